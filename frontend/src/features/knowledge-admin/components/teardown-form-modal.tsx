import { KNOWLEDGE_LIMITS, type TeardownDto } from '@causeway/shared';
import { Alert, App, Form, Input, InputNumber, Modal, Select } from 'antd';
import { useState } from 'react';
import { VehicleScopeFields } from '@/components/vehicle-scope-fields';
import { applyFieldErrors, formAlertMessage } from '@/lib/form-errors';
import { SCOPE_LABELS, scopeOf, type ScopeValues } from '@/utils/vehicle-scope';
import { useCreateTeardown } from '../api/create-teardown';
import { useUpdateTeardown } from '../api/update-teardown';
import { inFormTerms } from '../utils/errors';

interface TeardownValues extends ScopeValues {
  key: string;
  name: string;
  hours: number;
  cautions: string[];
}

type TeardownFormModalProps = {
  teardown: TeardownDto | null;
  open: boolean;
  onClose: () => void;
  /** Caution keys in use, offered in the select. */
  knownCautions: string[];
};

const LABELS = { key: 'Key', name: 'Name', hours: 'Hours', cautions: 'Safety cautions', ...SCOPE_LABELS };

export function TeardownFormModal({ teardown, open, onClose, knownCautions }: TeardownFormModalProps) {
  const { message } = App.useApp();
  const [form] = Form.useForm<TeardownValues>();
  const [alert, setAlert] = useState<string | null>(null);
  const onError = (error: Error) => {
    const shown = inFormTerms(error, { cautions: 'cautions' });
    setAlert(formAlertMessage(shown, applyFieldErrors(form, shown, { labels: LABELS })));
  };
  const create = useCreateTeardown({ mutationConfig: { onSuccess: (t) => { void message.success(`${t.name} added`); onClose(); }, onError } });
  const update = useUpdateTeardown({ mutationConfig: { onSuccess: (t) => { void message.success(`${t.name} saved`); onClose(); }, onError } });
  return (
    <Modal
      title={teardown ? `Edit teardown: ${teardown.name}` : 'Add a teardown'}
      open={open}
      onCancel={onClose}
      okText={teardown ? 'Save teardown' : 'Add teardown'}
      onOk={() => form.submit()}
      confirmLoading={create.isPending || update.isPending}
      destroyOnHidden
      width={720}
    >
      <Form<TeardownValues>
        form={form}
        layout="vertical"
        preserve={false}
        initialValues={teardown ? { ...teardown } : { cautions: [] }}
        onFinish={(values) => {
          setAlert(null);
          const data = { name: values.name.trim(), hours: values.hours, cautions: values.cautions ?? [], ...scopeOf(values) };
          if (teardown) update.mutate({ key: teardown.key, data });
          else create.mutate({ key: values.key.trim(), ...data });
        }}
      >
        {alert && <Alert type="error" showIcon title={alert} style={{ marginBottom: 16 }} />}
        <Form.Item
          name="key"
          label="Key"
          extra="Lower-case letters and digits joined by dashes; it cannot be changed later."
          rules={[{ required: true, message: 'Enter a key' }, { pattern: /^[a-z0-9]+(?:-[a-z0-9]+)*$/, message: 'Use lower-case letters and digits joined by dashes' }]}
        >
          <Input disabled={!!teardown} maxLength={80} spellCheck={false} />
        </Form.Item>
        <Form.Item name="name" label="Name" rules={[{ required: true, whitespace: true, message: 'Enter what is taken apart' }]}>
          <Input maxLength={240} />
        </Form.Item>
        <Form.Item name="hours" label="Hours to take apart and put back" rules={[{ required: true, message: 'Enter the hours' }]} style={{ maxWidth: 280 }}>
          <InputNumber min={0} max={KNOWLEDGE_LIMITS.hoursMax} step={0.1} suffix="h" style={{ width: '100%' }} />
        </Form.Item>
        <VehicleScopeFields legend="Which vehicles (empty: all)" />
        <Form.Item name="cautions" label="Safety cautions (keys)">
          <Select mode="tags" options={knownCautions.map((c) => ({ value: c, label: c }))} tokenSeparators={[',', ' ']} />
        </Form.Item>
      </Form>
    </Modal>
  );
}
