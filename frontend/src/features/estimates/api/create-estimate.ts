import type { CreateEstimateRequest, CreateEstimateResponse } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';

export interface CreateEstimateInput {
  jobId: string;
  data: CreateEstimateRequest;
}

/**
 * `POST /api/jobs/:id/estimates`: saves a staged estimate from the job's current fix paths and
 * e-mails it to the vehicle owner. The answer says whether the e-mail went (and why not); the
 * estimate is saved either way. The link is in the answer only this once.
 */
export function createEstimate({ jobId, data }: CreateEstimateInput): Promise<CreateEstimateResponse> {
  return api.post<CreateEstimateResponse>(`/jobs/${encodeURIComponent(jobId)}/estimates`, data);
}

type UseCreateEstimateOptions = { mutationConfig?: MutationConfig<typeof createEstimate> };

export function useCreateEstimate({ mutationConfig }: UseCreateEstimateOptions = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: createEstimate,
    onSuccess: async (...args) => {
      // The job lists its estimates; its key is the prefix of the estimates' own.
      await queryClient.invalidateQueries({ queryKey: ['jobs', 'detail', args[1].jobId] });
      return onSuccess?.(...args);
    },
  });
}
