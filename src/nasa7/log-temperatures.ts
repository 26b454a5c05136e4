/**
 * ln T of every sample temperature, remembered for the last list of temperatures seen. Species of one
 * database share their sampling grid, so the prepared samples (prepared.ts) and the error check
 * (quality.ts) of the next species usually ask for the same temperatures again: comparing them with the
 * remembered ones costs one comparison per sample instead of one logarithm.
 *
 * Method: Math.log of each T, computed on a miss only. Math.log is a pure function of its argument, so a
 * remembered value is the very double a fresh call returns: results are bit-identical to calling Math.log
 * in place, whatever was asked before. The returned array is shared and must not be written to; a miss
 * makes a new array (arrays returned earlier stay valid). Comparison by ===, so a NaN temperature never
 * matches and is recomputed (the callers skip such samples anyway); +0 and −0 match, and their logarithms
 * are both −Infinity.
 */
import type { FitSample } from './types.js';

let last: { T: Float64Array; lnT: Float64Array } | undefined;

/** ln T[i] for every i (see the module comment; do not write to the result). */
export function lnOfTemperatures(T: Float64Array): Float64Array {
  const hit = last;
  if (hit && hit.T.length === T.length) {
    let same = true;
    for (let i = 0; i < T.length && same; i++) same = hit.T[i] === T[i];
    if (same) return hit.lnT;
  }
  const lnT = new Float64Array(T.length);
  for (let i = 0; i < T.length; i++) lnT[i] = Math.log(T[i]!);
  last = { T: T.slice(), lnT };
  return lnT;
}

/** ln T of every sample, in sample order (see the module comment; do not write to the result). */
export function lnOfSampleTemperatures(samples: readonly FitSample[]): Float64Array {
  const hit = last;
  if (hit && sameSampleTemperatures(hit.T, samples)) return hit.lnT;
  return lnOfTemperatures(Float64Array.from(samples, (s) => s.T));
}

/**
 * Whether `samples` have exactly the temperatures `remembered` (same length, === per sample): the check of
 * the per-grid memos (this one, factor-cache.ts `temperatureKey`).
 */
export function sameSampleTemperatures(remembered: Float64Array, samples: readonly FitSample[]): boolean {
  if (remembered.length !== samples.length) return false;
  for (let i = 0; i < samples.length; i++) if (remembered[i] !== samples[i]!.T) return false;
  return true;
}
