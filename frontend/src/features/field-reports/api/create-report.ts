import type { FieldReportDto, FieldReportRequest } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { FIELD_REPORTS_QUERY_KEY } from './get-my-reports';

/** `POST /api/field-reports`: saves a draft (or submits at once with `submit: true`). */
export function createReport(body: FieldReportRequest): Promise<FieldReportDto> {
  return api.post<FieldReportDto>('/field-reports', body);
}

type Options = { mutationConfig?: MutationConfig<typeof createReport> };

export function useCreateReport({ mutationConfig }: Options = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: createReport,
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: FIELD_REPORTS_QUERY_KEY });
      return onSuccess?.(...args);
    },
  });
}
