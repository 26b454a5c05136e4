/**
 * The τ = T/1024 scaling and the Householder QR used by the solver. Checks are algebraic identities
 * (sources: the substitution τ = T/T_SCALE in the published NASA TM-4513 form; A = QR with QᵀQ = I, Golub & Van Loan,
 * Matrix Computations, 4th ed., §5.2), on written by hand for this test coefficients.
 */
import { describe, expect, it } from 'vitest';
import { evaluateRange, cpDerivative } from '../../../src/nasa7/evaluate.js';
import { householderQr } from '../../../src/nasa7/householder.js';
import { cpBasis, dcpBasis, hBasis, sBasis, scaleCoefficients, T_SCALE, unscaleCoefficients } from '../../../src/nasa7/scaling.js';
import { HAND_WRITTEN_LOW } from './known-polynomial.js';

const dot = (a: number[], b: number[]) => a.reduce((s, v, i) => s + v * b[i]!, 0);

describe('scaling to τ = T / T_SCALE', () => {
  it('T_SCALE is a power of two, so a1..a6 convert exactly both ways', () => {
    expect(Math.log2(T_SCALE) % 1).toBe(0);
    const back = unscaleCoefficients(scaleCoefficients(HAND_WRITTEN_LOW));
    for (let k = 0; k < 6; k++) expect(back[k]).toBe(HAND_WRITTEN_LOW[k]);
    expect(Math.abs(back[6] - HAND_WRITTEN_LOW[6])).toBeLessThan(1e-14);
  });

  it('the τ basis with scaled coefficients equals the T form', () => {
    const b = scaleCoefficients(HAND_WRITTEN_LOW);
    for (const T of [200, 298.15, 999, 1000]) {
      const tau = T / T_SCALE;
      const v = evaluateRange(HAND_WRITTEN_LOW, T);
      expect(dot(cpBasis(tau), b)).toBeCloseTo(v.cpR, 13);
      expect(dot(hBasis(tau), b)).toBeCloseTo(v.hRT, 12);
      expect(dot(sBasis(tau), b)).toBeCloseTo(v.sR, 12);
      expect(dot(dcpBasis(tau), b) / T_SCALE).toBeCloseTo(cpDerivative(HAND_WRITTEN_LOW, T), 15);
    }
  });
});

describe('householderQr', () => {
  it('returns a full orthogonal Q and upper-triangular R with A = Q [R; 0]', () => {
    const a = [
      [1, 2, 0],
      [3, -1, 4],
      [0, 5, 1],
      [2, 2, 2],
      [-1, 0, 3],
    ];
    const { q, r } = householderQr(a);
    expect(q).toHaveLength(5);
    for (let i = 0; i < 5; i++) {
      for (let j = 0; j < 5; j++) {
        const qtq = q.reduce((s, row) => s + row[i]! * row[j]!, 0);
        expect(qtq).toBeCloseTo(i === j ? 1 : 0, 14);
      }
    }
    for (let i = 0; i < 5; i++) {
      for (let j = 0; j < 3; j++) {
        let s = 0;
        for (let k = 0; k < 3; k++) s += q[i]![k]! * r[k]![j]!;
        expect(s).toBeCloseTo(a[i]![j]!, 13);
      }
    }
    expect(r[1]![0]).toBe(0);
    expect(r[2]![1]).toBe(0);
  });
});
