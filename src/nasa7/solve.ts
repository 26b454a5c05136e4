/**
 * Equality-constrained linear least squares: minimise ‖A x − y‖₂ subject to C x = d, by the null-space
 * method (Golub & Van Loan, Matrix Computations, 4th ed., §6.2.2; Björck, Numerical Methods for Least
 * Squares Problems, 1996, §5.1.2):
 *   1. equilibrate columns: x = D⁻¹ u with D_j a power of two near ‖A_{:,j}‖ (exact scaling);
 *   2. QR of (C D⁻¹)ᵀ = [Q1 Q2] [R; 0]; a particular solution u_p = Q1 R⁻ᵀ d satisfies the constraints;
 *   3. every u = u_p + Q2 z satisfies them too; z solves the unconstrained problem
 *      min ‖(A D⁻¹ Q2) z − (y − A D⁻¹ u_p)‖ by Householder QR (ml-matrix), conditioning checked through
 *      the singular values of its R factor (ml-matrix SVD).
 * The constraints hold to rounding error (‖C x − d‖ ≈ ε ‖C‖ ‖x‖) regardless of the data, which is what
 * "exact" can mean in floating point.
 */
import { Matrix, QrDecomposition, SingularValueDecomposition } from 'ml-matrix';
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
}

export interface ConstrainedProblem {
  rows: readonly (readonly number[])[];
  rhs: readonly number[];
  constraintRows: readonly (readonly number[])[];
  constraintRhs: readonly number[];
  /** Names of the constraints, for the dependent-constraint message. */
  constraintLabels?: readonly string[];
}

function powerOfTwoNear(x: number): number {
  return x > 0 && Number.isFinite(x) ? 2 ** Math.round(Math.log2(x)) : 1;
}

export function solveConstrainedLeastSquares(p: ConstrainedProblem): ConstrainedSolution {
  const n = p.rows[0]?.length ?? 0;
  const m = p.constraintRows.length;
  const k = n - m;
  if (p.rows.length < k) throw new FitError(`least-squares system has ${p.rows.length} rows for ${k} free unknowns; expected at least as many rows`);

  const colNorm = new Array<number>(n).fill(0);
  for (const row of p.rows) for (let j = 0; j < n; j++) colNorm[j] = Math.hypot(colNorm[j]!, row[j]!);
  // A column no sample touches (e.g. a6, a7 when the H and S weights are zero) can still be fixed by the
  // constraints; whether the whole problem is determined shows in the reduced condition number.
  const scale = colNorm.map(powerOfTwoNear);

  const a = p.rows.map((row) => row.map((v, j) => v / scale[j]!));
  const ct = Array.from({ length: n }, (_, j) => p.constraintRows.map((row) => row[j]! / scale[j]!));

  const { q, r } = householderQr(ct);
  const rMax = Math.max(...r.map((row, i) => Math.abs(row[i]!)));
  r.forEach((row, i) => {
    if (!(Math.abs(row[i]!) > CONSTRAINT_RANK_TOLERANCE * rMax)) {
      const label = p.constraintLabels?.[i] ?? `constraint ${i}`;
      throw new FitError(`equality constraints are linearly dependent (at "${label}"); check anchorT and tMid`);
    }
  });
  // Forward substitution Rᵀ w = d.
  const w = new Array<number>(m).fill(0);
  for (let i = 0; i < m; i++) {
    let s = p.constraintRhs[i]!;
    for (let j = 0; j < i; j++) s -= r[j]![i]! * w[j]!;
    w[i] = s / r[i]![i]!;
  }
  const up = new Array<number>(n).fill(0);
  for (let i = 0; i < n; i++) for (let j = 0; j < m; j++) up[i]! += q[i]![j]! * w[j]!;

  // Reduced problem on the null space of the constraints.
  const reduced = new Matrix(a.length, k);
  const rhs = new Matrix(a.length, 1);
  for (let row = 0; row < a.length; row++) {
    const ar = a[row]!;
    let pred = 0;
    for (let j = 0; j < n; j++) pred += ar[j]! * up[j]!;
    rhs.set(row, 0, p.rhs[row]! - pred);
    for (let c = 0; c < k; c++) {
      let v = 0;
      for (let j = 0; j < n; j++) v += ar[j]! * q[j]![m + c]!;
      reduced.set(row, c, v);
    }
  }
  const qr = new QrDecomposition(reduced);
  const sv = new SingularValueDecomposition(qr.upperTriangularMatrix, {
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
  const z = qr.solve(rhs).getColumn(0);

  const x = up.map((v, i) => {
    let s = v;
    for (let c = 0; c < k; c++) s += q[i]![m + c]! * z[c]!;
    return s / scale[i]!;
  });
  let res = 0;
  for (let row = 0; row < p.rows.length; row++) {
    let pred = 0;
    for (let j = 0; j < n; j++) pred += p.rows[row]![j]! * x[j]!;
    res = Math.hypot(res, pred - p.rhs[row]!);
  }
  return { x, conditionNumber, residualNorm: res };
}
