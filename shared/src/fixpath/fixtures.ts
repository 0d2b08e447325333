import type { PlanAddOn, PlanCause, PlanInput } from './types';

/** mulberry32: a small, fast, well-mixed 32-bit PRNG; the same seed gives the same sequence on every platform. */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export interface RandomPlanOptions {
  /** Number of teardowns (default ⌈n/4⌉); 0 = no cause is behind a teardown. */
  teardowns?: number;
  /** Give some causes check costs, some of them check-first (default true). */
  checks?: boolean;
  /** Offer escalation (default true). */
  escalation?: boolean;
  /** A verification cost above 0 (default true). */
  verification?: boolean;
  /** Unlisted mass r drawn from [0, 0.15) (default true); false = r = 0. */
  unlisted?: boolean;
}

/**
 * A reproducible random fix-path instance, for tests and benchmarks: probabilities from a
 * flat Dirichlet scaled to 1 − r, integer costs in workshop-like ranges, about half the
 * causes behind a teardown, and one add-on per teardown.
 */
export function randomPlanInput(seed: number, n: number, opts: RandomPlanOptions = {}): PlanInput {
  const rand = mulberry32(seed);
  const int = (lo: number, hi: number): number => lo + Math.floor(rand() * (hi - lo + 1));
  const nTeardowns = opts.teardowns ?? Math.ceil(n / 4);
  const teardowns: Record<string, number> = {};
  for (let t = 1; t <= nTeardowns; t++) teardowns[`T${t}`] = int(20, 300);

  const r = (opts.unlisted ?? true) ? rand() * 0.15 : 0;
  // -ln(u) is Exponential(1); normalised, a flat Dirichlet sample.
  const raw = Array.from({ length: n }, () => -Math.log(1 - rand()));
  const sum = raw.reduce((s, x) => s + x, 0);
  const causes: PlanCause[] = raw.map((w, i) => {
    const cause: PlanCause = { key: `C${i + 1}`, probability: (w / sum) * (1 - r), replaceCost: int(10, 600) };
    if (nTeardowns > 0 && rand() < 0.5) cause.teardown = `T${int(1, nTeardowns)}`;
    if ((opts.checks ?? true) && rand() < 0.5) {
      cause.checkCost = int(5, 80);
      if (rand() < 0.3) cause.checkFirst = true;
    }
    return cause;
  });
  const addOns: PlanAddOn[] = Object.keys(teardowns).map((t, i) => ({ key: `A${i + 1}`, teardown: t, cost: int(10, 120) }));
  const input: PlanInput = {
    causes,
    teardowns,
    verificationCost: (opts.verification ?? true) ? int(0, 60) : 0,
    unlistedProbability: Math.max(0, 1 - causes.reduce((s, c) => s + c.probability, 0)),
    addOns,
  };
  if (opts.escalation ?? true) input.escalationCost = int(400, 3000);
  return input;
}
