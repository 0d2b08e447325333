import type { PartDto } from '@causeway/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** `GET /api/parts`: every part of the knowledge base (same key as the knowledge base pages). */
export function getParts({ signal }: { signal?: AbortSignal } = {}): Promise<PartDto[]> {
  return api.get<PartDto[]>('/parts', { signal });
}

export function getPartsQueryOptions() {
  return queryOptions({ queryKey: ['knowledge', 'parts'] as const, queryFn: ({ signal }) => getParts({ signal }), staleTime: 5 * 60_000 });
}

export function useParts() {
  return useQuery(getPartsQueryOptions());
}
