import type { CandidatePart, EquivalentDto, PinoutComparison, Weights } from '../alternates';
import type { FamilyKey } from '../families';

/** One thing a substitute is judged on, with the weight it carries unless the user moves it. */
export interface Criterion {
  key: string;
  label: string;
  family: FamilyKey | 'any';
  defaultWeight: number;
  description: string;
}

export interface RankOptions {
  weights?: Weights;
  /** The operating supply the candidate's range must cover, total span in volts, e.g. {min: 9, max: 9}. */
  operatingSupply?: { min: number; max: number };
  requireDropIn?: boolean;
  allowObsolete?: boolean;
  /** For photoresistors: the LED that lights it (spectral peak comparison). */
  pairedLed?: CandidatePart;
  /** Editor rulings keyed by the other part's id. Approved ones are listed first; rejected ones are unsuitable. */
  equivalents?: ReadonlyMap<string, EquivalentDto>;
  /**
   * A pinout stated from outside instead of compared pin by pin (undefined: compare as usual). A home-made LED and
   * photoresistor pair has no package of its own, so there are no pins to compare.
   */
  pinoutOf?: (candidate: CandidatePart) => PinoutComparison | undefined;
}
