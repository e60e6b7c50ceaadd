import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { OPTO_ESTIMATE_NOTE, type PositionRequirementsInput } from '@understudy/shared-types';
import { describe, expect, it } from 'vitest';
import { makeMatch, makeRequirementSet, makeUnsuitable, positionResultsOf, requirementSetId } from '../../../test/alternates';
import { listOf, makePart, makePhotoresistor, partId } from '../../../test/parts';
import { USERS, callsTo, json, meHandler, renderApp, stubApi } from '../../../test/render-app';

const quiet = makePart({ id: partId(951), partNumber: 'NW4580' });
const slow = makePart({ id: partId(952), partNumber: 'NW-SLOW' });
const results = positionResultsOf(
  [
    makeMatch(quiet, {
      margins: [
        { need: 'slewRate', label: 'Slew rate', needed: 'at least 0.251 V/µs', actual: '13 V/µs', margin: 50.7, ok: true, reason: 'slew rate 13 V/µs is 52× the 0.251 V/µs needed' },
        { need: 'lifecycle', label: 'Lifecycle', needed: 'not obsolete', actual: 'Active', margin: 1, ok: true, reason: 'active' },
      ],
      equivalentOf: [slow.id],
    }),
  ],
  [makeUnsuitable(slow, ['slew rate 0.1 V/µs is short of the 0.251 V/µs needed'])],
);

function rankBodies(fetchMock: ReturnType<typeof stubApi>): PositionRequirementsInput[] {
  return callsTo(fetchMock, 'POST', '/api/alternates/rank').map(([, init]) => JSON.parse(String(init!.body)) as PositionRequirementsInput);
}

function positionsApi(role: keyof typeof USERS, extra: Parameters<typeof stubApi>[0] = {}) {
  return stubApi({
    'GET /api/auth/me': meHandler(USERS[role]),
    'POST /api/alternates/rank': () => json(200, results),
    'GET /api/requirement-sets': () => json(200, { items: [] }),
    ...extra,
  });
}

describe('positions page', () => {
  it('shows the slew rate and LED current the position needs as they are typed, and ranks against them', async () => {
    const fetchMock = positionsApi('viewer');
    renderApp('/positions');
    expect(await screen.findByRole('heading', { level: 1, name: 'Positions' })).toBeInTheDocument();
    const user = userEvent.setup();

    await user.type(screen.getByLabelText('Supply voltage'), '9');
    await user.type(screen.getByLabelText('Peak voltage'), '2');
    await user.type(screen.getByLabelText('Frequency'), '20k');
    // 2π · 20 kHz · 2 V = 251 327 V/s.
    expect(screen.getByText('SR = 2π·f·Vpeak = 0.25 V/µs')).toBeInTheDocument();
    expect(screen.getByText('9 V between the rails.')).toBeInTheDocument();

    await waitFor(() =>
      expect(rankBodies(fetchMock).at(-1)).toEqual({
        family: 'op-amp',
        allowObsolete: false,
        supply: { kind: 'single', volts: 9, halfSupplyBias: false },
        signal: { peakVolts: 2, frequencyHz: 20e3 },
      }),
    );

    await user.type(screen.getByLabelText('Output voltage'), '7');
    await user.type(screen.getByLabelText('LED forward voltage'), '2');
    expect(screen.getByLabelText('Series resistor')).toHaveAccessibleDescription('Fill this in too, or clear the group');
    await user.type(screen.getByLabelText('Series resistor'), '1k');
    expect(screen.getByText('I = (Vout − Vf)/R = 5 mA')).toBeInTheDocument();
    await waitFor(() => expect(rankBodies(fetchMock).at(-1)?.ledLoad).toEqual({ outputVolts: 7, forwardVolts: 2, seriesOhms: 1e3 }));
    // Typing is debounced: one ranking per settled form, not one per keystroke.
    expect(rankBodies(fetchMock).length).toBeLessThan(6);

    const table = await screen.findByRole('table', { name: /Parts ranked against the position/ });
    const row = within(table).getByRole('link', { name: 'NW4580' }).closest('tr')!;
    expect(row.querySelector('td[data-column="need-slewRate"]')).toHaveTextContent('+5070 %, meets it13 V/µs');
    expect(within(row).getByText('Approved equivalent of NW-SLOW')).toBeInTheDocument();
    expect(screen.getByRole('list', { name: 'Not suitable' })).toHaveTextContent('slew rate 0.1 V/µs is short of the 0.251 V/µs needed');

    await user.click(within(row).getByRole('button', { name: 'Details for NW4580' }));
    const margins = screen.getByRole('table', { name: 'How NW4580 meets each requirement' });
    const slewLine = within(margins).getByRole('row', { name: /Slew rate/ });
    expect(slewLine).toHaveTextContent('at least 0.251 V/µs');
    expect(slewLine).toHaveTextContent('slew rate 13 V/µs is 52× the 0.251 V/µs needed');
    expect(within(margins).getByRole('row', { name: /Lifecycle/ })).toHaveTextContent('Active—Yes');
  });

  it('reads a dual supply per rail and derives the resistance range a photocell needs', async () => {
    const fetchMock = positionsApi('viewer');
    renderApp('/positions');
    const user = userEvent.setup();
    await user.click(await screen.findByRole('radio', { name: 'Dual supply' }));
    await user.type(screen.getByLabelText('Each rail (±)'), '15');
    expect(screen.getByText('30 V between the rails.')).toBeInTheDocument();
    await waitFor(() => expect(rankBodies(fetchMock).at(-1)?.supply).toEqual({ kind: 'dual', volts: 30, halfSupplyBias: false }));

    await user.selectOptions(screen.getByLabelText('Family'), 'photoresistor');
    expect(screen.queryByLabelText('Peak voltage')).not.toBeInTheDocument();
    await user.type(screen.getByLabelText('Feedback resistor'), '100k');
    await user.type(screen.getByLabelText('Smallest gain |G|'), '0.5');
    await user.type(screen.getByLabelText('Largest gain |G|'), '10');
    expect(screen.getByText('R = Rf/|G| = 10 kΩ to 200 kΩ')).toBeInTheDocument();
    await waitFor(() =>
      expect(rankBodies(fetchMock).at(-1)).toMatchObject({
        family: 'photoresistor',
        supply: { kind: 'dual', volts: 30 },
        invertingGain: { feedbackOhms: 100e3, gainMin: 0.5, gainMax: 10 },
      }),
    );
  });

  it('saves the position by name and opens it at its own address', async () => {
    const saved = makeRequirementSet({ id: requirementSetId(7), name: 'Tremolo driver', design: '' });
    const fetchMock = positionsApi('viewer', {
      'POST /api/requirement-sets': ({ body }) => json(201, { ...saved, ...(body as object) }),
      [`GET /api/requirement-sets/${saved.id}`]: () => json(200, saved),
      [`GET /api/requirement-sets/${saved.id}/results`]: () => json(200, results),
    });
    const { router } = renderApp('/positions');
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText('Supply voltage'), '9');
    await user.type(screen.getByLabelText('Peak voltage'), '2');
    await user.type(screen.getByLabelText('Frequency'), '20 kHz');

    await user.click(screen.getByRole('button', { name: 'Save position' }));
    expect(screen.getByText('Name this position')).toBeInTheDocument();
    await user.type(screen.getByLabelText('Position name'), 'Tremolo driver');
    await user.click(screen.getByRole('button', { name: 'Save position' }));

    await waitFor(() => expect(callsTo(fetchMock, 'POST', '/api/requirement-sets')).toHaveLength(1));
    expect(JSON.parse(String(callsTo(fetchMock, 'POST', '/api/requirement-sets')[0]![1]!.body))).toEqual({
      name: 'Tremolo driver',
      design: '',
      requirements: {
        family: 'op-amp',
        allowObsolete: false,
        supply: { kind: 'single', volts: 9, halfSupplyBias: false },
        signal: { peakVolts: 2, frequencyHz: 20e3 },
      },
    });
    await waitFor(() => expect(router.state.location.pathname).toBe(`/positions/${saved.id}`));
    expect(await screen.findByText('Saved as “Tremolo driver”. Reopen it from the list to rerun it later.')).toBeInTheDocument();
    expect(screen.getByRole('heading', { level: 1, name: 'Tremolo driver' })).toBeInTheDocument();
  });

  it('reopens a saved position, reruns it, and lets its owner save changes, rename and delete it', async () => {
    const set = makeRequirementSet({ id: requirementSetId(8) });
    let current = set;
    const fetchMock = positionsApi('viewer', {
      'GET /api/requirement-sets': () => json(200, { items: [current] }),
      [`GET /api/requirement-sets/${set.id}`]: () => json(200, current),
      [`GET /api/requirement-sets/${set.id}/results`]: () => json(200, results),
      [`PATCH /api/requirement-sets/${set.id}`]: ({ body }) => {
        current = { ...current, ...(body as object), updatedAt: '2025-03-02T09:00:00.000Z' };
        return json(200, current);
      },
      [`DELETE /api/requirement-sets/${set.id}`]: () => new Response(null, { status: 204 }),
    });
    const { router } = renderApp(`/positions/${set.id}`);
    const user = userEvent.setup();
    expect(await screen.findByRole('heading', { level: 1, name: 'Vibe LFO buffer' })).toBeInTheDocument();
    expect(screen.getByLabelText('Supply voltage')).toHaveValue('9 V');
    expect(screen.getByLabelText('Peak voltage')).toHaveValue('2 V');
    expect(screen.getByLabelText('Frequency')).toHaveValue('20 kHz');
    await screen.findByRole('table', { name: /Parts ranked against the position/ });
    expect(callsTo(fetchMock, 'GET', `/api/requirement-sets/${set.id}/results`)).toHaveLength(1);
    expect(callsTo(fetchMock, 'POST', '/api/alternates/rank')).toHaveLength(0);
    expect(within(screen.getByRole('list', { name: 'Saved positions' })).getByRole('link', { name: /Vibe LFO buffer/ })).toHaveAttribute('aria-current', 'page');

    await user.click(screen.getByRole('button', { name: 'Rerun' }));
    await waitFor(() => expect(callsTo(fetchMock, 'GET', `/api/requirement-sets/${set.id}/results`)).toHaveLength(2));

    const frequency = screen.getByLabelText('Frequency');
    await user.clear(frequency);
    await user.type(frequency, '10 kHz');
    await waitFor(() => expect(rankBodies(fetchMock).at(-1)?.signal).toEqual({ peakVolts: 2, frequencyHz: 10e3 }));
    await user.click(screen.getByRole('button', { name: 'Save changes' }));
    await waitFor(() => expect(callsTo(fetchMock, 'PATCH', `/api/requirement-sets/${set.id}`)).toHaveLength(1));
    expect(JSON.parse(String(callsTo(fetchMock, 'PATCH', `/api/requirement-sets/${set.id}`)[0]![1]!.body)).requirements.signal).toEqual({
      peakVolts: 2,
      frequencyHz: 10e3,
    });

    await user.click(await screen.findByRole('button', { name: 'Rename' }));
    const rename = screen.getByRole('form', { name: 'Rename Vibe LFO buffer' });
    const name = within(rename).getByLabelText('Position name');
    await user.clear(name);
    await user.type(name, 'Vibe buffer, rev D');
    await user.click(within(rename).getByRole('button', { name: 'Save name' }));
    await waitFor(() => expect(callsTo(fetchMock, 'PATCH', `/api/requirement-sets/${set.id}`)).toHaveLength(2));
    expect(JSON.parse(String(callsTo(fetchMock, 'PATCH', `/api/requirement-sets/${set.id}`)[1]![1]!.body))).toEqual({
      name: 'Vibe buffer, rev D',
      design: 'Photocell vibe',
    });
    expect(await screen.findByRole('heading', { level: 1, name: 'Vibe buffer, rev D' })).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Delete' }));
    await user.click(within(screen.getByRole('dialog', { name: 'Delete Vibe buffer, rev D?' })).getByRole('button', { name: 'Delete position' }));
    await waitFor(() => expect(callsTo(fetchMock, 'DELETE', `/api/requirement-sets/${set.id}`)).toHaveLength(1));
    await waitFor(() => expect(router.state.location.pathname).toBe('/positions'));
  });

  it('shows an editor a colleague’s position to rerun or copy, but not to change', async () => {
    const set = makeRequirementSet({ id: requirementSetId(9), owner: { id: USERS.viewer.id, name: USERS.viewer.name } });
    positionsApi('editor', {
      'GET /api/requirement-sets': () => json(200, { items: [set] }),
      [`GET /api/requirement-sets/${set.id}`]: () => json(200, set),
      [`GET /api/requirement-sets/${set.id}/results`]: () => json(200, results),
    });
    renderApp(`/positions/${set.id}`);
    expect(await screen.findByRole('heading', { level: 1, name: 'Vibe LFO buffer' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Rerun' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Rename' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Delete' })).not.toBeInTheDocument();
    expect(screen.getByRole('heading', { name: 'Save as a new position' })).toBeInTheDocument();
    expect(within(await screen.findByRole('list', { name: 'Saved positions' })).getByText(/Vera Viewer/)).toBeInTheDocument();
  });

  it('estimates a home-made optocoupler in the browser, with its assumptions and the bench caveat', async () => {
    const led = makePart({
      id: partId(961),
      family: 'led',
      partNumber: 'LR5-RD',
      manufacturer: { id: '5e1f0000-0000-4000-8000-000000000004', name: 'Lumen Cells' },
      package: 'led-5mm',
      pinLayout: 'led-2lead',
      parameters: {
        peakWavelength: { typ: 630e-9 },
        forwardVoltage: { typ: 2 },
        forwardCurrent: { typ: 20e-3, max: 30e-3 },
        luminousIntensity: { typ: 0.5, conditions: { current: 20e-3 } },
      },
    });
    const cell = makePhotoresistor({ id: partId(962), parameters: { ...makePhotoresistor().parameters, peakWavelength: { typ: 550e-9 } } });
    positionsApi('viewer', {
      'GET /api/parts': ({ query }) => json(200, listOf(query.get('family') === 'led' ? [led] : [cell])),
    });
    renderApp('/positions');
    const user = userEvent.setup();
    const panel = (await screen.findByRole('heading', { name: 'Optocoupler estimate' })).closest('section')!;
    await user.click(await within(panel).findByRole('button', { name: /LR5-RD/ }));
    await user.click(await within(panel).findByRole('button', { name: /LC-5516/ }));

    expect(within(panel).getByTestId('opto-typical').textContent).toMatch(/Ω$/);
    expect(within(panel).getByText(/^range .* to .*Ω$/)).toBeInTheDocument();
    expect(within(panel).getByTestId('opto-gain').textContent).toMatch(/^\d/);
    expect(within(panel).getByText(OPTO_ESTIMATE_NOTE)).toBeInTheDocument();
    expect(within(panel).getByText(/Assumptions \(\d+\)/)).toBeInTheDocument();
    expect(within(panel).getByRole('note', { name: 'Cadmium caution' })).toBeInTheDocument();

    // Moving the LED closer lowers the resistance.
    const before = within(panel).getByTestId('opto-typical').textContent;
    const spacing = within(panel).getByLabelText('Spacing');
    await user.clear(spacing);
    await user.type(spacing, '2');
    expect(within(panel).getByTestId('opto-typical').textContent).not.toBe(before);
  });
});
