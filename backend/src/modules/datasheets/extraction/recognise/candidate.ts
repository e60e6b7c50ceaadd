import type { ExtractionSource, ParameterValue } from '@understudy/shared-types';

export type Origin = 'table' | 'prose' | 'absolute-maximum';

/** One reading of a parameter somewhere in the document; the best per key becomes the proposal. */
export interface Candidate {
  key: string;
  value: ParameterValue;
  statedUnit: string | null;
  origin: Origin;
  conditionsText: string | null;
  confidence: number;
  source: ExtractionSource;
  /** Reading order in the document, for stable ids and for preferring the first table. */
  order: number;
  /** Set when the figures were measured away from room temperature or over the full range. */
  offNominal: boolean;
  /** How specific the label was ("Output current" outranks "Short-circuit current"). */
  rank: number;
  /** Read from a table whose title names special conditions ("Electrical characteristics, VS = ±5 V"). */
  variant?: boolean;
  /** How many parameters the candidate's table gave: the main characteristics table gives the most. */
  tableWeight?: number;
  /** A supply current stated for the whole package, to be shared out over the channels. */
  perPackage?: boolean;
}

export function clampConfidence(c: number): number {
  return Math.round(Math.min(1, Math.max(0.05, c)) * 100) / 100;
}
