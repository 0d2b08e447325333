import type { ApiErrorBody } from '@causeway/shared';
import { API_BASE_URL, ApiError } from '@/lib/api-client';
import { authToken } from '@/lib/auth-token';

export interface UploadProgress {
  loaded: number;
  total: number;
}

export interface XhrUploadOptions {
  params?: Record<string, string | number | boolean | undefined>;
  /** Bytes sent so far; the API client is fetch-based and cannot report them. */
  onProgress?: (progress: UploadProgress) => void;
  signal?: AbortSignal;
}

function isErrorBody(value: unknown): value is ApiErrorBody {
  return !!value && typeof value === 'object' && typeof (value as ApiErrorBody).message === 'string';
}

function fallbackMessage(status: number): string {
  if (status === 0) return 'Causeway could not reach the server. Check the connection and try again.';
  if (status === 401) return 'Your session has ended; sign in again.';
  if (status === 403) return 'You are not allowed to do that.';
  if (status === 413) return 'The file is larger than the server accepts.';
  if (status >= 502 && status <= 504) return 'The Causeway server is not answering. Try again in a moment.';
  if (status >= 500) return 'Something went wrong on the server; nothing was changed.';
  return 'The upload could not be completed.';
}

/**
 * A multipart POST through XMLHttpRequest, for the upload progress fetch cannot give. It sends
 * the same bearer token as the API client and fails with the same ApiError.
 */
export function xhrUpload<T>(path: string, form: FormData, { params, onProgress, signal }: XhrUploadOptions = {}): Promise<T> {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params ?? {})) if (value !== undefined && value !== '') search.set(key, String(value));
  const query = search.toString();
  const url = `${API_BASE_URL}${path}${query ? `?${query}` : ''}`;

  return new Promise<T>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', url);
    xhr.setRequestHeader('Accept', 'application/json');
    const token = authToken.get();
    if (token) xhr.setRequestHeader('Authorization', `Bearer ${token}`);
    if (onProgress) {
      xhr.upload.onprogress = (event) => onProgress({ loaded: event.loaded, total: event.lengthComputable ? event.total : 0 });
    }
    const abort = () => xhr.abort();
    signal?.addEventListener('abort', abort, { once: true });
    const done = () => signal?.removeEventListener('abort', abort);

    xhr.onload = () => {
      done();
      let payload: unknown = undefined;
      if (xhr.responseText) {
        try {
          payload = JSON.parse(xhr.responseText);
        } catch {
          payload = xhr.responseText;
        }
      }
      if (xhr.status >= 200 && xhr.status < 300) {
        resolve(payload as T);
        return;
      }
      if (xhr.status === 401) authToken.clear();
      const body: ApiErrorBody = isErrorBody(payload)
        ? { ...payload, statusCode: payload.statusCode ?? xhr.status }
        : { statusCode: xhr.status, error: xhr.statusText || 'Error', message: fallbackMessage(xhr.status) };
      reject(new ApiError(xhr.status, body));
    };
    xhr.onerror = () => {
      done();
      reject(new ApiError(0, { statusCode: 0, error: 'Network Error', message: fallbackMessage(0) }));
    };
    xhr.onabort = () => {
      done();
      reject(new DOMException('The upload was cancelled', 'AbortError'));
    };
    xhr.send(form);
  });
}

/** A version 4 UUID, also where `crypto.randomUUID` is missing (plain http on a LAN address). */
export function newUuid(): string {
  if (typeof crypto !== 'undefined' && typeof crypto.randomUUID === 'function') return crypto.randomUUID();
  const bytes = new Uint8Array(16);
  crypto.getRandomValues(bytes);
  bytes[6] = (bytes[6] & 0x0f) | 0x40;
  bytes[8] = (bytes[8] & 0x3f) | 0x80;
  const hex = [...bytes].map((b) => b.toString(16).padStart(2, '0')).join('');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}
