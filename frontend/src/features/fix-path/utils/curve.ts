import type { PlanSummary } from '@causeway/shared';

export interface CurvePoint {
  /** Expected spend so far: what following the plan costs on average up to and including this stage. */
  cost: number;
  /** Chance the fault is fixed by then. */
  fixed: number;
  /** 0 is the start, before any stage. */
  stage: number;
}

export interface CurveSeries {
  key: 'plan' | 'cheapestFirst' | 'mostLikelyFirst';
  label: string;
  points: CurvePoint[];
  expectedCost: number;
}

export function curvePoints(summary: PlanSummary): CurvePoint[] {
  return [
    { cost: 0, fixed: 0, stage: 0 },
    ...summary.stages.map((s, i) => ({ cost: s.cumulativeExpectedCost, fixed: s.cumulativeFixProbability, stage: i + 1 })),
  ];
}

export function curveSeries(plan: PlanSummary & { baselines: { cheapestFirst: PlanSummary; mostLikelyFirst: PlanSummary } }): CurveSeries[] {
  return [
    { key: 'plan', label: 'This fix path', points: curvePoints(plan), expectedCost: plan.expectedCost },
    { key: 'cheapestFirst', label: 'Cheapest part first', points: curvePoints(plan.baselines.cheapestFirst), expectedCost: plan.baselines.cheapestFirst.expectedCost },
    { key: 'mostLikelyFirst', label: 'Most likely first', points: curvePoints(plan.baselines.mostLikelyFirst), expectedCost: plan.baselines.mostLikelyFirst.expectedCost },
  ];
}
