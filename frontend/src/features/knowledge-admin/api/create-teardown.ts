import type { TeardownDto, TeardownEditRequest } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { KNOWLEDGE_QUERY_KEY } from './get-parts';

/** `POST /api/knowledge/teardowns` (moderators): a new teardown, audited. */
export function createTeardown(data: TeardownEditRequest): Promise<TeardownDto> {
  return api.post<TeardownDto>('/knowledge/teardowns', data);
}

type Options = { mutationConfig?: MutationConfig<typeof createTeardown> };

export function useCreateTeardown({ mutationConfig }: Options = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: createTeardown,
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: KNOWLEDGE_QUERY_KEY });
      return onSuccess?.(...args);
    },
  });
}
