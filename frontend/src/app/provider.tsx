import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { App as AntApp, ConfigProvider } from 'antd';
import { useEffect, useState, type ReactNode } from 'react';
import { theme } from '@/config/theme';
import { authToken } from '@/lib/auth-token';
import { createQueryClient } from '@/lib/react-query';

type AppProviderProps = {
  children: ReactNode;
  /** Tests pass a fresh client of their own. */
  queryClient?: QueryClient;
};

/** QueryClientProvider › ConfigProvider (our theme) › antd App (message/modal that see the theme). */
export function AppProvider({ children, queryClient }: AppProviderProps) {
  const [client] = useState(() => queryClient ?? createQueryClient());

  // However the session ends (sign-out, a 401, another tab), nothing fetched with it stays.
  useEffect(
    () =>
      authToken.subscribe(() => {
        if (authToken.get() === null) client.removeQueries();
      }),
    [client],
  );

  return (
    <QueryClientProvider client={client}>
      <ConfigProvider theme={theme}>
        <AntApp>{children}</AntApp>
      </ConfigProvider>
    </QueryClientProvider>
  );
}
