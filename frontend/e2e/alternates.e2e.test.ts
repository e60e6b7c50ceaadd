import type { Browser, Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BASE_URL, launchBrowser, newSession, screenshot, signIn } from './browser';

// HV4558 is the seed catalog's obsolete general-purpose dual op amp (DIP-8, 8 V to 30 V, single-supply capable):
// the usual reason to come looking for a stand-in.
const OBSOLETE_OP_AMP = 'HV4558';

let browser: Browser;

const escapeRegExp = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

/** Resolves when the alternates of a part answer a request that satisfies `test` (set it up before the action). */
function alternatesResponse(page: Page, test: (query: URLSearchParams) => boolean = () => true) {
  return page.waitForResponse((response) => {
    const url = new URL(response.url());
    return /^\/api\/parts\/[^/]+\/alternates$/.test(url.pathname) && response.ok() && test(url.searchParams);
  });
}

/** The ranking once the newest answer is on screen (the previous one stays, dimmed, while the next loads). */
async function settledRanking(page: Page): Promise<Locator> {
  const table = page.getByRole('table', { name: `Alternates for ${OBSOLETE_OP_AMP}, best first` });
  await table.waitFor();
  await expect.poll(() => page.locator('[aria-busy="true"]').count()).toBe(0);
  return table;
}

/** Part numbers in ranked order: each ranked row carries its part's id, its first link is the part. */
async function rankedPartNumbers(table: Locator): Promise<string[]> {
  const links = table.locator('tbody tr[data-row-id] td[data-column="part"] a');
  return (await links.allTextContents()).map((t) => t.trim());
}

describe(`alternates against ${BASE_URL}`, () => {
  it('a designer finds stand-ins for an obsolete op amp, reads why, re-weights them, then ranks a position', async () => {
    const { context, page } = await newSession(browser);
    try {
      await signIn(page, 'viewer@understudy.test');

      // The obsolete part, found in the catalog.
      await page.goto(`/parts?q=${encodeURIComponent(OBSOLETE_OP_AMP)}`);
      const results = page.getByRole('table', { name: /Catalog results/ });
      await results.waitFor();
      await results.getByRole('link', { name: OBSOLETE_OP_AMP, exact: true }).click();
      await page.getByRole('heading', { level: 1, name: OBSOLETE_OP_AMP }).waitFor();
      await page.getByText('Obsolete', { exact: true }).first().waitFor();

      // Its alternates, reached from the part page.
      const firstRanking = alternatesResponse(page);
      await page.getByRole('link', { name: `Alternates for ${OBSOLETE_OP_AMP}` }).click();
      await page.waitForURL((url) => /^\/parts\/[^/]+\/alternates$/.test(url.pathname));
      await page.getByRole('heading', { level: 1, name: `Alternates for ${OBSOLETE_OP_AMP}` }).waitFor();
      await firstRanking;
      const table = await settledRanking(page);
      const before = await rankedPartNumbers(table);
      expect(before.length).toBeGreaterThan(1);
      expect(before).not.toContain(OBSOLETE_OP_AMP);
      // Every row has a score out of 100 and a pinout class.
      for (const cell of await table.locator('td[data-column="score"]').allTextContents()) expect(cell).toMatch(/^\d+(\.\d)? out of 100$/);
      for (const cell of await table.locator('td[data-column="pinout"]').allTextContents()) {
        expect(cell).toMatch(/Drop-in|Same pins, other places|Not pin compatible|Pinout unknown/);
      }
      await page.getByRole('img', { name: 'Supply range of the candidates' }).waitFor();
      await screenshot(page, 'alternates-ranked');

      // Why the best one scores what it does.
      const best = before[0]!;
      const toggle = page.getByRole('button', { name: `Details for ${best}`, exact: true });
      await toggle.click();
      expect(await toggle.getAttribute('aria-expanded')).toBe('true');
      const breakdown = page.getByRole('table', { name: new RegExp(`^Why ${escapeRegExp(best)} scores \\d+`) });
      await breakdown.waitFor();
      const reasons = (await breakdown.locator('tbody tr td:last-child').allTextContents()).map((t) => t.trim());
      expect(reasons.length).toBeGreaterThan(3);
      for (const reason of reasons) expect(reason.length).toBeGreaterThan(0);
      expect(await page.getByRole('img', { name: new RegExp(`^Pinout of (${OBSOLETE_OP_AMP}|${escapeRegExp(best)}),`) }).count()).toBe(2);
      await screenshot(page, 'alternates-row-expanded');
      await toggle.press('Enter');
      expect(await toggle.getAttribute('aria-expanded')).toBe('false');

      // Weight one criterion to dominate and drop others until the order changes; each move goes to the server.
      const moves: Array<[label: string, key: 'End' | 'Home']> = [
        ['Noise', 'End'],
        ['Supply range', 'Home'],
        ['Pinout', 'Home'],
        ['Slew rate', 'End'],
        ['Lifecycle', 'Home'],
      ];
      let after = before;
      for (const [label, key] of moves) {
        const slider = page.getByRole('slider', { name: label, exact: true });
        const answered = alternatesResponse(page, (q) => (q.get('weights') ?? '') !== '');
        await slider.focus();
        await slider.press(key);
        expect(await slider.inputValue()).toBe(key === 'End' ? '5' : '0');
        const response = await answered;
        const sent = new URL(response.url()).searchParams.get('weights')!;
        expect(new URL(page.url()).searchParams.get('weights')).toBe(sent);
        after = await rankedPartNumbers(await settledRanking(page));
        if (after.join() !== before.join()) break;
      }
      expect(after.join()).not.toBe(before.join());
      await screenshot(page, 'alternates-reweighted');

      // A link reproduces the ranking: reload and the weights and order are the same.
      const weightsInLink = new URL(page.url()).searchParams.get('weights');
      await page.reload();
      expect(await rankedPartNumbers(await settledRanking(page))).toEqual(after);
      expect(new URL(page.url()).searchParams.get('weights')).toBe(weightsInLink);

      // A position of its own: a 9 V single supply, 2 V peak at 20 kHz, and an LED hung on the output.
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Positions' }).click();
      await page.getByRole('heading', { level: 1, name: 'Positions' }).waitFor();
      await page.getByLabel('Supply voltage').fill('9');
      await page.getByLabel('Peak voltage').fill('2');
      await page.getByLabel('Frequency').fill('20k');
      await page.getByText('SR = 2π·f·Vpeak = 0.25 V/µs').waitFor();

      const ranked = page.waitForResponse(
        (response) =>
          new URL(response.url()).pathname === '/api/alternates/rank' &&
          response.ok() &&
          (response.request().postDataJSON() as { ledLoad?: unknown } | null)?.ledLoad !== undefined,
      );
      await page.getByLabel('Output voltage').fill('7');
      await page.getByLabel('LED forward voltage').fill('2');
      await page.getByLabel('Series resistor').fill('1k');
      await page.getByText('I = (Vout − Vf)/R = 5 mA').waitFor();
      const body = (await ranked).request().postDataJSON() as Record<string, unknown>;
      expect(body).toMatchObject({
        family: 'op-amp',
        supply: { kind: 'single', volts: 9 },
        signal: { peakVolts: 2, frequencyHz: 20000 },
        ledLoad: { outputVolts: 7, forwardVolts: 2, seriesOhms: 1000 },
      });

      const needs = page.getByRole('heading', { name: 'What the position needs' }).locator('xpath=..');
      await needs.locator('[data-need="slewRate"]').waitFor();
      expect(await needs.locator('[data-need="slewRate"]').textContent()).toContain('0.251 V/µs');
      expect(await needs.locator('[data-need="outputCurrent"]').textContent()).toContain('5 mA');

      const positionTable = page.getByRole('table', { name: 'Parts ranked against the position, best first' });
      await positionTable.waitFor();
      await expect.poll(() => page.locator('[aria-busy="true"]').count()).toBe(0);
      const slewMargins = await positionTable.locator('td[data-column="need-slewRate"]').allTextContents();
      expect(slewMargins.length).toBeGreaterThan(0);
      // Everything ranked meets the slew rate: a positive margin, ticked.
      for (const margin of slewMargins) expect(margin).toMatch(/\+\d+ %, meets it/);

      const top = (await positionTable.locator('tbody tr[data-row-id] td[data-column="part"] a').first().textContent())!.trim();
      await positionTable.getByRole('button', { name: `Details for ${top}`, exact: true }).click();
      const margins = page.getByRole('table', { name: `How ${top} meets each requirement` });
      await margins.waitFor();
      const slewLine = margins.locator('tr[data-need="slewRate"]');
      expect(await slewLine.textContent()).toContain('at least 0.251 V/µs');
      expect(await margins.locator('tr[data-need="outputCurrent"]').textContent()).toContain('at least 5 mA');
      await screenshot(page, 'position-margins');
    } finally {
      await context.close();
    }
    // A long journey through four pages; the suite's default is sized for one.
  }, 120_000);

  it('an editor approves an equivalent for the obsolete op amp and a viewer then sees it ranked first, flagged', async () => {
    const use = 'any audio stage';
    const editor = await newSession(browser);
    const viewer = await newSession(browser);
    let approved: string | undefined;
    const openAlternates = async (page: Page) => {
      await page.goto(`/parts?q=${encodeURIComponent(OBSOLETE_OP_AMP)}`);
      await page.getByRole('table', { name: /Catalog results/ }).getByRole('link', { name: OBSOLETE_OP_AMP, exact: true }).click();
      await page.getByRole('link', { name: `Alternates for ${OBSOLETE_OP_AMP}` }).click();
      return settledRanking(page);
    };
    try {
      await signIn(editor.page, 'editor@understudy.test');
      const editorTable = await openAlternates(editor.page);
      const before = await rankedPartNumbers(editorTable);
      expect(before.length).toBeGreaterThan(2);
      // The lowest-ranked stand-in, so being listed first can only come from the ruling.
      approved = before[before.length - 1]!;
      expect(before[0]).not.toBe(approved);

      await editorTable.getByRole('button', { name: `Mark approved… ${approved}` }).click();
      const dialog = editor.page.getByRole('dialog', { name: `Approve ${approved} for ${OBSOLETE_OP_AMP}` });
      await dialog.getByLabel('For what use').fill(use);
      await dialog.getByLabel(/Note/).fill('Checked on the bench in the demo overdrive.');
      const saved = editor.page.waitForResponse((r) => new URL(r.url()).pathname === '/api/equivalents' && r.request().method() === 'POST');
      await dialog.getByRole('button', { name: 'Save ruling' }).click();
      expect((await saved).status()).toBe(201);
      await dialog.waitFor({ state: 'hidden' });

      // Another person, another browser: the viewer sees the approved part at the top with the editor's flag.
      await signIn(viewer.page, 'viewer@understudy.test');
      const viewerTable = await openAlternates(viewer.page);
      const ranked = await rankedPartNumbers(viewerTable);
      const rows = viewerTable.locator('tbody tr[data-row-id]');
      const flagged = await Promise.all(ranked.map(async (_, i) => /Approved for /.test((await rows.nth(i).textContent()) ?? '')));
      // Approved equivalents lead the list (by score among themselves), and the new one is among them.
      const firstUnflagged = flagged.indexOf(false);
      expect(flagged.slice(firstUnflagged)).not.toContain(true);
      expect(ranked.indexOf(approved)).toBeLessThan(firstUnflagged === -1 ? ranked.length : firstUnflagged);
      expect(await rows.nth(ranked.indexOf(approved)).textContent()).toContain(`Approved for ${use}`);
      // A viewer reads rulings but cannot make them.
      expect(await viewerTable.getByRole('button', { name: /^Mark approved…/ }).count()).toBe(0);
      await screenshot(viewer.page, 'alternates-approved-first');
    } finally {
      // Leave the demo catalog as it was, so the suite can run again on the same data.
      if (approved) {
        const table = await openAlternates(editor.page);
        const remove = table.getByRole('button', { name: `Remove ruling ${approved}` });
        if (await remove.count()) {
          await remove.click();
          await editor.page.getByRole('dialog', { name: `Remove the ruling on ${approved}?` }).getByRole('button', { name: 'Remove ruling' }).click();
          await editor.page.getByRole('dialog', { name: `Remove the ruling on ${approved}?` }).waitFor({ state: 'hidden' });
        }
      }
      await editor.context.close();
      await viewer.context.close();
    }
  }, 120_000);
});
