/**
 * The samples of one species prepared once for every midpoint candidate of its fit: validated, copied into
 * typed arrays (T, ln T, Cp/R, H/RT, S/R, the relative-enthalpy target of design.ts and the size-scaled
 * limits of limits.ts), so a candidate's split into the two ranges is a pair of index bounds instead of two
 * new lists and a fresh validation (samples.ts does both per call).
 *
 * Every value is computed with exactly the arithmetic of the per-candidate code it replaces (the same
 * expressions on the same doubles), so a fit on prepared samples is bit-identical to one on the lists
 * `splitSamples` returns. Only strictly ascending samples are prepared (a grid, what the pipeline passes);
 * for anything else, and for every input `splitSamples` would reject, `prepareSamples` returns undefined
 * and the caller takes the general path, which reports the problem exactly as before.
 */
import { limitAt } from './limits.js';
import { lnOfTemperatures } from './log-temperatures.js';
import { MAX_END_GAP_FRACTION, MAX_INNER_GAP_FRACTION, MIN_DISTINCT_TEMPERATURES } from './samples.js';
import type { FitOptions, FitSample } from './types.js';

export interface PreparedSamples {
  samples: readonly FitSample[];
  anchor: FitSample;
  n: number;
  T: Float64Array;
  /** ln T (shared between species on one grid: read only). */
  lnT: Float64Array;
  cpR: Float64Array;
  hRT: Float64Array;
  sR: Float64Array;
  /** hRT − hShift/T with hShift = anchor.hRT · anchor.T (the enthalpy target of design.ts). */
  hRel: Float64Array;
  /** L_q(T) of limits.ts for q = Cp/R, H/RT, S/R. */
  limCp: Float64Array;
  limH: Float64Array;
  limS: Float64Array;
}

/** Index bounds of one midpoint's ranges: low = [0, lowEnd), high = [highStart, n). */
export interface RangeSplit {
  lowEnd: number;
  highStart: number;
}

const rel = (T: number) => 1e-12 * T;

/**
 * The prepared samples, or undefined when they are not strictly ascending or `splitSamples` would find a
 * problem that does not depend on tMid (non-finite values, samples outside [tLow, tHigh], a bad anchor).
 */
export function prepareSamples(samples: readonly FitSample[], anchor: FitSample, options: FitOptions): PreparedSamples | undefined {
  const { tLow, tHigh, anchorT } = options;
  if (!(Number.isFinite(anchor.T) && Number.isFinite(anchor.cpR) && Number.isFinite(anchor.hRT) && Number.isFinite(anchor.sR))) return undefined;
  if (Math.abs(anchor.T - anchorT) > rel(anchorT)) return undefined;
  const n = samples.length;
  if (n === 0) return undefined;
  const T = new Float64Array(n);
  const cpR = new Float64Array(n);
  const hRT = new Float64Array(n);
  const sR = new Float64Array(n);
  const hRel = new Float64Array(n);
  const limCp = new Float64Array(n);
  const limH = new Float64Array(n);
  const limS = new Float64Array(n);
  const hShift = anchor.hRT * anchor.T;
  const { cp: lc, h: lh, s: ls } = options.limits;
  let previous = -Infinity;
  for (let i = 0; i < n; i++) {
    const s = samples[i]!;
    if (!(Number.isFinite(s.T) && Number.isFinite(s.cpR) && Number.isFinite(s.hRT) && Number.isFinite(s.sR))) return undefined;
    if (s.T < tLow - rel(tLow) || s.T > tHigh + rel(tHigh) || !(s.T > previous)) return undefined;
    previous = s.T;
    T[i] = s.T;
    cpR[i] = s.cpR;
    hRT[i] = s.hRT;
    sR[i] = s.sR;
    hRel[i] = s.hRT - hShift / s.T;
    limCp[i] = limitAt(lc, s.cpR);
    limH[i] = limitAt(lh, s.cpR);
    limS[i] = limitAt(ls, s.cpR);
  }
  // Math.log of each T, remembered between species on the same grid (log-temperatures.ts: the same doubles).
  const lnT = lnOfTemperatures(T);
  return { samples, anchor, n, T, lnT, cpR, hRT, sR, hRel, limCp, limH, limS };
}

function covered(T: Float64Array, from: number, to: number, first: number, end: number): boolean {
  if (end - first < MIN_DISTINCT_TEMPERATURES) return false;
  const width = to - from;
  if (T[first]! - from > MAX_END_GAP_FRACTION * width) return false;
  if (to - T[end - 1]! > MAX_END_GAP_FRACTION * width) return false;
  const gap = MAX_INNER_GAP_FRACTION * width;
  for (let i = first + 1; i < end; i++) if (T[i]! - T[i - 1]! > gap) return false;
  return true;
}

/**
 * The split at tMid (a sample at exactly tMid in both ranges, as in samples.ts), or undefined when a range
 * fails the coverage rules of samples.ts (the caller then reports the problem through `splitSamples`).
 */
export function splitAt(p: PreparedSamples, options: Pick<FitOptions, 'tLow' | 'tMid' | 'tHigh'>): RangeSplit | undefined {
  const { tLow, tMid, tHigh } = options;
  const T = p.T;
  let lowEnd = 0;
  while (lowEnd < p.n && T[lowEnd]! <= tMid) lowEnd++;
  const highStart = lowEnd > 0 && T[lowEnd - 1]! >= tMid ? lowEnd - 1 : lowEnd;
  if (!covered(T, tLow, tMid, 0, lowEnd) || !covered(T, tMid, tHigh, highStart, p.n)) return undefined;
  return { lowEnd, highStart };
}

/** The two ranges as sample lists (what `splitSamples` returns for the same tMid). */
export function rangeLists(p: PreparedSamples, split: RangeSplit): { low: FitSample[]; high: FitSample[] } {
  return { low: p.samples.slice(0, split.lowEnd), high: p.samples.slice(split.highStart) };
}
