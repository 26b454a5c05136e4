/**
 * Evaluation of the NASA-7 form (McBride, Gordon & Reno 1993, NASA TM-4513, eqs. 2–4) checked against
 * thermodynamic identities it must satisfy (published definitions): d(H/R)/dT = Cp/R, d(S/R)/dT = Cp/(R T),
 * and against a direct, non-Horner evaluation. Coefficients written by hand for this test (known-polynomial.ts).
 */
import { describe, expect, it } from 'vitest';
import { cpDerivative, cpSecondDerivative, evaluateNasa7, evaluateRange, rangeAt } from '../../../src/nasa7/evaluate.js';
import { knownPolynomial } from './known-polynomial.js';

const poly = knownPolynomial(1);
const c = poly.low;

describe('evaluateRange', () => {
  it('equals the published formulas term by term', () => {
    const T = 543.21;
    const [a1, a2, a3, a4, a5, a6, a7] = c;
    const v = evaluateRange(c, T);
    expect(v.cpR).toBeCloseTo(a1 + a2 * T + a3 * T ** 2 + a4 * T ** 3 + a5 * T ** 4, 12);
    expect(v.hRT).toBeCloseTo(a1 + (a2 * T) / 2 + (a3 * T ** 2) / 3 + (a4 * T ** 3) / 4 + (a5 * T ** 4) / 5 + a6 / T, 12);
    expect(v.sR).toBeCloseTo(a1 * Math.log(T) + a2 * T + (a3 * T ** 2) / 2 + (a4 * T ** 3) / 3 + (a5 * T ** 4) / 4 + a7, 12);
  });

  it('satisfies d(H/R)/dT = Cp/R and dS/dT = Cp/T (central differences)', () => {
    for (const T of [250, 700, 999]) {
      const d = 1e-3;
      const hR = (t: number) => evaluateRange(c, t).hRT * t;
      const sR = (t: number) => evaluateRange(c, t).sR;
      const cp = evaluateRange(c, T).cpR;
      expect((hR(T + d) - hR(T - d)) / (2 * d)).toBeCloseTo(cp, 6);
      expect(((sR(T + d) - sR(T - d)) / (2 * d)) * T).toBeCloseTo(cp, 6);
    }
  });

  it('first and second Cp derivatives match central differences', () => {
    for (const T of [300, 800]) {
      const d = 0.01;
      const cp = (t: number) => evaluateRange(c, t).cpR;
      expect(cpDerivative(c, T)).toBeCloseTo((cp(T + d) - cp(T - d)) / (2 * d), 9);
      expect(cpSecondDerivative(c, T)).toBeCloseTo((cpDerivative(c, T + d) - cpDerivative(c, T - d)) / (2 * d), 12);
    }
  });
});

describe('evaluateNasa7', () => {
  it('uses the low set up to and including tMid, the high set above', () => {
    expect(rangeAt(poly, 1000)).toBe(poly.low);
    expect(rangeAt(poly, 1000.0001)).toBe(poly.high);
    expect(evaluateNasa7(poly, 500)).toEqual(evaluateRange(poly.low, 500));
    expect(evaluateNasa7(poly, 3000)).toEqual(evaluateRange(poly.high, 3000));
  });
});
