/**
 * snake_case keys for JSON outputs: every JSON file or stdout qforge writes uses snake_case keys (except
 * data keys such as element symbols and recorded inputs), whatever the internal TypeScript names are.
 */

/** camelCase (or a lone capital such as `T`) → snake_case: `standardPressurePa` → `standard_pressure_pa`. */
export const snakeKey = (k: string): string => k.replace(/(?<=[a-z0-9])([A-Z])/g, '_$1').toLowerCase();

/** Deep copy of a plain JSON value with every object key in snake_case. */
export function snakeKeys(v: unknown): unknown {
  if (Array.isArray(v)) return v.map(snakeKeys);
  if (v && typeof v === 'object') return Object.fromEntries(Object.entries(v).map(([k, x]) => [snakeKey(k), snakeKeys(x)]));
  return v;
}
