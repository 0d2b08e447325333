import type { UserDto } from '@causeway/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** `GET /api/shops/mine/members` (shop owners): the technicians a job list can be filtered by. */
export function getShopMembers({ signal }: { signal?: AbortSignal } = {}): Promise<UserDto[]> {
  return api.get<UserDto[]>('/shops/mine/members', { signal });
}

export function getShopMembersQueryOptions() {
  return queryOptions({
    queryKey: ['shop', 'members'] as const,
    queryFn: ({ signal }) => getShopMembers({ signal }),
  });
}

export function useShopMembers({ enabled }: { enabled: boolean }) {
  return useQuery({ ...getShopMembersQueryOptions(), enabled });
}
