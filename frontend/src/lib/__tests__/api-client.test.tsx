import { screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { api, ApiError, setUnauthorizedHandler } from '@/lib/api-client';
import { TOKEN_STORAGE_KEY } from '@/lib/auth-token';
import { fail, mockApi, ok } from '@/testing/mock-api';
import { makeUser } from '@/testing/test-data';
import { renderApp } from '@/testing/test-utils';

describe('API client', () => {
  let restoreHandler: (() => void) | undefined;
  afterEach(() => restoreHandler?.());

  it('sends the stored token and query, and returns the parsed body', async () => {
    window.localStorage.setItem(TOKEN_STORAGE_KEY, 'abc');
    const server = mockApi({ 'GET /api/admin/users': ok({ items: [], total: 0, page: 2, pageSize: 20 }) });

    const page = await api.get('/admin/users', { params: { page: 2, q: '', sort: undefined } });

    expect(page).toEqual({ items: [], total: 0, page: 2, pageSize: 20 });
    expect(server.requests[0].url).toBe('/api/admin/users?page=2');
    expect(server.requests[0].headers.get('Authorization')).toBe('Bearer abc');
  });

  it("throws an ApiError with the status and the server's error body", async () => {
    const body = { statusCode: 400, error: 'Bad Request', message: 'shop.currency: must be an ISO 4217 code', errors: [{ field: 'shop.currency', message: 'must be an ISO 4217 code' }] };
    mockApi({ 'PATCH /api/shops/mine': fail(400, body) });

    const error = await api.patch('/shops/mine', { currency: 'XX' }).catch((e: unknown) => e);

    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 400, message: body.message, body });
    expect((error as ApiError).fieldErrors).toEqual(body.errors);
  });

  it('signs the user out on a 401: the token goes and the user is sent to sign in', async () => {
    window.localStorage.setItem(TOKEN_STORAGE_KEY, 'expired');
    const toSignIn = vi.fn();
    restoreHandler = setUnauthorizedHandler(toSignIn);
    mockApi({ 'GET /api/me': fail(401, { error: 'Unauthorized', message: 'Unauthorized' }) });

    await expect(api.get('/me')).rejects.toMatchObject({ status: 401 });

    expect(window.localStorage.getItem(TOKEN_STORAGE_KEY)).toBeNull();
    expect(toSignIn).toHaveBeenCalledTimes(1);
  });

  it('leaves the session alone when a call opts out (the sign-in call: 401 means a wrong password)', async () => {
    window.localStorage.setItem(TOKEN_STORAGE_KEY, 'still-good');
    const toSignIn = vi.fn();
    restoreHandler = setUnauthorizedHandler(toSignIn);
    mockApi({ 'POST /api/auth/login': fail(401) });

    await expect(api.post('/auth/login', {}, { signOutOnUnauthorized: false })).rejects.toMatchObject({ status: 401 });

    expect(window.localStorage.getItem(TOKEN_STORAGE_KEY)).toBe('still-good');
    expect(toSignIn).not.toHaveBeenCalled();
  });

  it('turns a failed connection and a non-JSON answer into ApiErrors', async () => {
    vi.stubGlobal('fetch', vi.fn().mockRejectedValueOnce(new TypeError('Failed to fetch')).mockResolvedValueOnce(new Response('<html>Bad gateway</html>', { status: 502, headers: { 'Content-Type': 'text/html' } })));

    await expect(api.get('/me')).rejects.toMatchObject({ status: 0, message: expect.stringMatching(/could not reach the server/) });
    await expect(api.get('/me')).rejects.toMatchObject({ status: 502, body: { statusCode: 502, message: expect.stringMatching(/not answering/) } });
  });

  it('in the app, a session the server no longer accepts ends on the sign-in page', async () => {
    const app = await renderApp('/jobs', {
      user: makeUser(),
      api: { 'GET /api/me': fail(401, { error: 'Unauthorized', message: 'Unauthorized' }) },
    });

    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
    expect(window.localStorage.getItem(TOKEN_STORAGE_KEY)).toBeNull();
    // After signing in again the user comes back to where they were.
    expect(app.router.state.location.state).toMatchObject({ from: { pathname: '/jobs' } });
  });
});
