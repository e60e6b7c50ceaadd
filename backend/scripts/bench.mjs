// `npm run bench:<name>`: a benchmark against a scratch database in the private cluster.
// Plain Node like the other bootstrap scripts; the benchmark itself is TypeScript under backend/bench/.
import path from 'node:path';
import { migrate } from './lib/app.mjs';
import { bootstrap } from './lib/bootstrap.mjs';
import { binCommand } from './lib/deps.mjs';
import { UserError } from './lib/log.mjs';
import { repoRoot } from './lib/paths.mjs';
import { databaseUrl, ensureDatabase } from './lib/postgres.mjs';
import { installSignalHandlers, main, run, shutdown } from './lib/proc.mjs';

installSignalHandlers();

const BENCHES = { search: 'search.bench.ts' };

await main(async () => {
  const name = process.argv[2];
  const file = BENCHES[name];
  if (!file) throw new UserError(`Unknown benchmark "${name}"; choose one of: ${Object.keys(BENCHES).join(', ')}`);
  await bootstrap();
  // The scratch database is kept between runs so the 100,000-part load happens once.
  await ensureDatabase('understudy_bench');
  const url = databaseUrl('understudy_bench');
  await migrate(url);
  const cwd = path.join(repoRoot, 'backend');
  const [cmd, argv] = binCommand('tsx', [path.join('bench', file), ...process.argv.slice(3)], cwd);
  const { code } = await run(`bench ${name}`, cmd, argv, { cwd, env: { ...process.env, DATABASE_URL: url, NODE_ENV: 'test' } });
  await shutdown(code);
});
