/**
 * Messages between the build runner and its species workers (node:worker_threads). Everything crossing
 * the thread boundary is plain data (structured clone keeps every double bit for bit), so a species built
 * in a worker is the same value as one built on the main thread.
 */
import type { DatabaseSettings } from '../core/settings.js';
import type { ReadySpecies, SpeciesOutcome, ValidSpecies } from '../runner.js';
import type { BuiltSpecies } from '../stages/emit.js';

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
}

export interface BatchRequest {
  id: number;
  species: ValidSpecies[];
}

/**
 * A SpeciesOutcome as a worker sends it back: without the species it was asked to build (`valid`, and the
 * built species' `species` and `input`, which are that request's own species object and normalised input),
 * since the main thread still holds the request (about a third of a reply's bytes, cloned for nothing).
 * `replyOutcome` makes it, `requestOutcome` puts the request's species back.
 */
export type ReplyOutcome = Omit<SpeciesOutcome, 'valid' | 'built'> & { built?: Omit<BuiltSpecies, 'species' | 'input'> };

export function replyOutcome(o: SpeciesOutcome): ReplyOutcome {
  const { valid: _valid, built, ...rest } = o;
  if (!built) return rest;
  const { species: _species, input: _input, ...own } = built;
  return { ...rest, built: own };
}

/** The outcome of `v` (the request's species) from its reply; what `buildOneSpecies` returned for it. */
export function requestOutcome(r: ReplyOutcome, v: ValidSpecies): SpeciesOutcome {
  const { built, ...rest } = r;
  if (!built) return { valid: v, ...rest };
  const ready = v as ReadySpecies;
  return { valid: v, ...rest, built: { ...built, species: ready.species, input: ready.normalisedInput } };
}

export type WorkerReply =
  | { id: number; outcomes: ReplyOutcome[]; cacheWriteProblem?: string }
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
