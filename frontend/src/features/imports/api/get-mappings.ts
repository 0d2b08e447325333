import type { ImportMappingDto } from '@causeway/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { IMPORTS_QUERY_KEY } from './get-imports';

/** `GET /api/imports/mappings`: the column mappings saved for the shop. */
export function getMappings({ signal }: { signal?: AbortSignal } = {}): Promise<ImportMappingDto[]> {
  return api.get<ImportMappingDto[]>('/imports/mappings', { signal });
}

export function getMappingsQueryOptions() {
  return queryOptions({ queryKey: [...IMPORTS_QUERY_KEY, 'mappings'] as const, queryFn: ({ signal }) => getMappings({ signal }) });
}

export function useMappings() {
  return useQuery(getMappingsQueryOptions());
}
