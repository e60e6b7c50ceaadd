/**
 * BOM check speed on a 100,000-part synthetic catalog: a 10,000-line messy BOM (exact numbers written in other
 * case and spacing, packing and package suffixes, slipped characters, numbers the catalog does not have, bad
 * quantities, designator ranges) through the HTTP API as a signed-in viewer: preview, save and first check,
 * the detail page, the CSV export, and checking again.
 * Target: save + check p95 under 5 s.
 */
import { BomDetailDtoSchema, type BomCreateBody, type MatchKind } from '@understudy/shared-types';
import { percentile, startApiAsViewer } from './api-harness';
import { log, openBenchCatalog } from './bench-catalog';

const ITERATIONS = Number(process.env.BENCH_ITERATIONS ?? 8);
const WARM_UP = 2;
const LINES = 10_000;
const TARGET_MS = 5_000;

const { db } = await openBenchCatalog();

/** mulberry32, as the catalog generator uses: the same BOM on every run. */
function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
const random = rng(20_251_202);
const pick = <T>(items: readonly T[]): T => items[Math.floor(random() * items.length)]!;

// Real parts of the catalog, spread over it: every 10th in part-number order.
const sample: { part_number: string; manufacturer: string }[] = await db.query(
  `SELECT s.part_number, m.name AS manufacturer
     FROM (SELECT part_number, manufacturer_id, row_number() OVER (ORDER BY part_number_key, id) AS n FROM parts WHERE NOT archived) s
     JOIN manufacturers m ON m.id = s.manufacturer_id
    WHERE s.n % 10 = 0 ORDER BY s.n LIMIT ${LINES}`,
);

const SUFFIXES = ['-TR', '/TR', 'T&R', '-REEL', '#PBF', '/NOPB', '-SOIC8', ' DIP8', '-TSSOP', 'G4', '-SOIC8-TR'];
const DIGITS = '0123456789';

/** One character slipped: a digit changed, two neighbours swapped, or one dropped. */
function typo(pn: string): string {
  const at = [...pn].map((c, i) => (/\d/.test(c) ? i : -1)).filter((i) => i >= 0);
  const i = pick(at.length ? at : [Math.floor(pn.length / 2)]);
  const kind = random();
  if (kind < 0.5) return pn.slice(0, i) + pick([...DIGITS].filter((d) => d !== pn[i])) + pn.slice(i + 1);
  if (kind < 0.8 && i + 1 < pn.length) return pn.slice(0, i) + pn[i + 1] + pn[i] + pn.slice(i + 2);
  return pn.slice(0, i) + pn.slice(i + 1);
}

/** As people retype a number: other case, spaces for dashes, dashes dropped. */
function respell(pn: string): string {
  const r = random();
  if (r < 0.3) return pn.toLowerCase();
  if (r < 0.5) return pn.replace(/-/g, ' ');
  if (r < 0.7) return pn.replace(/[-\s]/g, '');
  return ` ${pn} `;
}

const PASSIVES = ['10k 0603 1%', '100nF X7R 50V', '4k7 0805', '1uF 25V', '2N-GENERIC', 'JACK-6.35-MONO', 'DC-JACK-2.1', 'FOOTSWITCH-3PDT', 'KNOB-D-SHAFT'];
const PREFIX = ['R', 'C', 'U', 'D', 'Q', 'J', 'LDR', 'VR'];

const kinds = { exact: 0, suffix: 0, typo: 0, unknown: 0 };
const rows: string[] = ['Part Number;Manufacturer;Qty;Designators;Notes'];
const next: Record<string, number> = {};
for (let i = 0; i < LINES; i++) {
  const part = sample[i % sample.length]!;
  const r = random();
  let pn: string;
  if (r < 0.55) {
    pn = respell(part.part_number);
    kinds.exact++;
  } else if (r < 0.75) {
    pn = part.part_number + pick(SUFFIXES);
    kinds.suffix++;
  } else if (r < 0.87) {
    pn = typo(part.part_number);
    kinds.typo++;
  } else {
    pn = `${pick(PASSIVES)}-${i}`;
    kinds.unknown++;
  }
  const qty = 1 + Math.floor(random() * 8);
  const prefix = pick(PREFIX);
  const start = (next[prefix] ??= 1);
  next[prefix] = start + qty;
  const designators = qty > 2 && random() < 0.5 ? `${prefix}${start}-${prefix}${start + qty - 1}` : Array.from({ length: qty }, (_, k) => `${prefix}${start + k}`).join(', ');
  const quantity = random() < 0.01 ? 'ten' : random() < 0.02 ? `${qty} pcs` : String(qty);
  const maker = random() < 0.6 ? part.manufacturer : '';
  const note = random() < 0.2 ? '"Order extra, ""long lead time"""' : '';
  rows.push([pn.includes(';') ? `"${pn}"` : pn, maker, quantity, `"${designators}"`, note].join(';'));
}
const text = rows.join('\r\n');
log(`BOM: ${LINES.toLocaleString('en')} lines, ${(Buffer.byteLength(text) / 1024).toFixed(0)} KiB — written as ${kinds.exact} exact (respelled), ${kinds.suffix} with suffixes, ${kinds.typo} mistyped, ${kinds.unknown} not in the catalog.`);

const server = await startApiAsViewer(db);
const { base, cookie } = server;
const headers = { cookie, 'content-type': 'application/json' };

async function call(path: string, init: RequestInit = {}): Promise<Response> {
  const res = await fetch(`${base}${path}`, { ...init, headers: { ...headers, ...init.headers } });
  if (!res.ok) throw new Error(`${path}: HTTP ${res.status} ${(await res.text()).slice(0, 500)}`);
  return res;
}

async function time(fn: () => Promise<unknown>, iterations = ITERATIONS): Promise<{ p50: number; p95: number }> {
  for (let i = 0; i < WARM_UP; i++) await fn();
  const samples: number[] = [];
  for (let i = 0; i < iterations; i++) {
    const t0 = performance.now();
    await fn();
    samples.push(performance.now() - t0);
  }
  samples.sort((a, b) => a - b);
  return { p50: percentile(samples, 50), p95: percentile(samples, 95) };
}

const created: string[] = [];
const createBody: BomCreateBody = {
  name: 'Bench BOM',
  text,
  fileName: 'bench.csv',
  encoding: 'utf-8',
  delimiter: ';',
  hasHeader: true,
  mapping: { partNumber: 0, manufacturer: 1, quantity: 2, designators: 3, notes: 4 },
};
const save = async () => {
  const res = await call('/api/boms', { method: 'POST', body: JSON.stringify(createBody) });
  const body = (await res.json()) as { id: string };
  created.push(body.id);
  return body;
};

// One save to see what the check made of the lines.
const first = BomDetailDtoSchema.parse(await save());
const matched: Partial<Record<MatchKind, number>> = {};
for (const l of first.lines) matched[l.match.kind] = (matched[l.match.kind] ?? 0) + 1;
log(`Check: ${Object.entries(matched).map(([k, n]) => `${n} ${k}`).join(', ')}; ${first.checks[0]!.durationMs} ms matching and judging on the server.`);
log(`Summary: ${first.summary.text}\n`);

log(`${ITERATIONS} timed runs each after ${WARM_UP} warm-up runs; milliseconds.\n`);
const results: [string, { p50: number; p95: number }][] = [];
results.push(['preview (paste, 10,000 lines)', await time(async () => (await call('/api/boms/preview', { method: 'POST', body: JSON.stringify({ text }) })).arrayBuffer())]);
results.push(['save + first check', await time(save)]);
results.push(['GET detail', await time(async () => (await call(`/api/boms/${first.id}`)).arrayBuffer())]);
results.push(['export CSV', await time(async () => (await call(`/api/boms/${first.id}/export.csv`)).arrayBuffer())]);
results.push(['check again', await time(async () => (await call(`/api/boms/${first.id}/check`, { method: 'POST' })).arrayBuffer())]);

const header = ['operation', 'p50', 'p95'];
const table = results.map(([name, r]) => [name, r.p50.toFixed(0), r.p95.toFixed(0)]);
const widths = header.map((h, i) => Math.max(h.length, ...table.map((r) => r[i]!.length)));
const line = (cells: string[]) => cells.map((c, i) => (i === 0 ? c.padEnd(widths[i]!) : c.padStart(widths[i]!))).join('  ');
log(line(header));
log(widths.map((w) => '-'.repeat(w)).join('  '));
for (const r of table) log(line(r));
const saveP95 = results[1]![1].p95;
log(`\nSave + check p95: ${saveP95.toFixed(0)} ms (target < ${TARGET_MS} ms) ${saveP95 < TARGET_MS ? 'met' : 'NOT met'}`);

server.stop();
// The viewer's BOMs go with the viewer.
await server.removeViewer();
await db.destroy();
