import type { TeardownDto } from '@causeway/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { KNOWLEDGE_QUERY_KEY } from './get-parts';

/** `GET /api/teardowns`: every teardown with its hours, scope and cautions. */
export function getTeardowns({ signal }: { signal?: AbortSignal } = {}): Promise<TeardownDto[]> {
  return api.get<TeardownDto[]>('/teardowns', { signal });
}

export function getTeardownsQueryOptions() {
  return queryOptions({ queryKey: [...KNOWLEDGE_QUERY_KEY, 'teardowns'] as const, queryFn: ({ signal }) => getTeardowns({ signal }) });
}

export function useTeardowns() {
  return useQuery(getTeardownsQueryOptions());
}
