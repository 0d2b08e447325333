import { solveExact } from './exact';
import { solveHeuristic } from './heuristic';
import { buildModel, Model, Step, summarise } from './model';
import type { Plan, PlanAddOnSaving, PlanInput, PlanOptions, PlanSummary } from './types';
import { DEFAULT_EXACT_LIMIT, PlanInputError, validatePlanInput, validatePlanOptions } from './validate';

/** One cause per stage in the given order; a check-first cause as a one-cause check stage. */
function oneByOne(model: Model, order: number[]): Step[] {
  return order.map((i) => ({ kind: model.canReplace[i] ? 'replace' : 'check', causes: [i] }));
}

function indices(n: number): number[] {
  return Array.from({ length: n }, (_, i) => i);
}

/** "Cheapest part first": ascending replaceCost; ties to the likelier, then input order. */
export function cheapestFirstSteps(model: Model): Step[] {
  return oneByOne(
    model,
    indices(model.n).sort((a, b) => model.replace[a] - model.replace[b] || model.p[b] - model.p[a] || a - b),
  );
}

/** "Most likely first": descending probability; ties to the cheaper, then input order. */
export function mostLikelyFirstSteps(model: Model): Step[] {
  return oneByOne(
    model,
    indices(model.n).sort((a, b) => model.p[b] - model.p[a] || model.replace[a] - model.replace[b] || a - b),
  );
}

function addOnSavings(input: PlanInput, summary: PlanSummary): PlanAddOnSaving[] {
  const out: PlanAddOnSaving[] = [];
  for (const addOn of input.addOns ?? []) {
    const stageIndex = summary.stages.findIndex((s) => s.teardowns.includes(addOn.teardown));
    if (stageIndex < 0) continue;
    out.push({
      key: addOn.key,
      ...(addOn.label === undefined ? {} : { label: addOn.label }),
      teardown: addOn.teardown,
      stageIndex,
      reachProbability: summary.stages[stageIndex].reachProbability,
      savedCost: input.teardowns[addOn.teardown],
    });
  }
  return out;
}

/**
 * The fix path of least expected cost (product.md §3), with the two baselines, what it
 * saves against "cheapest part first", and the add-ons that share an opened teardown.
 *
 * Up to `exactLimit` causes (default 14) the recursion is solved exactly by dynamic
 * programming (`method: 'exact-dp'`, `exact: true`); above it the heuristic of
 * heuristic.ts runs and the result says it is approximate (`exact: false`).
 *
 * @throws PlanInputError with every issue of `validatePlanInput` (field and rule)
 */
export function planFixPath(input: PlanInput, opts?: PlanOptions): Plan {
  const issues = [...validatePlanInput(input), ...validatePlanOptions(opts)];
  if (issues.length > 0) throw new PlanInputError(issues);
  const model = buildModel(input);
  const exactLimit = opts?.exactLimit ?? DEFAULT_EXACT_LIMIT;
  const exact = model.n <= exactLimit;

  const cheapestFirst = summarise(model, cheapestFirstSteps(model));
  const mostLikelyFirst = summarise(model, mostLikelyFirstSteps(model));
  let best: PlanSummary;
  if (exact) {
    best = summarise(model, solveExact(model));
  } else {
    // A heuristic has no optimality guarantee, so never answer worse than a baseline.
    best = [summarise(model, solveHeuristic(model)), mostLikelyFirst, cheapestFirst].reduce((a, b) =>
      b.expectedCost < a.expectedCost ? b : a,
    );
  }
  return {
    ...best,
    exact,
    method: exact ? 'exact-dp' : 'heuristic',
    baselines: { cheapestFirst, mostLikelyFirst },
    addOns: addOnSavings(input, best),
    savingVsCheapestFirst: cheapestFirst.expectedCost - best.expectedCost,
    unlistedProbability: model.unlisted,
  };
}
