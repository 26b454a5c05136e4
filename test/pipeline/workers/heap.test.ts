/**
 * Old-generation sizing of a build's threads (pipeline/workers/heap.ts). Holds no reference values (no
 * source to name): the churn below is written by hand for this test, and the comparison is between runs
 * of our own code in fresh node processes (V8 flags are process-wide and cannot be unset).
 */
import { execFile } from 'node:child_process';
import { promisify } from 'node:util';
import { pathToFileURL } from 'node:url';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { heapPlanFor, holdHeapReserve, LARGE_DATABASE_FILES, MAIN_THREAD_RESERVE_MB, RESERVE_MIN_FILES, WORKER_INITIAL_OLD_GENERATION_MB } from '../../../pipeline/workers/heap.js';
import { HEAP_GROWING_PERCENT } from '../../../pipeline/cli.js';
import { REPO } from '../helpers.js';

const run = promisify(execFile);
const HEAP_MODULE = pathToFileURL(path.join(REPO, 'dist/pipeline/workers/heap.js')).href;

/**
 * A worker that keeps ~3 MB of small objects alive in a rolling window (32 rounds of 1,000) while it
 * allocates ~600 MB in all, so part of them live long enough to reach the old generation, and counts its
 * full collections. Both runs use the CLI's heap growth (pipeline/cli.ts HEAP_GROWING_PERCENT, 50 %);
 * `sized` calls sizeWorkerHeaps before the worker starts. Seen on the 2-core machine: 5 against 1.
 */
const script = (sized: boolean, thenReset = false) => `
import { Worker } from 'node:worker_threads';
const { sizeWorkerHeaps } = await import(${JSON.stringify(HEAP_MODULE)});
(await import('node:v8')).setFlagsFromString('--heap-growing-percent=${HEAP_GROWING_PERCENT}');
if (${sized}) sizeWorkerHeaps();
if (${thenReset}) sizeWorkerHeaps(0);
const body = \`
  import { PerformanceObserver, constants } from 'node:perf_hooks';
  import { parentPort } from 'node:worker_threads';
  let major = 0;
  new PerformanceObserver((list) => { for (const e of list.getEntries()) if (e.detail.kind === constants.NODE_PERFORMANCE_GC_MAJOR) major++; }).observe({ entryTypes: ['gc'] });
  const window = [];
  for (let round = 0; round < 6000; round++) {
    const batch = [];
    for (let i = 0; i < 1000; i++) batch.push({ t: round, i, v: [i, round] });
    window.push(batch);
    if (window.length > 32) window.shift();
  }
  setTimeout(() => parentPort.postMessage(major), 50);
\`;
const w = new Worker(body, { eval: true, resourceLimits: { maxYoungGenerationSizeMb: 16 } });
w.on('message', (n) => { console.log(n); w.terminate(); });
`;

async function workerFullCollections(sized: boolean, thenReset = false): Promise<number> {
  const { stdout } = await run(process.execPath, ['--input-type=module', '-e', script(sized, thenReset)], { cwd: REPO });
  return Number(stdout.trim());
}

describe('heap sizing of the build threads', () => {
  it('a worker started after sizeWorkerHeaps runs fewer full collections on the same churn', async () => {
    const [plain, sized, reset] = await Promise.all([workerFullCollections(false), workerFullCollections(true), workerFullCollections(true, true)]);
    expect(plain).toBeGreaterThan(0);
    expect(sized).toBeLessThan(plain);
    // 0 gives the next workers V8's own initial size again (a large database after a smaller one).
    expect(reset).toBeGreaterThan(sized);
  }, 60_000);

  it('the reserve holds its megabytes until released; none for 0', () => {
    const reserve = holdHeapReserve(2)!;
    expect(reserve.megabytes).toBe(2);
    reserve.release();
    expect(reserve.megabytes).toBe(0);
    expect(holdHeapReserve(0)).toBeUndefined();
  });

  it('the plan: no reserve for small builds, nothing extra for very large ones', () => {
    expect(heapPlanFor(RESERVE_MIN_FILES - 1)).toEqual({ reserveMb: 0, workerInitialOldGenerationMb: WORKER_INITIAL_OLD_GENERATION_MB });
    expect(heapPlanFor(RESERVE_MIN_FILES)).toEqual({ reserveMb: MAIN_THREAD_RESERVE_MB, workerInitialOldGenerationMb: WORKER_INITIAL_OLD_GENERATION_MB });
    expect(heapPlanFor(LARGE_DATABASE_FILES)).toEqual({ reserveMb: MAIN_THREAD_RESERVE_MB, workerInitialOldGenerationMb: WORKER_INITIAL_OLD_GENERATION_MB });
    expect(heapPlanFor(LARGE_DATABASE_FILES + 1)).toEqual({ reserveMb: 0, workerInitialOldGenerationMb: 0 });
  });
});
