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

/** Scratch of `expNegPairSmall` (e and 1 − e), reused: the grid form allocates nothing per temperature. */
const PAIR = new Float64Array(2);

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
  /** Factors of (1 − e) per mode in the running product: d for a whole d ≤ 8, else 0 (its own logarithm). */
  const powers = new Int32Array(modes);
  for (let k = 0; k < modes; k++) {
    theta[k] = C2_CM_K * vibrations[k]!.wavenumber;
    const d = vibrations[k]!.degeneracy;
    degeneracy[k] = d;
    powers[k] = d === 1 ? 1 : Number.isInteger(d) && d <= 8 ? d : 0;
  }
  // Temperature by temperature, the modes in their order: each temperature's sums are added mode by mode
  // in mode order whatever the loop nesting, so the results are those of the mode-by-mode form bit for bit;
  // this nesting keeps the sums in registers instead of loading and storing three grid arrays per mode and
  // temperature (a loop micro-benchmark, 50 modes × 600 temperatures: ~16–17 → ~11–15 ns per mode and
  // temperature, same doubles).
  const { invT } = grid;
  const n = invT.length;
  const pair = PAIR;
  for (let j = 0; j < n; j++) {
    const y = invT[j]!;
    let meanU = 0;
    let varU = 0;
    let product = 1;
    let logSum = 0;
    for (let k = 0; k < modes; k++) {
      const x = theta[k]! * y;
      const d = degeneracy[k]!;
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
      meanU += xRatio;
      varU += xRatio * x * inv;
      const factors = powers[k]!;
      if (factors === 1) product *= oneMinusE;
      else if (factors > 1) for (let r = 0; r < factors; r++) product *= oneMinusE;
      else logSum += d * Math.log(oneMinusE);
      if (product < 1e-250) {
        logSum += Math.log(product);
        product = 1;
      }
    }
    into.lnQ[j]! -= logSum + Math.log(product);
    into.meanU[j]! += meanU;
    into.varU[j]! += varU;
  }
}
