/**
 * Checks of a finished fit. Every breach becomes a FitViolation whose message names the quantity, where
 * (range and temperature) and by how much. Checks:
 *  1. max |fit − sample| of Cp/R, H/RT, S/R per range ≤ tolerances.cp / .h / .s (samples outside
 *     [tLow, tHigh] are ignored; a sample at tMid is checked against both sets);
 *  2. continuity at tMid of Cp/R, H/RT, S/R and of the dimensionless derivatives tMid·dCp/dT (and
 *     tMid²·d²Cp/dT² when tolerances.continuityOrder = 2) ≤ tolerances.continuity;
 *     anchor residuals of H/RT and S/R ≤ tolerances.continuity;
 *  3. Cp/R > 0, and Cp/R ≥ 5/2 − tolerances.cp (an ideal gas has Cv ≥ 3R/2 from translation and every other
 *     contribution is an energy variance ≥ 0, so Cp/R ≥ 5/2; McQuarrie, Statistical Mechanics, 1976,
 *     ch. 3) on a grid of step ≤ 5 K over [tLow − 100 K, tHigh + 100 K];
 *  4. smoothness inside the range: the number of direction reversals of the fitted Cp/R, counted with a
 *     hysteresis (zigzag) filter — a reversal counts only once Cp/R has moved back by more than an
 *     amplitude δ — must not exceed the number of reversals the samples show under the same filter, with
 *     δ = max(tolerances.smoothness, 2 E), E the fit's own max |ΔCp/R| at the samples. Why 2 E: if the data
 *     is monotone and the fit stays within ±E of it, the fit can reverse by up to 2 E without any defect
 *     (the error check bounds E separately); a larger reversal is structure the data does not have, e.g.
 *     between samples. The extra reversals farthest from any reversal of the data are reported. The
 *     hysteresis keeps real structure in the data (the Cp maximum of an atom with low-lying levels) from
 *     counting against the fit.
 *  5. smoothness beyond the ends: within `extrapolation` K beyond each end, walking outward, the fitted
 *     Cp/R must not turn back against the direction it has at the end by more than
 *     tolerances.extrapolationSmoothness. Continuing a trend (even a steep one) is not a turn-over — the
 *     positivity checks above bound a plunge; a quartic that bends round just past the end is.
 *     (A first version counted reversals over the extended span against the data's; it failed NO, whose
 *     real Cp minimum near 300 K is shallow inside the range but deep once the fit, correctly, keeps rising
 *     below 200 K.)
 *     Measured on closed-form RRHO data (test/src/nasa7): careful fits of N2, CH4, H2O turn over by
 *     ≈ 0.006–0.06 in Cp/R near the ends (CH4: 0.055 at 5540–6000 K with E = 0.083) — the form's floor.
 *  6. departure beyond the ends: at computed points just outside the range (the caller's extrapolation
 *     samples, e.g. every 5 K over the 20 K below T_low and every 20 K over the 100 K above T_high — the
 *     partition functions are valid there), |fitted − computed| Cp/R ≤ extrapolationDeparture × the Cp
 *     limit at that point (limits.ts, from the computed Cp/R). Rules 3 and 5 bound the fit's shape; this
 *     one bounds where it goes, so a fit that leaves the physics just past its end (a quartic that is
 *     still rising and smooth but away from the true Cp) is caught. Why 3×: a fit inside its limit at the
 *     end and following the data's slope stays well within it over these short zones; 3× leaves room for
 *     the form's natural drift while a genuine turn-away exceeds it. Measured with default settings (worst
 *     departure as a fraction of this limit): demo database worst 0.22 (CH3OH at 6100 K); 205 closed-form
 *     RRHO species (seeded synthetic set, propane, benzene, n-C7, n-C16, n-C30) median 0.33, 90th
 *     percentile 0.45, max 0.63 (benzene at 180 K). Extrapolation samples never enter the fit.
 */
import { cpDerivative, cpSecondDerivative, evaluateRange } from './evaluate.js';
import { DEFAULT_FIT_LIMITS, limitAt, limitPart } from './limits.js';
import { lnOfSampleTemperatures } from './log-temperatures.js';
import type { Coefficients7, FitResult, FitSample, Nasa7Polynomial } from './types.js';

export interface FitTolerances {
  /** Absolute part of the |ΔCp/R| limit (limits.ts: limit = max(cp, perCp.cp · Cp/R)). */
  cp: number;
  /** Absolute part of the |Δ(H/RT)| limit. */
  h: number;
  /** Absolute part of the |ΔS/R| limit. */
  s: number;
  /** Size-scaled parts: multiples of the computed Cp/R at the same temperature. */
  perCp: { cp: number; h: number; s: number };
  /** Max continuity / anchor residual (dimensionless). */
  continuity: number;
  /** Least hysteresis amplitude (in Cp/R) of the reversal count inside [tLow, tHigh] (see rule 4). */
  smoothness: number;
  /** Least hysteresis amplitude (in Cp/R) over the range extended by `extrapolation` (see rule 4). */
  extrapolationSmoothness: number;
  /** 2 → also check d²Cp/dT² continuity (when the fit was made with continuityOrder 2). */
  continuityOrder: 1 | 2;
  /** How far above the high end Cp is checked, K. */
  extrapolation: number;
  /** How far below the low end Cp is checked, K (20 K: a large molecule's Cp falls fast at low T). */
  extrapolationBelow: number;
  /** Allowed |fitted − computed| Cp/R at the extrapolation samples, as a multiple of the Cp limit there (rule 6). */
  extrapolationDeparture: number;
  /**
   * Least Cp/R of the structure's classical limit: 5/2 atom, 7/2 linear, 4 nonlinear (translation plus
   * fully excited rotation; vibration only adds). The floor checked is min(this, least computed Cp/R)
   * less the Cp limit there, so a quantum rotor below its classical limit (H2 near 200 K) is not flagged.
   */
  cpFloor: number;
}

/**
 * Defaults (project choices, above the form's floor of ≈ 0.012 (N2) to ≈ 0.08 (harmonic CH4) in Cp/R).
 */
export const DEFAULT_FIT_TOLERANCES: Readonly<FitTolerances> = Object.freeze({
  cp: DEFAULT_FIT_LIMITS.cp.absolute,
  h: DEFAULT_FIT_LIMITS.h.absolute,
  s: DEFAULT_FIT_LIMITS.s.absolute,
  perCp: Object.freeze({ cp: DEFAULT_FIT_LIMITS.cp.perCp, h: DEFAULT_FIT_LIMITS.h.perCp, s: DEFAULT_FIT_LIMITS.s.perCp }),
  continuity: 1e-8,
  smoothness: 0.02,
  extrapolationSmoothness: 0.1,
  continuityOrder: 1,
  extrapolation: 100,
  extrapolationBelow: 20,
  extrapolationDeparture: 3,
  cpFloor: 2.5,
});

export type FitViolationQuantity =
  | 'cp'
  | 'h'
  | 's'
  | 'continuity-cp'
  | 'continuity-dcp'
  | 'continuity-d2cp'
  | 'continuity-h'
  | 'continuity-s'
  | 'anchor-h'
  | 'anchor-s'
  | 'cp-positive'
  | 'cp-wiggle'
  | 'extrapolation-departs';

export interface FitViolation {
  quantity: FitViolationQuantity;
  /** 'mid' for continuity at tMid (and the anchor residuals, which belong to the low set: 'low'). */
  range: 'low' | 'high' | 'extrapolation' | 'mid';
  /** K */
  T: number;
  /** The offending value (an error, residual, Cp/R or a reversal count). */
  value: number;
  limit: number;
  /** For the error checks (cp, h, s): which part set the limit at T, and the computed Cp/R there. */
  limitPart?: 'absolute' | 'perCp';
  cpR?: number;
  message: string;
}

const QUANTITY_LABEL = { cp: 'Cp/R', h: 'H/RT', s: 'S/R' } as const;

const fmt = (x: number): string => (x !== 0 && (Math.abs(x) < 1e-3 || Math.abs(x) >= 1e5) ? x.toExponential(3) : String(Number(x.toPrecision(4))));

function normaliseTolerances(t: Partial<FitTolerances> | undefined): FitTolerances {
  const out: FitTolerances = { ...DEFAULT_FIT_TOLERANCES, perCp: { ...DEFAULT_FIT_TOLERANCES.perCp } };
  for (const [k, v] of Object.entries(t ?? {})) if (v !== undefined) (out as unknown as Record<string, unknown>)[k] = v;
  return out;
}

/** What to try when a fit misses its limits (the pipeline adds where each limit was set). */
const ERROR_REMEDY =
  'if the computed data are right, widen this species\' limits (tolerances in its own file), narrow its temperature_ranges, or move or search its midpoint (fit.optimise_mid)';

/** Cp/R of one coefficient set at T: evaluate.ts `evaluateRange(c, T).cpR`, the same operations. */
function cpOf(c: Readonly<Coefficients7>, T: number): number {
  return c[0] + T * (c[1] + T * (c[2] + T * (c[3] + T * c[4])));
}

/** Cp/R of the polynomial at T (evaluate.ts `evaluateNasa7(poly, T).cpR`, the same operations). */
function cpAt(poly: Nasa7Polynomial, T: number): number {
  return cpOf(T <= poly.tMid ? poly.low : poly.high, T);
}

/**
 * Scratch columns of the checks (sample columns, check temperatures, the fit's Cp/R there, the points
 * inside the range, the samples in range): module-level and grown as needed, each written in full up to
 * the length a check uses before it reads them, and never kept past one call. One check runs at a time
 * (no check calls another while it holds a column it still reads, except as noted where they nest).
 */
const scratch: Record<ScratchName, Float64Array> = {
  T: new Float64Array(0),
  cpR: new Float64Array(0),
  hRT: new Float64Array(0),
  sR: new Float64Array(0),
  checkT: new Float64Array(0),
  checkCp: new Float64Array(0),
  insideT: new Float64Array(0),
  insideCp: new Float64Array(0),
  dataT: new Float64Array(0),
  dataCp: new Float64Array(0),
};
type ScratchName = 'T' | 'cpR' | 'hRT' | 'sR' | 'checkT' | 'checkCp' | 'insideT' | 'insideCp' | 'dataT' | 'dataCp';

/** A copy of the first n doubles of a scratch column (for tests: what the last check wrote there). */
export function scratchView(name: 'checkT' | 'dataT' | 'dataCp', n: number): Float64Array {
  return scratch[name].slice(0, n);
}

/** A scratch column of at least n doubles (its contents are whatever the last user left: write before reading). */
function scratchColumn(name: ScratchName, n: number): Float64Array {
  if (scratch[name].length < n) scratch[name] = new Float64Array(Math.max(n, 2 * scratch[name].length));
  return scratch[name];
}

/** Rule 1 (see the module comment); exported for the same-doubles test, like shapeChecks. */
export function errorChecks(poly: Nasa7Polynomial, samples: readonly FitSample[], tol: FitTolerances, out: FitViolation[]): void {
  // ln T of every sample, shared between species on one grid (log-temperatures.ts: Math.log's doubles).
  const lnT = lnOfSampleTemperatures(samples);
  // The parts of the three limits (limits.ts `limitAt`: max(absolute, perCp · Cp/R), the same call).
  const absC = tol.cp, perC = tol.perCp.cp, absH = tol.h, perH = tol.perCp.h, absS = tol.s, perS = tol.perCp.s; // prettier-ignore
  // The samples as columns (scratch, written here in full): the loop below then reads doubles from typed
  // arrays, not boxed fields of sample objects (it allocated ~50 bytes per sample before).
  const n = samples.length;
  const colT = scratchColumn('T', n);
  const colCp = scratchColumn('cpR', n);
  const colH = scratchColumn('hRT', n);
  const colS = scratchColumn('sR', n);
  for (let i = 0; i < n; i++) {
    const smp = samples[i]!;
    colT[i] = smp.T;
    colCp[i] = smp.cpR;
    colH[i] = smp.hRT;
    colS[i] = smp.sR;
  }
  for (let r = 0; r < 2; r++) {
    const range = r === 0 ? 'low' : 'high';
    const from = r === 0 ? poly.tLow : poly.tMid;
    const to = r === 0 ? poly.tMid : poly.tHigh;
    const coeffs = r === 0 ? poly.low : poly.high;
    const a1 = coeffs[0], a2 = coeffs[1], a3 = coeffs[2], a4 = coeffs[3], a5 = coeffs[4], a6 = coeffs[5], a7 = coeffs[6]; // prettier-ignore
    // evaluate.ts evaluateRange's quotients, formed once (the same doubles at every T).
    const h2 = a2 / 2, h3 = a3 / 3, h4 = a4 / 4, h5 = a5 / 5, s3 = a3 / 2, s4 = a4 / 3, s5 = a5 / 4; // prettier-ignore
    // Worst error relative to its limit, per quantity (cp, h, s): ratio, error, T, computed Cp/R. The first
    // sample in range is always taken (its T is not NaN), then only a larger ratio.
    let rc = -1, ec = 0, tc = NaN, cc = NaN; // prettier-ignore
    let rh = -1, eh = 0, th = NaN, ch = NaN; // prettier-ignore
    let rs = -1, es = 0, ts = NaN, cs = NaN; // prettier-ignore
    for (let i = 0; i < n; i++) {
      const T = colT[i]!;
      if (!(T >= from && T <= to)) continue;
      const c = colCp[i]!;
      // Errors are |·| (≥ 0 or NaN), so `x < Infinity` is Number.isFinite(x); written so because
      // `Number.isFinite(x) ? x : Infinity` made the optimised loop box x (~50 bytes per sample, measured).
      const cpR = a1 + T * (a2 + T * (a3 + T * (a4 + T * a5)));
      const hRT = a1 + T * (h2 + T * (h3 + T * (h4 + T * h5))) + a6 / T;
      const sR = a1 * lnT[i]! + T * (a2 + T * (s3 + T * (s4 + T * s5))) + a7;
      const xc = Math.abs(cpR - c);
      const yc = xc < Infinity ? xc : Infinity;
      const qc = yc / Math.max(absC, perC * c);
      if (qc > rc || Number.isNaN(tc)) {
        rc = qc;
        ec = yc;
        tc = T;
        cc = c;
      }
      const xh = Math.abs(hRT - colH[i]!);
      const yh = xh < Infinity ? xh : Infinity;
      const qh = yh / Math.max(absH, perH * c);
      if (qh > rh || Number.isNaN(th)) {
        rh = qh;
        eh = yh;
        th = T;
        ch = c;
      }
      const xs = Math.abs(sR - colS[i]!);
      const ys = xs < Infinity ? xs : Infinity;
      const qs = ys / Math.max(absS, perS * c);
      if (qs > rs || Number.isNaN(ts)) {
        rs = qs;
        es = ys;
        ts = T;
        cs = c;
      }
    }
    const worst = {
      cp: { ratio: rc, err: ec, T: tc, cpR: cc },
      h: { ratio: rh, err: eh, T: th, cpR: ch },
      s: { ratio: rs, err: es, T: ts, cpR: cs },
    };
    for (const q of ['cp', 'h', 's'] as const) {
      const { ratio, err, T, cpR } = worst[q];
      if (ratio > 1) {
        const spec = { absolute: tol[q], perCp: tol.perCp[q] };
        const limit = limitAt(spec, cpR);
        const part = limitPart(spec, cpR);
        const setBy = part === 'perCp' ? `${fmt(tol.perCp[q])} × Cp/R ${fmt(cpR)} (the size-scaled part)` : `the absolute part ${fmt(tol[q])}`;
        out.push({
          quantity: q,
          range,
          T,
          value: err,
          limit,
          limitPart: part,
          cpR,
          message: `${QUANTITY_LABEL[q]} fit error ${fmt(err)} at ${T} K (${range} range ${from}–${to} K) is ${fmt(ratio)} × its limit ${fmt(limit)}, set there by ${setBy}; ${ERROR_REMEDY}`,
        });
      }
    }
  }
}

function continuityChecks(result: FitResult, tol: FitTolerances, out: FitViolation[]): void {
  const poly = result.polynomial;
  const t = poly.tMid;
  const lo = evaluateRange(poly.low, t);
  const hi = evaluateRange(poly.high, t);
  const items: Array<[FitViolationQuantity, string, number]> = [
    ['continuity-cp', 'Cp/R', Math.abs(lo.cpR - hi.cpR)],
    ['continuity-dcp', 'T·d(Cp/R)/dT', t * Math.abs(cpDerivative(poly.low, t) - cpDerivative(poly.high, t))],
    ['continuity-h', 'H/RT', Math.abs(lo.hRT - hi.hRT)],
    ['continuity-s', 'S/R', Math.abs(lo.sR - hi.sR)],
  ];
  if (tol.continuityOrder === 2) {
    items.splice(2, 0, ['continuity-d2cp', 'T²·d²(Cp/R)/dT²', t * t * Math.abs(cpSecondDerivative(poly.low, t) - cpSecondDerivative(poly.high, t))]);
  }
  for (const [quantity, label, jump] of items) {
    if (!(jump <= tol.continuity)) {
      out.push({
        quantity,
        range: 'mid',
        T: t,
        value: jump,
        limit: tol.continuity,
        message: `${label} jumps by ${fmt(jump)} between the low and high sets at tMid = ${t} K; tolerance ${fmt(tol.continuity)}`,
      });
    }
  }
  for (const [quantity, label, r] of [
    ['anchor-h', 'H/RT', result.metrics.anchor.h],
    ['anchor-s', 'S/R', result.metrics.anchor.s],
  ] as const) {
    if (!(r <= tol.continuity)) {
      out.push({
        quantity,
        range: 'low',
        T: NaN,
        value: r,
        limit: tol.continuity,
        message: `${label} at the anchor temperature misses the computed value by ${fmt(r)}; tolerance ${fmt(tol.continuity)}`,
      });
    }
  }
}

/** Temperatures of the reversals of v(T) under a hysteresis of amplitude delta (zigzag filter). */
export function hysteresisReversals(ts: ArrayLike<number>, vs: ArrayLike<number>, delta: number): number[] {
  const reversals: number[] = [];
  let dir = 0;
  let hiV = -Infinity;
  let hiT = NaN;
  let loV = Infinity;
  let loT = NaN;
  for (let i = 0; i < vs.length; i++) {
    const v = vs[i]!;
    const T = ts[i]!;
    if (v > hiV) {
      hiV = v;
      hiT = T;
    }
    if (v < loV) {
      loV = v;
      loT = T;
    }
    if (dir >= 0 && hiV - v > delta) {
      if (dir > 0) reversals.push(hiT);
      dir = -1;
      loV = v;
      loT = T;
      hiV = v;
      hiT = T;
    } else if (dir <= 0 && v - loV > delta) {
      if (dir < 0) reversals.push(loT);
      dir = 1;
      hiV = v;
      hiT = T;
      loV = v;
      loT = T;
    }
  }
  return reversals;
}

function where(poly: Nasa7Polynomial, T: number): 'low' | 'high' | 'extrapolation' {
  if (T < poly.tLow || T > poly.tHigh) return 'extrapolation';
  return T <= poly.tMid ? 'low' : 'high';
}

/**
 * The check temperatures of shapeChecks: from + (to − from) i / n for i = 0 … n, then tLow, tMid and tHigh
 * unless already there (SameValueZero, as Array.includes), all in ascending order — the array that
 * pushing the three and sorting with (a, b) => a − b gives. The even steps are already ascending (each
 * step of the formula is monotone in i), and a stable sort leaves an ascending run of finite values as it
 * is, so each of the three (finite, and equal to no element) only has to go in after the elements below
 * it. Anything else (a non-finite value, a run found not ascending) takes the push-and-sort itself.
 * Exported for the same-doubles test, like samplesInRange.
 */
export function checkTemperatures(from: number, to: number, n: number, poly: Nasa7Polynomial): number[] {
  const ts: number[] = [];
  for (let i = 0; i <= n; i++) ts.push(from + ((to - from) * i) / n);
  const extra = [poly.tLow, poly.tMid, poly.tHigh];
  let ascending = Number.isFinite(extra[0]) && Number.isFinite(extra[1]) && Number.isFinite(extra[2]);
  for (let i = 0; i < ts.length && ascending; i++) ascending = Number.isFinite(ts[i]) && (i === 0 || ts[i - 1]! <= ts[i]!);
  if (!ascending) {
    for (const T of extra) if (!ts.includes(T)) ts.push(T);
    return ts.sort((a, b) => a - b);
  }
  for (const T of extra) {
    // First index whose value is ≥ T (binary search over the ascending array).
    let lo = 0;
    let hi = ts.length;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (ts[mid]! < T) lo = mid + 1;
      else hi = mid;
    }
    if (lo < ts.length && ts[lo] === T) continue;
    ts.splice(lo, 0, T);
  }
  return ts;
}

/**
 * T and Cp/R of the samples in [tLow, tHigh] in ascending T (a stable sort by T, as
 * `filter(…).sort((a, b) => a.T − b.T)`: samples already in non-decreasing T, as a build passes them, stay in
 * their order, so the sort runs only when they are not), their least Cp/R (the first of equal values, in
 * sample order) and max |cpAt − Cp/R| over them (Math.max: the same double in any order).
 */
export function samplesInRange(poly: Nasa7Polynomial, samples: readonly FitSample[]): { T: number[]; cpR: number[]; leastCp: number; maxCpError: number } {
  const T: number[] = [];
  const cpR: number[] = [];
  let leastCp = Infinity;
  let sorted = true;
  for (const smp of samples) {
    if (!(smp.T >= poly.tLow && smp.T <= poly.tHigh)) continue;
    if (smp.cpR < leastCp) leastCp = smp.cpR;
    if (T.length && !(T[T.length - 1]! <= smp.T)) sorted = false;
    T.push(smp.T);
    cpR.push(smp.cpR);
  }
  let maxCpError = 0;
  if (sorted) {
    for (let i = 0; i < T.length; i++) maxCpError = Math.max(maxCpError, Math.abs(cpAt(poly, T[i]!) - cpR[i]!));
    return { T, cpR, leastCp, maxCpError };
  }
  const data = samples.filter((s) => s.T >= poly.tLow && s.T <= poly.tHigh).sort((a, b) => a.T - b.T);
  for (const s of data) maxCpError = Math.max(maxCpError, Math.abs(cpAt(poly, s.T) - s.cpR));
  return { T: data.map((s) => s.T), cpR: data.map((s) => s.cpR), leastCp, maxCpError };
}

/**
 * `checkTemperatures` written into the scratch column checkT (the same doubles in the same order, by the
 * same steps: the even steps, then each of tLow, tMid, tHigh inserted at its first index ≥ it unless there);
 * returns their count. Inputs that make `checkTemperatures` push and sort take that function itself.
 * Exported for the same-doubles test (with `scratchView`).
 */
export function checkTemperaturesIntoScratch(from: number, to: number, n: number, poly: Nasa7Polynomial): number {
  const extra0 = poly.tLow, extra1 = poly.tMid, extra2 = poly.tHigh; // prettier-ignore
  // n is NaN when the span is not finite: then no even step, as in checkTemperatures' loop.
  let ts = scratchColumn('checkT', (n >= 0 ? n : 0) + 4);
  let ascending = Number.isFinite(extra0) && Number.isFinite(extra1) && Number.isFinite(extra2);
  let count = 0;
  for (let i = 0; i <= n; i++) {
    const T = from + ((to - from) * i) / n;
    ts[i] = T;
    ascending &&= Number.isFinite(T) && (i === 0 || ts[i - 1]! <= T);
    count++;
  }
  if (!ascending) {
    const general = checkTemperatures(from, to, n, poly);
    ts = scratchColumn('checkT', general.length);
    for (let i = 0; i < general.length; i++) ts[i] = general[i]!;
    return general.length;
  }
  for (let k = 0; k < 3; k++) {
    const T = k === 0 ? extra0 : k === 1 ? extra1 : extra2;
    let lo = 0;
    let hi = count;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (ts[mid]! < T) lo = mid + 1;
      else hi = mid;
    }
    if (lo < count && ts[lo] === T) continue;
    ts.copyWithin(lo + 1, lo, count);
    ts[lo] = T;
    count++;
  }
  return count;
}

/**
 * `samplesInRange` with T and Cp/R written into the scratch columns dataT and dataCp (the same doubles in
 * the same order); returns the count, least Cp/R and max Cp error. Samples not in ascending T take
 * `samplesInRange` itself (its sort). Exported for the same-doubles test (with `scratchView`).
 */
export function samplesInRangeIntoScratch(poly: Nasa7Polynomial, samples: readonly FitSample[]): { count: number; leastCp: number; maxCpError: number } {
  let T = scratchColumn('dataT', samples.length);
  let cpR = scratchColumn('dataCp', samples.length);
  let count = 0;
  let leastCp = Infinity;
  let sorted = true;
  for (let i = 0; i < samples.length; i++) {
    const smp = samples[i]!;
    const t = smp.T;
    const c = smp.cpR;
    if (!(t >= poly.tLow && t <= poly.tHigh)) continue;
    if (c < leastCp) leastCp = c;
    if (count > 0 && !(T[count - 1]! <= t)) sorted = false;
    T[count] = t;
    cpR[count] = c;
    count++;
  }
  if (!sorted) {
    const general = samplesInRange(poly, samples);
    T = scratchColumn('dataT', general.T.length);
    cpR = scratchColumn('dataCp', general.T.length);
    for (let i = 0; i < general.T.length; i++) {
      T[i] = general.T[i]!;
      cpR[i] = general.cpR[i]!;
    }
    return { count: general.T.length, leastCp: general.leastCp, maxCpError: general.maxCpError };
  }
  let maxCpError = 0;
  for (let i = 0; i < count; i++) maxCpError = Math.max(maxCpError, Math.abs(cpAt(poly, T[i]!) - cpR[i]!));
  return { count, leastCp, maxCpError };
}

/** Rules 3–5 (see the module comment). */
export function shapeChecks(poly: Nasa7Polynomial, samples: readonly FitSample[], tol: FitTolerances, out: FitViolation[]): void {
  const from = Math.max(poly.tLow - tol.extrapolationBelow, 1);
  const to = poly.tHigh + tol.extrapolation;
  const n = Math.max(2, Math.ceil((to - from) / 5));
  // The check temperatures and the fit's Cp/R at each, evaluated once and reused by every check below
  // (scratch columns: this call writes them first and nothing it calls writes them).
  const count = checkTemperaturesIntoScratch(from, to, n, poly);
  const ts = scratch.checkT;
  const cps = scratchColumn('checkCp', count);
  for (let i = 0; i < count; i++) cps[i] = cpAt(poly, ts[i]!);

  let positive: FitViolation | undefined;
  let floor: FitViolation | undefined;
  // The samples in [tLow, tHigh] in ascending T (T and Cp/R), their least Cp/R (the first of equals), and
  // the fit's max |ΔCp/R| over them, in one pass.
  const data = samplesInRangeIntoScratch(poly, samples);
  const leastData = data.leastCp;
  const floorBase = Math.min(tol.cpFloor, leastData);
  const floorLimit = floorBase - limitAt({ absolute: tol.cp, perCp: tol.perCp.cp }, floorBase);
  for (let i = 0; i < count; i++) {
    const cp = cps[i]!;
    const T = ts[i]!;
    if (!(cp > 0) && !positive) {
      positive = { quantity: 'cp-positive', range: where(poly, T), T, value: cp, limit: 0, message: `Cp/R of the fit is ${fmt(cp)} ≤ 0 at ${fmt(T)} K (${where(poly, T)}); Cp must stay positive` };
    } else if (cp > 0 && cp < floorLimit && (!floor || cp < floor.value)) {
      floor = {
        quantity: 'cp-positive',
        range: where(poly, T),
        T,
        value: cp,
        limit: floorLimit,
        message: `Cp/R of the fit falls to ${fmt(cp)} at ${fmt(T)} K (${where(poly, T)}), ${fmt(floorLimit - cp)} below the floor ${fmt(floorLimit)} (${floorBase === tol.cpFloor ? `the structure's classical minimum ${fmt(tol.cpFloor)}` : `the least computed Cp/R ${fmt(floorBase)}`} less the Cp limit)`,
      };
    }
  }
  if (positive) out.push(positive);
  else if (floor) out.push(floor);

  const inside = scratchColumn('insideT', count);
  const insideCp = scratchColumn('insideCp', count);
  let insideCount = 0;
  for (let i = 0; i < count; i++) {
    const T = ts[i]!;
    if (T >= poly.tLow && T <= poly.tHigh) {
      inside[insideCount] = T;
      insideCp[insideCount] = cps[i]!;
      insideCount++;
    }
  }
  const maxCpError = data.maxCpError;
  const delta = Math.max(tol.smoothness, 2 * maxCpError);
  const dataRev = hysteresisReversals(scratch.dataT.subarray(0, data.count), scratch.dataCp.subarray(0, data.count), delta);
  // A fit within ±E of the data can deepen a data reversal just below δ (not counted there) by up to 2E;
  // a fit reversal is therefore extra only beyond δ + 2E. (Found on minimax fits of O2 and HO2, whose
  // computed Cp/R has a 0.018-deep maximum near 5000–5500 K: the fit turned back by 0.044 with E = 0.013.)
  const fitDelta = delta + 2 * maxCpError;
  const fitRev = hysteresisReversals(inside.subarray(0, insideCount), insideCp.subarray(0, insideCount), fitDelta);
  if (fitRev.length > dataRev.length) {
    const distance = (T: number) => (dataRev.length ? Math.min(...dataRev.map((d) => Math.abs(d - T))) : Infinity);
    const extra = [...fitRev].sort((a, b) => distance(b) - distance(a) || a - b).slice(0, fitRev.length - dataRev.length).sort((a, b) => a - b);
    for (const T of extra) {
      const range = where(poly, T);
      out.push({
        quantity: 'cp-wiggle',
        range,
        T,
        value: fitRev.length,
        limit: dataRev.length,
        message: `Cp/R of the fit turns over at ${fmt(T)} K (${range} range) where the data does not: over ${fmt(poly.tLow)}–${fmt(poly.tHigh)} K the fit reverses direction by more than ${fmt(fitDelta)} in Cp/R ${fitRev.length} time(s), the samples by more than ${fmt(delta)} ${dataRev.length} time(s)`,
      });
    }
  }

  for (const end of ['low', 'high'] as const) {
    const tEnd = end === 'low' ? poly.tLow : poly.tHigh;
    const outward = end === 'low' ? -1 : 1;
    const coeffs = end === 'low' ? poly.low : poly.high;
    // Direction of Cp/R when walking outward from the end (+1 rising, −1 falling, 0 flat → either way).
    const slope = outward * cpDerivative(coeffs, tEnd);
    // Walking outward over ts (ascending and duplicate-free, so walking outward is a walk over indices):
    // downward from the end below tLow, upward above tHigh.
    let best = cpOf(coeffs, tEnd);
    let bestT = tEnd;
    let worstRetreat = 0;
    let worstT = tEnd;
    let worstTurn = tEnd;
    const dir = slope >= 0 ? 1 : -1;
    for (let k = 0; k < count; k++) {
      const i = end === 'low' ? count - 1 - k : k;
      const T = ts[i]!;
      if (!(end === 'low' ? T < tEnd && T >= from : T > tEnd && T <= to)) continue;
      const cp = cps[i]!;
      if (dir * (cp - best) > 0) {
        best = cp;
        bestT = T;
      }
      const retreat = dir * (best - cp);
      if (slope !== 0 && retreat > worstRetreat) {
        worstRetreat = retreat;
        worstT = T;
        worstTurn = bestT;
      }
    }
    const worst = { retreat: worstRetreat, T: worstT, turn: worstTurn };
    // Scaled like the error limits: a large molecule's fit may bend by more in absolute terms.
    const turnLimit = Math.max(tol.extrapolationSmoothness, tol.perCp.cp * cpOf(coeffs, tEnd));
    if (worst.retreat > turnLimit) {
      out.push({
        quantity: 'cp-wiggle',
        range: 'extrapolation',
        T: worst.turn,
        value: worst.retreat,
        limit: turnLimit,
        message: `Cp/R of the fit turns over at ${fmt(worst.turn)} K, ${fmt(Math.abs(worst.turn - tEnd))} K beyond T_${end === 'low' ? 'low' : 'high'} = ${fmt(tEnd)} K, and turns back by ${fmt(worst.retreat)} by ${fmt(worst.T)} K; limit ${fmt(turnLimit)} within ${end === 'low' ? tol.extrapolationBelow : tol.extrapolation} K of the range`,
      });
    }
  }
}

/** What to try when the fit leaves the computed Cp/R just beyond its range. */
const DEPARTURE_REMEDY =
  'the polynomial must not be used there; to cover that temperature, widen this species\' temperature_ranges (the computed values exist there), otherwise move or search its midpoint (fit.optimise_mid) or, if the computed data are right and the departure is acceptable, widen its Cp limits (tolerances in its own file)';

function departureChecks(poly: Nasa7Polynomial, beyond: readonly FitSample[], tol: FitTolerances, out: FitViolation[]): void {
  for (const end of ['low', 'high'] as const) {
    let worst: { ratio: number; T: number; fitted: number; computed: number; err: number; limit: number } | undefined;
    for (const smp of beyond) {
      if (end === 'low' ? !(smp.T < poly.tLow) : !(smp.T > poly.tHigh)) continue;
      const fitted = cpOf(end === 'low' ? poly.low : poly.high, smp.T);
      const err = Number.isFinite(fitted) ? Math.abs(fitted - smp.cpR) : Infinity;
      const limit = tol.extrapolationDeparture * limitAt({ absolute: tol.cp, perCp: tol.perCp.cp }, smp.cpR);
      const ratio = err / limit;
      if (!worst || ratio > worst.ratio) worst = { ratio, T: smp.T, fitted, computed: smp.cpR, err, limit };
    }
    if (!worst || !(worst.ratio > 1)) continue;
    const spec = { absolute: tol.cp, perCp: tol.perCp.cp };
    const part = limitPart(spec, worst.computed);
    const tEnd = end === 'low' ? poly.tLow : poly.tHigh;
    const setBy = part === 'perCp' ? `${fmt(tol.perCp.cp)} × Cp/R, the size-scaled part` : `the absolute part ${fmt(tol.cp)}`;
    out.push({
      quantity: 'extrapolation-departs',
      range: 'extrapolation',
      T: worst.T,
      value: worst.err,
      limit: worst.limit,
      limitPart: part,
      cpR: worst.computed,
      message: `Cp/R of the fit is ${fmt(worst.fitted)} at ${fmt(worst.T)} K, ${fmt(Math.abs(worst.T - tEnd))} K beyond T_${end} = ${fmt(tEnd)} K, where the computed Cp/R is ${fmt(worst.computed)}: it departs by ${fmt(worst.err)}, ${fmt(worst.ratio)} × the limit ${fmt(worst.limit)} (${fmt(tol.extrapolationDeparture)} × the Cp limit ${fmt(limitAt(spec, worst.computed))} there, set by ${setBy}); ${DEPARTURE_REMEDY}`,
    });
  }
}

/**
 * All violations of the tolerances (defaults from DEFAULT_FIT_TOLERANCES for missing fields), in a fixed
 * order: errors (low, high; Cp, H, S), continuity, anchor, positivity, smoothness, departure beyond the
 * ends (low, high). Empty when the fit passes. `beyond`: computed points outside [tLow, tHigh] for rule
 * 6 (points inside are ignored by it; none → rule 6 is not applied).
 */
export function assessFit(
  result: FitResult,
  samples: readonly FitSample[],
  tolerances: Partial<FitTolerances> = {},
  beyond: readonly FitSample[] = [],
): FitViolation[] {
  const tol = normaliseTolerances(tolerances);
  const out: FitViolation[] = [];
  errorChecks(result.polynomial, samples, tol, out);
  continuityChecks(result, tol, out);
  shapeChecks(result.polynomial, samples, tol, out);
  departureChecks(result.polynomial, beyond, tol, out);
  return out;
}
