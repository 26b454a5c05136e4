/** The rotational symmetry number of a rigid molecule from its geometry. */
import { centred } from './center-of-mass.js';
import { rigidRotorOf } from './rotational-constants.js';
import type { Atom, Matrix3, Vector3 } from './types.js';
import { apply, cross, dot, norm, scale, sub, unit } from './vector.js';

/** Atoms this close after a rotation are the same atom (a geometry from a table or an optimisation), Å. */
export const SYMMETRY_TOLERANCE_ANGSTROM = 0.02;

/** Atoms are interchangeable when they are the same isotope. */
const kindOf = (a: Atom): string => `${a.element}:${a.mass}`;

/** Frame with columns u, v, w built from two non-collinear vectors (u along a, v in the a-b plane). */
function frame(a: readonly number[], b: readonly number[]): Matrix3 {
  const u = unit(a);
  const v = unit(sub(b, scale(u, dot(b, u))));
  const w = cross(u, v);
  return [
    [u[0], v[0], w[0]],
    [u[1], v[1], w[1]],
    [u[2], v[2], w[2]],
  ];
}

/** F' Fᵀ: the proper rotation taking frame F to frame F'. */
function rotationBetween(from: Matrix3, to: Matrix3): Matrix3 {
  const r: Matrix3 = [
    [0, 0, 0],
    [0, 0, 0],
    [0, 0, 0],
  ];
  for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) for (let k = 0; k < 3; k++) r[i]![j]! += to[i]![k]! * from[j]![k]!;
  return r;
}

/** True when `map` takes every atom onto an atom of the same kind (within the tolerance). */
export function isSymmetryOperation(atoms: readonly Atom[], map: (p: readonly number[]) => Vector3, tolerance: number): boolean {
  return atoms.every((a) => {
    const image = map(a.position);
    const kind = kindOf(a);
    return atoms.some((b) => kindOf(b) === kind && norm(sub(image, b.position)) <= tolerance);
  });
}

/**
 * Symmetry number σ: the order of the group of proper rotations that map the molecule onto itself, atoms
 * interchangeable when they are the same isotope (within `tolerance`, Å).
 * Method: with the centre of mass at the origin, a proper rotation is fixed by the images of two
 * non-collinear atom positions a, b. Every candidate image pair (a', b') of the same kinds, with
 * |a'| = |a|, |b'| = |b| and |a' − b'| = |a − b|, gives exactly one rotation R = F(a', b')·F(a, b)ᵀ
 * (orthonormal frames); σ counts the candidates whose R maps the whole molecule onto itself. Distinct image
 * pairs give distinct rotations, so nothing is counted twice. Linear molecules: σ = 2 when the half-turn
 * perpendicular to the axis (r → −r for collinear atoms) is a symmetry (D∞h), else 1 (C∞v).
 * Source of the definition: Gilson & Irikura, J. Phys. Chem. B 114, 16304 (2010) (symmetry numbers as the
 * order of the rotational subgroup of the point group); McQuarrie, Statistical Mechanics (1976), §8-3.
 */
export function rotationalSymmetryNumber(input: readonly Atom[], tolerance = SYMMETRY_TOLERANCE_ANGSTROM): number {
  const atoms = centred(input);
  if (rigidRotorOf(atoms).linear) return isSymmetryOperation(atoms, (p) => [-p[0]!, -p[1]!, -p[2]!], tolerance) ? 2 : 1;
  const offCentre = atoms.filter((x) => norm(x.position) > tolerance);
  const count = (k: string) => offCentre.filter((x) => kindOf(x) === k).length;
  // The rarest kind gives the fewest candidates; b is the atom farthest from the line of a (best-conditioned frame).
  const a = offCentre.reduce((best, x) => (count(kindOf(x)) < count(kindOf(best)) ? x : best));
  const perpendicular = (x: Atom) => norm(cross(unit(a.position), x.position));
  const b = offCentre.reduce((best, x) => (perpendicular(x) > perpendicular(best) ? x : best));
  const base = frame(a.position, b.position);
  const ra = norm(a.position);
  const rb = norm(b.position);
  const rab = norm(sub(a.position, b.position));
  let sigma = 0;
  for (const a2 of atoms) {
    if (kindOf(a2) !== kindOf(a) || Math.abs(norm(a2.position) - ra) > tolerance) continue;
    for (const b2 of atoms) {
      if (b2 === a2 || kindOf(b2) !== kindOf(b) || Math.abs(norm(b2.position) - rb) > tolerance) continue;
      if (Math.abs(norm(sub(a2.position, b2.position)) - rab) > 2 * tolerance) continue;
      if (norm(cross(a2.position, b2.position)) < 1e-9) continue;
      const r = rotationBetween(base, frame(a2.position, b2.position));
      if (isSymmetryOperation(atoms, (p) => apply(r, p), tolerance)) sigma++;
    }
  }
  return Math.max(sigma, 1);
}
