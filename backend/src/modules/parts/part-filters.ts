import {
  getFamily,
  isSupplySpan,
  LIFECYCLES,
  numericFilterMode,
  parseQuantity,
  parseSupplySpan,
  ROHS_STATUSES,
  type FamilyKey,
  type ParameterDefinition,
} from '@understudy/shared-types';
import { ValidationError } from '../../middleware/validate';

export type ParameterFilter =
  | { kind: 'numeric'; def: ParameterDefinition; mode: 'covers' | 'between'; min?: number; max?: number }
  | { kind: 'choice'; def: ParameterDefinition; values: (string | boolean)[] };

export interface ParsedFilters {
  parameters: ParameterFilter[];
  lifecycles: string[];
  rohs: string[];
}

const FIXED_KEYS = new Set(['family', 'q', 'lifecycle', 'rohs', 'includeArchived', 'sort', 'page', 'pageSize', 'format']);

function list(value: unknown): string[] {
  return String(value ?? '')
    .split(',')
    .map((s) => s.trim())
    .filter(Boolean);
}

/**
 * Reads `<key>.min`, `<key>.max` and `<key>=a,b` from the query against the family's own parameter definitions.
 * Numbers may be typed as engineers write them ("5V/us", "±4.5 V"); a bare number is in SI base units.
 */
export function parseFilters(family: FamilyKey | undefined, raw: Record<string, unknown>): ParsedFilters {
  const issues: { path: string; message: string }[] = [];
  const byKey = new Map<string, ParameterFilter>();
  const def = (key: string) => (family ? getFamily(family).parameters.find((p) => p.key === key) : undefined);

  for (const [name, rawValue] of Object.entries(raw)) {
    if (FIXED_KEYS.has(name) || rawValue === undefined || rawValue === '') continue;
    const value = Array.isArray(rawValue) ? String(rawValue[rawValue.length - 1]) : String(rawValue);
    const [key, bound] = name.split('.') as [string, string | undefined];
    if (!family) {
      issues.push({ path: `query.${name}`, message: 'Choose a family before filtering by its parameters.' });
      continue;
    }
    const parameter = def(key);
    if (!parameter) {
      issues.push({ path: `query.${name}`, message: `"${key}" is not a parameter of ${getFamily(family).pluralLabel.toLowerCase()}.` });
      continue;
    }
    if (parameter.kind === 'number') {
      if (bound !== 'min' && bound !== 'max') {
        issues.push({ path: `query.${name}`, message: `Use ${key}.min or ${key}.max for a number.` });
        continue;
      }
      const number = readNumber(parameter, value);
      if (typeof number === 'string') {
        issues.push({ path: `query.${name}`, message: number });
        continue;
      }
      const existing = byKey.get(key);
      const filter = existing?.kind === 'numeric' ? existing : { kind: 'numeric' as const, def: parameter, mode: numericFilterMode(parameter.slots) };
      filter[bound] = number;
      byKey.set(key, filter);
    } else {
      if (bound) {
        issues.push({ path: `query.${name}`, message: `${parameter.label} is not a number; use ${key}=value.` });
        continue;
      }
      const values = list(value);
      if (parameter.kind === 'boolean') {
        const bools = values.map((v) => (v === 'true' || v === '1' ? true : v === 'false' || v === '0' ? false : null));
        if (bools.some((b) => b === null)) {
          issues.push({ path: `query.${name}`, message: `${parameter.label} is yes or no: use true or false.` });
          continue;
        }
        byKey.set(key, { kind: 'choice', def: parameter, values: bools as boolean[] });
      } else {
        const allowed = parameter.choices?.map((c) => c.value);
        const unknown = allowed ? values.filter((v) => !allowed.includes(v)) : [];
        if (unknown.length) {
          issues.push({ path: `query.${name}`, message: `${parameter.label} can be ${allowed!.join(', ')}; not ${unknown.join(', ')}.` });
          continue;
        }
        byKey.set(key, { kind: 'choice', def: parameter, values });
      }
    }
  }

  for (const f of byKey.values()) {
    if (f.kind === 'numeric' && f.min !== undefined && f.max !== undefined && f.min > f.max) {
      issues.push({ path: `query.${f.def.key}.max`, message: `The upper bound of ${f.def.label.toLowerCase()} is below the lower one.` });
    }
  }

  const lifecycles = list(raw.lifecycle);
  const badLifecycle = lifecycles.filter((l) => !(LIFECYCLES as readonly string[]).includes(l));
  if (badLifecycle.length) issues.push({ path: 'query.lifecycle', message: `Lifecycle can be ${LIFECYCLES.join(', ')}.` });
  const rohs = list(raw.rohs);
  if (rohs.some((r) => !(ROHS_STATUSES as readonly string[]).includes(r))) issues.push({ path: 'query.rohs', message: `RoHS status can be ${ROHS_STATUSES.join(', ')}.` });

  if (issues.length) throw new ValidationError(issues);
  return { parameters: [...byKey.values()], lifecycles, rohs };
}

function readNumber(def: ParameterDefinition, text: string): number | string {
  // A supply filter may be typed as a dual supply: ±4.5 V means a 9 V span.
  if (isSupplySpan(def) && /±|\+\/-/.test(text)) {
    const span = parseSupplySpan(text);
    return span.ok ? span.max : span.error;
  }
  const parsed = parseQuantity(text, { unit: def.unit });
  if (!parsed.ok) return parsed.error;
  return parsed.value;
}

