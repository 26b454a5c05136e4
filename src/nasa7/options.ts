/**
 * Normalisation of the fit options, done once. Defaults: 200 / 1000 / 6000 K (the project's default
 * ranges), equal weights, Cp and dCp/dT continuous, H and S anchored at 298.15 K (T_REF).
 */
import { T_REF } from '../constants.js';
import { FitError } from './errors.js';
import { DEFAULT_FIT_LIMITS, type FitLimits } from './limits.js';
import type { FitOptions, FitWeights } from './types.js';

export type PartialFitOptions = Partial<Omit<FitOptions, 'weights' | 'limits'>> & {
  weights?: Partial<FitWeights>;
  limits?: Partial<{ [q in keyof FitLimits]: Partial<FitLimits[q]> }>;
};

/**
 * Library defaults. The method is least squares here (the neutral choice for a caller of src/); the
 * database settings default to minimax with a midpoint search (pipeline/core/settings.ts).
 */
export const DEFAULT_FIT_OPTIONS: Readonly<Omit<FitOptions, 'optimiseMid'>> = Object.freeze({
  tLow: 200,
  tMid: 1000,
  tHigh: 6000,
  weights: Object.freeze({ cp: 1, h: 1, s: 1 }),
  continuityOrder: 1,
  anchorT: T_REF,
  method: 'least-squares',
  limits: DEFAULT_FIT_LIMITS,
});

/**
 * How far below tLow the anchor may lie, K. Kinetics files often start the low range at 300 K; H and S
 * are still anchored at 298.15 K on the low set, which then reaches the anchor by 1.85 K of
 * extrapolation (the computed Cp/R of any species changes by well under 1 % over 1.85 K near room
 * temperature, so the fitted set stays as close to the data there as at 300 K). 5 K admits such layouts
 * and no more (project choice).
 */
export const MAX_ANCHOR_EXTRAPOLATION = 5;

/** Most midpoint candidates `optimiseMid` may ask for (each costs one full fit). */
export const MAX_MID_CANDIDATES = 2000;

const isPositiveFinite = (x: unknown): x is number => typeof x === 'number' && Number.isFinite(x) && x > 0;

/**
 * Fills defaults and validates every field, reporting all problems in one FitError. Weights multiply the
 * squared residuals (w = 1/σ² convention); a zero weight drops that quantity from the objective.
 */
export function normaliseFitOptions(partial: PartialFitOptions | FitOptions = {}): FitOptions {
  const problems: string[] = [];
  const tLow = partial.tLow ?? DEFAULT_FIT_OPTIONS.tLow;
  const tMid = partial.tMid ?? DEFAULT_FIT_OPTIONS.tMid;
  const tHigh = partial.tHigh ?? DEFAULT_FIT_OPTIONS.tHigh;
  const anchorT = partial.anchorT ?? DEFAULT_FIT_OPTIONS.anchorT;
  const continuityOrder = partial.continuityOrder ?? DEFAULT_FIT_OPTIONS.continuityOrder;
  const weights: FitWeights = {
    cp: partial.weights?.cp ?? DEFAULT_FIT_OPTIONS.weights.cp,
    h: partial.weights?.h ?? DEFAULT_FIT_OPTIONS.weights.h,
    s: partial.weights?.s ?? DEFAULT_FIT_OPTIONS.weights.s,
  };

  for (const [field, v] of [['tLow', tLow], ['tMid', tMid], ['tHigh', tHigh], ['anchorT', anchorT]] as const) {
    if (!isPositiveFinite(v)) problems.push(`options.${field} = ${String(v)}: expected a positive finite temperature in K`);
  }
  if (isPositiveFinite(tLow) && isPositiveFinite(tMid) && isPositiveFinite(tHigh) && !(tLow < tMid && tMid < tHigh)) {
    problems.push(`temperature ranges ${tLow} / ${tMid} / ${tHigh} K: expected tLow < tMid < tHigh (tMid strictly inside)`);
  }
  if (isPositiveFinite(anchorT) && isPositiveFinite(tLow) && isPositiveFinite(tMid) && !(anchorT >= tLow - MAX_ANCHOR_EXTRAPOLATION && anchorT <= tMid)) {
    problems.push(
      `options.anchorT = ${anchorT} K lies outside the low range [${tLow}, ${tMid}] K: expected tLow − ${MAX_ANCHOR_EXTRAPOLATION} K ≤ anchorT ≤ tMid (the low set may reach the anchor by at most ${MAX_ANCHOR_EXTRAPOLATION} K of extrapolation)`,
    );
  }
  for (const q of ['cp', 'h', 's'] as const) {
    const w = weights[q];
    if (typeof w !== 'number' || !Number.isFinite(w) || w < 0) problems.push(`options.weights.${q} = ${String(w)}: expected a finite number ≥ 0`);
  }
  const method = partial.method ?? DEFAULT_FIT_OPTIONS.method;
  if (method !== 'least-squares' && method !== 'minimax') problems.push(`options.method = ${String(method)}: expected 'least-squares' or 'minimax'`);
  const limits = {} as FitLimits;
  for (const q of ['cp', 'h', 's'] as const) {
    const absolute = partial.limits?.[q]?.absolute ?? DEFAULT_FIT_OPTIONS.limits[q].absolute;
    const perCp = partial.limits?.[q]?.perCp ?? DEFAULT_FIT_OPTIONS.limits[q].perCp;
    if (!isPositiveFinite(absolute)) problems.push(`options.limits.${q}.absolute = ${String(absolute)}: expected a positive finite number`);
    if (typeof perCp !== 'number' || !Number.isFinite(perCp) || perCp < 0) problems.push(`options.limits.${q}.perCp = ${String(perCp)}: expected a finite number ≥ 0`);
    limits[q] = { absolute, perCp };
  }
  if (weights.cp + weights.h + weights.s <= 0) problems.push('options.weights: all three weights are zero; expected at least one > 0');
  if (continuityOrder !== 1 && continuityOrder !== 2) {
    problems.push(`options.continuityOrder = ${String(continuityOrder)}: expected 1 (Cp, dCp/dT) or 2 (also d²Cp/dT²)`);
  }

  let optimiseMid: FitOptions['optimiseMid'];
  if (partial.optimiseMid !== undefined) {
    const { min, max, step } = partial.optimiseMid;
    if (!isPositiveFinite(min) || !isPositiveFinite(max) || !isPositiveFinite(step) || !(min <= max)) {
      problems.push(`options.optimiseMid = {min: ${min}, max: ${max}, step: ${step}}: expected positive numbers with min ≤ max and step > 0`);
    } else {
      if (isPositiveFinite(tLow) && isPositiveFinite(tHigh) && !(min > tLow && max < tHigh)) {
        problems.push(`options.optimiseMid [${min}, ${max}] K: expected strictly inside (${tLow}, ${tHigh}) K`);
      }
      if (isPositiveFinite(anchorT) && min < anchorT) {
        problems.push(`options.optimiseMid.min = ${min} K is below anchorT = ${anchorT} K: the anchor must stay in the low range`);
      }
      if (Math.floor((max - min) / step) + 1 > MAX_MID_CANDIDATES) {
        problems.push(`options.optimiseMid: ${Math.floor((max - min) / step) + 1} candidates; expected at most ${MAX_MID_CANDIDATES} (increase step)`);
      }
      optimiseMid = { min, max, step };
    }
  }

  if (problems.length) throw new FitError(problems);
  const out: FitOptions = { tLow, tMid, tHigh, weights, continuityOrder, anchorT, method, limits };
  if (optimiseMid) out.optimiseMid = optimiseMid;
  return out;
}
