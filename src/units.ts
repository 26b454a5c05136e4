/**
 * Unit conversion at the edge of the library. Internally: energies of levels and spectroscopic constants in
 * cm⁻¹, temperatures in K, enthalpies of formation in J/mol. Input may give a bare number (the default unit
 * of its kind) or `{value, unit}` with a unit from the sets below.
 *
 * Conversion factors are derived from CODATA 2018 constants in `constants.ts`, never typed in.
 */
import {
  AVOGADRO,
  ATOMIC_MASS_CONSTANT,
  BOLTZMANN,
  ELEMENTARY_CHARGE,
  PLANCK,
  SPEED_OF_LIGHT,
} from './constants.js';

/** 1 J expressed as a wavenumber in cm⁻¹: E/(h c), with c in cm/s. */
const CM1_PER_JOULE = 1 / (PLANCK * SPEED_OF_LIGHT * 100);

/** Wavenumber (cm⁻¹) of one unit of each accepted energy unit (per particle or per mole as the name says). */
export const ENERGY_UNITS_TO_CM1: Readonly<Record<string, number>> = Object.freeze({
  'cm-1': 1,
  eV: ELEMENTARY_CHARGE * CM1_PER_JOULE,
  K: BOLTZMANN * CM1_PER_JOULE,
  'J/mol': CM1_PER_JOULE / AVOGADRO,
  'kJ/mol': (1000 * CM1_PER_JOULE) / AVOGADRO,
  // Thermochemical calorie, 4.184 J exactly (the calorie of thermochemical tables).
  'kcal/mol': (4184 * CM1_PER_JOULE) / AVOGADRO,
});

/** Rotational constants may also be given as frequencies (microwave spectroscopy reports MHz or GHz). */
export const ROTATIONAL_UNITS_TO_CM1: Readonly<Record<string, number>> = Object.freeze({
  ...ENERGY_UNITS_TO_CM1,
  MHz: 1e6 / (SPEED_OF_LIGHT * 100),
  GHz: 1e9 / (SPEED_OF_LIGHT * 100),
});

/** Molar enthalpies: J/mol per one unit. */
export const ENTHALPY_UNITS_TO_J_PER_MOL: Readonly<Record<string, number>> = Object.freeze({
  'J/mol': 1,
  'kJ/mol': 1000,
  'kcal/mol': 4184,
  eV: ELEMENTARY_CHARGE * AVOGADRO,
  'cm-1': AVOGADRO / CM1_PER_JOULE,
});

/** Moments of inertia: kg m² per one unit. */
export const INERTIA_UNITS_TO_KG_M2: Readonly<Record<string, number>> = Object.freeze({
  'amu*angstrom^2': ATOMIC_MASS_CONSTANT * 1e-20,
  'kg*m^2': 1,
  'g*cm^2': 1e-7,
});

/**
 * Rotational constant from a moment of inertia.
 *
 * Formula: B = h / (8 π² c I), with c in cm/s, so B is in cm⁻¹.
 * Units: I in kg m² → B in cm⁻¹. Valid for any I > 0.
 * Source: Herzberg, Molecular Spectra and Molecular Structure I (1950), eq. III,10.
 */
export function rotationalConstantFromInertia(inertiaKgM2: number): number {
  return PLANCK / (8 * Math.PI * Math.PI * SPEED_OF_LIGHT * 100 * inertiaKgM2);
}

/** Thrown by the conversions; the validator turns it into a located diagnostic. */
export class UnknownUnitError extends Error {
  constructor(
    readonly unit: string,
    readonly accepted: readonly string[],
  ) {
    super(`unknown unit '${unit}'; expected one of ${accepted.join(', ')}`);
    this.name = 'UnknownUnitError';
  }
}

/** A quantity as written in input: a bare number in the default unit, or value with unit. */
export type QuantityInput = number | { value: number; unit: string };

/** Convert a quantity with the given table; bare numbers are taken to be in `defaultUnit`. */
export function convertQuantity(
  q: QuantityInput,
  table: Readonly<Record<string, number>>,
  defaultUnit: string,
): number {
  if (typeof q === 'number') {
    const f = table[defaultUnit];
    if (f === undefined) throw new UnknownUnitError(defaultUnit, Object.keys(table));
    return q * f;
  }
  const f = table[q.unit];
  if (f === undefined) throw new UnknownUnitError(q.unit, Object.keys(table));
  return q.value * f;
}
