import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { TOKEN_STORAGE_KEY } from '@/lib/auth-token';
import { fail, ok } from '@/testing/mock-api';
import { makeAuthResponse, makeUser } from '@/testing/test-data';
import { renderApp } from '@/testing/test-utils';

describe('Sign in', () => {
  it('posts the credentials, keeps the token and returns to the page the user asked for', async () => {
    const user = makeUser({ displayName: 'Sam Fielding' });
    const app = await renderApp('/jobs', {
      api: { 'POST /api/auth/login': ok(makeAuthResponse(user, 'fresh-token')) },
    });

    // Signed out, so the app sent us to sign in first.
    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
    await app.user.type(screen.getByLabelText('E-mail'), '  sam@example.test ');
    await app.user.type(screen.getByLabelText('Password'), 'correct horse 1');
    await app.user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('heading', { name: 'Jobs' })).toBeInTheDocument();
    expect(app.server.calls('POST /api/auth/login')).toHaveLength(1);
    expect(app.server.calls('POST /api/auth/login')[0].body).toEqual({ email: 'sam@example.test', password: 'correct horse 1' });
    expect(window.localStorage.getItem(TOKEN_STORAGE_KEY)).toBe('fresh-token');
    expect(screen.getByTestId('header-user')).toHaveTextContent('Sam Fielding');
    // The answer to sign-in already carried the user; no second round trip.
    expect(app.server.calls('GET /api/me')).toHaveLength(0);
  });

  it("shows the server's message on a wrong password and stays on the form", async () => {
    const app = await renderApp('/sign-in', {
      api: { 'POST /api/auth/login': fail(401, { error: 'Unauthorized', message: 'The e-mail address or password is not right' }) },
    });

    await app.user.type(await screen.findByLabelText('E-mail'), 'sam@example.test');
    await app.user.type(screen.getByLabelText('Password'), 'wrong password 1');
    await app.user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('alert')).toHaveTextContent('The e-mail address or password is not right');
    expect(screen.getByRole('heading', { name: 'Sign in' })).toBeInTheDocument();
    expect(window.localStorage.getItem(TOKEN_STORAGE_KEY)).toBeNull();
  });

  it('checks the form before asking the server', async () => {
    const app = await renderApp('/sign-in');
    await app.user.click(await screen.findByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Give your e-mail address')).toBeInTheDocument();
    expect(screen.getByText('Give your password')).toBeInTheDocument();
    expect(app.server.calls('POST /api/auth/login')).toHaveLength(0);
  });
});
