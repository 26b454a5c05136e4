/**
 * The fixed-midpoint fit of fit-fixed-mid.ts on prepared samples (prepared.ts): the same steps — cached
 * factorisation, least squares, for minimax the Lawson fit started from least squares, the T-form
 * finalisation, the limit-relative measure of both — with the same arithmetic on typed arrays, so the
 * result is bit-identical to `fitWithoutMetrics` at the same tMid. What it saves: the per-candidate split
 * and validation of the sample lists, the design targets as arrays of numbers, a second pass for the
 * reduced targets of the minimax fit (they are the least-squares solve's right-hand side before its
 * Householder steps), the per-sample objects and logarithms of the error measure, and the residual norm of
 * candidates that lose (computed for the winner only, by `measuredSolver`).
 */
import { factorisationFor } from './factor-cache.js';
import { constraintRhs, finish, type UnmeasuredFit } from './fit-fixed-mid.js';
import { minimaxReduced } from './minimax.js';
import { rangeLists, splitAt, type PreparedSamples, type RangeSplit } from './prepared.js';
import { assembleSolution, residualNormOf, solveFactoredParts, type FactoredProblem } from './solve.js';
import type { Coefficients7, FitOptions, FitWeights, Nasa7Polynomial } from './types.js';

const UNIT_WEIGHTS: FitWeights = Object.freeze({ cp: 1, h: 1, s: 1 });

/** Whether the prepared path applies: every quantity has rows (the usual case; design.ts drops rows of zero weight). */
export function preparedPathApplies(options: FitOptions): boolean {
  const w = options.weights;
  return w.cp > 0 && w.h > 0 && w.s > 0;
}

/** Rows of one split: 3 per sample (Cp/R, H/RT, S/R), the low range's samples first (design.ts order). */
export function rowsOf(p: PreparedSamples, split: RangeSplit): number {
  return 3 * (split.lowEnd + p.n - split.highStart);
}

/** The weighted design targets of design.ts `designRhs` (all weights > 0), same arithmetic. */
export function targetsOf(p: PreparedSamples, split: RangeSplit, weights: FitWeights): Float64Array {
  const wc = Math.sqrt(weights.cp);
  const wh = Math.sqrt(weights.h);
  const ws = Math.sqrt(weights.s);
  const y = new Float64Array(rowsOf(p, split));
  let row = 0;
  for (const [from, to] of [[0, split.lowEnd], [split.highStart, p.n]] as const) {
    for (let i = from; i < to; i++) {
      y[row++] = wc * p.cpR[i]!;
      y[row++] = wh * p.hRel[i]!;
      y[row++] = ws * p.sR[i]!;
    }
  }
  return y;
}

/** The limits of every row in row order (limits.ts `sampleLimits` of the low then the high list). */
function rowLimits(p: PreparedSamples, split: RangeSplit): Float64Array {
  const out = new Float64Array(rowsOf(p, split));
  let row = 0;
  for (const [from, to] of [[0, split.lowEnd], [split.highStart, p.n]] as const) {
    for (let i = from; i < to; i++) {
      out[row++] = p.limCp[i]!;
      out[row++] = p.limH[i]!;
      out[row++] = p.limS[i]!;
    }
  }
  return out;
}

function worstOfRange(c: Readonly<Coefficients7>, p: PreparedSamples, from: number, to: number, worst: number): number {
  const [a1, a2, a3, a4, a5, a6, a7] = c;
  // The quotients evaluate.ts forms at every T, formed once: the same doubles.
  const h2 = a2 / 2;
  const h3 = a3 / 3;
  const h4 = a4 / 4;
  const h5 = a5 / 5;
  const s3 = a3 / 2;
  const s4 = a4 / 3;
  const s5 = a5 / 4;
  for (let i = from; i < to; i++) {
    const T = p.T[i]!;
    const cpR = a1 + T * (a2 + T * (a3 + T * (a4 + T * a5)));
    const hRT = a1 + T * (h2 + T * (h3 + T * (h4 + T * h5))) + a6 / T;
    const sR = a1 * p.lnT[i]! + T * (a2 + T * (s3 + T * (s4 + T * s5))) + a7;
    const rc = Math.abs(cpR - p.cpR[i]!) / p.limCp[i]!;
    const rh = Math.abs(hRT - p.hRT[i]!) / p.limH[i]!;
    const rs = Math.abs(sR - p.sR[i]!) / p.limS[i]!;
    if (!(rc <= worst)) worst = rc;
    if (!(rh <= worst)) worst = rh;
    if (!(rs <= worst)) worst = rs;
  }
  return worst;
}

/** limit-ratio.ts `worstLimitRatio(poly, split lists, limits).ratio`, same arithmetic and order. */
export function worstRatioPrepared(poly: Nasa7Polynomial, p: PreparedSamples, split: RangeSplit): number {
  return worstOfRange(poly.high, p, split.highStart, p.n, worstOfRange(poly.low, p, 0, split.lowEnd, 0));
}

/** A fit on prepared samples: what `fitWithoutMetrics` computes, with what the winner's solver info needs. */
export interface PreparedFit {
  polynomial: Nasa7Polynomial;
  split: RangeSplit;
  f: FactoredProblem;
  /** Weighted targets and least-squares solution, for the residual norm. */
  y: Float64Array;
  x: number[];
  worst?: number;
}

/** The factorisation of one candidate (from the cache; the sample lists are built only on a miss). */
export function preparedFactorisation(p: PreparedSamples, options: FitOptions, temperatures: string, split: RangeSplit, weights = options.weights): FactoredProblem {
  return factorisationFor(
    { temperatures, weights, anchorT: p.anchor.T, tMid: options.tMid, continuityOrder: options.continuityOrder },
    () => rangeLists(p, split),
    p.anchor,
  );
}

/**
 * `fitWithoutMetrics` at options.tMid on prepared samples, or undefined when a range fails the coverage
 * rules (the caller then takes the general path, which reports it). Throws FitError like the general path
 * (a factorisation that cannot be made). `cutoff` as in `fitWithoutMetrics`.
 */
export function fitPrepared(p: PreparedSamples, options: FitOptions, temperatures: string, cutoff = Infinity): PreparedFit | undefined {
  const split = splitAt(p, options);
  if (!split) return undefined;
  const anchor = p.anchor;
  const f = preparedFactorisation(p, options, temperatures, split);
  const y = targetsOf(p, split, options.weights);
  const w = options.weights;
  const minimax = options.method === 'minimax';
  const unit = w.cp === 1 && w.h === 1 && w.s === 1;
  const ls = solveFactoredParts(f, y, constraintRhs(anchor, f.m), { targets: minimax && unit });
  let polynomial = finish(ls.solution.x, anchor, options);
  let worst: number | undefined;
  if (minimax) {
    // Started from least squares and never worse than it on the measure the check uses (fit-fixed-mid.ts).
    const lsWorst = worstRatioPrepared(polynomial, p, split);
    let fu = f;
    let start = ls;
    if (!unit) {
      fu = preparedFactorisation(p, options, temperatures, split, UNIT_WEIGHTS);
      start = solveFactoredParts(fu, targetsOf(p, split, UNIT_WEIGHTS), constraintRhs(anchor, fu.m), { targets: true });
    }
    const up = start.solution.up!;
    const z = minimaxReduced(fu, start.targets!, rowLimits(p, split), start.solution.z!, 3, 3 * split.lowEnd, cutoff).z;
    const mm = finish(assembleSolution(fu, up, z), anchor, options);
    const mmWorst = worstRatioPrepared(mm, p, split);
    if (mmWorst < lsWorst) polynomial = mm;
    worst = Math.min(lsWorst, mmWorst);
  }
  return { polynomial, split, f, y, x: ls.solution.x, ...(worst !== undefined ? { worst } : {}) };
}

/** The `UnmeasuredFit` the general path returns for the same fit (residual norm computed now). */
export function unmeasuredOf(p: PreparedSamples, fit: PreparedFit): UnmeasuredFit {
  return {
    polynomial: fit.polynomial,
    ranges: rangeLists(p, fit.split),
    solver: {
      conditionNumber: fit.f.conditionNumber,
      residualNorm: residualNormOf(fit.f, fit.y, fit.x),
      midCandidates: 1,
      ...(fit.worst !== undefined ? { worstLimitRatio: fit.worst } : {}),
    },
  };
}
