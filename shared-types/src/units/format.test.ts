import { describe, expect, it } from 'vitest';
import { E_SERIES } from './e-series';
import { formatQuantity } from './format';
import { parseQuantity } from './parse';

describe('formatQuantity', () => {
  // ISO 80000-1: a space separates number and unit symbol, except for the plane-angle degree (from memory).
  it.each([
    [4700, 'Ω', undefined, '4.7 kΩ'],
    [13e6, 'V/s', undefined, '13 V/µs'],
    [13e6, 'V/s', 'V/µs', '13 V/µs'],
    [470e-9, 'F', undefined, '470 nF'],
    [10e-9, 'V/√Hz', undefined, '10 nV/√Hz'],
    [10e-9, 'V/√Hz', 'nV/√Hz', '10 nV/√Hz'],
    [0.1, 'cd', 'mcd', '100 mcd'],
    [630e-9, 'm', 'nm', '630 nm'],
    [1e6, 'Hz', 'MHz', '1 MHz'],
    [0.0025, 'V', 'mV', '2.5 mV'],
    [-40, '°C', undefined, '-40 °C'],
    [5, '%', undefined, '5 %'],
    [30, '°', undefined, '30°'],
    [2, '', undefined, '2'],
    [0, 'Ω', undefined, '0 Ω'],
    [2e-12, 'A', undefined, '2 pA'],
    [150e-9, 'A', undefined, '150 nA'],
  ])('ISO 80000-1 notation: %d %s (display %s) → %s', (v, unit, displayUnit, expected) => {
    expect(formatQuantity(v, unit, displayUnit === undefined ? {} : { displayUnit })).toBe(expected);
  });

  it('writes micro as the micro sign U+00B5 (The Unicode Standard)', () => {
    const text = formatQuantity(4.7e-6, 'F');
    expect(text).toBe('4.7 µF');
    expect(text.includes('\u00B5')).toBe(true);
    expect(text.includes('\u03BC')).toBe(false);
  });

  it('rounds to significant digits and moves to the next prefix (ISO 80000-1 SI prefixes)', () => {
    expect(formatQuantity(4712.3, 'Ω')).toBe('4.71 kΩ');
    expect(formatQuantity(4712.3, 'Ω', { digits: 2 })).toBe('4.7 kΩ');
    expect(formatQuantity(999.96, 'Ω')).toBe('1 kΩ');
    expect(formatQuantity(1 / 3, 'V', { digits: 4 })).toBe('333.3 mV');
  });

  // IEC 60062 RKM code (from memory): letter in place of the decimal point, a trailing 0 after a single digit.
  it.each([
    [0.47, 'R47'],
    [4.7, '4R7'],
    [47, '47R'],
    [470, '470R'],
    [1000, '1K0'],
    [4700, '4K7'],
    [47_000, '47K'],
    [470_000, '470K'],
    [2.2e6, '2M2'],
    [4.7e6, '4M7'],
    [1e9, '1G0'],
    [1020, '1K02'],
  ])('IEC 60062 RKM code: %d Ω → %s', (v, code) => {
    expect(formatQuantity(v, 'Ω', { style: 'rkm' })).toBe(code);
  });

  it.each([
    [4.7e-12, '4p7'],
    [4.7e-9, '4n7'],
    [4.7e-6, '4µ7'],
    [470e-9, '470n'],
    [100e-12, '100p'],
  ])('IEC 60062 RKM code: %d F → %s', (v, code) => {
    expect(formatQuantity(v, 'F', { style: 'rkm' })).toBe(code);
  });

  it('ignores the RKM style for units IEC 60062 gives no code for', () => {
    expect(formatQuantity(15, 'V', { style: 'rkm' })).toBe('15 V');
  });

  it('refuses a display unit that measures something else', () => {
    expect(() => formatQuantity(1, 'V', { displayUnit: 'mA' })).toThrow(TypeError);
    expect(() => formatQuantity(1, 'parsec')).toThrow(TypeError);
  });

  it('shows a dash for values that are not finite', () => {
    expect(formatQuantity(Number.NaN, 'V')).toBe('—');
  });
});

describe('round trip parseQuantity(formatQuantity(v))', () => {
  const decades = [-1, 0, 1, 2, 3, 4, 5, 6];
  const capDecades = [-12, -11, -10, -9, -8, -7, -6];

  for (const name of ['E6', 'E12', 'E24', 'E48', 'E96'] as const) {
    it(`IEC 60063 ${name} series: every value at several decades, in Ω (SI and IEC 60062 RKM) and in F`, () => {
      for (const base of E_SERIES[name]) {
        for (const d of decades) {
          const v = Number(`${base}e${d}`);
          for (const style of ['si', 'rkm'] as const) {
            const text = formatQuantity(v, 'Ω', { style });
            const back = parseQuantity(text, { unit: 'Ω' });
            expect(back, `${v} Ω as ${text}`).toEqual({ ok: true, value: v, unit: 'Ω' });
          }
        }
        for (const d of capDecades) {
          const v = Number(`${base}e${d}`);
          for (const style of ['si', 'rkm'] as const) {
            const text = formatQuantity(v, 'F', { style });
            expect(parseQuantity(text, { unit: 'F' }), `${v} F as ${text}`).toEqual({ ok: true, value: v, unit: 'F' });
          }
        }
      }
    });
  }

  it('ISO 80000-1 SI prefixes: display units round-trip too', () => {
    for (const [v, unit, displayUnit] of [
      [13e6, 'V/s', 'V/µs'],
      [4.5e-9, 'V/√Hz', 'nV/√Hz'],
      [0.12, 'cd', 'mcd'],
      [565e-9, 'm', 'nm'],
      [-40, '°C', undefined],
      [5, '%', undefined],
    ] as const) {
      const text = formatQuantity(v, unit, displayUnit === undefined ? {} : { displayUnit });
      expect(parseQuantity(text, { unit })).toEqual({ ok: true, value: v, unit });
    }
  });
});
