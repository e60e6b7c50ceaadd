import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { USERS, json, meHandler, renderApp, stubApi } from '../../../test/render-app';
import { listOf, makePart, makePhotoresistor, partId, queriesTo } from '../../../test/parts';

const first = makePart({ id: partId(101), partNumber: 'NW4580' });
const second = makePart({
  id: partId(102),
  partNumber: 'NW072',
  lifecycle: 'nrnd',
  rohsStatus: 'unknown',
  parameters: { slewRate: { min: 8e6 }, supplyVoltage: { min: 7, max: 36 }, gainBandwidth: { typ: 3e6 } },
});

function cell(row: HTMLElement, column: string): HTMLElement {
  const td = row.querySelector<HTMLElement>(`td[data-column="${column}"]`);
  if (!td) throw new Error(`No ${column} cell`);
  return td;
}

function bodyRows(): HTMLElement[] {
  return within(screen.getByRole('table', { name: /Catalog results/ })).getAllByRole('row').slice(1);
}

describe('catalog results', () => {
  it('shows parameters in engineering notation with their display units, and the total', async () => {
    stubApi({
      'GET /api/auth/me': meHandler(USERS.viewer),
      'GET /api/parts': () => json(200, listOf([first, second], 1, 50, 2)),
    });
    renderApp('/parts?family=op-amp');

    await screen.findByRole('table', { name: /Catalog results/ });
    const [a, b] = bodyRows();
    expect(cell(a!, 'slewRate')).toHaveTextContent('13 V/µs');
    expect(cell(a!, 'supplyVoltage')).toHaveTextContent('4 V – 36 V');
    expect(cell(a!, 'gainBandwidth')).toHaveTextContent('10 MHz');
    expect(cell(a!, 'inputNoiseDensity')).toHaveTextContent('4 nV/√Hz');
    expect(cell(a!, 'inputOffsetVoltage')).toHaveTextContent('0.5 mV');
    // A value quoted only as a minimum says so.
    expect(cell(b!, 'slewRate')).toHaveTextContent('8 V/µsmin');
    expect(within(cell(a!, 'lifecycle')).getByText('Active')).toBeInTheDocument();
    expect(within(cell(b!, 'lifecycle')).getByTitle('Not recommended for new designs')).toHaveTextContent('NRND');
    expect(within(cell(a!, 'rohs')).getByText('RoHS compliant')).toBeInTheDocument();
    expect(screen.getByText('2 parts')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Export CSV' })).toHaveAttribute('href', '/api/parts/export?family=op-amp&format=csv');
  });

  it('marks cadmium cells in the list', async () => {
    stubApi({
      'GET /api/auth/me': meHandler(USERS.viewer),
      'GET /api/parts': () => json(200, listOf([makePhotoresistor()])),
    });
    renderApp('/parts?family=photoresistor');
    await screen.findByRole('table', { name: /Catalog results/ });
    const [row] = bodyRows();
    expect(within(cell(row!, 'partNumber')).getByRole('img', { name: 'Contains cadmium' })).toBeInTheDocument();
    expect(cell(row!, 'lightResistance')).toHaveTextContent('8 kΩ – 20 kΩ');
    expect(cell(row!, 'gamma')).toHaveTextContent('0.7');
  });

  it('moves between rows with the arrow keys, picks with Space and opens with Enter', async () => {
    stubApi({
      'GET /api/auth/me': meHandler(USERS.viewer),
      'GET /api/parts': () => json(200, listOf([first, second])),
      [`GET /api/parts/${second.id}`]: () => json(200, second),
      [`GET /api/parts/${second.id}/revisions`]: () => json(200, { items: [] }),
    });
    const { router } = renderApp('/parts?family=op-amp');
    const user = userEvent.setup();
    await screen.findByRole('table', { name: /Catalog results/ });
    const [a, b] = bodyRows();

    a!.focus();
    await user.keyboard(' ');
    expect(within(a!).getByRole('checkbox', { name: 'Compare NW4580' })).toBeChecked();
    await user.keyboard('{ArrowDown}');
    expect(b).toHaveFocus();
    await user.keyboard(' ');
    expect(within(b!).getByRole('checkbox', { name: 'Compare NW072' })).toBeChecked();
    expect(screen.getByRole('button', { name: 'Compare (2)' })).toBeEnabled();
    await user.keyboard('{ArrowUp}');
    expect(a).toHaveFocus();
    await user.keyboard('{ArrowDown}{Enter}');
    await waitFor(() => expect(router.state.location.pathname).toBe(`/parts/${second.id}`));
  });

  it('opens the comparison with the ticked parts in the address', async () => {
    stubApi({
      'GET /api/auth/me': meHandler(USERS.viewer),
      'GET /api/parts': () => json(200, listOf([first, second])),
      [`GET /api/parts/${first.id}`]: () => json(200, first),
      [`GET /api/parts/${second.id}`]: () => json(200, second),
    });
    const { router } = renderApp('/parts?family=op-amp');
    const user = userEvent.setup();
    await user.click(await screen.findByRole('checkbox', { name: 'Compare NW4580' }));
    expect(screen.getByRole('button', { name: 'Compare (1)' })).toBeDisabled();
    await user.click(screen.getByRole('checkbox', { name: 'Compare NW072' }));
    await user.click(screen.getByRole('button', { name: 'Compare (2)' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/compare'));
    expect(new URLSearchParams(router.state.location.search).get('ids')).toBe(`${first.id},${second.id}`);
  });

  it('sorts on the server by the column heading pressed', async () => {
    const fetchMock = stubApi({
      'GET /api/auth/me': meHandler(USERS.viewer),
      'GET /api/parts': () => json(200, listOf([first, second])),
    });
    const { router } = renderApp('/parts?family=op-amp');
    const user = userEvent.setup();
    const table = await screen.findByRole('table', { name: /Catalog results/ });
    await user.click(within(table).getByRole('button', { name: 'Slew rate' }));
    await waitFor(() => expect(new URLSearchParams(router.state.location.search).get('sort')).toBe('slewRate'));
    expect(within(table).getByRole('columnheader', { name: 'Slew rate' })).toHaveAttribute('aria-sort', 'ascending');
    await user.click(within(table).getByRole('button', { name: 'Slew rate' }));
    await waitFor(() => expect(queriesTo(fetchMock, '/api/parts').at(-1)!.get('sort')).toBe('-slewRate'));
  });

  it('remembers the chosen columns per family', async () => {
    stubApi({
      'GET /api/auth/me': meHandler(USERS.viewer),
      'GET /api/parts': () => json(200, listOf([first])),
    });
    const { unmount } = renderApp('/parts?family=op-amp');
    const user = userEvent.setup();
    const table = await screen.findByRole('table', { name: /Catalog results/ });
    expect(within(table).queryByRole('columnheader', { name: 'Output current' })).not.toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: /Columns/ }));
    await user.click(screen.getByRole('checkbox', { name: 'Output current' }));
    await user.click(screen.getByRole('checkbox', { name: 'Gain-bandwidth' }));
    expect(within(table).getByRole('columnheader', { name: 'Output current' })).toBeInTheDocument();
    expect(within(table).queryByRole('columnheader', { name: 'Gain-bandwidth' })).not.toBeInTheDocument();
    unmount();

    renderApp('/parts?family=op-amp');
    const again = await screen.findByRole('table', { name: /Catalog results/ });
    expect(within(again).getByRole('columnheader', { name: 'Output current' })).toBeInTheDocument();
    expect(within(again).queryByRole('columnheader', { name: 'Gain-bandwidth' })).not.toBeInTheDocument();
  });

  it('lists the filters in force when nothing matches, each removable', async () => {
    stubApi({
      'GET /api/auth/me': meHandler(USERS.viewer),
      'GET /api/parts': () => json(200, listOf([], 1, 50, 0)),
    });
    const { router } = renderApp('/parts?family=op-amp&slewRate.min=500&supplyVoltage.covers=3&lifecycle=obsolete');
    const user = userEvent.setup();
    expect(await screen.findByText('No parts match — loosen a filter')).toBeInTheDocument();
    const chips = screen.getByRole('list', { name: 'Active filters' });
    expect(within(chips).getAllByRole('button').map((b) => b.textContent)).toEqual([
      'Obsolete',
      'Supply range runs on 3 V',
      'Slew rate ≥ 500 V/µs',
    ]);
    await user.click(within(chips).getByRole('button', { name: 'Remove filter: Slew rate ≥ 500 V/µs' }));
    await waitFor(() => expect(new URLSearchParams(router.state.location.search).has('slewRate.min')).toBe(false));
    expect(new URLSearchParams(router.state.location.search).get('supplyVoltage.covers')).toBe('3');
  });

  it('pages through results with the page in the address', async () => {
    const fetchMock = stubApi({
      'GET /api/auth/me': meHandler(USERS.viewer),
      'GET /api/parts': () => json(200, listOf([first, second], 1, 25, 60)),
    });
    const { router } = renderApp('/parts?family=op-amp&pageSize=25');
    const user = userEvent.setup();
    expect(await screen.findByText('Page 1 of 3')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Next' }));
    await waitFor(() => expect(new URLSearchParams(router.state.location.search).get('page')).toBe('2'));
    await waitFor(() => expect(queriesTo(fetchMock, '/api/parts').at(-1)!.get('page')).toBe('2'));
  });
});
