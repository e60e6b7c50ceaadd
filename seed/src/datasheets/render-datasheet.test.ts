import { inflateSync } from 'node:zlib';
import { PDFParse } from 'pdf-parse';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { describe, expect, it } from 'vitest';
import type { DatasheetSpec } from './datasheet-spec';
import { renderDatasheet } from './render-datasheet';

const spec: DatasheetSpec = {
  meta: { title: 'ZT-1001 datasheet', author: 'Harrowgate Microsystems', date: new Date(Date.UTC(2025, 2, 14)) },
  titleBlock: { partNumber: 'ZT-1001', manufacturer: 'Harrowgate Microsystems', description: 'Dual low-noise operational amplifier', layout: 'banner', details: ['Rev. C', '2025-03-14'] },
  runningHeader: 'ZT-1001 · Dual low-noise operational amplifier',
  footer: { left: '© 2025 Harrowgate Microsystems', pageLabel: 'Page {n} of {total}' },
  pages: [
    {
      blocks: [
        { kind: 'paragraph', text: 'The slew rate is typically 9 V/\u00b5s; noise is 5 nV/√Hz; ±15 V; 30°; 4.7 kΩ; 2 \u03bcA.' },
        {
          kind: 'table',
          title: 'Electrical characteristics',
          columns: [
            { header: 'Parameter', width: 200 },
            { header: 'Min', width: 60, align: 'centre' },
            { header: 'Typ', width: 60, align: 'centre' },
            { header: 'Max', width: 60, align: 'centre' },
            { header: 'Unit', width: 60, align: 'centre' },
          ],
          rows: [{ cells: ['Gain-bandwidth product', '', '10', '', 'MHz'] }],
          rules: 'grid',
        },
      ],
    },
    { blocks: [{ kind: 'heading', text: 'Package information' }] },
  ],
};

/** Text items with their x position in points, as a parser reading the text layer sees them. */
async function textItems(data: Buffer): Promise<{ str: string; x: number; page: number }[]> {
  const doc = await getDocument({ data: new Uint8Array(data), useSystemFonts: false }).promise;
  const out: { str: string; x: number; page: number }[] = [];
  for (let n = 1; n <= doc.numPages; n++) {
    const content = await (await doc.getPage(n)).getTextContent();
    for (const item of content.items) if ('str' in item && item.str.trim()) out.push({ str: item.str, x: item.transform[4] as number, page: n });
  }
  await doc.destroy();
  return out;
}

describe('renderDatasheet', () => {
  it('writes the same bytes for the same spec', async () => {
    expect((await renderDatasheet(spec)).equals(await renderDatasheet(spec))).toBe(true);
  });

  it('embeds a font with the µ, μ, Ω, √, ± and ° glyphs and maps them back to text', async () => {
    const data = await renderDatasheet(spec);
    const parser = new PDFParse({ data: new Uint8Array(data) });
    const { text, total } = await parser.getText();
    await parser.destroy();
    expect(total).toBe(2);
    // pdf.js folds the micro sign into Greek mu when extracting; the file itself keeps both (checked below).
    for (const piece of ['V/μs', 'nV/√Hz', '±15 V', '30°', '4.7 kΩ', 'ZT-1001', 'Page 2 of 2', 'Rev. C']) expect(text).toContain(piece);
    const cmaps = [...data.toString('latin1').matchAll(/stream\r?\n([\s\S]*?)endstream/g)]
      .map((m) => {
        try {
          return inflateSync(Buffer.from(m[1]!, 'latin1')).toString('latin1');
        } catch {
          return '';
        }
      })
      .filter((s) => s.includes('begincmap'))
      .join('');
    expect(cmaps).toContain('<00b5>');
    expect(cmaps).toContain('<03bc>');
  });

  it('draws table cells at their column positions, so a lone value is told apart by x alone', async () => {
    const items = await textItems(await renderDatasheet(spec));
    const at = (s: string) => items.find((i) => i.str === s)!.x;
    // Columns start at x = 50 (the margin): Parameter 50–250, Min 250–310, Typ 310–370, Max 370–430.
    expect(at('10')).toBeGreaterThan(310);
    expect(at('10')).toBeLessThan(370);
    expect(at('Typ')).toBeGreaterThan(310);
    expect(at('Typ')).toBeLessThan(370);
    expect(items.find((i) => i.str.includes('Package information'))!.page).toBe(2);
  });

  it('refuses a page whose blocks do not fit', async () => {
    const long: DatasheetSpec = { ...spec, pages: [{ blocks: Array.from({ length: 80 }, () => ({ kind: 'paragraph' as const, text: 'Too much text for one page.' })) }] };
    await expect(renderDatasheet(long)).rejects.toThrow(/overflows/);
  });
});
