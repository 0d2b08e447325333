import { KNOWLEDGE_LIMITS } from '@causeway/shared';
import { Col, Form, Input, InputNumber, Row } from 'antd';

/** Make, model, engine and model years; empty means any. */
export function ScopeFields() {
  return (
    <fieldset style={{ border: 0, padding: 0, margin: 0, minWidth: 0 }}>
      <legend style={{ fontSize: 16, fontWeight: 600, marginBottom: 8, padding: 0, borderBottom: 0 }}>Which vehicles (empty: all)</legend>
      <Row gutter={12}>
        <Col xs={24} sm={8}>
          <Form.Item name="make" label="Make">
            <Input maxLength={40} autoComplete="off" />
          </Form.Item>
        </Col>
        <Col xs={24} sm={8}>
          <Form.Item name="model" label="Model">
            <Input maxLength={60} autoComplete="off" />
          </Form.Item>
        </Col>
        <Col xs={24} sm={8}>
          <Form.Item name="engine" label="Engine">
            <Input maxLength={60} autoComplete="off" />
          </Form.Item>
        </Col>
        <Col xs={12}>
          <Form.Item name="yearFrom" label="From model year">
            <InputNumber min={KNOWLEDGE_LIMITS.yearMin} max={KNOWLEDGE_LIMITS.yearMax} precision={0} style={{ width: '100%' }} />
          </Form.Item>
        </Col>
        <Col xs={12}>
          <Form.Item name="yearTo" label="To model year">
            <InputNumber min={KNOWLEDGE_LIMITS.yearMin} max={KNOWLEDGE_LIMITS.yearMax} precision={0} style={{ width: '100%' }} />
          </Form.Item>
        </Col>
      </Row>
    </fieldset>
  );
}

export interface ScopeValues {
  make?: string | null;
  model?: string | null;
  engine?: string | null;
  yearFrom?: number | null;
  yearTo?: number | null;
}

const blank = (s: string | null | undefined) => {
  const t = s?.trim() ?? '';
  return t === '' ? null : t;
};

/** The scope as the server takes it: empty text and missing years are null (any). */
export function scopeOf(values: ScopeValues) {
  return { make: blank(values.make), model: blank(values.model), engine: blank(values.engine), yearFrom: values.yearFrom ?? null, yearTo: values.yearTo ?? null };
}

export const SCOPE_LABELS: Record<string, string> = { make: 'Make', model: 'Model', engine: 'Engine', yearFrom: 'From model year', yearTo: 'To model year' };
