/** Principal moments and axes of inertia by symmetric eigendecomposition (ml-matrix). */
import { EigenvalueDecomposition, Matrix } from '../libraries.js';
import type { Matrix3, Vector3 } from './types.js';

export interface PrincipalAxes {
  /** Principal moments I_A ≤ I_B ≤ I_C, u·Å². */
  moments: [number, number, number];
  /** Unit axes, axes[k] belonging to moments[k]. */
  axes: [Vector3, Vector3, Vector3];
}

/**
 * Eigenvalues and eigenvectors of the (real symmetric) inertia tensor, ascending; tiny negative round-off
 * of a linear molecule's zero moment is clamped to 0. Method: ml-matrix EigenvalueDecomposition with
 * `assumeSymmetric` (Householder tridiagonalisation and QL, after EISPACK tred2/tql2).
 */
export function principalAxes(tensor: Matrix3): PrincipalAxes {
  const e = new EigenvalueDecomposition(new Matrix(tensor), { assumeSymmetric: true });
  const values = e.realEigenvalues;
  const vectors = e.eigenvectorMatrix;
  const order = [0, 1, 2].sort((a, b) => values[a]! - values[b]!);
  const moments = order.map((i) => Math.max(0, values[i]!)) as [number, number, number];
  const axes = order.map((i) => [vectors.get(0, i), vectors.get(1, i), vectors.get(2, i)] as Vector3) as [Vector3, Vector3, Vector3];
  return { moments, axes };
}
