import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { USERS, json, meHandler, renderApp, stubApi } from '../../../test/render-app';
import { partId } from '../../../test/parts';
import { datasheetId, makeDatasheetItem } from '../../../test/datasheets';
import { pdfFile, stubXhr } from '../../../test/xhr';

const ready = makeDatasheetItem({
  id: datasheetId(101),
  fileName: 'nw4580.pdf',
  part: { id: partId(501), partNumber: 'NW4580', manufacturer: 'Northwind Analog' },
});
const failed = makeDatasheetItem({
  id: datasheetId(102),
  fileName: 'scan.pdf',
  status: 'failed',
  failureReason: 'The PDF has no text layer; it looks like a scan.',
  uploadedBy: null,
});

function rowOf(name: string) {
  return screen.getByRole('link', { name }).closest('tr')!;
}

describe('datasheets page', () => {
  it('lists every datasheet with its status, part and uploader, and shows a viewer no drop zone', async () => {
    stubApi({ 'GET /api/auth/me': meHandler(USERS.viewer), 'GET /api/datasheets': () => json(200, { items: [ready, failed] }) });
    renderApp('/datasheets');
    expect(await screen.findByRole('heading', { level: 1, name: 'Datasheets' })).toBeInTheDocument();
    await screen.findByRole('table', { name: 'Datasheets' });

    const first = rowOf('nw4580.pdf');
    expect(within(first).getByText('Ready for review')).toBeInTheDocument();
    expect(within(first).getByRole('link', { name: 'NW4580' })).toHaveAttribute('href', `/parts/${ready.part!.id}`);
    expect(within(first).getByText('Eddie Editor')).toBeInTheDocument();
    expect(within(first).getByRole('link', { name: 'Download nw4580.pdf' })).toHaveAttribute(
      'href',
      `/api/datasheets/${ready.id}/file?download=1`,
    );
    const second = rowOf('scan.pdf');
    expect(within(second).getByText('Failed')).toBeInTheDocument();
    expect(within(second).getByText('The PDF has no text layer; it looks like a scan.')).toBeInTheDocument();

    expect(screen.queryByRole('button', { name: 'Choose files' })).not.toBeInTheDocument();
  });

  it('says so when there are none, and when the list cannot be loaded', async () => {
    let fail = true;
    stubApi({
      'GET /api/auth/me': meHandler(USERS.viewer),
      'GET /api/datasheets': () => (fail ? json(500, { error: { code: 'internal', message: 'The database is asleep.' } }) : json(200, { items: [] })),
    });
    renderApp('/datasheets');
    expect(await screen.findByText('The database is asleep.')).toBeInTheDocument();
    fail = false;
    await userEvent.setup().click(screen.getByRole('button', { name: 'Try again' }));
    expect(await screen.findByText('No datasheets yet')).toBeInTheDocument();
  });

  it('follows a datasheet through the parser without a reload', async () => {
    let calls = 0;
    const queued = makeDatasheetItem({ id: datasheetId(103), fileName: 'fresh.pdf', status: 'queued', parsedAt: null });
    stubApi({
      'GET /api/auth/me': meHandler(USERS.viewer),
      'GET /api/datasheets': () => json(200, { items: [++calls < 2 ? queued : { ...queued, status: 'ready' }] }),
    });
    renderApp('/datasheets');
    await screen.findByRole('table', { name: 'Datasheets' });
    expect(within(rowOf('fresh.pdf')).getByText('Queued')).toBeInTheDocument();
    await waitFor(() => expect(within(rowOf('fresh.pdf')).getByText('Ready for review')).toBeInTheDocument(), { timeout: 4_000 });
  });

  it('uploads each file in its own request with its own progress bar and shows the server’s answer per file', async () => {
    const sent = stubXhr();
    const existing = datasheetId(104);
    const uploaded = makeDatasheetItem({ id: datasheetId(105), fileName: 'nw4580.pdf', status: 'queued', parsedAt: null });
    let listed: unknown[] = [];
    stubApi({ 'GET /api/auth/me': meHandler(USERS.editor), 'GET /api/datasheets': () => json(200, { items: listed }) });
    renderApp('/datasheets');
    const user = userEvent.setup({ applyAccept: false });
    await screen.findByText('No datasheets yet');

    await user.upload(screen.getByLabelText('Choose files'), [pdfFile('nw4580.pdf', 2000), pdfFile('copy.pdf', 1000), new File(['x'], 'notes.txt', { type: 'text/plain' })]);

    // The text file is refused here and never sent; the PDFs go one per request.
    await waitFor(() => expect(sent).toHaveLength(2));
    expect(sent.map((x) => [x.method, x.url, x.fileName, x.body?.get('partId')])).toEqual([
      ['POST', '/api/datasheets', 'nw4580.pdf', null],
      ['POST', '/api/datasheets', 'copy.pdf', null],
    ]);
    expect(sent[0]!.headers.accept).toBe('application/json');
    const uploads = screen.getByRole('list', { name: 'Uploads' });
    expect(within(uploads).getByText('notes.txt is not a PDF; only PDF datasheets can be read.')).toBeInTheDocument();

    sent[0]!.progress(800, 2000);
    expect(screen.getByRole('progressbar', { name: 'Uploading nw4580.pdf' })).toHaveAttribute('aria-valuenow', '40');
    expect(screen.getByRole('progressbar', { name: 'Uploading copy.pdf' })).toHaveAttribute('aria-valuenow', '0');

    await sent[1]!.respond(422, {
      error: { code: 'upload_rejected', message: 'copy.pdf is already here, uploaded as nw4580-old.pdf.' },
      files: [{ fileName: 'copy.pdf', code: 'duplicate', message: 'copy.pdf is already here, uploaded as nw4580-old.pdf.', existingId: existing }],
    });
    const refused = await within(uploads).findByText(/copy\.pdf is already here/);
    expect(within(refused).getByRole('link', { name: 'Open the existing datasheet' })).toHaveAttribute('href', `/datasheets/${existing}`);
    expect(screen.queryByRole('progressbar', { name: 'Uploading copy.pdf' })).not.toBeInTheDocument();

    listed = [uploaded];
    await sent[0]!.respond(201, { items: [uploaded] });
    expect(screen.getByRole('progressbar', { name: 'Uploading nw4580.pdf' })).toHaveAttribute('aria-valuenow', '100');
    expect(await within(uploads).findByText('Queued')).toBeInTheDocument();

    // The server's state follows in the row as the list polls.
    listed = [{ ...uploaded, status: 'failed', failureReason: 'The PDF is encrypted.' }];
    expect(await within(uploads).findByText('The PDF is encrypted.', {}, { timeout: 4_000 })).toBeInTheDocument();
  });

  it('shows a file that is too large with the server’s message, and lets a failed upload be tried again', async () => {
    const sent = stubXhr();
    stubApi({ 'GET /api/auth/me': meHandler(USERS.editor), 'GET /api/datasheets': () => json(200, { items: [] }) });
    renderApp('/datasheets');
    const user = userEvent.setup();
    await screen.findByText('No datasheets yet');
    await user.upload(screen.getByLabelText('Choose files'), [pdfFile('huge.pdf'), pdfFile('flaky.pdf')]);
    await waitFor(() => expect(sent).toHaveLength(2));

    await sent[0]!.respond(413, {
      error: { code: 'too_large', message: 'A file is over the 25 MB limit for one datasheet.' },
      files: [{ fileName: 'files', code: 'too-large', message: 'A file is over the 25 MB limit for one datasheet.' }],
    });
    expect(await screen.findByText('A file is over the 25 MB limit for one datasheet.')).toBeInTheDocument();

    await sent[1]!.fail();
    expect(await screen.findByText(/did not reach the server/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Try again to upload flaky.pdf' }));
    await waitFor(() => expect(sent).toHaveLength(3));
    expect(sent[2]!.fileName).toBe('flaky.pdf');
  });
});
