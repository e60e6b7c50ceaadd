// `npm start`: one command from a fresh clone to a running app with demo data.
// Plain Node with built-ins only, because it has to run before `npm ci` has.
import {
  buildFrontend,
  migrate,
  seed,
  startFakeMail,
  startServer,
  usesRealSmtp,
  fakeSmtpEnv,
} from './lib/app.mjs';
import path from 'node:path';
import { bootstrap } from './lib/bootstrap.mjs';
import { bold, cyan, dim, step } from './lib/log.mjs';
import { assertPortFree, portFromEnv } from './lib/net.mjs';
import { dataDir, repoRoot } from './lib/paths.mjs';
import { databaseUrl, ensureDatabase } from './lib/postgres.mjs';
import { installSignalHandlers, main } from './lib/proc.mjs';

/** The data directory as the user would type it: relative when inside the repo. */
function shownDataDir() {
  const rel = path.relative(repoRoot, dataDir);
  return rel && !rel.startsWith('..') && !path.isAbsolute(rel) ? `${rel}/` : dataDir;
}

// Stopping with Ctrl-C is the normal way to end `npm start`, so it is not an error.
installSignalHandlers({ interruptExitCode: 0 });

await main(async () => {
  const port = portFromEnv('PORT', 3000);
  const realSmtp = usesRealSmtp();
  const smtpPort = realSmtp ? null : portFromEnv('FAKE_SMTP_PORT', 2525);
  const mailApiPort = realSmtp ? null : portFromEnv('FAKE_MAIL_API_PORT', 2526);
  // Development by default: the demo seed and the outbox page are not available in production.
  const nodeEnv = process.env.NODE_ENV || 'development';

  // Check the ports before the slow steps, so a second `npm start` fails in a second, not a minute.
  await assertPortFree(port, 'web server', 'PORT');
  if (!realSmtp) {
    await assertPortFree(smtpPort, 'fake SMTP server', 'FAKE_SMTP_PORT');
    await assertPortFree(mailApiPort, 'fake mail API', 'FAKE_MAIL_API_PORT');
  }

  const cluster = await bootstrap();
  await ensureDatabase('understudy');
  const dbUrl = databaseUrl('understudy');
  await migrate(dbUrl);
  if (nodeEnv === 'production') step('NODE_ENV=production: skipping the demo seed');
  else await seed(dbUrl, { nodeEnv });
  await buildFrontend();

  let mailEnv = {};
  if (realSmtp) {
    step(`Using your SMTP server ${process.env.SMTP_HOST}:${process.env.SMTP_PORT ?? '(default port)'} (SMTP_* from your environment)`);
  } else {
    const mail = await startFakeMail({ smtpPort, apiPort: mailApiPort, critical: true });
    mailEnv = fakeSmtpEnv(mail);
  }

  const appUrl = `http://127.0.0.1:${port}`;
  await startServer({
    port,
    critical: true,
    env: { DATABASE_URL: dbUrl, NODE_ENV: nodeEnv, APP_URL: appUrl, ...mailEnv },
  });

  const line = '─'.repeat(64);
  const outbox = realSmtp
    ? `Mail goes to your SMTP server (${process.env.SMTP_HOST}); the outbox page is off.`
    : nodeEnv === 'production'
      ? 'The outbox page is off in production.'
      : `Sent mail (invitations, password resets, BOM alerts): ${cyan(`${appUrl}/admin/outbox`)} (admin only)`;
  console.log(
    [
      '',
      line,
      `  ${bold('Understudy is running:')} ${cyan(appUrl)}`,
      '',
      `  Demo accounts ${dim('(demo data only; never use these anywhere real)')}:`,
      '    viewer@understudy.test   purchaser@understudy.test   editor@understudy.test   admin@understudy.test',
      `    password: ${bold('understudy-demo')}`,
      '',
      `  ${outbox}`,
      '',
      `  ${bold('Ctrl-C stops everything')}: the server, the mail server` +
        (cluster.startedByUs ? ' and PostgreSQL.' : ' (PostgreSQL was already running and stays up).'),
      `  Data is kept in ${shownDataDir()} and survives restarts.`,
      line,
      '',
    ].join('\n'),
  );
});
