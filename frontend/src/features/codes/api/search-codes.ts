import type { CodeSummaryDto, Page } from '@causeway/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { CodeListParams } from '../utils/list-params';

/** `GET /api/codes`: one page of the catalogue, searched, filtered and sorted on the server. */
export function searchCodes(params: CodeListParams, { signal }: { signal?: AbortSignal } = {}): Promise<Page<CodeSummaryDto>> {
  return api.get<Page<CodeSummaryDto>>('/codes', {
    signal,
    params: {
      page: params.page,
      pageSize: params.pageSize,
      q: params.q,
      system: params.system,
      control: params.control,
      sort: params.sort,
      order: params.sort ? params.order : undefined,
    },
  });
}

export function searchCodesQueryOptions(params: CodeListParams) {
  return queryOptions({
    queryKey: ['codes', 'list', params] as const,
    queryFn: ({ signal }) => searchCodes(params, { signal }),
    // Keep the rows on screen while the next page, order or filter loads.
    placeholderData: keepPreviousData,
  });
}

export function useSearchCodes(params: CodeListParams) {
  return useQuery(searchCodesQueryOptions(params));
}
