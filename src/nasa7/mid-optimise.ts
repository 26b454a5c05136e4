/**
 * Optional choice of tMid: fit at every candidate min, min + step, …, ≤ max and keep the one with the
 * smallest worst weighted error max_q √w_q · maxAbs_q over both ranges (q = Cp/R, H/RT, S/R). Ties go to
 * the lower candidate, so the choice is deterministic. Candidates that cannot be fitted (e.g. too few
 * samples on one side) are skipped; if none can, the first candidate's error is reported.
 */
import { FitError } from './errors.js';
import { fitAtFixedMid } from './fit-fixed-mid.js';
import type { FitOptions, FitResult, FitSample } from './types.js';

export function worstWeightedError(result: FitResult, weights: FitOptions['weights']): number {
  let worst = 0;
  for (const r of [result.metrics.low, result.metrics.high]) {
    worst = Math.max(worst, Math.sqrt(weights.cp) * r.maxAbs.cp, Math.sqrt(weights.h) * r.maxAbs.h, Math.sqrt(weights.s) * r.maxAbs.s);
  }
  return worst;
}

export function optimiseMid(samples: readonly FitSample[], anchor: FitSample, options: FitOptions): FitResult {
  const range = options.optimiseMid;
  if (!range) return fitAtFixedMid(samples, anchor, options);
  let best: { result: FitResult; score: number } | undefined;
  let firstError: unknown;
  let tried = 0;
  const count = Math.floor((range.max - range.min) / range.step + 1e-9) + 1;
  for (let i = 0; i < count; i++) {
    const tMid = range.min + i * range.step;
    tried++;
    try {
      const result = fitAtFixedMid(samples, anchor, { ...options, tMid });
      const score = worstWeightedError(result, options.weights);
      if (!best || score < best.score) best = { result, score };
    } catch (e) {
      if (!(e instanceof FitError)) throw e;
      firstError ??= e;
    }
  }
  if (!best) {
    const why = firstError instanceof FitError ? firstError.message : String(firstError);
    throw new FitError(`no midpoint in [${range.min}, ${range.max}] K could be fitted; first failure: ${why}`);
  }
  return { ...best.result, solver: { ...best.result.solver!, midCandidates: tried } };
}
