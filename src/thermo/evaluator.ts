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
  ThermoGrid,
  ThermoPoint,
} from '../model.js';
import { diatomicLevels, diatomicSpinManifolds, higherOrderTermsOf, type DiatomicStateLevels } from '../partition/diatomic.js';
import { electronicLevelList } from '../partition/electronic.js';
import { addPointwise, momentsAt, temperatureGrid, zeroGridMoments, type GridMoments, type TemperatureGrid } from '../partition/grid-moments.js';
import { addHarmonicGrid } from '../partition/harmonic.js';
import { describeTorsionPotential, HINDERED_ROTOR_CEILING_TEMPERATURE, hinderedRotorLevels } from '../partition/hindered-rotor.js';
import { opticalIsomerFactor } from './optical-isomers.js';
import type { LevelList } from '../partition/level-sum.js';
import { addLevelSumGrid } from '../partition/level-sum-grid.js';
import type { PartitionMoments } from '../partition/moments.js';
import { addLinearRotorGrid, linearRotorLevelList } from '../partition/rigid-rotor-linear.js';
import { addNonlinearRotorGrid } from '../partition/rigid-rotor-nonlinear.js';
import { addFrozenMixtureGrid, DEFAULT_NUCLEAR_SPIN_MIXTURE, type GridContribution } from '../partition/spin-mixture.js';
import { addTranslationalGrid } from '../partition/translational.js';
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

/** One factor of the partition function in grid form: adds its lnQ, meanU, varU at every grid T. */
type GridFactor = (grid: TemperatureGrid, into: GridMoments) => void;

/** A factor that only has the per-point form, evaluated at each grid temperature. */
const pointwise =
  (moments: (T: number) => PartitionMoments): GridFactor =>
  (grid, into) =>
    addPointwise(moments, grid, into);

/** The per-point form of a set of grid factors (for models that combine moments per temperature). */
const momentsOfFactors =
  (factors: readonly GridFactor[]) =>
  (T: number): PartitionMoments => {
    const grid = temperatureGrid([T]);
    const m = zeroGridMoments(1);
    for (const f of factors) f(grid, m);
    return momentsAt(m, 0);
  };

const levelSumFactor =
  (levels: LevelList): GridFactor =>
  (grid, into) =>
    addLevelSumGrid(levels, grid, into);

/**
 * Internal factors of a polyatomic: rigid rotor × vibrations × electronic levels (independent factors, so
 * their moments add). The linear rotor is a direct sum over J; the nonlinear one is classical.
 */
function polyatomicInternal(
  species: LinearSpecies | NonlinearSpecies,
  contributions: string[],
  maxTemperature: number,
): GridFactor[] {
  const el = electronicLevelList(species.electronicLevels);
  const sigma = species.symmetryNumber;
  let rotor: GridFactor;
  if (species.structure === 'linear') {
    const [B] = species.rotationalConstants;
    contributions.push(`rigid rotor, linear, direct sum over J (B = ${B} cm-1, sigma = ${sigma})`);
    const levels = linearRotorLevelList(B, maxTemperature);
    rotor = (grid, into) => addLinearRotorGrid(levels, sigma, grid, into);
  } else {
    const abc = species.rotationalConstants;
    contributions.push(`rigid rotor, nonlinear, classical (A, B, C = ${abc.join(', ')} cm-1, sigma = ${sigma})`);
    rotor = (grid, into) => addNonlinearRotorGrid(abc, sigma, grid, into);
  }
  if (species.geometryNotes) contributions.push(...species.geometryNotes);
  const vibrationAt = vibrationFactor(species, contributions);
  // Plain harmonic oscillators have a grid form (the same formula); the other vibration models run per T.
  const harmonic = species.anharmonicity === undefined && species.centrifugalDistortion === undefined;
  const vibration: GridFactor = harmonic ? (grid, into) => addHarmonicGrid(species.vibrations, grid, into) : pointwise(vibrationAt);
  contributions.push(`electronic level sum (${species.electronicLevels.length} levels)`);
  const optical = opticalIsomerFactor(species, contributions);
  const constant: GridFactor[] = optical ? [pointwise(() => optical)] : [];
  // Each torsion is one more independent factor (its levels built here, once).
  const torsions = (species.internalRotors ?? []).map((r) => {
    const levels = hinderedRotorLevels(r, { ceilingTemperature: maxTemperature });
    contributions.push(
      `hindered internal rotor, direct level sum (${describeTorsionPotential(r)}, sigma = ${r.symmetryNumber}, B = ${r.rotationalConstant} cm-1, ${levels.energies.length} levels, |m| <= ${levels.basisLimit})`,
    );
    return levelSumFactor(levels.list);
  });
  return [rotor, ...constant, vibration, levelSumFactor(el), ...torsions];
}

/**
 * Build the thermodynamic model of a species. Level lists are built here, once; `grid` and `at` only sum them.
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
export function createThermoEvaluator(
  species: Species,
  options?: Partial<PhysicsOptions>,
  range: { maxTemperature?: number } = {},
): ThermoEvaluator {
  const opts = normalisePhysicsOptions(options);
  // Level lists that need a ceiling (hindered and linear rotors) are complete up to this temperature.
  const maxTemperature = range.maxTemperature ?? HINDERED_ROTOR_CEILING_TEMPERATURE;
  if (!(maxTemperature >= T_REF && maxTemperature <= HINDERED_ROTOR_CEILING_TEMPERATURE)) {
    throw new PhysicsOptionsError(`maxTemperature must be within ${T_REF}-${HINDERED_ROTOR_CEILING_TEMPERATURE} K, got ${maxTemperature}`);
  }
  const p = opts.standardPressure;
  const mass = species.molarMass;
  const contributions: string[] = [`translational (Sackur-Tetrode), M = ${mass} g/mol`];
  const notes: string[] = [];
  /** The internal degrees of freedom: one partition function, or a mixture of independently populated parts. */
  let internal: { factors: GridFactor[] } | { mixture: (grid: TemperatureGrid, into: GridContribution) => void };
  let spinMixture: NuclearSpinMixture | undefined;

  switch (species.structure) {
    case 'atom': {
      const el = electronicLevelList(species.electronicLevels);
      contributions.push(`electronic level sum (${species.electronicLevels.length} levels)`);
      internal = { factors: [levelSumFactor(el)] };
      break;
    }
    case 'linear':
    case 'nonlinear': {
      const conformers = species.conformers;
      if (conformers) {
        // The conformer sum combines per-temperature moments; each conformer is the plain factorisation.
        const of = (part: PolyatomicMolecularPart, lines: string[]) =>
          momentsOfFactors(polyatomicInternal({ ...species, ...part } as typeof species, lines, maxTemperature));
        internal = { factors: [pointwise(conformerSum(conformers, of, contributions))] };
      } else {
        internal = { factors: polyatomicInternal(species, contributions, maxTemperature) };
      }
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
        internal = { mixture: (grid, into) => addFrozenMixtureGrid(components, grid, into) };
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
        internal = { factors: [levelSumFactor(levels.levels)] };
      }
      break;
    }
    default: {
      const never: never = species;
      throw new Error(`unknown structure ${(never as { structure: string }).structure}`);
    }
  }

  /**
   * Cp/R, (H − H0)/RT and S/R at every temperature: each factor adds its moments over the whole grid
   * (typed arrays, no object per temperature), then Cp/R = Σ varU, (H − H0)/RT = Σ meanU, S/R = Σ (lnQ +
   * meanU). Each temperature's numbers depend on that temperature alone, so `at(T)` equals the grid value.
   */
  const grid = (temperatures: ArrayLike<number>): ThermoGrid => {
    const g = temperatureGrid(temperatures);
    if (g.max > maxTemperature) {
      throw new PhysicsOptionsError(`T = ${g.max} K is above ${maxTemperature} K, the highest temperature this evaluator was built for`);
    }
    const n = g.T.length;
    const out: ThermoGrid = { T: g.T, cp: new Float64Array(n), hmh0: new Float64Array(n), s: new Float64Array(n) };
    const m = zeroGridMoments(n);
    addTranslationalGrid(mass, p, g, m);
    if ('mixture' in internal) {
      internal.mixture(g, out);
      for (let j = 0; j < n; j++) {
        out.cp[j]! += m.varU[j]!;
        out.hmh0[j]! += m.meanU[j]!;
        out.s[j]! += m.lnQ[j]! + m.meanU[j]!;
      }
    } else {
      // The internal factors in their own sum, then added to translation: the same operations whatever
      // combines them (one conformer gives back the plain species bit for bit).
      const mi = zeroGridMoments(n);
      for (const factor of internal.factors) factor(g, mi);
      for (let j = 0; j < n; j++) {
        const meanU = m.meanU[j]! + mi.meanU[j]!;
        out.cp[j] = m.varU[j]! + mi.varU[j]!;
        out.hmh0[j] = meanU;
        out.s[j] = m.lnQ[j]! + mi.lnQ[j]! + meanU;
      }
    }
    return out;
  };
  const at = (T: number): ThermoPoint => {
    const r = grid([T]);
    return { T, cp: r.cp[0]!, hmh0: r.hmh0[0]!, s: r.s[0]! };
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

  return { species, at, grid, h298MinusH0, enthalpyOfFormation298, summary };
}
