import type { AuthResponse } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { startSession } from '../utils/session';

export interface ChangePasswordInput {
  currentPassword: string;
  newPassword: string;
}

/** `POST /api/auth/change-password`: answers with a new token; every older token stops working. */
export function changePassword(input: ChangePasswordInput): Promise<AuthResponse> {
  return api.post<AuthResponse>('/auth/change-password', input);
}

type UseChangePasswordOptions = { mutationConfig?: MutationConfig<typeof changePassword> };

export function useChangePassword({ mutationConfig }: UseChangePasswordOptions = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: changePassword,
    onSuccess: (...args) => {
      startSession(queryClient, args[0], { fresh: false });
      return onSuccess?.(...args);
    },
  });
}
