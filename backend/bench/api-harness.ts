import { spawn } from 'node:child_process';
import net, { type AddressInfo } from 'node:net';
import path from 'node:path';
import type { DataSource } from 'typeorm';
import { createUser, TEST_PASSWORD } from '../test/factories';

/**
 * The API as its own process, as in production, so the client's work here is not counted against it, with a
 * signed-in viewer's cookie.
 */
export async function startApiAsViewer(db: DataSource): Promise<{ base: string; cookie: string; stop(): void; removeViewer(): Promise<void> }> {
  const user = await createUser(db, { role: 'viewer', email: `bench-${Date.now()}@example.test` });
  const port = await new Promise<number>((resolve) => {
    const probe = net.createServer().listen(0, '127.0.0.1', () => {
      const { port: free } = probe.address() as AddressInfo;
      probe.close(() => resolve(free));
    });
  });
  const backendDir = path.resolve(import.meta.dirname, '..');
  const server = spawn(path.join(backendDir, '../node_modules/.bin/tsx'), ['src/index.ts'], {
    cwd: backendDir,
    env: { ...process.env, NODE_ENV: 'test', PORT: String(port), HOST: '127.0.0.1', SESSION_SECRET: 'bench-session-secret-0123456789', SIGN_IN_RATE_LIMIT: '1000' },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const base = `http://127.0.0.1:${port}`;
  for (let i = 0; ; i++) {
    const ok = await fetch(`${base}/api/health`).then((r) => r.ok, () => false);
    if (ok) break;
    if (i > 150) throw new Error('The API did not start within 30 s');
    await new Promise((r) => setTimeout(r, 200));
  }
  const signIn = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: user.email, password: TEST_PASSWORD }),
  });
  const cookie = signIn.headers.get('set-cookie')!.split(';')[0]!;
  return {
    base,
    cookie,
    stop: () => server.kill('SIGTERM'),
    removeViewer: async () => void (await db.query('DELETE FROM users WHERE id = $1', [user.id])),
  };
}

export function percentile(sorted: number[], p: number): number {
  const i = Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1));
  return sorted[i]!;
}

/** p50 and p95 of `iterations` timed runs after five warm-up runs. */
export async function timeRuns(fn: () => Promise<unknown>, iterations: number): Promise<{ p50: number; p95: number }> {
  for (let i = 0; i < 5; i++) await fn();
  const samples: number[] = [];
  for (let i = 0; i < iterations; i++) {
    const t0 = performance.now();
    await fn();
    samples.push(performance.now() - t0);
  }
  samples.sort((a, b) => a - b);
  return { p50: percentile(samples, 50), p95: percentile(samples, 95) };
}
