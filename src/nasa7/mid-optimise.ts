/**
 * Choice of tMid per species: candidates min, min + step, …, ≤ max.
 *  - least squares: fit at every candidate and keep the smallest worst weighted error
 *    max_q √w_q · maxAbs_q over both ranges (q = Cp/R, H/RT, S/R);
 *  - minimax: least squares at every candidate (cheap: the factorisations are cached), ranked by the
 *    limit-relative measure the check uses (limit-ratio.ts); the minimax fit is then made at the
 *    MINIMAX_CANDIDATES − 1 best of them and at the candidate nearest the fixed tMid of the options, and
 *    the best minimax result kept. Including the fixed tMid makes the search never worse than minimax at
 *    that tMid; the least-squares ranking alone is a poor guide (on the synthetic set its favourite was
 *    often worse after minimax than 1000 K), and minimax at every candidate costs a full fit each.
 * Ties go to the lower candidate, so the choice is deterministic. Candidates that cannot be fitted (e.g.
 * too few samples on one side) are skipped; if none can, the first candidate's error is reported.
 */
import { FitError } from './errors.js';
import { fitAtFixedMid } from './fit-fixed-mid.js';
import { worstLimitRatio } from './limit-ratio.js';
import { temperatureKey } from './factor-cache.js';
import type { FitOptions, FitResult, FitSample } from './types.js';

/** Candidates refined by the minimax fit after the least-squares ranking. */
export const MINIMAX_CANDIDATES = 3;

export function worstWeightedError(result: FitResult, weights: FitOptions['weights']): number {
  let worst = 0;
  for (const r of [result.metrics.low, result.metrics.high]) {
    worst = Math.max(worst, Math.sqrt(weights.cp) * r.maxAbs.cp, Math.sqrt(weights.h) * r.maxAbs.h, Math.sqrt(weights.s) * r.maxAbs.s);
  }
  return worst;
}

function ratioOf(result: FitResult, samples: readonly FitSample[], options: FitOptions): number {
  const { tMid } = result.polynomial;
  const low = samples.filter((s) => s.T <= tMid);
  const high = samples.filter((s) => s.T >= tMid);
  return worstLimitRatio(result.polynomial, { low, high }, options.limits).ratio;
}

export function optimiseMid(samples: readonly FitSample[], anchor: FitSample, options: FitOptions): FitResult {
  const range = options.optimiseMid;
  const temperatures = temperatureKey(samples);
  if (!range) return fitAtFixedMid(samples, anchor, options, temperatures);
  const minimax = options.method === 'minimax';
  const scored: Array<{ tMid: number; result: FitResult; score: number }> = [];
  let firstError: unknown;
  let tried = 0;
  const count = Math.floor((range.max - range.min) / range.step + 1e-9) + 1;
  for (let i = 0; i < count; i++) {
    const tMid = range.min + i * range.step;
    tried++;
    try {
      const result = fitAtFixedMid(samples, anchor, { ...options, tMid, method: 'least-squares' }, temperatures);
      const score = minimax ? ratioOf(result, samples, options) : worstWeightedError(result, options.weights);
      scored.push({ tMid, result, score });
    } catch (e) {
      if (!(e instanceof FitError)) throw e;
      firstError ??= e;
    }
  }
  if (!scored.length) {
    const why = firstError instanceof FitError ? firstError.message : String(firstError);
    throw new FitError(`no midpoint in [${range.min}, ${range.max}] K could be fitted; first failure: ${why}`);
  }
  // Stable sort: equal scores keep ascending tMid.
  const ranked = [...scored].sort((a, b) => a.score - b.score);
  let best = ranked[0]!;
  if (minimax) {
    let refined: { result: FitResult; score: number } | undefined;
    const nearestFixed = [...scored].sort((a, b) => Math.abs(a.tMid - options.tMid) - Math.abs(b.tMid - options.tMid))[0]!;
    const chosen = new Set([nearestFixed.tMid, ...ranked.slice(0, MINIMAX_CANDIDATES - 1).map((c) => c.tMid)]);
    // The fixed midpoint first; another candidate must beat it by more than rounding noise (an atom's exact
    // fit scores ~1e-12 everywhere and keeps the fixed midpoint).
    const order = [nearestFixed.tMid, ...[...chosen].filter((t) => t !== nearestFixed.tMid).sort((a, b) => a - b)];
    for (const tMid of order) {
      try {
        const result = fitAtFixedMid(samples, anchor, { ...options, tMid }, temperatures);
        const score = result.solver?.worstLimitRatio ?? ratioOf(result, samples, options);
        if (!refined || score < refined.score * (1 - 1e-6) - 1e-9) refined = { result, score };
      } catch (e) {
        if (!(e instanceof FitError)) throw e;
      }
    }
    if (refined) best = { tMid: refined.result.polynomial.tMid, ...refined };
  }
  return { ...best.result, solver: { ...best.result.solver!, midCandidates: tried } };
}
