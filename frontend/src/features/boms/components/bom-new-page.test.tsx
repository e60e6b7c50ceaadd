import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { USERS, callsTo, json, meHandler, renderApp, stubApi } from '../../../test/render-app';
import { bomId, makeBomDetail, makeLine, makePreview } from '../test/fixtures';

type Handlers = Parameters<typeof stubApi>[0];

function newBomApi(extra: Handlers = {}) {
  return stubApi({
    'GET /api/auth/me': meHandler(USERS.viewer),
    'GET /api/notifications': () => json(200, { items: [], unread: 0 }),
    ...extra,
  });
}

function bodyOf(call: unknown[] | undefined): unknown {
  const init = call?.[1] as RequestInit | undefined;
  return typeof init?.body === 'string' ? JSON.parse(init.body) : init?.body;
}

async function openPage() {
  const utils = renderApp('/boms/new');
  await screen.findByRole('heading', { level: 1, name: 'Check a BOM' });
  return { ...utils, user: userEvent.setup() };
}

const pasted = 'Ref\tMPN\tQty\nU1, U2\tNW4580\t2\nR1\tKR-10K\t1\n';

describe('checking a new BOM', () => {
  it('reads a paste, preselects the guessed columns with where each guess came from, and saves exactly that', async () => {
    const saved = makeBomDetail([makeLine()], { id: bomId(7), name: 'Fuzz rev C' });
    const fetchMock = newBomApi({
      'POST /api/boms/preview': () => json(200, makePreview()),
      'POST /api/boms': () => json(201, saved),
      [`GET /api/boms/${saved.id}`]: () => json(200, saved),
    });
    const { user, router } = await openPage();

    await user.click(screen.getByLabelText('Paste rows from a spreadsheet'));
    await user.paste(pasted);
    await user.click(screen.getByRole('button', { name: 'Read the pasted rows' }));

    const partNumber = await screen.findByRole('combobox', { name: 'Column 2 (MPN) holds' });
    expect(bodyOf(callsTo(fetchMock, 'POST', '/api/boms/preview')[0])).toEqual({ text: pasted });
    expect(partNumber).toHaveValue('partNumber');
    expect(screen.getByRole('combobox', { name: 'Column 1 (Ref) holds' })).toHaveValue('designators');
    expect(screen.getByRole('combobox', { name: 'Column 3 (Qty) holds' })).toHaveValue('quantity');
    // Each guess says where it came from, under its own column.
    const headerCells = screen.getAllByRole('columnheader').filter((th) => within(th).queryByRole('combobox'));
    expect(headerCells.map((th) => th.textContent?.match(/as last time|from the header|from the values/)?.[0])).toEqual([
      'from the values',
      'from the header',
      'as last time',
    ]);
    expect(screen.getByTestId('read-as')).toHaveTextContent('Read 2 lines as pasted text, separated by tab.');
    // The sample rows are shown under their headers.
    expect(screen.getByRole('table', { name: 'The first rows, with what each column holds' })).toHaveTextContent('KR-10K');

    const name = screen.getByRole('textbox', { name: 'Name' });
    expect(name).toHaveValue('Pasted BOM');
    await user.clear(name);
    await user.type(name, 'Fuzz rev C');
    await user.click(screen.getByRole('button', { name: 'Check and save' }));

    await waitFor(() => expect(router.state.location.pathname).toBe(`/boms/${saved.id}`));
    expect(bodyOf(callsTo(fetchMock, 'POST', '/api/boms')[0])).toEqual({
      name: 'Fuzz rev C',
      text: pasted,
      fileName: null,
      encoding: 'text',
      delimiter: '\t',
      hasHeader: true,
      mapping: { designators: 0, partNumber: 1, quantity: 2 },
    });
    expect(await screen.findByRole('heading', { level: 1, name: 'Fuzz rev C' })).toBeInTheDocument();
  });

  it('moves a field from one column to another, and reads again with a new delimiter or header choice', async () => {
    const fetchMock = newBomApi({
      'POST /api/boms/preview': ({ body }) => {
        const { delimiter, hasHeader } = body as { delimiter?: string; hasHeader?: boolean };
        return json(200, makePreview(delimiter ? { delimiter: delimiter as ',' | ';', hasHeader: hasHeader ?? true } : {}));
      },
    });
    const { user } = await openPage();
    await user.click(screen.getByLabelText('Paste rows from a spreadsheet'));
    await user.paste(pasted);
    await user.click(screen.getByRole('button', { name: 'Read the pasted rows' }));
    const ref = await screen.findByRole('combobox', { name: 'Column 1 (Ref) holds' });

    // A part number lives in one column: choosing it for Ref takes it off MPN.
    await user.selectOptions(ref, 'partNumber');
    expect(ref).toHaveValue('partNumber');
    expect(screen.getByRole('combobox', { name: 'Column 2 (MPN) holds' })).toHaveValue('ignore');

    await user.selectOptions(screen.getByRole('combobox', { name: 'Columns separated by' }), ';');
    await waitFor(() => expect(callsTo(fetchMock, 'POST', '/api/boms/preview')).toHaveLength(2));
    expect(bodyOf(callsTo(fetchMock, 'POST', '/api/boms/preview')[1])).toEqual({ text: pasted, delimiter: ';', hasHeader: true });
    // A fresh read brings a fresh guess.
    await waitFor(() => expect(screen.getByRole('combobox', { name: 'Column 2 (MPN) holds' })).toHaveValue('partNumber'));

    await user.click(screen.getByRole('checkbox', { name: 'First row is a header' }));
    await waitFor(() => expect(callsTo(fetchMock, 'POST', '/api/boms/preview')).toHaveLength(3));
    expect(bodyOf(callsTo(fetchMock, 'POST', '/api/boms/preview')[2])).toEqual({ text: pasted, delimiter: ';', hasHeader: false });
  });

  it('shows why a paste was refused, with the rows, and keeps the text', async () => {
    newBomApi({
      'POST /api/boms/preview': () =>
        json(400, {
          error: { code: 'bom_rejected', message: 'The BOM has 10,001 lines; at most 10,000 can be checked at once.' },
          details: { reason: 'too-many-lines', rows: [{ row: 10_002, message: 'Past the 10,000-line limit' }] },
        }),
    });
    const { user } = await openPage();
    const textarea = screen.getByLabelText('Paste rows from a spreadsheet');
    await user.click(textarea);
    await user.paste(pasted);
    await user.click(screen.getByRole('button', { name: 'Read the pasted rows' }));

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('There are too many lines');
    expect(alert).toHaveTextContent('The BOM has 10,001 lines; at most 10,000 can be checked at once.');
    const rows = within(screen.getByRole('table', { name: 'Rows to fix' })).getAllByRole('row');
    expect(rows[1]).toHaveTextContent('10002');
    expect(rows[1]).toHaveTextContent('Past the 10,000-line limit');
    expect(textarea).toHaveValue(pasted);
  });

  it('shows why saving was refused and keeps the rows and the mapping to fix it', async () => {
    const fetchMock = newBomApi({
      'POST /api/boms/preview': () => json(200, makePreview()),
      'POST /api/boms': () =>
        json(400, {
          error: { code: 'bom_rejected', message: 'None of the lines has a part number in the chosen column.' },
          details: { reason: 'no-part-numbers', rows: [{ row: 2, message: 'Part number is empty' }, { row: 3, message: 'Part number is empty' }] },
        }),
    });
    const { user, router } = await openPage();
    const textarea = screen.getByLabelText('Paste rows from a spreadsheet');
    await user.click(textarea);
    await user.paste(pasted);
    await user.click(screen.getByRole('button', { name: 'Read the pasted rows' }));
    await user.selectOptions(await screen.findByRole('combobox', { name: 'Column 3 (Qty) holds' }), 'partNumber');
    await user.click(screen.getByRole('button', { name: 'Check and save' }));

    expect(await screen.findByText('No line has a part number')).toBeInTheDocument();
    expect(within(screen.getByRole('table', { name: 'Rows to fix' })).getAllByRole('row')).toHaveLength(3);
    expect(router.state.location.pathname).toBe('/boms/new');
    expect(textarea).toHaveValue(pasted);
    expect(screen.getByRole('combobox', { name: 'Column 3 (Qty) holds' })).toHaveValue('partNumber');

    // Nothing is sent without a part-number column.
    await user.selectOptions(screen.getByRole('combobox', { name: 'Column 3 (Qty) holds' }), 'ignore');
    await user.click(screen.getByRole('button', { name: 'Check and save' }));
    expect(screen.getByText('Choose the column that holds the part numbers.')).toBeInTheDocument();
    expect(callsTo(fetchMock, 'POST', '/api/boms')).toHaveLength(1);
  });

  it('uploads a file as is, shows the encoding it was read in, and names the BOM after the file', async () => {
    const saved = makeBomDetail([makeLine()], { id: bomId(8), name: 'mixer-v2' });
    const text = 'MPN;Qty\nNW4580;2\n';
    const fetchMock = newBomApi({
      'POST /api/boms/preview': ({ body }) =>
        json(
          200,
          makePreview({
            text,
            encoding: body === undefined ? 'windows-1252' : 'text',
            delimiter: ';',
            columns: [
              { index: 0, header: 'MPN', samples: ['NW4580'] },
              { index: 1, header: 'Qty', samples: ['2'] },
            ],
            lineCount: 1,
            sampleRows: [['NW4580', '2']],
            mapping: { partNumber: 0, quantity: 1 },
            mappingSource: { partNumber: 'headers', quantity: 'headers' },
          }),
        ),
      'POST /api/boms': () => json(201, saved),
      [`GET /api/boms/${saved.id}`]: () => json(200, saved),
    });
    const { user, router } = await openPage();
    const file = new File(['MPN;Qty\nNW4580;2\n'], 'mixer-v2.csv', { type: 'text/csv' });
    await user.upload(screen.getByLabelText('Choose a file'), file);

    await screen.findByRole('combobox', { name: 'Column 1 (MPN) holds' });
    const sent = callsTo(fetchMock, 'POST', '/api/boms/preview')[0]![1]!.body;
    expect(sent).toBeInstanceOf(FormData);
    expect((sent as FormData).get('file')).toBeInstanceOf(File);
    expect(((sent as FormData).get('file') as File).name).toBe('mixer-v2.csv');
    expect(screen.getByTestId('read-as')).toHaveTextContent('Read 1 line as Windows-1252, separated by semicolon.');
    expect(screen.getByRole('textbox', { name: 'Name' })).toHaveValue('mixer-v2');

    // Reading again with another header choice sends the decoded text, and keeps the file's encoding.
    await user.click(screen.getByRole('checkbox', { name: 'First row is a header' }));
    await waitFor(() => expect(callsTo(fetchMock, 'POST', '/api/boms/preview')).toHaveLength(2));
    expect(bodyOf(callsTo(fetchMock, 'POST', '/api/boms/preview')[1])).toEqual({ text, delimiter: ';', hasHeader: false });
    await waitFor(() => expect(screen.getByRole('checkbox', { name: 'First row is a header' })).toBeEnabled());
    expect(screen.getByTestId('read-as')).toHaveTextContent('as Windows-1252');

    await user.click(screen.getByRole('button', { name: 'Check and save' }));
    await waitFor(() => expect(router.state.location.pathname).toBe(`/boms/${saved.id}`));
    expect(bodyOf(callsTo(fetchMock, 'POST', '/api/boms')[0])).toMatchObject({
      name: 'mixer-v2',
      text,
      fileName: 'mixer-v2.csv',
      encoding: 'windows-1252',
      delimiter: ';',
      mapping: { partNumber: 0, quantity: 1 },
    });
  });

  it('refuses a file that is not text before sending it', async () => {
    const fetchMock = newBomApi();
    await openPage();
    // Dropped files are not filtered by the picker's accept list, so the page judges them itself.
    const user = userEvent.setup({ applyAccept: false });
    const file = new File(['%PDF-1.7'], 'datasheet.pdf', { type: 'application/pdf' });
    await user.upload(screen.getByLabelText('Choose a file'), file);
    expect(await screen.findByText(/“datasheet.pdf” is not a .csv, .tsv or .txt file/)).toBeInTheDocument();
    expect(callsTo(fetchMock, 'POST', '/api/boms/preview')).toHaveLength(0);
  });
});
