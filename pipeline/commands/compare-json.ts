/**
 * `qforge compare --json` (schemas/compare.schema.json, format qforge-compare/2): the CompareReport with
 * every key in snake_case (`T` → `t`, `referenceValue` → `reference_value`, …) and structured gate results,
 * one per breach, with the quantity, species, temperature, value (build − reference), limit and unit, like
 * `diff --json`'s `gate.results`. The report holds no user-named keys (species and file names are values),
 * so its keys are converted generically.
 */
import type { CompareReport } from './compare.js';

export const COMPARE_FORMAT = 'qforge-compare/2';

const UNIT: Record<string, string> = { cp: 'J/(mol K)', s: 'J/(mol K)', h: 'kJ/mol' };

/** camelCase (or a lone capital such as `T`) → snake_case. */
export const snakeKey = (k: string): string => k.replace(/(?<=[a-z0-9])([A-Z])/g, '_$1').toLowerCase();

/** Deep copy of a plain JSON value with every object key in snake_case. */
export function snakeKeys(v: unknown): unknown {
  if (Array.isArray(v)) return v.map(snakeKeys);
  if (v && typeof v === 'object') return Object.fromEntries(Object.entries(v).map(([k, x]) => [snakeKey(k), snakeKeys(x)]));
  return v;
}

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
