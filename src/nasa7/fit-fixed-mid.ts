/**
 * One fit at a fixed midpoint: validate and split the samples, build design and constraints in τ, solve
 * the constrained least-squares problem, convert back to coefficients of T, and finalise a6/a7.
 *
 * Finalisation: after the (exact for a1..a6) back-transformation, a6 and a7 of the low set are
 * re-derived in T from the anchor conditions, and a6 and a7 of the high set from H and S continuity at
 * tMid. This changes them only at rounding level but makes H°(T_a), S°(T_a) and the H, S continuity hold
 * to the last bit or two of the T-form evaluation, which is what users evaluate.
 */
import { buildConstraints } from './constraints.js';
import { buildDesign } from './design.js';
import { evaluateRange } from './evaluate.js';
import { computeMetrics } from './metrics.js';
import { splitSamples } from './samples.js';
import { unscaleCoefficients } from './scaling.js';
import { solveConstrainedLeastSquares } from './solve.js';
import type { Coefficients7, FitOptions, FitResult, FitSample, Nasa7Polynomial } from './types.js';

/** Re-derives a6 and a7 of `c` so that H/RT and S/R at T equal the targets (in T-form arithmetic). */
function pinEnthalpyAndEntropy(c: Coefficients7, T: number, hRT: number, sR: number): Coefficients7 {
  const withoutConstants: Coefficients7 = [c[0], c[1], c[2], c[3], c[4], 0, 0];
  const v = evaluateRange(withoutConstants, T);
  return [c[0], c[1], c[2], c[3], c[4], (hRT - v.hRT) * T, sR - v.sR];
}

export function fitAtFixedMid(samples: readonly FitSample[], anchor: FitSample, options: FitOptions): FitResult {
  const ranges = splitSamples(samples, anchor, options);
  const hShift = anchor.hRT * anchor.T;
  const design = buildDesign(ranges, options.weights, hShift);
  const constraints = buildConstraints(anchor, options);
  const sol = solveConstrainedLeastSquares({
    rows: design.rows,
    rhs: design.rhs,
    constraintRows: constraints.rows,
    constraintRhs: constraints.rhs,
    constraintLabels: constraints.labels,
  });
  const low = pinEnthalpyAndEntropy(unscaleCoefficients(sol.x.slice(0, 7)), anchor.T, anchor.hRT, anchor.sR);
  const lowAtMid = evaluateRange(low, options.tMid);
  const high = pinEnthalpyAndEntropy(unscaleCoefficients(sol.x.slice(7, 14)), options.tMid, lowAtMid.hRT, lowAtMid.sR);
  const polynomial: Nasa7Polynomial = { tLow: options.tLow, tMid: options.tMid, tHigh: options.tHigh, low, high };
  return {
    polynomial,
    metrics: computeMetrics(polynomial, ranges, anchor),
    solver: { conditionNumber: sol.conditionNumber, residualNorm: sol.residualNorm, midCandidates: 1 },
  };
}
