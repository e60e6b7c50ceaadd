import {
  FAMILIES,
  VALUE_SLOTS,
  formatQuantity,
  getParameter,
  isCadmiumCell,
  parameterValueSchemaFor,
  parseQuantity,
  type DatasheetExtraction,
  type FamilyKey,
  type ParameterDefinition,
  type ParameterProposal,
  type ParameterValue,
  type ValueSlot,
} from '@understudy/shared-types';
import { describeParameter, slotsOf } from '../../../lib/part-display';

export interface ProposalGroup {
  key: string;
  label: string;
  def: ParameterDefinition | undefined;
  proposals: ParameterProposal[];
}

/** Proposals per parameter, in the family's own order; keys the family does not know come last, by name. */
export function groupProposals(family: FamilyKey | undefined, proposals: readonly ParameterProposal[]): ProposalGroup[] {
  const order = family ? FAMILIES[family].parameters.map((p) => p.key) : [];
  const groups = new Map<string, ProposalGroup>();
  for (const p of proposals) {
    let group = groups.get(p.key);
    if (!group) {
      const def = family ? getParameter(family, p.key) : undefined;
      group = { key: p.key, label: def?.label ?? p.key, def, proposals: [] };
      groups.set(p.key, group);
    }
    group.proposals.push(p);
  }
  const rank = (key: string) => {
    const i = order.indexOf(key);
    return i === -1 ? Number.MAX_SAFE_INTEGER : i;
  };
  return [...groups.values()].sort((a, b) => rank(a.key) - rank(b.key) || a.key.localeCompare(b.key));
}

/** The value a decision stands for: the reviewer's correction when edited, else what the parser read. */
export function effectiveValue(p: ParameterProposal): ParameterValue {
  return p.decision === 'edited' && p.editedValue ? p.editedValue : p.value;
}

/** Each slot in the parameter's display unit: "typ 13 V/µs", "min 3 V, max 32 V"; conditions are left to the caller. */
export function formatProposalValue(def: ParameterDefinition | undefined, value: ParameterValue): string {
  if (def) return describeParameter(def, { ...value, conditions: undefined });
  const slots = VALUE_SLOTS.filter((s) => value[s] !== undefined).map((s) => `${s} ${value[s]}`);
  if (slots.length > 0) return slots.join(', ');
  return value.value === undefined ? '—' : String(value.value);
}

export type ConfidenceLevel = 'high' | 'medium' | 'low';

export function confidenceLevel(confidence: number): ConfidenceLevel {
  if (confidence >= 0.8) return 'high';
  if (confidence >= 0.5) return 'medium';
  return 'low';
}

export const CONFIDENCE_WORDS: Record<ConfidenceLevel, string> = {
  high: 'High confidence',
  medium: 'Medium confidence',
  low: 'Low confidence',
};

/** Parameters with more than one kept proposal: only one can be written, so the reviewer should know. */
export function doublyDecided(proposals: readonly ParameterProposal[]): Set<string> {
  const counts = new Map<string, number>();
  for (const p of proposals) {
    if (p.decision === 'accepted' || p.decision === 'edited') counts.set(p.key, (counts.get(p.key) ?? 0) + 1);
  }
  return new Set([...counts].filter(([, n]) => n > 1).map(([k]) => k));
}

export interface DiffLine {
  key: string;
  label: string;
  before: string;
  after: string;
  changed: boolean;
}

function same(a: ParameterValue | undefined, b: ParameterValue | undefined): boolean {
  return JSON.stringify(a ?? null) === JSON.stringify(b ?? null);
}

/** Before → after for every parameter the apply writes, against the target's current values (none for a new part). */
export function diffAgainst(
  family: FamilyKey | undefined,
  current: Record<string, ParameterValue | undefined>,
  reviewed: Record<string, ParameterValue>,
): DiffLine[] {
  const order = family ? FAMILIES[family].parameters.map((p) => p.key) : [];
  const keys = Object.keys(reviewed).sort((a, b) => {
    const ia = order.indexOf(a);
    const ib = order.indexOf(b);
    return (ia === -1 ? Infinity : ia) - (ib === -1 ? Infinity : ib) || a.localeCompare(b);
  });
  return keys.map((key) => {
    const def = family ? getParameter(family, key) : undefined;
    const show = (v: ParameterValue | undefined) => (v === undefined ? '(not stated)' : def ? describeParameter(def, v) : JSON.stringify(v));
    return { key, label: def?.label ?? key, before: show(current[key]), after: show(reviewed[key]), changed: !same(current[key], reviewed[key]) };
  });
}

/** Whether the proposals point to a cadmium cell, so the review shows the caution before anyone applies it. */
export function suggestsCadmium(extraction: DatasheetExtraction): boolean {
  if (extraction.identity.family?.value !== 'photoresistor') return false;
  return extraction.proposals.some((p) => {
    if (p.key !== 'cellMaterial' || p.decision === 'rejected') return false;
    const material = effectiveValue(p).value;
    return typeof material === 'string' && isCadmiumCell(material);
  });
}

// Editing ---------------------------------------------------------------------------------------------------------

/** What the edit boxes hold: one text per slot for numbers, the value for the other kinds. */
export type EditInputs = Partial<Record<ValueSlot, string>> & { value?: string };

function exact(def: ParameterDefinition, v: number): string {
  return formatQuantity(v, def.unit ?? '', { displayUnit: def.displayUnit, digits: 15 });
}

export function editInputsFor(def: ParameterDefinition, value: ParameterValue): EditInputs {
  if (def.kind === 'number') {
    return Object.fromEntries(slotsOf(def).map((s) => [s, value[s] === undefined ? '' : exact(def, value[s]!)]));
  }
  return { value: value.value === undefined ? '' : String(value.value) };
}

export type EditResult =
  | { ok: true; value: ParameterValue }
  | { ok: false; errors: Partial<Record<ValueSlot | 'value' | 'form', string>> };

/**
 * Reads the boxes in engineering notation (4k7, 13 V/µs) in the parameter's unit, keeps the conditions the table
 * stated, and checks the result with the same schema the server applies.
 */
export function parseEdit(def: ParameterDefinition, inputs: EditInputs, base: ParameterValue): EditResult {
  const errors: Partial<Record<ValueSlot | 'value' | 'form', string>> = {};
  let value: ParameterValue;
  if (def.kind === 'number') {
    value = {};
    for (const slot of slotsOf(def)) {
      const text = (inputs[slot] ?? '').trim();
      if (text === '') continue;
      const r = parseQuantity(text, { unit: def.unit ?? '', ...(def.displayUnit ? { displayUnit: def.displayUnit } : {}) });
      if (!r.ok) errors[slot] = r.error;
      else if (r.plusMinus) errors[slot] = 'Enter one value without ±; use min and max for a range';
      else value[slot] = r.value;
    }
    if (base.conditions && Object.keys(base.conditions).length > 0) value.conditions = base.conditions;
  } else if (def.kind === 'boolean') {
    value = inputs.value === 'true' ? { value: true } : inputs.value === 'false' ? { value: false } : {};
  } else {
    value = { value: (inputs.value ?? '').trim() };
  }
  if (Object.keys(errors).length > 0) return { ok: false, errors };
  const checked = parameterValueSchemaFor(def).safeParse(value);
  if (!checked.success) {
    for (const issue of checked.error.issues) {
      const head = issue.path[0];
      const field = head === 'min' || head === 'typ' || head === 'max' ? head : def.kind === 'number' ? 'form' : 'value';
      errors[field] ??= issue.message;
    }
    return { ok: false, errors };
  }
  return { ok: true, value: checked.data };
}
