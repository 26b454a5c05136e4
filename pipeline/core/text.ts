/** Small text helpers shared by the pipeline. */

/**
 * Code-unit order of two strings. Every sort whose result reaches an output or a message uses this: unlike
 * localeCompare it cannot depend on the machine's locale, so the order is the same everywhere.
 */
export function compareText(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

/** The message of a thrown value, for diagnostics (no stack: that is for real bugs only). */
export function errorText(e: unknown): string {
  return e instanceof Error ? e.message : String(e);
}
