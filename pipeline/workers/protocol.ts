/**
 * Messages between the build runner and its species workers (node:worker_threads). Everything crossing
 * the thread boundary is plain data (structured clone keeps every double bit for bit), so a species built
 * in a worker is the same value as one built on the main thread.
 */
import type { DatabaseSettings } from '../core/settings.js';
import type { SpeciesOutcome, ValidSpecies } from '../runner.js';
import type { FileCheck, KeepAs } from '../stages/check-file.js';

/** Where the fit-check limits and the sampling step are set, precomputed (a function cannot be cloned). */
export interface PlainLimitSource {
  settingsFile?: string;
  /** `settingsSetAt` of the keys the per-species stages name, keyed by the dotted path. */
  setAt: Record<string, { line: number; column: number }>;
}

export interface WorkerInit {
  settings: DatabaseSettings;
  limits: PlainLimitSource;
  /** Cache folder, or undefined when the cache is off. */
  cacheDir: string | undefined;
  /** The main thread's code fingerprint (cache keys), see storage/code-fingerprint.ts. */
  codeFingerprint: string;
  /** TEST-ONLY (test/pipeline/workers.test.ts): the worker exits abruptly when it reaches this species. */
  testCrashOn?: string;
  /** Monte Carlo samples of the uncertainty check (build --uncertainty-samples). */
  uncertaintySamples?: number;
  /**
   * Whether the main thread needs each species' computed sample points (only the HTML report draws them).
   * Without it the worker drops them from the reply: they are about 60 % of a reply's bytes, and copying
   * them between threads and holding them until emit costs time and memory for nothing.
   */
  keepSamples?: boolean;
  /** Whether warnings are errors (--strict or the settings' `strict`): the file checks apply it. */
  strict?: boolean;
}

export interface BatchRequest {
  id: number;
  species: ValidSpecies[];
}

/** The check of one species file from its bytes (stages/check-file.ts). */
export interface FileCheckRequest {
  id: number;
  check: { file: string; bytes: Uint8Array; keep: KeepAs };
}

export type WorkRequest = BatchRequest | FileCheckRequest;

export type WorkerReply =
  | { id: number; outcomes: SpeciesOutcome[]; cacheWriteProblem?: string }
  | { id: number; checked: FileCheck }
  | { id: number; error: string };

/**
 * Settings keys whose position the per-species stages quote (stages/limit-origin.ts, the sampling-step
 * check in runner.ts `buildOneSpecies`). A new quoted key must be added here, or workers print "default".
 */
export const LIMIT_KEYS: ReadonlyArray<readonly string[]> = [
  ...(['cp', 'h', 's'] as const).flatMap((q) => [
    ['tolerances', q],
    ['tolerances', 'relative_to_cp', q],
  ]),
  ['fit', 'sampling_step'],
];
