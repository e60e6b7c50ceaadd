import { ApiErrorSchema } from '@understudy/shared-types';
import type { z } from 'zod';

export interface FieldIssue {
  path: string;
  message: string;
}

/** Every failed API call surfaces as one of these, whatever went wrong underneath. */
export class ApiClientError extends Error {
  readonly status: number;
  readonly code: string;
  readonly issues: FieldIssue[];
  /** Seconds the server asked us to wait (from Retry-After), when it said. */
  readonly retryAfterSeconds: number | null;
  /** The whole error body, for answers that carry more than the error (a 409 sends the current record). */
  readonly payload: unknown;

  constructor(init: {
    status: number;
    code: string;
    message: string;
    issues?: FieldIssue[];
    retryAfterSeconds?: number | null;
    payload?: unknown;
  }) {
    super(init.message);
    this.name = 'ApiClientError';
    this.status = init.status;
    this.code = init.code;
    this.issues = init.issues ?? [];
    this.retryAfterSeconds = init.retryAfterSeconds ?? null;
    this.payload = init.payload;
  }
}

export function isApiClientError(error: unknown): error is ApiClientError {
  return error instanceof ApiClientError;
}

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

interface RequestOptions<S extends z.ZodType | undefined> {
  method?: Method;
  body?: unknown;
  /** A body sent as is (a file's text), with its own content type, instead of JSON. */
  rawBody?: { text: string; contentType: string };
  /** A multipart form (a file upload); the browser sets its content type and boundary. */
  form?: FormData;
  query?: Record<string, string | undefined>;
  /** The shared schema the response must satisfy; omit for empty (204) responses. */
  schema?: S;
  signal?: AbortSignal;
}

type Result<S> = S extends z.ZodType ? z.output<S> : undefined;

const FALLBACK_MESSAGES: Record<number, string> = {
  400: 'Some of the details need another look.',
  401: 'Please sign in to continue.',
  403: 'You do not have permission to do that.',
  404: 'That could not be found.',
  409: 'That conflicts with the current state. Refresh and try again.',
  410: 'That link has expired.',
  413: 'The file is too large to send.',
  429: 'Too many attempts. Wait a moment and try again.',
};

function parseRetryAfter(header: string | null): number | null {
  if (!header) return null;
  const seconds = Number(header);
  if (Number.isFinite(seconds) && seconds >= 0) return Math.ceil(seconds);
  const date = Date.parse(header);
  return Number.isNaN(date) ? null : Math.max(0, Math.ceil((date - Date.now()) / 1000));
}

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return undefined;
  }
}

/** The address of an API path with its query, for links (downloads) as well as fetches. */
export function apiUrl(path: string, query?: Record<string, string | undefined>): string {
  const url = `/api${path}`;
  if (!query) return url;
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== undefined) params.set(key, value);
  }
  const search = params.toString();
  return search ? `${url}?${search}` : url;
}

export async function apiRequest<S extends z.ZodType | undefined = undefined>(
  path: string,
  options: RequestOptions<S> = {},
): Promise<Result<S>> {
  const { method = 'GET', body, rawBody, form, query, schema, signal } = options;
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (rawBody) headers['Content-Type'] = rawBody.contentType;
  else if (body !== undefined) headers['Content-Type'] = 'application/json';

  let response: Response;
  try {
    response = await fetch(apiUrl(path, query), {
      method,
      headers,
      credentials: 'same-origin',
      body: form ?? (rawBody ? rawBody.text : body === undefined ? undefined : JSON.stringify(body)),
      signal,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiClientError({
      status: 0,
      code: 'network_error',
      message: 'Understudy could not reach the server. Check your connection and try again.',
    });
  }

  const payload = await readJson(response);

  if (!response.ok) {
    const parsed = ApiErrorSchema.safeParse(payload);
    throw new ApiClientError({
      status: response.status,
      code: parsed.success ? parsed.data.error.code : `http_${response.status}`,
      message: parsed.success
        ? parsed.data.error.message
        : (FALLBACK_MESSAGES[response.status] ?? 'Something went wrong on our side. Try again in a moment.'),
      issues: parsed.success ? parsed.data.error.issues : undefined,
      retryAfterSeconds: parseRetryAfter(response.headers.get('Retry-After')),
      payload,
    });
  }

  if (!schema) return undefined as Result<S>;

  const result = schema.safeParse(payload);
  if (!result.success) {
    // A response that breaks the contract is a bug, not something the person can fix.
    console.error(`Unexpected response shape from ${method} ${path}`, result.error.issues);
    throw new ApiClientError({
      status: response.status,
      code: 'invalid_response',
      message: 'The server sent an answer Understudy did not expect. Try again, or tell an admin.',
    });
  }
  return result.data as Result<S>;
}

export const api = {
  get: <S extends z.ZodType>(path: string, schema: S, options: Omit<RequestOptions<S>, 'schema' | 'method' | 'body'> = {}) =>
    apiRequest(path, { ...options, schema, method: 'GET' }),
  post: <S extends z.ZodType | undefined = undefined>(path: string, body?: unknown, schema?: S) =>
    apiRequest(path, { method: 'POST', body, schema }),
  patch: <S extends z.ZodType | undefined = undefined>(path: string, body: unknown, schema?: S) =>
    apiRequest(path, { method: 'PATCH', body, schema }),
  delete: (path: string) => apiRequest(path, { method: 'DELETE' }),
};
