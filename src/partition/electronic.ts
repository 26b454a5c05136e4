/**
 * Electronic partition function of an atom or a polyatomic molecule: a sum over its electronic levels.
 */
import { C2_CM_K } from '../constants.js';
import type { ElectronicLevel } from '../model.js';
import { createLevelList, levelSumMoments, type LevelList } from './level-sum.js';
import type { PartitionMoments } from './moments.js';

/**
 * Level list for q_el = Σ g_i exp(−c2·E_i/T). Energies in cm⁻¹ (any origin: shifted to the lowest level,
 * which then defines H0), degeneracies g_i > 0. Build once per species, evaluate at many T.
 */
export function electronicLevelList(levels: readonly ElectronicLevel[]): LevelList {
  return createLevelList(
    levels.map((l) => l.energy),
    levels.map((l) => l.degeneracy),
    C2_CM_K,
  );
}

/**
 * Formula: q_el = Σ g_i e^{−c2 E_i/T}; moments as in level-sum.ts. Units: cm⁻¹, K.
 * Valid while the listed levels are the ones populated at T (levels above the listed set are ignored).
 * Source: McQuarrie, Statistical Mechanics (1976), §5-3.
 */
export function electronicMoments(levels: LevelList, T: number): PartitionMoments {
  return levelSumMoments(levels, T);
}
