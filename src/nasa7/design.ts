/**
 * Rows of the weighted least-squares design matrix. Unknowns: the 14 τ-coefficients
 * x = [b_low(1..7), b_high(1..7)] (see scaling.ts). Each sample contributes up to three rows (Cp/R, H/RT,
 * S/R), each multiplied by √w so that the solver minimises Σ w_q r_q².
 *
 * Enthalpy target: the fit uses H_rel/RT = H/RT − H(anchor)/(R T), i.e. the enthalpy relative to its
 * value at the anchor temperature, instead of the absolute H/RT. The two give the same fit in exact
 * arithmetic (the difference c/T is exactly the a6/T column, so a6 absorbs it), but the absolute value
 * carries ΔfH°/RT, which can dwarf the thermal part (H2O: ≈ −97 at 298 K) and costs digits; the relative
 * form keeps every target O(1–50). The formation enthalpy is put back into a6 when the coefficients are
 * finalised (fit-fixed-mid.ts).
 */
import { cpBasis, hBasis, sBasis, T_SCALE } from './scaling.js';
import type { FitSample, FitWeights } from './types.js';

export const UNKNOWNS = 14;

export interface Design {
  /** Row-major rows of length 14, already weighted. */
  rows: number[][];
  /** Weighted targets, one per row. */
  rhs: number[];
}

function placeRow(basis: number[], range: 'low' | 'high', factor: number): number[] {
  const row = new Array<number>(UNKNOWNS).fill(0);
  const offset = range === 'low' ? 0 : 7;
  for (let k = 0; k < 7; k++) row[offset + k] = factor * basis[k]!;
  return row;
}

/** The weighted rows for both ranges: they depend on the sample temperatures and the weights only. */
export function designRows(ranges: { low: readonly FitSample[]; high: readonly FitSample[] }, weights: FitWeights): number[][] {
  const rows: number[][] = [];
  const wc = Math.sqrt(weights.cp);
  const wh = Math.sqrt(weights.h);
  const ws = Math.sqrt(weights.s);
  for (const range of ['low', 'high'] as const) {
    for (const s of ranges[range]) {
      const tau = s.T / T_SCALE;
      if (wc > 0) rows.push(placeRow(cpBasis(tau), range, wc));
      if (wh > 0) rows.push(placeRow(hBasis(tau), range, wh));
      if (ws > 0) rows.push(placeRow(sBasis(tau), range, ws));
    }
  }
  return rows;
}

/**
 * The weighted targets, in the order of `designRows`. `hShift` = H(anchor)/R in K (anchor.hRT · anchor.T):
 * the enthalpy target of a sample at T is hRT − hShift/T.
 */
export function designRhs(
  ranges: { low: readonly FitSample[]; high: readonly FitSample[] },
  weights: FitWeights,
  hShift: number,
): number[] {
  const rhs: number[] = [];
  const wc = Math.sqrt(weights.cp);
  const wh = Math.sqrt(weights.h);
  const ws = Math.sqrt(weights.s);
  for (const range of ['low', 'high'] as const) {
    for (const s of ranges[range]) {
      if (wc > 0) rhs.push(wc * s.cpR);
      if (wh > 0) rhs.push(wh * (s.hRT - hShift / s.T));
      if (ws > 0) rhs.push(ws * s.sR);
    }
  }
  return rhs;
}

/** Rows and targets together (see `designRows`, `designRhs`). */
export function buildDesign(
  ranges: { low: readonly FitSample[]; high: readonly FitSample[] },
  weights: FitWeights,
  hShift: number,
): Design {
  return { rows: designRows(ranges, weights), rhs: designRhs(ranges, weights, hShift) };
}
