import { describe, expect, it } from 'vitest';
import {
  findPins,
  normalizePinFunction,
  PACKAGES,
  PIN_LAYOUTS,
  PIN_LAYOUTS_BY_FAMILY,
  pinoutsMatch,
  type PinLayout,
} from './pinouts';
import { FAMILY_KEYS } from './types';

const layouts: PinLayout[] = Object.values(PIN_LAYOUTS);
const packageKeys = PACKAGES.map((p) => p.key as string);

describe('PIN_LAYOUTS', () => {
  it('numbers pins 1..n without gaps, keyed by themselves, on known packages', () => {
    for (const [key, layout] of Object.entries(PIN_LAYOUTS)) {
      expect(layout.key).toBe(key);
      const numbers = Object.keys(layout.pins).map(Number);
      expect(numbers).toEqual(numbers.map((_, i) => i + 1));
      for (const p of layout.packages) expect(packageKeys).toContain(p);
    }
  });

  it('gives every family at least one layout', () => {
    for (const f of FAMILY_KEYS) expect(PIN_LAYOUTS_BY_FAMILY[f].length).toBeGreaterThan(0);
  });

  it('takes power on pins 8 and 4 on the standard 8-pin dual op amp (common practice, no source)', () => {
    const dual = PIN_LAYOUTS['dip8-dual-opamp'];
    expect(findPins(dual, 'V+')).toEqual([8]);
    expect(findPins(dual, 'V-')).toEqual([4]);
    expect(findPins(dual, 'VCC')).toEqual([8]);
    expect(findPins(dual, 'VEE')).toEqual([4]);
    expect(findPins(dual, 'OUT A')).toEqual([1]);
    expect(findPins(dual, '-IN A')).toEqual([2]);
    expect(findPins(dual, '+IN A')).toEqual([3]);
    expect(findPins(dual, 'OUT B')).toEqual([7]);
  });

  it('puts the single op amp output on pin 6 and power on 7 and 4 (common practice, no source)', () => {
    const single = PIN_LAYOUTS['dip8-single-opamp'];
    expect(findPins(single, 'OUT')).toEqual([6]);
    expect(findPins(single, 'V+')).toEqual([7]);
    expect(findPins(single, 'V-')).toEqual([4]);
    expect(findPins(single, 'OFFSET NULL')).toEqual([1, 5]);
    expect(findPins(single, 'NC')).toEqual([8]);
  });

  it('puts quad op amp power on pins 4 and 11 (common practice, no source)', () => {
    const quad = PIN_LAYOUTS['dip14-quad-opamp'];
    expect(findPins(quad, 'V+')).toEqual([4]);
    expect(findPins(quad, 'V-')).toEqual([11]);
    expect(findPins(quad, 'OUT D')).toEqual([14]);
  });

  it('labels with the true minus sign U+2212 (The Unicode Standard)', () => {
    expect(PIN_LAYOUTS['dip8-dual-opamp'].pins[2]).toBe('\u2212IN A');
    expect(PIN_LAYOUTS['dip8-dual-opamp'].pins[4]).toBe('V\u2212');
    for (const l of layouts) for (const f of Object.values(l.pins)) expect(f.includes('-')).toBe(false);
  });

  it('wires pots CCW, wiper, CW and LEDs anode then cathode (common practice, no source)', () => {
    expect(PIN_LAYOUTS['pot-3lug'].pins).toEqual({ 1: 'CCW', 2: 'wiper', 3: 'CW' });
    expect(PIN_LAYOUTS['led-2lead'].pins).toEqual({ 1: 'anode', 2: 'cathode' });
    expect(PIN_LAYOUTS['optocoupler-4lead'].pins).toEqual({ 1: 'LED anode', 2: 'LED cathode', 3: 'cell', 4: 'cell' });
  });
});

describe('normalizePinFunction', () => {
  it('maps the spellings of an inverting input to one form (common practice, no source)', () => {
    const forms = ['-IN A', '−IN A', 'IN- A', 'INA-', 'IN-A', '1IN-', 'IN1-', '-in a', 'Inverting input A'];
    for (const f of forms) expect(normalizePinFunction(f), f).toBe('-IN A');
    expect(normalizePinFunction('+IN B')).toBe('+IN B');
    expect(normalizePinFunction('2IN+')).toBe('+IN B');
    expect(normalizePinFunction('Non-inverting input B')).toBe('+IN B');
    expect(normalizePinFunction('−IN')).toBe('-IN');
  });

  it('maps supply and output names (common practice, no source)', () => {
    for (const f of ['V+', 'VCC', 'VDD', '+VS', 'Vs+']) expect(normalizePinFunction(f)).toBe('V+');
    for (const f of ['V−', 'V-', 'VEE', 'VSS', '-VS']) expect(normalizePinFunction(f)).toBe('V-');
    expect(normalizePinFunction('1OUT')).toBe('OUT A');
    expect(normalizePinFunction('Output A')).toBe('OUT A');
    expect(normalizePinFunction('N/C')).toBe('NC');
    expect(normalizePinFunction('Wiper')).toBe('WIPER');
  });

  it('finds drop-in pinouts regardless of spelling (common practice, no source)', () => {
    const invented = {
      pins: { 1: '1OUT', 2: '1IN-', 3: '1IN+', 4: 'VEE', 5: '2IN+', 6: '2IN-', 7: '2OUT', 8: 'VCC' },
    };
    expect(pinoutsMatch(PIN_LAYOUTS['dip8-dual-opamp'], invented)).toBe(true);
    expect(pinoutsMatch(PIN_LAYOUTS['dip8-dual-opamp'], PIN_LAYOUTS['dip8-single-opamp'])).toBe(false);
  });
});
