import { Typography } from 'antd';
import { Link, useLocation, useNavigate } from 'react-router-dom';
import { AuthLayout } from '@/components/layouts/auth-layout';
import { paths } from '@/config/paths';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import type { SignInState } from '@/types/router';

function returnTo(state: unknown): string {
  const from = (state as SignInState | null)?.from;
  if (!from || from.pathname === paths.signIn) return paths.home;
  return `${from.pathname}${from.search}${from.hash}`;
}

export function Component() {
  const navigate = useNavigate();
  const location = useLocation();
  return (
    <AuthLayout
      title="Sign in"
      footer={
        <Typography.Text>
          New here? <Link to={paths.register}>Create an account</Link>
        </Typography.Text>
      }
    >
      <SignInForm onSuccess={() => navigate(returnTo(location.state), { replace: true })} />
    </AuthLayout>
  );
}
