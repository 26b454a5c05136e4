/** The inertia tensor of a set of atoms about their centre of mass. */
import { centerOfMass } from './center-of-mass.js';
import type { Atom, Matrix3 } from './types.js';

/**
 * Formula: I_jk = Σ_i m_i (|r_i|² δ_jk − r_ij r_ik) with r_i relative to the centre of mass.
 * Units: u·Å² (amu·Å²). Source: Goldstein, Classical Mechanics (2nd ed., 1980), eq. 5-7.
 */
export function inertiaTensor(atoms: readonly Atom[]): Matrix3 {
  const c = centerOfMass(atoms);
  const t: Matrix3 = [
    [0, 0, 0],
    [0, 0, 0],
    [0, 0, 0],
  ];
  for (const a of atoms) {
    const r = [a.position[0] - c[0], a.position[1] - c[1], a.position[2] - c[2]];
    const r2 = r[0]! * r[0]! + r[1]! * r[1]! + r[2]! * r[2]!;
    for (let j = 0; j < 3; j++) {
      for (let k = 0; k < 3; k++) t[j]![k]! += a.mass * ((j === k ? r2 : 0) - r[j]! * r[k]!);
    }
  }
  return t;
}
