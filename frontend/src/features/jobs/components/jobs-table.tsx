import { formatMoney, type JobSummaryDto } from '@causeway/shared';
import { Alert, Space, Table, Tag, Typography, type TableColumnsType } from 'antd';
import { Link } from 'react-router-dom';
import { palette } from '@/config/theme';
import { useTableParams } from '@/hooks/use-table-params';
import { formatDate } from '@/utils/format';
import { useJobs } from '../api/get-jobs';
import { CODE_STATUS_LABELS, jobStatusLabel, vehicleLabel } from '../utils/labels';
import { JOB_TABLE, type JobListParams } from '../utils/list-params';

type JobsTableProps = {
  params: JobListParams;
  onParamsChange: (params: JobListParams) => void;
  locale: string;
  jobHref: (id: string) => string;
  /** Hide the vehicle column, e.g. on a vehicle's own page. */
  hideVehicle?: boolean;
};

export function JobStatusTag({ job }: { job: Pick<JobSummaryDto, 'status' | 'resolution'> }) {
  const color = job.status === 'open' ? palette.teal600 : job.resolution === 'resolved' ? palette.green : palette.grey700;
  return <Tag color={color}>{jobStatusLabel(job.status, job.resolution)}</Tag>;
}

/** The shop's jobs, filtered, sorted and paged on the server. */
export function JobsTable({ params, onParamsChange, locale, jobHref, hideVehicle = false }: JobsTableProps) {
  const jobs = useJobs(params);
  const { sortable, onChange, pagination } = useTableParams(params, onParamsChange, JOB_TABLE);

  const columns: TableColumnsType<JobSummaryDto> = [
    { title: 'Opened', dataIndex: 'openedAt', ...sortable('openedAt'), render: (iso: string, job) => <Link to={jobHref(job.id)}>{formatDate(iso, locale)}</Link> },
    ...(hideVehicle
      ? []
      : [
          {
            title: 'Vehicle',
            key: 'vehicle',
            render: (_: unknown, job: JobSummaryDto) => (
              <Link to={jobHref(job.id)}>
                {vehicleLabel(job.vehicle)}
                {job.vehicle.plate && (
                  <Typography.Text type="secondary" style={{ display: 'block', fontSize: 14 }}>
                    {job.vehicle.plate}
                  </Typography.Text>
                )}
              </Link>
            ),
          },
        ]),
    {
      title: 'Codes',
      key: 'codes',
      render: (_: unknown, job) => (
        <Space size={4} wrap>
          {job.codes.map((c) => (
            <Tag key={c.code}>
              <span style={{ fontFamily: 'ui-monospace, SFMono-Regular, Menlo, monospace' }}>{c.code}</span> · {CODE_STATUS_LABELS[c.status].toLowerCase()}
            </Tag>
          ))}
        </Space>
      ),
    },
    { title: 'Status', ...sortable('status'), render: (_: unknown, job) => <JobStatusTag job={job} /> },
    {
      title: 'Complaint',
      dataIndex: 'complaint',
      key: 'complaint',
      render: (text: string) => (
        <span title={text} style={{ display: '-webkit-box', WebkitLineClamp: 2, WebkitBoxOrient: 'vertical', overflow: 'hidden', maxWidth: 300, minWidth: 200 }}>
          {text}
        </span>
      ),
    },
    { title: 'Technician', key: 'technician', render: (_: unknown, job) => job.technician?.displayName ?? '—' },
    { title: 'Steps', dataIndex: 'stepCount', key: 'stepCount', align: 'right' },
    {
      title: 'Spent so far (before tax)',
      key: 'cost',
      align: 'right',
      render: (_: unknown, job) => (
        <>
          {formatMoney(job.actualCostMinor, job.currency, locale)}
          {job.expectedCostAtOpenMinor !== null && (
            <Typography.Text type="secondary" style={{ display: 'block', fontSize: 14 }}>
              expected {formatMoney(job.expectedCostAtOpenMinor, job.currency, locale)}
            </Typography.Text>
          )}
        </>
      ),
    },
    { title: 'Closed', dataIndex: 'closedAt', ...sortable('closedAt'), render: (iso: string | null) => (iso ? formatDate(iso, locale) : '—') },
  ];

  return (
    <>
      {jobs.isError && <Alert type="error" showIcon title={jobs.error.message} style={{ marginBottom: 16 }} />}
      <Table<JobSummaryDto>
        rowKey="id"
        columns={columns}
        dataSource={jobs.data?.items ?? []}
        loading={jobs.isFetching}
        onChange={onChange}
        scroll={{ x: 'max-content' }}
        locale={{ emptyText: 'No jobs match these filters' }}
        pagination={pagination(jobs.data?.total ?? 0, (total) => `${total} ${total === 1 ? 'job' : 'jobs'}`)}
      />
    </>
  );
}
