import { ClockCircleOutlined } from '@ant-design/icons';
import type { CodeEntryDto } from '@causeway/shared';
import { Card, Col, Descriptions, Row, Tag, Typography } from 'antd';
import { CodeCautions } from './code-cautions';
import { CodeStructure } from './code-structure';

const headingStyle = { fontSize: 22, marginTop: 0 } as const;

function formatHours(h: number, locale: string): string {
  return `${new Intl.NumberFormat(locale, { maximumFractionDigits: 2 }).format(h)} h`;
}

type CodeDetailsProps = {
  entry: CodeEntryDto;
  /** How numbers are written: the shop's locale. */
  locale: string;
};

/** What a catalogue entry says: the meaning in plain words, structure, symptoms, verification and cautions. */
export function CodeDetails({ entry, locale }: CodeDetailsProps) {
  const hours = (h: number) => formatHours(h, locale);
  return (
    <Row gutter={[24, 24]}>
      <Col xs={24} xl={14}>
        <Card>
          <section aria-labelledby="code-meaning">
            <Typography.Title level={2} id="code-meaning" style={headingStyle}>
              What it means
            </Typography.Title>
            <Typography.Paragraph style={{ fontSize: 17 }}>{entry.description}</Typography.Paragraph>
            {entry.make && (
              <Typography.Paragraph type="secondary">
                This is what the code means on a {entry.make}; manufacturer-controlled codes mean different things on other makes.
              </Typography.Paragraph>
            )}
            {entry.otherMakes.length > 0 && (
              <Typography.Paragraph type="secondary">
                The catalogue also holds its meaning on: {entry.otherMakes.join(', ')}. Choose the vehicle above to see it.
              </Typography.Paragraph>
            )}
          </section>
          <section aria-labelledby="code-symptoms">
            <Typography.Title level={3} id="code-symptoms" style={{ fontSize: 18 }}>
              What the driver may notice
            </Typography.Title>
            {entry.symptoms.length > 0 ? (
              <ul style={{ margin: 0, paddingLeft: 20, lineHeight: 1.8 }}>
                {entry.symptoms.map((s) => (
                  <li key={s}>{s}</li>
                ))}
              </ul>
            ) : (
              <Typography.Paragraph type="secondary">No symptoms are recorded for this code.</Typography.Paragraph>
            )}
          </section>
        </Card>
        {entry.cautions.length > 0 && (
          <section aria-labelledby="code-cautions" style={{ marginTop: 24 }}>
            <Typography.Title level={2} id="code-cautions" style={headingStyle}>
              Safety
            </Typography.Title>
            <CodeCautions cautions={entry.cautions} />
          </section>
        )}
      </Col>
      <Col xs={24} xl={10}>
        <Card>
          <section aria-labelledby="code-structure">
            <Typography.Title level={2} id="code-structure" style={headingStyle}>
              What the code says
            </Typography.Title>
            <CodeStructure structure={entry.structure} subsystem={entry.subsystem} />
            {entry.source && entry.source !== 'causeway' && (
              <Typography.Paragraph type="secondary" style={{ marginTop: 8, marginBottom: 0 }}>
                Title from: <Tag>{entry.source}</Tag>
              </Typography.Paragraph>
            )}
          </section>
        </Card>
        <Card style={{ marginTop: 24 }}>
          <section aria-labelledby="code-verification">
            <Typography.Title level={2} id="code-verification" style={headingStyle}>
              How the fix is verified
            </Typography.Title>
            <Descriptions
              column={1}
              size="small"
              items={[
                { key: 'monitor', label: 'Monitor', children: entry.verification.monitor },
                {
                  key: 'hours',
                  label: 'Labour',
                  children: (
                    <span>
                      <ClockCircleOutlined aria-hidden /> {hours(entry.verification.hours)} to clear, drive and confirm
                    </span>
                  ),
                },
              ]}
            />
            <Typography.Paragraph style={{ marginTop: 8, marginBottom: 0 }}>{entry.verification.procedure}</Typography.Paragraph>
            {entry.escalation && (
              <>
                <Typography.Title level={3} style={{ fontSize: 18, marginTop: 16 }}>
                  Escalation: further diagnosis ({hours(entry.escalation.hours)})
                </Typography.Title>
                <Typography.Paragraph style={{ marginBottom: 0 }}>{entry.escalation.description}</Typography.Paragraph>
              </>
            )}
          </section>
        </Card>
      </Col>
    </Row>
  );
}
