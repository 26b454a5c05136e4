/**
 * The table-driven e^{−u} of exp-neg.ts against Math.exp and Math.expm1 (V8's fdlibm ports, within 1 ulp
 * of the true values). The stated bounds are 3 ulps (e^{−u}) and 4 ulps (1 − e^{−u}); a comparison
 * against a 1-ulp reference is therefore allowed 4 and 5 ulps. Arguments: a seeded sweep written here
 * (our own generator, not data from anywhere) plus the table edges.
 */
import { describe, expect, it } from 'vitest';
import { EXP_NEG_LIMIT, expNeg, expNegPairSmall } from '../../../src/partition/exp-neg.js';

/** Seeded linear congruential generator (Numerical Recipes constants), uniform in [0, 1). */
function uniform(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
}

const ulps = (got: number, want: number) => Math.abs(got - want) / (Math.abs(want) * 2 ** -52);

describe('expNeg', () => {
  it('is within 4 ulps of Math.exp(−u) on 0 … 708 (sweep and table edges)', () => {
    const next = uniform(9);
    let worst = 0;
    const args: number[] = [0, 1e-300, 1e-20, 1e-8, Math.LN2 / 64, Math.LN2 / 32, Math.LN2, 1, 20, 50, 700, EXP_NEG_LIMIT];
    for (let k = 0; k < 40000; k++) args.push((k * Math.LN2) / 32, (k + 0.5) * (Math.LN2 / 32));
    for (let i = 0; i < 200000; i++) args.push(next() * EXP_NEG_LIMIT, next() * 5, next() * 1e-3);
    for (const u of args) {
      if (u > EXP_NEG_LIMIT) continue;
      worst = Math.max(worst, ulps(expNeg(u), Math.exp(-u)));
    }
    expect(worst).toBeLessThanOrEqual(4);
    expect(expNeg(0)).toBe(1);
  });
  it('flushes to 0 above 708 (e^{−708} ≈ 3.3e-308)', () => {
    expect(expNeg(708.5)).toBe(0);
    expect(expNeg(1e6)).toBe(0);
  });
});

describe('expNegPairSmall', () => {
  it('gives e^{−u} and 1 − e^{−u} within 4 and 5 ulps of Math.exp / −Math.expm1 on 0 … ln 2', () => {
    const next = uniform(11);
    const out = new Float64Array(2);
    let worstE = 0;
    let worstD = 0;
    const args: number[] = [1e-300, 1e-30, 1e-12, 1e-6, Math.LN2 / 64, Math.LN2 / 32, Math.LN2 * (1 - 1e-16)];
    for (let i = 0; i < 200000; i++) args.push(next() * Math.LN2, next() * 0.02, next() * 1e-6);
    for (const u of args) {
      expNegPairSmall(u, out);
      worstE = Math.max(worstE, ulps(out[0]!, Math.exp(-u)));
      worstD = Math.max(worstD, ulps(out[1]!, -Math.expm1(-u)));
    }
    expect(worstE).toBeLessThanOrEqual(4);
    expect(worstD).toBeLessThanOrEqual(5);
  });
});
