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
import type { BatchRequest, WorkerInit, WorkerReply } from './protocol.js';

export interface SpeciesPool {
  run(batch: ValidSpecies[]): Promise<SpeciesOutcome[]>;
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

/** Deterministic batches: name order, sizes depending only on the count and `jobs`. */
export function batchesOf<T>(items: readonly T[], jobs: number): T[][] {
  const size = Math.max(1, Math.min(32, Math.ceil(items.length / (jobs * 8))));
  const out: T[][] = [];
  for (let i = 0; i < items.length; i += size) out.push(items.slice(i, i + size));
  return out;
}

export function createSpeciesPool(opts: PoolOptions): SpeciesPool {
  if (opts.jobs <= 1) {
    return {
      run: async (batch) => {
        const out: SpeciesOutcome[] = [];
        for (const v of batch) {
          // Yield between species so progress output and signals are handled during long builds.
          await new Promise((r) => setImmediate(r));
          out.push(await opts.inline(v));
        }
        return out;
      },
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

interface Job {
  req: BatchRequest;
  resolve: (o: SpeciesOutcome[]) => void;
}

interface Slot {
  worker: Worker;
  job: Job | undefined;
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

  async run(batch: ValidSpecies[]): Promise<SpeciesOutcome[]> {
    if (this.opts.cheap && (await this.opts.cheap(batch))) {
      const out: SpeciesOutcome[] = [];
      for (const v of batch) out.push(await this.opts.inline(v));
      return out;
    }
    return new Promise((resolve) => {
      this.queue.push({ req: { id: this.nextId++, species: batch }, resolve });
      this.pump();
    });
  }

  private pump(): void {
    while (this.queue.length > 0 && !this.closed) {
      let slot = [...this.slots].find((s) => s.job === undefined);
      if (!slot && this.slots.size < this.maxWorkers) slot = this.spawn();
      if (!slot) {
        // This thread also reads every species back and emits it, so it may take only part of the batches,
        // `share`, adjusted as the build goes: taking every other batch left a worker idle 11 % of the time
        // (this thread became the bottleneck), one in three left this thread idle 15 % (2,000 synthetic
        // species, two cores). It grows a little whenever this thread would idle with batches waiting and
        // shrinks whenever a worker runs dry while this thread holds a batch. Only the timing depends on it.
        if (!this.opts.shareThisThread || this.inlineBusy) return;
        if (this.here > this.share * (this.here + this.toWorkers)) {
          this.share = Math.min(MAX_SHARE, this.share * 1.05);
          return;
        }
        this.inlineBusy = true;
        this.here++;
        const job = this.queue.shift()!;
        setImmediate(() => void this.runHere(job));
        continue;
      }
      const job = this.queue.shift()!;
      this.toWorkers++;
      slot.job = job;
      slot.worker.postMessage(job.req);
    }
  }

  /** A batch on this thread, yielding between species so replies of the workers are taken in between. */
  private async runHere(job: Job): Promise<void> {
    const out: SpeciesOutcome[] = [];
    let result: SpeciesOutcome[];
    try {
      for (const v of job.req.species) {
        await new Promise((r) => setImmediate(r));
        out.push(await this.opts.inline(v));
      }
      result = out;
    } catch (e) {
      // What a worker's error reply would give: the whole batch fails, naming the error.
      result = this.failed(job, `building on the main thread failed: ${e instanceof Error ? e.message : String(e)}`);
    }
    this.inlineBusy = false;
    job.resolve(result);
    this.pump();
  }

  private spawn(): Slot {
    const worker = new Worker(this.entry, { workerData: this.opts.init, resourceLimits: { maxYoungGenerationSizeMb: WORKER_YOUNG_GENERATION_MB } });
    const slot: Slot = { worker, job: undefined };
    this.slots.add(slot);
    worker.on('message', (reply: WorkerReply) => {
      const job = slot.job;
      if (!job || job.req.id !== reply.id) return;
      slot.job = undefined;
      if (this.queue.length === 0 && this.inlineBusy) this.share = Math.max(MIN_SHARE, this.share * 0.8);
      if ('error' in reply) job.resolve(this.failed(job, `a worker failed: ${reply.error}`));
      else {
        if (reply.cacheWriteProblem !== undefined) this.cacheWriteProblem ??= reply.cacheWriteProblem;
        job.resolve(reply.outcomes);
      }
      this.pump();
    });
    const lost = (why: string) => {
      if (!this.slots.delete(slot)) return;
      const job = slot.job;
      slot.job = undefined;
      if (this.closed) return;
      this.crashes++;
      if (job) job.resolve(this.failed(job, why));
      // A worker that keeps dying (out of memory, a broken install) fails the rest instead of looping.
      if (this.crashes > this.opts.jobs + 2) {
        for (const j of this.queue.splice(0)) j.resolve(this.failed(j, `${why} (and the workers keep crashing; not retried)`));
      }
      this.pump();
    };
    worker.on('error', (err) => lost(`the worker thread crashed (${err instanceof Error ? err.message : String(err)})`));
    worker.on('exit', (code) => lost(`the worker thread exited with code ${code}`));
    return slot;
  }

  private failed(job: Job, reason: string): SpeciesOutcome[] {
    return job.req.species.map((v) => this.opts.crashed(v, reason));
  }

  async close(): Promise<void> {
    this.closed = true;
    const all = [...this.slots];
    this.slots.clear();
    await Promise.all(all.map((s) => s.worker.terminate()));
  }
}
