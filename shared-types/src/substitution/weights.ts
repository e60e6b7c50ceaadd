import type { Weights } from '../alternates';
import { FAMILIES, type FamilyKey } from '../families';
import { criteriaFor } from './criteria';
import { lower } from './values';

const MAX_WEIGHT = 5;

/**
 * "slewRate:4,noise:0" → the family's weights with those two changed. Keys match case-insensitively; pairs may be
 * separated by commas, semicolons or spaces and written with ":" or "=". Unknown keys, repeats, and weights
 * outside 0..5 are refused with a message naming what to write instead.
 */
export function parseWeights(
  text: string | undefined,
  family: FamilyKey,
): { ok: true; weights: Weights } | { ok: false; error: string } {
  const criteria = criteriaFor(family);
  const weights: Weights = Object.fromEntries(criteria.map((c) => [c.key, c.defaultWeight]));
  const trimmed = (text ?? '').trim();
  if (trimmed === '') return { ok: true, weights };
  const byLower = new Map(criteria.map((c) => [c.key.toLowerCase(), c.key]));
  const seen = new Set<string>();
  for (const pair of trimmed.split(/\s*[,;]\s*|\s+(?=[A-Za-z])/).filter((p) => p !== '')) {
    const m = /^([A-Za-z][\w-]*)\s*[:=]\s*(.*)$/.exec(pair);
    if (!m) return { ok: false, error: `"${pair}" is not a weight; write criterion:weight, such as ${criteria[0]!.key}:2` };
    const key = byLower.get(m[1]!.toLowerCase());
    if (key === undefined) {
      return {
        ok: false,
        error: `"${m[1]}" is not a criterion for ${lower(FAMILIES[family].pluralLabel)}; use ${criteria.map((c) => c.key).join(', ')}`,
      };
    }
    if (seen.has(key)) return { ok: false, error: `"${key}" is given twice` };
    seen.add(key);
    const value = m[2]!.trim() === '' ? NaN : Number(m[2]);
    if (!Number.isFinite(value) || value < 0 || value > MAX_WEIGHT) {
      return { ok: false, error: `The weight for "${key}" must be a number from 0 to ${MAX_WEIGHT}, not "${m[2]}"` };
    }
    weights[key] = value;
  }
  return { ok: true, weights };
}

/** The weights that differ from the family's defaults, in criterion order: "slewRate:4,noise:0" ("" for none). */
export function formatWeights(weights: Weights, family: FamilyKey): string {
  return criteriaFor(family)
    .filter((c) => weights[c.key] !== undefined && weights[c.key] !== c.defaultWeight)
    .map((c) => `${c.key}:${weights[c.key]}`)
    .join(',');
}

/** One weight per criterion, in order: defaults where missing, clamped to 0..5. */
export function resolveWeights(weights: Weights | undefined, family: FamilyKey): number[] {
  return criteriaFor(family).map((c) => {
    const w = weights?.[c.key] ?? c.defaultWeight;
    return Number.isFinite(w) ? Math.min(MAX_WEIGHT, Math.max(0, w)) : c.defaultWeight;
  });
}
