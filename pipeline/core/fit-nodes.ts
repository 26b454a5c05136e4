/**
 * The fit nodes: the computed points the fit is made from, drawn from the sampling grid (the CHECK grid,
 * every `fit.sampling_step` K; the verify stage judges the fit at every one of those points whatever the
 * nodes are). A species' fit costs roughly in proportion to the number of points it is made from, while
 * the points themselves are cheap once the species' level lists exist, so the fit may use a subset and
 * the check the whole grid.
 *
 * Node sets (`fit.nodes` in the settings):
 *   'all'                         every sampling point (the fit before this option existed);
 *   {spacing, count, exchange}    `count` target temperatures over [low, high] spaced
 *      'uniform'   evenly:                      T_i = low + (high − low)·i/(count − 1);
 *      'geometric' evenly in ln T:              T_i = low·(high/low)^(i/(count − 1)) — denser at low T,
 *                  where a species' Cp/R changes fastest and the fit's error lobes are narrowest;
 *      'chebyshev' Chebyshev–Lobatto points of the whole range (Powell, Approximation Theory and Methods,
 *                  1981, ch. 7): T_i = (low + high)/2 − (high − low)/2 · cos(π i/(count − 1)) — dense at
 *                  both ends;
 *   each snapped to the nearest sampling point, plus the range ends, 298.15 K and every midpoint the fit
 *   may use (the fixed one, or each candidate of the midpoint search: a node at T_mid belongs to both
 *   ranges, which keeps both ends of both ranges covered for every candidate). Chebyshev points of each
 *   range separately would need a different node set per midpoint candidate; the midpoint search fits
 *   one sample list, so the points here are of the whole range.
 *   `exchange`: after the fit, one exchange step (Remez 1934; Powell 1981, ch. 8): the sampling points
 *   where the fit's limit-relative error has its local maxima join the nodes and the fit is redone at the
 *   chosen midpoint (pipeline/stages/fit.ts).
 *
 * Coverage: the fit requires, in each range, at least 7 distinct temperatures, a sample within 5 % of the
 * range width of each end and no gap over 25 % of it (src/nasa7/samples.ts). `fitNodeIndices` fills in
 * sampling points (the midpoint of a too-wide gap, repeatedly) until every midpoint candidate meets those
 * rules, so any `count` gives a fittable node set whenever the sampling grid itself is fittable.
 *
 * Which set is the default, and why, is measured: test/pipeline/stages/fit-nodes.test.ts and
 * `npm run bench` (bench/grid.ts, the price table); README "Fit nodes".
 */
import { T_REF } from '../../src/constants.js';
import { MAX_END_GAP_FRACTION, MAX_INNER_GAP_FRACTION, MIN_DISTINCT_TEMPERATURES } from '../../src/nasa7/samples.js';

export type FitNodeSpacing = 'uniform' | 'geometric' | 'chebyshev';

/** `fit.nodes` of the settings. */
export type FitNodesSetting = 'all' | { spacing: FitNodeSpacing; count: number; exchange: boolean };

/** The midpoints a species' fit may use: a fixed one, or the candidates of its search. */
export interface MidChoice {
  mid: number;
  search?: { min: number; max: number; step: number };
}

/** Midpoint candidates, as src/nasa7/mid-optimise.ts enumerates them (min + i·step ≤ max), or the fixed one. */
export function midCandidates(choice: MidChoice): number[] {
  const s = choice.search;
  if (!s) return [choice.mid];
  const count = Math.floor((s.max - s.min) / s.step + 1e-9) + 1;
  return Array.from({ length: count }, (_, i) => s.min + i * s.step);
}

/** Target temperatures of a spacing rule over [low, high] (ends included), before snapping. */
export function spacingTargets(spacing: FitNodeSpacing, count: number, low: number, high: number): number[] {
  const n = Math.max(2, Math.floor(count));
  const out: number[] = [];
  for (let i = 0; i < n; i++) {
    const u = i / (n - 1);
    if (spacing === 'uniform') out.push(low + (high - low) * u);
    else if (spacing === 'geometric') out.push(low * (high / low) ** u);
    else out.push((low + high) / 2 - ((high - low) / 2) * Math.cos(Math.PI * u));
  }
  return out;
}

/** Index of the grid point nearest T (grid ascending; ties to the lower point). */
function nearestIndex(grid: readonly number[], T: number): number {
  let lo = 0;
  let hi = grid.length - 1;
  while (hi - lo > 1) {
    const m = (lo + hi) >> 1;
    if (grid[m]! <= T) lo = m;
    else hi = m;
  }
  return T - grid[lo]! <= grid[hi]! - T ? lo : hi;
}

/**
 * Adds grid indices to `chosen` until [from, to] has ≥ MIN_DISTINCT_TEMPERATURES nodes, one within
 * MAX_END_GAP_FRACTION of each end and no gap over MAX_INNER_GAP_FRACTION of its width (as far as the grid
 * allows: a grid that fails the rules itself is reported by the settings check, not here).
 */
function fillRange(grid: readonly number[], chosen: Set<number>, from: number, to: number): void {
  const width = to - from;
  const first = nearestIndex(grid, from);
  const last = nearestIndex(grid, to);
  for (let guard = 0; guard < grid.length; guard++) {
    const inside = [...chosen].filter((i) => grid[i]! >= from && grid[i]! <= to).sort((a, b) => a - b);
    let add: number | undefined;
    if (!inside.length || grid[inside[0]!]! - from > MAX_END_GAP_FRACTION * width) add = first;
    else if (to - grid[inside[inside.length - 1]!]! > MAX_END_GAP_FRACTION * width) add = last;
    else {
      // The widest gap: bisected when too wide, or when the range still lacks distinct temperatures.
      let widest = -1;
      let at = -1;
      for (let k = 1; k < inside.length; k++) {
        const gap = grid[inside[k]!]! - grid[inside[k - 1]!]!;
        if (gap > widest && inside[k]! - inside[k - 1]! > 1) {
          widest = gap;
          at = k;
        }
      }
      const tooFew = inside.length < MIN_DISTINCT_TEMPERATURES;
      if (at > 0 && (tooFew || widest > MAX_INNER_GAP_FRACTION * width)) {
        add = nearestIndex(grid, (grid[inside[at - 1]!]! + grid[inside[at]!]!) / 2);
      }
    }
    if (add === undefined || chosen.has(add)) return;
    chosen.add(add);
  }
}

/**
 * Indices (ascending) into `grid` — the species' sampling temperatures, ascending — of its fit nodes;
 * every index for 'all'. Deterministic: a function of the arguments only, so species with the same grid
 * and ranges share the node set (and the fit's cached factorisations).
 */
export function fitNodeIndices(
  grid: readonly number[],
  nodes: FitNodesSetting,
  ranges: { low: number; high: number },
  mids: MidChoice,
): number[] {
  if (nodes === 'all' || grid.length === 0) return grid.map((_, i) => i);
  const chosen = new Set<number>();
  for (const T of spacingTargets(nodes.spacing, nodes.count, ranges.low, ranges.high)) chosen.add(nearestIndex(grid, T));
  const candidates = midCandidates(mids);
  for (const T of [ranges.low, ranges.high, T_REF, ...candidates]) {
    const i = nearestIndex(grid, T);
    if (Math.abs(grid[i]! - T) <= 1e-9 * T) chosen.add(i);
  }
  for (const mid of candidates) {
    fillRange(grid, chosen, ranges.low, mid);
    fillRange(grid, chosen, mid, ranges.high);
  }
  return [...chosen].sort((a, b) => a - b);
}

/** Short text of a node setting, for tables and messages ('all', 'geometric 40 + exchange'). */
export function describeFitNodes(nodes: FitNodesSetting): string {
  return nodes === 'all' ? 'all' : `${nodes.spacing} ${nodes.count}${nodes.exchange ? ' + exchange' : ''}`;
}
