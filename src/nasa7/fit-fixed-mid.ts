/**
 * One fit at a fixed midpoint: validate and split the samples, take the factorisation of design and
 * constraints in τ from the cache (factor-cache.ts), solve for the species' targets — least squares, or the
 * minimax of the limit-relative error (minimax.ts) started from least squares — convert back to
 * coefficients of T, and finalise a6/a7.
 *
 * Finalisation: after the (exact for a1..a6) back-transformation, a6 and a7 of the low set are
 * re-derived in T from the anchor conditions, and a6 and a7 of the high set from H and S continuity at
 * tMid. This changes them only at rounding level but makes H°(T_a), S°(T_a) and the H, S continuity hold
 * to the last bit or two of the T-form evaluation, which is what users evaluate.
 */
import { designRhs } from './design.js';
import { evaluateRange } from './evaluate.js';
import { factorisationFor, temperatureKey } from './factor-cache.js';
import { worstLimitRatio } from './limit-ratio.js';
import { sampleLimits } from './limits.js';
import { computeMetrics } from './metrics.js';
import { minimaxReduced } from './minimax.js';
import { splitSamples, type SplitSamples } from './samples.js';
import { unscaleCoefficients } from './scaling.js';
import { assembleSolution, particularSolution, scaledRowDot, solveFactored, type FactoredProblem } from './solve.js';
import type { Coefficients7, FitOptions, FitResult, FitSample, Nasa7Polynomial } from './types.js';

/** Re-derives a6 and a7 of `c` so that H/RT and S/R at T equal the targets (in T-form arithmetic). */
function pinEnthalpyAndEntropy(c: Coefficients7, T: number, hRT: number, sR: number): Coefficients7 {
  const withoutConstants: Coefficients7 = [c[0], c[1], c[2], c[3], c[4], 0, 0];
  const v = evaluateRange(withoutConstants, T);
  return [c[0], c[1], c[2], c[3], c[4], (hRT - v.hRT) * T, sR - v.sR];
}

/** τ-form solution → T-form polynomial with a6, a7 re-derived (see the module comment). */
export function finish(x: readonly number[], anchor: FitSample, options: FitOptions): Nasa7Polynomial {
  const low = pinEnthalpyAndEntropy(unscaleCoefficients(x.slice(0, 7)), anchor.T, anchor.hRT, anchor.sR);
  const lowAtMid = evaluateRange(low, options.tMid);
  const high = pinEnthalpyAndEntropy(unscaleCoefficients(x.slice(7, 14)), options.tMid, lowAtMid.hRT, lowAtMid.sR);
  return { tLow: options.tLow, tMid: options.tMid, tHigh: options.tHigh, low, high };
}

const UNIT_WEIGHTS = Object.freeze({ cp: 1, h: 1, s: 1 });

/** Reduced-problem targets c = y − A D⁻¹ u_p of the unit-weight rows. */
function reducedTargets(f: FactoredProblem, y: readonly number[], up: readonly number[]): Float64Array {
  const c = new Float64Array(y.length);
  // Over each row's band only: the zeros outside add nothing (solve.ts FactoredProblem.band).
  for (let row = 0; row < y.length; row++) c[row] = y[row]! - scaledRowDot(f, row, up);
  return c;
}

function minimaxCoefficients(
  ranges: SplitSamples,
  anchor: FitSample,
  options: FitOptions,
  temperatures: string,
  leastSquares: { f: FactoredProblem; z: Float64Array; up: number[] },
  cutoff: number,
): number[] {
  const unit = options.weights.cp === 1 && options.weights.h === 1 && options.weights.s === 1;
  const f = unit
    ? leastSquares.f
    : factorisationFor({ temperatures, weights: UNIT_WEIGHTS, anchorT: anchor.T, tMid: options.tMid, continuityOrder: options.continuityOrder }, ranges, anchor);
  const y = designRhs(ranges, UNIT_WEIGHTS, anchor.hRT * anchor.T);
  const d = constraintRhs(anchor, f.m);
  const start = unit ? leastSquares : solveFactored(f, y, d);
  const up = start.up!;
  const c = reducedTargets(f, y, up);
  const limits = sampleLimits([...ranges.low, ...ranges.high], options.limits);
  return assembleSolution(f, up, minimaxReduced(f, c, limits, start.z!, 3, 3 * ranges.low.length, cutoff).z);
}

export function constraintRhs(anchor: FitSample, m: number): number[] {
  const d = new Array<number>(m).fill(0);
  d[1] = anchor.sR;
  return d;
}

/**
 * `temperatures` (optional) is temperatureKey(samples), passed by callers that fit the same samples many
 * times (the midpoint search) so the key is built once.
 */
export function fitAtFixedMid(samples: readonly FitSample[], anchor: FitSample, options: FitOptions, temperatures = temperatureKey(samples)): FitResult {
  return withMetrics(fitWithoutMetrics(samples, anchor, options, temperatures), anchor);
}

/** A fit whose quality metrics are not computed yet (the midpoint search needs them for its winner only). */
export interface UnmeasuredFit {
  polynomial: Nasa7Polynomial;
  ranges: SplitSamples;
  solver: FitResult['solver'] & object;
}

/** Adds the metrics: exactly what `fitAtFixedMid` returns for the same fit. */
export function withMetrics(fit: UnmeasuredFit, anchor: FitSample): FitResult {
  return { polynomial: fit.polynomial, metrics: computeMetrics(fit.polynomial, fit.ranges, anchor), solver: fit.solver };
}

/**
 * `fitAtFixedMid` without the metrics. `cutoff` (minimax only; see minimaxReduced): the caller discards
 * the fit unless its worst limit ratio is below this, so the minimax iteration may stop once it has
 * proved the optimum is not (the returned fit is then valid but not optimal, and its ratio ≥ cutoff).
 */
export function fitWithoutMetrics(samples: readonly FitSample[], anchor: FitSample, options: FitOptions, temperatures: string, cutoff = Infinity): UnmeasuredFit {
  const ranges = splitSamples(samples, anchor, options);
  const hShift = anchor.hRT * anchor.T;
  const f = factorisationFor({ temperatures, weights: options.weights, anchorT: anchor.T, tMid: options.tMid, continuityOrder: options.continuityOrder }, ranges, anchor);
  const sol = solveFactored(f, designRhs(ranges, options.weights, hShift), constraintRhs(anchor, f.m));
  let polynomial = finish(sol.x, anchor, options);
  let worst: number | undefined;
  if (options.method === 'minimax') {
    // Started from least squares and never worse than it on the measure the check uses.
    const lsWorst = worstLimitRatio(polynomial, ranges, options.limits).ratio;
    const mm = finish(minimaxCoefficients(ranges, anchor, options, temperatures, { f, z: sol.z!, up: sol.up! }, cutoff), anchor, options);
    const mmWorst = worstLimitRatio(mm, ranges, options.limits).ratio;
    if (mmWorst < lsWorst) polynomial = mm;
    worst = Math.min(lsWorst, mmWorst);
  }
  return {
    polynomial,
    ranges,
    solver: {
      conditionNumber: sol.conditionNumber,
      residualNorm: sol.residualNorm,
      midCandidates: 1,
      ...(worst !== undefined ? { worstLimitRatio: worst } : {}),
    },
  };
}
