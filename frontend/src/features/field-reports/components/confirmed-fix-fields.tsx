import { KNOWLEDGE_LIMITS, type DistanceUnit } from '@causeway/shared';
import { Col, Form, Input, InputNumber, Row, Select } from 'antd';
import { useCodeCauses } from '../api/get-code-causes';
import { useParts } from '../api/get-parts';
import { useParsedCode } from './code-field';
import { partOptions } from './part-options';
import { FormSection } from './form-section';

type ConfirmedFixFieldsProps = { distanceUnit: DistanceUnit };

const required = (what: string) => ({ required: true, message: `Enter ${what}` });

export function ConfirmedFixFields({ distanceUnit }: ConfirmedFixFieldsProps) {
  const code = useParsedCode(Form.useWatch<string | undefined>('code'));
  const parts = useParts();
  const causes = useCodeCauses(code);
  const options = partOptions(parts.data ?? [], causes.data ?? [], code);
  const fixedBy = Form.useWatch<string | undefined>('part');
  const unitName = distanceUnit === 'mi' ? 'miles' : 'km';
  return (
    <>
      <FormSection title="The vehicle">
        <Row gutter={16}>
          <Col xs={24} md={12} lg={6}>
            <Form.Item name="make" label="Make" rules={[required('the make')]}>
              <Input maxLength={40} autoComplete="off" />
            </Form.Item>
          </Col>
          <Col xs={24} md={12} lg={6}>
            <Form.Item name="model" label="Model" rules={[required('the model')]}>
              <Input maxLength={60} autoComplete="off" />
            </Form.Item>
          </Col>
          <Col xs={24} md={12} lg={6}>
            <Form.Item name="engine" label="Engine (optional)">
              <Input maxLength={60} autoComplete="off" placeholder="e.g. 1.6 T" />
            </Form.Item>
          </Col>
          <Col xs={24} md={12} lg={6}>
            <Form.Item name="year" label="Model year (optional)">
              <InputNumber min={KNOWLEDGE_LIMITS.yearMin} max={KNOWLEDGE_LIMITS.yearMax} precision={0} style={{ width: '100%' }} />
            </Form.Item>
          </Col>
        </Row>
        <Form.Item name="odometer" label={`Odometer (${unitName})`} extra={distanceUnit === 'mi' ? 'Kept in km; shown in miles as your shop works.' : undefined} style={{ maxWidth: 320 }}>
          <InputNumber min={0} precision={0} style={{ width: '100%' }} suffix={distanceUnit} />
        </Form.Item>
      </FormSection>
      <FormSection title="The fix">
        <Form.Item name="part" label="The part that fixed it" rules={[required('the part whose replacement fixed the fault')]} extra="The code stayed away after this part was replaced." style={{ maxWidth: 640 }}>
          <Select showSearch={{ optionFilterProp: 'label' }} options={options} loading={parts.isLoading} placeholder="Choose a part" />
        </Form.Item>
        <Form.Item name="triedFirst" label="Tried first without success (optional)" style={{ maxWidth: 640 }}>
          <Select
            mode="multiple"
            showSearch={{ optionFilterProp: 'label' }}
            options={(parts.data ?? []).filter((p) => p.key !== fixedBy).map((p) => ({ value: p.key, label: p.name }))}
            placeholder="Parts replaced or checked before, in any order"
          />
        </Form.Item>
        <Form.Item name="notes" label="Notes (optional)" style={{ maxWidth: 760 }}>
          <Input.TextArea rows={4} maxLength={KNOWLEDGE_LIMITS.notesMax} showCount placeholder="What you measured, what you saw, what you would do next time" />
        </Form.Item>
      </FormSection>
    </>
  );
}
