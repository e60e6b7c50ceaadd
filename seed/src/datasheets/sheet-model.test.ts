import { describe, expect, it } from 'vitest';
import { createDeck, createRng } from './prng';
import { applyUnitStyle, CANONICAL_STYLE, choosePrefix, numberText } from './quantity-text';
import { measuredRow, proseSentence, TruthBuilder } from './sheet-model';

describe('quantity text', () => {
  it('prints plain numbers and picks the prefix that reads naturally', () => {
    expect(numberText(0.5)).toBe('0.5');
    expect(numberText(2856)).toBe('2856');
    expect(choosePrefix([10e6], ['M', 'k'])).toBe('M');
    expect(choosePrefix([500e3], ['M', 'k'])).toBe('k');
    expect(choosePrefix([100e-9, 500e-9], ['m', 'µ', 'n'])).toBe('n');
    // Per-time units carry the prefix in the denominator: 9e6 V/s is 9 V/µs.
    expect(choosePrefix([9e6], ['µ'], undefined, true)).toBe('µ');
  });

  it('rewrites canonical glyphs into each spelling habit', () => {
    const text = '10 kΩ, 1 MΩ, 9 V/µs, 5 nV/√Hz, 30°, ±20 %, −40 °C';
    expect(applyUnitStyle(text, CANONICAL_STYLE)).toBe(text);
    expect(applyUnitStyle(text, { ...CANONICAL_STYLE, micro: 'u', rootHz: 'rtHz', degree: 'deg', percent: 'tight', minus: '-', ohm: 'word' })).toBe(
      '10 kohm, 1 Mohm, 9 V/us, 5 nV/rtHz, 30 deg, ±20%, -40 °C',
    );
    expect(applyUnitStyle(text, { ...CANONICAL_STYLE, micro: 'μ', ohm: 'capital-letter' })).toBe('10K, 1M, 9 V/μs, 5 nV/√Hz, 30°, ±20 %, −40 °C');
    expect(applyUnitStyle('4.7 kΩ', { ...CANONICAL_STYLE, ohm: 'letter' })).toBe('4.7k');
    expect(applyUnitStyle('kΩ', { ...CANONICAL_STYLE, ohm: 'spaced' })).toBe('k Ω');
  });
});

describe('rows and truth', () => {
  it('reads the truth back from the printed numbers', () => {
    const row = measuredRow({ parameter: 'Slew rate', key: 'slewRate', dim: 'V/s', si: { min: 6e6, typ: 9e6 }, prefixes: ['µ'] });
    expect(row).toMatchObject({ unit: 'V/µs', values: { min: '6', typ: '9' }, truth: { key: 'slewRate', si: { min: 6e6, typ: 9e6 } } });
    const offset = measuredRow({ parameter: 'Offset', key: 'inputOffsetVoltage', dim: 'V', si: { typ: 0.5e-3, max: 3e-3 }, prefixes: ['m', 'µ'], prefer: 'µ', plusMinus: true });
    expect(offset.values).toEqual({ typ: '±500', max: '±3000' });
    expect(offset.unit).toBe('µV');
  });

  it('keeps only real keys and the slots their definitions allow, and refuses contradictions', () => {
    const truth = new TruthBuilder('op-amp', { partNumber: 'ZT-1', manufacturer: 'Harrowgate Microsystems' });
    truth.add({ key: 'gainBandwidth', si: { min: 7e6, typ: 10e6 } });
    truth.add({ key: 'supplyVoltage', si: { min: 4, max: 36 } });
    expect(truth.build().parameters).toEqual({ gainBandwidth: { typ: 10e6, unit: 'Hz' }, supplyVoltage: { min: 4, max: 36, unit: 'V' } });
    expect(() => truth.add({ key: 'slewRatio', si: { typ: 1 } })).toThrow(/no op-amp parameter/);
    expect(() => truth.add({ key: 'supplyVoltage', si: { max: 32 } })).toThrow(/both stated/);
  });

  it('words prose so that the slot is unambiguous', () => {
    const dark = measuredRow({ parameter: 'Dark resistance', key: 'darkResistance', dim: 'Ω', si: { min: 1e6 }, prefixes: ['M'], phrase: 'the dark resistance' });
    expect(proseSentence(dark, 1)).toBe('The dark resistance is at least 1 MΩ.');
    const slew = measuredRow({ parameter: 'Slew rate', key: 'slewRate', dim: 'V/s', si: { typ: 9e6 }, prefixes: ['µ'], phrase: 'the slew rate' });
    expect(proseSentence(slew, 3)).toBe('The slew rate is typically 9 V/µs.');
  });
});

describe('prng', () => {
  it('repeats for a seed and deals every card of a deck once per pass', () => {
    const a = createRng(1);
    const b = createRng(1);
    expect(Array.from({ length: 5 }, () => a.next())).toEqual(Array.from({ length: 5 }, () => b.next()));
    const deal = createDeck(createRng(2), ['x', 'y', 'z']);
    expect([deal(), deal(), deal()].sort()).toEqual(['x', 'y', 'z']);
  });
});
