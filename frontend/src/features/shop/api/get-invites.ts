import type { InviteDto } from '@causeway/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** `GET /api/shops/mine/invites` (shop owners). */
export function getInvites({ signal }: { signal?: AbortSignal } = {}): Promise<InviteDto[]> {
  return api.get<InviteDto[]>('/shops/mine/invites', { signal });
}

export function getInvitesQueryOptions() {
  return queryOptions({
    queryKey: ['shop', 'invites'] as const,
    queryFn: ({ signal }) => getInvites({ signal }),
  });
}

export function useInvites() {
  return useQuery(getInvitesQueryOptions());
}
