import { isFiniteNumber, LikelihoodIssue, ownValue, SUM_TOLERANCE, throwIfAny } from './errors';

export interface KeyedProbability {
  key: string;
  probability: number;
}

export interface ConditionedLikelihoods {
  /** Same keys and order as given; excluded causes get probability 0. */
  causes: KeyedProbability[];
  /** Renormalised mass of a cause not listed. */
  unlisted: number;
}

function probabilityIssues(probs: unknown, unlisted: unknown): { issues: LikelihoodIssue[]; keys: Set<string> } {
  const issues: LikelihoodIssue[] = [];
  const keys = new Set<string>();
  let sum = 0;
  if (!Array.isArray(probs)) {
    issues.push({ field: 'probs', message: 'must be an array' });
  } else {
    probs.forEach((p: unknown, i) => {
      const c = p as Partial<KeyedProbability> | null;
      if (c === null || typeof c !== 'object') {
        issues.push({ field: `probs.${i}`, message: 'must be an object with key and probability' });
        return;
      }
      if (typeof c.key !== 'string' || c.key.length === 0) {
        issues.push({ field: `probs.${i}.key`, message: 'must be a non-empty string' });
      } else if (keys.has(c.key)) {
        issues.push({ field: `probs.${i}.key`, message: `duplicate key '${c.key}'` });
      } else {
        keys.add(c.key);
      }
      if (!isFiniteNumber(c.probability) || c.probability < 0 || c.probability > 1) {
        issues.push({ field: `probs.${i}.probability`, message: 'must be a number in [0, 1]' });
      } else {
        sum += c.probability;
      }
    });
  }
  if (!isFiniteNumber(unlisted) || unlisted < 0 || unlisted > 1) {
    issues.push({ field: 'unlisted', message: 'must be a number in [0, 1]' });
  } else if (sum + unlisted > 1 + SUM_TOLERANCE) {
    issues.push({ field: 'probs', message: `probabilities plus unlisted sum to ${sum + unlisted}, must be at most 1` });
  }
  return { issues, keys };
}

/**
 * In-job Bayesian conditioning on "these causes are ruled out" (checked good, or
 * replaced without the code going away): excluded causes drop to 0 and the rest,
 * the unlisted mass included, are rescaled to sum to 1.
 *
 * If every cause with any mass was excluded, the evidence contradicts the listed causes,
 * so all the mass goes to a cause not listed (unlisted = 1) rather than dividing by 0.
 *
 * @throws LikelihoodInputError naming the field (e.g. `excluded.1`) and rule broken
 */
export function conditionOnExcluded(
  probs: KeyedProbability[],
  unlisted: number,
  excluded: string[],
): ConditionedLikelihoods {
  const { issues, keys } = probabilityIssues(probs, unlisted);
  if (!Array.isArray(excluded)) {
    issues.push({ field: 'excluded', message: 'must be an array of cause keys' });
  } else {
    excluded.forEach((k: unknown, i) => {
      if (typeof k !== 'string' || !keys.has(k)) {
        issues.push({ field: `excluded.${i}`, message: `'${String(k)}' is not one of the causes given` });
      }
    });
  }
  throwIfAny(issues);
  const out = new Set(excluded);
  const remaining = probs.reduce((s, c) => s + (out.has(c.key) ? 0 : c.probability), 0) + unlisted;
  if (remaining <= 0) {
    return { causes: probs.map((c) => ({ key: c.key, probability: 0 })), unlisted: 1 };
  }
  return {
    causes: probs.map((c) => ({ key: c.key, probability: out.has(c.key) ? 0 : c.probability / remaining })),
    unlisted: unlisted / remaining,
  };
}

/**
 * Splits the credit of one fix among the parts replaced together in the stage that
 * cleared the code, in proportion to their current likelihoods (the posterior
 * probability that each was the cause, given that one of them was). The shares sum to 1;
 * when every replaced part currently has likelihood 0 there is nothing to weigh by, so
 * the split is equal.
 *
 * @param current likelihood per cause key; every replaced key must be present
 * @throws LikelihoodInputError naming the field (e.g. `replacedKeys.0`) and rule broken
 */
export function fractionalCredit(replacedKeys: string[], current: Record<string, number>): Record<string, number> {
  const issues: LikelihoodIssue[] = [];
  const currentOk = current !== null && typeof current === 'object' && !Array.isArray(current);
  if (!currentOk) issues.push({ field: 'current', message: 'must be an object of cause key → likelihood' });
  if (!Array.isArray(replacedKeys) || replacedKeys.length === 0) {
    issues.push({ field: 'replacedKeys', message: 'must be a non-empty array of cause keys' });
  } else {
    const seen = new Set<string>();
    replacedKeys.forEach((k: unknown, i) => {
      if (typeof k !== 'string' || k.length === 0) {
        issues.push({ field: `replacedKeys.${i}`, message: 'must be a non-empty string' });
        return;
      }
      if (seen.has(k)) issues.push({ field: `replacedKeys.${i}`, message: `duplicate key '${k}'` });
      seen.add(k);
      if (!currentOk) return;
      const p: unknown = ownValue<unknown>(current, k, undefined);
      if (p === undefined) issues.push({ field: `current.${k}`, message: 'is missing: every replaced cause needs its current likelihood' });
      else if (!isFiniteNumber(p) || p < 0 || p > 1) issues.push({ field: `current.${k}`, message: 'must be a number in [0, 1]' });
    });
  }
  throwIfAny(issues);
  const total = replacedKeys.reduce((s, k) => s + current[k], 0);
  return Object.fromEntries(
    replacedKeys.map((k) => [k, total > 0 ? current[k] / total : 1 / replacedKeys.length] as const),
  );
}
