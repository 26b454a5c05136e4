/**
 * The stage cache of incremental builds. One JSON file per entry:
 *   <cache dir>/<kind>/<key[0:2]>/<key>.json
 *   { "format": "qforge-cache/1", "kind", "key", "checksum": sha256(canonical payload), "payload" }
 * The key is a sha256 of everything the stage result depends on (see plan.ts) plus the tool version and
 * the constants edition, so a stale entry is never addressed. An entry is trusted only when it parses, its
 * format, kind and key match the ones asked for, and the checksum of its payload matches; otherwise it is
 * reported as corrupt, recomputed and overwritten. Writes go through a temp file and a rename.
 */
import { mkdir, readFile } from 'node:fs/promises';
import path from 'node:path';
import { describeFsError, writeFileAtomic } from './atomic-write.js';
import { canonicalJson, sha256Hex } from './hash.js';

export const CACHE_FORMAT = 'qforge-cache/1';
/** Name of the cache folder, created next to the output folder. */
export const CACHE_DIR_NAME = '.qforge-cache';

export type CacheKind = 'samples' | 'fit' | 'table';
export type CacheOutcome = 'hit' | 'miss' | 'corrupt' | 'off';

/** JSON round trip: fresh and cached values go through it alike, so both give identical outputs. */
export function jsonRoundTrip<T>(value: T): T {
  return JSON.parse(canonicalJson(value)) as T;
}

export interface CacheLookup<T> {
  outcome: CacheOutcome;
  value?: T;
  /** Why an entry was rejected (outcome 'corrupt'). */
  reason?: string;
}

export class StageCache {
  /**
   * Why the cache could not be written (the first failure of this build), e.g.
   * "mkdir '/x/.qforge-cache': EACCES (permission denied)"; undefined while every write succeeded.
   * The build goes on (a cache only saves time) but reports it, so a cache that never fills is not silent.
   */
  writeProblem: string | undefined;

  /** `dir` undefined disables the cache (every lookup is 'off', nothing is written). */
  constructor(readonly dir: string | undefined) {}

  /** Records a failed write (once per build). */
  noteWriteFailure(err: unknown): void {
    this.writeProblem ??= describeFsError(err) ?? (err instanceof Error ? err.message : String(err));
  }

  private entryPath(kind: CacheKind, key: string): string {
    if (!/^[0-9a-f]{64}$/.test(key)) throw new Error(`cache key must be a sha256 hex digest, got ${key}`);
    return path.join(this.dir as string, kind, key.slice(0, 2), `${key}.json`);
  }

  async get<T>(kind: CacheKind, key: string): Promise<CacheLookup<T>> {
    if (!this.dir) return { outcome: 'off' };
    const file = this.entryPath(kind, key);
    let text: string;
    try {
      text = await readFile(file, 'utf8');
    } catch {
      return { outcome: 'miss' };
    }
    let entry: unknown;
    try {
      entry = JSON.parse(text);
    } catch {
      return { outcome: 'corrupt', reason: 'not valid JSON' };
    }
    if (!entry || typeof entry !== 'object') return { outcome: 'corrupt', reason: 'not an object' };
    const e = entry as Record<string, unknown>;
    if (e.format !== CACHE_FORMAT) return { outcome: 'corrupt', reason: `foreign format ${JSON.stringify(e.format)}` };
    if (e.kind !== kind) return { outcome: 'corrupt', reason: `entry of kind ${JSON.stringify(e.kind)}` };
    if (e.key !== key) return { outcome: 'corrupt', reason: 'entry holds a different key' };
    if (!('payload' in e) || sha256Hex(canonicalJson(e.payload)) !== e.checksum) {
      return { outcome: 'corrupt', reason: 'checksum mismatch' };
    }
    return { outcome: 'hit', value: e.payload as T };
  }

  async put(kind: CacheKind, key: string, payload: unknown): Promise<void> {
    if (!this.dir) return;
    const file = this.entryPath(kind, key);
    await mkdir(path.dirname(file), { recursive: true });
    const body = canonicalJson(payload);
    const text = `{"format":${JSON.stringify(CACHE_FORMAT)},"kind":${JSON.stringify(kind)},"key":${JSON.stringify(key)},"checksum":${JSON.stringify(sha256Hex(body))},"payload":${body}}\n`;
    await writeFileAtomic(file, text);
  }
}

/**
 * Cached evaluation: returns the cached payload on a hit, otherwise computes, stores and returns the
 * JSON round-tripped value. Errors thrown by `compute` propagate (failures are not cached).
 */
export async function cached<T>(
  cache: StageCache,
  kind: CacheKind,
  key: string,
  compute: () => T,
): Promise<{ value: T; outcome: CacheOutcome; reason?: string; ms: number }> {
  const t0 = performance.now();
  const found = await cache.get<T>(kind, key);
  if (found.outcome === 'hit') return { value: found.value as T, outcome: 'hit', ms: performance.now() - t0 };
  const value = jsonRoundTrip(compute());
  try {
    await cache.put(kind, key, value);
  } catch (err) {
    // A cache that cannot be written only costs time on the next build; the runner reports it once.
    cache.noteWriteFailure(err);
  }
  const r: { value: T; outcome: CacheOutcome; reason?: string; ms: number } = {
    value,
    outcome: found.outcome,
    ms: performance.now() - t0,
  };
  if (found.reason) r.reason = found.reason;
  return r;
}
