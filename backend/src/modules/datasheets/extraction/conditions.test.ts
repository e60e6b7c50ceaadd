import { describe, expect, it } from 'vitest';
import { namesHotOrFullRange, readConditions, statedTemperature } from './conditions';

describe('readConditions', () => {
  it('reads supply as the total span, temperature in °C, current and time in SI', () => {
    expect(readConditions(['VS = ±15 V, TA = 25 °C'], ['supply', 'temperature'])).toEqual({ supply: 30, temperature: 25 });
    expect(readConditions(['VCC = 5 V'], ['supply'])).toEqual({ supply: 5 });
    expect(readConditions(['VCC = 15 V, VEE = −15 V'], ['supply'])).toEqual({ supply: 30 });
    expect(readConditions(['IF = 20 mA'], ['current'])).toEqual({ current: 0.02 });
    expect(readConditions(['10 s after removal of light'], ['time'])).toEqual({ time: 10 });
    expect(readConditions(['measured after 5 s in darkness'], ['time'])).toEqual({ time: 5 });
  });

  it('keeps only the conditions the definition allows, the most specific text first', () => {
    expect(readConditions(['TA = 25 °C, VS = ±15 V'], ['supply'])).toEqual({ supply: 30 });
    expect(readConditions(['VS = ±5 V', 'VS = ±15 V, TA = 25 °C'], ['supply', 'temperature'])).toEqual({ supply: 10, temperature: 25 });
  });

  it('takes no single temperature from a range', () => {
    expect(readConditions(['TA = −40 °C to +85 °C'], ['temperature'])).toEqual({});
    expect(statedTemperature(['at 85 °C'])).toBe(85);
  });
});

describe('namesHotOrFullRange', () => {
  it('flags figures away from room temperature', () => {
    expect(namesHotOrFullRange('TA = 85 °C')).toBe(true);
    expect(namesHotOrFullRange('TA = −40 °C to +85 °C')).toBe(true);
    expect(namesHotOrFullRange('over the full temperature range')).toBe(true);
    expect(namesHotOrFullRange('Electrical characteristics at elevated temperature')).toBe(true);
    expect(namesHotOrFullRange('TA = 25 °C')).toBe(false);
    expect(namesHotOrFullRange('VS = ±15 V')).toBe(false);
  });
});
