import type { ApiErrorBody, FieldError } from '@causeway/shared';
import { authToken } from './auth-token';

export const API_BASE_URL = '/api';

/** Any failed call: the HTTP status (0 when the server could not be reached) and the server's error body. */
export class ApiError extends Error {
  readonly status: number;
  readonly body: ApiErrorBody;

  constructor(status: number, body: ApiErrorBody) {
    super(body.message);
    this.name = 'ApiError';
    this.status = status;
    this.body = body;
  }

  get fieldErrors(): FieldError[] {
    return this.body.errors ?? [];
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

type QueryValue = string | number | boolean | null | undefined;

export interface RequestOptions {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  body?: unknown;
  params?: Record<string, QueryValue>;
  signal?: AbortSignal;
  /**
   * A 401 normally means the session is over: the token is dropped and the user is sent to
   * sign in. On the sign-in call itself a 401 only means "wrong e-mail or password".
   */
  signOutOnUnauthorized?: boolean;
}

type UnauthorizedHandler = () => void;

const defaultUnauthorizedHandler: UnauthorizedHandler = () => {
  if (window.location.pathname !== '/sign-in') window.location.assign('/sign-in');
};
let unauthorizedHandler = defaultUnauthorizedHandler;

/**
 * How to send the user to the sign-in page after a 401. The router installs one that keeps
 * the page they were on, so they come back to it; returns a function that uninstalls it.
 */
export function setUnauthorizedHandler(handler: UnauthorizedHandler): () => void {
  unauthorizedHandler = handler;
  return () => {
    if (unauthorizedHandler === handler) unauthorizedHandler = defaultUnauthorizedHandler;
  };
}

function buildUrl(path: string, params?: Record<string, QueryValue>): string {
  const url = `${API_BASE_URL}${path.startsWith('/') ? path : `/${path}`}`;
  if (!params) return url;
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) {
    if (value === undefined || value === null || value === '') continue;
    search.set(key, String(value));
  }
  const query = search.toString();
  return query ? `${url}?${query}` : url;
}

async function readBody(response: Response): Promise<unknown> {
  if (response.status === 204) return undefined;
  const text = await response.text();
  if (!text) return undefined;
  const type = response.headers.get('content-type') ?? '';
  if (type.includes('json')) {
    try {
      return JSON.parse(text);
    } catch {
      return text;
    }
  }
  return text;
}

function fallbackMessage(status: number): string {
  if (status === 401) return 'Your session has ended; sign in again.';
  if (status === 403) return 'You are not allowed to do that.';
  if (status === 404) return 'That could not be found.';
  if (status >= 502 && status <= 504) return 'The Causeway server is not answering. Try again in a moment.';
  if (status >= 500) return 'Something went wrong on the server; nothing was changed.';
  return 'The request could not be completed.';
}

function toErrorBody(response: Response, payload: unknown): ApiErrorBody {
  if (payload && typeof payload === 'object' && typeof (payload as ApiErrorBody).message === 'string') {
    const body = payload as ApiErrorBody;
    return { ...body, statusCode: body.statusCode ?? response.status, error: body.error ?? response.statusText };
  }
  return {
    statusCode: response.status,
    error: response.statusText || 'Error',
    message: fallbackMessage(response.status),
  };
}

/** The one way the client talks to the server. */
export async function request<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const { method = 'GET', body, params, signal, signOutOnUnauthorized = true } = options;
  const headers = new Headers({ Accept: 'application/json' });
  if (body !== undefined) headers.set('Content-Type', 'application/json');
  const token = authToken.get();
  if (token) headers.set('Authorization', `Bearer ${token}`);

  let response: Response;
  try {
    response = await fetch(buildUrl(path, params), {
      method,
      headers,
      body: body === undefined ? undefined : JSON.stringify(body),
      signal,
    });
  } catch (cause) {
    if (signal?.aborted) throw cause;
    throw new ApiError(0, {
      statusCode: 0,
      error: 'Network Error',
      message: 'Causeway could not reach the server. Check the connection and try again.',
    });
  }

  const payload = await readBody(response);
  if (!response.ok) {
    const error = new ApiError(response.status, toErrorBody(response, payload));
    if (response.status === 401 && signOutOnUnauthorized) {
      authToken.clear();
      unauthorizedHandler();
    }
    throw error;
  }
  return payload as T;
}

type CallOptions = Omit<RequestOptions, 'method' | 'body'>;

export const api = {
  get: <T>(path: string, options?: CallOptions) => request<T>(path, { ...options, method: 'GET' }),
  post: <T>(path: string, body?: unknown, options?: CallOptions) => request<T>(path, { ...options, method: 'POST', body }),
  put: <T>(path: string, body?: unknown, options?: CallOptions) => request<T>(path, { ...options, method: 'PUT', body }),
  patch: <T>(path: string, body?: unknown, options?: CallOptions) => request<T>(path, { ...options, method: 'PATCH', body }),
  delete: <T>(path: string, options?: CallOptions) => request<T>(path, { ...options, method: 'DELETE' }),
};
