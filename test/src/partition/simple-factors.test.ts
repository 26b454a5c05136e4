/**
 * Translational, harmonic, nonlinear-rotor and level-sum factors against closed forms of textbook
 * statistical mechanics (McQuarrie, Statistical Mechanics, 1976: Sackur-Tetrode eq. 5-20, harmonic
 * oscillator eqs. 6-22 to 6-25, two-level Schottky heat capacity, classical asymmetric top eq. 8-38).
 */
import { describe, expect, it } from 'vitest';
import { BOLTZMANN, C2_CM_K, GAS_CONSTANT, PLANCK, STANDARD_PRESSURE_ATM } from '../../../src/constants.js';
import { harmonicMoments } from '../../../src/partition/harmonic.js';
import { createLevelList, levelSumMoments } from '../../../src/partition/level-sum.js';
import { addMoments, LevelSumError } from '../../../src/partition/moments.js';
import { nonlinearRotorMoments } from '../../../src/partition/rigid-rotor-nonlinear.js';
import { translationalMoments } from '../../../src/partition/translational.js';
import { rel } from '../../support/relative.js';


describe('translational (Sackur-Tetrode)', () => {
  it('gives Cp/R = H/RT = 5/2 and the published Ar entropy (CODATA key value 154.846 J/(mol K))', () => {
    const m = translationalMoments(39.948, 298.15, 1e5);
    expect(m.meanU).toBe(2.5);
    expect(m.varU).toBe(2.5);
    expect(Math.abs(GAS_CONSTANT * (m.lnQ + m.meanU) - 154.846)).toBeLessThan(0.003);
  });
  it('changes S by −R ln(101325/100000) at 1 atm (ideal gas, definition of the standard state)', () => {
    const bar = translationalMoments(28, 1000, 1e5).lnQ;
    const atm = translationalMoments(28, 1000, STANDARD_PRESSURE_ATM).lnQ;
    expect(atm - bar).toBeCloseTo(-Math.log(1.01325), 14);
  });
  it('scales as (3/2) ln M and (5/2) ln T', () => {
    const a = translationalMoments(4, 500, 1e5).lnQ;
    expect(translationalMoments(8, 500, 1e5).lnQ - a).toBeCloseTo(1.5 * Math.log(2), 13);
    expect(translationalMoments(4, 1000, 1e5).lnQ - a).toBeCloseTo(2.5 * Math.log(2), 13);
  });
  it('uses m = M/(1000 N_A) kg', () => {
    const M = 28.0134;
    const T = 300;
    const m = M / 1000 / 6.02214076e23;
    const expected = Math.log(((2 * Math.PI * m * BOLTZMANN * T) / PLANCK ** 2) ** 1.5 * ((BOLTZMANN * T) / 1e5));
    expect(rel(translationalMoments(M, T, 1e5).lnQ, expected)).toBeLessThan(1e-14);
  });
});

describe('harmonic oscillators', () => {
  it('equal an explicit sum over v of g·exp(−vθ/T) from the zero-point level', () => {
    const nu = 667;
    const T = 900;
    const levels = Array.from({ length: 400 }, (_, v) => v * nu);
    const explicit = levelSumMoments(createLevelList(levels, levels.map(() => 1), C2_CM_K), T);
    const closed = harmonicMoments([{ wavenumber: nu, degeneracy: 1 }], T);
    expect(rel(closed.lnQ, explicit.lnQ)).toBeLessThan(1e-12);
    expect(rel(closed.meanU, explicit.meanU)).toBeLessThan(1e-12);
    expect(rel(closed.varU, explicit.varU)).toBeLessThan(1e-10);
  });
  it('count a degenerate mode d times', () => {
    const one = harmonicMoments([{ wavenumber: 667, degeneracy: 1 }], 700);
    const two = harmonicMoments([{ wavenumber: 667, degeneracy: 2 }], 700);
    expect(two.lnQ).toBeCloseTo(2 * one.lnQ, 14);
    expect(two.varU).toBeCloseTo(2 * one.varU, 14);
  });
  it('stay finite where e^x would overflow and reach the classical Cp/R = 1 at high T', () => {
    const frozen = harmonicMoments([{ wavenumber: 4000, degeneracy: 1 }], 5);
    expect(frozen).toEqual({ lnQ: 0, meanU: 0, varU: 0 });
    const hot = harmonicMoments([{ wavenumber: 10, degeneracy: 1 }], 1e5);
    expect(hot.varU).toBeCloseTo(1, 6);
  });
});

describe('nonlinear rigid rotor (classical)', () => {
  it('is (√π/σ)(T³/θAθBθC)^½ with Cp/R = 3/2', () => {
    const abc: [number, number, number] = [27.88, 14.51, 9.28];
    const T = 500;
    const m = nonlinearRotorMoments(abc, 2, T);
    const q = (Math.sqrt(Math.PI) / 2) * Math.sqrt(T ** 3 / (C2_CM_K ** 3 * 27.88 * 14.51 * 9.28));
    expect(rel(m.lnQ, Math.log(q))).toBeLessThan(1e-14);
    expect(m.meanU).toBe(1.5);
    expect(m.varU).toBe(1.5);
  });
});

describe('level sum', () => {
  it('reproduces the two-level (Schottky) heat capacity Cp/R = r x² e^{-x}/(1 + r e^{-x})²', () => {
    const list = createLevelList([0, 500], [2, 6], C2_CM_K);
    for (const T of [50, 300, 1000, 6000]) {
      const x = (C2_CM_K * 500) / T;
      const r = 3;
      const expected = (r * x * x * Math.exp(-x)) / (1 + r * Math.exp(-x)) ** 2;
      expect(rel(levelSumMoments(list, T).varU, expected)).toBeLessThan(1e-12);
    }
  });
  it('measures energies from the lowest level whatever the input origin', () => {
    const a = levelSumMoments(createLevelList([0, 100, 300], [1, 3, 5], C2_CM_K), 400);
    const b = levelSumMoments(createLevelList([1e6 + 100, 1e6, 1e6 + 300], [3, 1, 5], C2_CM_K), 400);
    expect(b.lnQ).toBeCloseTo(a.lnQ, 9);
    expect(b.meanU).toBeCloseTo(a.meanU, 9);
  });
  it('stays finite at extreme temperatures (no overflow)', () => {
    const list = createLevelList([0, 1e5, 2e5], [1, 1, 1], C2_CM_K);
    for (const T of [1e-3, 1e7]) {
      const m = levelSumMoments(list, T);
      expect(Number.isFinite(m.lnQ) && Number.isFinite(m.meanU) && Number.isFinite(m.varU)).toBe(true);
    }
  });
  it('rejects empty lists and non-positive weights', () => {
    expect(() => createLevelList([], [], 1)).toThrow(LevelSumError);
    expect(() => createLevelList([0, 1], [1, 0], 1)).toThrow(/weight 0/);
  });
  it('adds independent factors', () => {
    const s = addMoments([
      { lnQ: 1, meanU: 2, varU: 3 },
      { lnQ: 0.5, meanU: 0.25, varU: 0.125 },
    ]);
    expect(s).toEqual({ lnQ: 1.5, meanU: 2.25, varU: 3.125 });
  });
});
