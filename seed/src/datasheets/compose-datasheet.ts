import type { DatasheetSummary } from '@understudy/shared-types';
import type { Block, DatasheetSpec, PageSpec, TableBlock, TableColumn, TableRow, TitleBlock } from './datasheet-spec';
import { INVENTED_MAKERS } from './invented-names';
import { applyUnitStyle, unitStyleTags, type UnitStyle } from './quantity-text';
import { createMeasurer, type DatasheetMeasurer } from './render-datasheet';
import { inlineAmount, proseSentence, SLOTS, TruthBuilder, type AbsRow, type CharRow, type CharTable, type SheetContent, type Slot } from './sheet-model';
import type { Variations } from './variations';

/** A composed document: what to draw, what a perfect parser would report, and which variations it exercises. */
export interface ComposedDatasheet {
  spec: DatasheetSpec;
  truth: DatasheetSummary;
  pageCount: number;
  variations: string[];
}

type ColumnKind = 'parameter' | 'symbol' | 'conditions' | Slot | 'unit';

/** Column orders seen in real characteristics tables; those without a Unit column print units in the cells. */
export const GRID_LAYOUTS: Record<string, ColumnKind[]> = {
  'parameter-symbol-conditions-min-typ-max-unit': ['parameter', 'symbol', 'conditions', 'min', 'typ', 'max', 'unit'],
  'parameter-min-typ-max-unit': ['parameter', 'min', 'typ', 'max', 'unit'],
  'symbol-parameter-unit-min-max-typ': ['symbol', 'parameter', 'unit', 'min', 'max', 'typ'],
  'parameter-conditions-min-typ-max-unit': ['parameter', 'conditions', 'min', 'typ', 'max', 'unit'],
  'parameter-symbol-min-typ-max-unit-conditions': ['parameter', 'symbol', 'min', 'typ', 'max', 'unit', 'conditions'],
  'parameter-symbol-conditions-min-typ-max': ['parameter', 'symbol', 'conditions', 'min', 'typ', 'max'],
  'parameter-min-typ-max': ['parameter', 'min', 'typ', 'max'],
  'symbol-parameter-conditions-typ-min-max-unit': ['symbol', 'parameter', 'conditions', 'typ', 'min', 'max', 'unit'],
  'parameter-symbol-conditions-typ-max-unit': ['parameter', 'symbol', 'conditions', 'typ', 'max', 'unit'],
};
export const LIST_LAYOUTS = ['list:parameter-value', 'list:parameter-conditions-value'] as const;
const LAYOUT_NAMES = [...Object.keys(GRID_LAYOUTS), ...LIST_LAYOUTS];

const HEADER_WORDS = {
  short: { parameter: 'Parameter', symbol: 'Symbol', conditions: 'Conditions', min: 'Min', typ: 'Typ', max: 'Max', unit: 'Unit', value: 'Value' },
  upper: { parameter: 'PARAMETER', symbol: 'SYMBOL', conditions: 'TEST CONDITIONS', min: 'MIN', typ: 'TYP', max: 'MAX', unit: 'UNIT', value: 'VALUE' },
  dotted: { parameter: 'Characteristic', symbol: 'Sym.', conditions: 'Test conditions', min: 'Min.', typ: 'Typ.', max: 'Max.', unit: 'Units', value: 'Specification' },
  long: { parameter: 'Characteristics', symbol: 'Symbol', conditions: 'Test Conditions', min: 'Minimum', typ: 'Typical', max: 'Maximum', unit: 'Unit', value: 'Values' },
} as const;
type HeaderWords = (typeof HEADER_WORDS)[keyof typeof HEADER_WORDS];

const ABS_MAX_LAYOUTS = ['parameter-symbol-value-unit', 'parameter-rating', 'parameter-symbol-min-max-unit'] as const;
const ABS_MAX_TITLES = ['Absolute maximum ratings', 'ABSOLUTE MAXIMUM RATINGS', 'Absolute Maximum Ratings (TA = 25 °C)', 'Maximum ratings'];
const ABS_MAX_NOTE =
  'Stresses beyond those listed under absolute maximum ratings may cause permanent damage. These are stress ratings only; functional operation at these or any conditions beyond the recommended ones is not implied.';

const ACCENTS = ['#1f4e79', '#7a1f2b', '#2f5d3a', '#4b3b7a', '#8a5a00', '#333333'];
const MONTHS = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'];

interface TableStyle {
  layout: string;
  words: HeaderWords;
  rules: TableBlock['rules'];
  shaded: boolean;
  empty: string;
  align: 'centre' | 'right';
  qualifier: 'suffix' | 'prefix' | 'symbols';
  /** Appended conditions: ", f = 1 kHz" or " (f = 1 kHz)". */
  bracket: boolean;
}

interface Chunk {
  id: string;
  blocks: Block[];
  newPage?: boolean;
}

const cap = (s: string) => (s ? s[0]!.toUpperCase() + s.slice(1) : s);
const pad2 = (n: number) => String(n).padStart(2, '0');

function slotWord(slot: Slot, style: TableStyle): string {
  return style.words[slot];
}

// ---------------------------------------------------------------------------------------------------------------
// Tables

function needsSlots(rows: CharRow[]): Set<Slot> {
  const used = new Set<Slot>();
  for (const row of rows) {
    for (const s of SLOTS) if (row.values[s] !== undefined) used.add(s);
    if (row.text !== undefined) used.add('typ');
  }
  return used;
}

/** The layout if it has a column for every slot the rows use, else the full one. */
function fitLayout(layout: string, rows: CharRow[]): string {
  const cols = GRID_LAYOUTS[layout];
  if (!cols) return layout;
  const used = needsSlots(rows);
  return [...used].every((s) => cols.includes(s)) ? layout : 'parameter-symbol-conditions-min-typ-max-unit';
}

function columnWidths(kinds: ColumnKind[], inline: boolean, total: number, words: HeaderWords): number[] {
  // Wide enough for the header word in bold, so "Minimum" does not wrap.
  const slot = (s: Slot) => Math.max(inline ? 60 : 40, words[s].length * 6 + 6);
  const fixed: Partial<Record<ColumnKind, number>> = { symbol: 44, min: slot('min'), typ: slot('typ'), max: slot('max'), unit: 46 };
  const used = kinds.reduce((a, k) => a + (fixed[k] ?? 0), 0);
  const flexible = kinds.filter((k) => k === 'parameter' || k === 'conditions');
  const rest = total - used;
  return kinds.map((k) => {
    if (fixed[k] !== undefined) return fixed[k]!;
    if (flexible.length === 1) return rest;
    return k === 'parameter' ? Math.round(rest * 0.55) : rest - Math.round(rest * 0.55);
  });
}

function parameterText(row: CharRow, parent: CharRow | undefined, keepConditions: boolean, style: TableStyle): string {
  const name = row.continuation ? (parent?.parameter ?? '') : row.parameter;
  if (!keepConditions || !row.conditions || !(row.conditionsMatter || row.continuation)) return name;
  return style.bracket ? `${name} (${row.conditions})` : `${name}, ${row.conditions}`;
}

function gridTable(title: string, subtitle: string, groups: CharTable['groups'], style: TableStyle, width: number, note?: string): TableBlock {
  const kinds = GRID_LAYOUTS[style.layout]!;
  const inline = !kinds.includes('unit');
  const hasConditions = kinds.includes('conditions');
  const widths = columnWidths(kinds, inline, width, style.words);
  const columns: TableColumn[] = kinds.map((k, i) => ({
    header: style.words[k],
    width: widths[i]!,
    align: k === 'min' || k === 'typ' || k === 'max' ? style.align : k === 'unit' || k === 'symbol' ? 'centre' : 'left',
  }));
  const rows: TableRow[] = [];
  for (const group of groups) {
    if (groups.length > 1 && group.title) rows.push({ section: group.title });
    let parent: CharRow | undefined;
    for (const row of group.rows) {
      if (!row.continuation) parent = row;
      const cells = kinds.map((k): string => {
        switch (k) {
          case 'parameter':
            return row.continuation && hasConditions ? '' : parameterText(row, parent, !hasConditions, style);
          case 'symbol':
            return row.continuation ? '' : (row.symbol ?? '');
          case 'conditions':
            return row.conditions ?? '';
          case 'unit':
            return row.unit;
          default: {
            if (row.text !== undefined) return k === 'typ' ? row.text : style.empty;
            const v = row.values[k];
            if (v === undefined) return style.empty;
            return inline ? inlineAmount(row, v) : v;
          }
        }
      });
      rows.push({ cells });
    }
  }
  return { kind: 'table', title, subtitle, columns, rows, rules: style.rules, shadedHeader: style.shaded, fontSize: 7.5, ...(note ? { note } : {}) };
}

function listValue(row: CharRow, style: TableStyle): string {
  if (row.listText) return row.listText;
  if (row.text) return row.text;
  const present = SLOTS.filter((s) => row.values[s] !== undefined);
  if (present.length === 2 && present[0] === 'min' && present[1] === 'max') {
    return `${row.values.min} to ${inlineAmount(row, row.values.max!)}`;
  }
  return present
    .map((s) => {
      const amount = inlineAmount(row, row.values[s]!);
      if (style.qualifier === 'symbols') return s === 'min' ? `≥ ${amount}` : s === 'max' ? `≤ ${amount}` : present.length === 1 ? amount : `${amount} typ`;
      if (style.qualifier === 'prefix') return `${cap(slotWord(s, style).toLowerCase())} ${amount}`;
      return `${amount} ${slotWord(s, style).toLowerCase()}`;
    })
    .join(', ');
}

function listTable(title: string, subtitle: string, groups: CharTable['groups'], style: TableStyle, width: number, note?: string): TableBlock {
  const withConditions = style.layout === 'list:parameter-conditions-value';
  const widths = withConditions ? [Math.round(width * 0.38), Math.round(width * 0.3), width - Math.round(width * 0.38) - Math.round(width * 0.3)] : [Math.round(width * 0.45), width - Math.round(width * 0.45)];
  const columns: TableColumn[] = [
    { header: style.words.parameter, width: widths[0]! },
    ...(withConditions ? [{ header: style.words.conditions, width: widths[1]! }] : []),
    { header: style.words.value, width: widths[widths.length - 1]! },
  ];
  const rows: TableRow[] = [];
  for (const group of groups) {
    if (groups.length > 1 && group.title) rows.push({ section: group.title });
    let parent: CharRow | undefined;
    for (const row of group.rows) {
      if (!row.continuation) parent = row;
      const name = parameterText(row, parent, !withConditions || Boolean(row.continuation), style);
      rows.push({ cells: withConditions ? [name, row.continuation ? '' : (row.conditions ?? ''), listValue(row, style)] : [name, listValue(row, style)] });
    }
  }
  return { kind: 'table', title, subtitle, columns, rows, rules: style.rules, shadedHeader: style.shaded, fontSize: 8, ...(note ? { note } : {}) };
}

function charTable(table: CharTable, style: TableStyle, width: number, note?: string): TableBlock {
  const all = table.groups.flatMap((g) => g.rows);
  const fitted = { ...style, layout: fitLayout(style.layout, all) };
  return fitted.layout.startsWith('list:') ? listTable(table.title, table.subtitle, table.groups, fitted, width, note) : gridTable(table.title, table.subtitle, table.groups, fitted, width, note);
}

function absMaxTable(rows: AbsRow[], layout: (typeof ABS_MAX_LAYOUTS)[number], title: string, style: TableStyle, width: number): TableBlock {
  const range = /^(.+?) to (.+)$/;
  const value = (r: AbsRow) => (r.unit ? (r.unit === '°C' ? `${r.value} °C` : `${r.value} ${r.unit}`) : r.value);
  let columns: TableColumn[];
  let cells: string[][];
  if (layout === 'parameter-rating') {
    columns = [
      { header: style.words.parameter, width: Math.round(width * 0.6) },
      { header: 'Rating', width: width - Math.round(width * 0.6) },
    ];
    cells = rows.map((r) => [r.symbol ? `${r.parameter}, ${r.symbol}` : r.parameter, value(r)]);
  } else if (layout === 'parameter-symbol-value-unit') {
    columns = [
      { header: style.words.parameter, width: width - 44 - 110 - 46 },
      { header: style.words.symbol, width: 44, align: 'centre' },
      { header: style.words.value, width: 110, align: 'centre' },
      { header: style.words.unit, width: 46, align: 'centre' },
    ];
    cells = rows.map((r) => [r.parameter, r.symbol ?? '', r.value, r.unit]);
  } else {
    columns = [
      { header: style.words.parameter, width: width - 44 - 70 - 70 - 46 },
      { header: style.words.symbol, width: 44, align: 'centre' },
      { header: style.words.min, width: 70, align: 'centre' },
      { header: style.words.max, width: 70, align: 'centre' },
      { header: style.words.unit, width: 46, align: 'centre' },
    ];
    cells = rows.map((r) => {
      const m = /^\(/.test(r.value) ? null : range.exec(r.value);
      return [r.parameter, r.symbol ?? '', m ? m[1]! : style.empty, m ? m[2]! : r.value, r.unit];
    });
  }
  return { kind: 'table', title, columns, rows: cells.map((c) => ({ cells: c })), rules: style.rules === 'none' ? 'header' : style.rules, shadedHeader: style.shaded, fontSize: 7.5, note: ABS_MAX_NOTE };
}

// ---------------------------------------------------------------------------------------------------------------
// Styling every text of a block in the document's unit habits

function styleBlock(block: Block, unit: UnitStyle): Block {
  const s = (t: string) => applyUnitStyle(t, unit);
  switch (block.kind) {
    case 'heading':
    case 'paragraph':
      return { ...block, text: s(block.text) };
    case 'bullets':
      return { ...block, items: block.items.map(s) };
    case 'columns':
      return { ...block, left: block.left.map((b) => styleBlock(b, unit)), right: block.right.map((b) => styleBlock(b, unit)) };
    case 'table':
      return {
        ...block,
        ...(block.title ? { title: s(block.title) } : {}),
        ...(block.subtitle ? { subtitle: s(block.subtitle) } : {}),
        ...(block.note ? { note: s(block.note) } : {}),
        columns: block.columns.map((c) => ({ ...c, header: s(c.header) })),
        rows: block.rows.map((r) => ('section' in r ? { section: s(r.section) } : { ...r, cells: r.cells.map(s) })),
      };
    case 'figure':
      return {
        ...block,
        caption: s(block.caption),
        ...(block.xLabel ? { xLabel: s(block.xLabel) } : {}),
        ...(block.yLabel ? { yLabel: s(block.yLabel) } : {}),
        ...(block.xTicks ? { xTicks: block.xTicks.map(s) } : {}),
        ...(block.yTicks ? { yTicks: block.yTicks.map(s) } : {}),
      };
    case 'spacer':
      return block;
  }
}

// ---------------------------------------------------------------------------------------------------------------
// Pages

function splitTable(table: TableBlock, keep: number): [TableBlock, TableBlock] {
  const first = { ...table, rows: table.rows.slice(0, keep) };
  delete first.note;
  const rest: TableBlock = { ...table, rows: table.rows.slice(keep), title: `${table.title ?? 'Table'} (continued)` };
  delete rest.subtitle;
  return [first, rest];
}

function pack(chunks: Chunk[], m: DatasheetMeasurer): PageSpec[] {
  const heights = new Map<Block, number>();
  const height = (b: Block) => {
    let h = heights.get(b);
    if (h === undefined) heights.set(b, (h = m.blockHeight(b)));
    return h;
  };
  const pages: PageSpec[] = [{ blocks: [] }];
  let used = 0;
  const room = () => m.pageCapacity(pages.length - 1) - used;
  const newPage = () => {
    pages.push({ blocks: [] });
    used = 0;
  };
  for (const chunk of chunks) {
    if (chunk.newPage && pages[pages.length - 1]!.blocks.length) newPage();
    let blocks = chunk.blocks;
    while (blocks.length) {
      const total = blocks.reduce((a, b) => a + height(b), 0);
      if (total <= room()) {
        pages[pages.length - 1]!.blocks.push(...blocks);
        used += total;
        break;
      }
      // A long table continues on the next page with its header repeated.
      const tableAt = blocks.findIndex((b) => b.kind === 'table');
      const table = blocks[tableAt] as TableBlock | undefined;
      const fresh = pages[pages.length - 1]!.blocks.length === 0;
      if (table && table.rows.length > 4 && (room() > 160 || fresh)) {
        const before = blocks.slice(0, tableAt).reduce((a, b) => a + height(b), 0);
        let keep = table.rows.length - 1;
        while (keep > 2 && before + height(splitTable(table, keep)[0]) > room()) keep--;
        if (before + height(splitTable(table, keep)[0]) <= room()) {
          const [first, rest] = splitTable(table, keep);
          const placed = [...blocks.slice(0, tableAt), first];
          pages[pages.length - 1]!.blocks.push(...placed);
          newPage();
          blocks = [rest, ...blocks.slice(tableAt + 1)];
          continue;
        }
      }
      if (fresh) throw new Error(`Chunk ${chunk.id} does not fit on an empty page`);
      newPage();
    }
  }
  return pages.filter((p, i) => i === 0 || p.blocks.length > 0);
}

// ---------------------------------------------------------------------------------------------------------------

export interface ComposeOptions {
  /** Fixed choices for a hand-made document (the demos); otherwise drawn from the variation decks. */
  pages?: number;
}

export function composeDatasheet(sheet: SheetContent, v: Variations, options: ComposeOptions = {}): ComposedDatasheet {
  const { rng } = v;
  const unit: UnitStyle = {
    micro: v.choose('micro', ['µ', 'μ', 'u'] as const),
    ohm: v.choose('ohm', ['symbol', 'spaced', 'word', 'capital-letter', 'letter'] as const),
    rootHz: v.choose('root-hz', ['√Hz', 'rtHz'] as const),
    degree: v.choose('degree', ['°', 'deg'] as const),
    percent: v.choose('percent', ['spaced', 'tight'] as const),
    minus: v.choose('minus', ['−', '-'] as const),
  };
  const headerWords = v.choose('header-words', ['short', 'upper', 'dotted', 'long'] as const);
  const style: TableStyle = {
    layout: v.choose('columns', LAYOUT_NAMES),
    words: HEADER_WORDS[headerWords],
    rules: v.choose('rules', ['none', 'header', 'rows', 'grid'] as const),
    shaded: v.flag('shaded-header', 1, 3),
    empty: v.choose('empty-cell', ['', '', '—', '–', '-'] as const),
    align: v.choose('value-align', ['centre', 'right'] as const),
    qualifier: v.choose('list-qualifier', ['suffix', 'prefix', 'symbols'] as const),
    bracket: rng.chance(0.5),
  };
  const pageSize = v.choose('page-size', ['A4', 'A4', 'LETTER'] as const);
  const bodyFont = v.choose('body-font', ['sans', 'serif', 'condensed'] as const);
  const titleLayout = v.choose('title-layout', ['banner', 'stacked', 'boxed'] as const);
  const target = options.pages ?? v.choose('target-pages', [1, 2, 3, 4, 4, 4, 4, 4, 5, 6]);
  const proseCount = v.choose('prose-values', [0, 1, 1, 2, 3]);
  const alternates = sheet.alternates.length ? v.choose('alternate-tables', ['none', 'one', 'all'] as const) : 'none';
  const alternateFirst = alternates !== 'none' && v.flag('alternate-table-first', 1, 3);
  const separateTables = v.flag('separate-tables', 1, 2);
  const absLayout = v.choose('absolute-maximum-layout', ABS_MAX_LAYOUTS);
  const intro = v.choose('first-page', ['features-beside-pinout', 'stacked', 'description-first'] as const);
  const upper = v.flag('upper-case-headings', 1, 4);
  const width = pageSize === 'A4' ? 495.28 : 512;

  const maker = INVENTED_MAKERS.find((m) => m.name === sheet.manufacturer);
  const year = rng.int(2019, 2025);
  const month = rng.int(1, 12);
  const day = rng.int(1, 28);
  const date = new Date(Date.UTC(year, month - 1, day, 12));
  const dateText = v.choose('date-format', ['iso', 'month-year', 'day-month-year', 'slash'] as const);
  const dateLabel = {
    iso: `${year}-${pad2(month)}-${pad2(day)}`,
    'month-year': `${MONTHS[month - 1]} ${year}`,
    'day-month-year': `${day} ${MONTHS[month - 1]!.slice(0, 3)} ${year}`,
    slash: `${pad2(month)}/${year}`,
  }[dateText];
  const revision = v.choose('revision-format', ['Rev. C', 'Rev 1.2', 'Revision 3', 'Rev. B1'] as const);
  const docNumber = `${maker?.docPrefix ?? 'DS'}-${rng.int(100, 9999).toString().padStart(4, '0')}`;
  const pageLabel = v.choose('page-label', ['Page {n} of {total}', '{n}', '{n}/{total}', 'Page {n}', '– {n} –'] as const);

  const heading = (text: string, level: 1 | 2 = 1): Block => ({ kind: 'heading', text: upper && level === 1 ? text.toUpperCase() : text, level });
  const truth = new TruthBuilder(sheet.family, { partNumber: sheet.partNumber, manufacturer: sheet.manufacturer });
  for (const t of sheet.titleTruth) truth.add(t);

  // Values moved out of the tables into running prose.
  const primaryRows = sheet.primary.groups.flatMap((g) => g.rows);
  const movable = primaryRows.filter((row, i) => row.truth && (row.phrase || row.sentence) && !primaryRows[i + 1]?.continuation);
  const moved = new Set(rng.shuffle(movable).slice(0, proseCount));
  const sentences = [...moved].map((row, i) => proseSentence(row, rng.int(0, 5) + i));
  for (const row of moved) v.tag(`prose:${row.truth!.key}`);
  const primary: CharTable = { ...sheet.primary, groups: sheet.primary.groups.map((g) => ({ ...g, rows: g.rows.filter((r) => !moved.has(r)) })).filter((g) => g.rows.length) };
  for (const row of primary.groups.flatMap((g) => g.rows)) if (row.truth) truth.add(row.truth);
  for (const row of moved) truth.add(row.truth!);
  for (const row of sheet.operating?.groups.flatMap((g) => g.rows) ?? []) if (row.truth) truth.add(row.truth);
  for (const row of sheet.absoluteMax) if (row.truth) truth.add(row.truth);
  for (const st of sheet.statements) for (const t of st.truth ?? []) truth.add(t);
  if (sheet.absoluteMax.some((r) => r.truth)) v.tag('truth-from-absolute-maximum');
  if (sheet.absoluteMax.length) v.tag('absolute-maximum-table');

  // --- chunks, in reading order
  const chunks: Chunk[] = [];
  const featureBlocks: Block[] = [heading('Features'), { kind: 'bullets', items: sheet.features }];
  const pinoutBlocks: Block[] = sheet.pinout
    ? [
        heading(sheet.pinout.title, 2),
        {
          kind: 'table',
          columns: [
            { header: 'Pin', width: 34, align: 'centre' },
            { header: 'Name', width: 70 },
            { header: 'Function', width: 130 },
          ],
          rows: sheet.pinout.rows.map(([a, b, c]) => ({ cells: [a, b, c] })),
          rules: 'rows',
          fontSize: 7.5,
        },
      ]
    : [];
  const extraProse = [...sentences, ...sheet.statements.map((s) => s.text)];
  const description: Block[] = [
    heading('Description'),
    ...(target === 1 ? sheet.overview.slice(0, 1) : sheet.overview).map((text): Block => ({ kind: 'paragraph', text })),
    ...(extraProse.length ? [{ kind: 'paragraph', text: extraProse.join(' ') } satisfies Block] : []),
  ];
  if (intro === 'features-beside-pinout' && sheet.pinout && target > 1) {
    chunks.push({ id: 'intro', blocks: [{ kind: 'columns', left: featureBlocks, right: pinoutBlocks, split: 0.5 }, ...description] });
  } else if (intro === 'description-first') {
    chunks.push({ id: 'intro', blocks: [...description, ...(target > 1 ? featureBlocks : [])] });
  } else {
    chunks.push({ id: 'intro', blocks: [...(target > 1 ? featureBlocks : []), ...description] });
  }
  if (sheet.pinout && !(intro === 'features-beside-pinout' && target > 1)) {
    chunks.push({ id: 'pinout', blocks: [heading('Pin configuration'), ...pinoutBlocks.slice(1)] });
  }
  if (sheet.caution) chunks.push({ id: 'caution', blocks: [{ kind: 'paragraph', text: sheet.caution, italic: true }] });
  if (sheet.absoluteMax.length) {
    chunks.push({ id: 'absolute-maximum', blocks: [absMaxTable(sheet.absoluteMax, absLayout, rng.pick(ABS_MAX_TITLES), style, width)] });
  }
  if (sheet.operating) {
    chunks.push({ id: 'operating', blocks: [charTable(sheet.operating, { ...style, layout: rng.pick(['parameter-symbol-conditions-min-typ-max-unit', 'parameter-min-typ-max-unit', 'list:parameter-value']) }, width)] });
    v.tag('operating-conditions-table');
  }
  const primaryTables: Chunk[] = separateTables
    ? primary.groups.map((g, i) => ({
        id: `primary-${i}`,
       
        blocks: [charTable({ title: `${g.title || primary.title}`, subtitle: i === 0 ? primary.subtitle : '', groups: [g] }, style, width)],
      }))
    : [{ id: 'primary', blocks: [charTable(primary, style, width)] }];
  const chosenAlternates = alternates === 'none' ? [] : alternates === 'one' ? [rng.pick(sheet.alternates)] : sheet.alternates;
  const alternateChunks: Chunk[] = chosenAlternates.map((t, i) => ({ id: `alternate-${i}`, blocks: [charTable(t, style, width)] }));
  for (const t of chosenAlternates) v.tag(`alternate-conditions:${t.kind}`);
  chunks.push(...(alternateFirst ? [...alternateChunks, ...primaryTables] : [...primaryTables, ...alternateChunks]));

  const graphs = sheet.graphs.map((g): Block => ({ kind: 'figure', figure: 'graph', height: 150, caption: g.caption, xLabel: g.xLabel, yLabel: g.yLabel, xTicks: g.xTicks, yTicks: g.yTicks, curve: g.curve }));
  const optional: Chunk[] = [
    { id: 'graphs', blocks: [heading('Typical performance characteristics'), ...graphs.slice(0, 2)] },
    { id: 'applications', blocks: [heading('Applications'), { kind: 'bullets', items: sheet.applications }] },
    { id: 'application-notes', blocks: [heading('Application information'), ...sheet.applicationNotes.map((text): Block => ({ kind: 'paragraph', text }))] },
    {
      id: 'package',
     
      blocks: [
        heading(`Package information: ${sheet.packageName}`),
        { kind: 'figure', figure: 'package-outline', height: 110, caption: `Outline drawing, ${sheet.packageName} (not to scale)`, labels: sheet.dimensions.map((d) => d.symbol).slice(0, 2).concat(['Dimensions in mm']) },
        {
          kind: 'table',
          title: 'Package dimensions',
          columns: [
            { header: 'Dimension', width: 90 },
            { header: style.words.min, width: 70, align: 'centre' },
            { header: 'Nom', width: 70, align: 'centre' },
            { header: style.words.max, width: 70, align: 'centre' },
            { header: style.words.unit, width: 50, align: 'centre' },
          ],
          rows: sheet.dimensions.map((d) => ({ cells: [d.symbol, d.min || style.empty, d.nom || style.empty, d.max || style.empty, 'mm'] })),
          rules: 'rows',
          fontSize: 7.5,
        },
      ],
    },
    {
      id: 'ordering',
     
      blocks: [
        heading('Ordering information'),
        {
          kind: 'table',
          columns: [
            { header: 'Order code', width: 130 },
            { header: 'Package', width: 110 },
            { header: 'Marking', width: 90 },
            { header: 'Packing', width: width - 330 },
          ],
          rows: sheet.ordering.map((o) => ({ cells: [o.code, o.package, o.marking, o.packing] })),
          rules: 'header',
          fontSize: 7.5,
        },
      ],
    },
    {
      id: 'revision-history',
     
      blocks: [
        heading('Revision history'),
        {
          kind: 'table',
          columns: [
            { header: 'Revision', width: 70 },
            { header: 'Date', width: 100 },
            { header: 'Changes', width: width - 170 },
          ],
          rows: [
            { cells: ['A', `${year - 2}-0${rng.int(1, 9)}-1${rng.int(0, 9)}`, 'Initial release'] },
            { cells: ['B', `${MONTHS[rng.int(0, 11)]} ${year - 1}`, 'Added package dimensions; corrected typing errors'] },
            { cells: [revision.replace(/^Rev(ision)?\.? ?/, ''), dateLabel, 'Updated characteristics tables and ordering codes'] },
          ],
          rules: 'rows',
          fontSize: 7.5,
        },
      ],
    },
    {
      id: 'notice',
     
      blocks: [
        heading('Important notice'),
        {
          kind: 'paragraph',
          size: 7.5,
          text: `${maker?.legalName ?? sheet.manufacturer} may change specifications and product descriptions at any time without notice. Typical values are for design guidance only and are not tested in production. Customers are responsible for their products and applications using ${sheet.manufacturer} components. Document ${docNumber}, ${revision}, ${dateLabel}.`,
        },
      ],
    },
  ];
  const fillers: Chunk[] = [
    { id: 'more-graphs', newPage: true, blocks: [heading('Typical performance characteristics (continued)'), ...graphs.slice(2), ...graphs.slice(0, Math.max(0, 2 - graphs.slice(2).length))] },
    {
      id: 'reliability',
     
      newPage: true,
      blocks: [
        heading('Reliability and soldering'),
        {
          kind: 'table',
          title: 'Qualification tests',
          columns: [
            { header: 'Test', width: 170 },
            { header: 'Conditions', width: 200 },
            { header: 'Duration', width: width - 370 },
          ],
          rows: [
            { cells: ['Temperature cycling', `−40 °C / +125 °C, 30 min dwell`, '500 cycles'] },
            { cells: ['High-temperature storage', '+150 °C', '1000 h'] },
            { cells: ['Damp heat', '85 °C, 85 % RH', '1000 h'] },
            { cells: ['Solderability', '245 °C, 3 s', '—'] },
          ],
          rules: 'header',
          fontSize: 7.5,
        },
        { kind: 'paragraph', text: 'Reflow profile: preheat 150 °C to 200 °C for 60 s to 120 s, time above 217 °C 60 s to 150 s, peak 260 °C for at most 10 s. Hand soldering: 350 °C for at most 3 s per terminal.' },
      ],
    },
    { id: 'notes-page', newPage: true, blocks: [heading('Design notes'), ...sheet.applicationNotes.map((text): Block => ({ kind: 'paragraph', text })), { kind: 'bullets', items: sheet.applications }] },
  ];

  const titleBlock: TitleBlock = {
    partNumber: sheet.partNumber,
    manufacturer: sheet.manufacturer,
    description: sheet.description,
    layout: titleLayout,
    ...(rng.chance(0.8) ? { details: rng.shuffle([docNumber, revision, dateLabel]) } : {}),
    ...(rng.chance(0.6) ? { badge: rng.pick(['DATASHEET', 'PRELIMINARY', 'PRODUCT DATA']) } : {}),
  };
  const measurer = createMeasurer({ pageSize, bodyFont, titleBlock });
  // The core always appears; optional sections are added while the page count stays within the target, then
  // fillers and page breaks bring a short document up to it.
  const styled = (cs: Chunk[]) => cs.map((c) => ({ ...c, blocks: c.blocks.map((b) => styleBlock(b, unit)) }));
  const core = styled(chunks);
  let included: Chunk[] = [];
  let pages = pack(core, measurer);
  for (const chunk of styled(optional)) {
    if (pages.length > target) break;
    const attempt = pack([...core, ...included, chunk], measurer);
    if (attempt.length <= target) {
      included = [...included, chunk];
      pages = attempt;
    }
  }
  for (const filler of styled(fillers)) {
    if (pages.length >= target) break;
    included = [...included, filler];
    pages = pack([...core, ...included], measurer);
  }
  for (let i = included.length - 1; i >= 0 && pages.length < target; i--) {
    included[i] = { ...included[i]!, newPage: true };
    pages = pack([...core, ...included], measurer);
  }
  for (const c of included) v.tag(`section:${c.id}`);
  if (included.some((c) => c.id === 'ordering')) v.tag('decoy:ordering-codes');
  if (included.some((c) => c.id === 'package')) v.tag('decoy:package-dimensions');
  if (included.some((c) => c.id === 'revision-history')) v.tag('decoy:revision-history');
  for (const t of unitStyleTags(unit)) v.tag(t);
  v.tag(`page-count:${pages.length}`);
  if (pages.some((p) => p.blocks.some((b) => b.kind === 'table' && b.title?.endsWith('(continued)')))) v.tag('table-continues-on-next-page');
  const used = new Set<string>();
  for (const chunk of [...chunks]) for (const b of chunk.blocks) if (b.kind === 'table' && b.columns.length > 3 && chunk.id.match(/primary|alternate/)) used.add(b.columns.map((c) => c.header).join('|'));
  for (const layout of used) v.tag(`table-header:${layout}`);

  const copyright = `© ${year} ${maker?.legalName ?? sheet.manufacturer}`;
  const spec: DatasheetSpec = {
    meta: { title: `${sheet.partNumber} datasheet`, author: sheet.manufacturer, subject: sheet.description, keywords: `${sheet.partNumber}, ${sheet.family}`, date },
    pageSize,
    bodyFont,
    accent: rng.pick(ACCENTS),
    titleBlock,
    runningHeader: rng.pick([`${sheet.partNumber} · ${sheet.description}`, `${sheet.manufacturer}   ${sheet.partNumber}`, `${sheet.partNumber}   ${docNumber} ${revision}`]),
    footer: rng.pick([
      { left: copyright, centre: `${docNumber} ${revision}`, right: dateLabel, pageLabel, pageLabelPosition: 'right' as const },
      { left: `${sheet.manufacturer} · ${dateLabel}`, right: '', pageLabel, pageLabelPosition: 'right' as const },
      { left: `${docNumber} · ${revision}`, centre: '', right: copyright, pageLabel, pageLabelPosition: 'centre' as const },
    ]),
    pages,
  };
  return { spec, truth: truth.build(), pageCount: pages.length, variations: [...v.tags] };
}
