import type { PlanInput, PlanIssue, PlanOptions } from './types';

/** More causes than any code plausibly has; bounds the work one request can ask for. */
export const MAX_PLAN_CAUSES = 200;
/** The exact search is 2·3^n; beyond 16 a request could run for minutes. */
export const MAX_EXACT_LIMIT = 16;
export const DEFAULT_EXACT_LIMIT = 14;
/** Tolerance on "probabilities sum to at most 1" so rounded stored values are not rejected. */
export const PROBABILITY_SUM_TOLERANCE = 1e-9;

/**
 * Thrown by `planFixPath` and `evaluatePlan` for input that `validatePlanInput` (or the
 * stage checks of `evaluatePlan`) rejects; `issues` name each field and rule so the
 * server can answer with a 400 that a form maps onto its fields.
 */
export class PlanInputError extends Error {
  readonly issues: PlanIssue[];

  constructor(issues: PlanIssue[]) {
    super(`Invalid fix-path input: ${issues.map((i) => `${i.field}: ${i.message}`).join('; ')}`);
    this.name = 'PlanInputError';
    this.issues = issues;
  }
}

function isRecord(x: unknown): x is Record<string, unknown> {
  return x !== null && typeof x === 'object' && !Array.isArray(x);
}

function isCost(x: unknown): x is number {
  return typeof x === 'number' && Number.isFinite(x) && x >= 0;
}

function isProbability(x: unknown): x is number {
  return typeof x === 'number' && Number.isFinite(x) && x >= 0 && x <= 1;
}

function isOptionalLabel(x: unknown): boolean {
  return x === undefined || typeof x === 'string';
}

const COST_RULE = 'must be a finite number ≥ 0';
const PROBABILITY_RULE = 'must be a number in [0, 1]';

/**
 * The part every entry of a keyed list (causes, add-ons) shares: an object with a non-empty key,
 * unique in its list, and an optional label. False when it is no object at all (nothing more to check).
 */
function checkKeyedEntry(raw: unknown, field: string, seen: Set<string>, issues: PlanIssue[]): raw is Record<string, unknown> {
  if (!isRecord(raw)) {
    issues.push({ field, message: 'must be an object' });
    return false;
  }
  if (typeof raw.key !== 'string' || raw.key.length === 0) {
    issues.push({ field: `${field}.key`, message: 'must be a non-empty string' });
  } else if (seen.has(raw.key)) {
    issues.push({ field: `${field}.key`, message: `duplicate key '${raw.key}'` });
  } else {
    seen.add(raw.key);
  }
  if (!isOptionalLabel(raw.label)) issues.push({ field: `${field}.label`, message: 'must be a string when given' });
  return true;
}

/**
 * Every problem with a fix-path input, each naming its field (`causes.2.probability`,
 * `teardowns.K`, `addOns.0.teardown`, …) and the rule it breaks. Empty = valid.
 */
export function validatePlanInput(input: unknown): PlanIssue[] {
  const issues: PlanIssue[] = [];
  if (!isRecord(input)) return [{ field: '', message: 'must be an object with causes, teardowns, verificationCost and unlistedProbability' }];

  const teardownKeys = new Set<string>();
  if (!isRecord(input.teardowns)) {
    issues.push({ field: 'teardowns', message: 'must be an object of teardown key → opening cost' });
  } else {
    for (const [key, cost] of Object.entries(input.teardowns)) {
      teardownKeys.add(key);
      if (!isCost(cost)) issues.push({ field: `teardowns.${key}`, message: `opening cost ${COST_RULE}` });
    }
  }
  const teardownsOk = isRecord(input.teardowns);
  /** A reference to a teardown must name one of `teardowns` (when those are readable at all). */
  const checkTeardownRef = (value: unknown, field: string, rule: string) => {
    if (typeof value !== 'string') issues.push({ field, message: rule });
    else if (teardownsOk && !teardownKeys.has(value)) issues.push({ field, message: `unknown teardown '${value}': not a key of teardowns` });
  };

  let probabilitySum = 0;
  if (!Array.isArray(input.causes)) {
    issues.push({ field: 'causes', message: 'must be an array' });
  } else {
    if (input.causes.length > MAX_PLAN_CAUSES) {
      issues.push({ field: 'causes', message: `has ${input.causes.length} causes, at most ${MAX_PLAN_CAUSES} are allowed` });
    }
    const seen = new Set<string>();
    input.causes.forEach((raw: unknown, i) => {
      const f = `causes.${i}`;
      if (!checkKeyedEntry(raw, f, seen, issues)) return;
      if (!isProbability(raw.probability)) issues.push({ field: `${f}.probability`, message: PROBABILITY_RULE });
      else probabilitySum += raw.probability;
      if (!isCost(raw.replaceCost)) issues.push({ field: `${f}.replaceCost`, message: COST_RULE });
      if (raw.checkCost !== undefined && !isCost(raw.checkCost)) {
        issues.push({ field: `${f}.checkCost`, message: `${COST_RULE} when given` });
      }
      if (raw.checkFirst !== undefined && typeof raw.checkFirst !== 'boolean') {
        issues.push({ field: `${f}.checkFirst`, message: 'must be a boolean when given' });
      } else if (raw.checkFirst === true && raw.checkCost === undefined) {
        issues.push({ field: `${f}.checkFirst`, message: 'a cause that must be checked first needs a checkCost' });
      }
      if (raw.teardown !== undefined) checkTeardownRef(raw.teardown, `${f}.teardown`, 'must be a teardown key (string) when given');
    });
  }

  if (!isCost(input.verificationCost)) issues.push({ field: 'verificationCost', message: COST_RULE });
  if (input.escalationCost !== undefined && !isCost(input.escalationCost)) {
    issues.push({ field: 'escalationCost', message: `${COST_RULE}, or absent when escalation is not offered` });
  }
  if (!isProbability(input.unlistedProbability)) {
    issues.push({ field: 'unlistedProbability', message: PROBABILITY_RULE });
  } else if (probabilitySum + input.unlistedProbability > 1 + PROBABILITY_SUM_TOLERANCE) {
    issues.push({
      field: 'causes',
      message: `probabilities plus unlistedProbability sum to ${probabilitySum + input.unlistedProbability}, must be at most 1`,
    });
  }

  if (input.addOns !== undefined) {
    if (!Array.isArray(input.addOns)) {
      issues.push({ field: 'addOns', message: 'must be an array when given' });
    } else {
      const seen = new Set<string>();
      input.addOns.forEach((raw: unknown, i) => {
        const f = `addOns.${i}`;
        if (!checkKeyedEntry(raw, f, seen, issues)) return;
        checkTeardownRef(raw.teardown, `${f}.teardown`, 'must be a teardown key (string)');
        if (!isCost(raw.cost)) issues.push({ field: `${f}.cost`, message: COST_RULE });
      });
    }
  }
  return issues;
}

export function validatePlanOptions(opts: unknown): PlanIssue[] {
  if (opts === undefined) return [];
  if (!isRecord(opts)) return [{ field: 'opts', message: 'must be an object when given' }];
  const limit = (opts as PlanOptions).exactLimit;
  if (limit !== undefined && (!Number.isInteger(limit) || limit < 0 || limit > MAX_EXACT_LIMIT)) {
    return [{ field: 'opts.exactLimit', message: `must be an integer from 0 to ${MAX_EXACT_LIMIT}` }];
  }
  return [];
}

export function assertValidPlanInput(input: unknown): asserts input is PlanInput {
  const issues = validatePlanInput(input);
  if (issues.length > 0) throw new PlanInputError(issues);
}
