/**
 * A level sum q = Σ g_i e^{−θ_i/T} and its moments on a whole temperature grid, with far fewer
 * exponentials than levels × temperatures.
 *
 * Method (binned Taylor expansion). Levels are grouped into energy bins; in a bin with centre c and
 * levels θ_i = c + Δ_i (|Δ_i| ≤ h, the bin's half-spread),
 *   Σ g_i e^{−θ_i y} = e^{−c y} Σ_k M_k (−y)^k / k!,   M_k = Σ g_i Δ_i^k,   y = 1/T,
 * and likewise Σ g_i Δ_i e^{−θ_i y} and Σ g_i Δ_i² e^{−θ_i y} with M_{k+1}, M_{k+2}. The moments M_k are
 * computed once per level list, and only for the resolutions some temperature has asked for (finest bins
 * from the levels, each coarser resolution of twice the width from its levels or from the finer bins by the
 * exact binomial shift of the centre, whichever costs fewer operations). At each T the coarsest resolution
 * whose bin width is ≤ 2T is used, so |Δ_i| y ≤ 1: one exponential and three polynomials per bin, of the
 * lowest degree K ≤ 18 that meets the bound below for that bin's own spread h (x = h·y), and the number of
 * bins visited per T is bounded by a few dozen however many levels there are. A bin of few levels (a rotor's
 * sparse upper ladder) is cheaper summed level by level — one table exponential each (exp-neg.ts) — and is:
 * always at one or two levels, otherwise when count·DIRECT_LEVEL_COST ≤ 4 + K + 1 Horner steps. The choice
 * depends on the list and T only, so every temperature's numbers are the same in any grid.
 *
 * Accuracy (stated bound, tested against the direct sum): the Lagrange remainder of the degree-K Taylor
 * polynomial of e^{−x}, |x| ≤ 1, relative to e^{−x} itself, is at most e^{2|x|}|x|^{K+1}/(K+1)! = 6.1e-17
 * for K = 18 at |x| = 1, and each bin's K is the lowest that keeps this bound at its own x. Every term
 * g e^{−θy}·{1, Δ, Δ²} therefore carries a relative truncation error below 6.1e-17, and the bin
 * exponentials and directly summed levels the ≤ 3-ulp error of exp-neg.ts, so q, Σ w u and Σ w u²
 * (w = g e^{−u}, u = θ y) are each exact to ~1e-15 relative plus rounding, and ln q, ⟨u⟩, var u to
 * ~1e-15 relative (var u = ⟨u²⟩ − ⟨u⟩² loses the factor ⟨u²⟩/var u, a few at most for levels measured
 * from the lowest). Tested: Cp/R, H/RT, S/R within 1e-12 relative of the direct sum.
 *
 * Pruning (stated bound): bins are visited in rising energy, and the sum stops once the weight of all
 * remaining levels times e^{−u}(1 + u²), u the lowest remaining level (bounded via the bin centre), is below
 * 1e-17 of q — a bound on what the omitted levels can add to q, Σ w u and Σ w u² for u > 20, as in the
 * direct sum. Short lists (≤ DIRECT_LIMIT levels) and temperatures below half the finest bin width use
 * the direct sum of level-sum.ts.
 * Source of the moments: McQuarrie, Statistical Mechanics (1976), eqs. 2-30 to 2-34; the expansion is the
 * Taylor series of the exponential (any calculus text), our arrangement.
 */
import { expNeg } from './exp-neg.js';
import type { GridMoments, TemperatureGrid } from './grid-moments.js';
import { addDirectLevelSum, TAIL_CUTOFF, type LevelList } from './level-sum.js';

/** Highest degree of the Taylor polynomials (see the accuracy bound above). */
const TAYLOR_DEGREE = 18;
/** Coefficients per series (degree + 1). */
const TERMS = TAYLOR_DEGREE + 1;
/** Raw moments M_0 … M_{K+2} kept per bin. */
const RAW = TAYLOR_DEGREE + 3;
/** Width of the finest bins, K. Below half this temperature the direct sum is used. */
const FINEST_WIDTH = 400;
/** Lists of at most this many levels are summed directly (binning would not save exponentials). */
export const DIRECT_LIMIT = 64;
/** Relative truncation bound of every Taylor polynomial: e²/19!, the K = 18 bound at |x| = 1. */
const TRUNCATION_BOUND = Math.exp(2) / 121645100408832000;
/**
 * Cost of summing one level directly (a table exponential and four multiply-adds) in Horner steps (three
 * multiply-adds, one per series): about 4 on V8 (a loop micro-benchmark on the 2-core machine: ~5 ns per
 * table exponential with its sums, ~1.2 ns per Horner step). A bin is summed level by level when that is
 * cheaper than its exponential plus its Horner steps; the constant only moves cost, never the accuracy.
 */
const DIRECT_LEVEL_COST = 4;
/**
 * Bins of at most this many levels are always summed level by level, so they get no moments: at
 * DIRECT_LEVEL_COST two levels cost 8 Horner steps against 4 + K + 1 for the series of degree K (more for
 * every K ≥ 3), and a rotor's sparse upper ladder, one or two levels per bin, needs no series storage.
 */
const DIRECT_BIN_LEVELS = 2;
/** A child bin's moments are shifted (RAW(RAW+1)/2 operations) rather than re-summed (RAW per level) above this. */
const CHILD_SHIFT_LEVELS = (RAW + 1) / 2;

/**
 * DEGREE_FOR[i] = the smallest degree K whose bound e^{2x} x^{K+1}/(K+1)! stays ≤ TRUNCATION_BOUND for
 * every x ≤ (i + 1)/64 (x = half-spread/T ≤ 1): a bin of small spread needs fewer terms for the same
 * accuracy.
 */
const DEGREE_STEPS = 64;
const DEGREE_FOR = (() => {
  const t = new Int32Array(DEGREE_STEPS);
  for (let i = 0; i < DEGREE_STEPS; i++) {
    const x = (i + 1) / DEGREE_STEPS;
    let k = 0;
    let term = x; // x^{k+1}/(k+1)!
    while (k < TAYLOR_DEGREE && Math.exp(2 * x) * term > TRUNCATION_BOUND) {
      k++;
      term *= x / (k + 1);
    }
    t[i] = k;
  }
  return t;
})();

interface Resolution {
  /** Bin width, K: every level of a bin lies within ± width/2 of its centre. */
  width: number;
  /** Bin number floor(θ/width) of each (non-empty) bin, ascending. */
  index: Float64Array;
  /** First level of each bin, and the level count at the end (length bins + 1). */
  start: Int32Array;
  centre: Float64Array;
  /** Half the spread of the bin's levels (0 for a bin holding one energy). */
  halfSpread: Float64Array;
  /** Σ g of this bin and all above it. */
  tail: Float64Array;
  /**
   * Row of the bin in `raw` and `coef`, or −1 for a bin of at most DIRECT_BIN_LEVELS levels, which is
   * always summed level by level and so has no moments.
   */
  slot: Int32Array;
  /** Raw moments M_k = Σ g Δ^k about the centre, RAW per bin with a slot. */
  raw: Float64Array;
  /** Horner coefficients of the three series, 3·TERMS per bin with a slot: M_k/k!, M_{k+1}/k!, M_{k+2}/k!. */
  coef: Float64Array;
}

/** The resolutions of one list, finest first, built only as far as a temperature has needed. */
interface Binned {
  readonly levels: LevelList;
  readonly all: Resolution[];
}

const binned = new WeakMap<LevelList, Binned>();

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
  const n = r.raw.length / RAW;
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

/** Bin numbers, level ranges, centres, spreads, tails and moment slots of the bins of `width` (levels sorted). */
function binsOf(levels: LevelList, width: number): Resolution {
  const { theta, tailWeight } = levels;
  const n = theta.length;
  let count = 0;
  let last = -1;
  for (let i = 0; i < n; i++) {
    const idx = Math.floor(theta[i]! / width);
    if (idx !== last) {
      count++;
      last = idx;
    }
  }
  const index = new Float64Array(count);
  const start = new Int32Array(count + 1);
  const centre = new Float64Array(count);
  const halfSpread = new Float64Array(count);
  const tail = new Float64Array(count);
  const slot = new Int32Array(count);
  let b = -1;
  last = -1;
  for (let i = 0; i < n; i++) {
    const idx = Math.floor(theta[i]! / width);
    if (idx !== last) {
      start[++b] = i;
      index[b] = idx;
      last = idx;
    }
  }
  start[count] = n;
  let slots = 0;
  for (b = 0; b < count; b++) {
    const lo = theta[start[b]!]!;
    const hi = theta[start[b + 1]! - 1]!;
    centre[b] = 0.5 * (lo + hi);
    halfSpread[b] = 0.5 * (hi - lo);
    tail[b] = tailWeight[start[b]!]!;
    slot[b] = start[b + 1]! - start[b]! > DIRECT_BIN_LEVELS ? slots++ : -1;
  }
  return {
    width,
    index,
    start,
    centre,
    halfSpread,
    tail,
    slot,
    raw: new Float64Array(slots * RAW),
    coef: new Float64Array(slots * 3 * TERMS),
  };
}

/** Add the raw moments about `c` of levels from … to − 1 into raw[m …]: RAW multiply-adds per level. */
function addLevelMoments(levels: LevelList, from: number, to: number, c: number, raw: Float64Array, m: number): void {
  const { theta, weight } = levels;
  for (let i = from; i < to; i++) {
    const d = theta[i]! - c;
    let p = weight[i]!;
    for (let k = 0; k < RAW; k++) {
      raw[m + k]! += p;
      p *= d;
    }
  }
}

/**
 * Raw moments of every bin of `r` with a slot. Each part of a bin comes from its levels, or — for a
 * child bin of the next finer resolution `fine` that has moments and more than CHILD_SHIFT_LEVELS
 * levels — by the exact binomial shift of the child's moments to the new centre:
 * Σ g (Δ' + s)^k = Σ_j C(k, j) s^{k−j} M'_j, s = child centre − parent centre, RAW(RAW+1)/2 multiply-adds
 * per child against RAW per level (so a sparse rotor ladder is summed from its levels, a diatomic's ten
 * thousand levels from its children). Either is exact up to rounding, and the choice depends on the list
 * alone.
 */
function fillMoments(levels: LevelList, fine: Resolution | undefined, r: Resolution): void {
  const powers = new Float64Array(RAW);
  let child = 0;
  for (let b = 0; b < r.centre.length; b++) {
    const row = r.slot[b]!;
    const from = r.start[b]!;
    const to = r.start[b + 1]!;
    if (row < 0) continue;
    const c = r.centre[b]!;
    const m = row * RAW;
    if (fine === undefined) {
      addLevelMoments(levels, from, to, c, r.raw, m);
      continue;
    }
    while (fine.start[child]! < from) child++;
    for (; child < fine.centre.length && fine.start[child]! < to; child++) {
      const cf = fine.start[child]!;
      const ct = fine.start[child + 1]!;
      const fineRow = fine.slot[child]!;
      if (fineRow < 0 || ct - cf <= CHILD_SHIFT_LEVELS) {
        addLevelMoments(levels, cf, ct, c, r.raw, m);
        continue;
      }
      const s = fine.centre[child]! - c;
      powers[0] = 1;
      for (let k = 1; k < RAW; k++) powers[k] = powers[k - 1]! * s;
      const cm = fineRow * RAW;
      for (let k = 0; k < RAW; k++) {
        let sum = 0;
        for (let j = 0; j <= k; j++) sum += BINOMIAL[k * RAW + j]! * powers[k - j]! * fine.raw[cm + j]!;
        r.raw[m + k]! += sum;
      }
    }
  }
}

/**
 * Resolution `level` (width FINEST_WIDTH·2^level, or the last one if the list fits fewer), building the
 * missing ones (moments: `fillMoments`).
 */
function resolutionAt(b: Binned, level: number): Resolution {
  const { levels, all } = b;
  while (all.length <= level) {
    const fine = all[all.length - 1];
    if (fine !== undefined && fine.centre.length <= 1) break;
    const width = FINEST_WIDTH * 2 ** all.length;
    const r = binsOf(levels, width);
    fillMoments(levels, fine, r);
    fillCoefficients(r);
    all.push(r);
  }
  return all[Math.min(level, all.length - 1)]!;
}

function binnedOf(levels: LevelList): Binned {
  let b = binned.get(levels);
  if (!b) binned.set(levels, (b = { levels, all: [] }));
  return b;
}

/** Binned sum at one temperature (T ≥ FINEST_WIDTH/2); adds ln q, ⟨u⟩, var u at index j. */
function addBinnedAt(b: Binned, invT: number, T: number, into: GridMoments, j: number): void {
  let level = Math.max(0, Math.floor(Math.log2((2 * T) / FINEST_WIDTH)));
  while (level > 0 && FINEST_WIDTH * 2 ** level > 2 * T) level--;
  const r = resolutionAt(b, level);
  const { theta, weight } = b.levels;
  const n = r.centre.length;
  const z = -invT;
  let q = 0;
  let s1 = 0;
  let s2 = 0;
  for (let bin = 0; bin < n; bin++) {
    const c = r.centre[bin]!;
    const h = r.halfSpread[bin]!;
    // Lowest level of the bin is ≥ c − h, so its factor is ≤ e^{−(c−h)/T}, within e of the centre's.
    const uLow = (c - h) * invT;
    let e = -1;
    if (uLow > 20) {
      e = expNeg(c * invT);
      if (e === 0 || r.tail[bin]! * e * Math.E * (1 + uLow * uLow) < TAIL_CUTOFF * q) break;
    }
    const from = r.start[bin]!;
    const count = r.start[bin + 1]! - from;
    const x = h * invT;
    const degree = DEGREE_FOR[Math.min(DEGREE_STEPS - 1, Math.floor(x * DEGREE_STEPS))]!;
    const row = r.slot[bin]!;
    if (row < 0 || (h !== 0 && count * DIRECT_LEVEL_COST <= DIRECT_LEVEL_COST + degree + 1)) {
      // Few levels: their own exponentials are cheaper than the bin's series (same sums, no truncation).
      for (let i = from; i < from + count; i++) {
        const t = theta[i]!;
        const w = weight[i]! * expNeg(t * invT);
        q += w;
        const wt = w * t;
        s1 += wt;
        s2 += wt * t;
      }
      continue;
    }
    if (e < 0) e = expNeg(c * invT);
    if (e === 0) break; // sorted: every later bin underflows too
    const o = row * 3 * TERMS;
    let a: number;
    let bb: number;
    let cc: number;
    if (h === 0) {
      a = r.coef[o]!;
      bb = 0;
      cc = 0;
    } else {
      a = r.coef[o + degree]!;
      bb = r.coef[o + TERMS + degree]!;
      cc = r.coef[o + 2 * TERMS + degree]!;
      for (let k = degree - 1; k >= 0; k--) {
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
 * comment for the method, its accuracy and the pruning bound). Pure: the bins are built the first time a
 * temperature needs them and remembered (weakly) with the list; the method at each temperature depends
 * on the list and that temperature only, so a one-point grid gives the same numbers as a long one.
 */
export function addLevelSumGrid(levels: LevelList, grid: TemperatureGrid, into: GridMoments): void {
  const { T, invT } = grid;
  if (levels.theta.length <= DIRECT_LIMIT) {
    for (let j = 0; j < T.length; j++) addDirectLevelSum(levels, T[j]!, into, j);
    return;
  }
  const b = binnedOf(levels);
  for (let j = 0; j < T.length; j++) {
    const t = T[j]!;
    if (2 * t < FINEST_WIDTH) addDirectLevelSum(levels, t, into, j);
    else addBinnedAt(b, invT[j]!, t, into, j);
  }
}
