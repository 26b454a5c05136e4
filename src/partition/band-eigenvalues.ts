/**
 * Eigenvalues of a real symmetric band matrix: Givens reduction to tridiagonal form with bulge chasing,
 * then the QL iteration of hindered-rotor.ts.
 */
import { symmetricTridiagonalEigenvalues } from './tridiagonal-eigenvalues.js';

/**
 * A real symmetric n×n matrix of half-bandwidth k (A_ij = 0 for |i − j| > k), lower band stored with one
 * spare diagonal for the bulge of the reduction: entry (i, j), i ≥ j, at i·(k + 2) + (i − j).
 */
export class SymmetricBandMatrix {
  readonly data: Float64Array;
  private readonly width: number;
  constructor(
    readonly size: number,
    readonly halfBandwidth: number,
  ) {
    this.width = halfBandwidth + 2;
    this.data = new Float64Array(size * this.width);
  }
  get(i: number, j: number): number {
    const r = i >= j ? i : j;
    const d = i >= j ? i - j : j - i;
    return d < this.width ? this.data[r * this.width + d]! : 0;
  }
  set(i: number, j: number, value: number): void {
    const r = i >= j ? i : j;
    const c = i >= j ? j : i;
    if (r - c >= this.width) {
      if (value !== 0) throw new RangeError(`entry (${i}, ${j}) outside the band`);
      return;
    }
    this.data[r * this.width + (r - c)] = value;
  }
}

/**
 * All eigenvalues, ascending. Method: Schwarz's reduction (H. R. Schwarz, Numer. Math. 12, 231 (1968)):
 * column by column, each entry below the first subdiagonal is annihilated by a Givens rotation of the two
 * rows (and columns) above it; the bulge this creates k + 1 below the diagonal is chased off the end of the
 * matrix by further rotations, k rows at a time. O(n² k) work, O(n k) storage; orthogonal, so the
 * eigenvalues are kept to about 1e-15 of the largest entry. The matrix is destroyed.
 */
export function symmetricBandEigenvalues(a: SymmetricBandMatrix): Float64Array {
  const n = a.size;
  const k = a.halfBandwidth;
  const rotate = (p: number, x: number) => {
    // Rotate rows/columns p and q = p + 1 so that entry (q, x) becomes 0 (x < p).
    const q = p + 1;
    const apx = a.get(p, x);
    const aqx = a.get(q, x);
    if (aqx === 0) return;
    const r = Math.hypot(apx, aqx);
    const c = apx / r;
    const s = aqx / r;
    const lo = Math.max(0, p - k - 1);
    const hi = Math.min(n - 1, q + k + 1);
    for (let y = lo; y <= hi; y++) {
      if (y === p || y === q) continue;
      const u = a.get(p, y);
      const v = a.get(q, y);
      if (u === 0 && v === 0) continue;
      const nu = c * u + s * v;
      const nv = -s * u + c * v;
      a.set(p, y, nu);
      a.set(q, y, nv);
    }
    const app = a.get(p, p);
    const aqq = a.get(q, q);
    const apq = a.get(p, q);
    a.set(p, p, c * c * app + 2 * c * s * apq + s * s * aqq);
    a.set(q, q, s * s * app - 2 * c * s * apq + c * c * aqq);
    a.set(p, q, (c * c - s * s) * apq + c * s * (aqq - app));
    a.set(q, x, 0);
  };
  for (let j = 0; j < n - 2; j++) {
    for (let i = Math.min(j + k, n - 1); i >= j + 2; i--) {
      if (a.get(i, j) === 0) continue;
      rotate(i - 1, j);
      // Chase the bulge at (r + k, r − 1), r = i, down the band.
      for (let r = i; r + k < n; r += k) {
        if (a.get(r + k, r - 1) === 0) break;
        rotate(r + k - 1, r - 1);
      }
    }
  }
  const d = new Float64Array(n);
  const e = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    d[i] = a.get(i, i);
    if (i + 1 < n) e[i] = a.get(i + 1, i);
  }
  return symmetricTridiagonalEigenvalues(d, e);
}
