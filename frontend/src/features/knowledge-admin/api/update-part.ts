import type { PartDto, PartEditRequest } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { KNOWLEDGE_QUERY_KEY } from './get-parts';

export interface UpdatePartInput {
  key: string;
  data: Pick<PartEditRequest, 'name' | 'system'>;
}

/** `PATCH /api/knowledge/parts/:key` (moderators): rename a part or change its system, audited. */
export function updatePart({ key, data }: UpdatePartInput): Promise<PartDto> {
  return api.patch<PartDto>(`/knowledge/parts/${encodeURIComponent(key)}`, data);
}

type Options = { mutationConfig?: MutationConfig<typeof updatePart> };

export function useUpdatePart({ mutationConfig }: Options = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: updatePart,
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: KNOWLEDGE_QUERY_KEY });
      return onSuccess?.(...args);
    },
  });
}
