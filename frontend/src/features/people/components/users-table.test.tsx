import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { UserDto } from '@understudy/shared-types';
import { describe, expect, it } from 'vitest';
import { USERS, json, meHandler, renderApp, stubApi } from '../../../test/render-app';

const created = '2025-01-10T09:00:00.000Z';
const people: UserDto[] = Object.values(USERS).map((u) => ({
  ...u,
  disabled: false,
  createdAt: created,
  updatedAt: created,
  lastSignInAt: null,
}));

describe('people page', () => {
  it('lists accounts and shows a refused role change next to the row', async () => {
    const fetchMock = stubApi({
      'GET /api/auth/me': meHandler(USERS.admin),
      'GET /api/users': () => json(200, { items: people }),
      'GET /api/invitations': () => json(200, { items: [] }),
      [`PATCH /api/users/${USERS.admin.id}`]: () =>
        json(409, { error: { code: 'last_admin', message: 'You cannot demote the last admin.' } }),
    });
    renderApp('/admin/people');
    const user = userEvent.setup();

    const select = await screen.findByRole('combobox', { name: 'Role for Ada Admin' });
    const rows = screen.getAllByRole('row').slice(1);
    expect(rows.map((row) => within(row).getAllByRole('cell')[0]?.textContent)).toEqual([
      'Ada AdminYou',
      'Eddie Editor',
      'Vera Viewer',
    ]);

    await user.selectOptions(select, 'viewer');

    expect(await screen.findByText('You cannot demote the last admin.')).toBeInTheDocument();
    expect(select).toHaveValue('admin');
    const patch = fetchMock.mock.calls.find(([, init]) => init?.method === 'PATCH');
    expect(patch?.[1]?.body).toBe(JSON.stringify({ role: 'viewer' }));
  });

  it('sorts by a column when its heading is pressed', async () => {
    stubApi({
      'GET /api/auth/me': meHandler(USERS.admin),
      'GET /api/users': () => json(200, { items: people }),
      'GET /api/invitations': () => json(200, { items: [] }),
    });
    renderApp('/admin/people');
    const user = userEvent.setup();
    const table = await screen.findByRole('table', { name: 'People with an Understudy account' });

    await user.click(within(table).getByRole('button', { name: 'Name' }));
    expect(within(table).getByRole('columnheader', { name: 'Name' })).toHaveAttribute('aria-sort', 'descending');
    const names = within(table)
      .getAllByRole('row')
      .slice(1)
      .map((row) => within(row).getAllByRole('cell')[0]?.textContent);
    expect(names).toEqual(['Vera Viewer', 'Eddie Editor', 'Ada AdminYou']);
  });

  it('validates the invitation form with the shared schema before sending', async () => {
    const fetchMock = stubApi({
      'GET /api/auth/me': meHandler(USERS.admin),
      'GET /api/users': () => json(200, { items: people }),
      'GET /api/invitations': () => json(200, { items: [] }),
    });
    renderApp('/admin/people');
    const user = userEvent.setup();
    const form = await screen.findByRole('form', { name: 'Invite someone' });

    await user.type(within(form).getByLabelText('E-mail'), 'not-an-address');
    await user.click(within(form).getByRole('button', { name: 'Send invitation' }));

    expect(within(form).getByLabelText('E-mail')).toHaveAccessibleDescription('Enter a valid e-mail address');
    expect(fetchMock.mock.calls.some(([input, init]) => String(input) === '/api/invitations' && init?.method === 'POST')).toBe(false);
  });
});
