import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { KNOWLEDGE_QUERY_KEY } from './get-parts';

/** `DELETE /api/knowledge/causes/:id` (moderators): removes a possible cause, audited. */
export function deleteCause(id: string): Promise<void> {
  return api.delete<void>(`/knowledge/causes/${encodeURIComponent(id)}`);
}

type Options = { mutationConfig?: MutationConfig<typeof deleteCause> };

export function useDeleteCause({ mutationConfig }: Options = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: deleteCause,
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: KNOWLEDGE_QUERY_KEY });
      return onSuccess?.(...args);
    },
  });
}
