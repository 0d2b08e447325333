/** A possible cause as the fix path sees it. Costs are in one currency unit, tax included or not, but consistently. */
export interface PlanCause {
  key: string;
  label?: string;
  /** p_i, unconditional: the probability that this cause is the fault. */
  probability: number;
  /** R_i: part + labour to replace it, excluding opening its teardown. */
  replaceCost: number;
  /** T_i: a check that decides for sure whether it is the cause. Absent = cannot be checked, only replaced. */
  checkCost?: number;
  /** Must be found by a check before it may be replaced (a wiring fault). Needs `checkCost`. */
  checkFirst?: boolean;
  /** Key into `PlanInput.teardowns`: what must be taken apart to reach it. */
  teardown?: string;
}

/** Work that is not a possible cause but shares a teardown ("while it is apart"), e.g. due spark plugs. */
export interface PlanAddOn {
  key: string;
  label?: string;
  teardown: string;
  /** Its own part + labour, excluding the opening. */
  cost: number;
}

export interface PlanInput {
  causes: PlanCause[];
  /** O_g per teardown key: labour to take apart and put back. */
  teardowns: Record<string, number>;
  /** V: clear the code, drive, confirm the monitor passes. */
  verificationCost: number;
  /** E: further diagnosis by a specialist. Absent = not offered. */
  escalationCost?: number;
  /**
   * r: the probability that the fault is a cause not listed. If Σp + r falls short of 1,
   * the shortfall is counted as unlisted too (causes and "not listed" are exhaustive).
   */
  unlistedProbability: number;
  addOns?: PlanAddOn[];
}

export type StageKind = 'replace' | 'check' | 'escalate';

export interface PlanStage {
  kind: StageKind;
  /** Cause keys; for a check stage in the order the checks are made (p/T descending from the planner). */
  causes: string[];
  /** Teardown keys the stage opens (once each). Empty for escalation. */
  teardowns: string[];
  /**
   * Cost of the stage given that it is reached.
   * replace: cost(S) = ΣR + ΣO + V.
   * check: check(C, U) / m(U), the expected cost of opening, checking until the fault is
   *   found, replacing and verifying it, given the stage is reached; when m(U) = 0 the
   *   conditional is undefined and the cost of running every check is shown (ΣO + ΣT).
   * escalate: E.
   */
  cost: number;
  /** Unconditional contribution of the stage to the expected cost of the path. */
  expectedCost: number;
  /** m(U): probability that the stage is reached (nothing before fixed the fault). */
  reachProbability: number;
  /** Unconditional probability that this stage fixes the fault; 0 for escalation (the fault is handed over). */
  fixProbability: number;
  cumulativeFixProbability: number;
  cumulativeExpectedCost: number;
}

export interface PlanSummary {
  stages: PlanStage[];
  expectedCost: number;
  /** Probability that the path ends in escalation (explicit or after every listed cause). */
  escalationProbability: number;
  /**
   * Probability that the path ends with the fault still present and nothing more to do:
   * the unlisted mass (plus untried causes) when escalation is not offered, else 0.
   * Identity: Σ fixProbability + escalationProbability + unresolvedProbability = 1.
   */
  unresolvedProbability: number;
}

export interface PlanAddOnSaving {
  key: string;
  label?: string;
  teardown: string;
  /** Index of the first stage that opens the add-on's teardown. */
  stageIndex: number;
  /** Probability that stage is reached, i.e. that the saving materialises. */
  reachProbability: number;
  /** The opening cost the add-on avoids by being done while that teardown is open. */
  savedCost: number;
}

export type PlanMethod = 'exact-dp' | 'heuristic';

export interface Plan extends PlanSummary {
  /** True when the path is proven optimal under the model. */
  exact: boolean;
  method: PlanMethod;
  baselines: { cheapestFirst: PlanSummary; mostLikelyFirst: PlanSummary };
  addOns: PlanAddOnSaving[];
  /** cheapestFirst.expectedCost − expectedCost (≥ 0 for exact plans). */
  savingVsCheapestFirst: number;
  /** r actually used: the given unlisted mass, raised to 1 − Σp if the inputs fall short of 1. */
  unlistedProbability: number;
}

/** A staged plan to evaluate: stage kinds and cause keys only. */
export interface PlanStep {
  kind: StageKind;
  causes: string[];
}

export interface PlanOptions {
  /** Largest number of causes solved exactly (default 14, at most 16); above it the heuristic runs. */
  exactLimit?: number;
}

/** One problem with the input: the field (e.g. `causes.2.probability`) and the rule it breaks. */
export interface PlanIssue {
  field: string;
  message: string;
}
