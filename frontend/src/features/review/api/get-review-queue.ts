import type { FieldReportSummaryDto, Page } from '@causeway/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { QueueParams } from '../utils/queue-params';

/** Everything cached for the review desk; decisions invalidate it. */
export const REVIEW_QUERY_KEY = ['review'] as const;

/** `GET /api/review/reports` (moderators): the queue, oldest first; decided reports newest first. */
export function getReviewQueue(params: QueueParams, { signal }: { signal?: AbortSignal } = {}): Promise<Page<FieldReportSummaryDto>> {
  return api.get<Page<FieldReportSummaryDto>>('/review/reports', {
    signal,
    params: { page: params.page, pageSize: params.pageSize, status: params.status, kind: params.kind, code: params.code || undefined },
  });
}

export function getReviewQueueQueryOptions(params: QueueParams) {
  return queryOptions({
    queryKey: [...REVIEW_QUERY_KEY, 'queue', params] as const,
    queryFn: ({ signal }) => getReviewQueue(params, { signal }),
    placeholderData: keepPreviousData,
  });
}

export function useReviewQueue(params: QueueParams) {
  return useQuery(getReviewQueueQueryOptions(params));
}
