import type { ShopDto } from '@causeway/shared';
import { Alert, App, Button, Form } from 'antd';
import { useState } from 'react';
import { ShopFields } from '@/components/shop-fields';
import { applyFieldErrors, formAlertMessage } from '@/lib/form-errors';
import { formValuesToShop, shopFieldErrorOptions, shopToFormValues, type ShopFormValues } from '@/utils/shop-form';
import { useUpdateShop } from '../api/update-shop';

type ShopSettingsFormProps = { shop: ShopDto };

export function ShopSettingsForm({ shop }: ShopSettingsFormProps) {
  const { message } = App.useApp();
  const [form] = Form.useForm<ShopFormValues>();
  const [alert, setAlert] = useState<string | null>(null);
  const update = useUpdateShop({
    mutationConfig: {
      onSuccess: (saved) => {
        form.setFieldsValue(shopToFormValues(saved));
        void message.success('Shop settings saved');
      },
      onError: (error) => setAlert(formAlertMessage(error, applyFieldErrors(form, error, shopFieldErrorOptions()))),
    },
  });

  return (
    <Form<ShopFormValues>
      form={form}
      layout="vertical"
      requiredMark={false}
      initialValues={shopToFormValues(shop)}
      style={{ maxWidth: 560 }}
      onFinish={(values) => {
        setAlert(null);
        update.mutate(formValuesToShop(values));
      }}
    >
      {alert && <Alert type="error" showIcon title={alert} style={{ marginBottom: 24 }} />}
      <ShopFields />
      <Button type="primary" htmlType="submit" loading={update.isPending}>
        Save shop settings
      </Button>
    </Form>
  );
}
