import { Button, Form, Input } from 'antd';
import { useState } from 'react';
import { applyFieldErrors, formAlertMessage } from '@/lib/form-errors';
import { useChangePassword, type ChangePasswordInput } from '../api/change-password';
import { FormAlert } from './form-alert';
import { newPasswordRules, PASSWORD_HINT, repeatPasswordRules } from './password-rules';

interface ChangePasswordValues extends ChangePasswordInput {
  repeatPassword: string;
}

const LABELS = { currentPassword: 'Current password', newPassword: 'New password' };

type ChangePasswordFormProps = { onSuccess: () => void };

export function ChangePasswordForm({ onSuccess }: ChangePasswordFormProps) {
  const [form] = Form.useForm<ChangePasswordValues>();
  const [alert, setAlert] = useState<string | null>(null);
  const change = useChangePassword({
    mutationConfig: {
      onSuccess: () => {
        form.resetFields();
        onSuccess();
      },
      onError: (error) => setAlert(formAlertMessage(error, applyFieldErrors(form, error, { labels: LABELS }))),
    },
  });

  return (
    <Form<ChangePasswordValues>
      form={form}
      layout="vertical"
      requiredMark={false}
      onFinish={({ currentPassword, newPassword }) => {
        setAlert(null);
        change.mutate({ currentPassword, newPassword });
      }}
    >
      <FormAlert message={alert} />
      <Form.Item name="currentPassword" label={LABELS.currentPassword} rules={[{ required: true, message: 'Give your current password' }]}>
        <Input.Password autoComplete="current-password" />
      </Form.Item>
      <Form.Item name="newPassword" label={LABELS.newPassword} extra={`${PASSWORD_HINT} Other devices signed in to your account will be signed out.`} rules={newPasswordRules}>
        <Input.Password autoComplete="new-password" />
      </Form.Item>
      <Form.Item name="repeatPassword" label="Repeat the new password" dependencies={['newPassword']} rules={repeatPasswordRules('newPassword')}>
        <Input.Password autoComplete="new-password" />
      </Form.Item>
      <Button type="primary" htmlType="submit" loading={change.isPending}>
        Change password
      </Button>
    </Form>
  );
}
