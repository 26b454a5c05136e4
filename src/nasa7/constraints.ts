/**
 * Equality constraints C x = d on the 14 τ-coefficients (order of x as in design.ts):
 *  - anchor (low set): H_rel/RT(T_a) = 0 and S/R(T_a) = S_a/R, so H°(T_a) and S°(T_a) are reproduced;
 *  - midpoint (low − high = 0 at tMid): Cp/R, dCp/dT, H/RT, S/R, and d²Cp/dT² when continuityOrder = 2.
 * Derivative rows are in τ; because dτ/dT = 1/T_SCALE is the same on both sides, equality in τ is
 * equality in T.
 */
import { cpBasis, d2cpBasis, dcpBasis, hBasis, sBasis, T_SCALE } from './scaling.js';
import type { FitOptions, FitSample } from './types.js';
import { UNKNOWNS } from './design.js';

export interface Constraints {
  rows: number[][];
  rhs: number[];
  /** What each row enforces, for error messages. */
  labels: string[];
}

function lowOnly(basis: number[]): number[] {
  return [...basis, ...new Array<number>(7).fill(0)];
}

function lowMinusHigh(basis: number[]): number[] {
  return [...basis, ...basis.map((v) => -v)];
}

export function buildConstraints(anchor: FitSample, options: Pick<FitOptions, 'tMid' | 'continuityOrder'>): Constraints {
  const ta = anchor.T / T_SCALE;
  const tm = options.tMid / T_SCALE;
  const rows: number[][] = [lowOnly(hBasis(ta)), lowOnly(sBasis(ta))];
  const rhs: number[] = [0, anchor.sR];
  const labels = [`H at anchor ${anchor.T} K`, `S at anchor ${anchor.T} K`];
  const mids: Array<[string, (t: number) => number[]]> = [
    ['Cp', cpBasis],
    ['dCp/dT', dcpBasis],
    ['H', hBasis],
    ['S', sBasis],
  ];
  if (options.continuityOrder === 2) mids.push(['d²Cp/dT²', d2cpBasis]);
  for (const [label, basis] of mids) {
    rows.push(lowMinusHigh(basis(tm)));
    rhs.push(0);
    labels.push(`${label} continuous at tMid ${options.tMid} K`);
  }
  for (const r of rows) if (r.length !== UNKNOWNS) throw new Error('internal: constraint row length');
  return { rows, rhs, labels };
}
