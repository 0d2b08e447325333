import type { FieldReportDto, FieldReportRequest } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { FIELD_REPORTS_QUERY_KEY } from './get-my-reports';

export interface UpdateReportInput {
  id: string;
  body: FieldReportRequest;
}

/** `PATCH /api/field-reports/:id`: replaces a draft's kind and payload (drafts only). */
export function updateReport({ id, body }: UpdateReportInput): Promise<FieldReportDto> {
  return api.patch<FieldReportDto>(`/field-reports/${encodeURIComponent(id)}`, body);
}

type Options = { mutationConfig?: MutationConfig<typeof updateReport> };

export function useUpdateReport({ mutationConfig }: Options = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: updateReport,
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: FIELD_REPORTS_QUERY_KEY });
      return onSuccess?.(...args);
    },
  });
}
