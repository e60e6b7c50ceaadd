import { mkdir } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';

export const BASE_URL = (process.env.E2E_BASE_URL ?? 'http://127.0.0.1:5173').replace(/\/$/, '');
export const DEMO_PASSWORD = process.env.E2E_DEMO_PASSWORD ?? 'understudy-demo';

const SCREENSHOT_DIR = fileURLToPath(new URL('./screenshots/', import.meta.url));

/** The system Chromium, headless, with everything that would phone home switched off. No browser download. */
export function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium',
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
      '--disable-quic',
    ],
  });
}

/** A fresh context is a fresh profile: its own cookies and storage, like a different person's browser. */
export async function newSession(browser: Browser): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ baseURL: BASE_URL, viewport: { width: 1280, height: 860 } });
  context.setDefaultTimeout(15_000);
  const page = await context.newPage();
  return { context, page };
}

export async function screenshot(page: Page, name: string): Promise<void> {
  await mkdir(SCREENSHOT_DIR, { recursive: true });
  await page.screenshot({ path: `${SCREENSHOT_DIR}${name}.png`, fullPage: true });
}

export async function signIn(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('heading', { level: 1, name: /^Hello, / }).waitFor();
}

export async function mainNavLinks(page: Page): Promise<string[]> {
  const nav = page.getByRole('navigation', { name: 'Main' });
  await nav.waitFor();
  return (await nav.getByRole('link').allTextContents()).map((text) => text.trim());
}

/** Links in mail point at the app's public address; follow the path and query on the server under test. */
export function onBaseUrl(href: string): string {
  const url = new URL(href, BASE_URL);
  return `${url.pathname}${url.search}`;
}
