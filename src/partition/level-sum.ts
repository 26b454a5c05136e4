/**
 * Sum over discrete levels: q = Σ g_i exp(−θ_i/T) with level temperatures θ_i = c2·E_i (K).
 */
import { LevelSumError, type PartitionMoments } from './moments.js';

/**
 * A list of levels with their statistical weights. `theta` holds c2·(E − E_lowest) in K, so every entry is
 * ≥ 0 and the lowest level contributes exp(0): this is the log-sum-exp shift done once at construction,
 * and no term can overflow at any temperature.
 */
export interface LevelList {
  readonly theta: Float64Array;
  readonly weight: Float64Array;
}

/**
 * Build a level list from energies (any common origin, any unit) and weights; energies are shifted so the
 * lowest is zero and scaled by `toKelvin`.
 */
export function createLevelList(
  energies: ArrayLike<number>,
  weights: ArrayLike<number>,
  toKelvin: number,
): LevelList {
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
  const theta = new Float64Array(n);
  const weight = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    theta[i] = (energies[i]! - lowest) * toKelvin;
    weight[i] = weights[i]!;
  }
  return { theta, weight };
}

/**
 * Moments of a level sum at temperature T (K).
 *
 * Formula, with u_i = θ_i/T and p_i = g_i e^{−u_i}/q:
 *   ln q,  ⟨u⟩ = Σ p_i u_i,  var u = Σ p_i (u_i − ⟨u⟩)²
 * giving (H − H0)/RT = ⟨u⟩, Cp/R = var u, S/R = ln q + ⟨u⟩ (energies from the lowest level).
 * Valid for any T > 0 (u_i ≥ 0, the lowest term is exactly g_0).
 * Source: McQuarrie, Statistical Mechanics (1976), eqs. 2-30 to 2-34 (canonical fluctuations).
 */
export function levelSumMoments(levels: LevelList, T: number): PartitionMoments {
  const { theta, weight } = levels;
  const n = theta.length;
  const invT = 1 / T;
  // Weighted Welford update: one pass, centred, so the variance keeps full precision when ⟨u⟩ is large.
  let q = 0;
  let mean = 0;
  let m2 = 0;
  for (let i = 0; i < n; i++) {
    const u = theta[i]! * invT;
    const w = weight[i]! * Math.exp(-u);
    if (w === 0) continue;
    q += w;
    const d = u - mean;
    mean += (w / q) * d;
    m2 += w * d * (u - mean);
  }
  return { lnQ: Math.log(q), meanU: mean, varU: m2 / q };
}
