/**
 * `npm run bench`: times a cold build (empty cache) and a warm rebuild (everything cached) of the demo
 * database, reports wall time and peak RSS, and exits non-zero when a target is missed. Speed targets live
 * here, never in timed tests. Also runs bench/nasa7.ts's `benchNasa7()` when that file exists.
 *
 * Usage: node dist/bench/run.js [DATABASE_DIR]   (default: species/ of the working folder)
 */
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { runBuild } from '../pipeline/runner.js';

/** Targets (project choices for a nightly CI rebuild on a 2-core runner). */
const TARGETS = {
  /** Warm rebuild of ~20 species: everything from the cache. */
  warmMs: 2000,
  /** Cold build of ~20 species: every partition function, fit and check. */
  coldMs: 20000,
  /** Peak resident memory of the whole run. */
  peakRssMb: 512,
};

async function timeBuild(dir: string, out: string, cacheDir: string, jobs: number) {
  const t0 = performance.now();
  const report = await runBuild({ dir, out, cacheDir, keepGoing: true, jobs });
  const ms = performance.now() - t0;
  const counts = (report.summary as unknown as { counts: { species: number; ok: number; cache_hits: number } }).counts;
  return { ms, counts, exitCode: report.exitCode };
}

async function main(): Promise<number> {
  const dir = path.resolve(process.argv[2] ?? 'species');
  const work = await mkdtemp(path.join(tmpdir(), 'qforge-bench-'));
  let failed = false;
  try {
    const out = path.join(work, 'build');
    const cache = path.join(work, 'cache');
    const cold = await timeBuild(dir, out, cache, 4);
    const warm = await timeBuild(dir, out, cache, 4);
    const peakRssMb = process.resourceUsage().maxRSS / 1024;
    const line = (label: string, value: number, target: number, unit: string) => {
      const ok = value <= target;
      if (!ok) failed = true;
      console.log(`${label.padEnd(34)} ${value.toFixed(1).padStart(9)} ${unit}   target < ${target} ${unit}   ${ok ? 'ok' : 'MISSED'}`);
    };
    console.log(`qforge bench: ${dir} (${cold.counts.species} species; ${cold.counts.ok} built)`);
    line('cold build (empty cache)', cold.ms, TARGETS.coldMs, 'ms');
    line(`warm rebuild (${warm.counts.cache_hits}/${warm.counts.species} cached)`, warm.ms, TARGETS.warmMs, 'ms');
    line('peak RSS', peakRssMb, TARGETS.peakRssMb, 'MB');
    if (warm.counts.cache_hits !== warm.counts.species) {
      console.log(`warm rebuild recomputed ${warm.counts.species - warm.counts.cache_hits} species: the cache did not work`);
      failed = true;
    }
  } finally {
    await rm(work, { recursive: true, force: true });
  }

  // Optional benchmark of the fit itself, when the fit's own bench exists.
  const nasa7Bench = './nasa7.js';
  try {
    const mod = (await import(nasa7Bench)) as { benchNasa7?: () => unknown };
    if (typeof mod.benchNasa7 === 'function') {
      const r = await mod.benchNasa7();
      if (Array.isArray(r)) for (const x of r as Array<{ name: string; ms: number }>) console.log(`${x.name.padEnd(60)} ${x.ms.toFixed(2).padStart(9)} ms`);
      if (r === false || (typeof r === 'number' && r !== 0) || (r && typeof r === 'object' && (r as { ok?: boolean }).ok === false)) failed = true;
    }
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code !== 'ERR_MODULE_NOT_FOUND') throw e;
  }
  return failed ? 1 : 0;
}

main().then(
  (code) => {
    process.exitCode = code;
  },
  (e) => {
    console.error(e);
    process.exitCode = 1;
  },
);
