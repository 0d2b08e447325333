import type { MoneyContext } from '@causeway/shared';
import { Skeleton, Typography } from 'antd';
import { lazy, Suspense } from 'react';
import { palette } from '@/config/theme';
import type { CurveSeries } from '../utils/curve';
import { money, percent } from '../utils/format';

const CostCurveChart = lazy(() => import('./cost-curve-chart').then((m) => ({ default: m.CostCurveChart })));

type CostCurveProps = {
  series: CurveSeries[];
  money: Pick<MoneyContext, 'currency' | 'locale'>;
};

const cell = { padding: '6px 12px', borderBottom: `1px solid ${palette.grey200}`, textAlign: 'right' } as const;

/** The curve of chance fixed against spend, and the same points as a table for those who cannot see it. */
export function CostCurve({ series, money: ctx }: CostCurveProps) {
  return (
    <section aria-labelledby="fix-path-curve">
      <Typography.Title level={3} id="fix-path-curve" style={{ fontSize: 18 }}>
        Chance fixed against money spent
      </Typography.Title>
      <Typography.Paragraph type="secondary">
        The higher and further left a line climbs, the sooner the fault is likely fixed for the money. Each point is a stage.
      </Typography.Paragraph>
      <Suspense fallback={<Skeleton active title={false} paragraph={{ rows: 5 }} />}>
        <CostCurveChart series={series} money={ctx} />
      </Suspense>
      <details style={{ marginTop: 8 }}>
        <summary style={{ cursor: 'pointer', fontWeight: 600, padding: '8px 0' }}>The curve as a table</summary>
        <table style={{ borderCollapse: 'collapse', width: '100%', maxWidth: 720 }}>
          <caption style={{ textAlign: 'left', color: palette.grey700, padding: '4px 0' }}>
            Expected spend so far (before tax) and chance the fault is fixed, after each stage
          </caption>
          <thead>
            <tr>
              <th scope="col" style={{ ...cell, textAlign: 'left' }}>
                Order
              </th>
              <th scope="col" style={cell}>
                After stage
              </th>
              <th scope="col" style={cell}>
                Spent so far
              </th>
              <th scope="col" style={cell}>
                Fixed so far
              </th>
            </tr>
          </thead>
          <tbody>
            {series.flatMap((s) =>
              s.points.slice(1).map((p) => (
                <tr key={`${s.key}-${p.stage}`}>
                  <th scope="row" style={{ ...cell, textAlign: 'left', fontWeight: s.key === 'plan' ? 600 : 400 }}>
                    {s.label}
                  </th>
                  <td style={cell}>{p.stage}</td>
                  <td style={cell}>{money(p.cost, ctx)}</td>
                  <td style={cell}>{percent(p.fixed, ctx.locale)}</td>
                </tr>
              )),
            )}
          </tbody>
        </table>
      </details>
    </section>
  );
}
