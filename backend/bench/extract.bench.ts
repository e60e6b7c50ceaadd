/**
 * Datasheet parser accuracy and speed on the invented test corpus (seed/src/datasheets): recall and precision per
 * family against the corpus's ground truth, the worst misses, parse time per document and the heap over 20 parses
 * in a row. Targets: recall ≥ 95 %, precision ≥ 98 %, a 4-page datasheet in under 1 s.
 *
 *   npm run bench:extract [-- --write DIR] [--seed N] [--count N] [--misses N]
 */
import { mkdir, writeFile } from 'node:fs/promises';
import path from 'node:path';
import type { DatasheetSummary, FamilyKey } from '@understudy/shared-types';
import { buildCorpus, DEFAULT_CORPUS_SEED, DEFAULT_CORPUS_SIZE, type CorpusEntry } from '@understudy/seed/src/datasheets/corpus';
import { renderDatasheet } from '@understudy/seed/src/datasheets/render-datasheet';

const TARGETS = { recall: 0.95, precision: 0.98, fourPageSeconds: 1 };
const RELATIVE_TOLERANCE = 0.005;
const MEMORY_RUNS = 20;

/** The parameters the benchmark scores, per family; the parser may report others, which are not counted. */
const SCORED_KEYS: Partial<Record<FamilyKey, readonly string[]>> = {
  'op-amp': ['channels', 'supplyVoltage', 'slewRate', 'gainBandwidth', 'inputOffsetVoltage', 'inputBiasCurrent', 'inputNoiseDensity', 'outputCurrent', 'quiescentCurrent'],
  photoresistor: ['darkResistance', 'lightResistance', 'gamma', 'peakWavelength', 'riseTime', 'decayTime', 'maxVoltage', 'powerDissipation'],
  led: ['forwardVoltage', 'forwardCurrent', 'peakWavelength', 'luminousIntensity', 'viewingAngle'],
  potentiometer: ['resistance', 'taper', 'tolerance', 'powerRating', 'gangs'],
};
const SLOTS = ['min', 'typ', 'max', 'value'] as const;
const IDENTITY = ['family', 'partNumber', 'manufacturer'] as const;

const log = (line = '') => console.log(line);

function option(name: string): string | undefined {
  const i = process.argv.indexOf(`--${name}`);
  return i >= 0 ? process.argv[i + 1] : undefined;
}

type Extraction = typeof import('../src/modules/datasheets/extraction/index');

async function loadParser(): Promise<Extraction> {
  try {
    return await import('../src/modules/datasheets/extraction/index');
  } catch (error) {
    const code = (error as { code?: string }).code;
    if (code === 'ERR_MODULE_NOT_FOUND' || code === 'MODULE_NOT_FOUND') {
      console.error('The datasheet parser is not there yet: backend/src/modules/datasheets/extraction/index.ts must export');
      console.error('extractDatasheet(data, options?) and summarise(extraction). Nothing to measure.');
      process.exit(1);
    }
    throw error;
  }
}

// ---------------------------------------------------------------------------------------------------------------
// Scoring

type Value = number | string | boolean;
interface Miss {
  file: string;
  family: string;
  field: string;
  expected: Value | null;
  got: Value | null;
}
interface Tally {
  truthSlots: number;
  matchedTruth: number;
  predictedSlots: number;
  matchedPredicted: number;
}
const emptyTally = (): Tally => ({ truthSlots: 0, matchedTruth: 0, predictedSlots: 0, matchedPredicted: 0 });

const squash = (s: string) => s.replace(/\s+/g, '').toUpperCase();
const collapse = (s: string) => s.replace(/\s+/g, ' ').trim().toLowerCase();

function identityMatches(field: (typeof IDENTITY)[number], expected: string, got: string): boolean {
  if (field === 'partNumber') return squash(expected) === squash(got);
  if (field === 'manufacturer') return collapse(expected) === collapse(got);
  return expected === got;
}

function valueMatches(expected: Value, got: Value): boolean {
  if (typeof expected === 'number' && typeof got === 'number') {
    return expected === 0 ? got === 0 : Math.abs(got - expected) <= RELATIVE_TOLERANCE * Math.abs(expected);
  }
  return expected === got;
}

interface DocumentScore extends Tally {
  misses: Miss[];
  unitErrors: string[];
}

/** Scores one document slot by slot: identity fields, then every min/typ/max/value of the scored keys. */
function score(entry: CorpusEntry, got: DatasheetSummary | null): DocumentScore {
  const out: DocumentScore = { ...emptyTally(), misses: [], unitErrors: [] };
  const truth = entry.truth;
  const miss = (field: string, expected: Value | null, value: Value | null) =>
    out.misses.push({ file: entry.name, family: entry.family, field, expected, got: value });

  for (const field of IDENTITY) {
    const expected = truth[field]!;
    const value = got?.[field] ?? null;
    const ok = value !== null && identityMatches(field, expected, value);
    out.truthSlots++;
    if (value !== null) out.predictedSlots++;
    if (ok) {
      out.matchedTruth++;
      out.matchedPredicted++;
    } else miss(field, expected, value);
  }

  const keys = SCORED_KEYS[entry.family] ?? [];
  for (const key of keys) {
    const t = truth.parameters[key];
    const p = got?.parameters[key];
    for (const slot of SLOTS) {
      const expected = t?.[slot];
      const value = p?.[slot];
      if (expected === undefined && value === undefined) continue;
      const ok = expected !== undefined && value !== undefined && valueMatches(expected, value);
      if (expected !== undefined) out.truthSlots++;
      if (value !== undefined) out.predictedSlots++;
      if (ok) {
        out.matchedTruth++;
        out.matchedPredicted++;
      } else miss(`${key}.${slot}`, expected ?? null, value ?? null);
    }
    if (t?.unit && p && p.unit !== t.unit) out.unitErrors.push(`${entry.name} ${key}: unit ${p.unit ?? '(none)'}, expected ${t.unit}`);
  }
  return out;
}

function add(into: Tally, s: Tally): void {
  into.truthSlots += s.truthSlots;
  into.matchedTruth += s.matchedTruth;
  into.predictedSlots += s.predictedSlots;
  into.matchedPredicted += s.matchedPredicted;
}

const pct = (n: number, d: number) => (d === 0 ? '   n/a' : `${((100 * n) / d).toFixed(1).padStart(5)} %`);
const ratio = (n: number, d: number) => (d === 0 ? 1 : n / d);

function percentile(sorted: number[], p: number): number {
  if (!sorted.length) return NaN;
  const i = Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1));
  return sorted[i]!;
}

function table(header: string[], rows: string[][]): void {
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i]!.length)));
  const line = (cells: string[]) => cells.map((c, i) => (i === 0 ? c.padEnd(widths[i]!) : c.padStart(widths[i]!))).join('  ');
  log(line(header));
  log(widths.map((w) => '-'.repeat(w)).join('  '));
  for (const r of rows) log(line(r));
}

const show = (v: Value | null) => (v === null ? '—' : typeof v === 'number' ? String(Number(v.toPrecision(6))) : JSON.stringify(v));
const mb = (bytes: number) => `${(bytes / 1024 / 1024).toFixed(1)} MB`;

// ---------------------------------------------------------------------------------------------------------------

const seed = Number(option('seed') ?? DEFAULT_CORPUS_SEED);
const count = Number(option('count') ?? DEFAULT_CORPUS_SIZE);
const missesToShow = Number(option('misses') ?? 30);
const writeDir = option('write');

const { extractDatasheet, summarise } = await loadParser();

log(`Building the corpus (seed ${seed}, ${count} documents)…`);
let t = performance.now();
const corpus = buildCorpus({ seed, count });
const pdfs: Uint8Array[] = [];
for (const entry of corpus) pdfs.push(new Uint8Array(await renderDatasheet(entry.spec)));
log(`  rendered ${corpus.length} PDFs in ${((performance.now() - t) / 1000).toFixed(1)} s`);

if (writeDir) {
  await mkdir(writeDir, { recursive: true });
  await Promise.all(corpus.map((e, i) => writeFile(path.join(writeDir, `${e.name}.pdf`), pdfs[i]!)));
  const truth = Object.fromEntries(corpus.map((e) => [`${e.name}.pdf`, { pageCount: e.pageCount, variations: e.variations, truth: e.truth }]));
  await writeFile(path.join(writeDir, 'truth.json'), `${JSON.stringify(truth, null, 2)}\n`);
  log(`  wrote the PDFs and truth.json to ${writeDir}`);
}

// One untimed parse first, so loading pdf.js and warming the JIT are not charged to the first document.
await extractDatasheet(pdfs[0]!);

const perFamily = new Map<string, Tally>();
const overall = emptyTally();
const misses: Miss[] = [];
const unitErrors: string[] = [];
const failures: string[] = [];
const times: { ms: number; pages: number }[] = [];
const predictions: Record<string, DatasheetSummary | { error: string }> = {};

for (const [i, entry] of corpus.entries()) {
  let summary: DatasheetSummary | null = null;
  const t0 = performance.now();
  try {
    summary = summarise(await extractDatasheet(pdfs[i]!));
    times.push({ ms: performance.now() - t0, pages: entry.pageCount });
    predictions[entry.name] = summary;
  } catch (error) {
    failures.push(`${entry.name}: ${(error as Error).message}`);
    predictions[entry.name] = { error: (error as Error).message };
  }
  const s = score(entry, summary);
  const tally = perFamily.get(entry.family) ?? emptyTally();
  add(tally, s);
  perFamily.set(entry.family, tally);
  add(overall, s);
  misses.push(...s.misses);
  unitErrors.push(...s.unitErrors);
}
if (writeDir) await writeFile(path.join(writeDir, 'predicted.json'), `${JSON.stringify(predictions, null, 2)}\n`);

log(`\nAccuracy, slot by slot (numbers match within ${RELATIVE_TOLERANCE * 100} %; identity fields count as slots)\n`);
const familyRows = [...perFamily].map(([family, s]) => [family, String(corpus.filter((e) => e.family === family).length), `${s.matchedTruth}/${s.truthSlots}`, pct(s.matchedTruth, s.truthSlots), `${s.matchedPredicted}/${s.predictedSlots}`, pct(s.matchedPredicted, s.predictedSlots)]);
familyRows.push(['overall', String(corpus.length), `${overall.matchedTruth}/${overall.truthSlots}`, pct(overall.matchedTruth, overall.truthSlots), `${overall.matchedPredicted}/${overall.predictedSlots}`, pct(overall.matchedPredicted, overall.predictedSlots)]);
table(['family', 'docs', 'truth matched', 'recall', 'predicted matched', 'precision'], familyRows);

const recall = ratio(overall.matchedTruth, overall.truthSlots);
const precision = ratio(overall.matchedPredicted, overall.predictedSlots);
log(`\nRecall    ${(recall * 100).toFixed(1)} % (target ≥ ${TARGETS.recall * 100} %) ${recall >= TARGETS.recall ? 'met' : 'NOT met'}`);
log(`Precision ${(precision * 100).toFixed(1)} % (target ≥ ${TARGETS.precision * 100} %) ${precision >= TARGETS.precision ? 'met' : 'NOT met'}`);
if (failures.length) {
  log(`\n${failures.length} document(s) failed to parse:`);
  for (const f of failures.slice(0, 10)) log(`  ${f}`);
}

// Misses grouped by field, the most frequent first, with a few examples each.
const groups = new Map<string, Miss[]>();
for (const m of misses) {
  const id = `${m.family} ${m.field}`;
  groups.set(id, [...(groups.get(id) ?? []), m]);
}
const kind = (m: Miss) => (m.got === null ? 'missed' : m.expected === null ? 'extra' : 'wrong');
if (groups.size) {
  log(`\nWorst misses (${misses.length} in all; missed = not found, wrong = another value, extra = a slot the truth lacks)\n`);
  let shown = 0;
  for (const [id, list] of [...groups].sort((a, b) => b[1].length - a[1].length)) {
    if (shown >= missesToShow) break;
    const counts = ['missed', 'wrong', 'extra'].map((k) => [k, list.filter((m) => kind(m) === k).length] as const).filter(([, n]) => n);
    log(`${id}: ${list.length} (${counts.map(([k, n]) => `${n} ${k}`).join(', ')})`);
    for (const m of list.slice(0, 3)) log(`    expected ${show(m.expected)}, got ${show(m.got)}   ${m.file}.pdf`);
    shown++;
  }
}
if (unitErrors.length) {
  log(`\n${unitErrors.length} summary unit label(s) differ from the definition's canonical unit, e.g.:`);
  for (const u of unitErrors.slice(0, 5)) log(`  ${u}`);
}

// ---------------------------------------------------------------------------------------------------------------
// Speed

log(`\nParse time per document (extractDatasheet + summarise), milliseconds\n`);
const speedRows: string[][] = [];
const byPages = new Map<number, number[]>();
for (const s of times) byPages.set(s.pages, [...(byPages.get(s.pages) ?? []), s.ms]);
const allTimes = times.map((s) => s.ms).sort((a, b) => a - b);
for (const [pages, list] of [...byPages].sort((a, b) => a[0] - b[0])) {
  const sorted = [...list].sort((a, b) => a - b);
  speedRows.push([`${pages} page${pages === 1 ? '' : 's'}`, String(sorted.length), percentile(sorted, 50).toFixed(0), percentile(sorted, 95).toFixed(0), sorted[sorted.length - 1]!.toFixed(0)]);
}
speedRows.push(['all', String(allTimes.length), percentile(allTimes, 50).toFixed(0), percentile(allTimes, 95).toFixed(0), (allTimes[allTimes.length - 1] ?? NaN).toFixed(0)]);
table(['documents', 'n', 'median', 'p95', 'max'], speedRows);
const four = (byPages.get(4) ?? []).sort((a, b) => a - b);
const fourP95 = percentile(four, 95);
log(`\n4-page documents: median ${percentile(four, 50).toFixed(0)} ms, p95 ${fourP95.toFixed(0)} ms (target < ${TARGETS.fourPageSeconds * 1000} ms) ${fourP95 < TARGETS.fourPageSeconds * 1000 ? 'met' : 'NOT met'}`);

// ---------------------------------------------------------------------------------------------------------------
// Memory

const gc = (globalThis as { gc?: () => void }).gc;
log(`\nMemory over ${MEMORY_RUNS} parses in a row${gc ? ', after a full GC each' : ' (run with --expose-gc for settled figures)'}\n`);
const heaps: number[] = [];
const memoryRows: string[][] = [];
for (let i = 0; i < MEMORY_RUNS; i++) {
  const j = i % corpus.length;
  summarise(await extractDatasheet(pdfs[j]!));
  gc?.();
  const m = process.memoryUsage();
  heaps.push(m.heapUsed);
  memoryRows.push([String(i + 1), `${corpus[j]!.name}`, mb(m.heapUsed), mb(m.rss)]);
}
table(['parse', 'document', 'heap used', 'RSS'], memoryRows);
const settled = heaps[4]!;
const growth = heaps[heaps.length - 1]! - settled;
log(`\nHeap after parse ${MEMORY_RUNS} vs parse 5: ${growth >= 0 ? '+' : ''}${mb(growth)} ${Math.abs(growth) < 10 * 1024 * 1024 ? '(flat: no growth without bound)' : '(GROWING: look for retained documents or caches)'}`);
