/**
 * One-dimensional hindered internal rotor (a torsion) by a direct sum over its quantum levels.
 */
import { C2_CM_K } from '../constants.js';
import type { InternalRotor } from '../model.js';
import { createLevelList, levelSumMoments, type LevelList } from './level-sum.js';
import { fourierRotorEigenvalues } from './fourier-rotor.js';
import { LevelSumError, type PartitionMoments } from './moments.js';
import { symmetricTridiagonalEigenvalues } from './tridiagonal-eigenvalues.js';

export { symmetricTridiagonalEigenvalues };

/**
 * The level list is complete (every omitted level below 1e-17 of q) up to this temperature: the highest
 * temperature the settings accept for a fit range (schemas/settings.schema.json). Above it the list
 * undercounts the high levels and Cp falls towards 0.
 */
export const HINDERED_ROTOR_CEILING_TEMPERATURE = 20000;
/** Levels are kept up to u = E/kT = 50 at the ceiling temperature: e^{−50}(1 + 50²) ≈ 5e-19. */
const KEPT_U_AT_CEILING = 50;
/**
 * Largest free-rotor basis (2M + 1 functions). A rotor needing more has a rotational constant below about
 * 0.03 cm⁻¹ (I_red above about 550 amu·Å², far heavier than a CF3 top): a units mistake, or a torsion
 * better treated classically. The validator reports it before the physics. (Diagonalising a block of this size
 * takes a few seconds; an H2O2 or CH3 rotor needs a few hundred functions and milliseconds.)
 */
export const MAX_HINDERED_ROTOR_BASIS = 10001;

/**
 * Highest level kept, cm⁻¹ above the lowest, for a list complete up to `ceilingTemperature` (K): every
 * omitted level has u = E/kT > 50 there, e^{−50}(1 + 50²) ≈ 5e-19 of a ground-level term.
 */
export function hinderedRotorEnergyCeiling(ceilingTemperature: number = HINDERED_ROTOR_CEILING_TEMPERATURE): number {
  return (KEPT_U_AT_CEILING * ceilingTemperature) / C2_CM_K;
}

/**
 * Largest |m| of the free-rotor basis e^{imφ} that converges every kept level.
 *
 * Single cosine (the tridiagonal blocks of `hinderedRotorLevels`): every kept eigenvalue λ lies below
 * λ_top = E_keep + V0/2 (E_keep = `hinderedRotorEnergyCeiling`, and the lowest level is at most ⟨0|H|0⟩ =
 * V0/2), so beyond the turning point m_t = √(λ_top/B) an eigenvector's components obey the three-term
 * recurrence with diagonal gap a − λ ≥ B((m_t + jn)² − m_t²) ≥ 2B·m_t·j·n at the j-th block step, and with
 * m_t ≥ √(V0/2B) each step shrinks them by at most x/j, x = √(V0/B)/(4√2·n) (coupling V0/4 over the gap).
 * After J steps the edge component is below x^J/J! ≤ (e·x/J)^J; with J = ⌈2e·x⌉ + 12 that is at most about
 * 1e-14 for any x (largest near x ≈ 1), and the eigenvalue error, quadratic in it, is below 1e-25 of the
 * coupling — far below rounding. So M = ⌈m_t⌉ + n·J. The estimate is of the Combes–Thomas kind (eigenvector
 * decay in a gap; e.g. Reed & Simon, Methods of Modern Mathematical Physics IV, 1978, §XIII.11, our
 * arrangement for this tridiagonal case); variational (truncation can only raise an eigenvalue), and the
 * test suite checks that doubling M changes nothing. Until this criterion, B·M² ≥ 2.25(E_keep + V0) was
 * used: about 1.4× the basis (2× the eigenvalue work) for the same levels.
 *
 * General Fourier potential (a band matrix, several couplings per row): the earlier, more generous
 * B·M² ≥ 2.25 (E_keep + V0) + 2n, V0 = max − min of the potential, n its largest harmonic.
 */
export function hinderedRotorBasisLimit(
  rotor: Pick<InternalRotor, 'barrier' | 'rotationalConstant' | 'foldedness' | 'fourier'>,
  ceilingTemperature: number = HINDERED_ROTOR_CEILING_TEMPERATURE,
): number {
  const keep = hinderedRotorEnergyCeiling(ceilingTemperature);
  const b = rotor.rotationalConstant;
  const n = rotor.foldedness;
  if (rotor.fourier !== undefined) return Math.ceil(Math.sqrt((2.25 * (keep + rotor.barrier)) / b)) + 2 * n;
  const turningPoint = Math.sqrt((keep + rotor.barrier / 2) / b);
  const x = Math.sqrt(rotor.barrier / b) / (4 * Math.SQRT2 * n);
  const steps = Math.ceil(2 * Math.E * x) + 12;
  return Math.ceil(turningPoint) + n * steps;
}

/** Smallest rotational constant (cm⁻¹) whose basis stays within MAX_HINDERED_ROTOR_BASIS, for messages. */
export function smallestHinderedRotorConstant(rotor: Pick<InternalRotor, 'barrier' | 'foldedness' | 'fourier'>): number {
  // The basis size falls monotonically with B: bisect in log B (to 1e-6 relative; a message value).
  const fits = (b: number) => 2 * hinderedRotorBasisLimit({ ...rotor, rotationalConstant: b }) + 1 <= MAX_HINDERED_ROTOR_BASIS;
  let lo = 1e-6;
  let hi = 1e3;
  if (fits(lo)) return lo;
  while (hi / lo > 1 + 1e-6) {
    const mid = Math.sqrt(lo * hi);
    if (fits(mid)) hi = mid;
    else lo = mid;
  }
  return hi;
}

/** Number of basis functions 2M + 1 the rotor needs. */
export function hinderedRotorBasisSize(rotor: Pick<InternalRotor, 'barrier' | 'rotationalConstant' | 'foldedness' | 'fourier'>): number {
  return 2 * hinderedRotorBasisLimit(rotor) + 1;
}

/** The levels of one hindered rotor, built once. */
export interface HinderedRotorLevels {
  /** Energies above the lowest level, cm⁻¹, ascending, all 2π-periodic levels (before dividing by σ). */
  readonly energies: Float64Array;
  /** The level list summed by `hinderedRotorMoments`: every level with weight 1/σ. */
  readonly list: LevelList;
  /** Largest |m| of the free-rotor basis used. */
  readonly basisLimit: number;
  /** Energy of the lowest level above the potential minimum, cm⁻¹ (the torsional zero-point energy). */
  readonly zeroPointEnergy: number;
}

/**
 * Levels of H = B·(−d²/dφ²) + (V0/2)(1 − cos nφ) on 0 ≤ φ < 2π.
 *
 * Formula: in the free-rotor basis e^{imφ}/√(2π), |m| ≤ M, the matrix elements are
 *   ⟨m|H|m⟩ = B m² + V0/2,   ⟨m|H|m ± n⟩ = −V0/4   (⟨m|cos nφ|m ± n⟩ = ½),
 * so H splits into n tridiagonal blocks m ≡ r (mod n), each diagonalised exactly (QL; blocks related by
 * m → −m are diagonalised once, self-related ones split into even and odd halves). All eigenvalues up to
 * `hinderedRotorEnergyCeiling(ceilingTemperature)` above the lowest are kept (default ceiling
 * HINDERED_ROTOR_CEILING_TEMPERATURE; an evaluator that knows its highest temperature asks for less, which
 * keeps every level with u ≤ 50 there and shrinks the basis as √ of the ceiling), each with weight 1/σ: the levels of the full
 * 2π period are counted once and the rotor symmetry number σ removes the configurations that are the same
 * (σ = n for a symmetric top such as CH3; σ = 1 with n = 2 for a two-well torsion of distinguishable wells).
 * Units: B (reduced rotational constant ħ²/(2 I_red hc)) and V0 in cm⁻¹. Valid for a torsion separable
 * from the other modes, with a constant reduced moment and a pure n-fold cosine potential; complete up to
 * HINDERED_ROTOR_CEILING_TEMPERATURE. Limits: V0 → 0 gives the free rotor (levels B m²), V0 ≫ kT the
 * n-fold harmonic oscillator of wavenumber n·√(V0·B).
 * Sources: Pitzer & Gwinn, J. Chem. Phys. 10, 428 (1942) (hindered-rotor thermodynamic functions); Pitzer,
 * J. Chem. Phys. 14, 239 (1946) (reduced moments); McClurg, Flagan & Goddard, J. Chem. Phys. 106, 6675
 * (1997) (direct level summation of the hindered-rotor Hamiltonian in the free-rotor basis).
 */
export function hinderedRotorLevels(
  rotor: InternalRotor,
  options: { basisLimit?: number; ceilingTemperature?: number } = {},
): HinderedRotorLevels {
  const { barrier: v0, foldedness: n, symmetryNumber: sigma, rotationalConstant: b } = rotor;
  if (!(Number.isFinite(v0) && v0 >= 0)) throw new LevelSumError(`hindered rotor: barrier ${v0} cm-1; expected >= 0`);
  if (!(Number.isInteger(n) && n >= 1)) throw new LevelSumError(`hindered rotor: foldedness ${n}; expected a whole number >= 1`);
  if (!(Number.isInteger(sigma) && sigma >= 1)) throw new LevelSumError(`hindered rotor: symmetry number ${sigma}; expected a whole number >= 1`);
  if (!(Number.isFinite(b) && b > 0)) throw new LevelSumError(`hindered rotor: rotational constant ${b} cm-1; expected > 0`);
  // `basisLimit` (a larger |m| than needed) exists for the convergence tests only.
  const ceilingTemperature = options.ceilingTemperature ?? HINDERED_ROTOR_CEILING_TEMPERATURE;
  if (!(ceilingTemperature > 0 && ceilingTemperature <= HINDERED_ROTOR_CEILING_TEMPERATURE)) {
    throw new LevelSumError(`hindered rotor: ceiling temperature ${ceilingTemperature} K; expected > 0 and <= ${HINDERED_ROTOR_CEILING_TEMPERATURE}`);
  }
  const mMax = Math.max(hinderedRotorBasisLimit(rotor, ceilingTemperature), options.basisLimit ?? 0);
  if (2 * mMax + 1 > MAX_HINDERED_ROTOR_BASIS) {
    throw new LevelSumError(
      `hindered rotor: rotational constant ${b} cm-1 needs ${2 * mMax + 1} basis functions, more than ${MAX_HINDERED_ROTOR_BASIS}`,
    );
  }
  const parts: Float64Array[] = [];
  const eigenvaluesOf = (diagonal: (k: number) => number, firstCoupling: number, size: number, copies: number) => {
    const d = new Float64Array(size);
    const e = new Float64Array(size).fill(-v0 / 4);
    for (let k = 0; k < size; k++) d[k] = diagonal(k);
    e[0] = size > 1 ? firstCoupling : 0;
    const values = symmetricTridiagonalEigenvalues(d, e);
    for (let c = 0; c < copies; c++) parts.push(values);
  };
  const diagonalAt = (m: number) => b * m * m + v0 / 2;
  // A general Fourier potential has no single period to split by: one band matrix (fourier-rotor.ts).
  if (rotor.fourier !== undefined) parts.push(fourierRotorEigenvalues(rotor.fourier, b, mMax));
  else for (let r = 0; r < n; r++) {
    // m → −m maps residue class r onto n − r with the same matrix: those two blocks have the same
    // eigenvalues (computed once, counted twice), and a class that maps onto itself (r = 0, r = n/2)
    // splits exactly into its even and odd combinations (|m⟩ ± |−m⟩)/√2, two blocks of half the size.
    const mirror = (n - r) % n;
    if (mirror < r) continue;
    if (mirror !== r) {
      // Block m = m0, m0 + n, ... ≤ mMax with m0 the smallest m ≥ −mMax in the residue class r.
      const m0 = -mMax + ((((r + mMax) % n) + n) % n);
      eigenvaluesOf((k) => diagonalAt(m0 + k * n), -v0 / 4, Math.floor((mMax - m0) / n) + 1, 2);
    } else if (r === 0) {
      // m = 0, ±n, ±2n, …: even block {|0⟩, (|kn⟩ + |−kn⟩)/√2} couples |0⟩ to the next by −√2·V0/4.
      const top = Math.floor(mMax / n);
      eigenvaluesOf((k) => diagonalAt(k * n), (-Math.SQRT2 * v0) / 4, top + 1, 1);
      if (top > 0) eigenvaluesOf((k) => diagonalAt((k + 1) * n), -v0 / 4, top, 1);
    } else {
      // m = ±n/2, ±3n/2, …: ⟨n/2|H|−n/2⟩ = −V0/4 shifts the first even level down and the first odd up.
      const count = Math.floor((mMax - r) / n) + 1;
      eigenvaluesOf((k) => diagonalAt(r + k * n) - (k === 0 ? v0 / 4 : 0), -v0 / 4, count, 1);
      eigenvaluesOf((k) => diagonalAt(r + k * n) + (k === 0 ? v0 / 4 : 0), -v0 / 4, count, 1);
    }
  }
  const all = new Float64Array(parts.reduce((t, x) => t + x.length, 0));
  let filled = 0;
  for (const x of parts) {
    all.set(x, filled);
    filled += x.length;
  }
  all.sort();
  const lowest = all[0]!;
  const ceiling = hinderedRotorEnergyCeiling(ceilingTemperature);
  const energies = all.map((x) => x - lowest).filter((x) => x <= ceiling);
  const list = createLevelList(energies, new Float64Array(energies.length).fill(1 / sigma), C2_CM_K);
  return { energies, list, basisLimit: mMax, zeroPointEnergy: lowest };
}

/** The rotor's potential in words, for the model summary: V0 and n, or the Fourier terms (and scan fit). */
export function describeTorsionPotential(rotor: InternalRotor): string {
  if (rotor.fourier === undefined) return `V0 = ${rotor.barrier} cm-1, n = ${rotor.foldedness}`;
  const terms = rotor.fourier.map((t) => `[${t.n}, ${t.cos}, ${t.sin}]`).join(', ');
  const fit = rotor.scanFit
    ? `; fitted to a scan of ${rotor.scanFit.points} points, residual rms ${rotor.scanFit.rmsResidual.toPrecision(3)} cm-1, max ${rotor.scanFit.maxResidual.toPrecision(3)} cm-1`
    : '';
  return `Fourier potential [n, V_cos, V_sin] = ${terms} cm-1, max - min ${rotor.barrier} cm-1${fit}`;
}

/** Moments of one hindered rotor at T (K), energies from its lowest level (see `hinderedRotorLevels`). */
export function hinderedRotorMoments(levels: HinderedRotorLevels, T: number): PartitionMoments {
  return levelSumMoments(levels.list, T);
}

/**
 * Classical free internal rotor, for tests and comparison only.
 * Formula: q = (1/σ)·√(π T/θ), θ = c2·B, the integral of Σ_m e^{−θm²/T} over m; meanU = varU = ½.
 * Units: B in cm⁻¹, T in K. Valid for T ≫ θ; energies from the m = 0 level.
 * Source: Pitzer & Gwinn, J. Chem. Phys. 10, 428 (1942) (the free-rotor limit of their tables).
 */
export function freeRotorClassicalMoments(rotationalConstant: number, symmetryNumber: number, T: number): PartitionMoments {
  const theta = C2_CM_K * rotationalConstant;
  return { lnQ: 0.5 * Math.log((Math.PI * T) / theta) - Math.log(symmetryNumber), meanU: 0.5, varU: 0.5 };
}

/**
 * Harmonic wavenumber of the torsion in one well of the hindered rotor: ω = n·√(V0·B), cm⁻¹, from
 * V ≈ V0 n² φ²/4 near a minimum (Pitzer & Gwinn 1942). The low-T limit of the rotor is n/σ harmonic
 * oscillators of this wavenumber; the fundamental is lowered by the quartic term by about n²B/4.
 */
export function hinderedRotorHarmonicWavenumber(rotor: Pick<InternalRotor, 'barrier' | 'rotationalConstant' | 'foldedness'>): number {
  return rotor.foldedness * Math.sqrt(rotor.barrier * rotor.rotationalConstant);
}
