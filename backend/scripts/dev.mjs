// `npm run dev`: the API in watch mode plus Vite's dev server, with the same database and mail
// set-up as `npm start`. Open the Vite URL; Vite proxies /api to the API port.
import { migrate, seed, startFakeMail, startServer, usesRealSmtp, fakeSmtpEnv, childEnv } from './lib/app.mjs';
import { bootstrap } from './lib/bootstrap.mjs';
import { bold, cyan, dim, step } from './lib/log.mjs';
import { assertPortFree, portFromEnv, waitForHttp } from './lib/net.mjs';
import { repoRoot } from './lib/paths.mjs';
import { databaseUrl, ensureDatabase } from './lib/postgres.mjs';
import { installSignalHandlers, main, startService } from './lib/proc.mjs';

installSignalHandlers({ interruptExitCode: 0 });

await main(async () => {
  const apiPort = portFromEnv('UNDERSTUDY_API_PORT', 3001);
  const vitePort = portFromEnv('UNDERSTUDY_VITE_PORT', 5173);
  const realSmtp = usesRealSmtp();
  const smtpPort = realSmtp ? null : portFromEnv('FAKE_SMTP_PORT', 2525);
  const mailApiPort = realSmtp ? null : portFromEnv('FAKE_MAIL_API_PORT', 2526);
  const nodeEnv = process.env.NODE_ENV || 'development';

  await assertPortFree(apiPort, 'API server', 'UNDERSTUDY_API_PORT');
  await assertPortFree(vitePort, 'Vite dev server', 'UNDERSTUDY_VITE_PORT');
  if (!realSmtp) {
    await assertPortFree(smtpPort, 'fake SMTP server', 'FAKE_SMTP_PORT');
    await assertPortFree(mailApiPort, 'fake mail API', 'FAKE_MAIL_API_PORT');
  }

  const cluster = await bootstrap();
  await ensureDatabase('understudy');
  const dbUrl = databaseUrl('understudy');
  await migrate(dbUrl);
  if (nodeEnv !== 'production') await seed(dbUrl, { nodeEnv });

  let mailEnv = {};
  if (!realSmtp) mailEnv = fakeSmtpEnv(await startFakeMail({ smtpPort, apiPort: mailApiPort, critical: true }));

  // The browser talks to Vite, so the app's own URL (links in mail, origin checks) is Vite's.
  const appUrl = `http://127.0.0.1:${vitePort}`;
  const apiUrl = `http://127.0.0.1:${apiPort}`;
  await startServer({
    port: apiPort,
    watch: true,
    critical: true,
    env: { DATABASE_URL: dbUrl, NODE_ENV: nodeEnv, APP_URL: appUrl, ...mailEnv },
  });

  step(`Starting Vite on ${appUrl} (proxying /api to ${apiUrl})…`);
  // Bind 127.0.0.1 explicitly: "localhost" may resolve to ::1 only, and APP_URL names 127.0.0.1.
  const vite = startService(
    'vite',
    'npm',
    ['run', 'dev', '-w', 'frontend', '--', '--host', '127.0.0.1', '--port', String(vitePort), '--strictPort'],
    { cwd: repoRoot, env: childEnv({ API_PROXY_TARGET: apiUrl, NODE_ENV: undefined }), critical: true },
  );
  await waitForHttp(`${appUrl}/`, { handle: vite, okStatus: null, what: 'the Vite dev server' });

  const line = '─'.repeat(64);
  console.log(
    [
      '',
      line,
      `  ${bold('Understudy dev:')} ${cyan(appUrl)}  ${dim(`(API ${apiUrl}, restarts on change)`)}`,
      `  Demo accounts ${dim('(demo data only)')}: viewer@ / editor@ / admin@understudy.test, password ${bold('understudy-demo')}`,
      realSmtp ? '  Mail goes to your SMTP server.' : `  Outbox: ${cyan(`${appUrl}/admin/outbox`)}`,
      `  ${bold('Ctrl-C stops everything')}${cluster.startedByUs ? '' : ' (PostgreSQL was already running and stays up)'}.`,
      line,
      '',
    ].join('\n'),
  );
});
