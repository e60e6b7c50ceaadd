import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import PDFDocument from 'pdfkit';
import type {
  Block,
  BulletsBlock,
  ColumnsBlock,
  DatasheetSpec,
  FigureBlock,
  TableBlock,
  TitleBlock,
} from './datasheet-spec';

const require = createRequire(import.meta.url);

// The standard 14 PDF fonts have no µ, μ, Ω, √ or ≤ glyphs, so every face is embedded from DejaVu.
const FONT_FILES = {
  sans: 'DejaVuSans.ttf',
  sansBold: 'DejaVuSans-Bold.ttf',
  sansOblique: 'DejaVuSans-Oblique.ttf',
  condensed: 'DejaVuSansCondensed.ttf',
  condensedBold: 'DejaVuSansCondensed-Bold.ttf',
  serif: 'DejaVuSerif.ttf',
  serifItalic: 'DejaVuSerif-Italic.ttf',
} as const;
type FontName = keyof typeof FONT_FILES;

let fontCache: Map<FontName, Buffer> | undefined;

/** Absolute path of a DejaVu TTF in the installed dejavu-fonts-ttf package. */
export function dejaVuFontPath(file: string): string {
  return require.resolve(`dejavu-fonts-ttf/ttf/${file}`);
}

function fonts(): Map<FontName, Buffer> {
  fontCache ??= new Map(
    (Object.entries(FONT_FILES) as [FontName, string][]).map(([name, file]) => [name, readFileSync(dejaVuFontPath(file))]),
  );
  return fontCache;
}

type Doc = PDFKit.PDFDocument;

const PAGE_SIZES = { A4: [595.28, 841.89], LETTER: [612, 792] } as const;
const MARGIN_X = 50;
const RUNNING_HEADER_BOTTOM = 62;
const FOOTER_RESERVED = 58;
const GREY = '#555555';
const INK = '#111111';

const TITLE_HEIGHTS: Record<TitleBlock['layout'], number> = { banner: 150, stacked: 138, boxed: 140 };

interface Geometry {
  width: number;
  height: number;
  contentWidth: number;
}

function geometry(spec: Pick<DatasheetSpec, 'pageSize'>): Geometry {
  const [width, height] = PAGE_SIZES[spec.pageSize ?? 'A4'];
  return { width, height, contentWidth: width - 2 * MARGIN_X };
}

/** Where blocks start on a page (below the title block on page 1, below the running header after). */
function contentTop(spec: Pick<DatasheetSpec, 'titleBlock'>, pageIndex: number): number {
  return pageIndex === 0 ? TITLE_HEIGHTS[spec.titleBlock.layout] : RUNNING_HEADER_BOTTOM;
}

function createDoc(spec: Pick<DatasheetSpec, 'pageSize'>, extra: PDFKit.PDFDocumentOptions = {}): Doc {
  const doc = new PDFDocument({
    size: spec.pageSize ?? 'A4',
    // Our own layout decides every position; zero margins keep pdfkit from adding pages on its own.
    margins: { top: 0, bottom: 0, left: 0, right: 0 },
    autoFirstPage: false,
    ...extra,
  });
  for (const [name, data] of fonts()) doc.registerFont(name, data);
  return doc;
}

function bodyFace(spec: Pick<DatasheetSpec, 'bodyFont'>): { regular: FontName; italic: FontName } {
  switch (spec.bodyFont ?? 'sans') {
    case 'serif':
      return { regular: 'serif', italic: 'serifItalic' };
    case 'condensed':
      return { regular: 'condensed', italic: 'sansOblique' };
    default:
      return { regular: 'sans', italic: 'sansOblique' };
  }
}

interface Style {
  body: { regular: FontName; italic: FontName };
  accent: string;
}

// ---------------------------------------------------------------------------------------------------------------
// Measuring: the same code paths the drawing uses, so a measured block is exactly as tall as the drawn one.

function cellPad(size: number): number {
  return size >= 8.5 ? 3 : 2.5;
}

function tableRowHeights(doc: Doc, block: TableBlock): { header: number; rows: number[] } {
  const size = block.fontSize ?? 8;
  const pad = cellPad(size);
  doc.font('sansBold').fontSize(size);
  const header = Math.max(
    ...block.columns.map((c) => doc.heightOfString(c.header || ' ', { width: c.width - 2 * pad, lineGap: 0.5 })),
  );
  const rows = block.rows.map((row) => {
    if ('section' in row) return size + 2 * pad + 3;
    doc.font(row.bold ? 'sansBold' : 'sans').fontSize(size);
    return Math.max(
      size + 2 * pad,
      ...row.cells.map((cell, i) => {
        const col = block.columns[i];
        if (!col || cell === '') return 0;
        return doc.heightOfString(cell, { width: col.width - 2 * pad, lineGap: 0.5 }) + 2 * pad;
      }),
    );
  });
  return { header: header + 2 * pad + 1, rows };
}

function measureBlock(doc: Doc, style: Style, block: Block, width: number): number {
  switch (block.kind) {
    case 'heading':
      return (block.level ?? 1) === 1 ? 26 : 20;
    case 'paragraph':
      doc.font(block.italic ? style.body.italic : style.body.regular).fontSize(block.size ?? 9);
      return doc.heightOfString(block.text, { width, lineGap: 1.5 }) + 7;
    case 'bullets':
      doc.font(style.body.regular).fontSize(9);
      return block.items.reduce((h, item) => h + doc.heightOfString(item, { width: width - 12, lineGap: 1 }) + 2.5, 0) + 6;
    case 'columns': {
      const [lw, rw] = columnWidths(block, width);
      const left = block.left.reduce((h, b) => h + measureBlock(doc, style, b, lw), 0);
      const right = block.right.reduce((h, b) => h + measureBlock(doc, style, b, rw), 0);
      return Math.max(left, right);
    }
    case 'table': {
      const { header, rows } = tableRowHeights(doc, block);
      let h = header + rows.reduce((a, b) => a + b, 0) + 10;
      if (block.title) h += 16;
      if (block.subtitle) h += 12;
      if (block.note) {
        doc.font('sansOblique').fontSize(7);
        h += doc.heightOfString(block.note, { width }) + 4;
      }
      return h;
    }
    case 'figure':
      return block.height + 24;
    case 'spacer':
      return block.height;
  }
}

function columnWidths(block: ColumnsBlock, width: number): [number, number] {
  const gap = 18;
  const left = Math.floor((width - gap) * (block.split ?? 0.5));
  return [left, width - gap - left];
}

/** Measures blocks with the renderer's own metrics, so a generator can fill pages without overflowing them. */
export interface DatasheetMeasurer {
  /** Height available for blocks on a page (0-based). */
  pageCapacity(pageIndex: number): number;
  /** Height a block takes, including the space after it. */
  blockHeight(block: Block): number;
}

let measuringDoc: Doc | undefined;

export function createMeasurer(spec: Pick<DatasheetSpec, 'pageSize' | 'bodyFont' | 'titleBlock'>): DatasheetMeasurer {
  measuringDoc ??= createDoc({ pageSize: 'A4' });
  const doc = measuringDoc;
  const geo = geometry(spec);
  const style: Style = { body: bodyFace(spec), accent: INK };
  return {
    pageCapacity: (pageIndex) => geo.height - FOOTER_RESERVED - contentTop(spec, pageIndex),
    blockHeight: (block) => measureBlock(doc, style, block, geo.contentWidth),
  };
}

// ---------------------------------------------------------------------------------------------------------------
// Drawing

function drawTitleBlock(doc: Doc, geo: Geometry, style: Style, tb: TitleBlock): void {
  const x = MARGIN_X;
  const w = geo.contentWidth;
  if (tb.layout === 'banner') {
    doc.rect(0, 0, geo.width, 62).fill(style.accent);
    doc.fillColor('#ffffff').font('sansBold').fontSize(13).text(tb.manufacturer, x, 24, { lineBreak: false });
    if (tb.badge) doc.font('sans').fontSize(9).text(tb.badge, x, 28, { width: w, align: 'right', lineBreak: false });
    doc.fillColor(INK).font('sansBold').fontSize(24).text(tb.partNumber, x, 76, { lineBreak: false });
    doc.font('sans').fontSize(12).fillColor(GREY).text(tb.description, x, 106, { width: w, lineBreak: false });
    if (tb.details?.length) {
      doc.fontSize(7.5).text(tb.details.join('   ·   '), x, 126, { width: w, lineBreak: false });
    }
    doc.moveTo(x, 140).lineTo(x + w, 140).lineWidth(0.8).strokeColor(style.accent).stroke();
  } else if (tb.layout === 'stacked') {
    doc.fillColor(style.accent).font('sansBold').fontSize(12).text(tb.manufacturer, x, 36, { lineBreak: false });
    if (tb.details?.length) {
      doc.fillColor(GREY).font('sans').fontSize(7.5);
      tb.details.forEach((line, i) => doc.text(line, x, 34 + i * 10, { width: w, align: 'right', lineBreak: false }));
    }
    doc.moveTo(x, 56).lineTo(x + w, 56).lineWidth(1.5).strokeColor(style.accent).stroke();
    doc.fillColor(INK).font('sansBold').fontSize(26).text(tb.partNumber, x, 64, { lineBreak: false });
    doc.font('sans').fontSize(13).text(tb.description, x, 98, { width: w, lineBreak: false });
    if (tb.badge) doc.fillColor(style.accent).font('sansBold').fontSize(8).text(tb.badge, x, 70, { width: w, align: 'right', lineBreak: false });
    doc.moveTo(x, 124).lineTo(x + w, 124).lineWidth(0.5).strokeColor(GREY).stroke();
  } else {
    doc.rect(x, 36, w, 88).lineWidth(1).strokeColor(style.accent).stroke();
    doc.rect(x + w * 0.62, 36, w * 0.38, 88).fill(style.accent);
    doc.fillColor(INK).font('sansBold').fontSize(22).text(tb.partNumber, x + 12, 50, { lineBreak: false });
    doc.font('sans').fontSize(11).text(tb.description, x + 12, 82, { width: w * 0.62 - 20 });
    doc.fillColor('#ffffff').font('sansBold').fontSize(11).text(tb.manufacturer, x + w * 0.62 + 10, 46, { width: w * 0.38 - 20, lineBreak: false });
    doc.font('sans').fontSize(7.5);
    (tb.badge ? [tb.badge, ...(tb.details ?? [])] : (tb.details ?? [])).forEach((line, i) =>
      doc.text(line, x + w * 0.62 + 10, 66 + i * 11, { width: w * 0.38 - 20, lineBreak: false }),
    );
  }
  doc.fillColor(INK).strokeColor(INK);
}

function drawRunningHeader(doc: Doc, geo: Geometry, style: Style, text: string): void {
  doc.fillColor(GREY).font('sans').fontSize(7.5).text(text, MARGIN_X, 30, { width: geo.contentWidth, lineBreak: false });
  doc.moveTo(MARGIN_X, 44).lineTo(MARGIN_X + geo.contentWidth, 44).lineWidth(0.5).strokeColor(style.accent).stroke();
  doc.fillColor(INK).strokeColor(INK);
}

function drawFooter(doc: Doc, geo: Geometry, spec: DatasheetSpec, page: number, total: number): void {
  const f = spec.footer;
  const y = geo.height - 34;
  doc.moveTo(MARGIN_X, y - 8).lineTo(MARGIN_X + geo.contentWidth, y - 8).lineWidth(0.4).strokeColor('#999999').stroke();
  doc.fillColor(GREY).font('sans').fontSize(7);
  const label = f.pageLabel?.replace('{n}', String(page)).replace('{total}', String(total));
  const slots = { left: f.left, centre: f.centre, right: f.right };
  if (label) {
    const at = f.pageLabelPosition ?? 'right';
    slots[at] = slots[at] ? (at === 'left' ? `${label}   ${slots[at]}` : `${slots[at]}   ${label}`) : label;
  }
  const w = geo.contentWidth;
  if (slots.left) doc.text(slots.left, MARGIN_X, y, { width: w, align: 'left', lineBreak: false });
  if (slots.centre) doc.text(slots.centre, MARGIN_X, y, { width: w, align: 'center', lineBreak: false });
  if (slots.right) doc.text(slots.right, MARGIN_X, y, { width: w, align: 'right', lineBreak: false });
  doc.fillColor(INK).strokeColor(INK);
}

const ALIGN = { left: 'left', centre: 'center', right: 'right' } as const;

function drawTable(doc: Doc, style: Style, block: TableBlock, x0: number, y0: number, width: number): void {
  let y = y0;
  const size = block.fontSize ?? 8;
  const pad = cellPad(size);
  if (block.title) {
    doc.fillColor(INK).font('sansBold').fontSize(10).text(block.title, x0, y + 2, { width, lineBreak: false });
    y += 16;
  }
  if (block.subtitle) {
    doc.fillColor(GREY).font('sans').fontSize(7.5).text(block.subtitle, x0, y, { width, lineBreak: false });
    doc.fillColor(INK);
    y += 12;
  }
  const tableWidth = block.columns.reduce((a, c) => a + c.width, 0);
  const { header, rows } = tableRowHeights(doc, block);
  const xs: number[] = [];
  block.columns.reduce((x, c) => (xs.push(x), x + c.width), x0);

  const hline = (at: number, weight = 0.4) =>
    doc.moveTo(x0, at).lineTo(x0 + tableWidth, at).lineWidth(weight).strokeColor('#888888').stroke();

  if (block.shadedHeader) doc.rect(x0, y, tableWidth, header).fill(style.accent);
  doc.fillColor(block.shadedHeader ? '#ffffff' : INK).font('sansBold').fontSize(size);
  block.columns.forEach((c, i) =>
    doc.text(c.header, xs[i]! + pad, y + pad, { width: c.width - 2 * pad, align: ALIGN[c.align ?? 'left'], lineGap: 0.5 }),
  );
  doc.fillColor(INK);
  if (block.rules !== 'none') {
    if (block.rules === 'grid' || block.rules === 'rows') hline(y, 0.8);
    hline(y + header, 0.8);
  }
  const top = y;
  y += header;
  block.rows.forEach((row, r) => {
    const h = rows[r]!;
    if ('section' in row) {
      doc.font('sansBold').fontSize(size).text(row.section, x0 + pad, y + pad + 1.5, { width: tableWidth - 2 * pad, lineBreak: false });
    } else {
      doc.font(row.bold ? 'sansBold' : 'sans').fontSize(size);
      row.cells.forEach((cell, i) => {
        const c = block.columns[i];
        if (!c || cell === '') return;
        doc.text(cell, xs[i]! + pad, y + pad, { width: c.width - 2 * pad, align: ALIGN[c.align ?? 'left'], lineGap: 0.5 });
      });
    }
    y += h;
    if (block.rules === 'rows' || block.rules === 'grid') hline(y);
  });
  if (block.rules === 'header') hline(y, 0.8);
  if (block.rules === 'grid') {
    for (const x of [...xs, x0 + tableWidth]) doc.moveTo(x, top).lineTo(x, y).lineWidth(0.4).strokeColor('#888888').stroke();
  }
  doc.strokeColor(INK);
  if (block.note) {
    doc.fillColor(GREY).font('sansOblique').fontSize(7).text(block.note, x0, y + 4, { width });
    doc.fillColor(INK);
  }
}

function drawFigure(doc: Doc, style: Style, block: FigureBlock, x0: number, y0: number, width: number): void {
  const h = block.height;
  if (block.figure === 'graph') {
    const left = x0 + 40;
    const plotW = Math.min(width - 60, 300);
    const top = y0 + 14;
    const plotH = h - 34;
    doc.fillColor(GREY).font('sans').fontSize(7);
    if (block.yLabel) doc.text(block.yLabel, x0, y0, { lineBreak: false });
    doc.rect(left, top, plotW, plotH).lineWidth(0.6).strokeColor('#777777').stroke();
    const yt = block.yTicks ?? [];
    yt.forEach((t, i) => {
      const ty = top + plotH - (i / Math.max(1, yt.length - 1)) * plotH;
      doc.moveTo(left, ty).lineTo(left + plotW, ty).lineWidth(0.2).strokeColor('#cccccc').stroke();
      doc.text(t, x0, ty - 3, { width: 36, align: 'right', lineBreak: false });
    });
    const xt = block.xTicks ?? [];
    xt.forEach((t, i) => {
      const tx = left + (i / Math.max(1, xt.length - 1)) * plotW;
      doc.text(t, tx - 15, top + plotH + 3, { width: 30, align: 'center', lineBreak: false });
    });
    if (block.xLabel) doc.text(block.xLabel, left, top + plotH + 12, { width: plotW, align: 'center', lineBreak: false });
    const curve = block.curve ?? [0.2, 0.4, 0.6, 0.7, 0.75];
    curve.forEach((v, i) => {
      const px = left + (i / Math.max(1, curve.length - 1)) * plotW;
      const py = top + plotH - v * plotH;
      if (i === 0) doc.moveTo(px, py);
      else doc.lineTo(px, py);
    });
    doc.lineWidth(1.2).strokeColor(style.accent).stroke();
  } else {
    const bodyW = 90;
    const bodyH = h - 50;
    const left = x0 + 60;
    const top = y0 + 10;
    doc.rect(left, top, bodyW, bodyH).lineWidth(0.8).strokeColor('#444444').stroke();
    for (let i = 0; i < 4; i++) {
      const py = top + 8 + i * ((bodyH - 16) / 3);
      doc.rect(left - 14, py - 2, 14, 4).stroke();
      doc.rect(left + bodyW, py - 2, 14, 4).stroke();
    }
    doc.moveTo(left, top + bodyH + 12).lineTo(left + bodyW, top + bodyH + 12).lineWidth(0.4).stroke();
    doc.moveTo(left + bodyW + 26, top).lineTo(left + bodyW + 26, top + bodyH).stroke();
    doc.fillColor(GREY).font('sans').fontSize(7);
    const [a, b, ...rest] = block.labels ?? ['D', 'E'];
    if (a) doc.text(a, left + bodyW / 2 - 10, top + bodyH + 15, { width: 20, align: 'center', lineBreak: false });
    if (b) doc.text(b, left + bodyW + 30, top + bodyH / 2 - 3, { lineBreak: false });
    rest.forEach((label, i) => doc.text(label, left + bodyW + 70, top + 6 + i * 11, { lineBreak: false }));
  }
  doc.fillColor(GREY).font('sansOblique').fontSize(7.5).text(block.caption, x0, y0 + h + 4, { width, lineBreak: false });
  doc.fillColor(INK).strokeColor(INK);
}

function drawBullets(doc: Doc, style: Style, block: BulletsBlock, x: number, y0: number, width: number): void {
  let y = y0;
  doc.font(style.body.regular).fontSize(9).fillColor(INK);
  for (const item of block.items) {
    doc.fillColor(style.accent).text('•', x, y, { lineBreak: false }).fillColor(INK);
    doc.text(item, x + 12, y, { width: width - 12, lineGap: 1 });
    y += doc.heightOfString(item, { width: width - 12, lineGap: 1 }) + 2.5;
  }
}

function drawBlock(doc: Doc, style: Style, block: Block, x: number, y: number, width: number): number {
  const h = measureBlock(doc, style, block, width);
  switch (block.kind) {
    case 'heading': {
      const level = block.level ?? 1;
      doc.fillColor(level === 1 ? style.accent : INK).font('sansBold').fontSize(level === 1 ? 11.5 : 10);
      doc.text(block.text, x, y + 6, { width, lineBreak: false });
      if (level === 1) doc.moveTo(x, y + 21).lineTo(x + width, y + 21).lineWidth(0.5).strokeColor(style.accent).stroke();
      doc.fillColor(INK).strokeColor(INK);
      break;
    }
    case 'paragraph':
      doc.fillColor(INK).font(block.italic ? style.body.italic : style.body.regular).fontSize(block.size ?? 9);
      doc.text(block.text, x, y, { width, lineGap: 1.5 });
      break;
    case 'bullets':
      drawBullets(doc, style, block, x, y, width);
      break;
    case 'columns': {
      const [lw, rw] = columnWidths(block, width);
      let ly = y;
      for (const b of block.left) ly += drawBlock(doc, style, b, x, ly, lw);
      let ry = y;
      for (const b of block.right) ry += drawBlock(doc, style, b, x + lw + 18, ry, rw);
      break;
    }
    case 'table':
      drawTable(doc, style, block, x, y, width);
      break;
    case 'figure':
      drawFigure(doc, style, block, x, y, width);
      break;
    case 'spacer':
      break;
  }
  return h;
}

export interface RenderOptions {
  /** Encrypts the file; a reader then needs this password to open it. */
  userPassword?: string;
}

/** Draws a datasheet described by `spec` into PDF bytes. Throws if a page's blocks do not fit on it. */
export async function renderDatasheet(spec: DatasheetSpec, options: RenderOptions = {}): Promise<Buffer> {
  const geo = geometry(spec);
  const doc = createDoc(spec, {
    info: {
      Title: spec.meta.title,
      Author: spec.meta.author,
      Subject: spec.meta.subject ?? '',
      Keywords: spec.meta.keywords ?? '',
      Creator: 'Understudy test datasheets',
      Producer: 'Understudy test datasheets',
      CreationDate: spec.meta.date,
      ModDate: spec.meta.date,
    },
    ...(options.userPassword ? { userPassword: options.userPassword, ownerPassword: `${options.userPassword}-owner`, pdfVersion: '1.7' as const } : {}),
  });
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const finished = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  const style: Style = { body: bodyFace(spec), accent: spec.accent ?? '#1f4e79' };
  const total = spec.pages.length;
  try {
    spec.pages.forEach((page, index) => {
      doc.addPage();
      if (index === 0) drawTitleBlock(doc, geo, style, spec.titleBlock);
      else if (spec.runningHeader) drawRunningHeader(doc, geo, style, spec.runningHeader);
      let y = contentTop(spec, index);
      const bottom = geo.height - FOOTER_RESERVED;
      for (const block of page.blocks) {
        const h = measureBlock(doc, style, block, geo.contentWidth);
        if (y + h > bottom + 0.5) {
          throw new Error(`Page ${index + 1} of "${spec.meta.title}" overflows by ${(y + h - bottom).toFixed(0)} pt at a ${block.kind} block`);
        }
        y += drawBlock(doc, style, block, MARGIN_X, y, geo.contentWidth);
      }
      drawFooter(doc, geo, spec, index + 1, total);
    });
  } finally {
    doc.end();
  }
  return finished;
}
