import { createHash } from 'node:crypto';
import { readdir, readFile } from 'node:fs/promises';
import path from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BASE_URL, launchBrowser, newSession, screenshot, signIn } from './browser';

// `npm test` writes the three invented demo datasheets here before this suite starts.
const DATASHEETS_DIR = process.env.E2E_DATASHEETS_DIR;
const OP_AMP_PART = 'HV4580';

let browser: Browser;
let files: { name: string; data: Buffer }[] = [];

beforeAll(async () => {
  if (!DATASHEETS_DIR) throw new Error('E2E_DATASHEETS_DIR is not set; run the end-to-end suite through `npm test`.');
  const names = (await readdir(DATASHEETS_DIR)).filter((n) => n.endsWith('.pdf')).sort();
  files = await Promise.all(names.map(async (name) => ({ name, data: await readFile(path.join(DATASHEETS_DIR, name)) })));
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

/** A real drop: the files travel in a DataTransfer through dragenter, dragover and drop, as from a file manager. */
async function dropFiles(page: Page, target: string, dropped: { name: string; data: Buffer }[]) {
  const zone = page.getByText(target, { exact: true }).locator('..');
  const payload = dropped.map((f) => ({ name: f.name, base64: f.data.toString('base64') }));
  await zone.evaluate((element, items) => {
    const transfer = new DataTransfer();
    for (const item of items) {
      const bytes = Uint8Array.from(atob(item.base64), (c) => c.charCodeAt(0));
      transfer.items.add(new File([bytes], item.name, { type: 'application/pdf' }));
    }
    for (const type of ['dragenter', 'dragover', 'drop']) {
      element.dispatchEvent(new DragEvent(type, { bubbles: true, cancelable: true, dataTransfer: transfer }));
    }
  }, payload);
}

describe(`datasheets against ${BASE_URL}`, () => {
  it('an editor drops three datasheets, reviews one beside its page, applies it, and a viewer downloads it', async () => {
    expect(files).toHaveLength(3);
    const opAmpFile = files.find((f) => f.name.toLowerCase().includes(OP_AMP_PART.toLowerCase()));
    expect(opAmpFile, `a demo datasheet for ${OP_AMP_PART}`).toBeTruthy();

    const { context, page } = await newSession(browser);
    let datasheetUrl = '';
    try {
      await signIn(page, 'editor@understudy.test');
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Datasheets' }).click();
      await page.getByRole('heading', { level: 1, name: 'Datasheets' }).waitFor();

      const created: number[] = [];
      page.on('response', (r) => {
        if (new URL(r.url()).pathname === '/api/datasheets' && r.request().method() === 'POST') created.push(r.status());
      });
      await dropFiles(page, 'Drop PDF datasheets here, one or many', files);
      const uploads = page.getByRole('list', { name: 'Uploads' });
      // One progress bar per file while it is sent.
      await expect.poll(() => uploads.getByRole('listitem').count()).toBe(3);
      for (const f of files) await uploads.getByRole('progressbar', { name: `Uploading ${f.name}` }).waitFor({ state: 'attached' });
      // One request per file, so one bad file could never hold up the others.
      await expect.poll(() => created, { timeout: 15_000 }).toEqual([201, 201, 201]);
      // The parser's states arrive without a reload; each file ends ready for review.
      for (const f of files) {
        await uploads.getByRole('listitem').filter({ hasText: f.name }).getByText('Ready for review').waitFor({ timeout: 30_000 });
      }
      await screenshot(page, 'datasheets-uploaded');

      await uploads.getByRole('link', { name: `Review ${opAmpFile!.name}` }).click();
      await page.getByRole('heading', { level: 1, name: opAmpFile!.name }).waitFor();
      datasheetUrl = new URL(page.url()).pathname;

      // The page is drawn by pdf.js beside the proposals.
      const canvas = page.locator('canvas').first();
      await canvas.waitFor();
      await expect.poll(() => canvas.evaluate((c: HTMLCanvasElement) => c.width)).toBeGreaterThan(100);
      const acceptSlew = page.getByRole('button', { name: /^Accept Slew rate/ });
      await acceptSlew.waitFor();

      // Keep every proposal except the absolute-maximum ones, which are limits, not operating values.
      const proposals = page.locator('article[id^="proposal-"]');
      const total = await proposals.count();
      expect(total).toBeGreaterThanOrEqual(5);
      for (let i = 0; i < total; i++) {
        const item = proposals.nth(i);
        if ((await item.getByText('Absolute maximum', { exact: true }).count()) > 0) continue;
        const saved = page.waitForResponse((r) => r.request().method() === 'PATCH' && r.url().includes('/proposals/') && r.ok());
        await item.getByRole('button', { name: /^Accept/ }).click();
        await saved;
      }
      await expect.poll(() => acceptSlew.getAttribute('aria-pressed')).toBe('true');
      await screenshot(page, 'datasheet-review');

      await page.getByLabel('Find the part').fill(OP_AMP_PART);
      await page.getByRole('radio', { name: new RegExp(`^${OP_AMP_PART} `) }).first().click();
      await page.getByRole('heading', { name: new RegExp(`will change on ${OP_AMP_PART}`) }).waitFor();
      await screenshot(page, 'datasheet-apply-diff');
      await page.getByRole('button', { name: `Apply to ${OP_AMP_PART}` }).click();
      await page.getByText(`Applied to ${OP_AMP_PART}`).waitFor();

      await page.getByRole('link', { name: `Open ${OP_AMP_PART}` }).click();
      await page.getByRole('heading', { level: 1, name: new RegExp(OP_AMP_PART) }).waitFor();
      // The file is linked from the part's datasheets panel and from the revision it made; the history loads on its own
      // request, so wait for that line rather than count at once.
      const revisionLine = page.getByRole('list', { name: 'Revisions' }).getByText(/From datasheet/).first();
      await revisionLine.waitFor();
      expect(await revisionLine.getByRole('link', { name: opAmpFile!.name }).count()).toBe(1);
      await screenshot(page, 'datasheet-revision');
    } finally {
      await context.close();
    }

    const viewer = await newSession(browser);
    try {
      await signIn(viewer.page, 'viewer@understudy.test');
      await viewer.page.goto(datasheetUrl);
      await viewer.page.getByRole('heading', { level: 1, name: opAmpFile!.name }).waitFor();
      expect(await viewer.page.getByRole('button', { name: /^Accept / }).count()).toBe(0);
      const download = viewer.page.waitForEvent('download');
      await viewer.page.getByRole('link', { name: 'Download PDF' }).click();
      const saved = await (await download).path();
      const bytes = await readFile(saved);
      const sha = (b: Buffer) => createHash('sha256').update(b).digest('hex');
      expect(sha(bytes)).toBe(sha(opAmpFile!.data));
      expect((await download).suggestedFilename()).toBe(opAmpFile!.name);
    } finally {
      await viewer.context.close();
    }
  });
});
