import type { MoneyContext } from '@causeway/shared';
import { CartesianGrid, Legend, Line, LineChart, Tooltip, XAxis, YAxis } from 'recharts';
import { palette } from '@/config/theme';
import type { CurveSeries } from '../utils/curve';
import { money, percent } from '../utils/format';

type CostCurveChartProps = {
  series: CurveSeries[];
  money: Pick<MoneyContext, 'currency' | 'locale'>;
};

const STYLES: Record<CurveSeries['key'], { stroke: string; width: number; dash?: string }> = {
  plan: { stroke: palette.teal600, width: 4 },
  cheapestFirst: { stroke: palette.grey600, width: 2, dash: '8 5' },
  mostLikelyFirst: { stroke: palette.grey600, width: 2, dash: '2 4' },
};

/** Cumulative chance fixed against expected spend, for the fix path and both baselines. Lazy: recharts loads with it. */
export function CostCurveChart({ series, money: ctx }: CostCurveChartProps) {
  const { locale } = ctx;
  const summary = series.map((s) => `${s.label}: ${percent(s.points[s.points.length - 1].fixed, locale)} fixed for ${money(s.expectedCost, ctx)} on average`).join('; ');
  return (
    <div role="img" aria-label={`Curve of the chance the fault is fixed against the money spent. ${summary}. The table below gives each point.`} style={{ width: '100%', height: 320 }}>
      <LineChart responsive style={{ width: '100%', height: '100%' }} margin={{ top: 8, right: 24, bottom: 24, left: 8 }}>
        <CartesianGrid stroke={palette.grey200} />
        <XAxis
          type="number"
          dataKey="cost"
          domain={[0, 'dataMax']}
          tickFormatter={(v: number) => money(v, ctx)}
          tick={{ fill: palette.grey700, fontSize: 13 }}
          label={{ value: 'Expected spend so far (before tax)', position: 'insideBottom', offset: -16, fill: palette.grey700, fontSize: 13 }}
        />
        <YAxis
          type="number"
          dataKey="fixed"
          domain={[0, 1]}
          tickFormatter={(v: number) => percent(v, locale)}
          tick={{ fill: palette.grey700, fontSize: 13 }}
          width={56}
        />
        <Tooltip
          formatter={(value, name) => [percent(Number(value), locale), name]}
          labelFormatter={(label) => `Spent on average: ${money(Number(label), ctx)}`}
        />
        <Legend verticalAlign="top" height={32} />
        {series.map((s) => (
          <Line
            key={s.key}
            data={s.points}
            dataKey="fixed"
            name={s.label}
            type="linear"
            stroke={STYLES[s.key].stroke}
            strokeWidth={STYLES[s.key].width}
            strokeDasharray={STYLES[s.key].dash}
            dot={{ r: s.key === 'plan' ? 5 : 3, strokeDasharray: '' }}
            isAnimationActive={false}
          />
        ))}
      </LineChart>
    </div>
  );
}
