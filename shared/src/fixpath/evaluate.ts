import { buildModel, Model, Step, summarise } from './model';
import type { PlanInput, PlanIssue, PlanStep, PlanSummary } from './types';
import { PlanInputError, validatePlanInput } from './validate';

const KINDS = new Set(['replace', 'check', 'escalate']);

/** Checks that given stages respect the model; returns them as index steps. */
export function stepsFromPlan(model: Model, plan: unknown): { steps: Step[]; issues: PlanIssue[] } {
  const issues: PlanIssue[] = [];
  const steps: Step[] = [];
  if (!Array.isArray(plan)) return { steps, issues: [{ field: 'stages', message: 'must be an array of stages' }] };
  const index = new Map(model.keys.map((k, i) => [k, i]));
  const used = new Set<string>();
  plan.forEach((raw: unknown, s) => {
    const f = `stages.${s}`;
    const stage = raw as Partial<PlanStep> | null;
    if (stage === null || typeof stage !== 'object') {
      issues.push({ field: f, message: 'must be an object with kind and causes' });
      return;
    }
    if (typeof stage.kind !== 'string' || !KINDS.has(stage.kind)) {
      issues.push({ field: `${f}.kind`, message: "must be 'replace', 'check' or 'escalate'" });
      return;
    }
    if (!Array.isArray(stage.causes)) {
      issues.push({ field: `${f}.causes`, message: 'must be an array of cause keys' });
      return;
    }
    if (steps.length > 0 && steps[steps.length - 1].kind === 'escalate') {
      issues.push({ field: f, message: 'no stage may follow escalation: it ends the path' });
    }
    if (stage.kind === 'escalate') {
      if (stage.causes.length > 0) issues.push({ field: `${f}.causes`, message: 'must be empty for escalation' });
      steps.push({ kind: 'escalate', causes: [] });
      return;
    }
    if (stage.causes.length === 0) issues.push({ field: `${f}.causes`, message: 'must name at least one cause' });
    const causes: number[] = [];
    stage.causes.forEach((key: unknown, c) => {
      const cf = `${f}.causes.${c}`;
      const i = typeof key === 'string' ? index.get(key) : undefined;
      if (i === undefined) {
        issues.push({ field: cf, message: `'${String(key)}' is not a cause of this input` });
        return;
      }
      if (used.has(key as string)) issues.push({ field: cf, message: `'${String(key)}' already appears in an earlier stage` });
      used.add(key as string);
      if (stage.kind === 'replace' && !model.canReplace[i]) {
        issues.push({ field: cf, message: `'${String(key)}' must be checked first, so it cannot be in a replacement stage` });
      }
      if (stage.kind === 'check' && !model.canCheck[i]) {
        issues.push({ field: cf, message: `'${String(key)}' has no checkCost, so it cannot be in a check stage` });
      }
      causes.push(i);
    });
    steps.push({ kind: stage.kind, causes });
  });
  if (model.escalation === null && steps.some((s) => s.kind === 'escalate')) {
    issues.push({ field: 'stages', message: 'escalation is not offered (no escalationCost)' });
  }
  return { steps, issues };
}

/**
 * Expected cost of any staged plan under the model (product.md §3), with each stage's
 * reach and fix probabilities. Checks inside a check stage are priced in the order given.
 * If the plan neither escalates nor tries every cause, the mass left is escalated when
 * escalation is offered and is otherwise reported as `unresolvedProbability`.
 *
 * @throws PlanInputError naming the field (e.g. `stages.1.causes.0`) and rule broken
 */
export function evaluatePlan(input: PlanInput, stages: PlanStep[]): PlanSummary {
  const inputIssues = validatePlanInput(input);
  if (inputIssues.length > 0) throw new PlanInputError(inputIssues);
  const model = buildModel(input);
  const { steps, issues } = stepsFromPlan(model, stages);
  if (issues.length > 0) throw new PlanInputError(issues);
  return summarise(model, steps);
}
