import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { BomDetailDto, BomLineDto, BomLineOptions } from '@understudy/shared-types';
import { describe, expect, it, vi } from 'vitest';
import { makeRanked } from '../../../test/alternates';
import { makePart, partId } from '../../../test/parts';
import { USERS, callsTo, json, meHandler, renderApp, stubApi } from '../../../test/render-app';
import { bomPartId, lineId, makeBomDetail, makeBomPart, makeCheck, makeEquivalentRef, makeLine, makeSummary } from '../test/fixtures';

type Handlers = Parameters<typeof stubApi>[0];

const ok = makeLine({ row: 2 });
const obsoletePart = makeBomPart({ id: bomPartId(2), partNumber: 'HV4558', manufacturer: 'Harrow Valley', lifecycle: 'obsolete' });
const obsolete = makeLine({
  row: 3,
  partNumber: 'HV4558-TR',
  cells: ['HV4558-TR', '4', 'U3-U6'],
  quantity: 4,
  designators: ['U3', 'U4', 'U5', 'U6'],
  match: { kind: 'suffix', part: obsoletePart, detail: 'packing suffix -TR set aside', candidates: [] },
  status: 'at-risk',
  risk: 'Obsolete — 1 approved equivalent',
});
const unknown = makeLine({
  row: 4,
  partNumber: 'ZQ-999',
  cells: ['ZQ-999', 'ten', 'U7'],
  quantity: null,
  designators: ['U7'],
  match: { kind: 'unmatched', part: null, detail: null, candidates: [] },
  problems: [{ field: 'quantity', message: "'ten' is not a number" }],
  status: 'unmatched',
  risk: 'Not in the catalog',
});
const typoCandidate = makeBomPart({ id: bomPartId(4), partNumber: 'NW4580' });
const typo = makeLine({
  row: 5,
  partNumber: 'NW458O',
  match: { kind: 'candidates', part: null, detail: null, candidates: [{ part: typoCandidate, similarity: 0.83 }] },
  status: 'confirm',
  risk: 'Not in the catalog as written; 1 close match',
});
const cellPart = makeBomPart({
  id: bomPartId(5),
  family: 'photoresistor',
  partNumber: 'LC-5516',
  manufacturer: 'Lumen Cells',
  rohsStatus: 'exempt',
  cadmium: true,
});
const cadmium = makeLine({
  row: 6,
  partNumber: 'LC-5516',
  designators: ['LDR1'],
  quantity: 1,
  match: { kind: 'exact', part: cellPart, detail: null, candidates: [] },
  status: 'at-risk',
  risk: 'Cadmium cell: check the RoHS exemptions that apply and local rules',
});

const LINES = [ok, obsolete, unknown, typo, cadmium];
const SUMMARY = makeSummary({
  lines: 5,
  ok: 1,
  obsolete: 1,
  cadmium: 1,
  unmatched: 1,
  toConfirm: 1,
  withProblems: 1,
  text: '5 lines: 1 obsolete, 1 cadmium, 1 not in catalog, 1 to confirm',
});

function detail(overrides: Partial<BomDetailDto> = {}): BomDetailDto {
  return makeBomDetail(LINES, { summary: SUMMARY, ...overrides });
}

const approvedPart = makeBomPart({ id: bomPartId(6), partNumber: 'AP4558', manufacturer: 'Apsley Semis' });
const alternate = makePart({ id: partId(620), partNumber: 'QX-072S', manufacturer: { id: '5e1f0000-0000-4000-8000-000000000003', name: 'Quillwork Devices' } });
const OPTIONS: BomLineOptions = {
  approvedEquivalents: [makeEquivalentRef(approvedPart, { use: 'tremolo LFO', note: 'Bench-checked.' })],
  alternates: [makeRanked(alternate, { score: 86.4 })],
};

function bomApi(role: keyof typeof USERS, bom: BomDetailDto, extra: Handlers = {}) {
  return stubApi({
    'GET /api/auth/me': meHandler(USERS[role]),
    'GET /api/notifications': () => json(200, { items: [], unread: 0 }),
    [`GET /api/boms/${bom.id}`]: () => json(200, bom),
    [`GET /api/boms/${bom.id}/lines/${obsolete.id}/options`]: () => json(200, OPTIONS),
    [`GET /api/boms/${bom.id}/lines/${cadmium.id}/options`]: () => json(200, { approvedEquivalents: [], alternates: [] }),
    ...extra,
  });
}

async function openBom(bom: BomDetailDto) {
  const utils = renderApp(`/boms/${bom.id}`);
  await screen.findByRole('heading', { level: 1, name: bom.name });
  return { ...utils, user: userEvent.setup() };
}

function lineRows() {
  const table = screen.getByRole('table', { name: /Lines of/ });
  return within(table)
    .getAllByRole('row')
    .filter((row) => row.hasAttribute('data-row-id'));
}

function cell(row: HTMLElement, column: string) {
  return row.querySelector(`td[data-column="${column}"]`);
}

function bodyOf(call: unknown[] | undefined): unknown {
  const init = call?.[1] as RequestInit | undefined;
  return typeof init?.body === 'string' ? JSON.parse(init.body) : undefined;
}

describe('the BOM page', () => {
  it('shows the risk counts and every line worst first with its status, match and risk', async () => {
    bomApi('viewer', detail());
    await openBom(detail());

    const risks = screen.getByRole('list', { name: 'Risks in this BOM' });
    const count = (name: RegExp) => within(risks).getByRole('button', { name });
    expect(count(/^5 all lines$/)).toHaveAttribute('aria-pressed', 'true');
    expect(count(/^1 obsolete$/)).toBeInTheDocument();
    expect(count(/^0 not recommended$/)).toBeInTheDocument();
    expect(count(/^0 last-time buy$/)).toBeInTheDocument();
    expect(count(/^0 not RoHS compliant$/)).toBeInTheDocument();
    expect(count(/^1 cadmium$/)).toBeInTheDocument();
    expect(count(/^1 not in catalog$/)).toBeInTheDocument();
    expect(count(/^1 to confirm$/)).toBeInTheDocument();
    expect(risks.nextElementSibling).toHaveTextContent('5 lines: 1 obsolete, 1 cadmium, 1 not in catalog, 1 to confirm');

    // Worst first: not in catalog, to confirm, at risk, then OK.
    expect(lineRows().map((r) => cell(r, 'row')?.textContent)).toEqual(['4', '5', '3', '6', '2']);
    expect(lineRows().map((r) => cell(r, 'status')?.textContent)).toEqual(['Not in catalog', 'Confirm match', 'At risk', 'At risk', 'OK']);
    const [unknownRow, typoRow, obsoleteRow, , okRow] = lineRows();
    expect(cell(unknownRow!, 'matched')).toHaveTextContent('nothing close in the catalog');
    expect(cell(typoRow!, 'matched')).toHaveTextContent('1 close match to confirm');
    expect(within(obsoleteRow!).getByRole('link', { name: 'HV4558' })).toHaveAttribute('href', `/parts/${obsoletePart.id}`);
    expect(cell(obsoleteRow!, 'matched')).toHaveTextContent('packing suffix -TR set aside');
    expect(cell(obsoleteRow!, 'risk')).toHaveTextContent('Obsolete — 1 approved equivalent');
    expect(cell(obsoleteRow!, 'designators')).toHaveTextContent('U3, U4, U5, U6');
    expect(cell(okRow!, 'matched')).toHaveTextContent('exact');

    // The owner's controls are there.
    for (const name of ['Check again', 'Share…', 'Delete', 'Rename']) expect(screen.getByRole('button', { name })).toBeInTheDocument();
    expect(screen.getByRole('checkbox', { name: 'Watch this BOM' })).not.toBeChecked();
    expect(screen.getByRole('link', { name: 'Export CSV' })).toHaveAttribute('href', `/api/boms/${detail().id}/export.csv`);
    expect(screen.getByRole('link', { name: 'Printable report' })).toHaveAttribute('href', `/boms/${detail().id}/report`);
  });

  it('filters the lines by a count and back', async () => {
    bomApi('viewer', detail());
    const { user, router } = await openBom(detail());
    const risks = screen.getByRole('list', { name: 'Risks in this BOM' });

    await user.click(within(risks).getByRole('button', { name: /^1 obsolete$/ }));
    expect(within(risks).getByRole('button', { name: /^1 obsolete$/ })).toHaveAttribute('aria-pressed', 'true');
    expect(lineRows().map((r) => cell(r, 'row')?.textContent)).toEqual(['3']);
    expect(new URLSearchParams(router.state.location.search).get('risk')).toBe('obsolete');

    await user.click(within(risks).getByRole('button', { name: /^1 cadmium$/ }));
    expect(lineRows().map((r) => cell(r, 'row')?.textContent)).toEqual(['6']);

    await user.click(within(risks).getByRole('button', { name: /^5 all lines$/ }));
    expect(lineRows()).toHaveLength(5);
    expect(router.state.location.search).toBe('');
  });

  it('opens a line by keyboard: approved equivalents before alternates, and a replacement saved with its note', async () => {
    const bom = detail();
    const replaced: BomLineDto = {
      ...obsolete,
      replacement: { part: makeBomPart({ id: alternate.id, partNumber: 'QX-072S', manufacturer: 'Quillwork Devices' }), note: 'Same footprint.', chosenBy: { id: USERS.viewer.id, name: USERS.viewer.name }, chosenAt: '2025-04-03T10:00:00.000Z' },
    };
    // The server's copy changes with the PATCH, so the refetch after it sees the replacement too.
    let current = bom;
    const fetchMock = bomApi('viewer', bom, {
      [`GET /api/boms/${bom.id}`]: () => json(200, current),
      [`PATCH /api/boms/${bom.id}/lines/${obsolete.id}`]: () => {
        current = { ...bom, lines: bom.lines.map((l) => (l.id === replaced.id ? replaced : l)) };
        return json(200, replaced);
      },
    });
    const { user } = await openBom(bom);

    const toggle = screen.getByRole('button', { name: 'Details for row 3, HV4558-TR' });
    toggle.focus();
    await user.keyboard('{Enter}');
    expect(toggle).toHaveAttribute('aria-expanded', 'true');

    const approved = await screen.findByRole('list', { name: 'Approved equivalents for row 3' });
    const alternates = screen.getByRole('list', { name: 'Closest alternates for row 3' });
    expect(within(approved).getByText('Approved for tremolo LFO')).toBeInTheDocument();
    expect(within(alternates).getByText('86')).toBeInTheDocument();
    // In reading order, the approved one comes first.
    const offered = screen.getAllByRole('button', { name: /^Use as replacement/ }).map((b) => b.textContent);
    expect(offered).toEqual(['Use as replacement (AP4558)', 'Use as replacement (QX-072S)']);
    expect(approved.compareDocumentPosition(alternates) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();

    await user.type(screen.getByRole('textbox', { name: /Replacement note/ }), 'Same footprint.');
    await user.click(screen.getByRole('button', { name: 'Use as replacement (QX-072S)' }));
    await waitFor(() => expect(callsTo(fetchMock, 'PATCH', `/api/boms/${bom.id}/lines/${obsolete.id}`)).toHaveLength(1));
    expect(bodyOf(callsTo(fetchMock, 'PATCH', `/api/boms/${bom.id}/lines/${obsolete.id}`)[0])).toEqual({
      replacementPartId: alternate.id,
      replacementNote: 'Same footprint.',
    });

    // The line shows its replacement at once and stays open.
    const row = lineRows().find((r) => cell(r, 'row')?.textContent === '3')!;
    await waitFor(() => expect(cell(row, 'replacement')).toHaveTextContent('QX-072S'));
    expect(toggle).toHaveAttribute('aria-expanded', 'true');
    expect(screen.getByText('Chosen')).toBeInTheDocument();
  });

  it('confirms a close match with "This one", and shows the caution and problems of a line', async () => {
    const bom = detail();
    const confirmed: BomLineDto = { ...typo, match: { kind: 'confirmed', part: typoCandidate, detail: null, candidates: [] }, status: 'ok', risk: '' };
    let current = bom;
    const fetchMock = bomApi('viewer', bom, {
      [`GET /api/boms/${bom.id}`]: () => json(200, current),
      [`GET /api/boms/${bom.id}/lines/${typo.id}/options`]: () => json(200, { approvedEquivalents: [], alternates: [] }),
      [`PATCH /api/boms/${bom.id}/lines/${typo.id}`]: () => {
        current = { ...bom, lines: bom.lines.map((l) => (l.id === typo.id ? confirmed : l)) };
        return json(200, confirmed);
      },
    });
    const { user } = await openBom(bom);

    await user.click(screen.getByRole('button', { name: 'Details for row 5, NW458O' }));
    const close = screen.getByRole('list', { name: 'Close matches for row 5' });
    expect(within(close).getByText('83 % alike')).toBeInTheDocument();
    await user.click(within(close).getByRole('button', { name: 'This one (NW4580)' }));
    await waitFor(() => expect(bodyOf(callsTo(fetchMock, 'PATCH', `/api/boms/${bom.id}/lines/${typo.id}`)[0])).toEqual({ partId: typoCandidate.id }));
    await waitFor(() => expect(screen.getByRole('button', { name: 'Undo my match' })).toBeInTheDocument());

    await user.click(screen.getByRole('button', { name: 'Details for row 4, ZQ-999' }));
    expect(screen.getByTestId('line-details-4')).toHaveTextContent("Quantity: 'ten' is not a number");
    expect(screen.getByTestId('line-details-4')).toHaveTextContent('Match the line to a catalog part first');

    await user.click(screen.getByRole('button', { name: 'Details for row 6, LC-5516' }));
    expect(within(screen.getByTestId('line-details-6')).getByRole('note', { name: 'Cadmium caution' })).toBeInTheDocument();
  });

  it('matches a line to any catalog part found by a search', async () => {
    const bom = detail();
    const found = makePart({ id: partId(640), partNumber: 'ZQ-990', manufacturer: { id: '5e1f0000-0000-4000-8000-000000000009', name: 'Zephyr Quartz' } });
    const fetchMock = bomApi('viewer', bom, {
      'GET /api/parts': ({ query }) => json(200, { items: query.get('q') === 'ZQ' ? [found] : [], total: 1, page: 1, pageSize: 8 }),
      [`PATCH /api/boms/${bom.id}/lines/${unknown.id}`]: () => json(200, unknown),
    });
    const { user } = await openBom(bom);
    await user.click(screen.getByRole('button', { name: 'Details for row 4, ZQ-999' }));
    await user.type(screen.getByRole('searchbox', { name: 'Match row 4 to another catalog part' }), 'ZQ');
    const results = await screen.findByRole('list', { name: 'Parts found for row 4' });
    await user.click(await within(results).findByRole('button', { name: 'Match row 4 to ZQ-990' }));
    await waitFor(() => expect(bodyOf(callsTo(fetchMock, 'PATCH', `/api/boms/${bom.id}/lines/${unknown.id}`)[0])).toEqual({ partId: found.id }));
  });

  it('hides the owner-only controls from a colleague it is shared with', async () => {
    const bom = detail({
      owner: { id: USERS.editor.id, name: USERS.editor.name },
      sharedWith: [{ id: USERS.viewer.id, name: USERS.viewer.name }],
    });
    bomApi('viewer', bom);
    const { user } = await openBom(bom);

    expect(screen.getByText('Read-only: shared with you')).toBeInTheDocument();
    expect(screen.getByTestId('shared-with')).toHaveTextContent('Vera Viewer');
    for (const name of ['Check again', 'Share…', 'Delete', 'Rename']) expect(screen.queryByRole('button', { name })).not.toBeInTheDocument();
    expect(screen.queryByRole('checkbox', { name: 'Watch this BOM' })).not.toBeInTheDocument();
    // Reading, exporting and printing are theirs too.
    expect(screen.getByRole('link', { name: 'Export CSV' })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Printable report' })).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Details for row 5, NW458O' }));
    expect(within(screen.getByRole('list', { name: 'Close matches for row 5' })).queryByRole('button')).not.toBeInTheDocument();
    expect(screen.queryByRole('searchbox', { name: /Match row 5/ })).not.toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Details for row 3, HV4558-TR' }));
    await screen.findByRole('list', { name: 'Approved equivalents for row 3' });
    expect(screen.queryByRole('button', { name: /^Use as replacement/ })).not.toBeInTheDocument();
    expect(screen.queryByRole('textbox', { name: /Replacement note/ })).not.toBeInTheDocument();
  });

  it('checks again and lists the new check with its changes in the history', async () => {
    const bom = detail();
    const rechecked = detail({
      checks: [
        makeCheck({ summary: SUMMARY }),
        makeCheck({
          id: 'c4ec0000-0000-4000-8000-000000000002',
          checkedAt: '2025-04-05T09:00:00.000Z',
          trigger: 'manual',
          summary: { ...SUMMARY, text: '5 lines: 2 obsolete, 1 cadmium, 1 not in catalog, 1 to confirm' },
          changes: ['Row 2 NW4580: OK → At risk (now obsolete)'],
        }),
      ],
    });
    const fetchMock = bomApi('viewer', bom, { [`POST /api/boms/${bom.id}/check`]: () => json(200, rechecked) });
    const { user } = await openBom(bom);
    await user.click(screen.getByRole('button', { name: 'Check again' }));
    await waitFor(() => expect(callsTo(fetchMock, 'POST', `/api/boms/${bom.id}/check`)).toHaveLength(1));

    const notice = await screen.findByText(/— 1 line changed status\./);
    expect(notice).toHaveTextContent('5 lines: 2 obsolete, 1 cadmium, 1 not in catalog, 1 to confirm — 1 line changed status.');
    const history = screen.getByRole('list', { name: 'History of checks' });
    const entries = within(history).getAllByRole('listitem').filter((li) => li.parentElement === history);
    expect(entries).toHaveLength(2);
    expect(entries[0]).toHaveTextContent('Checked again');
    expect(entries[0]).toHaveTextContent('Row 2 NW4580: OK → At risk (now obsolete)');
    expect(entries[1]).toHaveTextContent('Uploaded');
  });

  it('shares with colleagues picked in a dialog, and deletes after a confirmation', async () => {
    const bom = detail();
    const fetchMock = bomApi('viewer', bom, {
      'GET /api/boms/colleagues': () =>
        json(200, {
          items: [
            { id: USERS.editor.id, name: USERS.editor.name, email: USERS.editor.email },
            { id: USERS.admin.id, name: USERS.admin.name, email: USERS.admin.email },
          ],
        }),
      [`PUT /api/boms/${bom.id}/shares`]: () => json(200, detail({ sharedWith: [{ id: USERS.admin.id, name: USERS.admin.name }] })),
      [`DELETE /api/boms/${bom.id}`]: () => new Response(null, { status: 204 }),
      'GET /api/boms': () => json(200, { items: [] }),
    });
    const { user, router } = await openBom(bom);

    await user.click(screen.getByRole('button', { name: 'Share…' }));
    const dialog = screen.getByRole('dialog', { name: `Share ${bom.name}` });
    await user.click(await within(dialog).findByRole('checkbox', { name: /Ada Admin/ }));
    await user.click(within(dialog).getByRole('button', { name: 'Save sharing' }));
    await waitFor(() => expect(bodyOf(callsTo(fetchMock, 'PUT', `/api/boms/${bom.id}/shares`)[0])).toEqual({ userIds: [USERS.admin.id] }));
    await waitFor(() => expect(screen.getByTestId('shared-with')).toHaveTextContent('Ada Admin'));

    await user.click(screen.getByRole('button', { name: 'Delete' }));
    await user.click(within(screen.getByRole('dialog', { name: `Delete ${bom.name}?` })).getByRole('button', { name: 'Delete BOM' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/boms'));
    expect(callsTo(fetchMock, 'DELETE', `/api/boms/${bom.id}`)).toHaveLength(1);
  });

  it('pages a large BOM instead of drawing every line', async () => {
    const many = Array.from({ length: 1200 }, (_, i) => makeLine({ id: lineId(1000 + i), row: i + 2, partNumber: `NW${4000 + i}` }));
    const bom = makeBomDetail(many, { summary: makeSummary({ lines: 1200, ok: 1200, text: '1,200 lines, all OK' }) });
    bomApi('viewer', bom);
    const { user } = await openBom(bom);

    expect(lineRows()).toHaveLength(100);
    const pages = screen.getByRole('navigation', { name: 'Pages of lines' });
    expect(pages).toHaveTextContent('Lines 1–100 of 1,200');
    expect(pages).toHaveTextContent('Page 1 of 12');
    await user.click(within(pages).getByRole('button', { name: 'Next' }));
    expect(pages).toHaveTextContent('Lines 101–200 of 1,200');
    expect(cell(lineRows()[0]!, 'row')).toHaveTextContent('102');

    // Sorting by row starts from the top of the sheet and goes back to the first page.
    await user.click(screen.getByRole('button', { name: 'Row' }));
    expect(pages).toHaveTextContent('Lines 1–100 of 1,200');
    expect(cell(lineRows()[0]!, 'row')).toHaveTextContent('2');
    await user.click(screen.getByRole('button', { name: 'Row' }));
    expect(cell(lineRows()[0]!, 'row')).toHaveTextContent('1201');

    await user.type(screen.getByRole('searchbox', { name: 'Find in the lines' }), 'NW5150');
    await waitFor(() => expect(lineRows()).toHaveLength(1));
    expect(screen.getByRole('navigation', { name: 'Pages of lines' })).toHaveTextContent('Lines 1–1 of 1');
  });

  it('says so when the BOM does not exist or is not shared with the person', async () => {
    stubApi({
      'GET /api/auth/me': meHandler(USERS.viewer),
      'GET /api/notifications': () => json(200, { items: [], unread: 0 }),
      'GET /api/boms/b0b00000-0000-4000-8000-000000000099': () => json(404, { error: { code: 'not_found', message: 'No such BOM' } }),
    });
    renderApp('/boms/b0b00000-0000-4000-8000-000000000099');
    expect(await screen.findByText('There is no such BOM')).toBeInTheDocument();
  });
});

describe('the printable report', () => {
  it('lists the summary and every line with status, replacement and note, and prints', async () => {
    const withReplacement: BomLineDto = {
      ...obsolete,
      replacement: { part: approvedPart, note: 'Approved for the LFO.', chosenBy: null, chosenAt: '2025-04-03T10:00:00.000Z' },
    };
    const bom = makeBomDetail([ok, withReplacement, cadmium], {
      summary: makeSummary({ lines: 3, ok: 1, obsolete: 1, cadmium: 1, replaced: 1, text: '3 lines: 1 obsolete, 1 cadmium — 1 replacement chosen' }),
    });
    bomApi('viewer', bom);
    const print = vi.spyOn(window, 'print').mockImplementation(() => {});
    renderApp(`/boms/${bom.id}/report`);

    expect(await screen.findByRole('heading', { level: 1, name: bom.name })).toBeInTheDocument();
    expect(screen.getByText('3 lines: 1 obsolete, 1 cadmium — 1 replacement chosen')).toBeInTheDocument();
    expect(screen.getByRole('note', { name: 'Cadmium caution' })).toBeInTheDocument();
    const rows = within(screen.getByRole('table', { name: `Lines of ${bom.name}` })).getAllByRole('row').slice(1);
    expect(rows.map((r) => (r as HTMLTableRowElement).cells[0]!.textContent)).toEqual(['3', '6', '2']);
    expect(rows[0]).toHaveTextContent('AP4558');
    expect(rows[0]).toHaveTextContent('Approved for the LFO.');
    expect(rows[0]).toHaveTextContent('At risk');

    await userEvent.setup().click(screen.getByRole('button', { name: 'Print' }));
    expect(print).toHaveBeenCalledTimes(1);
    // The app's header and footer stay off the paper.
    expect(document.getElementById('main')!.previousElementSibling!.className).toMatch(/print:hidden/);
  });
});
