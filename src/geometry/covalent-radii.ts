/**
 * Single-bond covalent radii, Å, for deciding which atoms of a geometry are bonded.
 *
 * Source: Cordero et al., "Covalent radii revisited", Dalton Trans. 2008, 2832 (Table 2; carbon sp3,
 * low-spin values for Mn, Fe, Co) — from memory. Two atoms are bonded when their distance is at most
 * BOND_TOLERANCE_FACTOR × (r1 + r2) (common practice).
 */
export const COVALENT_RADII_ANGSTROM: Readonly<Record<string, number>> = Object.freeze({
  H: 0.31, He: 0.28, Li: 1.28, Be: 0.96, B: 0.84, C: 0.76, N: 0.71, O: 0.66, F: 0.57, Ne: 0.58,
  Na: 1.66, Mg: 1.41, Al: 1.21, Si: 1.11, P: 1.07, S: 1.05, Cl: 1.02, Ar: 1.06,
  K: 2.03, Ca: 1.76, Sc: 1.7, Ti: 1.6, V: 1.53, Cr: 1.39, Mn: 1.39, Fe: 1.32, Co: 1.26, Ni: 1.24, Cu: 1.32, Zn: 1.22,
  Ga: 1.22, Ge: 1.2, As: 1.19, Se: 1.2, Br: 1.2, Kr: 1.16, Sn: 1.39, Sb: 1.39, Te: 1.38, I: 1.39, Xe: 1.4,
});

/** Distances up to this multiple of the sum of the covalent radii count as bonds (common practice). */
export const BOND_TOLERANCE_FACTOR = 1.25;

/** Covalent radius of a composition element (D, T as H), or undefined when the table has none. */
export function covalentRadius(element: string): number | undefined {
  return COVALENT_RADII_ANGSTROM[element === 'D' || element === 'T' ? 'H' : element];
}
