import type { DistanceUnit, FieldReportDto } from '@causeway/shared';
import { Alert, App, Button, Card, Descriptions, Flex, Popconfirm } from 'antd';
import type { ReactNode } from 'react';
import { formatDateTime } from '@/utils/format';
import { useWithdrawReport } from '../api/withdraw-report';
import { ReportPayload } from './report-payload';
import { ReportStatusTag } from './report-status-tag';

type ReportViewProps = {
  report: FieldReportDto;
  distanceUnit: DistanceUnit;
  locale: string;
  /** The stored files, shown by the page (they need an authenticated fetch). */
  attachments?: ReactNode;
};

/** A report that is no longer a draft: where it stands, what the moderator said, what it proposed. */
export function ReportView({ report, distanceUnit, locale, attachments }: ReportViewProps) {
  const { message } = App.useApp();
  const withdraw = useWithdrawReport({
    mutationConfig: { onSuccess: () => void message.success('Report withdrawn'), onError: (e) => void message.error(e.message) },
  });
  const decided = report.status === 'approved' || report.status === 'rejected';
  return (
    <Flex vertical gap={24}>
      <Card title="Where it stands">
        <Descriptions
          column={{ xs: 1, md: 2 }}
          items={[
            { key: 'status', label: 'Status', children: <ReportStatusTag status={report.status} /> },
            { key: 'submitted', label: 'Submitted', children: report.submittedAt ? formatDateTime(report.submittedAt, locale) : 'Not submitted' },
            ...(decided
              ? [
                  { key: 'decided', label: 'Decided', children: `${report.decidedAt ? formatDateTime(report.decidedAt, locale) : ''}${report.decidedBy ? ` by ${report.decidedBy.displayName}` : ''}` },
                ]
              : []),
          ]}
        />
        {report.status === 'rejected' && (
          <Alert type="error" showIcon title="Reason for the rejection" description={report.decisionNote ?? 'No reason was recorded.'} style={{ marginTop: 8 }} />
        )}
        {report.status === 'approved' && report.decisionNote && (
          <Alert type="success" showIcon title="The moderator's note" description={report.decisionNote} style={{ marginTop: 8 }} />
        )}
        {report.status === 'submitted' && (
          <Flex gap={12} align="center" wrap style={{ marginTop: 8 }}>
            <span>It is waiting on the review desk. You can still take it back.</span>
            <Popconfirm title="Withdraw this report?" okText="Withdraw" cancelText="Keep it" onConfirm={() => withdraw.mutate(report.id)}>
              <Button danger loading={withdraw.isPending}>
                Withdraw
              </Button>
            </Popconfirm>
          </Flex>
        )}
      </Card>
      <Card title="What it says">
        <ReportPayload report={report} distanceUnit={distanceUnit} locale={locale} />
      </Card>
      {report.attachments.length > 0 && <Card title="Evidence">{attachments}</Card>}
    </Flex>
  );
}
