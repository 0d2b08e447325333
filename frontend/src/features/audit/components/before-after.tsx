import type { AuditEntryDto } from '@causeway/shared';
import { Col, Row, Typography } from 'antd';

function isRecord(v: unknown): v is Record<string, unknown> {
  return v !== null && typeof v === 'object' && !Array.isArray(v);
}

/** Top-level keys whose values differ between before and after. */
export function changedKeys(before: unknown, after: unknown): string[] {
  if (!isRecord(before) || !isRecord(after)) return [];
  const keys = new Set([...Object.keys(before), ...Object.keys(after)]);
  return [...keys].filter((k) => JSON.stringify(before[k]) !== JSON.stringify(after[k]));
}

function Json({ value, label }: { value: unknown; label: string }) {
  return (
    <section aria-label={label}>
      <Typography.Title level={4} style={{ fontSize: 16, marginTop: 0 }}>
        {label}
      </Typography.Title>
      {value === null || value === undefined ? (
        <Typography.Text type="secondary">Nothing (it did not exist)</Typography.Text>
      ) : (
        <pre
          tabIndex={0}
          style={{ margin: 0, padding: 12, background: '#f5f7f7', border: '1px solid #dde2e3', borderRadius: 6, maxHeight: 360, overflow: 'auto', fontSize: 14, lineHeight: 1.5, whiteSpace: 'pre-wrap', wordBreak: 'break-word' }}
        >
          {JSON.stringify(value, null, 2)}
        </pre>
      )}
    </section>
  );
}

/** An audit entry's before and after, side by side. */
export function BeforeAfter({ entry }: { entry: AuditEntryDto }) {
  const changed = changedKeys(entry.before, entry.after);
  return (
    <div>
      {entry.note && (
        <Typography.Paragraph>
          <Typography.Text strong>Note: </Typography.Text>
          {entry.note}
        </Typography.Paragraph>
      )}
      {changed.length > 0 && (
        <Typography.Paragraph>
          <Typography.Text strong>Changed: </Typography.Text>
          {changed.join(', ')}
        </Typography.Paragraph>
      )}
      <Row gutter={[16, 16]}>
        <Col xs={24} lg={12}>
          <Json value={entry.before} label="Before" />
        </Col>
        <Col xs={24} lg={12}>
          <Json value={entry.after} label="After" />
        </Col>
      </Row>
    </div>
  );
}
