import type { FamilyKey } from '@understudy/shared-types';
import { describe, expect, it } from 'vitest';
import { candidatesFromProse, type Passage } from './prose';

function read(text: string, family: FamilyKey = 'op-amp', section: Passage['section'] = null) {
  const passage: Passage = { page: 1, text, spans: [], order: 0, section, listLike: false };
  return candidatesFromProse([passage], { family, documentText: text });
}
const valueOf = (text: string, key: string, family: FamilyKey = 'op-amp') => read(text, family).find((c) => c.key === key)?.value;

describe('candidatesFromProse', () => {
  it('reads the slot from the wording', () => {
    expect(valueOf('The slew rate is typically 9 V/µs.', 'slewRate')).toEqual({ typ: 9e6 });
    expect(valueOf('The slew rate is no less than 7.5 V/us, with 10 V/us typical.', 'slewRate')).toEqual({ min: 7.5e6, typ: 10e6 });
    expect(valueOf('The input offset voltage is 0.5 mV typical and does not exceed 2.5 mV.', 'inputOffsetVoltage')).toEqual({ typ: 0.0005, max: 0.0025 });
    expect(valueOf('Input bias current: 100 pA at most.', 'inputBiasCurrent')).toEqual({ max: 1e-10 });
  });

  it('gives each number to the nearest name whose unit it fits', () => {
    const out = read('A typical tolerance of the total resistance of ±30% is achieved with a total resistance of 1 M Ω.', 'potentiometer');
    expect(out.find((c) => c.key === 'tolerance')?.value).toEqual({ typ: 30 });
    expect(out.find((c) => c.key === 'resistance')?.value).toEqual({ typ: 1e6 });
    expect(valueOf('The 9 V/µs slew rate suits audio.', 'slewRate')).toEqual({ typ: 9e6 });
  });

  it('leaves test conditions and numbers without units alone', () => {
    expect(valueOf('The input offset voltage (VCM = 0 V) is 0.5 mV typical.', 'inputOffsetVoltage')).toEqual({ typ: 0.0005 });
    expect(valueOf('The slew rate improved in 2019 by 30 percent.', 'slewRate')).toBeUndefined();
    expect(valueOf('Dual-gang control, issue 2025-10-28.', 'gangs', 'potentiometer')).toBeUndefined();
    expect(valueOf('Number of gangs: 2', 'gangs', 'potentiometer')).toEqual({ typ: 2 });
  });

  it('reads ranges, "between … and …" and supplies as spans', () => {
    expect(valueOf('It runs from split supplies of ±2 V to ±18 V.', 'supplyVoltage')).toEqual({ min: 4, max: 36 });
    expect(valueOf('The resistance at 10 lx is typically 4.6K, and lies between 3K and 7K.', 'lightResistance', 'photoresistor')).toMatchObject({ min: 3000, max: 7000 });
  });

  it('reads a limit stated without a name when one limit of the family has that unit', () => {
    expect(valueOf('The cell may be operated at up to 320 V (DC or AC peak).', 'maxVoltage', 'photoresistor')).toEqual({ max: 320 });
    expect(valueOf('Do not exceed a continuous forward current of 25 mA.', 'forwardCurrent', 'led')).toEqual({ max: 0.025 });
  });

  it('keeps derating and light resistance at other illuminances out', () => {
    expect(valueOf('Derate power dissipation by 4.4 mW/°C above 25 °C.', 'powerDissipation', 'photoresistor')).toBeUndefined();
    expect(valueOf('The light resistance at 100 lx is 2 kΩ.', 'lightResistance', 'photoresistor')).toBeUndefined();
  });

  it('reads word values around their name', () => {
    expect(valueOf('The track follows a linear resistance law.', 'taper', 'potentiometer')).toEqual({ value: 'linear' });
  });

  it('takes only limits from an absolute-maximum section', () => {
    const section = { line: { text: 'Absolute maximum ratings' }, text: 'Absolute maximum ratings', kind: 'absolute-maximum' } as unknown as Passage['section'];
    const out = read('Dark resistance 1 MΩ. Maximum voltage 150 V.', 'photoresistor', section);
    expect(out.map((c) => [c.key, c.origin])).toEqual([['maxVoltage', 'absolute-maximum']]);
  });

  it('gives prose lower confidence than a labelled statement', () => {
    const [plain] = read('The slew rate is typically 9 V/µs.');
    const [labelled] = read('Slew rate: 9 V/µs typical.');
    expect(plain!.confidence).toBeLessThan(labelled!.confidence);
    expect(plain!.origin).toBe('prose');
  });
});
