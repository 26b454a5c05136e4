/**
 * Readers for `diff` and `compare`: a build folder (thermo.json, or nasa7.txt when the build wrote no
 * JSON) or any file in the 80-column layout, as one set of named polynomials. A build folder is read
 * through `resolveReadableBuild`, so a swap interrupted half-way still yields the previous complete set.
 *
 * Every file goes through `readInputFile`: a missing path, a folder where a file is expected, a device or
 * FIFO, or a file we may not read is a usage error (exit 2, like a missing path); a file over
 * MAX_INPUT_BYTES (64 MiB; a 1000-species nasa7.txt is about 330 kB) or one the system fails to read
 * (e.g. EIO) is an input failure (exit 1). Never a stack trace.
 */
import { open, stat } from 'node:fs/promises';
import path from 'node:path';
import { GAS_CONSTANT, T_REF } from '../../src/constants.js';
import { evaluateNasa7 } from '../../src/nasa7/evaluate.js';
import { parseNasa7File } from '../../src/nasa7/parse.js';
import type { Nasa7Polynomial } from '../../src/nasa7/types.js';
import { resolveReadableBuild } from './atomic-write.js';
import type { DatabaseSettings } from '../core/settings.js';

export interface NamedPolynomial {
  name: string;
  polynomial: Nasa7Polynomial;
  /** 'sha256:…' of the input, when the set came from thermo.json. */
  inputHash?: string;
  /** The normalised input recorded in thermo.json (absent in older builds and in 80-column files). */
  input?: unknown;
}

export interface PolynomialSet {
  label: string;
  /** What was read, e.g. `build/thermo.json`. */
  origin: string;
  /** The layout that was read: full-precision JSON or the 80-column records (9 significant digits). */
  format: 'thermo.json' | 'nasa7';
  /** True when `label` named a build folder (so its other file can be read instead, see `preferNasa7`). */
  fromFolder: boolean;
  species: Map<string, NamedPolynomial>;
  /** Build settings, when the set came from thermo.json. */
  settings?: DatabaseSettings;
  /** summary.json's `code_fingerprint`, when the set is a build folder whose summary records it. */
  codeFingerprint?: string;
}

/** The path does not exist or is not something `diff`/`compare` can read: a usage error. */
export class ReadBuildUsageError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'UsageError';
  }
}

/** The file exists but its content is malformed: an input failure. */
export class ReadBuildError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'ReadBuildError';
  }
}

/** Largest file `diff`/`compare` read (thermo.json, 80-column files, reference tables): 64 MiB. */
export const MAX_INPUT_BYTES = 64 * 1024 * 1024;

const errnoOf = (e: unknown) => (e as NodeJS.ErrnoException | undefined)?.code;

/**
 * The error for a failed stat/open/read of an input: not there → usage error "no such file"; not
 * permitted → usage error "permission denied" (both exit 2, like any bad path argument); anything else
 * (EIO, ELOOP, ...) → input failure naming the code (exit 1).
 */
export function inputReadError(e: unknown, what: string, label: string, missing = 'no such file'): ReadBuildUsageError | ReadBuildError {
  const code = errnoOf(e);
  const name = what ? `${what} ${label}` : label;
  if (code === 'ENOENT' || code === 'ENOTDIR') return new ReadBuildUsageError(`${name}: ${missing}`);
  if (code === 'EACCES' || code === 'EPERM') return new ReadBuildUsageError(`${name}: permission denied (${code})`);
  return new ReadBuildError(`${name}: cannot read it (${code ?? String(e)})`);
}

/**
 * Reads a whole text file for diff/compare with clean errors (see the module comment). `what` names the
 * role in messages ("reference", "build file"). Reads at most maxBytes + 1 bytes, so a file whose size
 * `stat` misreports (/proc, a growing log) cannot exhaust memory either.
 */
export async function readInputFile(p: string, label: string, what = 'file', maxBytes = MAX_INPUT_BYTES): Promise<string> {
  let info;
  try {
    info = await stat(p);
  } catch (e) {
    throw inputReadError(e, what, label);
  }
  if (info.isDirectory()) throw new ReadBuildUsageError(`${what} ${label} is a folder; expected a file`);
  if (!info.isFile()) throw new ReadBuildUsageError(`${what} ${label} is not a regular file (a device, FIFO or socket); expected a file`);
  const tooLarge = (n: string) =>
    new ReadBuildError(`${what} ${label} is too large (${n}); the limit is ${maxBytes / (1024 * 1024)} MiB, far above any thermo file`);
  if (info.size > maxBytes) throw tooLarge(`${(info.size / (1024 * 1024)).toFixed(1)} MiB`);
  let handle;
  try {
    handle = await open(p, 'r');
  } catch (e) {
    throw inputReadError(e, what, label);
  }
  try {
    const chunks: Buffer[] = [];
    let total = 0;
    for (;;) {
      const buf = Buffer.alloc(Math.min(1024 * 1024, maxBytes + 1 - total));
      const { bytesRead } = await handle.read(buf, 0, buf.length, null);
      if (bytesRead === 0) break;
      chunks.push(buf.subarray(0, bytesRead));
      total += bytesRead;
      if (total > maxBytes) throw tooLarge(`more than ${maxBytes / (1024 * 1024)} MiB`);
    }
    return Buffer.concat(chunks).toString('utf8');
  } catch (e) {
    if (e instanceof ReadBuildError) throw e;
    throw inputReadError(e, what, label);
  } finally {
    await handle.close();
  }
}

/** Whether `p` exists; errors other than "not there" (EACCES, EIO) are reported, not taken for absence. */
async function present(p: string, label: string): Promise<boolean> {
  try {
    await stat(p);
    return true;
  } catch (e) {
    const code = errnoOf(e);
    if (code === 'ENOENT' || code === 'ENOTDIR') return false;
    throw inputReadError(e, '', label);
  }
}

function fromThermoJson(text: string, origin: string, label: string, fromFolder: boolean): PolynomialSet {
  let db: unknown;
  try {
    db = JSON.parse(text);
  } catch (e) {
    throw new ReadBuildError(`${origin}: not valid JSON (${(e as Error).message})`);
  }
  const d = db as { format?: unknown; species?: unknown; build_settings?: DatabaseSettings };
  // /1 differs from /2 only in key spelling outside the fields read here.
  if ((d?.format !== 'qforge-database/2' && d?.format !== 'qforge-database/1') || !Array.isArray(d.species)) {
    throw new ReadBuildError(`${origin}: not a qforge database (format ${JSON.stringify(d?.format)})`);
  }
  const species = new Map<string, NamedPolynomial>();
  d.species.forEach((s: { name?: unknown; temperature_ranges?: { low: number; mid: number; high: number }; coefficients?: { low: number[]; high: number[] }; input_hash?: string; input?: unknown }, i: number) => {
    const r = s.temperature_ranges;
    const c = s.coefficients;
    if (typeof s.name !== 'string' || !r || !c || c.low?.length !== 7 || c.high?.length !== 7) {
      throw new ReadBuildError(`${origin}: species[${i}] is malformed`);
    }
    const entry: NamedPolynomial = {
      name: s.name,
      polynomial: { tLow: r.low, tMid: r.mid, tHigh: r.high, low: c.low as never, high: c.high as never },
    };
    if (s.input_hash) entry.inputHash = s.input_hash;
    if (s.input !== undefined) entry.input = s.input;
    species.set(s.name, entry);
  });
  const set: PolynomialSet = { label, origin, format: 'thermo.json', fromFolder, species };
  if (d.build_settings) set.settings = d.build_settings;
  return set;
}

function fromNasa7(text: string, origin: string, label: string, fromFolder: boolean): PolynomialSet {
  const parsed = parseNasa7File(text, origin);
  if (parsed.errors.length) {
    throw new ReadBuildError(parsed.errors.map((e) => `${origin}:${e.line}: ${e.message}`).join('\n'));
  }
  const species = new Map<string, NamedPolynomial>();
  for (const r of parsed.records) {
    if (species.has(r.name)) throw new ReadBuildError(`${origin}: record ${JSON.stringify(r.name)} appears twice`);
    species.set(r.name, { name: r.name, polynomial: r.polynomial });
  }
  return { label, origin, format: 'nasa7', fromFolder, species };
}

/** A file already read (e.g. a reference): a thermo.json when it ends in .json, else 80-column records. */
export function polynomialSetFromText(text: string, label: string): PolynomialSet {
  return /\.json$/i.test(label) ? fromThermoJson(text, label, label, false) : fromNasa7(text, label, label, false);
}

export interface ReadOptions {
  /**
   * For a build folder: read nasa7.txt even when thermo.json is there (diff against an 80-column file
   * compares like with like: the same 9-digit records on both sides).
   */
  preferNasa7?: boolean;
}

/** Reads a build folder or an 80-column file (or a thermo.json given as a file). */
export async function readPolynomialSet(p: string, label: string, opts: ReadOptions = {}): Promise<PolynomialSet> {
  const dir = await resolveReadableBuild(p);
  let info;
  try {
    info = await stat(dir);
  } catch (e) {
    throw inputReadError(e, '', label, 'no such build folder or file');
  }
  if (!info.isDirectory()) {
    const text = await readInputFile(dir, label, 'build file');
    return p.endsWith('.json') ? fromThermoJson(text, label, label, false) : fromNasa7(text, label, label, false);
  }
  const set = await readBuildFolder(dir, label, opts);
  const fingerprint = await summaryFingerprint(dir);
  if (fingerprint) set.codeFingerprint = fingerprint;
  return set;
}

/**
 * summary.json's code fingerprint, or undefined when the summary is missing, unreadable or older than the
 * field: only `diff`'s "code changed" line depends on it, so it never fails a read.
 */
async function summaryFingerprint(dir: string): Promise<string | undefined> {
  try {
    const text = await readInputFile(path.join(dir, 'summary.json'), 'summary.json', 'build file');
    const f = (JSON.parse(text) as { code_fingerprint?: unknown }).code_fingerprint;
    return typeof f === 'string' ? f : undefined;
  } catch {
    return undefined;
  }
}

async function readBuildFolder(dir: string, label: string, opts: ReadOptions): Promise<PolynomialSet> {
  const json = path.join(dir, 'thermo.json');
  const nasa = path.join(dir, 'nasa7.txt');
  const jsonLabel = path.join(label, 'thermo.json');
  const nasaLabel = path.join(label, 'nasa7.txt');
  if (opts.preferNasa7 && (await present(nasa, nasaLabel))) return fromNasa7(await readInputFile(nasa, nasaLabel, 'build file'), nasaLabel, label, true);
  if (await present(json, jsonLabel)) return fromThermoJson(await readInputFile(json, jsonLabel, 'build file'), jsonLabel, label, true);
  if (await present(nasa, nasaLabel)) return fromNasa7(await readInputFile(nasa, nasaLabel, 'build file'), nasaLabel, label, true);
  throw new ReadBuildUsageError(`${label}: folder holds neither thermo.json nor nasa7.txt`);
}

/**
 * x.toFixed(digits), but never "-0.0000": a value that rounds to zero prints without a sign. Use it for
 * every number in a diff/compare table.
 */
export function formatFixed(x: number, digits: number): string {
  if (!Number.isFinite(x)) return String(x);
  const s = x.toFixed(digits);
  return /^-0(\.0*)?$/.test(s) ? s.slice(1) : s;
}

/** Signed fixed-point ("+0.0012", "-0.1748"); zero, and anything rounding to it, prints as "+0.0000". */
export function formatSigned(x: number, digits: number): string {
  const s = formatFixed(x, digits);
  return s.startsWith('-') || !Number.isFinite(x) ? s : `+${s}`;
}

export interface Properties {
  /** J/(mol K) */
  cp: number;
  /** Absolute H, kJ/mol */
  h: number;
  /** J/(mol K) */
  s: number;
  /** H − H(298.15) of the same polynomial, kJ/mol */
  hMinusH298: number;
}

/** Properties of a polynomial in table units at T (K). */
export function polynomialProperties(poly: Nasa7Polynomial, T: number): Properties {
  const R = GAS_CONSTANT;
  const v = evaluateNasa7(poly, T);
  const ref = evaluateNasa7(poly, T_REF);
  const h = (v.hRT * R * T) / 1000;
  return { cp: v.cpR * R, h, s: v.sR * R, hMinusH298: h - (ref.hRT * R * T_REF) / 1000 };
}
