import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { AlternatesResponse } from '@understudy/shared-types';
import { describe, expect, it } from 'vitest';
import { alternatesOf, breakdownLine, makeEquivalent, makeRanked, makeUnsuitable } from '../../../test/alternates';
import { listOf, makePart, makePhotoresistor, makeRevision, partId, queriesTo } from '../../../test/parts';
import { USERS, callsTo, json, meHandler, renderApp, stubApi } from '../../../test/render-app';

const original = makePart({ id: partId(901), partNumber: 'NW2040', lifecycle: 'obsolete', description: 'An old general-purpose dual.' });
const quiet = makePart({ id: partId(902), partNumber: 'NW4580' });
const fast = makePart({
  id: partId(903),
  partNumber: 'QX-072S',
  manufacturer: { id: '5e1f0000-0000-4000-8000-000000000003', name: 'Quillwork Devices' },
  package: 'SOIC-8',
});
const lowVolt = makePart({ id: partId(904), partNumber: 'LV-6002', parameters: { supplyVoltage: { min: 1.8, max: 6 } } });

const quietRow = makeRanked(quiet, {
  score: 86.4,
  equivalent: makeEquivalent({ partId: original.id, equivalentId: quiet.id, use: 'fuzz gain stage', note: 'Checked on the bench.' }),
  breakdown: [
    breakdownLine({ criterion: 'noise', label: 'Noise', original: '10 nV/√Hz', candidate: '4 nV/√Hz', points: 0, maxPoints: 8, reason: 'quieter than the original, no loss' }),
  ],
});
const fastRow = makeRanked(fast, {
  score: 72,
  pinout: {
    class: 'adapter',
    packageChange: { from: 'DIP-8', to: 'SOIC-8' },
    differingPins: ['4', '8'],
    summary: 'The same functions, but the supply pins swap places.',
  },
  breakdown: [
    breakdownLine({ criterion: 'slewRate', label: 'Slew rate', original: '1.7 V/µs', candidate: '13 V/µs', points: 0, reason: 'faster than the original, no loss' }),
    breakdownLine({ criterion: 'pinout', label: 'Pinout', original: 'Dual op amp, 8 pins', candidate: 'Own pin map', points: -12.5, maxPoints: 25, reason: 'needs an adapter: pins 4 and 8 swap' }),
  ],
});

/** Two answers: by default the quiet one first; with slew rate weighted up, the fast one first. */
function answerFor(query: URLSearchParams): AlternatesResponse {
  const unsuitable = [makeUnsuitable(lowVolt, ['supply range 1.8 V – 6 V does not reach 9 V'])];
  const weights = query.get('weights') ?? '';
  if (weights.includes('slewRate:5')) return alternatesOf(original, [{ ...fastRow, score: 91 }, { ...quietRow, score: 70 }], unsuitable);
  return alternatesOf(original, [quietRow, fastRow], unsuitable);
}

function alternatesApi(role: keyof typeof USERS, extra: Record<string, Parameters<typeof stubApi>[0][string]> = {}) {
  return stubApi({
    'GET /api/auth/me': meHandler(USERS[role]),
    [`GET /api/parts/${original.id}`]: () => json(200, original),
    [`GET /api/parts/${original.id}/alternates`]: ({ query }) => json(200, answerFor(query)),
    [`GET /api/parts/${original.id}/equivalents`]: () => json(200, { items: [quietRow.equivalent] }),
    ...extra,
  });
}

function resultRows() {
  const table = screen.getByRole('table', { name: /Alternates for NW2040/ });
  return within(table)
    .getAllByRole('row')
    .filter((row) => row.hasAttribute('data-row-id'));
}

function scoreIn(row: HTMLElement) {
  return row.querySelector('td[data-column="score"]')?.textContent;
}

function partNumbersInOrder() {
  return resultRows().map((row) => within(row).getAllByRole('link')[0]!.textContent);
}

async function openPage(path = `/parts/${original.id}/alternates`) {
  const utils = renderApp(path);
  await screen.findByRole('heading', { level: 1, name: 'Alternates for NW2040' });
  await screen.findByRole('table', { name: /Alternates for NW2040/ });
  return utils;
}

describe('alternates page', () => {
  it('ranks the candidates with scores, pinout classes, lifecycle and rulings, and lists the unsuitable apart', async () => {
    alternatesApi('viewer');
    await openPage();
    expect(screen.getByText('Obsolete')).toBeInTheDocument();

    expect(partNumbersInOrder()).toEqual(['NW4580', 'QX-072S']);
    const [first, second] = resultRows();
    expect(within(first!).getByText('1')).toBeInTheDocument();
    expect(scoreIn(first!)).toBe('86 out of 100');
    expect(within(first!).getByText('Drop-in')).toBeInTheDocument();
    expect(within(first!).getByText('Approved for fuzz gain stage')).toBeInTheDocument();
    expect(within(first!).getByRole('link', { name: 'NW4580' })).toHaveAttribute('href', `/parts/${quiet.id}`);
    expect(within(second!).getByText('Same pins, other places')).toBeInTheDocument();
    expect(scoreIn(second!)).toBe('72 out of 100');

    // A viewer sees rulings but cannot make them.
    expect(screen.queryByRole('button', { name: /Mark approved/ })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Edit ruling/ })).not.toBeInTheDocument();

    const unsuitable = screen.getByRole('list', { name: 'Not suitable' });
    expect(within(unsuitable).getByRole('link', { name: 'LV-6002' })).toBeInTheDocument();
    expect(within(unsuitable).getByText('supply range 1.8 V – 6 V does not reach 9 V')).toBeInTheDocument();
    expect(within(screen.getByRole('table', { name: /Alternates for NW2040/ })).queryByText('LV-6002')).not.toBeInTheDocument();

    // Every shown candidate's supply range against the original's.
    const chart = screen.getByRole('img', { name: 'Supply range of the candidates' });
    expect(chart.querySelectorAll('[data-testid="supply-bar"]')).toHaveLength(3);
  });

  it('opens a row by keyboard to show where its points went and how its pins differ', async () => {
    alternatesApi('viewer');
    await openPage();
    const user = userEvent.setup();
    const toggle = screen.getByRole('button', { name: 'Details for QX-072S' });
    expect(toggle).toHaveAttribute('aria-expanded', 'false');
    toggle.focus();
    await user.keyboard('{Enter}');
    expect(toggle).toHaveAttribute('aria-expanded', 'true');

    const breakdown = screen.getByRole('table', { name: 'Why QX-072S scores 72' });
    const pinoutLine = within(breakdown).getByRole('row', { name: /Pinout/ });
    expect(pinoutLine).toHaveTextContent('needs an adapter: pins 4 and 8 swap');
    expect(pinoutLine).toHaveTextContent('−12.5 of 25');
    expect(within(breakdown).getByRole('row', { name: /Slew rate/ })).toHaveTextContent('faster than the original, no loss');

    expect(screen.getByText(/Package change:/).parentElement).toHaveTextContent('Package change: DIP-8 → SOIC-8');
    const originalPins = screen.getByRole('img', { name: /Pinout of NW2040/ });
    const candidatePins = screen.getByRole('img', { name: /Pinout of QX-072S/ });
    for (const svg of [originalPins, candidatePins]) {
      expect([...svg.querySelectorAll('[data-highlighted]')].map((g) => g.getAttribute('data-pin'))).toEqual(['4', '8']);
    }

    await user.keyboard(' ');
    expect(toggle).toHaveAttribute('aria-expanded', 'false');
    expect(screen.queryByRole('table', { name: 'Why QX-072S scores 72' })).not.toBeInTheDocument();
  });

  it('re-ranks when a weight moves: the new weights go to the server and into the address, and the order follows', async () => {
    const fetchMock = alternatesApi('viewer');
    const { router } = await openPage();
    expect(queriesTo(fetchMock, `/api/parts/${original.id}/alternates`)[0]!.get('weights')).toBeNull();

    const slider = screen.getByRole('slider', { name: 'Slew rate' });
    expect(slider).toHaveValue('2');
    fireEvent.change(slider, { target: { value: '5' } });
    expect(slider).toHaveValue('5');
    expect(new URLSearchParams(router.state.location.search).get('weights')).toBe('slewRate:5');

    await waitFor(() => expect(partNumbersInOrder()).toEqual(['QX-072S', 'NW4580']));
    const sent = queriesTo(fetchMock, `/api/parts/${original.id}/alternates`);
    expect(sent.at(-1)!.get('weights')).toBe('slewRate:5');
    // One request for the settled position, not one per render.
    expect(sent.filter((q) => q.get('weights') === 'slewRate:5')).toHaveLength(1);
    expect(scoreIn(resultRows()[0]!)).toBe('91 out of 100');
  });

  it('opens with the weights in its address and resets them to the defaults', async () => {
    const fetchMock = alternatesApi('viewer');
    const { router } = await openPage(`/parts/${original.id}/alternates?weights=slewRate:5,noise:0`);
    expect(screen.getByRole('slider', { name: 'Slew rate' })).toHaveValue('5');
    expect(screen.getByRole('slider', { name: 'Noise' })).toHaveValue('0');
    await waitFor(() => expect(partNumbersInOrder()).toEqual(['QX-072S', 'NW4580']));

    await userEvent.setup().click(screen.getByRole('button', { name: 'Reset weights' }));
    expect(screen.getByRole('slider', { name: 'Slew rate' })).toHaveValue('2');
    expect(screen.getByRole('slider', { name: 'Noise' })).toHaveValue('2');
    expect(router.state.location.search).toBe('');
    await waitFor(() => expect(partNumbersInOrder()).toEqual(['NW4580', 'QX-072S']));
    expect(queriesTo(fetchMock, `/api/parts/${original.id}/alternates`).at(-1)!.get('weights')).toBeNull();
    expect(screen.getByRole('button', { name: 'Reset weights' })).toBeDisabled();
  });

  it('sends the supply and the switches, refusing a supply it cannot read', async () => {
    const fetchMock = alternatesApi('viewer');
    const { router } = await openPage();
    const user = userEvent.setup();
    const supply = screen.getByLabelText('Operating supply');
    await user.type(supply, '±15 V');
    await waitFor(() => expect(queriesTo(fetchMock, `/api/parts/${original.id}/alternates`).at(-1)!.get('supply')).toBe('±15 V'));
    expect(screen.getByText('Candidates must run on 30 V between the rails.')).toBeInTheDocument();

    await user.click(screen.getByLabelText('Drop-in only'));
    await user.click(screen.getByLabelText('Include obsolete'));
    await waitFor(() => {
      const last = queriesTo(fetchMock, `/api/parts/${original.id}/alternates`).at(-1)!;
      expect(last.get('requireDropIn')).toBe('1');
      expect(last.get('allowObsolete')).toBe('1');
    });
    const search = new URLSearchParams(router.state.location.search);
    expect([search.get('supply'), search.get('requireDropIn'), search.get('allowObsolete')]).toEqual(['±15 V', '1', '1']);

    const before = queriesTo(fetchMock, `/api/parts/${original.id}/alternates`).length;
    await user.clear(supply);
    await user.type(supply, 'lots');
    expect(supply).toHaveAttribute('aria-invalid', 'true');
    await new Promise((resolve) => setTimeout(resolve, 400));
    expect(queriesTo(fetchMock, `/api/parts/${original.id}/alternates`).slice(before).every((q) => q.get('supply') === '±15 V' || q.get('supply') === null)).toBe(true);
  });

  it('compares the ticked candidates with the original', async () => {
    alternatesApi('viewer');
    await openPage();
    const user = userEvent.setup();
    await user.click(screen.getByRole('checkbox', { name: 'Compare NW4580' }));
    await user.click(screen.getByRole('checkbox', { name: 'Compare QX-072S' }));
    expect(screen.getByRole('link', { name: 'Compare (2)' })).toHaveAttribute('href', `/compare?ids=${original.id},${quiet.id},${fast.id}`);
  });

  it('lets an editor approve a candidate for a use, and change or remove a ruling', async () => {
    const fetchMock = alternatesApi('editor', {
      'POST /api/equivalents': ({ body }) =>
        json(201, makeEquivalent({ id: '4e0a0000-0000-4000-8000-000000000009', ...(body as object), decidedBy: { id: USERS.editor.id, name: USERS.editor.name } })),
      'DELETE /api/equivalents/4e0a0000-0000-4000-8000-000000000001': () => new Response(null, { status: 204 }),
    });
    await openPage();
    const user = userEvent.setup();

    await user.click(screen.getByRole('button', { name: 'Mark approved… QX-072S' }));
    const dialog = screen.getByRole('dialog', { name: 'Approve QX-072S for NW2040' });
    await user.click(within(dialog).getByRole('button', { name: 'Save ruling' }));
    expect(within(dialog).getByText('Say what use this ruling is for')).toBeInTheDocument();
    await user.type(within(dialog).getByLabelText('For what use'), 'tremolo LFO');
    await user.type(within(dialog).getByLabelText(/Note/), 'Fits with a socket adapter.');
    await user.click(within(dialog).getByRole('button', { name: 'Save ruling' }));

    await waitFor(() => expect(callsTo(fetchMock, 'POST', '/api/equivalents')).toHaveLength(1));
    expect(JSON.parse(String(callsTo(fetchMock, 'POST', '/api/equivalents')[0]![1]!.body))).toEqual({
      partId: original.id,
      equivalentId: fast.id,
      status: 'approved',
      use: 'tremolo LFO',
      note: 'Fits with a socket adapter.',
    });
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    // The ranking is asked again, so the server can move the approved one up.
    await waitFor(() => expect(queriesTo(fetchMock, `/api/parts/${original.id}/alternates`).length).toBeGreaterThan(1));

    expect(screen.getByRole('button', { name: 'Edit ruling NW4580' })).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Remove ruling NW4580' }));
    await user.click(within(screen.getByRole('dialog', { name: 'Remove the ruling on NW4580?' })).getByRole('button', { name: 'Remove ruling' }));
    await waitFor(() => expect(callsTo(fetchMock, 'DELETE', '/api/equivalents/4e0a0000-0000-4000-8000-000000000001')).toHaveLength(1));
  });

  it('says so when nothing qualifies, and when the server refuses the request', async () => {
    let answer: () => Response = () => json(200, alternatesOf(original, [], [makeUnsuitable(lowVolt, ['is obsolete'])]));
    stubApi({
      'GET /api/auth/me': meHandler(USERS.viewer),
      [`GET /api/parts/${original.id}`]: () => json(200, original),
      [`GET /api/parts/${original.id}/alternates`]: () => answer(),
      [`GET /api/parts/${original.id}/equivalents`]: () => json(200, { items: [] }),
    });
    renderApp(`/parts/${original.id}/alternates?requireDropIn=1`);
    expect(await screen.findByText('No alternates found')).toBeInTheDocument();
    expect(screen.getByRole('list', { name: 'Not suitable' })).toHaveTextContent('is obsolete');
    answer = () => json(400, { error: { code: 'bad_request', message: 'The supply "lots" is not a voltage.' } });
    await userEvent.setup().click(screen.getByRole('button', { name: 'Allow other pinouts' }));
    expect(await screen.findByText(/The supply "lots" is not a voltage\./)).toBeInTheDocument();
  });

  it('is reached from the part page', async () => {
    stubApi({
      'GET /api/auth/me': meHandler(USERS.viewer),
      [`GET /api/parts/${original.id}`]: () => json(200, original),
      [`GET /api/parts/${original.id}/revisions`]: () => json(200, { items: [makeRevision()] }),
      'GET /api/datasheets': () => json(200, { items: [] }),
    });
    renderApp(`/parts/${original.id}`);
    const link = await screen.findByRole('link', { name: 'Alternates for NW2040' });
    expect(link).toHaveAttribute('href', `/parts/${original.id}/alternates`);
  });

  it('pairs a photocell with the LED that lights it, and estimates the pair', async () => {
    const cell = makePhotoresistor({ id: partId(911), partNumber: 'LC-OLD', lifecycle: 'obsolete' });
    const other = makePhotoresistor({ id: partId(912), partNumber: 'LC-NEW', parameters: { ...cell.parameters, cellMaterial: { value: 'other' } } });
    const led = makePart({
      id: partId(913),
      family: 'led',
      partNumber: 'LR5-RD',
      package: 'led-5mm',
      pinLayout: 'led-2lead',
      parameters: { peakWavelength: { typ: 630e-9 }, forwardCurrent: { typ: 20e-3, max: 30e-3 }, luminousIntensity: { typ: 0.5, conditions: { current: 20e-3 } } },
    });
    const fetchMock = stubApi({
      'GET /api/auth/me': meHandler(USERS.viewer),
      [`GET /api/parts/${cell.id}`]: () => json(200, cell),
      [`GET /api/parts/${led.id}`]: () => json(200, led),
      [`GET /api/parts/${cell.id}/alternates`]: () => json(200, alternatesOf(cell, [makeRanked(other)])),
      [`GET /api/parts/${cell.id}/equivalents`]: () => json(200, { items: [] }),
      'GET /api/parts': ({ query }) => json(200, listOf(query.get('family') === 'led' ? [led] : [cell, other])),
    });
    const { router } = renderApp(`/parts/${cell.id}/alternates`);
    await screen.findByRole('heading', { level: 1, name: 'Alternates for LC-OLD' });
    // One caution for the page, not one per panel.
    expect(screen.getAllByRole('note', { name: 'Cadmium caution' })).toHaveLength(1);
    expect(screen.queryByLabelText('Operating supply')).not.toBeInTheDocument();

    const user = userEvent.setup();
    const picker = screen.getByRole('group', { name: 'Paired LED' });
    await user.click(await within(picker).findByRole('button', { name: /LR5-RD/ }));
    await waitFor(() => expect(queriesTo(fetchMock, `/api/parts/${cell.id}/alternates`).at(-1)!.get('pairedWith')).toBe(led.id));
    expect(new URLSearchParams(router.state.location.search).get('pairedWith')).toBe(led.id);
    expect(within(picker).getByText('LR5-RD')).toBeInTheDocument();

    // The estimate starts from this cell and the LED just paired with it.
    const estimate = screen.getByRole('heading', { name: 'Optocoupler estimate' }).closest('section')!;
    expect(within(estimate).getByRole('group', { name: 'Photoresistor' })).toHaveTextContent('LC-OLD');
    expect(await within(estimate).findByText('LR5-RD')).toBeInTheDocument();
    expect(within(estimate).getByTestId('opto-typical').textContent).toMatch(/Ω$/);
  });
});
