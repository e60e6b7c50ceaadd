import { describe, expect, it } from 'vitest';
import { spectralResponse } from './curves';
import { estimateOptocoupler, gainRangeFor, optoEstimateGaps } from './optocoupler-estimate';
import { cdsCell, redLed, variant } from './test-parts';

// LED: 500 mcd at 20 mA, 630 nm. Cell: 8 kΩ to 20 kΩ at 10 lx, γ 0.7, peak 540 nm, at least 1 MΩ dark.
const led = redLed();
const cell = cdsCell();

describe('estimateOptocoupler', () => {
  it('follows E = Iv·(I/Itest)/d², the spectral factor, then R = R10·(E/10)^(−γ)', () => {
    const e = estimateOptocoupler({ led, cell, ledCurrentA: 20e-3, spacingM: 10e-3 });
    // Inverse-square law for a point source on axis, E = I/d² (any photometry text; from memory).
    expect(e.illuminanceLux).toBeCloseTo(0.5 / 0.01 ** 2, 9);
    expect(e.spectralFactor).toBeCloseTo(spectralResponse(90e-9, 100e-9), 12);
    const effective = 5000 * e.spectralFactor;
    expect(e.resistanceOhms.typical).toBeCloseTo(Math.sqrt(8e3 * 20e3) * (effective / 10) ** -0.7, 6);
    expect(e.resistanceOhms.low).toBeCloseTo(8e3 * ((effective * 1.5) / 10) ** -0.7, 6);
    expect(e.resistanceOhms.high).toBeCloseTo(20e3 * ((effective * 0.5) / 10) ** -0.7, 6);
    expect(e.resistanceOhms.low).toBeLessThan(e.resistanceOhms.typical);
    expect(e.resistanceOhms.typical).toBeLessThan(e.resistanceOhms.high);
  });

  it('quarters the illuminance at twice the distance and doubles it at twice the current', () => {
    const near = estimateOptocoupler({ led, cell, ledCurrentA: 10e-3, spacingM: 5e-3 });
    const far = estimateOptocoupler({ led, cell, ledCurrentA: 10e-3, spacingM: 10e-3 });
    const bright = estimateOptocoupler({ led, cell, ledCurrentA: 20e-3, spacingM: 10e-3 });
    expect(near.illuminanceLux / far.illuminanceLux).toBeCloseTo(4, 12);
    expect(bright.illuminanceLux / far.illuminanceLux).toBeCloseTo(2, 12);
    // Twice the light lowers the resistance by 2^γ.
    expect(far.resistanceOhms.typical / bright.resistanceOhms.typical).toBeCloseTo(2 ** 0.7, 9);
  });

  it('gives full spectral credit when the LED sits on the cell peak', () => {
    const green = variant(led, 'LD-540G', {}, { peakWavelength: { typ: 540e-9 } });
    expect(estimateOptocoupler({ led: green, cell, ledCurrentA: 5e-3, spacingM: 10e-3 }).spectralFactor).toBe(1);
  });

  it('never goes above the dark resistance, and sits there with the LED off', () => {
    const faint = estimateOptocoupler({ led, cell, ledCurrentA: 1e-9, spacingM: 0.1 });
    expect(faint.resistanceOhms.high).toBe(1e6);
    const off = estimateOptocoupler({ led, cell, ledCurrentA: 0, spacingM: 10e-3 });
    expect(off.resistanceOhms).toEqual({ low: 1e6, typical: 1e6, high: 1e6 });
  });

  it('lists its assumptions in plain words and says it is an estimate for the bench', () => {
    const e = estimateOptocoupler({ led, cell, ledCurrentA: 10e-3, spacingM: 10e-3 });
    const all = e.assumptions.join(' ');
    expect(all).toMatch(/proportional to current/);
    expect(all).toMatch(/point source/);
    expect(all).toMatch(/100 nm wide at half response \(from memory/);
    expect(all).toMatch(/±50 %/);
    expect(e.note).toMatch(/estimate/);
    expect(e.note).toMatch(/bench/);
  });

  it('says what it assumed when the parts leave things out, and warns of an overdriven LED', () => {
    const white = variant(led, 'LD-W', {}, { peakWavelength: undefined, forwardCurrent: { max: 30e-3 } });
    const plainCell = variant(cell, 'LX-P', {}, { gamma: undefined });
    const e = estimateOptocoupler({ led: white, cell: plainCell, ledCurrentA: 40e-3, spacingM: 10e-3 });
    const all = e.assumptions.join(' ');
    expect(e.spectralFactor).toBe(1);
    expect(all).toMatch(/20 mA is assumed/);
    expect(all).toMatch(/no peak wavelength/);
    expect(all).toMatch(/0\.7 is assumed/);
    expect(all).toMatch(/40 mA is above the LED's rated 30 mA/);
  });

  it('refuses to guess without intensity or light resistance, naming what is missing', () => {
    const dark = variant(led, 'LD-NONE', {}, { luminousIntensity: undefined });
    expect(optoEstimateGaps(dark, cell)).toEqual(['LD-NONE states no luminous intensity']);
    expect(() => estimateOptocoupler({ led: dark, cell, ledCurrentA: 10e-3, spacingM: 5e-3 })).toThrow(/LD-NONE states no luminous intensity/);
    expect(() => estimateOptocoupler({ led: cell, cell: led, ledCurrentA: 10e-3, spacingM: 5e-3 })).toThrow(/is not an LED.*is not a photoresistor/);
    expect(() => estimateOptocoupler({ led, cell, ledCurrentA: 10e-3, spacingM: 0 })).toThrow(/spacing/);
  });
});

describe('gainRangeFor', () => {
  it('turns the resistance range into the gain an inverting stage reaches, |G| = Rf/R (Horowitz & Hill)', () => {
    const e = estimateOptocoupler({ led, cell, ledCurrentA: 10e-3, spacingM: 10e-3 });
    const g = gainRangeFor(e, 100e3);
    expect(g.typical).toBeCloseTo(100e3 / e.resistanceOhms.typical, 9);
    expect(g.low).toBeCloseTo(100e3 / e.resistanceOhms.high, 9);
    expect(g.high).toBeCloseTo(100e3 / e.resistanceOhms.low, 9);
    // With the LED off the stage falls to Rf/Rdark: 100 kΩ / 1 MΩ.
    expect(gainRangeFor(estimateOptocoupler({ led, cell, ledCurrentA: 0, spacingM: 10e-3 }), 100e3).typical).toBeCloseTo(0.1, 12);
  });
});
