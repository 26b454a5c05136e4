/**
 * Where a build's time goes by kind of species: from the per-species stage times of a build's
 * summary.json (cold, no cache), the count, the median and mean milliseconds per species of each stage
 * and each kind's share of all stage time. A mechanism's mix differs from the synthetic one (C3–C16 fuels
 * with torsions are mostly the costliest kind), so this table says what a given mix will cost, which one
 * number of species per second cannot.
 *
 * The median is shown beside the mean because each thread's first species also pays for its warm-up
 * (code not yet optimised, the fit's factorisations made cold: a few hundred ms), which a mean of a
 * small kind would carry.
 */
import { alignColumns, median } from './common.js';

/** The stages whose times are summed (summary.json `timings_ms` keys that do the per-species work). */
export const KIND_STAGES = ['load', 'validate', 'compute', 'fit', 'verify', 'table', 'uncertainty'] as const;

export interface SpeciesTimings {
  name: string;
  timings_ms: Record<string, number>;
}

export interface KindCost {
  kind: string;
  count: number;
  /** Median ms per species of each stage in KIND_STAGES, and of their sum. */
  medianMs: Record<string, number>;
  /** Mean ms per species, likewise. */
  meanMs: Record<string, number>;
  /** This kind's part of the stage time of every species (0 … 1). */
  share: number;
}

/**
 * Costs by kind, kinds in order of first appearance in `order` (kinds absent from the build omitted).
 * `kindOf` names each species' kind; a species it returns undefined for counts as 'other'.
 */
export function costByKind(species: readonly SpeciesTimings[], kindOf: (name: string) => string | undefined, order: readonly string[] = []): KindCost[] {
  const groups = new Map<string, Array<Record<string, number>>>();
  let all = 0;
  for (const s of species) {
    const kind = kindOf(s.name) ?? 'other';
    const row: Record<string, number> = {};
    let total = 0;
    for (const stage of KIND_STAGES) {
      const ms = s.timings_ms[stage] ?? 0;
      row[stage] = ms;
      total += ms;
    }
    row.total = total;
    all += total;
    let g = groups.get(kind);
    if (!g) groups.set(kind, (g = []));
    g.push(row);
  }
  const kinds = [...order.filter((k) => groups.has(k)), ...[...groups.keys()].filter((k) => !order.includes(k))];
  return kinds.map((kind) => {
    const rows = groups.get(kind)!;
    const medianMs: Record<string, number> = {};
    const meanMs: Record<string, number> = {};
    for (const key of [...KIND_STAGES, 'total']) {
      const values = rows.map((r) => r[key]!);
      medianMs[key] = median(values);
      meanMs[key] = values.reduce((a, b) => a + b, 0) / values.length;
    }
    const total = rows.reduce((a, r) => a + r.total!, 0);
    return { kind, count: rows.length, medianMs, meanMs, share: all > 0 ? total / all : 0 };
  });
}

/** The table `npm run bench` prints: one line per kind, median ms per stage, mean total, share. */
export function formatKindTable(rows: readonly KindCost[], title: string): string {
  const f = (x: number, d = 2) => (Number.isFinite(x) ? x.toFixed(d) : '-');
  const lines: string[][] = [['kind', 'species', ...KIND_STAGES.map((s) => `${s} ms`), 'total ms (median)', 'total ms (mean)', 'share %']];
  for (const r of rows) {
    lines.push([r.kind, String(r.count), ...KIND_STAGES.map((s) => f(r.medianMs[s]!)), f(r.medianMs.total!), f(r.meanMs.total!), f(100 * r.share, 1)]);
  }
  return [title, ...alignColumns(lines, (i) => i === 0)].join('\n');
}
