// `npm test`: every suite against throw-away databases in the private cluster, then a summary.
// Plain Node with built-ins only, because it has to run before `npm ci` has (fresh CI clone).
import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { buildFrontend, childEnv, fakeSmtpEnv, migrate, seed, startFakeMail, startServer } from './lib/app.mjs';
import { bootstrap } from './lib/bootstrap.mjs';
import { binCommand } from './lib/deps.mjs';
import { bold, dim, formatDuration, green, red, step, UserError, warn, yellow } from './lib/log.mjs';
import { freePorts } from './lib/net.mjs';
import { repoRoot } from './lib/paths.mjs';
import { databaseUrl, dropDatabase, ensureDatabase } from './lib/postgres.mjs';
import { installSignalHandlers, isShuttingDown, main, onFinalize, onShutdown, run, runOrFail, shutdown, stopAll } from './lib/proc.mjs';

installSignalHandlers();

const startedAt = Date.now();
// A hung suite must not hold CI hostage; vitest's own timeouts normally fire long before this.
const suiteTimeoutMs = Number(process.env.UNDERSTUDY_SUITE_TIMEOUT_MINUTES || 8) * 60_000;

const suites = [
  { key: 'shared', name: 'shared-types unit' },
  { key: 'seed', name: 'seed data' },
  { key: 'backend', name: 'backend (API + database)' },
  { key: 'frontend', name: 'frontend unit' },
  { key: 'e2e', name: 'end-to-end (Chromium)' },
].map((s) => ({ ...s, status: 'not run', ms: null, note: '' }));
const byKey = Object.fromEntries(suites.map((s) => [s.key, s]));
let current = null;

// Settings from the developer's shell that would point tests at real services or fixed ports.
const LEAKY = ['DATABASE_URL', 'PORT', 'APP_URL', 'SESSION_SECRET', 'SMTP_HOST', 'SMTP_PORT', 'SMTP_SECURE',
  'SMTP_USER', 'SMTP_PASSWORD', 'FAKE_MAIL_API_URL', 'FRONTEND_DIST', 'E2E_BASE_URL', 'DATASHEET_DIR', 'DATASHEET_MAX_MB', 'DATASHEET_MAX_FILES',
  'DATASHEET_MAX_PAGES', 'DATASHEET_WORKERS'];
const testEnv = (extra = {}) =>
  childEnv({ ...Object.fromEntries(LEAKY.map((k) => [k, undefined])), NODE_ENV: 'test', ...extra });

async function runSuite(key, body) {
  const suite = byKey[key];
  current = suite;
  console.log(`\n${bold(`━━ ${suite.name} ━━`)}`);
  const t0 = Date.now();
  try {
    const passed = await body();
    suite.status = passed ? 'passed' : 'failed';
  } catch (err) {
    if (isShuttingDown()) {
      suite.status = 'interrupted';
      throw err;
    }
    suite.status = 'failed';
    suite.note = err instanceof UserError ? err.message.split('\n')[0] : String(err?.message ?? err);
    console.error(red(`✖ ${suite.name}: ${suite.note}`));
  } finally {
    suite.ms = Date.now() - t0;
    current = null;
  }
}

async function vitest(workspace, args, env) {
  const cwd = path.join(repoRoot, workspace);
  const [cmd, argv] = binCommand('vitest', args, cwd);
  const { code, timedOut } = await run(`vitest (${workspace})`, cmd, argv, { cwd, env, timeoutMs: suiteTimeoutMs });
  if (timedOut) throw new UserError(`timed out after ${formatDuration(suiteTimeoutMs)}`);
  return code === 0;
}

/** Chromium for the browser tests; Debian's package when we are allowed to install it. */
async function ensureChromium() {
  const chromium = process.env.CHROMIUM_PATH || '/usr/bin/chromium';
  if (fs.existsSync(chromium)) return chromium;
  const isRoot = process.getuid?.() === 0;
  if (process.env.CHROMIUM_PATH || !isRoot) {
    warn(
      `Chromium was not found at ${chromium}; the end-to-end suite cannot run.\n` +
        "  Install Debian's `chromium` package (sudo apt-get install chromium), or set CHROMIUM_PATH.",
    );
    return null;
  }
  step('Installing Chromium for the end-to-end tests (apt-get install chromium)…');
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  try {
    await runOrFail('apt-get update', 'apt-get', ['update'], { env });
    await runOrFail('apt-get install chromium', 'apt-get', ['install', '-y', 'chromium'], { env });
  } catch (err) {
    if (isShuttingDown()) throw err;
    warn(err.message);
  }
  return fs.existsSync(chromium) ? chromium : null;
}

function printSummary(exitCode) {
  if (current && current.status === 'not run') current.status = 'interrupted';
  const paint = { passed: green, failed: red, interrupted: yellow, 'not run': dim };
  const width = Math.max(...suites.map((s) => s.name.length));
  const lines = suites.map((s) => {
    const status = paint[s.status](s.status.padEnd(11));
    const time = s.ms === null ? '' : formatDuration(s.ms).padStart(9);
    return `  ${s.name.padEnd(width)}  ${status} ${time}${s.note ? `  ${dim(s.note)}` : ''}`;
  });
  const failed = exitCode !== 0;
  console.log(
    [
      '',
      bold('Test summary'),
      ...lines,
      `  ${'total'.padEnd(width)}  ${(failed ? red : green)((failed ? 'FAILED' : 'PASSED').padEnd(11))} ${formatDuration(Date.now() - startedAt).padStart(9)}`,
      '',
    ].join('\n'),
  );
}
onFinalize(printSummary);

await main(async () => {
  await bootstrap();
  const chromium = await ensureChromium();

  const suffix = crypto.randomBytes(4).toString('hex');
  const testDb = `understudy_test_${suffix}`;
  const e2eDb = `understudy_e2e_${suffix}`;
  // Registered after the cluster's own stop hook, so it runs before PostgreSQL is stopped.
  onShutdown(async () => {
    step('Dropping the throw-away databases…');
    for (const db of [testDb, e2eDb]) await dropDatabase(db).catch((err) => warn(`could not drop ${db}: ${err.message}`));
  }, { always: true }); // quick, and leaving junk databases behind helps nobody
  // The end-to-end server's uploaded datasheets go to a throw-away folder too.
  const e2eFiles = fs.mkdtempSync(path.join(os.tmpdir(), 'understudy-e2e-files-'));
  onShutdown(() => fs.rmSync(e2eFiles, { recursive: true, force: true }), { always: true });
  await ensureDatabase(testDb);
  await ensureDatabase(e2eDb);
  const testUrl = databaseUrl(testDb);
  const e2eUrl = databaseUrl(e2eDb);

  await runSuite('shared', () => vitest('shared-types', ['run'], testEnv()));
  await runSuite('seed', () => vitest('seed', ['run'], testEnv()));
  // DATABASE_URL too, so nothing in the backend tests can fall back to a developer's database.
  await runSuite('backend', () =>
    vitest('backend', ['run'], testEnv({ TEST_DATABASE_URL: testUrl, DATABASE_URL: testUrl })),
  );
  await runSuite('frontend', () => vitest('frontend', ['run'], testEnv()));
  await runSuite('e2e', async () => {
    if (!chromium) throw new UserError('Chromium is not installed');
    try {
      await migrate(e2eUrl, { env: testEnv() });
      await seed(e2eUrl, { nodeEnv: 'test', env: testEnv() });
      await buildFrontend();
      // The invented demo datasheets the browser test drops on the app.
      const demoDatasheets = path.join(e2eFiles, 'demo-datasheets');
      const [tsx, tsxArgs] = binCommand('tsx', [path.join('seed', 'src', 'datasheets', 'write-demo-datasheets.ts'), demoDatasheets], repoRoot);
      await runOrFail('demo datasheets', tsx, tsxArgs, { cwd: repoRoot, env: testEnv() });
      const [smtpPort, apiPort, port] = await freePorts(3);
      const mail = await startFakeMail({ smtpPort, apiPort });
      const baseUrl = `http://127.0.0.1:${port}`;
      await startServer({
        port,
        env: testEnv({ DATABASE_URL: e2eUrl, APP_URL: baseUrl, DATASHEET_DIR: path.join(e2eFiles, 'store'), QUEUE_POLL_SECONDS: '0.5', ...fakeSmtpEnv(mail) }),
      });
      return await vitest(
        'frontend',
        ['run', '--config', 'vitest.e2e.config.ts'],
        testEnv({ E2E_BASE_URL: baseUrl, FAKE_MAIL_API_URL: mail.apiUrl, CHROMIUM_PATH: chromium, E2E_DATASHEETS_DIR: demoDatasheets }),
      );
    } finally {
      if (!isShuttingDown()) await stopAll(); // the server and the mail server of this stage
    }
  });

  await shutdown(suites.every((s) => s.status === 'passed') ? 0 : 1);
});
