/**
 * Fix path for more causes than the exact search can take (it is 2·3^n).
 *
 * The method follows the compound-action heuristics for troubleshooting with cost
 * clusters (Langseth & Jensen 2001; the SACSO methodology, Jensen et al. 2001):
 *
 * 1. Greedy by efficiency. Every stage's unconditional contribution is linear in the
 *    mass m reaching it (slope·m + offset, see `stageTerms`), so its efficiency is
 *    (probability it fixes) / (expected cost given it is reached). At each step, with U
 *    the causes still open, the candidates are
 *    - each single replacement: p_i / (R_i + O_g + V);
 *    - each single check: p_i·m / (m·(O_g + T_i) + p_i·(R_i + V));
 *    - per teardown (and for the causes behind none, with O = 0): the best prefix of its
 *      open checkable causes in p/T order as one check stage (the cluster is opened once),
 *      and the best prefix of its open replaceable causes in p/R order as one replacement
 *      stage (one opening, one verification);
 *    and the most efficient is taken. Replacement candidates do not depend on m, so they
 *    are kept sorted or cached per teardown and recomputed only where a step closed
 *    causes; check candidates are re-priced each step. The whole pass is O(n²) at worst.
 * 2. Local improvement. For a fixed set of stages the expected cost is minimised by
 *    ordering them by mass/slope (the Kadane & Simon 1977 exchange argument holds for any
 *    stage costs linear in the reach mass), which is also the fixed point of adjacent
 *    swaps. Then these moves are priced from reach masses and prefix sums of slopes,
 *    without building the stages:
 *    - merging two stages (adjacent, or sharing a teardown) into one stage of either kind
 *      their causes allow, placed at either stage's position;
 *    - splitting one cause off a stage, before or after the rest;
 *    - switching a stage to the other kind.
 *    A move over stages j..l changes the mass reaching only the stages inside that range,
 *    so the gains of moves over disjoint ranges add up: each pass applies the best
 *    improving moves whose ranges do not overlap, re-sorts, and repeats until no move
 *    improves.
 * 3. Escalation (when offered) is inserted at the best point of the resulting sequence:
 *    every cut k is priced as the first k stages plus m·E, and the cheapest kept.
 *
 * `planFixPath` then keeps the cheapest of this and the two baselines and marks the
 * result `exact: false`: a good path, not a proven optimum. On random instances of up to
 * 10 causes it stays within a few per cent of the exact optimum (see the tests).
 */
import { checkOrder } from './exact';
import { Model, stageTerms, Step, StageTerms } from './model';

function efficiency(gain: number, cost: number): number {
  if (cost > 0) return gain / cost;
  return gain > 0 ? Number.POSITIVE_INFINITY : 0;
}

function totalMass(model: Model): number {
  let m = model.unlisted;
  for (let i = 0; i < model.n; i++) m += model.p[i];
  return m;
}

/** Position of each cause in the global p/T order, so any check stage sorts by one integer. */
function checkRanks(model: Model): Int32Array {
  const rank = new Int32Array(model.n);
  checkOrder(model, Array.from({ length: model.n }, (_, i) => i)).forEach((i, r) => {
    rank[i] = r;
  });
  return rank;
}

function greedy(model: Model, rank: Int32Array): Step[] {
  const n = model.n;
  const V = model.verification;
  const nGroups = model.teardownKeys.length + 1;
  const none = nGroups - 1;
  const groupOf = (i: number): number => (model.teardown[i] >= 0 ? model.teardown[i] : none);
  const opening = (g: number): number => (g === none ? 0 : model.teardownCost[g]);
  const members: number[][] = Array.from({ length: nGroups }, () => []);
  for (let i = 0; i < n; i++) members[groupOf(i)].push(i);
  const replaceRatio = (i: number): number =>
    model.replace[i] > 0 ? model.p[i] / model.replace[i] : Number.POSITIVE_INFINITY;
  const byReplace = members.map((list) =>
    list.filter((i) => model.canReplace[i]).sort((a, b) => replaceRatio(b) - replaceRatio(a) || a - b),
  );
  const byCheck = members.map((list) => list.filter((i) => model.canCheck[i]).sort((a, b) => rank[a] - rank[b]));
  const checkable = byCheck.flat();

  // Single replacements never change efficiency: one sorted list, a cursor skips closed ones.
  const singleEff = new Float64Array(n);
  for (let i = 0; i < n; i++) singleEff[i] = efficiency(model.p[i], model.replace[i] + opening(groupOf(i)) + V);
  const singles = Array.from({ length: n }, (_, i) => i)
    .filter((i) => model.canReplace[i])
    .sort((a, b) => singleEff[b] - singleEff[a] || a - b);
  let cursor = 0;

  // Best joint replacement per group (≥ 2 causes), recomputed only when the group changed.
  const jointEff = new Float64Array(nGroups).fill(-1);
  const jointLength = new Int32Array(nGroups);
  const dirty = new Uint8Array(nGroups).fill(1);

  const open = new Uint8Array(n).fill(1);
  let m = totalMass(model);
  let remaining = n;
  const steps: Step[] = [];

  while (remaining > 0) {
    // The best candidate so far, as scalars: nothing is allocated per candidate priced.
    let bestEff = -1;
    let bestCheck = false;
    let bestSingle = -1;
    let bestGroup = -1;
    let bestLength = 0;

    while (cursor < singles.length && open[singles[cursor]] === 0) cursor++;
    if (cursor < singles.length) {
      bestEff = singleEff[singles[cursor]];
      bestSingle = singles[cursor];
    }
    for (let g = 0; g < nGroups; g++) {
      if (dirty[g]) {
        dirty[g] = 0;
        jointEff[g] = -1;
        let mass = 0;
        let cost = opening(g) + V;
        let length = 0;
        for (const i of byReplace[g]) {
          if (!open[i]) continue;
          mass += model.p[i];
          cost += model.replace[i];
          length++;
          const eff = efficiency(mass, cost);
          if (length > 1 && eff > jointEff[g]) {
            jointEff[g] = eff;
            jointLength[g] = length;
          }
        }
      }
      if (jointEff[g] > bestEff) {
        bestEff = jointEff[g];
        bestCheck = false;
        bestSingle = -1;
        bestGroup = g;
        bestLength = jointLength[g];
      }
    }
    for (const i of checkable) {
      if (!open[i]) continue;
      const p = model.p[i];
      const eff = efficiency(p * m, m * (opening(groupOf(i)) + model.check[i]) + p * (model.replace[i] + V));
      if (eff > bestEff) {
        bestEff = eff;
        bestCheck = true;
        bestSingle = i;
      }
    }
    for (let g = 0; g < nGroups; g++) {
      if (byCheck[g].length < 2) continue;
      let mass = 0;
      let slope = opening(g);
      let offset = 0;
      let length = 0;
      for (const i of byCheck[g]) {
        if (!open[i]) continue;
        slope += model.check[i];
        offset += model.p[i] * (model.replace[i] + V) - model.check[i] * mass;
        mass += model.p[i];
        length++;
        if (length < 2) continue;
        const eff = efficiency(mass * m, slope * m + offset);
        if (eff > bestEff) {
          bestEff = eff;
          bestCheck = true;
          bestSingle = -1;
          bestGroup = g;
          bestLength = length;
        }
      }
    }

    let causes: number[];
    if (bestSingle >= 0) {
      causes = [bestSingle];
    } else {
      causes = (bestCheck ? byCheck : byReplace)[bestGroup].filter((i) => open[i] === 1).slice(0, bestLength);
      if (!bestCheck) causes.sort((a, b) => a - b);
    }
    for (const i of causes) {
      open[i] = 0;
      m -= model.p[i];
      dirty[groupOf(i)] = 1;
    }
    remaining -= causes.length;
    steps.push({ kind: bestCheck ? 'check' : 'replace', causes });
  }
  return steps;
}

type WorkKind = 'replace' | 'check';

/** A stage with what the local search needs to price moves on it without rebuilding it. */
interface Staged {
  step: Step;
  terms: StageTerms;
  /** Its causes in global p/T order. */
  byRank: number[];
  /** Distinct teardown ids, ascending. */
  teardowns: number[];
  opening: number;
  sumR: number;
  sumT: number;
  allReplace: boolean;
  allCheck: boolean;
}

function makeStaged(model: Model, rank: Int32Array, kind: WorkKind, causes: readonly number[]): Staged {
  const byRank = [...causes].sort((a, b) => rank[a] - rank[b]);
  const step: Step = { kind, causes: kind === 'check' ? byRank : [...causes].sort((a, b) => a - b) };
  const teardowns = [...new Set(causes.map((i) => model.teardown[i]).filter((g) => g >= 0))].sort((a, b) => a - b);
  let sumR = 0;
  let sumT = 0;
  for (const i of causes) {
    sumR += model.replace[i];
    if (model.canCheck[i]) sumT += model.check[i];
  }
  return {
    step,
    terms: stageTerms(model, step),
    byRank,
    teardowns,
    opening: teardowns.reduce((s, g) => s + model.teardownCost[g], 0),
    sumR,
    sumT,
    allReplace: causes.every((i) => model.canReplace[i]),
    allCheck: causes.every((i) => model.canCheck[i]),
  };
}

function sharedOpening(model: Model, a: readonly number[], b: readonly number[]): number {
  let x = 0;
  let y = 0;
  let total = 0;
  while (x < a.length && y < b.length) {
    if (a[x] === b[y]) {
      total += model.teardownCost[a[x]];
      x++;
      y++;
    } else if (a[x] < b[y]) x++;
    else y++;
  }
  return total;
}

/** Terms of one stage of `kind` holding the causes of a and b (b may be null), without building it. */
function unionTerms(model: Model, rank: Int32Array, kind: WorkKind, a: Staged, b: Staged | null): StageTerms {
  const opening = b === null ? a.opening : a.opening + b.opening - sharedOpening(model, a.teardowns, b.teardowns);
  const mass = a.terms.mass + (b?.terms.mass ?? 0);
  if (kind === 'replace') {
    return { slope: a.sumR + (b?.sumR ?? 0) + opening + model.verification, offset: 0, mass };
  }
  // Walk both p/T-ordered lists as one merged list.
  const V = model.verification;
  const x = a.byRank;
  const y = b?.byRank ?? [];
  let ix = 0;
  let iy = 0;
  let before = 0;
  let offset = 0;
  while (ix < x.length || iy < y.length) {
    const i = iy >= y.length || (ix < x.length && rank[x[ix]] < rank[y[iy]]) ? x[ix++] : y[iy++];
    offset += model.p[i] * (model.replace[i] + V) - model.check[i] * before;
    before += model.p[i];
  }
  return { slope: a.sumT + (b?.sumT ?? 0) + opening, offset, mass };
}

function ratio(t: StageTerms): number {
  return efficiency(t.mass, t.slope);
}

/**
 * The best way to split one cause off a stage (before or after the rest), priced from
 * the stage's terms: removing cause i takes out R_i (or T_i and its own check term), its
 * opening if no other cause of the stage shares the teardown, and, in a check stage,
 * lowers by p_i the mass already ruled out before every later check.
 */
function bestSplit(
  model: Model,
  s: Staged,
  m: number,
  threshold: number,
): { delta: number; index: number; oneFirst: boolean } | null {
  const causes = s.step.causes;
  if (causes.length < 2) return null;
  const check = s.step.kind === 'check';
  const V = model.verification;
  const here = s.terms.slope * m + s.terms.offset;
  let tAfter = check ? s.sumT : 0;
  let best = threshold;
  let bestIndex = -1;
  let oneFirst = true;
  let before = 0;
  for (let x = 0; x < causes.length; x++) {
    const i = causes[x];
    const g = model.teardown[i];
    const own = g >= 0 ? model.teardownCost[g] : 0;
    let sole = own;
    if (g >= 0) for (const c of causes) if (c !== i && model.teardown[c] === g) sole = 0;
    const p = model.p[i];
    let oneSlope: number;
    let oneOffset: number;
    let restSlope: number;
    let restOffset: number;
    if (check) {
      const T = model.check[i];
      tAfter -= T;
      oneSlope = own + T;
      oneOffset = p * (model.replace[i] + V);
      restSlope = s.terms.slope - T - sole;
      restOffset = s.terms.offset - oneOffset + T * before + p * tAfter;
      before += p;
    } else {
      oneSlope = own + model.replace[i] + V;
      oneOffset = 0;
      restSlope = s.terms.slope - model.replace[i] - sole;
      restOffset = 0;
    }
    const restMass = s.terms.mass - p;
    const a = oneSlope * m + oneOffset + restSlope * (m - p) + restOffset - here;
    const b = restSlope * m + restOffset + oneSlope * (m - restMass) + oneOffset - here;
    if (a < best) {
      best = a;
      bestIndex = x;
      oneFirst = true;
    }
    if (b < best) {
      best = b;
      bestIndex = x;
      oneFirst = false;
    }
  }
  return bestIndex < 0 ? null : { delta: best, index: bestIndex, oneFirst };
}

const MAX_PASSES = 1000;

/** A priced move over stages from..to (inclusive) of the sorted sequence; `build` makes their replacement. */
interface Move {
  from: number;
  to: number;
  delta: number;
  build: () => Staged[];
}

function improve(model: Model, rank: Int32Array, steps: Step[], tol: number): Step[] {
  let seq: Staged[] = steps.map((s) => makeStaged(model, rank, s.kind === 'check' ? 'check' : 'replace', s.causes));
  const total = totalMass(model);
  const costAt = (t: StageTerms, m: number): number => t.slope * m + t.offset;

  for (let pass = 0; pass < MAX_PASSES; pass++) {
    // Stable sort: equal ratios keep their order.
    const ratios = seq.map((s) => ratio(s.terms));
    const order = seq.map((_, i) => i).sort((x, y) => ratios[y] - ratios[x] || x - y);
    seq = order.map((i) => seq[i]);
    const k = seq.length;
    const reach = new Float64Array(k);
    const slopeBefore = new Float64Array(k + 1); // Σ_{i<j} slope_i
    const atTeardown = new Map<number, number[]>();
    let m = total;
    for (let j = 0; j < k; j++) {
      reach[j] = m;
      m -= seq[j].terms.mass;
      slopeBefore[j + 1] = slopeBefore[j] + seq[j].terms.slope;
      for (const g of seq[j].teardowns) {
        const list = atTeardown.get(g);
        if (list === undefined) atTeardown.set(g, [j]);
        else list.push(j);
      }
    }
    const current = seq;
    const moves: Move[] = [];

    const tryMerge = (j: number, l: number): void => {
      const a = current[j];
      const b = current[l];
      const between = slopeBefore[l] - slopeBefore[j + 1];
      const base = costAt(a.terms, reach[j]) + costAt(b.terms, reach[l]);
      let best: Move | null = null;
      for (const kind of ['replace', 'check'] as const) {
        if (kind === 'replace' ? !(a.allReplace && b.allReplace) : !(a.allCheck && b.allCheck)) continue;
        const x = unionTerms(model, rank, kind, a, b);
        const atJ = costAt(x, reach[j]) - base - b.terms.mass * between;
        const atL = costAt(x, reach[l] + a.terms.mass) - base + a.terms.mass * between;
        const union = (): Staged => makeStaged(model, rank, kind, [...a.step.causes, ...b.step.causes]);
        if (atJ < -tol && (best === null || atJ < best.delta)) {
          best = { from: j, to: l, delta: atJ, build: () => [union(), ...current.slice(j + 1, l)] };
        }
        if (atL < -tol && (best === null || atL < best.delta)) {
          best = { from: j, to: l, delta: atL, build: () => [...current.slice(j + 1, l), union()] };
        }
      }
      if (best !== null) moves.push(best);
    };
    for (let j = 0; j + 1 < k; j++) tryMerge(j, j + 1);
    for (const list of atTeardown.values()) {
      for (let x = 0; x < list.length; x++) {
        for (let y = x + 1; y < list.length; y++) if (list[y] !== list[x] + 1) tryMerge(list[x], list[y]);
      }
    }

    for (let j = 0; j < k; j++) {
      const s = current[j];
      let best: Move | null = null;
      const other: WorkKind = s.step.kind === 'check' ? 'replace' : 'check';
      if (other === 'replace' ? s.allReplace : s.allCheck) {
        const d = costAt(unionTerms(model, rank, other, s, null), reach[j]) - costAt(s.terms, reach[j]);
        if (d < -tol) best = { from: j, to: j, delta: d, build: () => [makeStaged(model, rank, other, s.step.causes)] };
      }
      const split = bestSplit(model, s, reach[j], best?.delta ?? -tol);
      if (split !== null) {
        const kind: WorkKind = s.step.kind === 'check' ? 'check' : 'replace';
        best = {
          from: j,
          to: j,
          delta: split.delta,
          build: () => {
            const one = makeStaged(model, rank, kind, [s.step.causes[split.index]]);
            const rest = makeStaged(model, rank, kind, s.step.causes.filter((_, x) => x !== split.index));
            return split.oneFirst ? [one, rest] : [rest, one];
          },
        };
      }
      if (best !== null) moves.push(best);
    }
    if (moves.length === 0) break;

    moves.sort((x, y) => x.delta - y.delta);
    const taken = new Uint8Array(k);
    const chosen: Move[] = [];
    for (const mv of moves) {
      let free = true;
      for (let j = mv.from; j <= mv.to && free; j++) free = taken[j] === 0;
      if (!free) continue;
      for (let j = mv.from; j <= mv.to; j++) taken[j] = 1;
      chosen.push(mv);
    }
    // Right to left, so earlier indices stay valid while later ranges change length.
    chosen.sort((x, y) => y.from - x.from);
    const next = current.slice();
    for (const mv of chosen) next.splice(mv.from, mv.to - mv.from + 1, ...mv.build());
    seq = next;
  }
  return seq.map((s) => s.step);
}

function withEscalation(model: Model, steps: Step[]): Step[] {
  const E = model.escalation;
  if (E === null) return steps;
  let m = totalMass(model);
  // Cut k: the first k stages, then escalate with the mass left (k = all: f(∅) = r·E).
  // Ties go to the later cut: working on the car over handing it on.
  let spent = 0;
  let bestCost = m * E;
  let bestCut = 0;
  steps.forEach((step, i) => {
    const t = stageTerms(model, step);
    spent += t.slope * m + t.offset;
    m -= t.mass;
    const cost = spent + m * E;
    if (cost <= bestCost) {
      bestCost = cost;
      bestCut = i + 1;
    }
  });
  if (bestCut === steps.length) return steps;
  return [...steps.slice(0, bestCut), { kind: 'escalate', causes: [] }];
}

export function solveHeuristic(model: Model): Step[] {
  const rank = checkRanks(model);
  let scale = 1 + model.verification + (model.escalation ?? 0);
  for (let i = 0; i < model.n; i++) scale += model.replace[i] + (model.canCheck[i] ? model.check[i] : 0);
  for (let g = 0; g < model.teardownKeys.length; g++) scale += model.teardownCost[g];
  return withEscalation(model, improve(model, rank, greedy(model, rank), 1e-10 * scale));
}
