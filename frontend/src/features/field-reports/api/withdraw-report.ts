import type { FieldReportDto } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { FIELD_REPORTS_QUERY_KEY } from './get-my-reports';

/** `POST /api/field-reports/:id/withdraw`: takes back a draft or a report waiting for review. */
export function withdrawReport(id: string): Promise<FieldReportDto> {
  return api.post<FieldReportDto>(`/field-reports/${encodeURIComponent(id)}/withdraw`);
}

type Options = { mutationConfig?: MutationConfig<typeof withdrawReport> };

export function useWithdrawReport({ mutationConfig }: Options = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: withdrawReport,
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: FIELD_REPORTS_QUERY_KEY });
      return onSuccess?.(...args);
    },
  });
}
