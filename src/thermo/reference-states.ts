/**
 * Enthalpy increments H°(298.15 K) − H°(0) of the elements in their reference states, used to move an
 * enthalpy of formation given at 0 K to 298.15 K.
 *
 * Source: CODATA Key Values for Thermodynamics (J. D. Cox, D. D. Wagman, V. A. Medvedev, Hemisphere, 1989),
 * column "H°(298.15 K) − H°(0)", in kJ/mol of the reference substance. These values are FROM MEMORY and
 * must be checked against the printed table before a database built from 0 K formation enthalpies of
 * those elements is released; H2, O2, N2, C(graphite) and Ar are also confirmed by NIST-JANAF 4th ed.
 * (H2 8.467, O2 8.683, N2 8.670, Ar 6.197 kJ/mol, C(graphite) 1.051 kJ/mol).
 */
import { GAS_CONSTANT, T_REF } from '../constants.js';

export interface ElementReferenceState {
  /** The reference substance and phase. */
  substance: string;
  /** H°(298.15) − H°(0) per mole of the reference substance, kJ/mol. */
  incrementKJPerMol: number;
  /** Atoms of the element per formula unit of the reference substance (2 for H2, 1 for C(graphite)). */
  atomsPerFormula: number;
}

/** CODATA key values (Cox, Wagman & Medvedev 1989), from memory — see the file comment. */
export const ELEMENT_REFERENCE_STATES: Readonly<Record<string, ElementReferenceState>> = Object.freeze({
  H: { substance: 'H2(g)', incrementKJPerMol: 8.468, atomsPerFormula: 2 },
  D: { substance: 'D2(g)', incrementKJPerMol: 8.569, atomsPerFormula: 2 },
  He: { substance: 'He(g)', incrementKJPerMol: 6.197, atomsPerFormula: 1 },
  Ne: { substance: 'Ne(g)', incrementKJPerMol: 6.197, atomsPerFormula: 1 },
  Ar: { substance: 'Ar(g)', incrementKJPerMol: 6.197, atomsPerFormula: 1 },
  Kr: { substance: 'Kr(g)', incrementKJPerMol: 6.197, atomsPerFormula: 1 },
  Xe: { substance: 'Xe(g)', incrementKJPerMol: 6.197, atomsPerFormula: 1 },
  O: { substance: 'O2(g)', incrementKJPerMol: 8.683, atomsPerFormula: 2 },
  N: { substance: 'N2(g)', incrementKJPerMol: 8.67, atomsPerFormula: 2 },
  F: { substance: 'F2(g)', incrementKJPerMol: 8.825, atomsPerFormula: 2 },
  Cl: { substance: 'Cl2(g)', incrementKJPerMol: 9.181, atomsPerFormula: 2 },
  Br: { substance: 'Br2(l)', incrementKJPerMol: 24.513, atomsPerFormula: 2 },
  I: { substance: 'I2(cr)', incrementKJPerMol: 13.196, atomsPerFormula: 2 },
  C: { substance: 'C(cr, graphite)', incrementKJPerMol: 1.05, atomsPerFormula: 1 },
  S: { substance: 'S(cr, rhombic)', incrementKJPerMol: 4.412, atomsPerFormula: 1 },
  P: { substance: 'P(cr, white)', incrementKJPerMol: 5.36, atomsPerFormula: 1 },
  Si: { substance: 'Si(cr)', incrementKJPerMol: 3.217, atomsPerFormula: 1 },
  B: { substance: 'B(cr, rhombohedral)', incrementKJPerMol: 1.222, atomsPerFormula: 1 },
  Al: { substance: 'Al(cr)', incrementKJPerMol: 4.54, atomsPerFormula: 1 },
  Mg: { substance: 'Mg(cr)', incrementKJPerMol: 4.998, atomsPerFormula: 1 },
  Na: { substance: 'Na(cr)', incrementKJPerMol: 6.447, atomsPerFormula: 1 },
  K: { substance: 'K(cr)', incrementKJPerMol: 7.088, atomsPerFormula: 1 },
  Li: { substance: 'Li(cr)', incrementKJPerMol: 4.632, atomsPerFormula: 1 },
  Ca: { substance: 'Ca(cr)', incrementKJPerMol: 5.736, atomsPerFormula: 1 },
  Be: { substance: 'Be(cr)', incrementKJPerMol: 1.95, atomsPerFormula: 1 },
  Ge: { substance: 'Ge(cr)', incrementKJPerMol: 4.636, atomsPerFormula: 1 },
  Sn: { substance: 'Sn(cr, white)', incrementKJPerMol: 6.323, atomsPerFormula: 1 },
  Pb: { substance: 'Pb(cr)', incrementKJPerMol: 6.87, atomsPerFormula: 1 },
  Zn: { substance: 'Zn(cr)', incrementKJPerMol: 5.657, atomsPerFormula: 1 },
  Cd: { substance: 'Cd(cr)', incrementKJPerMol: 6.247, atomsPerFormula: 1 },
  Hg: { substance: 'Hg(l)', incrementKJPerMol: 9.342, atomsPerFormula: 1 },
  Cu: { substance: 'Cu(cr)', incrementKJPerMol: 5.004, atomsPerFormula: 1 },
  Ag: { substance: 'Ag(cr)', incrementKJPerMol: 5.745, atomsPerFormula: 1 },
  Ti: { substance: 'Ti(cr)', incrementKJPerMol: 4.824, atomsPerFormula: 1 },
  Rb: { substance: 'Rb(cr)', incrementKJPerMol: 7.489, atomsPerFormula: 1 },
  Cs: { substance: 'Cs(cr)', incrementKJPerMol: 7.717, atomsPerFormula: 1 },
});

/**
 * The electron under the thermal electron convention (the convention of NIST-JANAF 4th ed.): e⁻ is an
 * ideal monatomic gas with ΔfH°(e⁻) = 0 at every T, so H°(298.15) − H°(0) = (5/2)·R·298.15 = 6.197 kJ/mol.
 * Under the other (stationary electron / "ion") convention this increment would be 0; ΔfH°(298.15) of a
 * cation then differs by 6.197 kJ/mol per unit charge.
 */
export const ELECTRON_INCREMENT_J_PER_MOL = 2.5 * GAS_CONSTANT * T_REF;
export const ELECTRON_CONVENTION = 'thermal electron (e- ideal gas, DfH = 0 at all T, H298-H0 = 5/2 R 298.15)';

export class MissingReferenceStateError extends Error {
  constructor(readonly element: string) {
    super(
      `no reference-state enthalpy increment H298-H0 for element '${element}'; give the enthalpy of formation at 298.15 K instead of 0 K`,
    );
    this.name = 'MissingReferenceStateError';
  }
}

/** H°(298.15) − H°(0) of one mole of atoms of `element` in its reference state, J/mol. */
export function elementIncrementPerAtom(element: string): number {
  // The free electron (composition {E: 1}, charge −1) is counted by the charge term of formationEnthalpyAt298.
  if (element === 'E') return 0;
  const ref = ELEMENT_REFERENCE_STATES[element];
  if (!ref) throw new MissingReferenceStateError(element);
  return (ref.incrementKJPerMol * 1000) / ref.atomsPerFormula;
}

/**
 * ΔfH°(298.15) from ΔfH°(0).
 *
 * Formula: ΔfH(298) = ΔfH(0) + [H298 − H0](species) − Σ n_i [H298 − H0](element i, reference state)
 *          − n_e [H298 − H0](e⁻), with n_e = −charge (a cation's formula holds −z electrons).
 * Units: J/mol. Source: the definition of ΔfH and Kirchhoff's law; increments from CODATA (see above).
 */
export function formationEnthalpyAt298(
  formationAt0: number,
  speciesIncrement: number,
  composition: Readonly<Record<string, number>>,
  charge: number,
): number {
  let elements = 0;
  for (const [symbol, n] of Object.entries(composition)) elements += n * elementIncrementPerAtom(symbol);
  const electrons = -charge * ELECTRON_INCREMENT_J_PER_MOL;
  return formationAt0 + speciesIncrement - elements - electrons;
}
