import { PlusOutlined } from '@ant-design/icons';
import type { PartDto } from '@causeway/shared';
import { Alert, Button, Flex, Input, Table, Typography, type TableColumnsType } from 'antd';
import { useState } from 'react';
import { systemLabel } from '@/utils/part-systems';
import { useParts } from '../api/get-parts';
import { PartFormModal } from './part-form-modal';

type PartsTableProps = { q: string; page: number; onQueryChange: (q: string) => void; onPageChange: (page: number) => void };

export function PartsTable({ q, page, onQueryChange, onPageChange }: PartsTableProps) {
  const parts = useParts();
  const [editing, setEditing] = useState<PartDto | null>(null);
  const [open, setOpen] = useState(false);
  const needle = q.toLowerCase();
  const rows = (parts.data ?? []).filter((p) => !needle || p.name.toLowerCase().includes(needle) || p.key.includes(needle)).sort((a, b) => a.name.localeCompare(b.name));
  const columns: TableColumnsType<PartDto> = [
    { title: 'Name', key: 'name', render: (_: unknown, p) => p.name },
    { title: 'Key', key: 'key', render: (_: unknown, p) => <Typography.Text code>{p.key}</Typography.Text> },
    { title: 'System', key: 'system', render: (_: unknown, p) => systemLabel(p.system) },
    {
      title: 'Actions',
      key: 'actions',
      render: (_: unknown, p) => (
        <Button type="link" onClick={() => { setEditing(p); setOpen(true); }} aria-label={`Edit ${p.name}`}>
          Edit
        </Button>
      ),
    },
  ];
  return (
    <>
      <Flex gap={16} wrap align="flex-end" justify="space-between" style={{ marginBottom: 16 }}>
        <Input.Search key={q} defaultValue={q} placeholder="Find a part by name or key" aria-label="Find a part by name or key" allowClear enterButton="Find" onSearch={(v) => onQueryChange(v.trim())} style={{ width: 360 }} />
        <Button type="primary" icon={<PlusOutlined aria-hidden />} onClick={() => { setEditing(null); setOpen(true); }}>
          Add part
        </Button>
      </Flex>
      {parts.isError && <Alert type="error" showIcon title={parts.error.message} style={{ marginBottom: 16 }} />}
      <Table<PartDto>
        rowKey="key"
        columns={columns}
        dataSource={rows}
        loading={parts.isFetching}
        pagination={{ current: page, pageSize: 25, showSizeChanger: false, onChange: onPageChange, showTotal: (total) => `${total} ${total === 1 ? 'part' : 'parts'}` }}
      />
      <PartFormModal key={editing?.key ?? 'new'} part={editing} open={open} onClose={() => setOpen(false)} />
    </>
  );
}
