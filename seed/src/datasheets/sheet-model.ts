import { getFamily, type DatasheetSummary, type FamilyKey, type ValueSlot } from '@understudy/shared-types';
import { choosePrefix, displayNumber, PREFIX_EXPONENTS, type Prefix } from './quantity-text';

/**
 * The family-neutral content of one datasheet: characteristic rows that know their ground truth, and the decoys
 * around them. compose-datasheet arranges it into pages; the family files fill it with numbers.
 */

export type Slot = ValueSlot;
export const SLOTS: readonly Slot[] = ['min', 'typ', 'max'];

export type RowTruth = { key: string; si: Partial<Record<Slot, number>> } | { key: string; value: string };

export interface CharRow {
  parameter: string;
  symbol?: string;
  conditions?: string;
  /** The conditions tell this row from a neighbour (10 Hz against 1 kHz), so they stay when a table has no Conditions column. */
  conditionsMatter?: boolean;
  /** Unit as printed, in canonical glyphs; '' for none. */
  unit: string;
  /** Printed numbers per column. */
  values: Partial<Record<Slot, string>>;
  /** A word value instead of numbers (a taper); goes in the Typ column or the Value column. */
  text?: string;
  /** What the row means for the ground truth when it sits in a scored place. */
  truth?: RowTruth;
  /** Noun phrase for prose ("the slew rate"); without one the row always stays in its table. */
  phrase?: string;
  /** The value as a Parameter | Value table prints it ("±2 V to ±18 V"), instead of one made from the slots. */
  listText?: string;
  /** A whole sentence saying the same as the row, used instead of a generated one. */
  sentence?: string;
  /** A second line for the same parameter under other conditions (full temperature range); never truth. */
  continuation?: boolean;
}

export interface RowGroup {
  /** Section heading inside the table ("DC characteristics") or the title of a table of its own. */
  title: string;
  rows: CharRow[];
}

export interface CharTable {
  title: string;
  /** Printed under the title: "VS = ±15 V, TA = 25 °C unless otherwise noted". */
  subtitle: string;
  groups: RowGroup[];
}

/** Characteristics under other conditions: same parameters, other numbers, never truth. */
export interface AlternateTable extends CharTable {
  kind: 'supply' | 'temperature' | 'current';
}

export interface AbsRow {
  parameter: string;
  symbol?: string;
  /** The rating as printed ("±18", "−65 to +150", "Indefinite"). */
  value: string;
  unit: string;
  /** Only the documented absolute-maximum keys carry truth here. */
  truth?: RowTruth;
  phrase?: string;
}

export interface OrderingRow {
  code: string;
  package: string;
  marking: string;
  packing: string;
}

export interface DimensionRow {
  symbol: string;
  min: string;
  nom: string;
  max: string;
}

export interface SheetContent {
  family: FamilyKey;
  partNumber: string;
  manufacturer: string;
  /** The one-line description under the part number. */
  description: string;
  features: string[];
  overview: string[];
  applications: string[];
  pinout?: { title: string; rows: [pin: string, name: string, fn: string][] };
  absoluteMax: AbsRow[];
  /** Operating conditions apart from the characteristics (recommended supply range); truth. */
  operating?: CharTable;
  primary: CharTable;
  alternates: AlternateTable[];
  /** Sentences that carry truth of their own (channels in words, a taper spelled out) and always appear. */
  statements: { text: string; truth?: RowTruth[] }[];
  /** Truth the title line carries (channels of a "Dual" op amp, gangs of a "Dual-gang" pot). */
  titleTruth: RowTruth[];
  applicationNotes: string[];
  graphs: { caption: string; xLabel: string; yLabel: string; xTicks: string[]; yTicks: string[]; curve: number[] }[];
  packageName: string;
  dimensions: DimensionRow[];
  ordering: OrderingRow[];
  /** Safety or handling note (cadmium, soldering). */
  caution?: string;
}

// ---------------------------------------------------------------------------------------------------------------
// Rows

export interface Dimension {
  unit: (prefix: Prefix) => string;
  /** Per-time units: the prefix sits in the denominator (V/µs). */
  invert?: boolean;
}

export const DIMENSIONS = {
  V: { unit: (p) => `${p}V` },
  A: { unit: (p) => `${p}A` },
  'V/s': { unit: (p) => `V/${p}s`, invert: true },
  Hz: { unit: (p) => `${p}Hz` },
  'V/√Hz': { unit: (p) => `${p}V/√Hz` },
  'A/√Hz': { unit: (p) => `${p}A/√Hz` },
  'Ω': { unit: (p) => `${p}Ω` },
  m: { unit: (p) => `${p}m` },
  s: { unit: (p) => `${p}s` },
  W: { unit: (p) => `${p}W` },
  cd: { unit: (p) => `${p}cd` },
  '°': { unit: () => '°' },
  '%': { unit: () => '%' },
  '': { unit: () => '' },
} satisfies Record<string, Dimension>;
export type DimensionKey = keyof typeof DIMENSIONS;

export interface MeasuredRowInput {
  parameter: string;
  symbol?: string;
  conditions?: string;
  conditionsMatter?: boolean;
  /** Parameter key when the row is truth; omit for decoys. */
  key?: string;
  dim: DimensionKey;
  si: Partial<Record<Slot, number>>;
  prefixes: readonly Prefix[];
  prefer?: Prefix;
  phrase?: string;
  /** Print this slot with a ± sign (output current ±40 mA); the truth is the magnitude. */
  plusMinus?: boolean;
  continuation?: boolean;
}

/** A row of numbers printed in one prefix, with its truth read back from the printed text. */
export function measuredRow(input: MeasuredRowInput): CharRow {
  const dim: Dimension = DIMENSIONS[input.dim];
  const present = SLOTS.filter((s) => input.si[s] !== undefined);
  const prefix =
    input.dim === '' || input.dim === '°' || input.dim === '%'
      ? ''
      : choosePrefix(
          present.map((s) => input.si[s]!),
          input.prefixes,
          input.prefer,
          dim.invert,
        );
  const values: Partial<Record<Slot, string>> = {};
  const si: Partial<Record<Slot, number>> = {};
  for (const slot of present) {
    const text = displayNumber(input.si[slot]!, prefix, dim.invert);
    values[slot] = input.plusMinus ? `±${text}` : text;
    si[slot] = Number(`${text}e${dim.invert ? -PREFIX_EXPONENTS[prefix] : PREFIX_EXPONENTS[prefix]}`);
  }
  return {
    parameter: input.parameter,
    ...(input.symbol === undefined ? {} : { symbol: input.symbol }),
    ...(input.conditions === undefined ? {} : { conditions: input.conditions }),
    ...(input.conditionsMatter ? { conditionsMatter: true } : {}),
    unit: dim.unit(prefix),
    values,
    ...(input.key === undefined ? {} : { truth: { key: input.key, si } }),
    ...(input.phrase === undefined ? {} : { phrase: input.phrase }),
    ...(input.continuation ? { continuation: true } : {}),
  };
}

/** Inline text of one printed slot: "9 V/µs", "30°", "±20 %". */
export function inlineAmount(row: Pick<CharRow, 'unit'>, number: string): string {
  if (!row.unit) return number;
  return row.unit === '°' ? `${number}°` : `${number} ${row.unit}`;
}

// ---------------------------------------------------------------------------------------------------------------
// Truth

/** Collects the ground truth of one document, keeping only keys and slots the shared definitions have. */
export class TruthBuilder {
  private readonly params: DatasheetSummary['parameters'] = {};

  constructor(
    private readonly family: FamilyKey,
    private readonly identity: { partNumber: string; manufacturer: string },
  ) {}

  add(truth: RowTruth): void {
    const def = getFamily(this.family).parameters.find((p) => p.key === truth.key);
    if (!def) throw new Error(`${truth.key} is no ${this.family} parameter`);
    const entry = (this.params[truth.key] ??= {});
    if ('value' in truth) {
      if (entry.value !== undefined && entry.value !== truth.value) throw new Error(`${truth.key}: ${entry.value} and ${truth.value} both stated`);
      entry.value = truth.value;
      return;
    }
    for (const slot of def.slots ?? SLOTS) {
      const v = truth.si[slot];
      if (v === undefined) continue;
      const old = entry[slot];
      if (old !== undefined && Math.abs(old - v) > Math.abs(v) * 1e-9) {
        throw new Error(`${this.identity.partNumber} ${truth.key}.${slot}: ${old} and ${v} both stated as truth`);
      }
      entry[slot] = v;
    }
    if (def.unit) entry.unit = def.unit;
    if (SLOTS.every((s) => entry[s] === undefined) && entry.value === undefined) delete this.params[truth.key];
  }

  build(): DatasheetSummary {
    const sorted = Object.fromEntries(Object.entries(this.params).sort(([a], [b]) => a.localeCompare(b)));
    return { family: this.family, partNumber: this.identity.partNumber, manufacturer: this.identity.manufacturer, parameters: sorted };
  }
}

// ---------------------------------------------------------------------------------------------------------------
// Prose

const capitalise = (s: string) => s[0]!.toUpperCase() + s.slice(1);

/** One sentence stating a row's values, worded so the slot is unambiguous ("at least" is min, "typically" typ). */
export function proseSentence(row: CharRow, variant: number): string {
  if (row.sentence) return row.sentence;
  const phrase = row.phrase ?? row.parameter.toLowerCase();
  const cond = row.conditions && variant % 2 === 0 ? ` (${row.conditions})` : '';
  const v = (slot: Slot) => inlineAmount(row, row.values[slot]!);
  const { min, typ, max } = row.values;
  const P = capitalise(phrase);
  if (min !== undefined && typ !== undefined && max !== undefined) return `${P}${cond} is typically ${v('typ')}, and lies between ${v('min')} and ${v('max')}.`;
  if (min !== undefined && typ !== undefined) {
    return variant % 3 === 0 ? `${P}${cond} is typically ${v('typ')} and at least ${v('min')}.` : `${P}${cond} is no less than ${v('min')}, with ${v('typ')} typical.`;
  }
  if (typ !== undefined && max !== undefined) {
    return variant % 3 === 0 ? `${P}${cond} is typically ${v('typ')}, ${v('max')} at most.` : `${P}${cond} is ${v('typ')} typical and does not exceed ${v('max')}.`;
  }
  if (min !== undefined && max !== undefined) return `${P}${cond} lies between ${v('min')} and ${v('max')}.`;
  if (typ !== undefined) {
    return [`${P}${cond} is typically ${v('typ')}.`, `A typical ${phrase.replace(/^the /, '')} of ${v('typ')} is achieved${cond}.`, `Typically, ${phrase}${cond} is ${v('typ')}.`][variant % 3]!;
  }
  if (min !== undefined) return variant % 2 ? `${P}${cond} is at least ${v('min')}.` : `${P}${cond} is no less than ${v('min')}.`;
  if (max !== undefined) return variant % 2 ? `${P}${cond} must not exceed ${v('max')}.` : `${P}${cond} is ${v('max')} at most.`;
  throw new Error(`Row ${row.parameter} has nothing to say`);
}

/** "Dual op amp" → "dual op amp", but "CdS cell" and "5 mm LED" keep their first letters. */
export function lowerFirst(text: string): string {
  return /^[A-Z][a-z]/.test(text) ? text[0]!.toLowerCase() + text.slice(1) : text;
}

/** "a dual op amp", "an infrared LED". */
export function withArticle(text: string): string {
  return `${/^[aeiou8]/i.test(text) ? 'an' : 'a'} ${text}`;
}
