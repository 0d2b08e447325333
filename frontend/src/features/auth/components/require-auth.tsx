import { Button, Flex, Result, Spin } from 'antd';
import type { ReactNode } from 'react';
import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useAuthToken } from '@/lib/auth-token';
import { CurrentUserProvider } from '@/lib/current-user';
import type { SignInState } from '@/types/router';
import { useUser } from '../api/get-me';

type RequireAuthProps = { children?: ReactNode };

/**
 * The gate of the signed-in app: without a token, off to sign in (and back here after);
 * with one, the user is loaded once and offered to everything below via `useCurrentUser`.
 */
export function RequireAuth({ children }: RequireAuthProps) {
  const token = useAuthToken();
  const location = useLocation();
  const user = useUser();

  if (token === null) {
    const state: SignInState = { from: location };
    return <Navigate to={paths.signIn} replace state={state} />;
  }
  if (user.isPending) {
    return (
      <Flex align="center" justify="center" style={{ minHeight: '100vh' }}>
        <Spin size="large" description="Loading your account" />
      </Flex>
    );
  }
  if (user.isError) {
    return (
      <Result
        status="error"
        title="Your account could not be loaded"
        subTitle={user.error.message}
        extra={
          <Button type="primary" onClick={() => void user.refetch()}>
            Try again
          </Button>
        }
      />
    );
  }
  return <CurrentUserProvider user={user.data}>{children ?? <Outlet />}</CurrentUserProvider>;
}
