import type { ImportDto } from '@causeway/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { IMPORTS_QUERY_KEY } from './get-imports';

/** `GET /api/imports/:id`: one import with its report; its progress while it runs. */
export function getImport(id: string, { signal }: { signal?: AbortSignal } = {}): Promise<ImportDto> {
  return api.get<ImportDto>(`/imports/${encodeURIComponent(id)}`, { signal });
}

export function getImportQueryOptions(id: string) {
  return queryOptions({
    queryKey: [...IMPORTS_QUERY_KEY, 'detail', id] as const,
    queryFn: ({ signal }) => getImport(id, { signal }),
  });
}

/** Polls every `intervalMs` while the import runs. */
export function useImport(id: string, { enabled = true, intervalMs = 1000 }: { enabled?: boolean; intervalMs?: number } = {}) {
  return useQuery({
    ...getImportQueryOptions(id),
    enabled,
    retry: false,
    refetchInterval: (query) => (query.state.data?.status === 'running' || (query.state.status === 'error' && enabled) ? intervalMs : false),
  });
}
