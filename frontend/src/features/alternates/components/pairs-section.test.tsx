import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { PAIRS_DROP_IN_NOTE, type AlternatesResponse } from '@understudy/shared-types';
import { describe, expect, it } from 'vitest';
import { alternatesOf, makeRanked, makeRankedPair } from '../../../test/alternates';
import { makePart, makePhotoresistor, partId } from '../../../test/parts';
import { USERS, json, meHandler, renderApp, stubApi } from '../../../test/render-app';

const vactrol = makePart({
  id: partId(931),
  family: 'optocoupler',
  partNumber: 'VX-2K',
  package: 'opto-4lead',
  pinLayout: 'optocoupler-4lead',
  rohsStatus: 'exempt',
  parameters: { onResistance: { typ: 2e3, conditions: { current: 10e-3 } }, offResistance: { min: 10e6 }, cellMaterial: { value: 'cds' } },
});
const other = makePart({ id: partId(932), family: 'optocoupler', partNumber: 'VX-3K', package: 'opto-4lead', pinLayout: 'optocoupler-4lead', parameters: { onResistance: { typ: 3e3 } } });
const led = makePart({
  id: partId(933),
  family: 'led',
  partNumber: 'LD-540G',
  package: 'led-5mm',
  pinLayout: 'led-2lead',
  parameters: { peakWavelength: { typ: 540e-9 }, forwardCurrent: { typ: 20e-3, max: 30e-3 }, luminousIntensity: { typ: 0.05, conditions: { current: 20e-3 } } },
});
const oldLed = makePart({ ...led, id: partId(934), partNumber: 'LD-OLD', lifecycle: 'obsolete' });
const cell = makePhotoresistor({ id: partId(935), partNumber: 'LX-2K' });
const slow = makePhotoresistor({ id: partId(936), partNumber: 'LX-SLOW' });

const best = makeRankedPair(led, cell);
const worse = makeRankedPair(oldLed, slow, {
  score: 51.5,
  lifecycle: 'obsolete',
  estimate: { ...best.estimate, resistanceOhms: { low: 8.2e3, typical: 20e3, high: 57e3 } },
});

function answer(pairs: AlternatesResponse['pairs']): AlternatesResponse {
  return { ...alternatesOf(vactrol, [makeRanked(other, { score: 88 })]), pairs };
}

function pageApi(pairs: AlternatesResponse['pairs']) {
  return stubApi({
    'GET /api/auth/me': meHandler(USERS.viewer),
    [`GET /api/parts/${vactrol.id}`]: () => json(200, vactrol),
    [`GET /api/parts/${vactrol.id}/alternates`]: () => json(200, answer(pairs)),
    [`GET /api/parts/${vactrol.id}/equivalents`]: () => json(200, { items: [] }),
  });
}

async function pairsSection() {
  const heading = await screen.findByRole('heading', { name: 'LED + photoresistor pairs' });
  return heading.closest('section')!;
}

function pairRows(section: HTMLElement) {
  return within(within(section).getByRole('table', { name: 'LED + photoresistor pairs for VX-2K, best first' }))
    .getAllByRole('row')
    .filter((row) => row.hasAttribute('data-row-id'));
}

describe('LED + photoresistor pairs on an optocoupler’s alternates page', () => {
  it('lists each pair below the ranked table with both parts linked, score, estimated on resistance, lifecycle and RoHS', async () => {
    pageApi({ items: [best, worse], considered: 1000, note: 'Each pair is scored as the optocoupler it would make: the LED 5 mm from the cell at 10 mA.' });
    renderApp(`/parts/${vactrol.id}/alternates`);
    const section = await pairsSection();
    // Below the packaged alternates.
    const ranked = screen.getByRole('table', { name: /Alternates for VX-2K/ });
    expect(ranked.compareDocumentPosition(section) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
    expect(within(section).getByText(/Best 2 of 1000 pairs considered/)).toBeInTheDocument();
    expect(within(section).getByText(/the LED 5 mm from the cell at 10 mA/)).toBeInTheDocument();

    const [first, second] = pairRows(section);
    expect(within(first!).getByRole('link', { name: 'LD-540G' })).toHaveAttribute('href', `/parts/${led.id}`);
    expect(within(first!).getByRole('link', { name: 'LX-2K' })).toHaveAttribute('href', `/parts/${cell.id}`);
    expect(first!.querySelector('td[data-column="score"]')!.textContent).toBe('74 out of 100');
    const resistance = first!.querySelector('td[data-column="onResistance"]')!;
    expect(resistance).toHaveTextContent('2 kΩ');
    expect(resistance).toHaveTextContent('820 Ω to 5.7 kΩ at 10 mA');
    expect(within(first!).getByText('RoHS exemption')).toBeInTheDocument();
    expect(second!.querySelector('td[data-column="score"]')!.textContent).toBe('52 out of 100');
    expect(second!.querySelector('td[data-column="lifecycle"]')).toHaveTextContent('Obsolete');
    expect(second!.querySelector('td[data-column="onResistance"]')).toHaveTextContent('20 kΩ');
    // A CdS cell among them: the caution is shown once for the page.
    expect(screen.getAllByRole('note', { name: 'Cadmium caution' })).toHaveLength(1);
  });

  it('opens a pair to show its breakdown, the layout change, the assumptions and that it is an estimate for the bench', async () => {
    pageApi({ items: [best], considered: 40, note: 'Each pair is scored as the optocoupler it would make.' });
    renderApp(`/parts/${vactrol.id}/alternates`);
    const section = await pairsSection();
    const user = userEvent.setup();
    const toggle = within(section).getByRole('button', { name: 'Details for LD-540G + LX-2K' });
    await user.click(toggle);
    expect(toggle).toHaveAttribute('aria-expanded', 'true');

    const breakdown = within(section).getByRole('table', { name: 'Why LD-540G + LX-2K scores 74' });
    expect(within(breakdown).getByRole('row', { name: /Pinout/ })).toHaveTextContent('two parts in place of one package, so the board layout changes; never a drop-in');
    expect(within(breakdown).getByRole('row', { name: /On resistance/ })).toHaveTextContent("estimated on resistance 2 kΩ matches the original's");
    const estimate = within(section).getByRole('region', { name: 'Estimate for LD-540G + LX-2K' });
    expect(within(estimate).getByText('1000 lx')).toBeInTheDocument();
    expect(within(estimate).getByText('Assumptions (2)')).toBeInTheDocument();
    expect(within(estimate).getByText(/5 mm from the cell.*common practice, no source/)).toBeInTheDocument();
    expect(within(estimate).getByText(/to confirm on the bench/)).toBeInTheDocument();
    expect(within(section).getByText(/Two parts in place of one package, so the board layout changes; never a drop-in\. Mount the LED facing the cell, 5 mm apart/)).toBeInTheDocument();

    await user.click(toggle);
    expect(within(section).queryByRole('table', { name: /Why LD-540G/ })).not.toBeInTheDocument();
  });

  it('says why there are none, and offers to drop the drop-in requirement that rules them out', async () => {
    const fetchMock = pageApi({ items: [], considered: 0, note: PAIRS_DROP_IN_NOTE });
    const { router } = renderApp(`/parts/${vactrol.id}/alternates?requireDropIn=1`);
    const section = await pairsSection();
    expect(within(section).getByText('No LED + photoresistor pairs')).toBeInTheDocument();
    expect(within(section).getByText(PAIRS_DROP_IN_NOTE)).toBeInTheDocument();
    expect(within(section).queryByRole('table')).not.toBeInTheDocument();
    await userEvent.setup().click(within(section).getByRole('button', { name: 'Allow other pinouts' }));
    expect(new URLSearchParams(router.state.location.search).get('requireDropIn')).toBeNull();
    expect(fetchMock).toHaveBeenCalled();
  });

  it('shows no pairs section for other families', async () => {
    stubApi({
      'GET /api/auth/me': meHandler(USERS.viewer),
      [`GET /api/parts/${cell.id}`]: () => json(200, cell),
      [`GET /api/parts/${cell.id}/alternates`]: () => json(200, { ...alternatesOf(cell, [makeRanked(slow)]), pairs: null }),
      [`GET /api/parts/${cell.id}/equivalents`]: () => json(200, { items: [] }),
      'GET /api/parts': () => json(200, { items: [], total: 0, page: 1, pageSize: 50 }),
    });
    renderApp(`/parts/${cell.id}/alternates`);
    await screen.findByRole('table', { name: /Alternates for LX-2K/ });
    expect(screen.queryByRole('heading', { name: 'LED + photoresistor pairs' })).not.toBeInTheDocument();
  });
});
