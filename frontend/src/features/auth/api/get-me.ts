import type { UserDto } from '@causeway/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { useAuthToken } from '@/lib/auth-token';
import { CURRENT_USER_QUERY_KEY } from '@/lib/current-user';

/** `GET /api/me`: the signed-in user, with their shop. */
export function getMe({ signal }: { signal?: AbortSignal } = {}): Promise<UserDto> {
  return api.get<UserDto>('/me', { signal });
}

export function getMeQueryOptions() {
  return queryOptions({
    queryKey: CURRENT_USER_QUERY_KEY,
    queryFn: ({ signal }) => getMe({ signal }),
    staleTime: 5 * 60_000,
  });
}

/** The signed-in user, fetched only while there is a token. */
export function useUser() {
  const token = useAuthToken();
  return useQuery({ ...getMeQueryOptions(), enabled: token !== null });
}
