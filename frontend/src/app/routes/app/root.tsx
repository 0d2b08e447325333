import { App, Modal } from 'antd';
import { useState } from 'react';
import { Outlet } from 'react-router-dom';
import { AppLayout } from '@/components/layouts/app-layout';
import { ChangePasswordForm } from '@/features/auth/components/change-password-form';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useSignOut } from '@/features/auth/hooks/use-sign-out';
import { useCurrentUser } from '@/lib/current-user';

function SignedInFrame() {
  const user = useCurrentUser();
  const signOut = useSignOut();
  const { message } = App.useApp();
  const [changingPassword, setChangingPassword] = useState(false);
  return (
    <AppLayout user={user} onSignOut={signOut} onChangePassword={() => setChangingPassword(true)}>
      <Outlet />
      <Modal
        title="Change password"
        open={changingPassword}
        onCancel={() => setChangingPassword(false)}
        footer={null}
        destroyOnHidden
      >
        <ChangePasswordForm
          onSuccess={() => {
            setChangingPassword(false);
            void message.success('Password changed. Other devices have been signed out.');
          }}
        />
      </Modal>
    </AppLayout>
  );
}

export function Component() {
  return (
    <RequireAuth>
      <SignedInFrame />
    </RequireAuth>
  );
}
