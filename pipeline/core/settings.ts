/**
 * Database settings: `qforge.yaml` at the root of a database folder. The shape (and every default) is
 * defined by `schemas/settings.schema.json`; this module reads the file, checks it against the schema and a
 * few cross-field rules, and fills the defaults once so later stages never look at optional input.
 *
 * Unknown keys are errors; a missing file means "all defaults".
 */
import { access } from 'node:fs/promises';
import path from 'node:path';
import schema from '../../schemas/settings.schema.json' with { type: 'json' };
import { STANDARD_PRESSURE_ATM, STANDARD_PRESSURE_BAR, T_REF } from '../../src/constants.js';
import type { Diagnostic } from './diagnostics.js';
import { SETTINGS_FILE_NAME, loadYamlFile, type LoadedDocument } from '../stages/load.js';
import type { ValidateFunction } from 'ajv';
import { validateSettingsInput } from '../generated/settings-validator.js';
import { checkAgainstSchema, formatFieldPath } from '../stages/schema-check.js';
import { MAX_END_GAP_FRACTION, MAX_INNER_GAP_FRACTION, MIN_DISTINCT_TEMPERATURES } from '../../src/nasa7/samples.js';
import { MAX_ANCHOR_EXTRAPOLATION } from '../../src/nasa7/options.js';
// plan.ts imports this module too; only functions cross the cycle, and only at call time.
import { temperatureGrid } from './grid.js';
import type { FitNodesSetting } from './fit-nodes.js';

export { SETTINGS_FILE_NAME };

export type StandardPressureLabel = '1 bar' | '1 atm';

export interface QuantityTriple {
  cp: number;
  h: number;
  s: number;
}

/**
 * A recorded, reasoned exception to `references.tolerances` (see schemas/settings.schema.json): inside
 * [from, to] K (inclusive; absent = unbounded) the given quantities of `species` may deviate up to the
 * widened limits. Used only by `qforge compare`; never by the build.
 */
export interface KnownDeviation {
  species: string;
  from?: number;
  to?: number;
  /** cp, s in J/(mol K); h (H−H298) in kJ/mol; only the quantities given are widened. */
  tolerances: Partial<QuantityTriple>;
  reason: string;
}

/** The fit limits of `tolerances`: limit of q at T = max(q, relative_to_cp.q · Cp/R(T)). */
export interface FitTolerancesSetting extends QuantityTriple {
  relative_to_cp: QuantityTriple;
}

/** Settings with every default filled in (same key names as the file). */
export interface DatabaseSettings {
  title: string;
  record_identifier: string;
  temperature_ranges: { low: number; mid: number; high: number };
  standard_pressure: StandardPressureLabel;
  fit: {
    weights: QuantityTriple;
    method: 'minimax' | 'least_squares';
    continuity_order: 1 | 2;
    optimise_mid: false | { min: number; max: number; step: number };
    sampling_step: number;
    /** Which sampling points the fit is made from (core/fit-nodes.ts); the check always uses all of them. */
    nodes: FitNodesSetting;
  };
  /** Dimensionless: |ΔCp/R|, |ΔH/RT|, |ΔS/R| (absolute parts) and multiples of Cp/R (relative_to_cp). */
  tolerances: FitTolerancesSetting;
  outputs: { thermo_json: boolean; nasa7: boolean; tables: boolean; report: boolean };
  tables: { from: number; to: number; step: number; extra: number[] };
  references: {
    files: string[];
    /** cp, s in J/(mol K); h (H−H298) in kJ/mol. */
    tolerances: QuantityTriple;
    known_deviations: KnownDeviation[];
  };
  /** Warnings are errors (pipeline/core/strict.ts), except the accepted ones. */
  strict: boolean;
  accepted_warnings: AcceptedWarning[];
}

/** A warning accepted in writing (settings or species `accepted_warnings`). */
export interface AcceptedWarning {
  code: string;
  species?: string;
  reason: string;
}

export const DEFAULT_SETTINGS: Readonly<DatabaseSettings> = Object.freeze({
  title: 'qforge database',
  record_identifier: 'QFORGE',
  temperature_ranges: { low: 200, mid: 1000, high: 6000 },
  standard_pressure: '1 bar',
  fit: {
    weights: { cp: 1, h: 1, s: 1 },
    method: 'minimax',
    continuity_order: 1,
    optimise_mid: { min: 700, max: 2500, step: 100 },
    sampling_step: 10,
    nodes: 'all',
  },
  tolerances: { cp: 0.1, h: 0.02, s: 0.02, relative_to_cp: { cp: 0.015, h: 0.003, s: 0.003 } },
  outputs: { thermo_json: true, nasa7: true, tables: true, report: false },
  tables: { from: 200, to: 6000, step: 100, extra: [298.15] },
  references: { files: [], tolerances: { cp: 0.5, h: 0.5, s: 0.5 }, known_deviations: [] },
  strict: false,
  accepted_warnings: [],
} satisfies DatabaseSettings);

type FitNodeSpacingName = Exclude<FitNodesSetting, 'all'>['spacing'];

/** Defaults of the keys of a written `fit.nodes` mapping (schemas/settings.schema.json). */
const DEFAULT_NODE_SET: Readonly<Exclude<FitNodesSetting, 'all'>> = Object.freeze({ spacing: 'geometric', count: 40, exchange: true });

/** Standard pressure in Pa for a settings label. */
export function standardPressurePa(label: StandardPressureLabel): number {
  return label === '1 atm' ? STANDARD_PRESSURE_ATM : STANDARD_PRESSURE_BAR;
}

type Json = Record<string, unknown>;
const isObject = (v: unknown): v is Json => v !== null && typeof v === 'object' && !Array.isArray(v);

/** Deep-merge a schema-valid settings object over the defaults (arrays replace, objects merge). */
export function withDefaults(input: unknown): DatabaseSettings {
  const merge = (base: unknown, over: unknown): unknown => {
    if (over === undefined) return structuredClone(base);
    if (isObject(base) && isObject(over)) {
      const out: Json = {};
      for (const k of new Set([...Object.keys(base), ...Object.keys(over)])) out[k] = merge(base[k], over[k]);
      return out;
    }
    return structuredClone(over);
  };
  const merged = merge(DEFAULT_SETTINGS, isObject(input) ? input : {}) as DatabaseSettings;
  const om = merged.fit.optimise_mid;
  if (om !== false && isObject(om) && om.step === undefined) om.step = 100;
  // A written node set over the default 'all' (a string, so nothing was merged into it) gets the schema's defaults.
  const nodes = merged.fit.nodes as unknown;
  if (isObject(nodes)) {
    const d = DEFAULT_NODE_SET;
    merged.fit.nodes = { spacing: (nodes.spacing as FitNodeSpacingName | undefined) ?? d.spacing, count: (nodes.count as number | undefined) ?? d.count, exchange: (nodes.exchange as boolean | undefined) ?? d.exchange };
  }
  return merged;
}

// Compiled ahead of time (scripts/generate-validators.mjs); the messages look subschemas up from the root.
const validator = Object.assign(validateSettingsInput, { schema }) as unknown as ValidateFunction;
function settingsValidator(): ValidateFunction {
  return validator;
}

export interface SettingsResult {
  settings: DatabaseSettings;
  /** Path of the settings file as displayed in messages (or undefined when the file is absent). */
  file?: string;
  diagnostics: Diagnostic[];
  /** Line and column of a settings field (e.g. ['references', 'known_deviations', 0]), when known. */
  locate?: (segments: Array<string | number>) => { line?: number; column?: number };
  /**
   * Where the file sets exactly this field (e.g. ['tolerances', 'cp']); undefined when the file does not
   * set it (the default applies) or there is no file.
   */
  setAt?: (segments: Array<string | number>) => { line: number; column: number } | undefined;
}

/** Cross-field rules the schema cannot express; all problems at once. */
export function checkSettingsRules(s: DatabaseSettings, file: string, doc?: LoadedDocument): Diagnostic[] {
  const out: Diagnostic[] = [];
  const at = (segments: Array<string | number>) => locate(doc, segments);
  const push = (code: string, segments: Array<string | number>, message: string, value: unknown, expected: string) =>
    out.push({ severity: 'error', code, file, ...at(segments), path: formatFieldPath(segments), message, value, expected });

  const { low, mid, high } = s.temperature_ranges;
  if (!(low < mid && mid < high)) {
    push('settings-range-order', ['temperature_ranges'], 'temperature ranges out of order', { low, mid, high }, 'low < mid < high');
  }
  // Point at the bound that is on the wrong side of 298.15 K (both, when both are). The low range may
  // start up to MAX_ANCHOR_EXTRAPOLATION above it (e.g. 300 K): the low set is extrapolated to the anchor.
  if (!(low <= T_REF + MAX_ANCHOR_EXTRAPOLATION)) {
    push(
      'settings-range-excludes-298',
      ['temperature_ranges', 'low'],
      `the low range must start at most ${MAX_ANCHOR_EXTRAPOLATION} K above ${T_REF} K (H and S are anchored there, on the low polynomial)`,
      low,
      `low ≤ ${T_REF + MAX_ANCHOR_EXTRAPOLATION} and ${T_REF} ≤ mid`,
    );
  }
  if (!(T_REF <= mid)) {
    push('settings-range-excludes-298', ['temperature_ranges', 'mid'], `the low range must contain ${T_REF} K (H and S are anchored there)`, mid, `low ≤ ${T_REF} ≤ mid`);
  }
  const om = s.fit.optimise_mid;
  // The default search interval is clipped to each species' ranges (plan.ts); only a written one is checked.
  if (om !== false && isSetIn(doc, ['fit', 'optimise_mid'])) {
    if (!(om.min < om.max)) push('settings-mid-interval-empty', ['fit', 'optimise_mid'], 'midpoint search interval is empty', om, 'min < max');
    if (!(om.min > low && om.max < high)) {
      push('settings-mid-interval-outside', ['fit', 'optimise_mid'], 'midpoint search interval must lie inside the temperature ranges', om, `${low} < min < max < ${high}`);
    }
    if (om.min < T_REF) push('settings-mid-below-298', ['fit', 'optimise_mid', 'min'], `midpoint may not fall below ${T_REF} K`, om.min, `min ≥ ${T_REF}`);
  }
  if (!(s.tables.from < s.tables.to)) push('settings-table-grid-empty', ['tables'], 'table grid is empty', { from: s.tables.from, to: s.tables.to }, 'from < to');
  else if ((s.tables.to - s.tables.from) / s.tables.step > 100_000) {
    push('settings-table-grid-too-large', ['tables', 'step'], 'table grid has too many rows', s.tables.step, 'at most 100000 rows');
  }
  if ((high - low) / s.fit.sampling_step > 100_000) {
    push('settings-sampling-grid-too-large', ['fit', 'sampling_step'], 'sampling grid has too many points', s.fit.sampling_step, 'at most 100000 points');
  } else if (low < mid && mid < high && low <= T_REF + MAX_ANCHOR_EXTRAPOLATION && T_REF <= mid) {
    // Only once the ranges themselves are sound: a misplaced mid is one mistake, reported above.
    const step = s.fit.sampling_step;
    const shortfall = samplingShortfall({ low, mid, high }, step);
    if (shortfall) {
      const setHere = isSetIn(doc, ['fit', 'sampling_step']);
      const largest = largestSamplingStep({ low, mid, high });
      out.push({
        severity: 'error',
        code: 'sampling-step-too-coarse',
        file,
        ...at(setHere ? ['fit', 'sampling_step'] : ['temperature_ranges']),
        path: 'fit.sampling_step',
        message: `fit.sampling_step = ${step} K${setHere ? '' : ' (the default)'} is too coarse for the temperature ranges ${low}/${mid}/${high} K: ${shortfall}`,
        value: step,
        expected: `fit.sampling_step <= ${largest} K for these ranges (the largest accepted value)`,
      });
    }
  }
  const ref = s.references.files;
  if (new Set(ref).size !== ref.length) push('settings-reference-listed-twice', ['references', 'files'], 'a reference file is listed twice', ref, 'distinct files');
  checkKnownDeviations(s.references, push);
  return out;
}

export interface FitRanges {
  low: number;
  mid: number;
  high: number;
}

/**
 * Why the sampling grid of `step` K cannot support a two-range fit over `ranges`, or undefined when it can.
 * The grid is the one plan.ts builds (low, low+step, …, high, plus mid and 298.15 K); the rules are those
 * the fit itself enforces (src/nasa7/samples.ts): at least MIN_DISTINCT_TEMPERATURES distinct temperatures
 * per range, no inner gap wider than MAX_INNER_GAP_FRACTION of the range, and samples near both ends.
 * Checking here lets a too-coarse step be reported once, at the setting, instead of as a fit failure of
 * every species.
 */
export function samplingShortfall(ranges: FitRanges, step: number): string | undefined {
  const { low, mid, high } = ranges;
  const grid = temperatureGrid(low, high, step, [mid, T_REF]);
  for (const [name, from, to] of [['low', low, mid], ['high', mid, high]] as const) {
    // A sample at exactly mid belongs to both ranges, as in the fit.
    const d = grid.filter((t) => (name === 'low' ? t <= mid : t >= mid));
    const width = to - from;
    if (d.length < MIN_DISTINCT_TEMPERATURES) {
      return `the ${name} range [${from}, ${to}] K gets ${d.length} distinct sample temperatures; the fit needs at least ${MIN_DISTINCT_TEMPERATURES}`;
    }
    if (d[0]! - from > MAX_END_GAP_FRACTION * width || to - d[d.length - 1]! > MAX_END_GAP_FRACTION * width) {
      return `the ${name} range [${from}, ${to}] K is not sampled near its ends`;
    }
    for (let i = 1; i < d.length; i++) {
      const gap = d[i]! - d[i - 1]!;
      if (gap > MAX_INNER_GAP_FRACTION * width) {
        return `the ${name} range [${from}, ${to}] K has no sample between ${d[i - 1]} and ${d[i]} K (a gap of ${Number(gap.toPrecision(6))} K); the fit accepts gaps up to ${MAX_INNER_GAP_FRACTION * 100} % of the range, ${MAX_INNER_GAP_FRACTION * width} K`;
      }
    }
  }
  return undefined;
}

/** Resolution of `largestSamplingStep`, K: the schema's smallest accepted step. */
const SAMPLING_STEP_RESOLUTION = 0.5;

/**
 * The largest step (a multiple of 0.5 K, at most the schema's 500 K) such that it and every smaller
 * multiple of 0.5 K pass `samplingShortfall` for `ranges`: a value that is safe to suggest. 0 when even
 * 0.5 K fails (ranges too narrow for any grid).
 */
export function largestSamplingStep(ranges: FitRanges): number {
  const max = (schema.properties.fit.properties.sampling_step as { maximum: number }).maximum;
  let ok = 0;
  for (let k = 1; k * SAMPLING_STEP_RESOLUTION <= max; k++) {
    if (samplingShortfall(ranges, k * SAMPLING_STEP_RESOLUTION) !== undefined) break;
    ok = k * SAMPLING_STEP_RESOLUTION;
  }
  return ok;
}

/**
 * For a species that overrides `temperature_ranges`: an error when the database's fit.sampling_step is too
 * coarse for that species' ranges (the database's own ranges are checked with the settings). Names both the
 * species' temperature_ranges (file:line:col of the species) and fit.sampling_step (where the settings file
 * sets it, or "the default"). Undefined when the step suits the ranges, or the ranges are not in order
 * (validation reports that).
 */
export function checkSpeciesSampling(opts: {
  /** The species' effective ranges (its overrides merged over the settings). */
  ranges: FitRanges;
  settings: DatabaseSettings;
  /** Species file and the position of its `temperature_ranges`. */
  file: string;
  species: string;
  line?: number;
  column?: number;
  /** Settings file, and where it sets fit.sampling_step (SettingsResult.setAt(['fit', 'sampling_step'])). */
  settingsFile?: string;
  stepSetAt?: { line: number; column: number };
}): Diagnostic | undefined {
  const { ranges, settings } = opts;
  if (!(ranges.low < ranges.mid && ranges.mid < ranges.high)) return undefined;
  const step = settings.fit.sampling_step;
  const shortfall = samplingShortfall(ranges, step);
  if (!shortfall) return undefined;
  const stepWhere =
    opts.stepSetAt && opts.settingsFile
      ? `set in ${opts.settingsFile}:${opts.stepSetAt.line}:${opts.stepSetAt.column}`
      : 'the default';
  const d: Diagnostic = {
    severity: 'error',
    code: 'sampling-step-too-coarse',
    file: opts.file,
    species: opts.species,
    path: 'temperature_ranges',
    message: `temperature_ranges ${ranges.low}/${ranges.mid}/${ranges.high} K are too narrow for fit.sampling_step = ${step} K (${stepWhere}): ${shortfall}`,
    value: { ...ranges },
    expected: `fit.sampling_step <= ${largestSamplingStep(ranges)} K for these ranges, or wider temperature_ranges`,
  };
  if (opts.line !== undefined) d.line = opts.line;
  if (opts.column !== undefined) d.column = opts.column;
  return d;
}

function isSetIn(doc: LoadedDocument | undefined, segments: string[]): boolean {
  let v: unknown = doc?.value;
  for (const k of segments) {
    if (!isObject(v) || !Object.hasOwn(v, k)) return false;
    v = v[k];
  }
  return true;
}

const PLACEHOLDER_REASON = /^\s*(todo|tbd|tba|fixme|xxx|n\/?a|none|unknown|known)\b/i;

/** Windows, widened limits and reasons of references.known_deviations (all problems at once). */
function checkKnownDeviations(
  refs: DatabaseSettings['references'],
  push: (code: string, segments: Array<string | number>, message: string, value: unknown, expected: string) => void,
): void {
  const list = refs.known_deviations;
  list.forEach((k, i) => {
    const at = ['references', 'known_deviations', i];
    if (k.from !== undefined && k.to !== undefined && !(k.from <= k.to)) {
      push('known-deviation-window-empty', [...at, 'to'], 'known deviation: empty temperature window', { from: k.from, to: k.to }, 'from ≤ to');
    }
    for (const q of ['cp', 's', 'h'] as const) {
      const widened = k.tolerances[q];
      if (widened !== undefined && !(widened > refs.tolerances[q])) {
        push(
          'known-deviation-not-wider',
          [...at, 'tolerances', q],
          `known deviation: the limit does not widen references.tolerances.${q} (${refs.tolerances[q]})`,
          widened,
          `a value > ${refs.tolerances[q]}`,
        );
      }
    }
    if (PLACEHOLDER_REASON.test(k.reason)) {
      push('known-deviation-placeholder-reason', [...at, 'reason'], 'known deviation: the reason is a placeholder', k.reason, 'why the deviation is accepted, e.g. the model limit and where it is documented');
    }
    // Two entries covering the same species, quantity and temperature would make the limit ambiguous.
    for (let j = 0; j < i; j++) {
      const o = list[j]!;
      if (o.species !== k.species) continue;
      const overlap = Math.max(o.from ?? 0, k.from ?? 0) <= Math.min(o.to ?? Infinity, k.to ?? Infinity);
      const shared = (['cp', 's', 'h'] as const).filter((q) => o.tolerances[q] !== undefined && k.tolerances[q] !== undefined);
      if (overlap && shared.length) {
        push(
          'known-deviation-overlap',
          at,
          `known deviation overlaps references.known_deviations[${j}] for ${k.species} ${shared.join(', ')}`,
          { species: k.species, from: k.from, to: k.to },
          'windows of the same species and quantity that do not overlap',
        );
      }
    }
  });
}

function locate(doc: LoadedDocument | undefined, segments: Array<string | number>): { line?: number; column?: number } {
  if (!doc) return {};
  for (let n = segments.length; n >= 0; n--) {
    const loc = doc.locate(segments.slice(0, n));
    if (loc) return { line: loc.line, column: loc.column };
  }
  return {};
}

/**
 * Reads `<dir>/qforge.yaml` (absent → defaults). Returns defaults merged with the file and every problem
 * found; when there are errors the returned settings are the defaults and must not be used for a build.
 */
export async function loadSettings(dir: string, displayDir = dir): Promise<SettingsResult> {
  const filePath = path.join(dir, SETTINGS_FILE_NAME);
  const display = path.join(displayDir, SETTINGS_FILE_NAME);
  try {
    await access(filePath);
  } catch {
    return { settings: withDefaults({}), diagnostics: [] };
  }
  const loaded = await loadYamlFile(filePath, display, { split: 'single' });
  const diagnostics: Diagnostic[] = [...loaded.diagnostics];
  if (loaded.documents.length > 1) {
    diagnostics.push({
      severity: 'error',
      code: 'settings-several-documents',
      file: display,
      path: '',
      message: `${SETTINGS_FILE_NAME} holds ${loaded.documents.length} YAML documents`,
      expected: 'exactly one mapping of settings',
    });
  }
  const doc = loaded.documents[0];
  if (!doc || diagnostics.some((d) => d.severity === 'error')) {
    return { settings: withDefaults({}), file: display, diagnostics };
  }
  if (doc.value === null || doc.value === undefined) {
    return { settings: withDefaults({}), file: display, diagnostics };
  }
  const schemaDiagnostics = checkAgainstSchema(settingsValidator(), doc, { species: '' });
  diagnostics.push(...schemaDiagnostics);
  if (schemaDiagnostics.some((d) => d.severity === 'error')) {
    return { settings: withDefaults({}), file: display, diagnostics };
  }
  const settings = withDefaults(doc.value);
  const rules = checkSettingsRules(settings, display, doc);
  diagnostics.push(...rules);
  if (rules.length) return { settings: withDefaults({}), file: display, diagnostics };
  const setAt = (segments: Array<string | number>) => {
    let v: unknown = doc.value;
    for (const k of segments) {
      if (v === null || typeof v !== 'object' || !Object.prototype.hasOwnProperty.call(v, k)) return undefined;
      v = (v as Record<string | number, unknown>)[k];
    }
    const loc = doc.locate(segments);
    return loc ? { line: loc.line, column: loc.column } : undefined;
  };
  return { settings, file: display, diagnostics, locate: (segments) => locate(doc, segments), setAt };
}
