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
