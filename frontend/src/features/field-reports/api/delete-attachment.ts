import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { FIELD_REPORTS_QUERY_KEY } from './get-my-reports';

export interface DeleteAttachmentInput {
  reportId: string;
  attachmentId: string;
}

/** `DELETE /api/field-reports/:id/attachments/:attachmentId` (drafts only). */
export function deleteAttachment({ reportId, attachmentId }: DeleteAttachmentInput): Promise<void> {
  return api.delete<void>(`/field-reports/${encodeURIComponent(reportId)}/attachments/${encodeURIComponent(attachmentId)}`);
}

type Options = { mutationConfig?: MutationConfig<typeof deleteAttachment> };

export function useDeleteAttachment({ mutationConfig }: Options = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: deleteAttachment,
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: FIELD_REPORTS_QUERY_KEY });
      return onSuccess?.(...args);
    },
  });
}
