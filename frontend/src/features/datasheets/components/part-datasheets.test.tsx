import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { USERS, json, meHandler, renderApp, stubApi } from '../../../test/render-app';
import { makePart, makeRevision, partId } from '../../../test/parts';
import { datasheetId, makeDatasheetItem } from '../../../test/datasheets';
import { pdfFile, stubXhr } from '../../../test/xhr';

const part = makePart({ id: partId(701) });
const sheet = makeDatasheetItem({
  id: datasheetId(301),
  fileName: 'nw4580-rev-b.pdf',
  status: 'applied',
  part: { id: part.id, partNumber: part.partNumber, manufacturer: part.manufacturer.name },
});

function partPage(role: keyof typeof USERS, items = [sheet]) {
  return stubApi({
    'GET /api/auth/me': meHandler(USERS[role]),
    [`GET /api/parts/${part.id}`]: () => json(200, part),
    [`GET /api/parts/${part.id}/revisions`]: () =>
      json(200, {
        items: [
          makeRevision({
            version: 3,
            source: 'datasheet',
            datasheet: { id: sheet.id, fileName: sheet.fileName },
            changes: [{ field: 'parameters.slewRate', before: { typ: 9e6 }, after: { typ: 13e6 } }],
          }),
        ],
      }),
    'GET /api/datasheets': ({ query }) => json(200, { items: query.get('partId') === part.id ? items : [] }),
  });
}

describe('datasheets on the part page', () => {
  it('lists the part’s datasheets to open or download, and names the datasheet in the history', async () => {
    const fetchMock = partPage('viewer');
    renderApp(`/parts/${part.id}`);
    const list = await screen.findByRole('list', { name: 'Datasheets of this part' });
    expect(within(list).getByRole('link', { name: 'nw4580-rev-b.pdf' })).toHaveAttribute('href', `/datasheets/${sheet.id}`);
    expect(within(list).getByRole('link', { name: 'Download nw4580-rev-b.pdf' })).toHaveAttribute(
      'href',
      `/api/datasheets/${sheet.id}/file?download=1`,
    );
    expect(within(list).getByText('Applied')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Choose files' })).not.toBeInTheDocument();

    const history = await screen.findByRole('list', { name: 'Revisions' });
    expect(within(history).getByText(/From datasheet/)).toHaveTextContent('From datasheet nw4580-rev-b.pdf');
    expect(within(history).getByRole('link', { name: 'nw4580-rev-b.pdf' })).toHaveAttribute('href', `/datasheets/${sheet.id}`);

    const listCall = fetchMock.mock.calls.map(([input]) => new URL(String(input), 'http://localhost')).find((u) => u.pathname === '/api/datasheets');
    expect(listCall?.searchParams.get('partId')).toBe(part.id);
  });

  it('lets an editor upload datasheets attached to the part', async () => {
    const sent = stubXhr();
    partPage('editor', []);
    renderApp(`/parts/${part.id}`);
    const user = userEvent.setup();
    expect(await screen.findByText('No datasheet for this part yet.')).toBeInTheDocument();
    await user.upload(screen.getByLabelText('Choose files'), pdfFile('nw4580-rev-c.pdf'));
    await waitFor(() => expect(sent).toHaveLength(1));
    expect(sent[0]!.body?.get('partId')).toBe(part.id);
    expect(sent[0]!.fileName).toBe('nw4580-rev-c.pdf');
  });
});
