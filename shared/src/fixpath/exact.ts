import type { Model, Step } from './model';

const ESCALATE = 0;
const REPLACE = 1;
const CHECK = 2;

/**
 * Order in which a check stage makes its checks: p/T descending (a free check first),
 * ties in input order; causes that cannot be checked go last.
 */
export function checkOrder(model: Model, causes: readonly number[]): number[] {
  const ratio = (i: number): number => {
    if (!model.canCheck[i]) return Number.NEGATIVE_INFINITY;
    return model.check[i] > 0 ? model.p[i] / model.check[i] : Number.POSITIVE_INFINITY;
  };
  return [...causes].sort((a, b) => ratio(b) - ratio(a) || a - b);
}

/**
 * The recursion of product.md §3, exactly, by dynamic programming over the subsets U of
 * open causes (bit masks), in increasing numeric order so every U \ S is solved first:
 *
 *   f(∅) = r·E (0 where escalation is not offered)
 *   f(U) = min( m(U)·E,
 *               min_{S ⊆ U, none check-first}  m(U)·cost(S) + f(U \ S),
 *               min_{C ⊆ U, all checkable}     check(C, U) + f(U \ C) )
 *
 * Causes are re-indexed by p/T descending, so the checks of any C in p/T order are its
 * bits from low to high, and check(C, U) = m(U)·(ΣO + ΣT)(C) + [Σp(R+V) − Σ_k T_k·P_<k](C)
 * where both brackets depend on C alone and are tabled once per mask (built from the
 * mask without its highest bit). Work: Σ_U 2^|U ∩ replaceable| + 2^|U ∩ checkable| ≤ 2·3^n.
 *
 * Ties (within 1e-10 of the sum of all costs) go to working on the car over escalating, then to the
 * larger stage: fewer stages for the same expected cost, e.g. one check stage rather than
 * several when no teardown is shared.
 */
export function solveExact(model: Model): Step[] {
  const n = model.n;
  const order = checkOrder(model, Array.from({ length: n }, (_, i) => i));
  const size = 1 << n;
  const full = size - 1;

  const p = new Float64Array(n);
  const R = new Float64Array(n);
  const T = new Float64Array(n);
  const tdBit = new Int32Array(n);
  let replaceMask = 0;
  let checkMask = 0;
  let scale = 1 + model.verification * n + (model.escalation ?? 0);
  for (let b = 0; b < n; b++) {
    const i = order[b];
    p[b] = model.p[i];
    R[b] = model.replace[i];
    T[b] = model.canCheck[i] ? model.check[i] : 0;
    tdBit[b] = model.teardown[i] >= 0 ? 1 << model.teardown[i] : 0;
    if (model.canReplace[i]) replaceMask |= 1 << b;
    if (model.canCheck[i]) checkMask |= 1 << b;
    scale += R[b] + T[b];
  }
  const nTeardowns = model.teardownKeys.length;
  const open = new Float64Array(1 << nTeardowns);
  for (let t = 1; t < open.length; t++) {
    const hb = 31 - Math.clz32(t);
    open[t] = open[t ^ (1 << hb)] + model.teardownCost[hb];
  }
  scale += open[open.length - 1];
  const tol = 1e-10 * scale;

  const mass = new Float64Array(size);
  const tdMask = new Int32Array(size);
  const replaceCost = new Float64Array(size);
  const checkSlope = new Float64Array(size);
  const checkOffset = new Float64Array(size);
  const bits = new Uint8Array(size);
  const sumR = new Float64Array(size);
  const sumT = new Float64Array(size);
  const V = model.verification;
  for (let s = 1; s < size; s++) {
    const hb = 31 - Math.clz32(s);
    const prev = s ^ (1 << hb);
    mass[s] = mass[prev] + p[hb];
    tdMask[s] = tdMask[prev] | tdBit[hb];
    bits[s] = bits[prev] + 1;
    sumR[s] = sumR[prev] + R[hb];
    sumT[s] = sumT[prev] + T[hb];
    const o = open[tdMask[s]];
    replaceCost[s] = sumR[s] + o + V;
    checkSlope[s] = sumT[s] + o;
    // hb is checked last within s, once every lower bit has been ruled out.
    checkOffset[s] = checkOffset[prev] + p[hb] * (R[hb] + V) - T[hb] * mass[prev];
  }

  const E = model.escalation;
  const r = model.unlisted;
  const f = new Float64Array(size);
  const kind = new Uint8Array(size);
  const chosen = new Int32Array(size);
  f[0] = E === null ? 0 : r * E;
  for (let U = 1; U < size; U++) {
    const m = mass[U] + r;
    let best = Number.POSITIVE_INFINITY;
    let bestKind = ESCALATE;
    let bestSet = 0;
    let bestBits = -1;
    if (E !== null) best = m * E;
    const RU = U & replaceMask;
    for (let s = RU; s !== 0; s = (s - 1) & RU) {
      const c = m * replaceCost[s] + f[U ^ s];
      if (c < best - tol || (c <= best + tol && bits[s] > bestBits)) {
        best = c;
        bestKind = REPLACE;
        bestSet = s;
        bestBits = bits[s];
      }
    }
    const CU = U & checkMask;
    for (let s = CU; s !== 0; s = (s - 1) & CU) {
      const c = m * checkSlope[s] + checkOffset[s] + f[U ^ s];
      if (c < best - tol || (c <= best + tol && bits[s] > bestBits)) {
        best = c;
        bestKind = CHECK;
        bestSet = s;
        bestBits = bits[s];
      }
    }
    f[U] = best;
    kind[U] = bestKind;
    chosen[U] = bestSet;
  }

  const steps: Step[] = [];
  let U = full;
  while (U !== 0) {
    if (kind[U] === ESCALATE) {
      steps.push({ kind: 'escalate', causes: [] });
      return steps;
    }
    const s = chosen[U];
    const causes: number[] = [];
    for (let b = 0; b < n; b++) if (s & (1 << b)) causes.push(order[b]);
    // Replacements are listed in input order; checks keep p/T order (low bits first).
    if (kind[U] === REPLACE) causes.sort((a, b) => a - b);
    steps.push({ kind: kind[U] === REPLACE ? 'replace' : 'check', causes });
    U ^= s;
  }
  return steps;
}
