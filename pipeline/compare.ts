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
 *   - lines starting with '#' are comments (name the source there); empty cells mean "no value".
 * 80-column files: every record whose name is in the build is compared on a 100 K grid (plus 298.15 K
 * and the ends) over the common temperature range.
 *
 * Only temperatures inside the fitted range of the built species are compared (the polynomials are not
 * valid outside it); rows outside are counted and reported as skipped.
 * Tolerances: --tolerance flags, else the references.tolerances of --database's qforge.yaml, else the
 * build's recorded settings, else the defaults (0.5 J/(mol K), 0.5 J/(mol K), 0.5 kJ/mol).
 */
import { readFile, stat } from 'node:fs/promises';
import path from 'node:path';
import { parseString } from 'fast-csv';
import { T_REF } from '../src/constants.js';
import type { CliIo } from './cli.js';
import { formatDiagnostic } from './diagnostics.js';
import { polynomialProperties, readPolynomialSet, ReadBuildError, ReadBuildUsageError, type PolynomialSet } from './read-build.js';
import { DEFAULT_SETTINGS, loadSettings, type QuantityTriple } from './settings.js';

export type RefQuantity = 'cp' | 's' | 'h';
const QS: readonly RefQuantity[] = ['cp', 's', 'h'];
const LABEL: Record<RefQuantity, string> = { cp: 'Cp', s: 'S', h: 'H-H298' };
const UNIT: Record<RefQuantity, string> = { cp: 'J/(mol K)', s: 'J/(mol K)', h: 'kJ/mol' };

/** Unit → factor into the internal unit of the column (J/(mol K) or kJ/mol). Thermochemical calorie. */
const ENTROPY_UNITS: Record<string, number> = { 'J/(mol K)': 1, 'J/(mol*K)': 1, 'J/mol/K': 1, 'J mol-1 K-1': 1, 'cal/(mol K)': 4.184, 'cal/mol/K': 4.184 };
const ENTHALPY_UNITS: Record<string, number> = { 'kJ/mol': 1, 'J/mol': 1e-3, 'kcal/mol': 4.184 };

export interface ReferenceRow {
  T: number;
  cp?: number;
  s?: number;
  h?: number;
}

export interface ReferenceTable {
  file: string;
  species: Map<string, ReferenceRow[]>;
}

export class ReferenceError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'ReferenceError';
  }
}

type Column = { kind: 'T' } | { kind: 'species' } | { kind: RefQuantity; factor: number } | { kind: 'ignore' };

function parseHeaderCell(cell: string, file: string): Column {
  const c = cell.trim();
  if (/^(species|name)$/i.test(c)) return { kind: 'species' };
  const m = /^(T|Cp|S|H-H298|H-H\(298\.15\)|H-H298\.15)\s*\[(.+)\]$/.exec(c);
  if (!m) {
    if (/^(T|Cp|S|H-H298)$/.test(c)) throw new ReferenceError(`${file}: column '${c}' has no unit; expected e.g. '${c} [${c === 'T' ? 'K' : c === 'H-H298' ? 'kJ/mol' : 'J/(mol K)'}]'`);
    return { kind: 'ignore' };
  }
  const what = m[1]!;
  const unit = m[2]!.trim();
  if (what === 'T') {
    if (unit !== 'K') throw new ReferenceError(`${file}: column '${c}': temperatures must be in K`);
    return { kind: 'T' };
  }
  if (what === 'Cp' || what === 'S') {
    const f = ENTROPY_UNITS[unit];
    if (f === undefined) throw new ReferenceError(`${file}: column '${c}': unknown unit '${unit}'; expected one of ${Object.keys(ENTROPY_UNITS).join(', ')}`);
    return { kind: what === 'Cp' ? 'cp' : 's', factor: f };
  }
  const f = ENTHALPY_UNITS[unit];
  if (f === undefined) throw new ReferenceError(`${file}: column '${c}': unknown unit '${unit}'; expected one of ${Object.keys(ENTHALPY_UNITS).join(', ')}`);
  return { kind: 'h', factor: f };
}

async function csvRows(text: string): Promise<string[][]> {
  return new Promise((resolve, reject) => {
    const rows: string[][] = [];
    parseString(text, { headers: false, comment: '#', ignoreEmpty: true, trim: true })
      .on('error', reject)
      .on('data', (r: string[]) => rows.push(r))
      .on('end', () => resolve(rows));
  });
}

/** Parses a reference CSV table (see the module comment for the layout). */
export async function parseReferenceCsv(text: string, file: string): Promise<ReferenceTable> {
  let rows: string[][];
  try {
    rows = await csvRows(text);
  } catch (e) {
    throw new ReferenceError(`${file}: not a readable CSV file (${(e as Error).message})`);
  }
  const header = rows[0];
  if (!header) throw new ReferenceError(`${file}: no header row; expected e.g. 'T [K],Cp [J/(mol K)],S [J/(mol K)],H-H298 [kJ/mol]'`);
  const cols = header.map((h) => parseHeaderCell(h, file));
  const tCol = cols.findIndex((c) => c.kind === 'T');
  if (tCol < 0) throw new ReferenceError(`${file}: no 'T [K]' column in the header`);
  if (!cols.some((c) => c.kind === 'cp' || c.kind === 's' || c.kind === 'h')) {
    throw new ReferenceError(`${file}: no Cp, S or H-H298 column in the header`);
  }
  const sCol = cols.findIndex((c) => c.kind === 'species');
  const fallbackName = path.basename(file).replace(/\.csv$/i, '');
  const species = new Map<string, ReferenceRow[]>();
  rows.slice(1).forEach((r, i) => {
    const lineNo = i + 2;
    const T = Number(r[tCol]);
    if (!(Number.isFinite(T) && T > 0)) throw new ReferenceError(`${file}: data row ${lineNo}: T = '${r[tCol] ?? ''}' is not a temperature in K`);
    const name = sCol >= 0 ? (r[sCol] ?? '').trim() : fallbackName;
    if (!name) throw new ReferenceError(`${file}: data row ${lineNo}: empty species name`);
    const row: ReferenceRow = { T };
    cols.forEach((c, j) => {
      if (c.kind !== 'cp' && c.kind !== 's' && c.kind !== 'h') return;
      const cell = (r[j] ?? '').trim();
      if (cell === '') return;
      const v = Number(cell);
      if (!Number.isFinite(v)) throw new ReferenceError(`${file}: data row ${lineNo}: ${header[j]} = '${cell}' is not a number`);
      row[c.kind] = v * c.factor;
    });
    const list = species.get(name) ?? [];
    list.push(row);
    species.set(name, list);
  });
  return { file, species };
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

export interface Deviation {
  species: string;
  reference: string;
  quantity: RefQuantity;
  T: number;
  referenceValue: number;
  buildValue: number;
  /** build − reference */
  deviation: number;
  tolerance: number;
  ok: boolean;
}

export interface CompareReport {
  build: string;
  tolerances: QuantityTriple;
  deviations: Deviation[];
  /** Reference species absent from the build. */
  missing: Array<{ species: string; reference: string }>;
  /** Rows outside the fitted range of the built species, skipped. */
  skipped: Array<{ species: string; reference: string; T: number }>;
  breaches: Deviation[];
}

export function compareWithReferences(build: PolynomialSet, refs: readonly ReferenceTable[], tolerances: QuantityTriple): CompareReport {
  const report: CompareReport = { build: build.label, tolerances, deviations: [], missing: [], skipped: [], breaches: [] };
  for (const ref of refs) {
    for (const [name, rows] of [...ref.species].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))) {
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
        const built: Record<RefQuantity, number> = { cp: p.cp, s: p.s, h: p.hMinusH298 };
        for (const q of QS) {
          const rv = row[q];
          if (rv === undefined) continue;
          const deviation = built[q] - rv;
          const d: Deviation = {
            species: name,
            reference: ref.file,
            quantity: q,
            T: row.T,
            referenceValue: rv,
            buildValue: built[q],
            deviation,
            tolerance: tolerances[q],
            // A hair of slack so that float noise never turns a deviation equal to the tolerance into a breach.
            ok: Math.abs(deviation) <= tolerances[q] + 1e-9,
          };
          report.deviations.push(d);
          if (!d.ok) report.breaches.push(d);
        }
      }
    }
  }
  return report;
}

const signed = (x: number, d: number) => `${x >= 0 ? '+' : ''}${x.toFixed(d)}`;

export function describeBreach(d: Deviation): string {
  return `${d.species} ${LABEL[d.quantity]} at ${d.T} K: build ${d.buildValue.toFixed(4)} vs reference ${d.referenceValue.toFixed(4)} ${UNIT[d.quantity]} (${d.reference}): deviation ${signed(d.deviation, 4)} exceeds the tolerance ${d.tolerance} ${UNIT[d.quantity]}`;
}

export function renderCompareText(r: CompareReport): string {
  const lines: string[] = [
    `qforge compare ${r.build}: tolerances Cp ${r.tolerances.cp} J/(mol K), S ${r.tolerances.s} J/(mol K), H-H298 ${r.tolerances.h} kJ/mol`,
  ];
  const bySpecies = new Map<string, Deviation[]>();
  for (const d of r.deviations) bySpecies.set(d.species, [...(bySpecies.get(d.species) ?? []), d]);
  for (const [name, ds] of bySpecies) {
    const worst = QS.map((q) => {
      const of = ds.filter((d) => d.quantity === q);
      if (!of.length) return undefined;
      const w = of.reduce((a, b) => (Math.abs(b.deviation) > Math.abs(a.deviation) ? b : a));
      return `${LABEL[q]} ${signed(w.deviation, 4)} at ${w.T} K`;
    }).filter(Boolean);
    const bad = ds.filter((d) => !d.ok).length;
    lines.push(`${bad ? 'FAIL' : 'ok  '} ${name}: ${ds.length} values, largest deviations ${worst.join(', ')}${bad ? `; ${bad} beyond tolerance` : ''}`);
    lines.push(`       T [K]   quantity  reference      build  deviation`);
    for (const d of ds) {
      lines.push(
        `  ${String(d.T).padStart(10)}   ${LABEL[d.quantity].padEnd(8)} ${d.referenceValue.toFixed(4).padStart(10)} ${d.buildValue.toFixed(4).padStart(10)} ${signed(d.deviation, 4).padStart(10)}${d.ok ? '' : '  <-- beyond tolerance'}`,
      );
    }
  }
  for (const m of r.missing) lines.push(`note: ${m.species} (in ${m.reference}) is not in the build`);
  if (r.skipped.length) lines.push(`note: ${r.skipped.length} reference row(s) outside the fitted ranges were skipped`);
  return `${lines.join('\n')}\n`;
}

async function loadReference(p: { path: string; label: string }, build: PolynomialSet): Promise<ReferenceTable> {
  try {
    if (!(await stat(p.path)).isFile()) throw new Error();
  } catch {
    throw new ReadBuildUsageError(`reference ${p.label}: no such file`);
  }
  if (/\.csv$/i.test(p.path)) return parseReferenceCsv(await readFile(p.path, 'utf8'), p.label);
  return referenceFromPolynomials(await readPolynomialSet(p.path, p.label), build);
}

export async function compareCommand(
  io: CliIo,
  buildPath: string,
  buildLabel: string,
  o: { reference?: Array<{ path: string; label: string }>; database?: string; tolerance?: Partial<QuantityTriple>; json?: boolean },
): Promise<number> {
  try {
    const build = await readPolynomialSet(buildPath, buildLabel);
    let refs = o.reference ?? [];
    let tolerances: QuantityTriple = { ...(build.settings?.references?.tolerances ?? DEFAULT_SETTINGS.references.tolerances) };
    if (o.database) {
      const s = await loadSettings(o.database, path.relative(io.cwd, o.database) || '.');
      if (s.diagnostics.some((d) => d.severity === 'error')) {
        for (const d of s.diagnostics) io.stderr.write(`${formatDiagnostic(d)}\n`);
        return 1;
      }
      tolerances = { ...s.settings.references.tolerances };
      if (!refs.length) {
        refs = s.settings.references.files.map((f) => ({
          path: path.resolve(o.database!, f),
          label: path.relative(io.cwd, path.resolve(o.database!, f)),
        }));
      }
    }
    tolerances = { ...tolerances, ...(o.tolerance ?? {}) };
    if (!refs.length) {
      io.stderr.write('qforge: error: no reference files: give --reference FILE... or --database DIR with references.files in its qforge.yaml\n');
      return 2;
    }
    const tables: ReferenceTable[] = [];
    for (const r of refs) tables.push(await loadReference(r, build));
    const report = compareWithReferences(build, tables, tolerances);
    if (o.json) io.stdout.write(`${JSON.stringify(report, null, 2)}\n`);
    else io.stdout.write(renderCompareText(report));
    if (report.deviations.length === 0) {
      io.stderr.write('qforge: compare FAILED: no reference value matched a species and temperature of the build\n');
      return 1;
    }
    if (report.breaches.length) {
      io.stderr.write(
        `qforge: compare FAILED: ${report.breaches.length} value(s) beyond tolerance:\n${report.breaches.map((d) => `  ${describeBreach(d)}`).join('\n')}\n`,
      );
      return 1;
    }
    io.stderr.write(`qforge: compare ok: ${report.deviations.length} values within tolerance\n`);
    return 0;
  } catch (e) {
    if (e instanceof ReferenceError || e instanceof ReadBuildError) {
      io.stderr.write(`qforge: error: ${e.message}\n`);
      return 1;
    }
    throw e;
  }
}
