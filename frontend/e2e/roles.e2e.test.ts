import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BASE_URL, launchBrowser, mainNavLinks, newSession, onBaseUrl, screenshot, signIn } from './browser';

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

describe(`roles against ${BASE_URL}`, () => {
  it.each([
    { role: 'viewer', email: 'viewer@understudy.test', nav: ['Home', 'Catalog', 'Positions', 'Datasheets', 'BOMs'] },
    { role: 'editor', email: 'editor@understudy.test', nav: ['Home', 'Catalog', 'Positions', 'Datasheets', 'BOMs'] },
    { role: 'admin', email: 'admin@understudy.test', nav: ['Home', 'Catalog', 'Positions', 'Datasheets', 'BOMs', 'People', 'Outbox'] },
  ])('the $role signs in and sees only their navigation', async ({ role, email, nav }) => {
    const { context, page } = await newSession(browser);
    try {
      await signIn(page, email);
      expect(await mainNavLinks(page)).toEqual(nav);
      await page.getByRole('button', { name: /account menu/i }).click();
      await expect.poll(() => page.getByText(email, { exact: true }).isVisible()).toBe(true);
      await screenshot(page, `home-${role}`);

      await page.getByRole('button', { name: 'Sign out' }).click();
      await page.waitForURL((url) => url.pathname === '/sign-in');
      await page.getByText('You are signed out.').waitFor();
      expect(new URL(page.url()).search).toBe('');
    } finally {
      await context.close();
    }
  });

  it('sends a signed-out visit to an admin page to sign in', async () => {
    const { context, page } = await newSession(browser);
    try {
      await page.goto('/admin/people');
      await page.waitForURL((url) => url.pathname === '/sign-in');
      expect(new URL(page.url()).searchParams.get('next')).toBe('/admin/people');
      await page.getByRole('heading', { name: 'Sign in to Understudy' }).waitFor();
      expect(await page.getByText('Demo accounts (demo data only)').isVisible()).toBe(true);
      await screenshot(page, 'sign-in-redirect');
    } finally {
      await context.close();
    }
  });

  it('an admin invites someone, who follows the link from the outbox and joins with that role', async () => {
    const invitee = `invitee-${Date.now()}@understudy.test`;
    const admin = await newSession(browser);
    const guest = await newSession(browser);
    try {
      const { page } = admin;
      await signIn(page, 'admin@understudy.test');
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'People' }).click();
      await page.getByRole('heading', { level: 1, name: 'People' }).waitFor();

      const form = page.getByRole('form', { name: 'Invite someone' });
      await form.getByLabel('E-mail').fill(invitee);
      await form.getByLabel('Role').selectOption('editor');
      await form.getByRole('button', { name: 'Send invitation' }).click();
      await form.getByText('Invitation sent').waitFor();
      await page.getByRole('row').filter({ hasText: invitee }).getByText('Pending').waitFor();
      await screenshot(page, 'people-invited');

      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Outbox' }).click();
      const message = page.getByRole('button').filter({ hasText: `To ${invitee}` });
      // The list refreshes itself every few seconds; mail delivery is asynchronous.
      await message.first().waitFor({ timeout: 30_000 });
      await message.first().click();
      const link = page.getByTestId('outbox-message-body').getByRole('link', { name: /accept-invitation/ });
      const href = await link.first().getAttribute('href');
      expect(href).toBeTruthy();
      await screenshot(page, 'outbox-invitation');

      // The invitee is someone else, on their own browser.
      const { page: invitePage } = guest;
      await invitePage.goto(onBaseUrl(href!));
      await invitePage.getByRole('heading', { name: 'Join Understudy' }).waitFor();
      await invitePage.getByText(invitee, { exact: true }).waitFor();
      await invitePage.getByLabel('Your name').fill('Ingrid Invitee');
      await invitePage.getByLabel('Choose a password').fill('a long enough passphrase');
      await screenshot(invitePage, 'accept-invitation');
      await invitePage.getByRole('button', { name: 'Join Understudy' }).click();

      await invitePage.getByRole('heading', { level: 1, name: 'Hello, Ingrid Invitee' }).waitFor();
      expect(new URL(invitePage.url()).pathname).toBe('/');
      expect(await invitePage.getByRole('main').getByText('Editor', { exact: true }).first().isVisible()).toBe(true);
      expect(await mainNavLinks(invitePage)).toEqual(['Home', 'Catalog', 'Positions', 'Datasheets', 'BOMs']);
      await screenshot(invitePage, 'invitee-home');
    } finally {
      await admin.context.close();
      await guest.context.close();
    }
  });
});
