import fs from 'node:fs';
import path from 'node:path';
import connectPgSimple from 'connect-pg-simple';
import express, { type Express } from 'express';
import session from 'express-session';
import helmet from 'helmet';
import pg from 'pg';
import type { DataSource } from 'typeorm';
import type { AppConfig } from './config';
import type { Mailer } from './mail/mailer';
import { loadCurrentUser } from './middleware/authenticate';
import { errorHandler, notFoundApi } from './middleware/error-handler';
import { rejectCrossSite } from './middleware/same-origin';
import { alertsRouter } from './modules/alerts/alerts.router';
import { alternatesRouter } from './modules/alternates/alternates.router';
import { datasheetsRouter } from './modules/datasheets/datasheets.router';
import { auditEventsRouter } from './modules/audit-events/audit-events.router';
import { authRouter } from './modules/auth/auth.router';
import { bomJsonBody, bomsRouter } from './modules/boms/boms.router';
import { SESSION_COOKIE } from './modules/auth/session';
import { equivalentsRouter } from './modules/equivalents/equivalents.router';
import { familiesRouter } from './modules/families/families.router';
import { healthRouter } from './modules/health/health.router';
import { invitationsRouter } from './modules/invitations/invitations.router';
import { manufacturersRouter } from './modules/manufacturers/manufacturers.router';
import { outboxRouter } from './modules/outbox/outbox.router';
import { partsRouter } from './modules/parts/parts.router';
import { passwordResetsRouter } from './modules/password-resets/password-resets.router';
import { requirementSetsRouter } from './modules/requirement-sets/requirement-sets.router';
import { usersRouter } from './modules/users/users.router';
import type { JobQueue } from './queue/job-queue';
import type { FileStorage } from './storage/file-storage';

export interface AppDeps {
  config: AppConfig;
  db: DataSource;
  mailer: Mailer;
  storage: FileStorage;
  queue: JobQueue;
}

export interface BuiltApp {
  app: Express;
  /** Closes what the app opened itself (the session store's pool). */
  close(): Promise<void>;
}

export function createApp({ config, db, mailer, storage, queue }: AppDeps): BuiltApp {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');

  app.use(helmet());
  app.use('/api/health', healthRouter(db));

  const sessionPool = new pg.Pool({ connectionString: config.databaseUrl, max: 4, connectionTimeoutMillis: 3_000 });
  // An idle client dropped by a database restart must not crash the process; the pool reconnects on next use.
  sessionPool.on('error', (err) => console.warn('[sessions] idle connection lost:', err.message));
  const PgStore = connectPgSimple(session);

  // A BOM's text may run to 5 MB: its two POSTs get a wider JSON limit; the general parser then skips them.
  app.use('/api/boms', bomJsonBody());
  app.use('/api', express.json({ limit: '1mb' }));
  app.use('/api', rejectCrossSite(config.allowedOrigins));
  app.use(
    '/api',
    session({
      name: SESSION_COOKIE,
      secret: config.sessionSecret,
      // Sessions last a fixed week from sign-in, so there is no need to write the row on every request.
      store: new PgStore({ pool: sessionPool, tableName: 'sessions', createTableIfMissing: false, pruneSessionInterval: 15 * 60, disableTouch: true }),
      resave: false,
      saveUninitialized: false,
      rolling: false,
      cookie: {
        httpOnly: true,
        sameSite: 'lax',
        secure: config.appUrl.startsWith('https://'),
        maxAge: 7 * 24 * 3_600_000,
        path: '/',
      },
    }),
  );
  app.use('/api', loadCurrentUser(db));

  app.use('/api/auth', authRouter(db, config));
  app.use('/api/users', usersRouter(db));
  app.use('/api/invitations', invitationsRouter(db, mailer, config));
  app.use('/api/password-resets', passwordResetsRouter(db, mailer, config));
  app.use('/api/audit-events', auditEventsRouter(db));
  app.use('/api/outbox', outboxRouter(config));
  app.use('/api/families', familiesRouter());
  app.use('/api/manufacturers', manufacturersRouter(db));
  app.use('/api', alternatesRouter(db));
  app.use('/api', equivalentsRouter(db, queue));
  app.use('/api/parts', partsRouter(db, queue));
  app.use('/api/datasheets', datasheetsRouter({ db, storage, queue, limits: config.datasheets }));
  app.use('/api/requirement-sets', requirementSetsRouter(db));
  app.use('/api/boms', bomsRouter(db));
  app.use('/api', alertsRouter(db));
  app.use('/api', notFoundApi);

  if (config.frontendDist && fs.existsSync(path.join(config.frontendDist, 'index.html'))) {
    const dist = config.frontendDist;
    app.use(express.static(dist, { index: false, maxAge: '1h' }));
    // Client-side routes: every other GET gets the app shell.
    app.get(/^(?!\/api\/).*/, (_req, res) => res.sendFile(path.join(dist, 'index.html')));
  }

  app.use(errorHandler);

  return {
    app,
    close: async () => {
      await sessionPool.end();
    },
  };
}
