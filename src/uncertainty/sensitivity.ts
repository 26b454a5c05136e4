/**
 * Sensitivities of Cp°, S°, H° − H°298 and H° to each uncertain input, from the pipeline's own evaluator.
 *
 * Method: harmonic vibrations of a species whose vibrational factor is the harmonic one (no anharmonic
 * constants, no conformers) use the closed form of ./harmonic.ts; every other input uses the central
 * difference [f(x+δ) − f(x−δ)]/(2δ) through createThermoEvaluator, with δ = CENTRAL_DIFFERENCE_STEP·|x|
 * (δ = u when x = 0). Truncation error O(δ²) ≈ 1e-8 relative, rounding error ≈ 1e-16/1e-4: both far
 * below any uncertainty worth stating (the tests check step independence and the closed form).
 * Models with level lists that change their level count with x (a dissociation cut) can be
 * non-differentiable there; the Monte Carlo check shows where that matters.
 */
import { GAS_CONSTANT, T_REF } from '../constants.js';
import type { PhysicsOptions, Species } from '../model.js';
import { createThermoEvaluator } from '../thermo/evaluator.js';
import { standardProperties } from '../thermo/properties.js';
import { harmonicWavenumberDerivatives } from './harmonic.js';
import type { PerturbableInput } from './inputs.js';
import type { Sensitivity, SensitivityMethod } from './types.js';

/** Relative step of the central differences (see the module comment). */
export const CENTRAL_DIFFERENCE_STEP = 1e-4;

/** Cp°, S° (J/(mol K)), H° − H°298 and H° (kJ/mol) of a species at each T. */
export function propertiesAt(species: Species, physics: Partial<PhysicsOptions>, temperatures: readonly number[]): Sensitivity[] {
  const ev = createThermoEvaluator(species, physics);
  return temperatures.map((T) => {
    const p = standardProperties(ev, T);
    return { cp: p.Cp, s: p.S, hMinusH298: p.HminusH298, h: p.H };
  });
}

const harmonicModel = (s: Species) =>
  (s.structure === 'linear' || s.structure === 'nonlinear') && s.anharmonicity === undefined && (s.conformers?.length ?? 0) === 0;

/** Closed-form sensitivities of vibration `index` (harmonic model), table units per cm⁻¹. */
function harmonicSensitivity(species: Species, index: number, temperatures: readonly number[]): Sensitivity[] {
  const v = (species as { vibrations: Array<{ wavenumber: number; degeneracy: number }> }).vibrations[index]!;
  const R = GAS_CONSTANT;
  const at298 = harmonicWavenumberDerivatives(v.wavenumber, v.degeneracy, T_REF);
  // H°298 − H°0 enters H° only when ΔfH° was given at 0 K (its conversion to 298.15 K uses it).
  const formationTerm = species.enthalpyOfFormation.temperature === 0 ? (R * at298.hmh0) / 1000 : 0;
  return temperatures.map((T) => {
    const d = harmonicWavenumberDerivatives(v.wavenumber, v.degeneracy, T);
    const hMinusH298 = (R * (d.hmh0 - at298.hmh0)) / 1000;
    return { cp: R * d.cp, s: R * d.s, hMinusH298, h: hMinusH298 + formationTerm };
  });
}

/** Central-difference sensitivities of one input with step δ. */
export function centralDifference(
  species: Species,
  physics: Partial<PhysicsOptions>,
  input: PerturbableInput,
  temperatures: readonly number[],
  delta: number,
): Sensitivity[] {
  const moved = (d: number) => {
    const copy = structuredClone(species);
    input.apply(copy, d);
    return propertiesAt(copy, physics, temperatures);
  };
  const plus = moved(delta);
  const minus = moved(-delta);
  return plus.map((p, i) => {
    const m = minus[i]!;
    return {
      cp: (p.cp - m.cp) / (2 * delta),
      s: (p.s - m.s) / (2 * delta),
      hMinusH298: (p.hMinusH298 - m.hMinusH298) / (2 * delta),
      h: (p.h - m.h) / (2 * delta),
    };
  });
}

/** Sensitivities of every input at every temperature ([input][T]) and the method used per input. */
export function sensitivities(
  species: Species,
  physics: Partial<PhysicsOptions>,
  inputs: readonly PerturbableInput[],
  temperatures: readonly number[],
): { values: Sensitivity[][]; methods: SensitivityMethod[] } {
  const values: Sensitivity[][] = [];
  const methods: SensitivityMethod[] = [];
  for (const input of inputs) {
    const m = /^vibration\[(\d+)\]$/.exec(input.name);
    if (m && harmonicModel(species)) {
      values.push(harmonicSensitivity(species, Number(m[1]), temperatures));
      methods.push('analytic');
    } else {
      const delta = input.value !== 0 ? CENTRAL_DIFFERENCE_STEP * Math.abs(input.value) : input.u;
      values.push(centralDifference(species, physics, input, temperatures, delta));
      methods.push('central-difference');
    }
  }
  return { values, methods };
}
