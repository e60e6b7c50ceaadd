import type { Lifecycle, RohsStatus } from '../parts';

// The curves every criterion scores with. Each maps a comparison to s ∈ [0, 1]; 1 costs nothing.

/** The candidate gave no value: scored as half, explained as "not stated". */
export const NOT_STATED = -1;

export function clamp01(x: number): number {
  return x <= 0 ? 0 : x >= 1 ? 1 : x;
}

/** More is not worse; less loses linearly in log10 and reaches 0 at `decades` below the original. */
export function shortfallLog(original: number, candidate: number, decades: number): number {
  if (candidate >= original) return 1;
  if (candidate <= 0) return 0;
  return clamp01(1 - Math.log10(original / candidate) / decades);
}

/** Less is not worse; more loses linearly in log10 and reaches 0 at `decades` above the original. */
export function excessLog(original: number, candidate: number, decades: number): number {
  if (candidate <= original) return 1;
  if (original <= 0) return 0;
  return clamp01(1 - Math.log10(candidate / original) / decades);
}

/** Either way loses: linear in log10, 0 at `decades` apart. */
export function closenessLog(original: number, candidate: number, decades: number): number {
  if (original <= 0 || candidate <= 0) return original === candidate ? 1 : 0;
  return clamp01(1 - Math.abs(Math.log10(candidate / original)) / decades);
}

/** Either way loses: linear, 0 at `span` apart (same unit as the values). */
export function closenessLinear(original: number, candidate: number, span: number): number {
  return clamp01(1 - Math.abs(candidate - original) / span);
}

const EPS = 1e-9;

/**
 * The fraction of the needed range [needMin, needMax] that [min, max] covers. A single point (a 9 V supply) is
 * covered or not: 1 or 0. Coverage, not overlap: a part that runs from 10 V covers none of 9 V.
 */
export function coverage(needMin: number, needMax: number, min: number, max: number): number {
  const width = needMax - needMin;
  if (width <= EPS * Math.max(1, Math.abs(needMax))) {
    return min <= needMin + EPS && max >= needMax - EPS ? 1 : 0;
  }
  return clamp01((Math.min(max, needMax) - Math.max(min, needMin)) / width);
}

/**
 * Two ranges on a log scale (light resistance 5k..12k against 10k..20k): half from how far apart their geometric
 * centres are (0 at a decade), half from how much of the original's range the candidate's covers.
 */
export function logRangeMatch(oMin: number, oMax: number, cMin: number, cMax: number): { s: number; centreRatio: number; covered: number } {
  const oLo = Math.log10(oMin);
  const oHi = Math.log10(oMax);
  const cLo = Math.log10(cMin);
  const cHi = Math.log10(cMax);
  const apart = Math.abs((cLo + cHi) / 2 - (oLo + oHi) / 2);
  const ratioScore = clamp01(1 - apart);
  const covered = coverage(oLo, oHi, cLo, cHi);
  return { s: (ratioScore + covered) / 2, centreRatio: 10 ** apart, covered };
}

/**
 * Relative response of a photocell at a wavelength `deltaM` from its peak: a Gaussian with the given full width at
 * half maximum, so 50 nm off a 100 nm-wide peak gives one half.
 */
export function spectralResponse(deltaM: number, fwhmM: number): number {
  return Math.exp(-4 * Math.LN2 * (deltaM / fwhmM) ** 2);
}

/** A CdS or CdSe cell responds over a band roughly 100 nm wide at half response (from memory, not a datasheet). */
export const CELL_RESPONSE_FWHM_M = 100e-9;

export const LIFECYCLE_SCORES: Record<Lifecycle, number> = { active: 1, nrnd: 0.6, 'last-time-buy': 0.3, obsolete: 0 };

export const ROHS_SCORES: Record<RohsStatus, number> = { compliant: 1, exempt: 1, unknown: 0.5, 'non-compliant': 0 };

/**
 * A margin beyond a need, saturating: meeting it exactly earns one half, each `scale` of margin closes most of
 * the remaining gap (1 − e^(−margin/scale)).
 */
export function marginScore(margin: number, scale: number): number {
  if (!(margin > 0)) return 0.5;
  return 0.5 + 0.5 * (1 - Math.exp(-margin / scale));
}

export function round1(x: number): number {
  const r = Math.round(x * 10) / 10;
  return r === 0 ? 0 : r;
}
