/// <reference path="./support/jstat.d.ts" />
import fc from 'fast-check';
import { jStat } from 'jstat';
import {
  backoffPosterior,
  betaInterval,
  capInfluence,
  conditionOnExcluded,
  dirichletPosterior,
  fractionalCredit,
  LikelihoodInputError,
  OutcomeCredit,
  PriorCause,
  UNLISTED_KEY,
} from '../src/likelihood';

function issuesOf(fn: () => unknown): Array<{ field: string; message: string }> {
  try {
    fn();
  } catch (e) {
    if (e instanceof LikelihoodInputError) return e.issues;
    throw e;
  }
  throw new Error('expected a LikelihoodInputError');
}

// domain-reference.md §6 "Learning from outcomes", Ex. 5 (values computed there with scipy).
const EX5_PRIORS: PriorCause[] = [
  { key: 'a', weight: 0.4 },
  { key: 'b', weight: 0.3 },
  { key: 'c', weight: 0.2 },
  { key: 'd', weight: 0.1 },
];
const EX5_COUNTS = { a: 6, b: 10, c: 3, d: 1 };

describe('dirichletPosterior', () => {
  it('reproduces Ex. 5: means and 95 % intervals (domain-reference §6, scipy)', () => {
    const post = dirichletPosterior(EX5_PRIORS, EX5_COUNTS, 0, 10, 0.95);
    // Source: §6 Ex. 5, posterior (10, 13, 5, 2)/30 = .3333 / .4333 / .1667 / .0667.
    const means = [0.3333, 0.4333, 0.1667, 0.0667];
    // Source: §6 Ex. 5, scipy intervals printed to 3 decimals (so compared to ±0.0005).
    const intervals: Array<[number, number]> = [
      [0.179, 0.508],
      [0.264, 0.611],
      [0.058, 0.317],
      [0.008, 0.178],
    ];
    post.causes.forEach((c, i) => {
      expect(Math.abs(c.probability - means[i])).toBeLessThan(5e-5);
      expect(Math.abs(c.lower - intervals[i][0])).toBeLessThanOrEqual(5e-4 + 1e-12);
      expect(Math.abs(c.upper - intervals[i][1])).toBeLessThanOrEqual(5e-4 + 1e-12);
    });
    expect(post.totalEvidence).toBe(20);
    expect(post.unlisted.probability).toBeCloseTo(0, 12);
    expect(post.causes.map((c) => c.evidence)).toEqual([6, 10, 3, 1]);
  });

  it('gives posterior means equal to (α·w_i + n_i)/(α + N) computed directly (product.md §2)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.record({ w: fc.double({ min: 0, max: 1, noNaN: true }), n: fc.integer({ min: 0, max: 40 }) }), {
          minLength: 1,
          maxLength: 8,
        }),
        fc.double({ min: 0, max: 0.5, noNaN: true }),
        fc.integer({ min: 0, max: 10 }),
        fc.double({ min: 0.5, max: 50, noNaN: true }),
        (rows, rFraction, unlistedCount, alpha) => {
          const sum = rows.reduce((s, r) => s + r.w, 0) || 1;
          const priors = rows.map((r, i) => ({ key: `k${i}`, weight: (r.w / sum) * (1 - rFraction) }));
          const counts = Object.fromEntries(rows.map((r, i) => [`k${i}`, r.n]));
          const N = rows.reduce((s, r) => s + r.n, 0) + unlistedCount;
          const post = dirichletPosterior(priors, counts, unlistedCount, alpha);
          post.causes.forEach((c, i) => {
            expect(c.probability).toBeCloseTo((alpha * priors[i].weight + rows[i].n) / (alpha + N), 12);
          });
          const r = 1 - priors.reduce((s, p) => s + p.weight, 0);
          expect(post.unlisted.probability).toBeCloseTo((alpha * r + unlistedCount) / (alpha + N), 12);
          const total = post.causes.reduce((s, c) => s + c.probability, 0) + post.unlisted.probability;
          expect(total).toBeCloseTo(1, 12);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('uses a 90 % interval by default, matching jstat (reference library)', () => {
    const post = dirichletPosterior(EX5_PRIORS, EX5_COUNTS, 0, 10);
    // Beta(13, 17) for cause b (Ex. 5); jStat.beta.inv is the independent reference.
    expect(post.causes[1].lower).toBeCloseTo(jStat.beta.inv(0.05, 13, 17), 6);
    expect(post.causes[1].upper).toBeCloseTo(jStat.beta.inv(0.95, 13, 17), 6);
  });

  it('reports the unlisted mass under its own key, with evidence from unlisted outcomes', () => {
    const post = dirichletPosterior([{ key: 'x', weight: 0.7 }], { x: 2 }, 3, 10);
    expect(post.unlisted.key).toBe(UNLISTED_KEY);
    expect(post.unlisted.priorWeight).toBeCloseTo(0.3, 12);
    expect(post.unlisted.evidence).toBe(3);
    // (10·0.3 + 3)/(10 + 5), the formula of product.md §2.
    expect(post.unlisted.probability).toBeCloseTo(6 / 15, 12);
  });

  it('treats cause keys that are also object property names as plain keys', () => {
    // Formula of product.md §2 with no outcomes: the posterior equals the prior.
    const post = dirichletPosterior([{ key: 'constructor', weight: 0.6 }, { key: 'toString', weight: 0.4 }], {}, 0, 10);
    expect(post.causes.map((c) => c.probability)).toEqual([0.6, 0.4]);
    const capped = capInfluence([{ causeKey: 'constructor', weight: 1, userId: 'u', shopId: null }], { perUser: 1, perShop: 1 });
    expect(capped.counts).toEqual({ constructor: 1 });
  });

  it('names the field and rule of bad input instead of throwing something else', () => {
    const fields = (fn: () => unknown): string[] => issuesOf(fn).map((i) => i.field);
    expect(fields(() => dirichletPosterior([{ key: 'a', weight: 0.8 }, { key: 'b', weight: 0.4 }], {}, 0, 10))).toContain('priors');
    expect(fields(() => dirichletPosterior(EX5_PRIORS, { zz: 1 }, 0, 10))).toEqual(['counts.zz']);
    expect(fields(() => dirichletPosterior(EX5_PRIORS, { a: -1 }, 0, 10))).toEqual(['counts.a']);
    expect(fields(() => dirichletPosterior(EX5_PRIORS, {}, Number.NaN, 10))).toEqual(['unlistedCount']);
    expect(fields(() => dirichletPosterior(EX5_PRIORS, {}, 0, 0))).toEqual(['alpha']);
    expect(fields(() => dirichletPosterior(EX5_PRIORS, {}, 0, 10, 1))).toEqual(['level']);
    expect(fields(() => dirichletPosterior([{ key: 'a', weight: 0.1 }, { key: 'a', weight: 0.1 }], {}, 0, 10))).toEqual([
      'priors.1.key',
    ]);
    expect(fields(() => dirichletPosterior(null as unknown as PriorCause[], {}, 0, 10))).toContain('priors');
  });
});

describe('betaInterval', () => {
  it('matches the closed form for 0 of 5 fixes, Beta(1, 6) (domain-reference §6 "Fix rate of one action")', () => {
    const [lo, hi] = betaInterval(1, 6, 0.95);
    // Closed form from §6: [1 − 0.975^(1/6), 1 − 0.025^(1/6)] = [0.00421, 0.459].
    expect(lo).toBeCloseTo(1 - 0.975 ** (1 / 6), 10);
    expect(hi).toBeCloseTo(1 - 0.025 ** (1 / 6), 10);
    expect(Math.abs(lo - 0.00421)).toBeLessThan(5e-6);
    expect(Math.abs(hi - 0.459)).toBeLessThan(5e-4);
  });

  it('matches 7 fixes in 10 with a Beta(1,1) prior: Beta(8,4), [0.390, 0.891] (domain-reference §6)', () => {
    const [lo, hi] = betaInterval(8, 4, 0.95);
    expect(Math.abs(lo - 0.39)).toBeLessThan(5e-4);
    expect(Math.abs(hi - 0.891)).toBeLessThan(5e-4);
  });

  it('agrees with jstat (jStat.beta.inv, reference library) to 1e-6 on random shapes and levels', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.2, max: 80, noNaN: true }),
        fc.double({ min: 0.2, max: 80, noNaN: true }),
        fc.double({ min: 0.5, max: 0.99, noNaN: true }),
        (a, b, level) => {
          const [lo, hi] = betaInterval(a, b, level);
          expect(Math.abs(lo - jStat.beta.inv((1 - level) / 2, a, b))).toBeLessThan(1e-6);
          expect(Math.abs(hi - jStat.beta.inv((1 + level) / 2, a, b))).toBeLessThan(1e-6);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('collapses to a point when a shape parameter is 0, and rejects bad parameters by name', () => {
    expect(betaInterval(0, 5, 0.9)).toEqual([0, 0]);
    expect(betaInterval(5, 0, 0.9)).toEqual([1, 1]);
    expect(issuesOf(() => betaInterval(-1, 2, 0.9)).map((i) => i.field)).toEqual(['a']);
    expect(issuesOf(() => betaInterval(1, 2, 0)).map((i) => i.field)).toEqual(['level']);
    expect(issuesOf(() => betaInterval(0, 0, 0.9)).map((i) => i.field)).toEqual(['b']);
  });
});

describe('backoffPosterior', () => {
  it('returns the priors when no scope has outcomes', () => {
    const result = backoffPosterior(
      EX5_PRIORS.map((p) => ({ ...p, weight: p.weight * 0.9 })),
      [
        { scope: 'all', counts: {}, unlisted: 0 },
        { scope: 'make', counts: {}, unlisted: 0 },
        { scope: 'make+model', counts: {}, unlisted: 0 },
      ],
      10,
    );
    result.causes.forEach((c, i) => expect(c.probability).toBeCloseTo(EX5_PRIORS[i].weight * 0.9, 12));
    expect(result.unlisted.probability).toBeCloseTo(0.1, 12);
    expect(result.levels.map((l) => l.scope)).toEqual(['all', 'make', 'make+model']);
    expect(result.totalEvidence).toBe(0);
  });

  it('uses the posterior of each scope as the prior of the next (product.md §2)', () => {
    const general = { scope: 'all', counts: { a: 6, b: 10, c: 3, d: 1 }, unlisted: 2 };
    const specific = { scope: 'make', counts: { c: 4 }, unlisted: 0 };
    const result = backoffPosterior(EX5_PRIORS, [general, specific], 10, 0.9);
    // Independent composition: Ex. 5's posterior, then a second conjugate update.
    const first = dirichletPosterior(EX5_PRIORS, general.counts, general.unlisted, 10);
    const second = dirichletPosterior(
      first.causes.map((c) => ({ key: c.key, weight: c.probability })),
      specific.counts,
      specific.unlisted,
      10,
    );
    result.causes.forEach((c, i) => {
      expect(c.probability).toBeCloseTo(second.causes[i].probability, 12);
      expect(c.lower).toBeCloseTo(second.causes[i].lower, 12);
    });
    expect(result.causes[2].evidence).toBe(4);
    expect(result.causes[2].inheritedEvidence).toBe(3);
    expect(result.unlisted.inheritedEvidence).toBe(2);
    expect(result.levels[0].posterior.causes[0].probability).toBeCloseTo(first.causes[0].probability, 12);
  });

  it('names the level and key of a bad count', () => {
    const issues = issuesOf(() => backoffPosterior(EX5_PRIORS, [{ scope: 'all', counts: { q: 1 }, unlisted: 0 }], 10));
    expect(issues.map((i) => i.field)).toEqual(['levels.0.counts.q']);
  });
});

describe('capInfluence', () => {
  const others: OutcomeCredit[] = Array.from({ length: 20 }, (_, i) => ({
    causeKey: (['a', 'b', 'c', 'd'] as const)[i % 4],
    weight: 1,
    userId: `u${i}`,
    shopId: `s${i}`,
  }));

  it('limits one user posting 50 outcomes to the bound the cap allows', () => {
    const caps = { perUser: 2, perShop: 5 };
    const burst: OutcomeCredit[] = Array.from({ length: 50 }, () => ({ causeKey: 'd', weight: 1, userId: 'x', shopId: 'sx' }));
    const alpha = 10;
    const before = capInfluence(others, caps);
    const after = capInfluence([...others, ...burst], caps);
    expect(after.capped).toBe(true);
    expect(after.total - before.total).toBeCloseTo(caps.perUser, 12);
    const p0 = dirichletPosterior(EX5_PRIORS, before.counts, before.unlisted, alpha).causes[3].probability;
    const p1 = dirichletPosterior(EX5_PRIORS, after.counts, after.unlisted, alpha).causes[3].probability;
    // Bound derived from p = (α·w + n)/(α + N): adding weight c ≤ perUser to one cause moves
    // it by at most (1 − p0)·c/(α + N + c).
    const N = before.total;
    const bound = ((1 - p0) * caps.perUser) / (alpha + N + caps.perUser);
    expect(p1 - p0).toBeGreaterThan(0);
    expect(p1 - p0).toBeLessThanOrEqual(bound + 1e-12);
    // Without the cap the same burst would move it far further.
    const uncapped = capInfluence([...others, ...burst], { perUser: Infinity, perShop: Infinity });
    const pFree = dirichletPosterior(EX5_PRIORS, uncapped.counts, uncapped.unlisted, alpha).causes[3].probability;
    expect(pFree - p0).toBeGreaterThan(5 * bound);
  });

  it('adds up users who each stay within the cap', () => {
    // product.md §2: the cap only limits a contributor beyond it; below it credits are summed as given.
    const outcomes: OutcomeCredit[] = [
      { causeKey: 'a', weight: 1, userId: 'u1', shopId: 's1' },
      { causeKey: 'a', weight: 0.5, userId: 'u2', shopId: 's2' },
      { causeKey: 'b', weight: 0.5, userId: 'u2', shopId: 's2' },
      { causeKey: null, weight: 1, userId: 'u3', shopId: null },
    ];
    const result = capInfluence(outcomes, { perUser: 2, perShop: 3 });
    expect(result).toEqual({ counts: { a: 1.5, b: 0.5 }, unlisted: 1, total: 3, capped: false });
  });

  it('scales a shop whose users together exceed the shop cap, keeping their mix', () => {
    // Users each capped at 2 (4 → 2), then the shop's 4 scaled to its cap of 3 in proportion.
    const outcomes: OutcomeCredit[] = [
      ...Array.from({ length: 4 }, () => ({ causeKey: 'a', weight: 1, userId: 'u1', shopId: 'shop' })),
      ...Array.from({ length: 4 }, () => ({ causeKey: 'b', weight: 1, userId: 'u2', shopId: 'shop' })),
    ];
    const result = capInfluence(outcomes, { perUser: 2, perShop: 3 });
    expect(result.counts.a).toBeCloseTo(1.5, 12);
    expect(result.counts.b).toBeCloseTo(1.5, 12);
    expect(result.total).toBeCloseTo(3, 12);
    expect(result.capped).toBe(true);
  });

  // Product owner's rule: bad input gets an error naming the field and the rule.
  it('names bad outcomes and caps', () => {
    const issues = issuesOf(() =>
      capInfluence([{ causeKey: 'a', weight: 2, userId: '', shopId: null }], { perUser: 0, perShop: 1 }),
    );
    expect(issues.map((i) => i.field)).toEqual(['outcomes.0.weight', 'outcomes.0.userId', 'caps.perUser']);
  });
});

describe('conditionOnExcluded', () => {
  it('sets excluded causes to 0 and renormalises the rest, unlisted included, to sum 1', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 2, maxLength: 8 }),
        fc.double({ min: 0.01, max: 0.3, noNaN: true }),
        fc.integer({ min: 0, max: 255 }),
        (raw, r, pick) => {
          const sum = raw.reduce((s, x) => s + x, 0) || 1;
          const probs = raw.map((x, i) => ({ key: `k${i}`, probability: (x / sum) * (1 - r) }));
          const excluded = probs.filter((_, i) => (pick >> i) & 1).map((p) => p.key);
          const out = conditionOnExcluded(probs, r, excluded);
          const total = out.causes.reduce((s, c) => s + c.probability, 0) + out.unlisted;
          expect(total).toBeCloseTo(1, 12);
          const kept = probs.filter((p) => !excluded.includes(p.key));
          const remaining = kept.reduce((s, p) => s + p.probability, 0) + r;
          out.causes.forEach((c, i) => {
            if (excluded.includes(c.key)) expect(c.probability).toBe(0);
            else expect(c.probability).toBeCloseTo(probs[i].probability / remaining, 12);
          });
        },
      ),
      { numRuns: 200 },
    );
  });

  it('gives all the mass to a cause not listed when every listed cause with mass is excluded', () => {
    const out = conditionOnExcluded([{ key: 'a', probability: 1 }], 0, ['a']);
    expect(out).toEqual({ causes: [{ key: 'a', probability: 0 }], unlisted: 1 });
  });

  it('names an excluded key that is not among the causes', () => {
    expect(issuesOf(() => conditionOnExcluded([{ key: 'a', probability: 0.5 }], 0.5, ['b'])).map((i) => i.field)).toEqual([
      'excluded.0',
    ]);
  });
});

describe('fractionalCredit', () => {
  it('credits replaced parts in proportion to their current likelihoods, summing to 1', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 0.001, max: 1, noNaN: true }), { minLength: 1, maxLength: 6 }), (ps) => {
        const current = Object.fromEntries(ps.map((p, i) => [`k${i}`, p]));
        const keys = Object.keys(current);
        const credit = fractionalCredit(keys, current);
        expect(Object.values(credit).reduce((s, x) => s + x, 0)).toBeCloseTo(1, 12);
        keys.forEach((k) => expect(credit[k] / credit[keys[0]]).toBeCloseTo(current[k] / current[keys[0]], 9));
      }),
    );
    const credit = fractionalCredit(['a', 'b'], { a: 0.3, b: 0.1, c: 0.6 });
    expect(Object.keys(credit)).toEqual(['a', 'b']);
    expect(credit.a).toBeCloseTo(0.75, 12);
    expect(credit.b).toBeCloseTo(0.25, 12);
  });

  it('splits equally when every replaced part currently has likelihood 0', () => {
    expect(fractionalCredit(['a', 'b', 'c'], { a: 0, b: 0, c: 0 })).toEqual({ a: 1 / 3, b: 1 / 3, c: 1 / 3 });
  });

  it('names missing and duplicate keys', () => {
    expect(issuesOf(() => fractionalCredit(['a', 'a', 'z'], { a: 0.5 })).map((i) => i.field)).toEqual([
      'replacedKeys.1',
      'current.z',
    ]);
    expect(issuesOf(() => fractionalCredit([], {})).map((i) => i.field)).toEqual(['replacedKeys']);
  });
});
