export { evaluatePlan } from './evaluate';
export { planFixPath } from './plan';
export { randomPlanInput, mulberry32 } from './fixtures';
export type { RandomPlanOptions } from './fixtures';
export {
  DEFAULT_EXACT_LIMIT,
  MAX_EXACT_LIMIT,
  MAX_PLAN_CAUSES,
  PlanInputError,
  validatePlanInput,
} from './validate';
export type {
  Plan,
  PlanAddOn,
  PlanAddOnSaving,
  PlanCause,
  PlanInput,
  PlanIssue,
  PlanMethod,
  PlanOptions,
  PlanStage,
  PlanStep,
  PlanSummary,
  StageKind,
} from './types';
