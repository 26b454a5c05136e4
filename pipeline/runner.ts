/**
 * The build runner: composes the stages load → validate → compute → fit → verify → emit for a database
 * folder and returns a report; it never prints and never exits (the CLI does both).
 *
 * Concurrency: file loading and the per-species stages run under p-limit(jobs). The per-species work is a
 * pure function of the species and its plan (no shared mutable state); results are collected into a map
 * and emitted in name order, so the outputs do not depend on `jobs` or on the order of completion.
 */
import { stat } from 'node:fs/promises';
import path from 'node:path';
import { recordedReferenceFiles } from './core/recorded-references.js';
import pLimit from 'p-limit';
import type { Species, StandardProperties } from '../src/model.js';
import { Nasa7FormatError } from '../src/nasa7/errors.js';
import type { FitOptions, FitResult } from '../src/nasa7/types.js';
import { acquireOutputLock, OutputStaging, recoverOutputDir, type PublishHooks } from './storage/atomic-write.js';
import { cached, cacheEntryPath, defaultCacheDir, StageCache, type CacheKind, type CacheOutcome } from './storage/cache.js';
import { recordCacheUse } from './storage/cache-uses.js';
import { shardLabel, shardOf, shardRecord, type Shard } from './core/shard.js';
import { StreamingEmitter } from './stages/emit-stream.js';
import { batchesOf, createSpeciesPool } from './workers/pool.js';
import { LIMIT_KEYS, type PlainLimitSource } from './workers/protocol.js';
import { computeSamples, computeTable, type ComputedSpecies } from './stages/compute.js';
import { compareDiagnostics, formatDiagnostic, hasErrors, type Diagnostic } from './core/diagnostics.js';
import { byName, jsonText, validateSummaryJson, type BuiltSpecies } from './stages/emit.js';
import { fitOptionsFor, fitSpecies } from './stages/fit.js';
import { canonicalJson, hashParts, sha256Hex } from './storage/hash.js';
import { discoverSpeciesFiles, loadYamlFile, type LoadedDocument } from './stages/load.js';
import { planSpecies, type SpeciesPlan } from './core/plan.js';
import { checkSpeciesSampling, loadSettings, type DatabaseSettings, type FitTolerancesSetting } from './core/settings.js';
import { checkUniqueNames, validateSpecies } from './stages/validate.js';
import { classicalCpFloor, verifySpecies } from './stages/verify.js';
import { computeUncertainty } from './stages/uncertainty.js';
import { fitLimitOrigin, toleranceKeyPositions } from './stages/limit-origin.js';
import { codeFingerprint } from './storage/code-fingerprint.js';
import { createWarningPolicy } from './core/strict.js';
import { partialMark } from './stages/partial.js';
import { CONSTANTS_EDITION, TOOL_NAME, TOOL_VERSION } from './core/version.js';
import { displayPath } from './core/display-path.js';
import { compareText, errorText } from './core/text.js';
import { ReportWriter, type ReportRequest } from './report/build-report.js';

export type StageName = 'load' | 'validate' | 'compute' | 'fit' | 'verify' | 'emit';

export type ProgressEvent =
  | { kind: 'stage'; stage: StageName; detail?: string }
  | { kind: 'species-start'; total: number }
  | { kind: 'species-done'; name: string; ok: boolean; cacheHit: boolean; done: number; total: number }
  | { kind: 'note'; message: string };

export interface CheckOptions {
  /** Database folder. */
  dir: string;
  /** Diagnostics name files relative to this folder (the user's working folder). Default: as found. */
  displayBase?: string;
  /** Concurrency of file loading (default 8). */
  jobs?: number;
  /** Warnings are errors (also `strict: true` in the settings); see core/strict.ts. */
  strict?: boolean;
}

export interface BuildOptions extends CheckOptions {
  out: string;
  /** Cache folder; null disables the cache. Default: `.qforge-cache` inside the database folder. */
  cacheDir?: string | null;
  keepGoing?: boolean;
  /** Build only the species of this shard (see core/shard.ts). */
  shard?: Shard;
  onProgress?: (e: ProgressEvent) => void;
  hooks?: PublishHooks;
  /** Write report.html (also when the settings' outputs.report is true); see pipeline/report/. */
  report?: ReportRequest;
  /** Monte Carlo samples of the uncertainty check per species (none: linear propagation only). */
  uncertaintySamples?: number;
  /**
   * Worker threads for compute, fit and verify when `jobs` is not given: at most this many, and no more
   * than one per SPECIES_PER_THREAD species to build (see autoThreads). Default 1.
   */
  maxThreads?: number;
}

/** One species document that passed validation. */
export interface ValidSpecies {
  name: string;
  /** Species file relative to the database folder (written into thermo.json). */
  file: string;
  /** Species file as shown in messages. */
  displayFile: string;
  species: Species;
  normalisedInput: unknown;
  /** Source positions for diagnostics of later stages: the species' `name` and `temperature_ranges`. */
  positions: Partial<Record<'name' | 'composition' | 'temperature_ranges' | `tolerances.${string}`, { line: number; column: number }>>;
  loadMs: number;
  validateMs: number;
}

/** A species document that failed validation (or lost a duplicate-name clash): listed as failed. */
export interface InvalidDocument {
  /** The document's `name`, when it has a string one. */
  name?: string;
  /** Species file relative to the database folder. */
  file: string;
  /** Species file as shown in messages. */
  displayFile: string;
  /** 1-based position of the species within its file. */
  document: number;
  diagnostics: Diagnostic[];
}

export interface CheckReport {
  settings: DatabaseSettings;
  settingsOk: boolean;
  /** Settings file as shown in messages; undefined when the database has none (all defaults). */
  settingsFile?: string;
  /** Where the settings file sets exactly this field (see SettingsResult.setAt). */
  settingsSetAt?: (segments: Array<string | number>) => { line: number; column: number } | undefined;
  /** Species documents that failed validation, in file order. */
  invalid: InvalidDocument[];
  files: string[];
  species: ValidSpecies[];
  /** All diagnostics (settings, files, species), sorted. */
  diagnostics: Diagnostic[];
  /** Diagnostics per file, for the summary. */
  fileDiagnostics: Map<string, Diagnostic[]>;
  /** Files in which at least one species document failed validation or the file itself failed. */
  failedFiles: Set<string>;
  timings: { load: number; validate: number };
}

function positionsOf(doc: LoadedDocument): ValidSpecies['positions'] {
  const out: ValidSpecies['positions'] = {};
  for (const key of ['name', 'composition'] as const) {
    const p = doc.locate([key]);
    if (p) out[key] = { line: p.line, column: p.column };
  }
  const v = doc.value as Record<string, unknown> | null;
  if (v && typeof v === 'object' && 'temperature_ranges' in v) {
    const tr = doc.locate(['temperature_ranges']);
    if (tr) out.temperature_ranges = { line: tr.line, column: tr.column };
  }
  Object.assign(out, toleranceKeyPositions(doc));
  return out;
}

/** Load and validate a database folder: every problem of every file at once. */
/**
 * Starting a worker thread (loading the compiled modules, warming up) costs about as much as building a
 * dozen small species, so a thread only pays for itself with enough species to share; below that the main
 * thread is faster. Outputs never depend on the thread count (tested), only the time does.
 */
export const SPECIES_PER_THREAD = 16;

export function autoThreads(speciesToBuild: number, maxThreads: number): number {
  return Math.max(1, Math.min(maxThreads, Math.floor(speciesToBuild / SPECIES_PER_THREAD)));
}

export async function checkDatabase(opts: CheckOptions): Promise<CheckReport> {
  const dir = opts.dir;
  const limit = pLimit(Math.max(1, opts.jobs ?? 8));
  const t0 = performance.now();
  const settingsResult = await loadSettings(dir, dir);
  const discovered = await discoverSpeciesFiles(dir);
  const policy = createWarningPolicy({
    strict: opts.strict === true || settingsResult.settings.strict,
    accepted: settingsResult.settings.accepted_warnings,
    ...(settingsResult.file !== undefined ? { settingsFile: settingsResult.file } : {}),
    ...(settingsResult.locate ? { settingsLocate: settingsResult.locate } : {}),
  });
  discovered.diagnostics = policy.applyOther(discovered.diagnostics);
  settingsResult.diagnostics = policy.applyOther(settingsResult.diagnostics);
  const validateWithPolicy = (doc: LoadedDocument) => {
    const r = validateSpecies(doc);
    const name = doc.value && typeof doc.value === 'object' ? (doc.value as { name?: unknown }).name : undefined;
    r.diagnostics = policy.applySpecies(r.diagnostics, {
      raw: doc.value,
      file: doc.file,
      ...(typeof name === 'string' ? { name } : {}),
      locate: (at) => doc.locate(at),
    });
    return r;
  };
  const diagnostics: Diagnostic[] = [...settingsResult.diagnostics, ...discovered.diagnostics];
  const fileDiagnostics = new Map<string, Diagnostic[]>();
  const failedFiles = new Set<string>();
  const addFileDiag = (d: Diagnostic) => {
    const list = fileDiagnostics.get(d.file) ?? [];
    list.push(d);
    fileDiagnostics.set(d.file, list);
    if (d.severity === 'error') failedFiles.add(d.file);
  };
  discovered.diagnostics.forEach(addFileDiag);

  const displayOf = (f: string) => (path.relative(dir, f) || f).split(path.sep).join('/');
  const show = (f: string) => (opts.displayBase && path.isAbsolute(f) ? displayPath(opts.displayBase, f) : f);
  let validateTotal = 0;
  const perFile = await Promise.all(
    discovered.files.map((f) =>
      limit(async () => {
        const tl = performance.now();
        const loaded = await loadYamlFile(f, f);
        loaded.diagnostics = policy.applyOther(loaded.diagnostics);
        const loadMs = performance.now() - tl;
        const results = loaded.documents.map((doc: LoadedDocument) => {
          const tv = performance.now();
          const r = validateWithPolicy(doc);
          const ms = performance.now() - tv;
          validateTotal += ms;
          return { doc, r, ms };
        });
        // Documents with only a duplicate key or an unknown tag are checked too, so the user sees every
        // error of the file in one run; they are never built (one of their values is a guess).
        const recovered = (loaded.recoveredDocuments ?? []).map((doc: LoadedDocument) => ({
          doc,
          diagnostics: validateWithPolicy(doc).diagnostics,
        }));
        return { file: f, loaded, results, recovered, loadMs };
      }),
    ),
  );
  const tLoad = performance.now() - t0 - validateTotal;

  const valid: Array<{ doc: LoadedDocument; v: ValidSpecies }> = [];
  const invalid: Array<{ doc: LoadedDocument; entry: InvalidDocument }> = [];
  const nameOf = (doc: LoadedDocument): string | undefined => {
    const n = doc.value && typeof doc.value === 'object' ? (doc.value as { name?: unknown }).name : undefined;
    return typeof n === 'string' && n !== '' ? n : undefined;
  };
  const invalidEntry = (doc: LoadedDocument, file: string, ds: Diagnostic[]): InvalidDocument => {
    const e: InvalidDocument = { file: displayOf(file), displayFile: show(file), document: doc.index + 1, diagnostics: ds };
    const n = nameOf(doc);
    if (n !== undefined) e.name = n;
    return e;
  };
  for (const { file, loaded, results, recovered, loadMs } of perFile) {
    loaded.diagnostics.forEach(addFileDiag);
    diagnostics.push(...loaded.diagnostics);
    for (const { doc, diagnostics: ds } of recovered) {
      diagnostics.push(...ds);
      ds.forEach(addFileDiag);
      // It failed for its own YAML errors plus whatever validation found.
      invalid.push({ doc, entry: invalidEntry(doc, file, [...(doc.yamlErrors ?? []), ...ds]) });
    }
    if (loaded.documents.length === 0 && !hasErrors(loaded.diagnostics)) {
      for (const d of policy.applyOther([{ severity: 'warning', code: 'file-holds-no-species', file, path: '', message: 'file holds no species' }])) {
        diagnostics.push(d);
        addFileDiag(d);
      }
    }
    const n = Math.max(1, results.length);
    for (const { doc, r, ms: vms } of results) {
      diagnostics.push(...r.diagnostics);
      r.diagnostics.forEach(addFileDiag);
      if (r.species && !hasErrors(r.diagnostics)) {
        valid.push({
          doc,
          v: {
            name: r.species.name,
            file: displayOf(file),
            displayFile: show(file),
            species: r.species,
            normalisedInput: r.normalisedInput ?? r.species,
            positions: positionsOf(doc),
            loadMs: loadMs / n,
            validateMs: vms,
          },
        });
      } else {
        invalid.push({ doc, entry: invalidEntry(doc, file, [...r.diagnostics]) });
      }
    }
  }
  // Names must be unique across the database: the later duplicates fail (validate.ts names the first use).
  const dup = policy.applyOther(checkUniqueNames(perFile.flatMap((p) => [...p.results.map((x) => x.doc), ...p.recovered.map((x) => x.doc)])));
  diagnostics.push(...dup);
  dup.forEach(addFileDiag);
  const isDuplicate = (doc: LoadedDocument, name: string) =>
    dup.some((d) => d.severity === 'error' && d.file === doc.file && d.species === name && doc.locate(['name'])?.line === d.line);
  const species: ValidSpecies[] = [];
  for (const { doc, v } of valid) {
    if (!isDuplicate(doc, v.name)) species.push(v);
    else {
      const ds = dup.filter((d) => d.file === doc.file && d.species === v.name && doc.locate(['name'])?.line === d.line);
      invalid.push({ doc, entry: invalidEntry(doc, doc.file, ds) });
    }
  }
  for (const { doc, entry } of invalid) {
    if (entry.name === undefined) continue;
    // A duplicate of an invalid document is reported with that document too.
    for (const d of dup) {
      if (d.file === doc.file && d.species === entry.name && doc.locate(['name'])?.line === d.line && !entry.diagnostics.includes(d)) {
        entry.diagnostics.push(d);
      }
    }
  }
  if (discovered.files.length === 0 && !hasErrors(discovered.diagnostics)) {
    diagnostics.push({
      severity: 'error',
      code: 'no-species-files',
      file: dir,
      path: '',
      message: 'no species files (*.yaml, *.yml) in the database folder',
      expected: 'at least one species file',
    });
  }
  diagnostics.push(...policy.staleSettingsEntries());
  species.sort(byName);
  for (const d of diagnostics) d.file = show(d.file);
  diagnostics.sort(compareDiagnostics);
  const invalidDocs = invalid
    .map(({ entry }) => entry)
    .sort((a, b) => compareText(a.file, b.file) || a.document - b.document);
  for (const e of invalidDocs) e.diagnostics.sort(compareDiagnostics);
  const report: CheckReport = {
    settings: settingsResult.settings,
    settingsOk: !hasErrors(settingsResult.diagnostics),
    invalid: invalidDocs,
    files: discovered.files,
    species,
    diagnostics,
    fileDiagnostics,
    failedFiles,
    timings: { load: tLoad, validate: validateTotal },
  };
  if (settingsResult.file !== undefined) report.settingsFile = show(settingsResult.file);
  if (settingsResult.setAt) report.settingsSetAt = settingsResult.setAt;
  return report;
}

// ---------------------------------------------------------------------------------------------------------

export interface SpeciesOutcome {
  valid: ValidSpecies;
  built?: BuiltSpecies;
  diagnostics: Diagnostic[];
  cache: Partial<Record<CacheKind, CacheOutcome>>;
  cacheNotes: string[];
  timings: Record<string, number>;
  /** Cache entries this species uses (`kind/key`), for `qforge cache prune`. */
  keys?: string[];
}

/** Cache keys of one species' stages; see plan.ts for what each depends on. */
export function stageKeys(inputHash: string, species: Species, plan: SpeciesPlan, fitOptions: FitOptions) {
  const base = [TOOL_NAME, TOOL_VERSION, codeFingerprint(), CONSTANTS_EDITION, inputHash, species, plan.physics];
  const samples = hashParts('samples', ...base, plan.sampleTemperatures, plan.zoneTemperatures);
  return {
    samples,
    fit: hashParts('fit', TOOL_NAME, TOOL_VERSION, codeFingerprint(), samples, fitOptions),
    table: hashParts('table', ...base, plan.tableTemperatures),
  };
}


/** `kind/key` of the entries a species uses. */
function keyList(keys: ReturnType<typeof stageKeys>, settings: DatabaseSettings): string[] {
  return [`samples/${keys.samples}`, `fit/${keys.fit}`, ...(settings.outputs.tables ? [`table/${keys.table}`] : [])];
}

/** `kind/key` of the cache entries one species uses; undefined when it fails before using the cache. */
export function speciesCacheKeys(v: ValidSpecies, settings: DatabaseSettings): string[] | undefined {
  const plan = planSpecies(v.species, settings);
  let fitOptions: FitOptions;
  try {
    fitOptions = fitOptionsFor(plan.fitOptions);
  } catch {
    return undefined;
  }
  const inputHash = `sha256:${sha256Hex(canonicalJson(v.normalisedInput))}`;
  return keyList(stageKeys(inputHash, v.species, plan, fitOptions), settings);
}

/** The cache entries the current species of a checked database use (what `qforge cache prune` keeps). */
export function currentCacheKeys(check: CheckReport): string[] {
  return check.species.flatMap((v) => speciesCacheKeys(v, check.settings) ?? []);
}

/** Whether every stage result of every species of a batch is in the cache (then no worker is needed). */
async function allCached(cacheDir: string | undefined, batch: readonly ValidSpecies[], settings: DatabaseSettings): Promise<boolean> {
  if (cacheDir === undefined) return false;
  for (const v of batch) {
    const keys = speciesCacheKeys(v, settings);
    if (!keys) return false;
    for (const k of keys) {
      const [kind, key] = k.split('/') as [CacheKind, string];
      if (!(await stat(cacheEntryPath(cacheDir, kind, key)).then(() => true, () => false))) return false;
    }
  }
  return true;
}

/** Where a fit check's limit came from, for the message: the settings file (file:line) or a default. */
export interface LimitSource {
  settingsFile?: string;
  settingsSetAt?: (segments: Array<string | number>) => { line: number; column: number } | undefined;
}

/**
 * A fit-check diagnostic located at the species (not at an invented field), its message extended by the
 * settings key that set the limit: "… exceeds the tolerance 1e-06 by …; limit set by tolerances.cp in
 * db/qforge.yaml:11:17".
 */
export function locateFitViolation(d: Diagnostic, tolerances: FitTolerancesSetting, source: LimitSource, species?: ValidSpecies): Diagnostic {
  return { ...d, path: '', message: `fit check: ${d.message}; ${fitLimitOrigin(d.path, tolerances, source, species)}` };
}

/** compute → fit → verify (and the table points) of one species, through the cache. */
export async function buildOneSpecies(
  v: ValidSpecies,
  settings: DatabaseSettings,
  cache: StageCache,
  limitSource: LimitSource = {},
  extra: { uncertaintySamples?: number } = {},
): Promise<SpeciesOutcome> {
  const out: SpeciesOutcome = {
    valid: v,
    diagnostics: [],
    cache: {},
    cacheNotes: [],
    timings: { load: v.loadMs, validate: v.validateMs },
  };
  const where = { file: v.displayFile, species: v.name, ...(v.positions.name ?? {}) };
  const fail = (code: string, pathText: string, message: string) => {
    const pos = (pathText === 'temperature_ranges' ? v.positions.temperature_ranges : undefined) ?? v.positions.name;
    out.diagnostics.push({ severity: 'error', code, ...where, ...(pos ?? {}), path: pathText, message });
  };
  const note = (kind: CacheKind, r: { outcome: CacheOutcome; reason?: string }) => {
    out.cache[kind] = r.outcome;
    if (r.outcome === 'corrupt') out.cacheNotes.push(`cache entry for ${kind} rejected (${r.reason}); recomputed`);
  };

  const plan = planSpecies(v.species, settings);
  // A species' own ranges can be too narrow for the database's sampling step: say so, naming both settings,
  // rather than letting the fit fail with a message about sample counts.
  if (v.species.temperatureRanges) {
    const stepSetAt = limitSource.settingsSetAt?.(['fit', 'sampling_step']);
    const coarse = checkSpeciesSampling({
      ranges: plan.ranges,
      settings,
      file: v.displayFile,
      species: v.name,
      ...(v.positions.temperature_ranges ?? v.positions.name ?? {}),
      ...(limitSource.settingsFile ? { settingsFile: limitSource.settingsFile } : {}),
      ...(stepSetAt ? { stepSetAt } : {}),
    });
    if (coarse) {
      out.diagnostics.push(coarse);
      return out;
    }
  }
  let fitOptions: FitOptions;
  try {
    fitOptions = fitOptionsFor(plan.fitOptions);
  } catch (e) {
    fail('fit-options', v.species.temperatureRanges ? 'temperature_ranges' : '', `fit options: ${errorText(e)}`);
    return out;
  }
  const inputHash = `sha256:${sha256Hex(canonicalJson(v.normalisedInput))}`;
  const keys = stageKeys(inputHash, v.species, plan, fitOptions);
  out.keys = keyList(keys, settings);

  // One cached stage: its result, or undefined after recording the failure (the species stops there).
  const stage = async <T>(
    kind: CacheKind,
    key: string,
    run: () => T,
    failPath: string,
    what: string,
  ): Promise<T | undefined> => {
    try {
      const r = await cached(cache, kind, key, run);
      note(kind, r);
      out.timings[kind === 'samples' ? 'compute' : kind] = r.ms;
      return r.value;
    } catch (e) {
      fail(kind === 'samples' ? 'compute-failed' : `${kind}-failed`, failPath, `${what} failed: ${errorText(e)}`);
      return undefined;
    }
  };

  const computed = await stage(
    'samples',
    keys.samples,
    () => computeSamples(v.species, plan.physics, plan.sampleTemperatures, plan.zoneTemperatures),
    '',
    'computing the properties',
  );
  if (!computed) return out;
  const fit = await stage('fit', keys.fit, () => fitSpecies(computed, fitOptions), 'fit', 'the fit');
  if (!fit) return out;

  const tv = performance.now();
  const violations = verifySpecies(fit, computed.samples, plan.tolerances, fitOptions.continuityOrder, classicalCpFloor(v.species.structure), where, computed.extrapolationSamples);
  out.timings.verify = performance.now() - tv;
  if (violations.length) {
    out.diagnostics.push(...violations.map((d) => locateFitViolation(d, plan.tolerances, limitSource, v)));
    return out;
  }

  let table: StandardProperties[] = [];
  if (settings.outputs.tables) {
    const rows = await stage(
      'table',
      keys.table,
      () => computeTable(v.species, plan.physics, plan.tableTemperatures),
      '',
      'computing the table',
    );
    if (!rows) return out;
    table = rows;
  }
  out.built = { name: v.name, file: v.file, species: v.species, inputHash, input: v.normalisedInput, computed, fit, table };
  const tu = performance.now();
  try {
    out.built.uncertainty = computeUncertainty(v.species, plan.physics, plan.ranges, extra.uncertaintySamples);
  } catch (e) {
    out.diagnostics.push({ severity: 'warning', code: 'uncertainty-failed', ...where, path: 'uncertainties', message: `uncertainty propagation failed: ${errorText(e)}` });
  }
  out.timings.uncertainty = performance.now() - tu;
  return out;
}

// ---------------------------------------------------------------------------------------------------------

export interface BuildReport {
  exitCode: 0 | 1;
  written: boolean;
  /** Whether a previous OUT was replaced (it is replaced as a whole). */
  replaced: boolean;
  /** Why nothing was written although the settings were valid and --keep-going was given. */
  notWrittenReason?: string;
  summary: Summary;
  diagnostics: Diagnostic[];
  notes: string[];
  /** Build-level warnings for the terminal: an unwritable cache, rejected cache entries (one per species). */
  warnings: string[];
  /** Names of the failed species (or `file#document` when a document has no name), in summary order. */
  failed: string[];
  /** Settings file as shown in messages (undefined: the database has none). */
  settingsFile?: string;
}

export type Summary = Record<string, unknown> & {
  status: 'ok' | 'failed' | 'partial';
  written: boolean;
  species: SummarySpecies[];
};

interface SummarySpecies {
  /** Absent only for a document without a usable name (then `document` tells which one it is). */
  name?: string;
  file: string;
  /** 1-based position within the file; given for species that failed validation. */
  document?: number;
  status: 'ok' | 'failed';
  warnings: string[];
  errors: string[];
  cache: Partial<Record<CacheKind, CacheOutcome>>;
  cache_hit: boolean;
  fit_metrics?: { max_abs_cp: number; max_abs_h: number; max_abs_s: number; t_mid: number };
  timings_ms: Record<string, number>;
}

const ms = (x: number) => Math.round(x * 1000) / 1000;

/** Runs a whole build. Writes OUT only when the build may be published (see the module comment of cli). */
export async function runBuild(opts: BuildOptions): Promise<BuildReport> {
  const release = await acquireOutputLock(opts.out);
  try {
    return await runLockedBuild(opts);
  } finally {
    await release();
  }
}

async function runLockedBuild(opts: BuildOptions): Promise<BuildReport> {
  const t0 = performance.now();
  const progress = opts.onProgress ?? (() => {});
  const notes = await recoverOutputDir(opts.out);
  for (const n of notes) progress({ kind: 'note', message: n });

  progress({ kind: 'stage', stage: 'load' });
  const check = await checkDatabase(opts);
  const settings = check.settings;
  // A shard builds the species (and reports the invalid documents) whose name hashes into it.
  const shard = opts.shard;
  const inShard = (key: string) => !shard || shardOf(key, shard.count) === shard.index;
  const shardSpecies = check.species.filter((v) => inShard(v.name));
  const shardInvalid = check.invalid.filter((inv) => inShard(inv.name ?? `${inv.file}#${inv.document}`));
  const checkDiagnostics = shard ? check.diagnostics.filter((d) => d.species === undefined || inShard(d.species)) : check.diagnostics;
  progress({
    kind: 'stage',
    stage: 'validate',
    detail: `${check.species.length} species in ${check.files.length} files${shard ? `; shard ${shardLabel(shard)}: ${shardSpecies.length} species` : ''}`,
  });
  const cacheDir = opts.cacheDir === null ? undefined : (opts.cacheDir ?? defaultCacheDir(opts.dir));
  const cache = new StageCache(cacheDir);
  // Opened before the species run so that a missing --report-against build fails at once.
  const reportWriter =
    check.settingsOk && (opts.report || settings.outputs.report) ? await ReportWriter.open(opts.report ?? {}, settings, opts.dir, opts.displayBase) : undefined;

  const total = shardSpecies.length;
  const jobs = opts.jobs !== undefined ? Math.max(1, opts.jobs) : autoThreads(total, opts.maxThreads ?? 1);
  let done = 0;
  const tStages = performance.now();
  let emitMs = 0;

  // Per-species summary entries are made as the species are emitted; nothing else of a species is kept.
  const ownDiagnostics = new Map<string, Diagnostic[]>();
  const speciesKey = (file: string, name: string) => `${file}\u0000${name}`;
  for (const ds of check.fileDiagnostics.values()) {
    for (const d of ds) {
      if (d.species === undefined) continue;
      const k = speciesKey(d.file, d.species);
      const list = ownDiagnostics.get(k);
      if (list) list.push(d);
      else ownDiagnostics.set(k, [d]);
    }
  }
  const summarySpecies: SummarySpecies[] = [];
  const speciesDiagnostics: Diagnostic[] = [];
  const warnings: string[] = [];
  let processed = 0;
  let failedCount = 0;
  const usedKeys: string[] = [];

  const canWrite = check.settingsOk && check.files.length > 0;
  const staging = canWrite && total > 0 ? await OutputStaging.open(opts.out) : undefined;
  let published = false;
  const pool = createSpeciesPool({
    jobs,
    init: {
      settings,
      limits: plainLimits(check),
      cacheDir,
      codeFingerprint: codeFingerprint(),
      ...(opts.uncertaintySamples !== undefined ? { uncertaintySamples: opts.uncertaintySamples } : {}),
    },
    inline: (v) => buildOneSpecies(v, settings, cache, check, opts.uncertaintySamples !== undefined ? { uncertaintySamples: opts.uncertaintySamples } : {}),
    cheap: (batch) => allCached(cacheDir, batch, settings),
    crashed: (v, reason) => ({
      valid: v,
      diagnostics: [
        {
          severity: 'error',
          file: v.displayFile,
          species: v.name,
          ...(v.positions.name ?? {}),
          path: '',
          message: `internal error: ${reason} while building this species' batch; it was not built`,
        },
      ],
      cache: {},
      cacheNotes: [],
      timings: { load: v.loadMs, validate: v.validateMs },
    }),
  });
  let emitter: StreamingEmitter | undefined;
  try {
    emitter = staging ? await StreamingEmitter.open(staging, settings) : undefined;

    // In name order: emit (a record the 80-column layout cannot hold fails its species), then summarise.
    const sink = async (o: SpeciesOutcome): Promise<void> => {
      const te = performance.now();
      let tableMs = 0;
      if (o.built && emitter) {
        try {
          tableMs = await emitter.add(o.built);
        } catch (e) {
          if (!(e instanceof Nasa7FormatError) || e.record !== o.valid.name) throw e;
          o.diagnostics.push({
            severity: 'error',
            code: 'record-not-writable',
            file: o.valid.displayFile,
            species: o.valid.name,
            ...((e.field.startsWith('elements') ? o.valid.positions.composition : o.valid.positions.name) ?? {}),
            path: e.field.startsWith('elements') ? 'composition' : e.field,
            message: `cannot be written as an 80-column record: ${e.message}`,
          });
          delete o.built;
        }
      }
      emitMs += performance.now() - te;
      processed++;
      if (!o.built) failedCount++;
      if (o.keys) usedKeys.push(...o.keys);
      speciesDiagnostics.push(...o.diagnostics);
      for (const n of o.cacheNotes) warnings.push(`${o.valid.name}: ${n}`);
      const s = summaryEntry(o, ownDiagnostics.get(speciesKey(o.valid.displayFile, o.valid.name)) ?? [], tableMs);
      summarySpecies.push(s);
      reportWriter?.add({
        name: o.valid.name,
        file: o.valid.file,
        status: s.status,
        species: o.valid.species,
        ...(o.built ? { computed: o.built.computed, fit: o.built.fit } : {}),
        ...(o.built?.uncertainty ? { uncertainty: o.built.uncertainty } : {}),
        warnings: s.warnings,
        errors: s.errors,
        cacheHit: s.cache_hit,
      });
    };

    if (check.settingsOk) {
      progress({ kind: 'stage', stage: 'compute', detail: `compute, fit and verify per species (${jobs} ${jobs === 1 ? 'thread' : 'threads'})` });
      progress({ kind: 'species-start', total });
      // Batches go out in name order and are consumed in that order; at most `window` are in flight.
      const batches = batchesOf(shardSpecies, jobs);
      const window = Math.max(2, jobs * 2);
      const inflight: Array<Promise<SpeciesOutcome[]>> = [];
      const consume = async () => {
        for (const o of await inflight.shift()!) await sink(o);
      };
      for (const batch of batches) {
        inflight.push(
          pool.run(batch).then((outs) => {
            for (const o of outs) {
              done++;
              progress({ kind: 'species-done', name: o.valid.name, ok: !!o.built, cacheHit: isCacheHit(o), done, total });
            }
            return outs;
          }),
        );
        if (inflight.length >= window) await consume();
      }
      while (inflight.length > 0) await consume();
    }
    await pool.close();
    if (pool.cacheWriteProblem !== undefined) cache.writeProblem ??= pool.cacheWriteProblem;
    const stagesMs = performance.now() - tStages - emitMs;

    progress({ kind: 'stage', stage: 'emit' });
    const tEmit = performance.now();
    const good = processed - failedCount;
    const allDiagnostics = [...checkDiagnostics, ...speciesDiagnostics].sort(compareDiagnostics);
    // Nothing good to publish: never replace a previous database with an empty one (also not with
    // --keep-going). An empty shard (no species hashed into it) is written, so that merge finds it.
    const emptyShard = shard !== undefined && total === 0 && shardInvalid.length === 0;
    let notWrittenReason: string | undefined;
    if (canWrite && good === 0 && !emptyShard) {
      if (opts.keepGoing) notWrittenReason = 'no species succeeded, so --keep-going wrote nothing';
      if (!hasErrors(allDiagnostics)) {
        allDiagnostics.push({
          severity: 'error',
          code: 'database-empty',
          file: opts.displayBase ? displayPath(opts.displayBase, opts.dir) : opts.dir,
          path: '',
          message: 'the database holds no species',
          expected: 'at least one species document',
        });
      }
    }
    allDiagnostics.sort(compareDiagnostics);
    const anyError = !check.settingsOk || hasErrors(allDiagnostics);
    const mayWrite = canWrite && (!anyError || opts.keepGoing === true) && (good > 0 || emptyShard);
    const status: Summary['status'] = !anyError ? 'ok' : mayWrite ? 'partial' : 'failed';

    const finalStaging = mayWrite ? (staging ?? (await OutputStaging.open(opts.out))) : undefined;
    // A partial database says so in its headers, naming what is missing (stages/partial.ts).
    const mark =
      status === 'partial'
        ? partialMark(
            [...summarySpecies.filter((x) => x.status === 'failed').flatMap((x) => (x.name === undefined ? [] : [x.name])), ...shardInvalid.flatMap((e) => (e.name === undefined ? [] : [e.name]))],
            [...check.failedFiles].map((f) => (opts.displayBase && path.isAbsolute(f) ? displayPath(opts.displayBase, f) : f)),
          )
        : undefined;
    if (finalStaging) {
      emitter ??= await StreamingEmitter.open(finalStaging, settings);
      await emitter.finish(mark);
    }
    if (finalStaging && reportWriter) {
      const report = reportWriter.finish(status, shardInvalid.map((i) => `${i.file}#${i.document}: ${i.diagnostics.find((d) => d.severity === 'error')?.message ?? 'invalid'}`));
      await finalStaging.write('report.html', report.main);
      for (const [page, html] of report.pages) await finalStaging.write(page, html);
    }
    const outputs = finalStaging ? [...[...finalStaging.written].sort(), 'summary.json'] : [];
    emitMs += performance.now() - tEmit;

    for (const inv of shardInvalid) {
      summarySpecies.push({
        ...(inv.name !== undefined ? { name: inv.name } : {}),
        file: inv.file,
        document: inv.document,
        status: 'failed',
        warnings: inv.diagnostics.filter((d) => d.severity === 'warning').map(formatDiagnostic),
        errors: inv.diagnostics.filter((d) => d.severity === 'error').map(formatDiagnostic),
        cache: {},
        cache_hit: false,
        timings_ms: {},
      });
    }
    // Name order (unnamed documents last), then file and document: independent of completion order.
    const nameKey = (x: SummarySpecies) => (x.name === undefined ? '\uffff' : x.name);
    summarySpecies.sort(
      (a, b) =>
        compareText(nameKey(a), nameKey(b)) ||
        compareText(a.file, b.file) ||
        (a.document ?? 0) - (b.document ?? 0),
    );
    const failedLabels = summarySpecies
      .filter((x) => x.status === 'failed')
      .map((x) => x.name ?? `${x.file}#${x.document}`);

    // Cache problems: once per build for an unwritable cache, one line per species for rejected entries.
    if (cache.writeProblem) warnings.unshift(`cache: not writable: ${cache.dir}: ${cache.writeProblem}; every species is recomputed on each build`);
    if (cacheDir !== undefined && check.settingsOk && !shard) await recordCacheUse(cacheDir, opts.dir, usedKeys).catch((e) => cache.noteWriteFailure(e));
    // Files whose problems are not tied to a species that validated (syntax errors, invalid documents, …).
    const validKeys = new Set((check.settingsOk ? check.species : []).map((v) => speciesKey(v.displayFile, v.name)));
    const summaryFiles = [...check.fileDiagnostics.entries()]
      .map(([file, ds]) => ({
        file: ds[0]?.file ?? file,
        // Warnings of species that were built are reported with the species; everything else stays with the file.
        ds: ds.filter((d) => !(d.severity === 'warning' && d.species && validKeys.has(speciesKey(d.file, d.species)))),
      }))
      .filter(({ ds }) => ds.length > 0)
      .sort((a, b) => compareText(a.file, b.file))
      .map(({ file, ds }) => ({
        file,
        errors: ds.filter((d) => d.severity === 'error').map(formatDiagnostic),
        warnings: ds.filter((d) => d.severity === 'warning').map(formatDiagnostic),
      }));

    const summary: Summary = {
      format: 'qforge-summary/1',
      tool: { name: TOOL_NAME, version: TOOL_VERSION },
      code_fingerprint: `sha256:${codeFingerprint()}`,
      database: opts.displayBase ? displayPath(opts.displayBase, opts.dir) : opts.dir,
      status,
      written: mayWrite,
      outputs,
      counts: {
        species: processed + shardInvalid.length,
        ok: good,
        failed: failedCount + shardInvalid.length,
        cache_hits: summarySpecies.filter((s) => s.cache_hit).length,
        files: check.files.length,
        files_failed: check.failedFiles.size,
      },
      warnings,
      settings_diagnostics: check.diagnostics.filter((d) => path.basename(d.file) === 'qforge.yaml').map(formatDiagnostic),
      species: summarySpecies,
      files: summaryFiles,
      timings_ms: {
        load: ms(check.timings.load),
        validate: ms(check.timings.validate),
        compute_fit_verify: ms(stagesMs),
        emit: ms(emitMs),
        total: 0,
      },
    };
    if (shard) summary.shard = shardRecord(shard, check);
    if (settings.references.files.length) summary.reference_files = recordedReferenceFiles(opts.dir, opts.out, settings.references.files);

    let replaced = false;
    (summary.timings_ms as Record<string, number>).total = ms(performance.now() - t0);
    if (finalStaging) {
      validateSummaryJson(summary);
      await finalStaging.write('summary.json', jsonText(summary));
      published = true;
      replaced = (await finalStaging.publish(opts.hooks)).replaced;
    }
    const report: BuildReport = {
      exitCode: anyError ? 1 : 0,
      written: mayWrite,
      replaced,
      summary,
      diagnostics: allDiagnostics,
      notes,
      warnings,
      failed: failedLabels,
    };
    if (notWrittenReason !== undefined && !mayWrite) report.notWrittenReason = notWrittenReason;
    if (check.settingsFile !== undefined) report.settingsFile = check.settingsFile;
    return report;
  } finally {
    await pool.close();
    await emitter?.close();
    if (!published) await staging?.discard();
  }
}

/** The summary entry of one species (its warnings: the validation ones of its file, then its own). */
function summaryEntry(o: SpeciesOutcome, own: readonly Diagnostic[], emitMs: number): SummarySpecies {
  const fm = o.built?.fit.metrics;
  const s: SummarySpecies = {
    name: o.valid.name,
    file: o.valid.file,
    status: o.built ? 'ok' : 'failed',
    warnings: [...own, ...o.diagnostics].filter((d) => d.severity === 'warning').map(formatDiagnostic).concat(o.cacheNotes),
    errors: o.diagnostics.filter((d) => d.severity === 'error').map(formatDiagnostic),
    cache: o.cache,
    cache_hit: isCacheHit(o),
    timings_ms: Object.fromEntries(Object.entries({ ...o.timings, emit: emitMs }).map(([k, v]) => [k, ms(v)])),
  };
  if (fm && o.built) {
    s.fit_metrics = {
      max_abs_cp: Math.max(fm.low.maxAbs.cp, fm.high.maxAbs.cp),
      max_abs_h: Math.max(fm.low.maxAbs.h, fm.high.maxAbs.h),
      max_abs_s: Math.max(fm.low.maxAbs.s, fm.high.maxAbs.s),
      t_mid: o.built.fit.polynomial.tMid,
    };
  }
  return s;
}

/** The settings positions the per-species stages quote, as plain data for the workers. */
function plainLimits(check: CheckReport): PlainLimitSource {
  const setAt: PlainLimitSource['setAt'] = {};
  for (const segments of LIMIT_KEYS) {
    const at = check.settingsSetAt?.([...segments]);
    if (at) setAt[segments.join('.')] = { line: at.line, column: at.column };
  }
  return { setAt, ...(check.settingsFile !== undefined ? { settingsFile: check.settingsFile } : {}) };
}

function isCacheHit(o: SpeciesOutcome): boolean {
  const v = Object.values(o.cache);
  return v.length > 0 && v.every((x) => x === 'hit');
}

