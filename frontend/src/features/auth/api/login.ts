import type { AuthResponse, LoginRequest } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { startSession } from '../utils/session';

/** `POST /api/auth/login`. A 401 here means a wrong e-mail or password, not an ended session. */
export function login(input: LoginRequest): Promise<AuthResponse> {
  return api.post<AuthResponse>('/auth/login', input, { signOutOnUnauthorized: false });
}

type UseLoginOptions = { mutationConfig?: MutationConfig<typeof login> };

export function useLogin({ mutationConfig }: UseLoginOptions = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: login,
    onSuccess: (...args) => {
      startSession(queryClient, args[0], { fresh: true });
      return onSuccess?.(...args);
    },
  });
}
