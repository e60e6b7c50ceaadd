import type { CandidatePart } from '../alternates';
import { getParameter, isCadmiumCell, PIN_LAYOUTS, type FamilyKey, type ParameterDefinition } from '../families';
import type { RohsStatus } from '../parts';
import { formatQuantity } from '../units';

export type Slot = 'min' | 'typ' | 'max';

export const TYP_FIRST: readonly Slot[] = ['typ', 'min', 'max'];
export const MAX_FIRST: readonly Slot[] = ['max', 'typ', 'min'];
export const MIN_FIRST: readonly Slot[] = ['min', 'typ', 'max'];

/** The first finite number among `order`'s slots of a parameter, or undefined. */
export function pick(part: CandidatePart, key: string, order: readonly Slot[]): number | undefined {
  const v = part.parameters[key];
  if (v === undefined) return undefined;
  for (let i = 0; i < order.length; i++) {
    const x = v[order[i]!];
    if (typeof x === 'number' && Number.isFinite(x)) return x;
  }
  return undefined;
}

/** Both ends of a range parameter (supply span), or undefined when either is missing. */
export function rangeOf(part: CandidatePart, key: string): { min: number; max: number } | undefined {
  const v = part.parameters[key];
  if (v === undefined || typeof v.min !== 'number' || typeof v.max !== 'number') return undefined;
  return { min: v.min, max: v.max };
}

export function flag(part: CandidatePart, key: string): boolean | undefined {
  const v = part.parameters[key]?.value;
  return typeof v === 'boolean' ? v : undefined;
}

export function choice(part: CandidatePart, key: string): string | undefined {
  const v = part.parameters[key]?.value;
  return typeof v === 'string' ? v : undefined;
}

export function definition(family: FamilyKey, key: string): ParameterDefinition {
  const def = getParameter(family, key);
  if (!def) throw new RangeError(`No parameter "${key}" in ${family}`);
  return def;
}

/** A value in the definition's display unit and precision: "13 V/µs", "4.5 nV/√Hz", "2 pA". */
export function show(def: ParameterDefinition, value: number): string {
  return formatQuantity(value, def.unit ?? '', {
    digits: def.precision ?? 3,
    ...(def.displayUnit === undefined ? {} : { displayUnit: def.displayUnit }),
  });
}

/** show() with a small cache, for values that repeat across many candidates. */
export function memoShow(def: ParameterDefinition): (value: number) => string {
  const cache = new Map<number, string>();
  return (value) => {
    let text = cache.get(value);
    if (text === undefined) {
      text = show(def, value);
      if (cache.size < 1000) cache.set(value, text);
    }
    return text;
  };
}

export function showRange(def: ParameterDefinition, min: number, max: number): string {
  const lo = show(def, min);
  const hi = show(def, max);
  return lo === hi ? lo : `${lo} to ${hi}`;
}

export function choiceLabel(def: ParameterDefinition, value: string): string {
  return def.choices?.find((c) => c.value === value)?.label ?? value;
}

/** "Slew rate" → "slew rate", but "LED forward voltage" and "RoHS" keep their capitals. */
export function lower(text: string): string {
  return /^[A-Z][a-z]*(?=[\s/-]|$)/.test(text) ? text[0]!.toLowerCase() + text.slice(1) : text;
}

const MINUS = '\u2212';

/** Points as shown in reasons: "−12.3", "0". */
export function pointsText(points: number): string {
  return points === 0 ? '0' : `${points < 0 ? MINUS : '+'}${Math.abs(points)}`;
}

export function joinList(items: readonly string[]): string {
  if (items.length <= 1) return items[0] ?? '';
  return `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

/** The part's pin map, or its shared layout's when it records none. */
export function pinMapOf(part: CandidatePart): Readonly<Record<string, string>> | undefined {
  // Pin 1 answers at once for nearly every map; for-in would list every key first.
  if (part.pinMap['1'] !== undefined) return part.pinMap;
  for (const _ in part.pinMap) return part.pinMap;
  const layout = part.pinLayout ? (PIN_LAYOUTS as Record<string, { pins: Readonly<Record<number, string>> }>)[part.pinLayout] : undefined;
  return layout?.pins as Readonly<Record<string, string>> | undefined;
}

const LAYOUT_CHANNELS: Record<string, number> = {
  'dip8-single-opamp': 1,
  'dip8-dual-opamp': 2,
  'dip14-quad-opamp': 4,
  'pot-3lug': 1,
  'pot-dual-6lug': 2,
};

/** Op amp channels or pot gangs: the parameter, else what the shared pin layout implies. */
export function countOf(part: CandidatePart, key: 'channels' | 'gangs'): number | undefined {
  return pick(part, key, TYP_FIRST) ?? (part.pinLayout ? LAYOUT_CHANNELS[part.pinLayout] : undefined);
}

/**
 * RoHS status as scored: a cadmium cell is taken as non-compliant unless an exemption is recorded, whatever else
 * its record says, because RoHS restricts cadmium.
 */
export function effectiveRohs(part: CandidatePart): RohsStatus {
  if (part.rohsStatus !== 'exempt' && (part.family === 'photoresistor' || part.family === 'optocoupler')) {
    if (isCadmiumCell(choice(part, 'cellMaterial'))) return 'non-compliant';
  }
  return part.rohsStatus;
}
