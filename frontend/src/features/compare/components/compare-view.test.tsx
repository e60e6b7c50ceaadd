import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { USERS, json, meHandler, renderApp, stubApi } from '../../../test/render-app';
import { makePart, makePhotoresistor, partId } from '../../../test/parts';

const a = makePart({ id: partId(401), partNumber: 'NW4580' });
const b = makePart({
  id: partId(402),
  partNumber: 'NW072',
  parameters: { ...a.parameters, slewRate: { typ: 16e6 }, supplyVoltage: { min: 10, max: 36 } },
});
const cellA = makePhotoresistor({ id: partId(403), partNumber: 'LC-5516' });
const cellB = makePhotoresistor({
  id: partId(404),
  partNumber: 'LC-0712',
  parameters: { lightResistance: { min: 50e3, max: 100e3 }, gamma: { typ: 0.85 }, cellMaterial: { value: 'cdse' } },
});

function api(parts: ReturnType<typeof makePart>[]) {
  return stubApi({
    'GET /api/auth/me': meHandler(USERS.viewer),
    ...Object.fromEntries(parts.map((p) => [`GET /api/parts/${p.id}`, () => json(200, p)])),
  });
}

describe('compare', () => {
  it('puts the parts side by side and marks the rows that differ', async () => {
    api([a, b]);
    renderApp(`/compare?ids=${a.id},${b.id}`);
    const table = await screen.findByRole('table', { name: /Parameters side by side/ });
    await within(table).findByRole('link', { name: 'NW072' });
    const row = (name: string) => table.querySelector(`tr[data-row="${name}"]`)!;
    expect(row('parameters.slewRate')).toHaveAttribute('data-differs', 'true');
    expect(row('parameters.slewRate')).toHaveTextContent('Slew rate (values differ)13 V/µsSupply 30 V16 V/µs');
    expect(row('parameters.channels')).not.toHaveAttribute('data-differs');
    expect(row('manufacturer')).not.toHaveAttribute('data-differs');

    const supply = screen.getByRole('img', { name: 'Supply range' });
    expect(supply.querySelectorAll('[data-testid="supply-bar"] rect')).toHaveLength(2);
    expect(screen.getByText('Total span between the rails. 1 of 2 run on 9 V.')).toBeInTheDocument();
    expect(screen.queryByRole('img', { name: 'Resistance against light' })).not.toBeInTheDocument();

    const user = userEvent.setup();
    const marker = screen.getByLabelText('Your supply');
    await user.clear(marker);
    await user.type(marker, '±9 V');
    expect(await screen.findByText('Total span between the rails. 2 of 2 run on 18 V.')).toBeInTheDocument();

    await user.click(screen.getByRole('checkbox', { name: 'Only rows that differ' }));
    expect(table.querySelector('tr[data-row="parameters.channels"]')).toBeNull();
  });

  it('draws the light response of photoresistors and shows the cadmium caution', async () => {
    api([cellA, cellB]);
    renderApp(`/compare?ids=${cellA.id},${cellB.id}`);
    const chart = await screen.findByRole('img', { name: 'Resistance against light' });
    await waitFor(() => expect(chart.querySelectorAll('[data-testid^="light-line-"]')).toHaveLength(2));
    expect(screen.getByRole('note', { name: 'Cadmium caution' })).toBeInTheDocument();
    expect(screen.queryByRole('img', { name: 'Supply range' })).not.toBeInTheDocument();
  });

  it('removes a part from the comparison through the address', async () => {
    api([a, b]);
    const { router } = renderApp(`/compare?ids=${a.id},${b.id}`);
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: 'Remove NW4580 from the comparison' }));
    await waitFor(() => expect(new URLSearchParams(router.state.location.search).get('ids')).toBe(b.id));
  });

  it('says what to do when there is nothing to compare', async () => {
    api([]);
    renderApp('/compare');
    expect(await screen.findByText('Nothing to compare yet')).toBeInTheDocument();
  });
});
