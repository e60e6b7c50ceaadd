import { describe, expect, it } from 'vitest';
import { matchLabel } from './synonyms';

const key = (...args: Parameters<typeof matchLabel>) => matchLabel(...args)?.synonym.key ?? null;

describe('matchLabel', () => {
  it('names op amp parameters by words or symbol', () => {
    expect(key('op-amp', 'Slew rate')).toBe('slewRate');
    expect(key('op-amp', '', 'SR')).toBe('slewRate');
    for (const label of ['Gain bandwidth product', 'Gain-bandwidth product', 'Unity-gain bandwidth', 'GBW', 'GBP']) expect(key('op-amp', label), label).toBe('gainBandwidth');
    expect(key('op-amp', '', 'VIO')).toBe('inputOffsetVoltage');
    expect(key('op-amp', 'Input bias current', 'IB')).toBe('inputBiasCurrent');
    expect(key('op-amp', 'Input voltage noise density', 'en')).toBe('inputNoiseDensity');
    expect(key('op-amp', 'Output short-circuit current', 'ISC')).toBe('outputCurrent');
    for (const label of ['Supply current', 'Quiescent current', 'Supply current per amplifier']) expect(key('op-amp', label), label).toBe('quiescentCurrent');
    expect(key('op-amp', '', 'ICC')).toBe('quiescentCurrent');
    for (const label of ['Supply voltage range', 'Operating supply voltage']) expect(key('op-amp', label), label).toBe('supplyVoltage');
  });

  it('ranks an explicit output current over a short-circuit current', () => {
    expect(matchLabel('op-amp', 'Output current')!.synonym.rank).toBeGreaterThan(matchLabel('op-amp', 'Output short-circuit current')!.synonym.rank!);
  });

  it('rejects look-alikes that are other quantities', () => {
    for (const label of ['Input offset voltage drift', 'Input offset current', 'Power-supply rejection ratio', 'Input current noise density', 'Supply voltage rejection', 'Full-power bandwidth']) {
      expect(['inputOffsetVoltage', 'gainBandwidth', 'supplyVoltage', 'inputNoiseDensity', 'inputBiasCurrent'].includes(key('op-amp', label) ?? ''), label).toBe(false);
    }
    expect(key('led', 'Dominant wavelength', 'λd')).toBeNull();
    expect(key('led', 'Peak forward current (1/10 duty)', 'IFP')).toBeNull();
    expect(key('potentiometer', 'Residual resistance')).toBeNull();
    expect(key('potentiometer', 'Insulation resistance')).toBeNull();
    expect(key('potentiometer', 'Gang tracking error')).toBeNull();
  });

  it('names photoresistor, LED and potentiometer parameters', () => {
    expect(key('photoresistor', 'Dark resistance')).toBe('darkResistance');
    expect(key('photoresistor', 'Resistance at 10 lux')).toBe('lightResistance');
    expect(key('photoresistor', 'Light resistance')).toBe('lightResistance');
    expect(key('photoresistor', '', 'γ')).toBe('gamma');
    expect(key('photoresistor', 'Peak spectral response', 'λp')).toBe('peakWavelength');
    expect(key('photoresistor', 'Rise time')).toBe('riseTime');
    expect(key('photoresistor', 'Decay time')).toBe('decayTime');
    expect(key('photoresistor', 'Max voltage')).toBe('maxVoltage');
    expect(key('photoresistor', 'Power dissipation')).toBe('powerDissipation');
    expect(key('led', 'Forward voltage', 'VF')).toBe('forwardVoltage');
    expect(key('led', '', 'IF')).toBe('forwardCurrent');
    expect(key('led', 'Luminous intensity', 'IV')).toBe('luminousIntensity');
    expect(key('led', '', '2θ½')).toBe('viewingAngle');
    expect(key('led', '', '2θ1/2')).toBe('viewingAngle');
    expect(key('potentiometer', 'Taper')).toBe('taper');
    expect(key('potentiometer', 'Resistance law')).toBe('taper');
    expect(key('potentiometer', 'Tolerance')).toBe('tolerance');
    expect(key('potentiometer', 'Power rating')).toBe('powerRating');
    expect(key('potentiometer', 'Number of gangs')).toBe('gangs');
  });
});
