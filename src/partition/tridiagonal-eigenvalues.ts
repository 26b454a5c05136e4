/** Eigenvalues of a real symmetric tridiagonal matrix (shared by the hindered-rotor level builders). */
import { LevelSumError } from './moments.js';

/** QL iterations allowed per eigenvalue before giving up (2–3 are typical; EISPACK allows 30). */
const MAX_QL_ITERATIONS = 30;

/**
 * √(a² + b²) without Math.hypot's cost (it dominates the QL sweep in V8); falls back to Math.hypot only
 * where the squares could overflow or underflow. Same correctly-rounded-within-1-ulp accuracy class.
 */
function hypot2(a: number, b: number): number {
  const s = a * a + b * b;
  return s < 1e300 && s > 1e-300 ? Math.sqrt(s) : Math.hypot(a, b);
}

/**
 * Eigenvalues of a real symmetric tridiagonal matrix: implicit QL with Wilkinson-type shifts, eigenvalues only
 * (the tql1 procedure of EISPACK; Bowdler, Martin, Reinsch & Wilkinson, Numer. Math. 11, 293 (1968)), O(n²).
 * Accuracy: about 1e-15 of the largest |entry| in absolute terms (for a rotor basis reaching B·M² ≈ 1.6e6
 * cm⁻¹, ~1e-8 cm⁻¹ per level — far below anything thermodynamic; the tests compare it with ml-matrix).
 * `diagonal` is overwritten with the eigenvalues in ascending order; `offDiagonal[i]` couples i and i+1
 * (length n, last entry ignored) and is destroyed.
 */
export function symmetricTridiagonalEigenvalues(diagonal: Float64Array, offDiagonal: Float64Array): Float64Array {
  const n = diagonal.length;
  const d = diagonal;
  const e = offDiagonal;
  if (n === 0) return d;
  e[n - 1] = 0;
  let f = 0;
  let tst1 = 0;
  const eps = 2 ** -52;
  for (let l = 0; l < n; l++) {
    tst1 = Math.max(tst1, Math.abs(d[l]!) + Math.abs(e[l]!));
    let m = l;
    while (m < n - 1 && Math.abs(e[m]!) > eps * tst1) m++;
    if (m > l) {
      let iterations = 0;
      do {
        if (++iterations > MAX_QL_ITERATIONS) throw new LevelSumError('hindered rotor: the QL eigenvalue iteration did not converge');
        let g = d[l]!;
        let p = (d[l + 1]! - g) / (2 * e[l]!);
        let r = hypot2(p, 1);
        if (p < 0) r = -r;
        d[l] = e[l]! / (p + r);
        d[l + 1] = e[l]! * (p + r);
        const dl1 = d[l + 1]!;
        let h = g - d[l]!;
        for (let i = l + 2; i < n; i++) d[i]! -= h;
        f += h;
        p = d[m]!;
        let c = 1;
        let c2 = c;
        let c3 = c;
        const el1 = e[l + 1]!;
        let s = 0;
        let s2 = 0;
        for (let i = m - 1; i >= l; i--) {
          c3 = c2;
          c2 = c;
          s2 = s;
          g = c * e[i]!;
          h = c * p;
          r = hypot2(p, e[i]!);
          e[i + 1] = s * r;
          s = e[i]! / r;
          c = p / r;
          p = c * d[i]! - s * g;
          d[i + 1] = h + s * (c * g + s * d[i]!);
        }
        p = (-s * s2 * c3 * el1 * e[l]!) / dl1;
        e[l] = s * p;
        d[l] = c * p;
      } while (Math.abs(e[l]!) > eps * tst1);
    }
    d[l] = d[l]! + f;
    e[l] = 0;
  }
  d.sort();
  return d;
}
