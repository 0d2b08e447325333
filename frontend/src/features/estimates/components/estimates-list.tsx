import { CheckCircleFilled, CloseCircleFilled, PrinterOutlined, SendOutlined } from '@ant-design/icons';
import { formatMoney, type CreateEstimateResponse, type EstimateAnswerDto, type EstimateDto } from '@causeway/shared';
import { Alert, App, Button, Card, Empty, Flex, Space, Spin, Table, Tag, Typography } from 'antd';
import { useState } from 'react';
import { palette } from '@/config/theme';
import { useEstimates } from '../api/get-estimates';
import { useResendEstimate } from '../api/resend-estimate';
import { formatWhen } from '../utils/format';

type EstimatesListProps = {
  jobId: string;
  locale: string;
  closed: boolean;
  printHref: (estimateId: string) => string;
};

/** The latest answer to each stage. */
export function latestDecisions(estimate: Pick<EstimateDto, 'stageCount' | 'answers'>): Array<EstimateAnswerDto | null> {
  const latest: Array<EstimateAnswerDto | null> = Array.from({ length: estimate.stageCount }, () => null);
  const sorted = [...estimate.answers].sort((a, b) => a.answeredAt.localeCompare(b.answeredAt));
  for (const a of sorted) if (a.stageIndex < latest.length) latest[a.stageIndex] = a;
  return latest;
}

function EstimateCard({ estimate, locale, closed, printHref }: { estimate: EstimateDto; locale: string; closed: boolean; printHref: string }) {
  const { message } = App.useApp();
  const [resent, setResent] = useState<CreateEstimateResponse | null>(null);
  const resend = useResendEstimate({
    mutationConfig: {
      onSuccess: (answer) => {
        setResent(answer);
        void message[answer.emailed ? 'success' : 'error'](answer.emailed ? 'Sent again with a new link' : 'Saved with a new link, but not e-mailed');
      },
      onError: (error) => void message.error(error.message),
    },
  });
  const decisions = latestDecisions(estimate);
  const answered = decisions.filter(Boolean).length;
  const money = (minor: number) => formatMoney(minor, estimate.currency, locale);

  return (
    <Card
      size="small"
      data-testid="sent-estimate"
      title={`Estimate of ${formatWhen(estimate.createdAt, locale)}`}
      extra={
        <Space wrap>
          <Button href={printHref} target="_blank" icon={<PrinterOutlined aria-hidden />}>
            Print
          </Button>
          {!closed && (
            <Button icon={<SendOutlined aria-hidden />} loading={resend.isPending} onClick={() => resend.mutate({ jobId: estimate.jobId, estimateId: estimate.id, data: {} })}>
              Send again
            </Button>
          )}
        </Space>
      }
      style={{ marginBottom: 16 }}
    >
      <Flex wrap gap={8} style={{ marginBottom: 8 }}>
        {estimate.emailedAt ? (
          <Tag color={palette.green}>E-mailed {formatWhen(estimate.emailedAt, locale)}{estimate.recipientEmail ? ` to ${estimate.recipientEmail}` : ''}</Tag>
        ) : (
          <Tag color={palette.red}>Not e-mailed</Tag>
        )}
        {estimate.expired ? <Tag>Link expired {formatWhen(estimate.expiresAt, locale)}</Tag> : <Tag>Link open until {formatWhen(estimate.expiresAt, locale)}</Tag>}
        <Tag>
          {answered} of {estimate.stageCount} stages answered
        </Tag>
      </Flex>
      {estimate.emailError && <Alert type="error" showIcon title={estimate.emailError} style={{ marginBottom: 8 }} />}
      {resent && (
        <Typography.Paragraph copyable={{ text: resent.link }}>
          New link: <a href={resent.link} target="_blank" rel="noreferrer">{resent.link}</a>
          {resent.emailError ? ` — ${resent.emailError}` : ''}
        </Typography.Paragraph>
      )}
      <Typography.Paragraph>
        Expected {money(estimate.totals.expected.gross)} with tax; every stage {money(estimate.totals.allStages.gross)} with tax.
      </Typography.Paragraph>
      <Table
        size="small"
        rowKey="index"
        pagination={false}
        dataSource={estimate.stages}
        columns={[
          { title: 'Stage', key: 'stage', render: (_: unknown, s) => `${s.index + 1}. ${s.title}` },
          { title: 'With tax', key: 'gross', align: 'right', render: (_: unknown, s) => money(s.price.gross) },
          {
            title: "Owner's answer",
            key: 'answer',
            render: (_: unknown, s) => {
              const a = decisions[s.index];
              if (!a) return <Typography.Text type="secondary">No answer yet</Typography.Text>;
              const approved = a.decision === 'approved';
              return (
                <span style={{ color: approved ? palette.green : palette.grey700, fontWeight: 600 }} data-testid="owner-answer">
                  {approved ? <CheckCircleFilled aria-hidden /> : <CloseCircleFilled aria-hidden />} {approved ? 'Approved' : 'Declined'}
                  <span style={{ fontWeight: 400 }}>
                    {a.name ? ` by ${a.name}` : ''}, {formatWhen(a.answeredAt, locale)}
                  </span>
                </span>
              );
            },
          },
        ]}
      />
    </Card>
  );
}

/** The staged estimates sent for a job, with the owner's answers and when they came. */
export function EstimatesList({ jobId, locale, closed, printHref }: EstimatesListProps) {
  const estimates = useEstimates(jobId);
  if (estimates.isPending) return <Spin description="Loading the estimates" />;
  if (estimates.isError) return <Alert type="error" showIcon title={estimates.error.message} />;
  if (estimates.data.length === 0) return <Empty description="No staged estimate sent yet." image={Empty.PRESENTED_IMAGE_SIMPLE} />;
  return (
    <>
      {estimates.data.map((e) => (
        <EstimateCard key={e.id} estimate={e} locale={locale} closed={closed} printHref={printHref(e.id)} />
      ))}
    </>
  );
}
