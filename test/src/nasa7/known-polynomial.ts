/**
 * A 14-coefficient set that satisfies every constraint of the fit exactly (by construction), for
 * recovery tests. The low set was written by hand for this test (magnitudes like a diatomic's, taken from no
 * data file); the high set's a3..a5 (or a4, a5 for second-order continuity) were written by hand too, and the rest follow from the continuity conditions at
 * tMid, solved here in closed form:
 *   Cp:  h1 + h2 t + h3 t² + h4 t³ + h5 t⁴ = cpLow(t)
 *   Cp': h2 + 2 h3 t + 3 h4 t² + 4 h5 t³ = cp'Low(t)
 *   Cp'': 2 h3 + 6 h4 t + 12 h5 t² = cp''Low(t)           (order 2 only)
 *   a6, a7 from H and S continuity.
 * Data generated from it can be fitted with zero residual, so a fit must return it to rounding error.
 */
import { cpDerivative, cpSecondDerivative, evaluateNasa7, evaluateRange } from '../../../src/nasa7/evaluate.js';
import type { Coefficients7, FitSample, Nasa7Polynomial } from '../../../src/nasa7/types.js';

export const HAND_WRITTEN_LOW: Coefficients7 = [3.53125, -2.5e-4, 7.5e-7, -1.25e-10, -2.5e-13, -1043.75, 3.375];

export function knownPolynomial(order: 1 | 2, tLow = 200, tMid = 1000, tHigh = 6000): Nasa7Polynomial {
  const t = tMid;
  const low = HAND_WRITTEN_LOW;
  const cp = evaluateRange(low, t).cpR;
  const d1 = cpDerivative(low, t);
  const d2 = cpSecondDerivative(low, t);
  const h4 = 8.75e-11; // written by hand
  const h5 = -5.5e-15; // written by hand
  const h3 = order === 2 ? (d2 - 6 * h4 * t - 12 * h5 * t * t) / 2 : -3.25e-7; // written by hand for order 1
  const h2 = d1 - 2 * h3 * t - 3 * h4 * t * t - 4 * h5 * t ** 3;
  const h1 = cp - h2 * t - h3 * t * t - h4 * t ** 3 - h5 * t ** 4;
  const partial: Coefficients7 = [h1, h2, h3, h4, h5, 0, 0];
  const lo = evaluateRange(low, t);
  const pv = evaluateRange(partial, t);
  const high: Coefficients7 = [h1, h2, h3, h4, h5, (lo.hRT - pv.hRT) * t, lo.sR - pv.sR];
  return { tLow, tMid, tHigh, low: [...low], high };
}

export function samplesOf(poly: Nasa7Polynomial, temperatures: readonly number[]): FitSample[] {
  return temperatures.map((T) => ({ T, ...evaluateNasa7(poly, T) }));
}
