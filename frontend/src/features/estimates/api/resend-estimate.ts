import type { CreateEstimateResponse } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';

export interface ResendEstimateInput {
  jobId: string;
  estimateId: string;
  data: { recipientEmail?: string; expiresInDays?: number };
}

/** `POST /api/jobs/:id/estimates/:estimateId/send`: sends it again with a new link; the old link stops working. */
export function resendEstimate({ jobId, estimateId, data }: ResendEstimateInput): Promise<CreateEstimateResponse> {
  return api.post<CreateEstimateResponse>(`/jobs/${encodeURIComponent(jobId)}/estimates/${encodeURIComponent(estimateId)}/send`, data);
}

type UseResendEstimateOptions = { mutationConfig?: MutationConfig<typeof resendEstimate> };

export function useResendEstimate({ mutationConfig }: UseResendEstimateOptions = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: resendEstimate,
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: ['jobs', 'detail', args[1].jobId] });
      return onSuccess?.(...args);
    },
  });
}
