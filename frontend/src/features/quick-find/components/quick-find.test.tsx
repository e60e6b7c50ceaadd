import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { USERS, json, meHandler, renderApp, stubApi } from '../../../test/render-app';
import { listOf, makePart, makePhotoresistor, partId, queriesTo } from '../../../test/parts';

const tl072 = makePart({ id: partId(201), partNumber: 'TL072', description: 'JFET-input dual op amp.', lifecycle: 'active' });
const tl071 = makePart({ id: partId(202), partNumber: 'TL071', description: 'JFET-input op amp.', lifecycle: 'nrnd' });
// The server's order puts a part that mentions the text only in its description first.
const mention = makePart({ id: partId(203), partNumber: 'NW4580', description: 'Drop-in upgrade for a TL072.' });
const cell = makePhotoresistor({ id: partId(204), partNumber: 'LC-5516', description: 'Cell.' });

function options() {
  return within(screen.getByRole('listbox', { name: 'Parts found' })).getAllByRole('option');
}

describe('quick find', () => {
  it('ranks the server candidates with fuse, toward the part number, and opens one with Enter', async () => {
    const fetchMock = stubApi({
      'GET /api/auth/me': meHandler(USERS.viewer),
      'GET /api/parts': () => json(200, listOf([mention, tl071, tl072], 1, 20)),
      [`GET /api/parts/${tl072.id}`]: () => json(200, tl072),
      [`GET /api/parts/${tl072.id}/revisions`]: () => json(200, { items: [] }),
      'GET /api/families': () => json(200, { items: [] }),
    });
    const { router } = renderApp('/');
    const user = userEvent.setup();
    const box = await screen.findByRole('combobox', { name: 'Find a part' });

    await user.keyboard('/');
    expect(box).toHaveFocus();
    await user.keyboard('t');
    // One character is too few to search on.
    expect(box).toHaveAttribute('aria-expanded', 'false');
    await user.keyboard('l072');

    expect(await screen.findByRole('listbox', { name: 'Parts found' })).toBeVisible();
    expect(box).toHaveAttribute('aria-expanded', 'true');
    expect(options().map((o) => o.textContent)).toEqual([
      expect.stringContaining('TL072'),
      expect.stringContaining('TL071'),
      expect.stringContaining('NW4580'),
    ]);
    expect(options()[0]).toHaveTextContent('Northwind Analog · Op amp');
    expect(within(options()[1]!).getByText('NRND')).toBeInTheDocument();
    // Debounced: one request for the whole word, with the candidate page size.
    const queries = queriesTo(fetchMock, '/api/parts');
    expect(queries.map((q) => [q.get('q'), q.get('pageSize')])).toEqual([['tl072', '20']]);

    await user.keyboard('{ArrowDown}');
    expect(options()[0]).toHaveAttribute('aria-selected', 'true');
    expect(box).toHaveAttribute('aria-activedescendant', options()[0]!.id);
    await user.keyboard('{ArrowDown}{ArrowUp}{Enter}');

    await waitFor(() => expect(router.state.location.pathname).toBe(`/parts/${tl072.id}`));
    expect(box).toHaveValue('');
  });

  it('says when nothing matches, and Escape clears the box', async () => {
    stubApi({
      'GET /api/auth/me': meHandler(USERS.editor),
      'GET /api/parts': () => json(200, listOf([], 1, 20)),
    });
    renderApp('/');
    const user = userEvent.setup();
    const box = await screen.findByRole('combobox', { name: 'Find a part' });
    await user.click(box);
    await user.keyboard('zz9');
    expect(await screen.findByText('No parts match')).toBeInTheDocument();
    await user.keyboard('{Escape}');
    expect(box).toHaveValue('');
    expect(screen.queryByText('No parts match')).not.toBeInTheDocument();
  });

  it('keeps server matches fuse cannot place, after the ranked ones', async () => {
    stubApi({
      'GET /api/auth/me': meHandler(USERS.viewer),
      'GET /api/parts': () => json(200, listOf([cell, tl072], 1, 20)),
    });
    renderApp('/');
    const user = userEvent.setup();
    await user.click(await screen.findByRole('combobox', { name: 'Find a part' }));
    await user.keyboard('tl 072');
    await screen.findByRole('listbox', { name: 'Parts found' });
    expect(options().map((o) => o.textContent)).toEqual([expect.stringContaining('TL072'), expect.stringContaining('LC-5516')]);
  });
});
