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
 *   before a build starts a worker and applies to the isolates created after that). Worker full
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
 * 2,000). The cost is a fixed amount per thread, not per species; above LARGE_DATABASE_FILES it is not
 * paid (see there).
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

/**
 * Above this many species files memory comes first: the CLI bounds the heap growth harder
 * (cli.ts `heapGrowthForDatabase`), and a build holds no reserve and gives its workers V8's own initial old
 * generation. Why: 50,000 synthetic species into a fresh cache peaked at 498 MB with both (bench,
 * 2026-12-04), against the 500 MB bound of the throughput issue and ~415 MB without them; cold without a
 * cache 351 MB. The main thread's live heap grows with such a database anyway, and with it the room.
 */
export const LARGE_DATABASE_FILES = 20_000;

/** How a build of `files` species files sizes its threads' heaps (0: nothing held, V8's own initial size). */
export interface HeapPlan {
  reserveMb: number;
  workerInitialOldGenerationMb: number;
}

export function heapPlanFor(files: number): HeapPlan {
  if (files > LARGE_DATABASE_FILES) return { reserveMb: 0, workerInitialOldGenerationMb: 0 };
  return { reserveMb: files >= RESERVE_MIN_FILES ? MAIN_THREAD_RESERVE_MB : 0, workerInitialOldGenerationMb: WORKER_INITIAL_OLD_GENERATION_MB };
}

/** The value last given to V8 (0: never set, V8's own). */
let workerInitialOldMb = 0;

/**
 * Sets the initial old generation (MB; 0 = V8's own) of the worker threads started from now on. The flag is
 * process-wide and stays set, so every build states its own value before it starts a worker.
 */
export function sizeWorkerHeaps(megabytes: number = WORKER_INITIAL_OLD_GENERATION_MB): void {
  if (megabytes === workerInitialOldMb) return;
  workerInitialOldMb = megabytes;
  setFlagsFromString(`--initial-old-space-size=${megabytes}`);
}

/** A reserve held by this thread until `release`. */
export interface HeapReserve {
  /** Megabytes held (0 once released). */
  readonly megabytes: number;
  release(): void;
}

/** Holds a reserve of `megabytes` of old generation on this thread until released. */
export function holdHeapReserve(megabytes: number = MAIN_THREAD_RESERVE_MB): HeapReserve | undefined {
  if (!(megabytes > 0)) return undefined;
  // fill() makes it a packed array of doubles: a flat block of numbers, never scanned for pointers.
  let held: number[] | undefined = new Array<number>(Math.floor((megabytes * 1024 * 1024) / 8)).fill(0.5);
  return {
    get megabytes() {
      return held === undefined ? 0 : (held.length * 8) / (1024 * 1024);
    },
    release() {
      held = undefined;
    },
  };
}
