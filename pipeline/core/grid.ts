/** Temperature grids of tables and samples, shared by the settings and the cache-key plan. */

/** Rounded to 1e-6 K so that low + k·step does not carry binary noise into keys or tables. */
export const tidy = (t: number): number => Math.round(t * 1e6) / 1e6;

/** low, low+step, …, high, plus the extras, inside [low, high], ascending, distinct. */
export function temperatureGrid(low: number, high: number, step: number, extra: readonly number[] = []): number[] {
  const set = new Set<number>();
  const n = Math.floor((high - low) / step + 1e-9);
  for (let k = 0; k <= n; k++) set.add(tidy(low + k * step));
  set.add(tidy(high));
  for (const t of extra) if (t >= low && t <= high) set.add(tidy(t));
  return [...set].filter((t) => t >= low && t <= high).sort((a, b) => a - b);
}
