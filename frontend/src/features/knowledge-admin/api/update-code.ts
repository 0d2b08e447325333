import type { CodeEditRequest, CodeEntryDto } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { KNOWLEDGE_QUERY_KEY } from './get-parts';

export interface UpdateCodeInput {
  code: string;
  data: CodeEditRequest;
}

/** `PATCH /api/knowledge/codes/:code` (moderators): the generic catalogue entry of a code, audited. */
export function updateCode({ code, data }: UpdateCodeInput): Promise<CodeEntryDto> {
  return api.patch<CodeEntryDto>(`/knowledge/codes/${encodeURIComponent(code)}`, data);
}

type Options = { mutationConfig?: MutationConfig<typeof updateCode> };

export function useUpdateCode({ mutationConfig }: Options = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: updateCode,
    onSuccess: async (...args) => {
      // The code's page elsewhere in the app reads the same entry.
      await Promise.all([queryClient.invalidateQueries({ queryKey: KNOWLEDGE_QUERY_KEY }), queryClient.invalidateQueries({ queryKey: ['codes'] })]);
      return onSuccess?.(...args);
    },
  });
}
