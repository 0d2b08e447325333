import type { RegisterRequest } from '@causeway/shared';
import { Button, Form, Input, Segmented, Typography } from 'antd';
import { useState } from 'react';
import { ShopFields } from '@/components/shop-fields';
import { shopDefaultsFor } from '@/config/locales';
import { applyFieldErrors, formAlertMessage, type FieldErrorOptions } from '@/lib/form-errors';
import { browserLocale } from '@/utils/format';
import { formValuesToShop, shopFieldErrorOptions, type ShopFormValues } from '@/utils/shop-form';
import { useRegister } from '../api/register';
import { FormAlert } from './form-alert';
import { newPasswordRules, PASSWORD_HINT, repeatPasswordRules } from './password-rules';

export type RegisterMode = 'new-shop' | 'join-shop';

interface RegisterFormValues {
  displayName: string;
  email: string;
  password: string;
  repeatPassword: string;
  inviteCode?: string;
  shop?: ShopFormValues;
}

const ACCOUNT_LABELS = { displayName: 'Your name', email: 'E-mail', password: 'Password' };

function errorOptions(mode: RegisterMode): FieldErrorOptions {
  if (mode === 'join-shop') return { labels: { ...ACCOUNT_LABELS, inviteCode: 'Invite code' } };
  const shop = shopFieldErrorOptions('shop.');
  return { labels: { ...ACCOUNT_LABELS, ...shop.labels }, rename: shop.rename };
}

function toRequest(mode: RegisterMode, values: RegisterFormValues): RegisterRequest {
  const account = { displayName: values.displayName.trim(), email: values.email.trim(), password: values.password };
  if (mode === 'join-shop') return { ...account, inviteCode: (values.inviteCode ?? '').trim() };
  return { ...account, shop: formValuesToShop(values.shop as ShopFormValues) };
}

type RegisterFormProps = { onSuccess: () => void; initialMode?: RegisterMode };

export function RegisterForm({ onSuccess, initialMode = 'new-shop' }: RegisterFormProps) {
  const [form] = Form.useForm<RegisterFormValues>();
  const [mode, setMode] = useState<RegisterMode>(initialMode);
  const [alert, setAlert] = useState<string | null>(null);
  const [initialValues] = useState<Partial<RegisterFormValues>>(() => ({
    shop: { name: '', labourRate: '', taxRate: '', ...shopDefaultsFor(browserLocale()) },
  }));
  const registration = useRegister({
    mutationConfig: {
      onSuccess: () => onSuccess(),
      onError: (error) => setAlert(formAlertMessage(error, applyFieldErrors(form, error, errorOptions(mode)))),
    },
  });

  return (
    <Form<RegisterFormValues>
      form={form}
      layout="vertical"
      requiredMark={false}
      initialValues={initialValues}
      onFinish={(values) => {
        setAlert(null);
        registration.mutate(toRequest(mode, values));
      }}
    >
      <div style={{ marginBottom: 24 }}>
        <Typography.Paragraph strong aria-hidden style={{ marginBottom: 8 }}>
          How do you start?
        </Typography.Paragraph>
        <Segmented<RegisterMode>
          block
          aria-label="How do you start?"
          value={mode}
          onChange={(value) => {
            setMode(value);
            setAlert(null);
          }}
          options={[
            { value: 'new-shop', label: 'Start a new shop' },
            { value: 'join-shop', label: 'Join a shop with an invite code' },
          ]}
        />
      </div>
      <FormAlert message={alert} />

      <Form.Item name="displayName" label={ACCOUNT_LABELS.displayName} rules={[{ required: true, whitespace: true, message: 'Give your name' }, { max: 80 }]}>
        <Input autoComplete="name" />
      </Form.Item>
      <Form.Item
        name="email"
        label={ACCOUNT_LABELS.email}
        rules={[
          { required: true, whitespace: true, message: 'Give your e-mail address' },
          { type: 'email', message: 'That is not an e-mail address' },
        ]}
      >
        <Input type="email" autoComplete="email" inputMode="email" />
      </Form.Item>
      <Form.Item name="password" label={ACCOUNT_LABELS.password} extra={PASSWORD_HINT} rules={newPasswordRules}>
        <Input.Password autoComplete="new-password" />
      </Form.Item>
      <Form.Item name="repeatPassword" label="Repeat the password" dependencies={['password']} rules={repeatPasswordRules('password')}>
        <Input.Password autoComplete="new-password" />
      </Form.Item>

      {mode === 'join-shop' ? (
        <Form.Item
          name="inviteCode"
          label="Invite code"
          extra="The code the owner of the shop gave you."
          rules={[{ required: true, whitespace: true, message: 'Give the invite code' }]}
        >
          <Input autoComplete="off" autoCapitalize="characters" spellCheck={false} />
        </Form.Item>
      ) : (
        <section aria-labelledby="new-shop-heading">
          <Typography.Title level={3} id="new-shop-heading" style={{ fontSize: 20 }}>
            Your shop
          </Typography.Title>
          <Typography.Paragraph type="secondary">
            You will be its owner. Everything here can be changed later in the shop settings.
          </Typography.Paragraph>
          <ShopFields prefix={['shop']} />
        </section>
      )}

      <Button type="primary" htmlType="submit" block loading={registration.isPending}>
        {mode === 'join-shop' ? 'Create account and join the shop' : 'Create account and shop'}
      </Button>
    </Form>
  );
}
