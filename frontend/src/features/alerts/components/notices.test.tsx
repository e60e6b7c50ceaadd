import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { NotificationDto, NotificationListResponse } from '@understudy/shared-types';
import { describe, expect, it } from 'vitest';
import { USERS, callsTo, json, meHandler, renderApp, stubApi } from '../../../test/render-app';

function notice(n: number, overrides: Partial<NotificationDto> = {}): NotificationDto {
  return {
    id: `a1e70000-0000-4000-8000-${String(n).padStart(12, '0')}`,
    kind: 'lifecycle',
    title: 'HV4558 is now obsolete',
    body: 'Two of your watched BOMs use it. Open them to choose a replacement.',
    part: { id: '7a0c0000-0000-4000-8000-000000000701', partNumber: 'HV4558' },
    boms: [
      { id: 'b0b00000-0000-4000-8000-000000000001', name: 'Tremolo rev B', lines: 2 },
      { id: 'b0b00000-0000-4000-8000-000000000002', name: 'Phaser 4-stage', lines: 1 },
    ],
    createdAt: `2025-04-0${n}T08:00:00.000Z`,
    readAt: null,
    emailedAt: null,
    ...overrides,
  };
}

/** A server whose notices can be marked read, so the counts move the way the real ones do. */
function noticesApi(items: NotificationDto[]) {
  let list = items;
  const answer = (): NotificationListResponse => ({ items: list, unread: list.filter((n) => n.readAt === null).length });
  const fetchMock = stubApi({
    'GET /api/auth/me': meHandler(USERS.viewer),
    'GET /api/notifications': () => json(200, answer()),
    'POST /api/notifications/read-all': () => {
      list = list.map((n) => ({ ...n, readAt: n.readAt ?? '2025-04-09T10:00:00.000Z' }));
      return new Response(null, { status: 204 });
    },
    ...Object.fromEntries(
      items.map((item) => [
        `POST /api/notifications/${item.id}/read`,
        () => {
          list = list.map((n) => (n.id === item.id ? { ...n, readAt: '2025-04-09T10:00:00.000Z' } : n));
          return new Response(null, { status: 204 });
        },
      ]),
    ),
  });
  return fetchMock;
}

const older = notice(1, { readAt: '2025-04-01T09:00:00.000Z', kind: 'approved-equivalent', title: 'AP4558 approved for HV4558', emailedAt: '2025-04-01T08:01:00.000Z' });
const middle = notice(2, { title: 'KR-10K is now last-time buy' });
const newest = notice(3);

describe('notices', () => {
  it('shows the unread count on the bell in the header', async () => {
    noticesApi([older, middle, newest]);
    renderApp('/');
    const bell = await screen.findByRole('link', { name: 'Notices, 2 unread' });
    expect(bell).toHaveAttribute('href', '/notices');
    expect(within(bell).getByTestId('notices-count')).toHaveTextContent('2');
  });

  it('shows a plain bell when everything is read', async () => {
    const fetchMock = noticesApi([older]);
    renderApp('/');
    const bell = await screen.findByRole('link', { name: 'Notices' });
    await waitFor(() => expect(callsTo(fetchMock, 'GET', '/api/notifications').length).toBeGreaterThan(0));
    expect(within(bell).queryByTestId('notices-count')).not.toBeInTheDocument();
  });

  it('lists the notices newest first with links to the part and the BOMs, and marks them read', async () => {
    const fetchMock = noticesApi([older, middle, newest]);
    renderApp('/notices');
    const list = await screen.findByRole('list', { name: 'Notices, newest first' });
    const items = within(list).getAllByRole('listitem');
    expect(items.map((li) => within(li).getByRole('heading').textContent)).toEqual([
      'HV4558 is now obsolete',
      'KR-10K is now last-time buy',
      'AP4558 approved for HV4558',
    ]);
    expect(within(items[0]!).getByRole('link', { name: 'HV4558' })).toHaveAttribute('href', '/parts/7a0c0000-0000-4000-8000-000000000701');
    expect(within(items[0]!).getByRole('link', { name: /Tremolo rev B/ })).toHaveAttribute('href', '/boms/b0b00000-0000-4000-8000-000000000001');
    expect(within(items[0]!).getByRole('link', { name: /Phaser 4-stage/ })).toHaveTextContent('(1 line)');
    expect(within(items[2]!).getByText(/also e-mailed/)).toBeInTheDocument();
    expect(within(items[2]!).queryByRole('button', { name: /Mark as read/ })).not.toBeInTheDocument();

    const user = userEvent.setup();
    await user.click(within(items[0]!).getByRole('button', { name: 'Mark as read (HV4558 is now obsolete)' }));
    await waitFor(() => expect(callsTo(fetchMock, 'POST', `/api/notifications/${newest.id}/read`)).toHaveLength(1));
    expect(await screen.findByRole('link', { name: 'Notices, 1 unread' })).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Mark all as read' }));
    await waitFor(() => expect(callsTo(fetchMock, 'POST', '/api/notifications/read-all')).toHaveLength(1));
    expect(await screen.findByRole('link', { name: 'Notices' })).toBeInTheDocument();
    expect(screen.getByText('All read.')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Mark all as read' })).toBeDisabled();
  });

  it('says there is nothing yet', async () => {
    noticesApi([]);
    renderApp('/notices');
    expect(await screen.findByText('No notices')).toBeInTheDocument();
  });
});
