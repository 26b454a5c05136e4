/**
 * Column scaling of the fit. In T the basis columns 1, T, …, T⁴ span 15 decades over 200–6000 K, which
 * wrecks the conditioning of any least-squares solve. The fit therefore works in τ = T / T_SCALE with
 * coefficients b of τ:
 *   Cp/R = b1 + b2 τ + b3 τ² + b4 τ³ + b5 τ⁴
 *   H/RT = b1 + b2 τ/2 + b3 τ²/3 + b4 τ³/4 + b5 τ⁴/5 + b6/τ
 *   S/R  = b1 ln τ + b2 τ + b3 τ²/2 + b4 τ³/3 + b5 τ⁴/4 + b7
 * Substituting τ = T/T_SCALE gives the coefficients of T exactly:
 *   a1 = b1,  a_k = b_k / T_SCALE^(k−1) (k = 2..5),  a6 = b6 · T_SCALE,  a7 = b7 − b1 ln T_SCALE.
 * T_SCALE is a power of two, so the a2..a6 conversions are exact in binary floating point (only the
 * exponent changes); a7 picks up one rounding, which the fit removes afterwards by re-deriving a6 and a7
 * from the exact anchor and continuity conditions (see fit-fixed-mid.ts).
 */
import type { Coefficients7 } from './types.js';

/** 2¹⁰ K: close to the usual midpoint, so τ stays within ≈ [0.2, 6] for 200–6000 K. */
export const T_SCALE = 1024;

const LN_T_SCALE = Math.log(T_SCALE);

/** Row of basis values in τ for Cp/R (length 7; b6 and b7 do not enter). */
export function cpBasis(tau: number): number[] {
  return [1, tau, tau * tau, tau ** 3, tau ** 4, 0, 0];
}

/** Row of basis values in τ for H/RT. */
export function hBasis(tau: number): number[] {
  return [1, tau / 2, (tau * tau) / 3, tau ** 3 / 4, tau ** 4 / 5, 1 / tau, 0];
}

/** Row of basis values in τ for S/R. */
export function sBasis(tau: number): number[] {
  return [Math.log(tau), tau, (tau * tau) / 2, tau ** 3 / 3, tau ** 4 / 4, 0, 1];
}

/** Row for d(Cp/R)/dτ = b2 + 2 b3 τ + 3 b4 τ² + 4 b5 τ³ (the T-derivative is this / T_SCALE). */
export function dcpBasis(tau: number): number[] {
  return [0, 1, 2 * tau, 3 * tau * tau, 4 * tau ** 3, 0, 0];
}

/** Row for d²(Cp/R)/dτ² = 2 b3 + 6 b4 τ + 12 b5 τ². */
export function d2cpBasis(tau: number): number[] {
  return [0, 0, 2, 6 * tau, 12 * tau * tau, 0, 0];
}

/** Coefficients of τ → coefficients of T (exact for a1..a6, one rounding in a7). */
export function unscaleCoefficients(b: readonly number[]): Coefficients7 {
  const b1 = b[0]!, b2 = b[1]!, b3 = b[2]!, b4 = b[3]!, b5 = b[4]!, b6 = b[5]!, b7 = b[6]!; // prettier-ignore
  return [
    b1,
    b2 / T_SCALE,
    b3 / T_SCALE ** 2,
    b4 / T_SCALE ** 3,
    b5 / T_SCALE ** 4,
    b6 * T_SCALE,
    b7 - b1 * LN_T_SCALE,
  ];
}

/** Coefficients of T → coefficients of τ (inverse of `unscaleCoefficients`). */
export function scaleCoefficients(a: Readonly<Coefficients7>): number[] {
  return [a[0], a[1] * T_SCALE, a[2] * T_SCALE ** 2, a[3] * T_SCALE ** 3, a[4] * T_SCALE ** 4, a[5] / T_SCALE, a[6] + a[0] * LN_T_SCALE];
}
