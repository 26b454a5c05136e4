/**
 * Partition-function moments on a whole temperature grid at once: one Float64Array per moment, filled by
 * the grid form of each model (`…Grid(…, grid, into)` adds its factor's lnQ, meanU, varU at every T).
 * Independent factors multiply, so their moments add, exactly as `addMoments` does for one T; no object is
 * made per temperature.
 */
import { assertTemperature, type PartitionMoments } from './moments.js';

export interface GridMoments {
  readonly lnQ: Float64Array;
  readonly meanU: Float64Array;
  readonly varU: Float64Array;
}

/** A temperature grid (K) with its reciprocals, checked once. */
export interface TemperatureGrid {
  readonly T: Float64Array;
  readonly invT: Float64Array;
  /** Largest temperature of the grid, K. */
  readonly max: number;
  /** Smallest temperature of the grid, K. */
  readonly min: number;
}

/** Check every temperature (finite, > 0) and precompute 1/T. Any order, repeats allowed. */
export function temperatureGrid(temperatures: ArrayLike<number>): TemperatureGrid {
  const n = temperatures.length;
  const T = new Float64Array(n);
  const invT = new Float64Array(n);
  let max = 0;
  let min = Infinity;
  for (let j = 0; j < n; j++) {
    const t = temperatures[j]!;
    assertTemperature(t);
    T[j] = t;
    invT[j] = 1 / t;
    if (t > max) max = t;
    if (t < min) min = t;
  }
  return { T, invT, max, min };
}

export function zeroGridMoments(n: number): GridMoments {
  return { lnQ: new Float64Array(n), meanU: new Float64Array(n), varU: new Float64Array(n) };
}

/**
 * Adapter for a model that only has the per-point form `(T) → PartitionMoments`: adds its moments at every
 * grid temperature (one call per T). Lets a new model join the grid evaluator before it has a grid form.
 */
export function addPointwise(moments: (T: number) => PartitionMoments, grid: TemperatureGrid, into: GridMoments): void {
  for (let j = 0; j < grid.T.length; j++) {
    const m = moments(grid.T[j]!);
    into.lnQ[j]! += m.lnQ;
    into.meanU[j]! += m.meanU;
    into.varU[j]! += m.varU;
  }
}

/** Moments at grid index j as a plain object (for the per-point API). */
export function momentsAt(m: GridMoments, j: number): PartitionMoments {
  return { lnQ: m.lnQ[j]!, meanU: m.meanU[j]!, varU: m.varU[j]! };
}
