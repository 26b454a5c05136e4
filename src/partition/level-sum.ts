/**
 * Sum over discrete levels: q = Σ g_i exp(−θ_i/T) with level temperatures θ_i = c2·E_i (K).
 */
import type { GridMoments } from './grid-moments.js';
import { LevelSumError, type PartitionMoments } from './moments.js';

/** Past this point the remaining levels change q, ⟨u⟩ and var u by less than this relative amount. */
export const TAIL_CUTOFF = 1e-17;

/**
 * A list of levels with their statistical weights, sorted by energy. `theta` holds c2·(E − E_lowest) in K,
 * so every entry is ≥ 0 and the lowest level contributes exp(0): this is the log-sum-exp shift done once at
 * construction, and no term can overflow at any temperature. `tailWeight[i]` = Σ_{k≥i} g_k bounds what
 * the levels from i on can still add, so the sum can stop early at low T.
 */
export interface LevelList {
  readonly theta: Float64Array;
  readonly weight: Float64Array;
  readonly tailWeight: Float64Array;
}

/**
 * Build a level list from energies (any common origin, any unit) and weights; energies are shifted so the
 * lowest is zero, scaled by `toKelvin` and sorted (ties keep input order, so the result is deterministic).
 */
export function createLevelList(
  energiesIn: ArrayLike<number>,
  weights: ArrayLike<number>,
  toKelvin: number,
): LevelList {
  // One array type for the sort and the loops below (the same doubles): callers pass Float64Arrays and plain
  // arrays, and each new kind deoptimised the sort's compiled code again (13 compilations per thread).
  const energies = energiesIn instanceof Float64Array ? energiesIn : Float64Array.from(energiesIn);
  const n = energies.length;
  if (n === 0) throw new LevelSumError('level list is empty');
  if (weights.length !== n) throw new LevelSumError('energies and weights differ in length');
  let lowest = Infinity;
  for (let i = 0; i < n; i++) {
    const e = energies[i]!;
    const w = weights[i]!;
    if (!Number.isFinite(e)) throw new LevelSumError(`level ${i} has a non-finite energy ${e}`);
    if (!(Number.isFinite(w) && w > 0)) throw new LevelSumError(`level ${i} has weight ${w}; expected > 0`);
    if (e < lowest) lowest = e;
  }
  const order = stableEnergyOrder(energies);
  const theta = new Float64Array(n);
  const weight = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const k = order[i]!;
    theta[i] = (energies[k]! - lowest) * toKelvin;
    weight[i] = weights[k]!;
  }
  const tailWeight = new Float64Array(n);
  let tail = 0;
  for (let i = n - 1; i >= 0; i--) {
    tail += weight[i]!;
    tailWeight[i] = tail;
  }
  return { theta, weight, tailWeight };
}

/**
 * Indices of `energies` in rising energy, ties in input order (the order of a stable sort by energy).
 * Natural merge sort: level lists arrive as a few already-sorted runs (one per vibrational ladder, J
 * rising), so this is O(n log runs) on typed arrays.
 */
export function stableEnergyOrder(energies: ArrayLike<number>): Int32Array {
  const n = energies.length;
  let a = new Int32Array(n);
  for (let i = 0; i < n; i++) a[i] = i;
  let bounds: number[] = [0];
  for (let i = 1; i < n; i++) if (energies[i]! < energies[i - 1]!) bounds.push(i);
  bounds.push(n);
  let b = new Int32Array(n);
  while (bounds.length > 2) {
    const next: number[] = [0];
    for (let r = 0; r + 1 < bounds.length; r += 2) {
      const lo = bounds[r]!;
      const mid = bounds[r + 1]!;
      const hi = r + 2 < bounds.length ? bounds[r + 2]! : mid;
      let i = lo;
      let j = mid;
      let k = lo;
      // On equal energies the left run (lower input indices) goes first: stable.
      while (i < mid && j < hi) b[k++] = energies[a[j]!]! < energies[a[i]!]! ? a[j++]! : a[i++]!;
      while (i < mid) b[k++] = a[i++]!;
      while (j < hi) b[k++] = a[j++]!;
      next.push(hi);
    }
    [a, b] = [b, a];
    bounds = next;
  }
  return a;
}

/**
 * Moments of a level sum at temperature T (K).
 *
 * Formula, with u_i = θ_i/T and p_i = g_i e^{−u_i}/q:
 *   ln q,  ⟨u⟩ = Σ p_i u_i,  var u = Σ p_i (u_i − ⟨u⟩)²
 * giving (H − H0)/RT = ⟨u⟩, Cp/R = var u, S/R = ln q + ⟨u⟩ (energies from the lowest level).
 * Levels are visited in rising energy; the sum stops once the remaining weight times e^{−u}(1 + u²)
 * (a bound on what the rest can add to q, Σ w u and Σ w u², valid for u > 2) is below 1e-17 of q.
 * Valid for any T > 0 (u_i ≥ 0, the lowest term is exactly g_0).
 * Source: McQuarrie, Statistical Mechanics (1976), eqs. 2-30 to 2-34 (canonical fluctuations).
 */
export function levelSumMoments(levels: LevelList, T: number): PartitionMoments {
  const one: GridMoments = { lnQ: new Float64Array(1), meanU: new Float64Array(1), varU: new Float64Array(1) };
  addDirectLevelSum(levels, T, one, 0);
  return { lnQ: one.lnQ[0]!, meanU: one.meanU[0]!, varU: one.varU[0]! };
}

/** The direct sum of `levelSumMoments` at T, added into grid index j (no object per temperature). */
export function addDirectLevelSum(levels: LevelList, T: number, into: GridMoments, j: number): void {
  const { theta, weight, tailWeight } = levels;
  const n = theta.length;
  const invT = 1 / T;
  // Weighted Welford update: one pass, centred, so the variance keeps full precision when ⟨u⟩ is large.
  let q = 0;
  let mean = 0;
  let m2 = 0;
  for (let i = 0; i < n; i++) {
    const u = theta[i]! * invT;
    const e = Math.exp(-u);
    if (u > 20 && tailWeight[i]! * e * (1 + u * u) < TAIL_CUTOFF * q) break;
    const w = weight[i]! * e;
    if (w === 0) break; // sorted: every later term underflows too
    q += w;
    const d = u - mean;
    mean += (w / q) * d;
    m2 += w * d * (u - mean);
  }
  into.lnQ[j]! += Math.log(q);
  into.meanU[j]! += mean;
  into.varU[j]! += m2 / q;
}
