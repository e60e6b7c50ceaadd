import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { Role } from '@understudy/shared-types';
import { describe, expect, it } from 'vitest';
import { USERS, json, meHandler, renderApp, stubApi } from '../../test/render-app';

async function navLinks(role: Role) {
  stubApi({ 'GET /api/auth/me': meHandler(USERS[role]) });
  renderApp('/');
  const nav = await screen.findByRole('navigation', { name: 'Main' });
  return within(nav)
    .getAllByRole('link')
    .map((link) => link.textContent);
}

describe('navigation by role', () => {
  it('shows a viewer Home, the Catalog and Positions', async () => {
    expect(await navLinks('viewer')).toEqual(['Home', 'Catalog', 'Positions', 'Datasheets', 'BOMs']);
  });

  it('shows an editor Home, the Catalog and Positions', async () => {
    expect(await navLinks('editor')).toEqual(['Home', 'Catalog', 'Positions', 'Datasheets', 'BOMs']);
  });

  it('shows an admin People and Outbox as well', async () => {
    expect(await navLinks('admin')).toEqual(['Home', 'Catalog', 'Positions', 'Datasheets', 'BOMs', 'People', 'Outbox']);
  });

  it('sends a signed-out visitor to sign in, remembering the page', async () => {
    stubApi({ 'GET /api/auth/me': meHandler(null) });
    const { router } = renderApp('/admin/people');
    expect(await screen.findByRole('heading', { name: 'Sign in to Understudy' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(router.state.location.search).toBe('?next=%2Fadmin%2Fpeople');
  });

  it('keeps a viewer out of the admin pages even by direct address', async () => {
    stubApi({ 'GET /api/auth/me': meHandler(USERS.viewer), 'GET /api/users': () => json(403, { error: { code: 'forbidden', message: 'No' } }) });
    renderApp('/admin/people');
    expect(await screen.findByText('This page is not part of your role')).toBeInTheDocument();
  });

  it('shows the account menu with name, e-mail and role, reachable by keyboard', async () => {
    stubApi({ 'GET /api/auth/me': meHandler(USERS.editor) });
    renderApp('/');
    const user = userEvent.setup();
    const button = await screen.findByRole('button', { name: /account menu/i });
    button.focus();
    await user.keyboard('{Enter}');
    expect(button).toHaveAttribute('aria-expanded', 'true');
    expect(screen.getByText('editor@understudy.test')).toBeVisible();
    expect(screen.getByRole('button', { name: 'Sign out' })).toHaveFocus();
    await user.keyboard('{Escape}');
    expect(button).toHaveAttribute('aria-expanded', 'false');
    expect(button).toHaveFocus();
  });

  it('signs out to the sign-in page without a way back into the session', async () => {
    const fetchMock = stubApi({
      'GET /api/auth/me': meHandler(USERS.admin),
      'POST /api/auth/sign-out': () => new Response(null, { status: 204 }),
      'GET /api/users': () => json(200, { items: [] }),
      'GET /api/invitations': () => json(200, { items: [] }),
    });
    const { router } = renderApp('/admin/people');
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: /account menu/i }));
    await user.click(screen.getByRole('button', { name: 'Sign out' }));

    expect(await screen.findByText('You are signed out.')).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(router.state.location.search).toBe('');
    expect(fetchMock.mock.calls.some(([input, init]) => String(input) === '/api/auth/sign-out' && init?.method === 'POST')).toBe(true);
  });
});
