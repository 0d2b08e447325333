import type { Role, UserDto } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { USERS_QUERY_KEY } from './get-users';

export interface UpdateUserInput {
  id: string;
  data: { role?: Role; disabled?: boolean };
}

/** `PATCH /api/admin/users/:id` (admins): change a role, or disable or enable an account. */
export function updateUser({ id, data }: UpdateUserInput): Promise<UserDto> {
  return api.patch<UserDto>(`/admin/users/${encodeURIComponent(id)}`, data);
}

type UseUpdateUserOptions = { mutationConfig?: MutationConfig<typeof updateUser> };

export function useUpdateUser({ mutationConfig }: UseUpdateUserOptions = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: updateUser,
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: USERS_QUERY_KEY });
      return onSuccess?.(...args);
    },
  });
}
