import { describe, expect, it } from 'vitest';
import { parseQuantity } from './parse';

function value(input: string, unit?: string) {
  const r = parseQuantity(input, unit === undefined ? undefined : { unit });
  if (!r.ok) throw new Error(`${input}: ${r.error}`);
  return r;
}

// Float-safe comparison: values are built from decimal text, but keep a relative margin anyway.
function expectClose(actual: number, expected: number) {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(Math.abs(expected) * 1e-12);
}

describe('parseQuantity: RKM codes', () => {
  // IEC 60062 RKM code (from memory): the letter marks the decimal point and the multiplier, R = ×1, K = ×10³,
  // M = ×10⁶, G = ×10⁹, T = ×10¹².
  it.each([
    ['R47', 0.47],
    ['0R47', 0.47],
    ['4R7', 4.7],
    ['47R', 47],
    ['470R', 470],
    ['1K0', 1000],
    ['4K7', 4700],
    ['47K', 47_000],
    ['470K', 470_000],
    ['M47', 470_000],
    ['4M7', 4_700_000],
    ['2M2', 2_200_000],
    ['1G0', 1e9],
    ['1T5', 1.5e12],
  ])('IEC 60062 RKM code: %s is %d Ω', (input, expected) => {
    const r = value(input);
    expect(r.unit).toBe('Ω');
    expectClose(r.value, expected);
  });

  it('takes a lower-case k for kilo (common practice, no source)', () => {
    expect(value('4k7')).toEqual({ ok: true, value: 4700, unit: 'Ω' });
    expect(value('2k2', 'Ω').value).toBe(2200);
  });

  // IEC 60062 RKM code for capacitors (from memory): p, n, µ, m and F mark the decimal point.
  it.each([
    ['4p7', 4.7e-12],
    ['4n7', 4.7e-9],
    ['4µ7', 4.7e-6],
    ['4μ7', 4.7e-6], // Greek mu U+03BC, as The Unicode Standard keeps it apart from the micro sign U+00B5
    ['4u7', 4.7e-6], // "u" for micro: common practice, no source
    ['1m5', 1.5e-3],
    ['4F7', 4.7],
    ['p47', 0.47e-12],
  ])('IEC 60062 RKM code: %s is %d F', (input, expected) => {
    const r = value(input);
    expect(r.unit).toBe('F');
    expectClose(r.value, expected);
  });

  it('reads a zener-style 5V1 as 5.1 V (common practice, no source)', () => {
    expect(value('5V1')).toEqual({ ok: true, value: 5.1, unit: 'V' });
  });

  it('IEC 60062 RKM code: accepts a unit symbol after the code', () => {
    expect(value('4k7 Ω').value).toBe(4700);
    expect(value('4K7ohm').value).toBe(4700);
    expect(value('4n7F').value).toBe(4.7e-9);
    expect(value('1M5 Hz')).toEqual({ ok: true, value: 1.5e6, unit: 'Hz' });
  });

  it('IEC 60062 RKM code: a prefix letter takes the field unit; R names ohms and refuses other fields', () => {
    expect(value('4k7', 'V')).toEqual({ ok: true, value: 4700, unit: 'V' });
    const r = parseQuantity('4R7', { unit: 'V' });
    expect(r).toEqual({ ok: false, error: 'expected a voltage in V, got Ω' });
  });
});

describe('parseQuantity: SI prefixes and unit spellings', () => {
  // ISO 80000-1 / SI prefixes: k = 10³, M = 10⁶, m = 10⁻³, µ = 10⁻⁶, n = 10⁻⁹.
  it.each([
    ['4.7k', 4700, 'Ω'],
    ['4.7 kΩ', 4700, 'Ω'],
    ['4.7 kΩ', 4700, 'Ω'], // ohm sign U+2126 (The Unicode Standard maps it to Greek omega U+03A9)
    ['4.7kohm', 4700, 'Ω'],
    ['4.7 kOhms', 4700, 'Ω'],
    ['4.7KΩ', 4700, 'Ω'],
    ['470n', 470e-9, 'F'],
    ['470 nF', 470e-9, 'F'],
    ['10uf', 10e-6, 'F'],
    ['1 MHz', 1e6, 'Hz'],
    ['10 kHz', 1e4, 'Hz'],
    ['2 mA', 2e-3, 'A'],
    ['500 mW', 0.5, 'W'],
    ['100 mcd', 0.1, 'cd'],
    ['630 nm', 630e-9, 'm'],
    ['16 mm', 16e-3, 'm'],
    ['10 ms', 10e-3, 's'],
    ['10 lux', 10, 'lx'],
  ])('ISO 80000-1 SI prefix: %s', (input, expected, unit) => {
    const r = value(input);
    expect(r.unit).toBe(unit);
    expectClose(r.value, expected);
  });

  it('reads "meg" as mega (SPICE scale factor, common practice, no source)', () => {
    expect(value('1meg').value).toBe(1e6);
    expect(value('2.2Meg', 'Ω').value).toBe(2.2e6);
    expect(value('1 megohm').value).toBe(1e6);
  });

  it('keeps m as milli and M as mega, as ISO 80000-1 SI prefixes do', () => {
    expect(value('5 mV').value).toBe(0.005);
    expect(value('5 MV').value).toBe(5e6);
    expect(value('4m7', 'A').value).toBe(0.0047);
    expect(value('4M7', 'A').value).toBe(4.7e6);
  });

  // ISO 80000-1 SI prefixes applied to a quotient unit: 1 V/µs = 10⁶ V/s.
  it.each(['13 V/µs', '13V/us', '13 V/μs', '13 V/µsec', '13 V / µs'])('ISO 80000-1 SI prefix: slew rate %s is 13e6 V/s', (input) => {
    expect(value(input)).toEqual({ ok: true, value: 13e6, unit: 'V/s' });
  });

  it.each(['10 nV/√Hz', '10 nV/rtHz', '10nV/sqrt(Hz)', '10 nV/√(Hz)'])(
    'ISO 80000-1 SI prefix: noise density %s is 10e-9 V/√Hz',
    (input) => {
      expect(value(input)).toEqual({ ok: true, value: 10e-9, unit: 'V/√Hz' });
    },
  );

  it('ISO 80000-1 SI prefix: current noise density in A/√Hz', () => {
    expect(value('1.5 pA/rtHz')).toEqual({ ok: true, value: 1.5e-12, unit: 'A/√Hz' });
  });

  it('keeps °C, ° and % as written (ISO 80000-5 Celsius temperature, ISO 80000-3 degree, ISO 80000-1 percent; from memory)', () => {
    expect(value('-40 °C')).toEqual({ ok: true, value: -40, unit: '°C' });
    expect(value('−40 °C')).toEqual({ ok: true, value: -40, unit: '°C' }); // minus sign U+2212
    expect(value('25 deg C')).toEqual({ ok: true, value: 25, unit: '°C' });
    expect(value('85°C')).toEqual({ ok: true, value: 85, unit: '°C' });
    expect(value('30°')).toEqual({ ok: true, value: 30, unit: '°' });
    expect(value('30 deg')).toEqual({ ok: true, value: 30, unit: '°' });
    // Stored as 5, not 0.05: datasheets and tolerances are quoted in percent.
    expect(value('5 %')).toEqual({ ok: true, value: 5, unit: '%' });
    expect(value('5%')).toEqual({ ok: true, value: 5, unit: '%' });
  });

  it('reads E notation and plain numbers (ISO 80000-1 number notation)', () => {
    expect(value('1.5e3')).toEqual({ ok: true, value: 1500, unit: '' });
    expect(value('2.2E-9', 'F').value).toBe(2.2e-9);
    expect(value('.47', 'Ω').value).toBe(0.47);
    expect(value('+15 V').value).toBe(15);
  });

  it('takes a comma as the decimal sign (ISO 80000-1 allows comma or point, from memory) and spaces around', () => {
    expect(value('4,7k').value).toBe(4700);
    expect(value('  4,7 kΩ  ').value).toBe(4700);
    expect(value('0,47 µF').value).toBe(0.47e-6);
  });

  it('refuses a comma that could be a thousands separator (ISO 80000-1 groups digits by spaces only, from memory)', () => {
    const r = parseQuantity('4,700 Ω');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error).toMatch(/thousands/);
  });

  it('returns the magnitude of ±X with plusMinus set (common practice, no source)', () => {
    expect(value('±15 V')).toEqual({ ok: true, value: 15, unit: 'V', plusMinus: true });
    expect(value('+/-15V')).toEqual({ ok: true, value: 15, unit: 'V', plusMinus: true });
    expect(value('±5 %', '%')).toEqual({ ok: true, value: 5, unit: '%', plusMinus: true });
  });
});

describe('parseQuantity: expected unit', () => {
  it('gives a bare number or a bare prefix the field unit (ISO 80000-1 SI prefixes)', () => {
    expect(value('4700', 'Ω')).toEqual({ ok: true, value: 4700, unit: 'Ω' });
    expect(value('2m', 'A')).toEqual({ ok: true, value: 0.002, unit: 'A' });
    expect(value('470n', 'F').value).toBe(470e-9);
    expect(value('1.5M', 'Hz').value).toBe(1.5e6);
  });

  it('accepts unit aliases for opts.unit (ISO 80000 unit symbols)', () => {
    expect(value('10', 'ohm').unit).toBe('Ω');
    expect(value('10', 'Ω').unit).toBe('Ω');
  });

  it('reads a bare number in the display unit when one is given (ISO 80000-1 SI prefixes)', () => {
    expect(parseQuantity('13', { unit: 'V/s', displayUnit: 'V/µs' })).toEqual({ ok: true, value: 13e6, unit: 'V/s' });
    expect(parseQuantity('100', { unit: 'cd', displayUnit: 'mcd' })).toEqual({ ok: true, value: 0.1, unit: 'cd' });
    // An explicit unit still wins over the display unit.
    expect(parseQuantity('13 V/s', { unit: 'V/s', displayUnit: 'V/µs' })).toEqual({ ok: true, value: 13, unit: 'V/s' });
  });

  it('reads "5m" as metres in a length field but milliamps in a current field (ISO 80000-1 symbols)', () => {
    expect(value('5m', 'm').value).toBe(5);
    expect(value('5 mm', 'm').value).toBe(0.005);
    expect(value('5m', 'A').value).toBe(0.005);
  });

  it('names the mismatch when another unit is typed', () => {
    expect(parseQuantity('15 V', { unit: 'Ω' })).toEqual({ ok: false, error: 'expected a resistance in Ω, got V' });
    expect(parseQuantity('13 V/µs', { unit: 'Hz' })).toEqual({ ok: false, error: 'expected a frequency in Hz, got V/s' });
    expect(parseQuantity('2 mA', { unit: '' })).toEqual({ ok: false, error: 'expected a plain number, got A' });
    expect(parseQuantity('10 lx', { unit: 'A' })).toEqual({ ok: false, error: 'expected a current in A, got lx' });
  });

  it('throws on a unit the code does not know, or a prefixed one (use displayUnit), as programming errors', () => {
    expect(() => parseQuantity('1', { unit: 'furlong' })).toThrow(TypeError);
    expect(() => parseQuantity('1', { unit: 'mA' })).toThrow(TypeError);
    expect(() => parseQuantity('1', { unit: 'A', displayUnit: 'mV' })).toThrow(TypeError);
  });
});

describe('parseQuantity: junk', () => {
  it('explains and suggests what to type', () => {
    expect(parseQuantity('4k7x')).toEqual({
      ok: false,
      error: '"4k7x" is not a number engineers write; try 4k7 or 4.7 kΩ',
    });
    expect(parseQuantity('4.7 kQ', { unit: 'Ω' })).toEqual({
      ok: false,
      error: '"4.7 kQ" is not a number engineers write; try 4.7 kΩ',
    });
    expect(parseQuantity('fast', { unit: 'V/s' })).toEqual({
      ok: false,
      error: '"fast" is not a number engineers write; try 13 V/µs or 13 V/us',
    });
  });

  it.each(['', '   ', 'abc', '4..7k', '4k7k', '1.2.3', 'k', 'V', '5 k%', '10 m°C', '1e', '--5', '1,2,3', '4 7k'])(
    'refuses %j',
    (input) => {
      const r = parseQuantity(input);
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.error.length).toBeGreaterThan(10);
    },
  );

  it('refuses values too large for a number', () => {
    const r = parseQuantity('1e400 Ω');
    expect(r).toEqual({ ok: false, error: '"1e400 Ω" is too large to be a real value' });
  });

  it('refuses non-strings without throwing', () => {
    expect(parseQuantity(undefined as unknown as string).ok).toBe(false);
    expect(parseQuantity(42 as unknown as string).ok).toBe(false);
  });
});
