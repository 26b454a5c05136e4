/**
 * Minimax (Chebyshev) solution of the reduced fit problem: choose z to minimise max_i |(B z − c)_i| / L_i,
 * where B z − c are the residuals of all Cp/R, H/RT, S/R rows on the null space of the fit's equality
 * constraints (solve.ts: u = u_p + Q2 z, so the constraints hold exactly for every z) and L_i the
 * size-scaled limit of each row (limits.ts). A fit therefore passes its error check exactly when this
 * optimum is ≤ 1.
 *
 * Method: Lawson's algorithm (C. L. Lawson, "Contributions to the theory of linear least maximum
 * approximation", PhD thesis, UCLA, 1961; analysed by J. R. Rice & K. H. Usow, "The Lawson algorithm and
 * extensions", Math. Comp. 22 (1968) 118–127): a sequence of weighted least-squares problems with weights
 * updated w_i ← w_i · |e_i|^β, renormalised to sum one, which converges to the minimax solution. It is
 * started from the least-squares solution (whose error picks the first reference set, see
 * `minimaxReduced`) and returns it unchanged if no step improves on it.
 * Notes:
 *  - each weighted least-squares step is a Householder QR of the √w-scaled rows (Golub & Van Loan, 4th
 *    ed., Alg. 5.2.1), never the normal equations, whose squared conditioning would cost digits;
 *  - stopping: for weights summing to one, √(min_z Σ w_i e_i(z)²) is a lower bound of the minimax value
 *    (Σ w_i e_i(z*)² ≤ max e_i(z*)²), so the iteration stops once the best max error found is within
 *    RELATIVE_GAP of that bound, or after MAX_ITERATIONS; the best iterate (smallest max error) is returned;
 *  - rows whose weight has fallen below PRUNE_FRACTION of the largest are dropped from later steps (their
 *    weight keeps shrinking geometrically);
 *  - the iteration runs on a reference set of rows, enlarged by violators (see `minimaxReduced`), so a
 *    step costs O(set size · k²) with k = 8 free unknowns, not O(all rows · k²).
 */
import type { FactoredProblem } from './solve.js';

export const MAX_ITERATIONS = 60;
/** Rounds of enlarging the reference set. */
export const MAX_ROUNDS = 6;
/**
 * Stop once the best max error is within this fraction of the lower bound: 3 % costs ≈ 35 steps against
 * ≈ 80 for 1 % and moved the optimum by < 1 % on the synthetic set (measured).
 */
export const RELATIVE_GAP = 0.03;
const PRUNE_FRACTION = 1e-9;
/**
 * Exponent of the weight update w_i ← w_i |e_i|^β (Lawson: β = 1). β = 1.5 reached the same optimum in
 * about a third fewer steps on the synthetic set of test/fixtures/nasa7; β = 2 oscillated (measured).
 */
const BETA = 1.5;
/** Initial reference set: local maxima of the starting error above this fraction of its maximum. */
const INITIAL_SET_FRACTION = 0.25;

export interface MinimaxResult {
  z: Float64Array;
  /** max_i |e_i| of z. */
  worst: number;
  /** Lower bound of the optimum from the last step. */
  lowerBound: number;
  iterations: number;
}

/**
 * Weighted least squares min Σ (s_i (b_i·z − c_i))² over the rows listed in `active`, by Householder QR.
 * `work` has room for active.length × (k + 1) doubles. Returns z and writes nothing else.
 */
function weightedSolve(
  b: Float64Array,
  c: Float64Array,
  s: Float64Array,
  active: Int32Array,
  count: number,
  k: number,
  work: Float64Array,
): Float64Array {
  const cols = k + 1;
  for (let r = 0; r < count; r++) {
    const i = active[r]!;
    const si = s[i]!;
    for (let j = 0; j < k; j++) work[r * cols + j] = si * b[i * k + j]!;
    work[r * cols + k] = si * c[i]!;
  }
  const diag = new Float64Array(k);
  for (let j = 0; j < k; j++) {
    // Plain sum of squares, not Math.hypot (several times slower): the rows are scaled by √w_i / L_i with
    // Σ w_i = 1 and limit-relative targets, so the entries are far from overflow or underflow.
    let sumSq = 0;
    for (let r = j; r < count; r++) sumSq += work[r * cols + j]! * work[r * cols + j]!;
    const norm = Math.sqrt(sumSq);
    if (norm === 0) {
      diag[j] = 0;
      continue;
    }
    const alpha = work[j * cols + j]! > 0 ? -norm : norm;
    // v = x − alpha e1, stored in place; beta = 1 / (alpha (alpha − x0)).
    work[j * cols + j]! -= alpha;
    const vv = -alpha * work[j * cols + j]!;
    for (let col = j + 1; col < cols; col++) {
      let dot = 0;
      for (let r = j; r < count; r++) dot += work[r * cols + j]! * work[r * cols + col]!;
      const f = dot / vv;
      for (let r = j; r < count; r++) work[r * cols + col]! -= f * work[r * cols + j]!;
    }
    diag[j] = alpha;
  }
  const z = new Float64Array(k);
  for (let j = k - 1; j >= 0; j--) {
    let v = work[j * cols + k]!;
    for (let col = j + 1; col < k; col++) v -= work[j * cols + col]! * z[col]!;
    z[j] = diag[j] !== 0 ? v / diag[j]! : 0;
  }
  return z;
}

/** |e_i| of every row for z; returns the max. */
function errorsOf(b: Float64Array, c: Float64Array, limits: Float64Array, k: number, z: Float64Array, e: Float64Array): number {
  let worst = 0;
  for (let i = 0; i < c.length; i++) {
    let v = -c[i]!;
    const o = i * k;
    for (let j = 0; j < k; j++) v += b[o + j]! * z[j]!;
    const a = Math.abs(v / limits[i]!);
    e[i] = a;
    if (!(a <= worst)) worst = a;
  }
  return worst;
}

/**
 * Rows at which |e| has a local maximum along T within its series (one series per quantity and range:
 * rows are sample-major with `stride` quantities per sample, the low range's first `lowRows` rows).
 */
function localMaxima(e: Float64Array, stride: number, lowRows: number, into: Set<number>, above: number): void {
  for (const [from, to] of [[0, lowRows], [lowRows, e.length]] as const) {
    for (let q = 0; q < stride; q++) {
      for (let i = from + q; i < to; i += stride) {
        const prev = i - stride >= from ? e[i - stride]! : -Infinity;
        const next = i + stride < to ? e[i + stride]! : -Infinity;
        if (e[i]! >= prev && e[i]! >= next && e[i]! > above) into.add(i);
      }
    }
  }
}

/**
 * Lawson iteration on the rows in `set` only; returns its best iterate on those rows.
 */
function lawsonOnSet(
  b: Float64Array,
  c: Float64Array,
  limits: Float64Array,
  k: number,
  set: Int32Array,
  work: Float64Array,
  cutoff: number,
): { z: Float64Array; iterations: number; cut: boolean } | undefined {
  const n = set.length;
  const w = new Float64Array(n).fill(1 / n);
  const s = new Float64Array(c.length);
  const e = new Float64Array(n);
  let active = set.slice();
  let count = n;
  let pos = new Int32Array(n);
  for (let r = 0; r < n; r++) pos[r] = r;
  let best: { z: Float64Array; worst: number } | undefined;
  let lowerBound = 0;
  let iterations = 0;
  for (; iterations < MAX_ITERATIONS; iterations++) {
    for (let r = 0; r < count; r++) s[active[r]!] = Math.sqrt(w[pos[r]!]!) / limits[active[r]!]!;
    const z = weightedSolve(b, c, s, active, count, k, work);
    let worst = 0;
    let bound = 0;
    let total = 0;
    for (let r = 0; r < n; r++) {
      const i = set[r]!;
      let v = -c[i]!;
      for (let j = 0; j < k; j++) v += b[i * k + j]! * z[j]!;
      const a = Math.abs(v / limits[i]!);
      e[r] = a;
      if (!(a <= worst)) worst = a;
      bound += w[r]! * a * a;
      total += w[r]! * a;
    }
    if (!Number.isFinite(worst)) break;
    lowerBound = Math.max(lowerBound, Math.sqrt(bound));
    if (!best || worst < best.worst) best = { z, worst };
    // The optimum on the set, hence on all rows, is at least lowerBound: at or above the cutoff this fit
    // cannot matter to the caller.
    if (lowerBound >= cutoff) return { z: best.z, iterations: iterations + 1, cut: true };
    if (best.worst - lowerBound <= RELATIVE_GAP * best.worst || total === 0) {
      iterations++;
      break;
    }
    let wMax = 0;
    let wSum = 0;
    for (let r = 0; r < n; r++) {
      w[r] = w[r]! * e[r]! ** BETA;
      if (w[r]! > wMax) wMax = w[r]!;
      wSum += w[r]!;
    }
    for (let r = 0; r < n; r++) w[r] = w[r]! / wSum;
    wMax /= wSum;
    let kept = 0;
    const nextActive = new Int32Array(n);
    const nextPos = new Int32Array(n);
    for (let r = 0; r < n; r++) {
      if (w[r]! >= PRUNE_FRACTION * wMax) {
        nextActive[kept] = set[r]!;
        nextPos[kept++] = r;
      } else w[r] = 0;
    }
    if (kept < k) break;
    active = nextActive;
    pos = nextPos;
    count = kept;
  }
  return best ? { z: best.z, iterations, cut: false } : undefined;
}

/**
 * Minimax of the limit-relative residuals of the reduced rows of `f` (f.reduced, row-major, k = n − m
 * columns) with targets `c` and one limit per row. Rows are sample-major with `stride` quantities per
 * sample; the first `lowRows` belong to the low range.
 *
 * To keep each Lawson step small, the iteration runs on a reference set of rows — the local maxima of
 * |e| along T of the starting solution — and the set is enlarged by the local maxima of the full error
 * until no row outside it exceeds the set's optimum by more than 0.1 % (an exchange in the sense of the
 * discrete Chebyshev methods; at most MAX_ROUNDS rounds). `start` (e.g. the least-squares solution) is
 * kept if nothing better is found, so the result is never worse than it.
 *
 * `cutoff` (default Infinity): the caller only needs the result if the optimum is below it (the midpoint
 * search already holds a fit that good). Every Lawson step gives a rigorous lower bound of the optimum
 * over all rows (√(Σ w_i e_i²) at the weighted least-squares z of weights summing to one, on a subset of
 * the rows, bounds the subset's minimax value, which bounds the full one); once it reaches the cutoff the
 * iteration stops and returns its best iterate so far, whose max error is then ≥ the cutoff too. A search
 * that keeps the smallest result therefore chooses exactly as without the cutoff, at less cost.
 */
export function minimaxReduced(
  f: FactoredProblem,
  c: Float64Array,
  limits: Float64Array,
  start: Float64Array,
  stride: number,
  lowRows: number,
  cutoff = Infinity,
): MinimaxResult {
  const k = f.n - f.m;
  const b = f.reduced;
  const rows = c.length;
  const e = new Float64Array(rows);
  let best = { z: start, worst: errorsOf(b, c, limits, k, start, e) };
  const set = new Set<number>();
  // Start from the larger local maxima of the starting error, but never fewer than 3k rows.
  const maxima = new Set<number>();
  localMaxima(e, stride, lowRows, maxima, -1);
  const byError = [...maxima].sort((x, y) => e[y]! - e[x]! || x - y);
  for (const i of byError) if (set.size < 3 * k || e[i]! > INITIAL_SET_FRACTION * best.worst) set.add(i);
  const work = new Float64Array(rows * (k + 1));
  let iterations = 0;
  let lowerBound = 0;
  for (let round = 0; round < MAX_ROUNDS; round++) {
    const ordered = Int32Array.from([...set].sort((x, y) => x - y));
    if (ordered.length < k) break;
    const r = lawsonOnSet(b, c, limits, k, ordered, work, cutoff);
    if (!r) break;
    iterations += r.iterations;
    if (r.cut) {
      const worst = errorsOf(b, c, limits, k, r.z, e);
      if (worst < best.worst) best = { z: r.z, worst };
      break;
    }
    let setWorst = 0;
    for (const i of ordered) {
      let v = -c[i]!;
      for (let j = 0; j < k; j++) v += b[i * k + j]! * r.z[j]!;
      setWorst = Math.max(setWorst, Math.abs(v / limits[i]!));
    }
    lowerBound = Math.max(lowerBound, setWorst * (1 - RELATIVE_GAP));
    const worst = errorsOf(b, c, limits, k, r.z, e);
    if (worst < best.worst) best = { z: r.z, worst };
    if (worst <= setWorst * 1.001) break;
    const before = set.size;
    localMaxima(e, stride, lowRows, set, setWorst);
    if (set.size === before) break;
  }
  return { z: best.z, worst: best.worst, lowerBound, iterations };
}
