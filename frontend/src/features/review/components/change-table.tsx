import { formatPercent, formatMoney, type FieldReportDto, type NewCausePayload, type ReviewFieldChangeDto } from '@causeway/shared';
import { Table, Typography, type TableColumnsType } from 'antd';
import { formatCount } from './likelihood-value';

type Value = ReviewFieldChangeDto['before'];

/** The currency of a part-cost change: the report's own (a new cause) or the one its label names. */
function currencyOf(change: ReviewFieldChangeDto, report: Pick<FieldReportDto, 'kind' | 'payload'>): string | null {
  if (report.kind === 'new-cause') return (report.payload as NewCausePayload).currency;
  return /\b([A-Z]{3})\b/.exec(change.label)?.[1] ?? null;
}

function label(change: ReviewFieldChangeDto, currency: string | null): string {
  if (change.field === 'partCostMinor') return currency ? `Part cost (${currency})` : 'Part cost';
  if (change.field === 'prior') return 'Prior weight';
  return change.label;
}

function show(value: Value, change: ReviewFieldChangeDto, currency: string | null, locale: string) {
  if (value === null) return <Typography.Text type="secondary">None</Typography.Text>;
  if (typeof value === 'boolean') return value ? 'Yes' : 'No';
  if (typeof value === 'number') {
    if (change.field === 'probability' || change.field === 'prior' || change.field === 'priorSum') return formatPercent(value, locale);
    if (change.field === 'partCostMinor' && currency) return formatMoney(Math.round(value), currency, locale);
    if (change.field === 'replaceHours') return `${formatCount(value, locale)} h`;
    return formatCount(value, locale);
  }
  return <span style={{ whiteSpace: 'pre-wrap' }}>{value}</span>;
}

type ChangeTableProps = {
  changes: ReviewFieldChangeDto[];
  report: Pick<FieldReportDto, 'kind' | 'payload'>;
  locale: string;
};

/** Each field approving would write: its value now beside its value afterwards. */
export function ChangeTable({ changes, report, locale }: ChangeTableProps) {
  const columns: TableColumnsType<ReviewFieldChangeDto> = [
    { title: 'What', key: 'label', width: '34%', render: (_: unknown, c) => label(c, currencyOf(c, report)) },
    { title: 'Now', key: 'before', width: '33%', render: (_: unknown, c) => show(c.before, c, currencyOf(c, report), locale) },
    {
      title: 'After approval',
      key: 'after',
      width: '33%',
      render: (_: unknown, c) => {
        const changed = c.before !== c.after;
        const value = show(c.after, c, currencyOf(c, report), locale);
        return changed ? <Typography.Text strong>{value}</Typography.Text> : value;
      },
    },
  ];
  return <Table<ReviewFieldChangeDto> rowKey="field" size="middle" columns={columns} dataSource={changes} pagination={false} />;
}
