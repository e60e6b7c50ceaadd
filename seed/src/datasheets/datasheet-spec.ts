/** What renderDatasheet draws: a document described page by page, block by block, in reading order. */
export interface DatasheetSpec {
  /** Document information dictionary; a fixed date keeps the bytes the same on every run. */
  meta: { title: string; author: string; subject?: string; keywords?: string; date: Date };
  pageSize?: 'A4' | 'LETTER';
  /** Body typeface for prose; tables always use a sans face. */
  bodyFont?: 'sans' | 'serif' | 'condensed';
  /** Accent colour of rules, title bar and table headers, as #rrggbb. */
  accent?: string;
  titleBlock: TitleBlock;
  /** Small line at the top of pages 2 onwards, e.g. "HGX4102 · Dual low-noise operational amplifier". */
  runningHeader?: string;
  footer: FooterSpec;
  pages: PageSpec[];
}

export interface TitleBlock {
  partNumber: string;
  manufacturer: string;
  /** One line saying what the part is: "Dual low-noise operational amplifier". */
  description: string;
  layout: 'banner' | 'stacked' | 'boxed';
  /** Small print beside or under the title: document number, revision, date. */
  details?: string[];
  /** A word in the corner such as "PRELIMINARY" or "DATASHEET". */
  badge?: string;
}

export interface FooterSpec {
  left?: string;
  centre?: string;
  right?: string;
  /** How the page number is printed; `{n}` and `{total}` are replaced. Placed after `right` when both exist. */
  pageLabel?: string;
  pageLabelPosition?: 'left' | 'centre' | 'right';
}

export interface PageSpec {
  blocks: Block[];
}

export type Block = HeadingBlock | ParagraphBlock | BulletsBlock | TableBlock | FigureBlock | SpacerBlock | ColumnsBlock;

export interface HeadingBlock {
  kind: 'heading';
  text: string;
  level?: 1 | 2;
}

export interface ParagraphBlock {
  kind: 'paragraph';
  text: string;
  size?: number;
  italic?: boolean;
}

export interface BulletsBlock {
  kind: 'bullets';
  items: string[];
}

/** Two blocks side by side, e.g. features beside the pinout on the first page. */
export interface ColumnsBlock {
  kind: 'columns';
  left: Block[];
  right: Block[];
  /** Share of the width given to the left column, 0..1. */
  split?: number;
}

export interface TableColumn {
  header: string;
  /** Width in points; the columns of a table are laid out left to right from the block's x. */
  width: number;
  align?: 'left' | 'centre' | 'right';
}

export type TableRow = { cells: string[]; bold?: boolean } | { section: string };

export interface TableBlock {
  kind: 'table';
  title?: string;
  /** Line under the title, e.g. "VS = ±15 V, TA = 25 °C unless otherwise noted". */
  subtitle?: string;
  columns: TableColumn[];
  rows: TableRow[];
  /** none: bare text in columns; header: a rule under the header; rows: a rule under every row; grid: every cell boxed. */
  rules: 'none' | 'header' | 'rows' | 'grid';
  /** Shaded header row (filled with the accent colour) instead of bold text only. */
  shadedHeader?: boolean;
  fontSize?: number;
  note?: string;
}

/** A drawing made of vector lines; its labels are real text. */
export interface FigureBlock {
  kind: 'figure';
  figure: 'graph' | 'package-outline';
  caption: string;
  height: number;
  xLabel?: string;
  yLabel?: string;
  xTicks?: string[];
  yTicks?: string[];
  /** For package outlines: dimension letters drawn on the outline. */
  labels?: string[];
  /** Relative curve shape, 0..1 values at evenly spaced x. */
  curve?: number[];
}

export interface SpacerBlock {
  kind: 'spacer';
  height: number;
}
