import { QueryClient, type DefaultOptions, type UseMutationOptions } from '@tanstack/react-query';
import { isApiError } from './api-client';

export const queryConfig = {
  queries: {
    refetchOnWindowFocus: false,
    staleTime: 60_000,
    // A 4xx will not change by asking again; a dropped connection or a 5xx might.
    retry: (failureCount: number, error: unknown) => {
      if (isApiError(error) && error.status >= 400 && error.status < 500) return false;
      return failureCount < 2;
    },
  },
} satisfies DefaultOptions;

export function createQueryClient(): QueryClient {
  return new QueryClient({ defaultOptions: queryConfig });
}

type AsyncFn = (...args: never[]) => Promise<unknown>;

export type ApiFnReturnType<FnType extends AsyncFn> = Awaited<ReturnType<FnType>>;

export type MutationConfig<MutationFnType extends AsyncFn> = UseMutationOptions<
  ApiFnReturnType<MutationFnType>,
  Error,
  Parameters<MutationFnType>[0]
>;
