/**
 * The linear rigid-rotor direct sum against its published asymptotic forms: Mulholland's expansion
 * (H. P. Mulholland, Proc. Cambridge Philos. Soc. 24, 280 (1928)) and the classical limit T/(σθ)
 * (common practice: the classical limit serves when T ≫ θ).
 */
import { describe, expect, it } from 'vitest';
import { C2_CM_K } from '../../../src/constants.js';
import {
  linearRotorClassicalLimit,
  linearRotorMoments,
  linearRotorMulholland,
} from '../../../src/partition/rigid-rotor-linear.js';
import { LevelSumError } from '../../../src/partition/moments.js';
import { rel } from '../../support/relative.js';


describe('linear rigid rotor, direct sum over J', () => {
  it.each([
    [1.99824, 1], // N2 Be, Huber & Herzberg (1979), from memory
    [1.99824, 2],
    [60.853, 2], // H2 Be, Huber & Herzberg (1979), from memory
    [0.39021, 2], // CO2 B, from memory
  ])('matches Mulholland to 1e-6 relative at T = 100θ (B = %f cm-1, σ = %i)', (B, sigma) => {
    const theta = C2_CM_K * B;
    const T = 100 * theta;
    const q = Math.exp(linearRotorMoments(B, sigma, T).lnQ);
    expect(rel(q, linearRotorMulholland(B, sigma, T))).toBeLessThan(1e-6);
  });

  it('tends to the classical limit T/(σθ) as T/θ grows (common practice: classical limit for T ≫ θ)', () => {
    const B = 1.0;
    const theta = C2_CM_K * B;
    let previous = Infinity;
    for (const ratio of [3, 10, 100, 1000, 10000]) {
      const T = ratio * theta;
      const err = rel(Math.exp(linearRotorMoments(B, 1, T).lnQ), linearRotorClassicalLimit(B, 1, T));
      expect(err).toBeLessThan(previous);
      // leading correction is θ/3T (Mulholland)
      expect(err).toBeLessThan(1 / (3 * ratio) + 1 / (10 * ratio * ratio));
      previous = err;
    }
    expect(previous).toBeLessThan(4e-5);
  });

  it('has the classical moments ⟨u⟩ → 1, var u → 1 at high T and freezes out at low T', () => {
    const hot = linearRotorMoments(1, 1, 1e5 * C2_CM_K);
    expect(hot.meanU).toBeCloseTo(1, 4);
    expect(hot.varU).toBeCloseTo(1, 4);
    const cold = linearRotorMoments(1, 1, 0.05 * C2_CM_K);
    expect(cold.lnQ).toBeLessThan(1e-16); // 3e^{-40}
    expect(cold.varU).toBeLessThan(1e-13); // 3·40²·e^{-40}
  });

  it('matches the moments of an explicit level list (u = θJ(J+1)/T)', () => {
    const B = 2;
    const T = 50;
    const x = (C2_CM_K * B) / T;
    let q = 0;
    let s1 = 0;
    let s2 = 0;
    for (let J = 0; J < 200; J++) {
      const u = x * J * (J + 1);
      const w = (2 * J + 1) * Math.exp(-u);
      q += w;
      s1 += w * u;
      s2 += w * u * u;
    }
    const m = linearRotorMoments(B, 1, T);
    expect(rel(m.lnQ, Math.log(q))).toBeLessThan(1e-13);
    expect(rel(m.meanU, s1 / q)).toBeLessThan(1e-13);
    expect(rel(m.varU, s2 / q - (s1 / q) ** 2)).toBeLessThan(1e-11);
  });

  it('refuses a non-positive rotational constant', () => {
    expect(() => linearRotorMoments(0, 1, 300)).toThrow(LevelSumError);
  });
});
