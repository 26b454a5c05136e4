/**
 * Setups the fit must refuse with a clear FitError. Data: the hand-written known polynomial
 * (known-polynomial.ts) and the closed-form RRHO N2 model (synthetic.ts; Huber & Herzberg 1979 constants).
 */
import { describe, expect, it } from 'vitest';
import { T_REF } from '../../../src/constants.js';
import { FitError } from '../../../src/nasa7/errors.js';
import { evaluateNasa7 } from '../../../src/nasa7/evaluate.js';
import { fitNasa7 } from '../../../src/nasa7/fit.js';
import { normaliseFitOptions } from '../../../src/nasa7/options.js';
import { solveConstrainedLeastSquares } from '../../../src/nasa7/solve.js';
import { knownPolynomial, samplesOf } from './known-polynomial.js';
import { grid, N2_RRHO, rrhoSample } from './synthetic.js';

const known = knownPolynomial(1);
const anchor = { T: T_REF, ...evaluateNasa7(known, T_REF) };

function fitError(run: () => unknown): FitError {
  try {
    run();
  } catch (e) {
    expect(e).toBeInstanceOf(FitError);
    return e as FitError;
  }
  throw new Error('expected a FitError');
}

describe('FitError for setups that cannot be fitted', () => {
  it('too few temperatures in the low range', () => {
    const ts = [200, 300, 450, 600, 800, 1000, ...grid(1000, 6000, 50)];
    const e = fitError(() => fitNasa7(samplesOf(known, ts), anchor));
    expect(e.message).toMatch(/low range \[200, 1000\] K has 6 distinct sample temperature\(s\); expected at least 7/);
  });

  it('duplicate temperatures only', () => {
    const ts = [...new Array(50).fill(500), ...new Array(50).fill(3000)];
    const e = fitError(() => fitNasa7(samplesOf(known, ts), anchor));
    expect(e.problems).toHaveLength(2);
    expect(e.message).toMatch(/low range .* has 1 distinct/);
    expect(e.message).toMatch(/high range .* has 1 distinct/);
  });

  it('samples not covering the range', () => {
    const e = fitError(() => fitNasa7(samplesOf(known, grid(200, 4000, 20)), anchor));
    expect(e.message).toMatch(/highest sample at 4000 K leaves 2000 K uncovered/);
    const gap = [...grid(200, 1000, 20), 1000, 1200, 5800, 5900, 6000, 1100, 1300];
    expect(fitError(() => fitNasa7(samplesOf(known, gap), anchor)).message).toMatch(/no samples between 1300 and 5800 K/);
  });

  it('non-finite samples and samples outside the range', () => {
    const samples = samplesOf(known, grid(200, 6000, 20));
    samples[3] = { ...samples[3]!, cpR: NaN };
    expect(fitError(() => fitNasa7(samples, anchor)).message).toMatch(/samples\[3\] \(T = 260 K\): cpR not finite/);
    const outside = samplesOf(known, grid(100, 6000, 20));
    expect(fitError(() => fitNasa7(outside, anchor)).message).toMatch(/samples\[0\] \(T = 100 K\) lies outside the fit range \[200, 6000\] K/);
  });

  it('anchor outside [tLow, tMid], tMid not inside, anchor at another temperature', () => {
    // 300 K is allowed (1.85 K of extrapolation to the anchor, options.ts MAX_ANCHOR_EXTRAPOLATION); 310 K is not.
    expect(normaliseFitOptions({ tLow: 300 }).tLow).toBe(300);
    expect(fitError(() => normaliseFitOptions({ tLow: 310 })).message).toMatch(/anchorT = 298.15 K lies outside the low range \[310, 1000\] K/);
    expect(fitError(() => normaliseFitOptions({ tMid: 7000 })).message).toMatch(/expected tLow < tMid < tHigh/);
    expect(fitError(() => normaliseFitOptions({ tMid: 200 })).problems.length).toBeGreaterThanOrEqual(1);
    const samples = samplesOf(known, grid(200, 6000, 20));
    expect(fitError(() => fitNasa7(samples, { ...anchor, T: 300 })).message).toMatch(/anchor sample is at T = 300 K but options.anchorT = 298.15 K/);
  });

  it('bad options are all reported at once', () => {
    const e = fitError(() => normaliseFitOptions({ weights: { cp: -1, h: NaN }, continuityOrder: 3 as 1, tHigh: -5 }));
    expect(e.problems.length).toBeGreaterThanOrEqual(4);
  });

  it('an ill-conditioned setup (ranges 1 K wide) is refused with the condition number', () => {
    const ts = grid(998, 1002, 0.05);
    const samples = ts.map((T) => rrhoSample(N2_RRHO, T));
    const e = fitError(() => fitNasa7(samples, rrhoSample(N2_RRHO, 999), { tLow: 998, tMid: 1000, tHigh: 1002, anchorT: 999 }));
    expect(e.message).toMatch(/ill-conditioned or rank deficient \(condition number [0-9.]+e\+\d+ > 1e\+10\)/);
  });

  it('a rank-deficient design (two identical columns) is refused by the solver', () => {
    const rows = grid(1, 20, 1).map((x) => [1, x, x, x * x]);
    const e = fitError(() => solveConstrainedLeastSquares({ rows, rhs: rows.map(() => 1), constraintRows: [[1, 0, 0, 0]], constraintRhs: [0] }));
    expect(e.message).toMatch(/rank deficient/);
  });

  it('dependent constraints are refused', () => {
    const rows = grid(1, 20, 1).map((x) => [1, x, x * x]);
    const e = fitError(() =>
      solveConstrainedLeastSquares({ rows, rhs: rows.map(() => 1), constraintRows: [[1, 1, 0], [2, 2, 0]], constraintRhs: [0, 0], constraintLabels: ['first', 'second'] }),
    );
    expect(e.message).toMatch(/linearly dependent \(at "second"\)/);
  });

  it('zero weights for H and S still give a determined fit (constraints fix a6, a7)', () => {
    const fit = fitNasa7(samplesOf(known, grid(200, 6000, 20)), anchor, { weights: { h: 0, s: 0 } });
    expect(fit.metrics.anchor.h).toBeLessThan(1e-12);
    expect(Math.abs(fit.polynomial.high[5] - known.high[5]) / Math.abs(known.high[5])).toBeLessThan(1e-8);
  });
});
