/**
 * A scratch file that holds values the build needs again later (the validated species, between the check of
 * every file and their turn to be built in name order), so the memory of a build does not grow with the
 * number of species: each value is written once with v8.serialize (structured clone: doubles bit for bit)
 * and read back by its offset. The file lives in the operating system's temporary folder and is removed by
 * `close`.
 * Reads and writes are synchronous calls on the file's descriptor behind the asynchronous methods: a value
 * is a few KB in the page cache, and a thread-pool round trip per value cost more than the copy itself
 * (two per species; a few per cent of the main thread's time of a cold build in profiles on a loaded machine).
 */
import { readSync, writeSync } from 'node:fs';
import { mkdtemp, open, rm, type FileHandle } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { deserialize, serialize } from 'node:v8';

/** Where a value lies in the spill file. */
export interface SpillRef {
  offset: number;
  length: number;
}

export class SpillFile {
  private end = 0;
  private closed = false;

  private constructor(
    private readonly dir: string,
    private readonly fh: FileHandle,
  ) {}

  static async open(): Promise<SpillFile> {
    const dir = await mkdtemp(path.join(tmpdir(), 'qforge-spill-'));
    return new SpillFile(dir, await open(path.join(dir, 'values'), 'w+'));
  }

  /** Stores a value; concurrent calls are safe (each reserves its own range before writing). */
  async put(value: unknown): Promise<SpillRef> {
    return this.putBytes(serialize(value));
  }

  /** Stores a value already serialised with v8.serialize (e.g. by the worker that checked its file). */
  async putBytes(bytes: Uint8Array): Promise<SpillRef> {
    const { ref, written } = this.appendBytes(bytes);
    await written;
    return ref;
  }

  /** Reserves the place of `bytes` at once (`ref`) and writes them (`written`; read only after it settles). */
  appendBytes(bytes: Uint8Array): { ref: SpillRef; written: Promise<void> } {
    const ref = { offset: this.end, length: bytes.length };
    this.end += bytes.length;
    let written: Promise<void>;
    try {
      // writeSync may write less than asked.
      for (let off = 0; off < bytes.length; ) off += writeSync(this.fh.fd, bytes, off, bytes.length - off, ref.offset + off);
      written = Promise.resolve();
    } catch (e) {
      written = Promise.reject(e);
      // Reported where the caller awaits it, not as an unhandled rejection before that.
      written.catch(() => undefined);
    }
    return { ref, written };
  }

  async get<T>(ref: SpillRef): Promise<T> {
    return deserialize(await this.getBytes(ref)) as T;
  }

  /** The v8.serialize bytes of a stored value (a worker thread deserialises them itself). */
  async getBytes(ref: SpillRef): Promise<Buffer> {
    // Not from the shared small-buffer pool: posted to a worker, a view copies its whole ArrayBuffer.
    const buf = Buffer.allocUnsafeSlow(ref.length);
    let bytesRead = 0;
    for (let n = -1; bytesRead < ref.length && n !== 0; bytesRead += n) n = readSync(this.fh.fd, buf, bytesRead, ref.length - bytesRead, ref.offset + bytesRead);
    if (bytesRead !== ref.length) throw new Error(`spill file: read ${bytesRead} of ${ref.length} bytes at ${ref.offset}`);
    return buf;
  }

  /** Closes and deletes the file (idempotent). */
  async close(): Promise<void> {
    if (this.closed) return;
    this.closed = true;
    await this.fh.close().catch(() => {});
    await rm(this.dir, { recursive: true, force: true });
  }
}
