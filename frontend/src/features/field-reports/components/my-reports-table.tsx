import { FIELD_REPORT_KINDS, FIELD_REPORT_STATUSES, type FieldReportSummaryDto } from '@causeway/shared';
import { Alert, App, Button, Popconfirm, Table, Typography, type TableColumnsType } from 'antd';
import { Link } from 'react-router-dom';
import { useTableParams } from '@/hooks/use-table-params';
import { KIND_LABELS, STATUS_LABELS } from '@/utils/field-report-labels';
import { formatDateTime } from '@/utils/format';
import { useMyReports } from '../api/get-my-reports';
import { useReport } from '../api/get-report';
import { useWithdrawReport } from '../api/withdraw-report';
import { MY_REPORTS_TABLE, type MyReportsParams } from '../utils/list-params';
import { ReportStatusTag } from './report-status-tag';

const visuallyHidden = { position: 'absolute', width: 1, height: 1, overflow: 'hidden', clip: 'rect(0 0 0 0)', whiteSpace: 'nowrap' } as const;

/** The moderator's note or reason, read with the report (the list carries only the summary). */
function DecisionNote({ id }: { id: string }) {
  const report = useReport(id);
  if (report.isLoading) return <Typography.Text type="secondary">…</Typography.Text>;
  const note = report.data?.decisionNote;
  if (!note) return <Typography.Text type="secondary">No note</Typography.Text>;
  return (
    <Typography.Paragraph style={{ marginBottom: 0, maxWidth: 300 }} ellipsis={{ rows: 3, expandable: true, symbol: 'more' }}>
      {report.data?.decidedBy ? <Typography.Text strong>{report.data.decidedBy.displayName}: </Typography.Text> : null}
      {note}
    </Typography.Paragraph>
  );
}

type MyReportsTableProps = {
  params: MyReportsParams;
  onParamsChange: (params: MyReportsParams) => void;
  /** Where a report opens, e.g. `/reports/:id`. */
  reportPath: (id: string) => string;
  locale: string;
};

export function MyReportsTable({ params, onParamsChange, reportPath, locale }: MyReportsTableProps) {
  const { message } = App.useApp();
  const reports = useMyReports(params);
  const table = useTableParams(params, onParamsChange, {
    ...MY_REPORTS_TABLE,
    filtersOf: (filters) => ({
      kind: FIELD_REPORT_KINDS.find((k) => k === filters.kind?.[0]),
      status: FIELD_REPORT_STATUSES.find((s) => s === filters.status?.[0]),
    }),
  });
  const withdraw = useWithdrawReport({
    mutationConfig: { onSuccess: () => void message.success('Report withdrawn'), onError: (e) => void message.error(e.message) },
  });

  const columns: TableColumnsType<FieldReportSummaryDto> = [
    {
      title: 'Report',
      key: 'title',
      render: (_: unknown, r) => (
        <Link to={reportPath(r.id)} style={{ display: 'inline-block', maxWidth: 360 }}>
          {r.title}
          {r.attachmentCount > 0 && <Typography.Text type="secondary">{` · ${r.attachmentCount} ${r.attachmentCount === 1 ? 'file' : 'files'}`}</Typography.Text>}
        </Link>
      ),
    },
    {
      title: 'Kind',
      key: 'kind',
      filters: FIELD_REPORT_KINDS.map((k) => ({ text: KIND_LABELS[k], value: k })),
      filterMultiple: false,
      filteredValue: params.kind ? [params.kind] : null,
      render: (_: unknown, r) => KIND_LABELS[r.kind],
    },
    {
      title: 'Status',
      key: 'status',
      filters: FIELD_REPORT_STATUSES.map((s) => ({ text: STATUS_LABELS[s], value: s })),
      filterMultiple: false,
      filteredValue: params.status ? [params.status] : null,
      render: (_: unknown, r) => <ReportStatusTag status={r.status} />,
    },
    {
      title: "Moderator's note",
      key: 'decision',
      render: (_: unknown, r) => (r.status === 'approved' || r.status === 'rejected' ? <DecisionNote id={r.id} /> : null),
    },
    { title: 'Last change', key: 'updatedAt', render: (_: unknown, r) => formatDateTime(r.decidedAt ?? r.updatedAt, locale) },
    {
      title: <span style={visuallyHidden}>Actions</span>,
      key: 'actions',
      render: (_: unknown, r) =>
        r.status === 'draft' || r.status === 'submitted' ? (
          <Popconfirm title="Withdraw this report?" okText="Withdraw" cancelText="Keep it" onConfirm={() => withdraw.mutate(r.id)}>
            <Button type="link" danger loading={withdraw.isPending && withdraw.variables === r.id} aria-label={`Withdraw ${r.title}`}>
              Withdraw
            </Button>
          </Popconfirm>
        ) : null,
    },
  ];

  return (
    <>
      {reports.isError && <Alert type="error" showIcon title={reports.error.message} style={{ marginBottom: 16 }} />}
      <Table<FieldReportSummaryDto>
        rowKey="id"
        columns={columns}
        dataSource={reports.data?.items ?? []}
        loading={reports.isFetching}
        onChange={table.onChange}
        scroll={{ x: 'max-content' }}
        locale={{ emptyText: params.kind || params.status ? 'No reports match these filters' : 'You have not filed a field report yet' }}
        pagination={table.pagination(reports.data?.total ?? 0, (total) => `${total} ${total === 1 ? 'report' : 'reports'}`)}
      />
    </>
  );
}
