import type { DataSource } from 'typeorm';
import { loadConfig, type AppConfig } from '../src/config';
import { createDataSource } from '../src/data-source';
import { loadSyntheticCatalog } from './load-synthetic';

export const BENCH_PARTS = Number(process.env.BENCH_PARTS ?? 100_000);
export const log = (line: string) => console.log(line);

/**
 * The scratch database every catalog bench runs on: connected, holding BENCH_PARTS synthetic parts (loaded once;
 * BENCH_RELOAD=1 reloads) and freshly analysed, since the migrations may have added indexes since the load.
 */
export async function openBenchCatalog(): Promise<{ config: AppConfig; db: DataSource; parts: number }> {
  const config = loadConfig({ ...process.env, NODE_ENV: 'test' });
  const db = createDataSource(config.databaseUrl);
  await db.initialize();
  const [{ count }] = await db.query(`SELECT count(*)::int AS count FROM parts`);
  if (count !== BENCH_PARTS || process.env.BENCH_RELOAD === '1') {
    log(`Loading ${BENCH_PARTS.toLocaleString('en')} synthetic parts into the scratch database…`);
    await loadSyntheticCatalog(db, BENCH_PARTS, log);
  } else {
    log(`Reusing the scratch database's ${count.toLocaleString('en')} synthetic parts (BENCH_RELOAD=1 reloads).`);
  }
  await db.query('ANALYZE parts');
  return { config, db, parts: BENCH_PARTS };
}
