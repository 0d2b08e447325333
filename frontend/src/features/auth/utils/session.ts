import type { AuthResponse } from '@causeway/shared';
import type { QueryClient } from '@tanstack/react-query';
import { authToken } from '@/lib/auth-token';
import { CURRENT_USER_QUERY_KEY } from '@/lib/current-user';

/**
 * Keeps the token and primes the signed-in user, so the app needs no second round trip.
 * A fresh sign-in drops whatever an earlier session left in the cache.
 */
export function startSession(queryClient: QueryClient, response: AuthResponse, { fresh }: { fresh: boolean }): void {
  if (fresh) queryClient.removeQueries();
  authToken.set(response.accessToken);
  queryClient.setQueryData(CURRENT_USER_QUERY_KEY, response.user);
}
