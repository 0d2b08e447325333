import type { InviteDto } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { InvitableRole } from '@/config/roles';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { getInvitesQueryOptions } from './get-invites';

/** `POST /api/shops/mine/invites` (shop owners): a new single-use invite code for a role. */
export function createInvite(input: { role: InvitableRole }): Promise<InviteDto> {
  return api.post<InviteDto>('/shops/mine/invites', input);
}

type UseCreateInviteOptions = { mutationConfig?: MutationConfig<typeof createInvite> };

export function useCreateInvite({ mutationConfig }: UseCreateInviteOptions = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: createInvite,
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: getInvitesQueryOptions().queryKey });
      return onSuccess?.(...args);
    },
  });
}
