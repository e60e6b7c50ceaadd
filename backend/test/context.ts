import fsp from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
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
import { startDatasheetWorkers } from '../src/modules/datasheets/datasheets.worker';
import { createJobQueue, type JobQueue } from '../src/queue/job-queue';
import { localFileStorage, type FileStorage } from '../src/storage/file-storage';
import { createUser, TEST_PASSWORD } from './factories';

export interface TestContext {
  app: Express;
  db: DataSource;
  mail: FakeMailServer;
  mailer: Mailer;
  config: AppConfig;
  storage: FileStorage;
  /** The folder behind `storage`, to check that nothing is left behind. */
  storageDir: string;
  queue: JobQueue;
  /** A supertest agent that keeps cookies, signed in as a fresh person of that role. */
  agentFor(role: Role): Promise<{ agent: ReturnType<typeof request.agent>; user: User }>;
  close(): Promise<void>;
}

export const APP_URL = 'http://understudy.test:3000';

/** The real app on the real test database, with the real mailer talking SMTP to an in-process fake server. */
export async function createTestContext(env: Record<string, string> = {}, { parseWorkers = 0 } = {}): Promise<TestContext> {
  const mail = await startFakeMailServer();
  const storageDir = await fsp.mkdtemp(path.join(os.tmpdir(), 'understudy-files-'));
  const config = loadConfig({
    NODE_ENV: 'test',
    DATABASE_URL: process.env.TEST_DATABASE_URL,
    APP_URL,
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(mail.smtpPort),
    FAKE_MAIL_API_URL: mail.apiUrl,
    SESSION_SECRET: 'test-session-secret-0123456789',
    DATASHEET_DIR: storageDir,
    QUEUE_POLL_SECONDS: '0.5',
    ...env,
  });
  const db = createDataSource(config.databaseUrl);
  await db.initialize();
  const mailer = createMailer(config);
  const storage = localFileStorage(config.datasheets.dir);
  // The queue starts on first use, so suites that never upload never touch pg-boss.
  const queue = createJobQueue(config.databaseUrl, { pollSeconds: config.datasheets.pollSeconds, namespace: `t${crypto.randomUUID().slice(0, 8)}-` });
  await startDatasheetWorkers({ db, storage, limits: config.datasheets }, queue, parseWorkers);
  const built = createApp({ config, db, mailer, storage, queue });
  return {
    app: built.app,
    db,
    mail,
    mailer,
    config,
    storage,
    storageDir,
    queue,
    async agentFor(role) {
      const user = await createUser(db, { role });
      const agent = request.agent(built.app);
      await agent.post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD }).expect(200);
      return { agent, user };
    },
    async close() {
      mailer.close();
      await queue.stop();
      await fsp.rm(storageDir, { recursive: true, force: true });
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
