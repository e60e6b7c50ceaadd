import {
  FAMILIES,
  LIFECYCLES,
  LIFECYCLE_LABELS,
  ROHS_LABELS,
  ROHS_STATUSES,
  formatQuantity,
  isFamilyKey,
  isSupplySpan,
  numericFilterMode,
  parseQuantity,
  parseRange,
  parseSupplySpan,
  type FamilyDefinition,
  type FamilyKey,
  type ParameterDefinition,
} from '@understudy/shared-types';
import { inputUnit } from '../../../lib/part-display';

/*
 * The catalog search lives in the address bar, so a search is a link. The address keeps what the person typed
 * ("5", "±4.5 V", "4k7"); the API query built from it is unambiguous ("5 V/µs", "9 V", "4.7 kΩ").
 *
 *   family=op-amp  q=…  lifecycle=active,nrnd  rohs=compliant
 *   <key>.min / <key>.max   numeric bounds, for parameters read as one value
 *   <key>.covers            one value or a range the part must cover ("runs on 9 V"), for min–max parameters
 *   <key>=v1,v2             enum choices;  <key>=true|false  booleans
 *   sort=-slewRate  page=2  pageSize=50
 */

export const PAGE_SIZES = [25, 50, 100] as const;
export const DEFAULT_PAGE_SIZE = 50;
const FIXED_SORTS = ['partNumber', 'manufacturer', 'lifecycle'] as const;

export function readFamily(params: URLSearchParams): FamilyKey | undefined {
  const family = params.get('family');
  return isFamilyKey(family) ? family : undefined;
}

export function readList(params: URLSearchParams, key: string): string[] {
  return (params.get(key) ?? '')
    .split(',')
    .map((v) => v.trim())
    .filter(Boolean);
}

export function filterableParameters(family: FamilyDefinition): ParameterDefinition[] {
  return family.parameters.filter((p) => p.filterable);
}

export function isCoversParameter(def: ParameterDefinition): boolean {
  return def.kind === 'number' && numericFilterMode(def.slots) === 'covers';
}


/** How the filter reads in words: "runs on" for a supply, "covers" for other ranges. */
export function coversVerb(def: ParameterDefinition): string {
  return isSupplySpan(def) ? 'runs on' : 'covers';
}

export type NumericBound = 'min' | 'max' | 'covers';

export function numericParamKey(def: ParameterDefinition, bound: NumericBound): string {
  return `${def.key}.${bound}`;
}

export type NumericReading = { ok: true; min: number; max: number; shown: string } | { ok: false; error: string };

function show(def: ParameterDefinition, value: number): string {
  return formatQuantity(value, def.unit ?? '', { displayUnit: def.displayUnit, digits: 4 });
}

/** Exact enough for the server to read back the same number; 15 digits round-trip any value typed by hand. */
function forApi(def: ParameterDefinition, value: number): string {
  return formatQuantity(value, def.unit ?? '', { displayUnit: def.displayUnit, digits: 15 });
}

/** Reads one numeric filter box the way the API will; a bare number is in the field's display unit. */
export function readNumeric(def: ParameterDefinition, bound: NumericBound, raw: string): NumericReading {
  const unit = def.unit ?? '';
  const opts = { unit, ...(def.displayUnit ? { displayUnit: def.displayUnit } : {}) };
  if (bound === 'covers') {
    const r = isSupplySpan(def) ? parseSupplySpan(raw, opts) : parseRange(raw, opts);
    if (!r.ok) return r;
    const shown = r.min === r.max ? show(def, r.min) : `${show(def, r.min)} to ${show(def, r.max)}`;
    return { ok: true, min: r.min, max: r.max, shown: isSupplySpan(def) && /±|\+\/-/.test(raw) ? `${shown} span` : shown };
  }
  const r = parseQuantity(raw, opts);
  if (!r.ok) return r;
  if (r.plusMinus) return { ok: false, error: `Enter one value for the ${bound === 'min' ? 'lowest' : 'highest'} ${def.label.toLowerCase()}, without ±` };
  return { ok: true, min: r.value, max: r.value, shown: show(def, r.value) };
}

function readSort(value: string | null, family: FamilyDefinition | undefined): string | undefined {
  if (!value) return undefined;
  const key = value.startsWith('-') ? value.slice(1) : value;
  if ((FIXED_SORTS as readonly string[]).includes(key)) return value;
  const def = family?.parameters.find((p) => p.key === key);
  return def?.kind === 'number' ? value : undefined;
}

export function readPage(params: URLSearchParams): number {
  const page = Number(params.get('page'));
  return Number.isInteger(page) && page >= 1 ? page : 1;
}

export function readPageSize(params: URLSearchParams): number {
  const size = Number(params.get('pageSize'));
  return (PAGE_SIZES as readonly number[]).includes(size) ? size : DEFAULT_PAGE_SIZE;
}

export interface ApiSearch {
  /** Ready for GET /api/parts. */
  query: Record<string, string>;
  /** Boxes that could not be read, by address key; they are left out of the query. */
  errors: Record<string, string>;
}

/** Everything the address says, in the API's terms. */
export function toApiSearch(params: URLSearchParams): ApiSearch {
  const query: Record<string, string> = {};
  const errors: Record<string, string> = {};
  const familyKey = readFamily(params);
  const family = familyKey ? FAMILIES[familyKey] : undefined;
  if (familyKey) query.family = familyKey;

  const q = params.get('q')?.trim();
  if (q) query.q = q;
  const lifecycle = readList(params, 'lifecycle').filter((v) => (LIFECYCLES as readonly string[]).includes(v));
  if (lifecycle.length > 0) query.lifecycle = lifecycle.join(',');
  const rohs = readList(params, 'rohs').filter((v) => (ROHS_STATUSES as readonly string[]).includes(v));
  if (rohs.length > 0) query.rohs = rohs.join(',');

  for (const def of family ? filterableParameters(family) : []) {
    if (def.kind === 'number') {
      for (const bound of isCoversParameter(def) ? (['covers'] as const) : (['min', 'max'] as const)) {
        const key = numericParamKey(def, bound);
        const raw = params.get(key)?.trim();
        if (!raw) continue;
        const reading = readNumeric(def, bound, raw);
        if (!reading.ok) {
          errors[key] = reading.error;
          continue;
        }
        if (bound === 'covers') {
          query[`${def.key}.min`] = forApi(def, reading.min);
          query[`${def.key}.max`] = forApi(def, reading.max);
        } else {
          query[key] = forApi(def, reading.min);
        }
      }
    } else if (def.kind === 'enum') {
      const allowed = new Set(def.choices?.map((c) => c.value));
      const values = readList(params, def.key).filter((v) => allowed.has(v));
      if (values.length > 0) query[def.key] = values.join(',');
    } else if (def.kind === 'boolean') {
      const value = params.get(def.key);
      if (value === 'true' || value === 'false') query[def.key] = value;
    }
  }

  const sort = readSort(params.get('sort'), family);
  if (sort) query.sort = sort;
  query.page = String(readPage(params));
  query.pageSize = String(readPageSize(params));
  return { query, errors };
}

/** The same result set for GET /api/parts/export: every filter, no paging. */
export function exportQuery(query: Record<string, string>, format: 'csv' | 'json'): Record<string, string> {
  const { page: _page, pageSize: _pageSize, ...filters } = query;
  return { ...filters, format };
}

/**
 * Maps a 400's issue paths ("query.slewRate.min") back to the box that produced them. A covered range is sent as
 * min and max but typed in one box.
 */
export function addressKeyForIssue(path: string, family: FamilyDefinition | undefined): string | undefined {
  const key = path.replace(/^query\./, '');
  const [param, bound] = key.split('.');
  const def = family?.parameters.find((p) => p.key === param);
  if (def && isCoversParameter(def) && (bound === 'min' || bound === 'max')) return `${def.key}.covers`;
  return key;
}

/** Every key that belongs to a family's filters, so switching family can drop them. */
function familyFilterKeys(family: FamilyDefinition): string[] {
  return family.parameters.flatMap((p) =>
    p.kind === 'number' ? [`${p.key}.min`, `${p.key}.max`, `${p.key}.covers`] : [p.key],
  );
}

/** The address after choosing another family: its filters and parameter sorting do not carry over. */
export function withFamily(params: URLSearchParams, family: FamilyKey | undefined): URLSearchParams {
  const next = new URLSearchParams(params);
  for (const f of Object.values(FAMILIES)) for (const key of familyFilterKeys(f)) next.delete(key);
  const sort = next.get('sort');
  if (sort && !(FIXED_SORTS as readonly string[]).includes(sort.replace(/^-/, ''))) next.delete('sort');
  if (family) next.set('family', family);
  else next.delete('family');
  next.delete('page');
  return next;
}

export interface ActiveFilter {
  /** Stable key for React and for tests. */
  id: string;
  label: string;
  /** The address with this one filter taken away. */
  without: (params: URLSearchParams) => URLSearchParams;
}

function removeKey(key: string) {
  return (params: URLSearchParams) => {
    const next = new URLSearchParams(params);
    next.delete(key);
    next.delete('page');
    return next;
  };
}

function removeListValue(key: string, value: string) {
  return (params: URLSearchParams) => {
    const next = new URLSearchParams(params);
    const rest = readList(next, key).filter((v) => v !== value);
    if (rest.length > 0) next.set(key, rest.join(','));
    else next.delete(key);
    next.delete('page');
    return next;
  };
}

/** Appends the field's unit to a bare number, so a chip reads "≥ 5 V/µs" rather than "≥ 5". */
function withUnit(def: ParameterDefinition, raw: string): string {
  const unit = inputUnit(def);
  return unit && /^[+-]?\d*\.?\d+(?:e[+-]?\d+)?$/i.test(raw) ? `${raw} ${unit}` : raw;
}

/** The filters in force, in words, each removable on its own. */
export function activeFilters(params: URLSearchParams): ActiveFilter[] {
  const out: ActiveFilter[] = [];
  const q = params.get('q')?.trim();
  if (q) out.push({ id: 'q', label: `Text “${q}”`, without: removeKey('q') });
  for (const v of readList(params, 'lifecycle')) {
    if ((LIFECYCLES as readonly string[]).includes(v)) {
      out.push({ id: `lifecycle:${v}`, label: LIFECYCLE_LABELS[v as (typeof LIFECYCLES)[number]], without: removeListValue('lifecycle', v) });
    }
  }
  for (const v of readList(params, 'rohs')) {
    if ((ROHS_STATUSES as readonly string[]).includes(v)) {
      out.push({ id: `rohs:${v}`, label: ROHS_LABELS[v as (typeof ROHS_STATUSES)[number]], without: removeListValue('rohs', v) });
    }
  }
  const familyKey = readFamily(params);
  if (!familyKey) return out;
  for (const def of filterableParameters(FAMILIES[familyKey])) {
    if (def.kind === 'number') {
      const bounds = isCoversParameter(def) ? (['covers'] as const) : (['min', 'max'] as const);
      for (const bound of bounds) {
        const key = numericParamKey(def, bound);
        const raw = params.get(key)?.trim();
        if (!raw) continue;
        const op = bound === 'covers' ? coversVerb(def) : bound === 'min' ? '≥' : '≤';
        out.push({ id: key, label: `${def.label} ${op} ${withUnit(def, raw)}`, without: removeKey(key) });
      }
    } else if (def.kind === 'enum') {
      for (const v of readList(params, def.key)) {
        const choice = def.choices?.find((c) => c.value === v);
        if (choice) out.push({ id: `${def.key}:${v}`, label: `${def.label}: ${choice.label}`, without: removeListValue(def.key, v) });
      }
    } else if (def.kind === 'boolean') {
      const v = params.get(def.key);
      if (v === 'true' || v === 'false') {
        out.push({ id: def.key, label: `${def.label}: ${v === 'true' ? 'yes' : 'no'}`, without: removeKey(def.key) });
      }
    }
  }
  return out;
}

export function parseSort(sort: string | undefined): { id: string; desc: boolean } | undefined {
  if (!sort) return undefined;
  return sort.startsWith('-') ? { id: sort.slice(1), desc: true } : { id: sort, desc: false };
}
