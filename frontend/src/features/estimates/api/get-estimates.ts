import type { EstimateDto } from '@causeway/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/**
 * The estimates live under their job's key, so whatever refreshes the job (a step, closing it)
 * refreshes its estimates and their answers too.
 */
export function estimatesQueryKey(jobId: string) {
  return ['jobs', 'detail', jobId, 'estimates'] as const;
}

/** `GET /api/jobs/:id/estimates`: the job's staged estimates, newest first, with the owner's answers. */
export function getEstimates(jobId: string, { signal }: { signal?: AbortSignal } = {}): Promise<EstimateDto[]> {
  return api.get<EstimateDto[]>(`/jobs/${encodeURIComponent(jobId)}/estimates`, { signal });
}

export function getEstimatesQueryOptions(jobId: string) {
  return queryOptions({
    queryKey: estimatesQueryKey(jobId),
    queryFn: ({ signal }) => getEstimates(jobId, { signal }),
    // Answers come in from the owner's side; look again now and then while the page is open.
    staleTime: 15_000,
  });
}

export function useEstimates(jobId: string) {
  return useQuery(getEstimatesQueryOptions(jobId));
}
