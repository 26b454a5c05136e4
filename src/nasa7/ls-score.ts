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
 * rows (typed arrays, no per-sample objects).
 */
import { factorisationFor } from './factor-cache.js';
import { constraintRhs } from './fit-fixed-mid.js';
import { limitAt } from './limits.js';
import { splitSamples } from './samples.js';
import { particularSolution } from './solve.js';
import type { FitOptions, FitSample } from './types.js';

export interface LeastSquaresScore {
  /** max_i |r_i| / (√w_q L_q(T_i)); Infinity if a weight is zero (that quantity has no rows). */
  limitRatio: number;
  /** max_i |r_i|. */
  weighted: number;
}

let scratchC = new Float64Array(0);
let scratchX = new Float64Array(0);

/**
 * Scores the least-squares fit at options.tMid (throws FitError like the fit itself). The solve repeats
 * solveFactored's reduced solve (particular solution, Householder application, back substitution) on
 * reused typed arrays, using that each design row touches only the 7 coefficients of its own range, and
 * takes the per-row residuals as B z − c on the reduced matrix B (8 products per row).
 */
export function leastSquaresScore(samples: readonly FitSample[], anchor: FitSample, options: FitOptions, temperatures: string): LeastSquaresScore {
  const ranges = splitSamples(samples, anchor, options);
  const w = options.weights;
  const f = factorisationFor({ temperatures, weights: w, anchorT: anchor.T, tMid: options.tMid, continuityOrder: options.continuityOrder }, ranges, anchor);
  const n = f.n;
  const k = n - f.m;
  const nr = f.scaledRows.length;
  if (scratchC.length < nr) {
    scratchC = new Float64Array(nr);
    scratchX = new Float64Array(nr);
  }
  const c = scratchC;
  const x0 = scratchX;
  const up = particularSolution(f, constraintRhs(anchor, f.m));
  const hShift = anchor.hRT * anchor.T;
  const wq = [Math.sqrt(w.cp), Math.sqrt(w.h), Math.sqrt(w.s)];
  const a = f.scaledFlat;
  let row = 0;
  for (const [list, offset] of [[ranges.low, 0], [ranges.high, 7]] as const) {
    for (const s of list) {
      for (let q = 0; q < 3; q++) {
        if (!(wq[q]! > 0)) continue;
        const target = q === 0 ? s.cpR : q === 1 ? s.hRT - hShift / s.T : s.sR;
        let pred = 0;
        const o = row * n + offset;
        for (let j = 0; j < 7; j++) pred += a[o + j]! * up[offset + j]!;
        c[row] = wq[q]! * target - pred;
        x0[row] = c[row]!;
        row++;
      }
    }
  }
  const qr = f.qrColumns;
  for (let col = 0; col < k; col++) {
    const o = col * nr;
    let s = 0;
    for (let i = col; i < nr; i++) s += qr[o + i]! * x0[i]!;
    s = -s / qr[o + col]!;
    for (let i = col; i < nr; i++) x0[i] = x0[i]! + s * qr[o + i]!;
  }
  for (let col = k - 1; col >= 0; col--) {
    x0[col] = x0[col]! / f.rDiagonal[col]!;
    for (let i = 0; i < col; i++) x0[i] = x0[i]! - x0[col]! * qr[col * nr + i]!;
  }
  const b = f.reduced;
  const lq = [options.limits.cp, options.limits.h, options.limits.s];
  const complete = wq[0]! > 0 && wq[1]! > 0 && wq[2]! > 0;
  let weighted = 0;
  let limitRatio = complete ? 0 : Infinity;
  row = 0;
  for (const list of [ranges.low, ranges.high]) {
    for (const s of list) {
      for (let q = 0; q < 3; q++) {
        if (!(wq[q]! > 0)) continue;
        let pred = -c[row]!;
        const o = row * k;
        for (let j = 0; j < k; j++) pred += b[o + j]! * x0[j]!;
        const r = Math.abs(pred);
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
