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
 * Work buffers of the iteration, grown on demand and reused by every call (the fit is synchronous and
 * single-threaded per worker, so one set per module suffices). Reuse changes no arithmetic: every buffer
 * is fully written before it is read.
 */
const scratch = {
  work: new Float64Array(0),
  s: new Float64Array(0),
  w: new Float64Array(0),
  e: new Float64Array(0),
  setB: new Float64Array(0),
  setC: new Float64Array(0),
  setL: new Float64Array(0),
  posA: new Int32Array(0),
  posB: new Int32Array(0),
  rowErrors: new Float64Array(0),
  inSet: new Uint8Array(0),
  diag: new Float64Array(0),
  /** v_j · column of the work matrix, per column (weightedSolve). */
  dots: new Float64Array(0),
  z: new Float64Array(0),
  /** Rows of the current reference set, ascending, the next one, and the rows a round adds (minimaxReduced). */
  ordered: new Int32Array(0),
  merged: new Int32Array(0),
  fresh: new Int32Array(0),
};

function ensure(n: number, k: number, rows: number): void {
  const sc = scratch;
  if (sc.work.length < n * (k + 1)) sc.work = new Float64Array(n * (k + 1));
  if (sc.s.length < n) {
    sc.s = new Float64Array(n);
    sc.w = new Float64Array(n);
    sc.e = new Float64Array(n);
    sc.posA = new Int32Array(n);
    sc.posB = new Int32Array(n);
  }
  if (sc.rowErrors.length < rows) {
    sc.rowErrors = new Float64Array(rows);
    sc.inSet = new Uint8Array(rows);
  }
  if (sc.diag.length < k) {
    sc.diag = new Float64Array(k);
    sc.dots = new Float64Array(k + 1);
    sc.z = new Float64Array(k);
  }
}

/**
 * Weighted least squares min Σ (s_r (b_i·z − c_i))² over the rows i = active[r], r < count, by Householder
 * QR; s is indexed by r. The work matrix is column-major (count rows, k + 1 columns) so every inner loop
 * runs over consecutive doubles. Writes z (length k) into `z`.
 *
 * The steps are those of the textbook order (`weightedSolveReference` in the tests): for each j, the
 * column norm below the diagonal, the reflector v_j, then for every later column the dot product with
 * v_j and its update. They are pipelined: the update of column j + 1 by reflector j also sums the squares
 * of its rows ≥ j + 1 (the next norm), v_{j+1} is formed at once, and the update of every later column
 * also sums its dot product with v_{j+1}. Each sum still takes the same terms, each the same double (a
 * row's value once reflector j is applied, the one the next step reads), in ascending row order from +0,
 * so every double is the same while each column is passed over once per step instead of twice (the sums
 * of step 0 are made while the work matrix is filled, column 0 first). `dots` holds k + 1 doubles of
 * scratch. Exported for the same-doubles test.
 */
export function weightedSolve(
  b: Float64Array,
  c: Float64Array,
  s: Float64Array,
  active: Int32Array,
  count: number,
  k: number,
  work: Float64Array,
  diag: Float64Array,
  z: Float64Array,
  dots: Float64Array,
): void {
  if (k === 0) return;
  // Column 0 first, with its sum of squares (plain sums of squares, not Math.hypot, several times slower:
  // the rows are scaled by √w_i / L_i with Σ w_i = 1 and limit-relative targets, so the entries are far
  // from overflow or underflow); its reflector v_0 at once; then the other columns, each row's entries
  // also entering their dot products with v_0.
  let sumSq = 0;
  for (let r = 0; r < count; r++) {
    const v = s[r]! * b[active[r]! * k]!;
    work[r] = v;
    sumSq += v * v;
  }
  // alpha of the current step j (0 when column j has no norm: no reflection), and whether dots[col] already
  // holds v_j · column col for every col > j.
  let alpha = reflectorOf(work, 0, 0, sumSq);
  let dotsReady = alpha !== 0;
  if (dotsReady) {
    for (let col = 1; col <= k; col++) dots[col] = 0;
    for (let r = 0; r < count; r++) {
      const i = active[r]!;
      const si = s[r]!;
      const o = i * k;
      const v0 = work[r]!;
      for (let j = 1; j < k; j++) {
        const v = si * b[o + j]!;
        work[j * count + r] = v;
        dots[j]! += v0 * v;
      }
      const v = si * c[i]!;
      work[k * count + r] = v;
      dots[k]! += v0 * v;
    }
  } else {
    for (let r = 0; r < count; r++) {
      const i = active[r]!;
      const si = s[r]!;
      const o = i * k;
      for (let j = 1; j < k; j++) work[j * count + r] = si * b[o + j]!;
      work[k * count + r] = si * c[i]!;
    }
  }
  for (let j = 0; j < k; j++) {
    const oj = j * count;
    const next = j + 1;
    if (alpha === 0) {
      diag[j] = 0;
      if (next < k) {
        const on = next * count;
        let sq = 0;
        for (let r = next; r < count; r++) sq += work[on + r]! * work[on + r]!;
        alpha = reflectorOf(work, on, next, sq);
      }
      dotsReady = false;
      continue;
    }
    const vv = -alpha * work[oj + j]!;
    if (!dotsReady) {
      for (let col = next; col <= k; col++) {
        const oc = col * count;
        let dot = 0;
        for (let r = j; r < count; r++) dot += work[oj + r]! * work[oc + r]!;
        dots[col] = dot;
      }
    }
    diag[j] = alpha;
    // Column j + 1: updated, its next norm summed on the way, its reflector formed.
    let nextAlpha = 0;
    {
      const on = next * count;
      const f = dots[next]! / vv;
      work[on + j]! -= f * work[oj + j]!;
      if (next < k) {
        let sq = 0;
        for (let r = next; r < count; r++) {
          const v = work[on + r]! - f * work[oj + r]!;
          work[on + r] = v;
          sq += v * v;
        }
        nextAlpha = reflectorOf(work, on, next, sq);
      } else {
        for (let r = next; r < count; r++) work[on + r]! -= f * work[oj + r]!;
      }
    }
    // Later columns: updated, and their dot products with v_{j+1} summed on the way when it exists.
    const on = next * count;
    const fuse = nextAlpha !== 0;
    for (let col = next + 1; col <= k; col++) {
      const oc = col * count;
      const f = dots[col]! / vv;
      work[oc + j]! -= f * work[oj + j]!;
      if (fuse) {
        let dot = 0;
        for (let r = next; r < count; r++) {
          const v = work[oc + r]! - f * work[oj + r]!;
          work[oc + r] = v;
          dot += work[on + r]! * v;
        }
        dots[col] = dot;
      } else {
        for (let r = next; r < count; r++) work[oc + r]! -= f * work[oj + r]!;
      }
    }
    alpha = nextAlpha;
    dotsReady = fuse;
  }
  for (let j = k - 1; j >= 0; j--) {
    let v = work[k * count + j]!;
    for (let col = j + 1; col < k; col++) v -= work[col * count + j]! * z[col]!;
    z[j] = diag[j] !== 0 ? v / diag[j]! : 0;
  }
}

/**
 * Reflector of the column at offset `o` from row j, whose rows ≥ j have sum of squares `sumSq`: returns
 * alpha = ∓‖x‖ (sign opposite to x_j) and stores v = x − alpha e_j in place, or returns 0 (nothing
 * stored) when the norm is 0.
 */
function reflectorOf(work: Float64Array, o: number, j: number, sumSq: number): number {
  const norm = Math.sqrt(sumSq);
  if (norm === 0) return 0;
  const alpha = work[o + j]! > 0 ? -norm : norm;
  work[o + j]! -= alpha;
  return alpha;
}

/**
 * |(b_i·z − c_i) / L_i| of row i, summed as −c_i + b_i0 z_0 + b_i1 z_1 + … in that order (unrolled for the
 * usual k = 8: the same operations).
 */
function rowError(b: Float64Array, c: Float64Array, limits: Float64Array, k: number, z: Float64Array, i: number): number {
  let v = -c[i]!;
  const o = i * k;
  if (k === 8) {
    v += b[o]! * z[0]!;
    v += b[o + 1]! * z[1]!;
    v += b[o + 2]! * z[2]!;
    v += b[o + 3]! * z[3]!;
    v += b[o + 4]! * z[4]!;
    v += b[o + 5]! * z[5]!;
    v += b[o + 6]! * z[6]!;
    v += b[o + 7]! * z[7]!;
  } else {
    for (let j = 0; j < k; j++) v += b[o + j]! * z[j]!;
  }
  return Math.abs(v / limits[i]!);
}

/**
 * |e_i| of rows [0, rows) for z; returns the max. For k = 8 the loop holds z in locals (rowError's operations
 * in its order: the same doubles; the typed-array reads of z it saves are what V8 cannot hoist, as e might
 * alias z).
 */
function errorsOf(b: Float64Array, c: Float64Array, limits: Float64Array, k: number, z: Float64Array, e: Float64Array, rows = c.length): number {
  let worst = 0;
  if (k === 8) {
    const z0 = z[0]!, z1 = z[1]!, z2 = z[2]!, z3 = z[3]!, z4 = z[4]!, z5 = z[5]!, z6 = z[6]!, z7 = z[7]!; // prettier-ignore
    for (let i = 0, o = 0; i < rows; i++, o += 8) {
      let v = -c[i]!;
      v += b[o]! * z0;
      v += b[o + 1]! * z1;
      v += b[o + 2]! * z2;
      v += b[o + 3]! * z3;
      v += b[o + 4]! * z4;
      v += b[o + 5]! * z5;
      v += b[o + 6]! * z6;
      v += b[o + 7]! * z7;
      const a = Math.abs(v / limits[i]!);
      e[i] = a;
      if (!(a <= worst)) worst = a;
    }
    return worst;
  }
  for (let i = 0; i < rows; i++) {
    const a = rowError(b, c, limits, k, z, i);
    e[i] = a;
    if (!(a <= worst)) worst = a;
  }
  return worst;
}

/**
 * Marks the rows at which |e| has a local maximum along T within its series (one series per quantity and
 * range: rows are sample-major with `stride` quantities per sample, the low range's first `lowRows` rows)
 * and exceeds `above`; returns how many were not marked before. `rows` = e's length in use. With `list`,
 * lists the maxima instead of marking them; with `fresh`, also writes the newly marked rows there.
 */
function markLocalMaxima(e: Float64Array, rows: number, stride: number, lowRows: number, inSet: Uint8Array, above: number, list?: number[], fresh?: Int32Array): number {
  let added = 0;
  for (let part = 0; part < 2; part++) {
    const from = part === 0 ? 0 : lowRows;
    const to = part === 0 ? lowRows : rows;
    for (let q = 0; q < stride; q++) {
      for (let i = from + q; i < to; i += stride) {
        const prev = i - stride >= from ? e[i - stride]! : -Infinity;
        const next = i + stride < to ? e[i + stride]! : -Infinity;
        if (e[i]! >= prev && e[i]! >= next && e[i]! > above) {
          if (list) list.push(i);
          else if (!inSet[i]) {
            inSet[i] = 1;
            if (fresh) fresh[added] = i;
            added++;
          }
        }
      }
    }
  }
  return added;
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
  cutoff: number,
): { z: Float64Array; iterations: number; cut: boolean } | undefined {
  const n = set.length;
  ensure(n, k, c.length);
  const { work, s, w, e, diag, z, dots } = scratch;
  // The set's rows of b, c and the limits, copied next to each other once: every step then reads
  // consecutive memory, indexed by position in the set (the same values, so the same arithmetic).
  if (scratch.setB.length < n * k) scratch.setB = new Float64Array(n * k);
  if (scratch.setC.length < n) {
    scratch.setC = new Float64Array(n);
    scratch.setL = new Float64Array(n);
  }
  const sb = scratch.setB;
  const sc = scratch.setC;
  const sl = scratch.setL;
  for (let r = 0; r < n; r++) {
    const i = set[r]!;
    for (let j = 0; j < k; j++) sb[r * k + j] = b[i * k + j]!;
    sc[r] = c[i]!;
    sl[r] = limits[i]!;
  }
  let pos = scratch.posA;
  let nextPos = scratch.posB;
  w.fill(1 / n, 0, n);
  for (let r = 0; r < n; r++) pos[r] = r;
  let count = n;
  let bestZ: Float64Array | undefined;
  let bestWorst = 0;
  let lowerBound = 0;
  let iterations = 0;
  for (; iterations < MAX_ITERATIONS; iterations++) {
    for (let r = 0; r < count; r++) s[r] = Math.sqrt(w[pos[r]!]!) / sl[pos[r]!]!;
    weightedSolve(sb, sc, s, pos, count, k, work, diag, z, dots);
    // e, max, Σ w e² and Σ w e over the set (errorsOf's loop, with the two sums).
    const worst = errorsOf(sb, sc, sl, k, z, e, n);
    let bound = 0;
    let total = 0;
    for (let r = 0; r < n; r++) {
      const a = e[r]!;
      bound += w[r]! * a * a;
      total += w[r]! * a;
    }
    if (!Number.isFinite(worst)) break;
    lowerBound = Math.max(lowerBound, Math.sqrt(bound));
    if (!bestZ || worst < bestWorst) {
      bestZ ??= new Float64Array(k);
      bestZ.set(z.subarray(0, k));
      bestWorst = worst;
    }
    // The optimum on the set, hence on all rows, is at least lowerBound: at or above the cutoff this fit
    // cannot matter to the caller.
    if (lowerBound >= cutoff) return { z: bestZ, iterations: iterations + 1, cut: true };
    if (bestWorst - lowerBound <= RELATIVE_GAP * bestWorst || total === 0) {
      iterations++;
      break;
    }
    let wMax = 0;
    let wSum = 0;
    // A pruned row (w = +0) keeps w = 0 · |e|^β = +0 whenever |e|^β is finite, as it is for |e| ≤ worst <
    // 1e200; skipping its power (the costliest operation of the step) then changes no double: +0 neither
    // raises wMax nor changes wSum.
    if (worst < 1e200) {
      for (let r = 0; r < n; r++) {
        const wr = w[r]!;
        if (wr === 0) continue;
        const u = wr * e[r]! ** BETA;
        w[r] = u;
        if (u > wMax) wMax = u;
        wSum += u;
      }
    } else {
      for (let r = 0; r < n; r++) {
        w[r] = w[r]! * e[r]! ** BETA;
        if (w[r]! > wMax) wMax = w[r]!;
        wSum += w[r]!;
      }
    }
    for (let r = 0; r < n; r++) w[r] = w[r]! / wSum;
    wMax /= wSum;
    let kept = 0;
    for (let r = 0; r < n; r++) {
      if (w[r]! >= PRUNE_FRACTION * wMax) nextPos[kept++] = r;
      else w[r] = 0;
    }
    if (kept < k) break;
    const swap = pos;
    pos = nextPos;
    nextPos = swap;
    count = kept;
  }
  return bestZ ? { z: bestZ, iterations, cut: false } : undefined;
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
  ensure(0, k, rows);
  const e = scratch.rowErrors;
  const inSet = scratch.inSet;
  inSet.fill(0, 0, rows);
  let best = { z: start, worst: errorsOf(b, c, limits, k, start, e) };
  // Start from the larger local maxima of the starting error, but never fewer than 3k rows.
  const maxima: number[] = [];
  markLocalMaxima(e, rows, stride, lowRows, inSet, -1, maxima);
  maxima.sort((x, y) => e[y]! - e[x]! || x - y);
  let size = 0;
  for (const i of maxima) {
    if (size < 3 * k || e[i]! > INITIAL_SET_FRACTION * best.worst) {
      inSet[i] = 1;
      size++;
    }
  }
  let iterations = 0;
  let lowerBound = 0;
  // The rows of the set, ascending: found by one pass over inSet for the first round; after that the rows
  // each round adds (sorted) are merged in, which gives the same list without passing over every row.
  if (scratch.ordered.length < rows) {
    scratch.ordered = new Int32Array(rows);
    scratch.merged = new Int32Array(rows);
    scratch.fresh = new Int32Array(rows);
  }
  let list = scratch.ordered;
  let spare = scratch.merged;
  const fresh = scratch.fresh;
  for (let i = 0, o = 0; i < rows && o < size; i++) if (inSet[i]) list[o++] = i;
  for (let round = 0; round < MAX_ROUNDS; round++) {
    if (size < k) break;
    const ordered = list.subarray(0, size);
    const r = lawsonOnSet(b, c, limits, k, ordered, cutoff);
    if (!r) break;
    iterations += r.iterations;
    if (r.cut) {
      const worst = errorsOf(b, c, limits, k, r.z, e);
      if (worst < best.worst) best = { z: r.z, worst };
      break;
    }
    const worst = errorsOf(b, c, limits, k, r.z, e);
    // The set's errors are among those just computed (rowError of the same z: the same doubles).
    let setWorst = 0;
    for (let o = 0; o < size; o++) setWorst = Math.max(setWorst, e[ordered[o]!]!);
    lowerBound = Math.max(lowerBound, setWorst * (1 - RELATIVE_GAP));
    if (worst < best.worst) best = { z: r.z, worst };
    if (worst <= setWorst * 1.001) break;
    const added = markLocalMaxima(e, rows, stride, lowRows, inSet, setWorst, undefined, fresh);
    if (added === 0) break;
    // Merge of two ascending lists of distinct rows (the new rows were not in the set).
    const adds = fresh.subarray(0, added).sort();
    let a = 0;
    let o = 0;
    let m = 0;
    while (o < size && a < added) spare[m++] = list[o]! < adds[a]! ? list[o++]! : adds[a++]!;
    while (o < size) spare[m++] = list[o++]!;
    while (a < added) spare[m++] = adds[a++]!;
    const swap = list;
    list = spare;
    spare = swap;
    size += added;
  }
  return { z: best.z, worst: best.worst, lowerBound, iterations };
}
