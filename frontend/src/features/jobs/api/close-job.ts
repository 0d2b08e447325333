import type { CloseJobRequest, JobDto } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { JOBS_QUERY_KEY } from './get-jobs';

export interface CloseJobInput {
  jobId: string;
  data: CloseJobRequest;
}

/** `POST /api/jobs/:id/close`: resolved (after the verification passed) or unresolved; 409 when already closed. */
export function closeJob({ jobId, data }: CloseJobInput): Promise<JobDto> {
  return api.post<JobDto>(`/jobs/${encodeURIComponent(jobId)}/close`, data);
}

type UseCloseJobOptions = { mutationConfig?: MutationConfig<typeof closeJob> };

export function useCloseJob({ mutationConfig }: UseCloseJobOptions = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: closeJob,
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: JOBS_QUERY_KEY });
      return onSuccess?.(...args);
    },
  });
}
