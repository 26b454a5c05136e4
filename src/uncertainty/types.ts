/**
 * Shapes of the uncertainty propagation: standard uncertainties of the inputs, the sensitivities of the
 * dimensionless functions to them, and the propagated standard uncertainties in table units.
 */

/** One uncertain input of a species' model, in internal units. */
export interface UncertainInput {
  /** Stable, readable name, e.g. `vibration[2]`, `rotational_constants[0]`, `enthalpy_of_formation`. */
  name: string;
  /** Its value (internal units: cm⁻¹, g/mol, J/mol, or 1 for the scale factor). */
  value: number;
  /** Standard uncertainty u (same unit as `value`), > 0. */
  u: number;
  /** Unit of value and u, for the report. */
  unit: string;
  /** How its sensitivities were obtained. */
  method?: SensitivityMethod;
}

/**
 * Sensitivities of the standard functions to one input at one temperature, d(property)/d(input), in table
 * units per unit of the input: Cp°, S° in J/(mol K); H° − H°298 and H° in kJ/mol.
 */
export interface Sensitivity {
  cp: number;
  s: number;
  hMinusH298: number;
  h: number;
}

/** How the sensitivities of an input were obtained. */
export type SensitivityMethod = 'analytic' | 'central-difference';

export type UncertaintyQuantity = 'cp' | 's' | 'hMinusH298' | 'h';

/** The share of one input in a propagated uncertainty: |sensitivity| · u in the property's unit. */
export interface Contributor {
  input: string;
  contribution: number;
}

/** Propagated standard uncertainties at one temperature: Cp°, S° in J/(mol K); H° − H°298, H° in kJ/mol. */
export interface PropagatedPoint {
  T: number;
  cp: number;
  s: number;
  hMinusH298: number;
  h: number;
  /** Largest three contributors of each quantity, largest first (empty when no input is uncertain). */
  largest: Record<UncertaintyQuantity, Contributor[]>;
}

export interface MonteCarloPoint {
  T: number;
  samples: number;
  seed: number;
  cp: number;
  s: number;
  hMinusH298: number;
  h: number;
}

export interface SpeciesUncertainty {
  /** The inputs that carry an uncertainty (empty: the species declares none, every u is then 0). */
  inputs: UncertainInput[];
  points: PropagatedPoint[];
  /** u(Cp°) in J/(mol K) on a coarse grid over the fitted range, for the report's band. */
  cpBand: Array<{ T: number; u: number }>;
  monteCarlo?: MonteCarloPoint[];
}
