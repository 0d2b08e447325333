import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { getMappingsQueryOptions } from './get-mappings';

/** `DELETE /api/imports/mappings/:id`. */
export function deleteMapping(id: string): Promise<void> {
  return api.delete<void>(`/imports/mappings/${encodeURIComponent(id)}`);
}

type Options = { mutationConfig?: MutationConfig<typeof deleteMapping> };

export function useDeleteMapping({ mutationConfig }: Options = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: deleteMapping,
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: getMappingsQueryOptions().queryKey });
      return onSuccess?.(...args);
    },
  });
}
