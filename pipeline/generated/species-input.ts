/* eslint-disable */
/**
 * GENERATED from schemas/species.schema.json by scripts/generate-types.mjs. Do not edit by hand:
 * change the schema and run `node scripts/generate-types.mjs`. A test fails when this file drifts.
 */

/**
 * A whole number, at least 1.
 */
export type PositiveInteger = number;
/**
 * An energy or wavenumber, zero or positive. A bare number is in cm-1; or {value, unit} with unit one of cm-1, eV, K, J/mol, kJ/mol, kcal/mol (per particle for cm-1, eV, K; per mole for the molar units).
 */
export type NonNegativeEnergy =
  | number
  | {
      /**
       * Numeric value in `unit`.
       */
      value: number;
      /**
       * Unit of `value`.
       */
      unit: "cm-1" | "eV" | "K" | "J/mol" | "kJ/mol" | "kcal/mol";
    };
/**
 * A rotational constant, strictly positive. A bare number is in cm-1; or {value, unit} with unit one of cm-1, eV, K, J/mol, kJ/mol, kcal/mol, MHz, GHz.
 */
export type RotationalConstant =
  | number
  | {
      /**
       * Numeric value in `unit`.
       */
      value: number;
      /**
       * Unit of `value`.
       */
      unit: "cm-1" | "eV" | "K" | "J/mol" | "kJ/mol" | "kcal/mol" | "MHz" | "GHz";
    };
/**
 * A principal moment of inertia, strictly positive. A bare number is in amu*angstrom^2; or {value, unit} with unit one of amu*angstrom^2, kg*m^2, g*cm^2.
 */
export type MomentOfInertia =
  | number
  | {
      /**
       * Numeric value in `unit`.
       */
      value: number;
      /**
       * Unit of `value`.
       */
      unit: "amu*angstrom^2" | "kg*m^2" | "g*cm^2";
    };
/**
 * One harmonic vibration: a fundamental wavenumber (a bare number in cm-1, or {value, unit}; degeneracy 1), or {wavenumber, degeneracy} with the wavenumber itself a bare number in cm-1 or {value, unit}.
 */
export type Vibration =
  | Wavenumber
  | {
      wavenumber: Wavenumber;
      degeneracy?: PositiveInteger;
    };
/**
 * A vibrational wavenumber, strictly positive. A bare number is in cm-1; or {value, unit} with unit one of cm-1, eV, K, J/mol, kJ/mol, kcal/mol (per particle for cm-1, eV, K; per mole for the molar units).
 */
export type Wavenumber =
  | number
  | {
      /**
       * Numeric value in `unit`.
       */
      value: number;
      /**
       * Unit of `value`.
       */
      unit: "cm-1" | "eV" | "K" | "J/mol" | "kJ/mol" | "kcal/mol";
    };
/**
 * An energy or wavenumber, strictly positive. A bare number is in cm-1; or {value, unit} with unit one of cm-1, eV, K, J/mol, kJ/mol, kcal/mol (per particle for cm-1, eV, K; per mole for the molar units).
 */
export type PositiveEnergy =
  | number
  | {
      /**
       * Numeric value in `unit`.
       */
      value: number;
      /**
       * Unit of `value`.
       */
      unit: "cm-1" | "eV" | "K" | "J/mol" | "kJ/mol" | "kcal/mol";
    };
/**
 * An energy or wavenumber of any sign. A bare number is in cm-1; or {value, unit} with unit one of cm-1, eV, K, J/mol, kJ/mol, kcal/mol (per particle for cm-1, eV, K; per mole for the molar units).
 */
export type Energy =
  | number
  | {
      /**
       * Numeric value in `unit`.
       */
      value: number;
      /**
       * Unit of `value`.
       */
      unit: "cm-1" | "eV" | "K" | "J/mol" | "kJ/mol" | "kcal/mol";
    };
/**
 * A rotational-type constant of any sign (e.g. alphae). A bare number is in cm-1; or {value, unit} with unit one of cm-1, eV, K, J/mol, kJ/mol, kcal/mol, MHz, GHz.
 */
export type RotationalTerm =
  | number
  | {
      /**
       * Numeric value in `unit`.
       */
      value: number;
      /**
       * Unit of `value`.
       */
      unit: "cm-1" | "eV" | "K" | "J/mol" | "kJ/mol" | "kcal/mol" | "MHz" | "GHz";
    };
/**
 * A rotational-type constant, zero or positive (e.g. the centrifugal distortion De). A bare number is in cm-1; or {value, unit} with unit one of cm-1, eV, K, J/mol, kJ/mol, kcal/mol, MHz, GHz.
 */
export type NonNegativeRotationalTerm =
  | number
  | {
      /**
       * Numeric value in `unit`.
       */
      value: number;
      /**
       * Unit of `value`.
       */
      unit: "cm-1" | "eV" | "K" | "J/mol" | "kJ/mol" | "kcal/mol" | "MHz" | "GHz";
    };

/**
 * One species of a qforge database, as written in a YAML document. Unknown keys are errors. Quantities with a unit are a bare number in the default unit or {value, unit}.
 */
export interface SpeciesInput {
  /**
   * Record name of the species, 1-16 characters (the name field of the 80-column record) of [A-Za-z0-9()+*,._-]; unique in a database.
   */
  name: string;
  /**
   * Element symbol (IUPAC; D and T accepted for 2H and 3H) -> number of atoms.
   */
  composition: {
    [k: string]: PositiveInteger;
  };
  /**
   * Charge number z: +1 for a singly charged cation, -1 for an anion. Default 0. The molar mass is corrected for the electrons.
   */
  charge?: number;
  /**
   * Standard enthalpy of formation. A bare number is in kJ/mol at 298.15 K; or {value, unit, temperature} with unit one of J/mol, kJ/mol, kcal/mol, eV, cm-1 (default kJ/mol) and temperature 298.15 or 0 K (default 298.15).
   */
  enthalpy_of_formation:
    | number
    | {
        /**
         * Numeric value in `unit`.
         */
        value: number;
        /**
         * Unit of `value`. Default kJ/mol.
         */
        unit?: "J/mol" | "kJ/mol" | "kcal/mol" | "eV" | "cm-1";
        /**
         * Reference temperature of the value, K: 298.15 or 0. Default 298.15.
         */
        temperature?: 298.15 | 0;
      };
  /**
   * Where every number comes from (free text, one entry per source). Required and non-empty.
   *
   * @minItems 1
   *
   * Items: One source citation.
   */
  sources: [string, ...string[]];
  /**
   * Which partition-function model applies: atom (translation + electronic levels), diatomic (full rovibrational level sum per electronic state), linear or nonlinear (rigid rotor + harmonic oscillators).
   */
  structure: "atom" | "diatomic" | "linear" | "nonlinear";
  symmetry_number?: PositiveInteger;
  /**
   * Electronic levels (atom, linear, nonlinear). Default: one non-degenerate ground level, [{energy: 0, degeneracy: 1}]. The lowest level must be at energy 0.
   *
   * @minItems 1
   */
  electronic_levels?: [ElectronicLevel, ...ElectronicLevel[]];
  /**
   * Rotational constants: [B] for linear, [A, B, C] for nonlinear (conventionally A >= B >= C). Give either this or moments_of_inertia.
   *
   * @minItems 1
   * @maxItems 3
   */
  rotational_constants?:
    | [RotationalConstant]
    | [RotationalConstant, RotationalConstant]
    | [RotationalConstant, RotationalConstant, RotationalConstant];
  /**
   * Principal moments of inertia, alternative to rotational_constants: [I] for linear, [IA, IB, IC] for nonlinear; converted with B = h/(8 pi^2 c I).
   *
   * @minItems 1
   * @maxItems 3
   */
  moments_of_inertia?:
    [MomentOfInertia] | [MomentOfInertia, MomentOfInertia] | [MomentOfInertia, MomentOfInertia, MomentOfInertia];
  /**
   * Harmonic vibrations (linear, nonlinear): each a wavenumber (bare number in cm-1, or {value, unit}) or {wavenumber, degeneracy}. 3N-5 (linear) or 3N-6 (nonlinear) modes counting degeneracy (internal_rotors count as modes).
   *
   * @minItems 1
   */
  vibrations?: [Vibration, ...Vibration[]];
  /**
   * Optional (linear, nonlinear): torsions treated as one-dimensional hindered internal rotors with potential V(phi) = (V0/2)(1 - cos n phi), summed over their quantum levels, instead of harmonic vibrations. A torsion listed here must be removed from vibrations (each rotor counts as one of the 3N-6 modes).
   *
   * @minItems 1
   */
  internal_rotors?: [InternalRotor, ...InternalRotor[]];
  dissociation_energy?: PositiveEnergy;
  /**
   * Homonuclear diatomic only, optional: statistical weights of even-J and odd-J rotational levels. When given they replace the symmetry number.
   */
  nuclear_spin_weights?: {
    /**
     * Weight of even-J levels.
     */
    even: number;
    /**
     * Weight of odd-J levels.
     */
    odd: number;
  };
  /**
   * Homonuclear diatomic with nuclear_spin_weights only, optional (default equilibrium): how the even-J and odd-J manifolds are populated. equilibrium: one Boltzmann distribution over all levels (ortho/para interconversion at every T); this reproduces NIST-JANAF 4th ed. H2 (H-050) and CODATA, e.g. Cp(200 K) within 0.01 J/(mol K), and is the default so tables stay comparable with them. frozen: fixed mole fractions even/(even+odd) and odd/(even+odd) (normal hydrogen 1:3, as H2 stays without a conversion catalyst when cooled from room temperature), each manifold in its own Boltzmann distribution; for H2 it is 0.17 J/(mol K) lower in Cp at 200 K than equilibrium and JANAF, and agrees with equilibrium within 1e-5 relative from 500 to 6000 K.
   */
  nuclear_spin_mixture?: "equilibrium" | "frozen";
  /**
   * Diatomic only, required: electronic states with their spectroscopic constants, ground state first.
   *
   * @minItems 1
   */
  electronic_states?: [ElectronicState, ...ElectronicState[]];
  /**
   * Optional per-species override of the fit ranges [low, mid] and [mid, high], K. Missing keys come from the database settings.
   */
  temperature_ranges?: {
    /**
     * Lowest fit temperature, K.
     */
    low?: number;
    /**
     * Common temperature of the two ranges, K.
     */
    mid?: number;
    /**
     * Highest fit temperature, K.
     */
    high?: number;
  };
  /**
   * Optional per-species fit limits, same keys as tolerances in qforge.yaml: the limit of q = cp, h, s at T is max(q, relative_to_cp.q × Cp/R(T)). Missing keys come from the database settings.
   */
  tolerances?: {
    /**
     * Absolute part of the Cp/R limit (dimensionless).
     */
    cp?: number;
    /**
     * Absolute part of the H/RT limit (dimensionless).
     */
    h?: number;
    /**
     * Absolute part of the S/R limit (dimensionless).
     */
    s?: number;
    /**
     * Multiples of the computed Cp/R.
     */
    relative_to_cp?: {
      /**
       * Size-scaled part of the Cp/R limit: a multiple of the computed Cp/R.
       */
      cp?: number;
      /**
       * Size-scaled part of the H/RT limit: a multiple of the computed Cp/R.
       */
      h?: number;
      /**
       * Size-scaled part of the S/R limit: a multiple of the computed Cp/R.
       */
      s?: number;
    };
  };
}
/**
 * One electronic level of an atom or polyatomic molecule.
 */
export interface ElectronicLevel {
  energy: NonNegativeEnergy;
  degeneracy: PositiveInteger;
  /**
   * Optional term symbol or label, e.g. '3P2'; for documentation only.
   */
  term?: string;
}
/**
 * One torsion as a one-dimensional hindered rotor: H = B(-d^2/dphi^2) + (V0/2)(1 - cos n phi) with B = h/(8 pi^2 c I_red), levels from a direct diagonalisation in the free-rotor basis. Give exactly one of moment_of_inertia and rotational_constant.
 */
export interface InternalRotor {
  barrier: NonNegativeEnergy;
  symmetry_number: PositiveInteger;
  foldedness?: PositiveInteger;
  moment_of_inertia?: MomentOfInertia;
  rotational_constant?: RotationalConstant;
}
/**
 * One electronic state of a diatomic molecule with its spectroscopic constants (Huber & Herzberg notation). Term values E(v,J) = Te + G(v) + B_v x - D_v x^2 + H_v x^3 with x = J(J+1), G(v) = we(v+1/2) - wexe(v+1/2)^2 + weye(v+1/2)^3 + weze(v+1/2)^4, B_v = Be - alphae(v+1/2) + gammae(v+1/2)^2, D_v = De + betae(v+1/2), H_v = He; the higher-order constants weze, gammae, betae, He are optional (0 when absent).
 */
export interface ElectronicState {
  /**
   * Term symbol or label, e.g. 'X1Sigma_g+'.
   */
  term: string;
  energy: NonNegativeEnergy;
  degeneracy: PositiveInteger;
  we: PositiveEnergy;
  wexe?: Energy;
  weye?: Energy;
  weze?: Energy;
  Be: RotationalConstant;
  alphae?: RotationalTerm;
  gammae?: RotationalTerm;
  De?: NonNegativeRotationalTerm;
  betae?: RotationalTerm;
  He?: RotationalTerm;
  dissociation_energy?: PositiveEnergy;
}
