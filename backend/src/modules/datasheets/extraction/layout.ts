import type { PageBox } from '@understudy/shared-types';
import type { TextItem } from './pdf-text';

/** Neighbouring items on one line, close enough to read as one phrase: a table cell or a run of prose. */
export interface Cell {
  text: string;
  x: number;
  right: number;
  top: number;
  bottom: number;
  fontSize: number;
  items: TextItem[];
}

/** Items sharing a baseline (subscripts included), left to right. */
export interface Line {
  page: number;
  top: number;
  bottom: number;
  /** Size of the line's largest text. */
  fontSize: number;
  cells: Cell[];
  text: string;
  items: TextItem[];
  /** Position in reading order over the whole document. */
  index: number;
}

// A gap wider than this share of the font size starts a new cell: word spaces are about a third of it, while
// table cells padded on both sides sit at least six tenths apart.
const CELL_GAP_EM = 0.5;
// Two items are on one line when their glyph boxes overlap by at least this share of the smaller one.
const LINE_OVERLAP = 0.45;

function verticalOverlap(a: { top: number; bottom: number }, b: { top: number; bottom: number }): number {
  const overlap = Math.min(a.bottom, b.bottom) - Math.max(a.top, b.top);
  const smaller = Math.min(a.bottom - a.top, b.bottom - b.top);
  return smaller <= 0 ? 0 : overlap / smaller;
}

/** Joins items left to right, with a space where there is visible room for one. */
export function joinItems(items: readonly TextItem[]): string {
  let out = '';
  let prev: TextItem | undefined;
  for (const item of items) {
    const text = item.text;
    if (prev) {
      const gap = item.x - (prev.x + prev.width);
      const size = Math.min(prev.fontSize, item.fontSize);
      const spaced = /\s$/.test(out) || /^\s/.test(text);
      if (!spaced && gap > 0.12 * size) out += ' ';
    }
    out += text;
    prev = item;
  }
  return out.replace(/\s+/g, ' ').trim();
}

/** A cell of the given items, which must lie on one line. */
export function cellOf(items: TextItem[]): Cell {
  return {
    text: joinItems(items),
    x: Math.min(...items.map((i) => i.x)),
    right: Math.max(...items.map((i) => i.x + i.width)),
    top: Math.min(...items.map((i) => i.y)),
    bottom: Math.max(...items.map((i) => i.y + i.height)),
    fontSize: Math.max(...items.map((i) => i.fontSize)),
    items,
  };
}

/** Splits a line's items (sorted by x) into cells at gaps wider than a word space. */
export function splitCells(items: readonly TextItem[]): Cell[] {
  const cells: Cell[] = [];
  let current: TextItem[] = [];
  for (const item of items) {
    const prev = current[current.length - 1];
    if (prev) {
      const gap = item.x - (prev.x + prev.width);
      const size = Math.max(prev.fontSize, item.fontSize);
      const textGap = /\s{2,}$/.test(prev.text) ? size : 0;
      if (gap + textGap > CELL_GAP_EM * size) {
        cells.push(cellOf(current));
        current = [];
      }
    }
    current.push(item);
  }
  if (current.length) cells.push(cellOf(current));
  return cells;
}

/** Groups positioned items into lines, page by page and top to bottom. */
export function buildLines(items: readonly TextItem[]): Line[] {
  const byPage = new Map<number, TextItem[]>();
  for (const item of items) {
    const list = byPage.get(item.page) ?? [];
    list.push(item);
    byPage.set(item.page, list);
  }
  const lines: Line[] = [];
  for (const page of [...byPage.keys()].sort((a, b) => a - b)) {
    const sorted = byPage.get(page)!.slice().sort((a, b) => a.baseline - b.baseline || a.x - b.x);
    const groups: { top: number; bottom: number; items: TextItem[] }[] = [];
    for (const item of sorted) {
      const box = { top: item.y, bottom: item.y + item.height };
      // Look back a few lines only: a subscript belongs to a line just above or just below.
      let target: (typeof groups)[number] | undefined;
      for (let i = groups.length - 1; i >= Math.max(0, groups.length - 3); i--) {
        const g = groups[i]!;
        if (verticalOverlap(g, box) < LINE_OVERLAP) continue;
        // Text of very different baselines, or stacked at the same x, is two lines even where the boxes touch.
        const near = g.items.some((o) => Math.abs(o.baseline - item.baseline) <= 0.6 * Math.min(o.fontSize, item.fontSize));
        const stacked = g.items.some((o) => o.x < item.x + item.width - 1 && item.x < o.x + o.width - 1);
        if (near && !stacked) {
          target = g;
          break;
        }
      }
      if (target) {
        target.items.push(item);
        // The line's extent follows its main text, so a tall neighbour cannot chain lines together.
        if (item.height >= target.bottom - target.top) {
          target.top = box.top;
          target.bottom = box.bottom;
        }
      } else {
        groups.push({ ...box, items: [item] });
      }
    }
    for (const g of groups) {
      const its = g.items.slice().sort((a, b) => a.x - b.x);
      const cells = splitCells(its);
      lines.push({
        page,
        top: Math.min(...its.map((i) => i.y)),
        bottom: Math.max(...its.map((i) => i.y + i.height)),
        fontSize: Math.max(...its.map((i) => i.fontSize)),
        cells,
        text: cells.map((c) => c.text).join('  '),
        items: its,
        index: 0,
      });
    }
  }
  lines.sort((a, b) => a.page - b.page || a.top - b.top);
  lines.forEach((l, i) => (l.index = i));
  return lines;
}

/** The box of a cell or line, for the reviewer's highlight. */
export function boxOf(thing: { x?: number; right?: number; items: readonly TextItem[] }): PageBox {
  const items = thing.items;
  const x = Math.min(...items.map((i) => i.x));
  const y = Math.min(...items.map((i) => i.y));
  const right = Math.max(...items.map((i) => i.x + i.width));
  const bottom = Math.max(...items.map((i) => i.y + i.height));
  return { x: round(x), y: round(y), width: round(right - x), height: round(bottom - y) };
}

/** One box per line the items lie on, so a highlight hugs the text instead of spanning the gaps. */
export function boxesOf(items: readonly TextItem[]): PageBox[] {
  if (items.length === 0) return [];
  const rows = new Map<number, TextItem[]>();
  for (const item of items) {
    const key = Math.round(item.baseline);
    rows.set(key, [...(rows.get(key) ?? []), item]);
  }
  return [...rows.values()].map((its) => boxOf({ items: its }));
}

function round(n: number): number {
  return Math.round(n * 100) / 100;
}

/** The most common font size of the document, weighted by characters: the body text. */
export function bodyFontSize(lines: readonly Line[]): number {
  const weight = new Map<number, number>();
  for (const line of lines) {
    for (const item of line.items) {
      const size = Math.round(item.fontSize * 2) / 2;
      weight.set(size, (weight.get(size) ?? 0) + item.text.length);
    }
  }
  let best = 9;
  let bestWeight = -1;
  for (const [size, w] of weight) {
    if (w > bestWeight) {
      best = size;
      bestWeight = w;
    }
  }
  return best;
}
