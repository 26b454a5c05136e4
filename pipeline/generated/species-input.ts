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
 * One atom: element or isotope symbol (C, 13C, D) and Cartesian coordinates in angstrom.
 *
 * @minItems 4
 * @maxItems 4
 */
export type GeometryRow = [unknown, unknown, unknown, unknown];
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
 * A torsional potential: {barrier, foldedness?} is (V0/2)(1 - cos n phi); {fourier} is V(phi) = sum V_cos (1 - cos n phi)/2 + V_sin sin(n phi)/2; {scan} is a relaxed scan [angle in degrees, energy] fitted to a Fourier series in multiples of the rotor symmetry number (the scan must cover the period 360/symmetry_number). unit (default cm-1) applies to V_cos, V_sin and scan energies.
 */
export type TorsionPotential = {
  barrier?: NonNegativeEnergy;
  foldedness?: PositiveInteger;
  /**
   * Fourier terms [n >= 1, V_cos, V_sin] in unit.
   *
   * @minItems 1
   */
  fourier?: [[unknown, unknown, unknown], ...[unknown, unknown, unknown][]];
  /**
   * Scan points [torsion angle in degrees, energy in unit]; the energy zero is arbitrary.
   *
   * @minItems 5
   */
  scan?: [
    [unknown, unknown],
    [unknown, unknown],
    [unknown, unknown],
    [unknown, unknown],
    [unknown, unknown],
    ...[unknown, unknown][]
  ];
  /**
   * Unit of V_cos, V_sin and scan energies. Default cm-1.
   */
  unit?: "cm-1" | "eV" | "K" | "J/mol" | "kJ/mol" | "kcal/mol";
} & TorsionPotential1;
export type TorsionPotential1 =
  | {
      [k: string]: unknown;
    }
  | {
      [k: string]: unknown;
    }
  | {
      [k: string]: unknown;
    };
/**
 * One anharmonic constant: 1-based mode indices i <= j into vibrations and the value in cm-1.
 *
 * @minItems 3
 * @maxItems 3
 */
export type AnharmonicTerm = never[];
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
   * Warnings of this species accepted in writing: each names the stable code of one warning (as printed in [brackets]) and why it is acceptable. An accepted warning is neither printed nor turned into an error by --strict; an entry that matches no warning is itself warned about (stale-accepted-warning). Never part of the normalised input (no effect on the numbers or the cache).
   *
   * @minItems 1
   */
  accepted_warnings?: [AcceptedWarning, ...AcceptedWarning[]];
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
   * Optional (linear, nonlinear): Cartesian geometry in angstrom. Symbols are elements (their most abundant isotope), isotopes with the mass number first (13C, 18O, 2H) or D, T. The rotational constants, the linear/nonlinear check, the symmetry number (when symmetry_number is absent) and internal rotors given by axis follow from it; the atoms must match composition. Give at most one of geometry and geometry_file.
   *
   * @minItems 2
   */
  geometry?: [GeometryRow, GeometryRow, ...GeometryRow[]];
  /**
   * Optional (linear, nonlinear): like geometry, read from an XYZ file (atom count, comment line, then one 'symbol x y z' line per atom, angstrom) in the species file's folder or below it.
   */
  geometry_file?: string;
  optical_isomers?: PositiveInteger;
  /**
   * Harmonic vibrations (linear, nonlinear): each a wavenumber (bare number in cm-1, or {value, unit}) or {wavenumber, degeneracy}. 3N-5 (linear) or 3N-6 (nonlinear) modes counting degeneracy (internal_rotors count as modes).
   *
   * @minItems 1
   */
  vibrations?: [Vibration, ...Vibration[]];
  /**
   * Optional (linear, nonlinear): torsions treated as one-dimensional hindered internal rotors, summed over their quantum levels, instead of harmonic vibrations. A torsion listed here must be removed from vibrations (each rotor counts as one of the 3N-6 modes; README: finding the torsion among the frequencies).
   *
   * @minItems 1
   */
  internal_rotors?: [InternalRotor, ...InternalRotor[]];
  vibration_scale_factor?: VibrationScaleFactor;
  anharmonicity?: Anharmonicity;
  centrifugal_distortion?: CentrifugalDistortion;
  /**
   * Optional (linear, nonlinear): several conformers of one species, each with its own molecular constants and its energy above the lowest conformer; the partition function is their Boltzmann-weighted sum. With conformers the molecular fields (symmetry_number, rotational_constants, moments_of_inertia, vibrations, internal_rotors, electronic_levels, vibration_scale_factor, anharmonicity, centrifugal_distortion, dissociation_energy) go into each conformer, not at the species level.
   *
   * @minItems 1
   */
  conformers?: [Conformer, ...Conformer[]];
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
   * Optional standard uncertainties (one standard deviation) of the model inputs, propagated linearly to u(Cp), u(S), u(H-H298) and u(H) at 298.15, 1000 and 2000 K (thermo.json, report.html). Every key is optional; a missing key means that input is taken as exact (u = 0), and a species without `uncertainties` reports zero uncertainties. Relative figures are fractions (0.01 = 1 %). Inputs are treated as independent, except `scale_factor`, which moves all vibrations together.
   */
  uncertainties?: {
    /**
     * Uncertainty of each vibration wavenumber (independent per entry): one relative figure for all entries, or a list of absolute uncertainties in cm-1, one per entry of `vibrations` (a degenerate entry moves as one). Diatomics: applies to we of every electronic state.
     */
    vibrations?: number | number[];
    /**
     * Relative uncertainty of the vibrational scale factor: all wavenumbers move together by this fraction (fully correlated).
     */
    scale_factor?: number;
    /**
     * Relative uncertainty of each rotational constant (independent per constant). With moments of inertia or a geometry as input, state the uncertainty of the rotational constants derived from them. Diatomics: Be of every electronic state.
     */
    rotational_constants?: number;
    /**
     * Uncertainty of each excited electronic level energy (or diatomic state Te), cm-1, independent per level.
     */
    electronic_energies?: number;
    /**
     * Relative uncertainty of each hindered-rotor barrier V0 (independent per rotor).
     */
    barriers?: number;
    /**
     * Relative uncertainty of each anharmonic constant x_ij (polyatomics with `anharmonicity`) or wexe (diatomics), independent per constant.
     */
    anharmonic_constants?: number;
    /**
     * Standard uncertainty of the enthalpy of formation: a number in kJ/mol or {value, unit} with unit J/mol, kJ/mol, kcal/mol.
     */
    enthalpy_of_formation?:
      | number
      | {
          /**
           * Standard uncertainty in `unit`.
           */
          value: number;
          /**
           * Unit of `value`. Default kJ/mol.
           */
          unit?: "J/mol" | "kJ/mol" | "kcal/mol";
        };
    /**
     * Relative uncertainty of the molar mass (rarely needed: atomic weights are known to better than 1e-4; isotopic mixtures).
     */
    molar_mass?: number;
  };
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
 * One accepted warning: its stable code and the reason a person accepts it.
 */
export interface AcceptedWarning {
  /**
   * Stable code of the accepted warning, as printed in [brackets] after the message.
   */
  code: string;
  /**
   * Why a person accepts this warning for this species; a placeholder (todo, n/a, ...) is an error.
   */
  reason: string;
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
 * One torsion as a one-dimensional hindered rotor H = B(-d^2/dphi^2) + V(phi), B = h/(8 pi^2 c I_red), levels from a direct diagonalisation in the free-rotor basis. The reduced moment: from the geometry (axis, top) by Pitzer's I(2,3), or given as moment_of_inertia or rotational_constant (exactly one of the three). The potential: barrier (+ foldedness), or potential {barrier, foldedness} | {fourier, unit} | {scan, unit} (exactly one of barrier and potential).
 */
export interface InternalRotor {
  /**
   * The torsion bond, as 1-based indices into geometry (the two atoms must be bonded). Needs geometry or geometry_file; the reduced moment of inertia then follows from the geometry.
   *
   * @minItems 2
   * @maxItems 2
   */
  axis?: [PositiveInteger, PositiveInteger];
  /**
   * With axis, optional: the atoms that turn (one whole side of the bond; the axis atom may be left out). Default: the side with fewer atoms.
   *
   * @minItems 1
   */
  top?: [PositiveInteger, ...PositiveInteger[]];
  barrier?: NonNegativeEnergy;
  symmetry_number?: PositiveInteger;
  foldedness?: PositiveInteger;
  moment_of_inertia?: MomentOfInertia;
  rotational_constant?: RotationalConstant;
  potential?: TorsionPotential;
}
/**
 * A vibrational scale factor and where it comes from.
 */
export interface VibrationScaleFactor {
  /**
   * The factor every wavenumber is multiplied by (dimensionless).
   */
  value: number;
  /**
   * Where the factor comes from (method, basis set, citation).
   */
  source: string;
}
/**
 * Anharmonic constants of a polyatomic, cm-1.
 */
export interface Anharmonicity {
  /**
   * x_ij in cm-1 with 1-based mode indices into vibrations, i <= j, each pair at most once.
   */
  x: AnharmonicTerm[];
  /**
   * g_tt' in cm-1 of doubly degenerate modes t <= t' (vibrational angular momentum, + g_tt' l_t l_t'). Default none.
   */
  g?: AnharmonicTerm[];
  /**
   * Optional vibration-rotation constants in cm-1, one entry per item of vibrations: B_v = B_0 - sum alpha_i v_i.
   *
   * @minItems 1
   */
  alpha?: [
    [number] | [number, number] | [number, number, number],
    ...([number] | [number, number] | [number, number, number])[]
  ];
}
/**
 * Quartic centrifugal distortion constants of the vibrational ground state, cm-1.
 */
export interface CentrifugalDistortion {
  /**
   * D_J (linear) or Delta_J (nonlinear, Watson A), cm-1.
   */
  DJ: number;
  /**
   * Delta_JK (Watson A), cm-1; nonlinear only.
   */
  DJK?: number;
  /**
   * Delta_K (Watson A), cm-1; nonlinear only.
   */
  DK?: number;
  /**
   * delta_J (Watson A), cm-1; nonlinear only.
   */
  dJ?: number;
  /**
   * delta_K (Watson A), cm-1; nonlinear only.
   */
  dK?: number;
}
/**
 * One conformer: its energy and the molecular fields of a linear or nonlinear species.
 */
export interface Conformer {
  /**
   * Label of the conformer (unique within the species).
   */
  name: string;
  energy: NonNegativeEnergy;
  symmetry_number?: PositiveInteger;
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
   * Optional (linear, nonlinear): Cartesian geometry in angstrom. Symbols are elements (their most abundant isotope), isotopes with the mass number first (13C, 18O, 2H) or D, T. The rotational constants, the linear/nonlinear check, the symmetry number (when symmetry_number is absent) and internal rotors given by axis follow from it; the atoms must match composition. Give at most one of geometry and geometry_file.
   *
   * @minItems 2
   */
  geometry?: [GeometryRow, GeometryRow, ...GeometryRow[]];
  /**
   * Optional (linear, nonlinear): like geometry, read from an XYZ file (atom count, comment line, then one 'symbol x y z' line per atom, angstrom) in the species file's folder or below it.
   */
  geometry_file?: string;
  /**
   * Harmonic vibrations (linear, nonlinear): each a wavenumber (bare number in cm-1, or {value, unit}) or {wavenumber, degeneracy}. 3N-5 (linear) or 3N-6 (nonlinear) modes counting degeneracy (internal_rotors count as modes).
   *
   * @minItems 1
   */
  vibrations: [Vibration, ...Vibration[]];
  /**
   * Optional (linear, nonlinear): torsions treated as one-dimensional hindered internal rotors with potential V(phi) = (V0/2)(1 - cos n phi), summed over their quantum levels, instead of harmonic vibrations. A torsion listed here must be removed from vibrations (each rotor counts as one of the 3N-6 modes).
   *
   * @minItems 1
   */
  internal_rotors?: [InternalRotor, ...InternalRotor[]];
  /**
   * Electronic levels (atom, linear, nonlinear). Default: one non-degenerate ground level, [{energy: 0, degeneracy: 1}]. The lowest level must be at energy 0.
   *
   * @minItems 1
   */
  electronic_levels?: [ElectronicLevel, ...ElectronicLevel[]];
  vibration_scale_factor?: VibrationScaleFactor;
  anharmonicity?: Anharmonicity;
  centrifugal_distortion?: CentrifugalDistortion;
  dissociation_energy?: PositiveEnergy;
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
