import type { CodeIndexEntry } from '@causeway/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** `GET /api/codes/index`: the whole catalogue in one small response, for the instant search. */
export function getCodeIndex({ signal }: { signal?: AbortSignal } = {}): Promise<CodeIndexEntry[]> {
  return api.get<CodeIndexEntry[]>('/codes/index', { signal });
}

export function getCodeIndexQueryOptions() {
  return queryOptions({
    queryKey: ['codes', 'index'] as const,
    queryFn: ({ signal }) => getCodeIndex({ signal }),
    // The catalogue changes only when an admin imports one: fetch it once per visit.
    staleTime: 60 * 60 * 1000,
    gcTime: 2 * 60 * 60 * 1000,
  });
}

export function useCodeIndex({ enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...getCodeIndexQueryOptions(), enabled });
}
