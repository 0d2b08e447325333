import type { FieldReportDto } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { FIELD_REPORTS_QUERY_KEY } from './get-my-reports';

/** `POST /api/field-reports/:id/submit`: sends a draft to the review desk. */
export function submitReport(id: string): Promise<FieldReportDto> {
  return api.post<FieldReportDto>(`/field-reports/${encodeURIComponent(id)}/submit`);
}

type Options = { mutationConfig?: MutationConfig<typeof submitReport> };

export function useSubmitReport({ mutationConfig }: Options = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: submitReport,
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: FIELD_REPORTS_QUERY_KEY });
      return onSuccess?.(...args);
    },
  });
}
