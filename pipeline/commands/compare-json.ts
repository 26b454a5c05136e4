/**
 * `qforge compare --json` (schemas/compare.schema.json, format qforge-compare/2): the CompareReport with
 * every key in snake_case (`T` → `t`, `referenceValue` → `reference_value`, …) and structured gate results,
 * one per breach, with the quantity, species, temperature, value (build − reference), limit and unit, like
 * `diff --json`'s `gate.results`. The report holds no user-named keys (species and file names are values),
 * so its keys are converted generically.
 */
import type { CompareReport } from './compare.js';
import { snakeKeys } from '../core/snake-case.js';

export const COMPARE_FORMAT = 'qforge-compare/2';

const UNIT: Record<string, string> = { cp: 'J/(mol K)', s: 'J/(mol K)', h: 'kJ/mol', dfh: 'kJ/mol' };

export function compareGateResults(r: CompareReport) {
  return r.breaches.map((d) => ({
    species: d.species,
    quantity: d.quantity,
    t: d.T,
    value: d.deviation,
    // The limit the value failed: a known deviation's widened one unless --strict ignores it.
    limit: d.widenedTolerance !== undefined && !r.strict ? d.widenedTolerance : d.tolerance,
    ...(UNIT[d.quantity] ? { unit: UNIT[d.quantity] } : {}),
    reference: d.reference,
  }));
}

export function compareJson(r: CompareReport) {
  return { format: COMPARE_FORMAT, ...(snakeKeys(r) as object), gate: { results: compareGateResults(r) } };
}
