import { UndoOutlined } from '@ant-design/icons';
import { labourCostMinor, type FixPathDto } from '@causeway/shared';
import { Alert, Button, InputNumber, Table, Typography, type TableColumnsType } from 'antd';
import { useId } from 'react';
import { currencyFractionDigits, fromMinorUnits } from '@/utils/money';
import type { WhatIf } from '../hooks/use-what-if';
import { hours, money } from '../utils/format';

type WhatIfEditorProps = {
  dto: FixPathDto;
  whatIf: WhatIf;
};

type Row = FixPathDto['causes'][number];

function step(digits: number): string {
  return digits > 0 ? `0.${'0'.repeat(digits - 1)}1` : '1';
}

/**
 * Try other figures: the shop's labour rate, a part's price, the labour to replace it. The fix
 * path above is planned again in the browser at once; nothing is saved.
 */
export function WhatIfEditor({ dto, whatIf }: WhatIfEditorProps) {
  const id = useId();
  const { currency, locale } = dto.money;
  const digits = currencyFractionDigits(currency);

  const columns: TableColumnsType<Row> = [
    { title: 'Possible cause', dataIndex: 'label', key: 'label' },
    {
      title: `Part price (${currency})`,
      key: 'partCost',
      render: (_: unknown, c) => (
        <InputNumber<string>
          stringMode
          min="0"
          step={step(digits)}
          aria-label={`Part price of ${c.label} (${currency})`}
          placeholder={fromMinorUnits(c.partCost.minor, currency)}
          value={whatIf.fields.causes[c.key]?.partCost ?? fromMinorUnits(c.partCost.minor, currency)}
          status={whatIf.invalid.has(`${c.key}.partCost`) ? 'error' : undefined}
          onChange={(v) => whatIf.setCause(c.key, 'partCost', v ?? '')}
          style={{ width: 140 }}
        />
      ),
    },
    {
      title: 'Labour to replace (h)',
      key: 'replaceHours',
      render: (_: unknown, c) => (
        <InputNumber<string>
          stringMode
          min="0"
          max="1000"
          step="0.1"
          aria-label={`Labour hours to replace ${c.label}`}
          value={whatIf.fields.causes[c.key]?.replaceHours ?? String(c.replaceHours)}
          status={whatIf.invalid.has(`${c.key}.replaceHours`) ? 'error' : undefined}
          onChange={(v) => whatIf.setCause(c.key, 'replaceHours', v ?? '')}
          style={{ width: 120 }}
        />
      ),
    },
    {
      title: 'Replace cost now',
      key: 'replaceCost',
      align: 'right',
      render: (_: unknown, c) => {
        const planned = whatIf.input.causes.find((p) => p.key === c.key);
        return planned ? money(planned.replaceCost, dto.money) : money(c.replaceCostMinor, dto.money);
      },
    },
  ];

  return (
    <section aria-labelledby={`${id}-title`}>
      <Typography.Title level={3} id={`${id}-title`} style={{ fontSize: 18 }}>
        Try your own figures
      </Typography.Title>
      <Typography.Paragraph type="secondary">
        Change the labour rate, a part&apos;s price or the labour to replace it: the fix path is planned again at once, here in the
        browser. Nothing is saved. Checks, teardowns and verification are costed at the labour rate from their hours.
      </Typography.Paragraph>
      <div style={{ display: 'flex', flexWrap: 'wrap', gap: 16, alignItems: 'flex-end', marginBottom: 16 }}>
        <div style={{ display: 'flex', flexDirection: 'column', gap: 4 }}>
          <label htmlFor={`${id}-rate`} style={{ fontWeight: 600 }}>
            Labour rate per hour, before tax ({currency})
          </label>
          <InputNumber<string>
            id={`${id}-rate`}
            stringMode
            min="0"
            step={step(digits)}
            value={whatIf.fields.labourRate ?? fromMinorUnits(dto.money.labourRateMinor, currency)}
            status={whatIf.invalid.has('labourRate') ? 'error' : undefined}
            onChange={(v) => whatIf.setLabourRate(v ?? '')}
            style={{ width: 180 }}
          />
        </div>
        <Button icon={<UndoOutlined aria-hidden />} onClick={whatIf.reset} disabled={!whatIf.edited && whatIf.invalid.size === 0}>
          Reset to the shop&apos;s figures
        </Button>
        <Typography.Text type="secondary" aria-live="polite">
          {whatIf.edited ? `Planned with your figures; verification ${hours(dto.verification.hours, locale)} = ${money(labourCostMinor(dto.verification.hours, whatIf.labourRateMinor), dto.money)}.` : "Showing the shop's figures."}
        </Typography.Text>
      </div>
      {whatIf.invalid.size > 0 && (
        <Alert type="info" showIcon title="A field marked in red is not a number: its original figure is used until it is." style={{ marginBottom: 12 }} />
      )}
      {whatIf.error && <Alert type="error" showIcon title={whatIf.error} style={{ marginBottom: 12 }} />}
      <Table<Row> rowKey="key" size="small" columns={columns} dataSource={dto.causes} pagination={false} scroll={{ x: 'max-content' }} />
    </section>
  );
}

