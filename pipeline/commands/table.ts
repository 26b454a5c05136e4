/**
 * `qforge table FILE`: one species' standard properties straight from its partition functions (no fit).
 * CSV header (exact): T [K],Cp [J/(mol K)],S [J/(mol K)],H-H298 [kJ/mol],H [kJ/mol],G [kJ/mol]
 */
import { stat } from 'node:fs/promises';
import { STANDARD_PRESSURE_ATM, STANDARD_PRESSURE_BAR } from '../../src/constants.js';
import type { StandardProperties } from '../../src/model.js';
import type { CliIo } from './io.js';
import { formatDiagnostic, hasErrors } from '../core/diagnostics.js';
import { fixed } from '../stages/emit.js';
import { computeTable } from '../stages/compute.js';
import { loadYamlFile } from '../stages/load.js';
import { validateSpecies } from '../stages/validate.js';

export const TABLE_CSV_HEADER = 'T [K],Cp [J/(mol K)],S [J/(mol K)],H-H298 [kJ/mol],H [kJ/mol],G [kJ/mol]';

/** Temperatures printed when neither --at nor --range is given, K. */
export const DEFAULT_TABLE_TEMPERATURES = [200, 298.15, 300, 400, 500, 600, 800, 1000, 1500, 2000, 2500, 3000, 3500, 4000, 4500, 5000, 5500, 6000];

/** Most rows a table may have (a typo like --range 200:6000:0.001 should not hang). */
export const MAX_TABLE_ROWS = 100_000;

export class TableArgumentError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'TableArgumentError';
  }
}

const positiveT = (text: string, what: string): number => {
  const n = Number(text);
  if (text.trim() === '' || !Number.isFinite(n) || n <= 0) throw new TableArgumentError(`${what}: '${text}' is not a temperature in K > 0`);
  return n;
};

/** Temperatures from --at and --range (both may be given), ascending and distinct. */
export function tableTemperatures(at?: string, range?: string): number[] {
  const out = new Set<number>();
  if (at !== undefined) for (const part of at.split(',')) out.add(positiveT(part, '--at'));
  if (range !== undefined) {
    const parts = range.split(':');
    if (parts.length !== 3) throw new TableArgumentError(`--range '${range}': expected FROM:TO:STEP, e.g. 200:6000:100`);
    const [from, to, step] = parts.map((p, i) => positiveT(p, `--range ${['FROM', 'TO', 'STEP'][i]}`)) as [number, number, number];
    if (!(from <= to)) throw new TableArgumentError(`--range '${range}': FROM must not exceed TO`);
    const n = Math.floor((to - from) / step + 1e-9);
    if (n + 1 > MAX_TABLE_ROWS) throw new TableArgumentError(`--range '${range}': ${n + 1} rows; at most ${MAX_TABLE_ROWS}`);
    for (let k = 0; k <= n; k++) out.add(Math.round((from + k * step) * 1e6) / 1e6);
  }
  if (out.size === 0) return [...DEFAULT_TABLE_TEMPERATURES];
  if (out.size > MAX_TABLE_ROWS) throw new TableArgumentError(`${out.size} temperatures; at most ${MAX_TABLE_ROWS}`);
  return [...out].sort((a, b) => a - b);
}

/** Rows as the six formatted columns of the CSV header. */
export function formatTableRows(rows: readonly StandardProperties[]): string[][] {
  return rows.map((p) => [String(p.T), fixed(p.Cp, 3), fixed(p.S, 3), fixed(p.HminusH298, 3), fixed(p.H, 3), fixed(p.G, 3)]);
}

export function renderTableCsv(rows: readonly StandardProperties[]): string {
  return `${[TABLE_CSV_HEADER, ...formatTableRows(rows).map((r) => r.join(','))].join('\n')}\n`;
}

export function renderTableText(name: string, pressureLabel: string, rows: readonly StandardProperties[]): string {
  const header = TABLE_CSV_HEADER.split(',');
  const body = formatTableRows(rows);
  const widths = header.map((h, i) => Math.max(h.length, ...body.map((r) => r[i]!.length)));
  const line = (cells: readonly string[]) => cells.map((c, i) => c.padStart(widths[i]!)).join('  ');
  return [
    `${name}: ideal gas, standard pressure ${pressureLabel}, computed from partition functions (not the fitted polynomial)`,
    line(header),
    ...body.map(line),
    '',
  ].join('\n');
}

export async function tableCommand(
  io: CliIo,
  file: string,
  fileLabel: string,
  o: { name?: string; at?: string; range?: string; format: 'text' | 'csv'; pressure: 'bar' | 'atm' },
): Promise<number> {
  let temperatures: number[];
  try {
    temperatures = tableTemperatures(o.at, o.range);
  } catch (e) {
    io.stderr.write(`qforge: error: ${(e as Error).message}\n`);
    return 2;
  }
  // A FILE that is not there (or is a folder) is a bad path argument: usage, exit 2, like diff and compare.
  try {
    if ((await stat(file)).isDirectory()) {
      io.stderr.write(`qforge: error: ${fileLabel} is a folder, not a species file\n`);
      return 2;
    }
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    if (code === 'ENOENT' || code === 'ENOTDIR') {
      io.stderr.write(`qforge: error: ${fileLabel}: no such file\n`);
      return 2;
    }
    // Other problems (permissions, …) are reported by the loader with the OS reason.
  }
  const loaded = await loadYamlFile(file, fileLabel);
  const diagnostics = [...loaded.diagnostics];
  if (hasErrors(diagnostics)) {
    for (const d of diagnostics) io.stderr.write(`${formatDiagnostic(d)}\n`);
    return 1;
  }
  const names = loaded.documents.map((d) => (d.value && typeof d.value === 'object' ? (d.value as { name?: unknown }).name : undefined));
  let doc = loaded.documents[0];
  if (o.name !== undefined) {
    doc = loaded.documents.find((_, i) => names[i] === o.name);
    if (!doc) {
      // A usage error like a missing --name: the command line names something the file does not hold.
      io.stderr.write(`qforge: error: no species named '${o.name}' in ${fileLabel} (it holds: ${names.map(String).join(', ') || 'none'})\n`);
      return 2;
    }
  } else if (loaded.documents.length > 1) {
    io.stderr.write(`qforge: error: ${fileLabel} holds ${loaded.documents.length} species (${names.map(String).join(', ')}); choose one with --name\n`);
    return 2;
  }
  if (!doc) {
    io.stderr.write(`qforge: error: ${fileLabel} holds no species\n`);
    return 1;
  }
  const v = validateSpecies(doc);
  for (const d of v.diagnostics) io.stderr.write(`${formatDiagnostic(d)}\n`);
  if (!v.species || hasErrors(v.diagnostics)) return 1;
  const pressure = o.pressure === 'atm' ? STANDARD_PRESSURE_ATM : STANDARD_PRESSURE_BAR;
  let rows: StandardProperties[];
  try {
    rows = computeTable(v.species, { standardPressure: pressure }, temperatures);
  } catch (e) {
    io.stderr.write(`qforge: error: ${fileLabel}: [${v.species.name}] computing the properties failed: ${(e as Error).message}\n`);
    return 1;
  }
  const outside = temperatures.filter((T) => T < 200 || T > 6000);
  if (outside.length) {
    io.stderr.write(`qforge: warning: ${outside.length} temperature(s) outside 200-6000 K, where the models are meant to be used\n`);
  }
  io.stdout.write(o.format === 'csv' ? renderTableCsv(rows) : renderTableText(v.species.name, o.pressure === 'atm' ? '1 atm' : '1 bar', rows));
  return 0;
}
