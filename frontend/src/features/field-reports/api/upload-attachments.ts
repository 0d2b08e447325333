import type { AttachmentDto } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MutationConfig } from '@/lib/react-query';
import { postMultipart } from '../utils/multipart';
import { FIELD_REPORTS_QUERY_KEY } from './get-my-reports';

export interface UploadAttachmentsInput {
  reportId: string;
  files: File[];
}

/**
 * `POST /api/field-reports/:id/attachments` (multipart field `files`, drafts only): photos and
 * PDF invoices. The server decides the type by the content and takes all files or none.
 */
export function uploadAttachments({ reportId, files }: UploadAttachmentsInput): Promise<AttachmentDto[]> {
  const form = new FormData();
  for (const file of files) form.append('files', file, file.name);
  return postMultipart<AttachmentDto[]>(`/field-reports/${encodeURIComponent(reportId)}/attachments`, form);
}

type Options = { mutationConfig?: MutationConfig<typeof uploadAttachments> };

export function useUploadAttachments({ mutationConfig }: Options = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: uploadAttachments,
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: FIELD_REPORTS_QUERY_KEY });
      return onSuccess?.(...args);
    },
  });
}
