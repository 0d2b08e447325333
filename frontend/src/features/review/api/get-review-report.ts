import type { ReviewReportDto } from '@causeway/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { REVIEW_QUERY_KEY } from './get-review-queue';

/** `GET /api/review/reports/:id` (moderators): the report with what approving would change. */
export function getReviewReport(id: string, { signal }: { signal?: AbortSignal } = {}): Promise<ReviewReportDto> {
  return api.get<ReviewReportDto>(`/review/reports/${encodeURIComponent(id)}`, { signal });
}

export function getReviewReportQueryOptions(id: string) {
  return queryOptions({
    queryKey: [...REVIEW_QUERY_KEY, 'report', id] as const,
    queryFn: ({ signal }) => getReviewReport(id, { signal }),
    // The before/after depends on the knowledge base as it is now.
    staleTime: 0,
  });
}

export function useReviewReport(id: string) {
  return useQuery(getReviewReportQueryOptions(id));
}
