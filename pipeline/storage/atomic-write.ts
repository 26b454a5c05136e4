/**
 * Crash-safe publication of a build folder. A build writes several files that only make sense together,
 * so single-file renames are not enough. The scheme:
 *
 *   1. every output is written (and fsync'd) into a fresh sibling folder `.<OUT>.qforge-new-<pid>-<rand>`;
 *   2. the previous OUT (if any) is renamed to `.<OUT>.qforge-old`;
 *   3. the new folder is renamed to OUT;
 *   4. `.<OUT>.qforge-old` is removed.
 *
 * Each step is a single rename(2) in one parent folder, atomic on POSIX file systems. A process killed at
 * any moment therefore leaves one of these states, and the next command restores a complete set:
 *   - killed during 1: OUT untouched; a stale `-new-` folder is removed on the next build;
 *   - killed between 2 and 3: OUT absent, `-old` complete → `recoverOutputDir` renames it back (readers
 *     use it directly, see `resolveReadableBuild`);
 *   - killed between 3 and 4: OUT is the new complete set; `-old` is removed.
 * A rebuild whose files all equal OUT's but one (summary.json), under the same marker list, renames that one
 * file into OUT instead (one rename(2): killed before it, OUT is the previous set; after it, the new one);
 * see `OutputStaging`.
 * OUT is owned by qforge and replaced whole. Its marker file `.qforge-build` lists every file qforge wrote
 * there; a folder is replaced only when it is empty or holds nothing but the files its marker lists, so a
 * file a user put into OUT (notes, a species file) stops the build instead of vanishing. A non-empty folder
 * without a marker is never replaced. (A marker of an older qforge, without a list, is trusted as before.)
 */
import { createHash, hash as oneShotHash, randomBytes } from 'node:crypto';
import { closeSync, copyFileSync, constants as fsConstants, fsyncSync, linkSync, lstatSync, openSync, readdirSync, readFileSync, readSync, renameSync, rmdirSync, rmSync, unlinkSync, writeFileSync, writeSync } from 'node:fs';
import { lstat, mkdir, open, readdir, readFile, rename, rm, stat, type FileHandle } from 'node:fs/promises';
import path from 'node:path';
import { compareText } from '../core/text.js';
import type { Digest } from './hash.js';
import { WriteBurst } from './write-burst.js';

/** Marker file that identifies a folder as a qforge build output; it lists the files written (sorted). */
export const BUILD_MARKER = '.qforge-build';
const MARKER_HEADER = 'This folder is written by qforge build and is replaced as a whole on every build.\n';
const MARKER_LIST_LINE = 'Files written by qforge (any other entry here stops the next build):\n';

/** Deterministic marker text for a set of output files (relative paths, '/' separators). */
export function markerText(files: Iterable<string>): string {
  const list = [...files].filter((f) => f !== BUILD_MARKER).sort(compareText);
  return `${MARKER_HEADER}${MARKER_LIST_LINE}${list.map((f) => `${f}\n`).join('')}`;
}

/** Files a marker lists, or undefined for a marker without a list (older qforge). */
function parseMarker(text: string): Set<string> | undefined {
  const at = text.indexOf(MARKER_LIST_LINE);
  if (at < 0) return undefined;
  return new Set(text.slice(at + MARKER_LIST_LINE.length).split('\n').filter((l) => l !== ''));
}

/**
 * `syscall path: CODE (reason)` of a Node file-system error, e.g. "mkdir '/etc/passwd': ENOTDIR (not a
 * directory)"; undefined for other errors.
 */
export function describeFsError(err: unknown): string | undefined {
  const e = err as NodeJS.ErrnoException | undefined;
  if (!e || typeof e !== 'object' || typeof e.code !== 'string') return undefined;
  if (!/^E[A-Z0-9]+$/.test(e.code) && !e.code.startsWith('ERR_FS_')) return undefined;
  // Node's message reads "ENOTDIR: not a directory, mkdir '/etc/passwd'"; keep the reason words.
  const m = /^[A-Z0-9_]+: (.*?)(?:, [a-z]+ '.*')?$/.exec(e.message ?? '');
  const reason = m?.[1] ?? e.message ?? e.code;
  const where = e.syscall ? `${e.syscall}${e.path ? ` '${e.path}'` : ''}: ` : e.path ? `'${e.path}': ` : '';
  return `${where}${e.code} (${reason})`;
}

export class OutputFolderError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'OutputFolderError';
  }
}

/** Another live build holds the lock of the same output folder. */
export class BuildLockedError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'BuildLockedError';
  }
}

const siblings = (out: string) => {
  const abs = path.resolve(out);
  const parent = path.dirname(abs);
  const base = path.basename(abs);
  return {
    abs,
    parent,
    base,
    old: path.join(parent, `.${base}.qforge-old`),
    lock: path.join(parent, `.${base}.qforge-lock`),
    newPrefix: `.${base}.qforge-new-`,
  };
};

async function exists(p: string): Promise<boolean> {
  try {
    await stat(p);
    return true;
  } catch {
    return false;
  }
}

function processAlive(pid: number): boolean {
  if (!Number.isInteger(pid) || pid <= 0) return false;
  try {
    process.kill(pid, 0);
    return true;
  } catch (err) {
    return (err as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/**
 * Takes the lock of OUT (`.<OUT>.qforge-lock` next to it, holding the owner's pid) so that two builds never
 * swap the same folder at once. A lock whose process is gone (killed build) is taken over. Returns the
 * release function.
 */
export async function acquireOutputLock(out: string): Promise<() => Promise<void>> {
  const s = siblings(out);
  // A path qforge cannot create (under a file, in /proc, read-only) is a bad --out, not an internal error.
  const unusable = (err: unknown) =>
    describeFsError(err) ? new OutputFolderError(`cannot use the output folder ${out}: ${describeFsError(err)}`) : err;
  try {
    await mkdir(s.parent, { recursive: true });
  } catch (err) {
    throw unusable(err);
  }
  for (let attempt = 0; attempt < 3; attempt++) {
    try {
      const fh = await open(s.lock, 'wx');
      await fh.writeFile(`${process.pid}\n`);
      await fh.close();
      return async () => {
        await rm(s.lock, { force: true });
      };
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code !== 'EEXIST') throw unusable(err);
      let owner = NaN;
      try {
        owner = Number((await readFile(s.lock, 'utf8')).trim());
      } catch {
        // Vanished in between: try again.
      }
      if (processAlive(owner) && owner !== process.pid) {
        throw new BuildLockedError(`another qforge build (pid ${owner}) is writing ${out}; try again when it has finished`);
      }
      await rm(s.lock, { force: true });
    }
  }
  throw new BuildLockedError(`could not take the lock ${s.lock}`);
}

/**
 * Temporary names beside `file`: the process id, a random tag drawn once per thread (module instance) and a
 * counter, so names never repeat within a process and threads never share one. A random draw per name cost
 * ~18 µs each (a getrandom call), ~0.2 s over the 10,000 cache entries of a 2,000-species build.
 */
const TEMP_TAG = randomBytes(4).toString('hex');
let tempCount = 0;
function tempNameFor(file: string): string {
  return `${file}.${process.pid}.${TEMP_TAG}${(tempCount++).toString(36)}.tmp`;
}

/**
 * Writes a file through a temporary name and a rename, fsync'd unless `sync: false` (cache entries: a torn
 * entry after a power cut fails its checksum and is recomputed, so it need not stall the build).
 */
export async function writeFileAtomic(file: string, data: string | Uint8Array, opts: { sync?: boolean } = {}): Promise<void> {
  const tmp = tempNameFor(file);
  const fh = await open(tmp, 'w');
  try {
    await fh.writeFile(data);
    if (opts.sync !== false) await fh.sync();
  } finally {
    await fh.close();
  }
  try {
    await rename(tmp, file);
  } catch (err) {
    await rm(tmp, { force: true });
    throw err;
  }
}

/**
 * `writeFileAtomic` without fsync, synchronously: for the many small entries of the cache, where four
 * thread-pool round trips (open, write, close, rename) cost more than the write itself. `data` may also be
 * a function that writes the content into the temporary file's descriptor (a large file copied in chunks);
 * if it throws, the temporary file is removed and nothing is renamed.
 */
export function writeFileAtomicNoSync(file: string, data: string | Uint8Array | ((fd: number) => void)): void {
  const tmp = tempNameFor(file);
  if (typeof data === 'function') {
    const fd = openSync(tmp, 'wx');
    try {
      data(fd);
    } catch (err) {
      closeSync(fd);
      rmSync(tmp, { force: true });
      throw err;
    }
    closeSync(fd);
  } else writeFileSync(tmp, data, { flag: 'wx' });
  try {
    renameSync(tmp, file);
  } catch (err) {
    rmSync(tmp, { force: true });
    throw err;
  }
}

async function fsyncDir(dir: string): Promise<void> {
  try {
    const fh = await open(dir, 'r');
    try {
      await fh.sync();
    } finally {
      await fh.close();
    }
  } catch {
    // Some file systems refuse fsync on directories; the renames are still atomic.
  }
}

/**
 * Brings OUT back to a complete state after an interrupted build (see the module comment) and removes
 * stale temporary folders of dead processes. Returns what it did, for the log.
 */
export async function recoverOutputDir(out: string): Promise<string[]> {
  const s = siblings(out);
  const notes: string[] = [];
  if (!(await exists(s.parent))) return notes;
  const outExists = await exists(s.abs);
  if (await exists(s.old)) {
    if (!outExists) {
      await rename(s.old, s.abs);
      notes.push(`restored the previous outputs of an interrupted build into ${out}`);
    } else {
      await rm(s.old, { recursive: true, force: true });
      notes.push(`removed the backup left by an interrupted build (${path.basename(s.old)})`);
    }
  }
  for (const name of await readdir(s.parent)) {
    if (!name.startsWith(s.newPrefix)) continue;
    const pid = Number(name.slice(s.newPrefix.length).split('-')[0]);
    if (processAlive(pid) && pid !== process.pid) continue;
    await rm(path.join(s.parent, name), { recursive: true, force: true });
    notes.push(`removed the unfinished outputs of an interrupted build (${name})`);
  }
  return notes;
}

/** The folder a reader should use for OUT: OUT itself, or its backup while a swap is half done. */
export async function resolveReadableBuild(out: string): Promise<string> {
  const s = siblings(out);
  if (await exists(s.abs)) return s.abs;
  if (await exists(s.old)) return s.old;
  return s.abs;
}

/** Entries below `dir` (relative, '/' separators) that are not listed, nor folders holding listed files. */
async function unlistedEntries(dir: string, listed: ReadonlySet<string>): Promise<string[]> {
  const folders = new Set<string>();
  for (const f of listed) for (let d = path.posix.dirname(f); d !== '.'; d = path.posix.dirname(d)) folders.add(d);
  const out: string[] = [];
  const walk = async (abs: string, rel: string): Promise<void> => {
    const entries = (await readdir(abs, { withFileTypes: true })).sort((a, b) => compareText(a.name, b.name));
    for (const e of entries) {
      const r = rel ? `${rel}/${e.name}` : e.name;
      if (r === BUILD_MARKER) continue;
      if (e.isDirectory() && folders.has(r)) await walk(path.join(abs, e.name), r);
      else if (!(e.isFile() && listed.has(r))) out.push(e.isDirectory() ? `${r}/` : r);
    }
  };
  await walk(dir, '');
  return out;
}

/**
 * Refuses to replace a folder holding anything qforge did not write: a non-empty folder without the
 * marker (protects e.g. `--out ~`), or one holding entries its marker does not list (a user's notes).
 */
export async function assertReplaceable(out: string, label: string = out): Promise<void> {
  const s = siblings(out);
  let st;
  try {
    st = await lstat(s.abs);
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === 'ENOENT') return;
    throw new OutputFolderError(`cannot use the output folder ${label}: ${describeFsError(err) ?? String(err)}`);
  }
  if (st.isSymbolicLink()) st = await stat(s.abs).catch(() => st!);
  if (!st.isDirectory()) throw new OutputFolderError(`output path ${label} exists and is not a folder`);
  let entries: string[];
  let marker: string | undefined;
  try {
    entries = await readdir(s.abs);
    if (entries.includes(BUILD_MARKER)) marker = await readFile(path.join(s.abs, BUILD_MARKER), 'utf8');
  } catch (err) {
    throw new OutputFolderError(`cannot use the output folder ${label}: ${describeFsError(err) ?? String(err)}`);
  }
  if (entries.length === 0) return;
  if (marker === undefined) {
    throw new OutputFolderError(
      `output folder ${label} is not empty and was not written by qforge (no ${BUILD_MARKER}); refusing to replace it`,
    );
  }
  const listed = parseMarker(marker);
  if (!listed) return;
  const foreign = await unlistedEntries(s.abs, listed);
  if (foreign.length === 0) return;
  const shown = foreign.slice(0, 5).join(', ') + (foreign.length > 5 ? `, … (${foreign.length} in all)` : '');
  throw new OutputFolderError(
    `output folder ${label} holds ${foreign.length === 1 ? 'an entry' : `${foreign.length} entries`} qforge did not write (${shown}); ` +
      'qforge replaces the output folder as a whole and would delete ' +
      `${foreign.length === 1 ? 'it' : 'them'}: move ${foreign.length === 1 ? 'it' : 'them'} elsewhere or choose another --out`,
  );
}

/** A relative name of plain segments (no `.`, `..`, empty segment, or character a path could turn on). */
const PLAIN_SEGMENT = /^[A-Za-z0-9_+(),%-][A-Za-z0-9._+(),%-]*$|^\.[A-Za-z0-9_+(),%-][A-Za-z0-9._+(),%-]*$/;
function plainRelative(rel: string): boolean {
  for (const segment of rel.split('/')) if (!PLAIN_SEGMENT.test(segment)) return false;
  return true;
}

/** Resolved path of `rel` inside `root`, or an error when it would land outside (`..`, absolute, …). */
export function safeJoin(root: string, rel: string): string {
  // The common case (an output name below an absolute folder) needs no resolving: a plain relative name
  // cannot leave the folder. (`path.resolve` per table cost ~10 µs of a rebuild's ~100 µs per species.)
  if (path.sep === '/' && path.isAbsolute(root) && plainRelative(rel)) return root.endsWith('/') ? `${root}${rel}` : `${root}/${rel}`;
  const absRoot = path.resolve(root);
  const target = path.resolve(absRoot, rel);
  const back = path.relative(absRoot, target);
  if (!back || back.startsWith('..') || path.isAbsolute(back)) {
    throw new OutputFolderError(`output file name ${JSON.stringify(rel)} would leave the output folder`);
  }
  return target;
}

export interface PublishHooks {
  /** Called after the new folder is complete and before OUT is touched (tests pause here). */
  beforeSwap?: () => Promise<void>;
  /** Called after OUT was moved aside and before the new folder takes its place. */
  midSwap?: () => Promise<void>;
}

/** At most this many files are open at once while staging or syncing (well below common fd limits). */
const FILE_CONCURRENCY = 16;

/** Runs `work` over `items` with at most `width` at a time; rejects with the first failure. */
async function forEachBounded<T>(items: readonly T[], width: number, work: (item: T) => Promise<void>): Promise<void> {
  let next = 0;
  const lane = async (): Promise<void> => {
    while (next < items.length) await work(items[next++]!);
  };
  await Promise.all(Array.from({ length: Math.min(width, items.length) }, lane));
}

/** An appendable file in the staging folder (thermo.json and nasa7.txt are written this way, in pieces). */
export interface StagedStream {
  write(text: string): Promise<void>;
  close(): Promise<void>;
}

/** Whether two files of equal size hold the same bytes (read in 1 MiB chunks). */
function sameBytes(a: string, b: string): boolean {
  const fa = openSync(a, 'r');
  try {
    const fb = openSync(b, 'r');
    try {
      const ba = Buffer.allocUnsafe(1 << 20);
      const bb = Buffer.allocUnsafe(1 << 20);
      for (;;) {
        const na = readSync(fa, ba, 0, ba.length, null);
        const nb = readSync(fb, bb, 0, bb.length, null);
        if (na !== nb) return false;
        if (na === 0) return true;
        if (!ba.subarray(0, na).equals(bb.subarray(0, nb))) return false;
      }
    } finally {
      closeSync(fb);
    }
  } finally {
    closeSync(fa);
  }
}

/** Whether the file holds exactly the bytes of `digest` (read in 1 MiB chunks). */
export function digestMatches(file: string, digest: Digest): boolean {
  try {
    if (digest.bytes < DIGEST_BUFFER) {
      // A small file: one read of one byte more than expected tells both its length and its bytes.
      const buf = (digestBuffer ??= Buffer.allocUnsafe(DIGEST_BUFFER));
      const fd = openSync(file, 'r');
      let n: number;
      try {
        n = readSync(fd, buf, 0, digest.bytes + 1, 0);
      } finally {
        closeSync(fd);
      }
      return n === digest.bytes && oneShotHash('sha256', buf.subarray(0, n), 'hex') === digest.hash;
    }
    return sameDigest(fileDigest(file), digest);
  } catch {
    return false;
  }
}

/**
 * Removes a folder tree qforge wrote (the previous OUT after the swap): one readdir per folder and one unlink
 * per file, where `rmSync` also lstats every entry (10,000 tables: ~50 ms). Symbolic links are unlinked, never
 * followed. Anything unexpected is left to `rmSync`.
 */
function removeTree(dir: string): void {
  try {
    // A symbolic link (OUT given as a link to a folder) is removed itself: never the folder it leads to.
    if (!lstatSync(dir).isDirectory()) throw new Error('not a folder');
    for (const e of readdirSync(dir, { withFileTypes: true })) {
      const p = path.join(dir, e.name);
      if (e.isDirectory()) removeTree(p);
      else unlinkSync(p);
    }
    rmdirSync(dir);
  } catch {
    rmSync(dir, { recursive: true, force: true });
  }
}

const sameDigest = (a: Digest, b: Digest) => a.bytes === b.bytes && a.hash === b.hash;

/** The read buffer of `fileDigest` (synchronous, so one buffer serves every call of the thread). */
let digestBuffer: Buffer | undefined;
const DIGEST_BUFFER = 1 << 20;

/**
 * sha256 and length of a file's bytes, read in 1 MiB chunks into one reused buffer: a large file needs no
 * buffer of its size, and a rebuild hashing thousands of small tables allocates nothing per file.
 */
export function fileDigest(file: string): Digest {
  const fd = openSync(file, 'r');
  try {
    const buf = (digestBuffer ??= Buffer.allocUnsafe(DIGEST_BUFFER));
    const first = readSync(fd, buf, 0, buf.length, null);
    // A file smaller than the buffer (every table): one read, the end confirmed, a one-shot hash.
    if (first < buf.length && readSync(fd, buf, first, 1, null) === 0) return { hash: oneShotHash('sha256', buf.subarray(0, first), 'hex'), bytes: first };
    const h = createHash('sha256');
    h.update(buf.subarray(0, first));
    let bytes = first;
    for (;;) {
      const n = readSync(fd, buf, 0, buf.length, null);
      if (n === 0) break;
      h.update(buf.subarray(0, n));
      bytes += n;
    }
    return { hash: h.digest('hex'), bytes };
  } finally {
    closeSync(fd);
  }
}

/** Writes data[0, length) at the descriptor's position (writeSync may write less than asked). */
export function writeAll(fd: number, data: Uint8Array, length: number): void {
  for (let off = 0; off < length; ) off += writeSync(fd, data, off, length - off);
}

/** Bytes a StagedStream gathers before it writes them (one write per species would cost a system call each). */
const STREAM_BUFFER = 1 << 20;

/**
 * A file handle as a buffered StagedStream whose close may be called more than once. The buffer is
 * written synchronously: the pieces are small and a thread-pool round trip per write costs more than it.
 */
function closeOnce(fh: FileHandle): StagedStream {
  let closed = false;
  let pending: string[] = [];
  let size = 0;
  const flush = () => {
    if (pending.length === 0) return;
    const data = Buffer.from(pending.join(''), 'utf8');
    pending = [];
    size = 0;
    writeAll(fh.fd, data, data.length);
  };
  return {
    write: async (text: string) => {
      pending.push(text);
      size += text.length;
      if (size >= STREAM_BUFFER) flush();
    },
    close: async () => {
      if (closed) return;
      closed = true;
      try {
        flush();
      } finally {
        await fh.close();
      }
    },
  };
}

/**
 * A previous output found to hold the bytes this build would write, not yet linked into the staging folder
 * (see `OutputStaging`): where it goes, the inode that was hashed and the digest it was checked against.
 */
interface PendingLink {
  rel: string;
  previous: string;
  dest: string;
  /** Identity of the file that was hashed: inode, device and change time (ns). */
  stamp: string;
  digest: Digest;
}

/** Inode, device and change time of a file: a file replaced or rewritten since shows another stamp. */
export const stampOf = (st: { ino: bigint; dev: bigint; ctimeNs: bigint }) => `${st.dev}:${st.ino}:${st.ctimeNs}`;

/** Digests of previous files taken elsewhere (storage/previous-digests.ts), valid only for the given stamp. */
export interface KnownDigests {
  lookup(file: string, stamp: string): Digest | undefined;
}

/** New staged files created together (storage/write-burst.ts). */
const WRITE_BURST = 32;

/**
 * The temporary folder a build writes into while it runs (`.<OUT>.qforge-new-<pid>-<random>` next to OUT),
 * published as OUT by `publish` with the swap described in the module comment, or removed by `discard`.
 * Files are written without fsync as they come; `publish` fsyncs them all (in parallel, bounded) and their
 * folders before the swap, so the durability is that of a file-by-file fsync without its stalls.
 *
 * Previous outputs that hold exactly the bytes this build would write are checked in place (hashed where
 * they lie) and only recorded; they are hard-linked into the staging folder when they are needed there:
 * when the publish swaps folders, or when a framed file's pieces must be copied from them. When, at the
 * publish, every staged file but one is such a previous file and the previous marker lists exactly this
 * build's files, nothing but that one file differs from OUT: it alone is renamed into OUT (one rename(2),
 * as atomic as the swap) and no file is linked or removed — a no-change rebuild of 10,000 species saves
 * 10,000 links and the 10,000 unlinks of the old folder. A link made later is checked to be of the inode
 * that was hashed (else hashed again through the link), so what was checked is still what gets published;
 * where the file system refuses links, the previous file is copied and the copy checked against the digest.
 */
export class OutputStaging {
  private readonly files = new Set<string>();
  /** New files not created yet, by staged path: created WRITE_BURST at a time (storage/write-burst.ts). */
  private readonly newFiles = new WriteBurst<string | Uint8Array>(WRITE_BURST, (target, data) => writeFileSync(target, data, { flag: 'wx' }));
  /** Files that hold the previous OUT's bytes (linked, or still pending): no write and no fsync needed. */
  private readonly linked = new Set<string>();
  /** Checked previous files not linked yet, by destination path (a staged file or a scratch path). */
  private readonly pending = new Map<string, PendingLink>();
  private readonly dirs: Set<string>;
  private constructor(
    readonly out: string,
    readonly dir: string,
  ) {
    this.dirs = new Set([dir]);
  }

  /** Checks that OUT may be replaced and creates the staging folder. */
  static async open(out: string): Promise<OutputStaging> {
    const s = siblings(out);
    await mkdir(s.parent, { recursive: true });
    await assertReplaceable(out);
    const tmp = path.join(s.parent, `${s.newPrefix}${process.pid}-${randomBytes(4).toString('hex')}`);
    await mkdir(tmp);
    return new OutputStaging(out, tmp);
  }

  /** Files staged so far (relative paths). */
  get written(): ReadonlySet<string> {
    return this.files;
  }

  private async target(rel: string, register = true): Promise<string> {
    const target = this.claim(rel);
    await this.ensureDir(path.dirname(target));
    if (register) this.files.add(rel);
    return target;
  }

  /** The staged path of `rel`, refusing a second use of the name (no folder is made). */
  private claim(rel: string): string {
    if (this.files.has(rel) || rel === BUILD_MARKER) throw new OutputFolderError(`output file ${rel} written twice`);
    return safeJoin(this.dir, rel);
  }

  private async ensureDir(dir: string): Promise<void> {
    if (!this.dirs.has(dir)) {
      await mkdir(dir, { recursive: true });
      this.dirs.add(dir);
    }
  }

  /** Digests of previous files already taken (by a helper thread): used instead of hashing again. */
  useKnownDigests(known: KnownDigests | undefined): void {
    this.known = known;
  }
  private known: KnownDigests | undefined;

  /** The previous OUT's `rel` (it may not exist). */
  previousPath(rel: string): string {
    return safeJoin((this.previousRoot ??= siblings(this.out).abs), rel);
  }
  private previousRoot: string | undefined;

  /**
   * Stages `rel` as the previous OUT's `rel` when that file holds bytes of the given digest (the build
   * pack's record of what this build would write): hashed in place now, linked when needed (see the class
   * comment); a previous file that was modified, replaced or truncated hashes differently and is not used
   * (false: nothing staged).
   */
  async reuseByDigest(rel: string, digest: Digest): Promise<boolean> {
    const dest = this.claim(rel);
    if (!this.checkPrevious(rel, dest, digest)) return false;
    this.files.add(rel);
    this.linked.add(rel);
    return true;
  }

  /**
   * Records the previous OUT's `rel` for the unlisted scratch path `dest` when it holds bytes of the given
   * digest, checked as in `reuseByDigest`; `adoptScratch` later stages it under its name, `ensureLinked`
   * makes the file exist at `dest` (to read from it), `dropLink` forgets it.
   */
  async linkPreviousAs(rel: string, dest: string, digest: Digest): Promise<boolean> {
    return this.checkPrevious(rel, dest, digest);
  }

  /**
   * Hashes the previous `rel` in place: only a regular file (not a symbolic link, which link(2) would copy
   * as a link) of the recorded size and digest is recorded as pending for `dest`.
   */
  private checkPrevious(rel: string, dest: string, digest: Digest): boolean {
    const previous = this.previousPath(rel);
    const st = lstatSync(previous, { throwIfNoEntry: false, bigint: true });
    if (st?.isFile() !== true || st.size !== BigInt(digest.bytes)) return false;
    const stamp = stampOf(st);
    const known = this.known?.lookup(previous, stamp);
    if (known ? !sameDigest(known, digest) : !digestMatches(previous, digest)) return false;
    this.pending.set(dest, { rel, previous, dest, stamp, digest });
    return true;
  }

  /** Makes a pending previous file exist at `dest` (see `materialise`); nothing to do for other paths. */
  async ensureLinked(dest: string): Promise<void> {
    const p = this.pending.get(dest);
    if (!p) return;
    this.pending.delete(dest);
    await this.ensureDir(path.dirname(dest));
    materialise(p);
  }

  /** Forgets a pending previous file at `dest`, or removes the file there. */
  async dropLink(dest: string): Promise<void> {
    if (!this.pending.delete(dest)) await rm(dest, { force: true });
  }

  /** Stages a scratch file recorded by `linkPreviousAs` as `rel` (a previous file: published without fsync). */
  async adoptScratch(scratch: string, rel: string): Promise<void> {
    const p = this.pending.get(scratch);
    if (p) {
      const dest = this.claim(rel);
      this.pending.delete(scratch);
      this.pending.set(dest, { ...p, dest });
      this.files.add(rel);
    } else renameSync(scratch, await this.target(rel));
    this.linked.add(rel);
  }

  /**
   * Stages a new file. It is queued (`newFiles`) and created with the next burst, and before anything reads
   * the staged files or publishes them. Synchronous writes: a small file costs less than the thread-pool
   * round trips of open, write and close. A failure (a full disk) surfaces from the call that creates the
   * burst, which fails the build as a failure of that file would.
   */
  async write(rel: string, data: string | Uint8Array): Promise<void> {
    this.newFiles.add(await this.target(rel), data);
  }

  /**
   * Stages `rel` with content `data`: when the previous OUT holds exactly these bytes under the same name
   * (a rebuild that changed nothing there), that file is used instead (recorded as in `reuseByDigest`) —
   * the bytes are compared, never assumed — so it needs no new write and no new fsync. Otherwise as `write`.
   */
  async writeOrReuse(rel: string, data: string): Promise<void> {
    const dest = this.claim(rel);
    const previous = this.previousPath(rel);
    try {
      const st = lstatSync(previous, { throwIfNoEntry: false, bigint: true });
      const bytes = Buffer.from(data, 'utf8');
      if (st?.isFile() && st.size === BigInt(bytes.length) && readFileSync(previous).equals(bytes)) {
        this.pending.set(dest, { rel, previous, dest, stamp: stampOf(st), digest: { hash: oneShotHash('sha256', bytes, 'hex'), bytes: bytes.length } });
        this.files.add(rel);
        this.linked.add(rel);
        return;
      }
    } catch {
      // No previous file, an unreadable one: write it.
    }
    this.newFiles.add(await this.target(rel), data);
  }

  /**
   * After `rel` is completely staged: when the previous OUT holds the same bytes under that name, the
   * staged copy is replaced by a hard link to it (already durable there, so publishing needs no fsync of
   * it). The files are compared in full, in chunks.
   */
  async reuseIfSame(rel: string): Promise<void> {
    if (!this.files.has(rel) || this.linked.has(rel)) return;
    const target = safeJoin(this.dir, rel);
    if (this.newFiles.has(target)) this.newFiles.flush();
    const previous = this.previousPath(rel);
    try {
      const a = lstatSync(previous, { throwIfNoEntry: false });
      if (!a?.isFile() || a.size !== lstatSync(target).size || !sameBytes(previous, target)) return;
      const aside = `${target}.qforge-replaced`;
      renameSync(target, aside);
      try {
        linkSync(previous, target);
      } catch {
        renameSync(aside, target);
        return;
      }
      rmSync(aside, { force: true });
      this.linked.add(rel);
    } catch {
      // Keep the staged copy.
    }
  }

  /** Removes a staged file again (a species that failed after its table was staged). */
  async remove(rel: string): Promise<void> {
    this.linked.delete(rel);
    if (!this.files.delete(rel)) return;
    const staged = safeJoin(this.dir, rel);
    if (!this.newFiles.drop(staged)) await this.dropLink(staged);
  }

  async stream(rel: string): Promise<StagedStream> {
    return closeOnce(await open(await this.target(rel), 'wx'));
  }

  /** Path of a scratch file (not published; removed by `dropScratch` or with the folder). */
  scratchPath(rel: string): string {
    return path.join(this.dir, `.scratch-${rel.replace(/[^A-Za-z0-9._-]/g, '_')}`);
  }

  /** An unlisted scratch file in the staging folder, for pieces assembled later (thermo.json's species). */
  async scratch(rel: string): Promise<StagedStream> {
    return closeOnce(await open(this.scratchPath(rel), 'wx'));
  }

  async dropScratch(rel: string): Promise<void> {
    await rm(this.scratchPath(rel), { force: true });
  }

  /**
   * The one file to rename into OUT when everything else this build stages is the previous OUT's own
   * file (see the class comment); undefined when the folders must be swapped.
   */
  private async inPlaceFile(s: ReturnType<typeof siblings>): Promise<string | undefined> {
    const fresh = [...this.files].filter((rel) => !this.linked.has(rel));
    if (fresh.length !== 1) return undefined;
    // Only into a real folder (a symbolic link as OUT is replaced by a folder, as the swap does).
    const st = lstatSync(s.abs, { throwIfNoEntry: false });
    if (!st?.isDirectory()) return undefined;
    // Every pending file still stands under its own name (none was staged elsewhere).
    for (const p of this.pending.values()) if (p.dest !== safeJoin(this.dir, p.rel)) return undefined;
    let marker: string;
    try {
      marker = readFileSync(path.join(s.abs, BUILD_MARKER), 'utf8');
    } catch {
      return undefined;
    }
    // The same file list: OUT holds exactly this build's files (assertReplaceable saw nothing unlisted).
    return marker === markerText(this.files) ? fresh[0] : undefined;
  }

  /** Adds the marker, fsyncs everything and swaps the staging folder in as OUT (or renames one file in). */
  async publish(hooks: PublishHooks = {}): Promise<{ replaced: boolean }> {
    const s = siblings(this.out);
    try {
      this.newFiles.flush();
      const single = await this.inPlaceFile(s);
      if (single !== undefined) {
        const staged = safeJoin(this.dir, single);
        const fd = openSync(staged, 'r+');
        try {
          fsyncSync(fd);
        } finally {
          closeSync(fd);
        }
        await hooks.beforeSwap?.();
        await hooks.midSwap?.();
        renameSync(staged, safeJoin(s.abs, single));
        await fsyncDir(path.dirname(safeJoin(s.abs, single)));
        this.pending.clear();
        await this.discard();
        return { replaced: true };
      }
      for (const p of this.pending.values()) {
        await this.ensureDir(path.dirname(p.dest));
        materialise(p);
      }
      this.pending.clear();
      const markerFile = path.join(this.dir, BUILD_MARKER);
      const fh = await open(markerFile, 'wx');
      try {
        await fh.writeFile(markerText(this.files));
      } finally {
        await fh.close();
      }
      const all = [...this.files].filter((rel) => !this.linked.has(rel)).map((rel) => safeJoin(this.dir, rel));
      all.push(markerFile);
      await forEachBounded(all, FILE_CONCURRENCY, async (file) => {
        const h = await open(file, 'r+');
        try {
          await h.sync();
        } finally {
          await h.close();
        }
      });
      for (const d of this.dirs) await fsyncDir(d);
      await hooks.beforeSwap?.();
      const hadOld = await exists(s.abs);
      if (hadOld) {
        await rm(s.old, { recursive: true, force: true });
        await rename(s.abs, s.old);
      }
      await hooks.midSwap?.();
      await rename(this.dir, s.abs);
      await fsyncDir(s.parent);
      if (hadOld) removeTree(s.old);
      return { replaced: hadOld };
    } catch (err) {
      await this.discard();
      if (!(await exists(s.abs)) && (await exists(s.old))) await rename(s.old, s.abs);
      throw err;
    }
  }

  /** Removes the staging folder (the build is not published). */
  async discard(): Promise<void> {
    this.pending.clear();
    this.newFiles.clear();
    await rm(this.dir, { recursive: true, force: true });
  }
}

/**
 * Puts a checked previous file at its destination: a hard link, kept when it is the inode that was hashed
 * (else hashed again through the link); where links are refused, a copy checked against the digest. A file
 * that no longer holds the checked bytes fails the build (it was changed while the build ran).
 */
function materialise(p: PendingLink): void {
  // Stamp first: link(2) itself changes the inode's change time. The link is then checked to be of that inode.
  const before = lstatSync(p.previous, { bigint: true, throwIfNoEntry: false });
  let trusted = before !== undefined && stampOf(before) === p.stamp;
  try {
    linkSync(p.previous, p.dest);
    if (trusted) {
      const st = lstatSync(p.dest, { bigint: true });
      trusted = st.ino === before!.ino && st.dev === before!.dev;
    }
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === 'ENOENT') throw changedDuringBuild(p);
    trusted = false;
    copyFileSync(p.previous, p.dest, fsConstants.COPYFILE_EXCL);
  }
  if (!trusted && !digestMatches(p.dest, p.digest)) {
    rmSync(p.dest, { force: true });
    throw changedDuringBuild(p);
  }
}

const changedDuringBuild = (p: PendingLink) =>
  new OutputFolderError(`the previous output file ${p.rel} changed while the build ran; nothing was published: run the build again`);

/**
 * Writes `files` (relative path → content) as the complete new content of OUT, atomically as described in
 * the module comment. The marker file (listing the files) is added. Returns whether a previous OUT was
 * replaced.
 */
export async function publishDirectory(
  out: string,
  files: ReadonlyMap<string, string | Uint8Array>,
  hooks: PublishHooks = {},
): Promise<{ replaced: boolean }> {
  const staging = await OutputStaging.open(out);
  try {
    const sorted = [...files].sort(([a], [b]) => compareText(a, b));
    await forEachBounded(sorted, FILE_CONCURRENCY, ([rel, data]) => staging.write(rel, data));
  } catch (err) {
    await staging.discard();
    throw err;
  }
  return staging.publish(hooks);
}

/** Writes a text file into a fresh temp name next to it and renames it into place. */
export async function writeTextAtomic(file: string, text: string): Promise<void> {
  await mkdir(path.dirname(file), { recursive: true });
  await writeFileAtomic(file, text);
}

