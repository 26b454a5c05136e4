/**
 * Anharmonic vibrational levels of a polyatomic molecule, summed directly, with optional vibration–rotation
 * coupling (state-dependent rotational constants) and first-order centrifugal distortion.
 *
 * Method (a direct sum over an explicit level list, built once per species):
 *   G(v) = Σ ω_i (v_i + d_i/2) + Σ_{i≤j} x_ij (v_i + d_i/2)(v_j + d_j/2) + Σ_{t≤t'} g_tt' l_t l_t'
 * with d_i the degeneracy of mode i and, for a doubly degenerate mode t with v_t quanta, the vibrational
 * angular momentum l_t = v_t, v_t − 2, …, −v_t (v_t + 1 sublevels). Sublevels ±l that stay degenerate are
 * merged (weight 2), and a doubly degenerate mode without any g term keeps all v_t + 1 sublevels in one
 * level. A mode of degeneracy d ≥ 3 is counted by the number of ways to share v quanta among d oscillators,
 * C(v + d − 1, d − 1), without an l splitting (no g allowed on it). Energies are measured from G(0).
 * Source: G. Herzberg, Molecular Spectra and Molecular Structure II (1945), ch. II.5 (eqs. II,281–II,283
 * for the term formula with l); the same expansion is the basis of the anharmonic constants of
 * e.g. A. Chedin, J. Mol. Spectrosc. 76, 430 (1979) for CO2 (from memory).
 *
 * Level cut (documented in README, "Anharmonic polyatomics"):
 *   - a state is kept when its term without the l part, G(v) − G(0), is at most the cut, and when it is
 *     reached from the ground state by raising one quantum at a time, mode by mode in input order, each step
 *     raising G (the discrete ∂G/∂v_i > 0: beyond a turnover the expansion has no physical meaning);
 *   - the cut is `dissociationEnergy` when given, else — and also when that is higher — the energy above
 *     which the levels of a harmonic molecule with the same ω_i would hold less than 1e-12 of q at 6000 K
 *     (the upper incomplete gamma function Q(s, E/kT) with s modes counting degeneracy: the classical
 *     density of states E^{s−1}). Negative x_ij make the real levels denser than that estimate by a
 *     modest factor (< 10 for the molecules tested), so the dropped fraction stays below ~1e-11.
 *   - at most MAX_ANHARMONIC_LEVELS levels (after merging): beyond that the direct sum is the wrong tool
 *     (a large molecule), and the builder throws an AnharmonicModelError with code `anharmonic-level-limit`.
 *
 * Vibration–rotation coupling: with `alpha`, the rotational constants of state v are X_v = X_0 − Σ α_i v_i
 * (X_0 those of the vibrational ground state). Every level then carries its own classical rotor:
 *   q_rot(v, T) = q_rot(0, T) · r_v,  r_v = B_0/B_v (linear) or (A_0 B_0 C_0 / (A_v B_v C_v))^{1/2},
 * a T-independent ratio of the classical rotor partition functions, so it is part of the level weight and
 * the ground-state rotor (direct J sum for a linear molecule, classical for a nonlinear one) stays a
 * separate factor.
 *
 * Centrifugal distortion (first order, classical): q_rot → q_rot · (1 + a_v T), where a_v T = ⟨−H_d⟩/kT
 * averaged over the classical rigid-rotor distribution of state v (see `centrifugalCoefficient`). The
 * distortion constants are those of the ground state, used for every level.
 */
import { C2_CM_K } from '../constants.js';
import type { Anharmonicity, CentrifugalDistortion, Vibration } from '../model.js';
import { createLevelList, levelSumMoments, type LevelList } from './level-sum.js';
import type { PartitionMoments } from './moments.js';

/** Most levels (after merging degenerate sublevels) one species may have: ~48 MB of typed arrays. */
export const MAX_ANHARMONIC_LEVELS = 2_000_000;
/** The top of the temperature range the population cut is designed for, K. */
export const POPULATION_CUT_TEMPERATURE = 6000;
/** Fraction of q (harmonic density of states) the population cut may drop at POPULATION_CUT_TEMPERATURE. */
export const POPULATION_TAIL_BOUND = 1e-12;

/** A model the direct sum cannot build; `code` is the stable diagnostic code the pipeline reports. */
export class AnharmonicModelError extends Error {
  constructor(
    readonly code: 'anharmonic-level-limit' | 'anharmonic-rotational-constant-not-positive' | 'anharmonic-ladder-turns-over' | 'centrifugal-correction-not-positive',
    message: string,
  ) {
    super(message);
    this.name = 'AnharmonicModelError';
  }
}

export interface AnharmonicModelInput {
  /** Harmonic wavenumbers ω_i (cm⁻¹) and degeneracies. */
  vibrations: readonly Vibration[];
  anharmonicity: Anharmonicity;
  /** Ground-state rotational constants: [B] or [A, B, C], cm⁻¹. */
  rotationalConstants: readonly number[];
  centrifugalDistortion?: CentrifugalDistortion;
  /** Cut above the lowest level, cm⁻¹. */
  dissociationEnergy?: number;
}

/** The level list of the model: plugs into `levelSumMoments` when there is no centrifugal term. */
export interface AnharmonicLevels {
  /** θ = c2·(E − E_0) in K; weight = degeneracy × rotational ratio r_v. */
  readonly levels: LevelList;
  /** a_v (1/K) per level of `levels`, only with centrifugal distortion. */
  readonly centrifugal?: Float64Array;
  /** max |a_v|, 1/K (0 without centrifugal distortion). */
  readonly maxCentrifugal: number;
  /** Vibrational states v kept. */
  readonly states: number;
  /** The cut used, cm⁻¹ above G(0), and what set it. */
  readonly cut: number;
  readonly cutBy: 'dissociation energy' | 'population bound';
  /** Ladders ended because G stopped rising (∂G/∂v_i ≤ 0) below the cut. */
  readonly turnovers: number;
  /** Highest quantum number reached per mode. */
  readonly maxQuanta: readonly number[];
  /** G(0) above the bottom of the potential, cm⁻¹ (zero-point energy). */
  readonly zeroPoint: number;
}

/** Upper regularised incomplete gamma Q(s, x) for whole s ≥ 1: e^{−x} Σ_{k<s} x^k/k!. */
function harmonicTailFraction(s: number, x: number): number {
  let term = Math.exp(-x);
  let sum = term;
  for (let k = 1; k < s; k++) {
    term *= x / k;
    sum += term;
  }
  return sum;
}

/**
 * The population cut, cm⁻¹: the E with Q(s, E/kT) = POPULATION_TAIL_BOUND at POPULATION_CUT_TEMPERATURE,
 * s = modes counting degeneracy (the classical harmonic density of states ∝ E^{s−1}).
 */
export function populationCut(modes: number): number {
  let lo = 0;
  let hi = 1;
  while (harmonicTailFraction(modes, hi) > POPULATION_TAIL_BOUND) hi *= 2;
  for (let i = 0; i < 100; i++) {
    const mid = 0.5 * (lo + hi);
    if (harmonicTailFraction(modes, mid) > POPULATION_TAIL_BOUND) lo = mid;
    else hi = mid;
  }
  return (hi * POPULATION_CUT_TEMPERATURE) / C2_CM_K;
}

/**
 * First-order classical centrifugal coefficient a (1/K): q_rot ≈ q_rigid · (1 + a T).
 *
 * Formula: a T = ⟨−H_d⟩/(kT) over the classical rigid-rotor distribution, where the components J_a, J_b,
 * J_c are independent Gaussians with ⟨J_x²⟩ = κ s_x, s_x = 1/(2X), κ = kT/hc = T/c2 (cm⁻¹):
 *   linear (H_d = −D_J J⁴, J² = J_x² + J_y²):       a T = 2 D_J κ / B²
 *   nonlinear, Watson A reduction, Iʳ (z = a, x = b, y = c),
 *   H_d = −Δ_J J⁴ − Δ_JK J² J_a² − Δ_K J_a⁴ − 2δ_J J² (J_b² − J_c²) − 2δ_K J_a² (J_b² − J_c²) (classical):
 *   a T = κ [Δ_J ((Σs)² + 2Σs²) + Δ_JK (3s_a² + s_a(s_b + s_c)) + 3Δ_K s_a²
 *            + 2δ_J (3(s_b² − s_c²) + s_a(s_b − s_c)) + 2δ_K s_a(s_b − s_c)].
 * Units: constants in cm⁻¹, a in 1/K. Valid while a T ≪ 1 (first order; ~0.01 for CO2 and ~0.1 for H2O
 * at 3000 K). Sources: the Hamiltonian of J. K. G. Watson, in Vibrational Spectra and Structure vol. 6
 * (J. R. Durig ed., 1977); the first-order classical correction as in R. S. McDowell, J. Chem. Phys. 88,
 * 356 (1988) for linear molecules (factor 1 + 2D kT/(hc B²)) — citations from memory; the nonlinear
 * average is worked out here from the Gaussian moments ⟨J_x⁴⟩ = 3κ²s_x² and checked by a test against a
 * direct sum for the linear case.
 */
export function centrifugalCoefficient(rotationalConstants: ArrayLike<number>, d: CentrifugalDistortion): number {
  if (rotationalConstants.length === 1) {
    const b = rotationalConstants[0]!;
    return (2 * d.DJ) / (b * b) / C2_CM_K;
  }
  const a = rotationalConstants[0]!;
  const b = rotationalConstants[1]!;
  const c = rotationalConstants[2]!;
  const sa = 1 / (2 * a);
  const sb = 1 / (2 * b);
  const sc = 1 / (2 * c);
  const sum = sa + sb + sc;
  const squares = sa * sa + sb * sb + sc * sc;
  const perKappa =
    d.DJ * (sum * sum + 2 * squares) +
    (d.DJK ?? 0) * (3 * sa * sa + sa * (sb + sc)) +
    (d.DK ?? 0) * 3 * sa * sa +
    2 * (d.dJ ?? 0) * (3 * (sb * sb - sc * sc) + sa * (sb - sc)) +
    2 * (d.dK ?? 0) * sa * (sb - sc);
  return perKappa / C2_CM_K;
}

/**
 * Moments of the factor 1 + aT alone (centrifugal distortion without a level-dependent rotor):
 *   lnQ = ln(1 + aT), meanU = aT/(1 + aT), varU = aT(2 + aT)/(1 + aT)².
 */
export function centrifugalFactorMoments(a: number, T: number): PartitionMoments {
  const at = a * T;
  const f = 1 + at;
  return { lnQ: Math.log1p(at), meanU: at / f, varU: (at * (2 + at)) / (f * f) };
}

interface Prepared {
  n: number;
  omega: Float64Array;
  half: Float64Array;
  degeneracy: Int32Array;
  /** Symmetric x matrix, n×n. */
  x: Float64Array;
  /** g terms on 0-based modes. */
  g: ReadonlyArray<readonly [number, number, number]>;
  /** Modes whose l sublevels are listed (doubly degenerate with a g term); `signed`: sign of l matters. */
  expanded: number[];
  signed: boolean[];
  cut: number;
  cutBy: AnharmonicLevels['cutBy'];
}

function prepare(input: AnharmonicModelInput): Prepared {
  const n = input.vibrations.length;
  const omega = new Float64Array(n);
  const half = new Float64Array(n);
  const degeneracy = new Int32Array(n);
  input.vibrations.forEach((v, i) => {
    omega[i] = v.wavenumber;
    half[i] = v.degeneracy / 2;
    degeneracy[i] = v.degeneracy;
  });
  const x = new Float64Array(n * n);
  for (const [i, j, value] of input.anharmonicity.x) {
    x[i * n + j] = x[i * n + j]! + value;
    if (i !== j) x[j * n + i] = x[j * n + i]! + value;
  }
  const g = input.anharmonicity.g;
  const inG = new Set<number>();
  const cross = new Set<number>();
  for (const [t, u] of g) {
    inG.add(t);
    inG.add(u);
    if (t !== u) {
      cross.add(t);
      cross.add(u);
    }
  }
  const expanded = [...inG].sort((a, b) => a - b);
  const signed = expanded.map((t) => cross.has(t));
  const modes = input.vibrations.reduce((s, v) => s + v.degeneracy, 0);
  const byPopulation = populationCut(modes);
  const d0 = input.dissociationEnergy;
  const cut = d0 !== undefined && d0 <= byPopulation ? d0 : byPopulation;
  return { n, omega, half, degeneracy, x, g, expanded, signed, cut, cutBy: cut === d0 ? 'dissociation energy' : 'population bound' };
}

/** G(v) of the term formula without the l part, cm⁻¹ from the bottom of the potential. */
function termWithoutL(p: Prepared, v: Int32Array): number {
  const { n, omega, half, x } = p;
  let e = 0;
  for (let i = 0; i < n; i++) {
    const hi = v[i]! + half[i]!;
    e += omega[i]! * hi;
    for (let j = i; j < n; j++) e += x[i * n + j]! * hi * (v[j]! + half[j]!);
  }
  return e;
}

/** G(v + e_k) − G(v) without the l part. */
function step(p: Prepared, v: Int32Array, k: number): number {
  const { n, omega, half, x } = p;
  let s = omega[k]! + x[k * n + k]! * (2 * (v[k]! + half[k]!) + 1);
  for (let j = 0; j < n; j++) if (j !== k) s += x[k * n + j]! * (v[j]! + half[j]!);
  return s;
}

/** C(v + d − 1, d − 1): ways to put v quanta into d equivalent oscillators. */
function shareCount(v: number, d: number): number {
  let c = 1;
  for (let k = 1; k < d; k++) c = (c * (v + k)) / k;
  return Math.round(c);
}

/**
 * Walk the kept states (see the file comment) in a fixed order: `visit(v, energy above G(0))`.
 * Returns the number of ladders ended by a turnover.
 */
function walkStates(p: Prepared, visit: (v: Int32Array, energy: number) => void): number {
  const v = new Int32Array(p.n);
  let turnovers = 0;
  const recurse = (k: number, energy: number): void => {
    if (k === p.n) {
      visit(v, energy);
      return;
    }
    let e = energy;
    for (;;) {
      recurse(k + 1, e);
      const s = step(p, v, k);
      if (!(s > 0)) {
        if (e + s <= p.cut) turnovers++;
        break;
      }
      if (e + s > p.cut) break;
      v[k]!++;
      e += s;
    }
    v[k] = 0;
  };
  recurse(0, 0);
  return turnovers;
}

/** Levels (l sublevels) one state contributes: product over expanded modes of their l choices. */
function sublevelCount(p: Prepared, v: Int32Array): number {
  let c = 1;
  p.expanded.forEach((t, k) => {
    const vt = v[t]!;
    c *= p.signed[k] ? vt + 1 : Math.floor(vt / 2) + 1;
  });
  return c;
}

/** Rotational constants of state v: X_v = X_0 − Σ α_i v_i (ground state when there is no alpha). */
function stateConstants(input: AnharmonicModelInput, v: Int32Array, out: Float64Array): void {
  const x0 = input.rotationalConstants;
  const alpha = input.anharmonicity.alpha;
  for (let k = 0; k < x0.length; k++) {
    let b = x0[k]!;
    if (alpha) for (let i = 0; i < v.length; i++) b -= alpha[i]![k]! * v[i]!;
    out[k] = b;
  }
}

export interface AnharmonicSurvey {
  states: number;
  levels: number;
  turnovers: number;
  cut: number;
  cutBy: AnharmonicLevels['cutBy'];
  /** First state whose rotational constants are not all positive (quantum numbers), if any. */
  nonPositiveRotation?: { v: number[]; constants: number[] };
  /** First state whose centrifugal factor 1 + aT is ≤ 0 at POPULATION_CUT_TEMPERATURE, if any. */
  nonPositiveCentrifugal?: { v: number[]; factor: number };
  /** Largest |a T| at POPULATION_CUT_TEMPERATURE over the kept states. */
  largestCentrifugalCorrection: number;
  /** ΔG of the first quantum of each mode from the ground state (≤ 0: the ladder never rises). */
  firstSteps: number[];
}

/**
 * Count what `buildAnharmonicLevels` would build, without storing levels (for validation): states, levels,
 * turnovers, and the first state with a non-positive rotational constant or centrifugal factor. Stops
 * counting once the levels pass MAX_ANHARMONIC_LEVELS.
 */
export function surveyAnharmonicLevels(input: AnharmonicModelInput): AnharmonicSurvey {
  const p = prepare(input);
  const zero = new Int32Array(p.n);
  const firstSteps = Array.from({ length: p.n }, (_, k) => step(p, zero, k));
  const survey: AnharmonicSurvey = { states: 0, levels: 0, turnovers: 0, cut: p.cut, cutBy: p.cutBy, largestCentrifugalCorrection: 0, firstSteps };
  if (firstSteps.some((s) => !(s > 0))) return survey;
  const constants = new Float64Array(input.rotationalConstants.length);
  const cd = input.centrifugalDistortion;
  class Full extends Error {}
  try {
    survey.turnovers = walkStates(p, (v) => {
      survey.states++;
      survey.levels += sublevelCount(p, v);
      if (survey.levels > MAX_ANHARMONIC_LEVELS) throw new Full();
      stateConstants(input, v, constants);
      if (!survey.nonPositiveRotation && constants.some((b) => !(b > 0))) {
        survey.nonPositiveRotation = { v: Array.from(v), constants: Array.from(constants) };
      }
      if (cd && !survey.nonPositiveRotation) {
        const at = centrifugalCoefficient(constants, cd) * POPULATION_CUT_TEMPERATURE;
        survey.largestCentrifugalCorrection = Math.max(survey.largestCentrifugalCorrection, Math.abs(at));
        if (!survey.nonPositiveCentrifugal && !(1 + at > 0)) survey.nonPositiveCentrifugal = { v: Array.from(v), factor: 1 + at };
      }
    });
  } catch (e) {
    if (!(e instanceof Full)) throw e;
  }
  return survey;
}

/** Growable typed arrays for the level list under construction. */
class LevelBuffer {
  energy = new Float64Array(1024);
  weight = new Float64Array(1024);
  centrifugal = new Float64Array(1024);
  size = 0;
  push(e: number, w: number, a: number): void {
    if (this.size === this.energy.length) {
      const grow = (old: Float64Array) => {
        const next = new Float64Array(old.length * 2);
        next.set(old);
        return next;
      };
      this.energy = grow(this.energy);
      this.weight = grow(this.weight);
      this.centrifugal = grow(this.centrifugal);
    }
    this.energy[this.size] = e;
    this.weight[this.size] = w;
    this.centrifugal[this.size] = a;
    this.size++;
  }
}

/**
 * Build the level list of the model once (outside T). Throws AnharmonicModelError for a model the sum cannot
 * represent (validation reports these first, with locations). Deterministic: states are walked in a fixed
 * order and levels sorted by energy with ties in walk order.
 */
export function buildAnharmonicLevels(input: AnharmonicModelInput): AnharmonicLevels {
  const p = prepare(input);
  const zero = new Int32Array(p.n);
  for (let k = 0; k < p.n; k++) {
    if (!(step(p, zero, k) > 0)) {
      throw new AnharmonicModelError('anharmonic-ladder-turns-over', `mode ${k + 1}: G(v) falls already at the first quantum (ΔG = ${step(p, zero, k)} cm-1)`);
    }
  }
  const g0 = termWithoutL(p, zero);
  const buffer = new LevelBuffer();
  const constants = new Float64Array(input.rotationalConstants.length);
  const ground = input.rotationalConstants;
  const linear = ground.length === 1;
  const groundProduct = ground.reduce((a, b) => a * b, 1);
  const cd = input.centrifugalDistortion;
  const hasAlpha = input.anharmonicity.alpha !== undefined;
  const maxQuanta = new Array<number>(p.n).fill(0);
  const lValues = new Int32Array(p.expanded.length);
  let states = 0;
  let maxCentrifugal = 0;

  const turnovers = walkStates(p, (v, energy) => {
    states++;
    for (let i = 0; i < p.n; i++) if (v[i]! > maxQuanta[i]!) maxQuanta[i] = v[i]!;
    let rotorRatio = 1;
    let a = 0;
    if (hasAlpha || cd) {
      stateConstants(input, v, constants);
      if (constants.some((b) => !(b > 0))) {
        throw new AnharmonicModelError('anharmonic-rotational-constant-not-positive', `state v = (${Array.from(v).join(', ')}) has rotational constants ${Array.from(constants).join(', ')} cm-1`);
      }
      if (hasAlpha) rotorRatio = linear ? ground[0]! / constants[0]! : Math.sqrt(groundProduct / (constants[0]! * constants[1]! * constants[2]!));
      if (cd) {
        a = centrifugalCoefficient(constants, cd);
        if (!(1 + a * POPULATION_CUT_TEMPERATURE > 0)) {
          throw new AnharmonicModelError('centrifugal-correction-not-positive', `state v = (${Array.from(v).join(', ')}): 1 + aT = ${1 + a * POPULATION_CUT_TEMPERATURE} at ${POPULATION_CUT_TEMPERATURE} K`);
        }
        if (Math.abs(a) > maxCentrifugal) maxCentrifugal = Math.abs(a);
      }
    }
    let base = rotorRatio;
    for (let i = 0; i < p.n; i++) if (!p.expanded.includes(i)) base *= shareCount(v[i]!, p.degeneracy[i]!);
    if (p.expanded.length === 0) {
      buffer.push(energy, base, a);
    } else {
      const emitL = (k: number, w: number): void => {
        if (k === p.expanded.length) {
          let offset = 0;
          for (const [t, u, value] of p.g) offset += value * lValues[p.expanded.indexOf(t)]! * lValues[p.expanded.indexOf(u)]!;
          buffer.push(energy + offset, w, a);
          return;
        }
        const vt = v[p.expanded[k]!]!;
        if (p.signed[k]) {
          for (let l = -vt; l <= vt; l += 2) {
            lValues[k] = l;
            emitL(k + 1, w);
          }
        } else {
          for (let l = vt % 2; l <= vt; l += 2) {
            lValues[k] = l;
            emitL(k + 1, l === 0 ? w : 2 * w);
          }
        }
      };
      emitL(0, base);
    }
    if (buffer.size > MAX_ANHARMONIC_LEVELS) {
      throw new AnharmonicModelError('anharmonic-level-limit', `more than ${MAX_ANHARMONIC_LEVELS} levels below the cut at ${p.cut} cm-1`);
    }
  });

  const n = buffer.size;
  const order = Array.from({ length: n }, (_, i) => i).sort((i, j) => buffer.energy[i]! - buffer.energy[j]! || i - j);
  const energies = new Float64Array(n);
  const weights = new Float64Array(n);
  const centrifugal = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    const i = order[k]!;
    energies[k] = buffer.energy[i]!;
    weights[k] = buffer.weight[i]!;
    centrifugal[k] = buffer.centrifugal[i]!;
  }
  // Already sorted (ties in walk order), so createLevelList keeps this order and `centrifugal` stays aligned.
  const levels = createLevelList(energies, weights, C2_CM_K);
  const model: AnharmonicLevels = {
    levels,
    maxCentrifugal,
    states,
    cut: p.cut,
    cutBy: p.cutBy,
    turnovers,
    maxQuanta,
    zeroPoint: g0,
  };
  return cd ? { ...model, centrifugal } : model;
}

/** Past this point the remaining levels change q, ⟨m⟩ and var m by less than this relative amount. */
const TAIL_CUTOFF = 1e-17;

/**
 * Moments of the anharmonic factor at T (K): the vibrational level sum times the level-dependent part of
 * the rotor, Q = Σ_v w_v (1 + a_v T) e^{−θ_v/T} (the ground-state rotor is a separate factor).
 *
 * Formula, with m_v = T d ln[w_v (1 + a_v T) e^{−θ_v/T}]/dT = θ_v/T + a_v T/(1 + a_v T) and p_v the
 * normalised terms: lnQ = ln Σ, meanU = ⟨m⟩, varU = d(T⟨m⟩)/dT = var m + ⟨a T/(1 + aT) + aT/(1 + aT)²⟩,
 * exactly (analytic derivatives; no numerical differentiation). Without centrifugal terms this is
 * `levelSumMoments` itself (m_v = u_v). Levels are visited in rising energy and the sum stops, as in
 * level-sum.ts, once the remaining weight (times max(1 + aT)) times e^{−u}(1 + u²) is below 1e-17 of Q.
 * Valid for T > 0 within the model's assumptions (see the file comment). Source: McQuarrie, Statistical
 * Mechanics (1976), eqs. 2-30 to 2-34, with the level-dependent rotor as above.
 */
export function anharmonicMoments(model: AnharmonicLevels, T: number): PartitionMoments {
  const a = model.centrifugal;
  if (!a) return levelSumMoments(model.levels, T);
  const { theta, weight, tailWeight } = model.levels;
  const n = theta.length;
  const invT = 1 / T;
  const tailFactor = 1 + model.maxCentrifugal * T;
  // Plain (unshifted) sums: the lowest level is at m ≈ 0 with weight ≥ 1, so ⟨m⟩²/var m stays of the order of
  // the number of modes and Σ w m² − (Σ w m)²/Σ w loses no more than a few ulps; this saves the division per
  // level of a running mean.
  let q = 0;
  let sum1 = 0;
  let sum2 = 0;
  let curvature = 0;
  for (let i = 0; i < n; i++) {
    const u = theta[i]! * invT;
    const e = Math.exp(-u);
    if (u > 20 && tailWeight[i]! * tailFactor * e * (1 + u * u) < TAIL_CUTOFF * q) break;
    const at = a[i]! * T;
    const f = 1 + at;
    const w = weight[i]! * f * e;
    if (w === 0) break;
    const r = at / f;
    const m = u + r;
    q += w;
    sum1 += w * m;
    sum2 += w * m * m;
    curvature += w * (r + r / f);
  }
  const mean = sum1 / q;
  return { lnQ: Math.log(q), meanU: mean, varU: Math.max(sum2 / q - mean * mean, 0) + curvature / q };
}
