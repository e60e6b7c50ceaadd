import { describe, expect, it } from 'vitest';
import { formatQuantity } from '../units/format';
import { parseQuantity } from '../units/parse';
import { canonicalUnit, displayUnitExponent, UNITS } from '../units/units';
import { CADMIUM_CAUTION, CADMIUM_HANDLING_NOTE, isCadmiumCell } from './cadmium';
import { FAMILIES, FamilyKeySchema, getFamily, getParameter, isFamilyKey } from './families';
import { CONDITIONS, CONDITION_KEYS, FAMILY_KEYS, VALUE_SLOTS } from './types';

const allParameters = FAMILY_KEYS.flatMap((f) => FAMILIES[f].parameters.map((p) => ({ family: f, p })));

describe('FAMILIES definitions are consistent', () => {
  it('has every family key, each keyed by itself, with labels', () => {
    expect(Object.keys(FAMILIES).sort()).toEqual([...FAMILY_KEYS].sort());
    for (const key of FAMILY_KEYS) {
      const f = FAMILIES[key];
      expect(f.key).toBe(key);
      expect(f.label.length).toBeGreaterThan(0);
      expect(f.pluralLabel.length).toBeGreaterThan(f.label.length - 1);
      expect(f.description.length).toBeGreaterThan(10);
      expect(f.parameters.length).toBeGreaterThan(3);
    }
  });

  it('uses unique parameter keys within each family', () => {
    for (const key of FAMILY_KEYS) {
      const keys = FAMILIES[key].parameters.map((p) => p.key);
      expect(new Set(keys).size, key).toBe(keys.length);
      for (const k of keys) expect(k).toMatch(/^[a-z][A-Za-z0-9]*$/);
    }
  });

  it.each(allParameters.map(({ family, p }) => [`${family}.${p.key}`, p] as const))(
    '%s is well formed',
    (_, p) => {
      expect(p.label.length).toBeGreaterThan(0);
      expect(p.description.length).toBeGreaterThan(10);
      expect(p.description.includes('\n')).toBe(false);
      if (p.kind === 'number') {
        expect(p.slots?.length).toBeGreaterThan(0);
        for (const s of p.slots!) expect(VALUE_SLOTS).toContain(s);
        for (const c of p.conditions ?? []) expect(CONDITION_KEYS).toContain(c);
        expect(p.precision).toBeGreaterThan(0);
        expect(p.choices).toBeUndefined();
        if (p.unit !== undefined) {
          // Stored in the canonical unit, described by the same quantity the unit table uses.
          expect(canonicalUnit(p.unit)).toBe(p.unit);
          expect(p.quantity).toBe(UNITS[canonicalUnit(p.unit)!].quantity);
        } else {
          expect(p.displayUnit).toBeUndefined();
        }
      } else {
        expect(p.unit).toBeUndefined();
        expect(p.slots).toBeUndefined();
      }
      if (p.kind === 'enum') {
        expect(p.choices?.length).toBeGreaterThan(1);
        const values = p.choices!.map((c) => c.value);
        expect(new Set(values).size).toBe(values.length);
        for (const c of p.choices!) expect(c.label.length).toBeGreaterThan(0);
      }
    },
  );

  // ISO 80000-1 SI prefixes: every display unit is a power-of-ten rescaling of the stored unit.
  it.each(allParameters.filter(({ p }) => p.displayUnit).map(({ family, p }) => [`${family}.${p.key}`, p] as const))(
    '%s: display unit converts with formatQuantity and parses back (ISO 80000-1 SI prefixes)',
    (_, p) => {
      expect(displayUnitExponent(p.displayUnit!, p.unit!)).toBeTypeOf('number');
      const text = formatQuantity(1.5 * 10 ** displayUnitExponent(p.displayUnit!, p.unit!)!, p.unit!, {
        displayUnit: p.displayUnit!,
      });
      expect(text.startsWith('1.5')).toBe(true);
      const back = parseQuantity(text, { unit: p.unit! });
      expect(back.ok).toBe(true);
    },
  );

  it('gives every test condition a known unit (ISO 80000 unit symbols)', () => {
    for (const key of CONDITION_KEYS) {
      expect(canonicalUnit(CONDITIONS[key].unit)).toBe(CONDITIONS[key].unit);
      if (CONDITIONS[key].displayUnit) {
        expect(displayUnitExponent(CONDITIONS[key].displayUnit!, CONDITIONS[key].unit)).toBeTypeOf('number');
      }
    }
  });

  it('keeps the fixed API keys of the brief', () => {
    const keys = (f: keyof typeof FAMILIES) => FAMILIES[f].parameters.map((p) => p.key);
    expect(keys('op-amp')).toEqual([
      'channels',
      'supplyVoltage',
      'singleSupply',
      'slewRate',
      'gainBandwidth',
      'inputOffsetVoltage',
      'inputBiasCurrent',
      'inputNoiseDensity',
      'outputCurrent',
      'quiescentCurrent',
      'railToRailInput',
      'railToRailOutput',
      'inputStage',
      'operatingTemperature',
    ]);
    expect(keys('photoresistor')).toEqual([
      'darkResistance',
      'lightResistance',
      'gamma',
      'peakWavelength',
      'riseTime',
      'decayTime',
      'maxVoltage',
      'powerDissipation',
      'cellMaterial',
      'cellDiameter',
    ]);
    expect(keys('led')).toEqual([
      'colour',
      'peakWavelength',
      'forwardVoltage',
      'forwardCurrent',
      'luminousIntensity',
      'viewingAngle',
      'ledPackage',
      'lens',
    ]);
    expect(keys('potentiometer')).toEqual([
      'resistance',
      'taper',
      'tolerance',
      'powerRating',
      'gangs',
      'bodySize',
      'shaftType',
      'shaftLength',
      'mounting',
      'centreDetent',
    ]);
    expect(keys('optocoupler')).toEqual(
      expect.arrayContaining(['onResistance', 'offResistance', 'ledForwardVoltage', 'ledMaxCurrent', 'turnOnTime', 'turnOffTime']),
    );
  });

  it('describes the supply range as a total span (common practice, no source)', () => {
    const p = getParameter('op-amp', 'supplyVoltage')!;
    expect(p.unit).toBe('V');
    expect(p.slots).toEqual(['min', 'max']);
    expect(p.description).toMatch(/±X V supply is 2X V/);
  });

  it('stores slew rate in V/s and shows it per µs (ISO 80000-1 SI prefixes)', () => {
    const p = getParameter('op-amp', 'slewRate')!;
    expect(p.unit).toBe('V/s');
    expect(p.displayUnit).toBe('V/µs');
    expect(formatQuantity(13e6, p.unit!, { displayUnit: p.displayUnit! })).toBe('13 V/µs');
  });

  it('labels pot tapers in words, not region-dependent letter codes (common practice, no source)', () => {
    expect(getParameter('potentiometer', 'taper')!.choices).toEqual([
      { value: 'linear', label: 'Linear' },
      { value: 'log', label: 'Logarithmic (audio)' },
      { value: 'reverse-log', label: 'Reverse logarithmic' },
    ]);
  });
});

describe('helpers', () => {
  it('getFamily and getParameter find definitions, and say so when they do not', () => {
    expect(getFamily('led').label).toBe('LED');
    expect(getParameter('led', 'forwardVoltage')?.unit).toBe('V');
    expect(getParameter(getFamily('led'), 'nope')).toBeUndefined();
    expect(() => getFamily('valve' as never)).toThrow(RangeError);
    expect(isFamilyKey('op-amp')).toBe(true);
    expect(isFamilyKey('valve')).toBe(false);
    expect(FamilyKeySchema.safeParse('optocoupler').success).toBe(true);
    expect(FamilyKeySchema.safeParse('valve').success).toBe(false);
  });
});

describe('cadmium', () => {
  it('flags CdS and CdSe cells (RoHS Directive 2011/65/EU restricts cadmium)', () => {
    expect(isCadmiumCell('cds')).toBe(true);
    expect(isCadmiumCell('cdse')).toBe(true);
    expect(isCadmiumCell('CdS')).toBe(true);
    expect(isCadmiumCell('CdSe')).toBe(true);
    expect(isCadmiumCell('CdTe')).toBe(true);
    expect(isCadmiumCell('other')).toBe(false);
    expect(isCadmiumCell(undefined)).toBe(false);
    for (const c of getParameter('photoresistor', 'cellMaterial')!.choices!) {
      expect(isCadmiumCell(c.value)).toBe(c.value !== 'other');
    }
  });

  it('words the caution and handling note to defer to local rules (RoHS Directive 2011/65/EU)', () => {
    expect(CADMIUM_CAUTION).toMatch(/RoHS/);
    expect(CADMIUM_CAUTION).toMatch(/exemption/);
    expect(CADMIUM_CAUTION).toMatch(/local rules/);
    expect(CADMIUM_HANDLING_NOTE).toMatch(/break, burn or grind/);
    expect(CADMIUM_HANDLING_NOTE).toMatch(/hazardous waste/);
    expect(CADMIUM_HANDLING_NOTE).toMatch(/local codes/);
  });
});
