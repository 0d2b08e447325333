import type { ImportSummaryDto } from '@causeway/shared';
import { Alert, Table, Typography, type TableColumnsType, type TableProps } from 'antd';
import { Link } from 'react-router-dom';
import { formatDateTime } from '@/utils/format';
import { useImports, type ImportListParams } from '../api/get-imports';
import { ImportStatusTag } from './import-status-tag';

type ImportHistoryTableProps = {
  params: ImportListParams;
  onParamsChange: (params: ImportListParams) => void;
  importPath: (id: string) => string;
  locale: string;
};

export function ImportHistoryTable({ params, onParamsChange, importPath, locale }: ImportHistoryTableProps) {
  const imports = useImports(params);
  const n = (v: number) => new Intl.NumberFormat(locale).format(v);
  const columns: TableColumnsType<ImportSummaryDto> = [
    { title: 'When', key: 'createdAt', render: (_: unknown, i) => <Link to={importPath(i.id)}>{formatDateTime(i.createdAt, locale)}</Link> },
    { title: 'File', key: 'fileName', render: (_: unknown, i) => i.fileName },
    { title: 'Status', key: 'status', render: (_: unknown, i) => <ImportStatusTag status={i.status} /> },
    {
      title: 'Rows',
      key: 'rows',
      render: (_: unknown, i) => (
        <>
          {n(i.rows)}
          {i.rejected > 0 && <Typography.Text type="secondary">{` (${n(i.rejected)} with errors${i.validOnly ? ', left out' : ''})`}</Typography.Text>}
        </>
      ),
    },
    { title: 'New vehicles', key: 'vehicles', align: 'right', render: (_: unknown, i) => n(i.createdVehicles) },
    { title: 'New jobs', key: 'jobs', align: 'right', render: (_: unknown, i) => n(i.createdJobs) },
    { title: 'New codes', key: 'codes', align: 'right', render: (_: unknown, i) => n(i.createdCodes) },
    { title: 'By', key: 'by', render: (_: unknown, i) => i.createdBy?.displayName ?? '' },
  ];
  const onChange: TableProps<ImportSummaryDto>['onChange'] = (pagination) => {
    const pageSize = pagination.pageSize ?? params.pageSize;
    onParamsChange({ pageSize, page: pageSize === params.pageSize ? (pagination.current ?? 1) : 1 });
  };
  return (
    <>
      {imports.isError && <Alert type="error" showIcon title={imports.error.message} style={{ marginBottom: 16 }} />}
      <Table<ImportSummaryDto>
        rowKey="id"
        columns={columns}
        dataSource={imports.data?.items ?? []}
        loading={imports.isFetching && !imports.data}
        onChange={onChange}
        scroll={{ x: 'max-content' }}
        locale={{ emptyText: 'No imports yet' }}
        pagination={{ current: params.page, pageSize: params.pageSize, total: imports.data?.total ?? 0, showSizeChanger: true, pageSizeOptions: ['10', '25', '50'] }}
      />
    </>
  );
}
