import { describe, expect, it } from 'vitest';
import { readCellMaterial, readColour, readLedPackage, readLens, readTaper } from './enums';

describe('readTaper', () => {
  it('takes the law from words first', () => {
    expect(readTaper('Logarithmic (audio)')?.value).toBe('log');
    expect(readTaper('A (log)')?.value).toBe('log');
    expect(readTaper('Linear')?.value).toBe('linear');
    expect(readTaper('C (rev. log)')?.value).toBe('reverse-log');
    expect(readTaper('Reverse logarithmic')?.value).toBe('reverse-log');
    expect(readTaper('anti-log')?.value).toBe('reverse-log');
  });

  // Letter codes are common practice, no source: the JIS / US code A = log, B = linear, C = reverse log; the older
  // European IEC/DIN code A = linear, B = log, F = reverse log.
  it('reads a bare letter by the code the text names, the JIS / US code otherwise', () => {
    expect(readTaper('B')).toEqual({ value: 'linear', spelled: false });
    expect(readTaper('A')?.value).toBe('log');
    expect(readTaper('C')?.value).toBe('reverse-log');
    expect(readTaper('B100K')?.value).toBe('linear');
    expect(readTaper('A', 'Taper letters follow the European (DIN) code.')?.value).toBe('linear');
    expect(readTaper('B', 'Taper letters follow the European (DIN) code.')?.value).toBe('log');
    expect(readTaper('Z')).toBeNull();
  });
});

describe('other word values', () => {
  it('colour, lens, package and cell material', () => {
    expect(readColour('5 mm super red LED')).toBe('red');
    expect(readColour('Warm white')).toBe('white');
    expect(readColour('940 nm infrared emitter')).toBe('infrared');
    expect(readLens('water clear')).toBe('clear');
    expect(readLens('red diffused')).toBe('diffused');
    expect(readLedPackage('T-1 3/4 round')).toBe('5mm');
    expect(readLedPackage('3 mm')).toBe('3mm');
    expect(readLedPackage('0805 chip')).toBe('0805');
    expect(readCellMaterial('Cadmium sulphide (CdS) element')).toBe('cds');
    expect(readCellMaterial('CdSe')).toBe('cdse');
    expect(readCellMaterial('cadmium-free')).toBeNull();
  });
});
