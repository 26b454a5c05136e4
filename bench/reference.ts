/**
 * The plain reference implementation `npm run bench` times against qforge: the same job, written the
 * straightforward way, one species at a time, no caching, no checks, no tables of the build:
 *   read each species file → partition functions on the 10 K grid 200–6000 K (direct sums, typed arrays)
 *   → constrained two-range least-squares NASA-7 fit (KKT normal equations, Gaussian elimination)
 *   → one line per species (name and the 14 coefficients).
 * It reads only what bench/synthetic.ts writes (numbers in cm⁻¹ and amu·Å², bare or as {value, unit}; kJ/mol at 298.15 K) and
 * is not part of qforge. Physics as in McQuarrie, Statistical Mechanics (1976): Sackur–Tetrode
 * translation, rigid rotors (classical nonlinear, direct-sum linear), harmonic oscillators, electronic and
 * rovibronic level sums, and hindered rotors by Sturm-sequence bisection of the free-rotor-basis matrix.
 */
import { readdir, readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { parse } from 'yaml';
import { ATOMIC_MASS_CONSTANT, AVOGADRO, BOLTZMANN, C2_CM_K, GAS_CONSTANT, PLANCK, SPEED_OF_LIGHT, T_REF } from '../src/constants.js';

/** Standard atomic weights (IUPAC, conventional values, from memory) of the elements the generator uses. */
const ATOMIC_WEIGHT: Record<string, number> = { H: 1.008, C: 12.011, N: 14.007, O: 15.999, F: 18.998, S: 32.06, Cl: 35.45, Si: 28.085 };
/** h/(8π² c) in cm⁻¹·amu·Å²: B = this / I. */
const B_FROM_INERTIA = PLANCK / (8 * Math.PI ** 2 * SPEED_OF_LIGHT * 100) / (ATOMIC_MASS_CONSTANT * 1e-20);

const T_LOW = 200;
const T_MID = 1000;
const T_HIGH = 6000;
const STEP = 10;

interface Moments {
  lnQ: Float64Array;
  meanU: Float64Array;
  varU: Float64Array;
}

/** Add the moments of the level sum q = Σ g e^{−θ/T} (θ in K, from the lowest level) at every grid T. */
function addLevelSum(m: Moments, T: Float64Array, theta: ArrayLike<number>, g: ArrayLike<number>): void {
  for (let t = 0; t < T.length; t++) {
    const inv = 1 / T[t]!;
    let q = 0;
    let s1 = 0;
    let s2 = 0;
    for (let i = 0; i < theta.length; i++) {
      const u = theta[i]! * inv;
      const w = g[i]! * Math.exp(-u);
      q += w;
      s1 += w * u;
      s2 += w * u * u;
    }
    const mean = s1 / q;
    m.lnQ[t]! += Math.log(q);
    m.meanU[t]! += mean;
    m.varU[t]! += s2 / q - mean * mean;
  }
}

function shiftedKelvin(energies: number[]): number[] {
  const lowest = Math.min(...energies);
  return energies.map((e) => (e - lowest) * C2_CM_K);
}

/** Eigenvalues of a symmetric tridiagonal matrix below `upper`, by Sturm counts and bisection. */
function tridiagonalEigenvaluesBelow(d: Float64Array, off: number, upper: number): number[] {
  const count = (x: number) => {
    let c = 0;
    let q = 1;
    for (let i = 0; i < d.length; i++) {
      q = d[i]! - x - (i > 0 ? (off * off) / q : 0);
      if (q === 0) q = 1e-300;
      if (q < 0) c++;
    }
    return c;
  };
  const lower = Math.min(...d) - 2 * Math.abs(off);
  const n = count(upper);
  const out: number[] = [];
  for (let k = 0; k < n; k++) {
    let lo = lower;
    let hi = upper;
    while (hi - lo > 1e-9 * Math.max(1, Math.abs(hi))) {
      const mid = 0.5 * (lo + hi);
      if (count(mid) > k) hi = mid;
      else lo = mid;
    }
    out.push(0.5 * (lo + hi));
  }
  return out;
}

/** Levels of (B(−d²/dφ²) + V0/2 (1 − cos nφ)) up to E/kT = 40 at T_HIGH, cm⁻¹. */
function hinderedRotorEnergies(v0: number, n: number, b: number): number[] {
  const keep = (40 * T_HIGH) / C2_CM_K;
  const mMax = Math.ceil(Math.sqrt((2.25 * (keep + v0)) / b)) + 2 * n;
  const all: number[] = [];
  for (let r = 0; r < n; r++) {
    const m0 = -mMax + ((((r + mMax) % n) + n) % n);
    const size = Math.floor((mMax - m0) / n) + 1;
    const d = new Float64Array(size);
    for (let k = 0; k < size; k++) d[k] = b * (m0 + k * n) ** 2 + v0 / 2;
    all.push(...tridiagonalEigenvaluesBelow(d, -v0 / 4, keep + v0));
  }
  const lowest = Math.min(...all);
  return all.filter((e) => e - lowest <= keep);
}

type Doc = Record<string, unknown> & { name: string; structure: string; composition: Record<string, number> };
const list = <T>(x: unknown) => (x ?? []) as T[];

/** Cp/R, H/RT (relative to H0) and S/R on the grid (plus T_REF as the last point). */
function properties(doc: Doc, T: Float64Array): Moments {
  const m: Moments = { lnQ: new Float64Array(T.length), meanU: new Float64Array(T.length), varU: new Float64Array(T.length) };
  let mass = 0;
  for (const [el, n] of Object.entries(doc.composition)) mass += ATOMIC_WEIGHT[el]! * n;
  const mKg = mass / 1000 / AVOGADRO;
  for (let t = 0; t < T.length; t++) {
    const kT = BOLTZMANN * T[t]!;
    m.lnQ[t] = 1.5 * Math.log((2 * Math.PI * mKg * kT) / (PLANCK * PLANCK)) + Math.log(kT / 1e5);
    m.meanU[t] = 2.5;
    m.varU[t] = 2.5;
  }
  if (doc.structure === 'diatomic') {
    const energies: number[] = [];
    const weights: number[] = [];
    const sigma = doc.symmetry_number as number;
    const states = list<Record<string, number>>(doc.electronic_states);
    const e00 = (s: Record<string, number>, v: number, J: number) => {
      const h = v + 0.5;
      const x = J * (J + 1);
      return s.energy! + s.we! * h - s.wexe! * h * h + (s.Be! - s.alphae! * h) * x - s.De! * x * x + (s.He ?? 0) * x * x * x;
    };
    const limit = e00(states[0]!, 0, 0) + (doc.dissociation_energy as number);
    for (const s of states) {
      let previousG = -Infinity;
      for (let v = 0; ; v++) {
        const h = v + 0.5;
        const G = s.we! * h - s.wexe! * h * h;
        if ((v > 0 && G <= previousG) || s.Be! - s.alphae! * h <= 0 || e00(s, v, 0) >= limit) break;
        previousG = G;
        let previousE = -Infinity;
        for (let J = 0; ; J++) {
          const E = e00(s, v, J);
          if (E >= limit || E <= previousE) break;
          previousE = E;
          energies.push(E);
          weights.push((s.degeneracy! * (2 * J + 1)) / sigma);
        }
      }
    }
    addLevelSum(m, T, shiftedKelvin(energies), weights);
    return m;
  }
  const el = list<{ energy: number; degeneracy: number }>(doc.electronic_levels);
  addLevelSum(m, T, shiftedKelvin(el.map((l) => l.energy)), el.map((l) => l.degeneracy));
  if (doc.structure === 'atom') return m;
  const sigma = doc.symmetry_number as number;
  const rot = list<number>(doc.rotational_constants);
  if (doc.structure === 'linear') {
    const theta = rot[0]! * C2_CM_K;
    const levels: number[] = [];
    const g: number[] = [];
    for (let J = 0; theta * J * (J + 1) < 40 * T_HIGH; J++) {
      levels.push(theta * J * (J + 1));
      g.push((2 * J + 1) / sigma);
    }
    addLevelSum(m, T, levels, g);
  } else {
    const product = rot[0]! * rot[1]! * rot[2]! * C2_CM_K ** 3;
    for (let t = 0; t < T.length; t++) {
      m.lnQ[t]! += 0.5 * Math.log(Math.PI) - Math.log(sigma) + 0.5 * (3 * Math.log(T[t]!) - Math.log(product));
      m.meanU[t]! += 1.5;
      m.varU[t]! += 1.5;
    }
  }
  for (const v of list<number | { wavenumber: number; degeneracy: number }>(doc.vibrations)) {
    const nu = typeof v === 'number' ? v : v.wavenumber;
    const dg = typeof v === 'number' ? 1 : v.degeneracy;
    for (let t = 0; t < T.length; t++) {
      const x = (C2_CM_K * nu) / T[t]!;
      const e = Math.exp(-x);
      m.lnQ[t]! -= dg * Math.log(1 - e);
      m.meanU[t]! += (dg * x * e) / (1 - e);
      m.varU[t]! += (dg * x * x * e) / ((1 - e) * (1 - e));
    }
  }
  // The generator writes the rotor quantities with their units ({value, unit: cm-1 / amu*angstrom^2}).
  const valueOf = (x: number | { value: number }) => (typeof x === 'number' ? x : x.value);
  type Quantity = number | { value: number };
  for (const r of list<{ barrier: Quantity; foldedness: number; symmetry_number: number; moment_of_inertia: Quantity }>(doc.internal_rotors)) {
    const e = hinderedRotorEnergies(valueOf(r.barrier), r.foldedness, B_FROM_INERTIA / valueOf(r.moment_of_inertia));
    addLevelSum(m, T, shiftedKelvin(e), new Float64Array(e.length).fill(1 / r.symmetry_number));
  }
  return m;
}

/** Solve A x = b in place (Gaussian elimination with partial pivoting). */
function solveDense(a: Float64Array[], b: Float64Array): Float64Array {
  const n = b.length;
  for (let k = 0; k < n; k++) {
    let p = k;
    for (let i = k + 1; i < n; i++) if (Math.abs(a[i]![k]!) > Math.abs(a[p]![k]!)) p = i;
    [a[k], a[p]] = [a[p]!, a[k]!];
    [b[k], b[p]] = [b[p]!, b[k]!];
    for (let i = k + 1; i < n; i++) {
      const f = a[i]![k]! / a[k]![k]!;
      for (let j = k; j < n; j++) a[i]![j]! -= f * a[k]![j]!;
      b[i]! -= f * b[k]!;
    }
  }
  const x = new Float64Array(n);
  for (let i = n - 1; i >= 0; i--) {
    let s = b[i]!;
    for (let j = i + 1; j < n; j++) s -= a[i]![j]! * x[j]!;
    x[i] = s / a[i]![i]!;
  }
  return x;
}

// NASA-7 basis rows in τ = T/1000 (7 coefficients of one range).
const cpRow = (t: number) => [1, t, t * t, t ** 3, t ** 4, 0, 0];
const hRow = (t: number) => [1, t / 2, (t * t) / 3, t ** 3 / 4, t ** 4 / 5, 1 / t, 0];
const sRow = (t: number) => [Math.log(t), t, (t * t) / 2, t ** 3 / 3, t ** 4 / 4, 0, 1];
const dcpRow = (t: number) => [0, 1, 2 * t, 3 * t * t, 4 * t ** 3, 0, 0];

/** Two-range fit with H and S exact at T_REF and Cp, dCp/dT, H, S continuous at T_MID; T-coefficients. */
function fitTwoRanges(T: Float64Array, cp: Float64Array, h: Float64Array, s: Float64Array, anchor: number): number[] {
  const n = 14;
  const k = 6;
  const size = n + k;
  const a = Array.from({ length: size }, () => new Float64Array(size));
  const rhs = new Float64Array(size);
  const addRow = (row: number[], offset: number, target: number) => {
    for (let i = 0; i < 7; i++) {
      rhs[offset + i]! += 2 * row[i]! * target;
      for (let j = 0; j < 7; j++) a[offset + i]![offset + j]! += 2 * row[i]! * row[j]!;
    }
  };
  for (let i = 0; i < anchor; i++) {
    const t = T[i]! / 1000;
    const ranges = T[i]! < T_MID ? [0] : T[i]! > T_MID ? [7] : [0, 7];
    for (const off of ranges) {
      addRow(cpRow(t), off, cp[i]!);
      addRow(hRow(t), off, h[i]!);
      addRow(sRow(t), off, s[i]!);
    }
  }
  const constraint = (c: number, low: number[], high: number[] | null, value: number) => {
    for (let j = 0; j < 7; j++) {
      a[n + c]![j] = low[j]!;
      a[j]![n + c] = low[j]!;
      if (high) {
        a[n + c]![7 + j] = -high[j]!;
        a[7 + j]![n + c] = -high[j]!;
      }
    }
    rhs[n + c] = value;
  };
  const ta = T[anchor]! / 1000;
  const tm = T_MID / 1000;
  constraint(0, hRow(ta), null, h[anchor]!);
  constraint(1, sRow(ta), null, s[anchor]!);
  constraint(2, cpRow(tm), cpRow(tm), 0);
  constraint(3, dcpRow(tm), dcpRow(tm), 0);
  constraint(4, hRow(tm), hRow(tm), 0);
  constraint(5, sRow(tm), sRow(tm), 0);
  const x = solveDense(a, rhs);
  // τ-coefficients → T-coefficients: a_k = b_k/1000^(k−1), a6 = 1000·b6, a7 = b7 − a1 ln 1000.
  const out: number[] = [];
  for (const off of [0, 7]) {
    for (let j = 0; j < 5; j++) out.push(x[off + j]! / 1000 ** j);
    out.push(x[off + 5]! * 1000, x[off + 6]! - x[off]! * Math.log(1000));
  }
  return out;
}

/** Run the reference job over every species file of `dir`; writes `outFile`; returns the species count. */
export async function runReference(dir: string, outFile: string): Promise<number> {
  const files = (await readdir(dir)).filter((f) => f.endsWith('.yaml') && f !== 'qforge.yaml').sort();
  const points = (T_HIGH - T_LOW) / STEP + 1;
  const T = new Float64Array(points + 1);
  for (let i = 0; i < points; i++) T[i] = T_LOW + i * STEP;
  T[points] = T_REF;
  const lines: string[] = [];
  for (const file of files) {
    const doc = parse(await readFile(path.join(dir, file), 'utf8')) as Doc;
    const m = properties(doc, T);
    const hf = ((doc.enthalpy_of_formation as { value: number }).value * 1000) / (GAS_CONSTANT * T_REF);
    const cp = m.varU;
    const h = new Float64Array(T.length);
    const s = new Float64Array(T.length);
    const shift = (hf - m.meanU[points]!) * T_REF; // H/RT absolute = meanU + (ΔfH − (H298 − H0))/RT
    for (let i = 0; i < T.length; i++) {
      h[i] = m.meanU[i]! + shift / T[i]!;
      s[i] = m.lnQ[i]! + m.meanU[i]!;
    }
    const c = fitTwoRanges(T, cp, h, s, points);
    lines.push(`${doc.name} ${c.map((v) => v.toExponential(9)).join(' ')}`);
  }
  await writeFile(outFile, `${lines.join('\n')}\n`);
  return files.length;
}
