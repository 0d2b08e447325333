import type { ImportSummaryDto, Page } from '@causeway/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export const IMPORTS_QUERY_KEY = ['imports'] as const;

export interface ImportListParams {
  page: number;
  pageSize: number;
}

/** `GET /api/imports`: the shop's import history, newest first. */
export function getImports(params: ImportListParams, { signal }: { signal?: AbortSignal } = {}): Promise<Page<ImportSummaryDto>> {
  return api.get<Page<ImportSummaryDto>>('/imports', { signal, params: { page: params.page, pageSize: params.pageSize } });
}

export function getImportsQueryOptions(params: ImportListParams) {
  return queryOptions({
    queryKey: [...IMPORTS_QUERY_KEY, 'history', params] as const,
    queryFn: ({ signal }) => getImports(params, { signal }),
    placeholderData: keepPreviousData,
  });
}

export function useImports(params: ImportListParams) {
  return useQuery({
    ...getImportsQueryOptions(params),
    // While an import runs, its row in the history moves on its own.
    refetchInterval: (query) => (query.state.data?.items.some((i) => i.status === 'running') ? 2000 : false),
  });
}
