import type { TeardownDto } from '@causeway/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** `GET /api/teardowns`: what must be taken apart, for the teardown of a new possible cause. */
export function getTeardowns({ signal }: { signal?: AbortSignal } = {}): Promise<TeardownDto[]> {
  return api.get<TeardownDto[]>('/teardowns', { signal });
}

export function getTeardownsQueryOptions() {
  return queryOptions({ queryKey: ['knowledge', 'teardowns'] as const, queryFn: ({ signal }) => getTeardowns({ signal }), staleTime: 5 * 60_000 });
}

export function useTeardowns() {
  return useQuery(getTeardownsQueryOptions());
}
