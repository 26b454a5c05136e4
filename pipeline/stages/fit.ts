/**
 * Stage "fit": the two-range NASA 7-coefficient fit of one species' computed points (src/nasa7). Pure:
 * a function of the computed samples and the fit options only.
 */
import { fitNasa7 } from '../../src/nasa7/fit.js';
import { normaliseFitOptions, type PartialFitOptions } from '../../src/nasa7/options.js';
import type { FitOptions, FitResult } from '../../src/nasa7/types.js';
import type { ComputedSpecies } from './compute.js';

/** Normalised fit options of a plan (throws FitError listing every bad option). */
export function fitOptionsFor(partial: PartialFitOptions): FitOptions {
  return normaliseFitOptions(partial);
}

/** Fits the samples; throws FitError when the fit cannot be made. */
export function fitSpecies(computed: ComputedSpecies, options: FitOptions): FitResult {
  return fitNasa7(computed.samples, computed.anchor, options);
}
