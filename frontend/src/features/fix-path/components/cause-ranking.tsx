import type { CauseRankingDto, RankedCauseDto } from '@causeway/shared';
import { Alert, Skeleton, Table, Tag, Typography, type TableColumnsType } from 'antd';
import { lazy, Suspense } from 'react';
import { systemLabel } from '@/utils/part-systems';
import { hours, money } from '../utils/format';
import { describeVehicle } from '../utils/vehicle';
import { Probability } from './probability';

const CauseChart = lazy(() => import('./cause-chart').then((m) => ({ default: m.CauseChart })));

type CauseRankingProps = { ranking: CauseRankingDto };

function scopeText(ranking: CauseRankingDto): string {
  const scope = ranking.listScope;
  if (!scope || !scope.make) return 'the list for every vehicle';
  const years = scope.yearFrom ? ` from ${scope.yearFrom}${scope.yearTo ? ` to ${scope.yearTo}` : ''}` : '';
  return `the list for ${[scope.make, scope.model, scope.engine].filter(Boolean).join(' ')}${years}`;
}

/** The possible causes of a code for the vehicle, most likely first: a chart with their intervals and a table. */
export function CauseRanking({ ranking }: CauseRankingProps) {
  const ctx = ranking.money;
  const { locale } = ctx;

  const columns: TableColumnsType<RankedCauseDto> = [
    {
      title: 'Possible cause',
      key: 'cause',
      width: 190,
      render: (_: unknown, c) => (
        <>
          <Typography.Text strong>{c.partName}</Typography.Text>
          <Typography.Text type="secondary" style={{ display: 'block', fontSize: 14 }}>
            {systemLabel(c.system)}
          </Typography.Text>
        </>
      ),
    },
    { title: 'Likelihood', key: 'probability', align: 'right', render: (_: unknown, c) => <Probability likelihood={c} locale={locale} /> },
    {
      title: <span title="Verified fixes recorded for this vehicle; '+ wider' are those of the wider vehicle groups">Outcomes</span>,
      key: 'evidence',
      align: 'right',
      render: (_: unknown, c) => (
        <span>
          {c.evidence}
          {c.inheritedEvidence > 0 && (
            <Typography.Text type="secondary" style={{ display: 'block', fontSize: 14 }}>
              +{c.inheritedEvidence} wider
            </Typography.Text>
          )}
        </span>
      ),
    },
    {
      title: 'Part',
      key: 'part',
      align: 'right',
      render: (_: unknown, c) => (
        <>
          {money(c.partCost.minor, ctx)}
          {c.partCost.indicative && (
            <Typography.Text type="secondary" style={{ display: 'block', fontSize: 14 }}>
              indicative, converted
            </Typography.Text>
          )}
        </>
      ),
    },
    {
      title: 'Labour',
      key: 'labour',
      align: 'right',
      render: (_: unknown, c) => (
        <>
          {money(c.labourCostMinor, ctx)}
          <Typography.Text type="secondary" style={{ display: 'block', fontSize: 14 }}>
            {hours(c.replaceHours, locale)}
          </Typography.Text>
        </>
      ),
    },
    {
      title: 'Teardown',
      key: 'teardown',
      width: 220,
      render: (_: unknown, c) =>
        c.teardown ? (
          <>
            {c.teardown.name}
            <Typography.Text type="secondary" style={{ display: 'block', fontSize: 14 }}>
              {hours(c.teardown.hours, locale)}, {money(c.teardown.openCostMinor, ctx)}
            </Typography.Text>
          </>
        ) : (
          <Typography.Text type="secondary">None</Typography.Text>
        ),
    },
    {
      title: 'Check',
      key: 'check',
      width: 260,
      render: (_: unknown, c) =>
        c.check ? (
          <>
            {c.check.description}
            <Typography.Text type="secondary" style={{ display: 'block', fontSize: 14 }}>
              {hours(c.check.hours, locale)}, {money(c.check.costMinor, ctx)}
            </Typography.Text>
            {c.check.mustPrecede && <Tag style={{ marginTop: 4 }}>Must be found before replacing</Tag>}
          </>
        ) : (
          <Typography.Text type="secondary">No check: replace to find out</Typography.Text>
        ),
    },
  ];

  return (
    <section aria-labelledby="possible-causes">
      <Typography.Title level={2} id="possible-causes" style={{ fontSize: 22 }}>
        Possible causes
      </Typography.Title>
      {ranking.causes.length === 0 ? (
        <Alert type="info" showIcon title={`No possible causes of ${ranking.code} are known for ${describeVehicle(ranking.vehicle)} yet.`} />
      ) : (
        <>
          <Typography.Paragraph type="secondary">
            For {describeVehicle(ranking.vehicle)}, from {scopeText(ranking)}: {ranking.totalEvidence}{' '}
            {ranking.totalEvidence === 1 ? 'recorded outcome' : 'recorded outcomes'} on top of the curated weights (worth{' '}
            {ranking.priorStrength} jobs). Costs are before tax, at {money(ctx.labourRateMinor, ctx)} an hour.
            {ranking.capped && ' Some accounts reported so often that their weight was capped.'}
            {ranking.indicative && ' Some part prices were converted from another currency and are indicative.'}
          </Typography.Paragraph>
          <Suspense fallback={<Skeleton active title={false} paragraph={{ rows: 4 }} />}>
            <CauseChart ranking={ranking} />
          </Suspense>
          <Table<RankedCauseDto>
            rowKey="key"
            size="middle"
            columns={columns}
            dataSource={ranking.causes}
            pagination={false}
            scroll={{ x: 1020 }}
            style={{ marginTop: 16 }}
            summary={() => (
              <Table.Summary.Row>
                <Table.Summary.Cell index={0}>
                  <Typography.Text type="secondary">A cause not listed</Typography.Text>
                </Table.Summary.Cell>
                <Table.Summary.Cell index={1} align="right">
                  <Probability likelihood={ranking.unlisted} locale={locale} />
                </Table.Summary.Cell>
                <Table.Summary.Cell index={2} align="right">
                  {ranking.unlisted.evidence}
                </Table.Summary.Cell>
                <Table.Summary.Cell index={3} colSpan={4} />
              </Table.Summary.Row>
            )}
          />
        </>
      )}
    </section>
  );
}
