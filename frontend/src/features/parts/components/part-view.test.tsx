import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { CADMIUM_CAUTION, CADMIUM_HANDLING_NOTE } from '@understudy/shared-types';
import { describe, expect, it } from 'vitest';
import { USERS, callsTo, json, meHandler, renderApp, stubApi } from '../../../test/render-app';
import { makePart, makePhotoresistor, makeRevision, partId } from '../../../test/parts';

const part = makePart({ id: partId(301) });

function partApi(role: keyof typeof USERS, p = part, extra: Record<string, () => Response> = {}) {
  return stubApi({
    'GET /api/auth/me': meHandler(USERS[role]),
    [`GET /api/parts/${p.id}`]: () => json(200, p),
    [`GET /api/parts/${p.id}/revisions`]: () =>
      json(200, {
        items: [
          makeRevision({
            version: 3,
            changes: [
              { field: 'description', before: 'Old words.', after: p.description },
              { field: 'parameters.slewRate', before: { typ: 9e6 }, after: { typ: 13e6, conditions: { supply: 30 } } },
              { field: 'lifecycle', before: 'nrnd', after: 'active' },
            ],
          }),
          makeRevision({ id: '9b0d0000-0000-4000-8000-000000000002', version: 1, source: 'seed', actor: null, changes: [] }),
        ],
      }),
    ...extra,
  });
}

describe('part page', () => {
  it('shows a viewer the part with no edit controls', async () => {
    partApi('viewer');
    renderApp(`/parts/${part.id}`);
    expect(await screen.findByRole('heading', { level: 1, name: 'NW4580' })).toBeInTheDocument();
    expect(screen.getByText('Northwind Analog')).toBeInTheDocument();
    expect(screen.getByText('RoHS compliant')).toBeInTheDocument();
    expect(screen.queryByRole('link', { name: 'Edit' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Archive' })).not.toBeInTheDocument();

    const slew = screen.getByRole('row', { name: /Slew rate/ });
    expect(within(slew).getAllByRole('cell').map((c) => c.textContent)).toEqual(['—', '13 V/µs', '', 'Supply 30 V']);
    const offset = screen.getByRole('row', { name: /Input offset voltage/ });
    expect(within(offset).getAllByRole('cell').map((c) => c.textContent)).toEqual(['', '0.5 mV', '3 mV', '']);
    expect(screen.getByRole('row', { name: /Input stage/ })).toHaveTextContent('Bipolar');

    const pinout = screen.getByRole('img', { name: /Pinout of NW4580, DIP-8/ });
    expect(pinout.querySelectorAll('[data-pin]')).toHaveLength(8);

    const history = await screen.findByRole('list', { name: 'Revisions' });
    expect(within(history).getByText('Eddie Editor')).toBeInTheDocument();
    const slewChange = history.querySelector('[data-field="parameters.slewRate"]')!;
    expect(slewChange).toHaveTextContent('Slew rate: typ 9 V/µs→ changed to typ 13 V/µs (Supply 30 V)');
    expect(history.querySelector('[data-field="lifecycle"]')).toHaveTextContent(
      'Lifecycle: Not recommended for new designs→ changed to Active',
    );
    expect(within(history).getByText('Added to the catalog.')).toBeInTheDocument();
  });

  it('gives an editor Edit and Archive, and archives after confirmation', async () => {
    const fetchMock = partApi('editor', part, {
      [`DELETE /api/parts/${part.id}`]: () => json(200, { ...part, archived: true, version: 4 }),
    });
    renderApp(`/parts/${part.id}`);
    const user = userEvent.setup();
    expect(await screen.findByRole('link', { name: 'Edit' })).toHaveAttribute('href', `/parts/${part.id}/edit`);
    await user.click(screen.getByRole('button', { name: 'Archive' }));
    const dialog = screen.getByRole('dialog', { name: 'Archive NW4580?' });
    await user.click(within(dialog).getByRole('button', { name: 'Archive part' }));
    expect(await screen.findByText('This part no longer appears in catalog searches.', { exact: false })).toBeInTheDocument();
    expect(callsTo(fetchMock, 'DELETE', `/api/parts/${part.id}`)).toHaveLength(1);
    await waitFor(() => expect(screen.queryByRole('link', { name: 'Edit' })).not.toBeInTheDocument());
  });

  it('shows the cadmium caution and handling note for a cadmium cell', async () => {
    const cell = makePhotoresistor({ id: partId(302) });
    partApi('viewer', cell);
    renderApp(`/parts/${cell.id}`);
    const note = await screen.findByRole('note', { name: 'Cadmium caution' });
    expect(note).toHaveTextContent(CADMIUM_CAUTION);
    expect(note).toHaveTextContent(CADMIUM_HANDLING_NOTE);
    expect(screen.getByText('Cadmium exemption; check it still applies.')).toBeInTheDocument();
  });

  it('explains a part that does not exist', async () => {
    stubApi({ 'GET /api/auth/me': meHandler(USERS.viewer) });
    renderApp(`/parts/${partId(399)}`);
    expect(await screen.findByText('There is no such part')).toBeInTheDocument();
  });
});
