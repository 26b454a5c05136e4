/**
 * Quality metrics of a fit against its own samples: per range the max and RMS absolute error of Cp/R,
 * H/RT and S/R with the temperature of each maximum; continuity residuals at tMid; anchor residuals.
 * All dimensionless (the derivative residuals in 1/K and 1/K²).
 */
import { cpDerivative, cpSecondDerivative, evaluateRange } from './evaluate.js';
import type { Coefficients7, FitMetrics, FitSample, Nasa7Polynomial, RangeMetrics } from './types.js';

export function rangeMetrics(coeffs: Readonly<Coefficients7>, samples: readonly FitSample[]): RangeMetrics {
  const maxAbs = { cp: 0, h: 0, s: 0 };
  const sumSq = { cp: 0, h: 0, s: 0 };
  const tAtMax = { cp: NaN, h: NaN, s: NaN };
  for (const s of samples) {
    const v = evaluateRange(coeffs, s.T);
    const err = { cp: Math.abs(v.cpR - s.cpR), h: Math.abs(v.hRT - s.hRT), s: Math.abs(v.sR - s.sR) };
    for (const q of ['cp', 'h', 's'] as const) {
      sumSq[q] += err[q] * err[q];
      if (Number.isNaN(tAtMax[q]) || err[q] > maxAbs[q]) {
        maxAbs[q] = err[q];
        tAtMax[q] = s.T;
      }
    }
  }
  const n = samples.length;
  const rms = n ? { cp: Math.sqrt(sumSq.cp / n), h: Math.sqrt(sumSq.h / n), s: Math.sqrt(sumSq.s / n) } : { cp: 0, h: 0, s: 0 };
  return { points: n, maxAbs, rms, tAtMax };
}

/** |low − high| at tMid of Cp/R, d(Cp/R)/dT, d²(Cp/R)/dT², H/RT, S/R. */
export function continuityResiduals(poly: Nasa7Polynomial): FitMetrics['continuity'] {
  const t = poly.tMid;
  const lo = evaluateRange(poly.low, t);
  const hi = evaluateRange(poly.high, t);
  return {
    cp: Math.abs(lo.cpR - hi.cpR),
    dcp: Math.abs(cpDerivative(poly.low, t) - cpDerivative(poly.high, t)),
    d2cp: Math.abs(cpSecondDerivative(poly.low, t) - cpSecondDerivative(poly.high, t)),
    h: Math.abs(lo.hRT - hi.hRT),
    s: Math.abs(lo.sR - hi.sR),
  };
}

export function computeMetrics(
  poly: Nasa7Polynomial,
  ranges: { low: readonly FitSample[]; high: readonly FitSample[] },
  anchor: FitSample,
): FitMetrics {
  const a = evaluateRange(poly.low, anchor.T);
  return {
    low: rangeMetrics(poly.low, ranges.low),
    high: rangeMetrics(poly.high, ranges.high),
    continuity: continuityResiduals(poly),
    anchor: { h: Math.abs(a.hRT - anchor.hRT), s: Math.abs(a.sR - anchor.sR) },
  };
}
