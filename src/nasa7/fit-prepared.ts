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
import { evaluateRange as rangeMetricsAnchor } from './evaluate.js';
import { continuityResiduals } from './metrics.js';
import type { Coefficients7, FitOptions, FitResult, FitWeights, Nasa7Polynomial, RangeMetrics } from './types.js';

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

/**
 * Scratch rows of the candidate being fitted (targets, limits, reduced targets; the winner's targets for
 * its residual norm): written in full before each use and never kept beyond one `fitPrepared` or
 * `solverOf` call.
 */
const scratch = { y: new Float64Array(0), limits: new Float64Array(0), targets: new Float64Array(0) };

function scratchRows(key: keyof typeof scratch, rows: number): Float64Array {
  if (scratch[key].length < rows) scratch[key] = new Float64Array(rows);
  return scratch[key].subarray(0, rows);
}

/** The weighted design targets of design.ts `designRhs` (all weights > 0), same arithmetic; `into` if given. */
export function targetsOf(p: PreparedSamples, split: RangeSplit, weights: FitWeights, into?: Float64Array): Float64Array {
  const wc = Math.sqrt(weights.cp);
  const wh = Math.sqrt(weights.h);
  const ws = Math.sqrt(weights.s);
  const y = into ?? new Float64Array(rowsOf(p, split));
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
  const out = scratchRows('limits', rowsOf(p, split));
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

/**
 * The quotients evaluate.ts forms at every T (H/RT: a_k/k; S/R: a_k/(k−1)), formed once per range: the same
 * doubles, so the prepared path stays bit-identical to evaluate.ts.
 */
function hornerQuotients(c: Readonly<Coefficients7>) {
  return { h2: c[1] / 2, h3: c[2] / 3, h4: c[3] / 4, h5: c[4] / 5, s3: c[2] / 2, s4: c[3] / 3, s5: c[4] / 4 };
}

function worstOfRange(c: Readonly<Coefficients7>, p: PreparedSamples, from: number, to: number, worst: number): number {
  const a1 = c[0]!, a2 = c[1]!, a3 = c[2]!, a4 = c[3]!, a5 = c[4]!, a6 = c[5]!, a7 = c[6]!; // prettier-ignore
  const { h2, h3, h4, h5, s3, s4, s5 } = hornerQuotients(c);
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
  /** Least-squares solution, for the residual norm. */
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
  const y = targetsOf(p, split, options.weights, scratchRows('y', rowsOf(p, split)));
  const w = options.weights;
  const minimax = options.method === 'minimax';
  const unit = w.cp === 1 && w.h === 1 && w.s === 1;
  const ls = solveFactoredParts(f, y, constraintRhs(anchor, f.m), minimax && unit ? { targets: scratchRows('targets', y.length) } : {});
  let polynomial = finish(ls.solution.x, anchor, options);
  let worst: number | undefined;
  if (minimax) {
    // Started from least squares and never worse than it on the measure the check uses (fit-fixed-mid.ts).
    const lsWorst = worstRatioPrepared(polynomial, p, split);
    let fu = f;
    let start = ls;
    if (!unit) {
      fu = preparedFactorisation(p, options, temperatures, split, UNIT_WEIGHTS);
      // y is not needed any more (the winner's residual norm recomputes it): its scratch takes the unit targets.
      const yu = targetsOf(p, split, UNIT_WEIGHTS, scratchRows('y', rowsOf(p, split)));
      start = solveFactoredParts(fu, yu, constraintRhs(anchor, fu.m), { targets: scratchRows('targets', yu.length) });
    }
    const up = start.solution.up!;
    const z = minimaxReduced(fu, start.targets!, rowLimits(p, split), start.solution.z!, 3, 3 * split.lowEnd, cutoff).z;
    const mm = finish(assembleSolution(fu, up, z), anchor, options);
    const mmWorst = worstRatioPrepared(mm, p, split);
    if (mmWorst < lsWorst) polynomial = mm;
    worst = Math.min(lsWorst, mmWorst);
  }
  return { polynomial, split, f, x: ls.solution.x, ...(worst !== undefined ? { worst } : {}) };
}

/** The `UnmeasuredFit` the general path returns for the same fit (residual norm computed now). */
export function unmeasuredOf(p: PreparedSamples, fit: PreparedFit, options: FitOptions): UnmeasuredFit {
  return {
    polynomial: fit.polynomial,
    ranges: rangeLists(p, fit.split),
    solver: solverOf(p, fit, options),
  };
}

function solverOf(p: PreparedSamples, fit: PreparedFit, options: FitOptions): UnmeasuredFit['solver'] {
  return {
    conditionNumber: fit.f.conditionNumber,
    // The targets in the fit's scratch (free once the candidates are fitted; residualNormOf only reads them).
    residualNorm: residualNormOf(fit.f, targetsOf(p, fit.split, options.weights, scratchRows('y', rowsOf(p, fit.split))), fit.x),
    midCandidates: 1,
    ...(fit.worst !== undefined ? { worstLimitRatio: fit.worst } : {}),
  };
}

/** metrics.ts `rangeMetrics` of samples [from, to), same arithmetic (evaluate.ts's Horner forms). */
function rangeMetricsPrepared(c: Readonly<Coefficients7>, p: PreparedSamples, from: number, to: number): RangeMetrics {
  const a1 = c[0]!, a2 = c[1]!, a3 = c[2]!, a4 = c[3]!, a5 = c[4]!, a6 = c[5]!, a7 = c[6]!; // prettier-ignore
  const { h2, h3, h4, h5, s3, s4, s5 } = hornerQuotients(c);
  let mc = 0, mh = 0, ms = 0, qc = 0, qh = 0, qs = 0, tc = NaN, th = NaN, ts = NaN; // prettier-ignore
  for (let i = from; i < to; i++) {
    const T = p.T[i]!;
    const ec = Math.abs(a1 + T * (a2 + T * (a3 + T * (a4 + T * a5))) - p.cpR[i]!);
    const eh = Math.abs(a1 + T * (h2 + T * (h3 + T * (h4 + T * h5))) + a6 / T - p.hRT[i]!);
    const es = Math.abs(a1 * p.lnT[i]! + T * (a2 + T * (s3 + T * (s4 + T * s5))) + a7 - p.sR[i]!);
    qc += ec * ec;
    if (Number.isNaN(tc) || ec > mc) {
      mc = ec;
      tc = T;
    }
    qh += eh * eh;
    if (Number.isNaN(th) || eh > mh) {
      mh = eh;
      th = T;
    }
    qs += es * es;
    if (Number.isNaN(ts) || es > ms) {
      ms = es;
      ts = T;
    }
  }
  const n = to - from;
  const rms = n ? { cp: Math.sqrt(qc / n), h: Math.sqrt(qh / n), s: Math.sqrt(qs / n) } : { cp: 0, h: 0, s: 0 };
  return { points: n, maxAbs: { cp: mc, h: mh, s: ms }, rms, tAtMax: { cp: tc, h: th, s: ts } };
}

/** fit-fixed-mid.ts `withMetrics(unmeasuredOf(…))`: the same FitResult, metrics from the typed arrays. */
export function measuredOf(p: PreparedSamples, fit: PreparedFit, options: FitOptions): FitResult {
  const poly = fit.polynomial;
  const anchor = p.anchor;
  const lowAtAnchor = rangeMetricsAnchor(poly.low, anchor.T);
  return {
    polynomial: poly,
    metrics: {
      low: rangeMetricsPrepared(poly.low, p, 0, fit.split.lowEnd),
      high: rangeMetricsPrepared(poly.high, p, fit.split.highStart, p.n),
      continuity: continuityResiduals(poly),
      anchor: { h: Math.abs(lowAtAnchor.hRT - anchor.hRT), s: Math.abs(lowAtAnchor.sR - anchor.sR) },
    },
    solver: solverOf(p, fit, options),
  };
}
