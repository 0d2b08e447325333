import type { DistanceUnit } from '@causeway/shared';
import { Alert, Card, Descriptions, Flex, Result, Skeleton, Typography } from 'antd';
import { isApiError } from '@/lib/api-client';
import { formatDateTime } from '@/utils/format';
import { useImport } from '../api/get-import';
import { ImportProgress } from './import-progress';
import { ImportStatusTag } from './import-status-tag';
import { CorrectionsTable, DetectedPanel, PreviewTable, ProblemsTable, ReportSummary } from './report-panels';

type ImportDetailProps = { id: string; locale: string; distanceUnit: DistanceUnit };

/** One import of the history with its report; follows it while it runs. */
export function ImportDetail({ id, locale, distanceUnit }: ImportDetailProps) {
  const query = useImport(id, { intervalMs: 1000 });
  if (query.isLoading) return <Skeleton active paragraph={{ rows: 6 }} />;
  if (query.isError && !query.data) {
    if (isApiError(query.error) && query.error.status === 404) return <Result status="404" title="Import not found" />;
    return <Alert type="error" showIcon title={query.error.message} />;
  }
  const item = query.data;
  if (!item) return null;
  const report = item.report;
  return (
    <Flex vertical gap={24}>
      <Card>
        <Descriptions
          column={{ xs: 1, md: 2, xl: 4 }}
          items={[
            { key: 'file', label: 'File', children: item.fileName },
            { key: 'status', label: 'Status', children: <ImportStatusTag status={item.status} /> },
            { key: 'when', label: 'Started', children: formatDateTime(item.createdAt, locale) },
            { key: 'by', label: 'By', children: item.createdBy?.displayName ?? '' },
            { key: 'mode', label: 'Rows with errors', children: item.validOnly ? 'Left out (valid rows only)' : 'Refuse the whole file' },
            { key: 'finished', label: 'Finished', children: item.finishedAt ? formatDateTime(item.finishedAt, locale) : 'Not yet' },
          ]}
        />
        {item.status === 'running' && <ImportProgress uploaded={100} server={item.progress} afterUpload="Importing…" locale={locale} />}
        {item.message && <Alert type="error" showIcon title={item.message} style={{ marginTop: 8 }} />}
      </Card>
      {report && (
        <>
          <Card title="Outcome">
            <ReportSummary report={report} locale={locale} />
          </Card>
          <Card title={`Problems (${report.problemsTotal})`}>
            {report.problemsTotal === 0 ? <Typography.Text>No problems.</Typography.Text> : <ProblemsTable problems={report.problems} total={report.problemsTotal} locale={locale} />}
          </Card>
          {report.correctionsTotal > 0 && (
            <Card title={`Corrections (${report.correctionsTotal})`}>
              <CorrectionsTable corrections={report.corrections} total={report.correctionsTotal} locale={locale} />
            </Card>
          )}
          <Card title="Columns">
            <DetectedPanel detected={report.detected} />
          </Card>
          <Card title="First rows">
            <PreviewTable rows={report.preview} locale={locale} distanceUnit={distanceUnit} />
          </Card>
        </>
      )}
    </Flex>
  );
}
