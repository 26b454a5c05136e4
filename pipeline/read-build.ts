/**
 * Readers for `diff` and `compare`: a build folder (thermo.json, or nasa7.txt when the build wrote no
 * JSON) or any file in the 80-column layout, as one set of named polynomials. A build folder is read
 * through `resolveReadableBuild`, so a swap interrupted half-way still yields the previous complete set.
 */
import { readFile, stat } from 'node:fs/promises';
import path from 'node:path';
import { GAS_CONSTANT, T_REF } from '../src/constants.js';
import { evaluateNasa7 } from '../src/nasa7/evaluate.js';
import { parseNasa7File } from '../src/nasa7/parse.js';
import type { Nasa7Polynomial } from '../src/nasa7/types.js';
import { resolveReadableBuild } from './atomic-write.js';
import type { DatabaseSettings } from './settings.js';

export interface NamedPolynomial {
  name: string;
  polynomial: Nasa7Polynomial;
  /** 'sha256:…' of the input, when the set came from thermo.json. */
  inputHash?: string;
}

export interface PolynomialSet {
  label: string;
  /** What was read, e.g. `build/thermo.json`. */
  origin: string;
  species: Map<string, NamedPolynomial>;
  /** Build settings, when the set came from thermo.json. */
  settings?: DatabaseSettings;
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

async function isFile(p: string): Promise<boolean> {
  try {
    return (await stat(p)).isFile();
  } catch {
    return false;
  }
}

function fromThermoJson(text: string, origin: string, label: string): PolynomialSet {
  let db: unknown;
  try {
    db = JSON.parse(text);
  } catch (e) {
    throw new ReadBuildError(`${origin}: not valid JSON (${(e as Error).message})`);
  }
  const d = db as { format?: unknown; species?: unknown; build_settings?: DatabaseSettings };
  if (d?.format !== 'qforge-database/1' || !Array.isArray(d.species)) {
    throw new ReadBuildError(`${origin}: not a qforge database (format ${JSON.stringify(d?.format)})`);
  }
  const species = new Map<string, NamedPolynomial>();
  d.species.forEach((s: { name?: unknown; temperature_ranges?: { low: number; mid: number; high: number }; coefficients?: { low: number[]; high: number[] }; input_hash?: string }, i: number) => {
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
    species.set(s.name, entry);
  });
  const set: PolynomialSet = { label, origin, species };
  if (d.build_settings) set.settings = d.build_settings;
  return set;
}

function fromNasa7(text: string, origin: string, label: string): PolynomialSet {
  const parsed = parseNasa7File(text, origin);
  if (parsed.errors.length) {
    throw new ReadBuildError(parsed.errors.map((e) => `${origin}:${e.line}: ${e.message}`).join('\n'));
  }
  const species = new Map<string, NamedPolynomial>();
  for (const r of parsed.records) {
    if (species.has(r.name)) throw new ReadBuildError(`${origin}: record ${JSON.stringify(r.name)} appears twice`);
    species.set(r.name, { name: r.name, polynomial: r.polynomial });
  }
  return { label, origin, species };
}

/** Reads a build folder or an 80-column file. */
export async function readPolynomialSet(p: string, label: string): Promise<PolynomialSet> {
  if (await isFile(p)) {
    const text = await readFile(p, 'utf8');
    return p.endsWith('.json') ? fromThermoJson(text, label, label) : fromNasa7(text, label, label);
  }
  const dir = await resolveReadableBuild(p);
  try {
    if (!(await stat(dir)).isDirectory()) throw new Error();
  } catch {
    throw new ReadBuildUsageError(`${label}: no such build folder or file`);
  }
  const json = path.join(dir, 'thermo.json');
  if (await isFile(json)) return fromThermoJson(await readFile(json, 'utf8'), path.join(label, 'thermo.json'), label);
  const nasa = path.join(dir, 'nasa7.txt');
  if (await isFile(nasa)) return fromNasa7(await readFile(nasa, 'utf8'), path.join(label, 'nasa7.txt'), label);
  throw new ReadBuildUsageError(`${label}: folder holds neither thermo.json nor nasa7.txt`);
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
