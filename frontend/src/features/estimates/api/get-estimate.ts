import type { EstimateDto } from '@causeway/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { estimatesQueryKey } from './get-estimates';

/** `GET /api/jobs/:id/estimates/:estimateId`: one estimate as it was saved, for printing. */
export function getEstimate(jobId: string, estimateId: string, { signal }: { signal?: AbortSignal } = {}): Promise<EstimateDto> {
  return api.get<EstimateDto>(`/jobs/${encodeURIComponent(jobId)}/estimates/${encodeURIComponent(estimateId)}`, { signal });
}

export function getEstimateQueryOptions(jobId: string, estimateId: string) {
  return queryOptions({
    queryKey: [...estimatesQueryKey(jobId), estimateId] as const,
    queryFn: ({ signal }) => getEstimate(jobId, estimateId, { signal }),
  });
}

export function useEstimate(jobId: string, estimateId: string | undefined) {
  return useQuery({ ...getEstimateQueryOptions(jobId, estimateId ?? ''), enabled: Boolean(estimateId) });
}
