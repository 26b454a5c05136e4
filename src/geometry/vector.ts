/** Small 3-vector helpers of the geometry steps. */
import type { Matrix3, Vector3 } from './types.js';

export const sub = (a: readonly number[], b: readonly number[]): Vector3 => [a[0]! - b[0]!, a[1]! - b[1]!, a[2]! - b[2]!];
export const dot = (a: readonly number[], b: readonly number[]): number => a[0]! * b[0]! + a[1]! * b[1]! + a[2]! * b[2]!;
export const cross = (a: readonly number[], b: readonly number[]): Vector3 => [
  a[1]! * b[2]! - a[2]! * b[1]!,
  a[2]! * b[0]! - a[0]! * b[2]!,
  a[0]! * b[1]! - a[1]! * b[0]!,
];
export const norm = (a: readonly number[]): number => Math.sqrt(dot(a, a));
export const scale = (a: readonly number[], s: number): Vector3 => [a[0]! * s, a[1]! * s, a[2]! * s];
export const unit = (a: readonly number[]): Vector3 => scale(a, 1 / norm(a));
export const apply = (m: Matrix3, v: readonly number[]): Vector3 => [dot(m[0], v), dot(m[1], v), dot(m[2], v)];

/** Rotation by `angle` (rad) about the unit axis `k` (Rodrigues' formula). */
export function rotationAbout(k: readonly number[], angle: number): Matrix3 {
  const c = Math.cos(angle);
  const s = Math.sin(angle);
  const t = 1 - c;
  const [x, y, z] = [k[0]!, k[1]!, k[2]!];
  return [
    [c + x * x * t, x * y * t - z * s, x * z * t + y * s],
    [y * x * t + z * s, c + y * y * t, y * z * t - x * s],
    [z * x * t - y * s, z * y * t + x * s, c + z * z * t],
  ];
}

/** Inverse of a non-singular 3×3 matrix (adjugate / determinant). */
export function inverse3(m: Matrix3): Matrix3 {
  const [a, b, c] = m;
  const r0 = cross(b, c);
  const r1 = cross(c, a);
  const r2 = cross(a, b);
  const det = dot(a, r0);
  // Columns of the inverse are the cross products; transpose into rows.
  return [
    [r0[0] / det, r1[0] / det, r2[0] / det],
    [r0[1] / det, r1[1] / det, r2[1] / det],
    [r0[2] / det, r1[2] / det, r2[2] / det],
  ];
}
