// `npm run alerts:digest`: sends the daily alert digests now, as the scheduled job does each morning.
// With DATABASE_URL set it uses that database; otherwise the private cluster's `understudy` database that
// `npm start` uses, and the mail settings `npm start` would (a running fake mail server unless SMTP_HOST is set).
import { childEnv } from './lib/app.mjs';
import { bootstrap } from './lib/bootstrap.mjs';
import { binCommand } from './lib/deps.mjs';
import { portFromEnv } from './lib/net.mjs';
import { repoRoot } from './lib/paths.mjs';
import { databaseUrl } from './lib/postgres.mjs';
import { installSignalHandlers, main, run, shutdown } from './lib/proc.mjs';

installSignalHandlers();

await main(async () => {
  const env = { APP_URL: process.env.APP_URL || `http://127.0.0.1:${portFromEnv('PORT', 3000)}` };
  if (!process.env.DATABASE_URL) {
    await bootstrap();
    env.DATABASE_URL = databaseUrl('understudy');
  }
  if (!process.env.SMTP_HOST && !process.env.SMTP_PORT) env.SMTP_PORT = String(portFromEnv('FAKE_SMTP_PORT', 2525));
  const [cmd, args] = binCommand('tsx', ['backend/src/cli/send-alert-digest.ts']);
  const { code } = await run('alert digest', cmd, args, { cwd: repoRoot, env: childEnv(env) });
  await shutdown(code);
});
