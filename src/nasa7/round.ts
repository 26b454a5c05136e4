/**
 * Rounding of a fitted polynomial to what the 80-column record holds (E15.8: 9 significant digits),
 * keeping the fit's exact conditions as well as 9 digits allow. Rounding every coefficient independently
 * (what writing does) moves Cp, H, S at tMid by up to ≈ 5e-9 × the largest term (a1 ln T ≈ 25 in S/R), so
 * the two sets can disagree by ~1e-7 after a round trip. Here the free coefficients are rounded first and
 * the dependent ones re-derived from the rounded values before being rounded in turn:
 *   low a1..a5 → low a6, a7 (reproduce H/RT, S/R at anchorT of the unrounded fit)
 *   high a3..a5 → high a2 (dCp/dT continuous) → high a1 (Cp continuous) → high a6, a7 (H, S continuous).
 * What remains is one rounding of a1, a2, a6, a7 each: ≈ 1e-8 in Cp/R, H/RT, S/R and T·dCp/dT at tMid.
 * (d²Cp/dT² is not re-derived: a fit made with continuityOrder 1 does not have it continuous.)
 * Use on a fit's polynomial before writing it; not on records read from other files (it would alter them).
 */
import { T_REF } from '../constants.js';
import { cpDerivative, evaluateRange } from './evaluate.js';
import { formatE15 } from './format.js';
import type { Coefficients7, Nasa7Polynomial } from './types.js';

/** The value an E15.8 field of x reads back as. */
export function roundToE15(x: number): number {
  return Number(formatE15(x));
}

function pinConstants(c: Coefficients7, T: number, hRT: number, sR: number): Coefficients7 {
  const v = evaluateRange([c[0], c[1], c[2], c[3], c[4], 0, 0], T);
  return [c[0], c[1], c[2], c[3], c[4], roundToE15((hRT - v.hRT) * T), roundToE15(sR - v.sR)];
}

export function roundForRecord(poly: Nasa7Polynomial, anchorT: number = T_REF): Nasa7Polynomial {
  const target = evaluateRange(poly.low, anchorT);
  const lowFree = poly.low.map(roundToE15) as Coefficients7;
  const low = pinConstants(lowFree, anchorT, target.hRT, target.sR);
  const t = poly.tMid;
  const atMid = evaluateRange(low, t);
  const h = poly.high.map(roundToE15) as Coefficients7;
  const a2 = roundToE15(cpDerivative(low, t) - t * (2 * h[2] + t * (3 * h[3] + t * 4 * h[4])));
  const a1 = roundToE15(atMid.cpR - t * (a2 + t * (h[2] + t * (h[3] + t * h[4]))));
  const high = pinConstants([a1, a2, h[2], h[3], h[4], 0, 0], t, atMid.hRT, atMid.sR);
  return { ...poly, low, high };
}
