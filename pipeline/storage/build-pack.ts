/**
 * The build pack: one file per (database, output folder) in the cache, `<cache>/pack/<id>`, that the next
 * build reads in one go instead of one `file/` and one `result/` entry per species (storage/fast-entries.ts).
 *
 *   {"format":"qforge-pack/1","database":…,"out":…,"context":…,"sha256":…,"bytes":…}\n
 *   F <file key> <FileFacts JSON>\n            one line per species file (its check findings)
 *   R <result key> <StoredResult JSON>\n       one line per species: as its result entry, but the rendered
 *                                              texts replaced by their digests (sha256 and byte length)
 *   O <OutputRecord JSON>\n                    thermo.json and nasa7.txt as published: whole-file digest,
 *                                              head and tail digests and the digest of every species piece
 *
 * Trust: the header names the format, the database (real path) and the output folder (resolved) it was
 * written for, the build context (runner.ts `fileContextHash`: tool, code, constants, settings, strict
 * policy, display paths, options) and the sha256 and length of the body. A pack of another format or of
 * another database or output folder is foreign, a body of another length is truncated, a body whose sha256
 * differs is corrupt: each is rejected with a warning and the build goes on from the per-species entries,
 * exactly as without a pack. A pack of another build context (settings, code, --strict changed) is stale:
 * not used and not warned about, as an entry with another key is simply not addressed. Lines are keyed like
 * the entries (content addressed), so a valid pack can only say what the entries would say.
 *
 * What the pack says about outputs is never trusted on its own: a previous output is reused only after its
 * bytes hash to the digest the current build would write (stages/emit-stream.ts, OutputStaging); a
 * modified previous output is therefore never taken into a new build.
 *
 * The body lines are kept as text and parsed only when used; the next pack reuses the text of every line
 * that did not change, so a no-change rebuild re-encodes nothing.
 */
import { createHash, randomBytes, type Hash } from 'node:crypto';
import { closeSync, mkdirSync, openSync, readFileSync, readSync, realpathSync, rmSync } from 'node:fs';
import { mkdir, open } from 'node:fs/promises';
import path from 'node:path';
import { writeAll, writeFileAtomic, writeFileAtomicNoSync } from './atomic-write.js';
import { sha256Hex, type Digest } from './hash.js';

export const PACK_FORMAT = 'qforge-pack/1';
export const PACK_DIR = 'pack';
const KEY = /^[0-9a-f]{64}$/;


/** One output file assembled from per-species pieces (thermo.json, nasa7.txt), as a build published it. */
export interface OutputRecord {
  file: string;
  /** The whole file. */
  whole: Digest;
  /** The text before the first piece and after the last one. */
  head: Digest;
  tail: Digest;
  /** Each species piece (without its separator), in file order: [sha256, UTF-8 bytes]. */
  pieces: Array<[string, number]>;
}

/** Which database and output folder a pack belongs to. */
export interface PackIdentity {
  database: string;
  out: string;
}

export interface LoadedPack {
  /** File key → FileFacts JSON text. */
  files: Map<string, string>;
  /** Result key → StoredResult JSON text (rendered texts as digests). */
  results: Map<string, string>;
  outputs: Map<string, OutputRecord>;
  /** sha256 and length of the body read (a next pack of the same body need not be written again). */
  body: Digest;
}

/** The identity of a build of `database` into `out` (real path of the database folder, resolved out). */
export function packIdentity(database: string, out: string): PackIdentity {
  let db = path.resolve(database);
  try {
    db = realpathSync(db);
  } catch {
    // A database folder that cannot be resolved fails the check anyway; its given path is the identity.
  }
  return { database: db, out: path.resolve(out) };
}

export function packFile(cacheDir: string, id: PackIdentity): string {
  return path.join(cacheDir, PACK_DIR, sha256Hex(`${id.database}\n${id.out}`).slice(0, 32));
}

/** What reading a pack gave: a pack, or nothing (none, stale), or a rejection with its reason. */
export interface PackRead {
  pack?: LoadedPack;
  /** Why the pack was rejected (foreign, truncated, corrupt); undefined when there was none or it was stale. */
  rejected?: string;
}

interface PackHeader {
  format?: unknown;
  database?: unknown;
  out?: unknown;
  context?: unknown;
  sha256?: unknown;
  bytes?: unknown;
}

/** The header of a pack file (its first line, at most 64 KiB), or undefined when it has none. */
export async function packHeader(file: string): Promise<{ database?: unknown; out?: unknown } | undefined> {
  try {
    const fh = await open(file, 'r');
    try {
      const buf = Buffer.alloc(1 << 16);
      const { bytesRead } = await fh.read(buf, 0, buf.length, 0);
      const eol = buf.subarray(0, bytesRead).indexOf(0x0a);
      const h = JSON.parse(buf.subarray(0, eol < 0 ? bytesRead : eol).toString('utf8')) as PackHeader;
      return h !== null && typeof h === 'object' && h.format === PACK_FORMAT ? h : undefined;
    } finally {
      await fh.close();
    }
  } catch {
    return undefined;
  }
}

/** Reads and checks the pack of `id` for build context `context` (see the module comment). */
export function readPack(cacheDir: string, id: PackIdentity, context: string): PackRead {
  let bytes: Buffer;
  try {
    bytes = readFileSync(packFile(cacheDir, id));
  } catch {
    return {};
  }
  const eol = bytes.indexOf(0x0a);
  let header: PackHeader;
  try {
    header = JSON.parse(bytes.subarray(0, eol < 0 ? bytes.length : eol).toString('utf8')) as PackHeader;
  } catch {
    return { rejected: 'no pack header' };
  }
  if (header === null || typeof header !== 'object' || header.format !== PACK_FORMAT) {
    return { rejected: `foreign format ${JSON.stringify(String((header as PackHeader | null)?.format)).slice(0, 40)}` };
  }
  if (header.database !== id.database || header.out !== id.out) return { rejected: 'written for another database or output folder' };
  if (header.context !== context) return {};
  const body = bytes.subarray(eol + 1);
  if (body.length !== header.bytes) return { rejected: `truncated (${body.length} of ${String(header.bytes)} bytes)` };
  if (sha256Hex(body) !== header.sha256) return { rejected: 'checksum mismatch' };
  const pack: LoadedPack = { files: new Map(), results: new Map(), outputs: new Map(), body: { hash: header.sha256 as string, bytes: body.length } };
  const text = body.toString('utf8');
  let at = 0;
  while (at < text.length) {
    let end = text.indexOf('\n', at);
    if (end < 0) end = text.length;
    const kind = text[at];
    if (kind === 'F' || kind === 'R') {
      const key = text.slice(at + 2, at + 66);
      if (!KEY.test(key) || text[at + 66] !== ' ') return { rejected: 'malformed line' };
      (kind === 'F' ? pack.files : pack.results).set(key, text.slice(at + 67, end));
    } else if (kind === 'O') {
      try {
        const r = JSON.parse(text.slice(at + 2, end)) as OutputRecord;
        pack.outputs.set(r.file, r);
      } catch {
        return { rejected: 'malformed output record' };
      }
    } else return { rejected: 'malformed line' };
    at = end + 1;
  }
  return { pack };
}

/**
 * Lines of the pack held in memory before they go to a scratch file beside the pack: a pack holds ~1.6 KB
 * per species (80 MB at 50,000), which kept whole — and joined and copied once more to be written — made
 * the memory of a build grow with the database.
 */
export const PACK_MEMORY_BYTES = 4 << 20;

/**
 * Gathers the lines of the next pack (texts as they are to be stored) and writes it. Lines must come in
 * body order (every file line, then the results, then the outputs). Up to PACK_MEMORY_BYTES of them are
 * kept in memory; beyond that (with a `scratchDir`) the body goes to a scratch file as it grows, hashed as
 * it is written, and `write` copies it behind the header in chunks: the memory stays bounded, the bytes
 * are the same.
 */
export class PackWriter {
  private pending: string[] = [];
  private pendingLength = 0;
  private scratch: { file: string; fd: number; hash: Hash; bytes: number } | undefined;
  private phase = 0;

  /**
   * `scratchDir`: where the body may be spilled (the cache's pack folder); without it, all in memory.
   * `memoryBytes`: the in-memory bound (tests make it small to exercise the scratch file).
   */
  constructor(
    private readonly scratchDir?: string,
    private readonly memoryBytes = PACK_MEMORY_BYTES,
  ) {}

  addFile(key: string, factsText: string): void {
    this.add(0, `F ${key} ${factsText}\n`);
  }

  addResult(key: string, resultText: string): void {
    this.add(1, `R ${key} ${resultText}\n`);
  }

  addOutput(record: OutputRecord): void {
    this.add(2, `O ${JSON.stringify(record)}\n`);
  }

  private add(phase: number, line: string): void {
    if (phase < this.phase) throw new Error('build pack lines out of order');
    this.phase = phase;
    this.pending.push(line);
    this.pendingLength += line.length;
    if (this.scratchDir !== undefined && this.pendingLength >= this.memoryBytes) this.spill();
  }

  /** Appends the pending lines to the scratch file (made on first use). */
  private spill(): void {
    if (!this.scratch) {
      mkdirSync(this.scratchDir!, { recursive: true });
      const file = path.join(this.scratchDir!, `.body.${process.pid}.${randomBytes(4).toString('hex')}.tmp`);
      this.scratch = { file, fd: openSync(file, 'wx+'), hash: createHash('sha256'), bytes: 0 };
    }
    const data = Buffer.from(this.pending.join(''), 'utf8');
    this.pending = [];
    this.pendingLength = 0;
    this.scratch.hash.update(data);
    // Appended at the descriptor's position: only this method writes the scratch file (`write` reads it by offset).
    writeAll(this.scratch.fd, data, data.length);
    this.scratch.bytes += data.length;
  }

  /** Removes the scratch file (idempotent; `write` calls it). */
  discard(): void {
    const s = this.scratch;
    this.scratch = undefined;
    this.pending = [];
    if (!s) return;
    closeSync(s.fd);
    rmSync(s.file, { force: true });
  }

  /**
   * Writes the pack (through a temporary file and a rename, without fsync: a torn pack fails its checksum),
   * unless `previous` — the pack this build read, of the same identity and context — has the same body.
   */
  async write(cacheDir: string, id: PackIdentity, context: string, previous?: LoadedPack): Promise<void> {
    try {
      if (this.scratch && this.pending.length > 0) this.spill();
      const scratch = this.scratch;
      const inMemory = scratch ? undefined : Buffer.from(this.pending.join(''), 'utf8');
      const sha256 = inMemory ? sha256Hex(inMemory) : scratch!.hash.digest('hex');
      const bytes = inMemory ? inMemory.length : scratch!.bytes;
      if (previous && previous.body.bytes === bytes && previous.body.hash === sha256) return;
      const file = packFile(cacheDir, id);
      await mkdir(path.dirname(file), { recursive: true });
      const header = Buffer.from(`${packHeaderLine(id, context, sha256, bytes)}\n`, 'utf8');
      if (inMemory) await writeFileAtomic(file, Buffer.concat([header, inMemory]), { sync: false });
      else writeFileAtomicNoSync(file, (out) => {
        writeAll(out, header, header.length);
        const chunk = Buffer.allocUnsafe(1 << 20);
        for (let at = 0; at < bytes; ) {
          const n = readSync(scratch!.fd, chunk, 0, Math.min(chunk.length, bytes - at), at);
          if (n <= 0) throw new Error(`build pack scratch file ended at ${at} of ${bytes} bytes`);
          writeAll(out, chunk, n);
          at += n;
        }
      });
    } finally {
      this.discard();
    }
  }
}

function packHeaderLine(id: PackIdentity, context: string, sha256: string, bytes: number): string {
  return JSON.stringify({ format: PACK_FORMAT, database: id.database, out: id.out, context, sha256, bytes });
}
