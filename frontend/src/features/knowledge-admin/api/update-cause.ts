import type { CauseEditRequest, PossibleCauseRowDto } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { KNOWLEDGE_QUERY_KEY } from './get-parts';

export interface UpdateCauseInput {
  id: string;
  data: Omit<CauseEditRequest, 'code' | 'partKey'>;
}

/** `PATCH /api/knowledge/causes/:id` (moderators): prior, costs, teardown, check or scope, audited. */
export function updateCause({ id, data }: UpdateCauseInput): Promise<PossibleCauseRowDto> {
  return api.patch<PossibleCauseRowDto>(`/knowledge/causes/${encodeURIComponent(id)}`, data);
}

type Options = { mutationConfig?: MutationConfig<typeof updateCause> };

export function useUpdateCause({ mutationConfig }: Options = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: updateCause,
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: KNOWLEDGE_QUERY_KEY });
      return onSuccess?.(...args);
    },
  });
}
