/**
 * Old-generation sizing of a build's threads.
 *
 * Why: V8 sets an isolate's next full-collection limit from what survived the last one (a growing factor
 * of ~1.5–2 times the live size, chosen from the measured collection and allocation speeds), and it starts
 * marking for the next full collection as soon as the room left below that limit is smaller than the
 * young generation. A build's threads live with ~15–25 MB of old generation and a 16–32 MB young one, so
 * they sat in that state for the whole build: a full collection every ~250 ms on each thread, ~50 ms of
 * concurrent marking each (`--trace-gc`, `--trace-incremental-marking`: "Start (task) … slack 21MB"). On
 * 2,000 synthetic species (cold, --no-cache, 2 threads) that was 26–29 full collections on the main thread
 * and 16–17 on the worker; at 10,000, 79–83 and 75.
 *
 * What is done about it, without changing any output:
 * - Worker threads start with an initial old generation of WORKER_INITIAL_OLD_GENERATION_MB (V8's
 *   `--initial-old-space-size`, which `resourceLimits` cannot set: it is set with `v8.setFlagsFromString`
 *   before the first worker starts and applies to the isolates created after that). Worker full
 *   collections: 16 → 3 at 2,000 species.
 * - This thread's isolate exists already, so its heap cannot be configured: instead a large build holds a
 *   reserve, one array of doubles of MAIN_THREAD_RESERVE_MB that counts as live old generation. The limit
 *   grows with it, and the room left stays above the young generation. An array of doubles holds no
 *   pointers, so marking it costs next to nothing; it is dropped when the build ends. (The same idea as a
 *   "GC ballast" in other garbage-collected runtimes.) Main-thread full collections: 26 → 8–11.
 *
 * Measured (2-core machine, 2026-12-04, alternating runs, cold --no-cache, default 2 threads): 2,000
 * species 6.60–6.81 → 6.14–6.17 s wall, 12.5–13.0 → 11.7–11.8 s CPU, peak RSS 211–218 → 282–283 MB;
 * 10,000 species 25.05–25.17 → 22.14–22.79 s wall, 47.7–48.2 → 42.2–43.5 s CPU, peak RSS 238–240 →
 * 305–343 MB. Larger settings saved little more and cost more memory (initial old generation 128 MB and
 * a 32 MB reserve: 21.98–22.68 s at 10,000, RSS ~400 MB); smaller ones saved less (32 MB: 6.51–6.60 s at
 * 2,000). The cost is a fixed amount per thread, not per species.
 */
import { setFlagsFromString } from 'node:v8';

/** Initial old generation of a worker thread's V8 heap (MB); see the module comment. */
export const WORKER_INITIAL_OLD_GENERATION_MB = 64;

/** Size of this thread's reserve during a large build (MB); see the module comment. */
export const MAIN_THREAD_RESERVE_MB = 32;

/**
 * Builds of fewer species files than this hold no reserve: they end before collections add up, and small
 * builds (tests, a handful of species) keep their small footprint.
 */
export const RESERVE_MIN_FILES = 500;

let workerHeapsSized = false;

/** Sets the initial old generation of the worker threads started from now on (once per process). */
export function sizeWorkerHeaps(): void {
  if (workerHeapsSized) return;
  workerHeapsSized = true;
  setFlagsFromString(`--initial-old-space-size=${WORKER_INITIAL_OLD_GENERATION_MB}`);
}

/** A reserve held by this thread until `release`. */
export interface HeapReserve {
  /** Megabytes held (0 once released). */
  readonly megabytes: number;
  release(): void;
}

/** Holds a reserve of `megabytes` of old generation on this thread until released. */
export function holdHeapReserve(megabytes: number = MAIN_THREAD_RESERVE_MB): HeapReserve {
  // fill() makes it a packed array of doubles: a flat block of numbers, never scanned for pointers.
  let held: number[] | undefined = new Array<number>(Math.max(0, Math.floor((megabytes * 1024 * 1024) / 8))).fill(0.5);
  return {
    get megabytes() {
      return held === undefined ? 0 : (held.length * 8) / (1024 * 1024);
    },
    release() {
      held = undefined;
    },
  };
}
