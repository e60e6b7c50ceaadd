import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PASSWORD_RESET_REQUESTED_MESSAGE } from '@understudy/shared-types';
import { createTestContext, linkFrom, waitForMail, type TestContext } from '../../../test/context';
import { createUser, TEST_PASSWORD } from '../../../test/factories';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(() => ctx.close());

describe('password reset', () => {
  it('mails a single-use link that sets a new password and ends old sessions', async () => {
    const user = await createUser(ctx.db, { email: 'forgetful@example.test' });
    const oldSession = request.agent(ctx.app);
    await oldSession.post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD }).expect(200);

    const res = await request(ctx.app).post('/api/password-resets').send({ email: 'FORGETFUL@example.test' }).expect(202);
    expect(res.body.message).toBe(PASSWORD_RESET_REQUESTED_MESSAGE);
    const { token } = linkFrom((await waitForMail(ctx.mail, user.email)).text, '/reset-password');

    await request(ctx.app).post('/api/password-resets/complete').send({ token, password: 'brand new passphrase' }).expect(204);
    await request(ctx.app).post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD }).expect(401);
    await request(ctx.app).post('/api/auth/sign-in').send({ email: user.email, password: 'brand new passphrase' }).expect(200);
    await oldSession.get('/api/auth/me').expect(401);

    const reuse = await request(ctx.app).post('/api/password-resets/complete').send({ token, password: 'third passphrase!' }).expect(404);
    expect(reuse.body.error.code).toBe('reset_invalid');
  });

  it('answers the same for an unknown address and sends nothing', async () => {
    ctx.mail.clear();
    const res = await request(ctx.app).post('/api/password-resets').send({ email: 'ghost@example.test' }).expect(202);
    expect(res.body.message).toBe(PASSWORD_RESET_REQUESTED_MESSAGE);
    await new Promise((r) => setTimeout(r, 200));
    expect(ctx.mail.messages()).toHaveLength(0);
  });

  it('refuses an expired link with 410 and a too-short password with 400', async () => {
    const user = await createUser(ctx.db, { email: 'slow@example.test' });
    await request(ctx.app).post('/api/password-resets').send({ email: user.email }).expect(202);
    const { token } = linkFrom((await waitForMail(ctx.mail, user.email)).text, '/reset-password');
    const short = await request(ctx.app).post('/api/password-resets/complete').send({ token, password: 'short' }).expect(400);
    expect(short.body.error.issues[0].path).toBe('body.password');
    await ctx.db.query(`UPDATE password_resets SET expires_at = now() - interval '1 second' WHERE user_id = $1`, [user.id]);
    const expired = await request(ctx.app).post('/api/password-resets/complete').send({ token, password: 'long enough now' }).expect(410);
    expect(expired.body.error.code).toBe('reset_expired');
  });
});
