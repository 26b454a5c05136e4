/**
 * The factorisation cache (factor-cache.ts) and the split solve (solve.ts) give coefficients bit-identical
 * to the solver as it was before the cache: `solveBeforeCache` below is that solver, kept verbatim (only
 * renamed and reduced to returning x) as the reference. Data: closed-form RRHO species (synthetic.ts) and
 * the seeded synthetic set (test/fixtures/nasa7/synthetic-set.ts).
 */
import { Matrix, QrDecomposition, SingularValueDecomposition } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { T_REF } from '../../../src/constants.js';
import { buildConstraints } from '../../../src/nasa7/constraints.js';
import { buildDesign } from '../../../src/nasa7/design.js';
import { FitError } from '../../../src/nasa7/errors.js';
import { cachedFactorisations, factorisationFor, MAX_FACTORISATIONS, temperatureKey } from '../../../src/nasa7/factor-cache.js';
import { householderQr } from '../../../src/nasa7/householder.js';
import { normaliseFitOptions } from '../../../src/nasa7/options.js';
import { splitSamples } from '../../../src/nasa7/samples.js';
import { solveConstrainedLeastSquares, solveFactored, MAX_CONDITION_NUMBER, type ConstrainedProblem } from '../../../src/nasa7/solve.js';
import { syntheticSpecies } from '../../fixtures/nasa7/synthetic-set.js';
import { CH4_RRHO, grid, N2_RRHO, rrhoSample } from './synthetic.js';

const CONSTRAINT_RANK_TOLERANCE = 1e-12;

function powerOfTwoNear(x: number): number {
  return x > 0 && Number.isFinite(x) ? 2 ** Math.round(Math.log2(x)) : 1;
}

function solveBeforeCache(p: ConstrainedProblem): { x: number[] } {
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
  return { x };
}

const cases = [
  { name: 'N2', model: N2_RRHO, options: {} },
  { name: 'CH4, weights 4/0.5/1, tMid 1500', model: CH4_RRHO, options: { tMid: 1500, weights: { cp: 4, h: 0.5, s: 1 } } },
  { name: 'CH4, continuity order 2', model: CH4_RRHO, options: { continuityOrder: 2 as const } },
  ...syntheticSpecies(6, 11).map((sp) => ({ name: sp.name, model: sp.model, options: { tMid: 1200 } })),
];

describe('factorised solve equals the solver before the cache, bit for bit', () => {
  for (const c of cases) {
    it(c.name, () => {
      const samples = grid(200, 6000, 10).map((T) => rrhoSample(c.model, T));
      const anchor = rrhoSample(c.model, T_REF);
      const options = normaliseFitOptions(c.options);
      const ranges = splitSamples(samples, anchor, options);
      const design = buildDesign(ranges, options.weights, anchor.hRT * anchor.T);
      const constraints = buildConstraints(anchor, options);
      const problem = { rows: design.rows, rhs: design.rhs, constraintRows: constraints.rows, constraintRhs: constraints.rhs };
      const before = solveBeforeCache(problem).x;
      expect(solveConstrainedLeastSquares(problem).x).toStrictEqual(before);
      const key = { temperatures: temperatureKey(samples), weights: options.weights, anchorT: anchor.T, tMid: options.tMid, continuityOrder: options.continuityOrder };
      const f = factorisationFor(key, ranges, anchor);
      expect(factorisationFor(key, ranges, anchor)).toBe(f); // a hit
      expect(solveFactored(f, design.rhs, constraints.rhs).x).toStrictEqual(before);
    });
  }

  it('the cache stays bounded', () => {
    const samples = grid(200, 6000, 50).map((T) => rrhoSample(N2_RRHO, T));
    const anchor = rrhoSample(N2_RRHO, T_REF);
    const temperatures = temperatureKey(samples);
    for (let i = 0; i < MAX_FACTORISATIONS + 10; i++) {
      const options = normaliseFitOptions({ weights: { cp: 1 + i } });
      factorisationFor({ temperatures, weights: options.weights, anchorT: anchor.T, tMid: 1000, continuityOrder: 1 }, splitSamples(samples, anchor, options), anchor);
    }
    expect(cachedFactorisations()).toBe(MAX_FACTORISATIONS);
  });
});
