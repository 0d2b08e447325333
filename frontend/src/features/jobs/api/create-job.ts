import type { CreateJobRequest, JobDto } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { JOBS_QUERY_KEY } from './get-jobs';
import { jobQueryKey } from './get-job';

/**
 * `POST /api/jobs`: opens a job; each code is checked with the shared codec on the server too.
 * A 409 with `details.reason: 'odometer-lower'` asks to confirm a lower reading.
 */
export function createJob(data: CreateJobRequest): Promise<JobDto> {
  return api.post<JobDto>('/jobs', data);
}

type UseCreateJobOptions = { mutationConfig?: MutationConfig<typeof createJob> };

export function useCreateJob({ mutationConfig }: UseCreateJobOptions = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: createJob,
    onSuccess: async (...args) => {
      queryClient.setQueryData(jobQueryKey(args[0].id), args[0]);
      await queryClient.invalidateQueries({ queryKey: [...JOBS_QUERY_KEY, 'list'] });
      // The vehicle's odometer reading may have changed.
      await queryClient.invalidateQueries({ queryKey: ['vehicles'] });
      return onSuccess?.(...args);
    },
  });
}
