import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { USERS, json, meHandler, renderApp, stubApi } from '../../../test/render-app';
import { listOf, makePart, queriesTo } from '../../../test/parts';

function catalogApi(extra: Record<string, () => Response> = {}) {
  return stubApi({
    'GET /api/auth/me': meHandler(USERS.viewer),
    'GET /api/parts': () => json(200, listOf([makePart()])),
    ...extra,
  });
}

const lastQuery = (fetchMock: ReturnType<typeof stubApi>) => queriesTo(fetchMock, '/api/parts').at(-1)!;

describe('catalog filters', () => {
  it('writes engineering-notation filters into the address and sends them in the API’s own terms', async () => {
    const fetchMock = catalogApi();
    const { router } = renderApp('/parts');
    const user = userEvent.setup();

    await user.click(await screen.findByRole('tab', { name: 'Op amps' }));
    expect(screen.getByRole('tab', { name: 'Op amps' })).toHaveAttribute('aria-selected', 'true');
    await waitFor(() => expect(router.state.location.search).toBe('?family=op-amp'));

    // A bare number is in the unit shown beside the box.
    await user.type(screen.getByLabelText('Slew rate min'), '5');
    expect(await screen.findByText('= 5 V/µs')).toBeInTheDocument();
    // A dual supply is read as the span between its rails.
    await user.type(screen.getByLabelText('Supply range runs on'), '±4.5 V');
    expect(await screen.findByText('= 9 V span')).toBeInTheDocument();
    await user.type(screen.getByLabelText('Gain-bandwidth min'), '3meg');

    await waitFor(() => {
      const search = new URLSearchParams(router.state.location.search);
      expect(search.get('slewRate.min')).toBe('5');
      expect(search.get('supplyVoltage.covers')).toBe('±4.5 V');
      expect(search.get('gainBandwidth.min')).toBe('3meg');
    });
    await waitFor(() => {
      const q = lastQuery(fetchMock);
      expect(q.get('family')).toBe('op-amp');
      expect(q.get('slewRate.min')).toBe('5 V/µs');
      expect(q.get('supplyVoltage.min')).toBe('9 V');
      expect(q.get('supplyVoltage.max')).toBe('9 V');
      expect(q.get('gainBandwidth.min')).toBe('3 MHz');
    });

    await user.click(screen.getByText(/More parameters/));
    await user.click(screen.getByRole('checkbox', { name: 'JFET' }));
    await user.click(screen.getByRole('checkbox', { name: 'CMOS' }));
    const railToRail = screen.getByRole('group', { name: 'Rail-to-rail output' });
    await user.click(within(railToRail).getByRole('radio', { name: 'Yes' }));
    await user.click(screen.getByRole('checkbox', { name: 'Active' }));

    await waitFor(() => {
      const q = lastQuery(fetchMock);
      expect(q.get('inputStage')).toBe('jfet,cmos');
      expect(q.get('railToRailOutput')).toBe('true');
      expect(q.get('lifecycle')).toBe('active');
    });
    const search = new URLSearchParams(router.state.location.search);
    expect(search.get('inputStage')).toBe('jfet,cmos');
    expect(search.get('railToRailOutput')).toBe('true');
  });

  it('reads every filter back from the address, as after a reload or from a shared link', async () => {
    const fetchMock = catalogApi();
    renderApp(
      '/parts?family=op-amp&q=quiet&slewRate.min=5V%2Fus&supplyVoltage.covers=9&inputStage=jfet,cmos&railToRailOutput=false&lifecycle=active,nrnd&rohs=compliant',
    );

    expect(await screen.findByLabelText('Slew rate min')).toHaveValue('5V/us');
    expect(screen.getByLabelText('Supply range runs on')).toHaveValue('9');
    expect(screen.getByLabelText('Search the catalog')).toHaveValue('quiet');
    expect(screen.getByRole('tab', { name: 'Op amps' })).toHaveAttribute('aria-selected', 'true');
    expect(screen.getByRole('checkbox', { name: 'JFET' })).toBeChecked();
    expect(screen.getByRole('checkbox', { name: 'CMOS' })).toBeChecked();
    expect(screen.getByRole('checkbox', { name: 'Bipolar' })).not.toBeChecked();
    expect(within(screen.getByRole('group', { name: 'Rail-to-rail output' })).getByRole('radio', { name: 'No' })).toBeChecked();
    expect(screen.getByRole('checkbox', { name: 'Active' })).toBeChecked();
    expect(screen.getByRole('checkbox', { name: 'Not recommended for new designs' })).toBeChecked();
    expect(screen.getByRole('checkbox', { name: 'RoHS compliant' })).toBeChecked();
    // A parameter hidden under "More parameters" opens its section when it is in use.
    expect(screen.getByText(/More parameters/).closest('details')).toHaveAttribute('open');

    await waitFor(() => {
      const q = lastQuery(fetchMock);
      expect(q.get('slewRate.min')).toBe('5 V/µs');
      expect(q.get('supplyVoltage.min')).toBe('9 V');
      expect(q.get('supplyVoltage.max')).toBe('9 V');
      expect(q.get('q')).toBe('quiet');
      expect(q.get('rohs')).toBe('compliant');
      expect(q.get('lifecycle')).toBe('active,nrnd');
    });
  });

  it('shows an unreadable bound beside its box and leaves it out of the search', async () => {
    const fetchMock = catalogApi();
    renderApp('/parts?family=op-amp&slewRate.min=fast&gainBandwidth.min=1%20MHz');
    const box = await screen.findByLabelText('Slew rate min');
    expect(box).toHaveAttribute('aria-invalid', 'true');
    expect(box).toHaveAccessibleDescription(/"fast" is not a number engineers write/);
    await waitFor(() => expect(lastQuery(fetchMock).get('gainBandwidth.min')).toBe('1 MHz'));
    expect(lastQuery(fetchMock).has('slewRate.min')).toBe(false);
    expect(await screen.findByRole('button', { name: 'Remove filter: Slew rate ≥ fast' })).toHaveTextContent('(not applied)');
  });

  it('puts the server’s complaint about a bound beside that box', async () => {
    catalogApi({
      'GET /api/parts': () =>
        json(400, {
          error: {
            code: 'validation_failed',
            message: 'Some filters could not be read',
            issues: [{ path: 'query.slewRate.max', message: 'Slew rate max is below min' }],
          },
        }),
    });
    renderApp('/parts?family=op-amp&slewRate.min=20&slewRate.max=3');
    expect(await screen.findByText('Slew rate max is below min')).toBeInTheDocument();
    expect(screen.getByLabelText('Slew rate max')).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByText('Some filters could not be read')).toBeInTheDocument();
  });

  it('drops the old family’s filters when the family changes, and keeps the text search', async () => {
    catalogApi();
    const { router } = renderApp('/parts?family=op-amp&q=dual&slewRate.min=5&sort=-slewRate');
    const user = userEvent.setup();
    await user.click(await screen.findByRole('tab', { name: 'Photoresistors' }));
    await waitFor(() =>
      expect(Object.fromEntries(new URLSearchParams(router.state.location.search))).toEqual({ family: 'photoresistor', q: 'dual' }),
    );
    expect(await screen.findByLabelText('Gamma min')).toHaveValue('');
  });
});
