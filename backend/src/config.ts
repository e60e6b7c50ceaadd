import path from 'node:path';
import { z } from 'zod';
import { DATASHEET_LIMITS } from '@understudy/shared-types';

const EnvSchema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  HOST: z.string().default('127.0.0.1'),
  PORT: z.coerce.number().int().min(1).max(65535).default(3000),
  DATABASE_URL: z.string().min(1, 'DATABASE_URL is required (npm start sets it)'),
  APP_URL: z.string().url().optional(),
  SESSION_SECRET: z.string().min(16).optional(),
  /** Extra origins allowed to send state-changing requests, comma separated. */
  ALLOWED_ORIGINS: z.string().default(''),
  SMTP_HOST: z.string().default('127.0.0.1'),
  SMTP_PORT: z.coerce.number().int().default(2525),
  SMTP_SECURE: z.enum(['true', 'false']).default('false'),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  MAIL_FROM: z.string().default('Understudy <no-reply@understudy.test>'),
  FAKE_MAIL_API_URL: z.string().url().optional(),
  FRONTEND_DIST: z.string().optional(),
  SIGN_IN_RATE_LIMIT: z.coerce.number().int().min(1).default(10),
  SIGN_IN_RATE_WINDOW_MINUTES: z.coerce.number().int().min(1).default(15),
  /** Folder of the local datasheet store; git-ignored under .data/ by default. */
  DATASHEET_DIR: z.string().optional(),
  DATASHEET_MAX_MB: z.coerce.number().positive().max(1024).default(DATASHEET_LIMITS.maxBytes / 1024 / 1024),
  DATASHEET_MAX_FILES: z.coerce.number().int().min(1).max(100).default(DATASHEET_LIMITS.maxFilesPerUpload),
  DATASHEET_MAX_PAGES: z.coerce.number().int().min(1).default(DATASHEET_LIMITS.maxPages),
  /** Parsing jobs this process works on at once; 0 leaves parsing to other processes. */
  DATASHEET_WORKERS: z.coerce.number().int().min(0).max(16).default(1),
  QUEUE_POLL_SECONDS: z.coerce.number().min(0.5).max(60).default(1),
  /** When the daily alert digest goes out, as a cron expression in UTC. */
  ALERT_DIGEST_CRON: z.string().trim().min(1).default('0 7 * * *'),
  /** Alert fan-out jobs this process works on at once; 0 leaves them to other processes. */
  ALERT_WORKERS: z.coerce.number().int().min(0).max(16).default(1),
});

export interface AppConfig {
  env: 'development' | 'test' | 'production';
  host: string;
  port: number;
  databaseUrl: string;
  appUrl: string;
  sessionSecret: string;
  allowedOrigins: string[];
  smtp: { host: string; port: number; secure: boolean; user?: string; password?: string };
  mailFrom: string;
  fakeMailApiUrl?: string;
  frontendDist?: string;
  signInRateLimit: { limit: number; windowMs: number };
  datasheets: { dir: string; maxBytes: number; maxFiles: number; maxPages: number; workers: number; pollSeconds: number };
  alerts: { digestCron: string; workers: number };
}

export function loadConfig(env: NodeJS.ProcessEnv = process.env): AppConfig {
  const parsed = EnvSchema.safeParse(env);
  if (!parsed.success) {
    const problems = parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ');
    throw new Error(`Invalid environment: ${problems}`);
  }
  const e = parsed.data;
  if (e.NODE_ENV === 'production' && !e.SESSION_SECRET) {
    throw new Error('SESSION_SECRET must be set in production');
  }
  const appUrl = e.APP_URL ?? `http://${e.HOST}:${e.PORT}`;
  return {
    env: e.NODE_ENV,
    host: e.HOST,
    port: e.PORT,
    databaseUrl: e.DATABASE_URL,
    appUrl,
    // Outside production a per-process secret is fine: sessions simply end on restart.
    sessionSecret: e.SESSION_SECRET ?? `dev-${crypto.randomUUID()}`,
    allowedOrigins: [new URL(appUrl).origin, ...e.ALLOWED_ORIGINS.split(',').map((s) => s.trim()).filter(Boolean)],
    smtp: {
      host: e.SMTP_HOST,
      port: e.SMTP_PORT,
      secure: e.SMTP_SECURE === 'true',
      user: e.SMTP_USER,
      password: e.SMTP_PASSWORD,
    },
    mailFrom: e.MAIL_FROM,
    fakeMailApiUrl: e.FAKE_MAIL_API_URL,
    frontendDist: e.FRONTEND_DIST,
    signInRateLimit: { limit: e.SIGN_IN_RATE_LIMIT, windowMs: e.SIGN_IN_RATE_WINDOW_MINUTES * 60_000 },
    datasheets: {
      dir: path.resolve(e.DATASHEET_DIR ?? path.join(import.meta.dirname, '../../.data/datasheets')),
      maxBytes: Math.round(e.DATASHEET_MAX_MB * 1024 * 1024),
      maxFiles: e.DATASHEET_MAX_FILES,
      maxPages: e.DATASHEET_MAX_PAGES,
      workers: e.DATASHEET_WORKERS,
      pollSeconds: e.QUEUE_POLL_SECONDS,
    },
    alerts: { digestCron: e.ALERT_DIGEST_CRON, workers: e.ALERT_WORKERS },
  };
}
