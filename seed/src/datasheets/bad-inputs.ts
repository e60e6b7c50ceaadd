import type { UploadRejection } from '@understudy/shared-types';
import PDFDocument from 'pdfkit';
import { buildCorpus } from './corpus';
import type { DatasheetSpec } from './datasheet-spec';
import { eachPixel, encodeGreyPng, scannedTextImage } from './raster';
import { renderDatasheet } from './render-datasheet';

/** A file for the upload's error paths, with the rejection the server should give (null: accepted). */
export interface BadInput {
  name: string;
  fileName: string;
  /** The UPLOAD_REJECTIONS code the upload should answer with; null for the valid control file. */
  expected: UploadRejection['code'] | null;
  description: string;
  data: Buffer;
}

const FIXED_DATE = new Date(Date.UTC(2024, 2, 14, 12));

function collect(doc: PDFKit.PDFDocument): Promise<Buffer> {
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  return new Promise((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
}

/** A one-page datasheet that is fine in every way: the control case. */
export const TINY_DATASHEET: DatasheetSpec = {
  meta: { title: 'QX-7702 datasheet', author: 'Harrowgate Microsystems', date: FIXED_DATE },
  titleBlock: { partNumber: 'QX-7702', manufacturer: 'Harrowgate Microsystems', description: 'Dual general-purpose operational amplifier', layout: 'stacked' },
  footer: { left: 'Harrowgate Microsystems', pageLabel: 'Page {n} of {total}' },
  pages: [
    {
      blocks: [
        { kind: 'paragraph', text: 'The QX-7702 is a dual general-purpose operational amplifier. The slew rate is typically 9 V/µs.' },
        {
          kind: 'table',
          title: 'Electrical characteristics',
          subtitle: 'VS = ±15 V, TA = 25 °C',
          columns: [
            { header: 'Parameter', width: 200 },
            { header: 'Min', width: 50, align: 'centre' },
            { header: 'Typ', width: 50, align: 'centre' },
            { header: 'Max', width: 50, align: 'centre' },
            { header: 'Unit', width: 60, align: 'centre' },
          ],
          rows: [
            { cells: ['Supply voltage range', '±2', '', '±18', 'V'] },
            { cells: ['Gain-bandwidth product', '', '10', '', 'MHz'] },
            { cells: ['Input offset voltage', '', '0.5', '3', 'mV'] },
          ],
          rules: 'header',
        },
      ],
    },
  ],
};

/** Text drawn only as filled squares (vector art) on page 1 and as a raster "scan" on page 2: no text layer at all. */
async function noTextPdf(): Promise<Buffer> {
  const doc = new PDFDocument({ size: 'A4', margin: 0, autoFirstPage: false, info: { Title: 'Scanned datasheet', CreationDate: FIXED_DATE, ModDate: FIXED_DATE } });
  const done = collect(doc);
  const lines = ['QX-7702 DUAL OP AMP', 'HARROWGATE MICROSYSTEMS', '', 'SLEW RATE 9 V/US TYP', 'GBW 10 MHZ', 'SUPPLY 4 TO 36 V'];
  doc.addPage();
  lines.forEach((line, row) => eachPixel(line, (x, y) => void doc.rect(60 + x * 2.4, 80 + row * 26 + y * 2.4, 2.4, 2.4)));
  doc.fill('#111111');
  doc.rect(60, 260, 470, 1).fill('#444444');
  doc.addPage();
  doc.image(scannedTextImage(['ELECTRICAL CHARACTERISTICS', 'INPUT OFFSET 0.5 MV', 'NOISE 5 NV/RTHZ AT 1 KHZ', 'PAGE 2 OF 2']), 50, 60, { width: 495 });
  doc.end();
  return done;
}

/** Many pages with one line of text each: small in bytes, absurd in page count. */
async function manyPagesPdf(pages: number): Promise<Buffer> {
  const doc = new PDFDocument({ size: 'A4', margin: 0, autoFirstPage: false, info: { Title: 'Endless datasheet', CreationDate: FIXED_DATE, ModDate: FIXED_DATE } });
  const done = collect(doc);
  doc.font('Helvetica').fontSize(10);
  for (let i = 1; i <= pages; i++) {
    doc.addPage();
    doc.text(`QX-7702 appendix, page ${i} of ${pages}`, 60, 60, { lineBreak: false });
  }
  doc.end();
  return done;
}

/**
 * Every upload error case as a named buffer. pdfkit draws encryption keys at random, so the encrypted file's
 * bytes (not its password, "understudy") differ between runs; every other buffer is the same on every run.
 */
export async function buildBadInputs(): Promise<BadInput[]> {
  const tiny = await renderDatasheet(TINY_DATASHEET);
  const [fourPages] = buildCorpus({ count: 12 }).filter((e) => e.pageCount >= 3);
  const longer = await renderDatasheet(fourPages!.spec);
  const png = encodeGreyPng(64, 64, (x, y) => ((x >> 3) + (y >> 3)) % 2 ? 30 : 230);
  return [
    { name: 'empty', fileName: 'empty.pdf', expected: 'empty', description: 'A file of zero bytes', data: Buffer.alloc(0) },
    { name: 'png-named-pdf', fileName: 'photo.pdf', expected: 'not-pdf', description: 'A PNG image with a .pdf name', data: png },
    {
      name: 'text-named-pdf',
      fileName: 'notes.pdf',
      expected: 'not-pdf',
      description: 'Plain text with a .pdf name',
      data: Buffer.from('Slew rate 9 V/us, GBW 10 MHz.\nThis is a text file, not a PDF.\n', 'utf8'),
    },
    {
      name: 'truncated',
      fileName: 'truncated.pdf',
      expected: 'truncated',
      description: `The first half of a valid ${fourPages!.pageCount}-page datasheet: no cross-reference table, no %%EOF`,
      data: longer.subarray(0, Math.floor(longer.length / 2)),
    },
    {
      name: 'encrypted',
      fileName: 'encrypted.pdf',
      expected: 'encrypted',
      description: 'A valid datasheet that needs a password to open',
      data: await renderDatasheet(TINY_DATASHEET, { userPassword: 'understudy' }),
    },
    {
      name: 'no-text-layer',
      fileName: 'scanned.pdf',
      expected: 'no-text',
      description: 'Text only as vector squares (page 1) and as an embedded scan (page 2); nothing to extract',
      data: await noTextPdf(),
    },
    {
      name: 'thousand-pages',
      fileName: 'thousand-pages.pdf',
      expected: 'too-many-pages',
      description: '1,000 pages of one line each, a few hundred kilobytes',
      data: await manyPagesPdf(1000),
    },
    {
      name: 'garbage-after-header',
      fileName: 'garbled.pdf',
      expected: 'unreadable',
      description: 'A PDF header followed by bytes that are no PDF objects, then %%EOF',
      data: Buffer.concat([
        Buffer.from('%PDF-1.7\n%\xe2\xe3\xcf\xd3\n', 'latin1'),
        Buffer.from(Array.from({ length: 4096 }, (_, i) => (i * 73 + 11) % 251)),
        Buffer.from('\n%%EOF\n', 'latin1'),
      ]),
    },
    { name: 'valid-tiny', fileName: 'qx-7702.pdf', expected: null, description: 'A valid one-page datasheet', data: tiny },
  ];
}
