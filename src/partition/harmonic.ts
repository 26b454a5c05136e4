/**
 * Harmonic-oscillator vibrational partition function, energies from the zero-point level.
 */
import { C2_CM_K } from '../constants.js';
import type { Vibration } from '../model.js';
import type { PartitionMoments } from './moments.js';

/**
 * Formula: per mode with x = θ/T, θ = c2·ν̃ and degeneracy d:
 *   lnQ = −d·ln(1 − e^{−x}),  meanU = d·x/(e^{x} − 1),  varU = d·x² e^{x}/(e^{x} − 1)²
 * written with expm1/log1p of e^{−x} so no term overflows at large x or loses digits at small x.
 * Units: ν̃ in cm⁻¹, T in K. Valid for small-amplitude vibrations (anharmonicity neglected).
 * Source: McQuarrie, Statistical Mechanics (1976), eqs. 6-22 to 6-25 and 8-17.
 */
export function harmonicMoments(vibrations: readonly Vibration[], T: number): PartitionMoments {
  let lnQ = 0;
  let meanU = 0;
  let varU = 0;
  for (const { wavenumber, degeneracy } of vibrations) {
    const x = (C2_CM_K * wavenumber) / T;
    const e = Math.exp(-x);
    const oneMinusE = -Math.expm1(-x);
    lnQ -= degeneracy * Math.log1p(-e);
    meanU += (degeneracy * x * e) / oneMinusE;
    varU += (degeneracy * x * x * e) / (oneMinusE * oneMinusE);
  }
  return { lnQ, meanU, varU };
}
