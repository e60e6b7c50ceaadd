import { describe, expect, it } from 'vitest';
import { FAMILY_KEYS } from '../families';
import { criteriaFor, defaultWeights } from './criteria';
import { rankAlternates } from './rank';
import { dualOpAmp, variant } from './test-parts';
import { formatWeights, parseWeights } from './weights';

describe('criteria and default weights', () => {
  it('gives every family criteria with unique keys, defaults within 0..5, lifecycle and RoHS among them', () => {
    for (const family of FAMILY_KEYS) {
      const criteria = criteriaFor(family);
      const keys = criteria.map((c) => c.key);
      expect(new Set(keys).size).toBe(keys.length);
      expect(keys).toContain('lifecycle');
      expect(keys).toContain('rohs');
      for (const c of criteria) {
        expect(c.defaultWeight).toBeGreaterThan(0);
        expect(c.defaultWeight).toBeLessThanOrEqual(5);
        expect(c.description.length).toBeGreaterThan(10);
        expect([family, 'any']).toContain(c.family);
      }
      expect(defaultWeights(family)).toEqual(Object.fromEntries(criteria.map((c) => [c.key, c.defaultWeight])));
    }
  });

  it('lists the op amp criteria the brief asks for', () => {
    expect(criteriaFor('op-amp').map((c) => c.key)).toEqual([
      'supply',
      'singleSupply',
      'slewRate',
      'gainBandwidth',
      'noise',
      'offsetVoltage',
      'biasCurrent',
      'outputCurrent',
      'railToRailInput',
      'railToRailOutput',
      'pinout',
      'lifecycle',
      'rohs',
    ]);
  });

  it('hands out a fresh object each time', () => {
    const a = defaultWeights('led');
    a.peakWavelength = 0;
    expect(defaultWeights('led').peakWavelength).toBe(3);
  });
});

describe('parseWeights', () => {
  it('reads criterion:weight pairs over the defaults', () => {
    const r = parseWeights('slewRate:4,noise:0', 'op-amp');
    expect(r).toEqual({ ok: true, weights: { ...defaultWeights('op-amp'), slewRate: 4, noise: 0 } });
  });

  it('takes the defaults for nothing, and accepts loose spelling', () => {
    expect(parseWeights(undefined, 'op-amp')).toEqual({ ok: true, weights: defaultWeights('op-amp') });
    expect(parseWeights('  ', 'led')).toEqual({ ok: true, weights: defaultWeights('led') });
    const r = parseWeights('SLEWRATE = 4; noise: 0.5 pinout:5', 'op-amp');
    expect(r.ok && [r.weights.slewRate, r.weights.noise, r.weights.pinout]).toEqual([4, 0.5, 5]);
  });

  it('refuses unknown keys, naming the family and the keys it has', () => {
    const r = parseWeights('slewRate:4,gamma:2', 'op-amp');
    expect(r.ok).toBe(false);
    expect(!r.ok && r.error).toMatch(/^"gamma" is not a criterion for op amps; use supply, singleSupply, slewRate/);
  });

  it('refuses weights outside 0..5, non-numbers, repeats and malformed pairs', () => {
    expect(parseWeights('slewRate:6', 'op-amp')).toEqual({ ok: false, error: 'The weight for "slewRate" must be a number from 0 to 5, not "6"' });
    expect(parseWeights('slewRate:-1', 'op-amp').ok).toBe(false);
    expect(parseWeights('slewRate:fast', 'op-amp').ok).toBe(false);
    expect(parseWeights('slewRate:', 'op-amp').ok).toBe(false);
    expect(parseWeights('slewRate:1,slewrate:2', 'op-amp')).toEqual({ ok: false, error: '"slewRate" is given twice' });
    expect(!parseWeights('slewRate', 'op-amp').ok && (parseWeights('slewRate', 'op-amp') as { error: string }).error).toMatch(/write criterion:weight/);
  });
});

describe('formatWeights', () => {
  it('writes only the weights that differ from the defaults, in criterion order', () => {
    expect(formatWeights({ ...defaultWeights('op-amp'), noise: 0, slewRate: 4 }, 'op-amp')).toBe('slewRate:4,noise:0');
    expect(formatWeights(defaultWeights('op-amp'), 'op-amp')).toBe('');
    expect(formatWeights({ gamma: 3 }, 'op-amp')).toBe('');
  });

  it('round-trips through parseWeights', () => {
    const r = parseWeights('rohs:2.5, gamma:0, decayTime:5', 'photoresistor');
    expect(r.ok).toBe(true);
    if (r.ok) expect(formatWeights(r.weights, 'photoresistor')).toBe('gamma:0,decayTime:5,rohs:2.5');
  });
});

describe('weights change the order', () => {
  // One fast and noisy, one slow and quiet: which comes first is the designer's call.
  const original = dualOpAmp();
  const fastNoisy = variant(original, 'FX-FAST', {}, { slewRate: { typ: 20e6 }, inputNoiseDensity: { typ: 60e-9 } });
  const slowQuiet = variant(original, 'FX-QUIET', {}, { slewRate: { typ: 4e6 }, inputNoiseDensity: { typ: 5e-9 } });
  const order = (weights?: Record<string, number>) =>
    rankAlternates(original, [fastNoisy, slowQuiet], weights ? { weights } : {}).items.map((i) => i.part.partNumber);

  it('puts the quiet one first when noise and slew rate weigh the same', () => {
    expect(order()).toEqual(['FX-QUIET', 'FX-FAST']);
  });

  it('puts the fast one first when slew rate dominates and noise is ignored', () => {
    const parsed = parseWeights('slewRate:5,noise:0', 'op-amp');
    expect(parsed.ok).toBe(true);
    if (parsed.ok) expect(order(parsed.weights)).toEqual(['FX-FAST', 'FX-QUIET']);
  });

  it('scores everything 100 when every weight is zero, and ties fall to the part number', () => {
    const zero = Object.fromEntries(criteriaFor('op-amp').map((c) => [c.key, 0]));
    const r = rankAlternates(original, [slowQuiet, fastNoisy], { weights: zero });
    expect(r.items.map((i) => [i.part.partNumber, i.score])).toEqual([
      ['FX-FAST', 100],
      ['FX-QUIET', 100],
    ]);
  });
});
