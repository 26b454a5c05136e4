/**
 * Checks that the samples can support a two-range fit and splits them by range. A sample at exactly tMid
 * belongs to both ranges (it is a legitimate data point for each).
 */
import { FitError } from './errors.js';
import type { FitOptions, FitSample } from './types.js';

/**
 * Fewest distinct temperatures per range. Each range has 7 coefficients; with 3 quantities per point
 * fewer could be algebraically enough, but below 7 the polynomial is not over-determined in T and the
 * fit says nothing about the error between points (common practice).
 */
export const MIN_DISTINCT_TEMPERATURES = 7;

/** First/last sample may lie at most this fraction of a range's width inside its end. */
export const MAX_END_GAP_FRACTION = 0.05;
/** Largest allowed gap between consecutive distinct temperatures, as a fraction of the range width. */
export const MAX_INNER_GAP_FRACTION = 0.25;

export interface SplitSamples {
  low: FitSample[];
  high: FitSample[];
}

const rel = (T: number) => 1e-12 * T;

function describeSample(s: FitSample, i: number): string {
  return `samples[${i}] (T = ${s.T} K)`;
}

function distinctSorted(ts: number[]): number[] {
  // Samples usually arrive in ascending order (a grid): then the sort, which would not change them, is skipped.
  let ascending = true;
  for (let i = 1; i < ts.length && ascending; i++) ascending = ts[i - 1]! <= ts[i]!;
  const sorted = ascending ? ts : [...ts].sort((a, b) => a - b);
  let repeated = false;
  for (let i = 1; i < sorted.length && !repeated; i++) repeated = sorted[i] === sorted[i - 1];
  return repeated ? sorted.filter((t, i) => i === 0 || t !== sorted[i - 1]) : sorted;
}

function checkCoverage(name: string, ts: number[], from: number, to: number, problems: string[]): void {
  const d = distinctSorted(ts);
  if (d.length < MIN_DISTINCT_TEMPERATURES) {
    problems.push(
      `${name} range [${from}, ${to}] K has ${d.length} distinct sample temperature(s); expected at least ${MIN_DISTINCT_TEMPERATURES}`,
    );
    return;
  }
  const width = to - from;
  const first = d[0]!;
  const last = d[d.length - 1]!;
  if (first - from > MAX_END_GAP_FRACTION * width) {
    problems.push(`${name} range [${from}, ${to}] K: lowest sample at ${first} K leaves ${first - from} K uncovered; expected a sample within ${MAX_END_GAP_FRACTION * width} K of ${from} K`);
  }
  if (to - last > MAX_END_GAP_FRACTION * width) {
    problems.push(`${name} range [${from}, ${to}] K: highest sample at ${last} K leaves ${to - last} K uncovered; expected a sample within ${MAX_END_GAP_FRACTION * width} K of ${to} K`);
  }
  for (let i = 1; i < d.length; i++) {
    const gap = d[i]! - d[i - 1]!;
    if (gap > MAX_INNER_GAP_FRACTION * width) {
      problems.push(`${name} range [${from}, ${to}] K: no samples between ${d[i - 1]} and ${d[i]} K (gap ${gap} K); expected gaps ≤ ${MAX_INNER_GAP_FRACTION * width} K`);
      break;
    }
  }
}

/** Validates anchor and samples against the options (all problems at once) and splits them by range. */
export function splitSamples(samples: readonly FitSample[], anchor: FitSample, options: FitOptions): SplitSamples {
  const problems: string[] = [];
  const { tLow, tMid, tHigh, anchorT } = options;
  for (const key of ['T', 'cpR', 'hRT', 'sR'] as const) {
    if (!Number.isFinite(anchor[key])) problems.push(`anchor.${key} = ${String(anchor[key])}: expected a finite number`);
  }
  if (Number.isFinite(anchor.T) && Math.abs(anchor.T - anchorT) > rel(anchorT)) {
    problems.push(`anchor sample is at T = ${anchor.T} K but options.anchorT = ${anchorT} K; expected the same temperature`);
  }
  let nonFinite = 0;
  let outside = 0;
  const low: FitSample[] = [];
  const high: FitSample[] = [];
  samples.forEach((s, i) => {
    // The common all-finite case without building the list of bad keys (this runs per midpoint candidate).
    const finite = Number.isFinite(s.T) && Number.isFinite(s.cpR) && Number.isFinite(s.hRT) && Number.isFinite(s.sR);
    const bad = finite ? [] : (['T', 'cpR', 'hRT', 'sR'] as const).filter((k) => !Number.isFinite(s[k]));
    if (bad.length) {
      if (nonFinite++ < 5) problems.push(`${describeSample(s, i)}: ${bad.join(', ')} not finite (${bad.map((k) => String(s[k])).join(', ')})`);
      return;
    }
    if (s.T < tLow - rel(tLow) || s.T > tHigh + rel(tHigh)) {
      if (outside++ < 5) problems.push(`${describeSample(s, i)} lies outside the fit range [${tLow}, ${tHigh}] K; expected the caller to pass only samples inside it`);
      return;
    }
    if (s.T <= tMid) low.push(s);
    if (s.T >= tMid) high.push(s);
  });
  if (nonFinite > 5) problems.push(`… ${nonFinite - 5} more non-finite samples`);
  if (outside > 5) problems.push(`… ${outside - 5} more samples outside the fit range`);
  if (nonFinite === 0) {
    checkCoverage('low', low.map((s) => s.T), tLow, tMid, problems);
    checkCoverage('high', high.map((s) => s.T), tMid, tHigh, problems);
  }
  if (problems.length) throw new FitError(problems);
  return { low, high };
}
