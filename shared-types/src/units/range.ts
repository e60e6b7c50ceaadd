import { formatQuantity } from './format';
import { parseCore, type CoreSuccess, type ParseOptions } from './parse';
import { canonicalUnit, normaliseText, type CanonicalUnit } from './units';

export type RangeResult =
  | {
      ok: true;
      min: number;
      max: number;
      /** Canonical unit symbol. */
      unit: string;
      /** Both ends were written ±X ("±1.5 V to ±16 V"): min and max are the magnitudes. */
      dual?: boolean;
    }
  | { ok: false; error: string };

export type RangeOptions = ParseOptions;

// "to", dashes, tilde and dots separate the ends; a hyphen does too, unless it is a sign or an exponent's.
const WORD_SEPARATOR = /\s*(?:to|\.\.\.?|[\u2013\u2014~…])\s*/i;

function splitRange(input: string): [string, string] | [string] | undefined {
  const parts = input.split(WORD_SEPARATOR);
  if (parts.length > 2) return undefined;
  if (parts.length === 2) return [parts[0]!, parts[1]!];
  for (let i = 1; i < input.length; i++) {
    if (input[i] !== '-') continue;
    const before = input.slice(0, i).trimEnd();
    const prev = before[before.length - 1];
    if (prev === undefined || '+-±/('.includes(prev)) continue;
    // 1e-3: the hyphen belongs to the exponent.
    if ((prev === 'e' || prev === 'E') && /\d$/.test(before.slice(0, -1)) && /^\d/.test(input.slice(i + 1))) continue;
    return [before, input.slice(i + 1).trimStart()];
  }
  return [input];
}

interface Ends {
  low: CoreSuccess;
  high?: CoreSuccess;
  unit: CanonicalUnit;
}

function readEnds(input: string, opts: RangeOptions): Ends | { error: string } {
  const text = typeof input === 'string' ? normaliseText(input) : '';
  if (text === '') return { error: 'Enter a range, such as 3 V to 32 V' };
  const parts = splitRange(text);
  if (!parts) return { error: `"${text}" has more than two ends; write it as 3 V to 32 V` };
  if (parts.some((p) => p.trim() === '')) return { error: `"${text}" is missing one end; write it as 3 V to 32 V` };

  // "1 to 10 mA" means 1 mA to 10 mA: a bare end borrows the other end's prefix and unit.
  const BARE = /^[±+-]?\s*(?:\d+(?:[.,]\d*)?|[.,]\d+)(?:[eE][+-]?\d+)?$/;
  const LEADING_NUMBER = /^(?:±|\+\/-|\+-|[+-])?\s*(?:\d+(?:[.,]\d*)?|[.,]\d+)(?:[eE][+-]?\d+)?/;
  if (parts.length === 2) {
    const suffixes = parts.map((p) => p.replace(LEADING_NUMBER, '').trim());
    for (const [i, j] of [
      [0, 1],
      [1, 0],
    ] as const) {
      if (BARE.test(parts[i]!.trim()) && suffixes[j] !== '' && !/\d/.test(suffixes[j]!)) {
        parts[i] = `${parts[i]} ${suffixes[j]}`;
      }
    }
  }

  let unit = opts.unit;
  if (unit === undefined) {
    // The unit is usually written once, on the right: "3 to 32 V". Take whichever end names it.
    const probes = [...parts].reverse().map((p) => parseCore(p));
    const named = probes.find((p): p is CoreSuccess => p.ok && p.explicitUnit);
    if (named) unit = named.unit;
  }
  const ends = parts.map((p) => parseCore(p, unit === undefined ? {} : { ...opts, unit }));
  for (const e of ends) if (!e.ok) return { error: e.error };
  const [low, high] = ends as CoreSuccess[];
  if (high && low!.unit !== high.unit) {
    return { error: `"${text}" mixes ${low!.unit || 'a plain number'} and ${high.unit || 'a plain number'}` };
  }
  return { low: low!, high, unit: low!.unit };
}

function show(value: number, unit: CanonicalUnit): string {
  return formatQuantity(value, unit, { digits: 6 });
}

/**
 * Read a range: "3 to 32 V", "3–32 V", "3-32V", "-40 °C to 125 °C", "4.5 V to 36 V".
 * "±15 V" is the span from -15 V to +15 V. "±1.5 V to ±16 V" (both ends dual) gives the magnitudes
 * 1.5 and 16 with dual: true; parseSupplySpan turns that into a total span.
 */
export function parseRange(input: string, opts: RangeOptions = {}): RangeResult {
  const ends = readEnds(input, opts);
  if ('error' in ends) return { ok: false, error: ends.error };
  const { low, high, unit } = ends;
  if (!high) {
    return low.plusMinus
      ? { ok: true, min: -low.value, max: low.value, unit }
      : { ok: true, min: low.value, max: low.value, unit };
  }
  if (low.plusMinus !== high.plusMinus) {
    return {
      ok: false,
      error: `"${normaliseText(input)}" mixes a ± value with a plain one; write both ends the same way`,
    };
  }
  if (low.value > high.value) {
    return {
      ok: false,
      error: `"${normaliseText(input)}" runs backwards: ${show(low.value, unit)} is above ${show(high.value, unit)}`,
    };
  }
  return low.plusMinus
    ? { ok: true, min: low.value, max: high.value, unit, dual: true }
    : { ok: true, min: low.value, max: high.value, unit };
}

function spanOf(end: CoreSuccess): number {
  return end.plusMinus ? 2 * end.value : end.value;
}

function supplySpanOne(input: string, opts: RangeOptions): RangeResult {
  const ends = readEnds(input, opts);
  if ('error' in ends) return { ok: false, error: ends.error };
  const { low, high, unit } = ends;
  let min: number;
  let max: number;
  if (!high) {
    min = max = spanOf(low);
  } else if (!low.plusMinus && !high.plusMinus && low.value < 0 && high.value > 0) {
    // "-15 V to +15 V" names the two rails: the span between them.
    min = max = high.value - low.value;
  } else {
    min = spanOf(low);
    max = spanOf(high);
  }
  if (min < 0 || max < 0) {
    return { ok: false, error: `"${normaliseText(input)}" is not a supply span; a span is never negative` };
  }
  if (min > max) {
    return {
      ok: false,
      error: `"${normaliseText(input)}" runs backwards: ${show(min, unit)} is above ${show(max, unit)}`,
    };
  }
  return { ok: true, min, max, unit };
}

/**
 * Supply range as total span between the rails, the way the catalog stores it: a dual ±X V supply is 2X V.
 * "±15 V" → 30..30 V, "±1.5 V to ±16 V" → 3..32 V, "3 V to 32 V" → 3..32 V, "-15 V to +15 V" → 30..30 V.
 * Datasheets that give both forms ("3 V to 32 V or ±1.5 V to ±16 V", or one in brackets) get the widest span.
 */
export function parseSupplySpan(input: string, opts: RangeOptions = {}): RangeResult {
  const unit = opts.unit ?? 'V';
  if (canonicalUnit(unit) === undefined) throw new TypeError(`parseSupplySpan: unknown unit "${unit}"`);
  const text = typeof input === 'string' ? normaliseText(input) : '';
  const alternatives = text
    .split(/\s+or\s+|;|\(|\)|\s\/\s/i)
    .map((s) => s.trim())
    .filter((s) => s !== '');
  if (alternatives.length === 0) return { ok: false, error: 'Enter a supply range, such as ±15 V or 3 V to 32 V' };
  let min = Infinity;
  let max = -Infinity;
  let canonical = '';
  for (const alt of alternatives) {
    const r = supplySpanOne(alt, { ...opts, unit });
    if (!r.ok) return r;
    min = Math.min(min, r.min);
    max = Math.max(max, r.max);
    canonical = r.unit;
  }
  return { ok: true, min, max, unit: canonical };
}
