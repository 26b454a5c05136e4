/**
 * Closed-form derivatives of one harmonic oscillator's contribution with respect to its wavenumber ν̃.
 *
 * Formula (x = c2 ν̃ / T, energies from the zero-point level; g the degeneracy):
 *   Cp/R = g x² eˣ/(eˣ−1)²          d(Cp/R)/dν̃ = g (c2/T) · x eˣ/(eˣ−1)² · [2 + x − 2x eˣ/(eˣ−1)]
 *   S/R  = g [x/(eˣ−1) − ln(1−e⁻ˣ)]  d(S/R)/dν̃  = −g (c2/T) · x eˣ/(eˣ−1)²
 *   (H−H0)/R = g c2 ν̃/(eˣ−1)        d[(H−H0)/R]/dν̃ = g c2 · [1/(eˣ−1) − x eˣ/(eˣ−1)²]
 * Units: ν̃ in cm⁻¹, T in K, c2 in cm K; results per cm⁻¹ (the last in K per cm⁻¹).
 * Valid for any T > 0 and ν̃ > 0 (the harmonic model itself is the approximation).
 * Source: the Einstein/Planck oscillator functions, e.g. McQuarrie, Statistical Mechanics (1976), ch. 8;
 * differentiated by hand (our derivation) and checked against central differences in the tests.
 */
import { C2_CM_K } from '../constants.js';

export interface HarmonicDerivatives {
  /** d(Cp/R)/dν̃, 1/cm⁻¹ */
  cp: number;
  /** d(S/R)/dν̃, 1/cm⁻¹ */
  s: number;
  /** d[(H−H0)/R]/dν̃, K/cm⁻¹ */
  hmh0: number;
}

export function harmonicWavenumberDerivatives(wavenumber: number, degeneracy: number, T: number): HarmonicDerivatives {
  const x = (C2_CM_K * wavenumber) / T;
  if (x > 700) return { cp: 0, s: 0, hmh0: 0 };
  const em1 = Math.expm1(x);
  // x eˣ/(eˣ−1)² written with e⁻ˣ so that large x does not overflow.
  const core = x / (em1 * (1 - Math.exp(-x)));
  const ratio = x / (1 - Math.exp(-x)); // x eˣ/(eˣ−1)
  return {
    cp: degeneracy * (C2_CM_K / T) * core * (2 + x - 2 * ratio),
    s: -degeneracy * (C2_CM_K / T) * core,
    hmh0: degeneracy * C2_CM_K * (1 / em1 - core),
  };
}
