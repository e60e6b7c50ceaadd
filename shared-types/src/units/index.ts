export { parseQuantity, type ParseResult, type ParseOptions } from './parse';
export { parseRange, parseSupplySpan, type RangeResult, type RangeOptions } from './range';
export { formatQuantity, type FormatOptions } from './format';
export {
  E_SERIES,
  E_SERIES_NAMES,
  E_SERIES_TOLERANCE,
  nearestPreferredValue,
  isPreferredValue,
  preferredValuesBetween,
  type ESeriesName,
} from './e-series';
export {
  UNITS,
  canonicalUnit,
  displayUnitExponent,
  isCanonicalUnit,
  type CanonicalUnit,
  type UnitInfo,
} from './units';
