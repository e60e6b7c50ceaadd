/**
 * Substitution speed on a 100,000-part synthetic catalog: a part's ranked alternates (a few originals across the
 * families, with and without an operating supply) and a position's requirements, each through the HTTP API
 * (signed in, JSON, keep-alive) and its database half alone (the same statements, run the same way); the
 * difference is the engine's scoring, JSON and HTTP.
 * Target: API p95 ≤ 150 ms.
 */
import { AlternatesQuerySchema, PositionRequirementsSchema, type FamilyKey, type PositionRequirementsInput } from '@understudy/shared-types';
import { alternatesSqlOnly, positionSqlOnly } from '../src/modules/alternates/alternates.service';
import { loadCandidate } from '../src/modules/alternates/candidate-parts';
import { findPairs, shortlistPairParts } from '../src/modules/alternates/pairs-shortlist';
import { startApiAsViewer, timeRuns } from './api-harness';
import { log, openBenchCatalog } from './bench-catalog';

const ITERATIONS = Number(process.env.BENCH_ITERATIONS ?? 40);
const TARGET_P95 = 150;

const { db } = await openBenchCatalog();

/** A fixed, typical original of a family: the 500th active part in part-number order matching `where`. */
async function original(family: FamilyKey, where = 'true'): Promise<{ id: string; partNumber: string }> {
  const rows = await db.query(
    `SELECT id, part_number FROM parts WHERE family = $1 AND lifecycle = 'active' AND NOT archived AND ${where} ORDER BY part_number_key OFFSET 500 LIMIT 1`,
    [family],
  );
  if (!rows[0]) throw new Error(`No ${family} original matching ${where}`);
  return { id: rows[0].id, partNumber: rows[0].part_number };
}

const dual = await original('op-amp', 'n_channels = 2 AND n_supply_voltage_min <= 9');
const single = await original('op-amp', 'n_channels = 1');
const quad = await original('op-amp', 'n_channels = 4');
const cell = await original('photoresistor');
const [led] = await db.query(`SELECT id FROM parts WHERE family = 'led' AND NOT archived ORDER BY part_number_key OFFSET 100 LIMIT 1`);
const pot = await original('potentiometer');
const opto = await original('optocoupler');

const ALTERNATES: { name: string; id: string; query: Record<string, string> }[] = [
  { name: `dual op amp ${dual.partNumber}`, id: dual.id, query: {} },
  { name: `dual op amp ${dual.partNumber}, 9 V supply`, id: dual.id, query: { supply: '9 V' } },
  { name: `dual op amp, ±15 V, slew-rate weighted`, id: dual.id, query: { supply: '±15 V', weights: 'slewRate:5' } },
  { name: `dual op amp, 9 V, drop-in only`, id: dual.id, query: { supply: '9 V', requireDropIn: '1' } },
  { name: `single op amp ${single.partNumber}, 9..18 V`, id: single.id, query: { supply: '9..18 V' } },
  { name: `quad op amp ${quad.partNumber}, obsolete allowed`, id: quad.id, query: { allowObsolete: '1' } },
  { name: `photoresistor ${cell.partNumber} lit by an LED`, id: cell.id, query: { pairedWith: led.id } },
  { name: `potentiometer ${pot.partNumber}`, id: pot.id, query: {} },
  { name: `optocoupler ${opto.partNumber}, with LED + photoresistor pairs`, id: opto.id, query: {} },
  { name: `optocoupler ${opto.partNumber}, drop-in only (no pairs)`, id: opto.id, query: { requireDropIn: '1' } },
];

const POSITION: PositionRequirementsInput = {
  family: 'op-amp',
  supply: { kind: 'single', volts: 9, halfSupplyBias: true },
  signal: { peakVolts: 2, frequencyHz: 20_000 },
  ledLoad: { outputVolts: 7, forwardVolts: 2, seriesOhms: 470 },
};

const server = await startApiAsViewer(db);
const { base, cookie } = server;


const time = (fn: () => Promise<unknown>) => timeRuns(fn, ITERATIONS);

async function fetchJson(url: string, init: RequestInit = {}): Promise<Record<string, unknown>> {
  const res = await fetch(url, { ...init, headers: { cookie, 'content-type': 'application/json', ...init.headers } });
  if (!res.ok) throw new Error(`${url}: HTTP ${res.status} ${await res.text()}`);
  return (await res.json()) as Record<string, unknown>;
}

log(`\n${ITERATIONS} timed runs per query after 5 warm-up runs; milliseconds.\n`);
const header = ['query', 'considered', 'shown', 'API p50', 'API p95', 'SQL p50', 'SQL p95'];
const rows: string[][] = [];
let worstP95 = 0;

for (const { name, id, query } of ALTERNATES) {
  const url = `${base}/api/parts/${id}/alternates?${new URLSearchParams(query)}`;
  const first = await fetchJson(url);
  const api = await time(async () => {
    const res = await fetch(url, { headers: { cookie } });
    await res.arrayBuffer();
  });
  // The database half of the same call: the original, the shortlist, its rows, the rulings, the failing sample.
  const parsed = AlternatesQuerySchema.parse(query);
  const bare = await time(() => alternatesSqlOnly(db, id, parsed));
  worstP95 = Math.max(worstP95, api.p95);
  rows.push([name, String(first.considered), String((first.items as unknown[]).length), api.p50.toFixed(1), api.p95.toFixed(1), bare.p50.toFixed(1), bare.p95.toFixed(1)]);
}

{
  const url = `${base}/api/alternates/rank`;
  const init = { method: 'POST', body: JSON.stringify(POSITION) };
  const first = await fetchJson(url, init);
  const api = await time(async () => {
    const res = await fetch(url, { ...init, headers: { cookie, 'content-type': 'application/json' } });
    await res.arrayBuffer();
  });
  const parsed = PositionRequirementsSchema.parse(POSITION);
  const bare = await time(() => positionSqlOnly(db, parsed));
  worstP95 = Math.max(worstP95, api.p95);
  rows.push(['position: 9 V single, 2 V peak at 20 kHz, LED', String(first.considered), String((first.items as unknown[]).length), api.p50.toFixed(1), api.p95.toFixed(1), bare.p50.toFixed(1), bare.p95.toFixed(1)]);
}

// The pairs on their own, in this process: the two shortlists and the engine over every pair of them, against the
// shortlists alone (their SQL and rows). The optocoupler rows above include them through the API.
let pairsLine: string;
{
  const found = await loadCandidate(db, opto.id);
  const { archived: _archived, ...original } = found!;
  const input = { weights: {}, requireDropIn: false, allowObsolete: false };
  const first = await findPairs(db, original, input);
  const whole = await time(() => findPairs(db, original, input));
  const bare = await time(() => shortlistPairParts(db, original, input));
  pairsLine = `LED + photoresistor pairs for ${opto.partNumber}: ${first.considered} pairs scored, ${first.items.length} shown; in process p50 ${whole.p50.toFixed(1)} ms, p95 ${whole.p95.toFixed(1)} ms; of which the shortlists (SQL) p50 ${bare.p50.toFixed(1)} ms, p95 ${bare.p95.toFixed(1)} ms`;
}

const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i]!.length)));
const line = (cells: string[]) => cells.map((c, i) => (i === 0 ? c.padEnd(widths[i]!) : c.padStart(widths[i]!))).join('  ');
log(line(header));
log(widths.map((w) => '-'.repeat(w)).join('  '));
for (const r of rows) log(line(r));
log(`\n${pairsLine}`);
log(`\nWorst API p95: ${worstP95.toFixed(1)} ms (target ≤ ${TARGET_P95} ms) ${worstP95 <= TARGET_P95 ? 'met' : 'NOT met'}`);

server.stop();
await server.removeViewer();
await db.destroy();
