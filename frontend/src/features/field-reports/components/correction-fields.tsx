import { KNOWLEDGE_LIMITS, type CorrectionField, type PossibleCauseRowDto } from '@causeway/shared';
import { Form, Input, InputNumber, Radio, Select, Typography } from 'antd';
import { formatMoney } from '@/utils/money';
import { describeScope } from '@/utils/vehicle-scope';
import { useDecodedCode } from '../api/decode-code';
import { useCodeCauses } from '../api/get-code-causes';
import { CORRECTION_FIELD_LABELS } from '../utils/labels';
import { causeKey } from '../utils/report-form';
import { useParsedCode } from './code-field';
import { FormSection } from './form-section';

type CorrectionFieldsProps = { locale: string };

function currentValue(row: PossibleCauseRowDto | undefined, field: CorrectionField | undefined, locale: string): string | null {
  if (!row) return null;
  if (field === 'partCostMinor') return formatMoney(row.partCostMinor, row.currency, locale);
  if (field === 'replaceHours') return `${row.replaceHours} h`;
  return null;
}

export function CorrectionFields({ locale }: CorrectionFieldsProps) {
  const form = Form.useFormInstance();
  const code = useParsedCode(Form.useWatch<string | undefined>('code'));
  const target = Form.useWatch<'cause' | 'code' | undefined>('target') ?? 'cause';
  const field = Form.useWatch<CorrectionField | undefined>('field');
  const selected = Form.useWatch<string | undefined>('cause');
  const causes = useCodeCauses(target === 'cause' ? code : null);
  const decoded = useDecodedCode(target === 'code' ? code : null);
  const row = (causes.data ?? []).find((c) => causeKey(c) === selected);
  const now = target === 'code' ? (field === 'title' ? (decoded.data?.known?.title ?? null) : null) : currentValue(row, field, locale);
  const fields: CorrectionField[] = target === 'cause' ? ['partCostMinor', 'replaceHours'] : ['title', 'description'];

  return (
    <FormSection title="The correction">
      <Form.Item name="target" label="What to correct">
        <Radio.Group
          optionType="button"
          buttonStyle="solid"
          onChange={(e) => form.setFieldValue('field', e.target.value === 'cause' ? 'partCostMinor' : 'title')}
          options={[
            { value: 'cause', label: 'A possible cause of the code' },
            { value: 'code', label: 'The code itself' },
          ]}
        />
      </Form.Item>
      {target === 'cause' ? (
        <Form.Item name="cause" label="Possible cause" rules={[{ required: true, message: 'Choose the possible cause to correct' }]} style={{ maxWidth: 760 }}>
          <Select
            showSearch={{ optionFilterProp: 'label' }}
            loading={causes.isFetching}
            disabled={!code}
            placeholder={code ? 'Choose a possible cause' : 'Enter the fault code first'}
            notFoundContent={code ? `No possible causes are listed for ${code}` : undefined}
            options={(causes.data ?? []).map((c) => ({ value: causeKey(c), label: `${c.partName} — ${describeScope(c)}` }))}
          />
        </Form.Item>
      ) : (
        <Form.Item name="make" label="Make (only for a make's own meaning of the code)" style={{ maxWidth: 420 }}>
          <Input maxLength={40} />
        </Form.Item>
      )}
      <Form.Item name="field" label="Field">
        <Radio.Group optionType="button" buttonStyle="solid" options={fields.map((f) => ({ value: f, label: CORRECTION_FIELD_LABELS[f] }))} />
      </Form.Item>
      {now && (
        <Typography.Paragraph>
          Now: <Typography.Text strong>{now}</Typography.Text>
        </Typography.Paragraph>
      )}
      {field === 'partCostMinor' && (
        <Form.Item
          name="valueMoney"
          label={`The correct part cost${row ? ` (${row.currency})` : ''}`}
          rules={[{ required: true, message: 'Enter the correct part cost' }, { pattern: /^\s*\d+(?:[.,]\d{0,3})?\s*$/, message: 'Enter an amount such as 26.00' }]}
          style={{ maxWidth: 320 }}
        >
          <Input inputMode="decimal" autoComplete="off" />
        </Form.Item>
      )}
      {field === 'replaceHours' && (
        <Form.Item name="valueHours" label="The correct labour hours" rules={[{ required: true, message: 'Enter the correct labour hours' }]} style={{ maxWidth: 320 }}>
          <InputNumber min={0} max={KNOWLEDGE_LIMITS.hoursMax} step={0.1} suffix="h" style={{ width: '100%' }} />
        </Form.Item>
      )}
      {field === 'title' && (
        <Form.Item name="valueText" label="The correct title" rules={[{ required: true, whitespace: true, message: 'Enter the correct title' }]} style={{ maxWidth: 760 }}>
          <Input maxLength={200} />
        </Form.Item>
      )}
      {field === 'description' && (
        <Form.Item name="valueText" label="The correct description" style={{ maxWidth: 760 }}>
          <Input.TextArea rows={5} maxLength={4000} showCount />
        </Form.Item>
      )}
      <Form.Item
        name="reason"
        label="Reason"
        extra="Why the value is wrong and where the right one comes from (an invoice, a labour guide)."
        rules={[{ required: true, whitespace: true, message: 'Give the reason for the correction' }, { min: KNOWLEDGE_LIMITS.reasonMin, message: `At least ${KNOWLEDGE_LIMITS.reasonMin} characters` }]}
        style={{ maxWidth: 760 }}
      >
        <Input.TextArea rows={3} maxLength={KNOWLEDGE_LIMITS.reasonMax} showCount />
      </Form.Item>
    </FormSection>
  );
}
