import type { JobDto } from '@causeway/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { JOBS_QUERY_KEY } from './get-jobs';

/**
 * `GET /api/jobs/:id`: the job with its codes, each code's current fix path (recomputed from
 * the steps on every read), the timeline of steps and the estimates sent.
 */
export function getJob(id: string, { signal }: { signal?: AbortSignal } = {}): Promise<JobDto> {
  return api.get<JobDto>(`/jobs/${encodeURIComponent(id)}`, { signal });
}

export function jobQueryKey(id: string) {
  return [...JOBS_QUERY_KEY, 'detail', id] as const;
}

export function getJobQueryOptions(id: string) {
  return queryOptions({
    queryKey: jobQueryKey(id),
    queryFn: ({ signal }) => getJob(id, { signal }),
  });
}

export function useJob(id: string) {
  return useQuery(getJobQueryOptions(id));
}
