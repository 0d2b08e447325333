import {
  evaluatePlan,
  MAX_PLAN_CAUSES,
  Plan,
  PlanInput,
  PlanInputError,
  planFixPath,
  PlanSummary,
  randomPlanInput,
  validatePlanInput,
} from '../src/fixpath';

/** Stage sequence as kind:causes, e.g. 'replace:leak'. */
function route(plan: PlanSummary): string[] {
  return plan.stages.map((s) => `${s.kind}:${s.causes.join(',')}`);
}

function issuesOf(fn: () => unknown): Array<{ field: string; message: string }> {
  try {
    fn();
  } catch (e) {
    if (e instanceof PlanInputError) return e.issues;
    throw e;
  }
  throw new Error('expected a PlanInputError');
}

// domain-reference.md §6 Ex. 1 (P0171), expressed as in §8: replaceCost only, V = 0, no escalation.
const EX1: PlanInput = {
  causes: [
    { key: 'intake-leak', probability: 0.4, replaceCost: 60 },
    { key: 'maf', probability: 0.3, replaceCost: 180 },
    { key: 'fuel-pump', probability: 0.2, replaceCost: 450 },
    { key: 'o2', probability: 0.1, replaceCost: 150 },
  ],
  teardowns: {},
  verificationCost: 0,
  unlistedProbability: 0,
};

// domain-reference.md §6 Ex. 2 (P0455).
const EX2: PlanInput = {
  causes: [
    { key: 'gas-cap', probability: 0.5, replaceCost: 20 },
    { key: 'purge', probability: 0.2, replaceCost: 120 },
    { key: 'vent', probability: 0.2, replaceCost: 150 },
    { key: 'filler-neck', probability: 0.1, replaceCost: 300 },
  ],
  teardowns: {},
  verificationCost: 0,
  unlistedProbability: 0,
};

// domain-reference.md §6 Ex. 3 (HBR95 tests before repairs): (p, test, repair).
function ex3(checkFirst: boolean): PlanInput {
  return {
    causes: [
      { key: 'vacuum', probability: 0.4, checkCost: 40, replaceCost: 20, checkFirst },
      { key: 'maf', probability: 0.3, checkCost: 25, replaceCost: 180, checkFirst },
      { key: 'fuel-pressure', probability: 0.2, checkCost: 35, replaceCost: 450, checkFirst },
      { key: 'o2', probability: 0.1, checkCost: 30, replaceCost: 150, checkFirst },
    ],
    teardowns: {},
    verificationCost: 0,
    unlistedProbability: 0,
  };
}

// domain-reference.md §6 Ex. 4 (cost cluster K, C_K = 150), expressed as in §8.
const EX4: PlanInput = {
  causes: [
    { key: 'hose', probability: 0.25, replaceCost: 50 },
    { key: 'injector', probability: 0.25, replaceCost: 200 },
    { key: 'plug', probability: 0.25, replaceCost: 0, checkCost: 40, checkFirst: true, teardown: 'K' },
    { key: 'gasket', probability: 0.1, replaceCost: 0, checkCost: 30, checkFirst: true, teardown: 'K' },
    { key: 'coil', probability: 0.15, replaceCost: 0, checkCost: 90, checkFirst: true, teardown: 'K' },
  ],
  teardowns: { K: 150, L: 80 },
  verificationCost: 0,
  unlistedProbability: 0,
};

describe('planFixPath on the worked examples (domain-reference.md §8)', () => {
  it('Ex. 1: 303 in order intake leak, MAF, O2, fuel pump (Kadane & Simon 1977)', () => {
    const plan = planFixPath(EX1);
    expect(plan.expectedCost).toBeCloseTo(303, 9);
    expect(route(plan)).toEqual(['replace:intake-leak', 'replace:maf', 'replace:o2', 'replace:fuel-pump']);
    expect(plan.exact).toBe(true);
    expect(plan.method).toBe('exact-dp');
  });

  it('Ex. 1 baselines: most likely first 318, cheapest first 330 (domain-reference §6 Ex. 1)', () => {
    const plan = planFixPath(EX1);
    expect(plan.baselines.mostLikelyFirst.expectedCost).toBeCloseTo(318, 9);
    expect(route(plan.baselines.mostLikelyFirst)).toEqual([
      'replace:intake-leak',
      'replace:maf',
      'replace:fuel-pump',
      'replace:o2',
    ]);
    expect(plan.baselines.cheapestFirst.expectedCost).toBeCloseTo(330, 9);
    expect(route(plan.baselines.cheapestFirst)).toEqual(['replace:intake-leak', 'replace:o2', 'replace:maf', 'replace:fuel-pump']);
    expect(plan.savingVsCheapestFirst).toBeCloseTo(27, 9);
  });

  it('Ex. 2: 155 in order cap, purge, vent, neck (Kadane & Simon 1977)', () => {
    const plan = planFixPath(EX2);
    expect(plan.expectedCost).toBeCloseTo(155, 9);
    expect(route(plan)).toEqual(['replace:gas-cap', 'replace:purge', 'replace:vent', 'replace:filler-neck']);
    // §6 Ex. 2: the runner-up order costs 161 (vent before purge).
    expect(evaluatePlan(EX2, [
      { kind: 'replace', causes: ['gas-cap'] },
      { kind: 'replace', causes: ['vent'] },
      { kind: 'replace', causes: ['purge'] },
      { kind: 'replace', causes: ['filler-neck'] },
    ]).expectedCost).toBeCloseTo(161, 9);
  });

  it('Ex. 3, every cause check-first: 233.5 checking MAF, vacuum, fuel pressure, O2 (Heckerman, Breese & Rommelse 1995)', () => {
    const plan = planFixPath(ex3(true));
    expect(plan.expectedCost).toBeCloseTo(233.5, 9);
    // With no teardown one check stage and four one-check stages cost the same; ties go to fewer stages.
    expect(route(plan)).toEqual(['check:maf,vacuum,fuel-pressure,o2']);
    // HBR95 per-term breakdown from §6 Ex. 3: 25 + 28 + 10.5 + 3 (checks) + 167 (repairs).
    expect(plan.stages[0].cost).toBeCloseTo(25 + 28 + 10.5 + 3 + 167, 9);
  });

  it('Ex. 3 with blind replacement allowed: 203, replacing the vacuum part first (domain-reference §8)', () => {
    const plan = planFixPath(ex3(false));
    expect(plan.expectedCost).toBeCloseTo(203, 9);
    expect(route(plan)).toEqual(['replace:vacuum', 'check:maf,o2', 'replace:fuel-pressure']);
  });

  it('Ex. 4: 293.5 — hose; open K and check plug, gasket, coil; injector (Langseth & Jensen 2001)', () => {
    const plan = planFixPath(EX4);
    expect(plan.expectedCost).toBeCloseTo(293.5, 9);
    expect(route(plan)).toEqual(['replace:hose', 'check:plug,gasket,coil', 'replace:injector']);
    expect(plan.stages[1].teardowns).toEqual(['K']);
    // §6 Ex. 4: sorting by p/c and ignoring C_K costs 403.5 (plug, hose, gasket, coil,
    // injector; K re-opened for gasket and coil); adding C_K to every inside action costs
    // 355.5 (hose, plug, injector, coil, gasket). evaluatePlan must price both as the paper does.
    const ignoringOpening = evaluatePlan(EX4, [
      { kind: 'check', causes: ['plug'] },
      { kind: 'replace', causes: ['hose'] },
      { kind: 'check', causes: ['gasket', 'coil'] },
      { kind: 'replace', causes: ['injector'] },
    ]);
    expect(ignoringOpening.expectedCost).toBeCloseTo(403.5, 9);
    const openingOnEach = evaluatePlan(EX4, [
      { kind: 'replace', causes: ['hose'] },
      { kind: 'check', causes: ['plug'] },
      { kind: 'replace', causes: ['injector'] },
      { kind: 'check', causes: ['coil', 'gasket'] },
    ]);
    expect(openingOnEach.expectedCost).toBeCloseTo(355.5, 9);
  });

  it('Ex. 4 is also found by the heuristic, flagged as approximate', () => {
    const plan = planFixPath(EX4, { exactLimit: 0 });
    expect(plan.exact).toBe(false);
    expect(plan.method).toBe('heuristic');
    expect(plan.expectedCost).toBeCloseTo(293.5, 9);
    expect(route(plan)).toEqual(['replace:hose', 'check:plug,gasket,coil', 'replace:injector']);
  });
});

describe('plan details', () => {
  it('lists an add-on behind an opened teardown with the opening it saves, and not one behind a teardown never opened', () => {
    // product.md §3 / "while it is apart": work behind an opened teardown costs only its own
    // part and labour, so it saves O_K = 150; K is first opened by Ex. 4's cluster stage, reached with .75.
    const plan = planFixPath({
      ...EX4,
      addOns: [
        { key: 'spark-plugs', label: 'Spark plugs (due)', teardown: 'K', cost: 60 },
        { key: 'belt', teardown: 'L', cost: 40 },
      ],
    });
    expect(plan.addOns).toEqual([
      { key: 'spark-plugs', label: 'Spark plugs (due)', teardown: 'K', stageIndex: 1, reachProbability: 0.75, savedCost: 150 },
    ]);
  });

  it('shows per stage its cost, reach, fix and cumulative probabilities (Ex. 4 figures, domain-reference §6)', () => {
    const plan = planFixPath(EX4);
    const [hose, cluster, injector] = plan.stages;
    expect(hose).toMatchObject({ cost: 50, reachProbability: 1, fixProbability: 0.25 });
    // The cluster stage contributes 190·.75 + 30·.5 + 90·.4 = 193.5 (§6 Ex. 4), given reach .75.
    expect(cluster.expectedCost).toBeCloseTo(193.5, 9);
    expect(cluster.cost).toBeCloseTo(193.5 / 0.75, 9);
    expect(cluster.reachProbability).toBeCloseTo(0.75, 12);
    expect(cluster.fixProbability).toBeCloseTo(0.5, 12);
    expect(injector.cumulativeFixProbability).toBeCloseTo(1, 12);
    expect(injector.cumulativeExpectedCost).toBeCloseTo(293.5, 9);
  });

  it('escalates when guessing costs more than further diagnosis, and pays r·E at the end otherwise', () => {
    // Ex. 1 with 10 % unlisted: the remaining mass after the cheap tries is escalated
    // when E is low enough; m(U)·E is the escalation term of product.md §3.
    const input: PlanInput = {
      ...EX1,
      causes: EX1.causes.map((c) => ({ ...c, probability: c.probability * 0.9 })),
      unlistedProbability: 0.1,
      escalationCost: 500,
    };
    const plan = planFixPath(input);
    const last = plan.stages[plan.stages.length - 1];
    expect(last.kind).toBe('escalate');
    expect(last.cost).toBe(500);
    expect(plan.escalationProbability).toBeCloseTo(last.reachProbability, 12);
    expect(route(plan)).toEqual(['replace:intake-leak', 'replace:maf', 'escalate:']);
    // From the recursion of product.md §3 by hand: 60·1 + 180·.64 + 500·(1 − .36 − .27) = 360.2;
    // escalating one stage earlier costs 60 + 500·.64 = 380, trying O2 first 370.7.
    expect(plan.expectedCost).toBeCloseTo(60 + 115.2 + 185, 9);
    // Not offered: every cause is tried and the unlisted mass stays unresolved.
    const none = planFixPath({ ...input, escalationCost: undefined });
    expect(none.stages.every((s) => s.kind !== 'escalate')).toBe(true);
    expect(none.unresolvedProbability).toBeCloseTo(0.1, 12);
  });

  it('counts the mass the inputs leave out as unlisted', () => {
    // Causes and "a cause not listed" are exhaustive (product.md §2: the rest r is unlisted).
    const input: PlanInput = { ...EX2, causes: EX2.causes.slice(0, 3), escalationCost: 1000 };
    const plan = planFixPath(input);
    expect(plan.unlistedProbability).toBeCloseTo(0.1, 12);
  });

  it('keeps the identity Σ fixProbability + escalationProbability + unresolvedProbability = 1 on every plan and baseline', () => {
    // The identity: each stage fixes the mass of its causes, the path ends either in
    // escalation (taking the rest) or with the unlisted mass unresolved.
    for (let seed = 1; seed <= 40; seed++) {
      const input = randomPlanInput(seed, 3 + (seed % 9), { escalation: seed % 2 === 0 });
      const plan = planFixPath(input, { exactLimit: seed % 3 === 0 ? 0 : 14 });
      for (const summary of [plan, plan.baselines.cheapestFirst, plan.baselines.mostLikelyFirst] as PlanSummary[]) {
        const fixed = summary.stages.reduce((s, st) => s + st.fixProbability, 0);
        expect(fixed + summary.escalationProbability + summary.unresolvedProbability).toBeCloseTo(1, 10);
        let reach = 1;
        let cost = 0;
        for (const st of summary.stages) {
          expect(st.reachProbability).toBeCloseTo(reach, 10);
          reach -= st.fixProbability;
          cost += st.expectedCost;
          expect(st.cumulativeExpectedCost).toBeCloseTo(cost, 8);
        }
        expect(summary.expectedCost).toBeCloseTo(cost, 8);
        if (input.escalationCost === undefined) {
          expect(summary.unresolvedProbability).toBeCloseTo((plan as Plan).unlistedProbability, 10);
        } else {
          expect(summary.unresolvedProbability).toBe(0);
        }
      }
      // evaluatePlan prices the planner's own stages to the same total.
      const again = evaluatePlan(input, plan.stages.map((s) => ({ kind: s.kind, causes: s.causes })));
      expect(again.expectedCost).toBeCloseTo(plan.expectedCost, 8);
      expect(plan.expectedCost).toBeLessThanOrEqual(plan.baselines.cheapestFirst.expectedCost + 1e-9);
      expect(plan.expectedCost).toBeLessThanOrEqual(plan.baselines.mostLikelyFirst.expectedCost + 1e-9);
    }
  });

  it('plans 200 causes, the most allowed, with the heuristic', () => {
    // product.md §3: above n ≈ 14 a documented heuristic runs and says it is approximate.
    const plan = planFixPath(randomPlanInput(42, MAX_PLAN_CAUSES));
    expect(plan.exact).toBe(false);
    expect(plan.method).toBe('heuristic');
    expect(plan.expectedCost).toBeLessThanOrEqual(plan.baselines.cheapestFirst.expectedCost);
  });

  it('treats a cause with a check cost but no check-first flag as checkable or replaceable, and a check-first cause only in check stages', () => {
    // product.md §3: S ranges over sets with no check-first cause, C over all-checkable sets.
    const input = ex3(true);
    expect(issuesOf(() => evaluatePlan(input, [{ kind: 'replace', causes: ['maf'] }])).map((i) => i.field)).toEqual([
      'stages.0.causes.0',
    ]);
    expect(issuesOf(() => evaluatePlan(EX1, [{ kind: 'check', causes: ['maf'] }])).map((i) => i.field)).toEqual([
      'stages.0.causes.0',
    ]);
    for (const plan of [planFixPath(input), planFixPath(input, { exactLimit: 0 })]) {
      expect(plan.stages.every((s) => s.kind !== 'replace')).toBe(true);
    }
  });
});

// Product owner's rule: bad input gets a clear error naming the field and the rule, never
// an exception that escapes. Each bad-input class below is one the rule lists.
describe('validatePlanInput', () => {
  const fields = (input: unknown): string[] => validatePlanInput(input).map((i) => i.field);
  const withCause = (i: number, patch: Record<string, unknown>): PlanInput => ({
    ...EX4,
    causes: EX4.causes.map((c, j) => (j === i ? { ...c, ...patch } : c)) as PlanInput['causes'],
  });

  it('accepts the worked examples', () => {
    for (const input of [EX1, EX2, ex3(true), ex3(false), EX4]) expect(validatePlanInput(input)).toEqual([]);
  });

  it('names a probability outside [0, 1]', () => {
    expect(fields(withCause(2, { probability: -0.1 }))).toEqual(['causes.2.probability']);
    expect(fields(withCause(2, { probability: 1.5 }))).toEqual(['causes.2.probability']);
    expect(fields(withCause(2, { probability: Number.NaN }))).toEqual(['causes.2.probability']);
    expect(fields({ ...EX4, unlistedProbability: 2 })).toEqual(['unlistedProbability']);
  });

  it('names probabilities that sum above 1', () => {
    const issues = validatePlanInput({ ...EX4, unlistedProbability: 0.2 });
    expect(issues.map((i) => i.field)).toEqual(['causes']);
    expect(issues[0].message).toMatch(/at most 1/);
    // Within the 1e-9 tolerance rounding is accepted.
    expect(validatePlanInput({ ...EX4, unlistedProbability: 5e-10 })).toEqual([]);
  });

  it('names negative or non-finite costs', () => {
    expect(fields(withCause(0, { replaceCost: -1 }))).toEqual(['causes.0.replaceCost']);
    expect(fields(withCause(2, { checkCost: Number.POSITIVE_INFINITY }))).toEqual(['causes.2.checkCost']);
    expect(fields({ ...EX4, teardowns: { K: -5, L: 80 } })).toEqual(['teardowns.K']);
    expect(fields({ ...EX4, verificationCost: Number.NaN })).toEqual(['verificationCost']);
    expect(fields({ ...EX4, escalationCost: -3 })).toEqual(['escalationCost']);
    expect(fields({ ...EX4, addOns: [{ key: 'x', teardown: 'K', cost: -1 }] })).toEqual(['addOns.0.cost']);
  });

  it('names unknown teardown keys', () => {
    expect(fields(withCause(3, { teardown: 'Q' }))).toEqual(['causes.3.teardown']);
    expect(fields({ ...EX4, addOns: [{ key: 'x', teardown: 'Q', cost: 1 }] })).toEqual(['addOns.0.teardown']);
  });

  it('names duplicate keys', () => {
    expect(fields(withCause(1, { key: 'hose' }))).toEqual(['causes.1.key']);
    expect(
      fields({
        ...EX4,
        addOns: [
          { key: 'x', teardown: 'K', cost: 1 },
          { key: 'x', teardown: 'K', cost: 2 },
        ],
      }),
    ).toEqual(['addOns.1.key']);
  });

  it(`names more than ${MAX_PLAN_CAUSES} causes`, () => {
    const big = randomPlanInput(1, MAX_PLAN_CAUSES + 1);
    const issues = validatePlanInput(big);
    expect(issues.map((i) => i.field)).toEqual(['causes']);
    expect(issues[0].message).toMatch(/at most 200/);
  });

  it('names a check-first cause without a check cost, and wrong types', () => {
    expect(fields(withCause(0, { checkFirst: true }))).toEqual(['causes.0.checkFirst']);
    expect(fields(withCause(0, { key: 7 }))).toEqual(['causes.0.key']);
    expect(fields(null)).toEqual(['']);
    expect(fields({ causes: 'x', teardowns: [], verificationCost: 0, unlistedProbability: 0 })).toEqual(['teardowns', 'causes']);
  });

  it('makes planFixPath and evaluatePlan throw a PlanInputError with the issues, never another exception', () => {
    expect(issuesOf(() => planFixPath(withCause(2, { probability: 3 })))[0].field).toBe('causes.2.probability');
    expect(issuesOf(() => planFixPath(undefined as unknown as PlanInput))[0].field).toBe('');
    expect(issuesOf(() => planFixPath(EX1, { exactLimit: 40 }))[0].field).toBe('opts.exactLimit');
    expect(issuesOf(() => evaluatePlan(EX1, [{ kind: 'replace', causes: ['nope'] }]))[0].field).toBe('stages.0.causes.0');
    expect(
      issuesOf(() =>
        evaluatePlan({ ...EX1, escalationCost: 10 }, [
          { kind: 'escalate', causes: [] },
          { kind: 'replace', causes: ['maf'] },
        ]),
      )[0].field,
    ).toBe('stages.1');
    expect(issuesOf(() => evaluatePlan(EX1, [{ kind: 'escalate', causes: [] }]))[0].field).toBe('stages');
    expect(
      issuesOf(() =>
        evaluatePlan(EX1, [
          { kind: 'replace', causes: ['maf'] },
          { kind: 'replace', causes: ['maf'] },
        ]),
      )[0].field,
    ).toBe('stages.1.causes.0');
  });
});
