import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { USERS, json, meHandler, renderApp, stubApi } from '../../../test/render-app';

const message = (id: string, receivedAt: string, subject: string, text: string) => ({
  id,
  receivedAt,
  from: 'Understudy <no-reply@understudy.test>',
  to: ['someone@example.com'],
  subject,
  text,
  html: null,
});

describe('outbox page', () => {
  it('lists mail newest first and makes links in the body clickable', async () => {
    stubApi({
      'GET /api/auth/me': meHandler(USERS.admin),
      'GET /api/outbox': () =>
        json(200, {
          items: [
            message('1', '2025-03-01T10:00:00.000Z', 'Older reset', 'Reset here: http://localhost:5173/reset-password?token=abc.'),
            message('2', '2025-03-01T11:00:00.000Z', 'Newer invitation', 'Join: http://localhost:5173/accept-invitation?token=xyz'),
          ],
        }),
    });
    renderApp('/admin/outbox');
    const user = userEvent.setup();

    const list = await screen.findByRole('list', { name: 'Captured messages' });
    expect(within(list).getAllByRole('button').map((b) => b.querySelector('span')?.textContent)).toEqual([
      'Newer invitation',
      'Older reset',
    ]);
    const body = screen.getByTestId('outbox-message-body');
    expect(within(body).getByRole('link')).toHaveAttribute('href', 'http://localhost:5173/accept-invitation?token=xyz');

    await user.click(within(list).getByRole('button', { name: /older reset/i }));
    // Trailing sentence punctuation stays outside the link.
    expect(within(screen.getByTestId('outbox-message-body')).getByRole('link')).toHaveAttribute(
      'href',
      'http://localhost:5173/reset-password?token=abc',
    );
  });

  it('explains the empty outbox', async () => {
    stubApi({ 'GET /api/auth/me': meHandler(USERS.admin), 'GET /api/outbox': () => json(200, { items: [] }) });
    renderApp('/admin/outbox');
    expect(await screen.findByText('No mail yet')).toBeInTheDocument();
    expect(screen.getByText(/lands here instead of a real inbox/)).toBeInTheDocument();
  });
});
