/**
 * `qforge compare BUILD --reference FILE...`: deviations of the built polynomials from reference data,
 * per species and temperature; exit 1 when one exceeds its tolerance.
 *
 * Reference CSV tables (read with fast-csv):
 *   - one row per temperature; a header row naming the columns with units in brackets:
 *       `T [K]`, and any of `Cp [J/(mol K)]`, `S [J/(mol K)]`, `H-H298 [kJ/mol]`;
 *     accepted units: Cp and S in J/(mol K) or cal/(mol K); H-H298 in kJ/mol, J/mol or kcal/mol; T in K;
 *   - an optional `species` column; without it, the file name without `.csv` is the species name
 *     (so `N2.csv` holds N2), which lets published tables be dropped in one per file;
 *   - lines starting with '#' are comments (name the source there); empty cells mean "no value";
 *   - a `ΔfH [kJ/mol]` column (ΔfH°, DfH) is compared on its 298.15 K row with the polynomial's absolute
 *     H(298.15) (ΔfH° in the NASA convention), against the H tolerance; other rows are noted, not compared;
 *   - columns compare knows but does not use (H, G, -(G-H298)/T, ΔfG, log Kf, and the fitted columns of
 *     `build/tables/<name>.csv`, whose `computed` columns are read) are ignored and listed in a note;
 *   - every other header cell must be one of these: an unrecognised one (`Cp (J/mol/K)`, `Cv [J/(mol K)]`, an
 *     empty cell), a property without a unit in brackets, or a header with no property column at all is an
 *     error naming the file, the header line and the column, with what is accepted. Units are never guessed;
 *   - messages give the line of the file (comment and blank lines counted), e.g. `N2.csv:5: ...`.
 * 80-column files: every record whose name is in the build is compared on a 100 K grid (plus 298.15 K
 * and the ends) over the common temperature range.
 *
 * Only temperatures inside the fitted range of the built species are compared (the polynomials are not
 * valid outside it); rows outside are counted and reported as skipped.
 * Tolerances: --tolerance flags, else the references.tolerances of --database's qforge.yaml, else the
 * build's recorded settings, else the defaults (0.5 J/(mol K), 0.5 J/(mol K), 0.5 kJ/mol).
 *
 * Known deviations (references.known_deviations, from the same place as the tolerances): a value beyond
 * the normal tolerance but within the widened limit of the entry covering its species, quantity and
 * temperature has status 'known' instead of being a breach, and the entry's reason is printed once per
 * species. Exit 0 when every value is ok or known. --tolerance changes only the normal limits (an entry's
 * widened limit still applies where it is larger); --strict ignores every entry, so CI can also run the
 * plain check. Entries naming a species absent from the build, covering no compared value, or no longer
 * needed (all their values within the normal tolerance) are warnings, so stale exceptions get removed.
 */
import { compareJson } from './compare-json.js';
import path from 'node:path';
import { parseString } from 'fast-csv';
import { T_REF } from '../../src/constants.js';
import type { CliIo } from './io.js';
import { formatDiagnostic } from '../core/diagnostics.js';
import {
  formatFixed,
  formatSigned,
  polynomialProperties,
  polynomialSetFromText,
  readInputFile,
  readPolynomialSet,
  ReadBuildError,
  type PolynomialSet,
} from '../storage/read-build.js';
import { DEFAULT_SETTINGS, loadSettings, type KnownDeviation, type QuantityTriple } from '../core/settings.js';
import { displayPath } from '../core/display-path.js';
import { compareText } from '../core/text.js';
import { FORMATION_ENTHALPY_NAMES, referenceHeaderAlias } from './reference-columns.js';
import { referencesRecordedInBuild } from './recorded-references.js';

/** dfh: ΔfH°(298.15), compared with the polynomial's absolute H(298.15) (the NASA convention). */
export type RefQuantity = 'cp' | 's' | 'h' | 'dfh';
/** The quantities with a tolerance of their own (and known deviations); dfh is judged by h's tolerance. */
const QS: readonly Exclude<RefQuantity, 'dfh'>[] = ['cp', 's', 'h'];
const COMPARED: readonly RefQuantity[] = [...QS, 'dfh'];
const LABEL: Record<RefQuantity, string> = { cp: 'Cp', s: 'S', h: 'H-H298', dfh: 'ΔfH°' };
const UNIT: Record<RefQuantity, string> = { cp: 'J/(mol K)', s: 'J/(mol K)', h: 'kJ/mol', dfh: 'kJ/mol' };

/** Unit → factor into the internal unit of the column (J/(mol K) or kJ/mol). Thermochemical calorie. */
const ENTROPY_UNITS: Record<string, number> = { 'J/(mol K)': 1, 'J/(mol*K)': 1, 'J/mol/K': 1, 'J mol-1 K-1': 1, 'cal/(mol K)': 4.184, 'cal/mol/K': 4.184 };
const ENTHALPY_UNITS: Record<string, number> = { 'kJ/mol': 1, 'J/mol': 1e-3, 'kcal/mol': 4.184 };

export interface ReferenceRow {
  T: number;
  cp?: number;
  s?: number;
  h?: number;
  /** ΔfH°(298.15), kJ/mol: only on a 298.15 K row (see reference-columns.ts). */
  dfh?: number;
}

export interface ReferenceTable {
  file: string;
  species: Map<string, ReferenceRow[]>;
  /** Header cells of columns compare recognises but does not use (see reference-columns.ts). */
  ignoredColumns?: string[];
}

export class ReferenceError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'ReferenceError';
  }
}

type Column = { kind: 'T' } | { kind: 'species' } | { kind: 'ignored' } | { kind: RefQuantity; factor: number };

const PROPERTY_NAMES: Record<string, RefQuantity> = { Cp: 'cp', S: 's', 'H-H298': 'h', 'H-H(298.15)': 'h', 'H-H298.15': 'h', ...FORMATION_ENTHALPY_NAMES };
const ACCEPTED_HEADERS =
  `accepted headers: 'T [K]'; 'Cp [unit]' and 'S [unit]' with unit ${Object.keys(ENTROPY_UNITS).join(' | ')}; ` +
  `'H-H298 [unit]' and 'ΔfH [unit]' (or 'DfH') with unit ${Object.keys(ENTHALPY_UNITS).join(' | ')}; optional 'species' (or 'name')`;
const EXAMPLE_HEADER = 'T [K],Cp [J/(mol K)],S [J/(mol K)],H-H298 [kJ/mol]';

/**
 * One header cell → its column, or a message saying why it is refused. Every cell must be recognised: a
 * column we silently skipped could be the one the user meant to check (`Cp (J/mol/K)` once meant a Cp
 * column nobody compared). Units are never guessed.
 */
function parseHeaderCell(cell: string): Column | string {
  const alias = referenceHeaderAlias(cell);
  if (alias.ignored) return { kind: 'ignored' };
  const c = alias.cell;
  if (c === '') return `empty header; every column needs one (${ACCEPTED_HEADERS})`;
  if (/^(species|name)$/i.test(c)) return { kind: 'species' };
  const m = /^(\S+?)\s*\[(.*)\]$/.exec(c);
  const what = m ? m[1]! : c;
  const unit = m ? m[2]!.trim() : undefined;
  const q = PROPERTY_NAMES[what];
  const paren = /^(\S+?)\s*\((.*)\)$/.exec(c);
  if (!m && paren && (paren[1] === 'T' || PROPERTY_NAMES[paren[1]!] !== undefined)) {
    const name = paren[1]!;
    return `header '${c}' has no unit in square brackets (a unit in parentheses is not read); units are never guessed: write e.g. '${name} [${name === 'T' ? 'K' : PROPERTY_NAMES[name] === 'h' || PROPERTY_NAMES[name] === 'dfh' ? 'kJ/mol' : 'J/(mol K)'}]'`;
  }
  if (what !== 'T' && q === undefined) {
    const looksLike = /^(t|cp|s|h)\b/i.test(c);
    return `header '${c}' is not recognised${looksLike ? ' (names are case-sensitive and units go in square brackets)' : ''}; ${ACCEPTED_HEADERS}`;
  }
  if (unit === undefined) {
    return `header '${c}' has no unit; units are never guessed: write e.g. '${what} [${what === 'T' ? 'K' : q === 'h' || q === 'dfh' ? 'kJ/mol' : 'J/(mol K)'}]'`;
  }
  if (what === 'T') return unit === 'K' ? { kind: 'T' } : `header '${c}': temperatures must be in K, as 'T [K]'`;
  const units = q === 'h' || q === 'dfh' ? ENTHALPY_UNITS : ENTROPY_UNITS;
  const f = units[unit];
  if (f === undefined) return `header '${c}': unknown unit '${unit}'; expected one of ${Object.keys(units).join(', ')}`;
  return { kind: q!, factor: f };
}

async function csvRows(text: string): Promise<string[][]> {
  return new Promise((resolve, reject) => {
    const rows: string[][] = [];
    parseString(text, { headers: false, ignoreEmpty: false, trim: true })
      .on('error', reject)
      .on('data', (r: string[]) => rows.push(r))
      .on('end', () => resolve(rows));
  });
}

/** The row a ΔfH° value is compared on: 298.15 K (to the 0.005 K a table prints). */
const isStandardTemperature = (T: number) => Math.abs(T - T_REF) < 0.005;

const DECIMAL = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
/** At most this many bad rows are listed in one error (the count says how many there were). */
const MAX_LISTED_ROW_ERRORS = 20;

/**
 * Parses a reference CSV table (see the module comment for the layout). Messages carry the FILE line
 * (`N2.csv:5: ...`, counting comment and blank lines); all header problems, and up to 20 bad data rows,
 * are reported at once.
 */
export async function parseReferenceCsv(text: string, file: string): Promise<ReferenceTable> {
  // Comment and blank lines are dropped here rather than by the CSV reader, so every row keeps its line.
  const lines: Array<{ no: number; text: string }> = [];
  text
    .replace(/^\uFEFF/, '')
    .split(/\r\n|\n|\r/)
    .forEach((t, i) => {
      if (t.trim() !== '' && !t.trimStart().startsWith('#')) lines.push({ no: i + 1, text: t });
    });
  let rows: string[][];
  try {
    rows = await csvRows(lines.map((l) => l.text).join('\n'));
  } catch (e) {
    throw new ReferenceError(`${file}: not a readable CSV file (${(e as Error).message})`);
  }
  if (rows.length !== lines.length) {
    throw new ReferenceError(`${file}: a quoted cell spans several lines; reference tables take one row per line`);
  }
  const header = rows[0];
  const headerLine = lines[0]?.no ?? 1;
  if (!header) throw new ReferenceError(`${file}:1: no header row; expected e.g. '${EXAMPLE_HEADER}'`);
  const parsed = header.map((h) => parseHeaderCell(h));
  const problems: string[] = [];
  parsed.forEach((c, j) => {
    if (typeof c === 'string') problems.push(`${file}:${headerLine}: column ${j + 1}: ${c}`);
  });
  const cols = parsed.map((c) => (typeof c === 'string' ? undefined : c));
  const kinds = cols.map((c) => c?.kind);
  kinds.forEach((k, j) => {
    if (k !== undefined && k !== 'ignored' && kinds.indexOf(k) !== j) problems.push(`${file}:${headerLine}: column ${j + 1}: header '${header[j]}' repeats column ${kinds.indexOf(k) + 1} (each quantity once)`);
  });
  if (problems.length === 0) {
    if (!kinds.includes('T')) problems.push(`${file}:${headerLine}: no 'T [K]' column in the header; expected e.g. '${EXAMPLE_HEADER}'`);
    if (!kinds.some((k) => k === 'cp' || k === 's' || k === 'h' || k === 'dfh')) {
      problems.push(`${file}:${headerLine}: no property column (Cp, S or H-H298 with a unit) in the header, so nothing can be compared; expected e.g. '${EXAMPLE_HEADER}'`);
    }
  }
  if (problems.length) throw new ReferenceError(problems.join('\n'));

  const tCol = kinds.indexOf('T');
  const sCol = kinds.indexOf('species');
  const fallbackName = path.basename(file).replace(/\.csv$/i, '');
  const species = new Map<string, ReferenceRow[]>();
  const rowErrors: string[] = [];
  let dfhElsewhere = 0;
  rows.slice(1).forEach((r, i) => {
    const where = `${file}:${lines[i + 1]!.no}`;
    if (r.every((cell) => cell.trim() === '')) return;
    if (r.length > header.length && r.slice(header.length).some((cell) => cell.trim() !== '')) {
      rowErrors.push(`${where}: ${r.length} cells but the header has ${header.length} columns`);
      return;
    }
    const tText = (r[tCol] ?? '').trim();
    const T = DECIMAL.test(tText) ? Number(tText) : NaN;
    if (!(Number.isFinite(T) && T > 0)) {
      rowErrors.push(`${where}: T = '${tText}' is not a temperature in K`);
      return;
    }
    const name = sCol >= 0 ? (r[sCol] ?? '').trim() : fallbackName;
    if (!name) {
      rowErrors.push(`${where}: empty species name`);
      return;
    }
    const row: ReferenceRow = { T };
    cols.forEach((c, j) => {
      if (!c || (c.kind !== 'cp' && c.kind !== 's' && c.kind !== 'h' && c.kind !== 'dfh')) return;
      const cell = (r[j] ?? '').trim();
      if (cell === '') return;
      if (c.kind === 'dfh' && !isStandardTemperature(T)) {
        dfhElsewhere++;
        return;
      }
      const v = DECIMAL.test(cell) ? Number(cell) : NaN;
      if (!Number.isFinite(v)) {
        rowErrors.push(`${where}: ${header[j]} = '${cell}' is not a number`);
        return;
      }
      row[c.kind] = v * c.factor;
    });
    const list = species.get(name) ?? [];
    list.push(row);
    species.set(name, list);
  });
  if (rowErrors.length) {
    const more = rowErrors.length > MAX_LISTED_ROW_ERRORS ? `\n(${rowErrors.length - MAX_LISTED_ROW_ERRORS} more bad row(s) not listed)` : '';
    throw new ReferenceError(rowErrors.slice(0, MAX_LISTED_ROW_ERRORS).join('\n') + more);
  }
  const ignoredColumns = header.filter((_, j) => kinds[j] === 'ignored');
  if (dfhElsewhere) ignoredColumns.push(`${header[kinds.indexOf('dfh')]} at temperatures other than 298.15 K (${dfhElsewhere} value(s); ΔfH(T) needs the elements' tables)`);
  return ignoredColumns.length ? { file, species, ignoredColumns } : { file, species };
}

/** An 80-column file as a reference: its records evaluated on a 100 K grid over the common range. */
export function referenceFromPolynomials(ref: PolynomialSet, build: PolynomialSet): ReferenceTable {
  const species = new Map<string, ReferenceRow[]>();
  for (const [name, r] of ref.species) {
    const b = build.species.get(name);
    if (!b) {
      species.set(name, []);
      continue;
    }
    const low = Math.max(r.polynomial.tLow, b.polynomial.tLow);
    const high = Math.min(r.polynomial.tHigh, b.polynomial.tHigh);
    const temps = new Set<number>();
    if (low < high) {
      temps.add(low).add(high);
      for (let T = Math.ceil(low / 100) * 100; T <= high; T += 100) temps.add(T);
      if (T_REF >= low && T_REF <= high) temps.add(T_REF);
    }
    species.set(
      name,
      [...temps].sort((x, y) => x - y).map((T) => {
        const p = polynomialProperties(r.polynomial, T);
        return { T, cp: p.cp, s: p.s, h: p.hMinusH298 };
      }),
    );
  }
  return { file: ref.label, species };
}

export type DeviationStatus = 'ok' | 'known' | 'breach';

export interface Deviation {
  species: string;
  reference: string;
  quantity: RefQuantity;
  T: number;
  referenceValue: number;
  buildValue: number;
  /** build − reference */
  deviation: number;
  /** The normal tolerance (references.tolerances or --tolerance). */
  tolerance: number;
  /** Within the normal tolerance. */
  ok: boolean;
  /** ok: within the normal tolerance; known: beyond it but within a known deviation's widened limit; breach: neither. */
  status: DeviationStatus;
  /** Index into CompareReport.knownDeviations of the entry covering this value (also under --strict). */
  knownDeviation?: number;
  /** The widened limit of that entry (never below the normal tolerance). */
  widenedTolerance?: number;
}

/** A known deviation as used by one compare run, with what it turned out to cover. */
export interface KnownDeviationUse extends KnownDeviation {
  /** Where it was recorded, e.g. `species/qforge.yaml:27` or `build settings (thermo.json)`. */
  recordedAt: string;
  /** Values it covers (species, window and one of its quantities). */
  covered: number;
  /** Covered values beyond the normal tolerance (reported as known unless --strict). */
  needed: number;
  /** Covered values beyond even the widened limit. */
  exceeded: number;
  /** Its quantities whose widening no covered value needs (stale parts). */
  unneeded: RefQuantity[];
}

export interface CompareReport {
  build: string;
  tolerances: QuantityTriple;
  /** --strict: known deviations ignored (values they cover are judged by the normal tolerance). */
  strict: boolean;
  knownDeviations: KnownDeviationUse[];
  deviations: Deviation[];
  /** Reference species absent from the build. */
  missing: Array<{ species: string; reference: string }>;
  /** Rows outside the fitted range of the built species, skipped. */
  skipped: Array<{ species: string; reference: string; T: number }>;
  /** Values beyond the normal tolerance accepted by a known deviation. */
  known: Deviation[];
  breaches: Deviation[];
  /** Known deviations naming a species not in the build, covering nothing, or no longer needed. */
  warnings: string[];
  counts: { values: number; ok: number; known: number; breaches: number; skipped: number };
}

export interface CompareOptions {
  /** Recorded exceptions (references.known_deviations) with where each was recorded. */
  knownDeviations?: ReadonlyArray<KnownDeviation & { recordedAt: string }>;
  /** Ignore the known deviations. */
  strict?: boolean;
}

const inWindow = (k: KnownDeviation, T: number) => T >= (k.from ?? -Infinity) && T <= (k.to ?? Infinity);

// A hair of slack so that float noise never turns a deviation equal to a tolerance into a breach.
const within = (deviation: number, limit: number) => Math.abs(deviation) <= limit + 1e-9;

export function compareWithReferences(
  build: PolynomialSet,
  refs: readonly ReferenceTable[],
  tolerances: QuantityTriple,
  options: CompareOptions = {},
): CompareReport {
  const strict = options.strict === true;
  const report: CompareReport = {
    build: build.label,
    tolerances,
    strict,
    knownDeviations: (options.knownDeviations ?? []).map((k) => ({ ...k, covered: 0, needed: 0, exceeded: 0, unneeded: [] })),
    deviations: [],
    missing: [],
    skipped: [],
    known: [],
    breaches: [],
    warnings: [],
    counts: { values: 0, ok: 0, known: 0, breaches: 0, skipped: 0 },
  };
  const neededBy = report.knownDeviations.map(() => new Set<RefQuantity>());
  for (const ref of refs) {
    for (const [name, rows] of [...ref.species].sort(([a], [b]) => compareText(a, b))) {
      const b = build.species.get(name);
      if (!b) {
        report.missing.push({ species: name, reference: ref.file });
        continue;
      }
      for (const row of [...rows].sort((x, y) => x.T - y.T)) {
        if (row.T < b.polynomial.tLow || row.T > b.polynomial.tHigh) {
          report.skipped.push({ species: name, reference: ref.file, T: row.T });
          continue;
        }
        const p = polynomialProperties(b.polynomial, row.T);
        const built: Record<RefQuantity, number> = { cp: p.cp, s: p.s, h: p.hMinusH298, dfh: p.h };
        for (const q of COMPARED) {
          const rv = row[q];
          if (rv === undefined) continue;
          const deviation = built[q] - rv;
          const tolerance = tolerances[q === 'dfh' ? 'h' : q];
          const ok = within(deviation, tolerance);
          const d: Deviation = {
            species: name,
            reference: ref.file,
            quantity: q,
            T: row.T,
            referenceValue: rv,
            buildValue: built[q],
            deviation,
            tolerance,
            ok,
            status: ok ? 'ok' : 'breach',
          };
          // The settings rules forbid overlapping entries, so at most one covers a value.
          // Known deviations widen model limits (cp, s, h); a ΔfH° mismatch is an input question, never widened.
          const kq = q === 'dfh' ? undefined : q;
          const ki = kq ? report.knownDeviations.findIndex((k) => k.species === name && k.tolerances[kq] !== undefined && inWindow(k, row.T)) : -1;
          if (kq && ki >= 0) {
            const k = report.knownDeviations[ki]!;
            d.knownDeviation = ki;
            d.widenedTolerance = Math.max(k.tolerances[kq]!, tolerance);
            k.covered++;
            if (!ok) {
              k.needed++;
              neededBy[ki]!.add(kq);
              if (!within(deviation, d.widenedTolerance)) k.exceeded++;
              else if (!strict) d.status = 'known';
            }
          }
          report.deviations.push(d);
          if (d.status === 'known') report.known.push(d);
          if (d.status === 'breach') report.breaches.push(d);
        }
      }
    }
  }
  // An entry can only be judged against the references given this time: a species they do not cover says
  // nothing about whether its entry is still needed (e.g. `--reference N2.csv` against a whole database).
  const referenced = new Set(refs.flatMap((r) => [...r.species.keys()]));
  report.knownDeviations.forEach((k, i) => {
    const given = QS.filter((q) => k.tolerances[q] !== undefined);
    const where = `known deviation for ${k.species} (${k.recordedAt}${windowText(k) ? `, ${windowText(k)}` : ''})`;
    if (!build.species.has(k.species)) {
      report.warnings.push(`${where}: ${k.species} is not in the build ${build.label}; fix the name or remove the entry`);
      return;
    }
    if (!referenced.has(k.species)) return;
    if (k.covered === 0) {
      report.warnings.push(`${where}: no reference value of ${k.species} in its window; nothing was compared against it`);
      return;
    }
    k.unneeded = given.filter((q) => !neededBy[i]!.has(q));
    if (k.needed === 0) {
      report.warnings.push(
        `${where} is no longer needed: all ${k.covered} value(s) it covers are within the normal tolerance (largest ${largestCovered(report.deviations, i)}); remove it`,
      );
    } else if (k.unneeded.length) {
      report.warnings.push(
        `${where}: the widened ${k.unneeded.map((q) => LABEL[q]).join(', ')} limit is no longer needed (every covered ${k.unneeded.length > 1 ? 'value of these' : 'value'} is within the normal tolerance); remove it from the entry`,
      );
    }
  });
  report.counts = {
    values: report.deviations.length,
    ok: report.deviations.filter((d) => d.status === 'ok').length,
    known: report.known.length,
    breaches: report.breaches.length,
    skipped: report.skipped.length,
  };
  return report;
}

function windowText(k: KnownDeviation): string {
  if (k.from !== undefined && k.to !== undefined) return k.from === k.to ? `at ${k.from} K` : `${k.from}-${k.to} K`;
  if (k.from !== undefined) return `from ${k.from} K`;
  if (k.to !== undefined) return `up to ${k.to} K`;
  return '';
}

function largestCovered(ds: readonly Deviation[], ki: number): string {
  return QS.map((q) => {
    const of = ds.filter((d) => d.knownDeviation === ki && d.quantity === q);
    if (!of.length) return undefined;
    const w = of.reduce((a, b) => (Math.abs(b.deviation) > Math.abs(a.deviation) ? b : a));
    return `${LABEL[q]} ${signed(w.deviation, 4)} at ${w.T} K`;
  })
    .filter(Boolean)
    .join(', ');
}

function limitsText(t: Partial<QuantityTriple>): string {
  return QS.filter((q) => t[q] !== undefined)
    .map((q) => `${LABEL[q]} ${t[q]} ${UNIT[q]}`)
    .join(', ');
}

const signed = formatSigned;

export function describeBreach(d: Deviation, report?: CompareReport): string {
  const head = `${d.species} ${LABEL[d.quantity]} at ${d.T} K: build ${formatFixed(d.buildValue, 4)} vs reference ${formatFixed(d.referenceValue, 4)} ${UNIT[d.quantity]} (${d.reference}): deviation ${signed(d.deviation, 4)}`;
  const k = d.knownDeviation !== undefined ? report?.knownDeviations[d.knownDeviation] : undefined;
  if (k && d.widenedTolerance !== undefined && !within(d.deviation, d.widenedTolerance)) {
    return `${head} exceeds even the widened tolerance ${d.widenedTolerance} ${UNIT[d.quantity]} of the known deviation at ${k.recordedAt}`;
  }
  const base = `${head} exceeds the tolerance ${d.tolerance} ${UNIT[d.quantity]}`;
  if (k && report?.strict) return `${base} (the known deviation at ${k.recordedAt} would allow ${d.widenedTolerance}; ignored under --strict)`;
  return base;
}

const STATUS_WORD: Record<DeviationStatus, string> = { ok: 'ok', known: 'known', breach: 'FAIL' };

export function renderCompareText(r: CompareReport): string {
  const kd = r.knownDeviations.length;
  const lines: string[] = [
    `qforge compare ${r.build}: tolerances Cp ${r.tolerances.cp} J/(mol K), S ${r.tolerances.s} J/(mol K), H-H298 ${r.tolerances.h} kJ/mol` +
      (kd ? `; ${kd} known deviation(s)${r.strict ? ' IGNORED (--strict)' : ''}` : ''),
  ];
  const bySpecies = new Map<string, Deviation[]>();
  for (const d of r.deviations) bySpecies.set(d.species, [...(bySpecies.get(d.species) ?? []), d]);
  for (const [name, ds] of bySpecies) {
    const worst = COMPARED.map((q) => {
      const of = ds.filter((d) => d.quantity === q);
      if (!of.length) return undefined;
      const w = of.reduce((a, b) => (Math.abs(b.deviation) > Math.abs(a.deviation) ? b : a));
      return `${LABEL[q]} ${signed(w.deviation, 4)} at ${w.T} K`;
    }).filter(Boolean);
    const bad = ds.filter((d) => d.status === 'breach').length;
    const known = ds.filter((d) => d.status === 'known').length;
    const status: DeviationStatus = bad ? 'breach' : known ? 'known' : 'ok';
    const counts = [known ? `${known} value(s) within a known deviation` : '', bad ? `${bad} beyond tolerance` : ''].filter(Boolean).join(', ');
    lines.push(`${STATUS_WORD[status].padEnd(5)} ${name}: ${ds.length} values, largest deviations ${worst.join(', ')}${counts ? `; ${counts}` : ''}`);
    // The reason once per species, for every entry that covers one of its values.
    const entries = [...new Set(ds.map((d) => d.knownDeviation).filter((i): i is number => i !== undefined))].sort((a, b) => a - b);
    for (const i of entries) {
      const k = r.knownDeviations[i]!;
      lines.push(`      known deviation (${k.recordedAt}${windowText(k) ? `, ${windowText(k)}` : ''}; widened ${limitsText(k.tolerances)})${r.strict ? ' IGNORED (--strict)' : ''}`);
      lines.push(`        reason: ${k.reason.trim().replace(/\s+/g, ' ')}`);
    }
    lines.push(`       T [K]   quantity  reference      build  deviation`);
    for (const d of ds) {
      const mark =
        d.status === 'known'
          ? `  known (within the widened ${d.widenedTolerance})`
          : d.status === 'breach'
            ? d.widenedTolerance !== undefined && !within(d.deviation, d.widenedTolerance)
              ? `  <-- beyond the widened tolerance ${d.widenedTolerance}`
              : '  <-- beyond tolerance'
            : '';
      lines.push(
        `  ${String(d.T).padStart(10)}   ${LABEL[d.quantity].padEnd(8)} ${formatFixed(d.referenceValue, 4).padStart(10)} ${formatFixed(d.buildValue, 4).padStart(10)} ${signed(d.deviation, 4).padStart(10)}${mark}`,
      );
    }
  }
  for (const m of r.missing) lines.push(`note: ${m.species} (in ${m.reference}) is not in the build`);
  if (r.skipped.length) lines.push(`note: ${r.skipped.length} reference row(s) outside the fitted ranges were skipped`);
  return `${lines.join('\n')}\n`;
}

/** The final line on stderr: counts of ok, known and breaching values. */
export function compareSummaryLine(r: CompareReport): string {
  const perSpecies = new Map<string, number>();
  for (const d of r.known) perSpecies.set(d.species, (perSpecies.get(d.species) ?? 0) + 1);
  const knownPart = r.counts.known
    ? `, ${r.counts.known} within known deviations (${[...perSpecies].map(([s, n]) => `${s} ${n}`).join(', ')})`
    : '';
  const warnPart = r.warnings.length ? `; ${r.warnings.length} warning(s)` : '';
  const strictPart = r.strict && r.knownDeviations.length ? '; known deviations ignored (--strict)' : '';
  if (r.counts.breaches) {
    return `qforge: compare FAILED: ${r.counts.values} values: ${r.counts.ok} within tolerance${knownPart}, ${r.counts.breaches} beyond tolerance${warnPart}${strictPart}`;
  }
  return `qforge: compare ok: ${r.counts.values} values: ${r.counts.ok} within tolerance${knownPart}${warnPart}${strictPart}`;
}

async function loadReference(p: { path: string; label: string }, build: PolynomialSet): Promise<ReferenceTable> {
  // Missing, a folder, unreadable, too large: readInputFile's clean errors (exit 2 or 1).
  const text = await readInputFile(p.path, p.label, 'reference');
  if (/\.csv$/i.test(p.path)) return parseReferenceCsv(text, p.label);
  return referenceFromPolynomials(polynomialSetFromText(text, p.label), build);
}

export async function compareCommand(
  io: CliIo,
  buildPath: string,
  buildLabel: string,
  o: { reference?: Array<{ path: string; label: string }>; database?: string; tolerance?: Partial<QuantityTriple>; strict?: boolean; json?: boolean; quiet?: boolean },
): Promise<number> {
  try {
    const build = await readPolynomialSet(buildPath, buildLabel);
    let refs = o.reference ?? [];
    let tolerances: QuantityTriple = { ...(build.settings?.references?.tolerances ?? DEFAULT_SETTINGS.references.tolerances) };
    // Same precedence as the tolerances: --database's qforge.yaml, else the build's recorded settings.
    let knownDeviations: Array<KnownDeviation & { recordedAt: string }> = (build.settings?.references?.known_deviations ?? []).map((k, i) => ({
      ...k,
      recordedAt: `build settings (thermo.json) references.known_deviations[${i}]`,
    }));
    if (o.database) {
      const s = await loadSettings(o.database, displayPath(io.cwd, o.database));
      if (s.diagnostics.some((d) => d.severity === 'error')) {
        for (const d of s.diagnostics) io.stderr.write(`${formatDiagnostic(d)}\n`);
        return 1;
      }
      tolerances = { ...s.settings.references.tolerances };
      knownDeviations = s.settings.references.known_deviations.map((k, i) => {
        const line = s.locate?.(['references', 'known_deviations', i]).line;
        return { ...k, recordedAt: `${s.file ?? 'qforge.yaml'}${line ? `:${line}` : ''}` };
      });
      if (!refs.length) {
        refs = s.settings.references.files.map((f) => ({
          path: path.resolve(o.database!, f),
          label: displayPath(io.cwd, path.resolve(o.database!, f)),
        }));
      }
    }
    // --tolerance replaces the normal limits for every species; a known deviation still allows its own
    // widened limit where that is larger. --strict drops the known deviations altogether.
    tolerances = { ...tolerances, ...(o.tolerance ?? {}) };
    if (!refs.length && !o.database && build.fromFolder) refs = await referencesRecordedInBuild(buildPath, buildLabel);
    if (!refs.length) {
      io.stderr.write('qforge: error: no reference files: give --reference FILE... or --database DIR with references.files in its qforge.yaml (a build records the files of its settings in summary.json)\n');
      return 2;
    }
    const tables: ReferenceTable[] = [];
    for (const r of refs) tables.push(await loadReference(r, build));
    const report = compareWithReferences(build, tables, tolerances, { knownDeviations, strict: o.strict === true });
    if (o.json) io.stdout.write(`${JSON.stringify(compareJson(report), null, 2)}\n`);
    else if (!o.quiet) {
      io.stdout.write(renderCompareText(report));
      for (const t of tables) if (t.ignoredColumns) io.stdout.write(`note: ${t.file}: column(s) not compared (ignored): ${t.ignoredColumns.join(', ')}\n`);
    }
    if (!o.quiet) for (const w of report.warnings) io.stderr.write(`qforge: warning: ${w}\n`);
    if (report.deviations.length === 0) {
      io.stderr.write('qforge: compare FAILED: no reference value matched a species and temperature of the build\n');
      return 1;
    }
    if (report.breaches.length) {
      io.stderr.write(`qforge: ${report.breaches.length} value(s) beyond tolerance:\n${report.breaches.map((d) => `  ${describeBreach(d, report)}`).join('\n')}\n`);
    }
    io.stderr.write(`${compareSummaryLine(report)}\n`);
    return report.breaches.length ? 1 : 0;
  } catch (e) {
    if (e instanceof ReferenceError || e instanceof ReadBuildError) {
      io.stderr.write(`qforge: error: ${e.message}\n`);
      return 1;
    }
    throw e;
  }
}
