import { describe, expect, it } from 'vitest';
import { parseRange, parseSupplySpan } from './range';

describe('parseRange', () => {
  // ISO 80000-1 writes a range as "3 V to 32 V" (from memory); dashes, "…" and a unit written once on the
  // right are common practice, no source.
  it.each([
    ['3 to 32 V', 3, 32, 'V'],
    ['3–32 V', 3, 32, 'V'],
    ['3-32V', 3, 32, 'V'],
    ['3 V to 32 V', 3, 32, 'V'],
    ['4.5 V to 36 V', 4.5, 36, 'V'],
    ['3 V to 32', 3, 32, 'V'],
    ['-40 °C to 125 °C', -40, 125, '°C'],
    ['−40 to +85 °C', -40, 85, '°C'],
    ['-40-85°C', -40, 85, '°C'],
    ['-40 - -10 °C', -40, -10, '°C'],
    ['10k to 100 kHz', 1e4, 1e5, 'Hz'],
    ['1k…10k', 1e3, 1e4, 'Ω'],
    ['5 V', 5, 5, 'V'],
    ['100 to 470 nF', 100e-9, 470e-9, 'F'],
    ['1 to 10 mA', 0.001, 0.01, 'A'],
  ])('ISO 80000-1 range, "to" form, or common-practice dash: %s', (input, min, max, unit) => {
    expect(parseRange(input)).toEqual({ ok: true, min, max, unit });
  });

  it('reads ±15 V as the span from -15 V to +15 V (common practice, no source)', () => {
    expect(parseRange('±15 V')).toEqual({ ok: true, min: -15, max: 15, unit: 'V' });
  });

  it('reads ±1.5 V to ±16 V as magnitudes with dual set (common practice, no source)', () => {
    expect(parseRange('±1.5 V to ±16 V')).toEqual({ ok: true, min: 1.5, max: 16, unit: 'V', dual: true });
  });

  it('takes the expected unit for bare ends (ISO 80000-1 SI prefixes)', () => {
    expect(parseRange('1 to 10', { unit: 'A', displayUnit: 'mA' })).toEqual({ ok: true, min: 0.001, max: 0.01, unit: 'A' });
    expect(parseRange('1 to 10 mA', { unit: 'A' })).toEqual({ ok: true, min: 0.001, max: 0.01, unit: 'A' });
    expect(parseRange('1m to 10m', { unit: 'A' })).toEqual({ ok: true, min: 0.001, max: 0.01, unit: 'A' });
  });

  it('refuses a backwards range, mixed units, mixed ± and missing ends', () => {
    expect(parseRange('32 to 3 V')).toEqual({ ok: false, error: '"32 to 3 V" runs backwards: 32 V is above 3 V' });
    expect(parseRange('3 V to 5 A').ok).toBe(false);
    expect(parseRange('±1.5 V to 16 V').ok).toBe(false);
    expect(parseRange('3 to').ok).toBe(false);
    expect(parseRange('').ok).toBe(false);
    expect(parseRange('3 to 5 to 7 V').ok).toBe(false);
    expect(parseRange('3 to 32 V', { unit: 'A' })).toEqual({ ok: false, error: 'expected a current in A, got V' });
  });
});

describe('parseSupplySpan', () => {
  // Total span between the rails: a dual ±X V supply is 2X V (common practice, no source).
  it.each([
    ['±15 V', 30, 30],
    ['±1.5 V to ±16 V', 3, 32],
    ['3 V to 32 V', 3, 32],
    ['3 to 32 V', 3, 32],
    ['4.5 V to 36 V', 4.5, 36],
    ['-15 V to +15 V', 30, 30],
    ['±2.25 to ±18 V', 4.5, 36],
    ['5', 5, 5],
  ])('common practice, no source: %s spans %d to %d V', (input, min, max) => {
    expect(parseSupplySpan(input)).toEqual({ ok: true, min, max, unit: 'V' });
  });

  it('takes the widest span when a datasheet gives both forms (common practice, no source)', () => {
    expect(parseSupplySpan('3 V to 32 V or ±1.5 V to ±16 V')).toEqual({ ok: true, min: 3, max: 32, unit: 'V' });
    expect(parseSupplySpan('5 V to 36 V (±2.5 V to ±18 V)')).toEqual({ ok: true, min: 5, max: 36, unit: 'V' });
    expect(parseSupplySpan('±5 V to ±15 V; 4 V to 36 V')).toEqual({ ok: true, min: 4, max: 36, unit: 'V' });
  });

  it('refuses spans that are not voltages or are negative', () => {
    expect(parseSupplySpan('3 to 32 mA')).toEqual({ ok: false, error: 'expected a voltage in V, got A' });
    expect(parseSupplySpan('-5 V').ok).toBe(false);
    expect(parseSupplySpan('').ok).toBe(false);
  });
});
