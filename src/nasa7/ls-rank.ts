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
 *  - B⁺ y' = (RᵀR)⁻¹ Q2ᵀ D⁻¹ (Aᵀ y') by the semi-normal equations (Björck 1996, §2.2.3; R from the cached
 *    QR of B), with Aᵀ y' from prefix sums over the samples: O(1) per candidate instead of O(rows).
 * The max over a subset of rows is ≤ the max over all rows. The semi-normal equations lose accuracy
 * ∝ cond(B)² (Björck §2.2.3), so the bound is lowered by a margin: MARGIN_SAFETY · u · cond(B)² · ‖y'‖₂ ·
 * max_i ‖b_i‖₂ / min_i(√w_q L_q), with u the unit round-off. The actual error measured on the seeded
 * synthetic set was at most ~1e-4 of that margin (bench/nasa7.ts compares the whole search with the
 * exhaustive one), so a pruned candidate's exact score is above the `needed`-th best with a wide
 * safety factor. The ranking's first `needed` entries are then those of exhaustive scoring: pruned
 * candidates get score Infinity and rank after every evaluated one.
 */
import { coordinates, projectorOf } from './ls-score.js';
import type { PreparedSamples, RangeSplit } from './prepared.js';
import { T_SCALE } from './scaling.js';
import type { FactoredProblem } from './solve.js';
import type { FitOptions } from './types.js';

/** Margin factor over the error estimate of the lower bound (see the module comment). */
export const MARGIN_SAFETY = 1e3;
/** Every SUBSET_STRIDE-th sample enters the lower bound (plus both ends and the samples around tMid). */
const SUBSET_STRIDE = 6;
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
  const nr = f.scaledRows.length;
  const qr = f.qrColumns;
  const rAt = (i: number, c: number) => (i === c ? f.rDiagonal[i]! : qr[c * nr + i]!);
  const g = new Float64Array(k * n);
  const w = new Float64Array(k);
  for (let j = 0; j < n; j++) {
    // Rᵀ w = (Q2ᵀ D⁻¹) e_j, then R g_j = w.
    for (let i = 0; i < k; i++) {
      let s = f.q[j]![m + i]! / f.scale[j]!;
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
 * p: least-squares fit of Cp/R by b1..b5 in τ over all samples (normal equations: only the size of the
 * residual matters here), b6 and b7 from H_rel(T_a) = 0 and S(T_a) = S_a. Returns zeros if singular.
 */
function referencePolynomial(p: PreparedSamples): number[] {
  const a = Array.from({ length: 5 }, () => new Array<number>(6).fill(0));
  for (let i = 0; i < p.n; i++) {
    const tau = p.T[i]! / T_SCALE;
    const pw = [1, tau, tau * tau, tau ** 3, tau ** 4];
    for (let r = 0; r < 5; r++) {
      for (let c = 0; c < 5; c++) a[r]![c]! += pw[r]! * pw[c]!;
      a[r]![5]! += pw[r]! * p.cpR[i]!;
    }
  }
  for (let col = 0; col < 5; col++) {
    let piv = col;
    for (let r = col + 1; r < 5; r++) if (Math.abs(a[r]![col]!) > Math.abs(a[piv]![col]!)) piv = r;
    [a[col], a[piv]] = [a[piv]!, a[col]!];
    const d = a[col]![col]!;
    if (!(Math.abs(d) > 0)) return new Array<number>(7).fill(0);
    for (let r = col + 1; r < 5; r++) {
      const fct = a[r]![col]! / d;
      for (let c = col; c < 6; c++) a[r]![c]! -= fct * a[col]![c]!;
    }
  }
  const b = new Array<number>(7).fill(0);
  for (let r = 4; r >= 0; r--) {
    let s = a[r]![5]!;
    for (let c = r + 1; c < 5; c++) s -= a[r]![c]! * b[c]!;
    b[r] = s / a[r]![r]!;
  }
  const ta = p.anchor.T / T_SCALE;
  b[5] = -ta * (b[0]! + ta * (b[1]! / 2 + ta * (b[2]! / 3 + ta * (b[3]! / 4 + ta * (b[4]! / 5)))));
  b[6] = p.anchor.sR - (b[0]! * Math.log(ta) + ta * (b[1]! + ta * (b[2]! / 2 + ta * (b[3]! / 3 + ta * (b[4]! / 4)))));
  return b.every(Number.isFinite) ? b : new Array<number>(7).fill(0);
}

/** y' (3 per sample, weighted), prefix sums of Aᵀ y' per sample (7 × (n + 1)), ‖y'‖₂. */
function reducedData(p: PreparedSamples, weights: FitOptions['weights']): { yp: Float64Array; prefix: Float64Array; norm: number } {
  const b = referencePolynomial(p);
  const wc = Math.sqrt(weights.cp);
  const wh = Math.sqrt(weights.h);
  const ws = Math.sqrt(weights.s);
  const yp = new Float64Array(3 * p.n);
  const prefix = new Float64Array(7 * (p.n + 1));
  let sumSq = 0;
  for (let i = 0; i < p.n; i++) {
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
    const v = [c + h + s * lt, t * (c + h / 2 + s), t2 * (c + h / 3 + s / 2), t3 * (c + h / 4 + s / 3), t4 * (c + h / 5 + s / 4), h / t, s];
    for (let j = 0; j < 7; j++) prefix[o + 7 + j] = prefix[o + j]! + v[j]!;
  }
  return { yp, prefix, norm: Math.sqrt(sumSq) };
}

let scratchY = new Float64Array(0);
const scratchT = new Float64Array(64);

/** ls-score.ts `leastSquaresScore` of one prepared split (all weights > 0), same arithmetic. */
export function exactScore(p: PreparedSamples, e: RankEntry, options: FitOptions): { limitRatio: number; weighted: number } {
  const { f, split } = e;
  const w = options.weights;
  const k = f.n - f.m;
  const nr = f.scaledRows.length;
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
  let weighted = 0;
  let limitRatio = 0;
  row = 0;
  for (const [from, to] of ranges) {
    for (let i = from; i < to; i++) {
      for (let q = 0; q < 3; q++) {
        let r = y[row]! - sA * h[row]!;
        const o = row * k;
        for (let j = 0; j < k; j++) r -= b[o + j]! * t[j]!;
        r = Math.abs(r);
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
  const { yp, prefix, norm } = reducedData(p, w);
  let minDivisor = 1;
  if (mode === 'limitRatio') {
    minDivisor = Infinity;
    for (let i = 0; i < p.n; i++) minDivisor = Math.min(minDivisor, sq[0]! * p.limCp[i]!, sq[1]! * p.limH[i]!, sq[2]! * p.limS[i]!);
  }
  const lims = [p.limCp, p.limH, p.limS];
  const bounds = entries.map((e) => {
    const { f, split } = e;
    const n = f.n;
    const k = n - f.m;
    const sn = semiNormalOf(f);
    // Aᵀ y' of this split: low rows are samples [0, lowEnd), high rows [highStart, n).
    const aty = new Float64Array(n);
    for (let j = 0; j < 7; j++) {
      aty[j] = prefix[7 * split.lowEnd + j]!;
      aty[7 + j] = prefix[7 * p.n + j]! - prefix[7 * split.highStart + j]!;
    }
    const t = new Float64Array(k);
    for (let i = 0; i < k; i++) {
      let s = 0;
      for (let j = 0; j < n; j++) s += sn.g[i * n + j]! * aty[j]!;
      t[i] = s;
    }
    let lb = 0;
    const b = f.reduced;
    const visit = (i: number, row0: number) => {
      for (let q = 0; q < 3; q++) {
        const row = row0 + q;
        let r = yp[3 * i + q]!;
        for (let j = 0; j < k; j++) r -= b[row * k + j]! * t[j]!;
        const v = mode === 'limitRatio' ? Math.abs(r) / (sq[q]! * lims[q]![i]!) : Math.abs(r);
        if (v > lb) lb = v;
      }
    };
    const nLow = split.lowEnd;
    const inSubset = (i: number) => i < 4 || i >= p.n - 2 || i % SUBSET_STRIDE === 0 || Math.abs(i - nLow) <= 3;
    for (let i = 0; i < nLow; i++) if (inSubset(i)) visit(i, 3 * i);
    for (let i = split.highStart; i < p.n; i++) if (inSubset(i)) visit(i, 3 * (nLow + i - split.highStart));
    const cond = f.conditionNumber;
    const margin = (MARGIN_SAFETY * UNIT_ROUNDOFF * cond * cond * norm * sn.rowNormMax) / minDivisor;
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
