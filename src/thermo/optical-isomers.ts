/**
 * Optical isomers: a chiral molecule exists as n (usually 2) mirror-image forms of equal energy, which an
 * ideal-gas table counts as one species of n-fold degenerate configurations.
 */
import type { LinearSpecies, NonlinearSpecies } from '../model.js';
import type { PartitionMoments } from '../partition/moments.js';

/**
 * The constant factor n of the partition function (lnQ = ln n, no T dependence: S/R += ln n, Cp and H
 * unchanged), or undefined when the species has one form. Summary line appended to `contributions`.
 * Source: Pitzer, Quantum Chemistry (1953), app. 18; Gilson & Irikura, J. Phys. Chem. B 114, 16304 (2010)
 * (σ counts proper rotations only; enantiomers enter as a separate factor).
 */
export function opticalIsomerFactor(species: LinearSpecies | NonlinearSpecies, contributions: string[]): PartitionMoments | undefined {
  const n = species.opticalIsomers;
  if (n === undefined || n === 1) return undefined;
  contributions.push(`optical isomers: ${n} (S/R + ln ${n})`);
  return { lnQ: Math.log(n), meanU: 0, varU: 0 };
}
