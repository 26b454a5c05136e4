/** Temperature grids of tables and samples, shared by the settings and the cache-key plan. */

/** Rounded to 1e-6 K so that low + k·step does not carry binary noise into keys or tables. */
export const tidy = (t: number): number => Math.round(t * 1e6) / 1e6;

/** The grids of the last few distinct argument lists: every species of a database asks for the same one or two. */
const remembered: Array<{ low: number; high: number; step: number; extra: number[]; grid: number[] }> = [];
const REMEMBERED_GRIDS = 8;

/**
 * low, low+step, …, high, plus the extras, inside [low, high], ascending, distinct. A fresh array each call
 * (callers may change it); a repeated argument list gets a copy of the grid made the first time, which is
 * a function of the arguments alone (Object.is-equal numbers), so the same doubles.
 */
export function temperatureGrid(low: number, high: number, step: number, extra: readonly number[] = []): number[] {
  for (const r of remembered) {
    if (Object.is(r.low, low) && Object.is(r.high, high) && Object.is(r.step, step) && sameNumbers(r.extra, extra)) return r.grid.slice();
  }
  const grid = buildTemperatureGrid(low, high, step, extra);
  if (remembered.length >= REMEMBERED_GRIDS) remembered.shift();
  remembered.push({ low, high, step, extra: [...extra], grid: grid.slice() });
  return grid;
}

function sameNumbers(a: readonly number[], b: readonly number[]): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (!Object.is(a[i], b[i])) return false;
  return true;
}

function buildTemperatureGrid(low: number, high: number, step: number, extra: readonly number[]): number[] {
  const set = new Set<number>();
  const n = Math.floor((high - low) / step + 1e-9);
  for (let k = 0; k <= n; k++) set.add(tidy(low + k * step));
  set.add(tidy(high));
  for (const t of extra) if (t >= low && t <= high) set.add(tidy(t));
  return [...set].filter((t) => t >= low && t <= high).sort((a, b) => a - b);
}
