/** Small text helpers shared by the pipeline. */

/**
 * Code-unit order of two strings. Every sort whose result reaches an output or a message uses this: unlike
 * localeCompare it cannot depend on the machine's locale, so the order is the same everywhere.
 */
export function compareText(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

/** Objects of at most this many keys have them sorted by insertion (`sortedKeys`). */
const INSERTION_SORT_KEYS = 32;

/**
 * Own enumerable keys in the order `Array.prototype.sort` gives them (UTF-16 code units), sorted in place
 * by insertion: keys are distinct, so any correct sort gives this order, and for the few keys of an input
 * or result object insertion allocates nothing where the built-in sort copies into a work array (larger
 * objects, where insertion's quadratic cost would show, use that sort).
 */
export function sortedKeys(obj: object): string[] {
  const keys = Object.keys(obj);
  if (keys.length > INSERTION_SORT_KEYS) return keys.sort();
  for (let i = 1; i < keys.length; i++) {
    const k = keys[i]!;
    let j = i - 1;
    if (!(keys[j]! > k)) continue;
    while (j >= 0 && keys[j]! > k) {
      keys[j + 1] = keys[j]!;
      j--;
    }
    keys[j + 1] = k;
  }
  return keys;
}

/** The message of a thrown value, for diagnostics (no stack: that is for real bugs only). */
export function errorText(e: unknown): string {
  return e instanceof Error ? e.message : String(e);
}
