import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { ALERT_DELIVERY_LABELS } from '@understudy/shared-types';
import { describe, expect, it } from 'vitest';
import { USERS, callsTo, json, meHandler, renderApp, stubApi } from '../../../test/render-app';

/** A radio's name starts with its label; the hint follows. */
const labelled = (text: string) => new RegExp(`^${text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}`);

describe('alert settings', () => {
  it('shows the saved choice, saves a new one and confirms it', async () => {
    const fetchMock = stubApi({
      'GET /api/auth/me': meHandler(USERS.viewer),
      'GET /api/notifications': () => json(200, { items: [], unread: 0 }),
      'GET /api/me/alert-preferences': () => json(200, { delivery: 'immediate' }),
      'PUT /api/me/alert-preferences': ({ body }) => json(200, body),
    });
    renderApp('/settings/alerts');
    const immediate = await screen.findByRole('radio', { name: labelled(ALERT_DELIVERY_LABELS.immediate) });
    expect(immediate).toBeChecked();
    expect(screen.getAllByRole('radio')).toHaveLength(3);
    const save = screen.getByRole('button', { name: 'Save' });
    expect(save).toBeDisabled();

    const user = userEvent.setup();
    await user.click(screen.getByRole('radio', { name: labelled(ALERT_DELIVERY_LABELS.daily) }));
    await user.click(save);
    await waitFor(() => expect(callsTo(fetchMock, 'PUT', '/api/me/alert-preferences')).toHaveLength(1));
    expect(JSON.parse(String(callsTo(fetchMock, 'PUT', '/api/me/alert-preferences')[0]![1]!.body))).toEqual({ delivery: 'daily' });
    expect(await screen.findByRole('status')).toHaveTextContent(`Saved${ALERT_DELIVERY_LABELS.daily}.`);
    expect(screen.getByRole('radio', { name: labelled(ALERT_DELIVERY_LABELS.daily) })).toBeChecked();
  });

  it('says why a save failed and keeps the choice', async () => {
    stubApi({
      'GET /api/auth/me': meHandler(USERS.viewer),
      'GET /api/notifications': () => json(200, { items: [], unread: 0 }),
      'GET /api/me/alert-preferences': () => json(200, { delivery: 'daily' }),
      'PUT /api/me/alert-preferences': () => json(400, { error: { code: 'validation_failed', message: 'Choose how to be told.' } }),
    });
    renderApp('/settings/alerts');
    const user = userEvent.setup();
    await user.click(await screen.findByRole('radio', { name: labelled(ALERT_DELIVERY_LABELS.off) }));
    await user.click(screen.getByRole('button', { name: 'Save' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('Choose how to be told.');
    expect(screen.getByRole('radio', { name: labelled(ALERT_DELIVERY_LABELS.off) })).toBeChecked();
  });
});
