/**
 * Types of the two-range seven-coefficient NASA polynomial (McBride, Gordon & Reno 1993, NASA TM-4513):
 *   Cp/R = a1 + a2 T + a3 T² + a4 T³ + a5 T⁴
 *   H/RT = a1 + a2 T/2 + a3 T²/3 + a4 T³/4 + a5 T⁴/5 + a6/T
 *   S/R  = a1 ln T + a2 T + a3 T²/2 + a4 T³/3 + a5 T⁴/4 + a7
 * with one set for [tLow, tMid] and one for [tMid, tHigh]. H is the absolute standard enthalpy
 * (ΔfH°(298.15) + H°(T) − H°(298.15)), so a6 carries the formation enthalpy.
 */

import type { FitLimits } from './limits.js';

export type Coefficients7 = [number, number, number, number, number, number, number];

export interface Nasa7Polynomial {
  tLow: number;
  tMid: number;
  tHigh: number;
  /** Coefficients for [tLow, tMid]. */
  low: Coefficients7;
  /** Coefficients for [tMid, tHigh]. */
  high: Coefficients7;
}

/** One computed point to be fitted: dimensionless Cp/R, absolute H/RT and S/R at T (K). */
export interface FitSample {
  T: number;
  cpR: number;
  hRT: number;
  sR: number;
}

export interface FitWeights {
  cp: number;
  h: number;
  s: number;
}

/** Options of the fit, normalised once (see `normaliseFitOptions`). */
export interface FitOptions {
  tLow: number;
  tMid: number;
  tHigh: number;
  /** Relative weights of the Cp/R, H/RT and S/R residuals. */
  weights: FitWeights;
  /**
   * Highest derivative order of Cp continuous at tMid: 1 → Cp and dCp/dT (plus H and S, always);
   * 2 → also d²Cp/dT².
   */
  continuityOrder: 1 | 2;
  /** Temperature at which H and S are reproduced exactly (298.15 K). */
  anchorT: number;
  /** When set, tMid is chosen in [min, max] on this step (see mid-optimise.ts). */
  optimiseMid?: { min: number; max: number; step: number };
  /**
   * 'least-squares': minimise Σ w_q r_q² (weights above); 'minimax': minimise the largest error relative
   * to `limits` (minimax.ts), started from and never worse than least squares.
   */
  method: FitMethod;
  /** Size-scaled limits the minimax fit and the midpoint search measure against (limits.ts). */
  limits: FitLimits;
}

export type FitMethod = 'least-squares' | 'minimax';

export interface QuantityErrors {
  cp: number;
  h: number;
  s: number;
}

/** Errors of one range against the fitted samples, dimensionless (Cp/R, H/RT, S/R). */
export interface RangeMetrics {
  points: number;
  maxAbs: QuantityErrors;
  rms: QuantityErrors;
  /** Temperature (K) at which each maximum occurs. */
  tAtMax: QuantityErrors;
}

export interface FitMetrics {
  low: RangeMetrics;
  high: RangeMetrics;
  /** |low − high| at tMid of Cp/R, d(Cp/R)/dT, d²(Cp/R)/dT², H/RT, S/R (before any rounding). */
  continuity: { cp: number; dcp: number; d2cp: number; h: number; s: number };
  /** |fit − data| of H/RT and S/R at the anchor temperature. */
  anchor: { h: number; s: number };
}

/** How the solve went (added by the fit; optional so hand-made results stay valid). */
export interface FitSolverInfo {
  /** 2-norm condition number of the reduced, column-equilibrated least-squares problem. */
  conditionNumber: number;
  /** ‖A x − y‖₂ of the weighted problem (dimensionless). */
  residualNorm: number;
  /** Number of tMid candidates fitted (1 unless optimiseMid was set). */
  midCandidates: number;
  /** Largest error relative to the limits (limit-ratio.ts), when the method or midpoint search used it. */
  worstLimitRatio?: number;
}

export interface FitResult {
  polynomial: Nasa7Polynomial;
  metrics: FitMetrics;
  solver?: FitSolverInfo;
}

/** A record of the 80-column file: everything the layout carries. */
export interface Nasa7Record {
  name: string;
  /** Date/identifier field, columns 19–24 (up to 6 characters). */
  identifier: string;
  /** Element symbol → count, in the order written (electron as 'E', negative for cations). */
  elements: Array<[string, number]>;
  /** 'G' for gas. */
  phase: string;
  polynomial: Nasa7Polynomial;
  /** Optional comment text after the name on line 1 is not part of the layout; kept empty. */
}
