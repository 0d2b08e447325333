import { evaluatePlan, mulberry32, PlanInput, planFixPath, randomPlanInput } from '../src/fixpath';

/*
 * Independent references for the optimiser. Nothing here calls into the planner's
 * internals: the brute force below enumerates every staged plan and prices it with its
 * own cost function, written from the formulas of product.md §3.
 */

interface BruteStage {
  kind: 'replace' | 'check' | 'escalate';
  /** Cause indices; for a check stage, in the order checked. */
  causes: number[];
}

/** Expected cost of a complete staged plan, straight from product.md §3. */
function bruteCost(input: PlanInput, plan: BruteStage[]): number {
  const causes = input.causes;
  const sumP = causes.reduce((s, c) => s + c.probability, 0);
  const r = Math.max(input.unlistedProbability, 1 - sumP);
  let m = sumP + r; // m(U) with U = every cause
  let total = 0;
  const V = input.verificationCost;
  const openings = (idx: number[]): number => {
    const gs = new Set(idx.map((i) => causes[i].teardown).filter((g): g is string => g !== undefined));
    return [...gs].reduce((s, g) => s + input.teardowns[g], 0);
  };
  for (const stage of plan) {
    if (stage.kind === 'escalate') return total + m * (input.escalationCost as number);
    const fixed = stage.causes.reduce((s, i) => s + causes[i].probability, 0);
    if (stage.kind === 'replace') {
      // m(U)·cost(S), cost(S) = Σ R_i + Σ O_g + V
      total += m * (stage.causes.reduce((s, i) => s + causes[i].replaceCost, 0) + openings(stage.causes) + V);
    } else {
      // check(C, U) = m(U)·Σ O_g + Σ_k T_{c_k}·(m(U) − Σ_{j<k} p_{c_j}) + Σ p_i·(R_i + V)
      total += m * openings(stage.causes);
      let ruledOut = 0;
      for (const i of stage.causes) {
        total += (causes[i].checkCost as number) * (m - ruledOut);
        ruledOut += causes[i].probability;
      }
      total += stage.causes.reduce((s, i) => s + causes[i].probability * (causes[i].replaceCost + V), 0);
    }
    m -= fixed;
  }
  // f(∅) = r·E, or 0 where escalation is not offered
  return total + (input.escalationCost === undefined ? 0 : m * input.escalationCost);
}

function subsets<T>(items: T[]): T[][] {
  const out: T[][] = [];
  for (let mask = 1; mask < 1 << items.length; mask++) out.push(items.filter((_, b) => mask & (1 << b)));
  return out;
}

function permutations<T>(items: T[]): T[][] {
  if (items.length <= 1) return [items.slice()];
  return items.flatMap((x, i) => permutations([...items.slice(0, i), ...items.slice(i + 1)]).map((rest) => [x, ...rest]));
}

/**
 * Every staged plan: ordered set partitions of the causes into replacement stages (no
 * check-first cause) and check stages (checkable causes only, in every order), with
 * escalation allowed at any point when offered. Returns the cheapest and how many were seen.
 */
function bruteForce(input: PlanInput): { cost: number; count: number } {
  let best = Number.POSITIVE_INFINITY;
  let count = 0;
  const plan: BruteStage[] = [];
  const visit = (open: number[]): void => {
    if (input.escalationCost !== undefined) {
      plan.push({ kind: 'escalate', causes: [] });
      best = Math.min(best, bruteCost(input, plan));
      count++;
      plan.pop();
    }
    if (open.length === 0) {
      best = Math.min(best, bruteCost(input, plan));
      count++;
      return;
    }
    for (const set of subsets(open)) {
      const rest = open.filter((i) => !set.includes(i));
      if (set.every((i) => input.causes[i].checkFirst !== true)) {
        plan.push({ kind: 'replace', causes: set });
        visit(rest);
        plan.pop();
      }
      if (set.every((i) => input.causes[i].checkCost !== undefined)) {
        for (const order of permutations(set)) {
          plan.push({ kind: 'check', causes: order });
          visit(rest);
          plan.pop();
        }
      }
    }
  };
  visit(input.causes.map((_, i) => i));
  return { cost: best, count };
}

describe('fix-path optimality against independent references', () => {
  it('equals the p/c order on instances without teardowns, checks, verification or escalation (Kadane & Simon 1977)', () => {
    // Kadane & Simon (1977), Ann. Statist. 5(2):237–255; domain-reference.md §6 basic model:
    // ECR(s) = Σ_k c_{s_k}·(1 − Σ_{j<k} p_{s_j}) is minimised by sorting on p_i/c_i.
    for (let seed = 1; seed <= 40; seed++) {
      const n = 2 + (seed % 11);
      const input = randomPlanInput(seed, n, { teardowns: 0, checks: false, escalation: false, verification: false, unlisted: false });
      const order = input.causes
        .map((c, i) => ({ c, i }))
        .sort((a, b) => b.c.probability / b.c.replaceCost - a.c.probability / a.c.replaceCost);
      let rest = 1;
      let ecr = 0;
      for (const { c } of order) {
        ecr += c.replaceCost * rest;
        rest -= c.probability;
      }
      const plan = planFixPath(input);
      expect(plan.expectedCost).toBeCloseTo(ecr, 8);
      expect(plan.stages.map((s) => s.causes)).toEqual(order.map(({ c }) => [c.key]));
    }
  });

  it('equals a brute-force enumeration of every staged plan (product.md §3 recursion)', () => {
    let plans = 0;
    for (let seed = 1; seed <= 60; seed++) {
      const n = seed <= 6 ? 6 : 2 + (seed % 4);
      const input = randomPlanInput(100 + seed, n, {
        teardowns: seed % 5 === 0 ? 0 : 1 + (seed % 3),
        escalation: seed % 3 !== 0,
        checks: seed % 7 !== 0,
      });
      const brute = bruteForce(input);
      plans += brute.count;
      const plan = planFixPath(input);
      expect(plan.expectedCost).toBeCloseTo(brute.cost, 7);
      // The planner's stages, priced by the brute force's own cost function, give the same total.
      const index = new Map(input.causes.map((c, i) => [c.key, i]));
      const own = plan.stages.map((s) => ({ kind: s.kind, causes: s.causes.map((k) => index.get(k) as number) }));
      expect(bruteCost(input, own)).toBeCloseTo(plan.expectedCost, 7);
    }
    expect(plans).toBeGreaterThan(100_000);
  });

  it('prices any plan with evaluatePlan as the formula does', () => {
    const rand = mulberry32(7);
    for (let seed = 1; seed <= 30; seed++) {
      const input = randomPlanInput(500 + seed, 2 + (seed % 6));
      // A random valid plan: shuffle the causes, cut into stages of allowed kinds.
      const idx = input.causes.map((_, i) => i);
      for (let i = idx.length - 1; i > 0; i--) {
        const j = Math.floor(rand() * (i + 1));
        [idx[i], idx[j]] = [idx[j], idx[i]];
      }
      const stages: Array<{ kind: 'replace' | 'check'; causes: number[] }> = [];
      for (const i of idx) {
        const c = input.causes[i];
        const kind = c.checkFirst ? 'check' : c.checkCost !== undefined && rand() < 0.5 ? 'check' : 'replace';
        const last = stages[stages.length - 1];
        if (last !== undefined && last.kind === kind && rand() < 0.4) last.causes.push(i);
        else stages.push({ kind, causes: [i] });
      }
      const summary = evaluatePlan(
        input,
        stages.map((s) => ({ kind: s.kind, causes: s.causes.map((i) => input.causes[i].key) })),
      );
      expect(summary.expectedCost).toBeCloseTo(bruteCost(input, stages), 8);
    }
  });

  it('heuristic: never below the exact optimum, within 10 % worst case on random instances of 3–10 causes', () => {
    const gaps: number[] = [];
    for (let seed = 1; seed <= 150; seed++) {
      const n = 3 + (seed % 8);
      const input = randomPlanInput(2000 + seed, n, { escalation: seed % 4 !== 0 });
      const exact = planFixPath(input);
      const approx = planFixPath(input, { exactLimit: 0 });
      expect(exact.exact).toBe(true);
      expect(approx.exact).toBe(false);
      expect(approx.method).toBe('heuristic');
      expect(approx.expectedCost).toBeGreaterThanOrEqual(exact.expectedCost - 1e-9);
      gaps.push(approx.expectedCost / exact.expectedCost - 1);
    }
    const mean = gaps.reduce((s, g) => s + g, 0) / gaps.length;
    const worst = Math.max(...gaps);
    console.info(`heuristic vs exact on ${gaps.length} instances: mean gap ${(mean * 100).toFixed(3)} %, worst ${(worst * 100).toFixed(2)} %`);
    expect(worst).toBeLessThanOrEqual(0.1);
    expect(mean).toBeLessThanOrEqual(0.02);
  });

  it('runs the heuristic, flagged approximate, above the exact limit', () => {
    const input = randomPlanInput(9, 20);
    const plan = planFixPath(input);
    expect(plan.exact).toBe(false);
    expect(plan.method).toBe('heuristic');
    const forced = planFixPath(randomPlanInput(9, 8), { exactLimit: 7 });
    expect(forced.exact).toBe(false);
    const exact = planFixPath(randomPlanInput(9, 8), { exactLimit: 8 });
    expect(exact.exact).toBe(true);
    expect(forced.expectedCost).toBeGreaterThanOrEqual(exact.expectedCost - 1e-9);
  });

  it('makes randomPlanInput deterministic per seed', () => {
    expect(randomPlanInput(3, 12)).toEqual(randomPlanInput(3, 12));
    expect(randomPlanInput(3, 12)).not.toEqual(randomPlanInput(4, 12));
  });
});
