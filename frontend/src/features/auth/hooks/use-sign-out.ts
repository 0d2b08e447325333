import { useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { authToken } from '@/lib/auth-token';

/** Forgets the token and everything fetched with it, then goes to the sign-in page. */
export function useSignOut(): () => void {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  return useCallback(() => {
    authToken.clear();
    queryClient.removeQueries();
    navigate(paths.signIn, { replace: true });
  }, [navigate, queryClient]);
}
