import {
  LIFECYCLE_LABELS,
  ROHS_LABELS,
  getParameter,
  type FamilyDefinition,
  type Lifecycle,
  type ParameterValue,
  type RevisionChange,
  type RohsStatus,
} from '@understudy/shared-types';
import { describeParameter, pinLayoutFor } from '../../../lib/part-display';

export const FIELD_LABELS: Record<string, string> = {
  partNumber: 'Part number',
  manufacturer: 'Manufacturer',
  description: 'Description',
  lifecycle: 'Lifecycle',
  rohsStatus: 'RoHS status',
  rohsNote: 'RoHS note',
  package: 'Package',
  pinLayout: 'Pin layout',
  pinMap: 'Pin map',
  tags: 'Tags',
  archived: 'Archived',
  family: 'Family',
};

const EMPTY = '(empty)';

export interface ChangeLine {
  field: string;
  label: string;
  before: string;
  after: string;
}

function isBlank(v: unknown): boolean {
  return v === undefined || v === null || v === '' || (Array.isArray(v) && v.length === 0);
}

function text(v: unknown): string {
  if (isBlank(v)) return EMPTY;
  if (typeof v === 'string') return v;
  if (typeof v === 'number' || typeof v === 'boolean') return String(v);
  return JSON.stringify(v);
}

function formatField(field: string, v: unknown): string {
  if (isBlank(v)) return EMPTY;
  switch (field) {
    case 'lifecycle':
      return LIFECYCLE_LABELS[v as Lifecycle] ?? text(v);
    case 'rohsStatus':
      return ROHS_LABELS[v as RohsStatus] ?? text(v);
    case 'manufacturer':
      return typeof v === 'object' && v !== null && 'name' in v ? text((v as { name: unknown }).name) : text(v);
    case 'tags':
      return Array.isArray(v) ? v.map(String).join(', ') : text(v);
    case 'pinLayout':
      return pinLayoutFor(String(v))?.label ?? text(v);
    case 'pinMap':
      if (typeof v === 'object' && v !== null) {
        const entries = Object.entries(v as Record<string, unknown>).sort(([a], [b]) => Number(a) - Number(b));
        return entries.length === 0 ? 'as the pin layout' : entries.map(([n, f]) => `${n} ${String(f)}`).join(', ');
      }
      return text(v);
    case 'archived':
      return v === true ? 'Yes' : v === false ? 'No' : text(v);
    default:
      return text(v);
  }
}

function parameterLine(family: FamilyDefinition, key: string, before: unknown, after: unknown): ChangeLine {
  const def = getParameter(family, key);
  const show = (v: unknown) => (isBlank(v) ? EMPTY : def ? describeParameter(def, v as ParameterValue) : text(v));
  return { field: `parameters.${key}`, label: def?.label ?? key, before: show(before), after: show(after) };
}

/**
 * Field-level changes in words and units. Parameter changes may arrive one per parameter ("parameters.slewRate")
 * or as the whole record ("parameters"); either way each changed parameter gets its own line.
 */
export function describeChanges(family: FamilyDefinition, changes: readonly RevisionChange[]): ChangeLine[] {
  const lines: ChangeLine[] = [];
  for (const change of changes) {
    const paramMatch = /^parameters[./](.+)$/.exec(change.field);
    if (paramMatch) {
      lines.push(parameterLine(family, paramMatch[1]!, change.before, change.after));
      continue;
    }
    if (change.field === 'parameters') {
      const before = (change.before ?? {}) as Record<string, unknown>;
      const after = (change.after ?? {}) as Record<string, unknown>;
      const keys = new Set([...Object.keys(before), ...Object.keys(after)]);
      const order = family.parameters.map((p) => p.key);
      for (const key of [...keys].sort((a, b) => order.indexOf(a) - order.indexOf(b))) {
        if (JSON.stringify(before[key]) !== JSON.stringify(after[key])) lines.push(parameterLine(family, key, before[key], after[key]));
      }
      continue;
    }
    lines.push({
      field: change.field,
      label: FIELD_LABELS[change.field] ?? change.field,
      before: formatField(change.field, change.before),
      after: formatField(change.field, change.after),
    });
  }
  return lines;
}

const SOURCE_LABELS: Record<string, string> = {
  ui: 'edited in Understudy',
  web: 'edited in Understudy',
  form: 'edited in Understudy',
  api: 'through the API',
  import: 'bulk import',
  seed: 'demo data',
  create: 'created',
  archive: 'archived',
};

export function sourceLabel(source: string): string {
  return SOURCE_LABELS[source] ?? source;
}
