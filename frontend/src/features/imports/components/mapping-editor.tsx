import { IMPORT_FIELDS, IMPORT_REQUIRED_FIELDS, type DistanceUnit, type ImportMapping } from '@causeway/shared';
import { Alert, App, Button, Col, Flex, Input, Popconfirm, Row, Select, Table, Typography, type TableColumnsType } from 'antd';
import { useState } from 'react';
import { useDeleteMapping } from '../api/delete-mapping';
import { useMappings } from '../api/get-mappings';
import { useSaveMapping } from '../api/save-mapping';
import { assign, choiceOf, FIELD_LABELS, FREEZE_FRAME, IGNORE, missingRequired, overlay, toInput, type ColumnChoice } from '../utils/mapping';

type MappingEditorProps = {
  headers: string[];
  mapping: ImportMapping;
  onChange: (mapping: ImportMapping) => void;
  distanceUnit: DistanceUnit;
  locale: string;
};

const CHOICES: { value: ColumnChoice; label: string }[] = [
  { value: IGNORE, label: 'Ignore this column' },
  ...IMPORT_FIELDS.map((f) => ({ value: f, label: `${FIELD_LABELS[f]}${IMPORT_REQUIRED_FIELDS.includes(f) ? ' (required)' : ''}` })),
  { value: FREEZE_FRAME, label: 'Freeze-frame value' },
];

interface HeaderRow {
  header: string;
  index: number;
}

/** How each column of the file is read; can be saved under a name for the shop and picked next time. */
export function MappingEditor({ headers, mapping, onChange, distanceUnit, locale }: MappingEditorProps) {
  const { message } = App.useApp();
  const mappings = useMappings();
  const [name, setName] = useState('');
  const [picked, setPicked] = useState<string | undefined>(undefined);
  const save = useSaveMapping({
    mutationConfig: {
      onSuccess: (saved) => {
        setPicked(saved.id);
        void message.success(`Column mapping saved as "${saved.name}"`);
      },
      onError: (error) => void message.error(error.message),
    },
  });
  const remove = useDeleteMapping({
    mutationConfig: {
      onSuccess: () => {
        setPicked(undefined);
        void message.success('Saved mapping deleted');
      },
      onError: (error) => void message.error(error.message),
    },
  });
  const missing = missingRequired(mapping);
  const usesLocaleOrder = !locale.startsWith('en-US');

  const columns: TableColumnsType<HeaderRow> = [
    { title: 'Column in the file', key: 'header', render: (_: unknown, r) => <Typography.Text strong>{r.header || `(column ${r.index + 1} has no header)`}</Typography.Text> },
    {
      title: 'Read as',
      key: 'choice',
      render: (_: unknown, r) => (
        <Select<ColumnChoice>
          aria-label={`Read the column ${r.header} as`}
          value={choiceOf(mapping, r.header)}
          onChange={(choice) => onChange(assign(mapping, r.header, choice))}
          options={CHOICES}
          showSearch={{ optionFilterProp: 'label' }}
          style={{ minWidth: 260 }}
          disabled={!r.header}
        />
      ),
    },
  ];

  return (
    <>
      {missing.length > 0 && (
        <Alert
          type="error"
          showIcon
          title={`Choose the column${missing.length > 1 ? 's' : ''} that hold${missing.length > 1 ? '' : 's'}: ${missing.map((f) => FIELD_LABELS[f]).join(', ')}`}
          description="The VIN, the fault code and the scan date are needed for every row."
          style={{ marginBottom: 16 }}
        />
      )}
      <Row gutter={[24, 16]}>
        <Col xs={24} xl={14}>
          <Table<HeaderRow> rowKey="index" size="small" columns={columns} dataSource={headers.map((header, index) => ({ header, index }))} pagination={false} />
        </Col>
        <Col xs={24} xl={10}>
          <Flex vertical gap={16}>
            <div>
              <Typography.Text strong style={{ display: 'block' }} id="odometer-unit-label">
                Odometer unit
              </Typography.Text>
              <Select<'km' | 'mi' | 'shop'>
                aria-labelledby="odometer-unit-label"
                value={mapping.odometerUnit ?? 'shop'}
                onChange={(v) => onChange({ ...mapping, odometerUnit: v === 'shop' ? null : v })}
                options={[
                  { value: 'shop', label: `As the shop works (${distanceUnit})` },
                  { value: 'km', label: 'Kilometres' },
                  { value: 'mi', label: 'Miles' },
                ]}
                style={{ width: '100%' }}
              />
            </div>
            <div>
              <Typography.Text strong style={{ display: 'block' }} id="date-order-label">
                Dates written with slashes (03/04/2025)
              </Typography.Text>
              <Select<'DMY' | 'MDY' | 'shop'>
                aria-labelledby="date-order-label"
                value={mapping.dateOrder ?? 'shop'}
                onChange={(v) => onChange({ ...mapping, dateOrder: v === 'shop' ? null : v })}
                options={[
                  { value: 'shop', label: `As the shop's locale writes them (${usesLocaleOrder ? 'day first' : 'month first'})` },
                  { value: 'DMY', label: 'Day first (03/04 is 3 April)' },
                  { value: 'MDY', label: 'Month first (03/04 is March 4)' },
                ]}
                style={{ width: '100%' }}
              />
            </div>
            <div>
              <Typography.Text strong style={{ display: 'block' }} id="saved-mapping-label">
                Use a saved mapping
              </Typography.Text>
              <Flex gap={8}>
                <Select
                  aria-labelledby="saved-mapping-label"
                  placeholder={mappings.data?.length ? 'Choose a saved mapping' : 'None saved yet'}
                  value={picked}
                  loading={mappings.isLoading}
                  disabled={!mappings.data?.length}
                  onChange={(id: string) => {
                    const saved = mappings.data?.find((m) => m.id === id);
                    if (!saved) return;
                    setPicked(id);
                    setName(saved.name);
                    onChange(overlay(mapping, saved.mapping));
                  }}
                  options={(mappings.data ?? []).map((m) => ({ value: m.id, label: m.name }))}
                  style={{ flex: 1 }}
                />
                {picked && (
                  <Popconfirm title="Delete this saved mapping?" okText="Delete" okButtonProps={{ danger: true }} cancelText="Keep it" onConfirm={() => remove.mutate(picked)}>
                    <Button danger loading={remove.isPending}>
                      Delete
                    </Button>
                  </Popconfirm>
                )}
              </Flex>
            </div>
            <form
              onSubmit={(e) => {
                e.preventDefault();
                const trimmed = name.trim();
                if (trimmed) save.mutate({ name: trimmed, mapping: toInput(mapping) });
              }}
            >
              <Typography.Text strong style={{ display: 'block' }}>
                <label htmlFor="mapping-name">Save this mapping for the shop as</label>
              </Typography.Text>
              <Flex gap={8}>
                <Input id="mapping-name" value={name} maxLength={80} onChange={(e) => setName(e.target.value)} placeholder="e.g. Bay 2 scan tool" />
                <Button htmlType="submit" loading={save.isPending} disabled={!name.trim()}>
                  Save mapping
                </Button>
              </Flex>
            </form>
          </Flex>
        </Col>
      </Row>
    </>
  );
}
