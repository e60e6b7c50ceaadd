import { describe, expect, it } from 'vitest';
import { RankedAlternateSchema, type CandidatePart, type EquivalentDto } from '../alternates';
import { hardRequirementFailures, rankAlternates, scoreCandidate } from './rank';
import { cdsCell, dualOpAmp, logPot, ruling, testId, variant } from './test-parts';

describe('hard requirements', () => {
  const original = dualOpAmp();

  it('passes a plain substitute', () => {
    expect(hardRequirementFailures(original, variant(original, 'FX-OK'), { operatingSupply: { min: 9, max: 9 }, requireDropIn: true })).toEqual([]);
  });

  it('refuses another family, and says only that', () => {
    expect(hardRequirementFailures(original, cdsCell(), {})).toEqual(['is a photoresistor, not an op amp']);
  });

  it('refuses another channel count, reading the layout when the parameter is missing', () => {
    const quad = variant(original, 'FX-4', {}, { channels: { typ: 4 } });
    expect(hardRequirementFailures(original, quad, {})).toEqual(['has 4 channels; the original has 2']);
    const single = variant(original, 'FX-1', { pinLayout: 'dip8-single-opamp' }, { channels: undefined });
    expect(hardRequirementFailures(original, single, {})).toEqual(['has 1 channel; the original has 2']);
  });

  it('refuses a supply range that does not cover the operating supply, or states none', () => {
    const high = variant(original, 'FX-HV', {}, { supplyVoltage: { min: 10, max: 36 } });
    expect(hardRequirementFailures(original, high, { operatingSupply: { min: 9, max: 9 } })).toEqual(['supply range 10 V to 36 V does not cover 9 V']);
    expect(hardRequirementFailures(original, high, { operatingSupply: { min: 12, max: 30 } })).toEqual([]);
    const silent = variant(original, 'FX-?', {}, { supplyVoltage: undefined });
    expect(hardRequirementFailures(original, silent, { operatingSupply: { min: 9, max: 9 } })).toEqual([
      'states no supply range, so it cannot be shown to run on 9 V',
    ]);
    // Without an operating supply, supply is only scored.
    expect(hardRequirementFailures(original, high, {})).toEqual([]);
  });

  it('refuses anything but a drop-in when one is required; a package change alone is allowed', () => {
    const adapter = variant(original, 'FX-AD', { pinLayout: null, pinMap: { 1: 'OUT A', 2: '+IN A', 3: '-IN A', 4: 'V-', 5: '+IN B', 6: '-IN B', 7: 'OUT B', 8: 'V+' } });
    const [reason] = hardRequirementFailures(original, adapter, { requireDropIn: true });
    expect(reason).toMatch(/^not a drop-in: The same functions on other pins \(2 and 3\)/);
    expect(hardRequirementFailures(original, adapter, {})).toEqual([]);
    expect(hardRequirementFailures(original, variant(original, 'FX-S', { package: 'SOIC-8' }), { requireDropIn: true })).toEqual([]);
    const unknown = variant(original, 'FX-U', { pinLayout: null, pinMap: {} });
    expect(hardRequirementFailures(original, unknown, { requireDropIn: true })[0]).toMatch(/^not a drop-in: This part's pin map is not recorded/);
  });

  it('refuses obsolete parts unless they are allowed', () => {
    const old = variant(original, 'FX-OLD', { lifecycle: 'obsolete' });
    expect(hardRequirementFailures(original, old, {})).toEqual(['is obsolete']);
    expect(hardRequirementFailures(original, old, { allowObsolete: true })).toEqual([]);
    expect(hardRequirementFailures(original, variant(original, 'FX-LTB', { lifecycle: 'last-time-buy' }), {})).toEqual([]);
  });

  it("refuses a pair an editor rejected, quoting the use and the note", () => {
    const c = variant(original, 'FX-OSC');
    const equivalents = new Map([[c.id, ruling(original, c, 'rejected', 'fuzz gain stage', 'oscillates at unity gain')]]);
    expect(hardRequirementFailures(original, c, { equivalents })).toEqual(['an editor rejected this pair for fuzz gain stage: oscillates at unity gain']);
    const bare = new Map([[c.id, ruling(original, c, 'rejected', 'any')]]);
    expect(hardRequirementFailures(original, c, { equivalents: bare })).toEqual(['an editor rejected this pair for any']);
  });

  it('refuses another taper or another gang count for a pot', () => {
    const pot = logPot();
    expect(hardRequirementFailures(pot, variant(pot, 'PT-LIN', {}, { taper: { value: 'linear' } }), {})).toEqual([
      "taper is linear; the original's is logarithmic (audio)",
    ]);
    expect(hardRequirementFailures(pot, variant(pot, 'PT-DUAL', {}, { gangs: { typ: 2 } }), {})).toEqual(['has 2 gangs; the original has 1']);
    expect(hardRequirementFailures(pot, variant(pot, 'PT-DUAL6', { pinLayout: 'pot-dual-6lug' }, { gangs: undefined }), {})).toEqual([
      'has 2 gangs; the original has 1',
    ]);
  });

  it('lists every failure at once', () => {
    const bad = variant(original, 'FX-BAD', { lifecycle: 'obsolete' }, { channels: { typ: 1 }, supplyVoltage: { min: 10, max: 30 } });
    expect(hardRequirementFailures(original, bad, { operatingSupply: { min: 9, max: 9 } })).toEqual([
      'has 1 channel; the original has 2',
      'supply range 10 V to 30 V does not cover 9 V',
      'is obsolete',
    ]);
  });
});

describe('rankAlternates', () => {
  const original = dualOpAmp();

  it('splits suitable from unsuitable, and never lists the original itself', () => {
    const same = { ...original };
    const fine = variant(original, 'FX-FINE');
    const old = variant(original, 'FX-OLD', { lifecycle: 'obsolete' });
    const r = rankAlternates(original, [same, old, fine, cdsCell('LX-1')], {});
    expect(r.items.map((i) => i.part.partNumber)).toEqual(['FX-FINE']);
    expect(r.unsuitable.map((u) => [u.part.partNumber, u.reasons])).toEqual([
      ['FX-OLD', ['is obsolete']],
      ['LX-1', ['is a photoresistor, not an op amp']],
    ]);
  });

  it('lists approved equivalents first, by score among themselves, then the rest by score, ties by part number', () => {
    const best = variant(original, 'FX-BEST');
    const tieB = variant(original, 'FX-TIE-B', {}, { slewRate: { typ: 5e6 } });
    const tieA = variant(original, 'FX-TIE-A', {}, { slewRate: { typ: 5e6 } });
    const approvedLow = variant(original, 'FX-APP-LOW', {}, { slewRate: { typ: 1e6 }, gainBandwidth: { typ: 0.3e6 } });
    const approvedMid = variant(original, 'FX-APP-MID', {}, { slewRate: { typ: 2e6 } });
    const equivalents = new Map<string, EquivalentDto>([
      [approvedLow.id, ruling(original, approvedLow, 'approved', 'any', 'used in the reissue')],
      [approvedMid.id, ruling(approvedMid, original, 'approved')],
    ]);
    const r = rankAlternates(original, [tieB, approvedLow, best, tieA, approvedMid], { equivalents });
    expect(r.items.map((i) => i.part.partNumber)).toEqual(['FX-APP-MID', 'FX-APP-LOW', 'FX-BEST', 'FX-TIE-A', 'FX-TIE-B']);
    expect(r.items[0]!.score).toBeLessThan(r.items[2]!.score);
    expect(r.items[1]!.equivalent?.note).toBe('used in the reissue');
    expect(r.items[2]!.equivalent).toBeNull();
    expect(r.items[3]!.score).toBe(r.items[4]!.score);
  });

  it('gives each item the breakdown scoreCandidate gives, written when first read', () => {
    const c = variant(original, 'FX-9', { package: 'SOIC-8', rohsStatus: 'unknown' }, { slewRate: { typ: 9e6 }, inputNoiseDensity: undefined });
    const options = { operatingSupply: { min: 9, max: 9 } };
    const [item] = rankAlternates(original, [c], options).items;
    const direct = scoreCandidate(original, c, options);
    expect(Object.keys(item!)).toEqual(['part', 'score', 'breakdown', 'pinout', 'equivalent']);
    expect(item).toEqual(direct);
    expect({ ...item }).toEqual(direct);
    expect(JSON.parse(JSON.stringify(item))).toEqual(JSON.parse(JSON.stringify(direct)));
    expect(RankedAlternateSchema.parse(item)).toEqual(direct);
    // Read once, it stays put; it can be replaced like any property.
    expect(item!.breakdown).toBe(item!.breakdown);
    item!.breakdown = [];
    expect(item!.breakdown).toEqual([]);
  });

  it('weights and options change nothing but the order', () => {
    const a = variant(original, 'FX-A', {}, { slewRate: { typ: 30e6 }, inputNoiseDensity: { typ: 40e-9 } });
    const b = variant(original, 'FX-B', {}, { slewRate: { typ: 3e6 }, inputNoiseDensity: { typ: 4e-9 } });
    const byNoise = rankAlternates(original, [a, b], { weights: { noise: 5, slewRate: 0 } });
    const bySlew = rankAlternates(original, [a, b], { weights: { noise: 0, slewRate: 5 } });
    expect(byNoise.items.map((i) => i.part.partNumber)).toEqual(['FX-B', 'FX-A']);
    expect(bySlew.items.map((i) => i.part.partNumber)).toEqual(['FX-A', 'FX-B']);
  });

  it('handles 20,000 candidates (a sanity check, not a timing)', () => {
    let seed = 7;
    const rnd = () => (seed = (seed * 48271) % 2147483647) / 2147483647;
    const candidates: CandidatePart[] = Array.from({ length: 20_000 }, (_, i) =>
      variant(
        original,
        `SYN-${String(i).padStart(5, '0')}`,
        { id: testId(), package: rnd() < 0.5 ? 'DIP-8' : 'SOIC-8', lifecycle: rnd() < 0.05 ? 'obsolete' : 'active' },
        {
          channels: { typ: rnd() < 0.9 ? 2 : 4 },
          supplyVoltage: { min: 3 + Math.round(rnd() * 8), max: 18 + Math.round(rnd() * 26) },
          slewRate: { typ: 1e6 * (0.3 + rnd() * 30) },
          inputNoiseDensity: { typ: (3 + rnd() * 40) * 1e-9 },
          inputBiasCurrent: { typ: 10 ** (-12 + rnd() * 5) },
        },
      ),
    );
    const r = rankAlternates(original, candidates, { operatingSupply: { min: 9, max: 9 } });
    expect(r.items.length + r.unsuitable.length).toBe(20_000);
    expect(r.items.length).toBeGreaterThan(5_000);
    expect(r.items.every((item, i) => item.score >= 0 && item.score <= 100 && (i === 0 || r.items[i - 1]!.score >= item.score))).toBe(true);
    expect(r.items[0]!.breakdown).toHaveLength(13);
  });
});
