import type { Page, UserDto } from '@causeway/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { UserListParams } from '../utils/list-params';

export const USERS_QUERY_KEY = ['admin', 'users'] as const;

/** `GET /api/admin/users` (admins): one page of accounts, searched and sorted on the server. */
export function getUsers(params: UserListParams, { signal }: { signal?: AbortSignal } = {}): Promise<Page<UserDto>> {
  return api.get<Page<UserDto>>('/admin/users', {
    signal,
    params: {
      page: params.page,
      pageSize: params.pageSize,
      q: params.q,
      sort: params.sort,
      order: params.sort ? params.order : undefined,
      role: params.role,
    },
  });
}

export function getUsersQueryOptions(params: UserListParams) {
  return queryOptions({
    queryKey: [...USERS_QUERY_KEY, params] as const,
    queryFn: ({ signal }) => getUsers(params, { signal }),
    // Keep the rows on screen while the next page or order loads.
    placeholderData: keepPreviousData,
  });
}

export function useUsers(params: UserListParams) {
  return useQuery(getUsersQueryOptions(params));
}
