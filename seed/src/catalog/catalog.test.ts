import { describe, expect, it } from 'vitest';
import {
  FAMILY_KEYS,
  PACKAGES,
  PIN_LAYOUTS,
  PartCreateBodySchema,
  isCadmiumCell,
  partNumberKey,
  type PartCreateBody,
} from '@understudy/shared-types';
import { MANUFACTURERS, MANUFACTURER_NAMES } from './manufacturers';
import { DEMO_PARTS, DEMO_SEARCH_EXAMPLES } from './parts';
import { SCENARIO } from './scenario';

// Self-consistency checks on invented demo data; no external reference applies.

const num = (p: PartCreateBody, key: string) => p.parameters?.[key];
const enumValue = (p: PartCreateBody, key: string) => p.parameters?.[key]?.value;

describe('demo catalog', () => {
  it('every part passes the create schema', () => {
    const failures = DEMO_PARTS.flatMap((p) => {
      const r = PartCreateBodySchema.safeParse(p);
      return r.success ? [] : [`${p.partNumber}: ${r.error.issues.map((i) => `${i.path.join('.')} ${i.message}`).join('; ')}`];
    });
    expect(failures).toEqual([]);
  });

  it('has at least 60 parts from at least 6 manufacturers, all of them listed', () => {
    expect(DEMO_PARTS.length).toBeGreaterThanOrEqual(60);
    expect(MANUFACTURERS.length).toBeGreaterThanOrEqual(6);
    const used = new Set(DEMO_PARTS.map((p) => p.manufacturer));
    expect(used.size).toBeGreaterThanOrEqual(6);
    for (const name of used) expect(MANUFACTURER_NAMES).toContain(name);
    for (const m of MANUFACTURERS) expect(m.description.length).toBeGreaterThan(10);
  });

  it('gives every family at least 6 parts', () => {
    for (const family of FAMILY_KEYS) {
      expect(DEMO_PARTS.filter((p) => p.family === family).length, family).toBeGreaterThanOrEqual(6);
    }
  });

  it('keeps part numbers unique per manufacturer, however they are spaced or cased', () => {
    const keys = DEMO_PARTS.map((p) => `${p.manufacturer}|${partNumberKey(p.partNumber)}`);
    expect(new Set(keys).size).toBe(keys.length);
  });

  it('uses known packages and pin layouts that fit them', () => {
    const packages = new Map<string, readonly string[]>(PACKAGES.map((p) => [p.key, p.families]));
    for (const p of DEMO_PARTS) {
      expect(packages.get(p.package ?? ''), `${p.partNumber} package`).toContain(p.family);
      if (p.pinLayout == null) {
        expect(Object.keys(p.pinMap ?? {}).length, `${p.partNumber} needs a pin map`).toBeGreaterThan(0);
        continue;
      }
      const layout = PIN_LAYOUTS[p.pinLayout as keyof typeof PIN_LAYOUTS];
      expect(layout, `${p.partNumber} layout`).toBeDefined();
      expect(layout.packages as readonly string[], `${p.partNumber} layout`).toContain(p.package);
    }
  });

  it('matches op amp pin layouts to channel counts', () => {
    const want: Record<number, string> = { 1: 'dip8-single-opamp', 2: 'dip8-dual-opamp', 4: 'dip14-quad-opamp' };
    for (const p of DEMO_PARTS.filter((x) => x.family === 'op-amp' && x.pinLayout != null)) {
      expect(p.pinLayout, p.partNumber).toBe(want[num(p, 'channels')?.typ ?? 0]);
    }
  });

  it('has at least 3 op amps that run on a 9 V single supply with slew of 5 V/µs or more', () => {
    const fits = DEMO_PARTS.filter((p) => {
      if (p.family !== 'op-amp') return false;
      const supply = num(p, 'supplyVoltage');
      const slew = num(p, 'slewRate');
      return (
        enumValue(p, 'singleSupply') === true &&
        supply?.min !== undefined &&
        supply.max !== undefined &&
        supply.min <= 9 &&
        supply.max >= 9 &&
        (slew?.typ ?? slew?.min ?? 0) >= 5e6
      );
    });
    expect(fits.length).toBeGreaterThanOrEqual(3);
  });

  it('also has op amps that miss the 9 V brief in each way', () => {
    const opAmps = DEMO_PARTS.filter((p) => p.family === 'op-amp');
    const supply = (p: PartCreateBody) => num(p, 'supplyVoltage')!;
    expect(opAmps.some((p) => supply(p).max! < 9)).toBe(true);
    expect(opAmps.some((p) => supply(p).min! > 9)).toBe(true);
    expect(opAmps.some((p) => enumValue(p, 'singleSupply') === false && supply(p).min! <= 9)).toBe(true);
    expect(opAmps.some((p) => supply(p).min! <= 9 && supply(p).max! >= 9 && num(p, 'slewRate')!.typ! < 5e6)).toBe(true);
  });

  it('gives cadmium cells a RoHS status other than compliant, with a note', () => {
    const cadmium = DEMO_PARTS.filter(
      (p) => (p.family === 'photoresistor' || p.family === 'optocoupler') && isCadmiumCell(enumValue(p, 'cellMaterial') as string),
    );
    expect(cadmium.some((p) => p.rohsStatus !== 'compliant')).toBe(true);
    for (const p of cadmium) {
      expect(p.rohsStatus, p.partNumber).not.toBe('compliant');
      expect(p.rohsNote, p.partNumber).not.toBe('');
    }
    const cadmiumFree = DEMO_PARTS.filter((p) => p.family === 'photoresistor' && enumValue(p, 'cellMaterial') === 'other');
    expect(cadmiumFree.length).toBeGreaterThan(0);
  });

  it('mixes lifecycles so substitution has work to do', () => {
    const count = (l: string) => DEMO_PARTS.filter((p) => p.lifecycle === l).length;
    expect(count('obsolete')).toBeGreaterThanOrEqual(3);
    expect(count('last-time-buy')).toBeGreaterThanOrEqual(3);
    expect(count('active')).toBeGreaterThan(DEMO_PARTS.length / 2);
  });

  it('stores values in SI base units within the ranges a datasheet would give', () => {
    for (const p of DEMO_PARTS.filter((x) => x.family === 'op-amp')) {
      const slew = num(p, 'slewRate')!.typ!;
      expect(slew, p.partNumber).toBeGreaterThanOrEqual(0.3e6);
      expect(slew, p.partNumber).toBeLessThanOrEqual(25e6);
      expect(num(p, 'inputNoiseDensity')!.typ!, p.partNumber).toBeLessThan(50e-9);
      expect(num(p, 'inputOffsetVoltage')!.max!, p.partNumber).toBeLessThan(10e-3);
    }
    for (const p of DEMO_PARTS.filter((x) => x.family === 'photoresistor')) {
      const light = num(p, 'lightResistance')!;
      expect(light.min!, p.partNumber).toBeGreaterThanOrEqual(2e3);
      expect(light.max!, p.partNumber).toBeLessThanOrEqual(200e3);
      expect(num(p, 'darkResistance')!.conditions?.time, p.partNumber).toBeGreaterThan(0);
      const peak = num(p, 'peakWavelength')!.typ!;
      expect(peak).toBeGreaterThanOrEqual(520e-9);
      expect(peak).toBeLessThanOrEqual(720e-9);
    }
    for (const p of DEMO_PARTS.filter((x) => x.family === 'led')) {
      expect(num(p, 'forwardVoltage')!.conditions?.current, p.partNumber).toBe(20e-3);
    }
  });

  it('gives every part a description and tags', () => {
    for (const p of DEMO_PARTS) {
      expect(p.description!.length, p.partNumber).toBeGreaterThan(40);
      expect(p.tags!.length, p.partNumber).toBeGreaterThan(0);
    }
  });

  it('holds the part numbers the search tests need', () => {
    const hits = DEMO_PARTS.filter((p) => partNumberKey(p.partNumber) === partNumberKey(DEMO_SEARCH_EXAMPLES.spacedQuery));
    expect(hits.map((p) => p.partNumber)).toEqual([DEMO_SEARCH_EXAMPLES.spacedMatch]);
    const [a, b] = DEMO_SEARCH_EXAMPLES.nearIdentical;
    const numbers = DEMO_PARTS.map((p) => p.partNumber);
    expect(numbers).toContain(a);
    expect(numbers).toContain(b);
    expect([...a].filter((ch, i) => ch !== b[i]).length).toBe(1);
  });

  it('has a one-paragraph scenario', () => {
    expect(SCENARIO).not.toContain('\n');
    expect(SCENARIO).toContain('Marrowbone Pedal Works');
  });
});
