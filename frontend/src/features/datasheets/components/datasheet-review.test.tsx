import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { CADMIUM_CAUTION, type DatasheetDto } from '@understudy/shared-types';
import { useEffect } from 'react';
import { describe, expect, it, vi } from 'vitest';
import { USERS, callsTo, json, meHandler, renderApp, stubApi } from '../../../test/render-app';
import { makePart, partId } from '../../../test/parts';
import { datasheetId, makeDatasheet, makeExtraction, makeProposal } from '../../../test/datasheets';
import type { PdfPageCanvasProps } from './pdf-page-canvas';

// jsdom cannot draw PDFs: the canvas stands in as a plain element that reports the page it was asked for.
vi.mock('./pdf-page-canvas', () => ({
  PdfPageCanvas: ({ pageNumber, label, onDocument }: PdfPageCanvasProps) => {
    useEffect(() => onDocument?.({ numPages: 4 }), [onDocument]);
    return <div role="img" aria-label={label} data-testid="pdf-page" data-page={pageNumber} />;
  },
}));

const target = makePart({ id: partId(601), version: 3, parameters: { ...makePart().parameters, slewRate: { typ: 9e6 } } });

function sheetApi(role: keyof typeof USERS, sheet: DatasheetDto, extra: Record<string, Parameters<typeof stubApi>[0][string]> = {}) {
  return stubApi({
    'GET /api/auth/me': meHandler(USERS[role]),
    [`GET /api/datasheets/${sheet.id}`]: () => json(200, sheet),
    [`PATCH /api/datasheets/${sheet.id}/proposals/p1`]: ({ body }) => json(200, decided(sheet, 'p1', body)),
    [`PATCH /api/datasheets/${sheet.id}/proposals/p2`]: ({ body }) => json(200, decided(sheet, 'p2', body)),
    [`PATCH /api/datasheets/${sheet.id}/proposals/p3`]: ({ body }) => json(200, decided(sheet, 'p3', body)),
    ...extra,
  });
}

function decided(sheet: DatasheetDto, id: string, body: unknown): DatasheetDto {
  const b = body as { decision: 'accepted'; value?: unknown };
  return {
    ...sheet,
    extraction: {
      ...sheet.extraction!,
      proposals: sheet.extraction!.proposals.map((p) =>
        p.id === id ? { ...p, decision: b.decision, editedValue: (b.value as never) ?? null } : p,
      ),
    },
  };
}

const proposal = (name: RegExp) => screen.getByRole('article', { name });
const patches = (fetchMock: ReturnType<typeof stubApi>, sheet: DatasheetDto, id: string) =>
  callsTo(fetchMock, 'PATCH', `/api/datasheets/${sheet.id}/proposals/${id}`).map(([, init]) => JSON.parse(String(init?.body)));

describe('datasheet review', () => {
  it('shows a viewer the proposals per parameter, read-only, with a download', async () => {
    const sheet = makeDatasheet({ id: datasheetId(201) });
    sheetApi('viewer', sheet);
    renderApp(`/datasheets/${sheet.id}`);

    expect(await screen.findByRole('heading', { level: 1, name: 'nw4580-datasheet.pdf' })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Download PDF' })).toHaveAttribute('href', `/api/datasheets/${sheet.id}/file?download=1`);

    const groups = screen.getAllByRole('region').filter((r) => r.hasAttribute('data-parameter'));
    expect(groups.map((g) => g.getAttribute('data-parameter'))).toEqual(['supplyVoltage', 'slewRate', 'inputOffsetVoltage']);
    expect(within(groups[1]!).getByRole('heading', { name: 'Slew rate' })).toBeInTheDocument();

    const slew = proposal(/^Slew rate/);
    expect(slew).toHaveTextContent('typ 13 V/µs');
    expect(slew).toHaveTextContent('Supply 30 V');
    expect(slew).toHaveTextContent('VS = ±15 V, TA = 25 °C');
    expect(slew).toHaveTextContent('V/us');
    expect(slew).toHaveTextContent('High confidence');
    expect(slew).toHaveTextContent('Slew rate SR RL = 2 kΩ 13 V/us');
    expect(proposal(/^Input offset voltage/)).toHaveTextContent('typ 0.5 mV, max 3 mV');
    expect(proposal(/^Input offset voltage/)).toHaveTextContent('Low confidence');

    const absMax = proposal(/^Supply range/);
    expect(absMax).toHaveTextContent('Absolute maximum');
    expect(absMax).toHaveTextContent('not a value it works at');

    const identity = screen.getByRole('region', { name: 'What the document is about' });
    expect(within(identity).getByText('Op amp')).toBeInTheDocument();
    expect(within(identity).getByText('NW4580')).toBeInTheDocument();
    expect(within(identity).getByText('Northwind Analog')).toBeInTheDocument();

    expect(screen.queryByRole('button', { name: /^Accept/ })).not.toBeInTheDocument();
    expect(screen.queryByRole('region', { name: 'Apply to the catalog' })).not.toBeInTheDocument();
  });

  it('jumps to the selected value’s page and marks its source, and lets identity findings be traced', async () => {
    const sheet = makeDatasheet({ id: datasheetId(202) });
    sheetApi('viewer', sheet);
    renderApp(`/datasheets/${sheet.id}`);
    const user = userEvent.setup();
    await screen.findByRole('heading', { level: 1 });

    // The first value in the list is selected at the start: the absolute maximum, read on page 1.
    expect(await screen.findByTestId('pdf-page')).toHaveAttribute('data-page', '1');
    await user.click(proposal(/^Slew rate/));
    expect(screen.getByTestId('pdf-page')).toHaveAttribute('data-page', '2');
    expect(screen.getByText('Page 2 of 4')).toBeInTheDocument();
    const boxes = document.querySelectorAll<HTMLElement>('[data-source-box]');
    expect(boxes).toHaveLength(1);
    // 61.2 pt of a 612 pt wide page is 10 %; 79.2 of 792 pt down is 10 %.
    expect(boxes[0]!.style.left).toBe('10%');
    expect(boxes[0]!.style.top).toBe('10%');
    expect(boxes[0]!.style.width).toBe('40%');

    await user.click(screen.getByRole('button', { name: 'Next page' }));
    expect(screen.getByTestId('pdf-page')).toHaveAttribute('data-page', '3');
    expect(document.querySelectorAll('[data-source-box]')).toHaveLength(0);

    screen.getByRole('region', { name: /nw4580-datasheet\.pdf, page 3 of 4/ }).focus();
    await user.keyboard('{ArrowLeft}{ArrowLeft}');
    expect(screen.getByTestId('pdf-page')).toHaveAttribute('data-page', '1');

    await user.click(screen.getByRole('button', { name: 'Show source, page 4 for the manufacturer' }));
    expect(screen.getByTestId('pdf-page')).toHaveAttribute('data-page', '4');
  });

  it('saves accept, reject and undo as they are made', async () => {
    const sheet = makeDatasheet({ id: datasheetId(203) });
    const fetchMock = sheetApi('editor', sheet);
    renderApp(`/datasheets/${sheet.id}`);
    const user = userEvent.setup();
    await screen.findByRole('heading', { level: 1 });

    await user.click(within(proposal(/^Slew rate/)).getByRole('button', { name: /^Accept/ }));
    expect(within(proposal(/^Slew rate/)).getByText('Accepted')).toBeInTheDocument();
    await user.click(within(proposal(/^Supply range/)).getByRole('button', { name: /^Reject/ }));
    expect(within(proposal(/^Supply range/)).getByText('Rejected')).toBeInTheDocument();
    await user.click(within(proposal(/^Supply range/)).getByRole('button', { name: /^Undo/ }));

    await waitFor(() => expect(patches(fetchMock, sheet, 'p2')).toHaveLength(2));
    expect(patches(fetchMock, sheet, 'p1')).toEqual([{ decision: 'accepted' }]);
    expect(patches(fetchMock, sheet, 'p2')).toEqual([{ decision: 'rejected' }, { decision: 'pending' }]);
    await waitFor(() => expect(within(proposal(/^Supply range/)).getByText('Pending')).toBeInTheDocument());
  });

  it('puts a refused decision back and says why', async () => {
    const sheet = makeDatasheet({ id: datasheetId(204) });
    sheetApi('editor', sheet, {
      [`PATCH /api/datasheets/${sheet.id}/proposals/p1`]: () => json(409, { error: { code: 'datasheet_not_ready', message: 'This datasheet has not been parsed yet.' } }),
    });
    renderApp(`/datasheets/${sheet.id}`);
    const user = userEvent.setup();
    await screen.findByRole('heading', { level: 1 });
    await user.click(within(proposal(/^Slew rate/)).getByRole('button', { name: /^Accept/ }));
    expect(await within(proposal(/^Slew rate/)).findByText('Not saved: This datasheet has not been parsed yet.')).toBeInTheDocument();
    expect(within(proposal(/^Slew rate/)).getByText('Pending')).toBeInTheDocument();
  });

  it('edits a value in engineering notation, with inline errors, keeping the stated conditions', async () => {
    const sheet = makeDatasheet({ id: datasheetId(205) });
    const fetchMock = sheetApi('editor', sheet);
    renderApp(`/datasheets/${sheet.id}`);
    const user = userEvent.setup();
    await screen.findByRole('heading', { level: 1 });

    await user.click(within(proposal(/^Slew rate/)).getByRole('button', { name: /^Edit/ }));
    const form = screen.getByRole('form', { name: 'Edit Slew rate' });
    const typ = within(form).getByLabelText('Typ (V/µs)');
    expect(typ).toHaveValue('13 V/µs');
    expect(typ).toHaveFocus();
    await user.clear(typ);
    await user.type(typ, 'fast');
    await user.click(within(form).getByRole('button', { name: 'Save value' }));
    expect(within(form).getByText(/"fast" is not a number engineers write/)).toBeInTheDocument();
    expect(patches(fetchMock, sheet, 'p1')).toEqual([]);

    await user.clear(typ);
    await user.type(typ, '15{Enter}');
    await waitFor(() => expect(patches(fetchMock, sheet, 'p1')).toHaveLength(1));
    expect(patches(fetchMock, sheet, 'p1')[0]).toEqual({ decision: 'edited', value: { typ: 15e6, conditions: { supply: 30 } } });
    const slew = proposal(/^Slew rate/);
    expect(slew).toHaveTextContent('typ 15 V/µs');
    expect(slew).toHaveTextContent('Read as typ 13 V/µs');
    expect(within(slew).getByText('Edited')).toBeInTheDocument();

    // Min above max is refused by the shared rules before anything is sent.
    await user.click(within(proposal(/^Input offset voltage/)).getByRole('button', { name: /^Edit/ }));
    const offset = screen.getByRole('form', { name: 'Edit Input offset voltage' });
    await user.clear(within(offset).getByLabelText('Typ (mV)'));
    await user.type(within(offset).getByLabelText('Typ (mV)'), '5');
    await user.click(within(offset).getByRole('button', { name: 'Save value' }));
    expect(within(offset).getByText('max must not be below typ')).toBeInTheDocument();
    expect(patches(fetchMock, sheet, 'p3')).toEqual([]);
  });

  it('reviews by keyboard: j/k and arrows move, a accepts, r rejects, e edits', async () => {
    const sheet = makeDatasheet({ id: datasheetId(206) });
    const fetchMock = sheetApi('editor', sheet);
    renderApp(`/datasheets/${sheet.id}`);
    const user = userEvent.setup();
    await screen.findByRole('heading', { level: 1 });
    expect(proposal(/^Supply range/)).toHaveAttribute('aria-current', 'true');

    await user.keyboard('j');
    expect(proposal(/^Slew rate/)).toHaveAttribute('aria-current', 'true');
    expect(proposal(/^Slew rate/)).toHaveFocus();
    expect(screen.getByTestId('pdf-page')).toHaveAttribute('data-page', '2');
    await user.keyboard('{ArrowDown}');
    expect(proposal(/^Input offset voltage/)).toHaveAttribute('aria-current', 'true');
    await user.keyboard('k');
    expect(proposal(/^Slew rate/)).toHaveAttribute('aria-current', 'true');

    // a accepts and moves on to the next value; r rejects it.
    await user.keyboard('a');
    expect(proposal(/^Input offset voltage/)).toHaveAttribute('aria-current', 'true');
    await user.keyboard('r');
    await user.keyboard('{ArrowUp}{ArrowUp}');
    expect(proposal(/^Supply range/)).toHaveAttribute('aria-current', 'true');
    await user.keyboard('e');
    expect(screen.getByRole('form', { name: 'Edit Supply range' })).toBeInTheDocument();
    // Typing in the box is not taken for shortcuts; Escape closes it.
    await user.keyboard('a{Escape}');
    expect(screen.queryByRole('form', { name: 'Edit Supply range' })).not.toBeInTheDocument();

    await waitFor(() => expect(patches(fetchMock, sheet, 'p3')).toHaveLength(1));
    expect(patches(fetchMock, sheet, 'p1')).toEqual([{ decision: 'accepted' }]);
    expect(patches(fetchMock, sheet, 'p3')).toEqual([{ decision: 'rejected' }]);
    expect(patches(fetchMock, sheet, 'p2')).toEqual([]);
  });

  it('shows what applying changes on the attached part, then applies against its version', async () => {
    const sheet = makeDatasheet({
      id: datasheetId(207),
      part: { id: target.id, partNumber: 'NW4580', manufacturer: 'Northwind Analog' },
      extraction: makeExtraction({
        proposals: [
          makeProposal({ decision: 'accepted' }),
          makeProposal({ id: 'p3', key: 'inputOffsetVoltage', value: { typ: 0.5e-3, max: 3e-3 }, decision: 'accepted' }),
          makeProposal({ id: 'p4', key: 'gainBandwidth', value: { typ: 10e6 }, decision: 'edited', editedValue: { typ: 12e6 } }),
          makeProposal({ id: 'p5', key: 'channels', value: { typ: 2 }, decision: 'pending' }),
          makeProposal({ id: 'p6', key: 'inputNoiseDensity', value: { typ: 9e-9 }, decision: 'rejected' }),
        ],
      }),
    });
    const saved = { ...target, version: 4, parameters: { ...target.parameters, slewRate: { typ: 13e6, conditions: { supply: 30 } }, gainBandwidth: { typ: 12e6 } } };
    const fetchMock = sheetApi('editor', sheet, {
      [`GET /api/parts/${target.id}`]: () => json(200, target),
      [`POST /api/datasheets/${sheet.id}/apply`]: () =>
        json(200, { datasheet: { ...sheet, status: 'applied', appliedAt: '2025-03-02T10:00:00.000Z' }, part: saved, revision: null }),
    });
    const { queryClient } = renderApp(`/datasheets/${sheet.id}`);
    const user = userEvent.setup();
    const panel = await screen.findByRole('region', { name: 'Apply to the catalog' });

    expect(await within(panel).findByRole('link', { name: 'NW4580' })).toHaveAttribute('href', `/parts/${target.id}`);
    const diff = await within(panel).findByRole('table', { name: 'What applying changes on NW4580' });
    const rows = within(diff).getAllByRole('row').slice(1);
    expect(rows.map((r) => r.textContent)).toEqual([
      'Slew ratetyp 9 V/µstyp 13 V/µs (Supply 30 V)',
      'Gain-bandwidthtyp 10 MHztyp 12 MHz',
      'Input offset voltagetyp 0.5 mV, max 3 mVNo change',
    ]);
    expect(within(panel).getByText('2 values will change on NW4580')).toBeInTheDocument();
    expect(within(panel).getByText('1 proposal is still pending and will be left out.')).toBeInTheDocument();

    await user.click(within(panel).getByRole('button', { name: 'Apply to NW4580' }));
    expect(await within(panel).findByText('Applied to NW4580')).toBeInTheDocument();
    expect(within(panel).getByRole('link', { name: 'Open NW4580' })).toHaveAttribute('href', `/parts/${target.id}`);
    const [call] = callsTo(fetchMock, 'POST', `/api/datasheets/${sheet.id}/apply`);
    expect(JSON.parse(String(call![1]?.body))).toEqual({ target: 'existing', partId: target.id, version: 3 });
    // The catalog's copy of the part is replaced by the saved one.
    expect(queryClient.getQueryData(['parts', 'detail', target.id])).toEqual(saved);
  });

  it('shows the fresh part after a conflict and applies again against its version', async () => {
    const sheet = makeDatasheet({
      id: datasheetId(208),
      part: { id: target.id, partNumber: 'NW4580', manufacturer: 'Northwind Analog' },
      extraction: makeExtraction({ proposals: [makeProposal({ decision: 'accepted' })] }),
    });
    const current = { ...target, version: 5, updatedAt: '2025-03-02T08:00:00.000Z', parameters: { ...target.parameters, slewRate: { typ: 11e6 } } };
    let attempts = 0;
    const fetchMock = sheetApi('editor', sheet, {
      [`GET /api/parts/${target.id}`]: () => json(200, attempts === 0 ? target : current),
      [`POST /api/datasheets/${sheet.id}/apply`]: () =>
        ++attempts === 1
          ? json(409, { error: { code: 'version_conflict', message: 'Someone saved this part meanwhile.' }, current })
          : json(200, { datasheet: { ...sheet, status: 'applied' }, part: { ...current, version: 6 }, revision: null }),
    });
    renderApp(`/datasheets/${sheet.id}`);
    const user = userEvent.setup();
    const panel = await screen.findByRole('region', { name: 'Apply to the catalog' });
    await user.click(await within(panel).findByRole('button', { name: 'Apply to NW4580' }));

    const conflict = await within(panel).findByTestId('apply-conflict');
    expect(conflict).toHaveTextContent('Someone else saved NW4580 while you were reviewing');
    expect(conflict).toHaveTextContent('It is now version 5');
    expect(within(panel).getByRole('table')).toHaveTextContent('typ 11 V/µs');
    await user.click(within(panel).getByRole('button', { name: 'Apply against version 5' }));
    expect(await within(panel).findByText('Applied to NW4580')).toBeInTheDocument();

    const bodies = callsTo(fetchMock, 'POST', `/api/datasheets/${sheet.id}/apply`).map(([, init]) => JSON.parse(String(init?.body)));
    expect(bodies).toEqual([
      { target: 'existing', partId: target.id, version: 3 },
      { target: 'existing', partId: target.id, version: 5 },
    ]);
  });

  it('finds an existing part by search within the family', async () => {
    const sheet = makeDatasheet({ id: datasheetId(209), extraction: makeExtraction({ proposals: [makeProposal({ decision: 'accepted' })] }) });
    const fetchMock = sheetApi('editor', sheet, {
      'GET /api/parts': () => json(200, { items: [target], total: 1, page: 1, pageSize: 8 }),
      [`GET /api/parts/${target.id}`]: () => json(200, target),
    });
    renderApp(`/datasheets/${sheet.id}`);
    const user = userEvent.setup();
    const panel = await screen.findByRole('region', { name: 'Apply to the catalog' });
    // The search starts from the part number the parser found.
    expect(within(panel).getByRole('searchbox', { name: 'Find the part' })).toHaveValue('NW4580');
    await user.click(await within(panel).findByRole('radio', { name: /NW4580/ }));
    expect(await within(panel).findByRole('button', { name: 'Apply to NW4580' })).toBeEnabled();
    const query = new URL(String(callsTo(fetchMock, 'GET', '/api/parts')[0]![0]), 'http://localhost').searchParams;
    expect(query.get('q')).toBe('NW4580');
    expect(query.get('family')).toBe('op-amp');
  });

  it('creates a new part from the reviewed identity', async () => {
    const sheet = makeDatasheet({ id: datasheetId(210), extraction: makeExtraction({ proposals: [makeProposal({ decision: 'accepted' })] }) });
    const created = makePart({ id: partId(602), partNumber: 'NW4580B', version: 1 });
    const fetchMock = sheetApi('editor', sheet, {
      'GET /api/parts': () => json(200, { items: [], total: 0, page: 1, pageSize: 8 }),
      [`POST /api/datasheets/${sheet.id}/apply`]: () => json(200, { datasheet: { ...sheet, status: 'applied' }, part: created, revision: null }),
      [`GET /api/parts/${created.id}`]: () => json(200, created),
    });
    renderApp(`/datasheets/${sheet.id}`);
    const user = userEvent.setup();
    const panel = await screen.findByRole('region', { name: 'Apply to the catalog' });
    await user.click(within(panel).getByRole('radio', { name: 'Create a new part' }));

    expect(within(panel).getByLabelText('Family')).toHaveValue('op-amp');
    expect(within(panel).getByLabelText('Manufacturer')).toHaveValue('Northwind Analog');
    expect(within(panel).getByLabelText('Package')).toHaveValue('DIP-8');
    const number = within(panel).getByLabelText('Part number');
    expect(number).toHaveValue('NW4580');
    await user.clear(number);
    await user.click(within(panel).getByRole('button', { name: 'Create the new part' }));
    expect(within(panel).getByText('Enter the part number')).toBeInTheDocument();
    await user.type(number, 'NW4580B');
    expect(within(panel).getByRole('table', { name: 'What applying changes on NW4580B' })).toHaveTextContent('typ 13 V/µs');
    await user.click(within(panel).getByRole('button', { name: 'Create NW4580B' }));

    expect(await within(panel).findByText('Applied to NW4580B')).toBeInTheDocument();
    const [call] = callsTo(fetchMock, 'POST', `/api/datasheets/${sheet.id}/apply`);
    expect(JSON.parse(String(call![1]?.body))).toEqual({
      target: 'new',
      family: 'op-amp',
      partNumber: 'NW4580B',
      manufacturer: 'Northwind Analog',
      package: 'DIP-8',
      description: '',
    });
  });

  it('says when nothing is kept yet, and shows the server’s refusal', async () => {
    const sheet = makeDatasheet({
      id: datasheetId(211),
      part: { id: target.id, partNumber: 'NW4580', manufacturer: 'Northwind Analog' },
      extraction: makeExtraction({ proposals: [makeProposal({ decision: 'accepted' })] }),
    });
    sheetApi('editor', sheet, {
      [`GET /api/parts/${target.id}`]: () => json(200, target),
      [`POST /api/datasheets/${sheet.id}/apply`]: () =>
        json(422, { error: { code: 'nothing_to_apply', message: 'Accept or edit at least one proposed value before applying.' } }),
    });
    renderApp(`/datasheets/${sheet.id}`);
    const user = userEvent.setup();
    const panel = await screen.findByRole('region', { name: 'Apply to the catalog' });
    await user.click(await within(panel).findByRole('button', { name: 'Apply to NW4580' }));
    expect(await within(panel).findByText('Accept or edit at least one proposed value before applying.')).toBeInTheDocument();

    await user.click(within(proposal(/^Slew rate/)).getByRole('button', { name: /^Undo/ }));
    expect(await within(panel).findByText('Accept or edit at least one proposed value; only those are applied.')).toBeInTheDocument();
    expect(within(panel).getByRole('button', { name: 'Apply to NW4580' })).toBeDisabled();
  });

  it('follows the parser while it works, and offers an editor Retry when it fails', async () => {
    const id = datasheetId(212);
    let state: DatasheetDto = makeDatasheet({ id, status: 'parsing', extraction: null, parsedAt: null });
    const fetchMock = stubApi({
      'GET /api/auth/me': meHandler(USERS.editor),
      [`GET /api/datasheets/${id}`]: () => json(200, state),
      [`POST /api/datasheets/${id}/retry`]: () => {
        state = { ...state, status: 'queued', failureReason: null };
        return json(200, state);
      },
    });
    renderApp(`/datasheets/${id}`);
    const user = userEvent.setup();
    expect(await screen.findByText('Reading the datasheet')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Download PDF' })).toBeInTheDocument();

    state = { ...state, status: 'failed', failureReason: 'The PDF is encrypted; remove the password and upload it again.' };
    expect(await screen.findByText('The PDF is encrypted; remove the password and upload it again.', {}, { timeout: 4_000 })).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Retry' }));
    expect(await screen.findByText('Waiting for the parser')).toBeInTheDocument();
    expect(callsTo(fetchMock, 'POST', `/api/datasheets/${id}/retry`)).toHaveLength(1);
  });

  it('shows a viewer a failure without Retry', async () => {
    const sheet = makeDatasheet({ id: datasheetId(213), status: 'failed', failureReason: 'Not a datasheet.', extraction: null });
    sheetApi('viewer', sheet);
    renderApp(`/datasheets/${sheet.id}`);
    expect(await screen.findByText('Not a datasheet.')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Retry' })).not.toBeInTheDocument();
  });

  it('shows the cadmium caution when a photocell is read as CdS', async () => {
    const sheet = makeDatasheet({
      id: datasheetId(214),
      extraction: makeExtraction({
        identity: { ...makeExtraction().identity, family: { value: 'photoresistor', confidence: 0.9, source: null } },
        proposals: [makeProposal({ id: 'p1', key: 'cellMaterial', value: { value: 'cds' }, statedUnit: null, conditionsText: null })],
      }),
    });
    sheetApi('viewer', sheet);
    renderApp(`/datasheets/${sheet.id}`);
    expect(await screen.findByRole('note', { name: 'Cadmium caution' })).toHaveTextContent(CADMIUM_CAUTION);
    expect(proposal(/^Cell material/)).toHaveTextContent('CdS');
  });

  it('explains a datasheet that does not exist', async () => {
    stubApi({ 'GET /api/auth/me': meHandler(USERS.viewer) });
    renderApp(`/datasheets/${datasheetId(299)}`);
    expect(await screen.findByText('There is no such datasheet')).toBeInTheDocument();
  });
});
