/**
 * Stage "verify": checks a fit against the tolerances of the database (src/nasa7/quality) and turns every
 * violation into a diagnostic that says which quantity, where and by how much.
 */
import { assessFit } from '../../src/nasa7/quality.js';
import type { FitResult, FitSample } from '../../src/nasa7/types.js';
import type { Diagnostic } from '../core/diagnostics.js';
import type { FitTolerancesSetting } from '../core/settings.js';

export function verifySpecies(
  fit: FitResult,
  samples: readonly FitSample[],
  tolerances: FitTolerancesSetting,
  continuityOrder: 1 | 2,
  where: { file: string; species: string; line?: number; column?: number },
): Diagnostic[] {
  const { relative_to_cp: perCp, cp, h, s } = tolerances;
  const violations = assessFit(fit, samples, { cp, h, s, perCp: { ...perCp }, continuityOrder });
  return violations.map((v) => ({
    severity: 'error' as const,
    code: `fit-${v.quantity}`,
    ...where,
    // fit.cp / fit.cp.relative_to_cp: the quantity and the part of its limit that applied.
    path: `fit.${v.quantity}${v.limitPart === 'perCp' ? '.relative_to_cp' : ''}`,
    message: v.message,
  }));
}

