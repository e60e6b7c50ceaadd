/**
 * Search speed on a 100,000-part synthetic catalog: each typical query through the HTTP API (signed in, JSON,
 * keep-alive) and as the bare SQL the API runs, with p50, p95 and the API/SQL ratio.
 * Targets on a 2-core machine: API p95 ≤ 50 ms, ratio ≤ 2.
 */
import { PartListQuerySchema } from '@understudy/shared-types';
import { parseFilters } from '../src/modules/parts/part-filters';
import { buildSearchSql, matchingManufacturers } from '../src/modules/parts/parts-search.service';
import { startApiAsViewer, timeRuns } from './api-harness';
import { log, openBenchCatalog } from './bench-catalog';

const ITERATIONS = Number(process.env.BENCH_ITERATIONS ?? 60);

const { db } = await openBenchCatalog();

// A real part number from the data, with two characters swapped, for the typo query.
const [{ part_number: samplePn }] = await db.query(`SELECT part_number FROM parts WHERE family = 'op-amp' ORDER BY part_number_key OFFSET 777 LIMIT 1`);
const typo = samplePn.length > 4 ? samplePn.slice(0, -2) + samplePn.slice(-1) + samplePn.slice(-2, -1) : samplePn;

const QUERIES: { name: string; query: Record<string, string> }[] = [
  { name: 'text: part number with a typo', query: { q: typo.toLowerCase() } },
  { name: 'text: words in descriptions, op amps', query: { q: 'quad jfet', family: 'op-amp' } },
  { name: 'text + two ranges', query: { q: samplePn.slice(0, 3), family: 'op-amp', 'supplyVoltage.min': '9 V', 'slewRate.min': '5 V/us' } },
  { name: 'ranges only: 9 V supply, ≥ 5 V/µs', query: { family: 'op-amp', 'supplyVoltage.min': '9', 'supplyVoltage.max': '9', 'slewRate.min': '5V/us' } },
  { name: 'ranges only: photocells reaching 10k at 10 lux', query: { family: 'photoresistor', 'lightResistance.min': '10k', 'lightResistance.max': '10k' } },
  { name: 'sort by slew rate, descending', query: { family: 'op-amp', sort: '-slewRate' } },
  { name: 'deep page (page 400 of op amps)', query: { family: 'op-amp', page: '400', pageSize: '50' } },
];

const server = await startApiAsViewer(db);
const { base, cookie } = server;


const time = (fn: () => Promise<unknown>) => timeRuns(fn, ITERATIONS);

log(`\n${ITERATIONS} timed runs per query after 5 warm-up runs; milliseconds.\n`);
const header = ['query', 'hits', 'API p50', 'API p95', 'SQL p50', 'SQL p95', 'ratio p50'];
const rows: string[][] = [];
let worstP95 = 0;
let worstRatio = 0;
for (const { name, query } of QUERIES) {
  const url = `${base}/api/parts?${new URLSearchParams(query)}`;
  const first = await fetch(url, { headers: { cookie } });
  if (!first.ok) throw new Error(`${name}: HTTP ${first.status} ${await first.text()}`);
  const { total } = (await first.json()) as { total: number };
  const api = await time(async () => {
    const res = await fetch(url, { headers: { cookie } });
    await res.arrayBuffer();
  });
  const parsed = PartListQuerySchema.parse(query);
  // The same two statements the API runs for a page (rows and total), side by side as it runs them.
  const manufacturerIds = await matchingManufacturers(db, parsed.q);
  const { sql, values, countSql, countValues } = buildSearchSql(parsed, parseFilters(parsed.family, query), { manufacturerIds });
  const bare = await time(() => Promise.all([db.query(sql, values), db.query(countSql, countValues)]));
  worstP95 = Math.max(worstP95, api.p95);
  worstRatio = Math.max(worstRatio, api.p50 / bare.p50);
  rows.push([name, String(total), api.p50.toFixed(1), api.p95.toFixed(1), bare.p50.toFixed(1), bare.p95.toFixed(1), (api.p50 / bare.p50).toFixed(2)]);
}

const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i]!.length)));
const line = (cells: string[]) => cells.map((c, i) => (i === 0 ? c.padEnd(widths[i]!) : c.padStart(widths[i]!))).join('  ');
log(line(header));
log(widths.map((w) => '-'.repeat(w)).join('  '));
for (const r of rows) log(line(r));
log(`\nWorst API p95: ${worstP95.toFixed(1)} ms (target ≤ 50 ms) ${worstP95 <= 50 ? 'met' : 'NOT met'}`);
log(`Worst API/SQL ratio at p50: ${worstRatio.toFixed(2)} (target ≤ 2) ${worstRatio <= 2 ? 'met' : 'NOT met'}`);

server.stop();
await server.removeViewer();
await db.destroy();
