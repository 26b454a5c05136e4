/**
 * Harmonic-oscillator vibrational partition function, energies from the zero-point level.
 */
import { C2_CM_K } from '../constants.js';
import type { Vibration } from '../model.js';
import { expNeg, expNegPairSmall } from './exp-neg.js';
import type { GridMoments, TemperatureGrid } from './grid-moments.js';
import type { PartitionMoments } from './moments.js';

/**
 * Formula: per mode with x = θ/T, θ = c2·ν̃ and degeneracy d:
 *   lnQ = −d·ln(1 − e^{−x}),  meanU = d·x/(e^{x} − 1),  varU = d·x² e^{x}/(e^{x} − 1)²
 * written with expm1/log1p of e^{−x} so no term overflows at large x or loses digits at small x.
 * Units: ν̃ in cm⁻¹, T in K. Valid for small-amplitude vibrations (anharmonicity neglected).
 * Source: McQuarrie, Statistical Mechanics (1976), eqs. 6-22 to 6-25 and 8-17.
 */
export function harmonicMoments(vibrations: readonly Vibration[], T: number): PartitionMoments {
  let lnQ = 0;
  let meanU = 0;
  let varU = 0;
  for (const { wavenumber, degeneracy } of vibrations) {
    const x = (C2_CM_K * wavenumber) / T;
    const e = Math.exp(-x);
    const oneMinusE = -Math.expm1(-x);
    lnQ -= degeneracy * Math.log1p(-e);
    meanU += (degeneracy * x * e) / oneMinusE;
    varU += (degeneracy * x * x * e) / (oneMinusE * oneMinusE);
  }
  return { lnQ, meanU, varU };
}

/**
 * Grid form of `harmonicMoments`, adding into `into` at every temperature of `grid` (the same formula).
 * Method: per mode and temperature one table-driven exponential (exp-neg.ts, no Math.exp call):
 * e = e^{−x} when x ≥ ln 2, and 1 − e the subtraction whose result lies in [½, 1]; when x < ln 2 both e and
 * 1 − e from `expNegPairSmall`, so 1 − e keeps its relative accuracy however small x is. One division per
 * mode (1/(1 − e)). lnQ = −Σ d ln(1 − e) is one logarithm per temperature, of the running product
 * Π (1 − e)^d (flushed into the logarithm before it can underflow).
 * Accuracy (stated, tested against harmonicMoments at 1e-13): e and 1 − e within 4 ulps (exp-neg.ts), so
 * meanU and varU within about 10 ulps relative per mode; lnQ within (number of factors + 2) ulps of 1
 * absolute plus 4 ulps relative per factor, i.e. ~1e-13 for 180 modes — below 1e-14 of S/R, which always
 * holds the translational lnQ ≥ 10.
 */
export function addHarmonicGrid(vibrations: readonly Vibration[], grid: TemperatureGrid, into: GridMoments): void {
  const modes = vibrations.length;
  const theta = new Float64Array(modes);
  const degeneracy = new Float64Array(modes);
  for (let k = 0; k < modes; k++) {
    theta[k] = C2_CM_K * vibrations[k]!.wavenumber;
    degeneracy[k] = vibrations[k]!.degeneracy;
  }
  // Mode by mode over the whole grid (each temperature's sums are independent, so the processor overlaps
  // them), with the running product Π (1 − e)^d per temperature; the order of the additions into each
  // temperature's sums is the mode order, whatever the grid.
  const { T, invT } = grid;
  const n = T.length;
  const meanU = new Float64Array(n);
  const varU = new Float64Array(n);
  const product = new Float64Array(n).fill(1);
  const logSum = new Float64Array(n);
  const pair = new Float64Array(2);
  for (let k = 0; k < modes; k++) {
    const th = theta[k]!;
    const d = degeneracy[k]!;
    const powers = d === 1 ? 1 : Number.isInteger(d) && d <= 8 ? d : 0;
    for (let j = 0; j < n; j++) {
      const x = th * invT[j]!;
      let e: number;
      let oneMinusE: number;
      if (x >= Math.LN2) {
        e = expNeg(x);
        oneMinusE = 1 - e;
      } else {
        expNegPairSmall(x, pair);
        e = pair[0]!;
        oneMinusE = pair[1]!;
      }
      const inv = 1 / oneMinusE;
      const xRatio = d * x * e * inv;
      meanU[j]! += xRatio;
      varU[j]! += xRatio * x * inv;
      let p = product[j]!;
      if (powers === 1) p *= oneMinusE;
      else if (powers > 1) for (let r = 0; r < powers; r++) p *= oneMinusE;
      else logSum[j]! += d * Math.log(oneMinusE);
      if (p < 1e-250) {
        logSum[j]! += Math.log(p);
        p = 1;
      }
      product[j] = p;
    }
  }
  for (let j = 0; j < n; j++) {
    into.lnQ[j]! -= logSum[j]! + Math.log(product[j]!);
    into.meanU[j]! += meanU[j]!;
    into.varU[j]! += varU[j]!;
  }
}
