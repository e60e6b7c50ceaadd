import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SIGN_IN_FAILED_MESSAGE } from '@understudy/shared-types';
import { createTestContext, type TestContext } from '../../../test/context';
import { createUser, TEST_PASSWORD } from '../../../test/factories';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext({ SIGN_IN_RATE_LIMIT: '3' });
});
afterAll(() => ctx.close());

function sessionCookie(res: request.Response): string | undefined {
  const cookies = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
  return cookies.find((c) => c.startsWith('understudy.sid='));
}

describe('sign-in', () => {
  it('signs in with the right password, sets an httpOnly SameSite=Lax cookie, and /me answers', async () => {
    const user = await createUser(ctx.db, { role: 'editor', email: 'Mixed.Case@Example.test' });
    const agent = request.agent(ctx.app);
    // E-mail matching ignores case.
    const res = await agent.post('/api/auth/sign-in').send({ email: 'mixed.case@example.TEST', password: TEST_PASSWORD }).expect(200);
    expect(res.body.user).toEqual({ id: user.id, email: user.email, name: user.name, role: 'editor' });
    expect(res.body.user.passwordHash).toBeUndefined();
    const cookie = sessionCookie(res)!;
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    const me = await agent.get('/api/auth/me').expect(200);
    expect(me.body.user.id).toBe(user.id);
  });

  it('gives one generic message for an unknown e-mail, a wrong password and a disabled account', async () => {
    const active = await createUser(ctx.db);
    const disabled = await createUser(ctx.db, { disabled: true });
    const attempts = [
      { email: 'nobody@example.test', password: TEST_PASSWORD },
      { email: active.email, password: 'wrong password!' },
      { email: disabled.email, password: TEST_PASSWORD },
    ];
    for (const body of attempts) {
      // A fresh address per attempt group keeps this test clear of the rate limit.
      const res = await request(ctx.app).post('/api/auth/sign-in').set('X-Forwarded-For', '10.9.9.' + attempts.indexOf(body)).send(body).expect(401);
      expect(res.body.error).toEqual({ code: 'invalid_credentials', message: SIGN_IN_FAILED_MESSAGE });
    }
  });

  it('rejects a malformed body with field issues', async () => {
    const res = await request(ctx.app).post('/api/auth/sign-in').send({ email: 'not-an-email' }).expect(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toEqual(expect.arrayContaining(['body.email', 'body.password']));
  });

  it('rotates the session id at sign-in', async () => {
    const user = await createUser(ctx.db);
    const agent = request.agent(ctx.app);
    // A failed attempt leaves no session; make one exist first by signing in, then sign in again.
    const first = sessionCookie(await agent.post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD }).expect(200));
    const second = sessionCookie(await agent.post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD }).expect(200));
    expect(first).toBeDefined();
    expect(second).toBeDefined();
    expect(second!.split(';')[0]).not.toBe(first!.split(';')[0]);
    const [{ count }] = await ctx.db.query(`SELECT count(*)::int AS count FROM sessions WHERE sess->>'userId' = $1`, [user.id]);
    expect(count).toBe(1);
  });

  it('signs out and forgets the session', async () => {
    const { agent } = await ctx.agentFor('viewer');
    await agent.get('/api/auth/me').expect(200);
    await agent.post('/api/auth/sign-out').expect(204);
    await agent.get('/api/auth/me').expect(401);
  });

  it('answers 401 to /me when signed out', async () => {
    const res = await request(ctx.app).get('/api/auth/me').expect(401);
    expect(res.body.error.code).toBe('unauthenticated');
  });

  it('rate-limits repeated failed sign-ins from one address', async () => {
    const user = await createUser(ctx.db);
    const from = '10.1.2.3';
    for (let i = 0; i < 3; i++) {
      await request(ctx.app).post('/api/auth/sign-in').set('X-Forwarded-For', from).send({ email: user.email, password: 'nope nope nope' }).expect(401);
    }
    const limited = await request(ctx.app).post('/api/auth/sign-in').set('X-Forwarded-For', from).send({ email: user.email, password: TEST_PASSWORD }).expect(429);
    expect(limited.body.error.code).toBe('rate_limited');
    // Another address is unaffected.
    await request(ctx.app).post('/api/auth/sign-in').set('X-Forwarded-For', '10.1.2.4').send({ email: user.email, password: TEST_PASSWORD }).expect(200);
  });

  it('ends the session of an account disabled while signed in', async () => {
    const { agent, user } = await ctx.agentFor('viewer');
    await ctx.db.query('UPDATE users SET disabled = true WHERE id = $1', [user.id]);
    await agent.get('/api/auth/me').expect(401);
  });
});

describe('cross-site protection', () => {
  it('refuses a state-changing request from another origin', async () => {
    const res = await request(ctx.app).post('/api/auth/sign-in').set('Origin', 'https://evil.example').send({ email: 'a@b.test', password: 'x' }).expect(403);
    expect(res.body.error.code).toBe('cross_site_request');
  });

  it('refuses Sec-Fetch-Site cross-site and same-site, accepts same-origin', async () => {
    await request(ctx.app).post('/api/auth/sign-out').set('Sec-Fetch-Site', 'cross-site').expect(403);
    await request(ctx.app).post('/api/auth/sign-out').set('Sec-Fetch-Site', 'same-site').expect(403);
    await request(ctx.app).post('/api/auth/sign-out').set('Sec-Fetch-Site', 'same-origin').set('Origin', 'http://understudy.test:3000').expect(204);
  });

  it('sends security headers', async () => {
    const res = await request(ctx.app).get('/api/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    expect(res.headers['x-powered-by']).toBeUndefined();
  });
});
