import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { USERS, json, meHandler, renderApp, stubApi } from '../../../test/render-app';
import { bomId, makeBom, makeSummary } from '../test/fixtures';

const mine = makeBom({
  id: bomId(1),
  name: 'Tremolo rev B',
  lineCount: 30,
  sharedWith: [{ id: USERS.editor.id, name: USERS.editor.name }],
  summary: makeSummary({ lines: 30, ok: 24, obsolete: 3, lastTimeBuy: 1, unmatched: 2, replaced: 2, text: '30 lines: 3 obsolete, 1 last-time buy, 2 not in catalog — 2 replacements chosen' }),
});
const theirs = makeBom({
  id: bomId(2),
  name: 'Phaser 4-stage',
  owner: { id: USERS.editor.id, name: USERS.editor.name },
  sharedWith: [{ id: USERS.viewer.id, name: USERS.viewer.name }],
  lineCount: 12,
  fileName: null,
  summary: makeSummary({ lines: 12, ok: 12, text: '12 lines, all OK' }),
});

function listApi(role: keyof typeof USERS, byScope: Record<string, unknown[]>) {
  return stubApi({
    'GET /api/auth/me': meHandler(USERS[role]),
    'GET /api/notifications': () => json(200, { items: [], unread: 0 }),
    'GET /api/boms': ({ query }) => json(200, { items: byScope[query.get('scope') ?? 'all'] ?? [] }),
  });
}

function rowNamed(name: string) {
  return screen.getByRole('link', { name }).closest('tr')!;
}

describe('the BOM list', () => {
  it('lists my BOMs with owner, lines, coloured counts, last check and sharing', async () => {
    const fetchMock = listApi('viewer', { mine: [mine], shared: [theirs] });
    renderApp('/boms');
    await screen.findByRole('link', { name: 'Tremolo rev B' });
    expect(new URL(String(fetchMock.mock.calls.find(([u]) => String(u).startsWith('/api/boms'))![0]), 'http://x').searchParams.get('scope')).toBe('mine');

    const row = rowNamed('Tremolo rev B');
    expect(within(row).getByRole('link', { name: 'Tremolo rev B' })).toHaveAttribute('href', `/boms/${mine.id}`);
    expect(row).toHaveTextContent('You');
    expect(row).toHaveTextContent('30');
    expect(within(row).getByText('3 obsolete')).toBeInTheDocument();
    expect(within(row).getByText('1 last-time buy')).toBeInTheDocument();
    expect(within(row).getByText('2 not in catalog')).toBeInTheDocument();
    expect(within(row).getByText('2 replacements chosen')).toBeInTheDocument();
    expect(within(row).getByText('Shared with 1')).toBeInTheDocument();

    // A viewer chooses between their own and those shared with them; "All" is for editors and admins.
    const scopes = screen.getByRole('group', { name: 'Which BOMs' });
    expect(within(scopes).getAllByRole('button').map((b) => b.textContent)).toEqual(['Mine', 'Shared with me']);
    await userEvent.setup().click(within(scopes).getByRole('button', { name: 'Shared with me' }));
    const shared = await screen.findByRole('link', { name: 'Phaser 4-stage' });
    const sharedRow = shared.closest('tr')!;
    expect(sharedRow).toHaveTextContent('Eddie Editor');
    expect(within(sharedRow).getByText('Shared with you')).toBeInTheDocument();
    expect(within(sharedRow).getByText('All 12 OK')).toBeInTheDocument();
    expect(within(scopes).getByRole('button', { name: 'Shared with me' })).toHaveAttribute('aria-pressed', 'true');
  });

  it('offers an editor everyone’s BOMs', async () => {
    listApi('editor', { all: [mine, theirs] });
    renderApp('/boms?scope=all');
    await screen.findByRole('link', { name: 'Tremolo rev B' });
    const scopes = screen.getByRole('group', { name: 'Which BOMs' });
    expect(within(scopes).getByRole('button', { name: 'All' })).toHaveAttribute('aria-pressed', 'true');
    expect(rowNamed('Tremolo rev B')).toHaveTextContent('Vera Viewer');
    expect(rowNamed('Phaser 4-stage')).toHaveTextContent('You');
  });

  it('invites a first check when there is none, and says when loading fails', async () => {
    listApi('viewer', { mine: [] });
    const { router } = renderApp('/boms');
    expect(await screen.findByText('No BOMs checked yet')).toBeInTheDocument();
    const ctas = screen.getAllByRole('link', { name: 'Check a BOM' });
    expect(ctas.length).toBeGreaterThan(0);
    await userEvent.setup().click(ctas.at(-1)!);
    await waitFor(() => expect(router.state.location.pathname).toBe('/boms/new'));
  });

  it('shows the server’s reason when the list cannot be loaded', async () => {
    stubApi({
      'GET /api/auth/me': meHandler(USERS.viewer),
      'GET /api/notifications': () => json(200, { items: [], unread: 0 }),
      'GET /api/boms': () => json(500, { error: { code: 'internal', message: 'The database is not answering.' } }),
    });
    renderApp('/boms');
    expect(await screen.findByText('The database is not answering.', {}, { timeout: 10_000 })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });
});
