/** One problem with an argument: which field, and which rule it breaks. */
export interface LikelihoodIssue {
  field: string;
  message: string;
}

/**
 * Thrown by the likelihood functions when an argument breaks a rule. It carries every
 * problem found (not just the first) so a caller can map them onto fields and answer
 * with a 400 rather than letting a bare exception escape.
 */
export class LikelihoodInputError extends Error {
  readonly issues: LikelihoodIssue[];

  constructor(issues: LikelihoodIssue[]) {
    super(`Invalid likelihood input: ${issues.map((i) => `${i.field}: ${i.message}`).join('; ')}`);
    this.name = 'LikelihoodInputError';
    this.issues = issues;
  }
}

/** Tolerance on "sums to at most 1" so rounding in stored weights is not rejected. */
export const SUM_TOLERANCE = 1e-9;

export function isFiniteNumber(x: unknown): x is number {
  return typeof x === 'number' && Number.isFinite(x);
}

export function throwIfAny(issues: LikelihoodIssue[]): void {
  if (issues.length > 0) throw new LikelihoodInputError(issues);
}

/**
 * A record's own value for a key, or the fallback: cause keys come from users, and a key
 * such as `constructor` must not pick up what every object inherits.
 */
export function ownValue<T>(record: Record<string, T>, key: string, fallback: T): T {
  return Object.hasOwn(record, key) ? record[key] : fallback;
}
