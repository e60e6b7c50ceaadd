import { startFakeMailServer } from './fake-mail-server';

const server = await startFakeMailServer({
  smtpPort: Number(process.env.FAKE_SMTP_PORT ?? 2525),
  apiPort: Number(process.env.FAKE_MAIL_API_PORT ?? 2526),
});
console.log(`fake mail server ready: SMTP 127.0.0.1:${server.smtpPort}, messages at ${server.apiUrl}/messages`);

const stop = () => {
  server.close().finally(() => process.exit(0));
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
