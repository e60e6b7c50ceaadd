import { describe, expect, it } from 'vitest';
import { detectFamily, readIdentity, withoutLegalForm } from './identity';
import { buildLines } from './layout';
import { analyseLayout } from './tables';
import { item } from './test-support/items';

const layoutOf = (items: ReturnType<typeof item>[]) => analyseLayout(buildLines(items));
const body = Array.from({ length: 6 }, (_, i) => item('Body text that sets the usual size of the document, nothing more.', 50, 200 + i * 12, 9));

describe('detectFamily', () => {
  it('reads the family from the title words, an optocoupler before its LED and cell', () => {
    const title = (text: string) => detectFamily(layoutOf([item('PN-100', 50, 50, 24), item(text, 50, 80, 12), ...body]))?.value;
    expect(title('Quad JFET-input operational amplifier')).toBe('op-amp');
    expect(title('5 mm CdS photoresistor')).toBe('photoresistor');
    expect(title('Light dependent resistor')).toBe('photoresistor');
    expect(title('3 mm green LED, diffused')).toBe('led');
    expect(title('Dual-gang 16 mm rotary potentiometer')).toBe('potentiometer');
    expect(title('Resistive optocoupler (LED / LDR)')).toBe('optocoupler');
  });
});

describe('readIdentity', () => {
  it('takes the largest part-number token, and the title-block maker without its legal form', () => {
    const layout = layoutOf([
      item('Quillon Devices', 50, 24, 12),
      item('QX4102', 50, 50, 24),
      item('Dual low-noise operational amplifier', 50, 84, 12),
      ...body,
      item('Order code QX4102-S8-TR, reel of 2500', 50, 400, 9),
      item('© 2024 Quillon Devices Ltd. All rights reserved.', 50, 800, 7),
    ]);
    const id = readIdentity(layout, [], detectFamily(layout));
    expect(id.partNumber?.value).toBe('QX4102');
    expect(id.manufacturer?.value).toBe('Quillon Devices');
    expect(id.manufacturer?.source?.boxes.length).toBeGreaterThan(0);
  });

  it('strips legal forms from a copyright name', () => {
    expect(withoutLegalForm('Tarrant & Sloe Components LLP')).toBe('Tarrant & Sloe Components');
    expect(withoutLegalForm('Kittering Components S.A.')).toBe('Kittering Components');
    expect(withoutLegalForm('Glimmerbrook Electronics AB')).toBe('Glimmerbrook Electronics');
    expect(withoutLegalForm('Marlpit Semiconductor Co.')).toBe('Marlpit Semiconductor');
  });
});
