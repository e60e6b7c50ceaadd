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
  gainRangeFor,
  optoEstimateGaps,
  OPTO_ESTIMATE_NOTE,
  type OptoEstimate,
  type OptoEstimateInput,
} from './optocoupler-estimate';
export { CELL_RESPONSE_FWHM_M, LIFECYCLE_SCORES, ROHS_SCORES } from './curves';
