/** Geometry rows → atoms, with the checks every later step relies on. */
import { GeometryError } from './errors.js';
import { atomIdentity } from './isotopes.js';
import type { Atom } from './types.js';

/** Two atoms closer than this are the same point (a duplicated row or a units slip), Å. */
export const COINCIDENT_ATOMS_ANGSTROM = 0.1;

export type GeometryRow = readonly [string, number, number, number];

/**
 * Atoms of a geometry given as rows [symbol, x, y, z] in Å (symbols as in `atomIdentity`). Throws
 * GeometryError: `geometry-unknown-atom` (with the row index) or `geometry-coincident-atoms` when two atoms
 * are closer than COINCIDENT_ATOMS_ANGSTROM (no bond is shorter than about 0.74 Å, H2).
 */
export function atomsOf(rows: readonly GeometryRow[]): Atom[] {
  const atoms = rows.map((row, i) => {
    try {
      const id = atomIdentity(row[0]);
      return { symbol: row[0], element: id.element, mass: id.mass, position: [row[1], row[2], row[3]] as const };
    } catch (e) {
      if (e instanceof GeometryError) throw new GeometryError(e.code, e.message, [i]);
      throw e;
    }
  });
  for (let i = 0; i < atoms.length; i++) {
    for (let j = i + 1; j < atoms.length; j++) {
      const d = distance(atoms[i]!, atoms[j]!);
      if (d < COINCIDENT_ATOMS_ANGSTROM) {
        throw new GeometryError('geometry-coincident-atoms', `atoms ${i + 1} and ${j + 1} are ${d.toPrecision(3)} angstrom apart`, [i, j]);
      }
    }
  }
  return atoms;
}

export function distance(a: Atom, b: Atom): number {
  return Math.hypot(a.position[0] - b.position[0], a.position[1] - b.position[1], a.position[2] - b.position[2]);
}

/** Element counts of the atoms, as a composition (D and T separate from H). */
export function compositionOf(atoms: readonly Atom[]): Record<string, number> {
  const out: Record<string, number> = {};
  for (const a of atoms) out[a.element] = (out[a.element] ?? 0) + 1;
  return out;
}
