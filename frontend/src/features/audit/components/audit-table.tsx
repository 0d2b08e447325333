import type { AuditEntryDto } from '@causeway/shared';
import { Alert, Button, Col, Form, Input, Row, Select, Table, Tag, Typography, type TableColumnsType } from 'antd';
import { useEffect } from 'react';
import { useTableParams } from '@/hooks/use-table-params';
import { formatDateTime } from '@/utils/format';
import { useAuditEntries } from '../api/get-audit-entries';
import { ACTION_OPTIONS, actionLabel, ENTITY_TYPE_LABELS } from '../utils/labels';
import { AUDIT_TABLE, type AuditListParams } from '../utils/list-params';
import { BeforeAfter } from './before-after';

type AuditTableProps = {
  params: AuditListParams;
  onParamsChange: (params: AuditListParams) => void;
  locale: string;
};

interface FilterValues {
  actor?: string;
  /** undefined (not '') so the selects show their placeholder. */
  action?: string;
  entityType?: string;
  from?: string;
  to?: string;
}

function filtersOf(params: AuditListParams): FilterValues {
  return { actor: params.actor, action: params.action || undefined, entityType: params.entityType || undefined, from: params.from, to: params.to };
}

export function AuditTable({ params, onParamsChange, locale }: AuditTableProps) {
  const entries = useAuditEntries(params);
  const table = useTableParams(params, onParamsChange, AUDIT_TABLE);
  const [form] = Form.useForm<FilterValues>();

  // The address bar is the truth: going back or forward puts its filters in the form.
  const applied = JSON.stringify(filtersOf(params));
  useEffect(() => {
    form.setFieldsValue({ actor: '', action: undefined, entityType: undefined, from: '', to: '', ...(JSON.parse(applied) as FilterValues) });
  }, [form, applied]);

  const columns: TableColumnsType<AuditEntryDto> = [
    { title: 'When', key: 'at', render: (_: unknown, e) => formatDateTime(e.at, locale) },
    { title: 'Who', key: 'actor', render: (_: unknown, e) => e.actorEmail },
    {
      title: 'Action',
      key: 'action',
      render: (_: unknown, e) => (
        <>
          {actionLabel(e.action)} <Typography.Text type="secondary" code>{e.action}</Typography.Text>
        </>
      ),
    },
    {
      title: 'What',
      key: 'entity',
      render: (_: unknown, e) => (
        <div style={{ maxWidth: 260 }}>
          <Tag>{ENTITY_TYPE_LABELS[e.entityType] ?? e.entityType}</Tag>
          <Typography.Text type="secondary" style={{ display: 'block', wordBreak: 'break-all', fontSize: 14 }}>
            {e.entityId}
          </Typography.Text>
        </div>
      ),
    },
    {
      title: 'Note',
      key: 'note',
      render: (_: unknown, e) => (e.note ? <Typography.Paragraph ellipsis={{ rows: 2 }} style={{ marginBottom: 0, maxWidth: 320 }}>{e.note}</Typography.Paragraph> : null),
    },
  ];

  const filtered = !!(params.actor || params.action || params.entityType || params.from || params.to);

  return (
    <>
      <Form<FilterValues>
        form={form}
        layout="vertical"
        initialValues={filtersOf(params)}
        onFinish={(values) =>
          table.refine({
            actor: values.actor?.trim() ?? '',
            action: values.action ?? '',
            entityType: values.entityType ?? '',
            from: values.from ?? '',
            to: values.to ?? '',
          })
        }
        role="search"
        aria-label="Filter the audit log"
        style={{ marginBottom: 16 }}
      >
        <Row gutter={16} align="bottom">
          <Col xs={24} md={12} xl={5}>
            <Form.Item name="actor" label="Who (e-mail or user id)">
              <Input allowClear autoComplete="off" placeholder="e.g. moderator@" />
            </Form.Item>
          </Col>
          <Col xs={24} md={12} xl={5}>
            <Form.Item name="action" label="Action">
              <Select allowClear placeholder="Any action" options={ACTION_OPTIONS} showSearch={{ optionFilterProp: 'label' }} />
            </Form.Item>
          </Col>
          <Col xs={24} md={12} xl={4}>
            <Form.Item name="entityType" label="What was changed">
              <Select allowClear placeholder="Anything" options={Object.entries(ENTITY_TYPE_LABELS).map(([value, label]) => ({ value, label }))} />
            </Form.Item>
          </Col>
          <Col xs={12} md={6} xl={4}>
            <Form.Item
              name="from"
              label="From"
              rules={[
                ({ getFieldValue }) => ({
                  validator: async (_r, value: string | undefined) => {
                    const to = getFieldValue('to') as string | undefined;
                    if (value && to && value > to) throw new Error('From must not be after To');
                  },
                }),
              ]}
            >
              <Input type="date" />
            </Form.Item>
          </Col>
          <Col xs={12} md={6} xl={4}>
            <Form.Item name="to" label="To">
              <Input type="date" />
            </Form.Item>
          </Col>
          <Col xs={24} xl={2}>
            <Form.Item label=" " colon={false}>
              <Button type="primary" htmlType="submit" block>
                Filter
              </Button>
            </Form.Item>
          </Col>
        </Row>
        {filtered && (
          <Button
            type="link"
            onClick={() => table.refine({ actor: '', action: '', entityType: '', from: '', to: '' })}
            style={{ paddingInline: 0 }}
          >
            Clear the filters
          </Button>
        )}
      </Form>
      {entries.isError && <Alert type="error" showIcon title={entries.error.message} style={{ marginBottom: 16 }} />}
      <Table<AuditEntryDto>
        rowKey="id"
        columns={columns}
        dataSource={entries.data?.items ?? []}
        loading={entries.isFetching}
        onChange={table.onChange}
        expandable={{ expandedRowRender: (e) => <BeforeAfter entry={e} />, expandRowByClick: false }}
        locale={{ emptyText: filtered ? 'No entries match these filters' : 'Nothing has been recorded yet' }}
        pagination={table.pagination(entries.data?.total ?? 0, (total) => `${total} ${total === 1 ? 'entry' : 'entries'}`)}
      />
    </>
  );
}
