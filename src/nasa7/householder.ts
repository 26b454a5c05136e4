/**
 * Householder QR with the full orthogonal factor, for the small constraint matrix (14 × ≤7). ml-matrix's
 * QrDecomposition returns only the thin Q, and the null-space method needs the complement columns as well.
 * Algorithm: Golub & Van Loan, Matrix Computations, 4th ed., Alg. 5.2.1 (Householder QR), Q accumulated
 * by backward application of the reflectors.
 */

export interface FullQr {
  /** n × n orthogonal matrix, row-major: q[i][j]. */
  q: number[][];
  /** m × m upper triangle of R (A = Q [R; 0]), row-major. */
  r: number[][];
}

/** QR of an n × m matrix a (n ≥ m), given row-major. */
export function householderQr(a: readonly (readonly number[])[]): FullQr {
  const n = a.length;
  const m = a[0]?.length ?? 0;
  if (m > n) throw new Error(`internal: householderQr needs rows ≥ columns, got ${n} × ${m}`);
  const w = a.map((row) => [...row]);
  const vs: number[][] = [];
  const betas: number[] = [];
  for (let k = 0; k < m; k++) {
    let norm = 0;
    for (let i = k; i < n; i++) norm = Math.hypot(norm, w[i]![k]!);
    const v = new Array<number>(n).fill(0);
    let beta = 0;
    if (norm > 0) {
      const alpha = w[k]![k]! > 0 ? -norm : norm;
      for (let i = k; i < n; i++) v[i] = w[i]![k]!;
      v[k]! -= alpha;
      let vv = 0;
      for (let i = k; i < n; i++) vv += v[i]! * v[i]!;
      beta = vv > 0 ? 2 / vv : 0;
      for (let j = k; j < m; j++) {
        let dot = 0;
        for (let i = k; i < n; i++) dot += v[i]! * w[i]![j]!;
        const f = beta * dot;
        for (let i = k; i < n; i++) w[i]![j]! -= f * v[i]!;
      }
    }
    vs.push(v);
    betas.push(beta);
  }
  const q: number[][] = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === j ? 1 : 0)));
  for (let k = m - 1; k >= 0; k--) {
    const v = vs[k]!;
    const beta = betas[k]!;
    if (beta === 0) continue;
    for (let j = 0; j < n; j++) {
      let dot = 0;
      for (let i = k; i < n; i++) dot += v[i]! * q[i]![j]!;
      const f = beta * dot;
      for (let i = k; i < n; i++) q[i]![j]! -= f * v[i]!;
    }
  }
  const r = Array.from({ length: m }, (_, i) => Array.from({ length: m }, (_, j) => (j >= i ? w[i]![j]! : 0)));
  return { q, r };
}
