/**
 * Combine the partition-function factors of a species into its thermodynamic functions.
 */
import { CONSTANTS_EDITION, GAS_CONSTANT, STANDARD_PRESSURE_BAR, T_REF } from '../constants.js';
import type {
  LinearSpecies,
  ModelSummary,
  NonlinearSpecies,
  NuclearSpinMixture,
  PhysicsOptions,
  PolyatomicMolecularPart,
  Species,
  ThermoEvaluator,
  ThermoPoint,
} from '../model.js';
import { diatomicLevels, diatomicSpinManifolds, higherOrderTermsOf, type DiatomicStateLevels } from '../partition/diatomic.js';
import { electronicLevelList } from '../partition/electronic.js';
import { describeTorsionPotential, hinderedRotorLevels, hinderedRotorMoments } from '../partition/hindered-rotor.js';
import { opticalIsomerFactor } from './optical-isomers.js';
import { levelSumMoments, type LevelList } from '../partition/level-sum.js';
import {
  addContributions,
  addMoments,
  assertTemperature,
  contributionOf,
  type PartitionMoments,
  type ThermoContribution,
} from '../partition/moments.js';
import { linearRotorMoments } from '../partition/rigid-rotor-linear.js';
import { nonlinearRotorMoments } from '../partition/rigid-rotor-nonlinear.js';
import { DEFAULT_NUCLEAR_SPIN_MIXTURE, frozenMixtureContribution } from '../partition/spin-mixture.js';
import { translationalMoments } from '../partition/translational.js';
import { ELECTRON_CONVENTION, formationEnthalpyAt298 } from './reference-states.js';
import { vibrationFactor } from './vibration-model.js';
import { conformerSum } from './conformers.js';

export class PhysicsOptionsError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'PhysicsOptionsError';
  }
}

/** Points remembered per evaluator (a fit grid of ~600 T plus check points fits comfortably). */
const MEMO_LIMIT = 8192;

export const DEFAULT_PHYSICS_OPTIONS: Readonly<PhysicsOptions> = Object.freeze({
  standardPressure: STANDARD_PRESSURE_BAR,
});

/** Fill defaults and check options once, so the physics never sees a partial or bad option set. */
export function normalisePhysicsOptions(options: Partial<PhysicsOptions> = {}): PhysicsOptions {
  const standardPressure = options.standardPressure ?? DEFAULT_PHYSICS_OPTIONS.standardPressure;
  if (!(Number.isFinite(standardPressure) && standardPressure > 0)) {
    throw new PhysicsOptionsError(`standardPressure must be a finite pressure > 0 Pa, got ${standardPressure}`);
  }
  return { standardPressure };
}

/**
 * Internal factors of a polyatomic: rigid rotor × harmonic oscillators × electronic levels (independent
 * factors, so their moments add). The linear rotor is a direct sum over J; the nonlinear one is classical.
 */
function polyatomicInternal(
  species: LinearSpecies | NonlinearSpecies,
  contributions: string[],
): (T: number) => PartitionMoments {
  const el = electronicLevelList(species.electronicLevels);
  const sigma = species.symmetryNumber;
  let rotor: (T: number) => PartitionMoments;
  if (species.structure === 'linear') {
    const [B] = species.rotationalConstants;
    contributions.push(`rigid rotor, linear, direct sum over J (B = ${B} cm-1, sigma = ${sigma})`);
    rotor = (T) => linearRotorMoments(B, sigma, T);
  } else {
    const abc = species.rotationalConstants;
    contributions.push(`rigid rotor, nonlinear, classical (A, B, C = ${abc.join(', ')} cm-1, sigma = ${sigma})`);
    rotor = (T) => nonlinearRotorMoments(abc, sigma, T);
  }
  if (species.geometryNotes) contributions.push(...species.geometryNotes);
  const vibration = vibrationFactor(species, contributions);
  contributions.push(`electronic level sum (${species.electronicLevels.length} levels)`);
  const rotors = species.internalRotors;
  const optical = opticalIsomerFactor(species, contributions);
  if (optical) {
    const plain = rotor;
    rotor = (T) => addMoments([plain(T), optical]);
  }
  if (rotors === undefined || rotors.length === 0) {
    return (T) => addMoments([rotor(T), vibration(T), levelSumMoments(el, T)]);
  }
  // Each torsion is one more independent factor (its levels built here, once); species without rotors keep
  // the three-factor sum above, bit for bit.
  const torsions = rotors.map((r) => {
    const levels = hinderedRotorLevels(r);
    contributions.push(
      `hindered internal rotor, direct level sum (${describeTorsionPotential(r)}, sigma = ${r.symmetryNumber}, B = ${r.rotationalConstant} cm-1, ${levels.energies.length} levels, |m| <= ${levels.basisLimit})`,
    );
    return levels;
  });
  return (T) =>
    addMoments([rotor(T), vibration(T), levelSumMoments(el, T), ...torsions.map((l) => hinderedRotorMoments(l, T))]);
}

/**
 * Build the thermodynamic model of a species. Level lists are built here, once; `at(T)` only sums them.
 *
 * Factorisation by structure (each factor documented in src/partition/):
 *   atom       q = q_trans · q_el
 *   linear     q = q_trans · q_rot(direct J sum) · q_vib(harmonic) · q_el
 *   nonlinear  q = q_trans · q_rot(classical)    · q_vib(harmonic) · q_el
 *   (linear and nonlinear also · Π q_torsion(hindered rotor, direct level sum) when internal rotors are given)
 *   diatomic   q = q_trans · q_rovibronic (explicit sum over all bound levels of all states)
 * Then Cp/R = Σ varU, (H − H0)/RT = Σ meanU, S/R = Σ (lnQ + meanU), exactly from the moments.
 * A diatomic with nuclear spin weights and `nuclearSpinMixture: 'frozen'` has no single q_rovibronic: its
 * even-J and odd-J manifolds are a fixed-composition mixture (src/partition/spin-mixture.ts) whose
 * already-combined contributions are added to the translational ones.
 * H0 is the lowest level of the species (the zero-point level for vibrations).
 */
export function createThermoEvaluator(species: Species, options?: Partial<PhysicsOptions>): ThermoEvaluator {
  const opts = normalisePhysicsOptions(options);
  const p = opts.standardPressure;
  const mass = species.molarMass;
  const contributions: string[] = [`translational (Sackur-Tetrode), M = ${mass} g/mol`];
  const notes: string[] = [];
  /** The internal degrees of freedom: one partition function, or a mixture of independently populated parts. */
  let internal: { moments: (T: number) => PartitionMoments } | { mixture: (T: number) => ThermoContribution };
  let spinMixture: NuclearSpinMixture | undefined;

  switch (species.structure) {
    case 'atom': {
      const el = electronicLevelList(species.electronicLevels);
      contributions.push(`electronic level sum (${species.electronicLevels.length} levels)`);
      internal = { moments: (T) => levelSumMoments(el, T) };
      break;
    }
    case 'linear':
    case 'nonlinear': {
      const conformers = species.conformers;
      const of = (part: PolyatomicMolecularPart, lines: string[]) => polyatomicInternal({ ...species, ...part } as typeof species, lines);
      internal = { moments: conformers ? conformerSum(conformers, of, contributions) : polyatomicInternal(species, contributions) };
      break;
    }
    case 'diatomic': {
      const spin = species.nuclearSpinWeights;
      const mixture: NuclearSpinMixture | undefined = spin ? (species.nuclearSpinMixture ?? DEFAULT_NUCLEAR_SPIN_MIXTURE) : undefined;
      spinMixture = mixture;
      const describeStates = (states: readonly DiatomicStateLevels[]) => {
        states.forEach((s, i) => {
          notes.push(
            `state ${s.term}: ${s.vibrationalLevels} vibrational levels (ladder end: ${s.vEnd}), ${s.levels} levels, J <= ${s.maxJ}, limit ${s.limit.toFixed(3)} cm-1 above the lowest level`,
          );
          // Only states that use them get this note, so the summary of every other state is unchanged.
          const higher = higherOrderTermsOf(species.electronicStates[i]!);
          if (higher.length > 0) {
            notes.push(
              `state ${s.term}: higher-order level constants ${higher.join(', ')}; ${s.rotationalTurnovers} of ${s.vibrationalLevels} J ladders end where E(v,J) turns over, the rest at the limit`,
            );
          }
        });
      };
      if (spin && mixture === 'frozen') {
        const { components, states } = diatomicSpinManifolds(species);
        const counts = components.map((c) => `${c.levels.theta.length} ${c.label}`).join(', ');
        contributions.push(
          `rovibronic level sums over all bound levels, frozen even/odd-J mixture (${counts} levels, ${states.length} electronic states)`,
        );
        describeStates(states);
        notes.push(
          `nuclear spin weights even:odd = ${spin.even}:${spin.odd}; frozen mixture: even-J and odd-J manifolds at fixed mole fractions ${components
            .map((c) => `${c.label} ${c.fraction}`)
            .join(', ')} (no interconversion), energies from the molecule's lowest level; conventional entropy (nuclear spin and its mixing term excluded)`,
        );
        internal = { mixture: (T) => frozenMixtureContribution(components, T) };
      } else {
        const levels = diatomicLevels(species);
        contributions.push(
          `rovibronic level sum over all bound levels (${levels.levels.theta.length} levels, ${levels.states.length} electronic states)`,
        );
        describeStates(levels.states);
        notes.push(
          spin
            ? `nuclear spin weights even:odd = ${spin.even}:${spin.odd}, normalised by their sum (conventional entropy, nuclear spin excluded); equilibrium between even and odd J`
            : `symmetry number ${species.symmetryNumber} divides every level`,
        );
        internal = { moments: (T) => levelSumMoments(levels.levels, T) };
      }
      break;
    }
    default: {
      const never: never = species;
      throw new Error(`unknown structure ${(never as { structure: string }).structure}`);
    }
  }

  // The fit and the checks ask for the same temperatures; remembering recent points is safe because
  // `at` is a pure function of T. Bounded so a long-running process cannot grow it without limit.
  const memo = new Map<number, ThermoPoint>();
  const at = (T: number): ThermoPoint => {
    const known = memo.get(T);
    if (known) return { ...known };
    assertTemperature(T);
    let point: ThermoPoint;
    if ('mixture' in internal) {
      const c = addContributions([contributionOf(translationalMoments(mass, T, p)), internal.mixture(T)]);
      point = { T, cp: c.cp, hmh0: c.hmh0, s: c.s };
    } else {
      const m = addMoments([translationalMoments(mass, T, p), internal.moments(T)]);
      point = { T, cp: m.varU, hmh0: m.meanU, s: m.lnQ + m.meanU };
    }
    if (memo.size >= MEMO_LIMIT) memo.clear();
    memo.set(T, point);
    return { ...point };
  };

  // Same operand order as standardProperties, so H − H298 is exactly 0 at 298.15 K.
  const h298MinusH0 = GAS_CONSTANT * T_REF * at(T_REF).hmh0;
  const formation = species.enthalpyOfFormation;
  let enthalpyOfFormation298: number;
  if (formation.temperature === T_REF) {
    enthalpyOfFormation298 = formation.value;
  } else if (formation.temperature === 0) {
    enthalpyOfFormation298 = formationEnthalpyAt298(formation.value, h298MinusH0, species.composition, species.charge);
    notes.push(
      `enthalpy of formation converted from 0 K with CODATA (1989) reference-state H298-H0 of the elements${species.charge !== 0 ? `; electron: ${ELECTRON_CONVENTION}` : ''}`,
    );
  } else {
    throw new PhysicsOptionsError(
      `enthalpy of formation must be given at 298.15 K or 0 K, got ${formation.temperature} K`,
    );
  }

  const summary: ModelSummary = {
    structure: species.structure,
    contributions,
    options: {
      standardPressurePa: p,
      constants: CONSTANTS_EDITION,
      electronConvention: ELECTRON_CONVENTION,
      enthalpyZero: 'lowest level (H0 at 0 K)',
      ...(spinMixture ? { nuclearSpinMixture: spinMixture } : {}),
    },
    notes,
  };

  return { species, at, h298MinusH0, enthalpyOfFormation298, summary };
}
