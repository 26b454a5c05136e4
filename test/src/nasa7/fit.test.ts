/**
 * The constrained fit. Sources: the polynomial form of McBride, Gordon & Reno 1993 (NASA TM-4513);
 * closed-form RRHO data (formulas named in synthetic.ts, constants from Huber & Herzberg 1979 and from
 * memory as marked there); known-coefficient data constructed in known-polynomial.ts (coefficients written by hand for this test).
 */
import { describe, expect, it } from 'vitest';
import { T_REF } from '../../../src/constants.js';
import { evaluateNasa7, evaluateRange } from '../../../src/nasa7/evaluate.js';
import { fitNasa7 } from '../../../src/nasa7/fit.js';
import { continuityResiduals } from '../../../src/nasa7/metrics.js';
import type { Coefficients7 } from '../../../src/nasa7/types.js';
import { knownPolynomial, samplesOf } from './known-polynomial.js';
import { CH4_RRHO, grid, H2O_RRHO, N2_RRHO, rrhoSample } from './synthetic.js';

function maxRelativeDifference(a: Coefficients7, b: Coefficients7): number {
  return Math.max(...a.map((v, i) => Math.abs(v - b[i]!) / Math.abs(b[i]!)));
}

describe('recovering a known 14-coefficient set (written by hand for this test, constraint-satisfying by construction)', () => {
  for (const order of [1, 2] as const) {
    it(`continuity order ${order}: every coefficient back to 1e-9 relative`, () => {
      const known = knownPolynomial(order);
      const samples = samplesOf(known, grid(200, 6000, 10));
      const anchor = { T: T_REF, ...evaluateNasa7(known, T_REF) };
      const fit = fitNasa7(samples, anchor, { continuityOrder: order });
      expect(maxRelativeDifference(fit.polynomial.low, known.low)).toBeLessThan(1e-9);
      expect(maxRelativeDifference(fit.polynomial.high, known.high)).toBeLessThan(1e-9);
      for (const r of [fit.metrics.low, fit.metrics.high]) {
        expect(Math.max(r.maxAbs.cp, r.maxAbs.h, r.maxAbs.s)).toBeLessThan(1e-10);
      }
    });
  }

  it('also with unequal weights, a different midpoint and a coarse grid', () => {
    const known = knownPolynomial(1, 250, 1500, 5000);
    const samples = samplesOf(known, grid(250, 5000, 50));
    const anchor = { T: T_REF, ...evaluateNasa7(known, T_REF) };
    const fit = fitNasa7(samples, anchor, { tLow: 250, tMid: 1500, tHigh: 5000, weights: { cp: 4, h: 0.5, s: 1 } });
    expect(maxRelativeDifference(fit.polynomial.low, known.low)).toBeLessThan(1e-9);
    expect(maxRelativeDifference(fit.polynomial.high, known.high)).toBeLessThan(1e-9);
  });
});

describe('constraints hold exactly on realistic (non-polynomial) data', () => {
  const models = { N2: N2_RRHO, CH4: CH4_RRHO, H2O: H2O_RRHO };
  for (const [name, model] of Object.entries(models)) {
    for (const order of [1, 2] as const) {
      it(`${name} (RRHO), continuity order ${order}`, () => {
        const samples = grid(200, 6000, 10).map((T) => rrhoSample(model, T));
        const anchor = rrhoSample(model, T_REF);
        const fit = fitNasa7(samples, anchor, { continuityOrder: order });
        const c = continuityResiduals(fit.polynomial);
        // Issue 3: Cp/R, H/RT, S/R continuous to 1e-10 before rounding; derivatives made dimensionless by tMid.
        expect(c.cp).toBeLessThan(1e-10);
        expect(c.h).toBeLessThan(1e-10);
        expect(c.s).toBeLessThan(1e-10);
        expect(c.dcp * 1000).toBeLessThan(1e-10);
        if (order === 2) expect(c.d2cp * 1e6).toBeLessThan(1e-10);
        // H°(298.15) and S°(298.15) equal the data to 1e-9 relative (H as H/R in K, absolute).
        const at = evaluateRange(fit.polynomial.low, T_REF);
        const hScale = Math.max(Math.abs(anchor.hRT), 1); // N2: ΔfH = 0 → H298 = 0; compare absolutely then
        expect(Math.abs(at.hRT - anchor.hRT) / hScale).toBeLessThan(1e-9);
        expect(Math.abs(at.sR - anchor.sR) / Math.abs(anchor.sR)).toBeLessThan(1e-9);
        expect(fit.metrics.anchor.h).toBeLessThan(1e-12 * hScale);
        expect(fit.metrics.anchor.s).toBeLessThan(1e-12 * Math.abs(anchor.sR));
      });
    }
  }
});

describe('fit floor of the form on RRHO data (issue 3: N2 ≈ 0.012, harmonic CH4 ≈ 0.08 in Cp/R)', () => {
  it('harmonic N2 and CH4 reach the floor, 200/1000/6000 K, equal weights', () => {
    const worst = (model: typeof N2_RRHO) => {
      const fit = fitNasa7(grid(200, 6000, 10).map((T) => rrhoSample(model, T)), rrhoSample(model, T_REF));
      return {
        cp: Math.max(fit.metrics.low.maxAbs.cp, fit.metrics.high.maxAbs.cp),
        s: Math.max(fit.metrics.low.maxAbs.s, fit.metrics.high.maxAbs.s),
      };
    };
    const n2 = worst(N2_RRHO);
    const ch4 = worst(CH4_RRHO);
    expect(n2.cp).toBeLessThan(0.0125);
    expect(n2.s).toBeLessThan(0.002);
    expect(ch4.cp).toBeLessThan(0.085);
  });

  it('optimiseMid picks a midpoint no worse than the default and deterministically', () => {
    const samples = grid(200, 6000, 20).map((T) => rrhoSample(CH4_RRHO, T));
    const anchor = rrhoSample(CH4_RRHO, T_REF);
    const fixed = fitNasa7(samples, anchor, {});
    const opts = { optimiseMid: { min: 800, max: 2000, step: 100 } };
    const best = fitNasa7(samples, anchor, opts);
    const worst = (f: typeof fixed) => Math.max(...[f.metrics.low, f.metrics.high].flatMap((r) => [r.maxAbs.cp, r.maxAbs.h, r.maxAbs.s]));
    expect(worst(best)).toBeLessThanOrEqual(worst(fixed));
    expect(best.solver?.midCandidates).toBe(13);
    expect(fitNasa7(samples, anchor, opts).polynomial).toEqual(best.polynomial);
  });
});
