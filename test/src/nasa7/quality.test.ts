/**
 * Fit checks. Data: closed-form RRHO models (synthetic.ts; constants from Huber & Herzberg 1979 and from
 * memory as marked there) and the hand-written known polynomial (known-polynomial.ts). The ideal-gas bound
 * Cp/R ≥ 5/2 is textbook statistical mechanics (McQuarrie, Statistical Mechanics, 1976).
 */
import { describe, expect, it } from 'vitest';
import { T_REF } from '../../../src/constants.js';
import { fitNasa7 } from '../../../src/nasa7/fit.js';
import { assessFit, hysteresisReversals } from '../../../src/nasa7/quality.js';
import type { Coefficients7, FitResult } from '../../../src/nasa7/types.js';
import { evaluateNasa7 } from '../../../src/nasa7/evaluate.js';
import { CH4_RRHO, grid, H2O_RRHO, N2_RRHO, rrhoSample } from './synthetic.js';

const samplesN2 = grid(200, 6000, 10).map((T) => rrhoSample(N2_RRHO, T));
const fitN2 = fitNasa7(samplesN2, rrhoSample(N2_RRHO, T_REF));

function withHigh(fit: FitResult, change: (c: Coefficients7) => Coefficients7): FitResult {
  return { ...fit, polynomial: { ...fit.polynomial, high: change([...fit.polynomial.high]) } };
}

describe('hysteresisReversals', () => {
  it('counts only reversals larger than the amplitude', () => {
    const ts = grid(0, 100, 1);
    const small = ts.map((t) => 0.001 * Math.sin(t / 5));
    const big = ts.map((t) => Math.sin(t / 10)); // extrema at t = 5π·(2k+1): 15.7, 47.1, 78.5
    expect(hysteresisReversals(ts, small, 0.01)).toEqual([]);
    expect(hysteresisReversals(ts, big, 0.1)).toEqual([16, 47, 79]);
    expect(hysteresisReversals(ts, ts, 0.1)).toEqual([]);
  });
});

describe('assessFit', () => {
  it('careful fits of RRHO N2, CH4, H2O pass the default tolerances', () => {
    for (const model of [N2_RRHO, CH4_RRHO, H2O_RRHO]) {
      const samples = grid(200, 6000, 10).map((T) => rrhoSample(model, T));
      expect(assessFit(fitNasa7(samples, rrhoSample(model, T_REF)), samples)).toEqual([]);
    }
  });

  it('a tolerance below the error names quantity, range, temperature and excess', () => {
    const v = assessFit(fitN2, samplesN2, { cp: 0.01, perCp: { cp: 0, h: 0, s: 0 } });
    expect(v.map((x) => [x.quantity, x.range])).toEqual([
      ['cp', 'low'],
      ['cp', 'high'],
    ]);
    expect(v[0]!.T).toBe(fitN2.metrics.low.tAtMax.cp);
    expect(v[0]!.value).toBeCloseTo(fitN2.metrics.low.maxAbs.cp, 15);
    expect(v[0]!.message).toMatch(/^Cp\/R fit error 0\.012\d* at 950 K \(low range 200–1000 K\) is 1\.2\d* × its limit 0\.01, set there by the absolute part 0\.01; .*widen this species' limits/);
    expect(v[0]!.limitPart).toBe('absolute');
  });

  it('the size-scaled part sets the limit where it is larger, and the message says so', () => {
    // 0.003 × Cp/R ≈ 0.0105 at 950 K (N2 Cp/R ≈ 3.5) beats the absolute 0.001.
    const v = assessFit(fitN2, samplesN2, { cp: 0.001, perCp: { cp: 0.003, h: 0.003, s: 0.003 } });
    const low = v.find((x) => x.quantity === 'cp' && x.range === 'low')!;
    expect(low.limitPart).toBe('perCp');
    expect(low.limit).toBeCloseTo(0.003 * low.cpR!, 12);
    expect(low.message).toMatch(/set there by 0\.003 × Cp\/R 3\.\d+ \(the size-scaled part\)/);
  });

  it('a broken midpoint is reported as a continuity jump at tMid', () => {
    const bad = withHigh(fitN2, (c) => [c[0] + 1e-6, c[1], c[2], c[3], c[4], c[5], c[6]]);
    const v = assessFit(bad, samplesN2);
    const q = v.map((x) => x.quantity);
    expect(q).toContain('continuity-cp');
    expect(q).toContain('continuity-h');
    expect(q).toContain('continuity-s');
    const cp = v.find((x) => x.quantity === 'continuity-cp')!;
    expect(cp.range).toBe('mid');
    expect(cp.T).toBe(1000);
    expect(cp.message).toMatch(/^Cp\/R jumps by 1\.000e-6 between the low and high sets at tMid = 1000 K; tolerance 1\.000e-8/);
  });

  it('a polynomial whose Cp turns over beyond the range is caught, even when it matches the data exactly', () => {
    // Written by hand for this test, one polynomial (same set both sides, so continuous): Cp/R = 3.5 +
    // 2e-3 (T − 190)², a minimum at 190 K, i.e. 10 K below tLow = 200 K, inside the 20 K checked below the
    // low end; monotone over the data 200–2000 K.
    const k = 2e-3;
    const c: Coefficients7 = [3.5 + k * 190 * 190, -2 * k * 190, k, 0, 0, 0, 0];
    const poly = { tLow: 200, tMid: 1000, tHigh: 2000, low: c, high: [...c] as Coefficients7 };
    const samples = grid(200, 2000, 10).map((T) => ({ T, ...evaluateNasa7(poly, T) }));
    const fit: FitResult = { ...fitN2, polynomial: poly, metrics: { ...fitN2.metrics, anchor: { h: 0, s: 0 } } };
    const v = assessFit(fit, samples);
    expect(v.map((x) => [x.quantity, x.range, x.T])).toEqual([['cp-wiggle', 'extrapolation', 190]]);
    expect(v[0]!.message).toBe(
      'Cp/R of the fit turns over at 190 K, 10 K beyond T_low = 200 K, and turns back by 0.2 by 180 K; limit 0.1 within 20 K of the range',
    );
    // Checked only 5 K below the low end, the turn-over is out of sight.
    expect(assessFit(fit, samples, { extrapolationBelow: 5 })).toEqual([]);
  });

  it('continuing a trend beyond the end is not a turn-over (a real Cp minimum inside the range, as for NO)', () => {
    // written by hand for this test: Cp/R = 3.5 + 1e-5 (T − 250)², minimum at 250 K inside the data, rising steadily below 200 K.
    const k = 1e-5;
    const c: Coefficients7 = [3.5 + k * 250 * 250, -2 * k * 250, k, 0, 0, 0, 0];
    const poly = { tLow: 200, tMid: 1000, tHigh: 2000, low: c, high: [...c] as Coefficients7 };
    const samples = grid(200, 2000, 10).map((T) => ({ T, ...evaluateNasa7(poly, T) }));
    const fit: FitResult = { ...fitN2, polynomial: poly, metrics: { ...fitN2.metrics, anchor: { h: 0, s: 0 } } };
    expect(assessFit(fit, samples, { cp: 1, h: 1, s: 1 })).toEqual([]);
  });

  it('Cp ≤ 0 anywhere in the checked span is reported', () => {
    const negative = withHigh(fitN2, (c) => [c[0], c[1], c[2], c[3], c[4] - 1e-14, c[5], c[6]]);
    const nv = assessFit(negative, samplesN2, { cp: 1e9, h: 1e9, s: 1e9, continuity: 1e9 });
    const pos = nv.find((x) => x.quantity === 'cp-positive')!;
    expect(pos.message).toMatch(/^Cp\/R of the fit is -?[0-9.e-]+ ≤ 0 at [0-9.]+ K \(high\); Cp must stay positive/);
  });

  it('Cp/R below the ideal-gas minimum 5/2 is reported', () => {
    const low = withHigh(fitN2, (c) => [c[0] - 2, c[1], c[2], c[3], c[4], c[5], c[6]]);
    const v = assessFit(low, samplesN2, { cp: 0.1, h: 1e9, s: 1e9, continuity: 1e9 });
    expect(v.find((x) => x.quantity === 'cp-positive')?.message).toMatch(/below the floor 2\.4 \(the structure's classical minimum 2\.5 less the Cp limit\)/);
  });

  it('the floor follows the structure: 7/2 for a linear molecule, but never above the computed Cp/R', () => {
    // N2's high set starts near Cp/R 3.9 at 1000 K; lowering its a1 by 0.6 puts it near 3.3: below 7/2 − 0.1 for a
    // linear molecule, fine for the atom floor 5/2, and fine when the data itself is that low (a quantum
    // rotor such as H2 near 200 K has Cp/R ≈ 3.3 < 7/2; NIST-JANAF 4th ed. H-050, from memory).
    const low = withHigh(fitN2, (c) => [c[0] - 0.6, c[1], c[2], c[3], c[4], c[5], c[6]]);
    const loose = { cp: 1, h: 1e9, s: 1e9, continuity: 1e9, perCp: { cp: 0, h: 0, s: 0 } };
    const floorOf = (cpFloor: number, data = samplesN2) => assessFit(low, data, { ...loose, cp: 0.1, cpFloor }).filter((x) => x.quantity === 'cp-positive');
    expect(floorOf(3.5).length).toBe(1);
    expect(floorOf(2.5)).toEqual([]);
    expect(floorOf(3.5, samplesN2.map((s) => ({ ...s, cpR: s.cpR - 0.6 })))).toEqual([]);
  });
});

describe('departure beyond the ends (rule 6)', () => {
  // Hand-made bend: Cp/R of RRHO N2 lowered by k·u², u = (T − 5000 K)/1000 K above 5000 K, with H/RT and
  // S/R integrated from it in closed form, so the bent data is self-consistent and the fit follows it. The
  // "computed" zone points beyond 6000 K are the unbent RRHO values: the fit turns away from them.
  const a = 5000;
  const w = 1000;
  const k = -0.5;
  const bent = (T: number) => {
    const p = rrhoSample(N2_RRHO, T);
    if (T <= a) return p;
    const u = (T - a) / w;
    const dS = (k / (w * w)) * ((T * T - a * a) / 2 - 2 * a * (T - a) + a * a * Math.log(T / a));
    return { T, cpR: p.cpR + k * u * u, hRT: p.hRT + (k * w * u ** 3) / 3 / T, sR: p.sR + dS };
  };
  const zone = [180, 185, 190, 195, 6020, 6040, 6060, 6080, 6100];
  const samples = grid(200, 6000, 10).map(bent);
  const fit = fitNasa7(samples, bent(T_REF));

  it('a fit that turns away just beyond T_high fails with the departure, naming T, values, limit and remedy', () => {
    const truth = zone.map((T) => rrhoSample(N2_RRHO, T));
    const inside = assessFit(fit, samples);
    expect(inside).toEqual([]); // the bend alone passes every in-range check
    const v = assessFit(fit, samples, {}, truth).filter((x) => x.quantity === 'extrapolation-departs');
    expect(v).toHaveLength(1);
    expect(v[0]!.range).toBe('extrapolation');
    expect(v[0]!.T).toBe(6100);
    expect(v[0]!.value).toBeGreaterThan(v[0]!.limit);
    expect(v[0]!.limit).toBeCloseTo(3 * 0.1, 12); // 3 × max(0.1, 0.015 × Cp/R ≈ 4.5)
    expect(v[0]!.limitPart).toBe('absolute');
    expect(v[0]!.message).toMatch(/^Cp\/R of the fit is [\d.]+ at 6100 K, 100 K beyond T_high = 6000 K, where the computed Cp\/R is [\d.]+: it departs by [\d.]+, [\d.]+ × the limit 0\.3 \(3 × the Cp limit 0\.1 there, set by the absolute part 0\.1\); .*widen this species' temperature_ranges/);
  });

  it('the same fit passes when the computed values beyond the end follow its trend', () => {
    expect(assessFit(fit, samples, {}, zone.map(bent))).toEqual([]);
  });

  it('a careful fit stays within the departure limit beyond both ends; points inside the range are ignored', () => {
    const truth = [...zone, 500, 3000].map((T) => rrhoSample(N2_RRHO, T));
    expect(assessFit(fitN2, samplesN2, {}, truth)).toEqual([]);
    // A tight multiple shows the check reads both ends (low end first).
    const tight = assessFit(fitN2, samplesN2, { extrapolationDeparture: 1e-6 }, truth).filter((x) => x.quantity === 'extrapolation-departs');
    expect(tight.map((x) => x.T < 200)).toEqual([true, false]);
  });
});

