/**
 * A level sum q = Σ g_i e^{−θ_i/T} and its moments on a whole temperature grid, with far fewer
 * exponentials than levels × temperatures.
 *
 * Method (binned Taylor expansion). Levels are grouped into energy bins; in a bin with centre c and
 * levels θ_i = c + Δ_i (|Δ_i| ≤ h, the bin's half-spread),
 *   Σ g_i e^{−θ_i y} = e^{−c y} Σ_k M_k (−y)^k / k!,   M_k = Σ g_i Δ_i^k,   y = 1/T,
 * and likewise Σ g_i Δ_i e^{−θ_i y} and Σ g_i Δ_i² e^{−θ_i y} with M_{k+1}, M_{k+2}. The moments M_k are
 * computed once per level list (finest bins from the levels, each coarser resolution of twice the width
 * from the finer one by the exact binomial shift of the centre). At each T the coarsest resolution whose
 * bin width is ≤ 2T is used, so |Δ_i| y ≤ 1: one exponential and three degree-18 polynomials per bin, and
 * the number of bins visited per T is bounded by a few dozen however many levels there are.
 *
 * Accuracy (stated bound, tested against the direct sum): the Lagrange remainder of the degree-K Taylor
 * polynomial of e^{−x}, |x| ≤ 1, relative to e^{−x} itself, is at most e^{2|x|}|x|^{K+1}/(K+1)! = 6.1e-17
 * for K = 18. Every term g e^{−θy}·{1, Δ, Δ²} therefore carries a relative truncation error below
 * 6.1e-17, so q, Σ w u and Σ w u² (w = g e^{−u}, u = θ y) are each exact to ~1e-16 relative plus rounding,
 * and ln q, ⟨u⟩, var u to ~1e-15 relative (var u = ⟨u²⟩ − ⟨u⟩² loses the factor ⟨u²⟩/var u, a few at most
 * for levels measured from the lowest). Tested: Cp/R, H/RT, S/R within 1e-12 relative of the direct sum.
 *
 * Pruning (stated bound): bins are visited in rising energy, and the sum stops once the weight of all
 * remaining levels times e^{−u}(1 + u²), u the lowest remaining level (bounded via the bin centre), is below
 * 1e-17 of q — a bound on what the omitted levels can add to q, Σ w u and Σ w u² for u > 20, as in the
 * direct sum. Short lists (≤ DIRECT_LIMIT levels) and temperatures below half the finest bin width use
 * the direct sum of level-sum.ts.
 * Source of the moments: McQuarrie, Statistical Mechanics (1976), eqs. 2-30 to 2-34; the expansion is the
 * Taylor series of the exponential (any calculus text), our arrangement.
 */
import type { GridMoments, TemperatureGrid } from './grid-moments.js';
import { addDirectLevelSum, TAIL_CUTOFF, type LevelList } from './level-sum.js';

/** Degree of the Taylor polynomials (see the accuracy bound above). */
const TAYLOR_DEGREE = 18;
/** Coefficients per series (degree + 1). */
const TERMS = TAYLOR_DEGREE + 1;
/** Raw moments M_0 … M_{K+2} kept per bin. */
const RAW = TAYLOR_DEGREE + 3;
/** Width of the finest bins, K. Below half this temperature the direct sum is used. */
const FINEST_WIDTH = 400;
/** Lists of at most this many levels are summed directly (binning would not save exponentials). */
export const DIRECT_LIMIT = 64;

interface Resolution {
  /** Bin width, K: every level of a bin lies within ± width/2 of its centre. */
  width: number;
  /** Bin number floor(θ/width) of each (non-empty) bin, ascending. */
  index: Float64Array;
  centre: Float64Array;
  /** Half the spread of the bin's levels (0 for a bin holding one energy). */
  halfSpread: Float64Array;
  /** Σ g of this bin and all above it. */
  tail: Float64Array;
  /** Raw moments M_k = Σ g Δ^k about the centre, RAW per bin. */
  raw: Float64Array;
  /** Horner coefficients of the three series, 3·TERMS per bin: M_k/k!, M_{k+1}/k!, M_{k+2}/k!. */
  coef: Float64Array;
}

const binned = new WeakMap<LevelList, Resolution[]>();

const FACTORIAL = (() => {
  const f = new Float64Array(RAW + 1);
  f[0] = 1;
  for (let k = 1; k <= RAW; k++) f[k] = f[k - 1]! * k;
  return f;
})();

const BINOMIAL = (() => {
  const c = new Float64Array(RAW * RAW);
  for (let k = 0; k < RAW; k++) {
    c[k * RAW] = 1;
    for (let j = 1; j <= k; j++) c[k * RAW + j] = c[(k - 1) * RAW + j - 1]! + (j < k ? c[(k - 1) * RAW + j]! : 0);
  }
  return c;
})();

function fillCoefficients(r: Resolution): void {
  const n = r.centre.length;
  for (let b = 0; b < n; b++) {
    const m = b * RAW;
    const o = b * 3 * TERMS;
    for (let k = 0; k < TERMS; k++) {
      const f = FACTORIAL[k]!;
      r.coef[o + k] = r.raw[m + k]! / f;
      r.coef[o + TERMS + k] = r.raw[m + k + 1]! / f;
      r.coef[o + 2 * TERMS + k] = r.raw[m + k + 2]! / f;
    }
  }
}

function tailOf(weights: Float64Array): Float64Array {
  const tail = new Float64Array(weights.length);
  let t = 0;
  for (let b = weights.length - 1; b >= 0; b--) {
    t += weights[b]!;
    tail[b] = t;
  }
  return tail;
}

function emptyResolution(width: number, n: number): Resolution {
  return {
    width,
    index: new Float64Array(n),
    centre: new Float64Array(n),
    halfSpread: new Float64Array(n),
    tail: new Float64Array(n),
    raw: new Float64Array(n * RAW),
    coef: new Float64Array(n * 3 * TERMS),
  };
}

/** Finest bins straight from the (sorted) levels. */
function finestResolution(levels: LevelList): Resolution {
  const { theta, weight } = levels;
  const n = theta.length;
  // First pass: bin boundaries (levels are sorted, so each bin is a contiguous run).
  const starts: number[] = [];
  let last = -1;
  for (let i = 0; i < n; i++) {
    const idx = Math.floor(theta[i]! / FINEST_WIDTH);
    if (idx !== last) {
      starts.push(i);
      last = idx;
    }
  }
  const r = emptyResolution(FINEST_WIDTH, starts.length);
  const binWeight = new Float64Array(starts.length);
  for (let b = 0; b < starts.length; b++) {
    const from = starts[b]!;
    const to = b + 1 < starts.length ? starts[b + 1]! : n;
    const lo = theta[from]!;
    const hi = theta[to - 1]!;
    const c = 0.5 * (lo + hi);
    r.index[b] = Math.floor(lo / FINEST_WIDTH);
    r.centre[b] = c;
    r.halfSpread[b] = 0.5 * (hi - lo);
    const m = b * RAW;
    for (let i = from; i < to; i++) {
      const d = theta[i]! - c;
      let p = weight[i]!;
      binWeight[b]! += p;
      for (let k = 0; k < RAW; k++) {
        r.raw[m + k]! += p;
        p *= d;
      }
    }
  }
  r.tail.set(tailOf(binWeight));
  fillCoefficients(r);
  return r;
}

/** Bins of twice the width from `fine`: centres move to the middle of each merged bin (binomial shift). */
function coarser(fine: Resolution): Resolution {
  const nf = fine.centre.length;
  const parentOf = (b: number) => Math.floor(fine.index[b]! / 2);
  let count = 0;
  for (let b = 0; b < nf; b++) if (b === 0 || parentOf(b) !== parentOf(b - 1)) count++;
  const width = fine.width * 2;
  const r = emptyResolution(width, count);
  const binWeight = new Float64Array(count);
  const powers = new Float64Array(RAW);
  let p = -1;
  for (let b = 0; b < nf; ) {
    // Children b … e−1 share a parent; its centre is the middle of their combined spread.
    let e = b + 1;
    while (e < nf && parentOf(e) === parentOf(b)) e++;
    p++;
    const lo = fine.centre[b]! - fine.halfSpread[b]!;
    const hi = fine.centre[e - 1]! + fine.halfSpread[e - 1]!;
    const c = 0.5 * (lo + hi);
    r.index[p] = parentOf(b);
    r.centre[p] = c;
    r.halfSpread[p] = 0.5 * (hi - lo);
    const m = p * RAW;
    for (let child = b; child < e; child++) {
      // Σ g (Δ' + s)^k = Σ_j C(k, j) s^{k−j} M'_j with s = child centre − parent centre.
      const s = fine.centre[child]! - c;
      powers[0] = 1;
      for (let k = 1; k < RAW; k++) powers[k] = powers[k - 1]! * s;
      const cm = child * RAW;
      binWeight[p]! += fine.raw[cm]!;
      for (let k = 0; k < RAW; k++) {
        let sum = 0;
        for (let j = 0; j <= k; j++) sum += BINOMIAL[k * RAW + j]! * powers[k - j]! * fine.raw[cm + j]!;
        r.raw[m + k]! += sum;
      }
    }
    b = e;
  }
  r.tail.set(tailOf(binWeight));
  fillCoefficients(r);
  return r;
}

function resolutionsOf(levels: LevelList): Resolution[] {
  const known = binned.get(levels);
  if (known) return known;
  const all = [finestResolution(levels)];
  while (all[all.length - 1]!.centre.length > 1) all.push(coarser(all[all.length - 1]!));
  binned.set(levels, all);
  return all;
}

/** Binned sum at one temperature (T ≥ FINEST_WIDTH); adds ln q, ⟨u⟩, var u at index j. */
function addBinnedAt(all: readonly Resolution[], invT: number, T: number, into: GridMoments, j: number): void {
  let level = Math.min(all.length - 1, Math.floor(Math.log2((2 * T) / FINEST_WIDTH)));
  while (level > 0 && all[level]!.width > 2 * T) level--;
  const r = all[level]!;
  const n = r.centre.length;
  const z = -invT;
  let q = 0;
  let s1 = 0;
  let s2 = 0;
  for (let b = 0; b < n; b++) {
    const c = r.centre[b]!;
    const e = Math.exp(-c * invT);
    if (e === 0) break; // sorted: every later bin underflows too
    // Lowest level of the bin is ≥ c − h, so its factor is ≤ e·e^{h/T} ≤ e·e (h/T ≤ 1).
    const uLow = (c - r.halfSpread[b]!) * invT;
    if (uLow > 20 && r.tail[b]! * e * Math.E * (1 + uLow * uLow) < TAIL_CUTOFF * q) break;
    const o = b * 3 * TERMS;
    let a: number;
    let bb: number;
    let cc: number;
    if (r.halfSpread[b] === 0) {
      a = r.coef[o]!;
      bb = 0;
      cc = 0;
    } else {
      a = r.coef[o + TERMS - 1]!;
      bb = r.coef[o + 2 * TERMS - 1]!;
      cc = r.coef[o + 3 * TERMS - 1]!;
      for (let k = TERMS - 2; k >= 0; k--) {
        a = a * z + r.coef[o + k]!;
        bb = bb * z + r.coef[o + TERMS + k]!;
        cc = cc * z + r.coef[o + 2 * TERMS + k]!;
      }
    }
    q += e * a;
    s1 += e * (c * a + bb);
    s2 += e * (c * (c * a + 2 * bb) + cc);
  }
  const mean = (s1 * invT) / q;
  into.lnQ[j]! += Math.log(q);
  into.meanU[j]! += mean;
  into.varU[j]! += (s2 * invT * invT) / q - mean * mean;
}

/**
 * Add the moments of the level sum `levels` at every temperature of `grid` into `into` (see the file
 * comment for the method, its accuracy and the pruning bound). Pure: the bins are built once per level
 * list and remembered (weakly) with it.
 */
export function addLevelSumGrid(levels: LevelList, grid: TemperatureGrid, into: GridMoments): void {
  const { T, invT } = grid;
  if (levels.theta.length <= DIRECT_LIMIT) {
    for (let j = 0; j < T.length; j++) addDirectLevelSum(levels, T[j]!, into, j);
    return;
  }
  const all = resolutionsOf(levels);
  for (let j = 0; j < T.length; j++) {
    const t = T[j]!;
    if (2 * t < FINEST_WIDTH) addDirectLevelSum(levels, t, into, j);
    else addBinnedAt(all, invT[j]!, t, into, j);
  }
}
