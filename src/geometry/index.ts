/** Geometry → rigid rotor, symmetry number and torsions: one step per file. */
export { atomsOf, compositionOf, distance, COINCIDENT_ATOMS_ANGSTROM, type GeometryRow } from './atoms.js';
export { centerOfMass, centred } from './center-of-mass.js';
export { BOND_TOLERANCE_FACTOR, COVALENT_RADII_ANGSTROM, covalentRadius } from './covalent-radii.js';
export { GeometryError } from './errors.js';
export { inertiaTensor } from './inertia-tensor.js';
export { areBonded, bondGraph, sideOf, torsionOf, type TorsionGeometry } from './internal-rotation.js';
export { atomIdentity, type AtomIdentity } from './isotopes.js';
export { principalAxes, type PrincipalAxes } from './principal-moments.js';
export { LINEARITY_TOLERANCE_ANGSTROM, rigidRotorOf, rotationalConstantOfMoment, type RigidRotor } from './rotational-constants.js';
export { rotationalSymmetryNumber, SYMMETRY_TOLERANCE_ANGSTROM } from './symmetry-number.js';
export type { Atom, Matrix3, Vector3 } from './types.js';
