/**
 * Evaluation of the seven-coefficient NASA polynomial (McBride, Gordon & Reno 1993, NASA TM-4513, eqs. 2–4):
 *   Cp/R = a1 + a2 T + a3 T² + a4 T³ + a5 T⁴
 *   H/RT = a1 + a2 T/2 + a3 T²/3 + a4 T³/4 + a5 T⁴/5 + a6/T
 *   S/R  = a1 ln T + a2 T + a3 T²/2 + a4 T³/3 + a5 T⁴/4 + a7
 * T in K, results dimensionless. Valid only inside the fitted range [tLow, tHigh]; outside it the
 * polynomial is an extrapolation with no physical guarantee.
 */
import type { Coefficients7, Nasa7Polynomial } from './types.js';

export interface Nasa7Values {
  cpR: number;
  hRT: number;
  sR: number;
}

/** Cp/R, H/RT, S/R of one coefficient set at T (K), Horner form. */
export function evaluateRange(c: Readonly<Coefficients7>, T: number): Nasa7Values {
  // Indexed reads, not array destructuring: destructuring goes through the array iterator, whose result
  // objects unoptimised code allocates on every call.
  const a1 = c[0], a2 = c[1], a3 = c[2], a4 = c[3], a5 = c[4], a6 = c[5], a7 = c[6]; // prettier-ignore
  const cpR = a1 + T * (a2 + T * (a3 + T * (a4 + T * a5)));
  const hRT = a1 + T * (a2 / 2 + T * (a3 / 3 + T * (a4 / 4 + T * (a5 / 5)))) + a6 / T;
  const sR = a1 * Math.log(T) + T * (a2 + T * (a3 / 2 + T * (a4 / 3 + T * (a5 / 4)))) + a7;
  return { cpR, hRT, sR };
}

/** d(Cp/R)/dT = a2 + 2 a3 T + 3 a4 T² + 4 a5 T³, in 1/K. */
export function cpDerivative(c: Readonly<Coefficients7>, T: number): number {
  return c[1] + T * (2 * c[2] + T * (3 * c[3] + T * 4 * c[4]));
}

/** d²(Cp/R)/dT² = 2 a3 + 6 a4 T + 12 a5 T², in 1/K². */
export function cpSecondDerivative(c: Readonly<Coefficients7>, T: number): number {
  return 2 * c[2] + T * (6 * c[3] + T * 12 * c[4]);
}

/** The coefficient set that applies at T: the low set for T ≤ tMid, the high set above. */
export function rangeAt(poly: Nasa7Polynomial, T: number): Coefficients7 {
  return T <= poly.tMid ? poly.low : poly.high;
}

/**
 * Cp/R, H/RT, S/R of the two-range polynomial at T (K): low set for T ≤ tMid, high set above. Does not
 * refuse T outside [tLow, tHigh] (the quality checks probe 100 K beyond each end); callers that need the
 * valid range must check it.
 */
export function evaluateNasa7(poly: Nasa7Polynomial, T: number): Nasa7Values {
  return evaluateRange(rangeAt(poly, T), T);
}
