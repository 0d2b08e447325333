import { KNOWLEDGE_LIMITS } from '@causeway/shared';
import { Col, Form, Input, InputNumber, Row, Typography } from 'antd';
import { SCOPE_LABELS } from '@/utils/vehicle-scope';

type VehicleScopeFieldsProps = {
  /** Heads the fields as a fieldset of their own (leave it out inside a titled form section). */
  legend?: string;
  /** A line above the fields, e.g. what leaving them empty means. */
  hint?: string;
};

/** Make, model, engine and model years of the vehicles something applies to: empty means "any". */
export function VehicleScopeFields({ legend, hint }: VehicleScopeFieldsProps) {
  const fields = (
    <>
      {hint && <Typography.Paragraph type="secondary">{hint}</Typography.Paragraph>}
      <Row gutter={16}>
        <Col xs={24} md={8}>
          <Form.Item name="make" label={SCOPE_LABELS.make}>
            <Input maxLength={40} autoComplete="off" />
          </Form.Item>
        </Col>
        <Col xs={24} md={8}>
          <Form.Item name="model" label={SCOPE_LABELS.model}>
            <Input maxLength={60} autoComplete="off" />
          </Form.Item>
        </Col>
        <Col xs={24} md={8}>
          <Form.Item name="engine" label={SCOPE_LABELS.engine}>
            <Input maxLength={60} autoComplete="off" />
          </Form.Item>
        </Col>
        <Col xs={12} md={6}>
          <Form.Item name="yearFrom" label={SCOPE_LABELS.yearFrom}>
            <InputNumber min={KNOWLEDGE_LIMITS.yearMin} max={KNOWLEDGE_LIMITS.yearMax} precision={0} style={{ width: '100%' }} />
          </Form.Item>
        </Col>
        <Col xs={12} md={6}>
          <Form.Item name="yearTo" label={SCOPE_LABELS.yearTo}>
            <InputNumber min={KNOWLEDGE_LIMITS.yearMin} max={KNOWLEDGE_LIMITS.yearMax} precision={0} style={{ width: '100%' }} />
          </Form.Item>
        </Col>
      </Row>
    </>
  );
  if (!legend) return fields;
  return (
    <fieldset style={{ border: 0, padding: 0, margin: 0, minWidth: 0 }}>
      <legend style={{ fontSize: 16, fontWeight: 600, marginBottom: 8, padding: 0, borderBottom: 0 }}>{legend}</legend>
      {fields}
    </fieldset>
  );
}
