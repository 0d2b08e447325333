import type { ApproveReportRequest, FieldReportDto } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { REVIEW_QUERY_KEY } from './get-review-queue';

export interface ApproveReportInput {
  id: string;
  data: ApproveReportRequest;
}

/** `POST /api/review/reports/:id/approve`: applies the change (or counts the outcome), audited; the author is e-mailed. */
export function approveReport({ id, data }: ApproveReportInput): Promise<FieldReportDto> {
  return api.post<FieldReportDto>(`/review/reports/${encodeURIComponent(id)}/approve`, data);
}

type Options = { mutationConfig?: MutationConfig<typeof approveReport> };

export function useApproveReport({ mutationConfig }: Options = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: approveReport,
    onSuccess: async (...args) => {
      // Approving changes likelihoods and the knowledge base, not only the queue.
      await Promise.all([queryClient.invalidateQueries({ queryKey: REVIEW_QUERY_KEY }), queryClient.invalidateQueries({ queryKey: ['knowledge'] })]);
      return onSuccess?.(...args);
    },
  });
}
