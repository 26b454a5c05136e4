/**
 * Physical constants, CODATA 2018 recommended values (Tiesinga et al., Rev. Mod. Phys. 93, 025010 (2021);
 * NIST SP 961 (2019)). The four defining constants of the 2019 SI are exact; everything else the project
 * needs is derived here from them so that there is exactly one place where a number is typed in.
 *
 * Each value is pinned by `test/src/constants.test.ts` and cross-checked against mathjs (which ships
 * CODATA 2018).
 */

/** Edition label written into every database so a reader knows which constants produced it. */
export const CONSTANTS_EDITION = 'CODATA 2018';

/** Planck constant h, J s (exact). */
export const PLANCK = 6.62607015e-34;
/** Boltzmann constant k, J/K (exact). */
export const BOLTZMANN = 1.380649e-23;
/** Speed of light in vacuum c, m/s (exact). */
export const SPEED_OF_LIGHT = 299792458;
/** Avogadro constant N_A, 1/mol (exact). */
export const AVOGADRO = 6.02214076e23;
/** Elementary charge e, C (exact). */
export const ELEMENTARY_CHARGE = 1.602176634e-19;
/** Atomic mass constant m_u = 1 u, kg (CODATA 2018, measured: 1.66053906660(50)e-27). */
export const ATOMIC_MASS_CONSTANT = 1.6605390666e-27;
/** Electron mass in u (CODATA 2018: 5.48579909065(16)e-4). */
export const ELECTRON_MASS_U = 5.48579909065e-4;

/** Molar gas constant R = N_A k, J/(mol K). Exact in the 2019 SI: 8.314462618... */
export const GAS_CONSTANT = AVOGADRO * BOLTZMANN;

/**
 * Second radiation constant c2 = hc/k expressed in cm K (1.438776877... cm K), the factor that turns a
 * term value in cm⁻¹ into a temperature: θ = c2·E.
 */
export const C2_CM_K = (PLANCK * SPEED_OF_LIGHT * 100) / BOLTZMANN;

/** Standard-state pressure, Pa: 1 bar (IUPAC since 1982; used by NIST-JANAF 4th ed.). */
export const STANDARD_PRESSURE_BAR = 1e5;
/** The older 1 standard atmosphere, Pa (exact by definition), offered as an option. */
export const STANDARD_PRESSURE_ATM = 101325;

/** Reference temperature of formation enthalpies and of the H − H298 scale, K. */
export const T_REF = 298.15;
