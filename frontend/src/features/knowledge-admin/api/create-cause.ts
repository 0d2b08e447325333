import type { CauseEditRequest, PossibleCauseRowDto } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { KNOWLEDGE_QUERY_KEY } from './get-parts';

/** `POST /api/knowledge/causes` (moderators): a new possible cause; the priors of its scope must sum to at most 1. */
export function createCause(data: CauseEditRequest): Promise<PossibleCauseRowDto> {
  return api.post<PossibleCauseRowDto>('/knowledge/causes', data);
}

type Options = { mutationConfig?: MutationConfig<typeof createCause> };

export function useCreateCause({ mutationConfig }: Options = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: createCause,
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: KNOWLEDGE_QUERY_KEY });
      return onSuccess?.(...args);
    },
  });
}
