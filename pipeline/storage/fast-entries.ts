/**
 * The two cache entries of the no-change fast path, and their JSON encoding.
 *
 *   file/<key>    what loading and validating one species file found: its load diagnostics, per document
 *                 the name facts, diagnostics and (when valid) source positions, the settings acceptances
 *                 its warnings used, and a hash of every geometry file it read;
 *   result/<key>  what emitting and summarising one species of that file needs: the 80-column record
 *                 text, the thermo.json record text, the table CSV text, its stage diagnostics, the stage
 *                 cache keys it used and its summary fit metrics.
 *
 * The file key is sha256 over the build context (tool, code fingerprint, constants, canonical settings,
 * strict policy, how paths are shown, options that change per-species outputs; see runner.ts) plus the
 * file's path and the sha256 of its bytes; the result key adds the document's position. So a changed byte,
 * setting or code file addresses another entry (a miss), and a hit needs neither YAML parsing, nor
 * validation, nor re-hashing the normalised input. Geometry files are checked on every hit: they are read
 * again and compared by hash (a changed geometry file is a miss).
 *
 * The payload is JSON in which a non-finite number (a diagnostic can quote one) is written as
 * {"$qforge-number":"NaN"|"Infinity"|"-Infinity"}, so a message reads the same from the cache as when
 * computed. Stored through StageCache.putText/getText (header, checksum of the stored bytes).
 */
import type { Diagnostic } from '../core/diagnostics.js';
import type { NameFact } from '../stages/names.js';
import type { StageCache, CacheLookup } from './cache.js';
import type { Digest } from './hash.js';

export type Position = { line: number; column: number };

/** One species document of a file, as the runner's check needs it after its YAML tree is dropped. */
export interface DocumentFacts extends NameFact {
  /** Validation diagnostics (warning policy applied). */
  diagnostics: Diagnostic[];
  /** Present when the document validated: the species name and the source positions later stages quote. */
  valid?: { name: string; positions: Record<string, Position> };
  /** Only for recovered documents (see load.ts): their YAML-level errors. */
  yamlErrors?: Diagnostic[];
}

export interface FileFacts {
  /** Diagnostics of loading the file (warning policy applied). */
  loadDiagnostics: Diagnostic[];
  documents: DocumentFacts[];
  /** Documents with recoverable YAML errors: checked, never built. */
  recovered: DocumentFacts[];
  /** Indices of the settings' accepted_warnings entries this file's diagnostics used. */
  settingsUsed: number[];
  /** Geometry files read for this file's documents: the name as written, sha256 of what was read. */
  geometry: Array<{ name: string; hash: string }>;
}

/** Digests of the rendered outputs of one built species (what the build pack stores instead of the texts). */
export interface RenderedDigests {
  nasa7?: Digest;
  thermo?: Digest;
  table?: Digest;
}

/** The rendered outputs of one built species (thermo without its list separator). */
export interface RenderedSpecies {
  nasa7?: string;
  thermo?: string;
  table?: string;
}

export interface StoredResult {
  /** Diagnostics of compute, fit, verify and emit (file names as shown). */
  diagnostics: Diagnostic[];
  /** The stage cache entries the species used (`kind/key`), kept by `qforge cache prune`. */
  keys?: string[];
  /** The stage kinds the species went through (reported as hits). */
  stages: Array<'samples' | 'fit' | 'table'>;
  /** Present when the species was built and written. */
  built?: {
    /** The texts (a result entry), or only their digests (a line of the build pack, storage/build-pack.ts). */
    rendered?: RenderedSpecies;
    digests?: RenderedDigests;
    fitMetrics?: { max_abs_cp: number; max_abs_h: number; max_abs_s: number; t_mid: number };
  };
}

const NUMBER_TAG = '$qforge-number';

/** JSON text of a payload, non-finite numbers tagged (see the module comment). */
export function encodeEntry(value: unknown): string {
  return JSON.stringify(value, (_k, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? { [NUMBER_TAG]: String(v) } : v));
}

/** The payload of `encodeEntry` text. */
export function decodeEntry<T>(text: string): T {
  // The tag is rare: only texts that hold it pay for a reviver.
  if (!text.includes(NUMBER_TAG)) return JSON.parse(text) as T;
  return JSON.parse(text, (_k, v: unknown) => {
    if (v !== null && typeof v === 'object' && !Array.isArray(v)) {
      const keys = Object.keys(v);
      if (keys.length === 1 && keys[0] === NUMBER_TAG) return Number((v as Record<string, string>)[NUMBER_TAG]);
    }
    return v;
  }) as T;
}

/** Reads a fast-path entry: a hit, a miss, or a rejected entry (corrupt, with the reason). */
export async function readEntry<T>(cache: StageCache, kind: 'file' | 'result', key: string): Promise<CacheLookup<T>> {
  const r = await cache.getText(kind, key);
  if (r.outcome !== 'hit') return r.reason !== undefined ? { outcome: r.outcome, reason: r.reason } : { outcome: r.outcome };
  try {
    return { outcome: 'hit', value: decodeEntry<T>(r.value!) };
  } catch {
    return { outcome: 'corrupt', reason: 'not valid JSON' };
  }
}

/** Stores a fast-path entry; a failed write is noted on the cache (it only costs time on the next build). */
export async function writeEntry(cache: StageCache, kind: 'file' | 'result', key: string, value: unknown): Promise<void> {
  await writeEntryText(cache, kind, key, encodeEntry(value));
}

/** Stores a fast-path entry of `encodeEntry` text. */
export async function writeEntryText(cache: StageCache, kind: 'file' | 'result', key: string, text: string): Promise<void> {
  try {
    await cache.putText(kind, key, text);
  } catch (e) {
    cache.noteWriteFailure(e);
  }
}
