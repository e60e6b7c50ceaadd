import { describe, expect, it } from 'vitest';
import { E_SERIES, E_SERIES_TOLERANCE, isPreferredValue, nearestPreferredValue, preferredValuesBetween } from './e-series';

describe('E_SERIES', () => {
  it('IEC 60063: each series has 6, 12, 24, 48 or 96 values per decade, ascending, from 1 up to 10', () => {
    for (const [name, values] of Object.entries(E_SERIES)) {
      expect(values.length, name).toBe(Number(name.slice(1)));
      expect(values[0]).toBe(1);
      for (let i = 1; i < values.length; i++) expect(values[i]!).toBeGreaterThan(values[i - 1]!);
      expect(values[values.length - 1]!).toBeLessThan(10);
    }
  });

  it('IEC 60063: E6 ⊂ E12 ⊂ E24 and E48 is every second E96 value', () => {
    for (const v of E_SERIES.E6) expect(E_SERIES.E12).toContain(v);
    for (const v of E_SERIES.E12) expect(E_SERIES.E24).toContain(v);
    expect(E_SERIES.E48).toEqual(E_SERIES.E96.filter((_, i) => i % 2 === 0));
  });

  it('IEC 60063 (from memory): E48 and E96 are 10^(i/n) rounded to three significant figures', () => {
    for (const name of ['E48', 'E96'] as const) {
      const values = E_SERIES[name];
      values.forEach((v, i) => {
        expect(v, `${name}[${i}]`).toBe(Number((10 ** (i / values.length)).toPrecision(3)));
      });
    }
  });

  it('IEC 60063 (from memory): E24 departs from the two-figure rounding of 10^(i/24) only at its historical values', () => {
    const departures = E_SERIES.E24.filter((v, i) => v !== Number((10 ** (i / 24)).toPrecision(2)));
    expect(departures).toEqual([2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 8.2]);
    // Still within half a step of the ideal geometric ladder.
    E_SERIES.E24.forEach((v, i) => expect(Math.abs(Math.log10(v) * 24 - i)).toBeLessThan(0.5));
  });
});

describe('E_SERIES_TOLERANCE', () => {
  it('IEC 60063 (from memory): E6 ±20 %, E12 ±10 %, E24 ±5 %, E48 ±2 %, E96 ±1 %', () => {
    expect(E_SERIES_TOLERANCE).toEqual({ E6: 20, E12: 10, E24: 5, E48: 2, E96: 1 });
  });
});

describe('nearestPreferredValue', () => {
  // IEC 60063 series, nearest on a logarithmic scale.
  it.each([
    [4900, 'E12', 4700],
    [5000, 'E12', 4700], // log midpoint of 4.7k and 5.6k is about 5.13k
    [5200, 'E12', 5600],
    [9.6, 'E6', 10],
    [0.95, 'E12', 1],
    [1.05, 'E12', 1],
    [1234, 'E96', 1240],
    [1234, 'E48', 1210],
    [47e-9, 'E6', 47e-9],
    [3.0e-12, 'E24', 3.0e-12],
    [3.0e-12, 'E12', 3.3e-12],
    [100_000, 'E24', 100_000],
    [7.9e6, 'E24', 8.2e6],
  ] as const)('IEC 60063: %d in %s → %d', (value, series, expected) => {
    expect(nearestPreferredValue(value, series)).toBe(expected);
  });

  it('accepts a custom ladder, e.g. the 1-2.2-4.7 steps potentiometers come in (common practice, no source)', () => {
    expect(nearestPreferredValue(30_000, [1, 2.2, 4.7])).toBe(22_000);
    expect(nearestPreferredValue(80_000, [1, 2.2, 4.7])).toBe(100_000);
  });

  it('refuses zero, negative and non-finite values', () => {
    expect(() => nearestPreferredValue(0, 'E12')).toThrow(RangeError);
    expect(() => nearestPreferredValue(-4.7, 'E12')).toThrow(RangeError);
    expect(() => nearestPreferredValue(Number.POSITIVE_INFINITY, 'E12')).toThrow(RangeError);
  });
});

describe('isPreferredValue', () => {
  it('IEC 60063: recognises series values at any decade', () => {
    expect(isPreferredValue(4700, 'E12')).toBe(true);
    expect(isPreferredValue(0.47, 'E6')).toBe(true);
    expect(isPreferredValue(5100, 'E12')).toBe(false);
    expect(isPreferredValue(5100, 'E24')).toBe(true);
    expect(isPreferredValue(10_200, 'E96')).toBe(true);
    expect(isPreferredValue(10_200, 'E48')).toBe(false);
    expect(isPreferredValue(4.7 * 1000, 'E12')).toBe(true);
    expect(isPreferredValue(0, 'E12')).toBe(false);
  });
});

describe('preferredValuesBetween', () => {
  it('IEC 60063: lists the ladder across decades, ends included', () => {
    expect(preferredValuesBetween(3300, 15_000, 'E6')).toEqual([3300, 4700, 6800, 10_000, 15_000]);
    expect(preferredValuesBetween(10, 1, 'E6')).toEqual([]);
  });
});
