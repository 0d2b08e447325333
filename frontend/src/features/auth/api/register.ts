import type { AuthResponse, RegisterRequest } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { startSession } from '../utils/session';

/** `POST /api/auth/register`: join a shop with `inviteCode`, or create one with `shop` and own it. */
export function register(input: RegisterRequest): Promise<AuthResponse> {
  return api.post<AuthResponse>('/auth/register', input);
}

type UseRegisterOptions = { mutationConfig?: MutationConfig<typeof register> };

export function useRegister({ mutationConfig }: UseRegisterOptions = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: register,
    onSuccess: (...args) => {
      startSession(queryClient, args[0], { fresh: true });
      return onSuccess?.(...args);
    },
  });
}
