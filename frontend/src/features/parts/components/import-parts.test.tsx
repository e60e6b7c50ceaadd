import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { ImportReport } from '@understudy/shared-types';
import { describe, expect, it } from 'vitest';
import { USERS, callsTo, json, meHandler, renderApp, stubApi } from '../../../test/render-app';
import { listOf, makePart } from '../../../test/parts';

const CSV = 'family,manufacturer,partNumber\nop-amp,Northwind Analog,NW4580\nop-amp,Northwind Analog,NW072\n';

function csvFile(text = CSV, name = 'parts.csv') {
  return new File([text], name, { type: 'text/csv' });
}

const report = (overrides: Partial<ImportReport> = {}): ImportReport => ({
  dryRun: true,
  total: 2,
  created: 1,
  updated: 1,
  errors: [],
  ...overrides,
});

async function chooseFile(file: File) {
  const user = userEvent.setup({ applyAccept: false });
  await user.upload(await screen.findByLabelText('Choose a file'), file);
  return user;
}

describe('importing parts', () => {
  it('lists every bad row from the dry run and keeps the import button disabled', async () => {
    const fetchMock = stubApi({
      'GET /api/auth/me': meHandler(USERS.editor),
      'POST /api/parts/import': () =>
        json(
          200,
          report({
            total: 3,
            created: 1,
            updated: 0,
            errors: [
              { row: 3, partNumber: 'NW072', message: 'manufacturer: Required' },
              { row: 4, partNumber: null, message: 'family: Invalid option' },
            ],
          }),
        ),
    });
    renderApp('/parts/import');
    const user = await chooseFile(csvFile());

    const importButton = screen.getByRole('button', { name: /^Import/ });
    expect(importButton).toBeDisabled();
    await user.click(await screen.findByRole('button', { name: 'Check file' }));

    expect(await screen.findByText('2 rows need fixing — nothing was changed')).toBeInTheDocument();
    expect(screen.getByText(/3 rows: 1 new, 0 updates/)).toBeInTheDocument();
    const rows = within(screen.getByRole('table', { name: 'Rows that need fixing' })).getAllByRole('row').slice(1);
    expect(rows.map((r) => r.textContent)).toEqual(['3NW072manufacturer: Required', '4—family: Invalid option']);
    expect(screen.getByRole('button', { name: /^Import/ })).toBeDisabled();

    const [call] = callsTo(fetchMock, 'POST', '/api/parts/import');
    expect(new URL(String(call![0]), 'http://localhost').searchParams.get('dryRun')).toBe('1');
    expect(call![1]?.body).toBe(CSV);
    expect(new Headers(call![1]?.headers).get('Content-Type')).toBe('text/csv');
  });

  it('imports without dryRun after a clean dry run, then refreshes the catalog', async () => {
    const fetchMock = stubApi({
      'GET /api/auth/me': meHandler(USERS.editor),
      'POST /api/parts/import': ({ query, headers }) => {
        expect(headers.get('Content-Type')).toBe('application/json');
        return json(200, report({ dryRun: query.get('dryRun') === '1' }));
      },
    });
    const { queryClient } = renderApp('/parts/import');
    // A catalog list in the cache, to see the import invalidate it.
    await queryClient.fetchQuery({ queryKey: ['parts', 'list', {}], queryFn: () => 'cached' });

    const user = await chooseFile(new File(['[{"partNumber":"NW4580"}]'], 'parts.JSON', { type: 'application/json' }));
    await user.click(await screen.findByRole('button', { name: 'Check file' }));
    expect(await screen.findByText('The file is ready to import')).toBeInTheDocument();
    expect(screen.getByText(/2 rows: 1 new, 1 update\b/)).toBeInTheDocument();

    const importButton = screen.getByRole('button', { name: 'Import 2 parts' });
    expect(importButton).toBeEnabled();
    await user.click(importButton);

    expect(await screen.findByText('Imported 2 parts')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Back to the catalog' })).toHaveAttribute('href', '/parts');
    const calls = callsTo(fetchMock, 'POST', '/api/parts/import').map(([input]) => new URL(String(input), 'http://localhost'));
    expect(calls.map((u) => u.searchParams.has('dryRun'))).toEqual([true, false]);
    expect(queryClient.getQueryState(['parts', 'list', {}])?.isInvalidated).toBe(true);
    expect(screen.getByRole('button', { name: /^Import/ })).toBeDisabled();
  });

  it('shows the rows a refused import reports, and server messages for unreadable files', async () => {
    let attempt = 0;
    stubApi({
      'GET /api/auth/me': meHandler(USERS.admin),
      'POST /api/parts/import': ({ query }) => {
        if (query.get('dryRun') === '1') return json(200, report());
        attempt += 1;
        if (attempt === 1) {
          return json(422, {
            error: { code: 'import_rejected', message: '1 row(s) need fixing; nothing was imported.' },
            report: report({ dryRun: false, errors: [{ row: 2, partNumber: 'NW4580', message: 'the same part as row 3' }] }),
          });
        }
        return json(400, { error: { code: 'import_unreadable', message: 'The CSV needs a header row.' } });
      },
    });
    renderApp('/parts/import');
    const user = await chooseFile(csvFile());
    await user.click(await screen.findByRole('button', { name: 'Check file' }));
    await user.click(await screen.findByRole('button', { name: 'Import 2 parts' }));

    expect(await screen.findByText('1 row needs fixing — nothing was changed')).toBeInTheDocument();
    expect(within(screen.getByRole('table', { name: 'Rows that need fixing' })).getByText('the same part as row 3')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: /^Import/ })).toBeDisabled();

    // Checking again clears the refusal; the next attempt meets a 400 and says why.
    await user.click(screen.getByRole('button', { name: 'Check file' }));
    await user.click(await screen.findByRole('button', { name: 'Import 2 parts' }));
    expect(await screen.findByText('The CSV needs a header row.')).toBeInTheDocument();
  });

  it('refuses other file types and files over 20 MB before sending anything', async () => {
    const fetchMock = stubApi({ 'GET /api/auth/me': meHandler(USERS.editor) });
    renderApp('/parts/import');
    await chooseFile(new File(['x'], 'parts.xlsx'));
    expect(await screen.findByText(/“parts.xlsx” is not a .csv or .json file/)).toBeInTheDocument();

    const big = csvFile();
    Object.defineProperty(big, 'size', { value: 21 * 1024 * 1024 });
    await chooseFile(big);
    expect(await screen.findByText(/is 21.0 MB; files can be at most 20 MB/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Check file' })).not.toBeInTheDocument();
    expect(callsTo(fetchMock, 'POST', '/api/parts/import')).toHaveLength(0);
  });

  it('offers Import on the catalog only to people who can create parts', async () => {
    stubApi({ 'GET /api/auth/me': meHandler(USERS.editor), 'GET /api/parts': () => json(200, listOf([makePart()])) });
    const { unmount } = renderApp('/parts');
    expect(await screen.findByRole('link', { name: 'Import' })).toHaveAttribute('href', '/parts/import');
    unmount();

    stubApi({ 'GET /api/auth/me': meHandler(USERS.viewer), 'GET /api/parts': () => json(200, listOf([makePart()])) });
    renderApp('/parts');
    await screen.findByRole('link', { name: 'Export CSV' });
    expect(screen.queryByRole('link', { name: 'Import' })).not.toBeInTheDocument();
  });
});
