import type { ApiErrorBody } from '@causeway/shared';
import { vi } from 'vitest';

export interface RecordedRequest {
  method: string;
  /** Path with query, e.g. `/api/admin/users?page=2`. */
  url: string;
  path: string;
  query: URLSearchParams;
  headers: Headers;
  body: unknown;
}

type Reply = Response | Promise<Response>;
export type Handler = (request: RecordedRequest) => Reply;
/** Keyed by `METHOD /api/path` (no query string). */
export type Handlers = Record<string, Handler>;

export function jsonResponse(status: number, body: unknown): Response {
  return new Response(body === undefined ? null : JSON.stringify(body), {
    status,
    headers: { 'Content-Type': 'application/json' },
  });
}

export function ok(body: unknown): Handler {
  return () => jsonResponse(200, body);
}

export function fail(status: number, body: Partial<ApiErrorBody> = {}): Handler {
  return () => jsonResponse(status, { statusCode: status, error: 'Error', message: 'Failed', ...body });
}

/**
 * Replaces `fetch` with a mock that answers from `handlers` and records every request.
 * A request nobody answers gets a 404 and fails the test's expectations loudly.
 */
export function mockApi(handlers: Handlers) {
  const requests: RecordedRequest[] = [];
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init: RequestInit = {}) => {
    const url = typeof input === 'string' ? input : input instanceof URL ? input.href : input.url;
    const parsed = new URL(url, 'http://localhost');
    const method = (init.method ?? 'GET').toUpperCase();
    const rawBody = typeof init.body === 'string' ? init.body : undefined;
    const request: RecordedRequest = {
      method,
      url: `${parsed.pathname}${parsed.search}`,
      path: parsed.pathname,
      query: parsed.searchParams,
      headers: new Headers(init.headers),
      body: rawBody ? JSON.parse(rawBody) : undefined,
    };
    requests.push(request);
    const handler = handlers[`${method} ${parsed.pathname}`];
    if (!handler) {
      return jsonResponse(404, { statusCode: 404, error: 'Not Found', message: `No test handler for ${method} ${parsed.pathname}` });
    }
    return handler(request);
  });
  vi.stubGlobal('fetch', fetchMock);
  return {
    fetchMock,
    requests,
    /** Requests to one endpoint, e.g. `calls('POST /api/auth/login')`. */
    calls: (key: string) => requests.filter((r) => `${r.method} ${r.path}` === key),
    /** Changes or adds an answer mid-test. */
    on: (key: string, handler: Handler) => {
      handlers[key] = handler;
    },
  };
}
