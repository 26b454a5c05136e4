/**
 * Structured gate results of `qforge diff --fail-above` for JSON output: one object per breach with the
 * quantity, species, temperature `t`, value and limit (and their unit), so a CI job reads numbers instead of
 * parsing the prose `breaches`. Same rules as diff.ts `gateBreaches`.
 */
import type { DiffReport } from './diff.js';

export interface GateResult {
  species: string;
  /** cp, h, s; 'removed' for a removed species; 'range' when the ranges no longer overlap. */
  quantity: 'cp' | 'h' | 's' | 'removed' | 'range';
  /** K; absent for 'removed' and 'range'. */
  t?: number;
  value?: number;
  limit?: number;
  unit?: string;
}

const UNIT = { cp: 'J/(mol K)', h: 'kJ/mol', s: 'J/(mol K)' } as const;

export function diffGateResults(r: DiffReport, limits: { cp?: number; h?: number; s?: number }, failOnRemoved: boolean): GateResult[] {
  const out: GateResult[] = [];
  for (const c of r.changed) {
    const qs = (['cp', 'h', 's'] as const).filter((q) => limits[q] !== undefined);
    if (qs.length && !c.common) {
      out.push({ species: c.name, quantity: 'range' });
      continue;
    }
    for (const q of qs) {
      if (c.max[q].value > limits[q]!) out.push({ species: c.name, quantity: q, t: c.max[q].T, value: c.max[q].value, limit: limits[q]!, unit: UNIT[q] });
    }
  }
  if (failOnRemoved) for (const n of r.removed) out.push({ species: n, quantity: 'removed' });
  return out;
}
