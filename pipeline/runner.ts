/**
 * The build runner: composes the stages load → validate → compute → fit → verify → emit for a database
 * folder and returns a report; it never prints and never exits (the CLI does both).
 *
 * Concurrency: the files are checked, and the species built, on the build's thread pool (workers/pool.ts:
 * this thread and `jobs` − 1 workers). A file's check and a species' build are pure functions of their
 * inputs (no shared mutable state); the checks are taken in file order and the species emitted in name
 * order, so the outputs do not depend on `jobs` or on the order of completion.
 */
import { stat } from 'node:fs/promises';
import { deserialize } from 'node:v8';
import path from 'node:path';
import { recordedReferenceFiles } from './core/recorded-references.js';
import pLimit from 'p-limit';
import type { Species, StandardProperties } from '../src/model.js';
import { Nasa7FormatError } from '../src/nasa7/errors.js';
import type { FitOptions, FitResult } from '../src/nasa7/types.js';
import { acquireOutputLock, OutputStaging, recoverOutputDir, type PublishHooks } from './storage/atomic-write.js';
import { cached, cacheEntryPath, defaultCacheDir, StageCache, type CacheKind, type CacheOutcome } from './storage/cache.js';
import { recordCacheUse, UsedKeys } from './storage/cache-uses.js';
import { decodeEntry, encodeEntry, readEntry, writeEntry, writeEntryText, type DocumentFacts, type FileFacts, type RenderedDigests, type RenderedSpecies, type StoredResult } from './storage/fast-entries.js';
import { PACK_DIR, packFile, packIdentity, PackWriter, readPack, type LoadedPack, type PackIdentity } from './storage/build-pack.js';
import { SpillFile, type SpillRef } from './storage/spill.js';
import { decodeSampleEntry, encodeSampleEntry } from './storage/sample-columns.js';
import { PositionInterner } from './core/intern.js';
import { PreviousDigests } from './storage/previous-digests.js';
import { shardLabel, shardOf, shardRecord, type Shard } from './core/shard.js';
import { StreamingEmitter } from './stages/emit-stream.js';
import { batchesOf, createSpeciesPool, type SpeciesPool } from './workers/pool.js';
import { LIMIT_KEYS, type PlainLimitSource } from './workers/protocol.js';
import type { ComputedSpecies } from './stages/compute.js';
import { compareDiagnostics, formatDiagnostic, hasErrors, type Diagnostic } from './core/diagnostics.js';
import { byName, type BuiltSpecies } from './stages/emit.js';
import { SummaryEntries, type SummarySpecies } from './stages/emit-summary.js';
import { canonicalJson, hashParts, sha256Hex } from './storage/hash.js';
import { discoverSpeciesFiles, loadYamlFile, readNamedGeometryFile, readYamlFileBytes } from './stages/load.js';
import { checkFileBytes, checkPolicy, geometryHash, type KeepAs, type SpeciesPair } from './stages/check-file.js';
import type { SpeciesPlan } from './core/plan.js';
import { checkSpeciesSampling, loadSettings, type DatabaseSettings, type FitTolerancesSetting } from './core/settings.js';
import { checkUniqueNameFacts, type NameFact } from './stages/names.js';
import { fitLimitOrigin } from './stages/limit-origin.js';
import { codeFingerprint } from './storage/code-fingerprint.js';
import { createWarningPolicy } from './core/strict.js';
import { partialMark } from './stages/partial.js';
import { CONSTANTS_EDITION, TOOL_NAME, TOOL_VERSION } from './core/version.js';
import { displayPath } from './core/display-path.js';
import { compareText, errorText } from './core/text.js';
import type { ReportRequest } from './report/build-report.js';
import { autoThreads, checkOnThreads } from './workers/auto-threads.js';
import { heapPlanFor, holdHeapReserve, type HeapReserve } from './workers/heap.js';

/**
 * The per-species stages and validation, loaded on first use: a rebuild that takes every species from the
 * cache never needs them, and loading them is a good part of its start-up time.
 */
let speciesStages:
  | Promise<{
      compute: typeof import('./stages/compute.js');
      fit: typeof import('./stages/fit.js');
      plan: typeof import('./core/plan.js');
      verify: typeof import('./stages/verify.js');
      uncertainty: typeof import('./stages/uncertainty.js');
    }>
  | undefined;
const stagesModules = () =>
  (speciesStages ??= Promise.all([
    import('./stages/compute.js'),
    import('./stages/fit.js'),
    import('./core/plan.js'),
    import('./stages/verify.js'),
    import('./stages/uncertainty.js'),
  ]).then(([compute, fit, plan, verify, uncertainty]) => ({ compute, fit, plan, verify, uncertainty })));
let validateModule: Promise<typeof import('./stages/validate.js')> | undefined;
const validation = () => (validateModule ??= import('./stages/validate.js'));

/** The payload encoding of `samples` entries (sample lists as columns of doubles). */
const SAMPLE_ENTRY_CODEC = { encode: encodeSampleEntry, decode: decodeSampleEntry };

export type StageName = 'load' | 'validate' | 'compute' | 'fit' | 'verify' | 'emit';

export type ProgressEvent =
  | { kind: 'stage'; stage: StageName; detail?: string }
  | { kind: 'species-start'; total: number }
  | { kind: 'species-done'; name: string; ok: boolean; cacheHit: boolean; done: number; total: number }
  | { kind: 'note'; message: string };

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
  /** Told the number of species files once they are found, before they are checked (the CLI tunes V8 by it). */
  onDatabaseSize?: (files: number) => void;
  /**
   * Check the files on the build's threads (true) or on this one (false) whatever their number; by default
   * by `checkOnThreads` (workers/auto-threads.ts). The findings are the same either way.
   */
  checkOnThreads?: boolean;
}

/** One species document that passed validation. */
export interface ValidSpecies {
  name: string;
  /** Species file relative to the database folder (written into thermo.json). */
  file: string;
  /** Species file as shown in messages. */
  displayFile: string;
  /**
   * The species and its normalised input. Absent when the check kept them in a spill file (`spilled`) or
   * took the file's findings from the cache; `speciesOf` gets them back.
   */
  species?: Species;
  normalisedInput?: unknown;
  spilled?: SpillRef;
  /**
   * The species and its normalised input as v8.serialize bytes, read from the spill file for the thread that
   * builds it (`buildOneSpecies` deserialises them): copying bytes to a worker is far cheaper than copying
   * the object, and this thread never needs the object of a species a worker builds.
   */
  packed?: Uint8Array;
  /** The species file (as discovered) and the 0-based position of this species in it. */
  source: { path: string; index: number };
  /** Key of this species' result entry of the no-change fast path (storage/fast-entries.ts). */
  resultKey?: string;
  /** Source positions for diagnostics of later stages: the species' `name` and `temperature_ranges`. */
  positions: Partial<Record<'name' | 'composition' | 'temperature_ranges' | `tolerances.${string}`, { line: number; column: number }>>;
  loadMs: number;
  validateMs: number;
}

/** A validated species with its species object at hand (what the per-species stages take). */
export type ReadySpecies = ValidSpecies & { species: Species; normalisedInput: unknown };

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
  /** `file/<key>` of the fast-path file entries of this database (with `fastPath`), for the cache use list. */
  fileKeys: string[];
  /** Files whose findings came from the cache. */
  cachedFiles: number;
  /** Rejected fast-path file entries (`file: reason`), reported like rejected stage entries. */
  cacheNotes: string[];
  /** With `fastPath`: the build context hash the file and result keys are made from. */
  fastContext?: string;
  /** With `fastPath.pack`: the build pack read (storage/build-pack.ts), when there was a valid one. */
  pack?: LoadedPack;
  /** With `fastPath`: each file's key and the JSON text of its findings, for the next build pack. */
  packFiles: Array<[string, string]>;
}

/** What a build needs to know, before any file is checked, to start its threads (`CheckOptions.checkOn`). */
export interface CheckContext {
  settings: DatabaseSettings;
  settingsOk: boolean;
  strict: boolean;
  limits: PlainLimitSource;
  files: number;
}

export interface CheckOptions {
  /** Database folder. */
  dir: string;
  /** Diagnostics name files relative to this folder (the user's working folder). Default: as found. */
  displayBase?: string;
  /** Concurrency of file loading (default 8). */
  jobs?: number;
  /** Warnings are errors (also `strict: true` in the settings); see core/strict.ts. */
  strict?: boolean;
  /**
   * What to keep of each valid species: 'memory' (default; `species` and `normalisedInput` set), 'none'
   * (names and positions only, e.g. `qforge check`), or a spill file (the build: memory independent of N).
   */
  keep?: 'memory' | 'none' | SpillFile;
  /**
   * Where the files that need a fresh check are checked: given the settings and the number of files, the
   * build answers with its thread pool (workers/pool.ts), so parsing and validation run on every thread;
   * without it (or when it answers undefined) they run here. The findings are the same either way.
   */
  checkOn?: (c: CheckContext) => Pick<SpeciesPool, 'checkFile'> | undefined;
  /** Told before each file that is parsed and validated afresh (not taken from the cache). */
  onFreshCheck?: () => void;
  /**
   * The no-change fast path: with `context` (what besides the settings changes per-species outputs) the
   * file and result keys are computed; with `cache` too, file entries are looked up and stored.
   */
  fastPath?: { context: Record<string, unknown>; cache?: StageCache; pack?: PackIdentity };
  /**
   * Species files hashed on another thread (storage/previous-digests.ts): handed the list as soon as the
   * files are found (always, with no files when there are no keys to compute), then asked for each file's
   * sha256, which stands for reading it while a stored finding of that key exists.
   */
  inputDigests?: { hashInputs(files: readonly string[]): void; inputDigest(file: string): string | undefined };
}

/** What a valid species' object is kept as until its turn: in memory, in the spill file, or not at all. */
type Kept = { species: Species; normalisedInput: unknown } | SpillRef | undefined;

/** One file as checked: its findings (from the cache or fresh) and, for fresh valid documents, what was kept. */
interface CheckedFile {
  file: string;
  facts: FileFacts;
  /** The findings as stored (JSON text, taken before the check's display paths are applied to them). */
  factsText?: string;
  kept: Kept[];
  key?: string;
  loadMs: number;
  validateMs: number;
}

/**
 * sha256 of everything besides a species file's bytes that its check findings and its species' outputs
 * depend on: tool and code, constants, settings, the warning policy, how paths are shown (messages quote
 * them), where the settings set the quoted limits, and the build options in `extra`.
 */
function fileContextHash(p: {
  settings: DatabaseSettings;
  strict: boolean;
  dir: string;
  displayBase: string | undefined;
  limits: PlainLimitSource;
  extra: Record<string, unknown>;
}): string {
  return hashParts('file-context', TOOL_NAME, TOOL_VERSION, codeFingerprint(), CONSTANTS_EDITION, p.settings, p.strict, p.dir, p.displayBase ?? null, p.limits, p.extra);
}

/** Whether every geometry file a cached file entry read still reads the same. */
async function geometryUnchanged(file: string, geometry: FileFacts['geometry']): Promise<boolean> {
  for (const g of geometry) {
    if (geometryHash(await readNamedGeometryFile(file, file, g.name)) !== g.hash) return false;
  }
  return true;
}

/** Load and validate a database folder: every problem of every file at once. */
export async function checkDatabase(opts: CheckOptions): Promise<CheckReport> {
  const dir = opts.dir;
  // Enough files in flight to keep every thread of a `checkOn` pool busy while this one reads.
  const limit = pLimit(Math.max(8, 4 * (opts.jobs ?? 1)));
  const keep = opts.keep ?? 'memory';
  const t0 = performance.now();
  const settingsResult = await loadSettings(dir, dir);
  const discovered = await discoverSpeciesFiles(dir);
  opts.inputDigests?.hashInputs(opts.fastPath ? discovered.files : []);
  const strict = opts.strict === true || settingsResult.settings.strict;
  const policy = createWarningPolicy({
    strict,
    accepted: settingsResult.settings.accepted_warnings,
    ...(settingsResult.file !== undefined ? { settingsFile: settingsResult.file } : {}),
    ...(settingsResult.locate ? { settingsLocate: settingsResult.locate } : {}),
  });
  discovered.diagnostics = policy.applyOther(discovered.diagnostics);
  settingsResult.diagnostics = policy.applyOther(settingsResult.diagnostics);
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

  // Species files are path.join(dir, normalised relative path) (discoverSpeciesFiles): the part after the
  // folder's own prefix is what path.relative would give, without resolving both paths per species.
  const dirPrefix = path.join(dir, path.sep);
  const relativeOf = (f: string) => (f.startsWith(dirPrefix) && f.length > dirPrefix.length ? f.slice(dirPrefix.length) : path.relative(dir, f) || f);
  const displayOf = (f: string) => (path.sep === '/' ? relativeOf(f) : relativeOf(f).split(path.sep).join('/'));
  // Asked per species and per diagnostic of a file: each file's shown path is worked out once.
  const shown = new Map<string, string>();
  const show = (f: string) => {
    if (!opts.displayBase || !path.isAbsolute(f)) return f;
    let d = shown.get(f);
    if (d === undefined) shown.set(f, (d = displayPath(opts.displayBase, f)));
    return d;
  };
  const settingsFileShown = settingsResult.file !== undefined ? show(settingsResult.file) : undefined;
  const checker = opts.checkOn?.({
    settings: settingsResult.settings,
    settingsOk: !hasErrors(settingsResult.diagnostics),
    strict,
    limits: plainLimitsOf(settingsFileShown, settingsResult.setAt),
    files: discovered.files.length,
  });
  const keepAs: KeepAs = keep === 'memory' ? 'objects' : keep === 'none' ? 'none' : 'bytes';
  const contextHash = opts.fastPath
    ? fileContextHash({
        settings: settingsResult.settings,
        strict,
        dir,
        displayBase: opts.displayBase,
        limits: plainLimitsOf(settingsFileShown, settingsResult.setAt),
        extra: opts.fastPath.context,
      })
    : undefined;
  const fastCache = opts.fastPath?.cache;
  const cacheNotes: string[] = [];
  let pack: LoadedPack | undefined;
  if (fastCache?.dir !== undefined && opts.fastPath?.pack && contextHash !== undefined) {
    const r = readPack(fastCache.dir, opts.fastPath.pack, contextHash);
    pack = r.pack;
    if (r.rejected !== undefined) cacheNotes.push(`cache: build pack ${show(packFile(fastCache.dir, opts.fastPath.pack))} rejected (${r.rejected}); every species taken from its own entries`);
  }
  let validateTotal = 0;
  let cachedFiles = 0;

  // Each file is read, looked up or parsed and validated, and reduced to its findings at once: the YAML tree
  // of a file never outlives its own check.
  const unreadable = (f: string, diagnostics: Diagnostic[], tl: number): CheckedFile => {
    const facts: FileFacts = { loadDiagnostics: policy.applyOther(diagnostics), documents: [], recovered: [], settingsUsed: [], geometry: [] };
    return { file: f, facts, kept: [], loadMs: performance.now() - tl, validateMs: 0 };
  };
  const fileKey = (f: string, sha256: string) => hashParts('file', contextHash, f, sha256);
  const checkFile = async (f: string): Promise<CheckedFile> => {
    const tl = performance.now();
    // A digest from the other thread stands for the bytes until a stored finding is missing (then read here).
    const known = contextHash !== undefined ? opts.inputDigests?.inputDigest(f) : undefined;
    let read = known === undefined ? await readYamlFileBytes(f, f) : undefined;
    if (read?.diagnostics !== undefined) return unreadable(f, read.diagnostics, tl);
    let key = contextHash !== undefined ? fileKey(f, known ?? sha256Hex(read!.bytes!)) : undefined;
    // Stored findings (a build-pack line or a file entry) stand for a fresh check while every geometry file
    // they read still reads the same; 'unparsable' when the text is not the JSON of findings.
    const reuse = async (text: string): Promise<CheckedFile | 'unparsable' | undefined> => {
      let facts: FileFacts;
      try {
        facts = decodeEntry<FileFacts>(text);
      } catch {
        return 'unparsable';
      }
      if (!(await geometryUnchanged(f, facts.geometry))) return undefined;
      policy.markUsed(facts.settingsUsed);
      cachedFiles++;
      return { file: f, facts, factsText: text, kept: [], key: key!, loadMs: performance.now() - tl, validateMs: 0 };
    };
    const packed = key !== undefined ? pack?.files.get(key) : undefined;
    // A line of a pack whose checksum held cannot fail to parse unless written wrong: then checked again.
    const fromPack = packed !== undefined ? await reuse(packed) : undefined;
    if (typeof fromPack === 'object') return fromPack;
    if (fastCache && key !== undefined) {
      const hit = await fastCache.getText('file', key);
      if (hit.outcome === 'hit') {
        const fromEntry = await reuse(hit.value!);
        if (typeof fromEntry === 'object') return fromEntry;
        if (fromEntry === 'unparsable') {
          hit.outcome = 'corrupt';
          hit.reason = 'not valid JSON';
        }
      }
      if (hit.outcome === 'corrupt') cacheNotes.push(`${show(f)}: cache entry for file rejected (${hit.reason}); checked again`);
    }
    if (read === undefined) {
      read = await readYamlFileBytes(f, f);
      if (read.diagnostics !== undefined) return unreadable(f, read.diagnostics, tl);
      // The findings below are of the bytes read now, and so is their key (the file may have changed since
      // the other thread hashed it).
      key = fileKey(f, sha256Hex(read.bytes));
    }
    const bytes = read.bytes!;
    const readMs = performance.now() - tl;
    opts.onFreshCheck?.();
    const checked = checker ? await checker.checkFile(f, bytes, keepAs) : await checkFileBytes(bytes, f, policy, keepAs);
    const { facts } = checked;
    policy.markUsed(facts.settingsUsed);
    const loadMs = readMs + checked.loadMs;
    const validateMs = checked.validateMs;
    const kept: Kept[] = [];
    for (const k of checked.kept) {
      if (k === undefined || keep === 'none') kept.push(undefined);
      else if (k instanceof Uint8Array) kept.push(keep === 'memory' ? (deserialize(k) as SpeciesPair) : await keep.putBytes(k));
      else kept.push(keep === 'memory' ? k : await keep.put(k));
    }
    const factsText = key !== undefined ? encodeEntry(facts) : undefined;
    if (fastCache && key !== undefined) await writeEntryText(fastCache, 'file', key, factsText!);
    return { file: f, facts, kept, ...(key !== undefined ? { key, factsText } : {}), loadMs, validateMs };
  };
  const perFile = await Promise.all(discovered.files.map((f) => limit(() => checkFile(f))));
  let loadTotal = 0;
  for (const p of perFile) {
    validateTotal += p.validateMs;
    loadTotal += p.loadMs;
  }
  // The files are checked on several threads: the wall time of the check is split between reading and
  // parsing, and validating, in the proportion of their summed times (so both stay ≥ 0 and add up to it).
  const tCheck = performance.now() - t0;
  const validateShare = validateTotal + loadTotal > 0 ? validateTotal / (validateTotal + loadTotal) : 0;
  const tValidate = tCheck * validateShare;
  const tLoad = tCheck - tValidate;

  const valid: Array<{ fact: DocumentFacts; v: ValidSpecies }> = [];
  const invalid: Array<{ fact: DocumentFacts; entry: InvalidDocument }> = [];
  const invalidEntry = (fact: DocumentFacts, file: string, ds: Diagnostic[]): InvalidDocument => {
    const e: InvalidDocument = { file: displayOf(file), displayFile: show(file), document: fact.index + 1, diagnostics: ds };
    if (fact.name !== undefined && fact.name !== '') e.name = fact.name;
    return e;
  };
  const nameFacts: NameFact[] = [];
  const interner = new PositionInterner();
  for (const { file, facts, kept, key, loadMs, validateMs } of perFile) {
    facts.loadDiagnostics.forEach(addFileDiag);
    diagnostics.push(...facts.loadDiagnostics);
    for (const fact of facts.recovered) {
      nameFacts.push(fact);
      diagnostics.push(...fact.diagnostics);
      fact.diagnostics.forEach(addFileDiag);
      // It failed for its own YAML errors plus whatever validation found.
      invalid.push({ fact, entry: invalidEntry(fact, file, [...(fact.yamlErrors ?? []), ...fact.diagnostics]) });
    }
    if (facts.documents.length === 0 && !hasErrors(facts.loadDiagnostics)) {
      for (const d of policy.applyOther([{ severity: 'warning', code: 'file-holds-no-species', file, path: '', message: 'file holds no species' }])) {
        diagnostics.push(d);
        addFileDiag(d);
      }
    }
    const n = Math.max(1, facts.documents.length);
    facts.documents.forEach((fact, i) => {
      nameFacts.push(fact);
      diagnostics.push(...fact.diagnostics);
      fact.diagnostics.forEach(addFileDiag);
      if (!fact.valid) {
        invalid.push({ fact, entry: invalidEntry(fact, file, [...fact.diagnostics]) });
        return;
      }
      const v: ValidSpecies = {
        name: fact.valid.name,
        file: displayOf(file),
        displayFile: show(file),
        source: { path: file, index: fact.index },
        positions: interner.intern(fact.valid.positions),
        loadMs: loadMs / n,
        validateMs: validateMs / n,
      };
      const k = kept[i];
      if (k && 'species' in k) {
        v.species = k.species;
        v.normalisedInput = k.normalisedInput;
      } else if (k) v.spilled = k;
      // The geometry files read (by hash) are inputs of the species' outputs too.
      if (key !== undefined) v.resultKey = hashParts('result', key, facts.geometry, fact.index);
      valid.push({ fact, v });
    });
  }
  // Names must be unique across the database: the later duplicates fail (validate.ts names the first use).
  const dup = policy.applyOther(checkUniqueNameFacts(nameFacts));
  diagnostics.push(...dup);
  dup.forEach(addFileDiag);
  const dupOf = (fact: DocumentFacts, name: string) =>
    dup.filter((d) => d.file === fact.file && d.species === name && fact.nameAt?.line === d.line);
  const species: ValidSpecies[] = [];
  for (const { fact, v } of valid) {
    const ds = dupOf(fact, v.name).filter((d) => d.severity === 'error');
    if (ds.length === 0) species.push(v);
    else invalid.push({ fact, entry: invalidEntry(fact, fact.file, dupOf(fact, v.name)) });
  }
  for (const { fact, entry } of invalid) {
    if (entry.name === undefined) continue;
    // A duplicate of an invalid document is reported with that document too.
    for (const d of dupOf(fact, entry.name)) if (!entry.diagnostics.includes(d)) entry.diagnostics.push(d);
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
  // `show` is idempotent; entries may hold copies of diagnostics (a cached file's YAML errors).
  for (const e of invalidDocs) for (const d of e.diagnostics) d.file = show(d.file);
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
    timings: { load: tLoad, validate: tValidate },
    fileKeys: perFile.flatMap((p) => (p.key !== undefined ? [`file/${p.key}`] : [])),
    cachedFiles,
    cacheNotes,
    packFiles: perFile.flatMap((p) => (p.key !== undefined && p.factsText !== undefined ? [[p.key, p.factsText] as [string, string]] : [])),
  };
  if (contextHash !== undefined) report.fastContext = contextHash;
  if (pack) report.pack = pack;
  if (settingsFileShown !== undefined) report.settingsFile = settingsFileShown;
  if (settingsResult.setAt) report.settingsSetAt = settingsResult.setAt;
  return report;
}

/**
 * A validated species with its species object: as kept by the check, read back from the spill file, or —
 * when the check took its file's findings from the cache — loaded and validated again from its file.
 */
export async function speciesOf(v: ValidSpecies, spill?: SpillFile): Promise<ReadySpecies> {
  if (v.species !== undefined) return v as ReadySpecies;
  if (v.spilled && spill) {
    const kept = await spill.get<{ species: Species; normalisedInput: unknown }>(v.spilled);
    return { ...v, species: kept.species, normalisedInput: kept.normalisedInput };
  }
  const loaded = await loadYamlFile(v.source.path, v.source.path);
  const doc = loaded.documents.find((d) => d.index === v.source.index);
  const r = doc ? (await validation()).validateSpecies(doc) : undefined;
  if (!r?.species || hasErrors(r.diagnostics) || r.species.name !== v.name) {
    throw new Error(`${v.displayFile} changed during the build (species ${v.name} no longer reads as checked)`);
  }
  return { ...v, species: r.species, normalisedInput: r.normalisedInput ?? r.species };
}

// ---------------------------------------------------------------------------------------------------------

export interface SpeciesOutcome {
  valid: ValidSpecies;
  built?: BuiltSpecies;
  /** A species taken whole from its result entry (the no-change fast path): what emit and summary need. */
  stored?: StoredResult;
  diagnostics: Diagnostic[];
  cache: Partial<Record<CacheKind, CacheOutcome>>;
  cacheNotes: string[];
  timings: Record<string, number>;
  /** Cache entries this species uses (`kind/key`), for `qforge cache prune`. */
  keys?: string[];
  /** The build pack line `stored` came from (written into the next pack as it is). */
  packLine?: string;
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
export async function speciesCacheKeys(v: ReadySpecies, settings: DatabaseSettings): Promise<string[] | undefined> {
  const { plan: { planSpecies }, fit: { fitOptionsFor } } = await stagesModules();
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

/**
 * The cache entries the current species of a checked database use (what `qforge cache prune` keeps): their
 * stage entries and, when checked with `fastPath`, the file and result entries of the fast path.
 */
export async function currentCacheKeys(check: CheckReport): Promise<string[]> {
  const keys = [...check.fileKeys];
  for (const v of check.species) {
    if (v.species !== undefined) keys.push(...((await speciesCacheKeys(v as ReadySpecies, check.settings)) ?? []));
    if (v.resultKey !== undefined) keys.push(`result/${v.resultKey}`);
  }
  return keys;
}

/** Whether every stage result of every species of a batch is in the cache (then no worker is needed). */
async function allCached(cacheDir: string | undefined, batch: readonly ValidSpecies[], settings: DatabaseSettings): Promise<boolean> {
  if (cacheDir === undefined) return false;
  for (const v of batch) {
    if (v.species === undefined) return false;
    const keys = await speciesCacheKeys(v as ReadySpecies, settings);
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
export function locateFitViolation(d: Diagnostic, tolerances: FitTolerancesSetting, source: LimitSource, species?: ReadySpecies): Diagnostic {
  return { ...d, path: '', message: `fit check: ${d.message}; ${fitLimitOrigin(d.path, tolerances, source, species)}` };
}

/** compute → fit → verify (and the table points) of one species, through the cache. */
export async function buildOneSpecies(
  given: ValidSpecies,
  settings: DatabaseSettings,
  cache: StageCache,
  limitSource: LimitSource = {},
  extra: { uncertaintySamples?: number } = {},
): Promise<SpeciesOutcome> {
  // The pool hands over species with their object (runner `speciesOf`) or its bytes; a bare one is a caller's bug.
  let v: ReadySpecies;
  if (given.species !== undefined) v = given as ReadySpecies;
  else if (given.packed !== undefined) {
    const { packed, ...rest } = given;
    v = { ...rest, ...(deserialize(packed) as SpeciesPair) };
  } else throw new Error(`buildOneSpecies: ${given.name} has no species object (see speciesOf)`);
  const {
    compute: { computeSamples, computeTable },
    fit: { fitOptionsFor, fitSpecies },
    plan: { planSpecies },
    verify: { classicalCpFloor, verifySpecies },
    uncertainty: { computeUncertainty },
  } = await stagesModules();
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
  // Without a cache the keys address nothing (hashing the species and its grids costs ~0.3 ms).
  const keys = cache.dir !== undefined ? stageKeys(inputHash, v.species, plan, fitOptions) : { samples: '', fit: '', table: '' };
  if (cache.dir !== undefined) out.keys = keyList(keys, settings);

  // One cached stage: its result, or undefined after recording the failure (the species stops there).
  const stage = async <T>(
    kind: CacheKind,
    key: string,
    run: () => T,
    failPath: string,
    what: string,
  ): Promise<T | undefined> => {
    try {
      // The table points are only ever printed by emit-table.ts `renderTable`, field by field, in fixed
      // decimals (where -0 and 0 print alike; T itself is never ±0, the grid is clipped to the fitted range,
      // whose low end the settings schema keeps above 0): their canonical copy cannot change an output, and
      // with --no-cache it is skipped (~0.05 ms per species).
      const r = await cached(cache, kind, key, run, kind === 'samples' ? { codec: SAMPLE_ENTRY_CODEC } : { orderFree: kind === 'table' });
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
  const cacheDir = opts.cacheDir === null ? undefined : (opts.cacheDir ?? defaultCacheDir(opts.dir));
  const cache = new StageCache(cacheDir);
  // The validated species wait in a spill file for their turn (name order), not in memory; without a
  // writable temporary folder they wait in memory (the build only needs more of it).
  const spill = await SpillFile.open().catch(() => undefined);
  // A rebuild into an existing OUT hashes the species files and the previous files beside the check
  // (storage/previous-digests.ts).
  const previous = cacheDir !== undefined && !opts.shard ? PreviousDigests.start(opts.out, ['thermo.json', 'nasa7.txt'], ['tables'], true) : undefined;
  // This thread's heap reserve (workers/heap.ts): taken once there is work, dropped with the build.
  const reserve: { held?: HeapReserve } = {};
  try {
    return await buildChecked(opts, t0, notes, cacheDir, cache, spill, previous, reserve);
  } finally {
    reserve.held?.release();
    // What was computed before a failure still saves the next build its time.
    cache.flushWrites();
    await previous?.stop();
    await spill?.close();
  }
}

async function buildChecked(
  opts: BuildOptions,
  t0: number,
  notes: string[],
  cacheDir: string | undefined,
  cache: StageCache,
  spill: SpillFile | undefined,
  previous: PreviousDigests | undefined,
  reserve: { held?: HeapReserve },
): Promise<BuildReport> {
  const progress = opts.onProgress ?? (() => {});
  // For a large database the threads start with the check, which then parses and validates the files on all
  // of them (workers/auto-threads.ts checkOnThreads); they build the species afterwards, unless the species to
  // build call for another number of threads (see below).
  let checkPool: SpeciesPool | undefined;
  // Bound after the check: this thread's builds quote where the settings set the limits (`check`).
  let inlineBuild: ((v: ValidSpecies) => Promise<SpeciesOutcome>) | undefined;
  const poolFor = (jobs: number, c: CheckContext) => {
    const policy = checkPolicy(c.settings, c.strict);
    return createSpeciesPool({
      jobs,
      init: {
        settings: c.settings,
        limits: c.limits,
        cacheDir,
        codeFingerprint: codeFingerprint(),
        ...(opts.uncertaintySamples !== undefined ? { uncertaintySamples: opts.uncertaintySamples } : {}),
        keepSamples: wantsReport(c),
        strict: c.strict,
      },
      inline: (v) => inlineBuild!(v),
      inlineCheck: (file, bytes, keep) => checkFileBytes(bytes, file, policy, keep),
      shareThisThread: true,
      workerInitialOldGenerationMb: heapPlanFor(c.files).workerInitialOldGenerationMb,
      cheap: (batch) => allCached(cacheDir, batch, c.settings),
      crashed: (v, reason) => failedOutcome(v, `internal error: ${reason} while building this species' batch; it was not built`),
    });
  };
  const wantsReport = (c: { settingsOk: boolean; settings: DatabaseSettings }) => Boolean(c.settingsOk && (opts.report || c.settings.outputs.report));
  // --jobs is a ceiling: a thread beyond one per file (check) or species (build) would have nothing to do and
  // still start, compile and warm up (--jobs 40 on 22 species: 1.1 GB and 8.9 s instead of ~1 s).
  const threadsFor = (count: number) => (opts.jobs !== undefined ? Math.max(1, Math.min(opts.jobs, count)) : autoThreads(count, opts.maxThreads ?? 1));
  // Set by checkDatabase, which always asks `checkOn` before checking any file.
  let checkContext: CheckContext | undefined;
  // This thread's heap reserve, sized by the check's file count (heapPlanFor) and taken only once there is
  // work to do — a file to check afresh or a species to build — so a no-change rebuild holds none.
  const takeReserve = () => {
    if (reserve.held === undefined && checkContext !== undefined) reserve.held = holdHeapReserve(heapPlanFor(checkContext.files).reserveMb);
  };
  let check: CheckReport;
  try {
    check = await checkDatabase({
      ...opts,
      keep: spill ?? 'memory',
      ...(previous ? { inputDigests: previous } : {}),
      // A shard does not use the build pack (its outputs are merged, not rebuilt in place).
      ...(cacheDir !== undefined ? { fastPath: { context: buildContext(opts), cache, ...(opts.shard ? {} : { pack: packIdentity(opts.dir, opts.out) }) } } : {}),
      onFreshCheck: takeReserve,
      checkOn: (c) => {
        checkContext = c;
        opts.onDatabaseSize?.(c.files);
        const jobs = threadsFor(c.files);
        if (opts.checkOnThreads ?? checkOnThreads(c.files, jobs)) checkPool = jobs > 1 ? poolFor(jobs, c) : undefined;
        return checkPool;
      },
    });
  } catch (e) {
    await checkPool?.close();
    throw e;
  }
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
  // Opened before the species run so that a missing --report-against build fails at once.
  // Until the build's own try below, a failure must stop the check's threads (they keep the process alive).
  const orStop = async <T>(p: () => Promise<T>): Promise<T> => {
    try {
      return await p();
    } catch (e) {
      await checkPool?.close();
      throw e;
    }
  };
  const reportWriter = wantsReport(check)
    ? await orStop(async () => (await import('./report/build-report.js')).ReportWriter.open(opts.report ?? {}, settings, opts.dir, opts.displayBase))
      : undefined;
  // A species is taken whole from its result entry unless the report needs its computed values.
  const useStored = cacheDir !== undefined && !reportWriter;
  // Without a pack nothing is reused by digest: the helper's work would be wasted.
  if (!check.pack || !useStored) await previous?.stop();

  const total = shardSpecies.length;
  const jobs = threadsFor(total);
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
  const summaryEntries = new SummaryEntries(spill);
  const speciesDiagnostics: Diagnostic[] = [];
  const warnings: string[] = [...check.cacheNotes];
  let processed = 0;
  let failedCount = 0;
  const usedKeys = new UsedKeys();
  for (const k of check.fileKeys.splice(0)) usedKeys.add(k);

  const canWrite = check.settingsOk && check.files.length > 0;
  const staging = canWrite && total > 0 ? await orStop(() => OutputStaging.open(opts.out)) : undefined;
  if (check.pack && useStored) staging?.useKnownDigests(previous);
  let published = false;
  inlineBuild = async (v) => {
    const o = await buildOneSpecies(v, settings, cache, check, opts.uncertaintySamples !== undefined ? { uncertaintySamples: opts.uncertaintySamples } : {});
    // As a worker's reply: the sample points only while the report needs them.
    if (o.built && !reportWriter) o.built.computed = { ...o.built.computed, samples: [], extrapolationSamples: [] };
    return o;
  };
  let pool: SpeciesPool;
  if (checkPool && checkPool.jobs === jobs) pool = checkPool;
  else {
    await checkPool?.close();
    pool = poolFor(jobs, checkContext!);
  }

  // A batch: the species whose result entry is in the cache are taken from it, the others are built (on
  // the pool) from their species object; the order of the batch is kept.
  const resolveBatch = async (batch: readonly ValidSpecies[]): Promise<SpeciesOutcome[]> => {
    const outs: Array<SpeciesOutcome | undefined> = new Array(batch.length);
    const todo: ValidSpecies[] = [];
    const at: number[] = [];
    const resultOutcome = new Map<number, { outcome: CacheOutcome; reason?: string }>();
    for (let i = 0; i < batch.length; i++) {
      const v = batch[i]!;
      if (useStored && v.resultKey !== undefined) {
        const tr = performance.now();
        const line = check.pack?.results.get(v.resultKey);
        if (line !== undefined) {
          try {
            const o = storedOutcome(v, decodeEntry<StoredResult>(line), performance.now() - tr);
            o.packLine = line;
            outs[i] = o;
            continue;
          } catch {
            // Unreadable line: the result entry decides.
          }
        }
        const r = await readEntry<StoredResult>(cache, 'result', v.resultKey);
        if (r.outcome === 'hit') {
          outs[i] = storedOutcome(v, r.value!, performance.now() - tr);
          continue;
        }
        resultOutcome.set(i, r);
      }
      try {
        todo.push(v.species === undefined && v.spilled && spill ? { ...v, packed: await spill.getBytes(v.spilled) } : await speciesOf(v, spill));
        at.push(i);
      } catch (e) {
        outs[i] = failedOutcome(v, errorText(e), 'species-file-changed');
      }
    }
    if (todo.length > 0) {
      takeReserve();
      const built = await pool.run(todo);
      built.forEach((o, k) => {
        const i = at[k]!;
        const r = resultOutcome.get(i);
        if (r) {
          o.cache.result = r.outcome;
          if (r.outcome === 'corrupt') o.cacheNotes.unshift(`cache entry for result rejected (${r.reason}); recomputed`);
        }
        outs[i] = o;
      });
    }
    return outs as SpeciesOutcome[];
  };
  // The texts of a species taken from the build pack, when the emitter needs them: from its result entry,
  // else (missing, rejected) the species is built again and its lookup reported.
  const textsOf = async (o: SpeciesOutcome, lookup: { outcome?: CacheOutcome; reason?: string }): Promise<RenderedSpecies | undefined> => {
    const r = await readEntry<StoredResult>(cache, 'result', o.valid.resultKey!);
    Object.assign(lookup, r.outcome === 'hit' && !r.value?.built?.rendered ? { outcome: 'corrupt', reason: 'no rendered outputs' } : { outcome: r.outcome, reason: r.reason });
    return r.outcome === 'hit' ? r.value?.built?.rendered : undefined;
  };
  const rebuilt = async (o: SpeciesOutcome, lookup: { outcome?: CacheOutcome; reason?: string }): Promise<SpeciesOutcome> => {
    let ready: ReadySpecies;
    try {
      ready = await speciesOf(o.valid, spill);
    } catch (e) {
      return failedOutcome(o.valid, errorText(e), 'species-file-changed');
    }
    const [fresh] = await pool.run([ready]);
    fresh!.cache.result = lookup.outcome === 'corrupt' ? 'corrupt' : 'miss';
    if (lookup.outcome === 'corrupt') fresh!.cacheNotes.unshift(`cache entry for result rejected (${lookup.reason}); recomputed`);
    return fresh!;
  };
  const pack = cacheDir !== undefined && !shard ? new PackWriter(path.join(cacheDir, PACK_DIR)) : undefined;
  // Handed over, not kept twice: the pack writer may spill them (one line per species file).
  if (pack) for (const [key, text] of check.packFiles.splice(0)) pack.addFile(key, text);
  let emitter: StreamingEmitter | undefined;
  const emitterOptions = { digests: pack !== undefined, ...(check.pack ? { previous: check.pack.outputs } : {}) };
  try {
    emitter = staging ? await StreamingEmitter.open(staging, settings, emitterOptions) : undefined;

    // In name order: emit (a record the 80-column layout cannot hold fails its species), then summarise.
    const sink = async (given: SpeciesOutcome): Promise<void> => {
      let o = given;
      const te = performance.now();
      let tableMs = 0;
      let rendered: RenderedSpecies | undefined;
      let digests: RenderedDigests | undefined;
      if (o.stored?.built && emitter) {
        if (o.stored.built.rendered) digests = await emitter.addRendered(o.valid.name, o.stored.built.rendered);
        else {
          const lookup: { outcome?: CacheOutcome; reason?: string } = {};
          digests = await emitter.addDigested(o.valid.name, o.stored.built.digests ?? {}, () => textsOf(o, lookup));
          if (!digests) o = await rebuilt(o, lookup);
        }
      }
      if (o.built && emitter) {
        try {
          ({ tableMs, rendered, digests } = await emitter.add(o.built));
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
      // What a rebuild with nothing changed takes instead of building this species again.
      if (emitter && !o.stored && o.valid.resultKey !== undefined && storable(o)) {
        await writeEntry(cache, 'result', o.valid.resultKey, toStored(o, rendered));
      }
      // And the same without the texts, for the build pack of the next build.
      if (pack && emitter && o.valid.resultKey !== undefined && storable(o)) {
        const line = o.packLine ?? packLineOf(o, digests);
        if (line !== undefined) pack.addResult(o.valid.resultKey, line);
      }
      emitMs += performance.now() - te;
      processed++;
      if (!isBuilt(o)) failedCount++;
      if (o.keys) for (const k of o.keys) usedKeys.add(k);
      if (o.valid.resultKey !== undefined) usedKeys.add(`result/${o.valid.resultKey}`);
      speciesDiagnostics.push(...o.diagnostics);
      for (const n of o.cacheNotes) warnings.push(`${o.valid.name}: ${n}`);
      const s = summaryEntry(o, ownDiagnostics.get(speciesKey(o.valid.displayFile, o.valid.name)) ?? [], tableMs);
      summaryEntries.add(s);
      reportWriter?.add({
        name: o.valid.name,
        file: o.valid.file,
        status: s.status,
        species: o.valid.species!,
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
      const window = Math.max(2, jobs * 4);
      const inflight: Array<Promise<SpeciesOutcome[]>> = [];
      const consume = async () => {
        for (const o of await inflight.shift()!) await sink(o);
      };
      for (const batch of batches) {
        inflight.push(
          resolveBatch(batch).then((outs) => {
            for (const o of outs) {
              done++;
              progress({ kind: 'species-done', name: o.valid.name, ok: isBuilt(o), cacheHit: isCacheHit(o), done, total });
            }
            return outs;
          }),
        );
        if (inflight.length >= window) await consume();
      }
      while (inflight.length > 0) await consume();
    }
    await previous?.stop();
    await pool.close();
    cache.flushWrites();
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
            [...summaryEntries.failedNames(), ...shardInvalid.flatMap((e) => (e.name === undefined ? [] : [e.name]))],
            [...check.failedFiles].map((f) => (opts.displayBase && path.isAbsolute(f) ? displayPath(opts.displayBase, f) : f)),
          )
        : undefined;
    if (finalStaging) {
      emitter ??= await StreamingEmitter.open(finalStaging, settings);
      await emitter.finish(mark);
      // Written before the swap so that a failure is reported; should the swap fail, the pack still says
      // only what is checked before use (its outputs are compared by digest with whatever OUT then holds).
      if (pack && check.fastContext !== undefined) {
        for (const r of emitter.records) pack.addOutput(r);
        await pack.write(cacheDir!, packIdentity(opts.dir, opts.out), check.fastContext, check.pack).catch((e) => cache.noteWriteFailure(e));
      }
    }
    if (finalStaging && reportWriter) {
      const report = reportWriter.finish(status, shardInvalid.map((i) => `${i.file}#${i.document}: ${i.diagnostics.find((d) => d.severity === 'error')?.message ?? 'invalid'}`));
      await finalStaging.write('report.html', report.main);
      for (const [page, html] of report.pages) await finalStaging.write(page, html);
    }
    const outputs = finalStaging ? [...[...finalStaging.written].sort(), 'summary.json'] : [];
    emitMs += performance.now() - tEmit;

    for (const inv of shardInvalid) {
      summaryEntries.add({
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
    summaryEntries.sort();
    const failedLabels = summaryEntries.failedLabels();

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
        cache_hits: summaryEntries.cacheHits,
        files: check.files.length,
        files_failed: check.failedFiles.size,
      },
      warnings,
      settings_diagnostics: check.diagnostics.filter((d) => path.basename(d.file) === 'qforge.yaml').map(formatDiagnostic),
      species: [],
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
      const out = await finalStaging.stream('summary.json');
      try {
        await summaryEntries.write(out, summary);
      } finally {
        await out.close();
      }
      published = true;
      replaced = (await finalStaging.publish(opts.hooks)).replaced;
    }
    // The species entries are parsed back only for a caller that reads them (--json, tests); their texts
    // come back from the spill file now, after the workers are gone, while it is still open.
    await summaryEntries.settle();
    const summaryWithSpecies = {} as Summary;
    for (const [k, v] of Object.entries(summary)) {
      if (k === 'species') Object.defineProperty(summaryWithSpecies, k, { get: () => summaryEntries.species(), enumerable: true });
      else summaryWithSpecies[k] = v;
    }
    const report: BuildReport = {
      exitCode: anyError ? 1 : 0,
      written: mayWrite,
      replaced,
      summary: summaryWithSpecies,
      diagnostics: allDiagnostics,
      notes,
      warnings,
      failed: failedLabels,
    };
    if (notWrittenReason !== undefined && !mayWrite) report.notWrittenReason = notWrittenReason;
    if (check.settingsFile !== undefined) report.settingsFile = check.settingsFile;
    return report;
  } finally {
    pack?.discard();
    await pool.close();
    await emitter?.close();
    if (!published) await staging?.discard();
  }
}

/** The summary entry of one species (its warnings: the validation ones of its file, then its own). */
function summaryEntry(o: SpeciesOutcome, own: readonly Diagnostic[], emitMs: number): SummarySpecies {
  const s: SummarySpecies = {
    name: o.valid.name,
    file: o.valid.file,
    status: isBuilt(o) ? 'ok' : 'failed',
    warnings: [...own, ...o.diagnostics].filter((d) => d.severity === 'warning').map(formatDiagnostic).concat(o.cacheNotes),
    errors: o.diagnostics.filter((d) => d.severity === 'error').map(formatDiagnostic),
    cache: o.cache,
    cache_hit: isCacheHit(o),
    timings_ms: timingsOf(o.timings, emitMs),
  };
  const fm = o.stored ? o.stored.built?.fitMetrics : fitMetricsOf(o);
  if (fm) s.fit_metrics = fm;
  return s;
}

/** `{ ...timings, emit }` rounded to µs (a loop: one object per species, not four arrays). */
function timingsOf(timings: SpeciesOutcome['timings'], emitMs: number): Record<string, number> {
  const out: Record<string, number> = {};
  for (const k in timings) out[k] = ms(timings[k as keyof typeof timings]!);
  out.emit = ms(emitMs);
  return out;
}

/** The summary's fit metrics of a built species: largest errors over both ranges, and T_mid. */
function fitMetricsOf(o: SpeciesOutcome): SummarySpecies['fit_metrics'] {
  const fm = o.built?.fit.metrics;
  if (!fm || !o.built) return undefined;
  return {
    max_abs_cp: Math.max(fm.low.maxAbs.cp, fm.high.maxAbs.cp),
    max_abs_h: Math.max(fm.low.maxAbs.h, fm.high.maxAbs.h),
    max_abs_s: Math.max(fm.low.maxAbs.s, fm.high.maxAbs.s),
    t_mid: o.built.fit.polynomial.tMid,
  };
}

/** Whether the species was built and written (freshly or from its result entry). */
function isBuilt(o: SpeciesOutcome): boolean {
  return o.stored ? o.stored.built !== undefined : o.built !== undefined;
}

/** The outcome of a species that failed before it was built, with one error. */
function failedOutcome(v: ValidSpecies, message: string, code?: string): SpeciesOutcome {
  return {
    valid: v,
    diagnostics: [{ severity: 'error', ...(code !== undefined ? { code } : {}), file: v.displayFile, species: v.name, ...(v.positions.name ?? {}), path: '', message }],
    cache: {},
    cacheNotes: [],
    timings: { load: v.loadMs, validate: v.validateMs },
  };
}

/** The options of a build, besides the settings, that change what a species' outputs hold. */
export function buildContext(opts: { uncertaintySamples?: number }): Record<string, unknown> {
  return opts.uncertaintySamples !== undefined ? { uncertaintySamples: opts.uncertaintySamples } : {};
}

/** A species taken from its result entry: reported as a hit of each stage it went through. */
function storedOutcome(v: ValidSpecies, s: StoredResult, ms: number): SpeciesOutcome {
  const cache: SpeciesOutcome['cache'] = {};
  for (const k of s.stages) cache[k] = 'hit';
  cache.result = 'hit';
  const o: SpeciesOutcome = { valid: v, stored: s, diagnostics: [...s.diagnostics], cache, cacheNotes: [], timings: { load: v.loadMs, validate: v.validateMs, result: ms } };
  if (s.keys) o.keys = s.keys;
  return o;
}

/**
 * Whether an outcome may be stored as a result entry: not one that failed because something went wrong
 * while building it (a crash, a thrown stage, a file that changed meanwhile), which another run may not
 * repeat; fit-check failures and unwritable records are results like any other.
 */
function storable(o: SpeciesOutcome): boolean {
  return o.diagnostics.every((d) => (d.severity === 'warning' || d.code !== undefined) && !(d.code !== undefined && /-failed$|^species-file-changed$/.test(d.code)));
}

function toStored(o: SpeciesOutcome, rendered: RenderedSpecies | undefined): StoredResult {
  const s: StoredResult = { diagnostics: o.diagnostics, stages: STAGE_KINDS.filter((k) => o.cache[k] !== undefined) };
  if (o.keys) s.keys = o.keys;
  const fitMetrics = fitMetricsOf(o);
  if (o.built && rendered) s.built = { rendered, ...(fitMetrics ? { fitMetrics } : {}) };
  return s;
}

/**
 * The build pack line of a species (storage/build-pack.ts): its stored result with the digests of its texts
 * instead of the texts; undefined for a built species whose digests are unknown.
 */
function packLineOf(o: SpeciesOutcome, digests: RenderedDigests | undefined): string | undefined {
  const s: StoredResult = o.stored
    ? { diagnostics: o.stored.diagnostics, stages: o.stored.stages, ...(o.stored.keys ? { keys: o.stored.keys } : {}) }
    : toStored(o, undefined);
  if (isBuilt(o)) {
    if (!digests) return undefined;
    const fitMetrics = o.stored ? o.stored.built?.fitMetrics : fitMetricsOf(o);
    s.built = { digests, ...(fitMetrics ? { fitMetrics } : {}) };
  }
  return encodeEntry(s);
}

const STAGE_KINDS = ['samples', 'fit', 'table'] as const;

/** The settings positions the per-species stages quote, as plain data for the workers. */
function plainLimitsOf(settingsFile: string | undefined, settingsSetAt: CheckReport['settingsSetAt']): PlainLimitSource {
  const setAt: PlainLimitSource['setAt'] = {};
  for (const segments of LIMIT_KEYS) {
    const at = settingsSetAt?.([...segments]);
    if (at) setAt[segments.join('.')] = { line: at.line, column: at.column };
  }
  return { setAt, ...(settingsFile !== undefined ? { settingsFile } : {}) };
}

/** Cache hit: nothing of the species was recomputed (its stage results, or its whole result, from the cache). */
function isCacheHit(o: SpeciesOutcome): boolean {
  // A loop, not flatMap/every: called twice per species (progress and summary) on a rebuild's hot path.
  let any = false;
  for (const k of STAGE_KINDS) {
    const x = o.cache[k];
    if (x === undefined) continue;
    if (x !== 'hit') return false;
    any = true;
  }
  return any;
}

