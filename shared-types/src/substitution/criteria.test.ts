import { describe, expect, it } from 'vitest';
import type { CandidatePart, RankedAlternate } from '../alternates';
import type { ParameterValue } from '../families';
import { round1 } from './curves';
import { rankAlternates, scoreCandidate } from './rank';
import { cdsCell, dualOpAmp, logPot, redLed, testPart, variant } from './test-parts';
import type { RankOptions } from './types';

type Changes = Record<string, ParameterValue | undefined>;
type Extra = Partial<CandidatePart>;

interface Case {
  criterion: string;
  better: [Extra, Changes];
  worse: [Extra, Changes];
  original?: [Extra, Changes];
  options?: RankOptions;
}

function line(item: RankedAlternate, criterion: string) {
  const l = item.breakdown.find((b) => b.criterion === criterion);
  if (!l) throw new Error(`no ${criterion} line`);
  return l;
}

/** Two candidates differing in one criterion only: the better one ranks first and only that line differs. */
function checkCase(base: CandidatePart, c: Case) {
  const original = c.original ? variant(base, base.partNumber, ...c.original) : base;
  const better = variant(original, 'CAND-A', ...c.better);
  const worse = variant(original, 'CAND-B', ...c.worse);
  // Worse listed first in the input, so the order comes from the scores.
  const { items, unsuitable } = rankAlternates(original, [worse, better], c.options ?? {});
  expect(unsuitable).toEqual([]);
  expect(items.map((i) => i.part.partNumber)).toEqual(['CAND-A', 'CAND-B']);
  const [a, b] = items as [RankedAlternate, RankedAlternate];
  expect(a.score).toBeGreaterThan(b.score);
  expect(line(b, c.criterion).points).toBeLessThan(line(a, c.criterion).points);
  expect(line(b, c.criterion).reason).toMatch(/: −\d/);
  for (const l of a.breakdown) {
    if (l.criterion !== c.criterion) expect(line(b, l.criterion).points).toBe(l.points);
  }
}

function addsUp(item: RankedAlternate) {
  expect(item.score).toBe(round1(100 + item.breakdown.reduce((sum, l) => sum + l.points, 0)));
  for (const l of item.breakdown) {
    expect(l.points).toBeLessThanOrEqual(0);
    expect(-l.points).toBeLessThanOrEqual(l.maxPoints + 1e-9);
  }
}

describe('op amp criteria, one at a time', () => {
  const cases: Case[] = [
    { criterion: 'supply', better: [{}, { supplyVoltage: { min: 3, max: 36 } }], worse: [{}, { supplyVoltage: { min: 12, max: 36 } }] },
    { criterion: 'singleSupply', better: [{}, { singleSupply: { value: true } }], worse: [{}, { singleSupply: { value: false } }] },
    { criterion: 'slewRate', better: [{}, { slewRate: { typ: 20e6 } }], worse: [{}, { slewRate: { typ: 5e6 } }] },
    { criterion: 'gainBandwidth', better: [{}, { gainBandwidth: { typ: 10e6 } }], worse: [{}, { gainBandwidth: { typ: 1e6 } }] },
    { criterion: 'noise', better: [{}, { inputNoiseDensity: { typ: 10e-9 } }], worse: [{}, { inputNoiseDensity: { typ: 40e-9 } }] },
    { criterion: 'offsetVoltage', better: [{}, { inputOffsetVoltage: { typ: 1e-3 } }], worse: [{}, { inputOffsetVoltage: { typ: 8e-3 } }] },
    { criterion: 'biasCurrent', better: [{}, { inputBiasCurrent: { typ: 10e-12 } }], worse: [{}, { inputBiasCurrent: { typ: 50e-9 } }] },
    { criterion: 'outputCurrent', better: [{}, { outputCurrent: { typ: 40e-3 } }], worse: [{}, { outputCurrent: { typ: 5e-3 } }] },
    {
      criterion: 'railToRailInput',
      original: [{}, { railToRailInput: { value: true } }],
      better: [{}, { railToRailInput: { value: true } }],
      worse: [{}, { railToRailInput: { value: false } }],
    },
    { criterion: 'railToRailOutput', better: [{}, { railToRailOutput: { value: true } }], worse: [{}, { railToRailOutput: { value: false } }] },
    {
      criterion: 'pinout',
      better: [{ pinLayout: 'dip8-dual-opamp' }, {}],
      worse: [{ pinLayout: null, pinMap: { 1: 'OUT A', 2: '+IN A', 3: '-IN A', 4: 'V-', 5: '+IN B', 6: '-IN B', 7: 'OUT B', 8: 'V+' } }, {}],
    },
    { criterion: 'lifecycle', better: [{ lifecycle: 'active' }, {}], worse: [{ lifecycle: 'nrnd' }, {}] },
    { criterion: 'rohs', better: [{ rohsStatus: 'exempt' }, {}], worse: [{ rohsStatus: 'unknown' }, {}] },
  ];
  for (const c of cases) it(c.criterion, () => checkCase(dualOpAmp(), c));

  it('scores supply by coverage of the operating supply when one is set', () => {
    const original = dualOpAmp();
    const short = variant(original, 'FX-15V', {}, { supplyVoltage: { min: 5, max: 15 } });
    const r = scoreCandidate(original, short, { operatingSupply: { min: 9, max: 18 } });
    const supply = line(r, 'supply');
    // 9..15 of 9..18 is two thirds.
    expect(supply.points).toBe(-round1(supply.maxPoints / 3));
    expect(supply.reason).toMatch(/^supply range 5 V to 15 V covers 67 % of the operating supply 9 V to 18 V: −/);
    expect(supply.original).toBe('6 V to 36 V');
    const point = scoreCandidate(original, short, { operatingSupply: { min: 24, max: 24 } });
    expect(line(point, 'supply').reason).toMatch(/^supply range 5 V to 15 V does not cover the operating supply 24 V: −/);
  });

  it('explains in display units and adds up to the score', () => {
    const original = dualOpAmp();
    const slower = variant(original, 'FX-SLOW', {}, { slewRate: { typ: 9e6 } });
    const r = scoreCandidate(original, slower, {});
    const slew = line(r, 'slewRate');
    expect(slew.original).toBe('13 V/µs');
    expect(slew.candidate).toBe('9 V/µs');
    // Share 2/21 of 100 = 9.5; s = 1 − log10(13/9) = 0.84; cost 1.5.
    expect(slew.maxPoints).toBe(9.5);
    expect(slew.points).toBe(-1.5);
    expect(slew.reason).toBe("slew rate 9 V/µs is below the original's 13 V/µs: −1.5");
    expect(line(r, 'noise').reason).toBe("noise 18 nV/√Hz matches the original's");
    addsUp(r);
    expect(r.score).toBe(98.5);
  });

  it('costs half the share when the candidate does not state a value', () => {
    const original = dualOpAmp();
    const r = scoreCandidate(original, variant(original, 'FX-QUIET?', {}, { inputNoiseDensity: undefined }), {});
    const noise = line(r, 'noise');
    expect(noise.candidate).toBeNull();
    expect(noise.points).toBe(-round1(noise.maxPoints / 2));
    expect(noise.reason).toBe(`noise not stated: −${Math.abs(noise.points)}`);
    addsUp(r);
  });

  it('costs nothing when the original does not state a value', () => {
    const original = variant(dualOpAmp(), 'FX-OLD', {}, { gainBandwidth: undefined });
    const r = scoreCandidate(original, variant(original, 'FX-NEW', {}, { gainBandwidth: { typ: 0.1e6 } }), {});
    const gbw = line(r, 'gainBandwidth');
    expect(gbw.points).toBe(0);
    expect(gbw.original).toBeNull();
    expect(gbw.candidate).toBe('0.1 MHz');
    expect(gbw.reason).toBe('the original states no gain-bandwidth, so it is not compared');
  });

  it('lets a FET-input original lose the whole bias-current share to a bipolar input', () => {
    const original = dualOpAmp();
    const bipolar = scoreCandidate(original, variant(original, 'FX-BIP', {}, { inputBiasCurrent: { typ: 80e-9 } }), {});
    const bias = line(bipolar, 'biasCurrent');
    expect(bias.points).toBe(-bias.maxPoints);
    expect(bias.reason).toMatch(/^input bias current 80 nA is above the original's 30 pA: −/);
  });

  it('notes a package change in the pinout line without costing points', () => {
    const original = dualOpAmp();
    const r = scoreCandidate(original, variant(original, 'FX-2200S', { package: 'SOIC-8' }), {});
    const pin = line(r, 'pinout');
    expect(pin.points).toBe(0);
    expect([pin.original, pin.candidate]).toEqual(['DIP-8', 'SOIC-8']);
    expect(pin.reason).toMatch(/drop-in electrically; the package changes from DIP-8 to SOIC-8/);
    expect(r.pinout.packageChange).toEqual({ from: 'DIP-8', to: 'SOIC-8' });
  });

  it('scores weight-0 criteria as nothing and says so', () => {
    const original = dualOpAmp();
    const r = scoreCandidate(original, variant(original, 'FX-X', {}, { slewRate: { typ: 1e6 } }), { weights: { slewRate: 0 } });
    const slew = line(r, 'slewRate');
    expect([slew.points, slew.maxPoints]).toEqual([0, 0]);
    expect(slew.reason).toMatch(/\(weight 0, not counted\)$/);
    expect(r.score).toBe(100);
  });

  it('loses nothing on RoHS when the original is itself non-compliant', () => {
    const original = dualOpAmp('FX-OLD', { rohsStatus: 'non-compliant' });
    const r = scoreCandidate(original, variant(original, 'FX-LEADED', { rohsStatus: 'non-compliant' }), {});
    expect(line(r, 'rohs').points).toBe(0);
    expect(line(r, 'rohs').reason).toBe('the original is not RoHS compliant either, so nothing is lost');
  });
});

describe('photoresistor criteria, one at a time', () => {
  const cases: Case[] = [
    { criterion: 'darkResistance', better: [{}, { darkResistance: { min: 5e6 } }], worse: [{}, { darkResistance: { min: 200e3 } }] },
    {
      criterion: 'lightResistance',
      better: [{}, { lightResistance: { min: 10e3, max: 20e3 } }],
      worse: [{}, { lightResistance: { min: 40e3, max: 100e3 } }],
    },
    { criterion: 'gamma', better: [{}, { gamma: { typ: 0.75 } }], worse: [{}, { gamma: { typ: 0.4 } }] },
    { criterion: 'riseTime', better: [{}, { riseTime: { typ: 20e-3 } }], worse: [{}, { riseTime: { typ: 200e-3 } }] },
    { criterion: 'decayTime', better: [{}, { decayTime: { typ: 80e-3 } }], worse: [{}, { decayTime: { typ: 600e-3 } }] },
    { criterion: 'spectralPeak', better: [{}, { peakWavelength: { typ: 550e-9 } }], worse: [{}, { peakWavelength: { typ: 700e-9 } }] },
    {
      criterion: 'rohs',
      better: [{ rohsStatus: 'compliant' }, { cellMaterial: { value: 'other' } }],
      worse: [{ rohsStatus: 'unknown' }, { cellMaterial: { value: 'cds' } }],
    },
    { criterion: 'lifecycle', better: [{ lifecycle: 'nrnd' }, {}], worse: [{ lifecycle: 'last-time-buy' }, {}] },
  ];
  for (const c of cases) it(c.criterion, () => checkCase(cdsCell(), c));

  it('compares spectral peaks against the paired LED when one is given', () => {
    const original = cdsCell();
    const redCell = variant(original, 'LX-RED', {}, { peakWavelength: { typ: 620e-9 } });
    const greenCell = variant(original, 'LX-GREEN', {}, { peakWavelength: { typ: 540e-9 } });
    expect(rankAlternates(original, [redCell, greenCell], {}).items[0]!.part.partNumber).toBe('LX-GREEN');
    const lit = rankAlternates(original, [greenCell, redCell], { pairedLed: redLed() });
    expect(lit.items[0]!.part.partNumber).toBe('LX-RED');
    expect(line(lit.items[1]!, 'spectralPeak').reason).toMatch(/^peak response 540 nm is 90 nm from the paired LED's 630 nm, about 11 % response there: −/);
  });

  it("falls back to the original's peak when the paired LED states none, and says so", () => {
    const original = cdsCell();
    const white = variant(redLed(), 'LD-WHITE', {}, { colour: { value: 'white' }, peakWavelength: undefined });
    const r = scoreCandidate(original, variant(original, 'LX-600', {}, { peakWavelength: { typ: 600e-9 } }), { pairedLed: white });
    expect(line(r, 'spectralPeak').reason).toMatch(/^peak response 600 nm is 60 nm from the original's 540 nm \(the paired LED states no peak\), about/);
  });

  it('takes a cadmium cell without a recorded exemption as non-compliant', () => {
    const original = variant(cdsCell(), 'LX-FREE', { rohsStatus: 'compliant' }, { cellMaterial: { value: 'other' } });
    const claimed = variant(original, 'LX-CLAIM', { rohsStatus: 'compliant' }, { cellMaterial: { value: 'cds' } });
    const r = scoreCandidate(original, claimed, {});
    expect(line(r, 'rohs').points).toBe(-line(r, 'rohs').maxPoints);
    expect(line(r, 'rohs').candidate).toBe('Not RoHS compliant');
    const exempt = scoreCandidate(original, variant(original, 'LX-EX', { rohsStatus: 'exempt' }, { cellMaterial: { value: 'cdse' } }), {});
    expect(line(exempt, 'rohs').points).toBe(0);
    expect(line(exempt, 'rohs').reason).toMatch(/exemption: check that it still applies/);
  });
});

describe('LED criteria, one at a time', () => {
  const cases: Case[] = [
    { criterion: 'peakWavelength', better: [{}, { peakWavelength: { typ: 632e-9 } }], worse: [{}, { peakWavelength: { typ: 600e-9 } }] },
    { criterion: 'forwardVoltage', better: [{}, { forwardVoltage: { typ: 2.1 } }], worse: [{}, { forwardVoltage: { typ: 3.0 } }] },
    { criterion: 'forwardCurrent', better: [{}, { forwardCurrent: { typ: 20e-3, max: 50e-3 } }], worse: [{}, { forwardCurrent: { typ: 20e-3, max: 10e-3 } }] },
    { criterion: 'luminousIntensity', better: [{}, { luminousIntensity: { typ: 0.6 } }], worse: [{}, { luminousIntensity: { typ: 0.03 } }] },
    { criterion: 'viewingAngle', better: [{}, { viewingAngle: { typ: 30 } }], worse: [{}, { viewingAngle: { typ: 120 } }] },
    { criterion: 'package', better: [{}, { ledPackage: { value: '3mm' } }], worse: [{}, { ledPackage: { value: '0805' } }] },
    { criterion: 'lifecycle', better: [{ lifecycle: 'active' }, {}], worse: [{ lifecycle: 'obsolete' }, {}], options: { allowObsolete: true } },
    { criterion: 'rohs', better: [{ rohsStatus: 'compliant' }, {}], worse: [{ rohsStatus: 'non-compliant' }, {}] },
  ];
  for (const c of cases) it(c.criterion, () => checkCase(redLed(), c));

  it('brings luminous intensity to the original test current before comparing', () => {
    const original = redLed();
    const halfCurrent = variant(original, 'LD-HALF', {}, { luminousIntensity: { typ: 0.25, conditions: { current: 10e-3 } } });
    const r = scoreCandidate(original, halfCurrent, {});
    const iv = line(r, 'luminousIntensity');
    expect(iv.points).toBe(0);
    expect(iv.reason).toBe(
      "luminous intensity 250 mcd at 10 mA is about 500 mcd at the original's 20 mA (taken as proportional to current), 1× the original's 500 mcd",
    );
  });

  it('scores another size of the same mounting between the same package and another mounting', () => {
    const original = redLed();
    const same = scoreCandidate(original, variant(original, 'A', {}, { ledPackage: { value: '5mm' } }), {});
    const size = scoreCandidate(original, variant(original, 'B', {}, { ledPackage: { value: '3mm' } }), {});
    const smd = scoreCandidate(original, variant(original, 'C', {}, { ledPackage: { value: '1206' } }), {});
    expect(line(same, 'package').points).toBe(0);
    expect(line(size, 'package').points).toBe(-round1(line(size, 'package').maxPoints / 2));
    expect(line(smd, 'package').points).toBe(-line(smd, 'package').maxPoints);
  });
});

describe('potentiometer criteria, one at a time', () => {
  const cases: Case[] = [
    { criterion: 'resistance', better: [{}, { resistance: { typ: 50e3 } }], worse: [{}, { resistance: { typ: 100e3 } }] },
    { criterion: 'tolerance', better: [{}, { tolerance: { typ: 10 } }], worse: [{}, { tolerance: { typ: 30 } }] },
    { criterion: 'powerRating', better: [{}, { powerRating: { max: 0.25 } }], worse: [{}, { powerRating: { max: 0.05 } }] },
    { criterion: 'shaftType', better: [{}, { shaftType: { value: 'knurled' } }], worse: [{}, { shaftType: { value: 'd-flat' } }] },
    { criterion: 'mounting', better: [{}, { mounting: { value: 'pcb-vertical' } }], worse: [{}, { mounting: { value: 'panel' } }] },
    { criterion: 'bodySize', better: [{}, { bodySize: { typ: 16e-3 } }], worse: [{}, { bodySize: { typ: 24e-3 } }] },
    { criterion: 'lifecycle', better: [{ lifecycle: 'active' }, {}], worse: [{ lifecycle: 'last-time-buy' }, {}] },
    { criterion: 'rohs', better: [{ rohsStatus: 'compliant' }, {}], worse: [{ rohsStatus: 'unknown' }, {}] },
  ];
  for (const c of cases) it(c.criterion, () => checkCase(logPot(), c));

  it('ranks the exact value over the nearest E6 value over a value twice as large', () => {
    const original = logPot();
    const exact = variant(original, 'PT-50K', {}, { resistance: { typ: 50e3 } });
    const nearest = variant(original, 'PT-47K', {}, { resistance: { typ: 47e3 } });
    const double = variant(original, 'PT-100K', {}, { resistance: { typ: 100e3 } });
    const tight = variant(original, 'PT-T', {}, { tolerance: undefined });
    const r = rankAlternates(variant(tight, 'PT-ORIG', {}, { tolerance: undefined }), [double, nearest, exact], {});
    expect(r.items.map((i) => i.part.partNumber)).toEqual(['PT-50K', 'PT-47K', 'PT-100K']);
    expect(line(r.items[1]!, 'resistance').reason).toMatch(/^resistance 47 kΩ is the nearest E6 value to the original's 50 kΩ: −/);
  });

  it('counts a value inside the original tolerance as nearly as good', () => {
    const original = logPot();
    const r = scoreCandidate(original, variant(original, 'PT-56K', {}, { resistance: { typ: 56e3 } }), {});
    expect(line(r, 'resistance').reason).toMatch(/inside the original's ±20 % of 50 kΩ/);
  });
});

describe('optocoupler criteria', () => {
  it('ranks a closer on resistance first', () => {
    const original = testPart('optocoupler', 'OC-100', { onResistance: { typ: 1e3 }, offResistance: { min: 10e6 }, turnOffTime: { typ: 50e-3 } }, { pinLayout: 'optocoupler-4lead' });
    const close = variant(original, 'OC-A', {}, { onResistance: { typ: 1.2e3 } });
    const far = variant(original, 'OC-B', {}, { onResistance: { typ: 20e3 } });
    expect(rankAlternates(original, [far, close], {}).items.map((i) => i.part.partNumber)).toEqual(['OC-A', 'OC-B']);
  });
});
