import { UPLOAD_REJECTIONS } from '@understudy/shared-types';
import { PDFParse } from 'pdf-parse';
import { beforeAll, describe, expect, it } from 'vitest';
import { buildBadInputs, type BadInput } from './bad-inputs';

let inputs: BadInput[];
const get = (name: string) => inputs.find((i) => i.name === name)!;

async function open(data: Buffer): Promise<{ text: string; total: number }> {
  const parser = new PDFParse({ data: new Uint8Array(data) });
  try {
    const result = await parser.getText();
    return { text: result.pages.map((p) => p.text).join('\n'), total: result.total };
  } finally {
    await parser.destroy();
  }
}

beforeAll(async () => {
  inputs = await buildBadInputs();
}, 60_000);

describe('buildBadInputs', () => {
  it('names every case once, with a real rejection code', () => {
    expect(new Set(inputs.map((i) => i.name)).size).toBe(inputs.length);
    for (const i of inputs) {
      expect(i.fileName).toMatch(/\.pdf$/);
      if (i.expected !== null) expect(UPLOAD_REJECTIONS).toContain(i.expected);
    }
    expect(inputs.map((i) => i.expected)).toEqual(expect.arrayContaining(['empty', 'not-pdf', 'truncated', 'encrypted', 'no-text', 'too-many-pages', 'unreadable', null]));
  });

  it('has an empty file, and a PNG and a text file that only pretend to be PDFs', () => {
    expect(get('empty').data.length).toBe(0);
    expect(get('png-named-pdf').data.subarray(0, 8)).toEqual(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]));
    for (const name of ['png-named-pdf', 'text-named-pdf']) expect(get(name).data.subarray(0, 5).toString('latin1')).not.toBe('%PDF-');
  });

  it('cuts a valid PDF in half for the truncated case: the header stays, the end does not', () => {
    const data = get('truncated').data;
    expect(data.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(data.toString('latin1')).not.toContain('%%EOF');
    expect(data.toString('latin1')).not.toContain('startxref');
  });

  it('encrypts the encrypted case so that it cannot be read without its password', async () => {
    const data = get('encrypted').data;
    expect(data.toString('latin1')).toMatch(/\/Encrypt \d+ 0 R/);
    await expect(open(data)).rejects.toMatchObject({ name: 'PasswordException' });
  });

  it('has pages but no text layer in the scanned case', async () => {
    const data = get('no-text-layer').data;
    expect(data.toString('latin1')).toContain('/Subtype /Image');
    const { text, total } = await open(data);
    expect(total).toBe(2);
    expect(text.trim()).toBe('');
  });

  it('has 1,000 pages in a few hundred kilobytes', async () => {
    const data = get('thousand-pages').data;
    expect(data.length).toBeLessThan(1024 * 1024);
    const { total, text } = await open(data);
    expect(total).toBe(1000);
    expect(text).toContain('page 1000 of 1000');
  }, 60_000);

  it('has a PDF header and end marker around bytes no reader can use', async () => {
    const data = get('garbage-after-header').data.toString('latin1');
    expect(data.startsWith('%PDF-1.7')).toBe(true);
    expect(data.trimEnd().endsWith('%%EOF')).toBe(true);
    await expect(open(get('garbage-after-header').data)).rejects.toThrow();
  });

  it('includes a valid control file that reads back', async () => {
    const { text, total } = await open(get('valid-tiny').data);
    expect(total).toBe(1);
    expect(text).toContain('QX-7702');
    expect(text).toContain('Gain-bandwidth product');
  });
});
