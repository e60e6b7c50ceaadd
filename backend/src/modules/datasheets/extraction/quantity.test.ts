import { getParameter, type ParameterDefinition } from '@understudy/shared-types';
import { describe, expect, it } from 'vitest';
import { normaliseUnitSpelling, readSupplySpan, readValue } from './quantity';

const def = (family: Parameters<typeof getParameter>[0], key: string): ParameterDefinition => getParameter(family, key)!;
const slew = def('op-amp', 'slewRate');
const noise = def('op-amp', 'inputNoiseDensity');
const resistance = def('potentiometer', 'resistance');
const intensity = def('led', 'luminousIntensity');
const angle = def('led', 'viewingAngle');
const tolerance = def('potentiometer', 'tolerance');
const gamma = def('photoresistor', 'gamma');
const offset = def('op-amp', 'inputOffsetVoltage');

const typ = (text: string, unit: string | null, d: ParameterDefinition) => readValue(text, unit, d)?.slots.typ;

describe('readValue: unit spellings, in SI', () => {
  // SI prefixes per the SI Brochure (9th edition), table 7; "u" for µ and "K" for k are common practice, no source.
  it('micro as U+00B5, U+03BC or u', () => {
    expect(typ('9', 'V/\u00B5s', slew)).toBe(9e6);
    expect(typ('9', 'V/\u03BCs', slew)).toBe(9e6);
    expect(typ('9 V/us', null, slew)).toBe(9e6);
    expect(typ('9', 'V/µS', slew)).toBe(9e6);
  });

  it('kilohms as kΩ, k Ω, kohm, K, k and the ohm sign U+2126', () => {
    for (const [value, unit] of [
      ['4.7', 'kΩ'],
      ['4.7', 'k Ω'],
      ['4.7', 'kohm'],
      ['4.7 K', null],
      ['4k7', null],
      ['4.7', 'k'],
      ['4.7 k\u2126', null],
    ] as const) {
      expect(typ(value, unit, resistance), `${value} ${unit}`).toBeCloseTo(4700, 6);
    }
  });

  it('noise density per √Hz, rtHz and Hz^½', () => {
    for (const unit of ['nV/√Hz', 'nV/rtHz', 'nV/√(Hz)', 'nV/Hz^1/2', 'nV/Hz½']) expect(typ('4.5', unit, noise), unit).toBeCloseTo(4.5e-9, 18);
  });

  it('millicandela, degrees and percent', () => {
    expect(typ('350', 'mcd', intensity)).toBeCloseTo(0.35, 12);
    expect(typ('30', '°', angle)).toBe(30);
    expect(typ('30', 'deg', angle)).toBe(30);
    expect(typ('30°', null, angle)).toBe(30);
    expect(typ('±20 %', null, tolerance)).toBe(20);
    expect(typ('20%', null, tolerance)).toBe(20);
  });

  it('a plain number for a unitless parameter, and nothing for a number with a unit', () => {
    expect(typ('0.7', null, gamma)).toBe(0.7);
    expect(readValue('2 mm', null, def('potentiometer', 'gangs'))).toBeNull();
  });

  it('qualifiers, ranges, magnitudes and blanks', () => {
    expect(readValue('≥ 1 MΩ', null, def('photoresistor', 'darkResistance'))?.slots).toEqual({ min: 1e6 });
    expect(readValue('max 2', 'mV', offset)?.slots).toEqual({ max: 0.002 });
    expect(readValue('6 V/µs min', null, slew)?.slots).toEqual({ min: 6e6 });
    expect(readValue('8 kΩ to 15 kΩ', null, def('photoresistor', 'lightResistance'))?.slots).toEqual({ min: 8000, max: 15000 });
    expect(readValue('8–15', 'kΩ', def('photoresistor', 'lightResistance'))?.slots).toEqual({ min: 8000, max: 15000 });
    expect(readValue('±0.5', 'mV', offset)).toMatchObject({ slots: { typ: 0.0005 }, plusMinus: true });
    for (const blank of ['—', '–', '-', 'n/a', '']) expect(readValue(blank, 'mV', offset)).toBeNull();
  });

  it('a bare number with no unit anywhere is read in the display unit and flagged', () => {
    expect(readValue('13', null, slew)).toMatchObject({ slots: { typ: 13e6 }, unitGuessed: true });
    // Bias current has no display unit, so a bare number could be nA or pA: not read.
    expect(readValue('80', null, def('op-amp', 'inputBiasCurrent'))).toBeNull();
  });

  it('refuses another quantity', () => {
    expect(readValue('100', 'dB', offset)).toBeNull();
    expect(readValue('2', 'µV/°C', offset)).toBeNull();
  });
});

describe('readSupplySpan', () => {
  // The catalog stores the span between the rails; a dual ±X V supply is 2X V (shared definition of supplyVoltage).
  it('dual and single ranges', () => {
    expect(readSupplySpan('±1.5 V to ±16 V', null)).toEqual({ min: 3, max: 32 });
    expect(readSupplySpan('4.5 to 36 V', null)).toEqual({ min: 4.5, max: 36 });
    expect(readSupplySpan('3 V – 32 V', null)).toEqual({ min: 3, max: 32 });
    expect(readSupplySpan('±2.25 to ±18', 'V')).toEqual({ min: 4.5, max: 36 });
  });
});

describe('normaliseUnitSpelling', () => {
  it('folds look-alikes and reads a dash between numbers as a range', () => {
    expect(normaliseUnitSpelling('3–32 V')).toBe('3 to 32 V');
    expect(normaliseUnitSpelling('−40 °C')).toBe('-40 °C');
    expect(normaliseUnitSpelling('10 nV/Hz^1/2')).toBe('10 nV/√Hz');
    expect(normaliseUnitSpelling('25 deg C')).toBe('25 °C');
  });
});
