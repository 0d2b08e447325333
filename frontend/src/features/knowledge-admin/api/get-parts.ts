import type { PartDto } from '@causeway/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** Everything cached from the knowledge base; every direct edit invalidates it. */
export const KNOWLEDGE_QUERY_KEY = ['knowledge'] as const;

/** `GET /api/parts`: every part. */
export function getParts({ signal }: { signal?: AbortSignal } = {}): Promise<PartDto[]> {
  return api.get<PartDto[]>('/parts', { signal });
}

export function getPartsQueryOptions() {
  return queryOptions({ queryKey: [...KNOWLEDGE_QUERY_KEY, 'parts'] as const, queryFn: ({ signal }) => getParts({ signal }) });
}

export function useParts() {
  return useQuery(getPartsQueryOptions());
}
