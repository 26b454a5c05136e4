/**
 * Rigid-rotor partition function of a linear molecule, by direct summation over J.
 */
import { C2_CM_K } from '../constants.js';
import type { GridMoments, TemperatureGrid } from './grid-moments.js';
import type { LevelList } from './level-sum.js';
import { addLevelSumGrid } from './level-sum-grid.js';
import { LevelSumError, type PartitionMoments } from './moments.js';

/** Terms below this fraction of the running sum, past the population maximum, are negligible. */
const RELATIVE_CUTOFF = 1e-17;
/** A rotor needing more J than this has an absurd θ/T; refuse rather than loop for ever. */
const MAX_J = 10_000_000;

/**
 * Formula: q_rot = (1/σ) Σ_J (2J+1) exp(−θ J(J+1)/T), θ = c2·B; with u_J = θJ(J+1)/T the moments are
 * ln q, ⟨u⟩ and var u (see level-sum.ts). The sum stops after the population maximum once a term falls
 * below 1e-17 of the running sum. Dividing every level by σ is the usual high-temperature treatment of
 * homonuclear symmetry (it omits the even/odd J alternation).
 * Units: B in cm⁻¹, T in K. Valid at any T > 0 for a rigid rotor.
 * Source: McQuarrie, Statistical Mechanics (1976), eqs. 6-43 and 6-50.
 */
export function linearRotorMoments(
  rotationalConstant: number,
  symmetryNumber: number,
  T: number,
): PartitionMoments {
  const x = (C2_CM_K * rotationalConstant) / T;
  if (!(x > 0 && Number.isFinite(x))) throw new LevelSumError(`rotational constant ${rotationalConstant} cm-1 gives θ/T = ${x}`);
  const jPeak = Math.sqrt(1 / (2 * x));
  let q = 0;
  let mean = 0;
  let m2 = 0;
  for (let J = 0; ; J++) {
    if (J > MAX_J) throw new LevelSumError(`rotational sum did not converge within J = ${MAX_J} (θ/T = ${x})`);
    const u = x * J * (J + 1);
    const w = (2 * J + 1) * Math.exp(-u);
    if (J > jPeak && w <= RELATIVE_CUTOFF * q) break;
    q += w;
    const d = u - mean;
    mean += (w / q) * d;
    m2 += w * d * (u - mean);
  }
  return { lnQ: Math.log(q) - Math.log(symmetryNumber), meanU: mean, varU: m2 / q };
}

/** Levels are kept up to u = θJ(J+1)/T = 60 at the ceiling temperature of the list. */
const KEPT_U_AT_CEILING = 60;

/**
 * The J levels of a linear rigid rotor as a level list (θ_J = θ J(J+1), weight 2J + 1; σ is applied by
 * `addLinearRotorGrid`), complete up to `ceilingTemperature` (K): the omitted terms past u = 60 there sum
 * to less than ∫ (2J+1) e^{−θJ(J+1)/T} dJ over the rest, q_classical·e^{−60} ≈ 1e-26 of q.
 */
export function linearRotorLevelList(rotationalConstant: number, ceilingTemperature: number): LevelList {
  const x = (C2_CM_K * rotationalConstant) / ceilingTemperature;
  if (!(x > 0 && Number.isFinite(x))) throw new LevelSumError(`rotational constant ${rotationalConstant} cm-1 gives θ/T = ${x}`);
  // J(J+1) ≤ 60/x, so J ≤ √(60/x).
  const count = Math.floor(Math.sqrt(KEPT_U_AT_CEILING / x)) + 2;
  if (count > MAX_J) throw new LevelSumError(`rotational sum did not converge within J = ${MAX_J} (θ/T = ${x})`);
  const theta = new Float64Array(count);
  const weight = new Float64Array(count);
  const tailWeight = new Float64Array(count);
  const thetaRot = C2_CM_K * rotationalConstant;
  for (let J = 0; J < count; J++) {
    theta[J] = thetaRot * J * (J + 1);
    weight[J] = 2 * J + 1;
  }
  let tail = 0;
  for (let J = count - 1; J >= 0; J--) {
    tail += weight[J]!;
    tailWeight[J] = tail;
  }
  return { theta, weight, tailWeight };
}

/**
 * Grid form of `linearRotorMoments` from the level list of `linearRotorLevelList` (level-sum-grid.ts: its
 * stated accuracy, tested against the direct J sum); every T of the grid must be ≤ the list's ceiling.
 */
export function addLinearRotorGrid(levels: LevelList, symmetryNumber: number, grid: TemperatureGrid, into: GridMoments): void {
  addLevelSumGrid(levels, grid, into);
  const lnSigma = Math.log(symmetryNumber);
  for (let j = 0; j < grid.T.length; j++) into.lnQ[j]! -= lnSigma;
}

/**
 * Classical (high-temperature) limit q_rot → T/(σθ), θ = c2·B. A TEST CHECK, not the method.
 * Valid for T ≫ θ (common practice: the classical limit serves once T/θ is large, error ≈ θ/3T).
 * Source: McQuarrie, Statistical Mechanics (1976), eq. 6-47.
 */
export function linearRotorClassicalLimit(rotationalConstant: number, symmetryNumber: number, T: number): number {
  return T / (symmetryNumber * C2_CM_K * rotationalConstant);
}

/**
 * Mulholland's expansion q_rot ≈ T/(σθ)·(1 + θ/3T + θ²/15T² + 4θ³/315T³). A TEST CHECK, not the method.
 * Valid for T ≳ θ (asymptotic series; the next term is O((θ/T)⁴)).
 * Source: H. P. Mulholland, Proc. Cambridge Philos. Soc. 24, 280 (1928); McQuarrie (1976), eq. 6-49.
 */
export function linearRotorMulholland(rotationalConstant: number, symmetryNumber: number, T: number): number {
  const y = (C2_CM_K * rotationalConstant) / T;
  return (1 / (symmetryNumber * y)) * (1 + y / 3 + (y * y) / 15 + (4 * y * y * y) / 315);
}
