import {
  getParameter,
  parameterValueSchemaFor,
  type FamilyKey,
  type ParameterProposal,
  type ParameterValue,
  type ValueSlot,
} from '@understudy/shared-types';
import { clampConfidence, type Candidate } from './recognise/candidate';
import { SYNONYMS } from './recognise/synonyms';

function tier(c: Candidate): number {
  return c.origin === 'prose' ? 1 : 0;
}

/**
 * Best first: nominal conditions, not from a table titled with special conditions, a table over prose, the main table over shorter ones repeating some rows under
 * other conditions, confidence, the more specific label, then reading order.
 */
export function compareCandidates(a: Candidate, b: Candidate): number {
  return (
    Number(a.offNominal) - Number(b.offNominal) ||
    Number(a.variant ?? false) - Number(b.variant ?? false) ||
    tier(a) - tier(b) ||
    (b.tableWeight ?? 0) - (a.tableWeight ?? 0) ||
    b.confidence - a.confidence ||
    b.rank - a.rank ||
    a.order - b.order
  );
}

function isLimitKey(family: FamilyKey, key: string): boolean {
  return SYNONYMS[family].some((s) => s.key === key && s.limit);
}

const SLOTS: ValueSlot[] = ['min', 'typ', 'max'];

/**
 * A parameter's other slots may come from a second row when both rows were read under the same conditions, and a
 * limit (an LED's rated current) from the limits table beside the figure it was tested at.
 */
function mergeSlots(family: FamilyKey, best: Candidate, others: Candidate[]): Candidate {
  const def = getParameter(family, best.key);
  if (!def || def.kind !== 'number') return best;
  const allowed = def.slots ?? SLOTS;
  let value: ParameterValue = { ...best.value };
  for (const other of others) {
    if (other.offNominal) continue;
    const missing = allowed.filter((s) => value[s] === undefined && other.value[s] !== undefined);
    if (missing.length === 0) continue;
    const sameConditions = (other.conditionsText ?? '') === (best.conditionsText ?? '') && tier(other) === tier(best);
    // A limit key's rating and its test figure live in different places by nature.
    const hasMax = value.max !== undefined;
    const complementary = isLimitKey(family, best.key) && missing.every((s) => (hasMax ? s !== 'max' : s === 'max'));
    if (!sameConditions && !complementary) continue;
    const next: ParameterValue = { ...value };
    for (const s of missing) next[s] = other.value[s];
    if (parameterValueSchemaFor(def).safeParse(next).success) value = next;
  }
  return value === best.value ? best : { ...best, value };
}

/** Supply current stated for the package, shared out per channel. */
function perChannel(c: Candidate, channels: number | undefined): Candidate {
  if (!c.perPackage) return c;
  if (!channels || channels === 1) return { ...c, perPackage: false };
  const value: ParameterValue = { ...c.value };
  for (const s of SLOTS) if (value[s] !== undefined) value[s] = value[s]! / channels;
  return { ...c, value, perPackage: false, confidence: clampConfidence(c.confidence - 0.05) };
}

/**
 * The supply (or LED current) most of the table figures are given at: the document's nominal point. Figures at other
 * supplies repeat some parameters for comparison and are not the part's headline values.
 */
function nominalConditions(candidates: Candidate[]): { supply?: number; current?: number } {
  const out: { supply?: number; current?: number } = {};
  for (const cond of ['supply', 'current'] as const) {
    const keysAt = new Map<number, Set<string>>();
    for (const c of candidates) {
      const v = c.value.conditions?.[cond];
      if (c.origin !== 'table' || c.offNominal || c.variant || v === undefined) continue;
      keysAt.set(v, (keysAt.get(v) ?? new Set()).add(c.key));
    }
    let best: number | undefined;
    let bestCount = 0;
    for (const [v, keys] of keysAt) {
      if (keys.size > bestCount || (keys.size === bestCount && best !== undefined && v > best)) {
        best = v;
        bestCount = keys.size;
      }
    }
    if (best !== undefined && keysAt.size > 1) out[cond] = best;
  }
  return out;
}

/** One proposal per key, the preferred reading, numbered in document order. */
export function selectProposals(family: FamilyKey, input: Candidate[]): ParameterProposal[] {
  const nominal = nominalConditions(input);
  const candidates = input.map((c) => {
    const away = (['supply', 'current'] as const).some(
      (k) => nominal[k] !== undefined && c.value.conditions?.[k] !== undefined && c.value.conditions[k] !== nominal[k],
    );
    return away && !c.offNominal ? { ...c, offNominal: true } : c;
  });
  const byKey = new Map<string, Candidate[]>();
  for (const c of candidates) byKey.set(c.key, [...(byKey.get(c.key) ?? []), c]);
  const channelsBest = (byKey.get('channels') ?? []).slice().sort(compareCandidates)[0];
  const channels = channelsBest?.value.typ;
  const chosen: Candidate[] = [];
  for (const [, list] of byKey) {
    const adjusted = list.map((c) => perChannel(c, channels));
    const sorted = adjusted.slice().sort(compareCandidates);
    chosen.push(mergeSlots(family, sorted[0]!, sorted.slice(1)));
  }
  chosen.sort((a, b) => a.order - b.order || a.key.localeCompare(b.key));
  return chosen.map((c, i) => ({
    id: `p${i + 1}`,
    key: c.key,
    value: c.value,
    // pdf.js folds the micro sign into Greek mu; show the micro sign, as the catalog's units do.
    statedUnit: c.statedUnit?.replace(/\u03BC/g, '\u00B5') ?? null,
    origin: c.origin,
    conditionsText: c.conditionsText,
    confidence: c.confidence,
    source: c.source,
    decision: 'pending',
    editedValue: null,
  }));
}
