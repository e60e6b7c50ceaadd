import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AlternatesResponseSchema, PartCreateBodySchema, PositionResultsSchema, type AlternatesResponse, type PartCreateBody } from '@understudy/shared-types';
import { createTestContext, type TestContext } from '../../../test/context';
import { createPart, setArchived } from '../parts/parts.service';

type Agent = Awaited<ReturnType<TestContext['agentFor']>>['agent'];

let ctx: TestContext;
let viewer: Agent;
let editor: Agent;
let editorId: string;
const ids: Record<string, string> = {};

// Invented parts whose right answers are plain by eye: the original QS-2100 is a FET-input dual on 6 V to 36 V.
const dual = (partNumber: string, over: Partial<PartCreateBody> = {}, parameters: Record<string, unknown> = {}): PartCreateBody => ({
  family: 'op-amp',
  manufacturer: 'Quillon Semiconductor',
  partNumber,
  lifecycle: 'active',
  rohsStatus: 'compliant',
  package: 'DIP-8',
  pinLayout: 'dip8-dual-opamp',
  ...over,
  parameters: {
    channels: { typ: 2 },
    supplyVoltage: { min: 6, max: 36 },
    singleSupply: { value: true },
    slewRate: { typ: 13e6 },
    gainBandwidth: { typ: 3e6 },
    inputNoiseDensity: { typ: 18e-9 },
    outputCurrent: { typ: 20e-3 },
    ...parameters,
  } as PartCreateBody['parameters'],
});

const PARTS: PartCreateBody[] = [
  dual('QS-2100'),
  dual('QS-2101', {}, { slewRate: { typ: 12e6 } }),
  dual('QS-2102', { lifecycle: 'obsolete' }),
  dual('QS-2103', { description: 'CMOS, low voltage only.' }, { supplyVoltage: { min: 1.8, max: 5.5 } }),
  dual('QS-4100', { package: 'DIP-14', pinLayout: 'dip14-quad-opamp' }, { channels: { typ: 4 } }),
  dual('QS-2104', { package: 'SOIC-8', pinLayout: null, pinMap: { 1: 'V+', 2: 'OUT A', 3: '−IN A', 4: '+IN A', 5: 'V−', 6: '+IN B', 7: '−IN B', 8: 'OUT B' } }),
  dual('BA-2200', { manufacturer: 'Brackenridge Audio' }, { slewRate: { typ: 12.5e6 } }),
  dual('BA-2201', { manufacturer: 'Brackenridge Audio' }, { slewRate: { typ: 1e6 }, gainBandwidth: { typ: 1e6 } }),
  dual('QS-2199', { description: 'Archived: never a candidate.' }),
  { family: 'photoresistor', manufacturer: 'Brackenridge Audio', partNumber: 'BA-LDR5', parameters: { lightResistance: { min: 8e3, max: 20e3 }, darkResistance: { min: 1e6 }, gamma: { typ: 0.7 }, peakWavelength: { typ: 540e-9 }, cellMaterial: { value: 'cds' } } },
  { family: 'photoresistor', manufacturer: 'Quillon Semiconductor', partNumber: 'QS-LDR7', parameters: { lightResistance: { min: 10e3, max: 24e3 }, darkResistance: { min: 1e6 }, gamma: { typ: 0.75 }, peakWavelength: { typ: 560e-9 }, cellMaterial: { value: 'cds' } } },
  { family: 'led', manufacturer: 'Brackenridge Audio', partNumber: 'BA-LED-G', parameters: { colour: { value: 'green' }, peakWavelength: { typ: 565e-9 }, forwardVoltage: { typ: 2.1 }, forwardCurrent: { typ: 10e-3, max: 25e-3 } } },
  { family: 'optocoupler', manufacturer: 'Quillon Semiconductor', partNumber: 'QS-VTL1', package: 'opto-4lead', parameters: { onResistance: { typ: 1e3 }, offResistance: { min: 10e6 }, ledMaxCurrent: { max: 40e-3 }, cellMaterial: { value: 'cds' } } },
  { family: 'optocoupler', manufacturer: 'Brackenridge Audio', partNumber: 'BA-VTL2', package: 'opto-4lead', parameters: { onResistance: { typ: 1.5e3 }, offResistance: { min: 5e6 }, ledMaxCurrent: { max: 30e-3 }, cellMaterial: { value: 'cds' } } },
];

beforeAll(async () => {
  ctx = await createTestContext();
  await ctx.db.query('TRUNCATE requirement_sets, equivalents, part_revisions, parts, manufacturers CASCADE');
  for (const p of PARTS) ids[p.partNumber] = (await createPart(ctx.db, null, PartCreateBodySchema.parse(p))).id;
  ({ agent: viewer } = await ctx.agentFor('viewer'));
  ({ agent: editor, user: { id: editorId } } = await ctx.agentFor('editor'));
  await setArchived(ctx.db, editorId, ids['QS-2199']!, true);
});
afterAll(() => ctx.close());

async function alternates(partNumber: string, query: Record<string, string> = {}): Promise<AlternatesResponse> {
  const res = await viewer.get(`/api/parts/${ids[partNumber]}/alternates`).query(query).expect(200);
  return AlternatesResponseSchema.parse(res.body);
}
const ranked = (r: AlternatesResponse) => r.items.map((i) => i.part.partNumber);
const unsuitable = (r: AlternatesResponse) => Object.fromEntries(r.unsuitable.map((u) => [u.part.partNumber, u.reasons.join('; ')]));

describe('alternates of a part', () => {
  it('ranks the same family with explanations, leaving out the original, archived parts and other families', async () => {
    const res = await alternates('QS-2100');
    expect(res.original.partNumber).toBe('QS-2100');
    expect(res.weights.slewRate).toBeGreaterThan(0);
    const numbers = ranked(res);
    expect(numbers).not.toContain('QS-2100');
    expect(numbers).not.toContain('QS-2199');
    expect(numbers).not.toContain('BA-LDR5');
    // The closest match, same pins and nearly the same figures, comes out on top.
    expect(numbers[0]).toBe('BA-2200');
    expect(res.considered).toBe(res.items.length);
    const top = res.items[0]!;
    expect(top.pinout.class).toBe('drop-in');
    expect(top.breakdown.length).toBeGreaterThan(3);
    // The breakdown's points are what the score lost.
    expect(100 + top.breakdown.reduce((sum, line) => sum + line.points, 0)).toBeCloseTo(top.score, 1);
    const swapped = res.items.find((i) => i.part.partNumber === 'QS-2104')!;
    expect(swapped.pinout.class).not.toBe('drop-in');
  });

  it('lists a part of another channel count as unsuitable, in the engine words', async () => {
    const res = await alternates('QS-2100');
    expect(ranked(res)).not.toContain('QS-4100');
    expect(unsuitable(res)['QS-4100']).toMatch(/4 channels/);
  });

  it('keeps an obsolete candidate out of the ranking unless obsolete parts are allowed', async () => {
    const res = await alternates('QS-2100');
    expect(ranked(res)).not.toContain('QS-2102');
    expect(unsuitable(res)['QS-2102']).toMatch(/obsolete/);
    const allowed = await alternates('QS-2100', { allowObsolete: '1' });
    expect(ranked(allowed)).toContain('QS-2102');
    expect(unsuitable(allowed)['QS-2102']).toBeUndefined();
  });

  it('requires the operating supply to be covered: a 5.5 V part cannot run on ±15 V', async () => {
    expect(ranked(await alternates('QS-2100'))).toContain('QS-2103');
    for (const supply of ['±15 V', '9..30 V']) {
      const res = await alternates('QS-2100', { supply });
      expect(ranked(res)).not.toContain('QS-2103');
      expect(unsuitable(res)['QS-2103']).toMatch(/does not cover/);
    }
    const nine = await alternates('QS-2100', { supply: '9 V' });
    expect(ranked(nine)).not.toContain('QS-2103');
    expect(ranked(nine)).toContain('QS-2101');
  });

  it('shows only drop-ins when asked, listing the others as unsuitable', async () => {
    const res = await alternates('QS-2100', { requireDropIn: 'true' });
    expect(ranked(res)).not.toContain('QS-2104');
    expect(unsuitable(res)['QS-2104']).toMatch(/drop-in/);
    expect(res.items.every((i) => i.pinout.class === 'drop-in')).toBe(true);
  });

  it("lists an editor's approved equivalent first and a rejected one as unsuitable", async () => {
    await editor.post('/api/equivalents').send({ partId: ids['QS-2100'], equivalentId: ids['BA-2201'], status: 'approved', use: 'any' }).expect(201);
    await editor.post('/api/equivalents').send({ partId: ids['BA-2200'], equivalentId: ids['QS-2100'], status: 'rejected', use: 'any', note: 'Oscillates into a cable.' }).expect(201);
    const res = await alternates('QS-2100');
    // BA-2201 is far slower, so it would score low; the ruling puts it first anyway.
    expect(ranked(res)[0]).toBe('BA-2201');
    expect(res.items[0]!.equivalent).toMatchObject({ status: 'approved', partId: ids['QS-2100'], equivalentId: ids['BA-2201'] });
    expect(res.items[0]!.score).toBeLessThan(res.items[1]!.score);
    expect(ranked(res)).not.toContain('BA-2200');
    expect(unsuitable(res)['BA-2200']).toMatch(/Oscillates into a cable/);
    // A rejection is the first thing the unsuitable list says.
    expect(res.unsuitable[0]!.part.partNumber).toBe('BA-2200');
  });

  it('takes weights as criterion:weight pairs and bounds the list with limit', async () => {
    const res = await alternates('QS-2100', { weights: 'slewRate:5,noise:0', limit: '2' });
    expect(res.weights).toMatchObject({ slewRate: 5, noise: 0 });
    expect(res.items).toHaveLength(2);
    expect(res.considered).toBeGreaterThan(2);
  });

  it('answers 400 with the message for bad weights, an unreadable supply or a bad flag, and 404 for an unknown part', async () => {
    for (const [query, path] of [
      [{ weights: 'slewRate:9' }, 'query.weights'],
      [{ weights: 'sparkle:1' }, 'query.weights'],
      [{ supply: 'banana' }, 'query.supply'],
      [{ supply: '15 A' }, 'query.supply'],
      [{ allowObsolete: 'maybe' }, 'query.allowObsolete'],
      [{ limit: '0' }, 'query.limit'],
    ] as const) {
      const res = await viewer.get(`/api/parts/${ids['QS-2100']}/alternates`).query(query).expect(400);
      expect(res.body.error.code).toBe('validation_failed');
      expect(res.body.error.issues[0]).toMatchObject({ path });
      expect(res.body.error.issues[0].message.length).toBeGreaterThan(5);
    }
    await viewer.get('/api/parts/00000000-0000-4000-8000-00000000abcd/alternates').expect(404);
    await viewer.get('/api/parts/not-a-uuid/alternates').expect(400);
  });

  it('compares a photoresistor lit by a named LED, and refuses a pairing with something that is not an LED', async () => {
    const res = await alternates('BA-LDR5', { pairedWith: ids['BA-LED-G']! });
    expect(ranked(res)).toEqual(['QS-LDR7']);
    expect(res.items[0]!.breakdown.map((l) => l.criterion)).toContain('spectralPeak');
    const bad = await viewer.get(`/api/parts/${ids['BA-LDR5']}/alternates`).query({ pairedWith: ids['QS-2101'] }).expect(400);
    expect(bad.body.error.issues[0].path).toBe('query.pairedWith');
  });

  it('ranks other optocouplers for an optocoupler', async () => {
    const res = await alternates('QS-VTL1');
    expect(ranked(res)).toEqual(['BA-VTL2']);
  });
});

describe('ranking for a position', () => {
  const position = {
    family: 'op-amp',
    supply: { kind: 'single', volts: 9 },
    signal: { peakVolts: 2, frequencyHz: 20_000 },
    ledLoad: { outputVolts: 7, forwardVolts: 2, seriesOhms: 470 },
  };

  it('derives the needs, ranks what meets them and lists the rest with reasons', async () => {
    const res = PositionResultsSchema.parse((await viewer.post('/api/alternates/rank').send(position).expect(200)).body);
    // SR = 2π·f·Vpeak = 2π × 20 kHz × 2 V ≈ 0.251 V/µs (the full-power bandwidth relation, common practice).
    const slew = res.derived.find((d) => d.key === 'slewRate')!;
    expect(slew.value.min).toBeCloseTo(2 * Math.PI * 20_000 * 2, 0);
    // I = (Vout − Vf) / R = (7 − 2) / 470 ≈ 10.6 mA (Ohm's law across the series resistor).
    expect(res.derived.find((d) => d.key === 'outputCurrent')!.value.min).toBeCloseTo(5 / 470, 6);
    const matched = res.items.map((m) => m.part.partNumber);
    expect(matched).toEqual(expect.arrayContaining(['QS-2100', 'QS-2101', 'BA-2200', 'QS-4100']));
    expect(res.considered).toBe(res.items.length);
    const reasons = Object.fromEntries(res.unsuitable.map((u) => [u.part.partNumber, u.reasons.join('; ')]));
    expect(matched).not.toContain('QS-2103');
    expect(reasons['QS-2103']).toMatch(/supply range/);
    expect(reasons['QS-2102']).toMatch(/obsolete/);
  });

  it('marks approved equivalents among the matches', async () => {
    const res = PositionResultsSchema.parse((await viewer.post('/api/alternates/rank').send(position).expect(200)).body);
    const original = res.items.find((m) => m.part.partNumber === 'QS-2100')!;
    expect(original.equivalentOf).toEqual([ids['BA-2201']]);
  });

  it('refuses requirements it cannot read (400)', async () => {
    const res = await viewer.post('/api/alternates/rank').send({ family: 'optocoupler', supply: { kind: 'single', volts: -9 } }).expect(400);
    const paths = res.body.error.issues.map((i: { path: string }) => i.path);
    expect(paths).toEqual(expect.arrayContaining(['body.family', 'body.supply.volts']));
  });
});

describe('LED + photoresistor pairs for an optocoupler', () => {
  // At the original's 10 mA and the assumed 5 mm, the 50 mcd (at 20 mA) green LED gives
  // E = Iv·(I/Itest)/d² = 0.05 cd × ½ / (5 mm)² = 1000 lx (inverse-square law of illuminance, textbook photometry);
  // a cell of 10 kΩ to 40 kΩ at 10 lx with γ = 0.5 then sits at R = R10·(E/10 lx)^−γ = 20 kΩ × 100^−0.5 = 2 kΩ
  // (the gamma law, common practice, no source): the original's own on resistance.
  const cell = (partNumber: string, over: Record<string, unknown> = {}, lifecycle: PartCreateBody['lifecycle'] = 'active'): PartCreateBody => ({
    family: 'photoresistor',
    manufacturer: 'Quillon Semiconductor',
    partNumber,
    lifecycle,
    rohsStatus: 'exempt',
    package: 'radial',
    pinLayout: 'photoresistor-2lead',
    parameters: {
      lightResistance: { min: 10e3, max: 40e3 },
      darkResistance: { min: 10e6 },
      gamma: { typ: 0.5 },
      peakWavelength: { typ: 540e-9 },
      riseTime: { typ: 5e-3 },
      decayTime: { typ: 50e-3 },
      cellMaterial: { value: 'cds' },
      ...over,
    } as PartCreateBody['parameters'],
  });
  const led = (partNumber: string, over: Record<string, unknown> = {}, lifecycle: PartCreateBody['lifecycle'] = 'active'): PartCreateBody => ({
    family: 'led',
    manufacturer: 'Brackenridge Audio',
    partNumber,
    lifecycle,
    rohsStatus: 'compliant',
    package: 'led-5mm',
    pinLayout: 'led-2lead',
    parameters: {
      colour: { value: 'green' },
      peakWavelength: { typ: 540e-9 },
      forwardCurrent: { typ: 20e-3, max: 30e-3 },
      luminousIntensity: { typ: 0.05, conditions: { current: 20e-3 } },
      ...over,
    } as PartCreateBody['parameters'],
  });
  const PAIR_PARTS: PartCreateBody[] = [
    {
      family: 'optocoupler',
      manufacturer: 'Quillon Semiconductor',
      partNumber: 'QS-VTL3',
      package: 'opto-4lead',
      pinLayout: 'optocoupler-4lead',
      rohsStatus: 'exempt',
      parameters: {
        onResistance: { typ: 2e3, max: 4e3, conditions: { current: 10e-3 } },
        offResistance: { min: 10e6 },
        ledMaxCurrent: { max: 40e-3 },
        turnOnTime: { typ: 5e-3 },
        turnOffTime: { typ: 50e-3 },
        cellMaterial: { value: 'cds' },
      },
    },
    led('BA-LED-540'),
    led('BA-LED-5MA', { forwardCurrent: { typ: 2e-3, max: 5e-3 } }),
    led('BA-LED-OLD', {}, 'obsolete'),
    led('BA-LED-GONE'),
    cell('QS-LDR-2K'),
    cell('QS-LDR-20K', { lightResistance: { min: 100e3, max: 400e3 } }),
    cell('QS-LDR-SLOW', { decayTime: { typ: 500e-3 } }),
  ];

  beforeAll(async () => {
    for (const p of PAIR_PARTS) ids[p.partNumber] = (await createPart(ctx.db, null, PartCreateBodySchema.parse(p))).id;
    await setArchived(ctx.db, editorId, ids['BA-LED-GONE']!, true);
  });

  const pairNames = (r: AlternatesResponse) => r.pairs!.items.map((p) => p.partNumber);

  it('ranks LED + photoresistor pairs below the packaged alternates, the estimate nearest the original first', async () => {
    const res = await alternates('QS-VTL3');
    expect(ranked(res)).toEqual(expect.arrayContaining(['QS-VTL1', 'BA-VTL2']));
    const pairs = res.pairs!;
    expect(pairNames(res)[0]).toBe('BA-LED-540 + QS-LDR-2K');
    const top = pairs.items[0]!;
    expect(top.led.partNumber).toBe('BA-LED-540');
    expect(top.cell.partNumber).toBe('QS-LDR-2K');
    // E = 1000 lx (inverse-square law) and R = 20 kΩ × (1000/10)^−0.5 = 2 kΩ (gamma law), as worked above.
    expect(top.estimate.illuminanceLux).toBeCloseTo(1000, 6);
    expect(top.estimate.resistanceOhms.typical).toBeCloseTo(2000, 3);
    expect(top.driveCurrentA).toBe(10e-3);
    expect(top.spacingM).toBe(5e-3);
    expect(top.estimate.note).toMatch(/bench/);
    expect(top.estimate.assumptions.join(' ')).toMatch(/5 mm from the cell.*common practice, no source/);
    // The breakdown adds up to the score, and the pinout line says the layout changes.
    expect(100 + top.breakdown.reduce((sum, line) => sum + line.points, 0)).toBeCloseTo(top.score, 1);
    expect(top.breakdown.find((l) => l.criterion === 'pinout')!.reason).toMatch(/^two parts in place of one package/);
    // A decade off on on resistance, and ten times the decay, both rank lower.
    expect(pairNames(res).indexOf('BA-LED-540 + QS-LDR-20K')).toBeGreaterThan(0);
    expect(pairNames(res).indexOf('BA-LED-540 + QS-LDR-SLOW')).toBeGreaterThan(0);
    expect(pairs.note).toMatch(/10 mA \(the current the original's on resistance is stated at\)/);
  });

  it('leaves out LEDs rated below the drive current, archived ones and, unless allowed, obsolete ones', async () => {
    const res = await alternates('QS-VTL3');
    const ledsUsed = new Set(res.pairs!.items.map((p) => p.led.partNumber));
    expect(ledsUsed).toEqual(new Set(['BA-LED-540']));
    // BA-LED-G states no luminous intensity, so it cannot be estimated.
    expect(res.pairs!.considered).toBe(1 * 5);
    const allowed = await alternates('QS-VTL3', { allowObsolete: '1' });
    const old = allowed.pairs!.items.find((p) => p.led.partNumber === 'BA-LED-OLD')!;
    expect(old.lifecycle).toBe('obsolete');
    expect(allowed.pairs!.items.some((p) => p.led.partNumber === 'BA-LED-5MA' || p.led.partNumber === 'BA-LED-GONE')).toBe(false);
  });

  it('carries the weights over to the pairs', async () => {
    const res = await alternates('QS-VTL3', { weights: 'turnOffTime:0' });
    const slow = res.pairs!.items.find((p) => p.partNumber === 'BA-LED-540 + QS-LDR-SLOW')!;
    expect(slow.breakdown.find((l) => l.criterion === 'turnOffTime')!.points).toBe(0);
  });

  it('offers no pair when a drop-in is required, saying why, and none for another family', async () => {
    const res = await alternates('QS-VTL3', { requireDropIn: '1' });
    expect(res.pairs).toMatchObject({ items: [], considered: 0 });
    expect(res.pairs!.note).toMatch(/never a drop-in/);
    expect((await alternates('QS-2100')).pairs).toBeNull();
  });
});
