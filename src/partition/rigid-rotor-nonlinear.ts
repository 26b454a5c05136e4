/**
 * Classical rigid-rotor partition function of a nonlinear molecule.
 */
import { C2_CM_K } from '../constants.js';
import type { GridMoments, TemperatureGrid } from './grid-moments.js';
import type { PartitionMoments } from './moments.js';

/**
 * Formula: q_rot = (√π/σ)·(T³/(θA θB θC))^{1/2}, θX = c2·X for rotational constants A, B, C (cm⁻¹);
 *   meanU = 3/2, varU = 3/2 exactly.
 * Units: cm⁻¹, K. Valid when T ≫ θA, θB, θC (the classical limit; for H2O θA ≈ 40 K, so at 200 K the
 * quantum correction to S is a few 0.01 J/(mol K)).
 * Source: McQuarrie, Statistical Mechanics (1976), eq. 8-38.
 */
export function nonlinearRotorMoments(
  rotationalConstants: readonly [number, number, number],
  symmetryNumber: number,
  T: number,
): PartitionMoments {
  const [a, b, c] = rotationalConstants;
  const thetaProduct = C2_CM_K * a * C2_CM_K * b * C2_CM_K * c;
  const lnQ = 0.5 * Math.log(Math.PI) - Math.log(symmetryNumber) + 0.5 * (3 * Math.log(T) - Math.log(thetaProduct));
  return { lnQ, meanU: 1.5, varU: 1.5 };
}

/** Grid form of `nonlinearRotorMoments` (the same expression at every T). */
export function addNonlinearRotorGrid(
  rotationalConstants: readonly [number, number, number],
  symmetryNumber: number,
  grid: TemperatureGrid,
  into: GridMoments,
): void {
  const [a, b, c] = rotationalConstants;
  const thetaProduct = C2_CM_K * a * C2_CM_K * b * C2_CM_K * c;
  for (let j = 0; j < grid.T.length; j++) {
    into.lnQ[j]! += 0.5 * Math.log(Math.PI) - Math.log(symmetryNumber) + 0.5 * (3 * Math.log(grid.T[j]!) - Math.log(thetaProduct));
    into.meanU[j]! += 1.5;
    into.varU[j]! += 1.5;
  }
}
