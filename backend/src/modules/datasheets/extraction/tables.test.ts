import { describe, expect, it } from 'vitest';
import { buildLines } from './layout';
import { analyseLayout, cellText, findTables, headerRole, isConditionsText, sectionKind } from './tables';
import { item, row } from './test-support/items';

function tablesOf(items: ReturnType<typeof row>) {
  return findTables(analyseLayout(buildLines(items)));
}

describe('headerRole', () => {
  it('knows the column words in any case and spelling', () => {
    expect(['Min', 'MIN.', 'Minimum', 'min'].map(headerRole)).toEqual(['min', 'min', 'min', 'min']);
    expect(['Typ.', 'TYPICAL', 'Nom'].map(headerRole)).toEqual(['typ', 'typ', 'typ']);
    expect(['Max', 'Maximum', 'MAX.'].map(headerRole)).toEqual(['max', 'max', 'max']);
    expect(['Unit', 'Units', 'UNITS'].map(headerRole)).toEqual(['unit', 'unit', 'unit']);
    expect(['Parameter', 'Characteristics', 'CHARACTERISTIC'].map(headerRole)).toEqual(['label', 'label', 'label']);
    expect(['Symbol', 'Sym.'].map(headerRole)).toEqual(['symbol', 'symbol']);
    expect(['Conditions', 'Test conditions', 'TEST CONDITIONS'].map(headerRole)).toEqual(['conditions', 'conditions', 'conditions']);
    expect(['Value', 'Rating', 'Specification'].map(headerRole)).toEqual(['value', 'value', 'value']);
    expect(headerRole('Slew rate')).toBeNull();
  });
});

describe('findTables', () => {
  const header = row(100, [[50, 'Parameter'], [180, 'Symbol'], [230, 'Min'], [270, 'Typ'], [310, 'Max'], [350, 'Unit']]);

  it('assigns each cell to the column it sits under, so a lone value is known by its column', () => {
    const [table] = tablesOf([...header, ...row(114, [[50, 'Input offset voltage'], [180, 'VOS'], [312, '2'], [350, 'mV']])]);
    expect(table!.kind).toBe('characteristics');
    const r = table!.rows[0]!;
    expect(cellText(r, 'label')).toBe('Input offset voltage');
    expect(cellText(r, 'max')).toBe('2');
    expect(cellText(r, 'typ')).toBe('');
    expect(cellText(r, 'unit')).toBe('mV');
  });

  it('splits values set closer together than a word space when they sit under different headers', () => {
    // Right-aligned Min "2.5" ends 5 pt before the left-aligned Typ "3.5".
    const cells = [item('Parameter', 50, 100), item('Min', 230, 100, 8, { width: 14 }), item('Typ', 260, 100, 8, { width: 14 }), item('Slew rate', 50, 114), item('2.5', 242, 114, 8, { width: 13 }), item('3.5', 260, 114, 8, { width: 13 })];
    const [table] = tablesOf(cells);
    expect(cellText(table!.rows[0]!, 'min')).toBe('2.5');
    expect(cellText(table!.rows[0]!, 'typ')).toBe('3.5');
  });

  it('joins a wrapped label, repeats the label for a continuation row and reads sub-headings as groups', () => {
    const [table] = tablesOf([
      ...header,
      ...row(114, [[50, 'DC characteristics']]),
      ...row(128, [[50, 'Input voltage noise'], [270, '4.5'], [350, 'nV/√Hz']]),
      ...row(137.5, [[50, 'density']]),
      ...row(151, [[50, 'Input offset voltage'], [270, '0.5'], [310, '2'], [350, 'mV']]),
      ...row(165, [[230, 'TA = −40 °C to +85 °C'], [310, '3'], [350, 'mV']]),
    ]);
    const [noise, offset, full] = table!.rows;
    expect(cellText(noise!, 'label')).toBe('Input voltage noise density');
    expect(noise!.group).toBe('DC characteristics');
    expect(offset!.continuation).toBe(false);
    expect(full!.continuation).toBe(true);
    expect(cellText(full!, 'label')).toBe('Input offset voltage');
  });

  it('ends a table at a larger heading and reads its title and conditions', () => {
    const items = [
      item('Electrical characteristics', 50, 70, 10.5),
      item('VS = ±15 V, TA = 25 °C unless otherwise noted', 50, 85, 7.5),
      ...header,
      ...row(114, [[50, 'Slew rate'], [270, '9'], [350, 'V/µs']]),
      item('Absolute maximum ratings', 50, 150, 10.5),
      ...row(168, [[50, 'Parameter'], [250, 'Value'], [320, 'Unit']]),
      ...row(182, [[50, 'Supply voltage'], [250, '±18'], [320, 'V']]),
    ];
    const [chars, limits] = tablesOf(items);
    expect(chars!.heading).toBe('Electrical characteristics');
    expect(chars!.conditionsText).toBe('VS = ±15 V, TA = 25 °C unless otherwise noted');
    expect(chars!.rows).toHaveLength(1);
    expect(limits!.kind).toBe('absolute-maximum');
    expect(cellText(limits!.rows[0]!, 'value')).toBe('±18');
  });

  it('tells pin, ordering and dimension tables apart', () => {
    const kinds = tablesOf([
      ...row(100, [[50, 'Pin'], [90, 'Name'], [160, 'Function']]),
      ...row(114, [[50, '1'], [90, 'OUT A'], [160, 'Output A']]),
      item('Ordering information', 50, 150, 11),
      ...row(170, [[50, 'Order code'], [160, 'Package'], [260, 'Packing']]),
      ...row(184, [[50, 'QX4102-S8-TR'], [160, 'SOIC-8'], [260, 'Reel']]),
      item('Package dimensions', 50, 220, 11),
      ...row(240, [[50, 'Dimension'], [150, 'Min'], [200, 'Max'], [250, 'Unit']]),
      ...row(254, [[50, 'A'], [150, '3.2'], [200, '3.6'], [250, 'mm']]),
    ]).map((t) => t.kind);
    expect(kinds).toEqual(['pins', 'ordering', 'dimensions']);
  });
});

describe('sectionKind and isConditionsText', () => {
  it('reads what a heading opens', () => {
    expect(sectionKind('ABSOLUTE MAXIMUM RATINGS')).toBe('absolute-maximum');
    expect(sectionKind('Limiting values')).toBe('absolute-maximum');
    expect(sectionKind('Electrical characteristics')).toBe('characteristics');
    expect(sectionKind('Ordering information')).toBe('ordering');
    expect(sectionKind('Package dimensions')).toBe('dimensions');
    expect(sectionKind('Revision history')).toBe('revisions');
  });

  it('recognises printed test conditions', () => {
    expect(isConditionsText('TA = 25 °C, VS = ±15 V')).toBe(true);
    expect(isConditionsText('at 85 °C')).toBe(true);
    expect(isConditionsText('unless otherwise noted')).toBe(true);
    expect(isConditionsText('DC characteristics')).toBe(false);
  });
});
