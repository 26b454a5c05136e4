/**
 * Translational partition function of an ideal gas (Sackur–Tetrode).
 */
import { AVOGADRO, BOLTZMANN, PLANCK } from '../constants.js';
import type { GridMoments, TemperatureGrid } from './grid-moments.js';
import type { PartitionMoments } from './moments.js';

/**
 * Formula: with m = M/(1000·N_A) kg and the standard pressure p°,
 *   lnQ = ln[(2π m k T/h²)^{3/2} · kT/p°]     (q/N per molecule at p°, T)
 *   S/R = lnQ + 5/2,  (H − H0)/RT = 5/2,  Cp/R = 5/2
 * The 5/2 is 3/2 (kinetic energy) + 1 (pV = RT); the +1 in S from ln N! is absorbed by meanU = 5/2.
 * Units: molar mass g/mol, T K, pressure Pa. Valid for an ideal gas at any T where quantum degeneracy is
 * negligible (all conditions of thermochemical tables).
 * Source: Sackur (1911), Tetrode (1912); McQuarrie, Statistical Mechanics (1976), eq. 5-20.
 */
export function translationalMoments(molarMassGPerMol: number, T: number, pressurePa: number): PartitionMoments {
  const m = molarMassGPerMol / 1000 / AVOGADRO;
  const kT = BOLTZMANN * T;
  const lnQ = 1.5 * Math.log((2 * Math.PI * m * kT) / (PLANCK * PLANCK)) + Math.log(kT / pressurePa);
  return { lnQ, meanU: 2.5, varU: 2.5 };
}

/** Grid form of `translationalMoments` (the same expression at every T, so the same bits). */
export function addTranslationalGrid(molarMassGPerMol: number, pressurePa: number, grid: TemperatureGrid, into: GridMoments): void {
  const m = molarMassGPerMol / 1000 / AVOGADRO;
  for (let j = 0; j < grid.T.length; j++) {
    const kT = BOLTZMANN * grid.T[j]!;
    into.lnQ[j]! += 1.5 * Math.log((2 * Math.PI * m * kT) / (PLANCK * PLANCK)) + Math.log(kT / pressurePa);
    into.meanU[j]! += 2.5;
    into.varU[j]! += 2.5;
  }
}
