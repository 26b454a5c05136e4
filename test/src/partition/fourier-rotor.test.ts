/**
 * The general Fourier torsion: band reduction against ml-matrix (a general-purpose npm library), the
 * single-cosine rotor it generalises (same levels), the phase-shift identity of a cosine plus a sine term
 * (trigonometry), and the free-rotor and harmonic limits of Pitzer & Gwinn, J. Chem. Phys. 10, 428 (1942).
 * The rotor constants and Fourier terms are written by hand for these tests (no molecule's published
 * values); the expected numbers come from ml-matrix and the closed-form limits above.
 */
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import type { InternalRotor } from '../../../src/model.js';
import { SymmetricBandMatrix, symmetricBandEigenvalues } from '../../../src/partition/band-eigenvalues.js';
import { fourierPotentialRange } from '../../../src/partition/fourier-rotor.js';
import { harmonicMoments } from '../../../src/partition/harmonic.js';
import { freeRotorClassicalMoments, hinderedRotorLevels, hinderedRotorMoments } from '../../../src/partition/hindered-rotor.js';
import { rel } from '../../support/relative.js';

function fourierRotor(terms: Array<[number, number, number]>, b: number, sigma: number): InternalRotor {
  const fourier = terms.map(([n, c, s]) => ({ n, cos: c, sin: s }));
  const { min, max } = fourierPotentialRange(fourier);
  return { barrier: max - min, foldedness: Math.max(...terms.map((t) => t[0])), symmetryNumber: sigma, rotationalConstant: b, fourier };
}

describe('symmetric band eigenvalues (Givens reduction + QL)', () => {
  it('agree with ml-matrix on random band matrices', () => {
    let seed = 987;
    const random = () => ((seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31) * 2 - 1;
    for (const [n, k] of [[1, 1], [2, 1], [7, 3], [30, 5], [61, 13]] as const) {
      const band = new SymmetricBandMatrix(n, k);
      const dense = Matrix.zeros(n, n);
      for (let i = 0; i < n; i++) {
        for (let j = Math.max(0, i - k); j <= i; j++) {
          const x = i === j ? 50 * random() : 10 * random();
          band.set(i, j, x);
          dense.set(i, j, x);
          dense.set(j, i, x);
        }
      }
      const reference = new EigenvalueDecomposition(dense, { assumeSymmetric: true }).realEigenvalues.sort((x, y) => x - y);
      const got = symmetricBandEigenvalues(band);
      reference.forEach((x, i) => expect(Math.abs(got[i]! - x)).toBeLessThan(1e-10));
    }
  });
});

describe('Fourier torsional potential', () => {
  const b = 5.2;
  it('one cosine term gives the levels of the single-cosine rotor', () => {
    const plain = hinderedRotorLevels({ barrier: 373, foldedness: 3, symmetryNumber: 3, rotationalConstant: b });
    const general = hinderedRotorLevels(fourierRotor([[3, 373, 0]], b, 3), { basisLimit: plain.basisLimit });
    expect(general.energies.length).toBe(plain.energies.length);
    for (let i = 0; i < 200; i++) expect(Math.abs(general.energies[i]! - plain.energies[i]!)).toBeLessThan(1e-7);
  });
  it('a cosine plus a sine term is the cosine of amplitude hypot(Vc, Vs), shifted in phase (same levels)', () => {
    const plain = hinderedRotorLevels({ barrier: 500, foldedness: 2, symmetryNumber: 1, rotationalConstant: b });
    const general = hinderedRotorLevels(fourierRotor([[2, 300, 400]], b, 1), { basisLimit: plain.basisLimit });
    for (let i = 0; i < 200; i++) expect(Math.abs(general.energies[i]! - plain.energies[i]!)).toBeLessThan(1e-7);
  });
  it('V -> 0 gives the free rotor', () => {
    const levels = hinderedRotorLevels(fourierRotor([[1, 1e-6, 2e-6], [3, 1e-6, -1e-6]], b, 1));
    for (const T of [500, 1000, 3000]) {
      const m = hinderedRotorMoments(levels, T);
      const free = freeRotorClassicalMoments(b, 1, T);
      expect(Math.abs(m.lnQ - free.lnQ)).toBeLessThan(2e-3);
      expect(Math.abs(m.varU - 0.5)).toBeLessThan(2e-3);
    }
  });
  it('large V gives the harmonic oscillator of the curvature at the (shifted) minimum of an asymmetric potential', () => {
    // V = 4e5 (1 − cos φ)/2 + 1e5 sin(2φ)/2: one well, moved off φ = 0 by the sine term. Harmonic limit
    // H ≈ B p² + ½ V'' x² gives the first excitation ω = √(2 V'' B); anharmonic corrections are O(B).
    const terms: Array<[number, number, number]> = [[1, 4e5, 0], [2, 0, 1e5]];
    const levels = hinderedRotorLevels(fourierRotor(terms, b, 1));
    const v = (x: number) => 2e5 * (1 - Math.cos(x)) + 5e4 * Math.sin(2 * x);
    let x = 0;
    for (let i = 0; i < 50; i++) x -= (v(x + 1e-5) - v(x - 1e-5)) / 2e-5 / ((v(x + 1e-4) - 2 * v(x) + v(x - 1e-4)) / 1e-8);
    const curvature = (v(x + 1e-4) - 2 * v(x) + v(x - 1e-4)) / 1e-8;
    const omega = Math.sqrt(2 * curvature * b);
    expect(rel(levels.energies[1]!, omega)).toBeLessThan(0.01);
  });
});
