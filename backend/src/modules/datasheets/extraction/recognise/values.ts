import {
  getParameter,
  parameterValueSchemaFor,
  type FamilyKey,
  type ParameterConditions,
  type ParameterDefinition,
  type ParameterValue,
  type ValueSlot,
} from '@understudy/shared-types';
import { namesHotOrFullRange, readConditions } from '../conditions';
import { readSupplyEnd, readSupplySpan, readValue } from '../quantity';
import { ENUM_READERS } from './enums';

export type Slots = Partial<Record<ValueSlot, number>>;

/** Cells of one row by the slot their column names; `value` is a column that names no slot. */
export interface SlotTexts {
  min?: string;
  typ?: string;
  max?: string;
  value?: string;
}

export interface RowReading {
  slots: Slots;
  statedUnit: string | null;
  /** No unit was printed anywhere, so the prefix had to be guessed from the definition's display unit. */
  unitGuessed: boolean;
}

const LIMIT_WORDS = /\b(max(imum)?|rated|rating|limit|allowed|permissible|absolute)\b/i;

/**
 * Reads a row's number cells into the slots the definition allows. Min/Typ/Max columns name their slot; a lone Value
 * column is read by its own words ("≥ 1 MΩ", "8 to 20 kΩ"), and in a limits table it is a maximum.
 */
export function readSlots(
  def: ParameterDefinition,
  texts: SlotTexts,
  unitText: string | null,
  opts: { limitTable: boolean; label: string },
): RowReading | null {
  const slots: Slots = {};
  let statedUnit: string | null = unitText;
  let guessed = false;
  for (const role of ['min', 'typ', 'max', 'value'] as const) {
    const text = texts[role];
    if (!text) continue;
    // One cell may carry several qualified figures: "10M min, 20M typ".
    const parts = role === 'value' ? text.split(/\s*[,;/]\s+|\s{2,}/).filter(Boolean) : [text];
    if (parts.length > 1) {
      const readings = parts.map((part) => readValue(part, unitText, def));
      if (readings.every((r) => r?.qualifier)) {
        for (const r of readings) {
          slots[r!.qualifier!] ??= Object.values(r!.slots)[0]!;
          statedUnit ??= r!.statedUnit;
          guessed ||= r!.unitGuessed;
        }
        continue;
      }
    }
    const reading = readValue(text, unitText, def);
    if (!reading) continue;
    guessed ||= reading.unitGuessed;
    statedUnit ??= reading.statedUnit;
    if (reading.range) {
      if (reading.slots.min !== undefined) slots.min ??= reading.slots.min;
      if (reading.slots.max !== undefined) slots.max ??= reading.slots.max;
      continue;
    }
    const value = Object.values(reading.slots)[0]!;
    if (role === 'value') {
      const slot: ValueSlot = reading.qualifier ?? (opts.limitTable ? 'max' : 'typ');
      slots[slot] ??= value;
    } else {
      slots[role] ??= value;
    }
  }
  const allowed = def.slots ?? ['min', 'typ', 'max'];
  const out: Slots = {};
  for (const s of allowed) if (slots[s] !== undefined) out[s] = slots[s];
  if (Object.keys(out).length === 0 && allowed.length === 1) {
    const only = allowed[0]!;
    // A one-slot limit printed as a plain value is that limit; from a Typ column only when the label calls it one.
    if (only === 'max' && slots.typ !== undefined && (opts.limitTable || texts.value !== undefined || LIMIT_WORDS.test(opts.label))) {
      out.max = slots.typ;
    }
  }
  if (Object.keys(out).length === 0) return null;
  return { slots: out, statedUnit, unitGuessed: guessed };
}

/** The supply range as a total span, from Min and Max cells ("±1.5", "±16") or one cell ("3 V to 32 V"). */
export function readSupplySlots(texts: SlotTexts, unitText: string | null): Slots | null {
  const lo = texts.min ? readSupplyEnd(texts.min, unitText) : null;
  const hi = texts.max ? readSupplyEnd(texts.max, unitText) : null;
  if (lo !== null && hi !== null && lo <= hi) return { min: lo, max: hi };
  for (const t of [texts.value, texts.typ, texts.min, texts.max]) {
    if (!t) continue;
    const span = readSupplySpan(t, unitText);
    if (span && span.min < span.max) return { min: span.min, max: span.max };
  }
  return null;
}

/**
 * Attaches the conditions the definition allows, read from the texts most specific first (the row's, its group's,
 * the table's, the heading), and checks the value against the shared schema.
 */
export function finishValue(def: ParameterDefinition, slots: Slots, conditionTexts: (string | null | undefined)[]): ParameterValue | null {
  const conditions: ParameterConditions = readConditions(conditionTexts, def.conditions ?? []);
  const value: ParameterValue = { ...slots, ...(Object.keys(conditions).length ? { conditions } : {}) };
  return parameterValueSchemaFor(def).safeParse(value).success ? value : null;
}

export function enumValue(def: ParameterDefinition, text: string, context: string): ParameterValue | null {
  const reader = ENUM_READERS[def.key];
  if (!reader) return null;
  const v = reader(text, context);
  if (v === null) return null;
  const value = { value: v };
  return parameterValueSchemaFor(def).safeParse(value).success ? value : null;
}

export function definitionOf(family: FamilyKey, key: string): ParameterDefinition {
  const def = getParameter(family, key);
  if (!def) throw new RangeError(`No parameter ${key} in ${family}`);
  return def;
}

/**
 * Whether figures were measured away from the nominal point: another temperature or the full range, and for
 * noise density a frequency below the flat band (the definition quotes it at 1 kHz).
 */
export function isOffNominal(key: string, texts: (string | null | undefined)[]): boolean {
  if (texts.some((t) => namesHotOrFullRange(t))) return true;
  if (key === 'inputNoiseDensity') {
    for (const t of texts) {
      const m = t ? /\bf\s*=\s*(\d+(?:\.\d+)?)\s*(k)?Hz/i.exec(t) : null;
      if (m && Number(m[1]) * (m[2] ? 1000 : 1) < 1000) return true;
    }
  }
  return false;
}

/** Light resistance is defined at 10 lx: a row at another illuminance is another figure. */
export function wrongIlluminance(key: string, texts: (string | null | undefined)[]): boolean {
  if (key !== 'lightResistance') return false;
  for (const t of texts) {
    if (!t) continue;
    const lux = [...t.matchAll(/(\d+(?:[.,]\d+)?)\s*(k)?\s*(?:lux|lx)\b/gi)].map((m) => Number(m[1]!.replace(',', '.')) * (m[2] ? 1000 : 1));
    if (lux.length && !lux.includes(10)) return true;
  }
  return false;
}

const TOTAL = /\b(total|all (amplifiers|channels|op amps|four|sections)|both (amplifiers|channels|op amps)|both\b|per package|whole package|entire package)\b/i;
const PER_CHANNEL = /\bper (amplifier|channel|op[\s-]*amp|amp|section)\b|\beach (amplifier|channel|op[\s-]*amp)\b|\/\s*(amp|amplifier|channel|ch)\b/i;

/**
 * Supply current is stored per channel. Rule: a figure stated per amplifier is taken as it is; one stated for the
 * package ("total", "all amplifiers", "both") is divided by the channel count; an unstated one is read as the
 * current into the supply pin, i.e. the whole package.
 */
export function quiescentBasis(texts: (string | null | undefined)[]): 'per-channel' | 'per-package' | 'unstated' {
  const all = texts.filter(Boolean).join(' ');
  if (PER_CHANNEL.test(all)) return 'per-channel';
  if (TOTAL.test(all)) return 'per-package';
  return 'unstated';
}
