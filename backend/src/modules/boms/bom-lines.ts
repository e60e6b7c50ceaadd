// The lines of a BOM as read through its column mapping: part number, maker, quantity, designators, notes, and
// every problem found on a line kept on that line (never dropped). Pure.
import { BOM_FIELD_LABELS, type BomDelimiter, type BomField, type BomLineProblem, type BomMapping } from '@understudy/shared-types';
import { ValidationError } from '../../middleware/validate';
import { assertLineCount, BomRejectedError, columnNames, normaliseText, readRows, type ReadRecord } from './bom-read';

export interface ParsedLine {
  row: number;
  cells: string[];
  partNumber: string;
  manufacturer: string | null;
  quantity: number | null;
  designators: string[];
  notes: string;
  problems: BomLineProblem[];
}

export interface ParsedBom {
  /** Header texts, or "Column 1"… */
  columns: string[];
  lines: ParsedLine[];
}

// ---------------------------------------------------------------------------------------------------------------
// Quantities

export interface ParsedQuantity {
  value: number | null;
  problem: string | null;
}

/**
 * A quantity as people write it: "4", "4 pcs", "x4", "1,000", "2,5". A comma followed by exactly three digits
 * groups thousands, except in a semicolon-delimited file, where (as in the spreadsheets that write them) the
 * comma is the decimal mark and a dot before three digits groups thousands. Any other comma is a decimal mark
 * (a tab-separated paste from such a spreadsheet). The result must be a positive number; fractions are kept
 * (wire by the metre). Common practice, no source.
 */
export function parseQuantity(raw: string, delimiter: BomDelimiter): ParsedQuantity {
  const text = raw.trim();
  if (!text) return { value: null, problem: 'No quantity given' };
  const m = /^(?:x\s*)?([+-]?\d[\d.,\s\u00a0\u202f]*?)\s*(?:x|pcs?\.?|pieces?|ea\.?|stk\.?|st\.?|stück|units?)?$/i.exec(text);
  let value = NaN;
  if (m) {
    let n = m[1]!.replace(/[\s\u00a0\u202f]/g, '');
    if (delimiter === ';') {
      if (/^[+-]?\d{1,3}(\.\d{3})+(,\d+)?$/.test(n)) n = n.replace(/\./g, '');
      n = n.replace(',', '.');
    } else if (/^[+-]?\d{1,3}(,\d{3})+(\.\d+)?$/.test(n)) {
      n = n.replace(/,/g, '');
    } else {
      n = n.replace(',', '.');
    }
    if (/^[+-]?\d+(\.\d+)?$/.test(n)) value = Number(n);
  }
  if (Number.isNaN(value)) return { value: null, problem: `Quantity '${text}' is not a number` };
  if (!(value > 0)) return { value: null, problem: `Quantity ${text} is not a positive number` };
  return { value, problem: null };
}

// ---------------------------------------------------------------------------------------------------------------
// Designators

/** A range longer than this is taken for a typing slip, not expanded. */
const MAX_RANGE = 1000;

export interface ParsedDesignators {
  designators: string[];
  problems: string[];
}

/**
 * "R1, R2 R3;R4", "R1-R4", "R1-4", "R1 – R4" → R1 R2 R3 R4. A range must keep its letters and count upwards;
 * otherwise it is kept as written with a problem. Common practice, no source.
 */
export function parseDesignators(raw: string): ParsedDesignators {
  const problems: string[] = [];
  const out: string[] = [];
  const tokens = raw
    .trim()
    .replace(/\s*(?:[-–—]|\.\.)\s*/g, '-')
    .split(/[\s,;]+/)
    .filter(Boolean);
  for (const token of tokens) {
    const range = /^([A-Za-z]+)(\d+)-([A-Za-z]+)?(\d+)$/.exec(token);
    if (!range) {
      out.push(token);
      continue;
    }
    const [, prefix, fromText, toPrefix, toText] = range as unknown as [string, string, string, string | undefined, string];
    const from = Number(fromText);
    const to = Number(toText);
    if (toPrefix && toPrefix.toUpperCase() !== prefix.toUpperCase()) {
      problems.push(`${token} is not a range: the letters differ`);
      out.push(token);
    } else if (to < from) {
      problems.push(`${token} counts down; write it as ${prefix}${to}-${prefix}${from}`);
      out.push(token);
    } else if (to - from >= MAX_RANGE) {
      problems.push(`${token} spans more than ${MAX_RANGE} designators`);
      out.push(token);
    } else {
      for (let n = from; n <= to; n++) out.push(`${prefix}${n}`);
    }
  }
  return { designators: out, problems };
}

// ---------------------------------------------------------------------------------------------------------------
// Lines

const cell = (cells: string[], index: number | undefined) => (index === undefined ? '' : (cells[index] ?? '').trim());

/** Checks the mapping against the columns the file has; the part-number column is the one that must exist. */
function checkMapping(mapping: BomMapping, columnCount: number) {
  if (mapping.partNumber >= columnCount) {
    throw new BomRejectedError(
      'no-part-number-column',
      `The part number is mapped to column ${mapping.partNumber + 1}, but the file has ${columnCount} column${columnCount === 1 ? '' : 's'}.`,
    );
  }
  const issues = (Object.entries(mapping) as [BomField, number | undefined][])
    .filter(([field, index]) => field !== 'partNumber' && index !== undefined && index >= columnCount)
    .map(([field, index]) => ({ path: `body.mapping.${field}`, message: `${BOM_FIELD_LABELS[field]}: column ${index! + 1} is not in the file.` }));
  if (issues.length) throw new ValidationError(issues);
}

export interface ParseOptions {
  delimiter: BomDelimiter;
  hasHeader: boolean;
  mapping: BomMapping;
}

/** The whole BOM read through its mapping, or a rejection when nothing in it can be checked. */
export function parseBom(raw: string, { delimiter, hasHeader, mapping }: ParseOptions): ParsedBom {
  const text = normaliseText(raw);
  if (!text.trim()) throw new BomRejectedError('empty', 'There is nothing in it: the file or paste is empty.');
  const { records, columnCount } = readRows(text, delimiter, hasHeader);
  assertLineCount(records.length - (hasHeader ? 1 : 0));
  checkMapping(mapping, columnCount);
  const data = hasHeader ? records.slice(1) : records;
  const lines = data.map((r) => parseLine(r, mapping, delimiter));
  if (!lines.some((l) => l.partNumber)) {
    throw new BomRejectedError('no-part-numbers', `Column ${mapping.partNumber + 1} holds no part numbers. Is the part number mapped to the right column?`);
  }
  flagRepeatedDesignators(lines);
  return { columns: columnNames(hasHeader ? records[0]!.cells : null, columnCount), lines };
}

function parseLine(record: ReadRecord, mapping: BomMapping, delimiter: BomDelimiter): ParsedLine {
  const problems: BomLineProblem[] = [];
  const partNumber = cell(record.cells, mapping.partNumber).replace(/\s+/g, ' ');
  if (!partNumber) problems.push({ field: 'partNumber', message: 'No part number' });
  let quantity: number | null = null;
  if (mapping.quantity !== undefined) {
    const q = parseQuantity(cell(record.cells, mapping.quantity), delimiter);
    quantity = q.value;
    if (q.problem) problems.push({ field: 'quantity', message: q.problem });
  }
  let designators: string[] = [];
  if (mapping.designators !== undefined) {
    const d = parseDesignators(cell(record.cells, mapping.designators));
    designators = d.designators;
    for (const message of d.problems) problems.push({ field: 'designators', message });
    const seen = new Set<string>();
    const twice = new Set<string>();
    for (const name of designators) (seen.has(name.toUpperCase()) ? twice : seen).add(name.toUpperCase());
    if (twice.size) problems.push({ field: 'designators', message: `${[...twice].join(', ')} listed twice on this line` });
    if (quantity !== null && designators.length && Number.isInteger(quantity) && quantity !== designators.length) {
      problems.push({ field: 'quantity', message: `Quantity ${quantity}, but ${designators.length} designator${designators.length === 1 ? '' : 's'}` });
    }
  }
  const manufacturer = mapping.manufacturer !== undefined ? cell(record.cells, mapping.manufacturer) || null : null;
  const notes = mapping.notes !== undefined ? cell(record.cells, mapping.notes) : '';
  return { row: record.row, cells: record.cells, partNumber, manufacturer, quantity, designators, notes, problems };
}

/**
 * A designator on two lines is a problem on both, each naming the other rows (three at most, then how many
 * more); designators shared with the same rows share one message.
 */
function flagRepeatedDesignators(lines: ParsedLine[]) {
  const rowsOf = new Map<string, number[]>();
  lines.forEach((line, i) => {
    for (const name of new Set(line.designators.map((d) => d.toUpperCase()))) {
      const list = rowsOf.get(name) ?? [];
      list.push(i);
      rowsOf.set(name, list);
    }
  });
  lines.forEach((line, i) => {
    const byOthers = new Map<string, string[]>();
    for (const name of new Set(line.designators.map((d) => d.toUpperCase()))) {
      const at = rowsOf.get(name)!;
      if (at.length < 2) continue;
      const others = at.slice(0, 4).filter((j) => j !== i).slice(0, 3).map((j) => lines[j]!.row);
      const more = at.length - 1 - others.length;
      const where = `${others.length === 1 && !more ? 'row' : 'rows'} ${others.join(', ')}${more ? ` and ${more.toLocaleString('en')} more` : ''}`;
      byOthers.set(where, [...(byOthers.get(where) ?? []), name]);
    }
    for (const [where, names] of byOthers) {
      const shown = names.length > 5 ? `${names.slice(0, 5).join(', ')} and ${names.length - 5} more` : names.join(', ');
      line.problems.push({ field: 'designators', message: `${shown} ${names.length === 1 ? 'is' : 'are'} also on ${where}` });
    }
  });
}
