// Reading a BOM file or paste: bytes → text, text → rows, and the guesses (delimiter, header row, which column is
// what) the mapping screen starts from. Pure: no database, so every rule is unit-tested on its own.
import chardet from 'chardet';
import iconv from 'iconv-lite';
import Papa from 'papaparse';
import {
  BOM_DELIMITERS,
  BOM_FIELDS,
  BOM_LIMITS,
  type BomColumn,
  type BomDelimiter,
  type BomField,
  type BomMapping,
  type BomPreview,
  type BomRejection,
  type RememberedMapping,
} from '@understudy/shared-types';
import { DomainError } from '../../errors';

/** A BOM that cannot be read at all: 400 (413 when too large) with the reason and, where it is one row, the row. */
export class BomRejectedError extends DomainError {
  constructor(reason: BomRejection, message: string, rows: { row: number; message: string }[] = [], status = 400) {
    super(status, `bom_${reason.replace(/-/g, '_')}`, message, { details: { reason, rows } });
  }
}

export const tooLarge = () =>
  new BomRejectedError('too-large', `The file is over the ${BOM_LIMITS.maxBytes / 1024 / 1024} MB limit for one BOM.`, [], 413);

// ---------------------------------------------------------------------------------------------------------------
// Bytes → text

export interface Decoded {
  text: string;
  /** "utf-8", "utf-16le", "utf-16be", "windows-1252", or what chardet named. */
  encoding: string;
}

/** Single-byte encodings chardet may name for Western text; their labels map to windows-1252 in browsers. */
const LATIN1_LABELS = new Set(['iso-8859-1', 'latin1', 'us-ascii', 'ascii']);

/**
 * Byte order mark first (UTF-8, UTF-16LE/BE); then UTF-16 without a mark (every other byte zero); then strict
 * UTF-8; then chardet's guess if iconv-lite knows it; windows-1252 as the last resort. Workbooks and PDFs are
 * refused with a word on how to export CSV instead.
 */
export function decodeBytes(bytes: Uint8Array): Decoded {
  if (bytes.length === 0) throw new BomRejectedError('empty', 'The file is empty.');
  const buf = Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  refuseBinary(buf);
  let decoded: Decoded;
  if (buf[0] === 0xef && buf[1] === 0xbb && buf[2] === 0xbf) decoded = { text: buf.subarray(3).toString('utf8'), encoding: 'utf-8' };
  else if (buf[0] === 0xff && buf[1] === 0xfe) decoded = { text: iconv.decode(buf.subarray(2), 'utf-16le'), encoding: 'utf-16le' };
  else if (buf[0] === 0xfe && buf[1] === 0xff) decoded = { text: iconv.decode(buf.subarray(2), 'utf-16be'), encoding: 'utf-16be' };
  else {
    const utf16 = unmarkedUtf16(buf);
    if (utf16) decoded = { text: iconv.decode(buf, utf16), encoding: utf16 };
    else decoded = strictUtf8(buf) ?? guessed(buf);
  }
  if (/[\u0000-\u0008\u000e-\u001f]/.test(decoded.text.slice(0, 4096))) {
    throw new BomRejectedError('unreadable', 'This file holds binary data, not text. Save the parts list as CSV (or copy its rows and paste them).');
  }
  return { text: normaliseText(decoded.text), encoding: decoded.encoding };
}

function refuseBinary(buf: Buffer) {
  const starts = (sig: number[]) => sig.every((b, i) => buf[i] === b);
  if (starts([0x50, 0x4b, 0x03, 0x04])) {
    throw new BomRejectedError('unreadable', 'This is a spreadsheet workbook (.xlsx or .ods), not CSV. Save it as CSV, or copy the rows and paste them.');
  }
  if (starts([0xd0, 0xcf, 0x11, 0xe0])) {
    throw new BomRejectedError('unreadable', 'This is an old Excel workbook (.xls), not CSV. Save it as CSV, or copy the rows and paste them.');
  }
  if (starts([0x25, 0x50, 0x44, 0x46])) throw new BomRejectedError('unreadable', 'This is a PDF, not a parts list. Export the BOM from its tool as CSV.');
}

/** UTF-16 without a byte order mark: ASCII text leaves every other byte zero. */
function unmarkedUtf16(buf: Buffer): 'utf-16le' | 'utf-16be' | null {
  const n = Math.min(buf.length - (buf.length % 2), 4096);
  if (n < 4) return null;
  let evenZero = 0;
  let oddZero = 0;
  for (let i = 0; i < n; i += 2) {
    if (buf[i] === 0) evenZero++;
    if (buf[i + 1] === 0) oddZero++;
  }
  const pairs = n / 2;
  if (oddZero > pairs * 0.6 && evenZero < pairs * 0.1) return 'utf-16le';
  if (evenZero > pairs * 0.6 && oddZero < pairs * 0.1) return 'utf-16be';
  return null;
}

function strictUtf8(buf: Buffer): Decoded | null {
  try {
    return { text: new TextDecoder('utf-8', { fatal: true }).decode(buf), encoding: 'utf-8' };
  } catch {
    return null;
  }
}

/**
 * chardet's guess is taken only this sure and this far ahead of its next guess: on a short Western list it
 * wavers between Latin code pages, where windows-1252 is the safer reading.
 */
const CHARDET_CONFIDENCE = 40;
const CHARDET_LEAD = 15;

function guessed(buf: Buffer): Decoded {
  const [best, next] = chardet.analyse(buf);
  const name = best?.name.toLowerCase();
  const sure = !!best && best.confidence >= CHARDET_CONFIDENCE && best.confidence - (next?.confidence ?? 0) >= CHARDET_LEAD;
  // ISO-8859-1 files from Windows are nearly always windows-1252 (the WHATWG Encoding Standard maps the label so),
  // and a UTF-8 guess already failed the strict decode.
  if (sure && name && !LATIN1_LABELS.has(name) && !name.startsWith('utf') && iconv.encodingExists(name)) {
    return { text: iconv.decode(buf, name), encoding: name };
  }
  return { text: iconv.decode(buf, 'windows-1252'), encoding: 'windows-1252' };
}

/** Without a leading byte order mark, with \n line ends. */
export function normaliseText(text: string): string {
  return text.replace(/^\uFEFF/, '').replace(/\r\n?/g, '\n');
}

// ---------------------------------------------------------------------------------------------------------------
// Text → rows

export interface ReadRecord {
  /** The row as a spreadsheet numbers it: 1 for the first record, blank ones included. */
  row: number;
  cells: string[];
}

export interface ReadRows {
  /** Non-blank records in order; the header, if any, is the first. */
  records: ReadRecord[];
  columnCount: number;
}

/** The delimiter given, else papaparse's guess among the BOM delimiters (a comma when nothing fits better). */
export function guessDelimiter(text: string): BomDelimiter {
  const sample = text.slice(0, 64 * 1024);
  const result = Papa.parse<string[]>(sample, { delimitersToGuess: [...BOM_DELIMITERS], preview: 20 });
  const found = result.meta.delimiter as BomDelimiter;
  return (BOM_DELIMITERS as readonly string[]).includes(found) ? found : ',';
}

const isBlank = (cells: string[]) => cells.every((c) => c.trim() === '');

/**
 * Records as papaparse reads them (a quoted cell may hold a line break and is still one row, as in a
 * spreadsheet). Blank rows are skipped but keep their numbers. Refuses a quote that never closes, a row over the
 * column limit, and more data lines than the limit (counted after an optional header).
 */
export function readRows(text: string, delimiter: BomDelimiter, hasHeaderForCount?: boolean): ReadRows {
  const parsed = Papa.parse<string[]>(text, { delimiter, skipEmptyLines: false });
  const unclosed = parsed.errors.find((e) => e.code === 'MissingQuotes');
  if (unclosed) {
    const row = (unclosed.row ?? 0) + 1;
    throw new BomRejectedError('unreadable', `Row ${row}: a quoted cell starts here and never ends, so the rest of the file cannot be split into rows.`, [
      { row, message: 'A quote opens and never closes.' },
    ]);
  }
  const records: ReadRecord[] = [];
  let columnCount = 0;
  parsed.data.forEach((cells, i) => {
    if (isBlank(cells)) return;
    if (cells.length > BOM_LIMITS.maxColumns) {
      throw new BomRejectedError('too-many-columns', `Row ${i + 1} has ${cells.length} columns; a BOM may have at most ${BOM_LIMITS.maxColumns}. Is the delimiter right?`, [
        { row: i + 1, message: `${cells.length} columns` },
      ]);
    }
    columnCount = Math.max(columnCount, cells.length);
    records.push({ row: i + 1, cells });
  });
  if (!records.length) throw new BomRejectedError('empty', 'There are no rows in it: the file or paste is empty.');
  if (hasHeaderForCount !== undefined) assertLineCount(records.length - (hasHeaderForCount ? 1 : 0));
  return { records, columnCount };
}

export function assertLineCount(lines: number) {
  if (lines > BOM_LIMITS.maxLines) {
    const fmt = (n: number) => n.toLocaleString('en');
    throw new BomRejectedError('too-many-lines', `Found ${fmt(lines)} lines; a BOM may have at most ${fmt(BOM_LIMITS.maxLines)}. Split it into smaller BOMs.`);
  }
  if (lines === 0) throw new BomRejectedError('empty', 'There is only a header row: no lines to check.');
}

// ---------------------------------------------------------------------------------------------------------------
// Header row and column mapping

/** Lower case, accents and everything but letters and digits removed: "Qté." → "qte", "Part #" → "part". */
export function headerKey(text: string): string {
  return text
    .normalize('NFD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/ß/g, 'ss')
    .replace(/[^a-z0-9]/g, '');
}

/**
 * Header words per field, as headerKey leaves them, in English, German, French, Spanish, Italian and Dutch
 * (common practice in BOM exports, no source). English "reference" means the designators (as EDA tools export
 * it); the French "référence fabricant" is the maker's part number. "Pos." is left out: in German lists it
 * numbers the items.
 */
export const HEADER_SYNONYMS: Record<BomField, readonly string[]> = {
  partNumber: [
    'partnumber', 'part', 'partno', 'partnum', 'pn', 'mpn', 'mfrpn', 'mfgpn', 'mfrpart', 'mfgpart', 'mfrpartnumber', 'mfgpartnumber',
    'manufacturerpartnumber', 'manufacturerpn', 'manufacturerpart', 'partnr', 'artikelnummer', 'teilenummer', 'herstellerteilenummer',
    'herstellernummer', 'typ', 'bauteilnummer', 'referencefabricant', 'reffabricant', 'numerodepiece', 'numeropiece',
    'numerodeparte', 'numeroparte', 'referenciafabricante', 'codiceproduttore', 'codice', 'onderdeelnummer', 'artikelnr', 'typenummer',
  ],
  manufacturer: [
    'manufacturer', 'mfr', 'mfg', 'maker', 'make', 'brand', 'manufacturername', 'mfrname', 'mfgname', 'hersteller', 'fabricant',
    'fabricante', 'produttore', 'costruttore', 'fabrikant', 'producent', 'marque', 'marca',
  ],
  quantity: [
    'qty', 'quantity', 'qnty', 'qt', 'count', 'pcs', 'pieces', 'menge', 'anzahl', 'stuck', 'stk', 'quantite', 'qte', 'cantidad', 'cant',
    'quantita', 'qta', 'aantal', 'qtyperboard', 'qtyperunit',
  ],
  designators: [
    'designator', 'designators', 'ref', 'refs', 'reference', 'references', 'refdes', 'referencedesignator', 'referencedesignators',
    'referenz', 'bauteilbezeichnung', 'repere', 'reperes', 'designador', 'designadores',
    'riferimento', 'riferimenti', 'sigla', 'referentie', 'componentreference',
  ],
  notes: [
    'notes', 'note', 'description', 'desc', 'comment', 'comments', 'remark', 'remarks', 'bemerkung', 'bemerkungen', 'beschreibung',
    'kommentar', 'notiz', 'commentaire', 'remarque', 'descripcion', 'nota', 'notas', 'comentario', 'descrizione', 'opmerking', 'omschrijving',
  ],
};

/**
 * How well a header names a field: 3 for an exact synonym; between 1 and 2 for a longer header that holds one,
 * more the more of it the synonym covers ("Part description" is the notes, not the part number); 0 not at all.
 */
function headerScore(header: string, field: BomField): number {
  const key = headerKey(header);
  if (!key) return 0;
  const words = HEADER_SYNONYMS[field];
  if (words.includes(key)) return 3;
  // Short words count only at the start, so "preferred" holds no "ref".
  const held = words.filter((w) => (w.length >= 5 ? key.includes(w) : w.length >= 3 && key.startsWith(w)));
  return held.length ? 1 + Math.max(...held.map((w) => w.length)) / key.length : 0;
}

const isNumberLike = (cell: string) => /^[+-]?\d+(?:[.,]\d+)?$/.test(cell.trim());

/**
 * Whether the first row is a header: it has no number-like cells and either names a field in known words, or
 * holds only words above a column of numbers.
 */
export function guessHasHeader(records: readonly ReadRecord[]): boolean {
  const first = records[0]?.cells ?? [];
  if (first.some(isNumberLike)) return false;
  if (first.some((cell) => BOM_FIELDS.some((f) => headerScore(cell, f) > 0))) return true;
  const rest = records.slice(1, 21);
  if (!rest.length) return false;
  return first.some((cell, i) => {
    if (!cell.trim()) return false;
    const below = rest.map((r) => r.cells[i] ?? '').filter((c) => c.trim());
    return below.length > 0 && below.filter(isNumberLike).length >= below.length * 0.8;
  });
}

type Guess = { mapping: Partial<BomMapping>; source: BomPreview['mappingSource'] };

const spaceless = (s: string) => s.toLowerCase().replace(/\s+/g, '');

/**
 * The mapping to start from: the person's remembered mapping (by header text, ignoring case and spaces; by
 * position for a file without a header), then header words, then what the values look like. A column serves one
 * field at most.
 */
export function guessMapping(headers: (string | null)[], rows: readonly string[][], remembered: RememberedMapping | null): Guess {
  const mapping: Partial<BomMapping> = {};
  const source: Guess['source'] = {};
  const used = new Set<number>();
  const take = (field: BomField, index: number, from: 'remembered' | 'headers' | 'content') => {
    mapping[field] = index;
    source[field] = from;
    used.add(index);
  };
  const columnCount = headers.length;
  const hasHeader = headers.some((h) => h !== null);

  if (remembered) {
    for (const field of BOM_FIELDS) {
      if (hasHeader) {
        const text = remembered.byHeader[field];
        if (text === undefined) continue;
        const index = headers.findIndex((h, i) => h !== null && !used.has(i) && spaceless(h) === spaceless(text));
        if (index >= 0) take(field, index, 'remembered');
      } else {
        const index = remembered.byIndex[field];
        if (index !== undefined && index < columnCount && !used.has(index)) take(field, index, 'remembered');
      }
    }
  }

  if (hasHeader) {
    // Best (field, column) pairs first, so "Manufacturer" goes to the maker and "Manufacturer part number" to the number.
    const pairs: { field: BomField; index: number; score: number }[] = [];
    for (const field of BOM_FIELDS) {
      headers.forEach((h, index) => {
        const score = h ? headerScore(h, field) : 0;
        if (score) pairs.push({ field, index, score });
      });
    }
    pairs.sort((a, b) => b.score - a.score || BOM_FIELDS.indexOf(a.field) - BOM_FIELDS.indexOf(b.field) || a.index - b.index);
    for (const p of pairs) if (mapping[p.field] === undefined && !used.has(p.index)) take(p.field, p.index, 'headers');
  }

  const column = (i: number) => rows.slice(0, 50).map((r) => (r[i] ?? '').trim()).filter(Boolean);
  const free = () => Array.from({ length: columnCount }, (_, i) => i).filter((i) => !used.has(i));
  if (mapping.designators === undefined) {
    const best = bestColumn(free(), (i) => share(column(i), looksLikeDesignators));
    if (best !== null) take('designators', best, 'content');
  }
  if (mapping.quantity === undefined) {
    const best = bestColumn(free(), (i) => {
      const values = column(i);
      return isItemNumbering(values) ? 0 : share(values, (v) => /^\d{1,6}$/.test(v) && Number(v) > 0);
    });
    if (best !== null) take('quantity', best, 'content');
  }
  if (mapping.partNumber === undefined) {
    const best = bestColumn(free(), (i) => share(column(i), looksLikePartNumber), 0.5);
    if (best !== null) take('partNumber', best, 'content');
  }
  return { mapping, source };
}

function share(values: string[], test: (v: string) => boolean): number {
  return values.length ? values.filter(test).length / values.length : 0;
}

function bestColumn(candidates: number[], score: (i: number) => number, min = 0.8): number | null {
  let best: number | null = null;
  let bestScore = min;
  for (const i of candidates) {
    const s = score(i);
    if (s >= bestScore && (best === null || s > bestScore)) {
      best = i;
      bestScore = s;
    }
  }
  return best;
}

/** 1, 2, 3, … down the column: an item number, not a quantity. */
function isItemNumbering(values: string[]): boolean {
  return values.length >= 3 && values.every((v, i) => Number(v) === Number(values[0]) + i);
}

const DESIGNATOR = /^[A-Z]{1,4}\d{1,5}[A-Z]?$/i;
const DESIGNATOR_RANGE = /^[A-Z]{1,4}\d{1,5}\s*[-–]\s*(?:[A-Z]{1,4})?\d{1,5}$/i;

function looksLikeDesignators(value: string): boolean {
  const tokens = value.replace(/\s*[-–]\s*/g, '-').split(/[\s,;]+/).filter(Boolean);
  return tokens.length > 0 && tokens.every((t) => DESIGNATOR.test(t) || DESIGNATOR_RANGE.test(t));
}

/** Letters and digits together, four characters or more, and not a component value like "10k" or "100nF". */
function looksLikePartNumber(value: string): boolean {
  const v = value.trim();
  if (v.length < 4 || v.length > 64 || /\s{2,}/.test(v) || v.split(/\s+/).length > 2) return false;
  if (!/[a-z]/i.test(v) || !/\d/.test(v)) return false;
  if (/^\d+(?:[.,]\d+)?\s*[pnuµmkKMGR]?\d*\s*(?:F|H|Ω|R|ohms?|V|W|%)?$/i.test(v)) return false;
  return !DESIGNATOR.test(v);
}

// ---------------------------------------------------------------------------------------------------------------
// The preview

export interface PreviewInput {
  text: string;
  encoding: string;
  delimiter?: BomDelimiter;
  hasHeader?: boolean;
}

const SAMPLE_ROWS = 20;
const SAMPLES_PER_COLUMN = 5;

export function buildPreview(input: PreviewInput, remembered: RememberedMapping | null): BomPreview {
  const text = normaliseText(input.text);
  if (!text.trim()) throw new BomRejectedError('empty', 'There is nothing in it: the file or paste is empty.');
  const delimiter = input.delimiter ?? guessDelimiter(text);
  const { records, columnCount } = readRows(text, delimiter);
  const hasHeader = input.hasHeader ?? guessHasHeader(records);
  assertLineCount(records.length - (hasHeader ? 1 : 0));
  const data = hasHeader ? records.slice(1) : records;
  const headers: (string | null)[] = Array.from({ length: columnCount }, (_, i) => (hasHeader ? (records[0]!.cells[i] ?? '') : null));
  const columns: BomColumn[] = headers.map((header, index) => ({
    index,
    header,
    samples: data
      .map((r) => (r.cells[index] ?? '').trim())
      .filter(Boolean)
      .slice(0, SAMPLES_PER_COLUMN),
  }));
  const { mapping, source } = guessMapping(headers, data.map((r) => r.cells), remembered);
  return {
    text,
    encoding: input.encoding,
    delimiter,
    hasHeader,
    columns,
    lineCount: data.length,
    sampleRows: data.slice(0, SAMPLE_ROWS).map((r) => r.cells),
    mapping,
    mappingSource: source,
  };
}

/** The column names a saved BOM shows and exports: the header texts, or "Column 1"… without a header row. */
export function columnNames(headerCells: string[] | null, columnCount: number): string[] {
  return Array.from({ length: columnCount }, (_, i) => (headerCells ? (headerCells[i] ?? '') : `Column ${i + 1}`));
}
