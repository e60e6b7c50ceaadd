import { describe, expect, it } from 'vitest';
import { RankedPairSchema, type BreakdownLine } from '../alternates';
import { pairAsOptocoupler, pairDriveCurrent, rankPairs } from './pairs';
import { scoreCandidate } from './rank';
import { testPart, vactrol, variant, withParams } from './test-parts';

// The original: 2 kΩ at 10 mA, 10 MΩ dark, 5 ms on, 50 ms off, 40 mA LED maximum.
const original = vactrol();

// A green LED of 50 mcd at 20 mA, and a cell peaking at the same 540 nm, so the spectral factor is 1. At 10 mA and
// 5 mm: E = Iv·(I/Itest)/d² = 0.05 cd × ½ / (5 mm)² = 1000 lx (inverse-square law of illuminance, textbook
// photometry). With R10 from 10 kΩ to 40 kΩ (typically √(10k·40k) = 20 kΩ) and γ = 0.5:
// R = R10·(E/10 lx)^−γ = 20 kΩ × 100^−0.5 = 2 kΩ (the gamma law, common practice, no source) — the original's figure.
const led = testPart(
  'led',
  'LD-540G',
  {
    colour: { value: 'green' },
    peakWavelength: { typ: 540e-9 },
    forwardVoltage: { typ: 2.1, max: 2.6, conditions: { current: 20e-3 } },
    forwardCurrent: { typ: 20e-3, max: 30e-3 },
    luminousIntensity: { typ: 0.05, conditions: { current: 20e-3 } },
  },
  { package: 'led-5mm', pinLayout: 'led-2lead' },
);
const cell = testPart(
  'photoresistor',
  'LX-2K',
  {
    darkResistance: { min: 10e6, conditions: { time: 10 } },
    lightResistance: { min: 10e3, max: 40e3 },
    gamma: { typ: 0.5 },
    peakWavelength: { typ: 540e-9 },
    riseTime: { typ: 5e-3 },
    decayTime: { typ: 50e-3 },
    cellMaterial: { value: 'cds' },
  },
  { package: 'radial', pinLayout: 'photoresistor-2lead', rohsStatus: 'exempt' },
);
const drive = { driveCurrentA: 10e-3, spacingM: 5e-3 };

const names = (r: { items: { partNumber: string }[] }) => r.items.map((i) => i.partNumber);
const line = (pair: { breakdown: BreakdownLine[] }, criterion: string) => pair.breakdown.find((l) => l.criterion === criterion)!;

describe('pairAsOptocoupler', () => {
  it('estimates the on resistance by the inverse-square law and R = R10·(E/10 lx)^−γ, worked by hand', () => {
    const pair = pairAsOptocoupler(led, cell, drive);
    if (!pair.ok) throw new Error(pair.gaps.join('; '));
    // Inverse-square law of illuminance (textbook photometry): 0.05 cd × (10 mA / 20 mA) / (0.005 m)² = 1000 lx.
    expect(pair.estimate.illuminanceLux).toBeCloseTo(1000, 9);
    expect(pair.estimate.spectralFactor).toBe(1);
    // R = R10·(E/10 lx)^−γ (common practice, no source): 20 kΩ × (1000/10)^−0.5 = 2 kΩ.
    expect(pair.estimate.resistanceOhms.typical).toBeCloseTo(2e3, 6);
    // High end: the top of the light resistance and half the light: 40 kΩ × (500/10)^−0.5 = 5.657 kΩ.
    expect(pair.estimate.resistanceOhms.high).toBeCloseTo(40e3 / Math.sqrt(50), 6);
    expect(pair.part.parameters.onResistance).toEqual({ typ: pair.estimate.resistanceOhms.typical, max: pair.estimate.resistanceOhms.high, conditions: { current: 10e-3 } });
  });

  it('takes the rest from the two parts: dark resistance, LED ratings, the cell timings and material', () => {
    const pair = pairAsOptocoupler(led, cell, drive);
    if (!pair.ok) throw new Error('no pair');
    const p = pair.part;
    expect(p.id).toBe(`${led.id}+${cell.id}`);
    expect(p.family).toBe('optocoupler');
    expect(p.partNumber).toBe('LD-540G + LX-2K');
    expect(p.parameters.offResistance).toEqual({ min: 10e6, conditions: { time: 10 } });
    expect(p.parameters.ledForwardVoltage).toEqual({ typ: 2.1, max: 2.6, conditions: { current: 20e-3 } });
    expect(p.parameters.ledMaxCurrent).toEqual({ max: 30e-3 });
    expect(p.parameters.turnOnTime).toEqual({ typ: 5e-3 });
    expect(p.parameters.turnOffTime).toEqual({ typ: 50e-3 });
    expect(p.parameters.cellMaterial).toEqual({ value: 'cds' });
  });

  it('carries the worse lifecycle and the worse RoHS status of the two', () => {
    const made = (l: typeof led, c: typeof cell) => {
      const pair = pairAsOptocoupler(l, c, drive);
      if (!pair.ok) throw new Error('no pair');
      return pair.part;
    };
    expect(made(variant(led, 'LD-N', { lifecycle: 'nrnd' }), variant(cell, 'LX-L', { lifecycle: 'last-time-buy' })).lifecycle).toBe('last-time-buy');
    expect(made(variant(led, 'LD-O', { lifecycle: 'obsolete' }), cell).lifecycle).toBe('obsolete');
    // A compliant LED with an exempt CdS cell is under the exemption; an unknown LED is worse than that.
    expect(made(led, cell).rohsStatus).toBe('exempt');
    expect(made(variant(led, 'LD-U', { rohsStatus: 'unknown' }), cell).rohsStatus).toBe('unknown');
    // A CdS cell recorded as compliant with no exemption counts as not compliant, as the RoHS criterion reads it.
    expect(made(led, variant(cell, 'LX-C', { rohsStatus: 'compliant' })).rohsStatus).toBe('non-compliant');
  });

  it('names the gaps when no estimate can be made', () => {
    const dark = withParams(led, { luminousIntensity: undefined }, 'LD-DARK');
    expect(pairAsOptocoupler(dark, cell, drive)).toEqual({ ok: false, gaps: ['LD-DARK states no luminous intensity'] });
  });
});

describe('pairDriveCurrent', () => {
  it("uses the original's on-resistance current, else half its LED maximum, else an assumed 10 mA", () => {
    expect(pairDriveCurrent(original)).toMatchObject({ currentA: 10e-3, source: 'stated' });
    const noCondition = withParams(original, { onResistance: { typ: 2e3 } });
    expect(pairDriveCurrent(noCondition)).toMatchObject({ currentA: 20e-3, source: 'half-maximum' });
    expect(pairDriveCurrent(noCondition).why).toMatch(/half the original's 40 mA LED maximum/);
    const bare = withParams(noCondition, { ledMaxCurrent: undefined });
    expect(pairDriveCurrent(bare)).toMatchObject({ currentA: 10e-3, source: 'assumed' });
    expect(pairDriveCurrent(bare).why).toMatch(/assumed.*common practice, no source/);
  });
});

describe('rankPairs', () => {
  it('puts the pair whose estimate lands on the original ahead of one a decade off', () => {
    // 100 kΩ to 400 kΩ at 10 lx: ten times the resistance under the same light, 20 kΩ for the original's 2 kΩ.
    const far = variant(cell, 'LX-20K', {}, { lightResistance: { min: 100e3, max: 400e3 } });
    const r = rankPairs(original, [led], [far, cell], {});
    expect(names(r)).toEqual(['LD-540G + LX-2K', 'LD-540G + LX-20K']);
    const near = line(r.items[0]!, 'onResistance');
    expect(near.points).toBe(0);
    expect(near.reason).toMatch(/^estimated on resistance 2 kΩ/);
    // A decade off on the near-log curve (scale one decade) costs the whole share.
    const off = line(r.items[1]!, 'onResistance');
    expect(off.points).toBe(-off.maxPoints);
    expect(off.reason).toMatch(/10× the original's 2 kΩ/);
  });

  it('marks down a slow-decay cell on turn-off time', () => {
    const slow = variant(cell, 'LX-SLOW', {}, { decayTime: { typ: 500e-3 } });
    const r = rankPairs(original, [led], [slow, cell], {});
    expect(names(r)).toEqual(['LD-540G + LX-2K', 'LD-540G + LX-SLOW']);
    expect(line(r.items[0]!, 'turnOffTime').points).toBe(0);
    const off = line(r.items[1]!, 'turnOffTime');
    expect(off.points).toBe(-off.maxPoints);
    expect(r.items[0]!.score - r.items[1]!.score).toBeCloseTo(off.maxPoints, 1);
  });

  it('scores with the optocoupler criteria and weights, as scoreCandidate does for one package', () => {
    const pair = pairAsOptocoupler(led, cell, drive);
    if (!pair.ok) throw new Error('no pair');
    const weights = { onResistance: 5, pinout: 0 };
    const [item] = rankPairs(original, [led], [cell], { weights }).items;
    const direct = scoreCandidate(original, pair.part, { weights, pinoutOf: () => item!.pinout });
    expect(item!.score).toBe(direct.score);
    expect(item!.breakdown.map((l) => l.criterion)).toEqual(direct.breakdown.map((l) => l.criterion));
    // The only thing lost at these weights: the LED's 30 mA maximum against the original's 40 mA.
    expect(100 + item!.breakdown.reduce((s, l) => s + l.points, 0)).toBeCloseTo(item!.score, 1);
  });

  it('says in plain words that a pair is two parts in place of one package', () => {
    const [item] = rankPairs(original, [led], [cell], {}).items;
    const pinout = line(item!, 'pinout');
    expect(pinout.reason).toMatch(/^two parts in place of one package, so the board layout changes; never a drop-in: −/);
    expect(pinout.reason).not.toMatch(/pin map/);
    expect(item!.pinout).toMatchObject({ class: 'adapter', packageChange: { from: 'opto-4lead', to: 'led-5mm + radial' } });
    // Without the original's pin map nothing is scored, but the line still says what the change is.
    const unmapped = variant(original, 'VX-NOMAP', { pinLayout: null, pinMap: {} });
    const bare = line(rankPairs(unmapped, [led], [cell], {}).items[0]!, 'pinout');
    expect(bare.points).toBe(0);
    expect(bare.reason).toMatch(/^two parts in place of one package/);
  });

  it('offers no pair when a drop-in is required, and says why', () => {
    const r = rankPairs(original, [led], [cell], { requireDropIn: true });
    expect(r.items).toEqual([]);
    expect(r.note).toMatch(/never a drop-in/);
  });

  it('makes a pair with an obsolete LED obsolete: turned down unless obsolete parts are allowed', () => {
    const old = variant(led, 'LD-OLD', { lifecycle: 'obsolete' });
    const r = rankPairs(original, [old, led], [cell], {});
    expect(names(r)).toEqual(['LD-540G + LX-2K']);
    expect(r.unsuitable.map((u) => u.reasons)).toEqual([['LD-OLD is obsolete']]);
    expect(r.note).toMatch(/1 pair with an obsolete part/);
    const allowed = rankPairs(original, [old, led], [cell], { allowObsolete: true });
    expect(names(allowed)).toEqual(['LD-540G + LX-2K', 'LD-OLD + LX-2K']);
    expect(allowed.items[1]!.lifecycle).toBe('obsolete');
    expect(line(allowed.items[1]!, 'lifecycle').points).toBe(-line(allowed.items[1]!, 'lifecycle').maxPoints);
  });

  it('turns down a pair whose LED is rated below the drive current, or states no rating', () => {
    const weak = variant(led, 'LD-5MA', {}, { forwardCurrent: { typ: 2e-3, max: 5e-3 } });
    const unrated = variant(led, 'LD-NR', {}, { forwardCurrent: { typ: 20e-3 } });
    const r = rankPairs(original, [weak, unrated, led], [cell], {});
    expect(names(r)).toEqual(['LD-540G + LX-2K']);
    expect(r.considered).toBe(3);
    expect(Object.fromEntries(r.unsuitable.map((u) => [u.led.partNumber, u.reasons]))).toEqual({
      'LD-5MA': ['LD-5MA is rated for 5 mA, below the 10 mA drive current'],
      'LD-NR': ['LD-NR states no rated current, so it cannot be shown to carry the 10 mA drive'],
    });
    expect(r.note).toMatch(/2 pairs with an LED not shown to carry 10 mA/);
  });

  it('names the drive current and the spacing in every estimate, and calls it one to confirm on the bench', () => {
    const bare = withParams(original, { onResistance: { typ: 2e3 }, ledMaxCurrent: undefined });
    const r = rankPairs(bare, [led], [cell], {});
    const [item] = r.items;
    expect(item!.driveCurrentA).toBe(10e-3);
    expect(item!.spacingM).toBe(5e-3);
    const all = item!.estimate.assumptions.join(' ');
    expect(all).toMatch(/driven at 10 mA: an assumed drive/);
    expect(all).toMatch(/5 mm from the cell.*common practice, no source/);
    expect(item!.estimate.note).toMatch(/bench/);
    expect(r.note).toMatch(/5 mm from the cell at 10 mA/);
    expect(RankedPairSchema.parse(item)).toEqual(item);
  });

  it('keeps the best ten, and refuses an original that is not an optocoupler', () => {
    const cells = Array.from({ length: 12 }, (_, i) => variant(cell, `LX-${String(i).padStart(2, '0')}`, {}, { decayTime: { typ: 50e-3 * (1 + i / 4) } }));
    const r = rankPairs(original, [led], cells, {});
    expect(r.items).toHaveLength(10);
    expect(r.considered).toBe(12);
    expect(names(r)[0]).toBe('LD-540G + LX-00');
    expect(rankPairs(original, [led], cells, { limit: 3 }).items).toHaveLength(3);
    expect(() => rankPairs(cell, [led], [cell], {})).toThrow(RangeError);
  });
});
