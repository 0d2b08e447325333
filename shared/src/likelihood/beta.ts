import betaQuantile from '@stdlib/stats-base-dists-beta-quantile';
import { isFiniteNumber, LikelihoodIssue, throwIfAny } from './errors';

/** Default credibility of the intervals shown next to every likelihood (product brief §2). */
export const DEFAULT_CREDIBLE_LEVEL = 0.9;

export function betaIntervalIssues(a: unknown, b: unknown, level: unknown): LikelihoodIssue[] {
  const issues: LikelihoodIssue[] = [];
  if (!isFiniteNumber(a) || a < 0) issues.push({ field: 'a', message: 'must be a finite number ≥ 0' });
  if (!isFiniteNumber(b) || b < 0) issues.push({ field: 'b', message: 'must be a finite number ≥ 0' });
  if (a === 0 && b === 0) issues.push({ field: 'b', message: 'a and b cannot both be 0' });
  if (!isFiniteNumber(level) || level <= 0 || level >= 1) {
    issues.push({ field: 'level', message: 'must be a number strictly between 0 and 1' });
  }
  return issues;
}

/**
 * Equal-tailed credible interval of Beta(a, b): the (1−level)/2 and (1+level)/2 quantiles.
 *
 * A zero shape parameter is the limit of a cause with no prior weight and no outcomes
 * (or of one holding all of it): the distribution collapses onto 0 (or 1), so the
 * interval is that point rather than NaN.
 *
 * @throws LikelihoodInputError naming `a`, `b` or `level`
 */
export function betaInterval(a: number, b: number, level: number): [number, number] {
  throwIfAny(betaIntervalIssues(a, b, level));
  if (a === 0) return [0, 0];
  if (b === 0) return [1, 1];
  const tail = (1 - level) / 2;
  return [betaQuantile(tail, a, b), betaQuantile(1 - tail, a, b)];
}
