import { parseQuantity } from '@understudy/shared-types';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BASE_URL, launchBrowser, newSession, screenshot, signIn } from './browser';

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

/** Resolves when the parts list answers a search that satisfies `test` (set it up before the action). */
function partsResponse(page: Page, test: (query: URLSearchParams) => boolean) {
  return page.waitForResponse((response) => {
    const url = new URL(response.url());
    return url.pathname === '/api/parts' && response.ok() && test(url.searchParams);
  });
}

/** The results table once the newest answer is on screen (the previous page stays, dimmed, while one loads). */
async function settledResults(page: Page) {
  const table = page.getByRole('table', { name: /Catalog results/ });
  await table.waitFor();
  await expect.poll(() => page.locator('[aria-busy="true"]').count()).toBe(0);
  return table;
}

function valueOf(text: string, unit: string): number {
  const r = parseQuantity(text.trim(), { unit });
  if (!r.ok) throw new Error(`"${text}" is not ${unit}: ${r.error}`);
  return r.value;
}

async function tickFirstRows(page: Page, count: number) {
  const rows = page.getByRole('table', { name: /Catalog results/ }).locator('tbody tr');
  for (let i = 0; i < count; i++) await rows.nth(i).getByRole('checkbox').check();
}

describe(`catalog against ${BASE_URL}`, () => {
  it('a viewer filters op amps by supply and slew rate, keeps the search over a reload, and compares', async () => {
    const { context, page } = await newSession(browser);
    try {
      await signIn(page, 'viewer@understudy.test');
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Catalog' }).click();
      await page.getByRole('heading', { level: 1, name: 'Catalog' }).waitFor();

      await page.getByRole('tab', { name: 'Op amps' }).click();
      await page.waitForURL((url) => url.searchParams.get('family') === 'op-amp');
      await settledResults(page);

      const filtered = partsResponse(
        page,
        (q) => q.get('family') === 'op-amp' && q.get('slewRate.min') === '5 V/µs' && q.get('supplyVoltage.min') === '9 V' && q.get('supplyVoltage.max') === '9 V',
      );
      await page.getByLabel('Supply range runs on').fill('9');
      await page.getByLabel('Slew rate min').fill('5');
      await page.getByText('= 5 V/µs').waitFor();
      await filtered;
      await page.waitForURL((url) => url.searchParams.get('supplyVoltage.covers') === '9' && url.searchParams.get('slewRate.min') === '5');

      async function checkRows() {
        const table = await settledResults(page);
        const slewCells = table.locator('td[data-column="slewRate"]');
        const rows = await slewCells.count();
        expect(rows).toBeGreaterThan(0);
        // Every row states a slew rate, and every one is at least 5 V/µs.
        const slews = await table.locator('td[data-column="slewRate"] [data-quantity]').allTextContents();
        expect(slews).toHaveLength(rows);
        for (const text of slews) expect(valueOf(text, 'V/s')).toBeGreaterThanOrEqual(5e6);
        // And every supply range takes in 9 V.
        const supplies = await table.locator('td[data-column="supplyVoltage"] [data-quantity]').allTextContents();
        expect(supplies).toHaveLength(rows);
        for (const text of supplies) {
          const [low, high] = text.split('–').map((end) => valueOf(end, 'V'));
          expect(low).toBeLessThanOrEqual(9);
          expect(high).toBeGreaterThanOrEqual(9);
        }
        return rows;
      }

      const before = await checkRows();
      await screenshot(page, 'catalog-op-amps-filtered');

      await page.reload();
      expect(await page.getByLabel('Supply range runs on').inputValue()).toBe('9');
      expect(await page.getByLabel('Slew rate min').inputValue()).toBe('5');
      expect(await page.getByRole('tab', { name: 'Op amps' }).getAttribute('aria-selected')).toBe('true');
      expect(await checkRows()).toBe(before);
      await screenshot(page, 'catalog-after-reload');

      await tickFirstRows(page, 2);
      await page.getByRole('button', { name: 'Compare (2)' }).click();
      await page.waitForURL((url) => url.pathname === '/compare' && (url.searchParams.get('ids') ?? '').split(',').length === 2);
      const supplyChart = page.getByRole('img', { name: 'Supply range' });
      await supplyChart.waitFor();
      await expect.poll(() => supplyChart.locator('[data-testid="supply-bar"] rect').count()).toBe(2);
      expect(await supplyChart.locator('[data-testid="supply-marker"]').textContent()).toContain('9 V');
      await screenshot(page, 'compare-op-amps');

      // The light-response chart is drawn for photoresistors.
      await page.goto('/parts?family=photoresistor');
      await settledResults(page);
      await page.getByRole('button', { name: 'Clear', exact: true }).click();
      await tickFirstRows(page, 2);
      await page.getByRole('button', { name: 'Compare (2)' }).click();
      await page.waitForURL((url) => url.pathname === '/compare');
      const lightChart = page.getByRole('img', { name: 'Resistance against light' });
      await lightChart.waitFor();
      await expect.poll(() => lightChart.locator('[data-testid^="light-line-"]').count()).toBe(2);
      await page.getByRole('note', { name: 'Cadmium caution' }).waitFor();
      await screenshot(page, 'compare-photoresistors');

      // A viewer reads a part but is offered no way to change it.
      await page.goto('/parts?family=op-amp');
      const table = await settledResults(page);
      const link = table.locator('tbody tr').first().getByRole('link').first();
      const partNumber = (await link.textContent())!.trim();
      await link.click();
      await page.getByRole('heading', { level: 1, name: partNumber }).waitFor();
      await page.getByRole('heading', { name: 'Parameters' }).waitFor();
      await page.getByRole('img', { name: /^Pinout of/ }).waitFor();
      expect(await page.getByRole('link', { name: 'Edit', exact: true }).count()).toBe(0);
      expect(await page.getByRole('button', { name: 'Archive' }).count()).toBe(0);
      await screenshot(page, 'part-viewer');
    } finally {
      await context.close();
    }
  });

  it('an editor changes a part’s description and sees it in the history', async () => {
    const { context, page } = await newSession(browser);
    const description = `Edited in the end-to-end run ${new Date().toISOString()}.`;
    try {
      await signIn(page, 'editor@understudy.test');
      await page.goto('/parts?family=op-amp');
      const table = await settledResults(page);
      const link = table.locator('tbody tr').first().getByRole('link').first();
      const partNumber = (await link.textContent())!.trim();
      await link.click();
      await page.getByRole('heading', { level: 1, name: partNumber }).waitFor();
      const partPath = new URL(page.url()).pathname;

      await page.getByRole('link', { name: 'Edit', exact: true }).click();
      await page.waitForURL((url) => url.pathname === `${partPath}/edit`);
      const box = page.getByLabel('Description');
      await box.waitFor();
      await box.fill(description);
      await screenshot(page, 'part-edit');
      await page.getByRole('button', { name: 'Save changes' }).click();

      await page.waitForURL((url) => url.pathname === partPath);
      await page.getByText('Saved. The change is listed in the history below.').waitFor();
      expect(await page.getByTestId('part-description').textContent()).toBe(description);
      const history = page.getByRole('list', { name: 'Revisions' });
      const change = history.locator('[data-field="description"]').filter({ hasText: description }).first();
      await change.waitFor();
      expect(await change.textContent()).toContain('Description:');
      // Newest first: the revision this save made is at the top.
      expect(await history.locator(':scope > li').first().textContent()).toContain(description);
      await screenshot(page, 'part-revision');
    } finally {
      await context.close();
    }
  });
});
