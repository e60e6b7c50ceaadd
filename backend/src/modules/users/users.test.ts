import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestContext, type TestContext } from '../../../test/context';
import { createUser, TEST_PASSWORD } from '../../../test/factories';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
  // Start from no admins so the last-admin rule is tested against a known count.
  await ctx.db.query(`DELETE FROM users WHERE role = 'admin'`);
});
afterAll(() => ctx.close());

describe('people admin', () => {
  it('lists people without password hashes', async () => {
    const { agent } = await ctx.agentFor('admin');
    const res = await agent.get('/api/users').expect(200);
    expect(res.body.items.length).toBeGreaterThan(0);
    for (const u of res.body.items) expect(u).not.toHaveProperty('passwordHash');
  });

  it('changes a role, records an audit event, and the change applies at once', async () => {
    const { agent: admin, user: adminUser } = await ctx.agentFor('admin');
    const { agent: person, user } = await ctx.agentFor('viewer');
    await person.get('/api/users').expect(403);
    const res = await admin.patch(`/api/users/${user.id}`).send({ role: 'admin' }).expect(200);
    expect(res.body.role).toBe('admin');
    await person.get('/api/users').expect(200);
    const [event] = await ctx.db.query(`SELECT actor_id, before, after FROM audit_events WHERE action = 'user.updated' AND subject_id = $1`, [user.id]);
    expect(event).toEqual({ actor_id: adminUser.id, before: { role: 'viewer', disabled: false, name: user.name }, after: { role: 'admin', disabled: false, name: user.name } });
  });

  it('disables an account: its sessions end and it cannot sign in', async () => {
    const { agent: admin } = await ctx.agentFor('admin');
    const target = await createUser(ctx.db);
    const session = request.agent(ctx.app);
    await session.post('/api/auth/sign-in').send({ email: target.email, password: TEST_PASSWORD }).expect(200);
    await admin.patch(`/api/users/${target.id}`).send({ disabled: true }).expect(200);
    await session.get('/api/auth/me').expect(401);
    await request(ctx.app).post('/api/auth/sign-in').send({ email: target.email, password: TEST_PASSWORD }).expect(401);
  });

  it('refuses self-demotion, self-disable and removing the last active admin', async () => {
    await ctx.db.query(`DELETE FROM users WHERE role = 'admin'`);
    const { agent: admin, user } = await ctx.agentFor('admin');
    expect((await admin.patch(`/api/users/${user.id}`).send({ role: 'viewer' }).expect(409)).body.error.code).toBe('self_role_change');
    expect((await admin.patch(`/api/users/${user.id}`).send({ disabled: true }).expect(409)).body.error.code).toBe('self_disable');
    const other = await createUser(ctx.db, { role: 'admin', disabled: true });
    // The only *active* admin is the actor; demoting a disabled admin is fine.
    await admin.patch(`/api/users/${other.id}`).send({ role: 'viewer' }).expect(200);
  });

  it('answers 404 for an unknown id and 400 for an empty change', async () => {
    const { agent: admin } = await ctx.agentFor('admin');
    await admin.patch('/api/users/00000000-0000-4000-8000-000000000000').send({ role: 'viewer' }).expect(404);
    const res = await admin.patch('/api/users/00000000-0000-4000-8000-000000000000').send({}).expect(400);
    expect(res.body.error.code).toBe('validation_failed');
  });
});
