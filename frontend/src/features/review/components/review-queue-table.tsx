import { FIELD_REPORT_KINDS, parseDtc, type FieldReportKind, type FieldReportSummaryDto } from '@causeway/shared';
import { Alert, Flex, Input, Select, Table, Tag, Typography, type TableColumnsType } from 'antd';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { useTableParams } from '@/hooks/use-table-params';
import { KIND_LABELS, STATUS_COLOURS, STATUS_LABELS } from '@/utils/field-report-labels';
import { formatDateTime } from '@/utils/format';
import { useReviewQueue } from '../api/get-review-queue';
import { QUEUE_STATUSES, QUEUE_TABLE, type QueueParams, type QueueStatus } from '../utils/queue-params';

type ReviewQueueTableProps = {
  params: QueueParams;
  onParamsChange: (params: QueueParams) => void;
  reportPath: (id: string) => string;
  locale: string;
};

export function ReviewQueueTable({ params, onParamsChange, reportPath, locale }: ReviewQueueTableProps) {
  const queue = useReviewQueue(params);
  const table = useTableParams(params, onParamsChange, QUEUE_TABLE);
  const [codeError, setCodeError] = useState<string | null>(null);
  const waiting = params.status === 'submitted';

  const columns: TableColumnsType<FieldReportSummaryDto> = [
    {
      title: 'Report',
      key: 'title',
      render: (_: unknown, r) => (
        <Flex vertical gap={2} style={{ maxWidth: 420 }}>
          <Link to={reportPath(r.id)}>{r.title}</Link>
          <span>
            {r.proposesNewCode && <Tag>New code for the catalogue</Tag>}
            {r.attachmentCount > 0 && <Typography.Text type="secondary">{`${r.attachmentCount} ${r.attachmentCount === 1 ? 'file' : 'files'}`}</Typography.Text>}
          </span>
        </Flex>
      ),
    },
    { title: 'Kind', key: 'kind', render: (_: unknown, r) => KIND_LABELS[r.kind] },
    { title: 'Code', key: 'code', render: (_: unknown, r) => <Typography.Text code>{r.code}</Typography.Text> },
    { title: 'Filed by', key: 'author', render: (_: unknown, r) => r.author.displayName },
    {
      title: waiting ? 'Submitted' : 'Decided',
      key: 'when',
      render: (_: unknown, r) => {
        const at = waiting ? r.submittedAt : (r.decidedAt ?? r.updatedAt);
        return at ? formatDateTime(at, locale) : '';
      },
    },
    { title: 'Status', key: 'status', render: (_: unknown, r) => <Tag color={STATUS_COLOURS[r.status]}>{STATUS_LABELS[r.status]}</Tag> },
  ];

  return (
    <>
      <Flex gap={16} wrap align="flex-start" style={{ marginBottom: 16 }} role="search" aria-label="Filter the queue">
        <label>
          <Typography.Text strong style={{ display: 'block' }}>
            Show
          </Typography.Text>
          <Select<QueueStatus>
            aria-label="Status"
            value={params.status}
            onChange={(status) => table.refine({ status })}
            options={QUEUE_STATUSES.map((s) => ({ value: s, label: STATUS_LABELS[s] }))}
            style={{ minWidth: 220 }}
          />
        </label>
        <label>
          <Typography.Text strong style={{ display: 'block' }}>
            Kind
          </Typography.Text>
          <Select<FieldReportKind | 'all'>
            aria-label="Kind"
            value={params.kind ?? 'all'}
            onChange={(kind) => table.refine({ kind: kind === 'all' ? undefined : kind })}
            options={[{ value: 'all', label: 'Every kind' }, ...FIELD_REPORT_KINDS.map((k) => ({ value: k, label: KIND_LABELS[k] }))]}
            style={{ minWidth: 220 }}
          />
        </label>
        <div>
          <Typography.Text strong style={{ display: 'block' }}>
            <label htmlFor="review-code-filter">Fault code</label>
          </Typography.Text>
          <Input.Search
            id="review-code-filter"
            key={params.code}
            defaultValue={params.code}
            placeholder="e.g. P0303"
            allowClear
            enterButton="Filter"
            status={codeError ? 'error' : undefined}
            aria-describedby={codeError ? 'review-code-error' : undefined}
            onSearch={(value) => {
              const text = value.trim();
              if (!text) {
                setCodeError(null);
                table.refine({ code: '' });
                return;
              }
              const parsed = parseDtc(text);
              if (!parsed.ok) {
                setCodeError(parsed.error.message);
                return;
              }
              setCodeError(null);
              table.refine({ code: parsed.value.code });
            }}
            style={{ width: 280 }}
          />
          {codeError && (
            <Typography.Text type="danger" id="review-code-error" style={{ display: 'block' }}>
              {codeError}
            </Typography.Text>
          )}
        </div>
      </Flex>
      {queue.isError && <Alert type="error" showIcon title={queue.error.message} style={{ marginBottom: 16 }} />}
      <Table<FieldReportSummaryDto>
        rowKey="id"
        columns={columns}
        dataSource={queue.data?.items ?? []}
        loading={queue.isFetching}
        onChange={table.onChange}
        scroll={{ x: 'max-content' }}
        locale={{ emptyText: waiting ? 'Nothing is waiting for review' : 'No reports match these filters' }}
        pagination={table.pagination(queue.data?.total ?? 0, (total) => `${total} ${total === 1 ? 'report' : 'reports'}`)}
      />
    </>
  );
}
