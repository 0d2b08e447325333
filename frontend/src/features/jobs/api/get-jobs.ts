import type { JobSummaryDto, Page } from '@causeway/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { JobListParams } from '../utils/list-params';

export const JOBS_QUERY_KEY = ['jobs'] as const;

/** `GET /api/jobs`: one page of the shop's jobs, filtered and sorted on the server. */
export function getJobs(params: JobListParams, { signal }: { signal?: AbortSignal } = {}): Promise<Page<JobSummaryDto>> {
  return api.get<Page<JobSummaryDto>>('/jobs', {
    signal,
    params: {
      page: params.page,
      pageSize: params.pageSize,
      status: params.status,
      code: params.code,
      vehicleId: params.vehicleId,
      technicianId: params.technicianId,
      from: params.from,
      to: params.to,
      sort: params.sort,
      order: params.sort ? params.order : undefined,
    },
  });
}

export function getJobsQueryOptions(params: JobListParams) {
  return queryOptions({
    queryKey: [...JOBS_QUERY_KEY, 'list', params] as const,
    queryFn: ({ signal }) => getJobs(params, { signal }),
    placeholderData: keepPreviousData,
  });
}

export function useJobs(params: JobListParams) {
  return useQuery(getJobsQueryOptions(params));
}
