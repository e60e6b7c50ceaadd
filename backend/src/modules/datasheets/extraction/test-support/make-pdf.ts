import { createRequire } from 'node:module';
import path from 'node:path';
import PDFDocument from 'pdfkit';

const require = createRequire(import.meta.url);
const fontDir = path.join(path.dirname(require.resolve('dejavu-fonts-ttf/package.json')), 'ttf');
// DejaVu Sans carries µ μ Ω √ ± ° and θ, which the standard PDF fonts cannot show.
const FONTS = {
  regular: path.join(fontDir, 'DejaVuSans.ttf'),
  bold: path.join(fontDir, 'DejaVuSans-Bold.ttf'),
};

export interface TextSpec {
  text: string;
  /** Left edge and top of the line box, in points from the page's top-left corner. */
  x: number;
  y: number;
  size?: number;
  bold?: boolean;
}

export interface PageSpec {
  texts?: TextSpec[];
  /** Filled rectangles: drawn shapes without any text. */
  rects?: { x: number; y: number; width: number; height: number }[];
  /** Width and height in points; A4 portrait by default. */
  size?: [number, number];
}

export interface MakePdfOptions {
  userPassword?: string;
}

/** Builds a PDF with text placed exactly where asked, for parser tests. */
export function makePdf(pages: PageSpec[], options: MakePdfOptions = {}): Promise<Uint8Array> {
  const doc = new PDFDocument({
    autoFirstPage: false,
    margin: 0,
    ...(options.userPassword === undefined ? {} : { userPassword: options.userPassword, ownerPassword: `${options.userPassword}-owner` }),
  });
  const chunks: Buffer[] = [];
  const done = new Promise<Uint8Array>((resolve, reject) => {
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(new Uint8Array(Buffer.concat(chunks))));
    doc.on('error', reject);
  });
  for (const page of pages) {
    doc.addPage({ size: page.size ?? 'A4', margin: 0 });
    for (const r of page.rects ?? []) doc.rect(r.x, r.y, r.width, r.height).fill('#333333');
    for (const t of page.texts ?? []) {
      doc
        .font(t.bold ? FONTS.bold : FONTS.regular)
        .fontSize(t.size ?? 9)
        .fillColor('#000000')
        .text(t.text, t.x, t.y, { lineBreak: false });
    }
  }
  doc.end();
  return done;
}

export interface TableSpec {
  /** Left edge of each column. */
  columns: number[];
  rows: (string | null)[][];
  top: number;
  rowHeight?: number;
  size?: number;
  /** Bold first row, as most datasheets set their header. */
  boldHeader?: boolean;
}

/** Lays out a table as text runs, one per non-empty cell. */
export function table(spec: TableSpec): TextSpec[] {
  const rowHeight = spec.rowHeight ?? 14;
  const out: TextSpec[] = [];
  spec.rows.forEach((row, r) => {
    row.forEach((cell, c) => {
      if (cell === null || cell === '') return;
      out.push({
        text: cell,
        x: spec.columns[c]!,
        y: spec.top + r * rowHeight,
        size: spec.size ?? 9,
        bold: r === 0 && spec.boldHeader !== false,
      });
    });
  });
  return out;
}

/** Lines of text one under another, e.g. a paragraph or a heading with its conditions line. */
export function lines(x: number, top: number, texts: string[], size = 9, lineHeight = size * 1.4): TextSpec[] {
  return texts.map((text, i) => ({ text, x, y: top + i * lineHeight, size }));
}
