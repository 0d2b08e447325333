import { PlusOutlined } from '@ant-design/icons';
import { formatMoney, formatPercent, parseDtc, type PossibleCauseRowDto } from '@causeway/shared';
import { Alert, App, Button, Flex, Input, List, Popconfirm, Table, Typography, type TableColumnsType } from 'antd';
import { useState } from 'react';
import { describeScope, scopeKeyOf } from '@/utils/vehicle-scope';
import { useDeleteCause } from '../api/delete-cause';
import { useCauses } from '../api/get-causes';
import { useParts } from '../api/get-parts';
import { useTeardowns } from '../api/get-teardowns';
import { CauseFormModal } from './cause-form-modal';
import { CodeFormModal } from './code-form-modal';

type CausesTableProps = {
  code: string;
  page: number;
  onCodeChange: (code: string) => void;
  onPageChange: (page: number) => void;
  locale: string;
  currency: string;
};

interface ScopeSum {
  key: string;
  code: string;
  scope: string;
  sum: number;
}

function scopeSums(rows: PossibleCauseRowDto[]): ScopeSum[] {
  const sums = new Map<string, ScopeSum>();
  for (const r of rows) {
    const key = `${r.code}|${scopeKeyOf(r)}`;
    const s = sums.get(key) ?? { key, code: r.code, scope: describeScope(r, { capitalised: true }), sum: 0 };
    s.sum += r.prior;
    sums.set(key, s);
  }
  return [...sums.values()];
}

export function CausesTable({ code, page, onCodeChange, onPageChange, locale, currency }: CausesTableProps) {
  const { message } = App.useApp();
  const causes = useCauses(code);
  const parts = useParts();
  const teardowns = useTeardowns();
  const [editing, setEditing] = useState<PossibleCauseRowDto | null>(null);
  const [open, setOpen] = useState(false);
  const [codeError, setCodeError] = useState<string | null>(null);
  const [editingCode, setEditingCode] = useState(false);
  const remove = useDeleteCause({ mutationConfig: { onSuccess: () => void message.success('Possible cause removed'), onError: (e) => void message.error(e.message) } });
  const teardownName = new Map((teardowns.data ?? []).map((t) => [t.key, t.name]));
  const rows = [...(causes.data ?? [])].sort((a, b) => a.code.localeCompare(b.code) || scopeKeyOf(a).localeCompare(scopeKeyOf(b)) || b.prior - a.prior);

  const columns: TableColumnsType<PossibleCauseRowDto> = [
    { title: 'Code', key: 'code', render: (_: unknown, c) => <Typography.Text code>{c.code}</Typography.Text> },
    { title: 'Part', key: 'part', render: (_: unknown, c) => c.partName },
    { title: 'Vehicles', key: 'scope', render: (_: unknown, c) => describeScope(c, { capitalised: true }) },
    { title: 'Prior', key: 'prior', align: 'right', render: (_: unknown, c) => new Intl.NumberFormat(locale, { style: 'percent', maximumFractionDigits: 1 }).format(c.prior) },
    { title: 'Part cost', key: 'cost', align: 'right', render: (_: unknown, c) => formatMoney(c.partCostMinor, c.currency, locale) },
    { title: 'Labour', key: 'hours', align: 'right', render: (_: unknown, c) => `${new Intl.NumberFormat(locale).format(c.replaceHours)} h` },
    {
      title: 'Teardown',
      key: 'teardown',
      render: (_: unknown, c) => {
        if (!c.teardownKey) return '';
        const name = teardownName.get(c.teardownKey) ?? c.teardownKey;
        return (
          <Typography.Paragraph ellipsis={{ rows: 2, tooltip: name }} style={{ marginBottom: 0, width: 220 }}>
            {name}
          </Typography.Paragraph>
        );
      },
    },
    {
      title: 'Check',
      key: 'check',
      render: (_: unknown, c) =>
        c.check ? (
          <Typography.Paragraph ellipsis={{ rows: 2, tooltip: c.check.description }} style={{ marginBottom: 0, width: 240 }}>
            {`${c.check.description} (${new Intl.NumberFormat(locale).format(c.check.hours)} h${c.check.mustPrecede ? ', before replacing' : ''})`}
          </Typography.Paragraph>
        ) : (
          ''
        ),
    },
    {
      title: 'Actions',
      key: 'actions',
      render: (_: unknown, c) => (
        <Flex gap={4}>
          <Button
            type="link"
            onClick={() => {
              setEditing(c);
              setOpen(true);
            }}
            aria-label={`Edit ${c.partName} for ${c.code}, ${describeScope(c, { capitalised: true })}`}
          >
            Edit
          </Button>
          <Popconfirm title={`Remove ${c.partName} from ${c.code}?`} description="Its outcomes stay recorded." okText="Remove" okButtonProps={{ danger: true }} cancelText="Keep it" onConfirm={() => remove.mutate(c.id)}>
            <Button type="link" danger aria-label={`Remove ${c.partName} for ${c.code}, ${describeScope(c, { capitalised: true })}`}>
              Remove
            </Button>
          </Popconfirm>
        </Flex>
      ),
    },
  ];

  return (
    <>
      <Flex gap={16} wrap align="flex-end" justify="space-between" style={{ marginBottom: 16 }}>
        <div>
          <Typography.Text strong style={{ display: 'block' }}>
            <label htmlFor="knowledge-code-filter">Fault code</label>
          </Typography.Text>
          <Input.Search
            id="knowledge-code-filter"
            key={code}
            defaultValue={code}
            placeholder="e.g. P0171 (empty: every code)"
            allowClear
            enterButton="Show"
            status={codeError ? 'error' : undefined}
            onSearch={(value) => {
              const text = value.trim();
              if (!text) {
                setCodeError(null);
                onCodeChange('');
                return;
              }
              const parsed = parseDtc(text);
              if (!parsed.ok) return setCodeError(parsed.error.message);
              setCodeError(null);
              onCodeChange(parsed.value.code);
            }}
            style={{ width: 340 }}
          />
          {codeError && (
            <Typography.Text type="danger" style={{ display: 'block' }} role="alert">
              {codeError}
            </Typography.Text>
          )}
        </div>
        <Flex gap={12} wrap>
          {code && <Button onClick={() => setEditingCode(true)}>Edit {code}&apos;s catalogue entry</Button>}
          <Button
            type="primary"
            icon={<PlusOutlined aria-hidden />}
            onClick={() => {
              setEditing(null);
              setOpen(true);
            }}
          >
            Add possible cause
          </Button>
        </Flex>
      </Flex>
      {causes.isError && <Alert type="error" showIcon title={causes.error.message} style={{ marginBottom: 16 }} />}
      {code && rows.length > 0 && (
        <List
          size="small"
          header={<Typography.Text strong>Priors of {code} by vehicle scope</Typography.Text>}
          dataSource={scopeSums(rows)}
          style={{ marginBottom: 16, maxWidth: 760 }}
          renderItem={(s) => (
            <List.Item>
              {s.scope}: the priors sum to {formatPercent(s.sum, locale)}; {formatPercent(Math.max(0, 1 - s.sum), locale)} is left for a cause not listed.
            </List.Item>
          )}
        />
      )}
      <Table<PossibleCauseRowDto>
        rowKey="id"
        columns={columns}
        dataSource={rows}
        loading={causes.isFetching}
        scroll={{ x: 'max-content' }}
        locale={{ emptyText: code ? `${code} has no possible causes yet` : 'No possible causes' }}
        pagination={{ current: page, pageSize: 25, showSizeChanger: false, onChange: onPageChange, showTotal: (total) => `${total} possible ${total === 1 ? 'cause' : 'causes'}` }}
      />
      {code && <CodeFormModal code={code} open={editingCode} onClose={() => setEditingCode(false)} />}
      <CauseFormModal
        key={editing?.id ?? `new-${code}`}
        cause={editing}
        code={code}
        currency={currency}
        parts={parts.data ?? []}
        teardowns={teardowns.data ?? []}
        open={open}
        onClose={() => setOpen(false)}
      />
    </>
  );
}
