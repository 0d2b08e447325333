import { isFiniteNumber, LikelihoodIssue, throwIfAny } from './errors';

/** One verified outcome's credit to a cause (fractional when one stage replaced several parts). */
export interface OutcomeCredit {
  /** The cause credited; null = a cause not listed. */
  causeKey: string | null;
  /** Fractional credit in [0, 1]. */
  weight: number;
  userId: string;
  /** null for a technician working outside any shop (a skilled owner): only the user cap applies. */
  shopId: string | null;
}

/** Most total outcome weight one user / one shop may contribute to one (code, scope) posterior. */
export interface InfluenceCaps {
  perUser: number;
  perShop: number;
}

export interface CappedCounts {
  /** Capped counts per listed cause key, ready for `dirichletPosterior`. */
  counts: Record<string, number>;
  /** Capped count of outcomes credited to a cause not listed. */
  unlisted: number;
  /** Sum of all capped counts. */
  total: number;
  /** True when any user's or shop's credits were scaled down. */
  capped: boolean;
}

function outcomeIssues(outcomes: unknown, caps: unknown): LikelihoodIssue[] {
  const issues: LikelihoodIssue[] = [];
  if (!Array.isArray(outcomes)) {
    issues.push({ field: 'outcomes', message: 'must be an array' });
  } else {
    outcomes.forEach((o: unknown, i) => {
      const c = o as Partial<OutcomeCredit> | null;
      if (c === null || typeof c !== 'object') {
        issues.push({ field: `outcomes.${i}`, message: 'must be an object' });
        return;
      }
      if (c.causeKey !== null && (typeof c.causeKey !== 'string' || c.causeKey.length === 0)) {
        issues.push({ field: `outcomes.${i}.causeKey`, message: 'must be a non-empty string, or null for a cause not listed' });
      }
      if (!isFiniteNumber(c.weight) || c.weight < 0 || c.weight > 1) {
        issues.push({ field: `outcomes.${i}.weight`, message: 'must be a number in [0, 1]' });
      }
      if (typeof c.userId !== 'string' || c.userId.length === 0) {
        issues.push({ field: `outcomes.${i}.userId`, message: 'must be a non-empty string' });
      }
      if (c.shopId !== null && (typeof c.shopId !== 'string' || c.shopId.length === 0)) {
        issues.push({ field: `outcomes.${i}.shopId`, message: 'must be a non-empty string or null' });
      }
    });
  }
  const k = caps as Partial<InfluenceCaps> | null;
  if (k === null || typeof k !== 'object') {
    issues.push({ field: 'caps', message: 'must be an object with perUser and perShop' });
  } else {
    // Infinity is allowed: it switches a cap off.
    for (const f of ['perUser', 'perShop'] as const) {
      const v = k[f];
      if (typeof v !== 'number' || Number.isNaN(v) || v <= 0) {
        issues.push({ field: `caps.${f}`, message: 'must be a number > 0 (Infinity for no cap)' });
      }
    }
  }
  return issues;
}

function scaleGroups(weights: number[], groupOf: Array<string | null>, cap: number): boolean {
  const sums = new Map<string, number>();
  groupOf.forEach((g, i) => {
    if (g !== null) sums.set(g, (sums.get(g) ?? 0) + weights[i]);
  });
  let scaled = false;
  groupOf.forEach((g, i) => {
    if (g === null) return;
    const sum = sums.get(g) ?? 0;
    if (sum > cap) {
      weights[i] *= cap / sum;
      scaled = true;
    }
  });
  return scaled;
}

/**
 * Limits how far one user or one shop can move a likelihood: each user's credits are
 * scaled down proportionally so their sum is at most `perUser`, then each shop's (after
 * the user step) so theirs is at most `perShop`. Proportional scaling keeps the mix of
 * causes a contributor reported while bounding its weight, so a burst of reports adds at
 * most `perUser` to N and moves any p_i by at most perUser / (α + N_others + perUser).
 *
 * @throws LikelihoodInputError naming the field and rule broken
 */
export function capInfluence(outcomes: OutcomeCredit[], caps: InfluenceCaps): CappedCounts {
  throwIfAny(outcomeIssues(outcomes, caps));
  const weights = outcomes.map((o) => o.weight);
  const byUser = scaleGroups(weights, outcomes.map((o) => o.userId), caps.perUser);
  const byShop = scaleGroups(weights, outcomes.map((o) => o.shopId), caps.perShop);
  const counts = new Map<string, number>();
  let unlisted = 0;
  let total = 0;
  outcomes.forEach((o, i) => {
    if (o.causeKey === null) unlisted += weights[i];
    else counts.set(o.causeKey, (counts.get(o.causeKey) ?? 0) + weights[i]);
    total += weights[i];
  });
  return { counts: Object.fromEntries(counts), unlisted, total, capped: byUser || byShop };
}
