import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import type { Role } from '@understudy/shared-types';
import { createApp } from '../src/app';
import { loadConfig, type AppConfig } from '../src/config';
import { createDataSource } from '../src/data-source';
import type { User } from '../src/entities';
import { startFakeMailServer, type FakeMailServer } from '../src/mail/fake-mail-server';
import { createMailer, type Mailer } from '../src/mail/mailer';
import { createUser, TEST_PASSWORD } from './factories';

export interface TestContext {
  app: Express;
  db: DataSource;
  mail: FakeMailServer;
  mailer: Mailer;
  config: AppConfig;
  /** A supertest agent that keeps cookies, signed in as a fresh person of that role. */
  agentFor(role: Role): Promise<{ agent: ReturnType<typeof request.agent>; user: User }>;
  close(): Promise<void>;
}

export const APP_URL = 'http://understudy.test:3000';

/** The real app on the real test database, with the real mailer talking SMTP to an in-process fake server. */
export async function createTestContext(env: Record<string, string> = {}): Promise<TestContext> {
  const mail = await startFakeMailServer();
  const config = loadConfig({
    NODE_ENV: 'test',
    DATABASE_URL: process.env.TEST_DATABASE_URL,
    APP_URL,
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(mail.smtpPort),
    FAKE_MAIL_API_URL: mail.apiUrl,
    SESSION_SECRET: 'test-session-secret-0123456789',
    ...env,
  });
  const db = createDataSource(config.databaseUrl);
  await db.initialize();
  const mailer = createMailer(config);
  const built = createApp({ config, db, mailer });
  return {
    app: built.app,
    db,
    mail,
    mailer,
    config,
    async agentFor(role) {
      const user = await createUser(db, { role });
      const agent = request.agent(built.app);
      await agent.post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD }).expect(200);
      return { agent, user };
    },
    async close() {
      mailer.close();
      await built.close();
      await db.destroy();
      await mail.close();
    },
  };
}

/** Waits for the fake server to receive a message to `to`; SMTP delivery is asynchronous to the HTTP answer only by a hair. */
export async function waitForMail(mail: FakeMailServer, to: string, timeoutMs = 5_000) {
  const started = Date.now();
  for (;;) {
    const found = mail.messages().find((m) => m.to.some((address) => address.toLowerCase() === to.toLowerCase()));
    if (found) return found;
    if (Date.now() - started > timeoutMs) throw new Error(`No mail to ${to} within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 25));
  }
}

export function linkFrom(text: string, path: string): { url: URL; token: string } {
  const match = text.match(new RegExp(`https?://\\S+${path}\\?token=\\S+`));
  if (!match) throw new Error(`No ${path} link in mail:\n${text}`);
  const url = new URL(match[0]);
  return { url, token: url.searchParams.get('token')! };
}
