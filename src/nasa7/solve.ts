/**
 * Equality-constrained linear least squares: minimise ‖A x − y‖₂ subject to C x = d, by the null-space
 * method (Golub & Van Loan, Matrix Computations, 4th ed., §6.2.2; Björck, Numerical Methods for Least
 * Squares Problems, 1996, §5.1.2):
 *   1. equilibrate columns: x = D⁻¹ u with D_j a power of two near ‖A_{:,j}‖ (exact scaling);
 *   2. QR of (C D⁻¹)ᵀ = [Q1 Q2] [R; 0]; a particular solution u_p = Q1 R⁻ᵀ d satisfies the constraints;
 *   3. every u = u_p + Q2 z satisfies them too; z solves the unconstrained problem
 *      min ‖(A D⁻¹ Q2) z − (y − A D⁻¹ u_p)‖ by Householder QR (ml-matrix's arithmetic on typed arrays), conditioning checked through
 *      the singular values of its R factor (ml-matrix SVD).
 * The constraints hold to rounding error (‖C x − d‖ ≈ ε ‖C‖ ‖x‖) regardless of the data, which is what
 * "exact" can mean in floating point.
 *
 * Steps 1–3 up to the QR of the reduced matrix depend only on A and C, i.e. on the sample temperatures,
 * the weights, the anchor temperature and tMid — not on the species. `factorConstrainedProblem` does them
 * once; `solveFactored` applies the factorisation to one right-hand side (y, d) with exactly the
 * arithmetic of a from-scratch solve, so cached and uncached results are bit-identical.
 */
import { Matrix, SingularValueDecomposition } from '../libraries.js';
import { FitError } from './errors.js';
import { householderQr } from './householder.js';

/**
 * Largest accepted 2-norm condition number of the reduced, equilibrated problem. Solution error is
 * roughly cond · ε ≈ 1e-6 relative at the limit, still far below the form's fit floor; beyond it the
 * samples do not determine the coefficients.
 */
export const MAX_CONDITION_NUMBER = 1e10;

/** Constraint rows whose R diagonal falls below this fraction of the largest are treated as dependent. */
const CONSTRAINT_RANK_TOLERANCE = 1e-12;

export interface ConstrainedSolution {
  x: number[];
  /** 2-norm condition number of the reduced equilibrated design. */
  conditionNumber: number;
  /** ‖A x − y‖₂ of the weighted problem. */
  residualNorm: number;
  /** Coordinates on the null space of the constraints (u = u_p + Q2 z), when solved by solveFactored. */
  z?: Float64Array;
  /** Scaled particular solution u_p, when solved by solveFactored. */
  up?: number[];
}

export interface ConstrainedProblem {
  rows: readonly (readonly number[])[];
  rhs: readonly number[];
  constraintRows: readonly (readonly number[])[];
  constraintRhs: readonly number[];
  /** Names of the constraints, for the dependent-constraint message. */
  constraintLabels?: readonly string[];
}

/**
 * Everything of the null-space method that depends on A and C only (see the module comment), kept as flat
 * typed arrays: a build holds one per cached (grid, options, tMid), so nothing the solves do not read is
 * kept (no copy of A itself, no number[][], no ml-matrix object). ≈ (2k + w) doubles per row, w ≤ 7 the
 * band width below (≈ 0.3 MB for a 10 K grid over 200–6000 K).
 */
export interface FactoredProblem {
  /** Unknowns n, constraints m and rows of A. */
  n: number;
  m: number;
  rowCount: number;
  /** Column scale D (powers of two). */
  scale: Float64Array;
  /** Full Q of (C D⁻¹)ᵀ, n × n row-major (q[i·n + j]), and its R, m × m row-major. */
  q: Float64Array;
  r: Float64Array;
  /** Householder QR of the reduced matrix A D⁻¹ Q2 as ml-matrix forms it: its QR factor column-major (rows × k) and R diagonal. */
  qrColumns: Float64Array;
  rDiagonal: Float64Array;
  /**
   * Band of A D⁻¹: row i holds its columns rowFirst[i] … rowEnd[i] − 1 at band[i·bandWidth …] (a design
   * row touches one range's seven coefficients only). Products with the exact zeros outside add nothing
   * to a sum (x + ±0 = x for the x ≠ −0 such sums hold, and a sum started at +0 is never −0), so skipping
   * them keeps every result bit-identical. A itself is band · D: D_j is a power of two, so the quotient
   * and the product back are exact (no design value is near under- or overflow).
   */
  band: Float64Array;
  bandWidth: number;
  rowFirst: Int32Array;
  rowEnd: Int32Array;
  /** Reduced matrix A D⁻¹ Q2 itself, row-major (the minimax fit reweights its rows). */
  reduced: Float64Array;
  conditionNumber: number;
}

/** ml-matrix's `hypotenuse` (src/dc/util.js, v6.15): the scaled form, which its QR uses for column norms. */
function hypotenuse(a: number, b: number): number {
  if (Math.abs(a) > Math.abs(b)) {
    const r = b / a;
    return Math.abs(a) * Math.sqrt(1 + r * r);
  }
  if (b !== 0) {
    const r = a / b;
    return Math.abs(b) * Math.sqrt(1 + r * r);
  }
  return 0;
}

/**
 * Householder QR of an nr × k matrix (row-major `matrix`), as ml-matrix's QrDecomposition computes it
 * (v6.15, src/dc/qr.js; the LINPACK/JAMA form: Golub & Van Loan, 4th ed., Alg. 5.2.1 with unit-scaled
 * reflectors): the same operations in the same order on a column-major typed array instead of get/set on
 * a Matrix, so `qrColumns` (its QR factor, column-major) and `rDiagonal` (its Rdiag) are the same doubles
 * (tested against ml-matrix in test/src/nasa7/factor-cache.test.ts).
 */
export function householderColumns(matrix: Float64Array, nr: number, k: number): { qrColumns: Float64Array; rDiagonal: Float64Array } {
  const qr = new Float64Array(nr * k);
  for (let row = 0; row < nr; row++) for (let c = 0; c < k; c++) qr[c * nr + row] = matrix[row * k + c]!;
  const rDiagonal = new Float64Array(k);
  for (let c = 0; c < k; c++) {
    const oc = c * nr;
    let nrm = 0;
    for (let i = c; i < nr; i++) nrm = hypotenuse(nrm, qr[oc + i]!);
    if (nrm !== 0) {
      if (qr[oc + c]! < 0) nrm = -nrm;
      for (let i = c; i < nr; i++) qr[oc + i] = qr[oc + i]! / nrm;
      qr[oc + c] = qr[oc + c]! + 1;
      for (let j = c + 1; j < k; j++) {
        const oj = j * nr;
        let s = 0;
        for (let i = c; i < nr; i++) s += qr[oc + i]! * qr[oj + i]!;
        s = -s / qr[oc + c]!;
        for (let i = c; i < nr; i++) qr[oj + i] = qr[oj + i]! + s * qr[oc + i]!;
      }
    }
    rDiagonal[c] = -nrm;
  }
  return { qrColumns: qr, rDiagonal };
}

function powerOfTwoNear(x: number): number {
  return x > 0 && Number.isFinite(x) ? 2 ** Math.round(Math.log2(x)) : 1;
}

/** Steps 1–3 of the module comment for A = rows, C = constraintRows. Throws FitError. */
export function factorConstrainedProblem(
  rows: readonly (readonly number[])[],
  constraintRows: readonly (readonly number[])[],
  constraintLabels?: readonly string[],
): FactoredProblem {
  const n = rows[0]?.length ?? 0;
  const m = constraintRows.length;
  const k = n - m;
  if (rows.length < k) throw new FitError(`least-squares system has ${rows.length} rows for ${k} free unknowns; expected at least as many rows`);

  // A design row touches one range's coefficients only: its nonzero entries lie in rowFirst … rowEnd − 1
  // (A and A D⁻¹ hold zeros at the same places: v / 2^p is zero exactly when v is). The column norms and
  // the reduced matrix below visit that band only, without changing a bit: hypot(c, 0) = c for the c ≥ 0 a
  // norm holds, and a sum that starts at +0 is never −0, so the ±0 products left out would leave it as it
  // is. (Measured: those two loops over whole rows were most of a cold factorisation, ~13 ms before the
  // code is optimised, and a midpoint search makes 19 of them per thread.)
  const nr = rows.length;
  const rowFirst = new Int32Array(nr);
  const rowEnd = new Int32Array(nr);
  let bandWidth = 0;
  for (let row = 0; row < nr; row++) {
    const values = rows[row]!;
    let first = n;
    let end = 0;
    for (let j = 0; j < n; j++) {
      if (values[j]! !== 0) {
        if (first === n) first = j;
        end = j + 1;
      }
    }
    rowFirst[row] = first === n ? 0 : first;
    rowEnd[row] = end;
    bandWidth = Math.max(bandWidth, end - rowFirst[row]!);
  }
  const colNorm = new Array<number>(n).fill(0);
  for (let row = 0; row < nr; row++) {
    const values = rows[row]!;
    for (let j = rowFirst[row]!; j < rowEnd[row]!; j++) {
      const v = values[j]!;
      if (v !== 0) colNorm[j] = Math.hypot(colNorm[j]!, v);
    }
  }
  // A column no sample touches (e.g. a6, a7 when the H and S weights are zero) can still be fixed by the
  // constraints; whether the whole problem is determined shows in the reduced condition number.
  const scale = colNorm.map(powerOfTwoNear);

  const a = rows.map((row) => row.map((v, j) => v / scale[j]!));
  const ct = Array.from({ length: n }, (_, j) => constraintRows.map((row) => row[j]! / scale[j]!));

  const { q, r } = householderQr(ct);
  const rMax = Math.max(...r.map((row, i) => Math.abs(row[i]!)));
  r.forEach((row, i) => {
    if (!(Math.abs(row[i]!) > CONSTRAINT_RANK_TOLERANCE * rMax)) {
      const label = constraintLabels?.[i] ?? `constraint ${i}`;
      throw new FitError(`equality constraints are linearly dependent (at "${label}"); check anchorT and tMid`);
    }
  });

  const reduced = new Float64Array(nr * k);
  const q2 = new Float64Array(n * k);
  for (let j = 0; j < n; j++) for (let c = 0; c < k; c++) q2[j * k + c] = q[j]![m + c]!;
  for (let row = 0; row < nr; row++) {
    const ar = a[row]!;
    for (let c = 0; c < k; c++) {
      let v = 0;
      for (let j = rowFirst[row]!; j < rowEnd[row]!; j++) v += ar[j]! * q2[j * k + c]!;
      reduced[row * k + c] = v;
    }
  }
  const { qrColumns, rDiagonal } = householderColumns(reduced, nr, k);
  const upper = new Matrix(k, k);
  for (let i = 0; i < k; i++) for (let j = i; j < k; j++) upper.set(i, j, i === j ? rDiagonal[i]! : qrColumns[j * nr + i]!);
  const sv = new SingularValueDecomposition(upper, {
    computeLeftSingularVectors: false,
    computeRightSingularVectors: false,
  }).diagonal;
  const sMax = Math.max(...sv);
  const sMin = Math.min(...sv);
  const conditionNumber = sMin > 0 ? sMax / sMin : Infinity;
  if (!(conditionNumber <= MAX_CONDITION_NUMBER)) {
    throw new FitError(
      `least-squares system is ill-conditioned or rank deficient (condition number ${conditionNumber.toExponential(2)} > ${MAX_CONDITION_NUMBER.toExponential(0)}): the samples do not determine all coefficients; use more, better spread temperatures in each range`,
    );
  }
  const band = new Float64Array(nr * bandWidth);
  for (let row = 0; row < nr; row++) {
    for (let j = rowFirst[row]!; j < rowEnd[row]!; j++) band[row * bandWidth + j - rowFirst[row]!] = a[row]![j]!;
  }
  const qFlat = new Float64Array(n * n);
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) qFlat[i * n + j] = q[i]![j]!;
  const rFlat = new Float64Array(m * m);
  for (let i = 0; i < m; i++) for (let j = 0; j < m; j++) rFlat[i * m + j] = r[i]![j]!;
  return {
    n,
    m,
    rowCount: nr,
    scale: Float64Array.from(scale),
    q: qFlat,
    r: rFlat,
    qrColumns,
    rDiagonal,
    band,
    bandWidth,
    rowFirst,
    rowEnd,
    reduced,
    conditionNumber,
  };
}

/** (A D⁻¹ v)_row, summed over the row's band in column order (the arithmetic of a full row sum). */
export function scaledRowDot(f: FactoredProblem, row: number, v: ArrayLike<number>): number {
  const o = row * f.bandWidth - f.rowFirst[row]!;
  const band = f.band;
  let s = 0;
  for (let j = f.rowFirst[row]!, end = f.rowEnd[row]!; j < end; j++) s += band[o + j]! * v[j]!;
  return s;
}

/** u_p = Q1 R⁻ᵀ d: the scaled particular solution that satisfies the constraints. */
export function particularSolution(f: FactoredProblem, constraintRhs: readonly number[]): number[] {
  const { n, m, q, r } = f;
  // Forward substitution Rᵀ w = d.
  const w = new Array<number>(m).fill(0);
  for (let i = 0; i < m; i++) {
    let s = constraintRhs[i]!;
    for (let j = 0; j < i; j++) s -= r[j * m + i]! * w[j]!;
    w[i] = s / r[i * m + i]!;
  }
  const up = new Array<number>(n).fill(0);
  for (let i = 0; i < n; i++) for (let j = 0; j < m; j++) up[i]! += q[i * n + j]! * w[j]!;
  return up;
}

/** x = D⁻¹ (u_p + Q2 z). */
export function assembleSolution(f: FactoredProblem, up: readonly number[], z: ArrayLike<number>): number[] {
  const { n, m, q, scale } = f;
  const k = n - m;
  return up.map((v, i) => {
    let s = v;
    for (let c = 0; c < k; c++) s += q[i * n + m + c]! * z[c]!;
    return s / scale[i]!;
  });
}

/**
 * Solves min ‖A x − y‖ s.t. C x = d with a factorisation of A and C. The reduced solve repeats, on typed
 * arrays, exactly the arithmetic of ml-matrix's QrDecomposition.solve (Householder application, then back
 * substitution, in the same order), so the coefficients are bit-identical to a fresh solve.
 */
export function solveFactored(f: FactoredProblem, rhs: ArrayLike<number>, constraintRhs: readonly number[]): ConstrainedSolution {
  return solveFactoredParts(f, rhs, constraintRhs, { residualNorm: true }).solution;
}

/** Work rows of `solveFactoredParts` (fully written before use; nothing returned points into it). */
let scratchX0 = new Float64Array(0);

/**
 * `solveFactored` with its by-products: with `targets`, also the reduced targets c = y − A D⁻¹ u_p (the
 * right-hand side of the reduced problem before the Householder steps, which the minimax fit starts from;
 * written into `targets` when it is an array of the right length, else into a new one);
 * without `residualNorm`, the residual pass is skipped and residualNorm is NaN (callers that need it for
 * one solution only compute it later with `residualNormOf`, the same arithmetic).
 */
export function solveFactoredParts(
  f: FactoredProblem,
  rhs: ArrayLike<number>,
  constraintRhs: readonly number[],
  want: { targets?: boolean | Float64Array; residualNorm?: boolean },
): { solution: ConstrainedSolution; targets?: Float64Array } {
  const k = f.n - f.m;
  const nr = f.rowCount;
  const up = particularSolution(f, constraintRhs);
  if (scratchX0.length < nr) scratchX0 = new Float64Array(nr);
  const x0 = scratchX0;
  const { band, bandWidth, rowFirst, rowEnd } = f;
  for (let row = 0; row < nr; row++) {
    // scaledRowDot inlined (the hot loop of every solve). Design rows span 5 (Cp/R: a1–a5), 6 (H/RT: a1–a6)
    // or 7 (S/R: a1–a5, a7) columns; those are summed unrolled, the same products added in the same order.
    let pred = 0;
    const first = rowFirst[row]!;
    const width = rowEnd[row]! - first;
    const b = row * bandWidth;
    if (width >= 5 && width <= 7) {
      pred += band[b]! * up[first]!;
      pred += band[b + 1]! * up[first + 1]!;
      pred += band[b + 2]! * up[first + 2]!;
      pred += band[b + 3]! * up[first + 3]!;
      pred += band[b + 4]! * up[first + 4]!;
      if (width >= 6) pred += band[b + 5]! * up[first + 5]!;
      if (width === 7) pred += band[b + 6]! * up[first + 6]!;
    } else {
      for (let j = 0; j < width; j++) pred += band[b + j]! * up[first + j]!;
    }
    x0[row] = rhs[row]! - pred;
  }
  let targets: Float64Array | undefined;
  if (want.targets instanceof Float64Array) (targets = want.targets).set(x0.subarray(0, nr));
  else if (want.targets) targets = x0.slice(0, nr);
  const qr = f.qrColumns;
  // Reflection c is x ← x + s_c v_c with s_c = −(v_c·x) / v_c[c] over rows ≥ c. The update by reflection
  // c and the dot product of reflection c + 1 share one pass over the rows: row i is updated, then (from
  // row c + 1 on) enters the next sum, in ascending i as in two separate passes, so every double is the same.
  if (k > 0) {
    let s = 0;
    for (let i = 0; i < nr; i++) s += qr[i]! * x0[i]!;
    s = -s / qr[0]!;
    for (let c = 0; c < k - 1; c++) {
      const o = c * nr;
      const on = o + nr;
      let next = 0;
      x0[c] = x0[c]! + s * qr[o + c]!;
      for (let i = c + 1; i < nr; i++) {
        const v = x0[i]! + s * qr[o + i]!;
        x0[i] = v;
        next += qr[on + i]! * v;
      }
      s = -next / qr[on + c + 1]!;
    }
    // The last reflection has no next sum.
    const o = (k - 1) * nr;
    for (let i = k - 1; i < nr; i++) x0[i] = x0[i]! + s * qr[o + i]!;
  }
  for (let c = k - 1; c >= 0; c--) {
    x0[c] = x0[c]! / f.rDiagonal[c]!;
    for (let i = 0; i < c; i++) x0[i] = x0[i]! - x0[c]! * qr[c * nr + i]!;
  }
  const z = x0.slice(0, k);
  const x = assembleSolution(f, up, z);
  const residualNorm = want.residualNorm ? residualNormOf(f, rhs, x) : NaN;
  const solution = { x, conditionNumber: f.conditionNumber, residualNorm, z, up };
  return targets ? { solution, targets } : { solution };
}

/** ‖A x − y‖₂ of the weighted problem (the residual norm `solveFactored` reports, same arithmetic). */
export function residualNormOf(f: FactoredProblem, rhs: ArrayLike<number>, x: readonly number[]): number {
  const { band, bandWidth, rowFirst, rowEnd, scale } = f;
  let sumSq = 0;
  for (let row = 0; row < f.rowCount; row++) {
    let pred = 0;
    const o = row * bandWidth - rowFirst[row]!;
    // band · D_j is A's entry exactly (see FactoredProblem.band).
    for (let j = rowFirst[row]!; j < rowEnd[row]!; j++) pred += band[o + j]! * scale[j]! * x[j]!;
    const r = pred - rhs[row]!;
    sumSq += r * r;
  }
  return Math.sqrt(sumSq);
}

export function solveConstrainedLeastSquares(p: ConstrainedProblem): ConstrainedSolution {
  const f = factorConstrainedProblem(p.rows, p.constraintRows, p.constraintLabels);
  return solveFactored(f, p.rhs, p.constraintRhs);
}
