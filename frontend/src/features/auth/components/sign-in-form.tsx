import type { LoginRequest } from '@causeway/shared';
import { Button, Form, Input } from 'antd';
import { useState } from 'react';
import { applyFieldErrors, formAlertMessage } from '@/lib/form-errors';
import { useLogin } from '../api/login';
import { FormAlert } from './form-alert';

const LABELS = { email: 'E-mail', password: 'Password' };

type SignInFormProps = { onSuccess: () => void };

export function SignInForm({ onSuccess }: SignInFormProps) {
  const [form] = Form.useForm<LoginRequest>();
  const [alert, setAlert] = useState<string | null>(null);
  const login = useLogin({
    mutationConfig: {
      onSuccess: () => onSuccess(),
      onError: (error) => setAlert(formAlertMessage(error, applyFieldErrors(form, error, { labels: LABELS }))),
    },
  });

  return (
    <Form<LoginRequest>
      form={form}
      layout="vertical"
      requiredMark={false}
      onFinish={(values) => {
        setAlert(null);
        login.mutate({ email: values.email.trim(), password: values.password });
      }}
    >
      <FormAlert message={alert} />
      <Form.Item name="email" label={LABELS.email} rules={[{ required: true, whitespace: true, message: 'Give your e-mail address' }]}>
        <Input type="email" autoComplete="username" inputMode="email" autoFocus />
      </Form.Item>
      <Form.Item name="password" label={LABELS.password} rules={[{ required: true, message: 'Give your password' }]}>
        <Input.Password autoComplete="current-password" />
      </Form.Item>
      <Button type="primary" htmlType="submit" block loading={login.isPending}>
        Sign in
      </Button>
    </Form>
  );
}
