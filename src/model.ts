/**
 * The normalised species model: what the validator produces from a YAML document and what the physics
 * consumes. Every quantity is already in internal units (cm⁻¹ for levels and spectroscopic constants, K
 * for temperatures, J/mol for formation enthalpies) and every default is filled in, so the physics never
 * looks at units or optional input.
 *
 * The input shape (with units and defaults) is defined by `schemas/species.schema.json`; this file is the
 * shape after normalisation.
 */

export type Structure = 'atom' | 'diatomic' | 'linear' | 'nonlinear';

/** An electronic level of an atom or polyatomic: term energy above the ground level and degeneracy g. */
export interface ElectronicLevel {
  /** cm⁻¹ above the lowest level. */
  energy: number;
  degeneracy: number;
  term?: string;
}

/** One (possibly degenerate) harmonic vibration. */
export interface Vibration {
  /** Fundamental wavenumber, cm⁻¹. */
  wavenumber: number;
  degeneracy: number;
}

/**
 * One-dimensional hindered internal rotor (torsion) with potential V(φ) = (V0/2)(1 − cos nφ); see
 * src/partition/hindered-rotor.ts. Replaces the torsion's harmonic vibration.
 */
export interface InternalRotor {
  /** Barrier height V0, cm⁻¹ (≥ 0). */
  barrier: number;
  /** Foldedness n: minima (and maxima) of the potential per full turn. */
  foldedness: number;
  /** Rotor symmetry number σ: the levels of the full 2π period are divided by it. */
  symmetryNumber: number;
  /** Reduced rotational constant B = h/(8π² c I_red), cm⁻¹. */
  rotationalConstant: number;
  /**
   * A general torsional potential, replacing the single cosine when present (src/partition/fourier-rotor.ts):
   * V(φ) = Σ cos·(1 − cos nφ)/2 + sin·sin(nφ)/2, cm⁻¹. `barrier` then holds max V − min V and `foldedness`
   * the largest n (they size the basis).
   */
  fourier?: FourierTerm[];
  /** When `fourier` was fitted to a scan: its size and fit residuals (cm⁻¹), for the model summary. */
  scanFit?: { points: number; terms: number; rmsResidual: number; maxResidual: number };
}

/** One term of a torsional Fourier potential: V_cos (1 − cos nφ)/2 + V_sin sin(nφ)/2, cm⁻¹. */
export interface FourierTerm {
  n: number;
  cos: number;
  sin: number;
}

/**
 * One electronic state of a diatomic molecule with its Dunham-type constants (Huber & Herzberg notation).
 * All in cm⁻¹.
 */
export interface DiatomicState {
  term: string;
  /** Te: electronic term energy of the potential minimum above the ground-state minimum. */
  energy: number;
  /** Electronic degeneracy (spin multiplicity × Λ-doubling factor). */
  degeneracy: number;
  we: number;
  wexe: number;
  weye: number;
  /** Third anharmonicity ωeze, cm⁻¹: + ωeze(v+½)⁴ in G(v). Absent = 0. */
  weze?: number;
  Be: number;
  alphae: number;
  /** Second vibration-rotation constant γe, cm⁻¹: B_v = Be − αe(v+½) + γe(v+½)². Absent = 0. */
  gammae?: number;
  /** Centrifugal distortion constant De, cm⁻¹: D_v = De + βe(v+½). */
  De: number;
  /** Vibrational dependence of the centrifugal distortion βe, cm⁻¹. Absent = 0. */
  betae?: number;
  /** Sextic centrifugal constant He, cm⁻¹: + H_v·J³(J+1)³ with H_v = He for all v. Absent = 0. */
  He?: number;
  /**
   * Dissociation energy D0 of this state measured from its own lowest level (v=0, J=0), cm⁻¹. When absent
   * the state shares the molecule's dissociation limit.
   */
  dissociationEnergy?: number;
}

/** Statistical weights of even-J and odd-J rotational levels of a homonuclear diatomic (nuclear spin). */
export interface NuclearSpinWeights {
  even: number;
  odd: number;
}

/**
 * How the even-J and odd-J manifolds of a homonuclear diatomic with nuclear spin weights are populated:
 * 'equilibrium' — one Boltzmann distribution over all levels (interconversion at every T; the basis of
 * NIST-JANAF H2); 'frozen' — fixed mole fractions even/(even+odd) and odd/(even+odd) (the high-temperature
 * ratio, e.g. "normal" H2 1:3), each manifold in its own Boltzmann distribution (no interconversion).
 */
export type NuclearSpinMixture = 'equilibrium' | 'frozen';

interface SpeciesBase {
  /** Record name, 1–16 chars of [A-Za-z0-9()+*,._-]. */
  name: string;
  /** Element symbol → atom count. */
  composition: Record<string, number>;
  charge: number;
  /** g/mol, electrons removed for cations. */
  molarMass: number;
  enthalpyOfFormation: {
    /** J/mol */
    value: number;
    /** 298.15 or 0 */
    temperature: number;
  };
  sources: string[];
  structure: Structure;
  /** Optional per-species temperature ranges for the fit; pipeline settings supply the default. */
  temperatureRanges?: { low?: number; mid?: number; high?: number };
  /** Optional per-species fit limits (same meaning as the settings' tolerances); settings supply the rest. */
  fitLimits?: SpeciesFitLimits;
  /** Standard uncertainties of the inputs (absent when the input declares none: every u is then zero). */
  uncertainties?: InputUncertainties;
}

/** Absolute parts and multiples of Cp/R of the fit limits of one species (dimensionless). */
export interface SpeciesFitLimits {
  cp?: number;
  h?: number;
  s?: number;
  relativeToCp?: { cp?: number; h?: number; s?: number };
}

/**
 * Standard uncertainties of a species' inputs, internal units; every key optional (absent = exact). See
 * `uncertainties` in schemas/species.schema.json and src/uncertainty/.
 */
export interface InputUncertainties {
  /** Fraction of each vibration wavenumber (or of ωe of each diatomic state). */
  vibrationsRelative?: number;
  /** cm⁻¹ per entry of `vibrations` (alternative to vibrationsRelative). */
  vibrations?: number[];
  /** Fraction by which all wavenumbers move together. */
  scaleFactorRelative?: number;
  rotationalConstantsRelative?: number;
  /** cm⁻¹ for each excited electronic level (or diatomic state Te). */
  electronicEnergies?: number;
  barriersRelative?: number;
  anharmonicRelative?: number;
  /** J/mol */
  enthalpyOfFormation?: number;
  molarMassRelative?: number;
}

export interface AtomSpecies extends SpeciesBase {
  structure: 'atom';
  electronicLevels: ElectronicLevel[];
}

/**
 * Anharmonic constants of a polyatomic (src/partition/anharmonic-vibration.ts); with them the wavenumbers of
 * `vibrations` are harmonic ω_i and the rotational constants are those of the vibrational ground state.
 * All cm⁻¹; mode indices are 0-based into `vibrations`, i <= j.
 */
export interface Anharmonicity {
  /** x_ij: + x_ij (v_i + d_i/2)(v_j + d_j/2) in G(v). */
  x: Array<[number, number, number]>;
  /** g_tt': + g_tt' l_t l_t' for doubly degenerate modes t, t'. */
  g: Array<[number, number, number]>;
  /** Per mode: [α_B] (linear) or [α_A, α_B, α_C] (nonlinear); B_v = B_0 − Σ α_i v_i. Absent: no coupling. */
  alpha?: number[][];
}

/** First-order centrifugal distortion, cm⁻¹: linear {DJ}; nonlinear Watson A-reduced {DJ, DJK, DK, dJ, dK}. */
export interface CentrifugalDistortion {
  DJ: number;
  DJK?: number;
  DK?: number;
  dJ?: number;
  dK?: number;
}

/** One conformer of a polyatomic species: its own molecular part and its energy above the lowest one. */
export interface Conformer extends PolyatomicMolecularPart {
  label: string;
  /** Lowest level (zero-point level) of this conformer above that of the lowest conformer, cm⁻¹. */
  energy: number;
}

/** The fields that describe one molecular structure of a linear or nonlinear species. */
export interface PolyatomicMolecularPart {
  symmetryNumber: number;
  electronicLevels: ElectronicLevel[];
  rotationalConstants: number[];
  vibrations: Vibration[];
  internalRotors?: InternalRotor[];
  anharmonicity?: Anharmonicity;
  centrifugalDistortion?: CentrifugalDistortion;
  /** Cut of the anharmonic vibrational level sum above the lowest level, cm⁻¹ (only with anharmonicity). */
  dissociationEnergy?: number;
  /** Scale factor already applied to `vibrations` (recorded for the model summary). */
  vibrationScaleFactor?: { value: number; source: string };
  /** What was derived from a geometry (constants, σ, reduced moments), in words, for the model summary. */
  geometryNotes?: string[];
}

/** Optional extensions of the polyatomic model; absent keys keep the normalised form (and hash) unchanged. */
interface PolyatomicExtensions {
  anharmonicity?: Anharmonicity;
  centrifugalDistortion?: CentrifugalDistortion;
  dissociationEnergy?: number;
  vibrationScaleFactor?: { value: number; source: string };
  /** What was derived from a geometry, in words, for the model summary (see PolyatomicMolecularPart). */
  geometryNotes?: string[];
  /** Number of optical isomers (2 for a chiral molecule): S/R += ln(opticalIsomers). Absent = 1. */
  opticalIsomers?: number;
  /** When present the partition function is the Boltzmann-weighted sum over these (src/thermo/conformers.ts). */
  conformers?: Conformer[];
}

export interface LinearSpecies extends SpeciesBase, PolyatomicExtensions {
  structure: 'linear';
  symmetryNumber: number;
  electronicLevels: ElectronicLevel[];
  /** [B] in cm⁻¹. */
  rotationalConstants: [number];
  vibrations: Vibration[];
  /** Hindered internal rotors (absent when the input has none, so the normalised form is unchanged). */
  internalRotors?: InternalRotor[];
}

export interface NonlinearSpecies extends SpeciesBase, PolyatomicExtensions {
  structure: 'nonlinear';
  symmetryNumber: number;
  electronicLevels: ElectronicLevel[];
  /** [A, B, C] in cm⁻¹. */
  rotationalConstants: [number, number, number];
  vibrations: Vibration[];
  /** Hindered internal rotors (absent when the input has none, so the normalised form is unchanged). */
  internalRotors?: InternalRotor[];
}

export interface DiatomicSpecies extends SpeciesBase {
  structure: 'diatomic';
  symmetryNumber: number;
  /** D0 of the ground state from its lowest level, cm⁻¹; defines the dissociation limit. */
  dissociationEnergy: number;
  nuclearSpinWeights?: NuclearSpinWeights;
  /** Only with `nuclearSpinWeights`; the validator always fills it there. Absent → 'equilibrium'. */
  nuclearSpinMixture?: NuclearSpinMixture;
  /** Ground state first. */
  electronicStates: DiatomicState[];
}

export type Species = AtomSpecies | LinearSpecies | NonlinearSpecies | DiatomicSpecies;

/**
 * Thermodynamic functions at one temperature, dimensionless, all relative to the lowest level (H0):
 * cp = Cp°/R, hmh0 = (H° − H°(0))/(R T), s = S°/R.
 */
export interface ThermoPoint {
  T: number;
  cp: number;
  hmh0: number;
  s: number;
}

/** Dimensionless functions relative to H°(0) on a temperature grid: element j belongs to T[j]. */
export interface ThermoGrid {
  readonly T: Float64Array;
  readonly cp: Float64Array;
  readonly hmh0: Float64Array;
  readonly s: Float64Array;
}

/** Options of the physics that change the numbers (and hence the cache key). */
export interface PhysicsOptions {
  /** Standard-state pressure, Pa. Default 1e5 (1 bar). */
  standardPressure: number;
}

/** What a partition-function model contributed, for the database's model summary. */
export interface ModelSummary {
  structure: Structure;
  contributions: string[];
  options: Record<string, string | number | boolean>;
  notes: string[];
}

/**
 * The computed thermochemistry of one species: a pure function of its model and the physics options.
 */
export interface ThermoEvaluator {
  readonly species: Species;
  /** Dimensionless functions relative to H°(0) at T (K); the same numbers as `grid([T])`. */
  at(T: number): ThermoPoint;
  /** The same functions at every temperature of a grid (K), as typed arrays in the grid's order. */
  grid(temperatures: ArrayLike<number>): ThermoGrid;
  /** H°(298.15) − H°(0), J/mol. */
  readonly h298MinusH0: number;
  /** ΔfH°(298.15), J/mol (converted from 0 K when the input gave it there). */
  readonly enthalpyOfFormation298: number;
  readonly summary: ModelSummary;
}

/**
 * Standard properties in the units of thermochemical tables at one temperature, plus the absolute
 * dimensionless enthalpy the NASA fit uses: hRT = H°(T)/(R T) with H°(T) = ΔfH°(298.15) + [H°(T) − H°(298.15)].
 */
export interface StandardProperties {
  T: number;
  /** J/(mol K) */
  Cp: number;
  /** J/(mol K) */
  S: number;
  /** kJ/mol */
  HminusH298: number;
  /** kJ/mol */
  H: number;
  /** kJ/mol, G = H − T S */
  G: number;
  /** Cp/R */
  cpR: number;
  /** H°(T)/(R T), absolute (formation-enthalpy anchored) */
  hRT: number;
  /** S/R */
  sR: number;
}
