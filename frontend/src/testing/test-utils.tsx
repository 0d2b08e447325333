import type { UserDto } from '@causeway/shared';
import { QueryClient } from '@tanstack/react-query';
import { render, screen, waitForElementToBeRemoved } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { ReactElement, ReactNode } from 'react';
import { createMemoryRouter, MemoryRouter } from 'react-router-dom';
import { AppProvider } from '@/app/provider';
import { AppRouterProvider, createAppRoutes } from '@/app/router';
import { TOKEN_STORAGE_KEY } from '@/lib/auth-token';
import { mockApi, ok, type Handlers } from './mock-api';

export const TEST_TOKEN = 'test-token';

/** A fresh client per test: no retries (a failure shows at once), nothing shared between tests. */
export function createTestQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: { queries: { retry: false, gcTime: Infinity }, mutations: { retry: false } },
  });
}

interface RenderAppOptions {
  /** Signed in as this user (a token is stored and `GET /api/me` answers with them); null for signed out. */
  user?: UserDto | null;
  /** Answers of the mocked server, by `METHOD /api/path`. */
  api?: Handlers;
}

/**
 * Renders the real app (providers, routes, lazy pages) at `url`, against a mocked server.
 * Waits until the first page has loaded.
 */
export async function renderApp(url: string, { user = null, api = {} }: RenderAppOptions = {}) {
  if (user) {
    window.localStorage.setItem(TOKEN_STORAGE_KEY, TEST_TOKEN);
    api = { 'GET /api/me': ok(user), ...api };
  }
  const server = mockApi(api);
  const queryClient = createTestQueryClient();
  const router = createMemoryRouter(createAppRoutes(), { initialEntries: [url] });
  const result = render(
    <AppProvider queryClient={queryClient}>
      <AppRouterProvider router={router} />
    </AppProvider>,
  );
  await waitForPageLoaded();
  return { ...result, server, router, queryClient, user: userEvent.setup({ delay: null }) };
}

/** Waits until no route or account is loading any more. */
export async function waitForPageLoaded(): Promise<void> {
  const busy = () => [...screen.queryAllByRole('status'), ...document.querySelectorAll('.ant-spin-spinning')];
  if (busy().length > 0) await waitForElementToBeRemoved(busy, { timeout: 30_000 });
}

/** For a single component that needs the providers and a router but not the whole app. */
export function renderWithProviders(ui: ReactElement, { url = '/' }: { url?: string } = {}) {
  const queryClient = createTestQueryClient();
  const wrapper = ({ children }: { children: ReactNode }) => (
    <AppProvider queryClient={queryClient}>
      <MemoryRouter initialEntries={[url]}>{children}</MemoryRouter>
    </AppProvider>
  );
  return { ...render(ui, { wrapper }), queryClient, user: userEvent.setup({ delay: null }) };
}
