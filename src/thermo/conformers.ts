/**
 * Several conformers of one species: the internal partition function is the Boltzmann-weighted sum of the
 * conformers' own internal partition functions.
 *
 * Method (the multi-structure sum over conformers, "MS-RRHO" when each conformer is rigid-rotor harmonic):
 *   Q_int(T) = Σ_k Q_k(T) · exp(−θ_k/T),  θ_k = c2·E_k,
 * with Q_k the internal partition function of conformer k (rotation with its own symmetry number and
 * constants, vibrations, torsions, electronic levels) measured from its own lowest level and E_k that level
 * above the lowest conformer's (zero-point levels included). With M_k = meanU_k + θ_k/T and
 * p_k = Q_k e^{−θ_k/T}/Q_int, the moments are exact:
 *   lnQ = ln Σ_k e^{lnQ_k − θ_k/T},  meanU = Σ p_k M_k,  varU = Σ p_k varU_k + Σ p_k (M_k − meanU)²
 * (the mixture of canonical ensembles; the second sum is the conformational heat capacity). One conformer
 * gives back its own Q exactly. Source: the conformer sum of statistical thermodynamics, e.g. K. S. Pitzer,
 * J. Chem. Phys. 14, 239 (1946) for n-butane's trans/gauche forms; the MS-RRHO name as in J. Zheng,
 * T. Yu, E. Papajak, I. M. Alecu, S. L. Mielke & D. G. Truhlar, Phys. Chem. Chem. Phys. 13, 10885 (2011)
 * (citations from memory).
 * Caveat (double counting): a hindered internal rotor sums over all wells of its torsion already; listing
 * the other wells of that same torsion as conformers counts them twice. Give conformers that differ in
 * coordinates no listed rotor spans (the validator warns when conformers carry rotors). Mirror-image
 * conformers are one conformer with optical isomers, not two entries.
 */
import { C2_CM_K } from '../constants.js';
import type { Conformer, PolyatomicMolecularPart } from '../model.js';
import type { PartitionMoments } from '../partition/moments.js';

/**
 * The moments function of the conformer sum. `internalOf` builds one conformer's internal moments function
 * (the evaluator's own polyatomic factorisation, so a conformer is modelled exactly like a plain species)
 * and appends its summary lines to the given list; they are prefixed with the conformer here.
 */
export function conformerSum(
  conformers: readonly Conformer[],
  internalOf: (part: PolyatomicMolecularPart, contributions: string[]) => (T: number) => PartitionMoments,
  contributions: string[],
): (T: number) => PartitionMoments {
  const parts = conformers.map((c) => {
    const lines: string[] = [];
    const moments = internalOf(c, lines);
    contributions.push(...lines.map((l) => `conformer '${c.label}' (E = ${c.energy} cm-1): ${l}`));
    return { theta: C2_CM_K * c.energy, moments };
  });
  contributions.push(`conformer sum: Boltzmann-weighted over ${conformers.length} conformer${conformers.length === 1 ? '' : 's'} (energies from the lowest conformer's zero-point level)`);
  const lnTerm = new Float64Array(parts.length);
  const total = new Float64Array(parts.length);
  return (T) => {
    let top = -Infinity;
    const each = parts.map((p, k) => {
      const m = p.moments(T);
      lnTerm[k] = m.lnQ - p.theta / T;
      total[k] = m.meanU + p.theta / T;
      if (lnTerm[k]! > top) top = lnTerm[k]!;
      return m;
    });
    let q = 0;
    for (let k = 0; k < parts.length; k++) q += Math.exp(lnTerm[k]! - top);
    let meanU = 0;
    for (let k = 0; k < parts.length; k++) meanU += (Math.exp(lnTerm[k]! - top) / q) * total[k]!;
    let varU = 0;
    for (let k = 0; k < parts.length; k++) {
      const d = total[k]! - meanU;
      varU += (Math.exp(lnTerm[k]! - top) / q) * (each[k]!.varU + d * d);
    }
    return { lnQ: top + Math.log(q), meanU, varU };
  };
}
