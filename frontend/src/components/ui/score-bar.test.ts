import { describe, expect, it } from 'vitest';
import { formatScore } from './score-bar';

describe('formatScore', () => {
  it('shows whole points', () => {
    expect(formatScore(79.4)).toBe('79');
    expect(formatScore(82.5)).toBe('83');
    expect(formatScore(0)).toBe('0');
  });

  it('keeps 100 for a perfect match only, so a small loss is never rounded away', () => {
    expect(formatScore(100)).toBe('100');
    expect(formatScore(99.9)).toBe('99.9');
    expect(formatScore(99.5)).toBe('99.5');
    expect(formatScore(99.96)).toBe('99.9');
    expect(formatScore(99.4)).toBe('99');
  });
});
