/**
 * The species worker pool: runs batches of validated species on `jobs` threads — worker threads, and with
 * `shareThisThread` (the runner's builds) this thread counted as one of them; on this thread alone when
 * jobs is 1 — and hands back their outcomes. The runner sends batches in name order and
 * consumes the answers in that same order (a reorder window), so the outputs never depend on which
 * worker finished first, and the species in flight are bounded by the window, not by the database.
 *
 * A worker that crashes or exits fails only the batch it held: each of its species gets an error naming
 * the crash, a fresh worker takes the remaining batches, and after repeated crashes the remaining batches
 * fail the same way instead of waiting. The pool never hangs on a dead worker.
 *
 * Workers start lazily, on the first batch that needs computing: a batch whose every stage result is in
 * the cache is run on the main thread (reading an entry is cheaper than starting a thread).
 *
 * Workers run the compiled code in dist/ (`npm run build`); from TypeScript sources (the tests) the pool
 * points at the dist/ file of the same tree.
 */
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import type { SpeciesOutcome, ValidSpecies } from '../runner.js';
import type { FileCheck, KeepAs } from '../stages/check-file.js';
import { sizeWorkerHeaps } from './heap.js';
import type { WorkerInit, WorkerReply, WorkRequest } from './protocol.js';

export interface SpeciesPool {
  run(batch: ValidSpecies[]): Promise<SpeciesOutcome[]>;
  /**
   * Checks one species file from its bytes, on a worker or (its share, as for batches) on this thread; the
   * findings are the same either way. A worker that fails a check hands it back to this thread.
   */
  checkFile(file: string, bytes: Uint8Array, keep: KeepAs): Promise<FileCheck>;
  /** The number of threads, this one included. */
  readonly jobs: number;
  /** Stops the workers (idempotent). */
  close(): Promise<void>;
  /** The first cache write failure a worker reported. */
  readonly cacheWriteProblem: string | undefined;
}

export interface PoolOptions {
  jobs: number;
  init: WorkerInit;
  /** Builds one species on this thread (jobs = 1). */
  inline: (v: ValidSpecies) => Promise<SpeciesOutcome>;
  /** Checks one file on this thread (stages/check-file.ts under the build's warning policy). */
  inlineCheck?: (file: string, bytes: Uint8Array, keep: KeepAs) => Promise<FileCheck>;
  /** The outcome of a species whose worker died (an error diagnostic naming `reason`). */
  crashed: (v: ValidSpecies, reason: string) => SpeciesOutcome;
  /**
   * Whether a batch is cheap enough for this thread (every stage result already cached): then it is run
   * inline and no worker is started for it, so a no-change rebuild starts no thread at all.
   */
  cheap?: (batch: readonly ValidSpecies[]) => Promise<boolean>;
  /**
   * Count this thread as one of the `jobs`: start jobs − 1 workers and build a batch here (with `inline`)
   * whenever every worker is busy. One thread fewer holds a heap of its own (≈ 130 MB), and the species
   * built here are not copied to and from a worker.
   */
  shareThisThread?: boolean;
  /** Initial old generation of the workers' heaps, MB (workers/heap.ts; 0: V8's own; unset: heap.ts's default). */
  workerInitialOldGenerationMb?: number;
}

/**
 * Young-generation size of a worker's V8 heap (MB). V8's default on 64-bit (three semi-spaces of 16 MB)
 * lets each worker hold ~30 MB more than it needs: a species' garbage is short-lived (grids, fit scratch)
 * and dies young either way. Measured (2,000 synthetic species, cold --no-cache, 2 threads, two rounds,
 * shared 2-core machine): peak RSS 355–367 MB by default, 327–329 MB with 16, 331–336 MB with 8; CPU time
 * 24.2–24.5 s by default, 21.9–23.4 s with 16 (no measurable price).
 */
export const WORKER_YOUNG_GENERATION_MB = 16;

/** The worker entry module: next to this file when compiled, in dist/ when running from sources. */
export function workerEntry(): URL {
  const here = import.meta.url;
  return here.endsWith('.ts') ? new URL('../../dist/pipeline/workers/species-worker.js', here) : new URL('./species-worker.js', here);
}

/**
 * Species of the last batches, as a multiple of the threads: they come in quarter-size batches, so that
 * the threads run out of work at nearly the same time (with full batches of 32 species, ~0.3 s of one
 * thread, the last one alone left the other threads idle for up to that long).
 */
const TAIL_BATCHES_PER_THREAD = 4;

/**
 * Deterministic batches: name order, sizes depending only on the count and `jobs` (the species of the
 * last TAIL_BATCHES_PER_THREAD · jobs full batches in quarter-size ones).
 */
export function batchesOf<T>(items: readonly T[], jobs: number): T[][] {
  const size = Math.max(1, Math.min(32, Math.ceil(items.length / (jobs * 8))));
  const small = Math.max(1, Math.ceil(size / 4));
  // Full batches up to a multiple of their size, the rest small.
  const tailFrom = Math.max(0, Math.floor((items.length - TAIL_BATCHES_PER_THREAD * Math.max(1, jobs) * size) / size) * size);
  const out: T[][] = [];
  let i = 0;
  for (; i < tailFrom; i += size) out.push(items.slice(i, i + size));
  for (; i < items.length; i += small) out.push(items.slice(i, i + small));
  return out;
}

export function createSpeciesPool(opts: PoolOptions): SpeciesPool {
  if (opts.jobs <= 1) {
    return {
      jobs: 1,
      checkFile: (file, bytes, keep) => checkHere(opts, file, bytes, keep),
      run: (batch) => buildHere(opts, batch),
      close: async () => {},
      cacheWriteProblem: undefined,
    };
  }
  return new ThreadPool(opts);
}

/** This thread's share of the batches (shareThisThread): start, bounds. */
const INITIAL_SHARE = 1 / 3;
const MIN_SHARE = 1 / 8;
const MAX_SHARE = 1 / 2;

/**
 * A batch on this thread, yielding between species so that progress output, signals and the workers'
 * replies are handled during long builds.
 */
async function buildHere(opts: PoolOptions, batch: readonly ValidSpecies[]): Promise<SpeciesOutcome[]> {
  const out: SpeciesOutcome[] = [];
  for (const v of batch) {
    await new Promise((r) => setImmediate(r));
    out.push(await opts.inline(v));
  }
  return out;
}

function checkHere(opts: PoolOptions, file: string, bytes: Uint8Array, keep: KeepAs): Promise<FileCheck> {
  if (!opts.inlineCheck) throw new Error('this pool was made without a file check');
  return opts.inlineCheck(file, bytes, keep);
}

/** A species batch, or a file check; `fail` settles it when its worker is lost or reports an error. */
interface Job {
  req: WorkRequest;
  /** Runs it on this thread. */
  here: () => Promise<void>;
  /** Settles it with its worker's reply. */
  answer: (reply: WorkerReply) => void;
  fail: (reason: string) => void;
}

interface Slot {
  worker: Worker;
  /** Sent and not answered yet. */
  jobs: Job[];
}

/**
 * File checks in flight per worker: a check takes about a millisecond, so a worker given one at a time
 * would wait for each next one (idle about a third of the time in a 2,000-file check, two threads).
 */
const CHECKS_PER_WORKER = 4;

/** Whether `slot` may take `job` now: a batch only when idle; a check when it holds nothing but a few checks. */
function mayTake(slot: Slot, job: Job): boolean {
  if (slot.jobs.length === 0) return true;
  return 'check' in job.req && slot.jobs.length < CHECKS_PER_WORKER && slot.jobs.every((j) => 'check' in j.req);
}

class ThreadPool implements SpeciesPool {
  cacheWriteProblem: string | undefined;
  private readonly queue: Job[] = [];
  private readonly slots = new Set<Slot>();
  private nextId = 0;
  private crashes = 0;
  private closed = false;
  private readonly entry: URL;
  private readonly maxWorkers: number;
  private inlineBusy = false;
  /** Batches given to workers and built here, and the share of batches this thread may take (see `pump`). */
  private toWorkers = 0;
  private here = 0;
  private share = INITIAL_SHARE;

  constructor(private readonly opts: PoolOptions) {
    this.entry = workerEntry();
    this.maxWorkers = opts.shareThisThread ? Math.max(1, opts.jobs - 1) : opts.jobs;
    if (!existsSync(fileURLToPath(this.entry))) {
      throw new Error(`the worker code ${fileURLToPath(this.entry)} is missing: run \`npm run build\` (or use --jobs 1)`);
    }
  }

  get jobs(): number {
    return this.opts.jobs;
  }

  async run(batch: ValidSpecies[]): Promise<SpeciesOutcome[]> {
    if (this.opts.cheap && (await this.opts.cheap(batch))) {
      const out: SpeciesOutcome[] = [];
      for (const v of batch) out.push(await this.opts.inline(v));
      return out;
    }
    return new Promise((resolve) => {
      const failed = (reason: string) => resolve(batch.map((v) => this.opts.crashed(v, reason)));
      this.queue.push({
        req: { id: this.nextId++, species: batch },
        here: async () => {
          let out: SpeciesOutcome[];
          try {
            out = await buildHere(this.opts, batch);
          } catch (e) {
            // What a worker's error reply would give: the whole batch fails, naming the error.
            return failed(`building on the main thread failed: ${e instanceof Error ? e.message : String(e)}`);
          }
          resolve(out);
        },
        answer: (reply) => {
          if ('error' in reply) return failed(`a worker failed: ${reply.error}`);
          if (!('outcomes' in reply)) return failed('a worker answered a batch with something else');
          if (reply.cacheWriteProblem !== undefined) this.cacheWriteProblem ??= reply.cacheWriteProblem;
          resolve(reply.outcomes);
        },
        fail: failed,
      });
      this.pump();
    });
  }

  checkFile(file: string, bytes: Uint8Array, keep: KeepAs): Promise<FileCheck> {
    return new Promise((resolve, reject) => {
      const here = () => checkHere(this.opts, file, bytes, keep).then(resolve, reject);
      this.queue.push({
        req: { id: this.nextId++, check: { file, bytes, keep } },
        here,
        // A check is a pure function of the bytes: whatever went wrong on the worker, this thread does it again
        // (and throws what it throws).
        answer: (reply) => void ('checked' in reply ? resolve(reply.checked) : here()),
        fail: () => void here(),
      });
      this.pump();
    });
  }

  private pump(): void {
    while (this.queue.length > 0 && !this.closed) {
      const next = this.queue[0]!;
      let slot = [...this.slots].find((s) => s.jobs.length === 0);
      if (!slot && this.slots.size < this.maxWorkers) slot = this.spawn();
      slot ??= [...this.slots].find((s) => mayTake(s, next));
      if (!slot) {
        // This thread also reads every species back and emits it, so it may take only part of the batches,
        // `share`, adjusted as the build goes: taking every other batch left a worker idle 11 % of the time
        // (this thread became the bottleneck), one in three left this thread idle 15 % (2,000 synthetic
        // species, two cores). It grows a little whenever this thread would idle with batches waiting and
        // shrinks whenever a worker runs dry while this thread holds a batch. Only the timing depends on it.
        // A file check is taken whenever every worker holds its fill of them: checks are short and the
        // species batches that follow are what the share is tuned for.
        if (!this.opts.shareThisThread || this.inlineBusy) return;
        const isCheck = 'check' in next.req;
        if (!isCheck && this.here > this.share * (this.here + this.toWorkers)) {
          this.share = Math.min(MAX_SHARE, this.share * 1.05);
          return;
        }
        this.inlineBusy = true;
        if (!isCheck) this.here++;
        const job = this.queue.shift()!;
        setImmediate(() => void this.runHere(job));
        continue;
      }
      const job = this.queue.shift()!;
      if (!('check' in job.req)) this.toWorkers++;
      slot.jobs.push(job);
      slot.worker.postMessage(job.req);
    }
  }

  private async runHere(job: Job): Promise<void> {
    try {
      await job.here();
    } finally {
      this.inlineBusy = false;
      this.pump();
    }
  }

  private spawn(): Slot {
    sizeWorkerHeaps(this.opts.workerInitialOldGenerationMb);
    const worker = new Worker(this.entry, { workerData: this.opts.init, resourceLimits: { maxYoungGenerationSizeMb: WORKER_YOUNG_GENERATION_MB } });
    const slot: Slot = { worker, jobs: [] };
    this.slots.add(slot);
    worker.on('message', (reply: WorkerReply) => {
      // A worker may answer checks out of order (one waits for a geometry file while the next runs).
      const at = slot.jobs.findIndex((j) => j.req.id === reply.id);
      if (at < 0) return;
      const job = slot.jobs.splice(at, 1)[0]!;
      if (this.queue.length === 0 && this.inlineBusy && !('check' in job.req)) this.share = Math.max(MIN_SHARE, this.share * 0.8);
      job.answer(reply);
      this.pump();
    });
    const lost = (why: string) => {
      if (!this.slots.delete(slot)) return;
      const lostJobs = slot.jobs.splice(0);
      if (this.closed) return;
      this.crashes++;
      for (const job of lostJobs) job.fail(why);
      // A worker that keeps dying (out of memory, a broken install) fails the rest instead of looping.
      if (this.crashes > this.opts.jobs + 2) {
        for (const j of this.queue.splice(0)) j.fail(`${why} (and the workers keep crashing; not retried)`);
      }
      this.pump();
    };
    worker.on('error', (err) => lost(`the worker thread crashed (${err instanceof Error ? err.message : String(err)})`));
    worker.on('exit', (code) => lost(`the worker thread exited with code ${code}`));
    return slot;
  }

  async close(): Promise<void> {
    this.closed = true;
    const all = [...this.slots];
    this.slots.clear();
    await Promise.all(all.map((s) => s.worker.terminate()));
  }
}
