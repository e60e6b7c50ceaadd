import { describe, expect, it } from 'vitest';
import { parseBom, parseDesignators, parseQuantity } from './bom-lines';

describe('quantities (common practice, no source)', () => {
  it.each([
    ['4', ',', 4],
    [' 4 pcs', ',', 4],
    ['x4', ',', 4],
    ['4x', ',', 4],
    ['10 Stk.', ';', 10],
    ['1,000', ',', 1000],
    ['1 000', ',', 1000],
    ['2,5', ';', 2.5],
    ['2,5', '\t', 2.5],
    ['1.000', ';', 1000],
    ['1.5', ',', 1.5],
    ['0.5', ';', 0.5],
  ] as const)('%j in a %j file is %d', (raw, delimiter, value) => {
    expect(parseQuantity(raw, delimiter)).toEqual({ value, problem: null });
  });

  it('keeps what is not a positive number as a problem, in words', () => {
    expect(parseQuantity('ten', ',')).toEqual({ value: null, problem: "Quantity 'ten' is not a number" });
    expect(parseQuantity('0', ',')).toEqual({ value: null, problem: 'Quantity 0 is not a positive number' });
    expect(parseQuantity('-2', ',')).toEqual({ value: null, problem: 'Quantity -2 is not a positive number' });
    expect(parseQuantity('', ',')).toEqual({ value: null, problem: 'No quantity given' });
    expect(parseQuantity('2-3', ',').problem).toBe("Quantity '2-3' is not a number");
  });
});

describe('designators (common practice, no source)', () => {
  it('splits on commas, spaces and semicolons and expands ranges', () => {
    expect(parseDesignators('R1, R2 R3;R4')).toEqual({ designators: ['R1', 'R2', 'R3', 'R4'], problems: [] });
    expect(parseDesignators('R1-R4')).toEqual({ designators: ['R1', 'R2', 'R3', 'R4'], problems: [] });
    expect(parseDesignators('U1-3, C10 – C12')).toEqual({ designators: ['U1', 'U2', 'U3', 'C10', 'C11', 'C12'], problems: [] });
    expect(parseDesignators('R1..R3').designators).toEqual(['R1', 'R2', 'R3']);
    expect(parseDesignators('U1A, U1B').designators).toEqual(['U1A', 'U1B']);
  });

  it('keeps a range it cannot expand as written, with the reason', () => {
    expect(parseDesignators('R4-R1')).toEqual({ designators: ['R4-R1'], problems: ['R4-R1 counts down; write it as R1-R4'] });
    expect(parseDesignators('R1-C4')).toEqual({ designators: ['R1-C4'], problems: ['R1-C4 is not a range: the letters differ'] });
    expect(parseDesignators('R1-R5000').problems).toEqual(['R1-R5000 spans more than 1000 designators']);
  });
});

describe('reading lines through a mapping', () => {
  const mapping = { partNumber: 0, quantity: 1, designators: 2 };

  it('keeps every line, with its problems, and numbers rows as the spreadsheet (header = row 1)', () => {
    const text = ['MPN,Qty,Ref', 'CV2207,2,"R1, R2"', '', ',1,R3', 'OD-10V,ten,U1', 'OD-LDR5,3,"R2, R9"', 'OD-4558X,2,U2-U4'].join('\n');
    const { columns, lines } = parseBom(text, { delimiter: ',', hasHeader: true, mapping });
    expect(columns).toEqual(['MPN', 'Qty', 'Ref']);
    expect(lines.map((l) => l.row)).toEqual([2, 4, 5, 6, 7]);
    expect(lines[0]).toMatchObject({ partNumber: 'CV2207', quantity: 2, designators: ['R1', 'R2'], cells: ['CV2207', '2', 'R1, R2'] });
    expect(lines[0]!.problems).toEqual([{ field: 'designators', message: 'R2 is also on row 6' }]);
    expect(lines[1]!.problems).toEqual([{ field: 'partNumber', message: 'No part number' }]);
    expect(lines[2]).toMatchObject({ quantity: null, problems: [{ field: 'quantity', message: "Quantity 'ten' is not a number" }] });
    expect(lines[3]!.problems).toEqual([
      { field: 'quantity', message: 'Quantity 3, but 2 designators' },
      { field: 'designators', message: 'R2 is also on row 2' },
    ]);
    expect(lines[4]).toMatchObject({ designators: ['U2', 'U3', 'U4'], problems: [{ field: 'quantity', message: 'Quantity 2, but 3 designators' }] });
  });

  it('names "Column 1"… for a file without a header', () => {
    expect(parseBom('CV2207;2,5;R1\n', { delimiter: ';', hasHeader: false, mapping }).columns).toEqual(['Column 1', 'Column 2', 'Column 3']);
  });

  it('refuses a part-number column the file does not have, and a column without part numbers', () => {
    expect(() => parseBom('a,b\nc,d\n', { delimiter: ',', hasHeader: true, mapping: { partNumber: 5 } })).toThrow(/column 6, but the file has 2 columns/);
    try {
      parseBom('MPN,Qty\n,2\n,3\n', { delimiter: ',', hasHeader: true, mapping: { partNumber: 0, quantity: 1 } });
      throw new Error('expected a rejection');
    } catch (err) {
      expect(err).toMatchObject({ status: 400, code: 'bom_no_part_numbers', extra: { details: { reason: 'no-part-numbers' } } });
    }
  });

  it('answers a field error for another field mapped outside the file', () => {
    expect(() => parseBom('a,b\nc,d\n', { delimiter: ',', hasHeader: true, mapping: { partNumber: 0, notes: 4 } })).toThrow(/Some fields need attention/);
  });
});
