import { DATASHEET_LIMITS } from '@understudy/shared-types';
import { PDFParse } from 'pdf-parse';
import type { PDFDocumentProxy, TextItem as PdfJsTextItem } from 'pdfjs-dist/types/src/display/api';
import { PdfRejectionError } from './errors';

/** One run of text on a page, in PDF points from the page's top-left corner. */
export interface TextItem {
  page: number;
  text: string;
  x: number;
  /** Top of the glyph box. */
  y: number;
  width: number;
  height: number;
  /** Baseline, measured from the top of the page. */
  baseline: number;
  fontSize: number;
  fontName: string;
}

export interface PageSize {
  width: number;
  height: number;
}

export interface PdfText {
  pageCount: number;
  pages: PageSize[];
  /** Every horizontal text item of the pages read, page by page in reading order of the content stream. */
  items: TextItem[];
}

export interface ReadOptions {
  maxPages?: number;
  /** 'all' reads every page's text; 'probe' stops at the first page that has any (enough for an upload check). */
  text?: 'all' | 'probe';
}

// In Node, pdf.js runs its "worker" in the main thread; loading the worker module up front makes pdf.js use it
// directly instead of importing it by a path relative to its own build.
let workerReady: Promise<unknown> | undefined;
function ensureWorker(): Promise<unknown> {
  workerReady ??= import('pdfjs-dist/legacy/build/pdf.worker.mjs');
  return workerReady;
}

const HEAD_BYTES = 1024;
const TAIL_BYTES = 2048;

function indexOfAscii(data: Uint8Array, needle: string, from = 0, to = data.length): number {
  const first = needle.charCodeAt(0);
  outer: for (let i = Math.max(0, from); i <= Math.min(to, data.length) - needle.length; i++) {
    if (data[i] !== first) continue;
    for (let j = 1; j < needle.length; j++) if (data[i + j] !== needle.charCodeAt(j)) continue outer;
    return i;
  }
  return -1;
}

function lastIndexOfAscii(data: Uint8Array, needle: string): number {
  const first = needle.charCodeAt(0);
  outer: for (let i = data.length - needle.length; i >= 0; i--) {
    if (data[i] !== first) continue;
    for (let j = 1; j < needle.length; j++) if (data[i + j] !== needle.charCodeAt(j)) continue outer;
    return i;
  }
  return -1;
}

/** Checks that need no parser: judged by content, never by the file's name. */
export function checkBytes(data: Uint8Array): void {
  if (data.length === 0) throw new PdfRejectionError('empty');
  if (indexOfAscii(data, '%PDF-', 0, HEAD_BYTES) < 0) throw new PdfRejectionError('not-pdf');
  if (indexOfAscii(data, '%%EOF', data.length - TAIL_BYTES) < 0) throw new PdfRejectionError('truncated');
}

/**
 * A file that ends inside an object or stream was cut short, even if someone appended an end marker; anything
 * else the parser cannot read is damage of another kind.
 */
function looksCutShort(data: Uint8Array): boolean {
  const lastObj = lastIndexOfAscii(data, ' obj');
  if (lastObj >= 0 && indexOfAscii(data, 'endobj', lastObj) < 0) return true;
  // "endstream" contains "stream" three bytes in: a later "stream" opens one that never closes.
  const lastStream = lastIndexOfAscii(data, 'stream');
  return lastStream >= 0 && lastStream > lastIndexOfAscii(data, 'endstream') + 3;
}

function rejectionFor(error: unknown, data: Uint8Array): PdfRejectionError {
  if (error instanceof PdfRejectionError) return error;
  const name = error instanceof Error ? error.name : '';
  if (name === 'PasswordException') return new PdfRejectionError('encrypted');
  return new PdfRejectionError(looksCutShort(data) ? 'truncated' : 'unreadable');
}

// pdf-parse keeps the pdf.js document it opens to itself; its text helper flattens away the positions this parser
// needs, so the document is borrowed through the loader pdf-parse uses for its own helpers.
async function openDocument(parser: PDFParse): Promise<PDFDocumentProxy> {
  const loader = (parser as unknown as { load?: () => Promise<PDFDocumentProxy> }).load;
  if (typeof loader !== 'function') throw new TypeError('pdf-parse no longer exposes its document loader');
  return loader.call(parser);
}

function isTextItem(item: unknown): item is PdfJsTextItem {
  return typeof item === 'object' && item !== null && 'str' in item && 'transform' in item;
}

type Matrix = [number, number, number, number, number, number];

function multiply(m: Matrix, n: readonly number[]): Matrix {
  return [
    m[0] * n[0]! + m[2] * n[1]!,
    m[1] * n[0]! + m[3] * n[1]!,
    m[0] * n[2]! + m[2] * n[3]!,
    m[1] * n[2]! + m[3] * n[3]!,
    m[0] * n[4]! + m[2] * n[5]! + m[4],
    m[1] * n[4]! + m[3] * n[5]! + m[5],
  ];
}

/**
 * Reads page sizes and positioned text. Throws PdfRejectionError for files it refuses: empty, not a PDF, cut short,
 * password-protected, damaged, over the page limit, or without any text layer.
 */
export async function readPdf(data: Uint8Array, options: ReadOptions = {}): Promise<PdfText> {
  checkBytes(data);
  const maxPages = options.maxPages ?? DATASHEET_LIMITS.maxPages;
  await ensureWorker();
  // pdf.js may take over the buffer it is given; the caller keeps its own.
  const parser = new PDFParse({ data: data.slice(), verbosity: 0, stopAtErrors: false });
  try {
    let doc: PDFDocumentProxy;
    try {
      doc = await openDocument(parser);
    } catch (err) {
      throw rejectionFor(err, data);
    }
    const pageCount = doc.numPages;
    if (pageCount < 1) throw new PdfRejectionError('unreadable');
    if (pageCount > maxPages) throw new PdfRejectionError('too-many-pages', { pageCount, maxPages });

    const pages: PageSize[] = [];
    const items: TextItem[] = [];
    let wantText = true;
    let anyText = false;
    for (let n = 1; n <= pageCount; n++) {
      let page;
      try {
        page = await doc.getPage(n);
      } catch (err) {
        throw rejectionFor(err, data);
      }
      try {
        const viewport = page.getViewport({ scale: 1 });
        pages.push({ width: round(viewport.width), height: round(viewport.height) });
        if (!wantText) continue;
        const content = await page.getTextContent();
        for (const raw of content.items) {
          if (!isTextItem(raw) || raw.str.trim() === '') continue;
          const t = multiply(viewport.transform as Matrix, raw.transform as number[]);
          const fontSize = Math.hypot(t[2], t[3]);
          // Only left-to-right horizontal text: rotated watermarks and side labels are not table content.
          if (fontSize <= 0 || Math.abs(t[1]) > 0.01 * fontSize || t[0] <= 0) continue;
          const ascent = content.styles[raw.fontName]?.ascent || 0.8;
          const top = t[5] - fontSize * Math.min(Math.max(ascent, 0.6), 1);
          items.push({
            page: n,
            text: raw.str,
            x: round(t[4]),
            y: round(top),
            width: round(raw.width),
            height: round(fontSize),
            baseline: round(t[5]),
            fontSize: round(fontSize),
            fontName: raw.fontName,
          });
          anyText = true;
        }
        if (anyText && options.text === 'probe') wantText = false;
      } catch (err) {
        throw rejectionFor(err, data);
      } finally {
        page.cleanup();
      }
    }
    if (!anyText) throw new PdfRejectionError('no-text');
    return { pageCount, pages, items };
  } finally {
    await parser.destroy();
  }
}

function round(n: number): number {
  return Math.round(n * 100) / 100;
}
