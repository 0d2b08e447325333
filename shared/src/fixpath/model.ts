import type { PlanInput, PlanStage, PlanSummary, StageKind } from './types';

/** The input as arrays indexed by cause, in input order; built once per request. */
export interface Model {
  n: number;
  keys: string[];
  p: Float64Array;
  replace: Float64Array;
  /** Check cost, NaN when the cause cannot be checked. */
  check: Float64Array;
  canReplace: boolean[];
  canCheck: boolean[];
  /** Teardown id per cause, −1 for none. */
  teardown: Int32Array;
  teardownKeys: string[];
  teardownCost: Float64Array;
  verification: number;
  /** Escalation cost, null when not offered. */
  escalation: number | null;
  unlisted: number;
}

/** An internal stage: a kind and cause indices (for checks, in the order checked). */
export interface Step {
  kind: StageKind;
  causes: number[];
}

/** Expects valid input (see validatePlanInput). */
export function buildModel(input: PlanInput): Model {
  const n = input.causes.length;
  const teardownKeys: string[] = [];
  const teardownId = new Map<string, number>();
  const teardown = new Int32Array(n).fill(-1);
  input.causes.forEach((c, i) => {
    if (c.teardown === undefined) return;
    let id = teardownId.get(c.teardown);
    if (id === undefined) {
      id = teardownKeys.length;
      teardownId.set(c.teardown, id);
      teardownKeys.push(c.teardown);
    }
    teardown[i] = id;
  });
  const sumP = input.causes.reduce((s, c) => s + c.probability, 0);
  return {
    n,
    keys: input.causes.map((c) => c.key),
    p: Float64Array.from(input.causes, (c) => c.probability),
    replace: Float64Array.from(input.causes, (c) => c.replaceCost),
    check: Float64Array.from(input.causes, (c) => c.checkCost ?? Number.NaN),
    canReplace: input.causes.map((c) => c.checkFirst !== true),
    canCheck: input.causes.map((c) => c.checkCost !== undefined),
    teardown,
    teardownKeys,
    teardownCost: Float64Array.from(teardownKeys, (k) => input.teardowns[k]),
    verification: input.verificationCost,
    escalation: input.escalationCost ?? null,
    // Causes and "not listed" are exhaustive, so mass the inputs leave out is unlisted.
    unlisted: Math.max(input.unlistedProbability, 1 - sumP, 0),
  };
}

/** Sum of the opening costs of the distinct teardowns of the causes. */
export function openingCost(model: Model, causes: readonly number[]): number {
  let total = 0;
  const seen = new Set<number>();
  for (const i of causes) {
    const g = model.teardown[i];
    if (g >= 0 && !seen.has(g)) {
      seen.add(g);
      total += model.teardownCost[g];
    }
  }
  return total;
}

/**
 * Every stage's unconditional contribution is linear in the mass m reaching it:
 * slope·m + offset. replace: slope = cost(S); check: slope = ΣO + ΣT and offset =
 * Σ p(R+V) − Σ_k T_k·Σ_{j<k} p_j (checks in the given order); escalate: slope = E.
 * Linearity is what lets local search price a swap of two stages in O(1).
 */
export interface StageTerms {
  slope: number;
  offset: number;
  /** Σ p of the causes it fixes (0 for escalation). */
  mass: number;
}

export function stageTerms(model: Model, step: Step): StageTerms {
  if (step.kind === 'escalate') return { slope: model.escalation ?? 0, offset: 0, mass: 0 };
  let mass = 0;
  if (step.kind === 'replace') {
    let slope = openingCost(model, step.causes) + model.verification;
    for (const i of step.causes) {
      slope += model.replace[i];
      mass += model.p[i];
    }
    return { slope, offset: 0, mass };
  }
  let slope = openingCost(model, step.causes);
  let offset = 0;
  for (const i of step.causes) {
    slope += model.check[i];
    offset += model.p[i] * (model.replace[i] + model.verification) - model.check[i] * mass;
    mass += model.p[i];
  }
  return { slope, offset, mass };
}

function teardownsOf(model: Model, causes: readonly number[]): string[] {
  const out: string[] = [];
  for (const i of causes) {
    const g = model.teardown[i];
    if (g >= 0 && !out.includes(model.teardownKeys[g])) out.push(model.teardownKeys[g]);
  }
  return out;
}

/** Below this a leftover mass is rounding, not a chance worth a stage. */
const MASS_EPSILON = 1e-12;

/**
 * Prices a staged plan under the model of product.md §3. After the last stage, if the
 * path did not escalate, the mass left (the unlisted r plus any causes not tried) is
 * escalated when escalation is offered (that is f(∅) = r·E), else left unresolved.
 * Expects steps that respect the model (see evaluatePlan for the checks).
 */
export function summarise(model: Model, steps: readonly Step[]): PlanSummary {
  let m = model.unlisted;
  for (let i = 0; i < model.n; i++) m += model.p[i];
  const stages: PlanStage[] = [];
  let cumulativeFix = 0;
  let cumulativeCost = 0;
  let escalationProbability = 0;

  const push = (step: Step): void => {
    const t = stageTerms(model, step);
    const expectedCost = t.slope * m + t.offset;
    let cost: number;
    if (step.kind === 'check') cost = m > 0 ? expectedCost / m : t.slope;
    else cost = t.slope;
    cumulativeFix += t.mass;
    cumulativeCost += expectedCost;
    stages.push({
      kind: step.kind,
      causes: step.causes.map((i) => model.keys[i]),
      teardowns: teardownsOf(model, step.causes),
      cost,
      expectedCost,
      reachProbability: m,
      fixProbability: t.mass,
      cumulativeFixProbability: cumulativeFix,
      cumulativeExpectedCost: cumulativeCost,
    });
    if (step.kind === 'escalate') escalationProbability = m;
    m -= t.mass;
  };

  let escalated = false;
  for (const step of steps) {
    push(step);
    if (step.kind === 'escalate') {
      escalated = true;
      break;
    }
  }
  if (!escalated && model.escalation !== null && m > MASS_EPSILON) {
    push({ kind: 'escalate', causes: [] });
    escalated = true;
  }
  return {
    stages,
    expectedCost: cumulativeCost,
    escalationProbability,
    unresolvedProbability: escalated || model.escalation !== null ? 0 : Math.max(0, m),
  };
}
