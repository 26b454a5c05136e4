/**
 * Entry point of the two-range NASA-7 fit: one equality-constrained weighted least-squares problem for
 * all 14 coefficients over Cp/R, H/RT and S/R samples together (method: solve.ts; scaling: scaling.ts;
 * enthalpy target: design.ts), with H and S exact at the anchor temperature and Cp, dCp/dT, H, S
 * (optionally d²Cp/dT²) continuous at tMid.
 */
import { FitError } from './errors.js';
import { optimiseMid } from './mid-optimise.js';
import { normaliseFitOptions, type PartialFitOptions } from './options.js';
import type { FitOptions, FitResult, FitSample } from './types.js';

/**
 * Fits the samples. `anchor` is the computed point at options.anchorT (298.15 K by default), whose
 * H/RT and S/R the fit reproduces exactly. Samples must lie in [tLow, tHigh]. Throws FitError.
 */
export function fitNasa7(samples: readonly FitSample[], anchor: FitSample, options: FitOptions | PartialFitOptions = {}): FitResult {
  const opts = normaliseFitOptions(options);
  if (!Array.isArray(samples) || samples.length === 0) throw new FitError('no samples given; expected computed points over the fit range');
  return optimiseMid(samples, anchor, opts);
}
