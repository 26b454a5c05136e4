/**
 * Timing of the NASA-7 fit and of the 80-column writer/reader on ~600 samples (a 10 K grid over
 * 200–6000 K), on closed-form rigid-rotor/harmonic-oscillator CH4 data (translation + rotation +
 * Einstein functions; the constants are only there to make a realistic curve). Wired into bench/run.ts.
 *
 * Also runnable alone, for the CPU cost of the default fit per species (`benchFitCpu`):
 *   node dist/bench/nasa7.js [--species 1000] [--seed 1] [--rounds 3] [--before OTHER/dist/src/nasa7/fit.js]
 * `--before` names the compiled fit module of another tree (e.g. main's, built in a scratch clone); both
 * are timed in the same run on the same samples, alternating, and their results compared.
 */
import { performance } from 'node:perf_hooks';
import { fileURLToPath } from 'node:url';
import { C2_CM_K, T_REF } from '../src/constants.js';
import { fitNasa7 } from '../src/nasa7/fit.js';
import { formatNasa7File } from '../src/nasa7/format.js';
import { normaliseFitOptions } from '../src/nasa7/options.js';
import { parseNasa7File } from '../src/nasa7/parse.js';
import type { FitOptions, FitResult, FitSample, Nasa7Record } from '../src/nasa7/types.js';
import { planSpecies } from '../pipeline/core/plan.js';
import { withDefaults } from '../pipeline/core/settings.js';
import { computeSamples } from '../pipeline/stages/compute.js';
import { parseYamlText } from '../pipeline/stages/load.js';
import { validateSpecies } from '../pipeline/stages/validate.js';
import { syntheticSpecies } from './synthetic.js';

/** 54 modes spread like a 20-atom hydrocarbon's (C–H stretches, bends, rocks, skeletal, torsions). */
const TWENTY_ATOM_MODES: Array<[number, number]> = Array.from({ length: 54 }, (_, i) => {
  const band = [2950, 1420, 1000, 900, 400, 180][i % 6]!;
  return [band + 7 * i, 1] as [number, number];
});

/**
 * 144 modes, the count of a 50-atom molecule such as n-C16H34, spread over the same kinds of bands
 * (constructed by hand for timing; not a real assignment).
 */
const HEXADECANE_LIKE_MODES: Array<[number, number]> = Array.from({ length: 144 }, (_, i) => {
  const band = [2950, 1450, 1300, 1050, 800, 400, 250, 120][i % 8]!;
  return [band + 3 * i, 1] as [number, number];
});

/** Cp/R, H/RT, S/R of a rigid nonlinear rotor with harmonic vibrations; S up to a constant. */
function sample(T: number): FitSample {
  return sampleOf(T, [[2917, 1], [1534, 2], [3019, 3], [1306, 3]]);
}

function sampleOf(T: number, modes: Array<[number, number]>): FitSample {
  let cpR = 4;
  let hR = 4 * T;
  let sR = 4 * Math.log(T);
  for (const [nu, g] of modes) {
    const x = (nu * C2_CM_K) / T;
    const em1 = Math.expm1(x);
    cpR += (g * x * x * Math.exp(x)) / (em1 * em1);
    hR += (g * x * T) / em1;
    sR += g * (x / em1 - Math.log(-Math.expm1(-x)));
  }
  return { T, cpR, hRT: hR / T, sR };
}

async function time(name: string, repeat: number, run: () => unknown): Promise<{ name: string; ms: number }> {
  run(); // warm-up
  const t0 = performance.now();
  for (let i = 0; i < repeat; i++) run();
  return { name, ms: (performance.now() - t0) / repeat };
}

export async function benchNasa7(): Promise<{ name: string; ms: number }[]> {
  const samples: FitSample[] = [];
  for (let T = 200; T <= 6000; T += 10) samples.push(sample(T));
  const anchor = sample(T_REF);
  const results: { name: string; ms: number }[] = [];
  results.push(await time(`nasa7 fit, ${samples.length} points`, 20, () => fitNasa7(samples, anchor)));
  results.push(await time(`nasa7 fit, ${samples.length} points, continuity order 2`, 20, () => fitNasa7(samples, anchor, { continuityOrder: 2 })));
  results.push(
    await time(`nasa7 fit with tMid search (13 candidates), ${samples.length} points`, 3, () =>
      fitNasa7(samples, anchor, { optimiseMid: { min: 800, max: 2000, step: 100 } }),
    ),
  );
  // The database defaults (pipeline/core/settings.ts): minimax of the limit-relative error with the
  // midpoint search 700–2500 K step 100; per species, factorisations shared through the cache.
  results.push(await time(`nasa7 fit, minimax at 1000 K, ${samples.length} points`, 20, () => fitNasa7(samples, anchor, { method: 'minimax' })));
  results.push(
    await time(`nasa7 fit, default settings (minimax + tMid search 700–2500/100), ${samples.length} points`, 10, () =>
      fitNasa7(samples, anchor, { method: 'minimax', optimiseMid: { min: 700, max: 2500, step: 100 } }),
    ),
  );
  const big: FitSample[] = [];
  for (let T = 200; T <= 6000; T += 10) big.push(sampleOf(T, TWENTY_ATOM_MODES));
  const bigAnchor = sampleOf(T_REF, TWENTY_ATOM_MODES);
  results.push(await time(`nasa7 fit, least squares at 1000 K, 20-atom molecule`, 20, () => fitNasa7(big, bigAnchor)));
  results.push(
    await time(`nasa7 fit, default settings, 20-atom molecule`, 10, () =>
      fitNasa7(big, bigAnchor, { method: 'minimax', optimiseMid: { min: 700, max: 2500, step: 100 } }),
    ),
  );
  const c16: FitSample[] = [];
  for (let T = 200; T <= 6000; T += 10) c16.push(sampleOf(T, HEXADECANE_LIKE_MODES));
  const c16Anchor = sampleOf(T_REF, HEXADECANE_LIKE_MODES);
  results.push(await time(`nasa7 fit, least squares at 1000 K, n-hexadecane-sized molecule`, 20, () => fitNasa7(c16, c16Anchor)));
  results.push(
    await time(`nasa7 fit, default settings, n-hexadecane-sized molecule`, 10, () =>
      fitNasa7(c16, c16Anchor, { method: 'minimax', optimiseMid: { min: 700, max: 2500, step: 100 } }),
    ),
  );
  // CPU per species of the default fit on the seeded synthetic mix, as a build's fit stage sees it.
  const mix = syntheticFitCases(200, 1);
  cpuMsPerFit(fitNasa7, mix.slice(0, 20), 1);
  results.push({ name: `nasa7 default fit, CPU per species, synthetic mix (${mix.length}, seed 1)`, ms: cpuMsPerFit(fitNasa7, mix, 1) });
  const poly = fitNasa7(samples, anchor).polynomial;
  const records: Nasa7Record[] = Array.from({ length: 1000 }, (_, i) => ({
    name: `S${i}`,
    identifier: 'BENCH',
    elements: [['C', 1], ['H', 4]],
    phase: 'G',
    polynomial: poly,
  }));
  let text = '';
  results.push(await time('nasa7 write 1000 records', 5, () => (text = formatNasa7File(records, { tLow: 200, tMid: 1000, tHigh: 6000 }))));
  results.push(await time('nasa7 read 1000 records', 5, () => parseNasa7File(text, 'bench.txt')));
  return results;
}

type FitFunction = (samples: readonly FitSample[], anchor: FitSample, options: FitOptions) => FitResult;

interface FitCase {
  name: string;
  samples: FitSample[];
  anchor: FitSample;
  options: FitOptions;
}

/** The database defaults (pipeline/core/settings.ts) as the fit stage receives them. */
const DEFAULT_DATABASE_SETTINGS = withDefaults({});

/**
 * The first `count` species of the seeded synthetic set (bench/synthetic.ts), computed on the default
 * plan (10 K sampling grid 200–6000 K, minimax, midpoint search 700–2500/100). Species the physics or
 * the validation refuses are left out (none are expected).
 */
export function syntheticFitCases(count: number, seed: number): FitCase[] {
  const out: FitCase[] = [];
  for (let i = 0; i < count; i++) {
    const s = syntheticSpecies(seed, i);
    const doc = parseYamlText(s.yaml, `${s.name}.yaml`).documents[0];
    const species = doc ? validateSpecies(doc).species : undefined;
    if (!species) continue;
    const plan = planSpecies(species, DEFAULT_DATABASE_SETTINGS);
    const c = computeSamples(species, plan.physics, plan.sampleTemperatures);
    out.push({ name: `${s.name} (${s.kind}, ${s.atoms} atoms)`, samples: c.samples, anchor: c.anchor, options: normaliseFitOptions(plan.fitOptions) });
  }
  return out;
}

/** One closed-form case on the default plan's grid and options (what the build fits for such a species). */
function closedFormCase(name: string, modes: Array<[number, number]>): FitCase {
  const plan = planSpecies({} as Parameters<typeof planSpecies>[0], DEFAULT_DATABASE_SETTINGS);
  return {
    name,
    samples: plan.sampleTemperatures.map((T) => sampleOf(T, modes)),
    anchor: sampleOf(T_REF, modes),
    options: normaliseFitOptions(plan.fitOptions),
  };
}

/** CPU ms (user + system of this process; the fit is single-threaded) per fit of `cases`, `repeat` passes. */
function cpuMsPerFit(fit: FitFunction, cases: readonly FitCase[], repeat: number): number {
  const c0 = process.cpuUsage();
  for (let r = 0; r < repeat; r++) for (const c of cases) fit(c.samples, c.anchor, c.options);
  const c = process.cpuUsage(c0);
  return (c.user + c.system) / 1000 / (repeat * cases.length);
}

export interface FitCpuRow {
  name: string;
  fits: number;
  /** Smallest ms/fit over the rounds, per implementation ('before' only with --before). */
  msPerFit: { before?: number; after: number };
}

export interface FitAgreement {
  species: number;
  /** Species whose chosen T_mid differs between the two implementations. */
  midChanged: string[];
  /** Largest |Δ worst limit ratio| over the species. */
  maxRatioChange: number;
  /** Largest |Δ fitted Cp/R, H/RT, S/R| over every sample of every species. */
  maxValueChange: number;
  /** Species whose whole FitResult (coefficients, metrics, solver info) is not identical. */
  notIdentical: number;
}

function fittedAt(r: FitResult, T: number): [number, number, number] {
  const c = T <= r.polynomial.tMid ? r.polynomial.low : r.polynomial.high;
  const cp = c[0] + T * (c[1] + T * (c[2] + T * (c[3] + T * c[4])));
  const h = c[0] + T * (c[1] / 2 + T * (c[2] / 3 + T * (c[3] / 4 + T * (c[4] / 5)))) + c[5] / T;
  const s = c[0] * Math.log(T) + T * (c[1] + T * (c[2] / 2 + T * (c[3] / 3 + T * (c[4] / 4)))) + c[6];
  return [cp, h, s];
}

/** How far the fits of two implementations differ on the same cases. */
export function compareFits(a: FitFunction, b: FitFunction, cases: readonly FitCase[]): FitAgreement {
  const out: FitAgreement = { species: cases.length, midChanged: [], maxRatioChange: 0, maxValueChange: 0, notIdentical: 0 };
  for (const c of cases) {
    const ra = a(c.samples, c.anchor, c.options);
    const rb = b(c.samples, c.anchor, c.options);
    if (JSON.stringify(ra) !== JSON.stringify(rb)) out.notIdentical++;
    if (ra.polynomial.tMid !== rb.polynomial.tMid) out.midChanged.push(`${c.name}: ${ra.polynomial.tMid} → ${rb.polynomial.tMid} K`);
    const wa = ra.solver?.worstLimitRatio ?? NaN;
    const wb = rb.solver?.worstLimitRatio ?? NaN;
    out.maxRatioChange = Math.max(out.maxRatioChange, Math.abs(wa - wb));
    for (const s of c.samples) {
      const va = fittedAt(ra, s.T);
      const vb = fittedAt(rb, s.T);
      for (let q = 0; q < 3; q++) out.maxValueChange = Math.max(out.maxValueChange, Math.abs(va[q]! - vb[q]!));
    }
  }
  return out;
}

/**
 * CPU cost of the default fit per species: CH4-like, 20-atom and n-C16-sized closed-form species and the
 * seeded synthetic mix; with `before`, the same for another implementation, alternating in each round
 * (the smallest of the rounds is reported, the steadiest figure on a shared machine).
 */
export async function benchFitCpu(opts: { species: number; seed: number; rounds: number; before?: string }): Promise<{ rows: FitCpuRow[]; agreement?: FitAgreement }> {
  const after: FitFunction = fitNasa7;
  const before = opts.before ? ((await import(opts.before)) as { fitNasa7: FitFunction }).fitNasa7 : undefined;
  const groups: Array<{ name: string; cases: FitCase[]; repeat: number }> = [
    { name: 'CH4-like (9 modes)', cases: [closedFormCase('CH4-like', [[2917, 1], [1534, 2], [3019, 3], [1306, 3]])], repeat: 200 },
    { name: '20-atom (54 modes)', cases: [closedFormCase('20-atom', TWENTY_ATOM_MODES)], repeat: 200 },
    { name: 'n-C16-sized (144 modes)', cases: [closedFormCase('C16-sized', HEXADECANE_LIKE_MODES)], repeat: 200 },
    { name: `synthetic mix (seed ${opts.seed})`, cases: syntheticFitCases(opts.species, opts.seed), repeat: 1 },
  ];
  const rows: FitCpuRow[] = [];
  for (const g of groups) {
    const impls: Array<['before' | 'after', FitFunction]> = before ? [['before', before], ['after', after]] : [['after', after]];
    // Warm-up: JIT and the factorisation caches, as after the first species of a build.
    for (const [, f] of impls) cpuMsPerFit(f, g.cases.slice(0, 20), 1);
    const best: { before?: number; after: number } = { after: Infinity };
    if (before) best.before = Infinity;
    for (let r = 0; r < opts.rounds; r++) {
      for (const [which, f] of impls) best[which] = Math.min(best[which] ?? Infinity, cpuMsPerFit(f, g.cases, g.repeat));
    }
    rows.push({ name: g.name, fits: g.cases.length, msPerFit: best });
  }
  const agreement = before ? compareFits(before, after, groups[3]!.cases.concat(groups[0]!.cases, groups[1]!.cases, groups[2]!.cases)) : undefined;
  return { rows, ...(agreement ? { agreement } : {}) };
}

function formatFitCpu(r: { rows: FitCpuRow[]; agreement?: FitAgreement }): string {
  const lines = ['default fit (minimax, T_mid search 700–2500/100, 10 K grid): CPU ms per species'];
  for (const row of r.rows) {
    const b = row.msPerFit.before;
    const a = row.msPerFit.after;
    lines.push(`  ${row.name.padEnd(30)} ${String(row.fits).padStart(5)} species  ${b !== undefined ? `before ${b.toFixed(3)}  ` : ''}after ${a.toFixed(3)}${b !== undefined ? `  (×${(b / a).toFixed(2)})` : ''}`);
  }
  const g = r.agreement;
  if (g) {
    lines.push(`  agreement over ${g.species} species: results identical for ${g.species - g.notIdentical}; T_mid changed for ${g.midChanged.length}; max |Δ worst limit ratio| ${g.maxRatioChange.toExponential(2)}; max |Δ fitted value| ${g.maxValueChange.toExponential(2)}`);
    for (const m of g.midChanged.slice(0, 10)) lines.push(`    ${m}`);
  }
  return lines.join('\n');
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const arg = (name: string) => {
    const i = process.argv.indexOf(name);
    return i >= 0 ? process.argv[i + 1] : undefined;
  };
  const before = arg('--before');
  const r = await benchFitCpu({
    species: Number(arg('--species') ?? 1000),
    seed: Number(arg('--seed') ?? 1),
    rounds: Number(arg('--rounds') ?? 3),
    ...(before ? { before: new URL(`file://${before.startsWith('/') ? before : `${process.cwd()}/${before}`}`).href } : {}),
  });
  console.log(formatFitCpu(r));
}
