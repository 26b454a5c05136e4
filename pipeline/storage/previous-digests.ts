/**
 * Digests of the previous OUT's files, computed on a helper thread (workers/digest-worker.ts) while the
 * main thread checks the species files: a no-change rebuild must hash every previous table and framed file
 * (OutputStaging reuses a previous file only when its bytes hash to what this build would write), and on
 * two cores that reading and hashing (~200 MB at 10,000 species) can run beside the main thread's own.
 *
 * A digest is used only for the file state it was taken of: the helper reports the stamp (device, inode,
 * change time in ns) lstat gave before and after reading, and `lookup` answers only when the stamp the main
 * thread sees now is the same; a file replaced or written since is hashed again by the caller. Results are
 * taken synchronously from the port (`receiveMessageOnPort`), so they arrive even while the main thread
 * never yields to its event loop. Everything here is an optimisation: without the helper (no compiled code,
 * a thread that fails) every file is hashed on the main thread as before.
 */
import { existsSync, lstatSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { MessageChannel, receiveMessageOnPort, Worker, type MessagePort } from 'node:worker_threads';
import type { Digest } from './hash.js';
import type { DigestRow, DigestWorkerData } from '../workers/digest-worker.js';

/** The helper's entry: next to the compiled workers, in dist/ when running from sources. */
function entry(): URL {
  const here = import.meta.url;
  return here.endsWith('.ts') ? new URL('../../dist/pipeline/workers/digest-worker.js', here) : new URL('../workers/digest-worker.js', here);
}

export class PreviousDigests {
  private readonly known = new Map<string, { digest: Digest; stamp: string }>();
  private done = false;
  private stopped = false;

  private constructor(
    private readonly worker: Worker,
    private readonly port: MessagePort,
  ) {}

  /**
   * Starts hashing `files` and then every file of `folders` of the previous OUT (undefined when there is
   * no previous OUT folder or no compiled helper).
   */
  static start(out: string, files: string[], folders: string[]): PreviousDigests | undefined {
    const root = path.resolve(out);
    const url = entry();
    if (lstatSync(root, { throwIfNoEntry: false })?.isDirectory() !== true || !existsSync(fileURLToPath(url))) return undefined;
    const { port1, port2 } = new MessageChannel();
    const data: DigestWorkerData = { root, first: files, folders, port: port2 };
    let worker: Worker;
    try {
      // A small heap: the helper holds one 1 MiB read buffer and a chunk of results at a time.
      worker = new Worker(url, { workerData: data, transferList: [port2], resourceLimits: { maxYoungGenerationSizeMb: 4, maxOldGenerationSizeMb: 32 } });
    } catch {
      return undefined;
    }
    worker.unref();
    const d = new PreviousDigests(worker, port1);
    worker.on('error', () => {
      d.done = true;
    });
    return d;
  }

  /** The digest of `file` when the helper hashed it in the state `stamp` describes. */
  lookup(file: string, stamp: string): Digest | undefined {
    let k = this.known.get(file);
    if (k === undefined && !this.done) {
      this.drain();
      k = this.known.get(file);
    }
    return k !== undefined && k.stamp === stamp ? k.digest : undefined;
  }

  private drain(): void {
    for (;;) {
      const m = receiveMessageOnPort(this.port);
      if (m === undefined) return;
      if (m.message === 'done') {
        this.done = true;
        return;
      }
      for (const [file, hash, bytes, stamp] of m.message as DigestRow[]) this.known.set(file, { digest: { hash, bytes }, stamp });
    }
  }

  /** Stops the helper and forgets what it found. */
  async stop(): Promise<void> {
    if (this.stopped) return;
    this.stopped = true;
    this.done = true;
    this.known.clear();
    this.port.close();
    await this.worker.terminate().catch(() => undefined);
  }
}
