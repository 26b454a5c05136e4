/**
 * Timing of the NASA-7 fit and of the 80-column writer/reader on ~600 samples (a 10 K grid over
 * 200–6000 K), on closed-form rigid-rotor/harmonic-oscillator CH4 data (translation + rotation +
 * Einstein functions; the constants are only there to make a realistic curve). Wired into bench/run.ts.
 */
import { performance } from 'node:perf_hooks';
import { C2_CM_K, T_REF } from '../src/constants.js';
import { fitNasa7 } from '../src/nasa7/fit.js';
import { formatNasa7File } from '../src/nasa7/format.js';
import { parseNasa7File } from '../src/nasa7/parse.js';
import type { FitSample, Nasa7Record } from '../src/nasa7/types.js';

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
