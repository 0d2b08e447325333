import { PlusOutlined } from '@ant-design/icons';
import type { TeardownDto } from '@causeway/shared';
import { Alert, Button, Flex, Input, Table, Tag, Typography, type TableColumnsType } from 'antd';
import { useState } from 'react';
import { describeScope } from '@/utils/vehicle-scope';
import { useTeardowns } from '../api/get-teardowns';
import { TeardownFormModal } from './teardown-form-modal';

type TeardownsTableProps = { q: string; page: number; onQueryChange: (q: string) => void; onPageChange: (page: number) => void; locale: string };

export function TeardownsTable({ q, page, onQueryChange, onPageChange, locale }: TeardownsTableProps) {
  const teardowns = useTeardowns();
  const [editing, setEditing] = useState<TeardownDto | null>(null);
  const [open, setOpen] = useState(false);
  const needle = q.toLowerCase();
  const all = teardowns.data ?? [];
  const rows = all.filter((t) => !needle || t.name.toLowerCase().includes(needle) || t.key.includes(needle)).sort((a, b) => a.name.localeCompare(b.name));
  const knownCautions = [...new Set(all.flatMap((t) => t.cautions))].sort();
  const columns: TableColumnsType<TeardownDto> = [
    { title: 'Name', key: 'name', render: (_: unknown, t) => <div style={{ maxWidth: 380 }}>{t.name}</div> },
    { title: 'Key', key: 'key', render: (_: unknown, t) => <Typography.Text code>{t.key}</Typography.Text> },
    { title: 'Hours', key: 'hours', align: 'right', render: (_: unknown, t) => `${new Intl.NumberFormat(locale).format(t.hours)} h` },
    { title: 'Vehicles', key: 'scope', render: (_: unknown, t) => describeScope(t, { capitalised: true }) },
    { title: 'Safety cautions', key: 'cautions', render: (_: unknown, t) => t.cautions.map((c) => <Tag key={c}>{c}</Tag>) },
    {
      title: 'Actions',
      key: 'actions',
      render: (_: unknown, t) => (
        <Button type="link" onClick={() => { setEditing(t); setOpen(true); }} aria-label={`Edit ${t.name}`}>
          Edit
        </Button>
      ),
    },
  ];
  return (
    <>
      <Flex gap={16} wrap align="flex-end" justify="space-between" style={{ marginBottom: 16 }}>
        <Input.Search key={q} defaultValue={q} placeholder="Find a teardown by name or key" aria-label="Find a teardown by name or key" allowClear enterButton="Find" onSearch={(v) => onQueryChange(v.trim())} style={{ width: 360 }} />
        <Button type="primary" icon={<PlusOutlined aria-hidden />} onClick={() => { setEditing(null); setOpen(true); }}>
          Add teardown
        </Button>
      </Flex>
      {teardowns.isError && <Alert type="error" showIcon title={teardowns.error.message} style={{ marginBottom: 16 }} />}
      <Table<TeardownDto>
        rowKey="key"
        columns={columns}
        dataSource={rows}
        loading={teardowns.isFetching}
        scroll={{ x: 'max-content' }}
        pagination={{ current: page, pageSize: 25, showSizeChanger: false, onChange: onPageChange, showTotal: (total) => `${total} ${total === 1 ? 'teardown' : 'teardowns'}` }}
      />
      <TeardownFormModal key={editing?.key ?? 'new'} teardown={editing} open={open} onClose={() => setOpen(false)} knownCautions={knownCautions} />
    </>
  );
}
