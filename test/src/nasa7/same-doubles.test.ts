/**
 * The faster forms of the fit's hot paths give the very doubles of their straightforward forms
 * (test/fixtures/nasa7/reference-forms.ts, the code as it stood before): the pipelined Householder solve
 * and the Lawson weight update of minimax.ts, the unrolled band sums of solve.ts, the bound of ls-rank.ts,
 * the remembered option keys of factor-cache.ts and logarithms of log-temperatures.ts, and the error and
 * shape checks of quality.ts (their scratch-column forms included). Equality is bit for bit (every double's
 * IEEE-754 bit pattern, so −0 ≠ +0 and NaN payloads aside every NaN equals NaN). Data: the seeded synthetic set of
 * test/fixtures/nasa7/synthetic-set.ts (our own generator) on closed-form rigid-rotor/harmonic data
 * (synthetic.ts), propane (Shimanouchi 1972, fundamentals from memory), a constructed n-hexadecane, and
 * seeded random matrices written here (mulberry32, bench/synthetic.ts).
 */
import { describe, expect, it } from 'vitest';
import { T_REF } from '../../../src/constants.js';
import { optionKey, temperatureKey } from '../../../src/nasa7/factor-cache.js';
import { constraintRhs } from '../../../src/nasa7/fit-fixed-mid.js';
import { fitNasa7 } from '../../../src/nasa7/fit.js';
import { preparedFactorisation, targetsOf } from '../../../src/nasa7/fit-prepared.js';
import { sampleLimits } from '../../../src/nasa7/limits.js';
import { lnOfSampleTemperatures, lnOfTemperatures } from '../../../src/nasa7/log-temperatures.js';
import { boundAt } from '../../../src/nasa7/ls-rank.js';
import { minimaxReduced, weightedSolve } from '../../../src/nasa7/minimax.js';
import { normaliseFitOptions } from '../../../src/nasa7/options.js';
import { prepareSamples, rangeLists, splitAt } from '../../../src/nasa7/prepared.js';
import {
  checkTemperatures,
  checkTemperaturesIntoScratch,
  DEFAULT_FIT_TOLERANCES,
  errorChecks,
  samplesInRange,
  samplesInRangeIntoScratch,
  scratchView,
  shapeChecks,
  type FitTolerances,
  type FitViolation,
} from '../../../src/nasa7/quality.js';
import { solveFactoredParts, type FactoredProblem } from '../../../src/nasa7/solve.js';
import type { FitResult, FitSample, Nasa7Polynomial } from '../../../src/nasa7/types.js';
import {
  boundAtReference,
  errorChecksReference,
  minimaxReducedReference,
  shapeChecksReference,
  solveFactoredPartsReference,
  weightedSolveReference,
} from '../../fixtures/nasa7/reference-forms.js';
import { constructedAlkane, PROPANE_RRHO, seededRandom, syntheticSpecies } from '../../fixtures/nasa7/synthetic-set.js';
import { grid, rrhoSample, type RrhoModel } from './synthetic.js';

const SEARCH = { min: 700, max: 2500, step: 100 };
const OPTIONS = normaliseFitOptions({ tLow: 200, tMid: 1000, tHigh: 6000, method: 'minimax', optimiseMid: SEARCH });
/** The build's sampling grid: 10 K steps plus 298.15 K (pipeline/core/plan.ts). */
const PLAN_GRID = [...grid(200, 6000, 10), T_REF].sort((a, b) => a - b);

const models: Array<[string, RrhoModel]> = [
  ...syntheticSpecies(40, 20261203).map((s): [string, RrhoModel] => [s.name, s.model]),
  ['propane', PROPANE_RRHO],
  ['n-hexadecane (constructed)', constructedAlkane(16)],
];

function data(model: RrhoModel, temperatures: readonly number[] = PLAN_GRID): { samples: FitSample[]; anchor: FitSample } {
  return { samples: temperatures.map((T) => rrhoSample(model, T)), anchor: rrhoSample(model, T_REF) };
}

/** IEEE-754 bit patterns of doubles, as hex strings (so the comparison sees −0 and every last bit). */
function bits(values: ArrayLike<number>): string[] {
  const view = new DataView(new ArrayBuffer(8));
  return Array.from({ length: values.length }, (_, i) => {
    view.setFloat64(0, values[i]!);
    return view.getBigUint64(0).toString(16);
  });
}

/** Any value with every number replaced by its bit pattern (deep), for toStrictEqual. */
function bitsDeep(value: unknown): unknown {
  if (typeof value === 'number') return bits([value])[0];
  if (ArrayBuffer.isView(value) && !(value instanceof DataView)) return bits(value as unknown as ArrayLike<number>);
  if (Array.isArray(value)) return value.map(bitsDeep);
  if (value && typeof value === 'object') return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, bitsDeep(v)]));
  return value;
}

/** The least-squares start and reduced minimax problem fitPrepared builds at one midpoint (unit weights). */
function problemAt(samples: FitSample[], anchor: FitSample, tMid: number) {
  const p = prepareSamples(samples, anchor, OPTIONS)!;
  const at = { ...OPTIONS, tMid };
  const split = splitAt(p, at)!;
  const f = preparedFactorisation(p, at, temperatureKey(samples), split);
  const y = targetsOf(p, split, OPTIONS.weights);
  const d = constraintRhs(anchor, f.m);
  const ranges = rangeLists(p, split);
  const limits = sampleLimits([...ranges.low, ...ranges.high], OPTIONS.limits);
  return { f, y, d, limits, lowRows: 3 * split.lowEnd };
}

describe('minimax.ts', () => {
  it('weightedSolve equals the textbook Householder order on seeded random problems, zero columns included', () => {
    const rnd = seededRandom(7);
    for (let trial = 0; trial < 300; trial++) {
      const k = 1 + (trial % 9);
      const rows = k + Math.floor(rnd() * 50);
      const b = new Float64Array(rows * k).map(() => rnd() * 2 - 1);
      const c = new Float64Array(rows).map(() => rnd() * 2 - 1);
      // Some problems with exactly zero columns (the no-reflection branch), first, inner or last.
      if (trial % 4 === 1) for (let r = 0; r < rows; r++) b[r * k + (trial % k)] = 0;
      if (trial % 7 === 3) for (let r = 0; r < rows; r++) b[r * k] = 0;
      const count = k + Math.floor(rnd() * (rows - k + 1));
      const active = Int32Array.from({ length: count }, (_, r) => r);
      const s = new Float64Array(count).map(() => rnd());
      const run = (solve: 'fast' | 'reference') => {
        const work = new Float64Array(count * (k + 1));
        const diag = new Float64Array(k);
        const z = new Float64Array(k);
        if (solve === 'fast') weightedSolve(b, c, s, active, count, k, work, diag, z, new Float64Array(k + 1));
        else weightedSolveReference(b, c, s, active, count, k, work, diag, z);
        return { work: bits(work), diag: bits(diag), z: bits(z) };
      };
      expect(run('fast'), `trial ${trial}`).toStrictEqual(run('reference'));
    }
  });

  it('minimaxReduced equals the straightforward Lawson iteration, with and without a cutoff', () => {
    let cuts = 0;
    for (const [name, model] of models) {
      const { samples, anchor } = data(model);
      for (const tMid of [800, 1000, 1600, 2400]) {
        const { f, y, d, limits, lowRows } = problemAt(samples, anchor, tMid);
        const ls = solveFactoredParts(f, y, d, { targets: true });
        const c = ls.targets!;
        const start = ls.solution.z!;
        const free = minimaxReducedReference(f, c, limits, start, 3, lowRows);
        for (const cutoff of [Infinity, free.worst * 0.97, free.worst * 0.5]) {
          const fast = minimaxReduced(f, c, limits, start, 3, lowRows, cutoff);
          const reference = minimaxReducedReference(f, c, limits, start, 3, lowRows, cutoff);
          if (reference.iterations < free.iterations) cuts++;
          expect(bitsDeep(fast), `${name} at ${tMid} K, cutoff ${cutoff}`).toStrictEqual(bitsDeep(reference));
        }
        // Targets of ~1e205: the weight update overflows (|e|^β = Infinity), the branch without skipping.
        const huge = c.map((v) => v * 1e205);
        expect(bitsDeep(minimaxReduced(f, huge, limits, start, 3, lowRows)), `${name} at ${tMid} K, huge`).toStrictEqual(
          bitsDeep(minimaxReducedReference(f, huge, limits, start, 3, lowRows)),
        );
      }
    }
    expect(cuts).toBeGreaterThan(0);
  });
});

describe('solve.ts', () => {
  it('solveFactoredParts equals the looped band sums and reflections', () => {
    for (const [name, model] of models.slice(0, 12)) {
      const { samples, anchor } = data(model);
      for (const tMid of [700, 1300, 2500]) {
        const { f, y, d } = problemAt(samples, anchor, tMid);
        for (const want of [{}, { targets: true, residualNorm: true }, { targets: new Float64Array(y.length) }]) {
          const fast = solveFactoredParts(f, y, d, want);
          const wantRef = want.targets instanceof Float64Array ? { targets: new Float64Array(y.length) } : want;
          expect(bitsDeep(fast), `${name} at ${tMid} K`).toStrictEqual(bitsDeep(solveFactoredPartsReference(f, y, d, wantRef)));
        }
      }
    }
  });

  it('rows of other widths than 5–7 take the loop (a hand-made band of widths 1–9)', () => {
    const { samples, anchor } = data(PROPANE_RRHO);
    const { f, y, d } = problemAt(samples, anchor, 1000);
    // The same factorisation with each row's band cut to a width 1–9 (entries beyond the cut zeroed, and
    // rowEnd moved), so the unrolled and looped sums both run; the rest of f is left as it is.
    const widened: FactoredProblem = { ...f, rowFirst: f.rowFirst.slice(), rowEnd: f.rowEnd.slice(), band: f.band.slice() };
    for (let row = 0; row < f.rowCount; row++) {
      const width = Math.min(1 + (row % 9), f.bandWidth, f.n - f.rowFirst[row]!);
      for (let j = width; j < f.bandWidth; j++) widened.band[row * f.bandWidth + j] = 0;
      widened.rowEnd[row] = f.rowFirst[row]! + width;
    }
    expect(bitsDeep(solveFactoredParts(widened, y, d, { targets: true, residualNorm: true }))).toStrictEqual(
      bitsDeep(solveFactoredPartsReference(widened, y, d, { targets: true, residualNorm: true })),
    );
  });
});

describe('ls-rank.ts', () => {
  it('boundAt equals the form reading t from its array (k = 8 and other k)', () => {
    const rnd = seededRandom(11);
    for (const k of [8, 5, 8, 9, 8]) {
      const samples = 40;
      const b = new Float64Array(3 * samples * k).map(() => rnd() * 2 - 1);
      const t = new Float64Array(64).map(() => rnd() * 10 - 5);
      const yp = new Float64Array(3 * samples).map(() => rnd() * 4 - 2);
      const divisor = new Float64Array(3 * samples).map(() => 0.01 + rnd());
      for (let i = 0; i < samples; i++) {
        expect(bits([boundAt(b, k, t, yp, divisor, i, 3 * i)])).toStrictEqual(bits([boundAtReference(b, k, t, yp, divisor, i, 3 * i)]));
      }
    }
  });
});

describe('factor-cache.ts', () => {
  it('a remembered option key is the string a fresh one would be', () => {
    const fresh = (w: { cp: number; h: number; s: number }, a: number, t: number, o: number) => `${w.cp}|${w.h}|${w.s}|${a}|${t}|${o}`;
    const cases: Array<[{ cp: number; h: number; s: number }, number, number, 1 | 2]> = [];
    for (const w of [{ cp: 1, h: 1, s: 1 }, { cp: 2, h: 0.5, s: 1 }, { cp: -0, h: 1, s: NaN }]) {
      for (const tMid of [700, 1000, 0, -0, NaN, 1e-7, 2500]) for (const o of [1, 2] as const) cases.push([w, T_REF, tMid, o]);
    }
    // Twice over, interleaved, so keys come both fresh and remembered.
    for (const [w, a, t, o] of [...cases, ...cases.reverse(), ...cases]) {
      expect(optionKey(w, { temperatures: 'x', weights: w, anchorT: a, tMid: t, continuityOrder: o })).toBe(fresh(w, a, t, o));
    }
  });
});

describe('log-temperatures.ts', () => {
  it('remembered logarithms are Math.log of each T, across grid changes, and earlier arrays stay valid', () => {
    const grids = [PLAN_GRID, grid(200, 6000, 10), PLAN_GRID, [300, -0, 0, NaN, Infinity, 1e-300], PLAN_GRID.slice(0, 5)];
    const kept: Array<[readonly number[], Float64Array]> = [];
    for (const temperatures of [...grids, ...grids]) {
      const fromArray = lnOfTemperatures(Float64Array.from(temperatures));
      const fromSamples = lnOfSampleTemperatures(temperatures.map((T) => ({ T, cpR: 4, hRT: 4, sR: 20 })));
      const expected = bits(temperatures.map((T) => Math.log(T)));
      expect(bits(fromArray)).toStrictEqual(expected);
      expect(bits(fromSamples)).toStrictEqual(expected);
      kept.push([temperatures, fromArray]);
    }
    for (const [temperatures, lnT] of kept) expect(bits(lnT)).toStrictEqual(bits(temperatures.map((T) => Math.log(T))));
  });
});

describe('quality.ts', () => {
  const tight: FitTolerances = {
    ...DEFAULT_FIT_TOLERANCES,
    cp: 0.002,
    h: 0.0003,
    s: 0.0003,
    perCp: { cp: 0, h: 0, s: 0 },
    smoothness: 1e-4,
    extrapolationSmoothness: 1e-3,
    extrapolation: 400,
    extrapolationBelow: 150,
    cpFloor: 30,
  };
  const variants: Array<[string, FitTolerances]> = [
    ['default tolerances', { ...DEFAULT_FIT_TOLERANCES, perCp: { ...DEFAULT_FIT_TOLERANCES.perCp } }],
    ['tight tolerances (every check reports)', tight],
    ['non-finite extrapolation span (the push-and-sort branch)', { ...tight, extrapolation: NaN }],
  ];

  function compare(poly: Nasa7Polynomial, samples: readonly FitSample[], tol: FitTolerances, label: string): number {
    const fast: FitViolation[] = [];
    const reference: FitViolation[] = [];
    errorChecks(poly, samples, tol, fast);
    errorChecksReference(poly, samples, tol, reference);
    shapeChecks(poly, samples, tol, fast);
    shapeChecksReference(poly, samples, tol, reference);
    expect(bitsDeep(fast), label).toStrictEqual(bitsDeep(reference));
    return reference.length;
  }

  it('error and shape checks equal the straightforward forms on fits of the synthetic set', () => {
    let reported = 0;
    for (const [name, model] of models) {
      const { samples, anchor } = data(model);
      const fit: FitResult = fitNasa7(samples, anchor, OPTIONS);
      // The build's order, the samples reversed (the sort branch), and a few samples that are out of the
      // range or not finite (skipped alike).
      const odd = [...samples.slice(0, 50), { T: NaN, cpR: 5, hRT: 5, sR: 30 }, { T: 7000, cpR: 5, hRT: 5, sR: 30 }, { T: 400, cpR: NaN, hRT: 1, sR: Infinity }];
      for (const list of [samples, [...samples].reverse(), odd]) {
        for (const [variant, tol] of variants) reported += compare(fit.polynomial, list, tol, `${name}, ${variant}`);
      }
    }
    expect(reported).toBeGreaterThan(100);
  });

  it('check temperatures: the array push-and-sort gives, for ends on, between and beyond the even steps', () => {
    const rnd = seededRandom(5);
    const cases: Array<[number, number, number, [number, number, number]]> = [
      [180, 6100, 1184, [200, 1000, 6000]],
      [180, 6100, 1184, [180, 1000, 6100]],
      [1, 300, 60, [1, 1, 300]],
      [180, 6100, 1184, [200, 200.0000001, 6000]],
      [180, 6100, 2, [100, 7000, 3000]],
      [180, 6100, 1184, [NaN, 1000, 6000]],
      [NaN, 6100, 5, [200, 1000, 6000]],
      [180, 6100, 1184, [-0, 0, 6100]],
    ];
    for (let i = 0; i < 200; i++) {
      const from = 1 + rnd() * 500;
      const to = from + 1 + rnd() * 6000;
      const at = (u: number) => (u < 0.3 ? from + ((to - from) * Math.floor(u * 40)) / 40 : from + (to - from) * rnd());
      cases.push([from, to, 40, [at(rnd()), at(rnd()), at(rnd())]]);
    }
    for (const [from, to, n, [tLow, tMid, tHigh]] of cases) {
      const reference: number[] = [];
      for (let i = 0; i <= n; i++) reference.push(from + ((to - from) * i) / n);
      for (const T of [tLow, tMid, tHigh]) if (!reference.includes(T)) reference.push(T);
      reference.sort((a, b) => a - b);
      const poly = { tLow, tMid, tHigh, low: [0, 0, 0, 0, 0, 0, 0], high: [0, 0, 0, 0, 0, 0, 0] } as unknown as Nasa7Polynomial;
      expect(bits(checkTemperatures(from, to, n, poly)), `${from} ${to} ${n} ${tLow} ${tMid} ${tHigh}`).toStrictEqual(bits(reference));
      // The scratch-column form shapeChecks uses: the same doubles, written over whatever the last call left.
      const count = checkTemperaturesIntoScratch(from, to, n, poly);
      expect(bits(scratchView('checkT', count)), `scratch ${from} ${to} ${n} ${tLow} ${tMid} ${tHigh}`).toStrictEqual(bits(reference));
    }
  });

  it('samples in range: filter-and-sort order, least Cp/R and max Cp error, sorted or not', () => {
    const { samples, anchor } = data(PROPANE_RRHO);
    const poly = fitNasa7(samples, anchor, OPTIONS).polynomial;
    const cpAt = (T: number) => {
      const c = T <= poly.tMid ? poly.low : poly.high;
      return c[0] + T * (c[1] + T * (c[2] + T * (c[3] + T * c[4])));
    };
    const rnd = seededRandom(3);
    const shuffled = [...samples].sort(() => rnd() - 0.5);
    const ties = samples.flatMap((s) => [s, { ...s, cpR: s.cpR + 1e-3 }]);
    for (const list of [samples, [...samples].reverse(), shuffled, ties, [...ties].reverse(), []]) {
      const inRange = list.filter((s) => s.T >= poly.tLow && s.T <= poly.tHigh);
      let leastCp = Infinity;
      for (const s of list) if (s.T >= poly.tLow && s.T <= poly.tHigh && s.cpR < leastCp) leastCp = s.cpR;
      const sorted = [...inRange].sort((a, b) => a.T - b.T);
      let maxCpError = 0;
      for (const s of sorted) maxCpError = Math.max(maxCpError, Math.abs(cpAt(s.T) - s.cpR));
      const got = samplesInRange(poly, list);
      expect(bitsDeep(got)).toStrictEqual(bitsDeep({ T: sorted.map((s) => s.T), cpR: sorted.map((s) => s.cpR), leastCp, maxCpError }));
      const c = samplesInRangeIntoScratch(poly, list);
      const scratchForm = { T: [...scratchView('dataT', c.count)], cpR: [...scratchView('dataCp', c.count)], leastCp: c.leastCp, maxCpError: c.maxCpError };
      expect(bitsDeep(scratchForm)).toStrictEqual(bitsDeep({ T: sorted.map((s) => s.T), cpR: sorted.map((s) => s.cpR), leastCp, maxCpError }));
    }
  });

  it('equal the straightforward forms where tMid or the range ends fall on or between check points', () => {
    const { samples, anchor } = data(PROPANE_RRHO);
    const base = fitNasa7(samples, anchor, OPTIONS).polynomial;
    const bent = (d: number): Nasa7Polynomial => ({ ...base, low: [...base.low.slice(0, 4), base.low[4] + d, ...base.low.slice(5)] as Nasa7Polynomial['low'] });
    const ranges: Array<[number, number, number]> = [[200, 1000, 6000], [200, 1002.5, 6000], [180, 1000, 6100], [201.3, 1333.7, 5999.9], [200, 200, 6000], [200, 6000, 6000]];
    for (const [tLow, tMid, tHigh] of ranges) {
      for (const poly of [base, bent(1e-13), bent(-1e-12)]) {
        const moved = { ...poly, tLow, tMid, tHigh };
        for (const [variant, tol] of variants) compare(moved, samples, tol, `${tLow}/${tMid}/${tHigh}, ${variant}`);
      }
    }
  });
});
