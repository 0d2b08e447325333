import type { PartDto, PartEditRequest } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { KNOWLEDGE_QUERY_KEY } from './get-parts';

/** `POST /api/knowledge/parts` (moderators): a new part, audited. */
export function createPart(data: PartEditRequest): Promise<PartDto> {
  return api.post<PartDto>('/knowledge/parts', data);
}

type Options = { mutationConfig?: MutationConfig<typeof createPart> };

export function useCreatePart({ mutationConfig }: Options = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: createPart,
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: KNOWLEDGE_QUERY_KEY });
      return onSuccess?.(...args);
    },
  });
}
