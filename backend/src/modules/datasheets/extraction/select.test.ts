import { describe, expect, it } from 'vitest';
import type { Candidate } from './recognise/candidate';
import { selectProposals } from './select';

function candidate(over: Partial<Candidate> & Pick<Candidate, 'key' | 'value'>): Candidate {
  return {
    statedUnit: null,
    origin: 'table',
    conditionsText: null,
    confidence: 0.9,
    source: { page: 1, snippet: over.key, boxes: [] },
    order: 0,
    offNominal: false,
    rank: 0,
    ...over,
  };
}

describe('selectProposals', () => {
  it('keeps one proposal per key and numbers them in document order', () => {
    const out = selectProposals('op-amp', [
      candidate({ key: 'slewRate', value: { typ: 9e6 }, order: 20 }),
      candidate({ key: 'channels', value: { typ: 2 }, order: 1 }),
      candidate({ key: 'slewRate', value: { typ: 7e6 }, order: 30, confidence: 0.5, origin: 'prose' }),
    ]);
    expect(out.map((p) => [p.id, p.key, p.value])).toEqual([
      ['p1', 'channels', { typ: 2 }],
      ['p2', 'slewRate', { typ: 9e6 }],
    ]);
  });

  it('prefers nominal conditions, then tables over prose, then confidence, then the first reading', () => {
    const pick = (...cs: Candidate[]) => selectProposals('op-amp', cs)[0]!.value.typ;
    expect(pick(candidate({ key: 'slewRate', value: { typ: 1 }, offNominal: true, confidence: 1 }), candidate({ key: 'slewRate', value: { typ: 2 }, origin: 'prose', confidence: 0.5 }))).toBe(2);
    expect(pick(candidate({ key: 'slewRate', value: { typ: 1 }, origin: 'prose', confidence: 0.9 }), candidate({ key: 'slewRate', value: { typ: 2 }, confidence: 0.6 }))).toBe(2);
    expect(pick(candidate({ key: 'slewRate', value: { typ: 1 }, order: 5 }), candidate({ key: 'slewRate', value: { typ: 2 }, order: 9 }))).toBe(1);
  });

  it('prefers the supply most figures were measured at', () => {
    const out = selectProposals('op-amp', [
      candidate({ key: 'slewRate', value: { typ: 7e6, conditions: { supply: 10 } }, order: 1 }),
      candidate({ key: 'slewRate', value: { typ: 9e6, conditions: { supply: 30 } }, order: 10 }),
      candidate({ key: 'gainBandwidth', value: { typ: 1e7, conditions: { supply: 30 } }, order: 11 }),
    ]);
    expect(out.find((p) => p.key === 'slewRate')!.value.typ).toBe(9e6);
  });

  it('shares a per-package supply current out over the channels', () => {
    const out = selectProposals('op-amp', [
      candidate({ key: 'channels', value: { typ: 4 } }),
      candidate({ key: 'quiescentCurrent', value: { typ: 0.004, max: 0.006 }, perPackage: true }),
    ]);
    expect(out.find((p) => p.key === 'quiescentCurrent')!.value).toEqual({ typ: 0.001, max: 0.0015 });
  });

  it("adds an LED's rated current from the limits table to its test current", () => {
    const [p] = selectProposals('led', [
      candidate({ key: 'forwardCurrent', value: { typ: 0.02 } }),
      candidate({ key: 'forwardCurrent', value: { max: 0.03 }, origin: 'absolute-maximum' }),
    ]);
    expect(p!.value).toEqual({ typ: 0.02, max: 0.03 });
  });

  it('shows stated units with the micro sign', () => {
    const [p] = selectProposals('op-amp', [candidate({ key: 'slewRate', value: { typ: 9e6 }, statedUnit: 'V/\u03BCs' })]);
    expect(p!.statedUnit).toBe('V/\u00B5s');
  });
});
