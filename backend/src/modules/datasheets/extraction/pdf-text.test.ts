import { describe, expect, it } from 'vitest';
import { PdfRejectionError } from './errors';
import { extractDatasheet, inspectPdf } from './index';
import { checkBytes, readPdf } from './pdf-text';
import { makePdf } from './test-support/make-pdf';

const ascii = (s: string) => new TextEncoder().encode(s);

function concat(...parts: Uint8Array[]): Uint8Array {
  const out = new Uint8Array(parts.reduce((n, p) => n + p.length, 0));
  let at = 0;
  for (const p of parts) {
    out.set(p, at);
    at += p.length;
  }
  return out;
}

async function rejection(promise: Promise<unknown>): Promise<PdfRejectionError> {
  try {
    await promise;
  } catch (err) {
    if (err instanceof PdfRejectionError) return err;
    throw err;
  }
  throw new Error('expected the file to be refused');
}

const simple = () => makePdf([{ texts: [{ text: 'Slew rate 9 V/µs', x: 100, y: 200, size: 10 }] }]);

describe('readPdf', () => {
  it('gives text items with top-left positions in points and the page sizes', async () => {
    const pdf = await makePdf([
      { texts: [{ text: 'Slew rate 9 V/µs ±15 V Ω √Hz °', x: 100, y: 200, size: 10 }] },
      { size: [842, 595], texts: [{ text: 'Second page', x: 50, y: 40 }] },
    ]);
    const read = await readPdf(pdf);
    expect(read.pageCount).toBe(2);
    expect(read.pages[1]).toEqual({ width: 842, height: 595 });
    const item = read.items.find((i) => i.page === 1)!;
    // pdf.js folds the micro sign into Greek mu; every other glyph comes back as drawn.
    expect(item.text).toBe('Slew rate 9 V/μs ±15 V Ω √Hz °');
    expect(item.x).toBeCloseTo(100, 0);
    expect(item.y).toBeCloseTo(200, 0);
    expect(item.fontSize).toBeCloseTo(10, 1);
    expect(item.height).toBeCloseTo(10, 1);
    expect(item.width).toBeGreaterThan(100);
    expect(read.items.find((i) => i.page === 2)!.y).toBeCloseTo(40, 0);
  });

  it('leaves the caller its buffer', async () => {
    const pdf = await simple();
    const copy = pdf.slice();
    await readPdf(pdf);
    expect(pdf).toEqual(copy);
  });
});

describe('inspectPdf and extractDatasheet refuse bad files', () => {
  it('an empty file', async () => {
    expect((await rejection(inspectPdf(new Uint8Array()))).code).toBe('empty');
  });

  it('a file without a PDF header, whatever its name', async () => {
    // PNG signature (ISO/IEC 15948, section 5.2) followed by junk.
    const png = concat(new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), ascii('IHDR'.repeat(50)));
    expect((await rejection(inspectPdf(png))).code).toBe('not-pdf');
    expect((await rejection(extractDatasheet(ascii('Slew rate 9 V/us\n%%EOF')))).code).toBe('not-pdf');
  });

  it('a file cut short, with or without an end marker appended', async () => {
    const pdf = await simple();
    const cut = pdf.slice(0, Math.floor(pdf.length * 0.6));
    expect((await rejection(inspectPdf(cut))).code).toBe('truncated');
    expect((await rejection(inspectPdf(concat(cut, ascii('\n%%EOF\n'))))).code).toBe('truncated');
  });

  it('a password-protected file', async () => {
    const pdf = await makePdf([{ texts: [{ text: 'Secret', x: 50, y: 50 }] }], { userPassword: 'letmein' });
    const err = await rejection(inspectPdf(pdf));
    expect(err.code).toBe('encrypted');
    expect(err.message).toMatch(/password/);
  });

  it('a damaged file that has header and end marker', async () => {
    const junk = concat(ascii('%PDF-1.7\n'), ascii('x'.repeat(4000)), ascii('\n%%EOF\n'));
    expect((await rejection(inspectPdf(junk))).code).toBe('unreadable');
  });

  it('a scan without a text layer', async () => {
    const pdf = await makePdf([{ rects: [{ x: 50, y: 50, width: 400, height: 300 }] }, { rects: [{ x: 80, y: 80, width: 100, height: 100 }] }]);
    const err = await rejection(extractDatasheet(pdf));
    expect(err.code).toBe('no-text');
    expect(err.message).toContain('it looks like a scanned document; this app reads the text layer only, OCR is not supported');
  });

  it('more pages than allowed, by default or by option', async () => {
    const three = await makePdf([1, 2, 3].map((n) => ({ texts: [{ text: `Page ${n}`, x: 50, y: 50 }] })));
    const err = await rejection(inspectPdf(three, { maxPages: 2 }));
    expect(err.code).toBe('too-many-pages');
    expect(err.details).toEqual({ pageCount: 3, maxPages: 2 });
    expect(err.message).toBe('The PDF has 3 pages; the limit is 2.');
    const many = await makePdf(Array.from({ length: 201 }, () => ({ texts: [{ text: 'x', x: 50, y: 50 }] })));
    expect((await rejection(inspectPdf(many))).code).toBe('too-many-pages');
  });

  it('accepts a good file and reports its pages', async () => {
    const pdf = await makePdf([{ rects: [{ x: 0, y: 0, width: 10, height: 10 }] }, { texts: [{ text: 'Text on page two', x: 50, y: 50 }] }]);
    expect(await inspectPdf(pdf)).toEqual({ pageCount: 2, pages: [{ width: 595.28, height: 841.89 }, { width: 595.28, height: 841.89 }] });
  });
});

describe('checkBytes', () => {
  it('looks for the header in the first kilobyte and the end marker in the last two', () => {
    expect(() => checkBytes(concat(ascii(' '.repeat(900)), ascii('%PDF-1.4\n%%EOF')))).not.toThrow();
    expect(() => checkBytes(concat(ascii(' '.repeat(1100)), ascii('%PDF-1.4\n%%EOF')))).toThrow(/not a PDF/);
    expect(() => checkBytes(concat(ascii('%PDF-1.4\n%%EOF'), ascii(' '.repeat(2100))))).toThrow(/incomplete/);
  });
});
