import { readFile } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';
import Papa from 'papaparse';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BASE_URL, launchBrowser, newSession, screenshot, signIn } from './browser';

// The seed's 30-line BOM of a tremolo build, spelt as a real spreadsheet spells it: lower case, stray spaces and
// dashes, packing suffixes, a typo, parts that are not in the catalog, five obsolete ones.
const DEMO_BOM = fileURLToPath(new URL('../../seed/demo-boms/marrowbone-tremolo-rev-c.tsv', import.meta.url));
const PURCHASER = 'purchaser@understudy.test';
// An active LED in that BOM; the editor marks it obsolete and the purchaser is told, once.
const WATCHED_PART = 'LR5-RD-D';
const MAIL_API = process.env.FAKE_MAIL_API_URL;

interface FakeMail {
  to: string[] | string;
  subject: string;
  text: string;
}

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

async function mailTo(address: string, about: string): Promise<FakeMail[]> {
  const response = await fetch(`${MAIL_API}/messages`);
  const { items } = (await response.json()) as { items: FakeMail[] };
  return items.filter((m) => [m.to].flat().some((to) => to.includes(address)) && m.subject.includes(about));
}

/** The editor sets a part's lifecycle on its edit page, as an editor would. */
async function setLifecycle(page: Page, partNumber: string, lifecycle: string): Promise<void> {
  await page.goto(`/parts?q=${encodeURIComponent(partNumber)}`);
  await page.getByRole('table', { name: /Catalog results/ }).getByRole('link', { name: partNumber, exact: true }).click();
  await page.getByRole('heading', { level: 1, name: partNumber }).waitFor();
  await page.getByRole('link', { name: 'Edit', exact: true }).click();
  await page.getByLabel('Lifecycle').selectOption({ label: lifecycle });
  await page.getByRole('button', { name: 'Save changes' }).click();
  await page.getByText('Saved. The change is listed in the history below.').waitFor();
}

describe(`BOM check against ${BASE_URL}`, () => {
  it('a purchaser pastes a messy BOM, maps it, sees the risks, picks a replacement and exports; an obsolete part alerts once', async () => {
    expect(MAIL_API, 'FAKE_MAIL_API_URL must point at the fake mail server').toBeTruthy();
    const purchaser = await newSession(browser);
    const editor = await newSession(browser);
    const name = `Tremolo rev C ${Date.now()}`;
    let markedObsolete = false;
    try {
      const { page } = purchaser;
      await signIn(page, PURCHASER);
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'BOMs' }).click();
      await page.getByRole('link', { name: /Check a BOM/ }).first().click();

      // Step 1: paste the rows, as copied from the sheet (tab-separated, header row included).
      await page.getByLabel('Paste rows from a spreadsheet').fill(await readFile(DEMO_BOM, 'utf8'));
      await page.getByRole('button', { name: 'Read the pasted rows' }).click();
      await expect.poll(async () => page.getByTestId('read-as').textContent()).toMatch(/Read 30 lines as .*separated by tab/);

      // Step 2: the columns are guessed from the header; the purchaser checks the part-number one and saves.
      expect(await page.getByLabel('Column 4 (Mfr Part #) holds').inputValue()).toBe('partNumber');
      expect(await page.getByLabel('Column 2 (Qty) holds').inputValue()).toBe('quantity');
      expect(await page.getByLabel('Column 1 (Ref) holds').inputValue()).toBe('designators');
      await page.getByLabel('Name', { exact: true }).fill(name);
      await screenshot(page, 'bom-mapping');
      await page.getByRole('button', { name: 'Check and save' }).click();
      await page.getByRole('heading', { level: 1, name }).waitFor();
      const bomPath = new URL(page.url()).pathname;

      // Every line has a status; the summary counts the obsolete ones and the ones not in the catalog.
      const risks = page.getByRole('list', { name: 'Risks in this BOM' });
      await risks.waitFor();
      const riskText = (await risks.textContent()) ?? '';
      expect(riskText).toMatch(/8\s*Obsolete/i);
      expect(riskText).toMatch(/2\s*Not in catalog/i);
      // The typo (HV4850 for HV4580, two digits swapped) is offered its likely part to confirm, not dropped.
      expect(riskText).toMatch(/1\s*To confirm/i);
      const lines = page.getByRole('table', { name: `Lines of ${name}` });
      const rows = lines.locator('tbody tr[data-row-id]');
      await rows.first().waitFor();
      expect(await rows.count()).toBe(30);
      for (const status of await lines.locator('td[data-column="status"]').allTextContents()) {
        expect(status.trim()).toMatch(/^(Not in catalog|Confirm match|At risk|Check line|OK)/);
      }
      // Messy spellings found their parts: lower case, a packing suffix set aside.
      expect(await rows.filter({ hasText: 'hv4558' }).textContent()).toContain('HV4558');
      expect(await rows.filter({ hasText: 'HV 4580-TR' }).textContent()).toMatch(/suffix -TR/);
      await screenshot(page, 'bom-checked');

      // The obsolete dual is offered its approved equivalent first; the purchaser takes it, with a note.
      const obsoleteRow = rows.filter({ hasText: 'hv4558' });
      expect(await obsoleteRow.textContent()).toMatch(/Obsolete — 1 approved equivalent/);
      await obsoleteRow.getByRole('button', { name: 'Details for row 2, hv4558' }).click();
      const approved = page.getByRole('list', { name: 'Approved equivalents for row 2' });
      await approved.waitFor();
      expect(await approved.textContent()).toContain('HV4580');
      await page.getByRole('list', { name: 'Closest alternates for row 2' }).waitFor();
      await page.getByLabel(/^Replacement note/).fill('Approved stand-in; order 2 with the next batch.');
      const picked = page.waitForResponse((r) => /\/api\/boms\/[^/]+\/lines\/[^/]+$/.test(new URL(r.url()).pathname) && r.request().method() === 'PATCH');
      await approved.getByRole('button', { name: 'Use as replacement (HV4580)' }).click();
      expect((await picked).status()).toBe(200);
      await expect.poll(async () => rows.filter({ hasText: 'hv4558' }).textContent()).toContain('HV4580');
      await screenshot(page, 'bom-replacement');

      // The typo's likely part, confirmed by the purchaser: the line is matched and judged like any other.
      await rows.filter({ hasText: 'HV4850' }).getByRole('button', { name: 'Details for row 22, HV4850' }).click();
      const close = page.getByRole('list', { name: 'Close matches for row 22' });
      await close.getByRole('button', { name: 'This one (HV4580)' }).click();
      await expect.poll(async () => rows.filter({ hasText: 'HV4850' }).textContent()).toMatch(/confirmed/i);
      expect(await rows.filter({ hasText: 'HV4850' }).locator('td[data-column="status"]').textContent()).toBe('OK');

      // Export: the original columns untouched, then status, replacement and note.
      const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'Export CSV' }).click()]);
      const csv = (await readFile((await download.path())!, 'utf8')).replace(/^\uFEFF/, '');
      const parsed = Papa.parse<Record<string, string>>(csv, { header: true, skipEmptyLines: true });
      expect(parsed.meta.fields?.slice(0, 5)).toEqual(['Ref', 'Qty', 'Mfr', 'Mfr Part #', 'Description']);
      expect(parsed.data).toHaveLength(30);
      const exported = parsed.data.find((r) => r['Mfr Part #'] === 'hv4558')!;
      expect(exported['Understudy status']).toBe('At risk');
      expect(exported.Replacement).toContain('HV4580');
      expect(exported['Replacement note']).toBe('Approved stand-in; order 2 with the next batch.');

      // The printable report of the same BOM.
      await page.getByRole('link', { name: 'Printable report' }).click();
      await page.getByRole('button', { name: 'Print' }).waitFor();
      await page.emulateMedia({ media: 'print' });
      await screenshot(page, 'bom-report-print');
      await page.emulateMedia({ media: 'screen' });

      // An editor marks a part of that BOM obsolete: the purchaser gets one alert, however many lines use it.
      const before = (await mailTo(PURCHASER, WATCHED_PART)).length;
      await signIn(editor.page, 'editor@understudy.test');
      await setLifecycle(editor.page, WATCHED_PART, 'Obsolete');
      markedObsolete = true;
      await expect.poll(async () => (await mailTo(PURCHASER, WATCHED_PART)).length, { timeout: 30_000 }).toBe(before + 1);
      const [alert] = (await mailTo(PURCHASER, WATCHED_PART)).slice(-1);
      expect(alert!.subject).toMatch(/obsolete/i);
      expect(alert!.text).toContain(name);
      // Give a duplicate time to show up: there must not be one.
      await new Promise((resolve) => setTimeout(resolve, 3_000));
      expect((await mailTo(PURCHASER, WATCHED_PART)).length).toBe(before + 1);

      // In the app too: the notice, and the line is now at risk.
      await page.goto('/notices');
      await page.getByText(new RegExp(`${WATCHED_PART} is now obsolete`)).first().waitFor();
      await screenshot(page, 'bom-notice');
      await page.goto(bomPath);
      await expect.poll(async () => rows.filter({ hasText: WATCHED_PART }).textContent()).toMatch(/At risk/);
    } finally {
      // Leave the demo catalog as it was, so the suite can run again on the same data.
      if (markedObsolete) await setLifecycle(editor.page, WATCHED_PART, 'Active');
      await purchaser.context.close();
      await editor.context.close();
    }
  }, 150_000);

  it('a purchaser uploads a semicolon CSV saved in Windows-1252 with French headers, and it reads and checks alike', async () => {
    // A spreadsheet in a French locale saves CSV with semicolons in the legacy Windows code page.
    const rows = [
      'Repère;Qté;Fabricant;Référence fabricant;Désignation',
      'U1;2;Halvard Semiconductor;hv4558;Double ampli op, étages de phase',
      'VR1;1;Tessaly Components;TS16-B10K;Potentiomètre de profondeur',
      'LDR1;1;Brightwater Optics;BW-LDR-10K-4;Cellule CdS, trémolo',
      'R1-R4;4;;RC0805-10K;Résistance 10 k',
    ];
    const { context, page } = await newSession(browser);
    try {
      await signIn(page, PURCHASER);
      await page.goto('/boms/new');
      await page.locator('input[type="file"]').setInputFiles({
        name: 'trémolo-fr.csv',
        mimeType: 'text/csv',
        buffer: Buffer.from(`${rows.join('\r\n')}\r\n`, 'latin1'),
      });
      await expect.poll(async () => page.getByTestId('read-as').textContent()).toMatch(/Read 4 lines as Windows-1252, separated by semicolon/);
      // The accented headers came through intact and were recognised.
      expect(await page.getByLabel('Column 4 (Référence fabricant) holds').inputValue()).toBe('partNumber');
      expect(await page.getByLabel('Column 2 (Qté) holds').inputValue()).toBe('quantity');
      expect(await page.getByLabel('Name', { exact: true }).inputValue()).toBe('trémolo-fr');
      await page.getByRole('button', { name: 'Check and save' }).click();
      await page.getByRole('heading', { level: 1, name: 'trémolo-fr' }).waitFor();
      const lines = page.getByRole('table', { name: 'Lines of trémolo-fr' });
      const status = (text: string) => lines.locator('tbody tr[data-row-id]').filter({ hasText: text }).locator('td[data-column="status"]').textContent();
      expect(await status('hv4558')).toBe('At risk');
      expect(await status('TS16-B10K')).toBe('OK');
      expect(await status('RC0805-10K')).toBe('Not in catalog');
      expect(await lines.locator('tbody tr[data-row-id]').filter({ hasText: 'RC0805-10K' }).textContent()).toContain('R1, R2, R3, R4');
      await screenshot(page, 'bom-uploaded-1252');
    } finally {
      await context.close();
    }
  });
});
