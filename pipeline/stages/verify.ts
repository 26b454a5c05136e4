/**
 * Stage "verify": checks a fit against the tolerances of the database (src/nasa7/quality) and turns every
 * violation into a diagnostic that says which quantity, where and by how much.
 */
import { assessFit } from '../../src/nasa7/quality.js';
import type { FitResult, FitSample } from '../../src/nasa7/types.js';
import type { Diagnostic } from '../core/diagnostics.js';
import type { FitTolerancesSetting } from '../core/settings.js';

/** Classical Cp/R of translation plus fully excited rotation, by structure. */
export function classicalCpFloor(structure: string): number {
  return structure === 'atom' ? 2.5 : structure === 'nonlinear' ? 4 : 3.5;
}

export function verifySpecies(
  fit: FitResult,
  samples: readonly FitSample[],
  tolerances: FitTolerancesSetting,
  continuityOrder: 1 | 2,
  /** Classical Cp/R floor of the structure (5/2 atom, 7/2 linear or diatomic, 4 nonlinear). */
  cpFloor: number,
  where: { file: string; species: string; line?: number; column?: number },
  /** Computed points just beyond the range (compute stage `extrapolationSamples`); checked, never fitted. */
  beyond: readonly FitSample[] = [],
): Diagnostic[] {
  const { relative_to_cp: perCp, cp, h, s } = tolerances;
  const violations = assessFit(fit, samples, { cp, h, s, perCp: { ...perCp }, continuityOrder, cpFloor }, beyond);
  return violations.map((v) => ({
    severity: 'error' as const,
    code: `fit-${v.quantity}`,
    ...where,
    // fit.cp / fit.cp.relative_to_cp: the quantity and the part of its limit that applied (the departure
    // check beyond the ends is a multiple of the Cp limit, so it names the Cp key).
    path: `fit.${v.quantity === 'extrapolation-departs' ? 'cp' : v.quantity}${v.limitPart === 'perCp' ? '.relative_to_cp' : ''}`,
    message: v.message,
  }));
}

