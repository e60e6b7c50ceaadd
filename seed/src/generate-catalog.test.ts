import { describe, expect, it } from 'vitest';
import { FAMILY_KEYS, PACKAGES, PartCreateBodySchema, partNumberKey, type PartCreateBody } from '@understudy/shared-types';
import { generateSyntheticParts, syntheticManufacturers } from './generate-catalog';

// Self-consistency checks on generated benchmark data; no external reference applies.

const take = (n: number, seed?: number): PartCreateBody[] => [...generateSyntheticParts(n, seed)];

describe('synthetic catalog', () => {
  const parts = take(20_000);

  it('yields exactly n parts, lazily', () => {
    expect(parts).toHaveLength(20_000);
    const it = generateSyntheticParts(Number.MAX_SAFE_INTEGER, 3);
    expect(it.next().done).toBe(false);
  });

  it('passes the create schema for a sample of 2,000', () => {
    const sample = parts.filter((_, i) => i % 10 === 0);
    expect(sample).toHaveLength(2_000);
    const failures = sample.flatMap((p) => {
      const r = PartCreateBodySchema.safeParse(p);
      return r.success ? [] : [`${p.partNumber}: ${r.error.issues.map((i) => `${i.path.join('.')} ${i.message}`).join('; ')}`];
    });
    expect(failures.slice(0, 5)).toEqual([]);
  });

  it('is deterministic for a seed and differs between seeds', () => {
    expect(take(500, 7)).toEqual(take(500, 7));
    expect(take(500)).toEqual(parts.slice(0, 500));
    expect(take(500, 8)).not.toEqual(take(500, 7));
  });

  it('uses about 40 invented manufacturers', () => {
    const names = syntheticManufacturers();
    expect(names).toHaveLength(40);
    expect(new Set(names).size).toBe(40);
    expect(names.every((n) => n.startsWith('Synthetic '))).toBe(true);
    expect(new Set(parts.map((p) => p.manufacturer))).toEqual(new Set(names));
  });

  it('keeps part numbers unique per manufacturer after normalising', () => {
    const keys = new Set(parts.map((p) => `${p.manufacturer}|${partNumberKey(p.partNumber)}`));
    expect(keys.size).toBe(parts.length);
  });

  it('mixes families roughly 45/15/15/20/5', () => {
    const want = { 'op-amp': 0.45, photoresistor: 0.15, led: 0.15, potentiometer: 0.2, optocoupler: 0.05 };
    for (const family of FAMILY_KEYS) {
      const share = parts.filter((p) => p.family === family).length / parts.length;
      expect(share, family).toBeGreaterThan(want[family] - 0.02);
      expect(share, family).toBeLessThan(want[family] + 0.02);
    }
  });

  it('keeps most parts active', () => {
    const active = parts.filter((p) => p.lifecycle === 'active').length / parts.length;
    expect(active).toBeGreaterThan(0.8);
    expect(parts.some((p) => p.lifecycle === 'obsolete')).toBe(true);
  });

  it('spreads resistances and slew rates across decades', () => {
    const decades = (values: number[]) => new Set(values.map((v) => Math.floor(Math.log10(v)))).size;
    const slews = parts.filter((p) => p.family === 'op-amp').map((p) => p.parameters!.slewRate!.typ!);
    expect(Math.min(...slews)).toBeGreaterThanOrEqual(0.3e6);
    expect(Math.max(...slews)).toBeLessThanOrEqual(25e6);
    expect(decades(slews)).toBeGreaterThanOrEqual(2);
    const light = parts.filter((p) => p.family === 'photoresistor').map((p) => p.parameters!.lightResistance!.min!);
    expect(decades(light)).toBeGreaterThanOrEqual(2);
    const nineVolt = parts.filter((p) => {
      const s = p.parameters?.supplyVoltage;
      return p.family === 'op-amp' && p.parameters?.singleSupply?.value === true && s!.min! <= 9 && s!.max! >= 9;
    });
    expect(nineVolt.length).toBeGreaterThan(1000);
  });

  it('uses packages that belong to the family', () => {
    const families = new Map<string, readonly string[]>(PACKAGES.map((p) => [p.key, p.families]));
    for (const p of parts.slice(0, 2_000)) expect(families.get(p.package!), p.partNumber).toContain(p.family);
  });
});
