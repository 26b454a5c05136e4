/**
 * Size-scaled error limits of a fit. At each temperature the limit of quantity q is
 *   L_q(T) = max(absolute_q, perCp_q · Cp/R(T))
 * with Cp/R the computed (not the fitted) value. Defaults (project choices, reasoned in README "Fit
 * limits"): Cp/R within max(0.1, 0.015 Cp/R); H/RT and S/R within max(0.02, 0.003 Cp/R).
 * Why scale with Cp/R: the seven-term form's error floor grows with the number of modes (about 1 % of
 * Cp/R for least squares on large molecules), so a fixed 0.1 cannot be met once Cp/R reaches 20–60. An
 * error of 0.003 Cp/R in H/RT or S/R is what a 0.3 % shift in temperature would cause (dH/RT ≈ Cp/R · dT/T
 * and dS/R = Cp/R · dT/T), i.e. no larger than the uncertainty of a measured temperature; 0.015 Cp/R in
 * Cp/R keeps the same ratio to the H, S limits as the absolute parts (0.1 : 0.02). Below Cp/R ≈ 6.7 the
 * absolute parts apply unchanged.
 */
import type { FitSample } from './types.js';

export type LimitQuantity = 'cp' | 'h' | 's';

export interface QuantityLimit {
  /** Dimensionless floor of the limit. */
  absolute: number;
  /** Multiplier of the computed Cp/R at the same temperature. */
  perCp: number;
}

export type FitLimits = Record<LimitQuantity, QuantityLimit>;

export const DEFAULT_FIT_LIMITS: Readonly<FitLimits> = Object.freeze({
  cp: Object.freeze({ absolute: 0.1, perCp: 0.015 }),
  h: Object.freeze({ absolute: 0.02, perCp: 0.003 }),
  s: Object.freeze({ absolute: 0.02, perCp: 0.003 }),
});

/** L_q at a computed Cp/R. */
export function limitAt(limit: QuantityLimit, cpR: number): number {
  return Math.max(limit.absolute, limit.perCp * cpR);
}

/** Which part set the limit at this Cp/R ('absolute' on ties). */
export function limitPart(limit: QuantityLimit, cpR: number): 'absolute' | 'perCp' {
  return limit.perCp * cpR > limit.absolute ? 'perCp' : 'absolute';
}

/** The limits of every sample, in sample order: cp, h, s interleaved (3 per sample). */
export function sampleLimits(samples: readonly FitSample[], limits: FitLimits): Float64Array {
  const out = new Float64Array(samples.length * 3);
  samples.forEach((s, i) => {
    out[3 * i] = limitAt(limits.cp, s.cpR);
    out[3 * i + 1] = limitAt(limits.h, s.cpR);
    out[3 * i + 2] = limitAt(limits.s, s.cpR);
  });
  return out;
}
