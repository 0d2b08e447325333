import type { ReviewDiffDto, ReviewLikelihoodChangeDto } from '@causeway/shared';
import { Table, Tag, Typography, type TableColumnsType } from 'antd';
import { formatCount, LikelihoodValue } from './likelihood-value';

type Likelihoods = NonNullable<ReviewDiffDto['likelihoods']>;

type Row = ReviewLikelihoodChangeDto & { unlisted?: boolean };

function describeVehicle(v: Likelihoods['vehicle']): string {
  return [v.make, v.model, v.engine, v.year].filter((x) => x !== undefined && x !== null && x !== '').join(' ') || 'any vehicle';
}

function describeList(scope: Likelihoods['listScope']): string {
  if (!scope) return 'no list';
  const name = [scope.make, scope.model, scope.engine].filter(Boolean).join(' ');
  const years = scope.yearFrom || scope.yearTo ? `${scope.yearFrom ?? '…'}–${scope.yearTo ?? '…'}` : '';
  return [name || 'all vehicles', years].filter(Boolean).join(', ');
}

function shift(row: Row, locale: string): string {
  if (!row.before || !row.after) return '';
  const points = Math.round((row.after.probability - row.before.probability) * 100);
  if (points === 0) return 'no change';
  return `${points > 0 ? '+' : '−'}${new Intl.NumberFormat(locale).format(Math.abs(points))} ${Math.abs(points) === 1 ? 'point' : 'points'}`;
}

/** Every possible cause's likelihood now and after approval, for the vehicle the report names. */
export function LikelihoodTable({ likelihoods, locale }: { likelihoods: Likelihoods; locale: string }) {
  const rows: Row[] = [
    ...likelihoods.causes,
    { key: '__unlisted', partName: 'A cause not listed', before: likelihoods.unlisted.before, after: likelihoods.unlisted.after, subject: false, unlisted: true },
  ];
  const columns: TableColumnsType<Row> = [
    {
      title: 'Possible cause',
      key: 'part',
      render: (_: unknown, r) => (
        <>
          {r.subject ? <Typography.Text strong>{r.partName}</Typography.Text> : r.unlisted ? <Typography.Text italic>{r.partName}</Typography.Text> : r.partName}
          {r.subject && <Tag style={{ marginInlineStart: 8 }}>This report</Tag>}
        </>
      ),
    },
    { title: 'Now', key: 'before', render: (_: unknown, r) => <LikelihoodValue value={r.before} locale={locale} /> },
    { title: 'After approval', key: 'after', render: (_: unknown, r) => <LikelihoodValue value={r.after} locale={locale} /> },
    { title: 'Change', key: 'shift', render: (_: unknown, r) => shift(r, locale) },
  ];
  return (
    <>
      <Typography.Paragraph>
        For {describeVehicle(likelihoods.vehicle)} (possible-cause list for {describeList(likelihoods.listScope)}). Outcomes counted: {formatCount(likelihoods.evidenceBefore, locale)} now,{' '}
        {formatCount(likelihoods.evidenceAfter, locale)} after approval; prior strength {formatCount(likelihoods.priorStrength, locale)}.
        {likelihoods.capped && ' The contributor is at the influence cap for this code and vehicle, so this outcome counts at reduced weight.'}
      </Typography.Paragraph>
      <Table<Row>
        rowKey="key"
        size="middle"
        columns={columns}
        dataSource={rows}
        pagination={false}
        rowClassName={(r) => (r.subject ? 'review-subject-row' : '')}
        onRow={(r) => (r.subject ? { style: { background: '#eef6f5' } } : {})}
      />
    </>
  );
}
