import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  AlternatesQuerySchema,
  parseSupplySpan,
  parseWeights,
  PartCreateBodySchema,
  PIN_LAYOUTS,
  PositionRequirementsSchema,
  rankAlternates,
  rankForPosition,
  rankPairs,
  type FamilyKey,
  type PartCreateBody,
} from '@understudy/shared-types';
import { createTestContext, type TestContext } from '../../../test/context';
import { findOrCreateManufacturer } from '../parts/parts.service';
import { findAlternates, rankPosition, SHORTLIST } from './alternates.service';
import { CANDIDATE_COLUMNS, candidateFromRow, loadCandidate, type CandidateRow } from './candidate-parts';

/**
 * The shortlist is only a way to spend the engine's time on the candidates that can win. These checks rank a
 * generated family both ways, through the shortlist and with the engine over every candidate, and expect the same
 * top of the list. Invented parts with spreads wide enough that the shortlist has to choose.
 */

function rng(seed: number) {
  let a = seed >>> 0;
  const next = () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return {
    pick: <T>(xs: readonly T[]) => xs[Math.floor(next() * xs.length)]!,
    log: (lo: number, hi: number) => Number(Math.exp(Math.log(lo) + (Math.log(hi) - Math.log(lo)) * next()).toPrecision(3)),
    chance: (p: number) => next() < p,
  };
}

const r = rng(7);
const LIFECYCLES = ['active', 'active', 'active', 'nrnd', 'last-time-buy', 'obsolete'] as const;

function opAmp(i: number): PartCreateBody {
  const channels = r.pick([1, 2, 2, 4]);
  const layout = channels === 1 ? 'dip8-single-opamp' : channels === 2 ? 'dip8-dual-opamp' : 'dip14-quad-opamp';
  return {
    family: 'op-amp',
    manufacturer: r.pick(['Quillon Semiconductor', 'Brackenridge Audio']),
    partNumber: `SL-OA${String(i).padStart(5, '0')}`,
    lifecycle: r.pick(LIFECYCLES),
    rohsStatus: r.pick(['compliant', 'compliant', 'unknown']),
    package: channels === 4 ? 'DIP-14' : r.pick(['DIP-8', 'SOIC-8']),
    // Some with the pins lettered another way, so the pinout term has to be read by the engine.
    pinLayout: r.chance(0.85) ? layout : null,
    ...(r.chance(0.1) ? { pinMap: { 1: 'V+', 2: 'OUT A', 3: '−IN A', 4: '+IN A', 5: 'V−', 6: '+IN B', 7: '−IN B', 8: 'OUT B' } } : {}),
    parameters: {
      channels: { typ: channels },
      supplyVoltage: { min: r.pick([1.8, 3, 5, 8, 10]), max: r.pick([12, 16, 30, 36, 44]) },
      singleSupply: { value: r.chance(0.6) },
      slewRate: r.chance(0.3) ? { min: r.log(0.2e6, 20e6) } : { typ: r.log(0.2e6, 25e6) },
      gainBandwidth: { typ: r.log(0.5e6, 20e6) },
      inputOffsetVoltage: { typ: r.log(0.1e-3, 3e-3) },
      inputBiasCurrent: { typ: r.log(1e-12, 300e-9) },
      inputNoiseDensity: { typ: r.log(3e-9, 40e-9) },
      outputCurrent: { typ: r.log(5e-3, 60e-3) },
      railToRailInput: { value: r.chance(0.2) },
      railToRailOutput: { value: r.chance(0.3) },
    },
  };
}

function photocell(i: number): PartCreateBody {
  const lit = r.log(2e3, 100e3);
  return {
    family: 'photoresistor',
    manufacturer: 'Brackenridge Audio',
    partNumber: `SL-LDR${String(i).padStart(5, '0')}`,
    lifecycle: r.pick(LIFECYCLES),
    rohsStatus: r.pick(['exempt', 'non-compliant', 'unknown']),
    parameters: {
      lightResistance: { min: lit, max: Number((lit * r.log(1.5, 3)).toPrecision(3)) },
      darkResistance: { min: r.log(0.2e6, 20e6) },
      gamma: { typ: r.log(0.5, 0.9) },
      riseTime: { typ: r.log(5e-3, 80e-3) },
      decayTime: { typ: r.log(10e-3, 2) },
      peakWavelength: { typ: r.log(520e-9, 620e-9) },
      cellMaterial: { value: r.pick(['cds', 'cdse', 'other']) },
      maxVoltage: { max: r.pick([100, 150, 250]) },
    },
  };
}

function led(i: number): PartCreateBody {
  return {
    family: 'led',
    manufacturer: 'Quillon Semiconductor',
    partNumber: `SL-LED${String(i).padStart(5, '0')}`,
    parameters: { peakWavelength: { typ: r.log(450e-9, 640e-9) }, forwardVoltage: { typ: 2 }, forwardCurrent: { typ: 20e-3, max: 30e-3 } },
  };
}

/** LEDs that state an intensity, for the pairs: drawn after the rest, so the other families stay as they were. */
function brightLed(i: number): PartCreateBody {
  return {
    family: 'led',
    manufacturer: r.pick(['Quillon Semiconductor', 'Brackenridge Audio']),
    partNumber: `SL-LEDB${String(i).padStart(5, '0')}`,
    lifecycle: r.pick(LIFECYCLES),
    rohsStatus: r.pick(['compliant', 'compliant', 'unknown']),
    parameters: {
      peakWavelength: { typ: r.log(450e-9, 640e-9) },
      forwardCurrent: { typ: 10e-3, max: r.pick([15e-3, 25e-3, 30e-3, 50e-3]) },
      luminousIntensity: { typ: r.log(0.01, 5), conditions: { current: 20e-3 } },
    },
  };
}

function optocoupler(i: number): PartCreateBody {
  return {
    family: 'optocoupler',
    manufacturer: 'Quillon Semiconductor',
    partNumber: `SL-OC${String(i).padStart(5, '0')}`,
    pinLayout: 'optocoupler-4lead',
    package: 'opto-4lead',
    parameters: {
      onResistance: { typ: r.log(300, 20e3), conditions: { current: r.pick([5e-3, 10e-3, 20e-3]) } },
      offResistance: { min: r.log(1e6, 100e6) },
      ledMaxCurrent: { max: r.pick([25e-3, 40e-3]) },
      turnOnTime: { typ: r.log(2e-3, 20e-3) },
      turnOffTime: { typ: r.log(20e-3, 500e-3) },
      cellMaterial: { value: 'cds' },
    },
  };
}

let ctx: TestContext;
const N = { 'op-amp': 1200, photoresistor: 700 } as const;

/** Straight into the table, as the benchmark loader does: a thousand parts through the service would take minutes. */
async function bulkInsert(parts: PartCreateBody[]) {
  const makers = new Map<string, string>();
  const findManufacturerId = async (_db: unknown, name: string) => {
    if (!makers.has(name)) makers.set(name, (await findOrCreateManufacturer(ctx.db, name)).id);
    return makers.get(name)!;
  };
  const rows = [];
  for (const raw of parts) {
    const p = PartCreateBodySchema.parse(raw);
    const layout = p.pinLayout ? (PIN_LAYOUTS as Record<string, { pins: Record<number, string> }>)[p.pinLayout] : undefined;
    rows.push({
      family: p.family,
      manufacturer_id: await findManufacturerId(ctx.db, p.manufacturer),
      part_number: p.partNumber,
      part_number_key: p.partNumber.toLowerCase().replace(/[^a-z0-9]/g, ''),
      lifecycle: p.lifecycle,
      rohs_status: p.rohsStatus,
      package: p.package,
      pin_layout: p.pinLayout,
      pin_map: Object.keys(p.pinMap).length ? p.pinMap : (layout?.pins ?? {}),
      parameters: p.parameters,
    });
  }
  await ctx.db.query(
    `INSERT INTO parts (family, manufacturer_id, part_number, part_number_key, lifecycle, rohs_status, package, pin_layout, pin_map, parameters)
     SELECT family, manufacturer_id, part_number, part_number_key, lifecycle, rohs_status, package, pin_layout, pin_map, parameters
       FROM jsonb_to_recordset($1::jsonb) AS x(family text, manufacturer_id uuid, part_number text, part_number_key text, lifecycle text,
            rohs_status text, package text, pin_layout text, pin_map jsonb, parameters jsonb)`,
    [JSON.stringify(rows)],
  );
}

beforeAll(async () => {
  ctx = await createTestContext();
  await ctx.db.query('TRUNCATE requirement_sets, equivalents, part_revisions, parts, manufacturers CASCADE');
  await bulkInsert([
    ...Array.from({ length: N['op-amp'] }, (_, i) => opAmp(i)),
    ...Array.from({ length: N.photoresistor }, (_, i) => photocell(i)),
    ...Array.from({ length: 20 }, (_, i) => led(i)),
    ...Array.from({ length: 100 }, (_, i) => brightLed(i)),
    ...Array.from({ length: 8 }, (_, i) => optocoupler(i)),
  ]);
  await ctx.db.query('ANALYZE parts');
});
afterAll(() => ctx.close());

/** Every part in scope, ranked by the engine alone. */
async function exhaustive(family: FamilyKey) {
  const rows: CandidateRow[] = await ctx.db.query(
    `SELECT ${CANDIDATE_COLUMNS} FROM parts p JOIN manufacturers m ON m.id = p.manufacturer_id WHERE p.family = $1 AND NOT p.archived`,
    [family],
  );
  return rows.map(candidateFromRow);
}

async function originals(family: FamilyKey, count: number): Promise<string[]> {
  const rows: { id: string }[] = await ctx.db.query(`SELECT id FROM parts WHERE family = $1 AND lifecycle <> 'obsolete' ORDER BY part_number_key`, [family]);
  const step = Math.floor(rows.length / count);
  return Array.from({ length: count }, (_, i) => rows[i * step]!.id);
}

describe('the alternates shortlist', () => {
  const QUERIES: Record<string, string>[] = [{}, { supply: '9 V' }, { supply: '±15 V', weights: 'slewRate:5,noise:0' }, { weights: 'pinout:0,lifecycle:5' }, { requireDropIn: '1' }, { allowObsolete: '1', limit: '40' }];

  it('is smaller than the family, so it has to choose', async () => {
    const [id] = await originals('op-amp', 1);
    const res = await findAlternates(ctx.db, id!, AlternatesQuerySchema.parse({}));
    expect(res.considered).toBeGreaterThan(SHORTLIST);
  });

  for (const [index, query] of QUERIES.entries()) {
    it(`keeps the engine's own top of the list for op amps (${JSON.stringify(query)})`, async () => {
      const parsed = AlternatesQuerySchema.parse(query);
      const all = await exhaustive('op-amp');
      for (const id of await originals('op-amp', 6 + index)) {
        const original = (await loadCandidate(ctx.db, id))!;
        const supply = parsed.supply ? parseSupplySpan(parsed.supply) : undefined;
        const expected = rankAlternates(original, all, {
          weights: (parseWeights(parsed.weights, 'op-amp') as { weights: Record<string, number> }).weights,
          ...(supply?.ok ? { operatingSupply: { min: supply.min, max: supply.max } } : {}),
          requireDropIn: parsed.requireDropIn,
          allowObsolete: parsed.allowObsolete,
        });
        const got = await findAlternates(ctx.db, id, parsed);
        expect(got.items.map((i) => i.part.partNumber)).toEqual(expected.items.slice(0, parsed.limit).map((i) => i.part.partNumber));
        expect(got.items.map((i) => i.score)).toEqual(expected.items.slice(0, parsed.limit).map((i) => i.score));
      }
    });
  }

  it("keeps the engine's own top of the list for photoresistors, with and without a paired LED", async () => {
    const all = await exhaustive('photoresistor');
    const [ledRow]: { id: string }[] = await ctx.db.query(`SELECT id FROM parts WHERE family = 'led' ORDER BY part_number_key LIMIT 1`);
    const pairedLed = (await loadCandidate(ctx.db, ledRow!.id))!;
    for (const id of await originals('photoresistor', 6)) {
      const original = (await loadCandidate(ctx.db, id))!;
      for (const paired of [false, true]) {
        const expected = rankAlternates(original, all, paired ? { pairedLed } : {});
        const got = await findAlternates(ctx.db, id, AlternatesQuerySchema.parse(paired ? { pairedWith: ledRow!.id } : {}));
        expect(got.items.map((i) => i.part.partNumber)).toEqual(expected.items.slice(0, 25).map((i) => i.part.partNumber));
      }
    }
  });

  it("keeps the engine's own best pairs for an optocoupler, among every LED with every photoresistor", async () => {
    const leds = await exhaustive('led');
    const cells = await exhaustive('photoresistor');
    // Every LED with every cell is some 80,000 pairs for the engine per original, so three originals.
    for (const id of await originals('optocoupler', 3)) {
      const original = (await loadCandidate(ctx.db, id))!;
      for (const query of [{}, { allowObsolete: '1', weights: 'turnOffTime:5' }]) {
        const parsed = AlternatesQuerySchema.parse(query);
        const weights = (parseWeights(parsed.weights, 'optocoupler') as { weights: Record<string, number> }).weights;
        const expected = rankPairs(original, leds, cells, { weights, allowObsolete: parsed.allowObsolete });
        const got = (await findAlternates(ctx.db, id, parsed)).pairs!;
        expect(got.items.map((p) => p.partNumber)).toEqual(expected.items.map((p) => p.partNumber));
        expect(got.items.map((p) => p.score)).toEqual(expected.items.map((p) => p.score));
      }
    }
  }, 60_000);

  it("keeps the engine's own top of the list for a position", async () => {
    const all = await exhaustive('op-amp');
    for (const input of [
      { family: 'op-amp', supply: { kind: 'single', volts: 9 }, signal: { peakVolts: 2, frequencyHz: 20_000 }, ledLoad: { outputVolts: 7, forwardVolts: 2, seriesOhms: 470 } },
      { family: 'op-amp', supply: { kind: 'dual', volts: 30 }, signal: { peakVolts: 10, frequencyHz: 20_000 } },
      { family: 'op-amp', supply: { kind: 'single', volts: 5, halfSupplyBias: true }, signal: { peakVolts: 1.5, frequencyHz: 5_000 }, allowObsolete: true },
    ]) {
      const req = PositionRequirementsSchema.parse(input);
      const expected = rankForPosition(req, all);
      const got = await rankPosition(ctx.db, req);
      expect(got.items.map((m) => m.part.partNumber)).toEqual(expected.items.slice(0, 50).map((m) => m.part.partNumber));
    }
  });
});
