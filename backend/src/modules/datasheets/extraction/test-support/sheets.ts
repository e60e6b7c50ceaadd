import { lines, makePdf, table, type PageSpec, type TextSpec } from './make-pdf';

/** A title block as most datasheets set it: maker, part number large, one-line description, footer. */
export function titleBlock(opts: { manufacturer?: string; partNumber: string; description: string }): TextSpec[] {
  return [
    ...(opts.manufacturer ? [{ text: opts.manufacturer, x: 50, y: 30, size: 12, bold: true }] : []),
    { text: opts.partNumber, x: 50, y: 56, size: 24, bold: true },
    { text: opts.description, x: 50, y: 90, size: 12 },
  ];
}

export function footer(text: string, page = 1): TextSpec[] {
  return [
    { text, x: 50, y: 805, size: 7 },
    { text: `Page ${page}`, x: 520, y: 805, size: 7 },
  ];
}

/** A heading, an optional conditions line under it, and a table with a bold header row. */
export function section(opts: {
  top: number;
  heading?: string;
  conditions?: string;
  columns: number[];
  rows: (string | null)[][];
  rowHeight?: number;
}): TextSpec[] {
  const out: TextSpec[] = [];
  let y = opts.top;
  if (opts.heading) {
    out.push({ text: opts.heading, x: 50, y, size: 10.5, bold: true });
    y += 16;
  }
  if (opts.conditions) {
    out.push({ text: opts.conditions, x: 50, y, size: 7.5 });
    y += 13;
  }
  out.push(...table({ columns: opts.columns, rows: opts.rows, top: y, size: 8, rowHeight: opts.rowHeight ?? 13 }));
  return out;
}

export function paragraph(top: number, texts: string[]): TextSpec[] {
  return lines(50, top, texts, 9, 12);
}

export function onePage(texts: TextSpec[]): Promise<Uint8Array> {
  return makePdf([{ texts }]);
}

export function pages(...specs: TextSpec[][]): Promise<Uint8Array> {
  return makePdf(specs.map((texts): PageSpec => ({ texts })));
}
