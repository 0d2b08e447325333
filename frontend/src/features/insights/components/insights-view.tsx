import { formatMoney, formatPercent, type InsightsDto } from '@causeway/shared';
import { Alert, Col, Flex, Form, Input, Row, Spin, Statistic, Table, Typography } from 'antd';
import { Bar, BarChart, CartesianGrid, Cell, Legend, Pie, PieChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { palette } from '@/config/theme';
import { useInsights, type InsightsParams } from '../api/get-insights';
import { ChartCard } from './chart-card';

type InsightsViewProps = {
  params: InsightsParams;
  onParamsChange: (params: InsightsParams) => void;
  locale: string;
};

const AXIS = { fontSize: 13, fill: palette.grey700 };

/** Legend entries in body text colour: the swatch carries the series colour, the words stay readable. */
function legendText(value: string) {
  return <span style={{ color: palette.grey900 }}>{value}</span>;
}

function JobsByCode({ data }: { data: InsightsDto }) {
  const rows = data.jobsByCode;
  const top = rows[0];
  const summary = rows.length
    ? `Jobs per fault code, split into open, resolved and unresolved. Most often: ${top.code} with ${top.jobs} job${top.jobs === 1 ? '' : 's'}.`
    : 'Jobs per fault code.';
  return (
    <ChartCard
      title="Jobs by code"
      summary={summary}
      empty={rows.length === 0}
      emptyText="No jobs in this period"
      chart={
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={rows} margin={{ top: 8, right: 16, bottom: 8, left: 0 }}>
            <CartesianGrid strokeDasharray="3 3" stroke={palette.grey200} />
            <XAxis dataKey="code" tick={{ ...AXIS, angle: -40, textAnchor: "end" }} interval={0} height={56} />
            <YAxis allowDecimals={false} tick={AXIS} />
            <Tooltip />
            <Legend formatter={legendText} />
            <Bar dataKey="resolved" name="Resolved" stackId="jobs" fill={palette.teal600} isAnimationActive={false} />
            <Bar dataKey="unresolved" name="Unresolved" stackId="jobs" fill={palette.grey600} isAnimationActive={false} maxBarSize={36} />
            <Bar dataKey="open" name="Open" stackId="jobs" fill={palette.teal300} isAnimationActive={false} />
          </BarChart>
        </ResponsiveContainer>
      }
      table={
        <Table
          size="small"
          rowKey="code"
          pagination={false}
          dataSource={rows}
          columns={[
            { title: 'Code', dataIndex: 'code', key: 'code' },
            { title: 'Meaning', dataIndex: 'title', key: 'title', render: (t: string | null) => t ?? '—' },
            { title: 'Jobs', dataIndex: 'jobs', key: 'jobs', align: 'right' },
            { title: 'Open', dataIndex: 'open', key: 'open', align: 'right' },
            { title: 'Resolved', dataIndex: 'resolved', key: 'resolved', align: 'right' },
            { title: 'Unresolved', dataIndex: 'unresolved', key: 'unresolved', align: 'right' },
          ]}
        />
      }
    />
  );
}

function FirstTimeFix({ data, locale }: { data: InsightsDto; locale: string }) {
  const { resolvedJobs, firstTimeFixed, rate } = data.firstTimeFix;
  const slices = [
    { name: 'Fixed by the first replacement', value: firstTimeFixed, fill: palette.teal600 },
    { name: 'Needed more than one', value: resolvedJobs - firstTimeFixed, fill: palette.grey300 },
  ];
  const summary =
    rate === null
      ? 'The share of resolved jobs whose first replacement cleared the code.'
      : `${formatPercent(rate, locale)} of ${resolvedJobs} resolved job${resolvedJobs === 1 ? '' : 's'} with a replacement were fixed by the first part replaced (${firstTimeFixed}).`;
  return (
    <ChartCard
      title="First-time-fix rate"
      summary={summary}
      empty={resolvedJobs === 0}
      emptyText="No resolved job with a replacement yet"
      chart={
        <Flex align="center" gap={24} style={{ height: '100%' }} wrap>
          <Statistic title="First-time fix" value={rate === null ? '—' : formatPercent(rate, locale)} />
          <div style={{ flex: 1, minWidth: 220, height: '100%' }}>
            <ResponsiveContainer width="100%" height="100%">
              <PieChart>
                <Pie data={slices} dataKey="value" nameKey="name" innerRadius="55%" outerRadius="85%" isAnimationActive={false}>
                  {slices.map((s) => (
                    <Cell key={s.name} fill={s.fill} />
                  ))}
                </Pie>
                <Tooltip />
                <Legend formatter={legendText} />
              </PieChart>
            </ResponsiveContainer>
          </div>
        </Flex>
      }
      table={
        <Table
          size="small"
          rowKey="name"
          pagination={false}
          dataSource={slices}
          columns={[
            { title: 'Resolved jobs', dataIndex: 'name', key: 'name' },
            { title: 'Jobs', dataIndex: 'value', key: 'value', align: 'right' },
            { title: 'Share', key: 'share', align: 'right', render: (_: unknown, s) => (resolvedJobs ? formatPercent(s.value / resolvedJobs, locale) : '—') },
          ]}
        />
      }
    />
  );
}

function CostToResolve({ data, locale }: { data: InsightsDto; locale: string }) {
  const { costToResolve: c, currency } = data;
  const money = (minor: number) => formatMoney(Math.round(minor), currency, locale);
  const summary =
    c.averageActualMinor !== null && c.averageExpectedMinor !== null
      ? `Over ${c.jobs} resolved job${c.jobs === 1 ? '' : 's'}, resolving cost ${money(c.averageActualMinor)} on average before tax, against ${money(c.averageExpectedMinor)} the fix path expected when the job was opened.`
      : 'What resolving a job cost on average, against what the fix path expected when the job was opened.';
  return (
    <ChartCard
      title="Cost to resolve against the fix path"
      summary={summary}
      empty={c.byCode.length === 0}
      emptyText="No resolved job with an expected cost yet"
      chart={
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={c.byCode} margin={{ top: 8, right: 16, bottom: 8, left: 16 }}>
            <CartesianGrid strokeDasharray="3 3" stroke={palette.grey200} />
            <XAxis dataKey="code" tick={{ ...AXIS, angle: -40, textAnchor: "end" }} interval={0} height={56} />
            <YAxis tick={AXIS} tickFormatter={(v: number) => money(v)} width={90} />
            <Tooltip formatter={(v) => money(Number(v))} />
            <Legend formatter={legendText} />
            <Bar dataKey="averageActualMinor" name="Actual, average" fill={palette.teal600} isAnimationActive={false} />
            <Bar dataKey="averageExpectedMinor" name="Fix path expected" fill={palette.grey300} isAnimationActive={false} />
          </BarChart>
        </ResponsiveContainer>
      }
      table={
        <Table
          size="small"
          rowKey="code"
          pagination={false}
          dataSource={c.byCode}
          columns={[
            { title: 'Code', dataIndex: 'code', key: 'code' },
            { title: 'Resolved jobs', dataIndex: 'jobs', key: 'jobs', align: 'right' },
            { title: 'Actual, average (before tax)', dataIndex: 'averageActualMinor', key: 'a', align: 'right', render: (v: number) => money(v) },
            { title: 'Expected at opening', dataIndex: 'averageExpectedMinor', key: 'e', align: 'right', render: (v: number) => money(v) },
          ]}
        />
      }
    />
  );
}

function ReplacedWithoutFix({ data, locale }: { data: InsightsDto; locale: string }) {
  const rows = data.replacedWithoutFix;
  const money = (minor: number) => formatMoney(minor, data.currency, locale);
  const summary = rows.length
    ? `Parts replaced where the code came back. Most often: ${rows[0].label}, ${rows[0].times} time${rows[0].times === 1 ? '' : 's'}, ${money(rows[0].costMinor)} in all.`
    : 'Parts replaced where the code came back.';
  return (
    <ChartCard
      title="Parts replaced without fixing anything"
      summary={summary}
      empty={rows.length === 0}
      emptyText="No replacement came back in this period"
      chart={
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={rows} layout="vertical" margin={{ top: 8, right: 16, bottom: 8, left: 8 }}>
            <CartesianGrid strokeDasharray="3 3" stroke={palette.grey200} />
            <XAxis type="number" allowDecimals={false} tick={AXIS} />
            <YAxis type="category" dataKey="label" width={200} tick={AXIS} />
            <Tooltip />
            <Bar dataKey="times" name="Times replaced in vain" fill={palette.grey600} isAnimationActive={false} maxBarSize={36} />
          </BarChart>
        </ResponsiveContainer>
      }
      table={
        <Table
          size="small"
          rowKey="part"
          pagination={false}
          dataSource={rows}
          columns={[
            { title: 'Part', dataIndex: 'label', key: 'label' },
            { title: 'Times', dataIndex: 'times', key: 'times', align: 'right' },
            { title: 'Spent (before tax)', dataIndex: 'costMinor', key: 'cost', align: 'right', render: (v: number) => money(v) },
          ]}
        />
      }
    />
  );
}

/** How the shop's jobs turned out, as charts with their tables. */
export function InsightsView({ params, onParamsChange, locale }: InsightsViewProps) {
  const insights = useInsights(params);
  return (
    <>
      <Form layout="vertical" component="div">
        <Flex wrap gap={16} align="flex-end">
          <Form.Item label="Jobs opened from" htmlFor="insights-from">
            <Input id="insights-from" type="date" value={params.from ?? ''} max={params.to} onChange={(e) => onParamsChange({ ...params, from: e.target.value || undefined })} />
          </Form.Item>
          <Form.Item label="to" htmlFor="insights-to">
            <Input id="insights-to" type="date" value={params.to ?? ''} min={params.from} onChange={(e) => onParamsChange({ ...params, to: e.target.value || undefined })} />
          </Form.Item>
          {insights.isFetching && <Spin style={{ marginBottom: 24 }} />}
        </Flex>
      </Form>
      {insights.isError && <Alert type="error" showIcon title={insights.error.message} style={{ marginBottom: 16 }} />}
      {insights.data && (
        <Row gutter={[24, 24]}>
          <Col xs={24} xl={12}>
            <JobsByCode data={insights.data} />
          </Col>
          <Col xs={24} xl={12}>
            <FirstTimeFix data={insights.data} locale={locale} />
          </Col>
          <Col xs={24} xl={12}>
            <CostToResolve data={insights.data} locale={locale} />
          </Col>
          <Col xs={24} xl={12}>
            <ReplacedWithoutFix data={insights.data} locale={locale} />
          </Col>
        </Row>
      )}
      {insights.isPending && (
        <Typography.Paragraph>
          <Spin /> Loading the insights…
        </Typography.Paragraph>
      )}
    </>
  );
}
