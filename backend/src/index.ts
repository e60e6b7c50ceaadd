import { createApp } from './app';
import { loadConfig } from './config';
import { createDataSource } from './data-source';
import { createMailer } from './mail/mailer';
import { startAlertWorkers } from './modules/alerts/alerts.worker';
import { startDatasheetWorkers } from './modules/datasheets/datasheets.worker';
import { createJobQueue } from './queue/job-queue';
import { localFileStorage } from './storage/file-storage';

const config = loadConfig();
const db = createDataSource(config.databaseUrl);
await db.initialize();
const mailer = createMailer(config);
const storage = localFileStorage(config.datasheets.dir);
const queue = createJobQueue(config.databaseUrl, { pollSeconds: config.datasheets.pollSeconds });
await queue.start();
await startDatasheetWorkers({ db, storage, limits: config.datasheets }, queue, config.datasheets.workers);
await startAlertWorkers({ db, mailer, config }, queue, config.alerts);
const { app, close } = createApp({ config, db, mailer, storage, queue });

const server = app.listen(config.port, config.host, () => {
  console.log(`Understudy API listening on http://${config.host}:${config.port} (${config.env})`);
});

async function shutdown() {
  server.close();
  mailer.close();
  await queue.stop().catch(() => undefined);
  await close().catch(() => undefined);
  await db.destroy().catch(() => undefined);
  process.exit(0);
}
process.on('SIGINT', shutdown);
process.on('SIGTERM', shutdown);
