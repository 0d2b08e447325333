import { KNOWLEDGE_LIMITS } from '@causeway/shared';
import { Col, Form, Input, InputNumber, Row, Typography } from 'antd';

/** Make, model, engine and model years: empty means "any". */
export function ScopeFields({ hint }: { hint: string }) {
  return (
    <>
      <Typography.Paragraph type="secondary">{hint}</Typography.Paragraph>
      <Row gutter={16}>
        <Col xs={24} md={8}>
          <Form.Item name="make" label="Make">
            <Input maxLength={40} autoComplete="off" />
          </Form.Item>
        </Col>
        <Col xs={24} md={8}>
          <Form.Item name="model" label="Model">
            <Input maxLength={60} autoComplete="off" />
          </Form.Item>
        </Col>
        <Col xs={24} md={8}>
          <Form.Item name="engine" label="Engine">
            <Input maxLength={60} autoComplete="off" />
          </Form.Item>
        </Col>
        <Col xs={12} md={6}>
          <Form.Item name="yearFrom" label="From model year">
            <InputNumber min={KNOWLEDGE_LIMITS.yearMin} max={KNOWLEDGE_LIMITS.yearMax} precision={0} style={{ width: '100%' }} />
          </Form.Item>
        </Col>
        <Col xs={12} md={6}>
          <Form.Item name="yearTo" label="To model year">
            <InputNumber min={KNOWLEDGE_LIMITS.yearMin} max={KNOWLEDGE_LIMITS.yearMax} precision={0} style={{ width: '100%' }} />
          </Form.Item>
        </Col>
      </Row>
    </>
  );
}
