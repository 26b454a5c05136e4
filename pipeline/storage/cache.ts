/**
 * The stage cache of incremental builds. One file per entry:
 *   <cache dir>/<kind>/<key[0:1]>/<key>        (16 folders per kind: `entryFolderOf`)
 * holding one header line and the payload bytes:
 *   qforge-cache/2 <kind> <key> <sha256 of the payload bytes>\n<canonical JSON of the payload>
 * (a `samples` payload keeps its sample lists as base64 columns of doubles inside that JSON, see
 * sample-columns.ts).
 * The key is a sha256 of everything the stage result depends on (see plan.ts) plus the tool version and
 * the code fingerprint, so a stale entry is never addressed. An entry is trusted only when its header names
 * the format, kind and key asked for and the checksum of the stored payload bytes matches; otherwise it is
 * reported as corrupt, recomputed and overwritten. The checksum is taken over the bytes as stored — not
 * over a re-canonicalised parse — so a hit costs one hash and one JSON.parse. Writes are queued and made in
 * bursts (`putText`), each through a temp file and a rename.
 *
 * The no-change fast path adds two kinds keyed by the sha256 of a species file's bytes and the build context
 * (see runner.ts `fileContextHash`): 'file' (the load and validation findings of the file) and 'result'
 * (one species' rendered outputs), so a rebuild with nothing changed neither parses YAML nor validates
 * nor re-hashes normalised input.
 *
 * Which entries a database uses is recorded per database (cache-uses.ts), so `qforge cache prune` can drop
 * the entries no database sharing the folder still uses.
 */
import { mkdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { describeFsError, writeFileAtomicNoSync } from './atomic-write.js';
import { canonicalCopy, canonicalJson, sha256Hex } from './hash.js';
import { WriteBurst } from './write-burst.js';

export const CACHE_FORMAT = 'qforge-cache/2';
/** Name of the default cache folder, created inside the database folder (discovery skips dot-folders). */
export const CACHE_DIR_NAME = '.qforge-cache';

/**
 * Stage results (samples, fit, table), and the two entries of the no-change fast path (stages/cached-load.ts):
 * 'file' holds what loading and validating a species file found, 'result' what emitting and summarising one
 * of its species needs (rendered output text, diagnostics, fit metrics).
 */
export type CacheKind = 'samples' | 'fit' | 'table' | 'file' | 'result';
export const CACHE_KINDS: readonly CacheKind[] = ['samples', 'fit', 'table', 'file', 'result'];
export type CacheOutcome = 'hit' | 'miss' | 'corrupt' | 'off';

export interface CacheLookup<T> {
  outcome: CacheOutcome;
  value?: T;
  /** Why an entry was rejected (outcome 'corrupt'). */
  reason?: string;
}

const KEY = /^[0-9a-f]{64}$/;
/** Cache entries written together (storage/write-burst.ts). */
const CACHE_WRITE_BURST = 64;
const NEWLINE = 0x0a;

/**
 * The folder of an entry within its kind's folder: the key's first hex digit, so 16 folders per kind.
 * Why 16, not 256: a fresh cache creates every folder as its first entry lands, and on the 2-core machine
 * a folder cost ~0.3 ms of kernel time while the build runs (1,280 folders: ~0.38 s of a 2,000-species
 * build into a fresh cache, its main thread's CPU profile). Fuller folders cost nothing per file: 50,000
 * files created in 16 folders (~3,100 each, as a kind's folders hold for 50,000 species) took no longer
 * per file than in 256 (a loop micro-benchmark; DEVELOPERS.md "Folders of a fresh cache").
 */
export function entryFolderOf(key: string): string {
  return key.slice(0, 1);
}

/** Path of an entry below a cache folder. */
export function cacheEntryPath(dir: string, kind: CacheKind, key: string): string {
  if (!KEY.test(key)) throw new Error(`cache key must be a sha256 hex digest, got ${key}`);
  return path.join(dir, kind, entryFolderOf(key), key);
}

export class StageCache {
  /**
   * Why the cache could not be written (the first failure of this build), e.g.
   * "mkdir '/x/.qforge-cache': EACCES (permission denied)"; undefined while every write succeeded.
   * The build goes on (a cache only saves time) but reports it, so a cache that never fills is not silent.
   */
  writeProblem: string | undefined;

  /** Entry folders made (or found) during this build: a recursive mkdir per entry cost ~1 ms each. */
  private readonly madeDirs = new Set<string>();

  /** `dir` undefined disables the cache (every lookup is 'off', nothing is written). */
  constructor(readonly dir: string | undefined) {}

  /** Records a failed write (once per build). */
  noteWriteFailure(err: unknown): void {
    this.writeProblem ??= describeFsError(err) ?? (err instanceof Error ? err.message : String(err));
  }

  async get<T>(kind: CacheKind, key: string): Promise<CacheLookup<T>> {
    if (!this.dir) return { outcome: 'off' };
    const bytes = this.stored(cacheEntryPath(this.dir, kind, key));
    if (bytes === undefined) return { outcome: 'miss' };
    const payload = checkedPayload(bytes, kind, key);
    if (typeof payload === 'string') return { outcome: 'corrupt', reason: payload };
    try {
      return { outcome: 'hit', value: JSON.parse(payload.toString('utf8')) as T };
    } catch {
      return { outcome: 'corrupt', reason: 'not valid JSON' };
    }
  }

  /** Whether the last lookup that went to disk found nothing (see `stored`). */
  private lastLookupMissed = false;

  /**
   * The bytes of the entry file `file` (a queued entry first), or undefined when there is none or it cannot
   * be read. Synchronous: an entry is small, and a hit should cost a read, not thread-pool round trips.
   * A read of a missing file throws, and node's error object (with its stack) made a miss cost ~5–30 µs
   * against ~0.5 µs for a stat that is told not to throw — 10,000 misses per 2,000 species into a fresh
   * cache. So after a miss the next lookup asks first whether the file exists; after a hit it reads at
   * once (a no-change rebuild hits every time and pays no extra call). Either way the outcome is the same.
   */
  private stored(file: string): Buffer | undefined {
    const queued = this.newEntries.get(file);
    if (queued !== undefined) return queued;
    try {
      if (this.lastLookupMissed && statSync(file, { throwIfNoEntry: false }) === undefined) return undefined;
      const bytes = readFileSync(file);
      this.lastLookupMissed = false;
      return bytes;
    } catch {
      this.lastLookupMissed = true;
      return undefined;
    }
  }

  async put(kind: CacheKind, key: string, payload: unknown): Promise<void> {
    await this.putText(kind, key, canonicalJson(payload));
  }

  /**
   * The payload text of an entry, checked like `get` but not parsed (for kinds with their own JSON
   * encoding, see storage/fast-entries.ts).
   */
  async getText(kind: CacheKind, key: string): Promise<CacheLookup<string>> {
    if (!this.dir) return { outcome: 'off' };
    const bytes = this.stored(cacheEntryPath(this.dir, kind, key));
    if (bytes === undefined) return { outcome: 'miss' };
    const payload = checkedPayload(bytes, kind, key);
    if (typeof payload === 'string') return { outcome: 'corrupt', reason: payload };
    return { outcome: 'hit', value: payload.toString('utf8') };
  }

  /**
   * Stores an entry whose payload is the given text (see `getText`). Entries are queued and written
   * CACHE_WRITE_BURST at a time (storage/write-burst.ts; a lookup finds a queued entry): a build writes
   * three to five entries per species. A write that fails is noted (`writeProblem`), never thrown: a cache
   * only saves time.
   */
  async putText(kind: CacheKind, key: string, text: string): Promise<void> {
    if (!this.dir) return;
    const body = Buffer.from(text, 'utf8');
    this.newEntries.add(cacheEntryPath(this.dir, kind, key), Buffer.concat([Buffer.from(`${CACHE_FORMAT} ${kind} ${key} ${sha256Hex(body)}\n`, 'latin1'), body]));
  }

  /** Entries stored and not written yet, by file. */
  private readonly newEntries = new WriteBurst<Buffer>(CACHE_WRITE_BURST, (file, bytes) => {
    try {
      this.writeEntryFile(file, bytes);
    } catch (err) {
      this.noteWriteFailure(err);
    }
  });

  /**
   * Writes every queued entry (through a temporary file and a rename each). Called by the threads that
   * store entries before they finish a piece of work (a worker before it answers a batch; the build
   * before it records its cache use), and whenever the queue is full.
   */
  flushWrites(): void {
    this.newEntries.flush();
  }

  private writeEntryFile(file: string, bytes: Buffer): void {
    const folder = path.dirname(file);
    if (!this.madeDirs.has(folder)) {
      mkdirSync(folder, { recursive: true });
      this.madeDirs.add(folder);
    }
    try {
      writeFileAtomicNoSync(file, bytes);
    } catch (err) {
      // The folder went away during the build (a `cache prune`, a cleanup): make it again, once.
      if ((err as NodeJS.ErrnoException).code !== 'ENOENT') throw err;
      mkdirSync(folder, { recursive: true });
      writeFileAtomicNoSync(file, bytes);
    }
  }
}

/** The payload bytes of an entry whose header and checksum are right, else why the entry is rejected. */
function checkedPayload(bytes: Buffer, kind: CacheKind, key: string): Buffer | string {
  const eol = bytes.indexOf(NEWLINE);
  const header = (eol < 0 ? bytes : bytes.subarray(0, eol)).toString('latin1').split(' ');
  if (eol < 0 || header.length !== 4) return 'no entry header';
  const [format, entryKind, entryKey, checksum] = header as [string, string, string, string];
  if (format !== CACHE_FORMAT) return `foreign format ${JSON.stringify(format.slice(0, 40))}`;
  if (entryKind !== kind) return `entry of kind ${JSON.stringify(entryKind.slice(0, 40))}`;
  if (entryKey !== key) return 'entry holds a different key';
  const payload = bytes.subarray(eol + 1);
  if (sha256Hex(payload) !== checksum) return 'checksum mismatch';
  return payload;
}

/**
 * A payload encoding of its own for one kind of entry (storage/sample-columns.ts): `encode` takes the
 * canonical value and gives the payload text, `decode` gives back the value JSON.parse would give of that
 * value's canonical JSON (throwing on a malformed text).
 */
export interface EntryCodec {
  encode(value: unknown): string;
  decode<T>(text: string): T;
}

async function getDecoded<T>(cache: StageCache, kind: CacheKind, key: string, codec: EntryCodec): Promise<CacheLookup<T>> {
  const r = await cache.getText(kind, key);
  if (r.outcome !== 'hit') return r as CacheLookup<T>;
  try {
    return { outcome: 'hit', value: codec.decode<T>(r.value!) };
  } catch {
    return { outcome: 'corrupt', reason: 'not a valid entry' };
  }
}

/**
 * Cached evaluation: returns the cached payload on a hit, otherwise computes, stores and returns the
 * value in canonical form (`canonicalCopy`: sorted keys, as a parsed entry has them) — a structural copy,
 * not a JSON text round trip. Stage results are plain JSON-safe data (finite numbers, arrays, plain
 * objects), so cold, warm and --no-cache builds give the same bytes (tested). Errors thrown by `compute`
 * propagate (failures are not cached).
 */
export async function cached<T>(
  cache: StageCache,
  kind: CacheKind,
  key: string,
  compute: () => T,
  opts: { orderFree?: boolean; codec?: EntryCodec } = {},
): Promise<{ value: T; outcome: CacheOutcome; reason?: string; ms: number }> {
  const t0 = performance.now();
  const found = opts.codec ? await getDecoded<T>(cache, kind, key, opts.codec) : await cache.get<T>(kind, key);
  if (found.outcome === 'hit') return { value: found.value as T, outcome: 'hit', ms: performance.now() - t0 };
  // `orderFree`: the caller promises that nothing it derives from the value depends on key order or the sign
  // of a zero; then, with nothing to store, the canonical copy can change nothing that is written.
  const computed = compute();
  const value = opts.orderFree === true && cache.dir === undefined ? computed : canonicalCopy(computed);
  // Without a cache (--no-cache) nothing is stored: the entry's text cost ~0.8 ms of JSON.stringify per
  // species (~1.6 s of CPU over both threads for 2,000 synthetic species) for nothing.
  if (cache.dir !== undefined) {
    try {
      // `value` is canonical already, so its plain JSON is its canonical JSON (tested in hash.test.ts):
      // sorting a stage result's keys twice cost about 0.7 ms per species on a build into a cache.
      await cache.putText(kind, key, opts.codec ? opts.codec.encode(value) : JSON.stringify(value));
    } catch (err) {
      // A cache that cannot be written only costs time on the next build; the runner reports it once.
      cache.noteWriteFailure(err);
    }
  }
  const r: { value: T; outcome: CacheOutcome; reason?: string; ms: number } = {
    value,
    outcome: found.outcome,
    ms: performance.now() - t0,
  };
  if (found.reason) r.reason = found.reason;
  return r;
}

/** The default cache folder of a database: `.qforge-cache` inside it, so unrelated builds never share it. */
export function defaultCacheDir(databaseDir: string): string {
  return path.join(path.resolve(databaseDir), CACHE_DIR_NAME);
}
