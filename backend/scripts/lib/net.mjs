import net from 'node:net';
import { UserError } from './log.mjs';

/** Parses a TCP port from the environment (or a default), with a message naming the variable. */
export function portFromEnv(variable, fallback) {
  const raw = process.env[variable] ?? String(fallback);
  const port = Number(raw);
  if (!/^\d+$/.test(raw) || port < 1 || port > 65535) {
    throw new UserError(`${variable} must be a port number from 1 to 65535 (got "${raw}").`);
  }
  return port;
}

function tryListen(port) {
  return new Promise((resolve) => {
    const server = net.createServer();
    server.once('error', (err) => resolve({ ok: false, code: err.code }));
    server.listen({ port, host: '127.0.0.1', exclusive: true }, () => {
      const actual = server.address().port;
      server.close(() => resolve({ ok: true, port: actual }));
    });
  });
}

/** Fails early, with a hint, instead of letting a child crash on EADDRINUSE later. */
export async function assertPortFree(port, what, variable) {
  const result = await tryListen(port);
  if (!result.ok) {
    throw new UserError(
      `Port ${port} (${what}) is not available (${result.code}); is another Understudy still running? ` +
        `Stop it, or set ${variable} to another port.`,
    );
  }
}

/** `count` distinct free ports on 127.0.0.1 (held open together so they cannot repeat). */
export async function freePorts(count) {
  const servers = [];
  try {
    for (let i = 0; i < count; i += 1) {
      const server = net.createServer();
      await new Promise((resolve, reject) => {
        server.once('error', reject);
        server.listen(0, '127.0.0.1', resolve);
      });
      servers.push(server);
    }
    return servers.map((s) => s.address().port);
  } finally {
    await Promise.all(servers.map((s) => new Promise((r) => s.close(r))));
  }
}

export const sleep = (ms) => new Promise((resolve) => setTimeout(resolve, ms));

/**
 * Polls `url` until it answers (with `okStatus` if given, else any HTTP response). Gives up
 * early if the service handle exits, so a crash is reported at once rather than as a timeout.
 */
export async function waitForHttp(url, { handle, timeoutMs = 90_000, okStatus = 200, what = url } = {}) {
  const deadline = Date.now() + timeoutMs;
  let last = 'no answer yet';
  while (Date.now() < deadline) {
    if (handle?.result) {
      const { code, signal } = handle.result;
      throw new UserError(`${handle.name} exited (${signal ?? `code ${code}`}) before ${what} became ready.`);
    }
    try {
      const res = await fetch(url, { signal: AbortSignal.timeout(3000), redirect: 'manual' });
      await res.arrayBuffer().catch(() => undefined);
      if (okStatus === null || res.status === okStatus) return;
      last = `HTTP ${res.status}`;
    } catch (err) {
      last = err?.cause?.code ?? err?.message ?? String(err);
    }
    await sleep(300);
  }
  throw new UserError(`${what} was not ready after ${Math.round(timeoutMs / 1000)} s (last: ${last}).`);
}
