import { createApp } from './app';
import { loadConfig } from './config';
import { createDataSource } from './data-source';
import { createMailer } from './mail/mailer';

const config = loadConfig();
const db = createDataSource(config.databaseUrl);
await db.initialize();
const mailer = createMailer(config);
const { app, close } = createApp({ config, db, mailer });

const server = app.listen(config.port, config.host, () => {
  console.log(`Understudy API listening on http://${config.host}:${config.port} (${config.env})`);
});

async function shutdown() {
  server.close();
  mailer.close();
  await close().catch(() => undefined);
  await db.destroy().catch(() => undefined);
  process.exit(0);
}
process.on('SIGINT', shutdown);
process.on('SIGTERM', shutdown);
