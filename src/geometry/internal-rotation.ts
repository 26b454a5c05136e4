/**
 * A torsion of a molecule from its geometry: the two sides of a bond and the reduced moment of inertia of
 * the internal rotation.
 */
import { distance } from './atoms.js';
import { centred } from './center-of-mass.js';
import { BOND_TOLERANCE_FACTOR, covalentRadius } from './covalent-radii.js';
import { GeometryError } from './errors.js';
import { inertiaTensor } from './inertia-tensor.js';
import { SYMMETRY_TOLERANCE_ANGSTROM, isSymmetryOperation } from './symmetry-number.js';
import type { Atom, Vector3 } from './types.js';
import { apply, cross, dot, norm, rotationAbout, sub, unit, inverse3 } from './vector.js';

/** True when atoms i and j (0-based) are bonded by the covalent-radius rule of covalent-radii.ts. */
export function areBonded(atoms: readonly Atom[], i: number, j: number): boolean {
  const ri = covalentRadius(atoms[i]!.element);
  const rj = covalentRadius(atoms[j]!.element);
  if (ri === undefined || rj === undefined) {
    throw new GeometryError('geometry-no-covalent-radius', `no covalent radius for ${ri === undefined ? atoms[i]!.element : atoms[j]!.element}`, [ri === undefined ? i : j]);
  }
  return distance(atoms[i]!, atoms[j]!) <= BOND_TOLERANCE_FACTOR * (ri + rj);
}

/** Bond list (adjacency) of the whole geometry by the covalent-radius rule. */
export function bondGraph(atoms: readonly Atom[]): number[][] {
  const adjacent: number[][] = atoms.map(() => []);
  for (let i = 0; i < atoms.length; i++) {
    for (let j = i + 1; j < atoms.length; j++) {
      if (areBonded(atoms, i, j)) {
        adjacent[i]!.push(j);
        adjacent[j]!.push(i);
      }
    }
  }
  return adjacent;
}

/**
 * The atoms on the side of atom `j` of the bond i–j (0-based, j included, i excluded), found by walking the
 * bond graph without crossing the bond. Throws `rotor-axis-not-bonded` when i and j are not bonded and
 * `rotor-axis-in-ring` when the walk reaches i (the bond is in a ring: no free torsion).
 */
export function sideOf(atoms: readonly Atom[], i: number, j: number): number[] {
  const graph = bondGraph(atoms);
  if (!graph[i]!.includes(j)) {
    const d = distance(atoms[i]!, atoms[j]!);
    throw new GeometryError('rotor-axis-not-bonded', `atoms ${i + 1} and ${j + 1} are ${d.toFixed(3)} angstrom apart: not bonded`, [i, j]);
  }
  const seen = new Set<number>([j]);
  const queue = [j];
  while (queue.length > 0) {
    const k = queue.shift()!;
    for (const n of graph[k]!) {
      if (k === j && n === i) continue;
      if (n === i) throw new GeometryError('rotor-axis-in-ring', `the bond ${i + 1}-${j + 1} is in a ring`, [i, j]);
      if (!seen.has(n)) {
        seen.add(n);
        queue.push(n);
      }
    }
  }
  return [...seen].sort((x, y) => x - y);
}

export interface TorsionGeometry {
  /** The axis atoms (0-based), the top on the side of the second. */
  axis: [number, number];
  /** Atoms that turn (0-based), including the axis atom on their side. */
  top: number[];
  /** Pitzer's reduced moment I(2,3), u·Å². */
  reducedMoment: number;
  /** The two-body approximation I_top I_frame / (I_top + I_frame) about the bond, u·Å² (for comparison). */
  twoBodyMoment: number;
  /**
   * Rotor symmetry number: the number of turning angles per full turn that give an indistinguishable
   * molecule, lcm(n_top, n_frame) with n_side the largest n ≤ 12 for which a turn of 2π/n about the axis
   * maps that side onto itself (CH3-CH3 and CH3-OH: 3; CH3-NO2: 6).
   */
  symmetryNumber: number;
}

/**
 * The torsion about the bond i–j (0-based). `top` (0-based, optional) names the atoms that turn; it must
 * lie on one side of the bond (the axis atom of that side may be left out) and is completed to the whole
 * side; absent, the side with fewer atoms turns (the side of j on a tie). Throws GeometryError
 * `rotor-top-both-sides` or `rotor-top-incomplete` (a top that is not a whole side would tear bonds).
 *
 * Reduced moment (Pitzer's I(2,3)): with the centre of mass at the origin, the top turning at φ̇ about the
 * axis through atom i along λ = (r_j − r_i)/|r_j − r_i| moves each top atom k at t_k φ̇, t_k = λ × (r_k − r_i).
 * Removing the centre-of-mass motion and the overall rotation it drags along leaves the kinetic energy
 * ½ I_red φ̇² with
 *   I_red = Σ_top m_k |t_k|²  −  |Σ_top m_k t_k|² / M  −  gᵀ I⁻¹ g,   g = Σ_top m_k r_k × t_k,
 * I the inertia tensor of the whole molecule and M its mass. The same I_red results whichever side turns.
 * Units: u·Å². Valid for one torsion at a rigid frame (no coupling between several rotors is included).
 * Sources: Pitzer, J. Chem. Phys. 14, 239 (1946); Pitzer & Gwinn, J. Chem. Phys. 10, 428 (1942);
 * East & Radom, J. Chem. Phys. 106, 6655 (1997) (I(2,3) against the simpler approximations).
 */
export function torsionOf(input: readonly Atom[], i: number, j: number, top?: readonly number[]): TorsionGeometry {
  const atoms = centred(input);
  const sideJ = sideOf(atoms, i, j);
  const sideI = atoms.map((_, k) => k).filter((k) => !sideJ.includes(k));
  let turning: number[];
  let axis: [number, number];
  if (top !== undefined) {
    const onI = top.filter((k) => k !== i && k !== j && sideI.includes(k));
    const onJ = top.filter((k) => k !== i && k !== j && sideJ.includes(k));
    if (onI.length > 0 && onJ.length > 0) {
      throw new GeometryError('rotor-top-both-sides', `the top holds atoms on both sides of the bond ${i + 1}-${j + 1} (${onI.map((k) => k + 1).join(', ')} | ${onJ.map((k) => k + 1).join(', ')})`, [...onI, ...onJ]);
    }
    const useJ = onJ.length > 0 || (onI.length === 0 && top.includes(j));
    const side = useJ ? sideJ : sideI;
    const missing = side.filter((k) => k !== i && k !== j && !top.includes(k));
    if (missing.length > 0) {
      throw new GeometryError('rotor-top-incomplete', `the top leaves out atom${missing.length === 1 ? '' : 's'} ${missing.map((k) => k + 1).join(', ')} bonded to it on the same side of the bond ${i + 1}-${j + 1}`, missing);
    }
    turning = side;
    axis = useJ ? [i, j] : [j, i];
  } else if (sideI.length < sideJ.length) {
    turning = sideI;
    axis = [j, i];
  } else {
    turning = sideJ;
    axis = [i, j];
  }
  const frame = atoms.map((_, k) => k).filter((k) => !turning.includes(k));
  const origin = atoms[axis[0]]!.position;
  const lambda = unit(sub(atoms[axis[1]]!.position, origin));
  let aTop = 0;
  let totalMass = 0;
  let p: Vector3 = [0, 0, 0];
  let g: Vector3 = [0, 0, 0];
  for (const a of atoms) totalMass += a.mass;
  for (const k of turning) {
    const a = atoms[k]!;
    const t = cross(lambda, sub(a.position, origin));
    aTop += a.mass * dot(t, t);
    p = [p[0] + a.mass * t[0], p[1] + a.mass * t[1], p[2] + a.mass * t[2]];
    const l = cross(a.position, t);
    g = [g[0] + a.mass * l[0], g[1] + a.mass * l[1], g[2] + a.mass * l[2]];
  }
  const coupling = dot(g, apply(inverse3(inertiaTensor(atoms)), g));
  const reducedMoment = aTop - dot(p, p) / totalMass - coupling;
  const aboutAxis = (ks: readonly number[]) =>
    ks.reduce((s, k) => {
      const t = cross(lambda, sub(atoms[k]!.position, origin));
      return s + atoms[k]!.mass * dot(t, t);
    }, 0);
  const aFrame = aboutAxis(frame);
  const twoBodyMoment = (aTop * aFrame) / (aTop + aFrame);
  const sideSymmetry = (ks: readonly number[]) => {
    const local = ks.map((k) => ({ ...atoms[k]!, position: sub(atoms[k]!.position, origin) as readonly [number, number, number] }));
    for (let n = 12; n >= 2; n--) {
      const r = rotationAbout(lambda, (2 * Math.PI) / n);
      if (isSymmetryOperation(local, (q) => apply(r, q), SYMMETRY_TOLERANCE_ANGSTROM)) return n;
    }
    return 1;
  };
  const symmetryNumber = lcm(sideSymmetry(turning), sideSymmetry(frame));
  return { axis, top: turning, reducedMoment, twoBodyMoment, symmetryNumber };
}

const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));
const lcm = (a: number, b: number): number => (a / gcd(a, b)) * b;
