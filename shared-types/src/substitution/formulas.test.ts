import { describe, expect, it } from 'vitest';
import { PIN_LAYOUTS, findPins } from '../families';
import {
  dividerVoltage,
  invertingGain,
  ledCurrent,
  nonInvertingGain,
  rcCutoff,
  requiredSlewRate,
  resistanceRangeForGain,
} from './formulas';

describe('formulas against their published forms', () => {
  it('slew rate for a full-power sine is SR = 2π·f·Vpeak (Horowitz & Hill, The Art of Electronics; Sedra & Smith, Microelectronic Circuits)', () => {
    expect(requiredSlewRate(2, 20e3)).toBeCloseTo(2 * Math.PI * 20e3 * 2, 6);
    // 2 V peak at 20 kHz ≈ 0.251 V/µs.
    expect(requiredSlewRate(2, 20e3) / 1e6).toBeCloseTo(0.2513, 4);
    // 10 V peak at 20 kHz ≈ 1.26 V/µs, the figure behind "audio needs about 1 V/µs".
    expect(requiredSlewRate(10, 20e3) / 1e6).toBeCloseTo(1.2566, 4);
  });

  it('inverting gain is −Rf/Rin (Horowitz & Hill; Sedra & Smith)', () => {
    expect(invertingGain(100e3, 10e3)).toBeCloseTo(-10, 12);
    expect(invertingGain(47e3, 4.7e3)).toBeCloseTo(-10, 12);
  });

  it('non-inverting gain is 1 + Rf/Rg (Horowitz & Hill; Sedra & Smith)', () => {
    expect(nonInvertingGain(100e3, 10e3)).toBeCloseTo(11, 12);
    expect(nonInvertingGain(0, 10e3)).toBe(1);
    // Rg open: a voltage follower.
    expect(nonInvertingGain(10e3, Infinity)).toBe(1);
  });

  it('an RC low-pass has fc = 1/(2πRC) (Horowitz & Hill; Sedra & Smith)', () => {
    expect(rcCutoff(10e3, 10e-9)).toBeCloseTo(1 / (2 * Math.PI * 10e3 * 10e-9), 9);
    expect(rcCutoff(1.59e3, 100e-9)).toBeCloseTo(1000.97, 1);
  });

  it('LED current through a series resistor is (Vout − Vf)/R, Ohm’s law across the resistor (Horowitz & Hill)', () => {
    expect(ledCurrent(9, 2, 1e3)).toBeCloseTo(7e-3, 12);
    expect(ledCurrent(5, 2, 150)).toBeCloseTo(0.02, 12);
    // Below the forward voltage the LED does not conduct.
    expect(ledCurrent(1.5, 2, 1e3)).toBe(0);
    expect(ledCurrent(2, 2, 1e3)).toBe(0);
  });

  it('an unloaded divider gives Vs·Rb/(Rt + Rb) (Horowitz & Hill)', () => {
    expect(dividerVoltage(12, 10e3, 2e3)).toBeCloseTo(2, 12);
  });

  it('the resistance for a gain range of an inverting stage is R = Rf/|G| (from −Rf/Rin; Horowitz & Hill)', () => {
    expect(resistanceRangeForGain(100e3, 0.5, 10)).toEqual({ min: 10e3, max: 200e3 });
    // Order of the gains does not matter; signs neither.
    expect(resistanceRangeForGain(100e3, 10, 0.5)).toEqual({ min: 10e3, max: 200e3 });
    expect(resistanceRangeForGain(100e3, -0.5, -10)).toEqual({ min: 10e3, max: 200e3 });
  });
});

describe('facts of the trade', () => {
  it('an inverting stage with 220 kΩ and 220 kΩ has unity gain (common practice, no source)', () => {
    expect(invertingGain(220e3, 220e3)).toBe(-1);
  });

  it('an inverting stage can have a gain below one while a non-inverting stage cannot (common practice, no source)', () => {
    expect(Math.abs(invertingGain(10e3, 100e3))).toBeCloseTo(0.1, 12);
    expect(nonInvertingGain(10e3, 100e3)).toBeGreaterThanOrEqual(1);
    expect(nonInvertingGain(1, 1e12)).toBeGreaterThanOrEqual(1);
  });

  it('a divider of two equal resistors biases at half the supply, 4.5 V from 9 V (common practice, no source)', () => {
    expect(dividerVoltage(9, 10e3, 10e3)).toBe(4.5);
    expect(dividerVoltage(9, 1e6, 1e6)).toBe(4.5);
  });

  it('100 Ω with 47 µF filters a supply at about 34 Hz (common practice, no source)', () => {
    expect(rcCutoff(100, 47e-6)).toBeCloseTo(33.9, 1);
    expect(Math.round(rcCutoff(100, 47e-6))).toBe(34);
  });

  it('the standard 8-pin dual op amp takes power on pins 8 and 4 (common practice, no source)', () => {
    const dual = PIN_LAYOUTS['dip8-dual-opamp'];
    expect(findPins(dual, 'V+')).toEqual([8]);
    expect(findPins(dual, 'V-')).toEqual([4]);
  });
});
