/**
 * Stage "verify": checks a fit against the tolerances of the database (src/nasa7/quality) and turns every
 * violation into a diagnostic that says which quantity, where and by how much.
 */
import { assessFit } from '../../src/nasa7/quality.js';
import type { FitResult, FitSample } from '../../src/nasa7/types.js';
import type { Diagnostic } from '../core/diagnostics.js';
import type { QuantityTriple } from '../core/settings.js';

export function verifySpecies(
  fit: FitResult,
  samples: readonly FitSample[],
  tolerances: QuantityTriple,
  continuityOrder: 1 | 2,
  where: { file: string; species: string; line?: number; column?: number },
): Diagnostic[] {
  const violations = assessFit(fit, samples, { ...tolerances, continuityOrder });
  return violations.map((v) => ({
    severity: 'error' as const,
    code: `fit-${v.quantity}`,
    ...where,
    path: `fit.${v.quantity}`,
    message: v.message,
  }));
}

