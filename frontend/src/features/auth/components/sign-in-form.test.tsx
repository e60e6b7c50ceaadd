import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { SIGN_IN_FAILED_MESSAGE } from '@understudy/shared-types';
import { describe, expect, it } from 'vitest';
import { USERS, callsTo, json, renderApp, signedOut, stubApi } from '../../../test/render-app';

describe('sign-in form', () => {
  it('shows field errors for an empty form without calling the server', async () => {
    const fetchMock = stubApi({ 'GET /api/auth/me': signedOut });
    renderApp('/sign-in');
    const user = userEvent.setup();

    await user.click(await screen.findByRole('button', { name: 'Sign in' }));

    const email = screen.getByLabelText('E-mail');
    const password = screen.getByLabelText('Password');
    expect(email).toHaveAttribute('aria-invalid', 'true');
    expect(email).toHaveAccessibleDescription('Enter an e-mail address');
    expect(password).toHaveAttribute('aria-invalid', 'true');
    expect(password).toHaveAccessibleDescription('Enter your password');
    expect(callsTo(fetchMock, 'POST', '/api/auth/sign-in')).toHaveLength(0);
  });

  it('rejects a malformed e-mail address without calling the server', async () => {
    const fetchMock = stubApi({ 'GET /api/auth/me': signedOut });
    renderApp('/sign-in');
    const user = userEvent.setup();

    await user.type(await screen.findByLabelText('E-mail'), 'not-an-address');
    await user.type(screen.getByLabelText('Password'), 'whatever');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(screen.getByLabelText('E-mail')).toHaveAccessibleDescription('Enter a valid e-mail address');
    expect(screen.getByLabelText('Password')).not.toHaveAttribute('aria-invalid');
    expect(callsTo(fetchMock, 'POST', '/api/auth/sign-in')).toHaveLength(0);
  });

  it('shows the generic message when the server refuses the credentials', async () => {
    const fetchMock = stubApi({
      'GET /api/auth/me': signedOut,
      'POST /api/auth/sign-in': () => json(401, { error: { code: 'invalid_credentials', message: SIGN_IN_FAILED_MESSAGE } }),
    });
    renderApp('/sign-in');
    const user = userEvent.setup();

    await user.type(await screen.findByLabelText('E-mail'), 'viewer@understudy.test');
    await user.type(screen.getByLabelText('Password'), 'wrong-password');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('alert')).toHaveTextContent(SIGN_IN_FAILED_MESSAGE);
    expect(callsTo(fetchMock, 'POST', '/api/auth/sign-in')).toHaveLength(1);
    expect(callsTo(fetchMock, 'POST', '/api/auth/sign-in')[0]?.[1]?.body).toBe(
      JSON.stringify({ email: 'viewer@understudy.test', password: 'wrong-password' }),
    );
  });

  it('tells the person to wait when sign-in is rate limited', async () => {
    stubApi({
      'GET /api/auth/me': signedOut,
      'POST /api/auth/sign-in': () =>
        json(429, { error: { code: 'rate_limited', message: 'Too many requests' } }, { 'Retry-After': '600' }),
    });
    renderApp('/sign-in');
    const user = userEvent.setup();

    await user.type(await screen.findByLabelText('E-mail'), 'viewer@understudy.test');
    await user.type(screen.getByLabelText('Password'), 'guess');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText(/too many sign-in attempts\. wait about 10 minutes and try again/i)).toBeInTheDocument();
  });

  it('goes to the page in `next` after signing in', async () => {
    const admin = USERS.admin;
    stubApi({
      'GET /api/auth/me': signedOut,
      'POST /api/auth/sign-in': () => json(200, { user: admin }),
      'GET /api/users': () => json(200, { items: [] }),
      'GET /api/invitations': () => json(200, { items: [] }),
    });
    const { router } = renderApp('/sign-in?next=%2Fadmin%2Fpeople');
    const user = userEvent.setup();

    await user.type(await screen.findByLabelText('E-mail'), admin.email);
    await user.type(screen.getByLabelText('Password'), 'understudy-demo');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'People' })).toBeInTheDocument();
    await waitFor(() => expect(router.state.location.pathname).toBe('/admin/people'));
  });

  it('ignores an off-site `next` and goes home instead', async () => {
    stubApi({
      'GET /api/auth/me': signedOut,
      'POST /api/auth/sign-in': () => json(200, { user: USERS.viewer }),
    });
    const { router } = renderApp('/sign-in?next=%2F%2Fevil.example');
    const user = userEvent.setup();

    await user.type(await screen.findByLabelText('E-mail'), USERS.viewer.email);
    await user.type(screen.getByLabelText('Password'), 'understudy-demo');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('heading', { level: 1, name: /hello, vera viewer/i })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/');
  });
});
