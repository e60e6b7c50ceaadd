import { describe, expect, it } from 'vitest';
import { parametersSchemaFor, ParameterValueSchema } from './schema';
import { FAMILY_KEYS } from './types';

function messages(result: { success: boolean; error?: { issues: { message: string }[] } }): string[] {
  return result.error?.issues.map((i) => i.message) ?? [];
}

// Example values are invented, in SI base units as the catalog stores them.
describe('ParameterValueSchema', () => {
  it('accepts ordered min ≤ typ ≤ max with conditions', () => {
    expect(ParameterValueSchema.safeParse({ min: 3, max: 32 }).success).toBe(true);
    expect(ParameterValueSchema.safeParse({ min: 1, typ: 2, max: 3, conditions: { supply: 30 } }).success).toBe(true);
    expect(ParameterValueSchema.safeParse({ typ: 2, max: 2 }).success).toBe(true);
    expect(ParameterValueSchema.safeParse({ value: 'cmos' }).success).toBe(true);
    expect(ParameterValueSchema.safeParse({ value: true }).success).toBe(true);
    expect(ParameterValueSchema.safeParse({ typ: 1e6, conditions: { time: 10 } }).success).toBe(true);
  });

  it('refuses min above max, typ outside, infinities and strange keys', () => {
    expect(messages(ParameterValueSchema.safeParse({ min: 5, max: 3 }))).toEqual(['max must not be below min']);
    expect(ParameterValueSchema.safeParse({ min: 5, typ: 4 }).success).toBe(false);
    expect(ParameterValueSchema.safeParse({ typ: 5, max: 4 }).success).toBe(false);
    expect(ParameterValueSchema.safeParse({ typ: Number.POSITIVE_INFINITY }).success).toBe(false);
    expect(ParameterValueSchema.safeParse({ typ: Number.NaN }).success).toBe(false);
    expect(ParameterValueSchema.safeParse({ nominal: 4 }).success).toBe(false);
    expect(ParameterValueSchema.safeParse({ typ: 1, conditions: { humidity: 50 } }).success).toBe(false);
  });
});

describe('parametersSchemaFor', () => {
  const opAmp = parametersSchemaFor('op-amp');

  it('accepts a good set of op amp values (invented part)', () => {
    const r = opAmp.safeParse({
      channels: { typ: 2 },
      supplyVoltage: { min: 3, max: 32 },
      singleSupply: { value: true },
      slewRate: { typ: 13e6, conditions: { supply: 30, temperature: 25 } },
      gainBandwidth: { typ: 3e6 },
      inputOffsetVoltage: { typ: 0.5e-3, max: 3e-3 },
      inputBiasCurrent: { typ: 20e-12, max: 200e-12 },
      inputNoiseDensity: { typ: 12e-9 },
      inputStage: { value: 'jfet' },
      operatingTemperature: { min: -40, max: 85 },
    });
    expect(r.success, JSON.stringify(r.error?.issues)).toBe(true);
    expect(opAmp.safeParse({}).success).toBe(true);
  });

  it('accepts good values in every family (invented parts)', () => {
    expect(
      parametersSchemaFor('photoresistor').safeParse({
        darkResistance: { min: 0.5e6, conditions: { time: 10 } },
        lightResistance: { min: 8e3, max: 20e3 },
        gamma: { typ: 0.7 },
        cellMaterial: { value: 'cds' },
      }).success,
    ).toBe(true);
    expect(
      parametersSchemaFor('led').safeParse({
        colour: { value: 'red' },
        forwardVoltage: { typ: 1.9, max: 2.4, conditions: { current: 0.02 } },
        luminousIntensity: { typ: 0.1 },
        viewingAngle: { typ: 30 },
      }).success,
    ).toBe(true);
    expect(
      parametersSchemaFor('potentiometer').safeParse({
        resistance: { typ: 100e3 },
        taper: { value: 'log' },
        tolerance: { typ: 20 },
        centreDetent: { value: false },
      }).success,
    ).toBe(true);
    expect(
      parametersSchemaFor('optocoupler').safeParse({
        onResistance: { typ: 200, max: 500, conditions: { current: 0.02 } },
        offResistance: { min: 50e6 },
      }).success,
    ).toBe(true);
  });

  it('refuses min above max', () => {
    const r = opAmp.safeParse({ supplyVoltage: { min: 32, max: 3 } });
    expect(r.success).toBe(false);
    expect(r.error?.issues[0]?.path).toEqual(['supplyVoltage', 'max']);
  });

  it('refuses unknown parameter keys by name', () => {
    const r = opAmp.safeParse({ slewrate: { typ: 1 } });
    expect(messages(r)).toEqual(['"slewrate" is not a parameter of op amps']);
    const r2 = parametersSchemaFor('led').safeParse({ gamma: { typ: 1 }, darkResistance: { min: 1 } });
    expect(messages(r2)).toEqual(['"gamma" or "darkResistance" are not parameters of LEDs']);
  });

  it('refuses a slot the parameter does not use', () => {
    const r = opAmp.safeParse({ supplyVoltage: { typ: 15 } });
    expect(messages(r)).toEqual(['Supply range gives min or max, not typ']);
    expect(opAmp.safeParse({ gainBandwidth: { max: 1e6 } }).success).toBe(false);
  });

  it('refuses an empty number value and conditions the parameter does not take', () => {
    expect(messages(opAmp.safeParse({ slewRate: {} }))).toEqual(['Give slew rate as min or typ']);
    expect(opAmp.safeParse({ slewRate: { typ: 1e6, conditions: { current: 1 } } }).success).toBe(false);
    expect(opAmp.safeParse({ channels: { typ: 2, conditions: { supply: 30 } } }).success).toBe(false);
  });

  it('refuses enum values outside the choices, and wrong kinds', () => {
    expect(messages(opAmp.safeParse({ inputStage: { value: 'valve' } }))).toEqual([
      'Input stage must be one of bipolar, jfet or cmos',
    ]);
    expect(opAmp.safeParse({ singleSupply: { value: 'yes' } }).success).toBe(false);
    expect(opAmp.safeParse({ singleSupply: true }).success).toBe(false);
    expect(opAmp.safeParse({ channels: { typ: '2' } }).success).toBe(false);
    expect(opAmp.safeParse({ channels: { value: 2 } }).success).toBe(false);
  });

  it('builds one schema per family and reuses it', () => {
    for (const f of FAMILY_KEYS) expect(parametersSchemaFor(f)).toBe(parametersSchemaFor(f));
  });
});
