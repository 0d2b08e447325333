import type { CreateStepRequest, JobDto } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { JOBS_QUERY_KEY } from './get-jobs';

export interface CreateStepInput {
  jobId: string;
  data: CreateStepRequest;
}

/** `POST /api/jobs/:id/steps`: records a check or a replacement; a 409 when the job is closed. */
export function createStep({ jobId, data }: CreateStepInput): Promise<JobDto> {
  return api.post<JobDto>(`/jobs/${encodeURIComponent(jobId)}/steps`, data);
}

type UseCreateStepOptions = { mutationConfig?: MutationConfig<typeof createStep> };

export function useCreateStep({ mutationConfig }: UseCreateStepOptions = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: createStep,
    onSuccess: async (...args) => {
      // The fix path is recomputed on the server from every step: read the job again.
      await queryClient.invalidateQueries({ queryKey: JOBS_QUERY_KEY });
      return onSuccess?.(...args);
    },
  });
}
