// The Understudy-specific steps shared by start, test and dev: migrate, seed, build, services.
import { binCommand } from './deps.mjs';
import { step } from './log.mjs';
import { waitForHttp } from './net.mjs';
import { paths, repoRoot } from './paths.mjs';
import { runOrFail, startService } from './proc.mjs';
import { readOrCreateSecret } from './secrets.mjs';

const tsx = (args) => binCommand('tsx', args);

/** Environment for children: ours plus `extra`; keys set to undefined are removed. */
export function childEnv(extra = {}, base = process.env) {
  const env = { ...base, ...extra };
  for (const [key, value] of Object.entries(env)) if (value === undefined) delete env[key];
  return env;
}

/** The user's own mail server settings, if they configured one (SMTP_HOST is the switch). */
export const usesRealSmtp = () => Boolean(process.env.SMTP_HOST);

/** Env that points the backend at the fake mail server and drops any real SMTP settings. */
export function fakeSmtpEnv(mail) {
  return {
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(mail.smtpPort),
    SMTP_SECURE: 'false',
    SMTP_USER: undefined,
    SMTP_PASSWORD: undefined,
    FAKE_MAIL_API_URL: mail.apiUrl,
  };
}

/** Persisted so sessions survive a restart of `npm start`. */
export const sessionSecret = () => process.env.SESSION_SECRET || readOrCreateSecret(paths.sessionSecretFile, 32);

export async function migrate(databaseUrl, { env } = {}) {
  step('Running database migrations…');
  const [cmd, args] = tsx(['backend/src/cli/migrate.ts']);
  await runOrFail('migrations', cmd, args, { cwd: repoRoot, env: childEnv({ ...env, DATABASE_URL: databaseUrl }) });
}

/** The seed only fills an empty database, so it is safe to run on every start. */
export async function seed(databaseUrl, { nodeEnv = 'development', env } = {}) {
  step('Loading demo data (only into an empty database)…');
  const [cmd, args] = tsx(['seed/src/run-seed.ts']);
  await runOrFail('seed', cmd, args, {
    cwd: repoRoot,
    env: childEnv({ ...env, DATABASE_URL: databaseUrl, NODE_ENV: nodeEnv }),
  });
}

export async function buildFrontend() {
  step('Building the front end (frontend/dist)…');
  // NODE_ENV is left to Vite: an inherited "development"/"test" would produce a dev build.
  // --logLevel warn: the per-asset listing is long and says nothing useful here; errors still show.
  await runOrFail('front-end build', 'npm', ['run', 'build', '-w', 'frontend', '--', '--logLevel', 'warn'], {
    cwd: repoRoot,
    env: childEnv({ NODE_ENV: undefined }),
  });
}

/** Starts the fake SMTP server + its JSON API; resolves once it prints that it is ready. */
export async function startFakeMail({ smtpPort, apiPort, critical = false }) {
  step(`Starting the fake mail server (SMTP 127.0.0.1:${smtpPort}, API 127.0.0.1:${apiPort})…`);
  const [cmd, args] = tsx(['backend/src/mail/fake-mail-server.cli.ts']);
  const handle = startService('fake mail server', cmd, args, {
    cwd: repoRoot,
    env: childEnv({ FAKE_SMTP_PORT: String(smtpPort), FAKE_MAIL_API_PORT: String(apiPort) }),
    readyPattern: /fake mail server ready/i,
    critical,
  });
  await handle.ready;
  return Object.assign(handle, { smtpPort, apiPort, apiUrl: `http://127.0.0.1:${apiPort}` });
}

/**
 * Starts the API server (optionally `tsx watch`) and waits for GET /api/health to answer 200.
 * `env` must carry DATABASE_URL, PORT, NODE_ENV, APP_URL and the mail settings.
 */
export async function startServer({ port, env, watch = false, critical = false }) {
  step(`Starting the server on 127.0.0.1:${port}${watch ? ' (watch mode)' : ''}…`);
  const [cmd, args] = tsx([...(watch ? ['watch'] : []), 'backend/src/index.ts']);
  const handle = startService('server', cmd, args, {
    cwd: repoRoot,
    env: childEnv({
      SESSION_SECRET: sessionSecret(),
      FRONTEND_DIST: paths.frontendDist,
      ...env,
      HOST: '127.0.0.1',
      PORT: String(port),
    }),
    critical,
  });
  await waitForHttp(`http://127.0.0.1:${port}/api/health`, { handle, what: 'the server health check' });
  return handle;
}
