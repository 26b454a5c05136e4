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
 *
 * Species files: `hashInputs` hands the helper the database's species files, which it hashes before the
 * OUT's (stamped by stat: a species file may be a link), so that the check of a no-change rebuild finds
 * each file's key without reading it (~20 µs per file of reading and hashing moved off the main thread);
 * `inputDigest` answers with the digest of the file as the helper read it, or nothing (then the check
 * reads the file itself).
 */
import { existsSync, lstatSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { MessageChannel, receiveMessageOnPort, Worker, type MessagePort } from 'node:worker_threads';
import type { Digest } from './hash.js';
import type { DigestRow, DigestWorkerData, InputRowsMessage, InputsMessage } from '../workers/digest-worker.js';

/** The helper's entry: next to the compiled workers, in dist/ when running from sources. */
function entry(): URL {
  const here = import.meta.url;
  return here.endsWith('.ts') ? new URL('../../dist/pipeline/workers/digest-worker.js', here) : new URL('../workers/digest-worker.js', here);
}

export class PreviousDigests {
  private readonly known = new Map<string, { digest: Digest; stamp: string }>();
  /** sha256 hex of each species file the helper hashed. */
  private readonly inputs = new Map<string, string>();
  private inputsSent = false;
  private done = false;
  private stopped = false;

  private constructor(
    private readonly worker: Worker,
    private readonly port: MessagePort,
  ) {}

  /**
   * Starts hashing `files` and then every file of `folders` of the previous OUT (undefined when there is
   * no previous OUT folder or no compiled helper). With `inputsFirst` the helper waits for `hashInputs`
   * first, which the caller must then call (with no files if it has none).
   */
  static start(out: string, files: string[], folders: string[], inputsFirst = false): PreviousDigests | undefined {
    const root = path.resolve(out);
    const url = entry();
    if (lstatSync(root, { throwIfNoEntry: false })?.isDirectory() !== true || !existsSync(fileURLToPath(url))) return undefined;
    const { port1, port2 } = new MessageChannel();
    const data: DigestWorkerData = { root, first: files, folders, inputsFirst, port: port2 };
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

  /** Hands the helper the species files (as the check names them) to hash before the OUT's files; once only. */
  hashInputs(files: readonly string[]): void {
    if (this.inputsSent || this.stopped) return;
    this.inputsSent = true;
    this.port.postMessage({ inputs: [...files] } satisfies InputsMessage);
  }

  /**
   * sha256 (hex) of species file `file` as the helper read it (a regular file whose stat stamp and size
   * were the same before and after), else undefined. Unlike an OUT file, which is reused as the very inode
   * that was hashed (`lookup` checks the stamp again), a species file is only ever read: the helper's read
   * is as good a moment of the build as the check's own would be, so no second stat is spent on it here.
   */
  inputDigest(file: string): string | undefined {
    if (!this.inputsSent) return undefined;
    let k = this.inputs.get(file);
    if (k === undefined && !this.done) {
      this.drain();
      k = this.inputs.get(file);
    }
    return k;
  }

  private drain(): void {
    for (;;) {
      const m = receiveMessageOnPort(this.port);
      if (m === undefined) return;
      if (m.message === 'done') {
        this.done = true;
        return;
      }
      if (Array.isArray(m.message)) for (const [file, hash, bytes, stamp] of m.message as DigestRow[]) this.known.set(file, { digest: { hash, bytes }, stamp });
      else for (const [file, hash] of (m.message as InputRowsMessage).inputRows) this.inputs.set(file, hash);
    }
  }

  /** Stops the helper and forgets what it found. */
  async stop(): Promise<void> {
    if (this.stopped) return;
    this.stopped = true;
    this.done = true;
    this.known.clear();
    this.inputs.clear();
    this.port.close();
    await this.worker.terminate().catch(() => undefined);
  }
}
