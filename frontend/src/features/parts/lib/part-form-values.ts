import {
  CONDITIONS,
  LIFECYCLE_LABELS,
  PartCreateBodySchema,
  PartUpdateBodySchema,
  ROHS_LABELS,
  VALUE_SLOTS,
  formatQuantity,
  parseQuantity,
  type ConditionKey,
  type FamilyDefinition,
  type Lifecycle,
  type ParameterDefinition,
  type ParameterValue,
  type PartCreateInput,
  type PartDto,
  type PartUpdateBody,
  type RohsStatus,
} from '@understudy/shared-types';
import { pinLayoutFor, slotsOf } from '../../../lib/part-display';

/** What the boxes hold: text as typed, so nothing is lost or reformatted while someone works. */
export interface ParameterInput {
  min: string;
  typ: string;
  max: string;
  /** Enum choice, or 'true' / 'false' for a boolean; '' when not stated. */
  value: string;
  conditions: Partial<Record<ConditionKey, string>>;
}

export interface PartFormValues {
  partNumber: string;
  manufacturer: string;
  description: string;
  lifecycle: Lifecycle;
  rohsStatus: RohsStatus;
  rohsNote: string;
  package: string;
  pinLayout: string;
  /** Comma-separated. */
  tags: string;
  parameters: Record<string, ParameterInput>;
}

export const TOP_FIELDS = [
  'partNumber',
  'manufacturer',
  'description',
  'lifecycle',
  'rohsStatus',
  'rohsNote',
  'package',
  'pinLayout',
  'tags',
] as const;
export type TopField = (typeof TOP_FIELDS)[number];

export const TOP_FIELD_LABELS: Record<TopField, string> = {
  partNumber: 'Part number',
  manufacturer: 'Manufacturer',
  description: 'Description',
  lifecycle: 'Lifecycle',
  rohsStatus: 'RoHS status',
  rohsNote: 'RoHS note',
  package: 'Package',
  pinLayout: 'Pin layout',
  tags: 'Tags',
};

const blankInput = (): ParameterInput => ({ min: '', typ: '', max: '', value: '', conditions: {} });

export function emptyFormValues(family: FamilyDefinition): PartFormValues {
  return {
    partNumber: '',
    manufacturer: '',
    description: '',
    lifecycle: 'active',
    rohsStatus: 'unknown',
    rohsNote: '',
    package: '',
    pinLayout: '',
    tags: '',
    parameters: Object.fromEntries(family.parameters.map((p) => [p.key, blankInput()])),
  };
}

/** Exact enough to read back the same number: 15 significant digits, trailing zeros dropped. */
function exact(value: number, unit: string, displayUnit: string | undefined): string {
  return formatQuantity(value, unit, { displayUnit, digits: 15 });
}

function inputFrom(def: ParameterDefinition, value: ParameterValue | undefined): ParameterInput {
  const input = blankInput();
  if (!value) return input;
  if (def.kind === 'number') {
    for (const slot of VALUE_SLOTS) {
      const v = value[slot];
      if (v !== undefined) input[slot] = exact(v, def.unit ?? '', def.displayUnit);
    }
    for (const key of def.conditions ?? []) {
      const v = value.conditions?.[key];
      if (v !== undefined) input.conditions[key] = exact(v, CONDITIONS[key].unit, CONDITIONS[key].displayUnit);
    }
  } else if (value.value !== undefined) {
    input.value = String(value.value);
  }
  return input;
}

export function formValuesFromPart(family: FamilyDefinition, part: PartDto): PartFormValues {
  return {
    partNumber: part.partNumber,
    manufacturer: part.manufacturer.name,
    description: part.description,
    lifecycle: part.lifecycle,
    rohsStatus: part.rohsStatus,
    rohsNote: part.rohsNote,
    package: part.package,
    pinLayout: part.pinLayout ?? '',
    tags: part.tags.join(', '),
    parameters: Object.fromEntries(family.parameters.map((p) => [p.key, inputFrom(p, part.parameters[p.key])])),
  };
}

export function parseTags(text: string): string[] {
  const seen = new Set<string>();
  for (const t of text.split(',')) {
    const tag = t.trim();
    if (tag) seen.add(tag);
  }
  return [...seen];
}

type Parsed = { ok: true; value: number | undefined } | { ok: false; error: string };

function parseBox(text: string, unit: string, displayUnit: string | undefined): Parsed {
  if (text.trim() === '') return { ok: true, value: undefined };
  const r = parseQuantity(text, { unit, ...(displayUnit ? { displayUnit } : {}) });
  if (!r.ok) return r;
  if (r.plusMinus) return { ok: false, error: 'Enter one value without ±; use min and max for a range' };
  return { ok: true, value: r.value };
}

export function parseSlot(def: ParameterDefinition, text: string): Parsed {
  return parseBox(text, def.unit ?? '', def.displayUnit);
}

export function parseCondition(key: ConditionKey, text: string): Parsed {
  return parseBox(text, CONDITIONS[key].unit, CONDITIONS[key].displayUnit);
}

/**
 * A comparable reading of one field: equal when the values are equal, however they were typed ("13" in a V/µs box
 * and "13 V/µs" read the same).
 */
export function fieldSignature(family: FamilyDefinition, values: PartFormValues, field: string): string {
  if ((TOP_FIELDS as readonly string[]).includes(field)) {
    const v = values[field as TopField];
    return field === 'tags' ? parseTags(v).join('\u0000') : v.trim();
  }
  const key = field.replace(/^parameters\./, '');
  const def = family.parameters.find((p) => p.key === key);
  const input = values.parameters[key] ?? blankInput();
  if (!def) return '';
  if (def.kind !== 'number') return input.value;
  const read = (p: Parsed, raw: string) => (p.ok ? (p.value ?? '') : `?${raw.trim()}`);
  return JSON.stringify([
    ...slotsOf(def).map((s) => read(parseSlot(def, input[s]), input[s])),
    ...(def.conditions ?? []).map((c) => read(parseCondition(c, input.conditions[c] ?? ''), input.conditions[c] ?? '')),
  ]);
}

export function fieldKeys(family: FamilyDefinition): string[] {
  return [...TOP_FIELDS, ...family.parameters.map((p) => `parameters.${p.key}`)];
}

export function fieldLabel(family: FamilyDefinition, field: string): string {
  if ((TOP_FIELDS as readonly string[]).includes(field)) return TOP_FIELD_LABELS[field as TopField];
  const key = field.replace(/^parameters\./, '');
  return family.parameters.find((p) => p.key === key)?.label ?? key;
}

/** A field's value in words, for the conflict panel. */
export function fieldDisplay(family: FamilyDefinition, values: PartFormValues, field: string): string {
  switch (field) {
    case 'lifecycle':
      return LIFECYCLE_LABELS[values.lifecycle];
    case 'rohsStatus':
      return ROHS_LABELS[values.rohsStatus];
    case 'pinLayout':
      return pinLayoutFor(values.pinLayout)?.label ?? (values.pinLayout || '(none)');
    case 'tags':
      return parseTags(values.tags).join(', ') || '(none)';
  }
  if ((TOP_FIELDS as readonly string[]).includes(field)) return values[field as TopField].trim() || '(empty)';
  const key = field.replace(/^parameters\./, '');
  const def = family.parameters.find((p) => p.key === key);
  const input = values.parameters[key];
  if (!def || !input) return '(not stated)';
  if (def.kind === 'enum') return def.choices?.find((c) => c.value === input.value)?.label ?? (input.value || '(not stated)');
  if (def.kind === 'boolean') return input.value === 'true' ? 'Yes' : input.value === 'false' ? 'No' : '(not stated)';
  if (def.kind === 'text') return input.value || '(not stated)';
  const parts = slotsOf(def)
    .filter((s) => input[s].trim())
    .map((s) => `${s} ${input[s].trim()}`);
  const conditions = (def.conditions ?? [])
    .filter((c) => input.conditions[c]?.trim())
    .map((c) => `${CONDITIONS[c].label.toLowerCase()} ${input.conditions[c]!.trim()}`);
  const text = parts.join(', ') || '(not stated)';
  return conditions.length > 0 ? `${text} (${conditions.join(', ')})` : text;
}

export type FormErrors = Record<string, string>;

/** Issue paths from zod (arrays) or the server ("body.parameters.slewRate.typ") as one dotted key. */
export function issueKey(path: ReadonlyArray<PropertyKey> | string): string {
  const joined = typeof path === 'string' ? path : path.map(String).join('.');
  return joined.replace(/^body\./, '') || '_form';
}

export interface BuildContext {
  family: FamilyDefinition;
  /** The part the edit started from, so untouched parameters are sent back bit for bit. */
  base?: { part: PartDto; values: PartFormValues };
}

/**
 * The whole part from the boxes, checked with the same schema the server uses. Numbers are read here with the
 * shared parser; a box it cannot read is reported under its own key ("parameters.slewRate.typ").
 */
export function buildCreateBody(values: PartFormValues, { family, base }: BuildContext): { body: PartCreateInput | null; errors: FormErrors } {
  const errors: FormErrors = {};
  const parameters: Record<string, ParameterValue> = {};

  for (const def of family.parameters) {
    const input = values.parameters[def.key] ?? blankInput();
    const field = `parameters.${def.key}`;
    const original = base?.part.parameters[def.key];
    if (base && original && fieldSignature(family, values, field) === fieldSignature(family, base.values, field)) {
      parameters[def.key] = original;
      continue;
    }
    if (def.kind === 'number') {
      const value: ParameterValue = {};
      let unreadable = false;
      for (const slot of slotsOf(def)) {
        const r = parseSlot(def, input[slot]);
        if (!r.ok) {
          errors[`${field}.${slot}`] = r.error;
          unreadable = true;
        } else if (r.value !== undefined) value[slot] = r.value;
      }
      const conditions: Record<string, number> = {};
      for (const c of def.conditions ?? []) {
        const r = parseCondition(c, input.conditions[c] ?? '');
        if (!r.ok) {
          errors[`${field}.conditions.${c}`] = r.error;
          unreadable = true;
        } else if (r.value !== undefined) conditions[c] = r.value;
      }
      if (Object.keys(conditions).length > 0) value.conditions = conditions;
      // A box that cannot be read is reported once, by itself; the schema would only repeat it less clearly.
      if (!unreadable && Object.keys(value).length > 0) parameters[def.key] = value;
    } else if (def.kind === 'boolean') {
      if (input.value === 'true' || input.value === 'false') parameters[def.key] = { value: input.value === 'true' };
    } else if (input.value.trim()) {
      parameters[def.key] = { value: input.value.trim() };
    }
  }

  const layoutChanged = !base || values.pinLayout !== base.values.pinLayout;
  const candidate = {
    family: family.key,
    partNumber: values.partNumber,
    manufacturer: values.manufacturer,
    description: values.description,
    lifecycle: values.lifecycle,
    rohsStatus: values.rohsStatus,
    rohsNote: values.rohsNote,
    package: values.package,
    pinLayout: values.pinLayout || null,
    // A chosen layout brings its own pins; a part's own map is kept only while its layout stays.
    pinMap: layoutChanged ? {} : base!.part.pinMap,
    parameters,
    tags: parseTags(values.tags),
  };
  const result = PartCreateBodySchema.safeParse(candidate);
  if (!result.success) {
    for (const issue of result.error.issues) {
      const key = issueKey(issue.path);
      if (!(key in errors)) errors[key] = issue.message;
    }
  }
  if (Object.keys(errors).length > 0 || !result.success) return { body: null, errors };
  return { body: result.data, errors };
}

/** Only what this edit changed, with the version it started from; checked with the server's update schema. */
export function buildUpdateBody(
  values: PartFormValues,
  context: Required<BuildContext>,
): { body: PartUpdateBody | null; changed: string[]; errors: FormErrors } {
  const { family, base } = context;
  const built = buildCreateBody(values, context);
  if (!built.body) return { body: null, changed: [], errors: built.errors };
  const full = built.body;
  const changed = fieldKeys(family).filter((f) => fieldSignature(family, values, f) !== fieldSignature(family, base.values, f));
  const patch: Record<string, unknown> = { version: base.part.version };
  for (const field of changed) {
    if (field.startsWith('parameters.')) patch.parameters = full.parameters;
    else patch[field] = full[field as TopField];
  }
  if (changed.includes('pinLayout')) patch.pinMap = full.pinMap;
  const result = PartUpdateBodySchema.safeParse(patch);
  if (!result.success) {
    const errors: FormErrors = {};
    for (const issue of result.error.issues) errors[issueKey(issue.path)] ??= issue.message;
    return { body: null, changed, errors };
  }
  return { body: result.data, changed, errors: {} };
}

export interface ConflictField {
  field: string;
  label: string;
  theirs: string;
  yours: string;
  /** Whether this edit changed the field too; if not, taking theirs loses nothing. */
  yoursChanged: boolean;
}

/** Fields someone else changed since this edit began and where the two now disagree. */
export function findConflicts(
  family: FamilyDefinition,
  base: PartFormValues,
  mine: PartFormValues,
  theirs: PartFormValues,
): ConflictField[] {
  const out: ConflictField[] = [];
  for (const field of fieldKeys(family)) {
    const b = fieldSignature(family, base, field);
    const t = fieldSignature(family, theirs, field);
    const m = fieldSignature(family, mine, field);
    if (b === t || m === t) continue;
    out.push({
      field,
      label: fieldLabel(family, field),
      theirs: fieldDisplay(family, theirs, field),
      yours: fieldDisplay(family, mine, field),
      yoursChanged: m !== b,
    });
  }
  return out;
}

export type Choice = 'mine' | 'theirs';

/** The values to resubmit: this edit's boxes, with the current value taken wherever that was chosen. */
export function resolveConflicts(mine: PartFormValues, theirs: PartFormValues, choices: Record<string, Choice>): PartFormValues {
  const next: PartFormValues = { ...mine, parameters: { ...mine.parameters } };
  for (const [field, choice] of Object.entries(choices)) {
    if (choice !== 'theirs') continue;
    if (field.startsWith('parameters.')) {
      const key = field.slice('parameters.'.length);
      next.parameters[key] = theirs.parameters[key] ?? blankInput();
    } else if ((TOP_FIELDS as readonly string[]).includes(field)) {
      (next as unknown as Record<string, unknown>)[field] = theirs[field as TopField];
    }
  }
  return next;
}
