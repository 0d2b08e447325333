import { PART_SYSTEMS, type PartDto, type PartSystem } from '@causeway/shared';
import { Alert, App, Form, Input, Modal, Select } from 'antd';
import { useState } from 'react';
import { applyFieldErrors, formAlertMessage } from '@/lib/form-errors';
import { SYSTEM_LABELS } from '@/utils/part-systems';
import { useCreatePart } from '../api/create-part';
import { useUpdatePart } from '../api/update-part';

interface PartValues {
  key: string;
  name: string;
  system: PartSystem;
}

type PartFormModalProps = {
  /** The part edited; null for a new one. */
  part: PartDto | null;
  open: boolean;
  onClose: () => void;
};

const LABELS = { key: 'Key', name: 'Name', system: 'System' };

export function PartFormModal({ part, open, onClose }: PartFormModalProps) {
  const { message } = App.useApp();
  const [form] = Form.useForm<PartValues>();
  const [alert, setAlert] = useState<string | null>(null);
  const onError = (error: Error) => setAlert(formAlertMessage(error, applyFieldErrors(form, error, { labels: LABELS })));
  const create = useCreatePart({ mutationConfig: { onSuccess: (p) => { void message.success(`${p.name} added`); onClose(); }, onError } });
  const update = useUpdatePart({ mutationConfig: { onSuccess: (p) => { void message.success(`${p.name} saved`); onClose(); }, onError } });
  return (
    <Modal
      title={part ? `Edit part: ${part.name}` : 'Add a part'}
      open={open}
      onCancel={onClose}
      okText={part ? 'Save part' : 'Add part'}
      onOk={() => form.submit()}
      confirmLoading={create.isPending || update.isPending}
      destroyOnHidden
    >
      <Form<PartValues>
        form={form}
        layout="vertical"
        preserve={false}
        initialValues={part ? { key: part.key, name: part.name, system: part.system as PartSystem } : undefined}
        onFinish={(values) => {
          setAlert(null);
          if (part) update.mutate({ key: part.key, data: { name: values.name.trim(), system: values.system } });
          else create.mutate({ key: values.key.trim(), name: values.name.trim(), system: values.system });
        }}
      >
        {alert && <Alert type="error" showIcon title={alert} style={{ marginBottom: 16 }} />}
        <Form.Item
          name="key"
          label="Key"
          extra="Lower-case letters and digits joined by dashes; it cannot be changed later."
          rules={[{ required: true, message: 'Enter a key' }, { pattern: /^[a-z0-9]+(?:-[a-z0-9]+)*$/, message: 'Use lower-case letters and digits joined by dashes, e.g. fuel-cap' }]}
        >
          <Input disabled={!!part} maxLength={60} spellCheck={false} />
        </Form.Item>
        <Form.Item name="name" label="Name" rules={[{ required: true, whitespace: true, message: 'Enter the name of the part' }]}>
          <Input maxLength={160} />
        </Form.Item>
        <Form.Item name="system" label="System" extra="Decides the safety cautions that come with the part." rules={[{ required: true, message: 'Choose the system' }]}>
          <Select options={PART_SYSTEMS.map((s) => ({ value: s, label: SYSTEM_LABELS[s] }))} />
        </Form.Item>
      </Form>
    </Modal>
  );
}
