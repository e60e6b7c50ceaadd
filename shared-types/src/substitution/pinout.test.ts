import { describe, expect, it } from 'vitest';
import { PIN_LAYOUTS } from '../families';
import { comparePinouts } from './pinout';
import { dualOpAmp, variant } from './test-parts';

const MINUS = '\u2212';
const dualMap = (): Record<string, string> => ({ ...(PIN_LAYOUTS['dip8-dual-opamp'].pins as Record<string, string>) });

describe('comparePinouts', () => {
  const original = dualOpAmp();

  it('calls the same functions on the same pins a drop-in, whatever the spelling', () => {
    const spelled = variant(original, 'FX-2210', {
      pinLayout: null,
      pinMap: { 1: '1OUT', 2: '1IN-', 3: '1IN+', 4: 'VEE', 5: '2IN+', 6: '2IN-', 7: '2OUT', 8: 'VCC' },
    });
    const result = comparePinouts(original, spelled);
    expect(result.class).toBe('drop-in');
    expect(result.differingPins).toEqual([]);
    expect(result.packageChange).toBeNull();
    expect(result.summary).toBe('Same functions on the same pins.');
  });

  it('reads a shared layout when a part records no map of its own', () => {
    const layoutOnly = variant(original, 'FX-2220', { pinMap: {}, pinLayout: 'dip8-dual-opamp' });
    const mapped = variant(original, 'FX-2230', { pinMap: dualMap(), pinLayout: null });
    expect(comparePinouts(mapped, layoutOnly).class).toBe('drop-in');
    expect(comparePinouts(layoutOnly, mapped).class).toBe('drop-in');
  });

  it('reports DIP-8 against SOIC-8 with the same map as a drop-in with a package change', () => {
    const soic = variant(original, 'FX-2200S', { package: 'SOIC-8' });
    const result = comparePinouts(original, soic);
    expect(result.class).toBe('drop-in');
    expect(result.packageChange).toEqual({ from: 'DIP-8', to: 'SOIC-8' });
    expect(result.summary).toMatch(/drop-in electrically/);
    expect(result.summary).toMatch(/DIP-8 to SOIC-8/);
  });

  it('counts whole channels lettered the other way as a drop-in: each pin still does the same job', () => {
    const swapped = variant(original, 'FX-2200B', {
      pinLayout: null,
      pinMap: { 1: 'OUT B', 2: `${MINUS}IN B`, 3: '+IN B', 4: `V${MINUS}`, 5: '+IN A', 6: `${MINUS}IN A`, 7: 'OUT A', 8: 'V+' },
    });
    const result = comparePinouts(original, swapped);
    expect(result.class).toBe('drop-in');
    expect(result.summary).toMatch(/lettered the other way/);
  });

  it('calls swapped inputs of a channel an adapter: the same functions on other pins', () => {
    const inputsSwapped = variant(original, 'FX-2200X', {
      pinLayout: null,
      pinMap: { ...dualMap(), 2: '+IN A', 3: `${MINUS}IN A` },
    });
    const result = comparePinouts(original, inputsSwapped);
    expect(result.class).toBe('adapter');
    expect(result.differingPins).toEqual(['2', '3']);
    expect(result.summary).toMatch(/other pins \(2 and 3\)/);
  });

  it('calls supply pins moved to the quad-style places an adapter', () => {
    const moved = variant(original, 'FX-2200M', { pinLayout: null, pinMap: { ...dualMap(), 4: 'V+', 8: `V${MINUS}` } });
    expect(comparePinouts(original, moved).class).toBe('adapter');
  });

  it('calls a single op amp against a dual incompatible, naming the differing pins', () => {
    const single = variant(original, 'FX-1100', { pinLayout: 'dip8-single-opamp' });
    const result = comparePinouts(original, single);
    expect(result.class).toBe('incompatible');
    expect(result.differingPins).toEqual(['1', '2', '3', '5', '6', '7', '8']);
    expect(result.summary).toMatch(/^Not pin compatible: pin 1 is OFFSET NULL here, OUT A on the original/);
    expect(result.summary).toMatch(/and 4 more/);
  });

  it('calls a different pin count incompatible', () => {
    const quad = variant(original, 'FX-4400', { pinLayout: 'dip14-quad-opamp', package: 'DIP-14' });
    const result = comparePinouts(original, quad);
    expect(result.class).toBe('incompatible');
    expect(result.summary).toMatch(/14 pins here, 8 on the original/);
    expect(result.packageChange).toEqual({ from: 'DIP-8', to: 'DIP-14' });
  });

  it('calls a missing map unknown, on either side', () => {
    const bare = variant(original, 'FX-0000', { pinLayout: null, pinMap: {} });
    expect(comparePinouts(original, bare).class).toBe('unknown');
    expect(comparePinouts(bare, original).class).toBe('unknown');
    expect(comparePinouts(bare, original).summary).toMatch(/original's pin map is not recorded/);
  });

  it('ignores letter case and spaces in package names', () => {
    expect(comparePinouts(original, variant(original, 'FX-2200D', { package: ' dip-8 ' })).packageChange).toBeNull();
  });
});
