/** Rotational constants of a rigid molecule from its geometry. */
import { INERTIA_UNITS_TO_KG_M2, rotationalConstantFromInertia } from '../units.js';
import { centred } from './center-of-mass.js';
import { inertiaTensor } from './inertia-tensor.js';
import { principalAxes, type PrincipalAxes } from './principal-moments.js';
import type { Atom } from './types.js';

/** An atom farther than this from the axis of least inertia makes the molecule nonlinear, Å. */
export const LINEARITY_TOLERANCE_ANGSTROM = 1e-3;

export interface RigidRotor extends PrincipalAxes {
  /** Every atom within LINEARITY_TOLERANCE_ANGSTROM of one line through the centre of mass. */
  linear: boolean;
  /** [B] for a linear molecule, [A, B, C] with A ≥ B ≥ C otherwise, cm⁻¹. */
  rotationalConstants: [number] | [number, number, number];
}

/** B = h/(8π² c I), cm⁻¹, for I in u·Å² (src/units.ts, CODATA 2018 constants). */
export function rotationalConstantOfMoment(momentAmuAngstrom2: number): number {
  return rotationalConstantFromInertia(momentAmuAngstrom2 * INERTIA_UNITS_TO_KG_M2['amu*angstrom^2']!);
}

/**
 * Principal moments and rotational constants of the molecule (≥ 2 atoms, no two coincident: check first).
 * A molecule is linear when every atom lies within LINEARITY_TOLERANCE_ANGSTROM of the principal axis of
 * least inertia; then B = h/(8π² c I) with I the (double) moment perpendicular to the axis. Otherwise
 * A ≥ B ≥ C from I_A ≤ I_B ≤ I_C. Units: Å and u in, cm⁻¹ out.
 * Source: Gordy & Cook, Microwave Molecular Spectra (3rd ed., 1984), ch. 13 (principal-axis system).
 */
export function rigidRotorOf(atoms: readonly Atom[]): RigidRotor {
  const axes = principalAxes(inertiaTensor(atoms));
  const axis = axes.axes[0];
  const offAxis = centred(atoms).map((a) => {
    const p = a.position;
    const along = p[0] * axis[0] + p[1] * axis[1] + p[2] * axis[2];
    return Math.sqrt(Math.max(0, p[0] * p[0] + p[1] * p[1] + p[2] * p[2] - along * along));
  });
  const linear = offAxis.every((d) => d <= LINEARITY_TOLERANCE_ANGSTROM);
  const rotationalConstants: RigidRotor['rotationalConstants'] = linear
    ? [rotationalConstantOfMoment(0.5 * (axes.moments[1] + axes.moments[2]))]
    : [rotationalConstantOfMoment(axes.moments[0]), rotationalConstantOfMoment(axes.moments[1]), rotationalConstantOfMoment(axes.moments[2])];
  return { ...axes, linear, rotationalConstants };
}
