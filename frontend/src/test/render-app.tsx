import { render } from '@testing-library/react';
import type { CurrentUser } from '@understudy/shared-types';
import { createMemoryRouter, RouterProvider } from 'react-router';
import { vi } from 'vitest';
import { AppProvider, createAppQueryClient } from '../app/provider';
import { routes } from '../app/router';

type Handler = (request: {
  method: string;
  path: string;
  /** The parsed JSON body, or the raw text when the body is not JSON (an uploaded CSV). */
  body: unknown;
  query: URLSearchParams;
  headers: Headers;
}) => Response | Promise<Response>;

function readBody(body: RequestInit['body']): unknown {
  if (typeof body !== 'string') return undefined;
  try {
    return JSON.parse(body) as unknown;
  } catch {
    return body;
  }
}

export function json(status: number, body?: unknown, headers: Record<string, string> = {}): Response {
  return new Response(body === undefined ? null : JSON.stringify(body), {
    status,
    headers: { 'Content-Type': 'application/json', ...headers },
  });
}

export const signedOut: Handler = () => json(401, { error: { code: 'unauthenticated', message: 'Sign in to continue.' } });

/**
 * Replaces fetch at the network boundary. Keys are "METHOD /api/path" (query string ignored);
 * anything unlisted answers 404 so a forgotten call shows up as a visible failure.
 */
export function stubApi(handlers: Record<string, Handler>) {
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = new URL(typeof input === 'string' ? input : input instanceof URL ? input.href : input.url, 'http://localhost');
    const method = (init?.method ?? 'GET').toUpperCase();
    const body = readBody(init?.body);
    const handler = handlers[`${method} ${url.pathname}`];
    if (!handler) return json(404, { error: { code: 'not_found', message: `No stub for ${method} ${url.pathname}` } });
    return handler({ method, path: url.pathname, body, query: url.searchParams, headers: new Headers(init?.headers) });
  });
  vi.stubGlobal('fetch', fetchMock);
  return fetchMock;
}

export function callsTo(fetchMock: ReturnType<typeof stubApi>, method: string, path: string) {
  return fetchMock.mock.calls.filter(([input, init]) => {
    const url = new URL(String(input), 'http://localhost');
    return (init?.method ?? 'GET').toUpperCase() === method && url.pathname === path;
  });
}

export function meHandler(user: CurrentUser | null): Handler {
  return user ? () => json(200, { user }) : signedOut;
}

export function renderApp(path: string) {
  const router = createMemoryRouter(routes, { initialEntries: [path] });
  const queryClient = createAppQueryClient();
  const utils = render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { ...utils, router, queryClient };
}

export const USERS: Record<CurrentUser['role'], CurrentUser> = {
  viewer: { id: '3f1c2a9e-1111-4c4c-8a8a-000000000001', email: 'viewer@understudy.test', name: 'Vera Viewer', role: 'viewer' },
  editor: { id: '3f1c2a9e-2222-4c4c-8a8a-000000000002', email: 'editor@understudy.test', name: 'Eddie Editor', role: 'editor' },
  admin: { id: '3f1c2a9e-3333-4c4c-8a8a-000000000003', email: 'admin@understudy.test', name: 'Ada Admin', role: 'admin' },
};
