import type { InsightsDto } from '@causeway/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export interface InsightsParams {
  /** Jobs opened on or after, YYYY-MM-DD. */
  from?: string;
  /** Jobs opened on or before (the whole day), YYYY-MM-DD. */
  to?: string;
}

/** `GET /api/insights` (shop owners): how the shop's jobs turned out. */
export function getInsights(params: InsightsParams, { signal }: { signal?: AbortSignal } = {}): Promise<InsightsDto> {
  return api.get<InsightsDto>('/insights', { signal, params: { from: params.from, to: params.to } });
}

export function getInsightsQueryOptions(params: InsightsParams) {
  return queryOptions({
    queryKey: ['insights', params] as const,
    queryFn: ({ signal }) => getInsights(params, { signal }),
    placeholderData: keepPreviousData,
  });
}

export function useInsights(params: InsightsParams) {
  return useQuery(getInsightsQueryOptions(params));
}
