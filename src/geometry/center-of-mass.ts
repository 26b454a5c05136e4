/** Centre of mass of a set of atoms and coordinates relative to it. */
import type { Atom, Vector3 } from './types.js';

/** R = Σ m_i r_i / Σ m_i, Å. Needs at least one atom. */
export function centerOfMass(atoms: readonly Atom[]): Vector3 {
  let m = 0;
  const c: Vector3 = [0, 0, 0];
  for (const a of atoms) {
    m += a.mass;
    for (let k = 0; k < 3; k++) c[k]! += a.mass * a.position[k]!;
  }
  return [c[0] / m, c[1] / m, c[2] / m];
}

/** The atoms with positions relative to their centre of mass. */
export function centred(atoms: readonly Atom[]): Atom[] {
  const c = centerOfMass(atoms);
  return atoms.map((a) => ({ ...a, position: [a.position[0] - c[0], a.position[1] - c[1], a.position[2] - c[2]] as const }));
}
