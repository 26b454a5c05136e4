/**
 * Full rovibronic partition function of a diatomic molecule: an explicit sum over every bound
 * (v, J) level of every listed electronic state.
 */
import { C2_CM_K } from '../constants.js';
import type { DiatomicState, NuclearSpinWeights } from '../model.js';
import { createLevelList, levelSumMoments, type LevelList } from './level-sum.js';
import { LevelSumError, type PartitionMoments } from './moments.js';
import type { FrozenMixtureComponent } from './spin-mixture.js';

/** No real diatomic has more bound vibrational levels than this; more means the constants are unusable. */
export const MAX_VIBRATIONAL_LEVELS = 2000;
/** No real diatomic has a bound rotational ladder longer than this. */
export const MAX_ROTATIONAL_LEVELS = 20000;
/** Upper bound on the whole level list (keeps memory and evaluation time sane). */
export const MAX_TOTAL_LEVELS = 5_000_000;

/** What the level sum needs from a diatomic species (a subset of `DiatomicSpecies`). */
export interface DiatomicModelInput {
  name?: string;
  symmetryNumber: number;
  /** D0 of the ground state from its lowest level, cm⁻¹. */
  dissociationEnergy: number;
  nuclearSpinWeights?: NuclearSpinWeights;
  /** Ground state first. */
  electronicStates: readonly DiatomicState[];
}

/** Per-state bookkeeping of the level enumeration, for the model summary and the tests. */
export interface DiatomicStateLevels {
  term: string;
  /** Dissociation limit used for this state, cm⁻¹ above the molecule's lowest level. */
  limit: number;
  vibrationalLevels: number;
  levels: number;
  /** Largest J included in any v ladder. */
  maxJ: number;
  /** Why the v ladder ended: 'limit', 'turnover' (G(v) stopped rising) or 'B_v<=0'. */
  vEnd: 'limit' | 'turnover' | 'B_v<=0' | 'unbound';
  /** How many J ladders ended because E(v,J) stopped rising (the others reached the limit). */
  rotationalTurnovers: number;
}

export interface DiatomicLevels {
  levels: LevelList;
  states: DiatomicStateLevels[];
}

/**
 * Vibrational term G(v) = ωe(v+½) − ωexe(v+½)² + ωeye(v+½)³ + ωeze(v+½)⁴, cm⁻¹ above the potential
 * minimum (ωeze absent = 0). Valid where the constants were fitted (see `diatomicTermValue`).
 * Sources: Herzberg, Molecular Spectra and Molecular Structure I (1950), ch. III (eq. III,75 and the
 * higher powers after it); Huber & Herzberg, Constants of Diatomic Molecules (1979), introduction.
 */
export function vibrationalTerm(state: DiatomicState, v: number): number {
  const h = v + 0.5;
  return state.we * h - state.wexe * h * h + state.weye * h * h * h + (state.weze ?? 0) * h * h * h * h;
}

/**
 * Rotational constant of level v, B_v = Be − αe(v+½) + γe(v+½)², cm⁻¹ (γe absent = 0).
 * Sources: Herzberg (1950) ch. III (eq. III,112 and the γe term after it); Huber & Herzberg (1979).
 */
export function rotationalConstantOf(state: DiatomicState, v: number): number {
  const h = v + 0.5;
  return state.Be - state.alphae * h + (state.gammae ?? 0) * h * h;
}

/**
 * Quartic centrifugal constant of level v, D_v = De + βe(v+½), cm⁻¹ (βe absent = 0). Huber & Herzberg
 * (1979) sign convention: the term enters as −D_v·J²(J+1)². Source: Herzberg (1950) ch. III.
 */
export function centrifugalConstantOf(state: DiatomicState, v: number): number {
  return state.De + (state.betae ?? 0) * (v + 0.5);
}

/**
 * Term value of level (v, J) of a state, cm⁻¹ above the ground-state potential minimum.
 *
 * Formula, with x = J(J+1):
 *   E(v,J) = Te + G(v) + B_v·x − D_v·x² + H_v·x³,
 *   G(v) = ωe(v+½) − ωexe(v+½)² + ωeye(v+½)³ + ωeze(v+½)⁴,
 *   B_v = Be − αe(v+½) + γe(v+½)²,  D_v = De + βe(v+½),  H_v = He.
 * The higher-order constants (ωeze, γe, βe, He) are optional and 0 when absent; adding an exact 0
 * changes no bit, so states without them give the three-term G(v), linear B_v, D_v = De levels exactly.
 * This is Dunham's double series E = Σ Y_lm (v+½)^l x^m cut after the listed terms, in band-spectrum
 * notation (Y01 = Be, Y11 = −αe, Y21 = γe, Y02 = −De, Y12 = −βe, Y03 = He; Dunham's small corrections
 * to these identities are ignored, as in the tables).
 * Units: cm⁻¹ (every constant and the result).
 * Validity: the v, J region the published constants were fitted to. The series in x is asymptotic, so
 * far outside it (high J near the dissociation limit) each added term moves the levels a lot; a
 * truncated series can turn over (dE/dJ ≤ 0) well below the limit, which is why the J ladders stop
 * there. With He > 0 the turnover may disappear and the ladder then ends at the limit.
 * Sources: Herzberg, Molecular Spectra and Molecular Structure I, Spectra of Diatomic Molecules (1950),
 * ch. III (eqs. III,75 and III,112 and the higher-order terms after them); Huber & Herzberg, Constants
 * of Diatomic Molecules (1979), introduction (notation, signs); J. L. Dunham, Phys. Rev. 41, 721 (1932).
 */
export function diatomicTermValue(state: DiatomicState, v: number, J: number): number {
  const x = J * (J + 1);
  const G = vibrationalTerm(state, v);
  const Bv = rotationalConstantOf(state, v);
  const Dv = centrifugalConstantOf(state, v);
  const Hv = state.He ?? 0;
  return state.energy + G + Bv * x - Dv * x * x + Hv * x * x * x;
}

/**
 * The non-zero higher-order constants of a state as `name = value cm-1` texts, in input-field names
 * (empty for a state described by ωe, ωexe, ωeye, Be, αe, De only). For the model summary.
 */
export function higherOrderTermsOf(state: DiatomicState): string[] {
  const terms: [string, number | undefined][] = [
    ['weze', state.weze],
    ['gammae', state.gammae],
    ['betae', state.betae],
    ['He', state.He],
  ];
  return terms.filter(([, value]) => value !== undefined && value !== 0).map(([name, value]) => `${name} = ${value} cm-1`);
}

/** Every bound level of every state, before any σ or nuclear-spin factor is applied. */
interface EnumeratedLevels {
  /** cm⁻¹ above the ground-state potential minimum. */
  energies: Float64Array;
  /** g_el·(2J+1). */
  weights: Float64Array;
  /** 1 for even J, 0 for odd. */
  evenJ: Uint8Array;
  states: DiatomicStateLevels[];
}

/**
 * Typed columns that double when full: a diatomic has tens of thousands of levels, and pushing them onto
 * plain arrays (three of them, one of booleans) made ~2 MB of garbage per molecule in copies and boxes.
 */
class LevelColumns {
  count = 0;
  energies = new Float64Array(1024);
  weights = new Float64Array(1024);
  evenJ = new Uint8Array(1024);

  push(energy: number, weight: number, even: boolean): void {
    if (this.count === this.energies.length) {
      const size = 2 * this.count;
      const e = new Float64Array(size);
      e.set(this.energies);
      const w = new Float64Array(size);
      w.set(this.weights);
      const p = new Uint8Array(size);
      p.set(this.evenJ);
      this.energies = e;
      this.weights = w;
      this.evenJ = p;
    }
    this.energies[this.count] = energy;
    this.weights[this.count] = weight;
    this.evenJ[this.count] = even ? 1 : 0;
    this.count++;
  }
}

/**
 * Enumerate all bound levels with weight g_el·(2J+1) and the parity of J.
 *
 * The dissociation limit is the ground state's lowest level plus D0; a state with its own
 * `dissociationEnergy` uses its lowest level plus that value. A v ladder ends where G(v) turns over,
 * where B_v ≤ 0, or where E(v,0) reaches the limit; a J ladder ends where E(v,J) stops rising
 * (dE/dJ ≤ 0) or reaches the limit (with He > 0 it may only end at the limit). Quasi-bound levels
 * above the limit are excluded.
 * Throws LevelSumError if a ladder does not terminate within the bounds above.
 */
function enumerateLevels(input: DiatomicModelInput): EnumeratedLevels {
  const states = input.electronicStates;
  const ground = states[0];
  if (!ground) throw new LevelSumError(`${input.name ?? 'diatomic'}: no electronic states`);
  const groundLowest = diatomicTermValue(ground, 0, 0);
  const commonLimit = groundLowest + input.dissociationEnergy;

  const levels = new LevelColumns();
  const summary: DiatomicStateLevels[] = [];
  const where = (s: DiatomicState) => `${input.name ?? 'diatomic'} state ${s.term}`;
  for (const state of states) {
    const ownLowest = diatomicTermValue(state, 0, 0);
    const limit = state.dissociationEnergy !== undefined ? ownLowest + state.dissociationEnergy : commonLimit;
    const info: DiatomicStateLevels = {
      term: state.term,
      limit: limit - groundLowest,
      vibrationalLevels: 0,
      levels: 0,
      maxJ: 0,
      vEnd: 'unbound',
      rotationalTurnovers: 0,
    };
    summary.push(info);
    let previousG = -Infinity;
    for (let v = 0; ; v++) {
      if (v >= MAX_VIBRATIONAL_LEVELS) {
        throw new LevelSumError(`${where(state)}: vibrational ladder not terminated below v = ${MAX_VIBRATIONAL_LEVELS}`);
      }
      const G = vibrationalTerm(state, v);
      const Bv = rotationalConstantOf(state, v);
      const Dv = centrifugalConstantOf(state, v);
      const base = state.energy + G;
      if (v > 0 && G <= previousG) {
        info.vEnd = 'turnover';
        break;
      }
      if (Bv <= 0) {
        info.vEnd = 'B_v<=0';
        break;
      }
      if (base >= limit) {
        if (v > 0) info.vEnd = 'limit';
        break;
      }
      previousG = G;
      const g = state.degeneracy;
      // With He > 0 the ladder may never turn over: E then grows like He·x³ and ends at the limit, and
      // MAX_ROTATIONAL_LEVELS still bounds it for constants in the wrong unit.
      const Hv = state.He ?? 0;
      let previousE = -Infinity;
      let J = 0;
      for (; ; J++) {
        if (J >= MAX_ROTATIONAL_LEVELS) {
          throw new LevelSumError(`${where(state)}: rotational ladder of v = ${v} not terminated below J = ${MAX_ROTATIONAL_LEVELS}`);
        }
        const x = J * (J + 1);
        const E = base + Bv * x - Dv * x * x + Hv * x * x * x;
        if (E >= limit) break;
        if (E <= previousE) {
          info.rotationalTurnovers++;
          break;
        }
        previousE = E;
        levels.push(E, g * (2 * J + 1), J % 2 === 0);
      }
      info.levels += J;
      if (J - 1 > info.maxJ) info.maxJ = J - 1;
      info.vibrationalLevels++;
      if (levels.count > MAX_TOTAL_LEVELS) {
        throw new LevelSumError(`${input.name ?? 'diatomic'}: more than ${MAX_TOTAL_LEVELS} bound levels`);
      }
    }
  }
  const n = levels.count;
  if (n === 0) throw new LevelSumError(`${input.name ?? 'diatomic'}: no bound levels below the dissociation limit`);
  return { energies: levels.energies.subarray(0, n), weights: levels.weights.subarray(0, n), evenJ: levels.evenJ.subarray(0, n), states: summary };
}

/**
 * All bound levels in ONE level list (one Boltzmann distribution), weights g_el·(2J+1)·f(J): f = 1/σ
 * without nuclear spin weights; with them f = even/(even+odd) or odd/(even+odd) for even or odd J, i.e.
 * the EQUILIBRIUM ortho/para mixture, normalised so the conventional entropy excludes nuclear spin (at
 * high T f averages to 1/σ with σ = 2). Energies are measured from the lowest level found (the ground
 * state's v = 0, J = 0). For the frozen mixture see `diatomicSpinManifolds`.
 * Throws LevelSumError if a ladder does not terminate within the bounds above.
 */
export function diatomicLevels(input: DiatomicModelInput): DiatomicLevels {
  const { energies, weights, evenJ, states } = enumerateLevels(input);
  const spin = input.nuclearSpinWeights;
  const spinTotal = spin ? spin.even + spin.odd : 0;
  const evenFactor = spin ? spin.even / spinTotal : 1 / input.symmetryNumber;
  const oddFactor = spin ? spin.odd / spinTotal : 1 / input.symmetryNumber;
  // Levels of a manifold with spin weight 0 do not exist; drop them rather than give them weight 0.
  const e = new Float64Array(energies.length);
  const w = new Float64Array(energies.length);
  let kept = 0;
  for (let i = 0; i < energies.length; i++) {
    const f = evenJ[i] ? evenFactor : oddFactor;
    if (f === 0) continue;
    e[kept] = energies[i]!;
    w[kept] = weights[i]! * f;
    kept++;
  }
  return { levels: createLevelList(e.subarray(0, kept), w.subarray(0, kept), C2_CM_K), states };
}

/** The even-J and odd-J manifolds of a homonuclear diatomic as components of a frozen mixture. */
export interface DiatomicSpinManifolds {
  /** Manifolds with a non-zero spin weight, even J first. */
  components: FrozenMixtureComponent[];
  states: DiatomicStateLevels[];
}

/**
 * Split the levels into the even-J and odd-J manifolds, each with weight g_el·(2J+1) (no σ, no spin
 * weight) and mole fraction x = even/(even+odd) or odd/(even+odd), for the FROZEN ortho/para mixture of
 * spin-mixture.ts. Each list is measured from its own lowest level; `offsetTheta` records that level's
 * height above the molecule's lowest level (c2·Δε, K), so both manifolds share one energy zero (para
 * J = 0 for H2). A manifold with spin weight 0 is omitted.
 * Requires `nuclearSpinWeights`; throws LevelSumError without them or if a manifold has no bound level.
 */
export function diatomicSpinManifolds(input: DiatomicModelInput): DiatomicSpinManifolds {
  const spin = input.nuclearSpinWeights;
  if (!spin) throw new LevelSumError(`${input.name ?? 'diatomic'}: a frozen spin mixture needs nuclear spin weights`);
  const { energies, weights, evenJ, states } = enumerateLevels(input);
  const total = spin.even + spin.odd;
  const manifolds: { label: string; fraction: number; e: number[]; w: number[]; own: number }[] = [];
  for (const [label, even, g] of [['even J', true, spin.even], ['odd J', false, spin.odd]] as const) {
    if (g === 0) continue;
    const m = { label, fraction: g / total, e: [] as number[], w: [] as number[], own: Infinity };
    for (let i = 0; i < energies.length; i++) {
      if ((evenJ[i] === 1) !== even) continue;
      m.e.push(energies[i]!);
      m.w.push(weights[i]!);
      if (energies[i]! < m.own) m.own = energies[i]!;
    }
    if (m.e.length === 0) throw new LevelSumError(`${input.name ?? 'diatomic'}: no bound ${label} levels`);
    manifolds.push(m);
  }
  // The common zero is the lowest level that exists (a manifold of spin weight 0 has no levels), as in
  // the single-list sum, so both mixtures give the same H − H0 scale.
  const lowest = Math.min(...manifolds.map((m) => m.own));
  const components: FrozenMixtureComponent[] = manifolds.map((m) => ({
    label: m.label,
    fraction: m.fraction,
    levels: createLevelList(m.e, m.w, C2_CM_K),
    offsetTheta: (m.own - lowest) * C2_CM_K,
  }));
  return { components, states };
}

/**
 * Moments of the rovibronic level sum at T (K); see level-sum.ts. Build the level list once with
 * `diatomicLevels` and evaluate it at many temperatures.
 * Valid 0 < T; the accuracy at high T is limited by the constants (Dunham truncation, missing
 * electronic states), not by the sum.
 */
export function diatomicMoments(levels: DiatomicLevels, T: number): PartitionMoments {
  return levelSumMoments(levels.levels, T);
}
