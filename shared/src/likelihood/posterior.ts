import { betaInterval, DEFAULT_CREDIBLE_LEVEL } from './beta';
import { isFiniteNumber, LikelihoodIssue, ownValue, SUM_TOLERANCE, throwIfAny } from './errors';

/** A curated possible cause with its prior weight; the weights of one code sum to at most 1. */
export interface PriorCause {
  key: string;
  weight: number;
}

/** Key under which the mass of "a cause not listed" is reported. */
export const UNLISTED_KEY = '__unlisted__';

export interface CauseLikelihood {
  key: string;
  /** Posterior mean p_i = (α·w_i + n_i) / (α + N). */
  probability: number;
  /** Equal-tailed credible interval of the Beta marginal at the requested level. */
  lower: number;
  upper: number;
  /**
   * Outcomes n_i counted directly at this scope (after influence caps). Outcomes at
   * more general scopes reach this posterior only through its prior, and are reported
   * separately as `inheritedEvidence`.
   */
  evidence: number;
  /** Outcomes of this cause at the more general scopes of a back-off chain (0 for a single level). */
  inheritedEvidence: number;
  /** The prior weight w_i used at this scope (for back-off: the posterior of the level above). */
  priorWeight: number;
}

export interface PosteriorResult {
  causes: CauseLikelihood[];
  /** The mass of a cause not listed, under key `__unlisted__`. */
  unlisted: CauseLikelihood;
  /** N: every outcome counted at this scope, unlisted ones included. */
  totalEvidence: number;
}

export interface BackoffLevel {
  scope: string;
  counts: Record<string, number>;
  unlisted: number;
}

export interface BackoffResult extends PosteriorResult {
  /** The posterior at each scope, general → specific; the last one equals the top-level result. */
  levels: Array<{ scope: string; posterior: PosteriorResult }>;
}

function priorIssues(priors: unknown): LikelihoodIssue[] {
  if (!Array.isArray(priors)) return [{ field: 'priors', message: 'must be an array' }];
  const issues: LikelihoodIssue[] = [];
  const seen = new Set<string>();
  let sum = 0;
  priors.forEach((prior: unknown, i) => {
    const c = prior as Partial<PriorCause> | null;
    if (c === null || typeof c !== 'object') {
      issues.push({ field: `priors.${i}`, message: 'must be an object with key and weight' });
      return;
    }
    if (typeof c.key !== 'string' || c.key.length === 0) {
      issues.push({ field: `priors.${i}.key`, message: 'must be a non-empty string' });
    } else if (c.key === UNLISTED_KEY) {
      issues.push({ field: `priors.${i}.key`, message: `'${UNLISTED_KEY}' is reserved for causes not listed` });
    } else if (seen.has(c.key)) {
      issues.push({ field: `priors.${i}.key`, message: `duplicate key '${c.key}'` });
    } else {
      seen.add(c.key);
    }
    if (!isFiniteNumber(c.weight) || c.weight < 0 || c.weight > 1) {
      issues.push({ field: `priors.${i}.weight`, message: 'must be a number in [0, 1]' });
    } else {
      sum += c.weight;
    }
  });
  if (sum > 1 + SUM_TOLERANCE) {
    issues.push({ field: 'priors', message: `weights sum to ${sum}, must be at most 1` });
  }
  return issues;
}

function countIssues(
  counts: unknown,
  unlisted: unknown,
  keys: Set<string>,
  prefix: string,
  unlistedField: string,
): LikelihoodIssue[] {
  const issues: LikelihoodIssue[] = [];
  if (counts === null || typeof counts !== 'object' || Array.isArray(counts)) {
    issues.push({ field: prefix, message: 'must be an object of cause key → count' });
  } else {
    for (const [key, n] of Object.entries(counts as Record<string, unknown>)) {
      if (!keys.has(key)) {
        issues.push({
          field: `${prefix}.${key}`,
          message: 'is not a listed cause; outcomes of causes not listed belong in the unlisted count',
        });
      }
      if (!isFiniteNumber(n) || n < 0) issues.push({ field: `${prefix}.${key}`, message: 'must be a finite number ≥ 0' });
    }
  }
  if (!isFiniteNumber(unlisted) || unlisted < 0) {
    issues.push({ field: unlistedField, message: 'must be a finite number ≥ 0' });
  }
  return issues;
}

function strengthAndLevelIssues(alpha: unknown, level: unknown): LikelihoodIssue[] {
  const issues: LikelihoodIssue[] = [];
  if (!isFiniteNumber(alpha) || alpha <= 0) issues.push({ field: 'alpha', message: 'must be a finite number > 0' });
  if (!isFiniteNumber(level) || level <= 0 || level >= 1) {
    issues.push({ field: 'level', message: 'must be a number strictly between 0 and 1' });
  }
  return issues;
}

function likelihood(
  key: string,
  priorWeight: number,
  n: number,
  alpha: number,
  total: number,
  level: number,
  inheritedEvidence: number,
): CauseLikelihood {
  const a = alpha * priorWeight + n;
  // Rounding can leave b a hair below 0 when one cause holds all the mass.
  const b = Math.max(0, alpha + total - a);
  const [lower, upper] = betaInterval(a, b, level);
  return { key, probability: a / (alpha + total), lower, upper, evidence: n, inheritedEvidence, priorWeight };
}

function posteriorUnchecked(
  priors: PriorCause[],
  counts: Record<string, number>,
  unlistedCount: number,
  alpha: number,
  level: number,
  inherited: Record<string, number>,
): PosteriorResult {
  const listedWeight = priors.reduce((s, c) => s + c.weight, 0);
  const unlistedWeight = Math.max(0, 1 - listedWeight);
  const total = priors.reduce((s, c) => s + ownValue(counts, c.key, 0), 0) + unlistedCount;
  return {
    causes: priors.map((c) =>
      likelihood(c.key, c.weight, ownValue(counts, c.key, 0), alpha, total, level, ownValue(inherited, c.key, 0)),
    ),
    unlisted: likelihood(UNLISTED_KEY, unlistedWeight, unlistedCount, alpha, total, level, ownValue(inherited, UNLISTED_KEY, 0)),
    totalEvidence: total,
  };
}

/**
 * Dirichlet posterior of one (code, scope): p_i = (α·w_i + n_i)/(α + N) with N counting
 * every outcome, unlisted ones included; the unlisted cause has prior weight r = 1 − Σw.
 * Intervals come from the Beta marginal Beta(α·w_i + n_i, α + N − α·w_i − n_i).
 *
 * @param alpha prior strength, in "jobs"
 * @param level credibility of the interval, 0.9 unless given
 * @throws LikelihoodInputError naming the field and rule broken
 */
export function dirichletPosterior(
  priors: PriorCause[],
  counts: Record<string, number>,
  unlistedCount: number,
  alpha: number,
  level: number = DEFAULT_CREDIBLE_LEVEL,
): PosteriorResult {
  const issues = priorIssues(priors);
  const keys = new Set(Array.isArray(priors) ? priors.map((c) => c?.key) : []);
  issues.push(...countIssues(counts, unlistedCount, keys, 'counts', 'unlistedCount'));
  issues.push(...strengthAndLevelIssues(alpha, level));
  throwIfAny(issues);
  return posteriorUnchecked(priors, counts, unlistedCount, alpha, level, {});
}

/**
 * Back-off from general to specific scope: the posterior mean at each level is the prior
 * weight of the next (with the same strength α), so a specific scope with few outcomes
 * stays close to its parent and one with many outcomes follows its own data.
 *
 * @param levels general → specific, e.g. all vehicles, make, make + model
 * @throws LikelihoodInputError naming the field (e.g. `levels.1.counts.maf`) and rule broken
 */
export function backoffPosterior(
  priors: PriorCause[],
  levels: BackoffLevel[],
  alpha: number,
  level: number = DEFAULT_CREDIBLE_LEVEL,
): BackoffResult {
  const issues = priorIssues(priors);
  const keys = new Set(Array.isArray(priors) ? priors.map((c) => c?.key) : []);
  if (!Array.isArray(levels) || levels.length === 0) {
    issues.push({ field: 'levels', message: 'must be a non-empty array, general → specific' });
  } else {
    levels.forEach((l: unknown, i) => {
      const lv = l as Partial<BackoffLevel> | null;
      if (lv === null || typeof lv !== 'object') {
        issues.push({ field: `levels.${i}`, message: 'must be an object with scope, counts and unlisted' });
        return;
      }
      if (typeof lv.scope !== 'string') issues.push({ field: `levels.${i}.scope`, message: 'must be a string' });
      issues.push(...countIssues(lv.counts, lv.unlisted, keys, `levels.${i}.counts`, `levels.${i}.unlisted`));
    });
  }
  issues.push(...strengthAndLevelIssues(alpha, level));
  throwIfAny(issues);

  let weights: PriorCause[] = priors.map((c) => ({ key: c.key, weight: c.weight }));
  const inherited = new Map<string, number>();
  const out: BackoffResult['levels'] = [];
  for (const lv of levels) {
    const posterior = posteriorUnchecked(weights, lv.counts, lv.unlisted, alpha, level, Object.fromEntries(inherited));
    out.push({ scope: lv.scope, posterior });
    weights = posterior.causes.map((c) => ({ key: c.key, weight: c.probability }));
    for (const c of [...posterior.causes, posterior.unlisted]) {
      inherited.set(c.key, (inherited.get(c.key) ?? 0) + c.evidence);
    }
  }
  const last = out[out.length - 1].posterior;
  return { ...last, levels: out };
}
