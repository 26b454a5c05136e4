/**
 * The hindered internal rotor against published limits and formulas: Mathieu characteristic values
 * (Abramowitz & Stegun 1964, Table 20.1 and eq. 20.2.25, from memory), the classical free rotor and the
 * harmonic limit of Pitzer & Gwinn, J. Chem. Phys. 10, 428 (1942), first-order perturbation theory of the
 * quartic term (textbook quantum mechanics), and ml-matrix (a general-purpose npm library) for the
 * eigenvalue solver.
 */
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { harmonicMoments } from '../../../src/partition/harmonic.js';
import {
  freeRotorClassicalMoments,
  HINDERED_ROTOR_CEILING_TEMPERATURE,
  hinderedRotorHarmonicWavenumber,
  hinderedRotorLevels,
  hinderedRotorMoments,
  symmetricTridiagonalEigenvalues,
} from '../../../src/partition/hindered-rotor.js';
import { LevelSumError } from '../../../src/partition/moments.js';
import type { InternalRotor } from '../../../src/model.js';
import { MATHIEU_A0, mathieuA0Series } from '../../fixtures/hindered-rotor.js';
import { rel } from '../../support/relative.js';


describe('symmetric tridiagonal eigenvalues (QL)', () => {
  it('agree with ml-matrix EigenvalueDecomposition on random matrices', () => {
    let seed = 12345;
    const random = () => ((seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31) * 2 - 1;
    for (const n of [1, 2, 5, 40]) {
      const d = Float64Array.from({ length: n }, () => 100 * random());
      const e = Float64Array.from({ length: n }, () => 10 * random());
      const a = Matrix.zeros(n, n);
      for (let i = 0; i < n; i++) {
        a.set(i, i, d[i]!);
        if (i + 1 < n) {
          a.set(i, i + 1, e[i]!);
          a.set(i + 1, i, e[i]!);
        }
      }
      const reference = new EigenvalueDecomposition(a, { assumeSymmetric: true }).realEigenvalues.sort((x, y) => x - y);
      const mine = symmetricTridiagonalEigenvalues(d, e);
      reference.forEach((x, i) => expect(Math.abs(mine[i]! - x)).toBeLessThan(1e-11));
    }
  });
});

describe('levels against Mathieu characteristic values', () => {
  // −B ψ'' + (V0/2)(1 − cos 2φ) ψ = E ψ with B = 1, n = 2 is Mathieu's equation with q = V0/4 (z = φ,
  // |q| only matters for a0): the lowest level is E0 = V0/2 + a0(q).
  const lowest = (q: number) => hinderedRotorLevels({ barrier: 4 * q, foldedness: 2, symmetryNumber: 1, rotationalConstant: 1 }).zeroPointEnergy - 2 * q;
  it('small q: the published series a0 = −q²/2 + 7q⁴/128 − … (A&S 20.2.25)', () => {
    for (const q of [0.05, 0.1, 0.2]) expect(Math.abs(lowest(q) - mathieuA0Series(q))).toBeLessThan(1e-7);
  });
  it.each(MATHIEU_A0.map(([q, a0]) => [q, a0] as const))('q = %s: a0 from A&S Table 20.1 (from memory)', (q, a0) => {
    expect(Math.abs(lowest(q) - a0)).toBeLessThan(1e-6);
  });
});

describe('free-rotor limit (V0 = 0)', () => {
  const rotor: InternalRotor = { barrier: 0, foldedness: 3, symmetryNumber: 3, rotationalConstant: 5.3 };
  const levels = hinderedRotorLevels(rotor);
  it('has the free-rotor levels B m², m = 0, ±1, ±2, … (each |m| > 0 twice)', () => {
    const e = levels.energies;
    expect(e[0]).toBe(0);
    for (let m = 1; m <= 5; m++) {
      expect(e[2 * m - 1]).toBeCloseTo(5.3 * m * m, 9);
      expect(e[2 * m]).toBeCloseTo(5.3 * m * m, 9);
    }
  });
  it.each([300, 1000, 6000, HINDERED_ROTOR_CEILING_TEMPERATURE])('approaches the classical q = (1/σ)√(πT/θ) at %s K (Pitzer & Gwinn 1942)', (T) => {
    const sum = hinderedRotorMoments(levels, T);
    const classical = freeRotorClassicalMoments(5.3, 3, T);
    // T ≫ θ = 7.6 K: the Euler-Maclaurin corrections of a Gaussian sum are exponentially small.
    expect(Math.abs(sum.lnQ - classical.lnQ)).toBeLessThan(1e-12);
    expect(Math.abs(sum.meanU - 0.5)).toBeLessThan(1e-12);
    expect(Math.abs(sum.varU - 0.5)).toBeLessThan(1e-12);
  });
  it('a tiny barrier changes the free rotor by about V0/2kT only', () => {
    const T = 1000;
    const nearlyFree = hinderedRotorMoments(hinderedRotorLevels({ ...rotor, barrier: 1e-3 }), T);
    expect(Math.abs(nearlyFree.lnQ - hinderedRotorMoments(levels, T).lnQ)).toBeLessThan(1e-6);
  });
  it('the rotor symmetry number divides q: ln q falls by ln σ', () => {
    const one = hinderedRotorMoments(hinderedRotorLevels({ ...rotor, symmetryNumber: 1 }), 500);
    const three = hinderedRotorMoments(levels, 500);
    expect(one.lnQ - three.lnQ).toBeCloseTo(Math.log(3), 13);
    expect(one.meanU).toBeCloseTo(three.meanU, 13);
  });
});

describe('harmonic limit (V0 ≫ kT)', () => {
  // A methyl-like three-fold rotor with a very high barrier: n equivalent wells, ω = n√(V0 B).
  const rotor: InternalRotor = { barrier: 1e6, foldedness: 3, symmetryNumber: 3, rotationalConstant: 5 };
  const levels = hinderedRotorLevels(rotor);
  const omega = hinderedRotorHarmonicWavenumber(rotor);
  it('has n-fold degenerate levels spaced by ω − n²B/4 (first-order perturbation of the quartic term)', () => {
    const e = levels.energies;
    expect(omega).toBeCloseTo(3 * Math.sqrt(5e6), 9);
    expect(e[1]! - e[0]!).toBeLessThan(1e-6);
    expect(e[2]! - e[0]!).toBeLessThan(1e-6);
    // Second-order terms are of order B²/ω: 1e-5 relative here.
    expect(rel(e[3]!, omega - (9 * 5) / 4)).toBeLessThan(1e-5);
  });
  it.each([300, 1000, 3000])('gives (n/σ)·q_harmonic at %s K', (T) => {
    const m = hinderedRotorMoments(levels, T);
    const h = harmonicMoments([{ wavenumber: omega - (9 * 5) / 4, degeneracy: 1 }], T);
    expect(Math.abs(m.lnQ - h.lnQ)).toBeLessThan(1e-3 * Math.max(h.lnQ, 1e-3));
    expect(Math.abs(m.varU - h.varU)).toBeLessThan(2e-3 * Math.max(h.varU, 1e-3));
  });
});

describe('basis-size convergence', () => {
  it.each([
    ['H2O2-like, n = 2', { barrier: 1423, foldedness: 2, symmetryNumber: 1, rotationalConstant: 36.9 }],
    ['CH3-like, n = 3', { barrier: 1000, foldedness: 3, symmetryNumber: 3, rotationalConstant: 5.3 }],
    ['heavy top, n = 1', { barrier: 300, foldedness: 1, symmetryNumber: 1, rotationalConstant: 0.8 }],
    // Written by hand to reach the corners of the basis criterion (hindered-rotor.ts): a high barrier over
    // a small constant (x = √(V0/B)/(4√2 n) ≈ 10), a tiny barrier (x ≈ 0.1) and a heavy two-fold top.
    ['high barrier, heavy, n = 1', { barrier: 6000, foldedness: 1, symmetryNumber: 1, rotationalConstant: 1.1 }],
    ['tiny barrier, n = 3', { barrier: 2, foldedness: 3, symmetryNumber: 3, rotationalConstant: 5 }],
    ['heavy two-fold top', { barrier: 2500, foldedness: 2, symmetryNumber: 2, rotationalConstant: 0.3 }],
  ] as const)('%s: twice the basis changes no thermodynamic function', (_name, rotor) => {
    const standard = hinderedRotorLevels(rotor);
    const larger = hinderedRotorLevels(rotor, { basisLimit: 2 * standard.basisLimit });
    expect(larger.energies.length).toBe(standard.energies.length);
    for (let i = 0; i < 50; i++) expect(Math.abs(larger.energies[i]! - standard.energies[i]!)).toBeLessThan(1e-7);
    // What remains is roundoff: the QL eigenvalues are accurate to about 1e-15 of the largest basis energy
    // (B·M², ~1e6 cm-1), i.e. ~1e-8 cm-1, and the doubled basis has four times that.
    for (const T of [100, 1000, 6000, HINDERED_ROTOR_CEILING_TEMPERATURE]) {
      const a = hinderedRotorMoments(standard, T);
      const b = hinderedRotorMoments(larger, T);
      expect(Math.abs(a.lnQ - b.lnQ)).toBeLessThan(1e-9);
      expect(Math.abs(a.meanU - b.meanU)).toBeLessThan(1e-9);
      expect(Math.abs(a.varU - b.varU)).toBeLessThan(1e-9);
    }
  });
  it('keeps the high-temperature free-rotor limit at the ceiling temperature', () => {
    const rotor = { barrier: 1423, foldedness: 2, symmetryNumber: 1, rotationalConstant: 36.9 };
    const m = hinderedRotorMoments(hinderedRotorLevels(rotor), HINDERED_ROTOR_CEILING_TEMPERATURE);
    // kT = 13900 cm-1 ≫ V0: Cp/R → 1/2 from above (Pitzer & Gwinn 1942), within the V0/kT correction.
    expect(m.varU).toBeGreaterThan(0.5);
    expect(m.varU).toBeLessThan(0.51);
  });
});

describe('impossible requests', () => {
  it.each([
    ['negative barrier', { barrier: -1, foldedness: 2, symmetryNumber: 1, rotationalConstant: 1 }],
    ['foldedness 0', { barrier: 1, foldedness: 0, symmetryNumber: 1, rotationalConstant: 1 }],
    ['symmetry number 0', { barrier: 1, foldedness: 1, symmetryNumber: 0, rotationalConstant: 1 }],
    ['zero rotational constant', { barrier: 1, foldedness: 1, symmetryNumber: 1, rotationalConstant: 0 }],
    ['basis too large', { barrier: 1, foldedness: 1, symmetryNumber: 1, rotationalConstant: 1e-3 }],
  ] as const)('%s throws LevelSumError', (_what, rotor) => {
    expect(() => hinderedRotorLevels(rotor)).toThrow(LevelSumError);
  });
});

describe('upper ladder level by level (tridiagonal-window.ts) = QL on the whole blocks', () => {
  // A sweep written here (our own grid of constants, not data from anywhere): light to heavy tops, free to
  // high barriers, one- to six-fold, both ceilings the compute stage uses (6100 K) and the largest.
  const rotors: Array<[InternalRotor, number]> = [];
  for (const rotationalConstant of [0.1, 0.45, 1.7, 5.3, 20])
    for (const barrier of [0.5, 40, 700, 2600, 9000])
      for (const foldedness of [1, 2, 3, 6])
        for (const ceiling of [6100, HINDERED_ROTOR_CEILING_TEMPERATURE]) {
          const rotor = { barrier, foldedness, symmetryNumber: foldedness, rotationalConstant };
          if (rotationalConstant === 0.1 && ceiling > 6100) continue; // keep the whole-block QL reference quick
          rotors.push([rotor, ceiling]);
        }
  it('gives the same number of levels, each within 1e-13 of the ceiling energy, for 170+ rotors', () => {
    let worst = 0;
    for (const [rotor, ceiling] of rotors) {
      const whole = hinderedRotorLevels(rotor, { ceilingTemperature: ceiling, fullDiagonalisation: true });
      const split = hinderedRotorLevels(rotor, { ceilingTemperature: ceiling });
      expect(split.energies.length).toBe(whole.energies.length);
      const scale = whole.energies[whole.energies.length - 1]!;
      for (let i = 0; i < whole.energies.length; i++) worst = Math.max(worst, Math.abs(split.energies[i]! - whole.energies[i]!) / scale);
    }
    expect(worst).toBeLessThan(1e-13);
  });
  // Both are QL-accurate (about 4ε·max|diagonal| ≈ 1e-10 cm-1 per level, the reference on the larger
  // whole block the less accurate), i.e. ~1e-12 in u = E/kT at 200 K: in a deep six-fold well the
  // tunnelling splittings (~1e-10 cm-1) are that rounding in both. Compared on the scale of a species'
  // functions (Cp/R ≥ 1.5, H/RT ≥ 2.5 with translation), so differences count relative to max(1, value).
  it('changes Cp/R, H/RT and S/R of the rotor by less than 1e-11 of max(1, value) (200 … 6000 K)', () => {
    for (const [rotor, ceiling] of rotors.filter(([, c]) => c === 6100)) {
      const whole = hinderedRotorLevels(rotor, { ceilingTemperature: ceiling, fullDiagonalisation: true });
      const split = hinderedRotorLevels(rotor, { ceilingTemperature: ceiling });
      for (const T of [200, 298.15, 1000, 3000, 6000]) {
        const a = hinderedRotorMoments(whole, T);
        const b = hinderedRotorMoments(split, T);
        expect(Math.abs(a.varU - b.varU)).toBeLessThan(1e-11 * Math.max(1, a.varU));
        expect(Math.abs(a.meanU - b.meanU)).toBeLessThan(1e-11 * Math.max(1, a.meanU));
        expect(Math.abs(a.lnQ + a.meanU - b.lnQ - b.meanU)).toBeLessThan(1e-11 * Math.max(1, Math.abs(a.lnQ + a.meanU)));
      }
    }
  });
});
