import type { CauseRankingDto } from '@causeway/shared';
import { Bar, BarChart, CartesianGrid, ErrorBar, Rectangle, Tooltip, XAxis, YAxis, type BarShapeProps } from 'recharts';
import { palette } from '@/config/theme';
import { percent } from '../utils/format';

type CauseChartProps = { ranking: CauseRankingDto };

interface Row {
  label: string;
  probability: number;
  lower: number;
  upper: number;
  /** Distances below and above the mean, as the error bar wants them. */
  range: [number, number];
  unlisted: boolean;
}

/** Horizontal bars of the likelihoods with their 90 % intervals as whiskers. Lazy: recharts loads with it. */
export function CauseChart({ ranking }: CauseChartProps) {
  const { locale } = ranking.money;
  const rows: Row[] = [
    ...ranking.causes.map((c) => ({ label: c.partName, probability: c.probability, lower: c.lower, upper: c.upper, unlisted: false })),
    { label: 'A cause not listed', ...ranking.unlisted, unlisted: true },
  ].map((r) => ({ ...r, range: [Math.max(0, r.probability - r.lower), Math.max(0, r.upper - r.probability)] as [number, number] }));
  const top = Math.min(1, Math.ceil((Math.max(...rows.map((r) => r.upper)) + 0.05) * 10) / 10);
  const summary = rows.map((r) => `${r.label} ${percent(r.probability, locale)}`).join(', ');

  return (
    <div role="img" aria-label={`Chart of the likelihoods with their 90 % intervals: ${summary}. The table below gives the same figures.`} style={{ width: '100%', height: 40 * rows.length + 60 }}>
      <BarChart responsive style={{ width: '100%', height: '100%' }} data={rows} layout="vertical" margin={{ top: 8, right: 24, bottom: 8, left: 8 }}>
        <CartesianGrid horizontal={false} stroke={palette.grey200} />
        <XAxis
          type="number"
          domain={[0, top]}
          tickFormatter={(v: number) => percent(v, locale)}
          tick={{ fill: palette.grey700, fontSize: 14 }}
          label={{ value: 'Chance it is the cause (bar) and 90 % interval (whisker)', position: 'insideBottom', offset: -4, fill: palette.grey700, fontSize: 13 }}
          height={48}
        />
        <YAxis type="category" dataKey="label" width={240} tick={{ fill: palette.grey900, fontSize: 14 }} interval={0} />
        <Tooltip
          formatter={(_value, _name, item) => {
            const row = item.payload as Row;
            return [`${percent(row.probability, locale)} (90 % interval ${percent(row.lower, locale)} to ${percent(row.upper, locale)})`, 'Likelihood'];
          }}
        />
        <Bar
          dataKey="probability"
          fill={palette.teal500}
          radius={[0, 4, 4, 0]}
          barSize={18}
          isAnimationActive={false}
          // "A cause not listed" is drawn in grey: it is what the list does not explain.
          shape={(props: BarShapeProps) => <Rectangle {...props} fill={(props.payload as Row | undefined)?.unlisted ? palette.grey300 : palette.teal500} />}
        >
          <ErrorBar dataKey="range" width={6} strokeWidth={2} stroke={palette.grey900} direction="x" />
        </Bar>
      </BarChart>
    </div>
  );
}
