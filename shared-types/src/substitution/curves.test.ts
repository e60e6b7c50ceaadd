import { describe, expect, it } from 'vitest';
import {
  closenessLinear,
  closenessLog,
  coverage,
  excessLog,
  logRangeMatch,
  marginScore,
  round1,
  shortfallLog,
  spectralResponse,
} from './curves';

describe('scoring curves', () => {
  it('shortfallLog: more is not worse, a tenth of the original loses everything over one decade', () => {
    expect(shortfallLog(13, 20, 1)).toBe(1);
    expect(shortfallLog(13, 13, 1)).toBe(1);
    expect(shortfallLog(10, 1, 1)).toBe(0);
    expect(shortfallLog(10, 0.5, 1)).toBe(0);
    expect(shortfallLog(10, Math.sqrt(10), 1)).toBeCloseTo(0.5, 12);
    // Three decades: pA against nA.
    expect(shortfallLog(1000, 1, 3)).toBe(0);
    expect(shortfallLog(1000, 100, 3)).toBeCloseTo(2 / 3, 12);
  });

  it('excessLog mirrors it for "lower is better"', () => {
    expect(excessLog(4.5, 3, 1)).toBe(1);
    expect(excessLog(1, 10, 1)).toBe(0);
    expect(excessLog(30e-12, 30e-9, 3)).toBeCloseTo(0, 12);
    expect(excessLog(30e-12, 300e-12, 3)).toBeCloseTo(2 / 3, 12);
  });

  it('closenessLog and closenessLinear lose either way', () => {
    expect(closenessLog(10, 20, 1)).toBeCloseTo(closenessLog(10, 5, 1), 12);
    expect(closenessLog(10, 100, 1)).toBe(0);
    expect(closenessLinear(630, 620, 50)).toBeCloseTo(0.8, 12);
    expect(closenessLinear(630, 640, 50)).toBeCloseTo(0.8, 12);
    expect(closenessLinear(630, 530, 50)).toBe(0);
  });

  it('coverage is coverage, not overlap: a point is covered or not', () => {
    expect(coverage(9, 9, 3, 36)).toBe(1);
    expect(coverage(9, 9, 10, 36)).toBe(0);
    expect(coverage(9, 9, 9, 9)).toBe(1);
    expect(coverage(3, 32, 6, 36)).toBeCloseTo(26 / 29, 12);
    expect(coverage(3, 32, 40, 50)).toBe(0);
    expect(coverage(3, 32, 0, 100)).toBe(1);
  });

  it('logRangeMatch: identical ranges score 1, a decade apart and disjoint 0', () => {
    expect(logRangeMatch(10e3, 20e3, 10e3, 20e3).s).toBeCloseTo(1, 12);
    expect(logRangeMatch(10e3, 20e3, 100e3, 200e3).s).toBe(0);
    const half = logRangeMatch(10e3, 20e3, 5e3, 10e3);
    expect(half.covered).toBe(0);
    expect(half.centreRatio).toBeCloseTo(2, 12);
    expect(half.s).toBeCloseTo((1 - Math.log10(2)) / 2, 12);
  });

  it('spectralResponse is one half at half the full width (definition of FWHM)', () => {
    expect(spectralResponse(0, 100e-9)).toBe(1);
    expect(spectralResponse(50e-9, 100e-9)).toBeCloseTo(0.5, 12);
    expect(spectralResponse(-50e-9, 100e-9)).toBeCloseTo(0.5, 12);
    expect(spectralResponse(100e-9, 100e-9)).toBeCloseTo(1 / 16, 12);
  });

  it('marginScore: meeting a need earns one half, margin the rest, saturating', () => {
    expect(marginScore(0, 1)).toBe(0.5);
    expect(marginScore(-1, 1)).toBe(0.5);
    expect(marginScore(1, 1)).toBeCloseTo(0.5 + 0.5 * (1 - Math.exp(-1)), 12);
    expect(marginScore(50, 1)).toBeCloseTo(1, 12);
    expect(marginScore(2, 1)).toBeGreaterThan(marginScore(1, 1));
  });

  it('round1 rounds to tenths without a negative zero', () => {
    expect(round1(12.34)).toBe(12.3);
    expect(Object.is(round1(-0.01), 0)).toBe(true);
  });
});
