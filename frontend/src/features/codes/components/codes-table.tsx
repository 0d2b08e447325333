import { DTC_CONTROL_LABELS, DTC_SYSTEM_NAMES, type CodeSummaryDto, type DtcControl, type DtcSystem } from '@causeway/shared';
import { Alert, Input, Select, Space, Table, Tag, type TableColumnsType } from 'antd';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useTableParams } from '@/hooks/use-table-params';
import { useSearchCodes } from '../api/search-codes';
import { CODE_CONTROLS, CODE_SYSTEMS, CODE_TABLE, type CodeListParams } from '../utils/list-params';

type CodesTableProps = {
  params: CodeListParams;
  onParamsChange: (params: CodeListParams) => void;
};

function systemName(system: string): string {
  return DTC_SYSTEM_NAMES[system as DtcSystem] ?? system;
}

function controlLabel(control: string): string {
  return DTC_CONTROL_LABELS[control as DtcControl] ?? control;
}

/** The catalogue page by page, searched, filtered and sorted by the server; every choice is in the address. */
export function CodesTable({ params, onParamsChange }: CodesTableProps) {
  const codes = useSearchCodes(params);
  const { sortable, onChange, refine, pagination } = useTableParams(params, onParamsChange, CODE_TABLE);

  const columns: TableColumnsType<CodeSummaryDto> = [
    {
      title: 'Code',
      dataIndex: 'code',
      ...sortable('code'),
      width: 110,
      render: (code: string, row) => (
        <Link to={paths.code(code) + (row.make ? `?make=${encodeURIComponent(row.make)}` : '')} style={{ fontWeight: 600 }}>
          {code}
        </Link>
      ),
    },
    {
      title: 'Title',
      dataIndex: 'title',
      ...sortable('title'),
      render: (title: string, row) => (
        <>
          {title} {row.make && <Tag>{row.make} only</Tag>}
        </>
      ),
    },
    { title: 'Subsystem', dataIndex: 'subsystem', ...sortable('subsystem') },
    { title: 'System', dataIndex: 'system', key: 'system', render: systemName },
    { title: 'Who controls it', dataIndex: 'control', key: 'control', render: controlLabel },
  ];

  return (
    <>
      <Space wrap size={12} style={{ marginBottom: 16 }}>
        <Input.Search
          key={params.q}
          defaultValue={params.q}
          placeholder="Code prefix or words"
          aria-label="Filter the catalogue by code prefix or words"
          allowClear
          enterButton="Filter"
          maxLength={100}
          onSearch={(q) => refine({ q: q.trim() })}
          style={{ width: 360 }}
        />
        <Select<DtcSystem | ''>
          aria-label="System"
          value={params.system ?? ''}
          onChange={(system) => refine({ system: system || undefined })}
          options={[{ value: '', label: 'Every system' }, ...CODE_SYSTEMS.map((s) => ({ value: s, label: `${DTC_SYSTEM_NAMES[s]} (${s})` }))]}
          style={{ width: 200 }}
        />
        <Select<DtcControl | ''>
          aria-label="Who controls it"
          value={params.control ?? ''}
          onChange={(control) => refine({ control: control || undefined })}
          options={[{ value: '', label: 'Any range' }, ...CODE_CONTROLS.map((c) => ({ value: c, label: DTC_CONTROL_LABELS[c] }))]}
          style={{ width: 260 }}
        />
      </Space>
      {codes.isError && <Alert type="error" showIcon title={codes.error.message} style={{ marginBottom: 16 }} />}
      <Table<CodeSummaryDto>
        rowKey={(row) => `${row.code}|${row.make ?? ''}`}
        columns={columns}
        dataSource={codes.data?.items ?? []}
        loading={codes.isFetching}
        onChange={onChange}
        scroll={{ x: 960 }}
        locale={{ emptyText: params.q || params.system || params.control ? 'No codes match these filters' : 'The catalogue is empty' }}
        pagination={pagination(codes.data?.total ?? 0, (total) => `${total} ${total === 1 ? 'code' : 'codes'}`)}
      />
    </>
  );
}
