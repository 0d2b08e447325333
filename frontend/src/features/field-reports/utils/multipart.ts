import type { ApiErrorBody } from '@causeway/shared';
import { API_BASE_URL, ApiError } from '@/lib/api-client';
import { authToken } from '@/lib/auth-token';

function isErrorBody(value: unknown): value is ApiErrorBody {
  return !!value && typeof value === 'object' && typeof (value as ApiErrorBody).message === 'string';
}

/**
 * A multipart POST with the signed-in user's bearer token. The API client speaks JSON only;
 * this sends a FormData body and fails with the same ApiError, so forms show the server's words.
 */
export async function postMultipart<T>(path: string, form: FormData): Promise<T> {
  const headers = new Headers({ Accept: 'application/json' });
  const token = authToken.get();
  if (token) headers.set('Authorization', `Bearer ${token}`);
  let response: Response;
  try {
    response = await fetch(`${API_BASE_URL}${path}`, { method: 'POST', headers, body: form });
  } catch {
    throw new ApiError(0, { statusCode: 0, error: 'Network Error', message: 'Causeway could not reach the server. Check the connection and try again.' });
  }
  const text = await response.text();
  let payload: unknown = undefined;
  if (text) {
    try {
      payload = JSON.parse(text);
    } catch {
      payload = text;
    }
  }
  if (!response.ok) {
    if (response.status === 401) authToken.clear();
    if (isErrorBody(payload)) throw new ApiError(response.status, { ...payload, statusCode: payload.statusCode ?? response.status });
    const message =
      response.status === 413 ? 'The upload is too large for the server.' : response.status === 401 ? 'Your session has ended; sign in again.' : 'The upload could not be completed.';
    throw new ApiError(response.status, { statusCode: response.status, error: response.statusText || 'Error', message });
  }
  return payload as T;
}
