import { FAMILIES, type CandidatePart, type DerivedNeed, type ParameterDefinition } from '@understudy/shared-types';
import { summarizeParameter } from '../../../lib/part-display';

/** "−12" for points a criterion cost; a true minus sign, and no "−0". */
export function formatPoints(points: number): string {
  const rounded = Math.round(points * 10) / 10;
  if (rounded === 0) return '0';
  return rounded < 0 ? `\u2212${Math.abs(rounded)}` : `+${rounded}`;
}

/** A margin (actual/needed − 1) as a percentage: +50 %, −20 %. */
export function formatMargin(margin: number | null): string {
  if (margin === null || !Number.isFinite(margin)) return '—';
  const pct = Math.round(margin * 100);
  if (pct === 0) return '0 %';
  return pct > 0 ? `+${pct} %` : `\u2212${Math.abs(pct)} %`;
}

/**
 * A margin as its need reads it: a supply's is the volts to spare at the nearer end of the range, the others are
 * actual/needed − 1. Lines with no need of their own (lifecycle, RoHS) carry a table score, not a margin.
 */
export function formatNeedMargin(need: Pick<DerivedNeed, 'key' | 'unit'> | undefined, margin: number | null): string {
  if (!need || margin === null || !Number.isFinite(margin)) return '—';
  if (need.key === 'supply') {
    const v = Math.round(margin * 10) / 10;
    return v === 0 ? '0 V' : v > 0 ? `+${v} V` : `\u2212${Math.abs(v)} V`;
  }
  return formatMargin(margin);
}


/** The figures a designer reads first for a part of this family: its default catalog columns. */
export function keyFacts(part: CandidatePart): Array<{ def: ParameterDefinition; text: string; qualifier?: string }> {
  return FAMILIES[part.family].parameters
    .filter((def) => def.columnByDefault)
    .flatMap((def) => {
      const summary = summarizeParameter(def, part.parameters[def.key]);
      return summary ? [{ def, text: summary.text, qualifier: summary.qualifier }] : [];
    });
}

/** Total supply span of a part, in volts, where its family states one. */
export function supplySpanOf(part: CandidatePart): { min?: number; max?: number } | undefined {
  if (!FAMILIES[part.family].parameters.some((d) => d.key === 'supplyVoltage')) return undefined;
  return { min: part.parameters.supplyVoltage?.min, max: part.parameters.supplyVoltage?.max };
}
