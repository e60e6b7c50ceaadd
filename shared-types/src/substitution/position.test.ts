import { describe, expect, it } from 'vitest';
import { PositionMatchSchema, PositionRequirementsSchema, type PositionRequirementsInput } from '../alternates';
import { deriveNeeds, rankForPosition } from './position';
import { cdsCell, dualOpAmp, redLed, ruling, variant } from './test-parts';

const req = (input: PositionRequirementsInput) => PositionRequirementsSchema.parse(input);

describe('deriveNeeds', () => {
  it('turns a 9 V single supply with half-supply bias into a 9 V span, single-supply operation and a 4.5 V bias', () => {
    const needs = deriveNeeds(req({ family: 'op-amp', supply: { kind: 'single', volts: 9, halfSupplyBias: true } }));
    expect(needs.map((n) => n.key)).toEqual(['supply', 'singleSupply', 'bias']);
    expect(needs[0]!.value).toEqual({ min: 9, max: 9 });
    expect(needs[1]!.value).toEqual({ value: true });
    // A divider of two equal resistors biases at half the supply (common practice, no source).
    expect(needs[2]!.value).toEqual({ typ: 4.5 });
    expect(needs[2]!.explanation).toMatch(/4\.5 V, half the supply/);
  });

  it('gives a dual supply as its total span, without the single-supply need', () => {
    const needs = deriveNeeds(req({ family: 'op-amp', supply: { kind: 'dual', volts: 30 } }));
    expect(needs.map((n) => n.key)).toEqual(['supply']);
    expect(needs[0]!.explanation).toMatch(/±15 V supply is 30 V between the rails/);
  });

  it('derives the slew rate as 2π·f·Vpeak: 2 V peak at 20 kHz needs about 0.251 V/µs (Horowitz & Hill; Sedra & Smith)', () => {
    const [slew] = deriveNeeds(req({ family: 'op-amp', signal: { peakVolts: 2, frequencyHz: 20e3 } }));
    expect(slew!.key).toBe('slewRate');
    expect(slew!.value.min! / 1e6).toBeCloseTo(0.2513, 4);
    expect(slew!.formula).toBe('SR = 2π·f·Vpeak');
    expect(slew!.explanation).toBe('2 V peak at 20 kHz needs at least 0.251 V/µs to stay undistorted.');
  });

  it('derives LED current as (Vout − Vf)/R: (7 V − 2 V)/1 kΩ = 5 mA (Ohm’s law; Horowitz & Hill)', () => {
    const [opAmpNeed] = deriveNeeds(req({ family: 'op-amp', ledLoad: { outputVolts: 7, forwardVolts: 2, seriesOhms: 1e3 } }));
    expect(opAmpNeed!.key).toBe('outputCurrent');
    expect(opAmpNeed!.value.min).toBeCloseTo(5e-3, 12);
    expect(opAmpNeed!.explanation).toBe('(7 V − 2 V) / 1 kΩ = 5 mA: the output must source at least that.');
    const [ledNeed] = deriveNeeds(req({ family: 'led', ledLoad: { outputVolts: 7, forwardVolts: 2, seriesOhms: 1e3 } }));
    expect(ledNeed!.key).toBe('forwardCurrent');
    const [dark] = deriveNeeds(req({ family: 'op-amp', ledLoad: { outputVolts: 1.5, forwardVolts: 2, seriesOhms: 1e3 } }));
    expect(dark!.value.min).toBe(0);
    expect(dark!.explanation).toMatch(/LED stays dark/);
  });

  it('derives the resistance range of a photoresistor input resistor as Rf/gainMax … Rf/gainMin (from −Rf/Rin)', () => {
    const [range] = deriveNeeds(req({ family: 'photoresistor', invertingGain: { feedbackOhms: 100e3, gainMin: 0.5, gainMax: 10 } }));
    expect(range!.value).toEqual({ min: 10e3, max: 200e3 });
    expect(range!.explanation).toBe('Gain 0.5 to 10 with 100 kΩ feedback needs the cell to reach 10 kΩ lit and 200 kΩ dark.');
  });

  it('asks for a rail-to-rail output when the signal comes close to the rails, and says when it cannot fit at all', () => {
    const tight = deriveNeeds(req({ family: 'op-amp', supply: { kind: 'single', volts: 9, halfSupplyBias: true }, signal: { peakVolts: 3.5, frequencyHz: 1e3 } }));
    const swing = tight.find((n) => n.key === 'outputSwing');
    expect(swing!.value.typ).toBeCloseTo(1, 12);
    const roomy = deriveNeeds(req({ family: 'op-amp', supply: { kind: 'single', volts: 9, halfSupplyBias: true }, signal: { peakVolts: 2, frequencyHz: 1e3 } }));
    expect(roomy.some((n) => n.key === 'outputSwing')).toBe(false);
    const over = deriveNeeds(req({ family: 'op-amp', supply: { kind: 'single', volts: 9, halfSupplyBias: true }, signal: { peakVolts: 5, frequencyHz: 1e3 } }));
    expect(over.find((n) => n.key === 'outputSwing')!.explanation).toMatch(/goes past the rails/);
  });

  it('derives only what applies to the family', () => {
    expect(deriveNeeds(req({ family: 'led', signal: { peakVolts: 2, frequencyHz: 20e3 } }))).toEqual([]);
    expect(deriveNeeds(req({ family: 'photoresistor', supply: { kind: 'single', volts: 9 } })).map((n) => n.key)).toEqual(['maxVoltage']);
  });
});

describe('rankForPosition', () => {
  const pedal = req({
    family: 'op-amp',
    supply: { kind: 'single', volts: 9, halfSupplyBias: true },
    signal: { peakVolts: 2, frequencyHz: 20e3 },
    ledLoad: { outputVolts: 7, forwardVolts: 2, seriesOhms: 1e3 },
  });
  const base = dualOpAmp();

  it('refuses parts that miss a need, with a plain reason each', () => {
    const highSupply = variant(base, 'FX-HV', {}, { supplyVoltage: { min: 10, max: 36 } });
    const dualOnly = variant(base, 'FX-DUAL', {}, { singleSupply: { value: false } });
    const weak = variant(base, 'FX-WEAK', {}, { outputCurrent: { typ: 2e-3 } });
    const silent = variant(base, 'FX-SILENT', {}, { slewRate: undefined });
    const r = rankForPosition(pedal, [highSupply, dualOnly, weak, silent, cdsCell('LX-1')]);
    expect(r.items).toEqual([]);
    expect(Object.fromEntries(r.unsuitable.map((u) => [u.part.partNumber, u.reasons]))).toEqual({
      'FX-HV': ['supply range 10 V to 36 V does not reach down to 9 V'],
      'FX-DUAL': ['not single-supply capable'],
      'FX-WEAK': ['output current 2 mA is short of the 5 mA needed'],
      'FX-SILENT': ['states no slew rate, so it cannot be shown to reach 0.251 V/µs'],
      'LX-1': ['is not an op amp'],
    });
  });

  it('ranks more margin higher, with a margin and a reason for every need', () => {
    const roomy = variant(base, 'FX-ROOMY', {}, { supplyVoltage: { min: 3, max: 36 }, outputCurrent: { typ: 40e-3 } });
    const tight = variant(base, 'FX-TIGHT', {}, { supplyVoltage: { min: 8, max: 10 }, outputCurrent: { typ: 6e-3 } });
    const r = rankForPosition(pedal, [tight, roomy]);
    expect(r.items.map((i) => i.part.partNumber)).toEqual(['FX-ROOMY', 'FX-TIGHT']);
    expect(r.derived.map((d) => d.key)).toEqual(['supply', 'singleSupply', 'bias', 'slewRate', 'outputCurrent']);
    const [first] = r.items;
    expect(first!.margins.map((m) => m.need)).toEqual(['supply', 'singleSupply', 'slewRate', 'outputCurrent', 'lifecycle', 'rohs']);
    for (const m of first!.margins) expect(m.reason.length).toBeGreaterThan(3);
    const slew = first!.margins.find((m) => m.need === 'slewRate')!;
    expect(slew.margin).toBeCloseTo(13e6 / (2 * Math.PI * 20e3 * 2) - 1, 9);
    expect(slew.reason).toBe('slew rate 13 V/µs is 52× the 0.251 V/µs needed');
    const supply = first!.margins.find((m) => m.need === 'supply')!;
    expect(supply.margin).toBe(6);
    expect(supply.reason).toBe('supply range 3 V to 36 V covers 9 V with 6 V to spare below and 27 V above');
    const current = r.items[1]!.margins.find((m) => m.need === 'outputCurrent')!;
    expect(current.margin).toBeCloseTo(0.2, 12);
    expect(r.items[0]!.score).toBeGreaterThan(r.items[1]!.score);
    expect(r.items[0]!.score).toBeLessThanOrEqual(100);
  });

  it('puts an obsolete part among the unsuitable unless allowed, and scores lifecycle and RoHS as the alternates do', () => {
    const old = variant(base, 'FX-OLD', { lifecycle: 'obsolete' });
    const nrnd = variant(base, 'FX-NRND', { lifecycle: 'nrnd' });
    const fresh = variant(base, 'FX-NEW');
    expect(rankForPosition(pedal, [old]).unsuitable[0]!.reasons).toEqual(['is obsolete']);
    const allowed = rankForPosition({ ...pedal, allowObsolete: true }, [old, nrnd, fresh]);
    expect(allowed.items.map((i) => i.part.partNumber)).toEqual(['FX-NEW', 'FX-NRND', 'FX-OLD']);
  });

  it('asks for a rail-to-rail output when the swing is tight', () => {
    const tightSwing = req({ family: 'op-amp', supply: { kind: 'single', volts: 9, halfSupplyBias: true }, signal: { peakVolts: 3.5, frequencyHz: 1e3 } });
    const r = rankForPosition(tightSwing, [variant(base, 'FX-RRO'), variant(base, 'FX-NO-RRO', {}, { railToRailOutput: { value: false } })]);
    expect(r.items.map((i) => i.part.partNumber)).toEqual(['FX-RRO']);
    expect(r.unsuitable[0]!.reasons[0]).toMatch(/^not rail-to-rail at the output, and the signal comes within 1 V of the rails/);
  });

  it('checks a required pin layout', () => {
    const r = rankForPosition(req({ family: 'op-amp', requirePinLayout: 'dip8-dual-opamp' }), [base, variant(base, 'FX-SINGLE', { pinLayout: 'dip8-single-opamp' })]);
    expect(r.items.map((i) => i.part.partNumber)).toEqual([base.partNumber]);
    expect(r.unsuitable[0]!.reasons).toEqual(['Single op amp, 8 pins, not the Dual op amp, 8 pins required']);
  });

  it('checks that a photoresistor spans the resistance range, with the margin on each end', () => {
    const position = req({ family: 'photoresistor', invertingGain: { feedbackOhms: 100e3, gainMin: 0.5, gainMax: 10 } });
    // Needs 10 kΩ lit (worst case the light max) and 200 kΩ dark (worst case the dark min).
    const wide = variant(cdsCell(), 'LX-WIDE', {}, { lightResistance: { min: 2e3, max: 5e3 }, darkResistance: { min: 2e6 } });
    const narrow = variant(cdsCell(), 'LX-NARROW', {}, { lightResistance: { min: 4e3, max: 9e3 }, darkResistance: { min: 400e3 } });
    const dim = variant(cdsCell(), 'LX-DIM', {}, { lightResistance: { min: 8e3, max: 20e3 } });
    const r = rankForPosition(position, [narrow, dim, wide]);
    expect(r.items.map((i) => i.part.partNumber)).toEqual(['LX-WIDE', 'LX-NARROW']);
    const m = r.items[0]!.margins.find((x) => x.need === 'resistanceRange')!;
    expect(m.margin).toBeCloseTo(1, 12);
    expect(m.reason).toMatch(/^spans 10 kΩ to 200 kΩ with 0\.3 decades to spare lit and 1 decade dark/);
    expect(r.unsuitable[0]!.reasons[0]).toMatch(/at 10 lx it sits at up to 20 kΩ, above the 10 kΩ needed/);
  });

  it('writes margins when first read, as a plain own property', () => {
    const [match] = rankForPosition(pedal, [variant(base, 'FX-LAZY')]).items;
    expect(Object.keys(match!)).toEqual(['part', 'score', 'margins', 'equivalentOf']);
    const json = JSON.parse(JSON.stringify(match));
    expect(json.margins).toHaveLength(6);
    expect(PositionMatchSchema.parse(match)).toEqual(json);
    expect({ ...match }.margins).toBe(match!.margins);
  });

  it('lists the approved equivalents each part has', () => {
    const a = variant(base, 'FX-A');
    const other = variant(base, 'FX-REF');
    const r = rankForPosition(pedal, [a], { equivalents: new Map([[a.id, [ruling(other, a, 'approved'), ruling(a, base, 'rejected')]]]) });
    expect(r.items[0]!.equivalentOf).toEqual([other.id]);
  });

  it('checks an LED against the current its driver pushes through it', () => {
    const position = req({ family: 'led', ledLoad: { outputVolts: 9, forwardVolts: 2, seriesOhms: 220 } });
    // (9 − 2)/220 ≈ 31.8 mA: a 30 mA LED is short of it.
    const r = rankForPosition(position, [redLed(), variant(redLed(), 'LD-50', {}, { forwardCurrent: { typ: 20e-3, max: 50e-3 } })]);
    expect(r.items.map((i) => i.part.partNumber)).toEqual(['LD-50']);
    expect(r.unsuitable[0]!.reasons[0]).toMatch(/^rated current 30 mA is short of the 31\.8 mA needed$/);
  });
});
