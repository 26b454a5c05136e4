/**
 * Cheap score of the least-squares fit at one midpoint candidate, for ranking the candidates of the
 * midpoint search (mid-optimise.ts) without building a polynomial or its metrics.
 *
 * The weighted residual of design row i is r_i = √w_q (p_q(T_i) − y_i) for the τ-form coefficients the
 * solver returns (solve.ts), so
 *   - the limit-relative measure of the check (limit-ratio.ts) is max_i |r_i| / (√w_q L_q(T_i)), and
 *   - the weighted measure of a least-squares search is max_i |r_i| (= max_q √w_q · maxAbs_q).
 * Both equal the values computed from the finished polynomial (fit-fixed-mid.ts) up to rounding: the
 * finished T-form coefficients differ from the τ-form ones only by the exact power-of-two unscaling and
 * the re-derivation of a6, a7 at rounding level. The search therefore ranks the same candidates in the
 * same order except between candidates whose scores agree to ~1e-12 relative, where either choice is
 * equally good. Cost per candidate: one application of the cached factorisation plus one pass over the
 * rows (typed arrays, no per-sample objects). Memory: the projector kept beside each cached
 * factorisation holds (k + 1) doubles per row (≈ 0.13 MB on a 10 K grid) and goes with it.
 */
import { factorisationFor } from './factor-cache.js';
import { constraintRhs } from './fit-fixed-mid.js';
import { limitAt } from './limits.js';
import { splitSamples } from './samples.js';
import { particularSolution, scaledRowDot, type FactoredProblem } from './solve.js';
import type { FitOptions, FitSample } from './types.js';

export interface LeastSquaresScore {
  /** max_i |r_i| / (√w_q L_q(T_i)); Infinity if a weight is zero (that quantity has no rows). */
  limitRatio: number;
  /** max_i |r_i|. */
  weighted: number;
}

/**
 * Per factorisation (cached beside it, weakly): Q1 = the first k columns of the reduced QR's Q (k rows of
 * length nr) and h = (I − B B⁺) g, with g = A D⁻¹ u_p(e₂) the reduced target of a unit anchor S/R (the only
 * non-zero constraint value; the H anchor target is 0 because the fit uses the relative enthalpy).
 */
export interface Projector {
  q1: Float64Array;
  h: Float64Array;
}
const projectors = new WeakMap<FactoredProblem, Projector>();

/** z = R⁻¹ Q1ᵀ v (the least-squares coordinates of v) into `t` (length k). */
export function coordinates(f: FactoredProblem, q1: Float64Array, v: Float64Array, t: Float64Array): void {
  const k = f.n - f.m;
  const nr = f.rowCount;
  if (k === 8) {
    // The eight sums in one pass over v, each accumulated in the same order as below: the same doubles.
    let s0 = 0, s1 = 0, s2 = 0, s3 = 0, s4 = 0, s5 = 0, s6 = 0, s7 = 0; // prettier-ignore
    for (let i = 0; i < nr; i++) {
      const x = v[i]!;
      s0 += q1[i]! * x;
      s1 += q1[nr + i]! * x;
      s2 += q1[2 * nr + i]! * x;
      s3 += q1[3 * nr + i]! * x;
      s4 += q1[4 * nr + i]! * x;
      s5 += q1[5 * nr + i]! * x;
      s6 += q1[6 * nr + i]! * x;
      s7 += q1[7 * nr + i]! * x;
    }
    t[0] = s0;
    t[1] = s1;
    t[2] = s2;
    t[3] = s3;
    t[4] = s4;
    t[5] = s5;
    t[6] = s6;
    t[7] = s7;
  } else {
    for (let j = 0; j < k; j++) {
      let s = 0;
      const o = j * nr;
      for (let i = 0; i < nr; i++) s += q1[o + i]! * v[i]!;
      t[j] = s;
    }
  }
  for (let col = k - 1; col >= 0; col--) {
    t[col] = t[col]! / f.rDiagonal[col]!;
    for (let i = 0; i < col; i++) t[i] = t[i]! - t[col]! * f.qrColumns[col * nr + i]!;
  }
}

export function projectorOf(f: FactoredProblem): Projector {
  const hit = projectors.get(f);
  if (hit) return hit;
  const k = f.n - f.m;
  const nr = f.rowCount;
  const qr = f.qrColumns;
  const q1 = new Float64Array(k * nr);
  for (let j = 0; j < k; j++) {
    // Q e_j = H_0 H_1 … H_{k−1} e_j, each reflection applied as in solveFactored.
    const v = q1.subarray(j * nr, (j + 1) * nr);
    v[j] = 1;
    for (let c = k - 1; c >= 0; c--) {
      const o = c * nr;
      let s = 0;
      for (let i = c; i < nr; i++) s += qr[o + i]! * v[i]!;
      s = -s / qr[o + c]!;
      for (let i = c; i < nr; i++) v[i] = v[i]! + s * qr[o + i]!;
    }
  }
  const unit = new Array<number>(f.m).fill(0);
  unit[1] = 1;
  const up = particularSolution(f, unit);
  const h = new Float64Array(nr);
  for (let row = 0; row < nr; row++) {
    h[row] = scaledRowDot(f, row, up);
  }
  const t = new Float64Array(k);
  coordinates(f, q1, h, t);
  for (let row = 0; row < nr; row++) {
    let p = 0;
    for (let j = 0; j < k; j++) p += f.reduced[row * k + j]! * t[j]!;
    h[row] = h[row]! - p;
  }
  const made = { q1, h };
  projectors.set(f, made);
  return made;
}

let scratchY = new Float64Array(0);
const scratchT = new Float64Array(64);

/**
 * Scores the least-squares fit at options.tMid (throws FitError like the fit itself). By linearity the
 * residual of the reduced problem is (I − B B⁺)(y − S_a g) = (I − B B⁺) y − S_a h (see `Projector`), so a
 * candidate costs one pass for Q1ᵀ y (k products per row) and one for the residuals (k + 1 per row), on
 * reused typed arrays; B B⁺ y is formed from the QR factors (R⁻¹ Q1ᵀ y), never from normal equations.
 */
export function leastSquaresScore(samples: readonly FitSample[], anchor: FitSample, options: FitOptions, temperatures: string): LeastSquaresScore {
  const ranges = splitSamples(samples, anchor, options);
  const w = options.weights;
  const f = factorisationFor({ temperatures, weights: w, anchorT: anchor.T, tMid: options.tMid, continuityOrder: options.continuityOrder }, ranges, anchor);
  const k = f.n - f.m;
  const nr = f.rowCount;
  const { q1, h } = projectorOf(f);
  if (scratchY.length < nr) scratchY = new Float64Array(nr);
  const y = scratchY;
  const hShift = anchor.hRT * anchor.T;
  const wq = [Math.sqrt(w.cp), Math.sqrt(w.h), Math.sqrt(w.s)];
  let row = 0;
  for (const list of [ranges.low, ranges.high]) {
    for (const s of list) {
      if (wq[0]! > 0) y[row++] = wq[0]! * s.cpR;
      if (wq[1]! > 0) y[row++] = wq[1]! * (s.hRT - hShift / s.T);
      if (wq[2]! > 0) y[row++] = wq[2]! * s.sR;
    }
  }
  const t = k <= scratchT.length ? scratchT : new Float64Array(k);
  coordinates(f, q1, y, t);
  const b = f.reduced;
  const sA = anchor.sR;
  const lq = [options.limits.cp, options.limits.h, options.limits.s];
  const complete = wq[0]! > 0 && wq[1]! > 0 && wq[2]! > 0;
  let weighted = 0;
  let limitRatio = complete ? 0 : Infinity;
  row = 0;
  for (const list of [ranges.low, ranges.high]) {
    for (const s of list) {
      for (let q = 0; q < 3; q++) {
        if (!(wq[q]! > 0)) continue;
        let r = y[row]! - sA * h[row]!;
        const o = row * k;
        for (let j = 0; j < k; j++) r -= b[o + j]! * t[j]!;
        r = Math.abs(r);
        if (!(r <= weighted)) weighted = r;
        if (complete) {
          const ratio = r / (wq[q]! * limitAt(lq[q]!, s.cpR));
          if (!(ratio <= limitRatio)) limitRatio = ratio;
        }
        row++;
      }
    }
  }
  return { limitRatio, weighted };
}
