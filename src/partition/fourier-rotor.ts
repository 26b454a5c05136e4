/**
 * Hindered internal rotor with a general Fourier potential (cosine and sine terms): the Hamiltonian in a
 * real free-rotor basis.
 */
import type { FourierTerm } from '../model.js';
import { SymmetricBandMatrix, symmetricBandEigenvalues } from './band-eigenvalues.js';
import { LevelSumError } from './moments.js';

/** V(φ) = Σ V_cos (1 − cos nφ)/2 + V_sin sin(nφ)/2, cm⁻¹ (φ in rad). */
export function fourierPotential(terms: readonly FourierTerm[], phi: number): number {
  let v = 0;
  for (const t of terms) v += 0.5 * t.cos * (1 - Math.cos(t.n * phi)) + 0.5 * t.sin * Math.sin(t.n * phi);
  return v;
}

/** Smallest and largest V over a full turn (sampled finely enough for n ≤ 64 terms), cm⁻¹. */
export function fourierPotentialRange(terms: readonly FourierTerm[]): { min: number; max: number } {
  const nMax = Math.max(1, ...terms.map((t) => t.n));
  const points = 64 * nMax;
  let min = Infinity;
  let max = -Infinity;
  for (let i = 0; i < points; i++) {
    const v = fourierPotential(terms, (2 * Math.PI * i) / points);
    min = Math.min(min, v);
    max = Math.max(max, v);
  }
  return { min, max };
}

/** The free-rotor functions 1/√(2π), cos(mφ)/√π, sin(mφ)/√π as sums of e^{ipφ}/√(2π): [p, re, im] terms. */
function exponentials(index: number): Array<[number, number, number]> {
  if (index === 0) return [[0, 1, 0]];
  const m = Math.ceil(index / 2);
  const r = Math.SQRT1_2;
  // cos mφ = (e^{imφ} + e^{−imφ})/2; sin mφ = (e^{imφ} − e^{−imφ})/(2i).
  return index % 2 === 1 ? [[m, r, 0], [-m, r, 0]] : [[m, 0, -r], [-m, 0, r]];
}

/**
 * All eigenvalues (cm⁻¹, ascending) of H = B(−d²/dφ²) + V(φ), V a Fourier potential, in the basis
 * {1, cos mφ, sin mφ : 1 ≤ |m| ≤ M} (2M + 1 functions).
 * Formula: with V(φ) = Σ_k v_k e^{ikφ}, v_0 = Σ V_cos/2, v_{±n} = −(V_cos ± i V_sin)/4, the exponential
 * basis gives ⟨p|V|q⟩ = v_{p−q}, a complex Hermitian matrix once sine terms are present. The real basis
 * above is a unitary change of basis that makes it real symmetric (V is real), so no complex arithmetic
 * and no doubled 2N×2N embedding is needed; ordered 1, cos 1φ, sin 1φ, cos 2φ, ..., the matrix is banded
 * with half-bandwidth 2·n_max + 1 and is diagonalised by band reduction (band-eigenvalues.ts). Kinetic
 * term B m² on the diagonal. Variational in M; the caller picks M as for the single cosine.
 * Source: the free-rotor basis method of McClurg, Flagan & Goddard, J. Chem. Phys. 106, 6675 (1997);
 * potential form as in Pitzer & Gwinn, J. Chem. Phys. 10, 428 (1942), extended by sine terms for
 * torsions whose potential is not symmetric about its minimum.
 */
export function fourierRotorEigenvalues(terms: readonly FourierTerm[], rotationalConstant: number, basisLimit: number): Float64Array {
  for (const t of terms) {
    if (!(Number.isInteger(t.n) && t.n >= 1) || !Number.isFinite(t.cos) || !Number.isFinite(t.sin)) {
      throw new LevelSumError(`hindered rotor: Fourier term ${JSON.stringify(t)}; expected a whole n >= 1 and finite coefficients`);
    }
  }
  const v = new Map<number, [number, number]>();
  v.set(0, [terms.reduce((s, t) => s + t.cos / 2, 0), 0]);
  for (const t of terms) {
    const plus = v.get(t.n) ?? [0, 0];
    const minus = v.get(-t.n) ?? [0, 0];
    v.set(t.n, [plus[0] - t.cos / 4, plus[1] - t.sin / 4]);
    v.set(-t.n, [minus[0] - t.cos / 4, minus[1] + t.sin / 4]);
  }
  const nMax = Math.max(1, ...terms.map((t) => t.n));
  const size = 2 * basisLimit + 1;
  const band = 2 * nMax + 1;
  const h = new SymmetricBandMatrix(size, band);
  for (let a = 0; a < size; a++) {
    const ea = exponentials(a);
    const m = Math.ceil(a / 2);
    for (let b = Math.max(0, a - band); b <= a; b++) {
      let re = 0;
      for (const [p, ar, ai] of ea) {
        for (const [q, br, bi] of exponentials(b)) {
          const vk = v.get(p - q);
          if (!vk) continue;
          // conj(α)·β·v: (ar − i ai)(br + i bi)(vr + i vi), real part.
          const xr = ar * br + ai * bi;
          const xi = ar * bi - ai * br;
          re += xr * vk[0] - xi * vk[1];
        }
      }
      h.set(a, b, a === b ? re + rotationalConstant * m * m : re);
    }
  }
  return symmetricBandEigenvalues(h);
}
