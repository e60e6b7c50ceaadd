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

// `database: false` benches (the datasheet parser) need no cluster at all.
const BENCHES = {
  search: { file: 'search.bench.ts', database: true },
  alternates: { file: 'alternates.bench.ts', database: true },
  bom: { file: 'bom.bench.ts', database: true },
  extract: { file: 'extract.bench.ts', database: false },
};

await main(async () => {
  const name = process.argv[2];
  const bench = BENCHES[name];
  if (!bench) throw new UserError(`Unknown benchmark "${name}"; choose one of: ${Object.keys(BENCHES).join(', ')}`);
  const env = { ...process.env, NODE_ENV: 'test' };
  if (bench.database) {
    await bootstrap();
    // The scratch database is kept between runs so the 100,000-part load happens once.
    await ensureDatabase('understudy_bench');
    env.DATABASE_URL = databaseUrl('understudy_bench');
    await migrate(env.DATABASE_URL);
  } else {
    await bootstrap({ database: false });
  }
  const cwd = path.join(repoRoot, 'backend');
  const [cmd, argv] = binCommand('tsx', ['--expose-gc', path.join('bench', bench.file), ...process.argv.slice(3)], cwd);
  const { code } = await run(`bench ${name}`, cmd, argv, { cwd, env });
  await shutdown(code);
});
