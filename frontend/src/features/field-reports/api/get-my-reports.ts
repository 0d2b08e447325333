import type { FieldReportSummaryDto, Page } from '@causeway/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MyReportsParams } from '../utils/list-params';

/** Everything cached about the signed-in contributor's own reports; mutations invalidate it. */
export const FIELD_REPORTS_QUERY_KEY = ['field-reports'] as const;

/** `GET /api/field-reports` (contributors): the caller's own reports, most recently changed first. */
export function getMyReports(params: MyReportsParams, { signal }: { signal?: AbortSignal } = {}): Promise<Page<FieldReportSummaryDto>> {
  return api.get<Page<FieldReportSummaryDto>>('/field-reports', {
    signal,
    params: { page: params.page, pageSize: params.pageSize, status: params.status, kind: params.kind },
  });
}

export function getMyReportsQueryOptions(params: MyReportsParams) {
  return queryOptions({
    queryKey: [...FIELD_REPORTS_QUERY_KEY, 'mine', params] as const,
    queryFn: ({ signal }) => getMyReports(params, { signal }),
    placeholderData: keepPreviousData,
  });
}

export function useMyReports(params: MyReportsParams) {
  return useQuery(getMyReportsQueryOptions(params));
}
