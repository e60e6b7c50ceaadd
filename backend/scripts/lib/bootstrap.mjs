// The common first steps of `npm start`, `npm test` and `npm run dev`.
import { ensureDependencies } from './deps.mjs';
import { ensureCluster } from './postgres.mjs';

/** Dependencies → PostgreSQL binaries → private cluster (created on first run) → running. */
export async function bootstrap({ database = true } = {}) {
  await ensureDependencies();
  return database ? ensureCluster() : undefined;
}

export { main, installSignalHandlers, shutdown, onShutdown, onFinalize } from './proc.mjs';
