import { loadConfig } from '../config';
import { createDataSource } from '../data-source';
import { createMailer } from '../mail/mailer';
import { sendDigests } from '../modules/alerts/alerts.service';

// Sends the daily alert digests now, as the scheduled job would: `npm run alerts:digest`.
const config = loadConfig();
const db = createDataSource(config.databaseUrl);
await db.initialize();
const mailer = createMailer(config);
try {
  const result = await sendDigests({ db, mailer, config }, new Date());
  console.log(`Sent ${result.people} digest${result.people === 1 ? '' : 's'} covering ${result.notices} notice${result.notices === 1 ? '' : 's'}.`);
  if (result.failed) {
    console.error(`${result.failed} digest${result.failed === 1 ? ' was' : 's were'} refused by the mail server; run again once it answers.`);
    process.exitCode = 1;
  }
} finally {
  mailer.close();
  await db.destroy();
}
