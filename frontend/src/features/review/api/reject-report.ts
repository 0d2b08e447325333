import type { FieldReportDto, RejectReportRequest } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { REVIEW_QUERY_KEY } from './get-review-queue';

export interface RejectReportInput {
  id: string;
  data: RejectReportRequest;
}

/** `POST /api/review/reports/:id/reject`: nothing changes but the report; the reason is e-mailed to the author. */
export function rejectReport({ id, data }: RejectReportInput): Promise<FieldReportDto> {
  return api.post<FieldReportDto>(`/review/reports/${encodeURIComponent(id)}/reject`, data);
}

type Options = { mutationConfig?: MutationConfig<typeof rejectReport> };

export function useRejectReport({ mutationConfig }: Options = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: rejectReport,
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: REVIEW_QUERY_KEY });
      return onSuccess?.(...args);
    },
  });
}
