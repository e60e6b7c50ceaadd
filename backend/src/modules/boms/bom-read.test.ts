import iconv from 'iconv-lite';
import { describe, expect, it } from 'vitest';
import { BOM_LIMITS } from '@understudy/shared-types';
import { buildPreview, decodeBytes, guessDelimiter, guessHasHeader, guessMapping, readRows, type ReadRecord } from './bom-read';

const bytes = (...b: number[]) => Uint8Array.from(b);
const utf8 = (s: string) => new Uint8Array(Buffer.from(s, 'utf8'));
const records = (rows: string[][]): ReadRecord[] => rows.map((cells, i) => ({ row: i + 1, cells }));

function rejection(fn: () => unknown): { status: number; code: string; reason: string; rows: unknown[]; message: string } {
  try {
    fn();
  } catch (err) {
    const e = err as { status: number; code: string; message: string; extra: { details: { reason: string; rows: unknown[] } } };
    return { status: e.status, code: e.code, message: e.message, reason: e.extra.details.reason, rows: e.extra.details.rows };
  }
  throw new Error('expected a rejection');
}

describe('decoding bytes', () => {
  it('reads UTF-8 with and without its byte order mark, and drops the mark', () => {
    // Source: RFC 3629 — Ω (U+03A9) is CE A9 and µ (U+00B5) is C2 B5 in UTF-8; the mark U+FEFF is EF BB BF.
    const body = [0x52, 0x31, 0x3b, 0x34, 0x6b, 0x37, 0xce, 0xa9, 0x3b, 0x31, 0x30, 0xc2, 0xb5, 0x46, 0x0a];
    expect(decodeBytes(bytes(0xef, 0xbb, 0xbf, ...body))).toEqual({ text: 'R1;4k7Ω;10µF\n', encoding: 'utf-8' });
    expect(decodeBytes(bytes(...body))).toEqual({ text: 'R1;4k7Ω;10µF\n', encoding: 'utf-8' });
  });

  it('reads UTF-16LE and UTF-16BE by their byte order marks, and UTF-16LE without one', () => {
    // Source: Unicode Standard, "Byte Order Mark" — U+FEFF is FF FE in UTF-16LE and FE FF in UTF-16BE.
    const text = 'MPN\tQty\r\nCV2207\t2 Ω\r\n';
    const le = Buffer.from(text, 'utf16le');
    expect(decodeBytes(new Uint8Array(Buffer.concat([Buffer.from([0xff, 0xfe]), le])))).toEqual({ text: 'MPN\tQty\nCV2207\t2 Ω\n', encoding: 'utf-16le' });
    const be = Buffer.from(le);
    be.swap16();
    expect(decodeBytes(new Uint8Array(Buffer.concat([Buffer.from([0xfe, 0xff]), be])))).toEqual({ text: 'MPN\tQty\nCV2207\t2 Ω\n', encoding: 'utf-16be' });
    expect(decodeBytes(new Uint8Array(le))).toEqual({ text: 'MPN\tQty\nCV2207\t2 Ω\n', encoding: 'utf-16le' });
  });

  it('falls back to windows-1252 for bytes that are not UTF-8, so µ, é and ° read right', () => {
    // Source: Unicode Consortium mapping table MAPPINGS/VENDORS/MICSFT/WINDOWS/CP1252.TXT — 0xB5 µ, 0xE9 é,
    // 0xB0 °, 0xB1 ±, 0x96 en dash. The code page has no Ω: spreadsheets save it as "?" (or people write "Ohm").
    const raw = bytes(...Buffer.from('Part;Qt'), 0xe9, ...Buffer.from(';Remarque\nCV2207;2;10 '), 0xb5, ...Buffer.from('F '), 0xe9, ...Buffer.from('lectrolytique, 85 '), 0xb0, ...Buffer.from('C '), 0xb1, ...Buffer.from('20 % '), 0x96, ...Buffer.from(' 4k7 Ohm\n'));
    expect(decodeBytes(raw)).toEqual({ text: 'Part;Qté;Remarque\nCV2207;2;10 µF électrolytique, 85 °C ±20 % – 4k7 Ohm\n', encoding: 'windows-1252' });
  });

  it("takes chardet's guess when it is sure: a Cyrillic list in windows-1251", () => {
    const text = 'Деталь;Количество;Примечание\nCV2207;2;Резистор для усилителя\nOD-LDR5;1;Фоторезистор кадмиевый\n';
    expect(decodeBytes(new Uint8Array(iconv.encode(text, 'windows-1251')))).toEqual({ text, encoding: 'windows-1251' });
  });

  it('normalises CR LF and lone CR line ends to LF', () => {
    expect(decodeBytes(utf8('a,b\r\nc,d\re,f')).text).toBe('a,b\nc,d\ne,f');
  });

  it('refuses an empty file, a workbook, a PDF and binary bytes with a word on what to do', () => {
    expect(rejection(() => decodeBytes(bytes()))).toMatchObject({ status: 400, code: 'bom_empty', reason: 'empty' });
    const xlsx = rejection(() => decodeBytes(bytes(0x50, 0x4b, 0x03, 0x04, 0x14, 0x00)));
    expect(xlsx).toMatchObject({ code: 'bom_unreadable', reason: 'unreadable' });
    expect(xlsx.message).toMatch(/Save it as CSV/);
    expect(rejection(() => decodeBytes(utf8('%PDF-1.7\n')))).toMatchObject({ reason: 'unreadable' });
    expect(rejection(() => decodeBytes(bytes(0x01, 0x02, 0x03, 0x41, 0x42, 0x05, 0x06, 0x07)))).toMatchObject({ reason: 'unreadable' });
  });
});

describe('delimiters and rows', () => {
  it.each([
    [',', 'MPN,Qty,Ref\nCV2207,2,"R1, R2"\nOD-4558X,1,U1\n'],
    [';', 'MPN;Qty;Ref\nCV2207;2,5;R1, R2\nOD-4558X;1;U1\n'],
    ['\t', 'MPN\tQty\tRef\nCV2207\t2\tR1, R2\nOD-4558X\t1\tU1\n'],
    ['|', 'MPN|Qty|Ref\nCV2207|2|R1, R2\nOD-4558X|1|U1\n'],
  ])('guesses %j', (delimiter, text) => {
    expect(guessDelimiter(text)).toBe(delimiter);
    expect(readRows(text, delimiter as ',').records[1]!.cells).toEqual(['CV2207', delimiter === ';' ? '2,5' : '2', 'R1, R2']);
  });

  it('numbers rows as a spreadsheet does: blank rows skipped but counted, a quoted line break is one row', () => {
    const { records, columnCount } = readRows('MPN,Notes\n\nCV2207,"two\nlines"\n,\nOD-10V,x\n', ',');
    expect(records.map((r) => r.row)).toEqual([1, 3, 5]);
    expect(records[1]!.cells).toEqual(['CV2207', 'two\nlines']);
    expect(columnCount).toBe(2);
  });

  it('refuses a quote that never closes, naming the row', () => {
    const r = rejection(() => readRows('MPN,Notes\nCV2207,ok\nOD-10V,"never closed\nOD-LDR5,x\n', ','));
    expect(r).toMatchObject({ reason: 'unreadable', rows: [{ row: 3 }] });
  });

  it('refuses too many columns (naming the row) and too many lines (saying how many against the limit)', () => {
    const wide = `a\n${Array.from({ length: BOM_LIMITS.maxColumns + 1 }, (_, i) => `c${i}`).join(',')}\n`;
    expect(rejection(() => readRows(wide, ','))).toMatchObject({ reason: 'too-many-columns', rows: [{ row: 2 }] });
    const long = `MPN\n${'CV2207\n'.repeat(BOM_LIMITS.maxLines + 1)}`;
    const r = rejection(() => readRows(long, ',', true));
    expect(r).toMatchObject({ status: 400, code: 'bom_too_many_lines', reason: 'too-many-lines' });
    expect(r.message).toContain('10,001 lines');
    expect(r.message).toContain('10,000');
    expect(readRows(`MPN\n${'CV2207\n'.repeat(BOM_LIMITS.maxLines)}`, ',', true).records).toHaveLength(BOM_LIMITS.maxLines + 1);
  });
});

describe('header row', () => {
  it('sees header words in several languages', () => {
    expect(guessHasHeader(records([['Part Number', 'Qty', 'Designator'], ['CV2207', '2', 'U1']]))).toBe(true);
    expect(guessHasHeader(records([['Teilenummer', 'Menge', 'Bemerkung'], ['CV2207', '2', 'x']]))).toBe(true);
    expect(guessHasHeader(records([['Référence fabricant', 'Qté', 'Repères'], ['CV2207', '2', 'U1']]))).toBe(true);
    expect(guessHasHeader(records([['Cantidad', 'Fabricante'], ['2', 'Fixture Linear']]))).toBe(true);
  });

  it('sees words above a column of numbers', () => {
    expect(guessHasHeader(records([['Thing', 'How many'], ['CV2207', '2'], ['OD-10V', '4']]))).toBe(true);
  });

  it('sees no header when the first row is data', () => {
    expect(guessHasHeader(records([['CV2207', '2', 'U1'], ['OD-10V', '1', 'U2']]))).toBe(false);
    expect(guessHasHeader(records([['CV2207', 'U1, U2'], ['OD-10V', 'U3']]))).toBe(false);
  });
});

describe('mapping guesses', () => {
  it('maps by header words, giving "Manufacturer part number" to the number and "Manufacturer" to the maker', () => {
    const { mapping, source } = guessMapping(['Item', 'Manufacturer', 'Manufacturer Part Number', 'Qty.', 'Reference', 'Part description'], [], null);
    expect(mapping).toEqual({ manufacturer: 1, partNumber: 2, quantity: 3, designators: 4, notes: 5 });
    expect(new Set(Object.values(source))).toEqual(new Set(['headers']));
  });

  it('maps by content without a header: integers are the quantity, R1/U1-U3 the designators, part-number-like text the part number', () => {
    const rows = [
      ['1', '10k', 'R1, R2', 'CV2207', '4'],
      ['2', '100n', 'C1-C3', 'OD-4558X', '3'],
      ['3', 'TL', 'U1', 'OD-LDR5', '1'],
    ];
    const { mapping, source } = guessMapping([null, null, null, null, null], rows, null);
    // Column 0 counts 1, 2, 3: an item number, not a quantity; "10k"/"100n" are values, not part numbers.
    expect(mapping).toEqual({ designators: 2, quantity: 4, partNumber: 3 });
    expect(source).toEqual({ designators: 'content', quantity: 'content', partNumber: 'content' });
  });

  it("uses the person's remembered mapping first: by header text ignoring case and spaces, by position without a header", () => {
    const remembered = { byHeader: { partNumber: 'Our PN', quantity: 'Stück Zahl' }, byIndex: { partNumber: 2, quantity: 0 } };
    const withHeaders = guessMapping(['stückzahl', 'OUR  PN', 'Description'], [], remembered);
    expect(withHeaders.mapping).toEqual({ partNumber: 1, quantity: 0, notes: 2 });
    expect(withHeaders.source).toEqual({ partNumber: 'remembered', quantity: 'remembered', notes: 'headers' });
    const without = guessMapping([null, null, null], [['4', 'x', 'CV2207']], remembered);
    expect(without.mapping).toMatchObject({ partNumber: 2, quantity: 0 });
    expect(without.source).toMatchObject({ partNumber: 'remembered', quantity: 'remembered' });
  });
});

describe('preview', () => {
  it('reads a spreadsheet paste (tabs) with its header, columns, samples and mapping', () => {
    const preview = buildPreview({ text: 'MPN\tQty\tRef\nCV2207\t2\tU1, U2\n\nOD-LDR5\t1\tLDR1\n', encoding: 'text' }, null);
    expect(preview).toMatchObject({
      delimiter: '\t',
      hasHeader: true,
      lineCount: 2,
      mapping: { partNumber: 0, quantity: 1, designators: 2 },
      mappingSource: { partNumber: 'headers', quantity: 'headers', designators: 'headers' },
    });
    expect(preview.columns[0]).toEqual({ index: 0, header: 'MPN', samples: ['CV2207', 'OD-LDR5'] });
    expect(preview.sampleRows).toEqual([
      ['CV2207', '2', 'U1, U2'],
      ['OD-LDR5', '1', 'LDR1'],
    ]);
  });

  it('keeps the delimiter and header choice it is given', () => {
    const preview = buildPreview({ text: 'CV2207;2\nOD-10V;1\n', encoding: 'text', delimiter: ';', hasHeader: true }, null);
    expect(preview).toMatchObject({ delimiter: ';', hasHeader: true, lineCount: 1 });
    expect(preview.columns.map((c) => c.header)).toEqual(['CV2207', '2']);
  });

  it('refuses an empty paste and a header with no lines', () => {
    expect(rejection(() => buildPreview({ text: ' \n\n', encoding: 'text' }, null))).toMatchObject({ reason: 'empty' });
    expect(rejection(() => buildPreview({ text: 'MPN,Qty\n', encoding: 'text', hasHeader: true }, null))).toMatchObject({ reason: 'empty' });
  });
});
