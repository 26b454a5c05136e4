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
 * Cost: the least-squares ranking scores each candidate from its design-row residuals (ls-score.ts: one
 * application of the cached factorisation, no polynomial, no metrics), and the quality metrics are
 * computed for the winning fit only. Both change nothing but rounding-level ties of the ranking, so the
 * search is as good as one that finishes and measures every candidate (tested in mid-search.test.ts).
 * For ascending samples with every weight > 0 (what a build passes) the same search runs on samples
 * prepared once per species (prepared.ts, fit-prepared.ts), and the ranking scores exactly only the
 * candidates a proved lower bound cannot exclude from the best ones the search uses (ls-rank.ts, about
 * two per species): results bit-identical to the general path (prepared-path.test.ts), ≈ 3× less CPU
 * (bench/nasa7.ts).
 * Ties go to the lower candidate, so the choice is deterministic. Candidates that cannot be fitted (e.g.
 * too few samples on one side) are skipped; if none can, the first candidate's error is reported.
 */
import { FitError } from './errors.js';
import { fitAtFixedMid, fitWithoutMetrics, withMetrics, type UnmeasuredFit } from './fit-fixed-mid.js';
import { fitPrepared, measuredOf, preparedFactorisation, preparedPathApplies, type PreparedFit } from './fit-prepared.js';
import { rankLeastSquares, type RankEntry } from './ls-rank.js';
import { leastSquaresScore } from './ls-score.js';
import { worstLimitRatio } from './limit-ratio.js';
import { temperatureKey } from './factor-cache.js';
import { prepareSamples, splitAt, type PreparedSamples } from './prepared.js';
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

function ratioOf(result: Pick<FitResult, 'polynomial'>, samples: readonly FitSample[], options: FitOptions): number {
  const { tMid } = result.polynomial;
  const low = samples.filter((s) => s.T <= tMid);
  const high = samples.filter((s) => s.T >= tMid);
  return worstLimitRatio(result.polynomial, { low, high }, options.limits).ratio;
}

/** Ascending by score (a stable sort keeps ascending tMid on ties); Infinity ties with Infinity. */
const byScore = (a: { score: number }, b: { score: number }) => (a.score < b.score ? -1 : a.score > b.score ? 1 : 0);

/**
 * Visits every candidate tMid = min, min + step, … ≤ max with least-squares options at it; a candidate whose
 * visit throws a FitError is skipped. Throws when no candidate was scored (naming the first failure).
 * Returns the number of candidates tried. With `shared`, every visit gets the same options object with
 * its tMid set to the candidate's (one object per search instead of one per candidate): only for visitors
 * that keep no reference to it.
 */
function scanCandidates(
  range: NonNullable<FitOptions['optimiseMid']>,
  options: FitOptions,
  scored: ReadonlyArray<unknown>,
  visit: (tMid: number, at: FitOptions) => void,
  shared = false,
): number {
  let firstError: unknown;
  const count = Math.floor((range.max - range.min) / range.step + 1e-9) + 1;
  const one: FitOptions | undefined = shared ? { ...options, method: 'least-squares' as const } : undefined;
  for (let i = 0; i < count; i++) {
    const tMid = range.min + i * range.step;
    try {
      if (one) one.tMid = tMid;
      visit(tMid, one ?? { ...options, tMid, method: 'least-squares' as const });
    } catch (e) {
      if (!(e instanceof FitError)) throw e;
      firstError ??= e;
    }
  }
  if (!scored.length) {
    const why = firstError instanceof FitError ? firstError.message : String(firstError);
    throw new FitError(`no midpoint in [${range.min}, ${range.max}] K could be fitted; first failure: ${why}`);
  }
  return count;
}

/**
 * The minimax refinement of both searches: the candidate nearest the fixed tMid first, then the
 * MINIMAX_CANDIDATES − 1 best-ranked in ascending tMid; a later candidate must beat the best so far by more
 * than rounding noise (an atom's exact fit scores ~1e-12 everywhere and keeps the fixed midpoint), and its
 * minimax fit may stop as soon as it has proved it cannot (the cutoff; exact pruning, see minimaxReduced).
 * Candidates that cannot be fitted (a FitError, or undefined from `fitAt`) are skipped.
 */
function refineBest<F>(
  scored: ReadonlyArray<{ tMid: number }>,
  ranked: ReadonlyArray<{ tMid: number }>,
  fixedMid: number,
  fitAt: (tMid: number, cutoff: number) => { fit: F; score: number } | undefined,
): F | undefined {
  let refined: { fit: F; score: number } | undefined;
  const nearestFixed = [...scored].sort((a, b) => Math.abs(a.tMid - fixedMid) - Math.abs(b.tMid - fixedMid))[0]!;
  const chosen = new Set([nearestFixed.tMid, ...ranked.slice(0, MINIMAX_CANDIDATES - 1).map((c) => c.tMid)]);
  const order = [nearestFixed.tMid, ...[...chosen].filter((t) => t !== nearestFixed.tMid).sort((a, b) => a - b)];
  for (const tMid of order) {
    try {
      const cutoff = refined ? refined.score * (1 - 1e-6) - 1e-9 : Infinity;
      const r = fitAt(tMid, cutoff);
      if (r && (!refined || r.score < refined.score * (1 - 1e-6) - 1e-9)) refined = r;
    } catch (e) {
      if (!(e instanceof FitError)) throw e;
    }
  }
  return refined?.fit;
}

export function optimiseMid(samples: readonly FitSample[], anchor: FitSample, options: FitOptions): FitResult {
  const range = options.optimiseMid;
  const temperatures = temperatureKey(samples);
  if (!range) return fitAtFixedMid(samples, anchor, options, temperatures);
  const prepared = preparedPathApplies(options) ? prepareSamples(samples, anchor, options) : undefined;
  if (prepared) return optimisePrepared(prepared, options, range, temperatures);
  return optimiseMidGeneral(samples, anchor, options, temperatures);
}

/**
 * The search on the sample lists, for every input (the prepared path below covers the usual ones with
 * bit-identical results; tests compare the two).
 */
export function optimiseMidGeneral(samples: readonly FitSample[], anchor: FitSample, options: FitOptions, temperatures = temperatureKey(samples)): FitResult {
  const range = options.optimiseMid;
  if (!range) return fitAtFixedMid(samples, anchor, options, temperatures);
  const minimax = options.method === 'minimax';
  const w = options.weights;
  // Without rows for every quantity the residuals do not give the limit ratio of all three; score such
  // (unusual) options from the finished least-squares polynomial as the check would.
  const cheap = !minimax || (w.cp > 0 && w.h > 0 && w.s > 0);
  const scored: Array<{ tMid: number; score: number }> = [];
  const tried = scanCandidates(range, options, scored, (tMid, at) => {
    let score: number;
    if (cheap) {
      const s = leastSquaresScore(samples, anchor, at, temperatures);
      score = minimax ? s.limitRatio : s.weighted;
    } else score = ratioOf(fitAtFixedMid(samples, anchor, at, temperatures), samples, options);
    scored.push({ tMid, score });
  });
  // Stable sort: equal scores keep ascending tMid.
  const ranked = [...scored].sort((a, b) => a.score - b.score);
  let best: UnmeasuredFit | undefined;
  if (minimax) {
    best = refineBest(scored, ranked, options.tMid, (tMid, cutoff) => {
      const fit = fitWithoutMetrics(samples, anchor, { ...options, tMid }, temperatures, cutoff);
      return { fit, score: fit.solver.worstLimitRatio ?? ratioOf({ polynomial: fit.polynomial }, samples, options) };
    });
  }
  best ??= fitWithoutMetrics(samples, anchor, { ...options, tMid: ranked[0]!.tMid, method: 'least-squares' }, temperatures);
  const result = withMetrics(best, anchor);
  return { ...result, solver: { ...result.solver!, midCandidates: tried } };
}

/**
 * The search above on prepared samples (prepared.ts, fit-prepared.ts) with the pruned least-squares
 * ranking (ls-rank.ts): the same candidates, the same choice and bit-identical results, at less cost.
 * Candidates whose split fails the coverage rules, or that cannot be fitted, are handed to the general
 * functions, which report them exactly as before.
 */
function optimisePrepared(p: PreparedSamples, options: FitOptions, range: NonNullable<FitOptions['optimiseMid']>, temperatures: string): FitResult {
  const { samples, anchor } = p;
  const minimax = options.method === 'minimax';
  const scored: Array<{ tMid: number; score: number }> = [];
  const entries: RankEntry[] = [];
  const tried = scanCandidates(range, options, scored, (tMid, at) => {
    const split = splitAt(p, at);
    if (!split) {
      // The general scoring reports why (it throws the FitError of samples.ts).
      const s = leastSquaresScore(samples, anchor, at, temperatures);
      scored.push({ tMid, score: minimax ? s.limitRatio : s.weighted });
      return;
    }
    const entry: RankEntry = { tMid, split, f: preparedFactorisation(p, at, temperatures, split), score: NaN };
    entries.push(entry);
    scored.push(entry);
    // Neither splitAt, preparedFactorisation nor leastSquaresScore keeps `at`: the options can be shared.
  }, true);
  rankLeastSquares(p, entries, options, minimax ? MINIMAX_CANDIDATES - 1 : 1, minimax ? 'limitRatio' : 'weighted');
  const ranked = [...scored].sort(byScore);
  let best: PreparedFit | undefined;
  if (minimax) {
    best = refineBest(scored, ranked, options.tMid, (tMid, cutoff) => {
      const fit = fitPrepared(p, { ...options, tMid }, temperatures, cutoff);
      // A split the coverage rules refuse: the general fit would throw a FitError, skipped alike.
      return fit ? { fit, score: fit.worst! } : undefined;
    });
  }
  let result: FitResult;
  if (best) result = measuredOf(p, best, options);
  else {
    const at = { ...options, tMid: ranked[0]!.tMid, method: 'least-squares' as const };
    const fit = fitPrepared(p, at, temperatures);
    result = fit ? measuredOf(p, fit, at) : withMetrics(fitWithoutMetrics(samples, anchor, at, temperatures), anchor);
  }
  return { ...result, solver: { ...result.solver!, midCandidates: tried } };
}
