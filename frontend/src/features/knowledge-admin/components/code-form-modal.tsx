import { KNOWLEDGE_LIMITS, type CodeEntryDto } from '@causeway/shared';
import { Alert, App, Col, Form, Input, InputNumber, Modal, Row, Select, Skeleton, Switch } from 'antd';
import { useState } from 'react';
import { applyFieldErrors, formAlertMessage } from '@/lib/form-errors';
import { useCode } from '../api/get-code';
import { useUpdateCode } from '../api/update-code';
import { inFormTerms } from '../utils/errors';

interface CodeValues {
  title: string;
  description: string;
  subsystem: string;
  symptoms: string[];
  monitor: string;
  procedure: string;
  verificationHours: number;
  offersEscalation: boolean;
  escalationHours?: number | null;
  escalationDescription?: string;
  cautions: string[];
}

const LABELS: Record<string, string> = {
  title: 'Title',
  description: 'Description',
  subsystem: 'Subsystem',
  symptoms: 'Symptoms',
  'verification.monitor': 'Monitor',
  'verification.procedure': 'Verification procedure',
  'verification.hours': 'Verification hours',
  'escalation.hours': 'Hours of further diagnosis',
  'escalation.description': 'What further diagnosis involves',
  escalation: 'Further diagnosis',
  cautions: 'Safety cautions',
};
const RENAME = {
  'verification.monitor': 'monitor',
  'verification.procedure': 'procedure',
  'verification.hours': 'verificationHours',
  'escalation.hours': 'escalationHours',
  'escalation.description': 'escalationDescription',
  escalation: 'offersEscalation',
};

function toValues(entry: CodeEntryDto): CodeValues {
  return {
    title: entry.title,
    description: entry.description,
    subsystem: entry.subsystem,
    symptoms: entry.symptoms,
    monitor: entry.verification.monitor,
    procedure: entry.verification.procedure,
    verificationHours: entry.verification.hours,
    offersEscalation: entry.escalation !== null,
    escalationHours: entry.escalation?.hours ?? null,
    escalationDescription: entry.escalation?.description ?? '',
    cautions: entry.cautions.map((c) => c.key),
  };
}

function CodeForm({ entry, onClose }: { entry: CodeEntryDto; onClose: () => void }) {
  const { message } = App.useApp();
  const [form] = Form.useForm<CodeValues>();
  const [alert, setAlert] = useState<string | null>(null);
  const offersEscalation = Form.useWatch<boolean | undefined>('offersEscalation', form);
  const update = useUpdateCode({
    mutationConfig: {
      onSuccess: (saved) => {
        void message.success(`${saved.code} saved`);
        onClose();
      },
      onError: (error) => {
        const shown = inFormTerms(error, { symptoms: 'symptoms', cautions: 'cautions' });
        setAlert(formAlertMessage(shown, applyFieldErrors(form, shown, { labels: LABELS, rename: RENAME })));
      },
    },
  });
  return (
    <Form<CodeValues>
      id="code-edit-form"
      form={form}
      layout="vertical"
      initialValues={toValues(entry)}
      onFinish={(v) => {
        setAlert(null);
        update.mutate({
          code: entry.code,
          data: {
            title: v.title.trim(),
            description: v.description?.trim() ?? '',
            subsystem: v.subsystem.trim(),
            symptoms: (v.symptoms ?? []).map((s) => s.trim()).filter(Boolean),
            verification: { monitor: v.monitor?.trim() ?? '', procedure: v.procedure?.trim() ?? '', hours: v.verificationHours },
            escalation: v.offersEscalation ? { hours: v.escalationHours ?? Number.NaN, description: v.escalationDescription?.trim() ?? '' } : null,
            cautions: v.cautions ?? [],
          },
        });
      }}
    >
      {alert && <Alert type="error" showIcon title={alert} style={{ marginBottom: 16 }} />}
      <Form.Item name="title" label="Title" rules={[{ required: true, whitespace: true, message: 'Enter the title' }]}>
        <Input maxLength={200} />
      </Form.Item>
      <Form.Item name="description" label="Description">
        <Input.TextArea rows={4} maxLength={4000} />
      </Form.Item>
      <Row gutter={12}>
        <Col xs={24} sm={12}>
          <Form.Item name="subsystem" label="Subsystem" rules={[{ required: true, whitespace: true, message: 'Enter the subsystem' }]}>
            <Input maxLength={120} />
          </Form.Item>
        </Col>
        <Col xs={24} sm={12}>
          <Form.Item name="cautions" label="Safety cautions (keys)">
            <Select mode="tags" tokenSeparators={[',', ' ']} />
          </Form.Item>
        </Col>
      </Row>
      <Form.Item name="symptoms" label="Symptoms" extra="Type one and press Enter.">
        <Select mode="tags" open={false} suffixIcon={null} />
      </Form.Item>
      <fieldset style={{ border: 0, padding: 0, margin: 0, minWidth: 0 }}>
        <legend style={{ fontSize: 16, fontWeight: 600, marginBottom: 8, padding: 0, borderBottom: 0 }}>Verification</legend>
        <Row gutter={12}>
          <Col xs={24} sm={16}>
            <Form.Item name="monitor" label="Monitor">
              <Input maxLength={120} />
            </Form.Item>
          </Col>
          <Col xs={24} sm={8}>
            <Form.Item name="verificationHours" label="Hours to clear, drive and confirm" rules={[{ required: true, message: 'Enter the hours' }]}>
              <InputNumber min={0} max={KNOWLEDGE_LIMITS.hoursMax} step={0.1} suffix="h" style={{ width: '100%' }} />
            </Form.Item>
          </Col>
        </Row>
        <Form.Item name="procedure" label="Verification procedure">
          <Input.TextArea rows={3} maxLength={4000} />
        </Form.Item>
      </fieldset>
      <Form.Item name="offersEscalation" label="Further diagnosis (escalation) is offered" valuePropName="checked">
        <Switch />
      </Form.Item>
      {offersEscalation && (
        <Row gutter={12}>
          <Col xs={24} sm={8}>
            <Form.Item name="escalationHours" label="Hours of further diagnosis" rules={[{ required: true, message: 'Enter the hours' }]}>
              <InputNumber min={0} max={1000} step={0.5} suffix="h" style={{ width: '100%' }} />
            </Form.Item>
          </Col>
          <Col xs={24} sm={16}>
            <Form.Item name="escalationDescription" label="What further diagnosis involves">
              <Input maxLength={4000} />
            </Form.Item>
          </Col>
        </Row>
      )}
    </Form>
  );
}

type CodeFormModalProps = { code: string; open: boolean; onClose: () => void };

/** Edit the generic catalogue entry of a code: its words, verification, escalation and cautions. */
export function CodeFormModal({ code, open, onClose }: CodeFormModalProps) {
  const entry = useCode(code, open);
  return (
    <Modal
      title={`Edit the catalogue entry of ${code}`}
      open={open}
      onCancel={onClose}
      okText="Save code"
      okButtonProps={{ htmlType: 'submit', form: 'code-edit-form', disabled: !entry.data }}
      destroyOnHidden
      width={760}
    >
      {entry.isLoading && <Skeleton active />}
      {entry.isError && <Alert type="error" showIcon title={entry.error.message} />}
      {entry.data && <CodeForm key={entry.dataUpdatedAt} entry={entry.data} onClose={onClose} />}
    </Modal>
  );
}
