import { useEffect } from 'react';
import { createBrowserRouter, RouterProvider, type RouteObject } from 'react-router-dom';
import { RouteError } from '@/components/errors/route-error';
import { PageLoader } from '@/components/page-loader';
import { paths } from '@/config/paths';
import { section, type SectionKey } from '@/config/sections';
import { setUnauthorizedHandler } from '@/lib/api-client';
import type { RouteModule, SignInState } from '@/types/router';

type AppRouter = ReturnType<typeof createBrowserRouter>;

/**
 * A page that only some users may open, under the same rule as its navigation entry. The
 * guard loads with the page, keeping it off the first load.
 */
function guarded(key: SectionKey, path: string, load: () => Promise<RouteModule>): RouteObject {
  return {
    path,
    lazy: async () => {
      const [{ RequireRole }, { Component: Page }] = await Promise.all([
        import('@/features/auth/components/require-role'),
        load(),
      ]);
      const { access } = section(key);
      return {
        Component: function GuardedPage() {
          return (
            <RequireRole access={access}>
              <Page />
            </RequireRole>
          );
        },
      };
    },
  };
}

/**
 * Every route module is loaded lazily, so the first load carries only the router, the
 * providers and the page being opened.
 */
export function createAppRoutes(): RouteObject[] {
  return [
    {
      path: paths.signIn,
      lazy: () => import('./routes/auth/sign-in'),
      HydrateFallback: PageLoader,
      ErrorBoundary: RouteError,
    },
    {
      path: paths.register,
      lazy: () => import('./routes/auth/register'),
      HydrateFallback: PageLoader,
      ErrorBoundary: RouteError,
    },
    {
      // Signed in, but printable: no navigation around it.
      path: '/jobs/:id/estimate/print',
      lazy: () => import('./routes/estimate-print'),
      HydrateFallback: PageLoader,
      ErrorBoundary: RouteError,
    },
    {
      // The vehicle owner's page: no account, outside the signed-in app.
      path: '/estimate/:token',
      lazy: () => import('./routes/public-estimate'),
      HydrateFallback: PageLoader,
      ErrorBoundary: RouteError,
    },
    {
      path: paths.home,
      lazy: () => import('./routes/app/root'),
      HydrateFallback: PageLoader,
      ErrorBoundary: RouteError,
      children: [
        {
          ErrorBoundary: RouteError,
          children: [
            { index: true, lazy: () => import('./routes/app/home') },
            { path: 'codes', lazy: () => import('./routes/app/codes') },
            { path: 'codes/:code', lazy: () => import('./routes/app/code') },
            { path: 'jobs', lazy: () => import('./routes/app/jobs') },
            { path: 'jobs/:id', lazy: () => import('./routes/app/job') },
            { path: 'vehicles', lazy: () => import('./routes/app/vehicles') },
            { path: 'vehicles/:id', lazy: () => import('./routes/app/vehicle') },
            guarded('imports', 'imports', () => import('./routes/app/imports')),
            guarded('imports', 'imports/:id', () => import('./routes/app/imports')),
            guarded('reports', 'reports', () => import('./routes/app/reports')),
            guarded('reports', 'reports/:id', () => import('./routes/app/reports')),
            guarded('review', 'review', () => import('./routes/app/review')),
            guarded('review', 'review/:id', () => import('./routes/app/review')),
            guarded('knowledge', 'knowledge', () => import('./routes/app/knowledge')),
            guarded('shop', 'shop', () => import('./routes/app/shop')),
            guarded('insights', 'insights', () => import('./routes/app/insights')),
            guarded('adminUsers', 'admin/users', () => import('./routes/app/admin/users')),
            guarded('adminAudit', 'admin/audit', () => import('./routes/app/admin/audit')),
            { path: '*', lazy: () => import('./routes/not-found') },
          ],
        },
      ],
    },
  ];
}

/** After a 401 the API client drops the token; this sends the user to sign in and back afterwards. */
export function useSignInRedirect(router: AppRouter): void {
  useEffect(
    () =>
      setUnauthorizedHandler(() => {
        const { location } = router.state;
        if (location.pathname === paths.signIn) return;
        const state: SignInState = { from: location };
        void router.navigate(paths.signIn, { replace: true, state });
      }),
    [router],
  );
}

type RouterProps = { router: AppRouter };

export function AppRouterProvider({ router }: RouterProps) {
  useSignInRedirect(router);
  return <RouterProvider router={router} />;
}

let browserRouter: AppRouter | undefined;

export function AppRouter() {
  browserRouter ??= createBrowserRouter(createAppRoutes());
  return <AppRouterProvider router={browserRouter} />;
}
