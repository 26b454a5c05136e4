/**
 * The default thread count of a build (no --jobs): the rule and its measurement, in a module of its own so
 * the CLI's help text can state it without loading the runner.
 *
 * Starting a worker thread costs far more than loading its modules: the thread compiles and warms up the
 * whole physics and fit code again (V8 optimises per thread), ~2 s of CPU on the 2-core machine — extra CPU of
 * a 2-thread over a 1-thread cold --no-cache build of the synthetic mix: +1.1 s at 50 species, +1.4 s at 200,
 * +1.8 s at 500, +1.9 s at 1,000, +2 s at 2,000. Wall time, alternating runs (2026-12-03): 50 species 1.01 s
 * on one thread against 1.54 s on two, 200: 1.61 against 2.11 s, 500: 2.64–2.72 against 3.12–3.16 s, 1,000:
 * 4.64–4.67 against 4.49–4.56 s, 2,000: 7.7 against 7.0 s. So a thread pays for itself from about 500
 * species per thread on. Outputs never depend on the thread count (tested), only the time does.
 */
export const SPECIES_PER_THREAD = 500;

/** Threads for `speciesToBuild` species on a machine of `maxThreads` cores: one per SPECIES_PER_THREAD, 1 to the cores. */
export function autoThreads(speciesToBuild: number, maxThreads: number): number {
  return Math.max(1, Math.min(maxThreads, Math.floor(speciesToBuild / SPECIES_PER_THREAD)));
}

/**
 * Species files per worker thread from which the check (parse and validate) runs on the build's threads
 * rather than on the main thread alone. The main thread reads every file and stores every species either way,
 * and a worker that checks has to compile the YAML reader and the validators too, so sharing out the check
 * pays only on large databases. Measured (cold --no-cache, 2 threads, the synthetic mix, 2026-12-04, runs
 * alternating): check phase on the threads against the main thread alone, 2,000 files 0.82–0.88 s against
 * 0.60–0.64 s (whole build 6.52–6.76 s against 6.06–6.36 s); 10,000 files 2.19–2.59 s against 1.74–1.92 s
 * (build 24.5–24.8 s against 22.7–23.7 s); 50,000 files 7.1 s against 8.8 s (build 139.6 s against 140.8 s,
 * peak RSS 284 against 324 MB). Break-even near 20,000 files with one worker. With more workers the shared
 * check gets faster while its warm-up is paid once, in parallel, so the threshold is divided by the workers
 * (a model: only two threads were measured).
 */
export const CHECK_FILES_PER_WORKER = 20_000;

/** Whether a build of `files` species files on `jobs` threads checks its files on those threads. */
export function checkOnThreads(files: number, jobs: number): boolean {
  return jobs > 1 && files * (jobs - 1) >= CHECK_FILES_PER_WORKER;
}
