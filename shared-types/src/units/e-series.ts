// Preferred numbers for resistors and capacitors (IEC 60063), one decade from 1 up to 10.

const E6 = [1.0, 1.5, 2.2, 3.3, 4.7, 6.8] as const;
const E12 = [1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2] as const;
const E24 = [
  1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2,
  9.1,
] as const;
const E48 = [
  1.0, 1.05, 1.1, 1.15, 1.21, 1.27, 1.33, 1.4, 1.47, 1.54, 1.62, 1.69, 1.78, 1.87, 1.96, 2.05, 2.15, 2.26, 2.37, 2.49,
  2.61, 2.74, 2.87, 3.01, 3.16, 3.32, 3.48, 3.65, 3.83, 4.02, 4.22, 4.42, 4.64, 4.87, 5.11, 5.36, 5.62, 5.9, 6.19,
  6.49, 6.81, 7.15, 7.5, 7.87, 8.25, 8.66, 9.09, 9.53,
] as const;
const E96 = [
  1.0, 1.02, 1.05, 1.07, 1.1, 1.13, 1.15, 1.18, 1.21, 1.24, 1.27, 1.3, 1.33, 1.37, 1.4, 1.43, 1.47, 1.5, 1.54, 1.58,
  1.62, 1.65, 1.69, 1.74, 1.78, 1.82, 1.87, 1.91, 1.96, 2.0, 2.05, 2.1, 2.15, 2.21, 2.26, 2.32, 2.37, 2.43, 2.49, 2.55,
  2.61, 2.67, 2.74, 2.8, 2.87, 2.94, 3.01, 3.09, 3.16, 3.24, 3.32, 3.4, 3.48, 3.57, 3.65, 3.74, 3.83, 3.92, 4.02, 4.12,
  4.22, 4.32, 4.42, 4.53, 4.64, 4.75, 4.87, 4.99, 5.11, 5.23, 5.36, 5.49, 5.62, 5.76, 5.9, 6.04, 6.19, 6.34, 6.49,
  6.65, 6.81, 6.98, 7.15, 7.32, 7.5, 7.68, 7.87, 8.06, 8.25, 8.45, 8.66, 8.87, 9.09, 9.31, 9.53, 9.76,
] as const;

export const E_SERIES = { E6, E12, E24, E48, E96 } as const;
export type ESeriesName = keyof typeof E_SERIES;
export const E_SERIES_NAMES = Object.keys(E_SERIES) as ESeriesName[];

/** Tolerance in percent usually paired with each series, for labels. */
export const E_SERIES_TOLERANCE: Record<ESeriesName, number> = { E6: 20, E12: 10, E24: 5, E48: 2, E96: 1 };

function decadeValues(series: ESeriesName | readonly number[]): readonly number[] {
  const values = typeof series === 'string' ? E_SERIES[series] : series;
  if (!values || values.length === 0) throw new TypeError('nearestPreferredValue: empty series');
  return values;
}

/** Base-10 exponent of a positive value, robust to 999.9999 / 1000.0001 rounding in log10. */
function decadeOf(value: number): number {
  return Number(value.toExponential().split('e')[1]);
}

/** value at 10^decade, built through text so 4.7 at decade 3 is exactly 4700. */
function atDecade(base: number, decade: number): number {
  return Number(`${base}e${decade}`);
}

/**
 * The series value nearest to `value` on a log scale, at whatever decade: 4.9 kΩ in E12 → 4.7 kΩ,
 * 9.6 in E6 → 10. Ties go to the larger value. Throws on zero, negative or non-finite input.
 */
export function nearestPreferredValue(value: number, series: ESeriesName | readonly number[]): number {
  if (!Number.isFinite(value) || value <= 0) {
    throw new RangeError(`nearestPreferredValue: ${value} is not a positive value`);
  }
  const values = decadeValues(series);
  const decade = decadeOf(value);
  const target = Math.log10(value);
  let best = value;
  let bestDistance = Infinity;
  // Neighbouring decades too: 9.6 rounds up to the next decade's 1.0, 1.02 may round down to the last one's top.
  for (const d of [decade - 1, decade, decade + 1]) {
    for (const base of values) {
      const candidate = atDecade(base, d);
      const distance = Math.abs(Math.log10(candidate) - target);
      if (distance < bestDistance - 1e-12 || (Math.abs(distance - bestDistance) <= 1e-12 && candidate > best)) {
        best = candidate;
        bestDistance = distance;
      }
    }
  }
  return best;
}

/** Whether `value` is a series value at some decade (within a relative 1e-9, for float noise). */
export function isPreferredValue(value: number, series: ESeriesName | readonly number[]): boolean {
  if (!Number.isFinite(value) || value <= 0) return false;
  const nearest = nearestPreferredValue(value, series);
  return Math.abs(nearest - value) <= Math.abs(value) * 1e-9;
}

/** Every series value from min to max inclusive, ascending: for pickers and substitution searches. */
export function preferredValuesBetween(min: number, max: number, series: ESeriesName | readonly number[]): number[] {
  if (!(min > 0) || !(max >= min) || !Number.isFinite(max)) return [];
  const values = [...decadeValues(series)].sort((a, b) => a - b);
  const out: number[] = [];
  for (let d = decadeOf(min) - 1; d <= decadeOf(max); d++) {
    for (const base of values) {
      const v = atDecade(base, d);
      if (v >= min * (1 - 1e-12) && v <= max * (1 + 1e-12)) out.push(v);
    }
  }
  return out;
}
