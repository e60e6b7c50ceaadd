import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestContext, linkFrom, waitForMail, type TestContext } from '../../../test/context';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(() => ctx.close());

describe('invitations', () => {
  it('mails an invitation whose link creates a working account of the invited role, once', async () => {
    const { agent: admin } = await ctx.agentFor('admin');
    const created = await admin.post('/api/invitations').send({ email: 'New.Editor@Example.test', role: 'editor' }).expect(201);
    expect(created.body).toMatchObject({ email: 'New.Editor@Example.test', role: 'editor', status: 'pending' });

    const mail = await waitForMail(ctx.mail, 'New.Editor@Example.test');
    expect(mail.subject).toMatch(/invited/i);
    const { url, token } = linkFrom(mail.text, '/accept-invitation');
    expect(url.origin).toBe('http://understudy.test:3000');

    // Only the hash is stored.
    const [row] = await ctx.db.query('SELECT token_hash FROM invitations WHERE id = $1', [created.body.id]);
    expect(row.token_hash).not.toContain(token);
    expect(row.token_hash).toHaveLength(64);

    const preview = await request(ctx.app).get('/api/invitations/preview').query({ token }).expect(200);
    expect(preview.body).toEqual({ email: 'New.Editor@Example.test', role: 'editor' });

    const invitee = request.agent(ctx.app);
    const accepted = await invitee.post('/api/invitations/accept').send({ token, name: 'Noor Halvorsen', password: 'a long new passphrase' }).expect(201);
    expect(accepted.body.user).toMatchObject({ email: 'New.Editor@Example.test', role: 'editor', name: 'Noor Halvorsen' });
    await invitee.get('/api/auth/me').expect(200);

    // The new account signs in on its own.
    await request(ctx.app).post('/api/auth/sign-in').send({ email: 'new.editor@example.test', password: 'a long new passphrase' }).expect(200);

    // Single use.
    const again = await request(ctx.app).post('/api/invitations/accept').send({ token, name: 'Someone', password: 'another passphrase' }).expect(404);
    expect(again.body.error.code).toBe('invitation_invalid');

    const list = await admin.get('/api/invitations').expect(200);
    expect(list.body.items.find((i: { id: string }) => i.id === created.body.id).status).toBe('accepted');
  });

  it('refuses an expired invitation with 410', async () => {
    const { agent: admin } = await ctx.agentFor('admin');
    const created = await admin.post('/api/invitations').send({ email: 'late@example.test', role: 'viewer' }).expect(201);
    const { token } = linkFrom((await waitForMail(ctx.mail, 'late@example.test')).text, '/accept-invitation');
    await ctx.db.query(`UPDATE invitations SET expires_at = now() - interval '1 minute' WHERE id = $1`, [created.body.id]);
    const res = await request(ctx.app).post('/api/invitations/accept').send({ token, name: 'Late', password: 'a long passphrase' }).expect(410);
    expect(res.body.error.code).toBe('invitation_expired');
  });

  it('refuses a revoked invitation, a second pending one, and an address that has an account', async () => {
    const { agent: admin, user } = await ctx.agentFor('admin');
    const created = await admin.post('/api/invitations').send({ email: 'twice@example.test', role: 'viewer' }).expect(201);
    const dup = await admin.post('/api/invitations').send({ email: 'TWICE@example.test', role: 'viewer' }).expect(409);
    expect(dup.body.error.code).toBe('invitation_pending');
    const { token } = linkFrom((await waitForMail(ctx.mail, 'twice@example.test')).text, '/accept-invitation');
    await admin.delete(`/api/invitations/${created.body.id}`).expect(204);
    await request(ctx.app).get('/api/invitations/preview').query({ token }).expect(404);
    const taken = await admin.post('/api/invitations').send({ email: user.email.toUpperCase(), role: 'viewer' }).expect(409);
    expect(taken.body.error.code).toBe('email_taken');
  });

  it('rolls the invitation back when the mail cannot be sent', async () => {
    const broken = await createTestContext({ SMTP_PORT: '1' });
    try {
      const { agent: admin } = await broken.agentFor('admin');
      await admin.post('/api/invitations').send({ email: 'lost@example.test', role: 'viewer' }).expect(502);
      const [{ count }] = await broken.db.query(`SELECT count(*)::int AS count FROM invitations WHERE email = 'lost@example.test'`);
      expect(count).toBe(0);
    } finally {
      await broken.close();
    }
  });
});
