import { namesHotOrFullRange } from './conditions';
import { bodyFontSize, cellOf, type Cell, type Line } from './layout';

export type ColumnRole =
  | 'label'
  | 'symbol'
  | 'conditions'
  | 'min'
  | 'typ'
  | 'max'
  | 'unit'
  | 'value'
  | 'pin'
  | 'name'
  | 'function'
  | 'ordering'
  | 'dimension';

/** What a table is for, from its heading and header: only characteristics and limits carry parameter values. */
export type TableKind = 'characteristics' | 'absolute-maximum' | 'pins' | 'ordering' | 'dimensions' | 'revisions';

export interface Column {
  role: ColumnRole;
  header: string;
  x: number;
  right: number;
}

export interface TableRow {
  /** Cells per column role, left to right. */
  cells: Partial<Record<ColumnRole, Cell[]>>;
  lines: Line[];
  /** The sub-heading inside the table the row sits under ("DC characteristics", "TA = 85 °C"). */
  group: string | null;
  /** The row has no label of its own and repeats the row above under other conditions. */
  continuation: boolean;
}

export interface Table {
  kind: TableKind;
  page: number;
  /** The heading the table sits under, e.g. "Electrical characteristics". */
  heading: string | null;
  /** Conditions printed for the whole table, e.g. "TA = 25 °C, VS = ±15 V unless otherwise noted". */
  conditionsText: string | null;
  /**
   * For a table printed without conditions right after one that has them (characteristics split into DC, AC and
   * noise tables), the earlier table's conditions: "unless otherwise noted" reaches over the split.
   */
  inheritedConditions: string | null;
  header: Line;
  columns: Column[];
  rows: TableRow[];
  /** Every cell the table took, so prose reading can skip them. */
  cells: Set<Cell>;
  fontSize: number;
}

/** A heading line and what kind of section it opens. */
export interface Section {
  line: Line;
  text: string;
  kind: TableKind | 'other';
}

function normaliseHeader(text: string): string {
  return text
    .toLowerCase()
    .replace(/\(note[^)]*\)|\[note[^\]]*\]|\(\d\)/g, '')
    .replace(/[.:*¹²³]+/g, '')
    .replace(/\s+/g, ' ')
    .trim();
}

const HEADER_WORDS: [RegExp, ColumnRole][] = [
  [/^(parameters?|characteristics?|items?|descriptions?|property|properties|quantity|features?|attributes?)$/, 'label'],
  [/^(symbols?|sym|abbr)$/, 'symbol'],
  [/^((test )?conditions?|test condition|conditions? ?\/ ?notes?|remarks?|comments?)$/, 'conditions'],
  [/^(min|minimum|lower limit)$/, 'min'],
  [/^(typ|typical|nom|nominal)$/, 'typ'],
  [/^(max|maximum|upper limit)$/, 'max'],
  [/^(units?|unit of measure)$/, 'unit'],
  [/^(values?|ratings?|limits?|rated values?|max(imum)? ratings?|data|specs?|specifications?|specified values?)$/, 'value'],
  [/^(pin|pins|pin no|pin number|pin #|no|#|lead|terminal|lug)$/, 'pin'],
  [/^(name|pin name|signal|label)$/, 'name'],
  [/^(functions?|pin function|pin description)$/, 'function'],
  [
    /^(part number|part no|order(ing)? (code|number)|order no|orderable part( number)?|device|marking|top marking|packing|packaging|package|package type|qty|quantity|shipping|temperature range|temp range|reel|pack)$/,
    'ordering',
  ],
  [/^(dim|dims|dimension|dimensions|ref|mm|millimet(er|re)s|inch|inches)$/, 'dimension'],
];

export function headerRole(text: string): ColumnRole | null {
  const t = normaliseHeader(text);
  for (const [re, role] of HEADER_WORDS) if (re.test(t)) return role;
  return null;
}

/** Header words set close together read as one cell; split them again where each item is a header word itself. */
function headerCells(line: Line): Cell[] {
  return line.cells.flatMap((cell) => {
    if (cell.items.length < 2 || headerRole(cell.text)) return [cell];
    const parts = cell.items.map((item) => cellOf([item]));
    return parts.filter((p) => headerRole(p.text)).length >= 2 ? parts : [cell];
  });
}

const VALUE_ROLES: ColumnRole[] = ['min', 'typ', 'max', 'value'];

/** A header row: a run of header words with at least one column that holds values, pins or order codes. */
export function readHeader(line: Line): Column[] | null {
  const cells = headerCells(line);
  const roles = cells.map((c) => headerRole(c.text));
  let best: Column[] | null = null;
  // Longest run of header cells, allowing one unknown word inside it (a header that wrapped, say).
  for (let start = 0; start < roles.length; start++) {
    if (roles[start] === null) continue;
    const cols: Column[] = [];
    let unknown = 0;
    for (let i = start; i < roles.length; i++) {
      const role = roles[i] ?? null;
      const cell = cells[i]!;
      if (role === null) {
        if (++unknown > 1) break;
        cols.push({ role: 'conditions', header: cell.text, x: cell.x, right: cell.right });
        continue;
      }
      cols.push({ role, header: cell.text, x: cell.x, right: cell.right });
    }
    while (cols.length && headerRole(cols[cols.length - 1]!.header) === null) cols.pop();
    if (!best || cols.length > best.length) best = cols;
  }
  if (!best || best.length < 2) return null;
  const known = best.filter((c) => headerRole(c.header) !== null);
  const has = (r: ColumnRole) => best!.some((c) => c.role === r);
  const valued = VALUE_ROLES.filter(has).length;
  const isPins = has('pin') && (has('name') || has('function') || has('symbol') || (has('label') && best.length <= 4));
  const isOrdering = best.filter((c) => c.role === 'ordering').length >= 2;
  const isDims = has('dimension') && valued > 0;
  const isChars = valued >= 1 && (valued >= 2 || has('unit') || has('label') || has('symbol'));
  if (known.length < 2 || !(isPins || isOrdering || isDims || isChars)) return null;
  if (isPins) {
    // In a pin table, "Symbol" is the pin's name and "Description" what it does.
    for (const c of best) {
      if (c.role === 'symbol') c.role = has('name') ? 'function' : 'name';
      else if (c.role === 'label') c.role = has('function') ? 'name' : 'function';
    }
  }
  return best;
}

function kindOfHeader(columns: Column[]): TableKind | null {
  const roles = new Set(columns.map((c) => c.role));
  if (roles.has('pin')) return 'pins';
  if (columns.filter((c) => c.role === 'ordering').length >= 2) return 'ordering';
  if (roles.has('dimension')) return 'dimensions';
  return null;
}

export function sectionKind(text: string): TableKind | 'other' {
  const t = text.toLowerCase();
  if (/absolute\s*max|maximum\s+ratings|limiting\s+values|stress\s+ratings/.test(t)) return 'absolute-maximum';
  if (/order(ing)?\s+(information|codes?|guide)|how to order|part numbering|package marking/.test(t)) return 'ordering';
  if (/dimension|package outline|outline drawing|mechanical drawing|land pattern|footprint|tape and reel/.test(t)) {
    return 'dimensions';
  }
  if (/revision|document history|change (log|history)/.test(t)) return 'revisions';
  if (/pin\s*(configuration|description|functions?|assignments?|out|connections?)|pinout|terminal/.test(t)) return 'pins';
  if (/characteristics|specifications|operating conditions|ratings|parameters|electrical|optical|performance|mechanical|key specs?/.test(t)) {
    return 'characteristics';
  }
  return 'other';
}

/** Conditions printed under a heading: "TA = 25 °C, VS = ±15 V", "at 85 °C", "unless otherwise noted". */
export function isConditionsText(text: string): boolean {
  if (text.length > 160) return false;
  return (
    /unless otherwise|otherwise (noted|specified|stated)/i.test(text) ||
    /\b[A-Za-z][A-Za-z+\-]{0,5}\s*=\s*[±+\-−]?\s*\d/.test(text) ||
    /^\(?\s*(at|@)\s*[+\-−]?\d+(\.\d+)?\s*°\s*C\b/i.test(text)
  );
}

const numberLike = /^[±+\-−–~≤≥<>]?\s*\d/;

export interface DocumentLayout {
  lines: Line[];
  /** Page heights in points, by page number less one. */
  pageHeights: number[];
  bodySize: number;
  sections: Section[];
  /** The section each line falls under (by line index). */
  sectionOf: (Section | null)[];
}

/** Headings: short lines set larger than the body, or in another face, that do not read as data. */
export function analyseLayout(lines: Line[], pages: { height: number }[] = []): DocumentLayout {
  const bodySize = bodyFontSize(lines);
  const fontWeight = new Map<string, number>();
  for (const l of lines) for (const i of l.items) fontWeight.set(i.fontName, (fontWeight.get(i.fontName) ?? 0) + i.text.length);
  const bodyFont = [...fontWeight.entries()].sort((a, b) => b[1] - a[1])[0]?.[0];
  const sections: Section[] = [];
  const sectionOf: (Section | null)[] = [];
  let current: Section | null = null;
  for (const line of lines) {
    const text = line.text.trim();
    const single = line.cells.length === 1;
    const otherFace = line.items.every((i) => i.fontName !== bodyFont);
    const short = text.length <= 70 && !/[.;]$/.test(text) && /[A-Za-z]{3}/.test(text) && !numberLike.test(text);
    const larger = line.fontSize >= bodySize * 1.08;
    const vocabulary = sectionKind(text) !== 'other' && text.split(/\s+/).length <= 6;
    if (single && short && (larger || (otherFace && vocabulary))) {
      current = { line, text, kind: sectionKind(text) };
      sections.push(current);
    }
    sectionOf.push(current);
  }
  return { lines, pageHeights: pages.map((p) => p.height), bodySize, sections, sectionOf };
}

function overlap(a0: number, a1: number, b0: number, b1: number): number {
  return Math.max(0, Math.min(a1, b1) - Math.max(a0, b0));
}

/** The column whose header a cell overlaps most, if it overlaps any. */
function overlapColumn(cell: { x: number; right: number }, columns: Column[]): number | null {
  let best: number | null = null;
  let bestOverlap = 0;
  columns.forEach((c, i) => {
    const o = overlap(cell.x, cell.right, c.x - 1, c.right + 1);
    if (o > bestOverlap) {
      best = i;
      bestOverlap = o;
    }
  });
  return best;
}

/** The column a cell belongs to: the header it overlaps most, else the band around the nearest header. */
export function columnFor(cell: { x: number; right: number }, columns: Column[]): number {
  const hit = overlapColumn(cell, columns);
  if (hit !== null) return hit;
  const centre = (cell.x + cell.right) / 2;
  for (let i = 0; i < columns.length; i++) {
    const left = i === 0 ? -Infinity : (columns[i - 1]!.right + columns[i]!.x) / 2;
    const right = i === columns.length - 1 ? Infinity : (columns[i]!.right + columns[i + 1]!.x) / 2;
    if (centre >= left && centre < right) return i;
  }
  return columns.length - 1;
}

/**
 * A cell whose items sit under different headers is split: right-aligned numbers come closer to the next column's
 * left-aligned text than a word space can tell apart. Items under no header (the end of a long label) stay with
 * the item before them.
 */
function assignCells(cells: Cell[], columns: Column[]): Map<number, Cell[]> {
  const out = new Map<number, Cell[]>();
  const push = (i: number, cell: Cell) => out.set(i, [...(out.get(i) ?? []), cell]);
  for (const cell of cells) {
    const perItem = cell.items.map((it) => overlapColumn({ x: it.x, right: it.x + it.width }, columns));
    const known = perItem.filter((c): c is number => c !== null);
    if (cell.items.length === 1 || known.every((c) => c === known[0])) {
      push(columnFor(cell, columns), cell);
      continue;
    }
    let last = known[0]!;
    const filled = perItem.map((c) => (last = c ?? last));
    let start = 0;
    for (let k = 1; k <= cell.items.length; k++) {
      if (k === cell.items.length || filled[k] !== filled[start]) {
        push(filled[start]!, cellOf(cell.items.slice(start, k)));
        start = k;
      }
    }
  }
  return out;
}

function cellsWithin(line: Line, left: number, right: number, taken: Set<Cell>): Cell[] {
  return line.cells.filter((c) => !taken.has(c) && c.right > left && c.x < right);
}

function headingAndConditions(
  layout: DocumentLayout,
  header: Line,
  left: number,
  right: number,
): { heading: string | null; conditions: string[]; kind: TableKind | 'other' } {
  const conditions: string[] = [];
  let heading: string | null = null;
  const section = layout.sectionOf[header.index] ?? null;
  // Lines just above the header: the table's title and the conditions printed under it.
  for (let i = header.index - 1; i >= 0 && i >= header.index - 5; i--) {
    const line = layout.lines[i]!;
    if (line.page !== header.page || header.top - line.bottom > 70) break;
    const text = line.cells
      .filter((c) => c.right > left - 5 && c.x < right)
      .map((c) => c.text)
      .join(' ')
      .trim();
    if (!text) continue;
    if (section && section.line === line) {
      heading = section.text;
      break;
    }
    if (isConditionsText(text)) conditions.unshift(text);
    else if (readHeader(line)) break;
  }
  heading ??= section?.text ?? null;
  const kind = section ? section.kind : 'other';
  if (heading && section && heading !== section.text) return { heading, conditions, kind: sectionKind(heading) };
  return { heading, conditions, kind };
}

/** Lines directly under the header that only continue its words ("Test" / "conditions"). */
function isHeaderContinuation(line: Line, columns: Column[], header: Line): boolean {
  if (line.top - header.bottom > header.fontSize * 0.45) return false;
  return line.cells.every((c) => !numberLike.test(c.text) && c.text.length < 25 && columnFor(c, columns) >= 0);
}

function appendCells(row: TableRow, cells: Partial<Record<ColumnRole, Cell[]>>, line: Line): void {
  for (const [role, cs] of Object.entries(cells) as [ColumnRole, Cell[]][]) row.cells[role] = [...(row.cells[role] ?? []), ...cs];
  row.lines.push(line);
}

const textOf = (cells: Cell[]) => cells.map((c) => c.text).join(' ');

function median(values: number[]): number | undefined {
  if (values.length === 0) return undefined;
  return values.slice().sort((a, b) => a - b)[Math.floor(values.length / 2)];
}

function tableKind(columns: Column[], around: ReturnType<typeof headingAndConditions>): TableKind {
  const fromHeader = kindOfHeader(columns);
  if (fromHeader) return fromHeader;
  if (around.kind === 'ordering' || around.kind === 'revisions') return around.kind;
  // A Min/Nom/Max table under a dimensions heading without a Parameter column is a drawing's dimensions.
  if (around.kind === 'dimensions') return columns.some((c) => c.role === 'label') ? 'characteristics' : 'dimensions';
  return around.kind === 'absolute-maximum' ? 'absolute-maximum' : 'characteristics';
}

/** Reads the rows under one header until the table ends; returns the index of the last line it looked at. */
function readRows(layout: DocumentLayout, table: Table, start: number, left: number, right: number, taken: Set<Cell>): number {
  const { lines } = layout;
  const { columns, header } = table;
  const roleAt = (i: number) => columns[i]!.role;
  const labelRole: ColumnRole = columns.some((c) => c.role === 'label') ? 'label' : columns.some((c) => c.role === 'pin') ? 'pin' : 'symbol';
  let prevBottom = header.bottom;
  let group: string | null = null;
  let pendingLabel: { cells: Cell[]; line: Line } | null = null;
  let last: TableRow | null = null;
  const pitch: number[] = [];
  let k = start;
  for (; k < lines.length; k++) {
    const line = lines[k]!;
    if (line.page !== header.page) break;
    const cells = cellsWithin(line, left, right, taken);
    if (cells.length === 0) continue;
    // The table ends at a wide gap, a larger heading, another header, or text starting left of it.
    const gap = line.top - prevBottom;
    if (gap > Math.max(2.6 * table.fontSize, 2.2 * (median(pitch) ?? table.fontSize))) break;
    if (Math.max(...cells.map((c) => c.fontSize)) > table.fontSize * 1.12) break;
    if (readHeader(line)) break;
    if (table.rows.length === 0 && !pendingLabel && isHeaderContinuation(line, columns, header)) {
      for (const c of cells) {
        const col = columns[columnFor(c, columns)]!;
        col.header = `${col.header} ${c.text}`;
        const role = headerRole(col.header);
        if (role && col.role === 'conditions') col.role = role;
        taken.add(c);
        table.cells.add(c);
      }
      prevBottom = line.bottom;
      continue;
    }
    if (cells[0]!.x < left - 10) break;

    const byColumn = assignCells(cells, columns);
    const has = (roles: ColumnRole[]) => [...byColumn.keys()].some((i) => roles.includes(roleAt(i)));
    const hasValues = has(['min', 'typ', 'max', 'value', 'unit', 'name', 'function']);
    const hasLabel = has([labelRole]);
    const wide = cells.length === 1 && cells[0]!.right - cells[0]!.x > (right - left) * 0.55;
    const closeToLast = last !== null && line.top - last.lines[last.lines.length - 1]!.bottom < table.fontSize * 0.55;
    pitch.push(gap + (line.bottom - line.top));
    if (pitch.length > 8) pitch.shift();
    for (const c of cells) {
      taken.add(c);
      table.cells.add(c);
    }
    prevBottom = line.bottom;
    const rowCells: Partial<Record<ColumnRole, Cell[]>> = {};
    for (const [i, cs] of [...byColumn.entries()].sort((a, b) => a[0] - b[0])) rowCells[roleAt(i)] = [...(rowCells[roleAt(i)] ?? []), ...cs];

    // The second line of wrapped cells continues the row above instead of starting one.
    if (last && closeToLast && !hasLabel && [...byColumn.keys()].every((i) => (last!.cells[roleAt(i)]?.length ?? 0) > 0)) {
      appendCells(last, rowCells, line);
      continue;
    }
    if (hasValues) {
      let continuation = false;
      let rowLines = [line];
      if (!hasLabel && pendingLabel) {
        rowCells[labelRole] = pendingLabel.cells;
        rowLines = [pendingLabel.line, line];
      } else if (hasLabel && pendingLabel) {
        // The label-only line above was a sub-heading of the rows that follow.
        group = textOf(pendingLabel.cells);
      } else if (!hasLabel && last) {
        // The same parameter again under other conditions (the full temperature range, say).
        continuation = true;
        for (const role of ['label', 'symbol'] as ColumnRole[]) if (!rowCells[role] && last.cells[role]) rowCells[role] = last.cells[role];
      }
      pendingLabel = null;
      last = { cells: rowCells, lines: rowLines, group, continuation };
      table.rows.push(last);
      continue;
    }
    // A line without values: the rest of a wrapped label, a sub-heading, or a label whose values come next.
    if (last && closeToLast && !wide) {
      appendCells(last, rowCells, line);
    } else if (roleAt(Math.min(...byColumn.keys())) === labelRole || wide) {
      if (pendingLabel) group = textOf(pendingLabel.cells);
      pendingLabel = { cells: Object.values(rowCells).flat(), line };
    } else if (last) {
      appendCells(last, rowCells, line);
    }
  }
  return k - 1;
}

const CONTINUED = /\s*\(?\bcont(inued|'d|\.)?\)?\s*$/i;

/**
 * "Unless otherwise noted" reaches over characteristics split into several tables (DC, AC, noise): a table printed
 * without conditions takes those of the one before it, and a table continued on the next page those it started under.
 */
function inheritConditions(tables: Table[]): void {
  let carried: string | null = null;
  const seen: Table[] = [];
  for (const t of tables) {
    if (t.kind === 'absolute-maximum') carried = null;
    if (t.kind !== 'characteristics') continue;
    if (!t.conditionsText && t.heading && CONTINUED.test(t.heading)) {
      const base = t.heading.replace(CONTINUED, '').toLowerCase();
      const start = seen.findLast((s) => (s.heading ?? '').replace(CONTINUED, '').toLowerCase() === base);
      t.inheritedConditions = start ? (start.conditionsText ?? start.inheritedConditions) : carried;
    } else if (t.conditionsText) {
      const special = namesHotOrFullRange(t.conditionsText) || namesHotOrFullRange(t.heading) || isConditionsText(t.heading ?? '');
      // After a table at special conditions nothing is carried: which conditions follow is anyone's guess.
      carried = special ? null : t.conditionsText;
    } else if (!(t.heading && isConditionsText(t.heading))) {
      t.inheritedConditions = carried;
    }
    seen.push(t);
  }
}

/** Finds every table with a recognisable header row and reads its rows into columns. */
export function findTables(layout: DocumentLayout): Table[] {
  const tables: Table[] = [];
  const taken = new Set<Cell>();
  for (let h = 0; h < layout.lines.length; h++) {
    const header = layout.lines[h]!;
    const columns = readHeader(header);
    if (!columns) continue;
    const left = columns[0]!.x - 4;
    const lastCol = columns[columns.length - 1]!;
    const right = lastCol.right + Math.max(40, (lastCol.right - columns[0]!.x) * 0.15);
    const around = headingAndConditions(layout, header, left, right);
    const headerCells = header.cells.filter((c) => c.right > left && c.x < right);
    for (const c of headerCells) taken.add(c);
    const table: Table = {
      kind: tableKind(columns, around),
      page: header.page,
      heading: around.heading,
      conditionsText: around.conditions.length ? around.conditions.join(' ') : null,
      inheritedConditions: null,
      header,
      columns,
      rows: [],
      cells: new Set(headerCells),
      fontSize: Math.max(...headerCells.map((c) => c.fontSize)),
    };
    h = Math.max(h, readRows(layout, table, h + 1, left, right, taken));
    tables.push(table);
  }
  inheritConditions(tables);
  return tables;
}

/** The text of a row's cells in one column, in reading order. */
export function cellText(row: TableRow, role: ColumnRole): string {
  return (row.cells[role] ?? [])
    .map((c) => c.text)
    .join(' ')
    .replace(/\s+/g, ' ')
    .trim();
}
