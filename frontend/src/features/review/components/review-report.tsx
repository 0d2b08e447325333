import type { FieldReportDto, ReviewReportDto } from '@causeway/shared';
import { Alert, Card, Descriptions, Flex, Result, Skeleton, Tag, Typography } from 'antd';
import type { ReactNode } from 'react';
import { isApiError } from '@/lib/api-client';
import { KIND_LABELS, STATUS_COLOURS, STATUS_LABELS } from '@/utils/field-report-labels';
import { formatDateTime } from '@/utils/format';
import { useReviewReport } from '../api/get-review-report';
import { AttachmentGallery } from './attachment-gallery';
import { ChangeTable } from './change-table';
import { DecisionPanel } from './decision-panel';
import { LikelihoodTable } from './likelihood-table';

type ReviewReportProps = {
  id: string;
  /** The signed-in moderator: their own report shows that someone else must decide it. */
  currentUserId: string;
  locale: string;
  /** What the report says, drawn by the page. */
  renderPayload: (report: ReviewReportDto) => ReactNode;
  onDecided: (report: FieldReportDto, decision: 'approved' | 'rejected') => void;
};

/** One report on the review desk: what it says, what approving would change, the evidence, the decision. */
export function ReviewReport({ id, currentUserId, locale, renderPayload, onDecided }: ReviewReportProps) {
  const query = useReviewReport(id);
  if (query.isLoading) return <Skeleton active paragraph={{ rows: 8 }} />;
  if (query.isError) {
    if (isApiError(query.error) && query.error.status === 404) return <Result status="404" title="This report is not on the review desk" subTitle="It may be a draft, or it does not exist." />;
    return <Alert type="error" showIcon title={query.error.message} />;
  }
  const report = query.data;
  if (!report) return null;
  const { diff } = report;
  const own = report.author.id === currentUserId;
  const decided = report.status === 'approved' || report.status === 'rejected';

  return (
    <Flex vertical gap={24}>
      <Card>
        <Descriptions
          column={{ xs: 1, md: 2, xl: 4 }}
          items={[
            { key: 'kind', label: 'Kind', children: KIND_LABELS[report.kind] },
            { key: 'status', label: 'Status', children: <Tag color={STATUS_COLOURS[report.status]}>{STATUS_LABELS[report.status]}</Tag> },
            { key: 'author', label: 'Filed by', children: own ? `${report.author.displayName} (you)` : report.author.displayName },
            { key: 'submitted', label: 'Submitted', children: report.submittedAt ? formatDateTime(report.submittedAt, locale) : '' },
          ]}
        />
        {decided && (
          <Alert
            type={report.status === 'approved' ? 'success' : 'error'}
            showIcon
            title={`${STATUS_LABELS[report.status]}${report.decidedBy ? ` by ${report.decidedBy.displayName}` : ''}${report.decidedAt ? `, ${formatDateTime(report.decidedAt, locale)}` : ''}`}
            description={report.decisionNote ?? undefined}
            style={{ marginTop: 8 }}
          />
        )}
      </Card>

      <Card title="What approving changes">
        <Typography.Paragraph style={{ fontSize: 17 }}>{diff.summary}</Typography.Paragraph>
        <Typography.Paragraph type="secondary">Writes to: {diff.target.label}</Typography.Paragraph>
        {diff.warnings.length > 0 && (
          <Alert
            type="info"
            showIcon
            title="Before you decide"
            description={
              <ul style={{ margin: 0, paddingLeft: 20 }}>
                {diff.warnings.map((w, i) => (
                  <li key={i}>{w}</li>
                ))}
              </ul>
            }
            style={{ marginBottom: 16 }}
          />
        )}
        {diff.changes.length > 0 && <ChangeTable changes={diff.changes} report={report} locale={locale} />}
        {diff.likelihoods && (
          <>
            <Typography.Title level={3} style={{ fontSize: 19, marginTop: 24 }}>
              Likelihoods before and after
            </Typography.Title>
            <LikelihoodTable likelihoods={diff.likelihoods} locale={locale} />
          </>
        )}
      </Card>

      <Card title="What the report says">{renderPayload(report)}</Card>

      <Card title="Evidence">
        <AttachmentGallery attachments={report.attachments} />
      </Card>

      <section aria-labelledby="decision-title">
        <Typography.Title level={2} id="decision-title" style={{ fontSize: 22 }}>
          Decision
        </Typography.Title>
        {diff.blockers.length > 0 && (
          <Alert
            type={own || decided ? 'info' : 'error'}
            showIcon
            title={own ? 'You cannot decide your own report' : decided || report.status === 'withdrawn' ? 'Nothing to decide' : 'Approving would be refused as things stand'}
            description={
              <ul style={{ margin: 0, paddingLeft: 20 }}>
                {diff.blockers.map((b, i) => (
                  <li key={i}>{b}</li>
                ))}
              </ul>
            }
            style={{ marginBottom: 16 }}
          />
        )}
        {report.status === 'submitted' && !own && <DecisionPanel report={report} onDecided={onDecided} approveBlocked={!diff.applicable} />}
      </section>
    </Flex>
  );
}
