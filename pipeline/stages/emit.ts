/**
 * Stage "emit": renders the database files from the built species and writes them atomically (see
 * atomic-write.ts). Rendering is pure and deterministic: species sorted by name (code-point order), numbers
 * printed by JavaScript's shortest round-trip form in JSON and by fixed decimals in CSV, no dates.
 *
 *   thermo.json        the database (schemas/database.schema.json), validated before it is written
 *   nasa7.txt          the four-line 80-column records, caution comment lines ('!') on top
 *   tables/<name>.csv  computed and fitted values and their difference on the table grid
 *   summary.json       the build report (schemas/summary.schema.json); holds timings, so it is the one
 *                      output that differs from run to run
 */
import type { Ajv2020 } from 'ajv/dist/2020.js';
import { ajv2020Module } from '../core/lazy-libraries.js';
import settingsSchema from '../../schemas/settings.schema.json' with { type: 'json' };
import type { ValidateFunction } from 'ajv';
import { OUTPUT_AJV_OPTIONS } from '../core/output-schemas.js';
import { validateDatabaseEnvelope as generatedDatabaseEnvelope } from '../generated/output-validators.js';
import summarySchema from '../../schemas/summary.schema.json' with { type: 'json' };
import type { Species, StandardProperties } from '../../src/model.js';
import { formatNasa7File } from '../../src/nasa7/format.js';
import { roundForRecord } from '../../src/nasa7/round.js';
import type { FitMetrics, FitResult, Nasa7Record, RangeMetrics } from '../../src/nasa7/types.js';
import type { ComputedSpecies } from './compute.js';
import type { SpeciesUncertainty } from '../../src/uncertainty/types.js';
import { uncertaintyJson } from './uncertainty.js';
import type { DatabaseSettings } from '../core/settings.js';
import { standardPressurePa } from '../core/settings.js';
import { CONSTANTS_EDITION, TOOL_NAME, TOOL_VERSION } from '../core/version.js';
import { compareText } from '../core/text.js';
import { snakeKeys } from '../core/snake-case.js';

/** thermo.json's format; /2 made every key snake_case (read-build.ts still reads /1). */
export const DATABASE_FORMAT = 'qforge-database/2';

export const CAUTION =
  'CAUTION: these polynomials are valid only inside the temperature range they were fitted on; outside it ' +
  'they are extrapolations and may be badly wrong. The data come from statistical-mechanics models and the ' +
  'input constants named in each species\' sources; verify them against reference data (e.g. NIST-JANAF) ' +
  'before use, and defer to qualified review and the applicable codes and standards for any ' +
  'safety-relevant design decision.';

/**
 * tables/README.txt: what the CSV columns are, and the caution. The caution cannot go inside the CSV files
 * without breaking readers that expect the header on the first line, so it travels beside them.
 */
export function renderTablesReadme(settings: { title: string; standard_pressure: string }): string {
  const paragraphs = [
    `${settings.title}: property tables written by qforge.`,
    `One file per species, ideal gas at ${settings.standard_pressure}. For Cp and S in J/(mol K) and for H-H298, H ` +
      'and G in kJ/mol there are three columns each: "computed" from the partition functions, "fitted" from the ' +
      'NASA 7-coefficient polynomial in thermo.json and nasa7.txt, and "fitted-computed", their difference. H is ' +
      'the absolute standard enthalpy (formation enthalpy at 298.15 K plus H-H298); G = H - T S.',
    CAUTION,
  ];
  return `${paragraphs.map((p) => wrapWords(p, 78).join('\n')).join('\n\n')}\n`;
}

export function wrapWords(text: string, width: number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const w of text.split(/\s+/)) {
    if (line && line.length + 1 + w.length > width) {
      lines.push(line);
      line = w;
    } else line = line ? `${line} ${w}` : w;
  }
  if (line) lines.push(line);
  return lines;
}

/** Everything emit needs about one successfully built species. */
export interface BuiltSpecies {
  name: string;
  /** Species file relative to the database folder (display form). */
  file: string;
  species: Species;
  /** 'sha256:<hex>' of the species' normalised input. */
  inputHash: string;
  /** The normalised input itself (what `inputHash` hashes), recorded so `diff` can name the fields that moved. */
  input?: unknown;
  computed: ComputedSpecies;
  fit: FitResult;
  /** Computed properties on the table grid (empty when tables are not written, or rendered as `tableText`). */
  table: StandardProperties[];
  /**
   * tables/<name>.csv as `renderTable` makes it, rendered where the species was built (a worker thread,
   * which then sends the text instead of the table points: a flat string crosses threads cheaper than 60
   * objects, and the main thread, which emits every species, does less).
   */
  tableText?: string;
  /** Propagated uncertainties (pipeline/stages/uncertainty.ts); zeros when the species declares none. */
  uncertainty?: SpeciesUncertainty;
}

/** Code-point order (not locale order), so that the output never depends on the machine's locale. */
export const byName = (a: { name: string }, b: { name: string }): number => compareText(a.name, b.name);

// ---------------------------------------------------------------------------------------------------------
// File names

const SAFE_CHAR = /[A-Za-z0-9._+(),-]/;

/**
 * Maps a species name to a file name that can only name a file directly inside the tables folder:
 * characters outside [A-Za-z0-9._+(),-] and leading dots are percent-encoded (so `..`, `../x` or `a/b`
 * cannot climb out), and the mapping is one-to-one because '%' itself is encoded.
 */
export function speciesFileStem(name: string): string {
  let out = '';
  let leading = true;
  for (const ch of name) {
    const encode = !SAFE_CHAR.test(ch) || (leading && ch === '.');
    if (ch !== '.') leading = false;
    out += encode ? [...Buffer.from(ch, 'utf8')].map((b) => `%${b.toString(16).toUpperCase().padStart(2, '0')}`).join('') : ch;
  }
  return out || '%00';
}

/**
 * Table file names of all species: the stem plus `.csv`; names that would collide on a case-insensitive
 * file system (e.g. CO and Co) get a short hash of the exact name appended, the first in name order keeps
 * the plain form.
 */
export function tableFileNames(names: readonly string[], hash: (s: string) => string): Map<string, string> {
  const taken = new Set<string>();
  const out = new Map<string, string>();
  for (const name of [...names].sort()) {
    let stem = speciesFileStem(name);
    if (taken.has(stem.toLowerCase())) stem = `${stem}_${hash(name).slice(0, 8)}`;
    taken.add(stem.toLowerCase());
    out.set(name, `tables/${stem}.csv`);
  }
  return out;
}

// ---------------------------------------------------------------------------------------------------------
// thermo.json

function rangeMetricsJson(m: RangeMetrics) {
  return { points: m.points, max_abs: { ...m.maxAbs }, rms: { ...m.rms }, t_at_max: { ...m.tAtMax } };
}

export function fitMetricsJson(m: FitMetrics) {
  return {
    low: rangeMetricsJson(m.low),
    high: rangeMetricsJson(m.high),
    continuity: { ...m.continuity },
    anchor: { ...m.anchor },
  };
}

export function speciesJson(b: BuiltSpecies) {
  const p = b.fit.polynomial;
  return {
    name: b.name,
    file: b.file,
    composition: { ...b.species.composition },
    charge: b.species.charge,
    phase: 'G',
    molar_mass_g_per_mol: b.species.molarMass,
    temperature_ranges: { low: p.tLow, mid: p.tMid, high: p.tHigh },
    coefficients: { low: [...p.low], high: [...p.high] },
    at_298_15: {
      enthalpy_of_formation_kj_per_mol: b.computed.enthalpyOfFormation298 / 1000,
      entropy_j_per_mol_k: b.computed.at298.S,
      heat_capacity_j_per_mol_k: b.computed.at298.Cp,
      h298_minus_h0_kj_per_mol: b.computed.h298MinusH0 / 1000,
    },
    fit_metrics: fitMetricsJson(b.fit.metrics),
    model: {
      structure: b.computed.summary.structure,
      contributions: [...b.computed.summary.contributions],
      options: snakeKeys(b.computed.summary.options) as Record<string, string | number | boolean>,
      notes: [...b.computed.summary.notes],
    },
    input_hash: b.inputHash,
    ...(b.input !== undefined ? { input: b.input } : {}),
    sources: [...b.species.sources],
    ...(b.uncertainty ? { uncertainty: uncertaintyJson(b.uncertainty) } : {}),
  };
}

export function databaseJson(species: readonly BuiltSpecies[], settings: DatabaseSettings) {
  return {
    format: DATABASE_FORMAT,
    tool: { name: TOOL_NAME, version: TOOL_VERSION },
    constants_edition: CONSTANTS_EDITION,
    standard_pressure: { label: settings.standard_pressure, pascal: standardPressurePa(settings.standard_pressure) },
    title: settings.title,
    caution: CAUTION,
    build_settings: settings,
    species: [...species].sort(byName).map(speciesJson),
  };
}

/**
 * An Ajv instance for our own output schemas (the settings schema added, which they refer to). Our schemas
 * are fixed: checking them against the meta-schema on every run would cost more than the validation itself
 * (test/pipeline/fast-rebuild.test.ts checks them). The streamed files' validators are compiled ahead of time
 * (core/output-schemas.ts); this one compiles the rest on first use (the whole summary of `qforge merge`).
 */
export function outputAjv(): Ajv2020 {
  const ajv = new (ajv2020Module().Ajv2020)({ ...OUTPUT_AJV_OPTIONS });
  ajv.addSchema(settingsSchema);
  return ajv;
}
let summaryValidator: ReturnType<Ajv2020['compile']> | undefined;

/** Thrown when a rendered output does not match its own schema: a bug, never written to disk. */
export class OutputSchemaError extends Error {
  constructor(file: string, errors: unknown) {
    super(`${file} does not match its schema (not written): ${JSON.stringify(errors).slice(0, 2000)}`);
    this.name = 'OutputSchemaError';
  }
}

/**
 * Validates thermo.json without its species (the streaming emit validates each species record on its own):
 * the database schema with the species list required to be empty, compiled ahead of time
 * (core/output-schemas.ts, scripts/generate-validators.mjs).
 */
const compiledDatabaseEnvelope = generatedDatabaseEnvelope as unknown as ValidateFunction;
export function validateDatabaseEnvelope(value: unknown): void {
  if (!compiledDatabaseEnvelope(value)) throw new OutputSchemaError('thermo.json', compiledDatabaseEnvelope.errors);
}

export function validateSummaryJson(value: unknown): void {
  const v = (summaryValidator ??= outputAjv().compile(summarySchema));
  if (!v(value)) throw new OutputSchemaError('summary.json', v.errors);
}

export const jsonText = (value: unknown): string => `${JSON.stringify(value, null, 2)}\n`;

// ---------------------------------------------------------------------------------------------------------
// nasa7.txt

/** Element/count pairs of the 80-column record: the composition, plus the electron for ions. */
export function recordElements(species: Species): Array<[string, number]> {
  const pairs: Array<[string, number]> = Object.entries(species.composition);
  // The free electron's composition is its own E 1 (its charge is that electron).
  if (species.charge !== 0 && !Object.hasOwn(species.composition, 'E')) pairs.push(['E', -species.charge]);
  return pairs;
}

/**
 * The 80-column record of a built species. Its coefficients are re-derived by `roundForRecord` so that the
 * nine digits the layout holds still keep the two ranges continuous at T_mid (to ~1e-8) and H, S at 298.15 K;
 * thermo.json keeps the unrounded coefficients.
 */
export function nasa7Record(b: BuiltSpecies, identifier: string): Nasa7Record {
  return {
    name: b.name,
    identifier,
    elements: recordElements(b.species),
    phase: 'G',
    polynomial: roundForRecord(b.fit.polynomial),
  };
}

/** '!' comment lines written above the records. */
export function nasa7CautionLines(settings: DatabaseSettings): string[] {
  const text = `${settings.title} -- written by ${TOOL_NAME} ${TOOL_VERSION} (${CONSTANTS_EDITION}, standard pressure ${settings.standard_pressure}). ${CAUTION}`;
  return wrapWords(text, 77).map((l) => `! ${l}`);
}

/** The whole nasa7.txt: caution lines, then the formatter's header, records and terminator. */
export function renderNasa7(species: readonly BuiltSpecies[], settings: DatabaseSettings): string {
  const records = [...species].sort(byName).map((b) => nasa7Record(b, settings.record_identifier));
  const { low, mid, high } = settings.temperature_ranges;
  const body = formatNasa7File(records, { tLow: low, tMid: mid, tHigh: high });
  return `${nasa7CautionLines(settings).join('\n')}\n${body}${body.endsWith('\n') ? '' : '\n'}`;
}

// ---------------------------------------------------------------------------------------------------------
// tables/<name>.csv: rendered by emit-table.ts (a module of its own, without the schema validators, so a
// worker thread can render a table without loading them).

export { TABLE_HEADERS, csvText, fittedProperties, fixed, fixedByToFixed, renderTable } from './emit-table.js';
