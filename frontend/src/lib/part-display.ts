import {
  CONDITIONS,
  CONDITION_KEYS,
  PACKAGES,
  PIN_LAYOUTS,
  VALUE_SLOTS,
  formatQuantity,
  isCadmiumCell,
  numericFilterMode,
  type FamilyDefinition,
  type ParameterConditions,
  type ParameterDefinition,
  type ParameterValue,
  type PinLayoutKey,
  type ValueSlot,
} from '@understudy/shared-types';

/** A value in a parameter's display unit and precision: 13e6 V/s → "13 V/µs". */
export function formatParameterNumber(def: ParameterDefinition, value: number, digits = def.precision ?? 3): string {
  return formatQuantity(value, def.unit ?? '', { displayUnit: def.displayUnit, digits });
}

/** The unit people type and read for a parameter: its display unit, else its stored unit ('' for counts). */
export function inputUnit(def: Pick<ParameterDefinition, 'unit' | 'displayUnit'>): string {
  return def.displayUnit ?? def.unit ?? '';
}

export function slotsOf(def: ParameterDefinition): readonly ValueSlot[] {
  return def.slots ?? VALUE_SLOTS;
}

export const SLOT_LABELS: Record<ValueSlot, string> = { min: 'Min', typ: 'Typ', max: 'Max' };

export interface ValueSummary {
  /** The value as shown, e.g. "13 V/µs" or "3 V – 32 V". */
  text: string;
  /** Which slot it came from when that is not obvious ("min" for a slew rate quoted only as a minimum). */
  qualifier?: 'min' | 'max';
}

function choiceLabel(def: ParameterDefinition, value: string): string {
  return def.choices?.find((c) => c.value === value)?.label ?? value;
}

/**
 * One short reading of a parameter value, for table cells: a range for parameters given as min–max,
 * otherwise the typical value (or the one slot the datasheet gives, marked as such).
 */
export function summarizeParameter(def: ParameterDefinition, value: ParameterValue | undefined): ValueSummary | undefined {
  if (!value) return undefined;
  switch (def.kind) {
    case 'enum':
      return typeof value.value === 'string' ? { text: choiceLabel(def, value.value) } : undefined;
    case 'boolean':
      return typeof value.value === 'boolean' ? { text: value.value ? 'Yes' : 'No' } : undefined;
    case 'text':
      return typeof value.value === 'string' && value.value !== '' ? { text: value.value } : undefined;
    case 'number': {
      if (numericFilterMode(def.slots) === 'covers') {
        if (value.min !== undefined && value.max !== undefined) {
          return { text: `${formatParameterNumber(def, value.min)} – ${formatParameterNumber(def, value.max)}` };
        }
        if (value.min !== undefined) return { text: formatParameterNumber(def, value.min), qualifier: 'min' };
        if (value.max !== undefined) return { text: formatParameterNumber(def, value.max), qualifier: 'max' };
        return undefined;
      }
      if (value.typ !== undefined) return { text: formatParameterNumber(def, value.typ) };
      if (value.min !== undefined) return { text: formatParameterNumber(def, value.min), qualifier: 'min' };
      if (value.max !== undefined) return { text: formatParameterNumber(def, value.max), qualifier: 'max' };
      return undefined;
    }
  }
}

/** "Supply 30 V, Temperature 25 °C" — the test conditions a value was measured under. */
export function formatConditions(conditions: ParameterConditions | undefined): string {
  if (!conditions) return '';
  return CONDITION_KEYS.filter((key) => conditions[key] !== undefined)
    .map((key) => {
      const c = CONDITIONS[key];
      return `${c.label} ${formatQuantity(conditions[key]!, c.unit, { displayUnit: c.displayUnit, digits: 4 })}`;
    })
    .join(', ');
}

/** Every slot spelled out, for history and comparisons: "min 3 V, max 32 V (Supply 30 V)". */
export function describeParameter(def: ParameterDefinition, value: ParameterValue | undefined): string {
  if (!value) return '—';
  if (def.kind !== 'number') return summarizeParameter(def, value)?.text ?? '—';
  const slots = VALUE_SLOTS.filter((s) => value[s] !== undefined).map(
    (s) => `${s} ${formatParameterNumber(def, value[s]!)}`,
  );
  const conditions = formatConditions(value.conditions);
  const text = slots.join(', ') || '—';
  return conditions ? `${text} (${conditions})` : text;
}

/** Whether a part's cell is a cadmium compound, so the caution must be shown. */
export function containsCadmium(parameters: Record<string, ParameterValue | undefined>): boolean {
  const material = parameters.cellMaterial?.value;
  return typeof material === 'string' && isCadmiumCell(material);
}

export function pinLayoutFor(key: string | null | undefined) {
  return key && Object.prototype.hasOwnProperty.call(PIN_LAYOUTS, key) ? PIN_LAYOUTS[key as PinLayoutKey] : undefined;
}

/** The pins to draw: the part's own map when it has one, else its shared layout's. */
export function effectivePins(part: {
  pinLayout: string | null;
  pinMap: Record<string, string>;
}): Record<number, string> | undefined {
  if (Object.keys(part.pinMap).length > 0) {
    return Object.fromEntries(Object.entries(part.pinMap).map(([n, f]) => [Number(n), f]));
  }
  return pinLayoutFor(part.pinLayout)?.pins;
}

/** Parameters that a set of families shares or adds, in family order, first definition wins. */
export function unionOfParameters(families: readonly FamilyDefinition[]): ParameterDefinition[] {
  const seen = new Map<string, ParameterDefinition>();
  for (const family of families) for (const p of family.parameters) if (!seen.has(p.key)) seen.set(p.key, p);
  return [...seen.values()];
}

/** "Radial leads" for 'radial'; an unknown package is shown as stored. */
export function packageLabel(key: string): string {
  return PACKAGES.find((p) => p.key === key)?.label ?? key;
}
