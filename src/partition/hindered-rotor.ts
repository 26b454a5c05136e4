/**
 * One-dimensional hindered internal rotor (a torsion) by a direct sum over its quantum levels.
 */
import { C2_CM_K } from '../constants.js';
import type { InternalRotor } from '../model.js';
import { createLevelList, levelSumMoments, type LevelList } from './level-sum.js';
import { fourierRotorEigenvalues } from './fourier-rotor.js';
import { LevelSumError, type PartitionMoments } from './moments.js';
import { symmetricTridiagonalEigenvalues } from './tridiagonal-eigenvalues.js';
import { eigenvaluesBelow, windowEigenvalue } from './tridiagonal-window.js';

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

/** Where a rotor's blocks are split between the QL iteration (below) and the level-by-level ladder (above). */
interface LadderSplit {
  /** Absolute energy (cm⁻¹, from the potential minimum) separating the two parts. */
  energy: number;
  /** Largest |m| whose basis functions the lower part keeps (converges every level up to `energy`). */
  lowerLimit: number;
  /** Barrier V0, cm⁻¹. */
  barrier: number;
  /** Half-width cap of a window: four times the Combes–Thomas step count of `hinderedRotorBasisLimit`. */
  reach: number;
  rotationalConstant: number;
  foldedness: number;
}

/**
 * The split of `hinderedRotorLevels`, or undefined when the whole blocks are small enough for QL alone.
 * The ladder starts where B m² ≥ V0 and neighbouring diagonal entries of a block differ by at least V0/2
 * (two couplings): there every level is one basis function dressed by a fast-decaying tail.
 */
function ladderSplit(rotor: InternalRotor, mMax: number, ceilingTemperature: number): LadderSplit | undefined {
  const { barrier: v0, rotationalConstant: b, foldedness: n } = rotor;
  const mStart = Math.max(Math.sqrt(v0 / b), v0 / (4 * b * n) + n / 2);
  const energy = b * mStart * mStart + v0 / 2;
  // Basis converging every level ≤ energy (hinderedRotorBasisLimit with that keep energy, in its units).
  const lowerLimit = hinderedRotorBasisLimit(rotor, Math.min(ceilingTemperature, (energy * C2_CM_K) / KEPT_U_AT_CEILING));
  if (energy >= hinderedRotorEnergyCeiling(ceilingTemperature) || lowerLimit + 8 * n >= mMax) return undefined;
  const x = Math.sqrt(v0 / b) / (4 * Math.SQRT2 * n);
  return { energy, lowerLimit, barrier: v0, reach: 4 * (Math.ceil(2 * Math.E * x) + 12), rotationalConstant: b, foldedness: n };
}

/**
 * Eigenvalues of one block (diagonal d, couplings e; d is B m² + V0/2 along a residue class of m, so its
 * entries with |m| ≤ lowerLimit are one contiguous run): QL on that run, keeping the values ≤ split.energy
 * (converged, by the basis argument of `hinderedRotorBasisLimit`), and `windowEigenvalue` for every index
 * whose diagonal lies in (split.energy − V0/2, top], keeping the values > split.energy. Accepted only if a
 * Sturm count of the whole block finds exactly as many eigenvalues ≤ split.energy, every ladder value is
 * certified, and no two ladder values are closer than twice their error bound (so each is a different
 * eigenvalue); the count up to the ceiling is checked by the caller. Undefined when a check fails.
 */
function splitBlock(d: Float64Array, e: Float64Array, split: LadderSplit, top: number): { lower: Float64Array; upper: Float64Array } | undefined {
  const size = d.length;
  let maxD = 0;
  for (let k = 0; k < size; k++) maxD = Math.max(maxD, Math.abs(d[k]!));
  const tolerance = 4 * 2 ** -52 * maxD;
  // Rows of the lower run: diagonal ≤ B·lowerLimit² + V0/2 + (a rounding margin).
  const v0Half = split.barrier / 2;
  const runTop = split.rotationalConstant * split.lowerLimit * split.lowerLimit + v0Half + 1e-9 * maxD;
  let from = -1;
  let to = -1;
  for (let k = 0; k < size; k++) {
    if (d[k]! <= runTop) {
      if (from < 0) from = k;
      to = k + 1;
    }
  }
  if (from < 0 || to - from >= size - 4) return undefined;
  const subD = d.slice(from, to);
  const subE = e.slice(from, to);
  subE[subE.length - 1] = 0;
  const sub = symmetricTridiagonalEigenvalues(subD, subE);
  let below = 0;
  while (below < sub.length && sub[below]! <= split.energy) below++;
  if (eigenvaluesBelow(d, e, split.energy) !== below) return undefined;
  const ladder: number[] = [];
  const low = split.energy - v0Half;
  for (let k = 0; k < size; k++) {
    if (!(d[k]! > low && d[k]! <= top)) continue;
    const mu = windowEigenvalue(d, e, k, tolerance, split.reach);
    if (Number.isNaN(mu)) return undefined;
    if (mu > split.energy) ladder.push(mu);
  }
  const upper = Float64Array.from(ladder).sort();
  for (let i = 1; i < upper.length; i++) if (upper[i]! - upper[i - 1]! <= 2 * tolerance) return undefined;
  return { lower: sub.subarray(0, below), upper };
}

/** The levels of one hindered rotor, built once. */
export interface HinderedRotorLevels {
  /** Energies above the lowest level, cm⁻¹, ascending, all 2π-periodic levels (before dividing by σ). */
  readonly energies: Float64Array;
  /** The level list summed by `hinderedRotorMoments`: every level with weight 1/σ (equal energies merged). */
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
 * Cost: the QL iteration is O(size²) per block, and most of a block lies far above the barrier. So (single
 * cosine, V0 > 0) each block is split at E_s = B m_s² + V0/2, m_s = max(√(V0/B), V0/(4Bn) + n/2) (above the
 * barrier, where neighbouring diagonal entries differ by at least two couplings): QL on the rows with
 * |m| ≤ the basis limit for E_s (the same convergence argument as `hinderedRotorBasisLimit`) gives the
 * levels up to E_s, and every level above is found on its own from a window of the block
 * (tridiagonal-window.ts), certified to within 4ε·max|diagonal| by its residual — the accuracy class of QL
 * on the whole block. Sturm counts of the whole block at E_s and at the ceiling must match the numbers of
 * levels found, and no two window values may coincide; otherwise that block is diagonalised whole. Tested
 * against whole-block QL (level counts equal, energies within 1e-13 of the ceiling energy).
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
  options: { basisLimit?: number; ceilingTemperature?: number; fullDiagonalisation?: boolean } = {},
): HinderedRotorLevels {
  const { barrier: v0, foldedness: n, symmetryNumber: sigma, rotationalConstant: b } = rotor;
  if (!(Number.isFinite(v0) && v0 >= 0)) throw new LevelSumError(`hindered rotor: barrier ${v0} cm-1; expected >= 0`);
  if (!(Number.isInteger(n) && n >= 1)) throw new LevelSumError(`hindered rotor: foldedness ${n}; expected a whole number >= 1`);
  if (!(Number.isInteger(sigma) && sigma >= 1)) throw new LevelSumError(`hindered rotor: symmetry number ${sigma}; expected a whole number >= 1`);
  if (!(Number.isFinite(b) && b > 0)) throw new LevelSumError(`hindered rotor: rotational constant ${b} cm-1; expected > 0`);
  // `basisLimit` (a larger |m| than needed) and `fullDiagonalisation` (QL on every whole block, no
  // level-by-level upper ladder) exist for the tests only.
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
  const ceiling = hinderedRotorEnergyCeiling(ceilingTemperature);
  const split = options.fullDiagonalisation || v0 === 0 ? undefined : ladderSplit(rotor, mMax, ceilingTemperature);
  /** Blocks whose upper ladder was found level by level, checked by Sturm counts once the lowest level is known. */
  const windowed: Array<{ d: Float64Array; e: Float64Array; below: number; upper: Float64Array; copies: number }> = [];
  const eigenvaluesOf = (diagonal: (k: number) => number, firstCoupling: number, size: number, copies: number) => {
    const d = new Float64Array(size);
    const e = new Float64Array(size).fill(-v0 / 4);
    for (let k = 0; k < size; k++) d[k] = diagonal(k);
    e[0] = size > 1 ? firstCoupling : 0;
    e[size - 1] = 0;
    const ladder = split ? splitBlock(d, e, split, ceiling + v0) : undefined;
    if (ladder) {
      for (let c = 0; c < copies; c++) parts.push(ladder.lower);
      windowed.push({ d, e, below: ladder.lower.length, upper: ladder.upper, copies });
      return;
    }
    const values = symmetricTridiagonalEigenvalues(d.slice(), e.slice());
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
  // Upper ladders: keep a block's level-by-level values only if the Sturm count of the whole block finds
  // exactly as many eigenvalues up to the ceiling; otherwise diagonalise that block after all.
  const upper: Float64Array[] = [];
  for (const w of windowed) {
    const top = lowest + ceiling;
    let kept = 0;
    for (let i = 0; i < w.upper.length; i++) if (w.upper[i]! <= top) kept++;
    if (eigenvaluesBelow(w.d, w.e, top) - w.below === kept) {
      for (let c = 0; c < w.copies; c++) upper.push(w.upper);
    } else {
      const values = symmetricTridiagonalEigenvalues(w.d.slice(), w.e.slice());
      for (let c = 0; c < w.copies; c++) upper.push(values.subarray(w.below));
    }
  }
  const merged = new Float64Array(all.length + upper.reduce((t, x) => t + x.length, 0));
  merged.set(all);
  let at = all.length;
  for (const x of upper) {
    merged.set(x, at);
    at += x.length;
  }
  merged.sort();
  const energies = merged.map((x) => x - lowest).filter((x) => x <= ceiling);
  // Mirror blocks (r and n − r) give every one of their levels twice, bit for bit: one entry of weight
  // 2/σ instead of two of 1/σ is the same sum with one exponential fewer (exact; only the order of two
  // equal additions changes, a rounding-level difference).
  let distinct = 0;
  for (let i = 0; i < energies.length; i++) if (i === 0 || energies[i] !== energies[i - 1]) distinct++;
  const levelEnergies = new Float64Array(distinct);
  const levelWeights = new Float64Array(distinct);
  for (let i = 0, k = -1; i < energies.length; i++) {
    if (i === 0 || energies[i] !== energies[i - 1]) levelEnergies[++k] = energies[i]!;
    levelWeights[k]! += 1 / sigma;
  }
  const list = createLevelList(levelEnergies, levelWeights, C2_CM_K);
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
