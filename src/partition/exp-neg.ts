/**
 * e^{−u} for u ≥ 0 (and, for 0 ≤ u < ln 2, 1 − e^{−u} to full relative precision) without a call to
 * Math.exp: the level sums and oscillators of the grid evaluator take one of these per level or mode and
 * temperature, and V8's Math.exp costs about twice this inlined table form.
 *
 * Method (table-driven, P. T. P. Tang, ACM Trans. Math. Softw. 15, 144 (1989) for exp and 18, 211 (1992)
 * for expm1; our arrangement): k = round(32u/ln 2), r = k·ln2/32 − u (|r| ≤ ln2/64 ≈ 0.0108, computed
 * with ln 2 split in a 32-bit head and a tail, the fdlibm constants, so k·head is exact and r carries
 * no cancellation error), then
 *   e^{−u} = 2^{−⌊k/32⌋} · 2^{−(k mod 32)/32} · (1 + p(r)),   p(r) = r + r²/2! + … + r⁷/7!  (≈ e^r − 1).
 * Accuracy (stated, tested against Math.exp and Math.expm1): the Taylor remainder of p is below
 * r⁸/8! ≤ 5e-21 (below 5e-19 of p itself); the table values 2^{−j/32} are within 1 ulp (Math.pow); the
 * power of two is exact; with the roundings of 1 + p and of the products the result is within 3 ulps of
 * e^{−u} (measured ≤ 2.1 against Math.exp, which is itself within 1 ulp). For u > 708 (e^{−u} < 3.3e-308,
 * the edge of the normal range) the result is 0: every caller adds it to a sum of order 1 or more.
 * `expNegPairSmall` (0 ≤ u < ln 2 only): 1 − e^{−u} = (1 − 2^{−j/32}) − 2^{−j/32}·p(r), the first term
 * from a table (within 1 ulp, Math.expm1). For j ≥ 1 the first term (≥ 0.0214) is nearly twice the
 * second (≤ 0.0109), so the difference keeps its relative accuracy: within 4 ulps however small u is
 * (j = 0 gives −p(r) itself, u ≤ 0.0108). Tested: ≤ 4 ulps (e^{−u}) and ≤ 5 ulps (1 − e^{−u}) against
 * Math.exp / Math.expm1.
 */

const STEPS = 32;
const LN2_HI = 6.93147180369123816490e-1; // fdlibm ln2_hi: 32 significant bits
const LN2_LO = 1.90821492927058770002e-10; // fdlibm ln2_lo: ln 2 − ln2_hi
const STEP_HI = LN2_HI / STEPS;
const STEP_LO = LN2_LO / STEPS;
const INV_STEP = STEPS / Math.LN2;
/** 1.5·2^52: adding and subtracting it rounds a double below 2^51 to the nearest integer. */
const ROUND = 6755399441055744;
/** Largest u with a normal result. */
export const EXP_NEG_LIMIT = 708;

/** 2^{−j/32}, j = 0 … 31. */
const FRACTION = (() => {
  const t = new Float64Array(STEPS);
  for (let j = 0; j < STEPS; j++) t[j] = Math.pow(2, -j / STEPS);
  return t;
})();
/** 1 − 2^{−j/32}, j = 0 … 32, to full relative precision. */
const ONE_MINUS_FRACTION = (() => {
  const t = new Float64Array(STEPS + 1);
  for (let j = 0; j <= STEPS; j++) t[j] = -Math.expm1((-j * Math.LN2) / STEPS);
  return t;
})();
/** 2^{−m}, m = 0 … 1022 (exact). */
const POWER = (() => {
  const t = new Float64Array(1023);
  let p = 1;
  for (let m = 0; m < 1023; m++) {
    t[m] = p;
    p *= 0.5;
  }
  return t;
})();

/** e^{−u} for 0 ≤ u (see the file comment: within 3 ulps; 0 for u > 708). */
export function expNeg(u: number): number {
  if (u > EXP_NEG_LIMIT) return 0;
  const k = u * INV_STEP + ROUND - ROUND;
  const r = k * STEP_HI - u + k * STEP_LO;
  const p = r * (1 + r * (1 / 2 + r * (1 / 6 + r * (1 / 24 + r * (1 / 120 + r * (1 / 720 + r * (1 / 5040)))))));
  const i = k | 0;
  return POWER[i >> 5]! * (FRACTION[i & 31]! * (1 + p));
}

/**
 * e^{−u} and 1 − e^{−u} for 0 ≤ u < ln 2 from one table lookup (see the file comment: each within 3 ulps
 * relative). Writes e^{−u} to out[0] and 1 − e^{−u} to out[1].
 */
export function expNegPairSmall(u: number, out: Float64Array): void {
  const k = u * INV_STEP + ROUND - ROUND;
  const r = k * STEP_HI - u + k * STEP_LO;
  const p = r * (1 + r * (1 / 2 + r * (1 / 6 + r * (1 / 24 + r * (1 / 120 + r * (1 / 720 + r * (1 / 5040)))))));
  const j = k | 0;
  const f = j === STEPS ? 0.5 : FRACTION[j]!;
  out[0] = f + f * p;
  out[1] = ONE_MINUS_FRACTION[j]! - f * p;
}
