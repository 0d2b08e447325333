import { Typography } from 'antd';
import { Link, useNavigate } from 'react-router-dom';
import { AuthLayout } from '@/components/layouts/auth-layout';
import { paths } from '@/config/paths';
import { RegisterForm } from '@/features/auth/components/register-form';

export function Component() {
  const navigate = useNavigate();
  return (
    <AuthLayout
      title="Create your account"
      width={560}
      footer={
        <Typography.Text>
          Already have an account? <Link to={paths.signIn}>Sign in</Link>
        </Typography.Text>
      }
    >
      <RegisterForm onSuccess={() => navigate(paths.home, { replace: true })} />
    </AuthLayout>
  );
}
