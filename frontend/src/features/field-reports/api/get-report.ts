import type { FieldReportDto } from '@causeway/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { FIELD_REPORTS_QUERY_KEY } from './get-my-reports';

/** `GET /api/field-reports/:id`: one of the caller's reports with its payload and attachments. */
export function getReport(id: string, { signal }: { signal?: AbortSignal } = {}): Promise<FieldReportDto> {
  return api.get<FieldReportDto>(`/field-reports/${encodeURIComponent(id)}`, { signal });
}

export function getReportQueryOptions(id: string) {
  return queryOptions({
    queryKey: [...FIELD_REPORTS_QUERY_KEY, 'detail', id] as const,
    queryFn: ({ signal }) => getReport(id, { signal }),
  });
}

export function useReport(id: string) {
  return useQuery(getReportQueryOptions(id));
}
