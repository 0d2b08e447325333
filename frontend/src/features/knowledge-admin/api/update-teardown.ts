import type { TeardownDto, TeardownEditRequest } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { KNOWLEDGE_QUERY_KEY } from './get-parts';

export interface UpdateTeardownInput {
  key: string;
  data: Omit<TeardownEditRequest, 'key'>;
}

/** `PATCH /api/knowledge/teardowns/:key` (moderators): hours, scope, name or cautions, audited. */
export function updateTeardown({ key, data }: UpdateTeardownInput): Promise<TeardownDto> {
  return api.patch<TeardownDto>(`/knowledge/teardowns/${encodeURIComponent(key)}`, data);
}

type Options = { mutationConfig?: MutationConfig<typeof updateTeardown> };

export function useUpdateTeardown({ mutationConfig }: Options = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: updateTeardown,
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: KNOWLEDGE_QUERY_KEY });
      return onSuccess?.(...args);
    },
  });
}
