export type { Criterion, RankOptions } from './types';
export { criteriaFor, defaultWeights } from './criteria';
export { parseWeights, formatWeights } from './weights';
export { comparePinouts } from './pinout';
export { hardRequirementFailures, scoreCandidate, rankAlternates } from './rank';
export { deriveNeeds, rankForPosition, NON_RAIL_TO_RAIL_HEADROOM_V } from './position';
export {
  requiredSlewRate,
  ledCurrent,
  invertingGain,
  nonInvertingGain,
  rcCutoff,
  dividerVoltage,
  resistanceRangeForGain,
} from './formulas';
export {
  estimateOptocoupler,
  estimateOptocouplerFigures,
  ledIlluminance,
  gainRangeFor,
  optoEstimateGaps,
  OPTO_ESTIMATE_NOTE,
  type OptoEstimate,
  type OptoEstimateFigures,
  type OptoEstimateInput,
} from './optocoupler-estimate';
export { CELL_RESPONSE_FWHM_M, LIFECYCLE_SCORES, ROHS_SCORES } from './curves';
export {
  pairAsOptocoupler,
  pairDriveCurrent,
  pairId,
  rankPairs,
  ASSUMED_DRIVE_CURRENT_A,
  PAIR_SPACING_M,
  PAIRS_DROP_IN_NOTE,
  PAIRS_SHOWN,
  type PairDrive,
  type PairOptions,
  type PairRanking,
  type PairRankOptions,
  type PairResult,
  type UnsuitablePair,
} from './pairs';
