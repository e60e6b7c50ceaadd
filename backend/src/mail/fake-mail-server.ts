import { randomUUID } from 'node:crypto';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { OutboxMessage } from '@understudy/shared-types';

export interface FakeMailServer {
  smtpPort: number;
  apiUrl: string;
  messages(): OutboxMessage[];
  clear(): void;
  close(): Promise<void>;
}

/**
 * A local SMTP server that accepts every message and keeps it in memory, with a tiny JSON API
 * (GET/DELETE /messages) so the outbox page and the tests can read what was sent.
 */
export async function startFakeMailServer(options: { smtpPort?: number; apiPort?: number; host?: string } = {}): Promise<FakeMailServer> {
  const host = options.host ?? '127.0.0.1';
  const store: OutboxMessage[] = [];
  const limit = 500;

  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    size: 10 * 1024 * 1024,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const to = session.envelope.rcptTo.map((r) => r.address);
          store.unshift({
            id: randomUUID(),
            receivedAt: new Date().toISOString(),
            from: parsed.from?.text ?? (session.envelope.mailFrom ? session.envelope.mailFrom.address : ''),
            to,
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : null,
          });
          if (store.length > limit) store.length = limit;
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  await new Promise<void>((resolve, reject) => {
    smtp.once('error', reject);
    smtp.listen(options.smtpPort ?? 0, host, () => resolve());
  });
  const smtpPort = (smtp.server.address() as AddressInfo).port;

  const api = http.createServer((req, res) => {
    if (req.url === '/messages' && req.method === 'GET') {
      res.writeHead(200, { 'content-type': 'application/json' });
      res.end(JSON.stringify({ items: store }));
    } else if (req.url === '/messages' && req.method === 'DELETE') {
      store.length = 0;
      res.writeHead(204).end();
    } else {
      res.writeHead(404).end();
    }
  });
  await new Promise<void>((resolve, reject) => {
    api.once('error', reject);
    api.listen(options.apiPort ?? 0, host, () => resolve());
  });
  const apiPort = (api.address() as AddressInfo).port;

  return {
    smtpPort,
    apiUrl: `http://${host}:${apiPort}`,
    messages: () => [...store],
    clear: () => {
      store.length = 0;
    },
    close: async () => {
      await new Promise<void>((resolve) => smtp.close(() => resolve()));
      await new Promise<void>((resolve) => api.close(() => resolve()));
    },
  };
}
