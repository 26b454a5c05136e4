/**
 * Eigenvalues of the upper ladder of a hindered-rotor block without diagonalising the whole block.
 *
 * A block of the rotor Hamiltonian (hindered-rotor.ts) is a symmetric tridiagonal matrix whose diagonal
 * B m² + V0/2 grows quadratically while the couplings stay −V0/4: far up the ladder an eigenvector is
 * concentrated on one basis index k and decays on both sides faster than geometrically (the Combes–Thomas
 * decay that also fixes the basis size). Its eigenvalue is then the root near d_k of
 *   f(μ) = d_k − μ − e_{k−1}²/L_{k−1}(μ) − e_k²/R_{k+1}(μ),
 * L and R the continued fractions of the window [a, b] ∋ k on either side (R_b = d_b − μ,
 * R_i = d_i − μ − e_i²/R_{i+1}; L likewise), found by Newton's method from μ = d_k (f′ ≤ −1, so f is
 * monotone between its poles). That is the eigenvalue of the window matrix; the window is widened until
 * the estimated decay of the eigenvector reaches 1e-18 of its centre or the block ends.
 * Error bound (a posteriori, rigorous up to rounding): the window eigenvector v (v_k = 1, components from
 * the same continued fractions) padded with zeros is an approximate eigenvector of the whole block with
 * residual r = (f(μ) at k, e_{a−1}v_a at a − 1, e_b v_b at b + 1), so the block has an eigenvalue within
 * ‖r‖/‖v‖ ≤ ‖r‖ of μ (the residual bound for symmetric matrices; e.g. Parlett, The Symmetric Eigenvalue
 * Problem (1980), ch. 4 — chapter from memory). A value is accepted only when that bound is ≤ `tolerance`; the caller passes
 * 4·ε·max|d|, the accuracy class of the QL iteration itself.
 * Source of the method: the continued-fraction (Jacobi-matrix) form of the characteristic equation and the
 * Sturm count of `eigenvaluesBelow`, e.g. Wilkinson, The Algebraic Eigenvalue Problem (1965), ch. 5
 * (tridiagonal matrices; chapter from memory); our arrangement.
 */

/** Newton steps allowed per eigenvalue (from d_k, 3–5 are typical for the upper ladder). */
const MAX_NEWTON_STEPS = 12;
/** The window is widened until the eigenvector's estimated decay reaches this fraction of its centre. */
const WINDOW_DECAY = 1e-18;

/**
 * The eigenvalue of the block (diagonal d, couplings e, e[i] between i and i + 1) that belongs to basis
 * index k, with |error| ≤ tolerance (see the file comment), or NaN when the window cannot certify it (the
 * caller then diagonalises the block). `maxReach` caps the window half-width.
 */
export function windowEigenvalue(d: Float64Array, e: Float64Array, k: number, tolerance: number, maxReach: number): number {
  const size = d.length;
  const dk = d[k]!;
  // Window from the unperturbed decay estimate Π |e_i / (d_i − d_k)| on each side.
  let b = k;
  for (let p = 1; b + 1 < size && b - k < maxReach; ) {
    const gap = Math.abs(d[b + 1]! - dk);
    p *= Math.abs(e[b]!) / (gap > 0 ? gap : Math.abs(e[b]!) * 1e-3);
    b++;
    if (p < WINDOW_DECAY) break;
  }
  let a = k;
  for (let p = 1; a > 0 && k - a < maxReach; ) {
    const gap = Math.abs(d[a - 1]! - dk);
    p *= Math.abs(e[a - 1]!) / (gap > 0 ? gap : Math.abs(e[a - 1]!) * 1e-3);
    a--;
    if (p < WINDOW_DECAY) break;
  }
  let mu = dk;
  for (let step = 0; step < MAX_NEWTON_STEPS; step++) {
    // Right continued fraction R_{k+1}(μ), its derivative and the right edge component v_b.
    let f = dk - mu;
    let df = -1;
    let ve = 0;
    if (b > k) {
      // R_b … R_{k+1}, dR/dμ, and |v_b| = Π_{i=k+1}^{b} |e_{i−1}/R_i| as one product (no overflow).
      let r = d[b]! - mu;
      let dr = -1;
      let v = Math.abs(e[b - 1]! / r);
      for (let i = b - 1; i > k; i--) {
        const c2 = e[i]! * e[i]!;
        const inv = 1 / r;
        dr = -1 + c2 * dr * inv * inv;
        r = d[i]! - mu - c2 * inv;
        v *= Math.abs(e[i - 1]! / r);
      }
      const c2 = e[k]! * e[k]!;
      f -= c2 / r;
      df += (c2 * dr) / (r * r);
      if (b + 1 < size) ve += (e[b]! * v) ** 2;
    } else if (b + 1 < size) ve += e[b]! ** 2;
    if (a < k) {
      let l = d[a]! - mu;
      let dl = -1;
      let v = Math.abs(e[a]! / l);
      for (let i = a + 1; i < k; i++) {
        const c2 = e[i - 1]! * e[i - 1]!;
        const inv = 1 / l;
        dl = -1 + c2 * dl * inv * inv;
        l = d[i]! - mu - c2 * inv;
        v *= Math.abs(e[i]! / l);
      }
      const c2 = e[k - 1]! * e[k - 1]!;
      f -= c2 / l;
      df += (c2 * dl) / (l * l);
      if (a > 0) ve += (e[a - 1]! * v) ** 2;
    } else if (a > 0) ve += e[a - 1]! ** 2;
    if (!(Number.isFinite(f) && Number.isFinite(df) && Number.isFinite(ve))) return NaN;
    if (Math.sqrt(f * f + ve) <= tolerance) return mu;
    if (Math.sqrt(ve) > tolerance) return NaN; // the window is too narrow for this level
    mu -= f / df;
  }
  return NaN;
}

/** Number of eigenvalues of the block below x (Sturm count of the LDLᵀ pivots of T − xI). */
export function eigenvaluesBelow(d: Float64Array, e: Float64Array, x: number): number {
  let count = 0;
  let q = 1;
  for (let i = 0; i < d.length; i++) {
    const c2 = i > 0 ? e[i - 1]! * e[i - 1]! : 0;
    q = d[i]! - x - (i > 0 ? c2 / q : 0);
    if (q === 0) q = -Number.MIN_VALUE; // a pivot exactly 0: count it as below (then the next pivot is +∞)
    if (q < 0) count++;
  }
  return count;
}
