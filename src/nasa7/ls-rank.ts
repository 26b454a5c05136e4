/**
 * Least-squares ranking of the midpoint candidates of one species (mid-optimise.ts) on prepared samples,
 * with exact pruning. The search only uses the best `needed` candidates of the ranking (minimax: the two
 * best; least squares: the best), so a candidate whose score provably exceeds the `needed`-th best exact
 * score found so far need not be scored exactly.
 *
 * Exact score: ls-score.ts `leastSquaresScore` (max over rows of |r_i| / (√w_q L_q), or max |r_i|), same
 * arithmetic on typed arrays, so an evaluated candidate's score is bit-identical to it.
 *
 * Lower bound: the residual r = (I − B B⁺) y' of the reduced problem (B = A D⁻¹ Q2, solve.ts) at a few
 * rows (the first and last samples, every SUBSET_STRIDE-th sample, the samples around tMid), where
 *  - y' = y − A x_ref with x_ref = [p, p] for one seven-term polynomial p (a least-squares fit of Cp/R
 *    over the whole range, a6 and a7 set to meet the anchor conditions): x_ref meets every constraint of
 *    every candidate (continuity trivially, the anchor by construction), so the residual is the same as
 *    for y, while y' is 10²–10³ times smaller than y (fewer digits lost below);
 *  - B⁺ y' = (RᵀR)⁻¹ Q2ᵀ D⁻¹ (Aᵀ y') by the semi-normal equations (Å. Björck, Numerical Methods for
 *    Least Squares Problems, SIAM 1996, ch. 2, from memory; R from the cached QR of B), with Aᵀ y' from
 *    prefix sums over the samples: O(1) per candidate instead of O(rows).
 * The max over a subset of rows is ≤ the max over all rows. Two roundings separate this bound from the
 * exact score's own arithmetic: the semi-normal equations lose accuracy ∝ cond(B)² ‖y'‖, and the exact
 * score, computed from y by QR, carries errors ∝ cond(B) ‖y‖ (both Björck 1996, ch. 2, from memory).
 * The bound is therefore lowered by a margin MARGIN_SAFETY · u · (cond(B)² ‖y'‖₂ + cond(B) ‖y‖₂) ·
 * max_i ‖b_i‖₂ / min_i(√w_q L_q), u the unit round-off. Measured on the seeded synthetic set
 * (bench/synthetic.ts, 1,000 species) the two differ by at most 0.02 of the unscaled estimate, so
 * MARGIN_SAFETY leaves a factor of ≥ 5·10⁴ to spare, and the pruned search's results were identical to
 * the exhaustive one's for every species (bench/nasa7.ts --before). Pruned candidates get score Infinity
 * and rank after every evaluated one, so the first `needed` entries of the ranking are those of
 * exhaustive scoring. Cost: about two exact scores per species instead of one per candidate (measured).
 */
import { coordinates, projectorOf } from './ls-score.js';
import type { PreparedSamples, RangeSplit } from './prepared.js';
import { T_SCALE } from './scaling.js';
import type { FactoredProblem } from './solve.js';
import type { FitOptions } from './types.js';

/** Margin factor over the error estimate of the lower bound (see the module comment). */
export const MARGIN_SAFETY = 1e3;
/** Every SUBSET_STRIDE-th sample enters the lower bound (plus both ends and the samples around tMid). */
const SUBSET_STRIDE = 16;
const UNIT_ROUNDOFF = 2 ** -53;
const LN_T_SCALE = Math.log(T_SCALE);

export interface RankEntry {
  tMid: number;
  split: RangeSplit;
  f: FactoredProblem;
  /** Filled by `rankLeastSquares`: the exact score, or Infinity if pruned. */
  score: number;
}

/** Per factorisation: G = (RᵀR)⁻¹ Q2ᵀ D⁻¹ (k × n, row-major) and max_i ‖b_i‖₂. */
interface SemiNormal {
  g: Float64Array;
  rowNormMax: number;
}
const semiNormals = new WeakMap<FactoredProblem, SemiNormal>();

function semiNormalOf(f: FactoredProblem): SemiNormal {
  const hit = semiNormals.get(f);
  if (hit) return hit;
  const { n, m } = f;
  const k = n - m;
  const nr = f.rowCount;
  const qr = f.qrColumns;
  const rAt = (i: number, c: number) => (i === c ? f.rDiagonal[i]! : qr[c * nr + i]!);
  const g = new Float64Array(k * n);
  const w = new Float64Array(k);
  for (let j = 0; j < n; j++) {
    // Rᵀ w = (Q2ᵀ D⁻¹) e_j, then R g_j = w.
    for (let i = 0; i < k; i++) {
      let s = f.q[j * n + m + i]! / f.scale[j]!;
      for (let l = 0; l < i; l++) s -= rAt(l, i) * w[l]!;
      w[i] = s / rAt(i, i);
    }
    for (let i = k - 1; i >= 0; i--) {
      let s = w[i]!;
      for (let l = i + 1; l < k; l++) s -= rAt(i, l) * g[l * n + j]!;
      g[i * n + j] = s / rAt(i, i);
    }
  }
  let rowNormMax = 0;
  for (let row = 0; row < nr; row++) {
    let s = 0;
    for (let j = 0; j < k; j++) s += f.reduced[row * k + j]! ** 2;
    rowNormMax = Math.max(rowNormMax, Math.sqrt(s));
  }
  const made = { g, rowNormMax };
  semiNormals.set(f, made);
  return made;
}

/**
 * LU factors (partial pivoting) of the 5 × 5 normal matrix Σ φ φᵀ, φ = (1, τ, τ², τ³, τ⁴), of the last
 * temperature set seen: it depends on the temperatures only, which a build shares between species.
 */
let normalFactor: { T: Float64Array; lu: Float64Array; perm: Int32Array; ok: boolean } | undefined;

function sameTemperatures(a: Float64Array, b: Float64Array): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

function normalFactorOf(T: Float64Array): { lu: Float64Array; perm: Int32Array; ok: boolean } {
  if (normalFactor && sameTemperatures(normalFactor.T, T)) return normalFactor;
  const lu = new Float64Array(25);
  for (let i = 0; i < T.length; i++) {
    const tau = T[i]! / T_SCALE;
    const pw = [1, tau, tau * tau, tau ** 3, tau ** 4];
    for (let r = 0; r < 5; r++) for (let c = 0; c < 5; c++) lu[5 * r + c]! += pw[r]! * pw[c]!;
  }
  const perm = Int32Array.from([0, 1, 2, 3, 4]);
  let ok = true;
  for (let col = 0; col < 5 && ok; col++) {
    let piv = col;
    for (let r = col + 1; r < 5; r++) if (Math.abs(lu[5 * r + col]!) > Math.abs(lu[5 * piv + col]!)) piv = r;
    if (piv !== col) {
      for (let c = 0; c < 5; c++) [lu[5 * col + c], lu[5 * piv + c]] = [lu[5 * piv + c]!, lu[5 * col + c]!];
      [perm[col], perm[piv]] = [perm[piv]!, perm[col]!];
    }
    const d = lu[5 * col + col]!;
    if (!(Math.abs(d) > 0)) ok = false;
    for (let r = col + 1; r < 5 && ok; r++) {
      const fct = (lu[5 * r + col]! /= d);
      for (let c = col + 1; c < 5; c++) lu[5 * r + c]! -= fct * lu[5 * col + c]!;
    }
  }
  normalFactor = { T: T.slice(), lu, perm, ok };
  return normalFactor;
}

/**
 * p: least-squares fit of Cp/R by b1..b5 in τ over all samples (normal equations: only the size of the
 * residual matters here), b6 and b7 from H_rel(T_a) = 0 and S(T_a) = S_a. Zeros if that fails (then
 * y' = y, which the margin accounts for).
 */
function referencePolynomial(p: PreparedSamples): number[] {
  const zero = [0, 0, 0, 0, 0, 0, 0];
  const { lu, perm, ok } = normalFactorOf(p.T);
  if (!ok) return zero;
  let r0 = 0;
  let r1 = 0;
  let r2 = 0;
  let r3 = 0;
  let r4 = 0;
  for (let i = 0; i < p.n; i++) {
    const tau = p.T[i]! / T_SCALE;
    const c = p.cpR[i]!;
    const t2 = tau * tau;
    r0 += c;
    r1 += tau * c;
    r2 += t2 * c;
    r3 += t2 * tau * c;
    r4 += t2 * t2 * c;
  }
  const rhs = [r0, r1, r2, r3, r4];
  const b = [rhs[perm[0]!]!, rhs[perm[1]!]!, rhs[perm[2]!]!, rhs[perm[3]!]!, rhs[perm[4]!]!, 0, 0];
  for (let r = 1; r < 5; r++) for (let c = 0; c < r; c++) b[r]! -= lu[5 * r + c]! * b[c]!;
  for (let r = 4; r >= 0; r--) {
    for (let c = r + 1; c < 5; c++) b[r]! -= lu[5 * r + c]! * b[c]!;
    b[r] = b[r]! / lu[5 * r + r]!;
  }
  const ta = p.anchor.T / T_SCALE;
  b[5] = -ta * (b[0]! + ta * (b[1]! / 2 + ta * (b[2]! / 3 + ta * (b[3]! / 4 + ta * (b[4]! / 5)))));
  b[6] = p.anchor.sR - (b[0]! * Math.log(ta) + ta * (b[1]! + ta * (b[2]! / 2 + ta * (b[3]! / 3 + ta * (b[4]! / 4)))));
  return b.every(Number.isFinite) ? b : zero;
}

/**
 * Per-species work arrays of the ranking, reused from species to species (a worker fits one species at a
 * time): each is fully written before it is read (prefix from its first seven zeros on), nothing kept.
 */
const work = { yp: new Float64Array(0), prefix: new Float64Array(0), divisor: new Float64Array(0) };

function scratchOf(key: keyof typeof work, length: number): Float64Array {
  if (work[key].length < length) work[key] = new Float64Array(length);
  return work[key].subarray(0, length);
}

/** y' (3 per sample, weighted), prefix sums of Aᵀ y' per sample (7 × (n + 1)), ‖y'‖₂ and ‖y‖₂ over all samples. */
function reducedData(p: PreparedSamples, weights: FitOptions['weights']): { yp: Float64Array; prefix: Float64Array; norm: number; targetNorm: number } {
  const b = referencePolynomial(p);
  const wc = Math.sqrt(weights.cp);
  const wh = Math.sqrt(weights.h);
  const ws = Math.sqrt(weights.s);
  const yp = scratchOf('yp', 3 * p.n);
  const prefix = scratchOf('prefix', 7 * (p.n + 1));
  prefix.fill(0, 0, 7);
  let sumSq = 0;
  let targetSq = 0;
  for (let i = 0; i < p.n; i++) {
    targetSq += (wc * p.cpR[i]!) ** 2 + (wh * p.hRel[i]!) ** 2 + (ws * p.sR[i]!) ** 2;
    const t = p.T[i]! / T_SCALE;
    const lt = p.lnT[i]! - LN_T_SCALE;
    const t2 = t * t;
    const t3 = t2 * t;
    const t4 = t3 * t;
    const pc = b[0]! + b[1]! * t + b[2]! * t2 + b[3]! * t3 + b[4]! * t4;
    const ph = b[0]! + (b[1]! * t) / 2 + (b[2]! * t2) / 3 + (b[3]! * t3) / 4 + (b[4]! * t4) / 5 + b[5]! / t;
    const ps = b[0]! * lt + b[1]! * t + (b[2]! * t2) / 2 + (b[3]! * t3) / 3 + (b[4]! * t4) / 4 + b[6]!;
    const yc = wc * (p.cpR[i]! - pc);
    const yh = wh * (p.hRel[i]! - ph);
    const ys = ws * (p.sR[i]! - ps);
    yp[3 * i] = yc;
    yp[3 * i + 1] = yh;
    yp[3 * i + 2] = ys;
    sumSq += yc * yc + yh * yh + ys * ys;
    const c = wc * yc;
    const h = wh * yh;
    const s = ws * ys;
    const o = 7 * i;
    prefix[o + 7] = prefix[o]! + (c + h + s * lt);
    prefix[o + 8] = prefix[o + 1]! + t * (c + h / 2 + s);
    prefix[o + 9] = prefix[o + 2]! + t2 * (c + h / 3 + s / 2);
    prefix[o + 10] = prefix[o + 3]! + t3 * (c + h / 4 + s / 3);
    prefix[o + 11] = prefix[o + 4]! + t4 * (c + h / 5 + s / 4);
    prefix[o + 12] = prefix[o + 5]! + h / t;
    prefix[o + 13] = prefix[o + 6]! + s;
  }
  return { yp, prefix, norm: Math.sqrt(sumSq), targetNorm: Math.sqrt(targetSq) };
}

let scratchY = new Float64Array(0);
const scratchT = new Float64Array(64);

/** ls-score.ts `leastSquaresScore` of one prepared split (all weights > 0), same arithmetic. */
export function exactScore(p: PreparedSamples, e: RankEntry, options: FitOptions): { limitRatio: number; weighted: number } {
  const { f, split } = e;
  const w = options.weights;
  const k = f.n - f.m;
  const nr = f.rowCount;
  const { q1, h } = projectorOf(f);
  if (scratchY.length < nr) scratchY = new Float64Array(nr);
  const y = scratchY;
  const wc = Math.sqrt(w.cp);
  const wh = Math.sqrt(w.h);
  const ws = Math.sqrt(w.s);
  const ranges = [[0, split.lowEnd], [split.highStart, p.n]] as const;
  let row = 0;
  for (const [from, to] of ranges) {
    for (let i = from; i < to; i++) {
      y[row++] = wc * p.cpR[i]!;
      y[row++] = wh * p.hRel[i]!;
      y[row++] = ws * p.sR[i]!;
    }
  }
  const t = k <= scratchT.length ? scratchT : new Float64Array(k);
  coordinates(f, q1, y, t);
  const b = f.reduced;
  const sA = p.anchor.sR;
  const res = residuals(y, h, sA, b, t, k, nr);
  let weighted = 0;
  let limitRatio = 0;
  row = 0;
  for (const [from, to] of ranges) {
    for (let i = from; i < to; i++) {
      for (let q = 0; q < 3; q++) {
        const r = res[row]!;
        if (!(r <= weighted)) weighted = r;
        const wq = q === 0 ? wc : q === 1 ? wh : ws;
        const lim = q === 0 ? p.limCp[i]! : q === 1 ? p.limH[i]! : p.limS[i]!;
        const ratio = r / (wq * lim);
        if (!(ratio <= limitRatio)) limitRatio = ratio;
        row++;
      }
    }
  }
  return { limitRatio, weighted };
}

let scratchR = new Float64Array(0);

/** |y_i − s_A h_i − b_i·t| of every row, in ls-score.ts's order of operations (unrolled for k = 8). */
function residuals(y: Float64Array, h: Float64Array, sA: number, b: Float64Array, t: Float64Array, k: number, nr: number): Float64Array {
  if (scratchR.length < nr) scratchR = new Float64Array(nr);
  const out = scratchR;
  if (k === 8) {
    const t0 = t[0]!, t1 = t[1]!, t2 = t[2]!, t3 = t[3]!, t4 = t[4]!, t5 = t[5]!, t6 = t[6]!, t7 = t[7]!; // prettier-ignore
    for (let row = 0; row < nr; row++) {
      const o = row * 8;
      let r = y[row]! - sA * h[row]!;
      r -= b[o]! * t0;
      r -= b[o + 1]! * t1;
      r -= b[o + 2]! * t2;
      r -= b[o + 3]! * t3;
      r -= b[o + 4]! * t4;
      r -= b[o + 5]! * t5;
      r -= b[o + 6]! * t6;
      r -= b[o + 7]! * t7;
      out[row] = Math.abs(r);
    }
  } else {
    for (let row = 0; row < nr; row++) {
      let r = y[row]! - sA * h[row]!;
      const o = row * k;
      for (let j = 0; j < k; j++) r -= b[o + j]! * t[j]!;
      out[row] = Math.abs(r);
    }
  }
  return out;
}

/**
 * max over q of |y'_q(i) − b_row·t| / divisor for the three rows of sample i from `row0` (for k = 8 with t
 * read once into locals: the same products summed in the same order).
 */
export function boundAt(b: Float64Array, k: number, t: Float64Array, yp: Float64Array, divisor: Float64Array, i: number, row0: number): number {
  let worst = 0;
  if (k === 8) {
    const t0 = t[0]!, t1 = t[1]!, t2 = t[2]!, t3 = t[3]!, t4 = t[4]!, t5 = t[5]!, t6 = t[6]!, t7 = t[7]!; // prettier-ignore
    for (let q = 0; q < 3; q++) {
      const o = (row0 + q) * 8;
      let r = yp[3 * i + q]!;
      r -= b[o]! * t0 + b[o + 1]! * t1 + b[o + 2]! * t2 + b[o + 3]! * t3 + b[o + 4]! * t4 + b[o + 5]! * t5 + b[o + 6]! * t6 + b[o + 7]! * t7;
      const v = Math.abs(r) / divisor[3 * i + q]!;
      if (v > worst) worst = v;
    }
    return worst;
  }
  for (let q = 0; q < 3; q++) {
    const o = (row0 + q) * k;
    let r = yp[3 * i + q]!;
    for (let j = 0; j < k; j++) r -= b[o + j]! * t[j]!;
    const v = Math.abs(r) / divisor[3 * i + q]!;
    if (v > worst) worst = v;
  }
  return worst;
}

/**
 * Scores `entries` (ascending tMid, each a split the coverage rules accept and its factorisation) so that
 * the first `needed` of a stable ascending sort by score are those of exhaustive exact scoring. `mode`:
 * the limit-relative measure (minimax search) or the weighted one (least-squares search).
 */
export function rankLeastSquares(p: PreparedSamples, entries: RankEntry[], options: FitOptions, needed: number, mode: 'limitRatio' | 'weighted'): void {
  if (entries.length <= needed) {
    for (const e of entries) e.score = exactScore(p, e, options)[mode];
    return;
  }
  const w = options.weights;
  const sq = [Math.sqrt(w.cp), Math.sqrt(w.h), Math.sqrt(w.s)];
  const { yp, prefix, norm, targetNorm } = reducedData(p, w);
  let minDivisor = 1;
  if (mode === 'limitRatio') {
    minDivisor = Infinity;
    for (let i = 0; i < p.n; i++) minDivisor = Math.min(minDivisor, sq[0]! * p.limCp[i]!, sq[1]! * p.limH[i]!, sq[2]! * p.limS[i]!);
  }
  // Divisor of each sample row's |r| in the measure, and the fixed part of the subset.
  const divisor = scratchOf('divisor', 3 * p.n);
  for (let i = 0; i < p.n; i++) {
    divisor[3 * i] = mode === 'limitRatio' ? sq[0]! * p.limCp[i]! : 1;
    divisor[3 * i + 1] = mode === 'limitRatio' ? sq[1]! * p.limH[i]! : 1;
    divisor[3 * i + 2] = mode === 'limitRatio' ? sq[2]! * p.limS[i]! : 1;
  }
  const subset: number[] = [];
  for (let i = 0; i < p.n; i++) if (i < 4 || i >= p.n - 2 || i % SUBSET_STRIDE === 0) subset.push(i);
  const aty = new Float64Array(14);
  const t = new Float64Array(64);
  const bounds = entries.map((e) => {
    const { f, split } = e;
    const n = f.n;
    const k = n - f.m;
    const sn = semiNormalOf(f);
    // Aᵀ y' of this split: low rows are samples [0, lowEnd), high rows [highStart, n).
    for (let j = 0; j < 7; j++) {
      aty[j] = prefix[7 * split.lowEnd + j]!;
      aty[7 + j] = prefix[7 * p.n + j]! - prefix[7 * split.highStart + j]!;
    }
    for (let i = 0; i < k; i++) {
      let s = 0;
      for (let j = 0; j < n; j++) s += sn.g[i * n + j]! * aty[j]!;
      t[i] = s;
    }
    const b = f.reduced;
    const nLow = split.lowEnd;
    const shift = 3 * (nLow - split.highStart);
    let lb = 0;
    // The fixed subset, then the samples next to tMid on both sides (a repeated row changes no max).
    for (let pass = 0; pass < 2; pass++) {
      const count = pass === 0 ? subset.length : 8;
      for (let c = 0; c < count; c++) {
        const i = pass === 0 ? subset[c]! : nLow - 4 + c;
        if (i < 0 || i >= p.n) continue;
        if (i < nLow) lb = Math.max(lb, boundAt(b, k, t, yp, divisor, i, 3 * i));
        if (i >= split.highStart) lb = Math.max(lb, boundAt(b, k, t, yp, divisor, i, 3 * i + shift));
      }
    }
    const cond = f.conditionNumber;
    const margin = (MARGIN_SAFETY * UNIT_ROUNDOFF * (cond * cond * norm + cond * targetNorm) * sn.rowNormMax) / minDivisor;
    return { e, bound: Number.isFinite(lb) && Number.isFinite(margin) ? lb - margin : -Infinity };
  });
  const order = bounds.map((_, i) => i).sort((x, y) => bounds[x]!.bound - bounds[y]!.bound || x - y);
  const best: number[] = [];
  for (const i of order) {
    const { e, bound } = bounds[i]!;
    const kth = best.length >= needed ? best[needed - 1]! : Infinity;
    if (bound > kth) {
      e.score = Infinity;
      continue;
    }
    e.score = exactScore(p, e, options)[mode];
    best.push(e.score);
    best.sort((a, b) => a - b);
  }
}
