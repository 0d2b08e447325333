import type { UserDto } from '@causeway/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** `GET /api/shops/mine/members` (shop owners): everyone in the shop. */
export function getMembers({ signal }: { signal?: AbortSignal } = {}): Promise<UserDto[]> {
  return api.get<UserDto[]>('/shops/mine/members', { signal });
}

export function getMembersQueryOptions() {
  return queryOptions({
    queryKey: ['shop', 'members'] as const,
    queryFn: ({ signal }) => getMembers({ signal }),
  });
}

export function useMembers() {
  return useQuery(getMembersQueryOptions());
}
