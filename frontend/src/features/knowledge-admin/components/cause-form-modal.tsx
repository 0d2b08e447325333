import { KNOWLEDGE_LIMITS, parseDtc, type PartDto, type PossibleCauseRowDto, type TeardownDto } from '@causeway/shared';
import { Alert, App, Checkbox, Col, Form, Input, InputNumber, Modal, Row, Select, Switch } from 'antd';
import { useState } from 'react';
import { VehicleScopeFields } from '@/components/vehicle-scope-fields';
import { COMMON_CURRENCIES } from '@/config/locales';
import { applyFieldErrors, formAlertMessage } from '@/lib/form-errors';
import { fromMinorUnits, toMinorUnits } from '@/utils/money';
import { describeScope, SCOPE_LABELS, scopeOf, type ScopeValues } from '@/utils/vehicle-scope';
import { useCreateCause } from '../api/create-cause';
import { useUpdateCause } from '../api/update-cause';
import { inFormTerms } from '../utils/errors';

interface CauseValues extends ScopeValues {
  code: string;
  partKey: string;
  /** Percent, 0–100. */
  prior: number;
  partCost: string;
  currency: string;
  replaceHours: number;
  teardownKey?: string | null;
  withCheck: boolean;
  checkDescription?: string;
  checkHours?: number | null;
  checkMustPrecede?: boolean;
}

type CauseFormModalProps = {
  /** The row edited; null for a new one. */
  cause: PossibleCauseRowDto | null;
  /** A new cause starts with this code. */
  code: string;
  /** The currency a new cause's cost is typed in by default. */
  currency: string;
  parts: PartDto[];
  teardowns: TeardownDto[];
  open: boolean;
  onClose: () => void;
};

const LABELS: Record<string, string> = {
  code: 'Fault code',
  partKey: 'Part',
  prior: 'Prior',
  partCostMinor: 'Part cost',
  currency: 'Currency',
  replaceHours: 'Labour hours',
  teardownKey: 'Teardown',
  check: 'Check',
  'check.description': 'What the check does',
  'check.hours': 'Hours of the check',
  'check.mustPrecede': 'Check first',
  ...SCOPE_LABELS,
};
const RENAME = { partCostMinor: 'partCost', check: 'checkDescription', 'check.description': 'checkDescription', 'check.hours': 'checkHours', 'check.mustPrecede': 'checkMustPrecede' };

function toValues(c: PossibleCauseRowDto): CauseValues {
  return {
    code: c.code,
    partKey: c.partKey,
    prior: Number((c.prior * 100).toFixed(6)),
    partCost: fromMinorUnits(c.partCostMinor, c.currency),
    currency: c.currency,
    replaceHours: c.replaceHours,
    teardownKey: c.teardownKey,
    withCheck: !!c.check,
    checkDescription: c.check?.description,
    checkHours: c.check?.hours ?? null,
    checkMustPrecede: c.check?.mustPrecede ?? false,
    make: c.make,
    model: c.model,
    engine: c.engine,
    yearFrom: c.yearFrom,
    yearTo: c.yearTo,
  };
}

/** Add or edit one possible cause of a code. Priors are typed in percent; the server checks the sum per scope. */
export function CauseFormModal({ cause, code, currency, parts, teardowns, open, onClose }: CauseFormModalProps) {
  const { message } = App.useApp();
  const [form] = Form.useForm<CauseValues>();
  const [alert, setAlert] = useState<string | null>(null);
  const withCheck = Form.useWatch<boolean | undefined>('withCheck', form);
  const onError = (error: Error) => {
    const shown = inFormTerms(error);
    setAlert(formAlertMessage(shown, applyFieldErrors(form, shown, { labels: LABELS, rename: RENAME })));
  };
  const create = useCreateCause({ mutationConfig: { onSuccess: (c) => { void message.success(`${c.partName} added to ${c.code}`); onClose(); }, onError } });
  const update = useUpdateCause({ mutationConfig: { onSuccess: (c) => { void message.success(`${c.partName} (${c.code}) saved`); onClose(); }, onError } });

  return (
    <Modal
      title={cause ? `Edit possible cause: ${cause.partName} for ${cause.code}` : 'Add a possible cause'}
      open={open}
      onCancel={onClose}
      okText={cause ? 'Save possible cause' : 'Add possible cause'}
      onOk={() => form.submit()}
      confirmLoading={create.isPending || update.isPending}
      destroyOnHidden
      width={760}
    >
      <Form<CauseValues>
        form={form}
        layout="vertical"
        preserve={false}
        initialValues={cause ? toValues(cause) : { code, currency, withCheck: false, checkMustPrecede: false, teardownKey: null }}
        onFinish={(values) => {
          setAlert(null);
          const data = {
            prior: Number((values.prior / 100).toFixed(8)),
            partCostMinor: toMinorUnits(values.partCost, values.currency) ?? Number.NaN,
            currency: values.currency,
            replaceHours: values.replaceHours,
            teardownKey: values.teardownKey ?? null,
            check: values.withCheck ? { description: values.checkDescription?.trim() ?? '', hours: values.checkHours ?? Number.NaN, mustPrecede: values.checkMustPrecede ?? false } : null,
            ...scopeOf(values),
          };
          if (cause) update.mutate({ id: cause.id, data });
          else {
            const parsed = parseDtc(values.code);
            create.mutate({ code: parsed.ok ? parsed.value.code : values.code.trim(), partKey: values.partKey, ...data });
          }
        }}
      >
        {alert && <Alert type="error" showIcon title={alert} style={{ marginBottom: 16 }} />}
        <Row gutter={12}>
          <Col xs={24} sm={8}>
            <Form.Item
              name="code"
              label="Fault code"
              rules={[
                {
                  validator: async (_r, value: string | undefined) => {
                    const parsed = parseDtc(value ?? '');
                    if (!parsed.ok) throw new Error(parsed.error.message);
                  },
                },
              ]}
            >
              <Input disabled={!!cause} spellCheck={false} autoCapitalize="characters" />
            </Form.Item>
          </Col>
          <Col xs={24} sm={16}>
            <Form.Item name="partKey" label="Part" rules={[{ required: true, message: 'Choose the part' }]}>
              <Select disabled={!!cause} showSearch={{ optionFilterProp: 'label' }} options={parts.map((p) => ({ value: p.key, label: p.name }))} />
            </Form.Item>
          </Col>
        </Row>
        <Row gutter={12}>
          <Col xs={12} sm={6}>
            <Form.Item
              name="prior"
              label="Prior"
              extra="0–100 %"
              rules={[{ required: true, message: 'Enter the prior' }, { type: 'number', min: 0, max: 100, message: 'Between 0 and 100 %' }]}
            >
              <InputNumber min={0} max={100} step={1} suffix="%" style={{ width: '100%' }} />
            </Form.Item>
          </Col>
          <Col xs={12} sm={6}>
            <Form.Item name="partCost" label="Part cost" rules={[{ required: true, message: 'Enter the part cost' }, { pattern: /^\s*\d+(?:[.,]\d{0,3})?\s*$/, message: 'An amount such as 22.00' }]}>
              <Input inputMode="decimal" autoComplete="off" />
            </Form.Item>
          </Col>
          <Col xs={12} sm={6}>
            <Form.Item name="currency" label="Currency" rules={[{ required: true, message: 'Choose the currency' }]}>
              <Select showSearch options={COMMON_CURRENCIES.map((c) => ({ value: c, label: c }))} />
            </Form.Item>
          </Col>
          <Col xs={12} sm={6}>
            <Form.Item name="replaceHours" label="Labour hours" extra="To replace" rules={[{ required: true, message: 'Enter the hours' }]}>
              <InputNumber min={0} max={KNOWLEDGE_LIMITS.hoursMax} step={0.1} suffix="h" style={{ width: '100%' }} />
            </Form.Item>
          </Col>
        </Row>
        <Form.Item name="teardownKey" label="Teardown">
          <Select
            allowClear
            showSearch={{ optionFilterProp: 'label' }}
            options={teardowns.map((t) => ({ value: t.key, label: `${t.name} — ${t.hours} h, ${describeScope(t, { capitalised: true })}` }))}
            onClear={() => form.setFieldValue('teardownKey', null)}
          />
        </Form.Item>
        <Form.Item name="withCheck" label="A check decides whether this is the cause" valuePropName="checked">
          <Switch />
        </Form.Item>
        {withCheck && (
          <Row gutter={12}>
            <Col xs={24} sm={16}>
              <Form.Item name="checkDescription" label="What the check does" rules={[{ required: true, whitespace: true, message: 'Describe the check' }]}>
                <Input maxLength={1000} />
              </Form.Item>
            </Col>
            <Col xs={24} sm={8}>
              <Form.Item name="checkHours" label="Hours of the check" rules={[{ required: true, message: 'Enter the hours' }]}>
                <InputNumber min={0} max={KNOWLEDGE_LIMITS.hoursMax} step={0.1} suffix="h" style={{ width: '100%' }} />
              </Form.Item>
            </Col>
            <Col xs={24}>
              <Form.Item name="checkMustPrecede" valuePropName="checked">
                <Checkbox>Must be found by the check before it may be replaced</Checkbox>
              </Form.Item>
            </Col>
          </Row>
        )}
        <VehicleScopeFields legend="Which vehicles (empty: all)" />
      </Form>
    </Modal>
  );
}
