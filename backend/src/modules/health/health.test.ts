import net from 'node:net';
import type { AddressInfo } from 'node:net';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestContext, type TestContext } from '../../../test/context';

/** A TCP relay in front of PostgreSQL that the test can cut and restore, to play a database outage. */
async function startRelay(target: { host: string; port: number }) {
  const sockets = new Set<net.Socket>();
  let server: net.Server | undefined;
  let port = 0;
  const open = () =>
    new Promise<void>((resolve) => {
      server = net.createServer((client) => {
        const upstream = net.connect(target.port, target.host);
        sockets.add(client).add(upstream);
        client.pipe(upstream).pipe(client);
        const drop = () => {
          client.destroy();
          upstream.destroy();
        };
        client.on('error', drop).on('close', drop);
        upstream.on('error', drop).on('close', drop);
      });
      server.listen(port, '127.0.0.1', () => {
        port = (server!.address() as AddressInfo).port;
        resolve();
      });
    });
  const cut = () =>
    new Promise<void>((resolve) => {
      for (const s of sockets) s.destroy();
      sockets.clear();
      server!.close(() => resolve());
    });
  await open();
  return { port: () => port, cut, restore: open };
}

let ctx: TestContext;
let relay: Awaited<ReturnType<typeof startRelay>>;

beforeAll(async () => {
  const real = new URL(process.env.TEST_DATABASE_URL!);
  relay = await startRelay({ host: real.hostname, port: Number(real.port || 5432) });
  const viaRelay = new URL(real);
  viaRelay.port = String(relay.port());
  ctx = await createTestContext({ DATABASE_URL: viaRelay.toString() });
});
afterAll(async () => {
  await ctx.close().catch(() => undefined);
  await relay.cut().catch(() => undefined);
});

describe('GET /api/health', () => {
  it('answers 200 ok, 503 while the database is unreachable, and recovers by itself', async () => {
    expect((await request(ctx.app).get('/api/health').expect(200)).body).toEqual({ status: 'ok', db: 'ok' });

    await relay.cut();
    const down = await request(ctx.app).get('/api/health').expect(503);
    expect(down.body).toEqual({ status: 'error', db: 'unreachable' });

    await relay.restore();
    // The pool drops the broken connections and opens new ones without a restart.
    let status = 0;
    for (let i = 0; i < 20 && status !== 200; i++) {
      status = (await request(ctx.app).get('/api/health')).status;
      if (status !== 200) await new Promise((r) => setTimeout(r, 250));
    }
    expect(status).toBe(200);
  });
});
