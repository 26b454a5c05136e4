/**
 * Shared by both kinds of `qforge table` (computed from partition functions, fitted polynomial): the
 * temperature grid options, --digits, and the text/CSV rendering.
 * CSV header (exact): T [K],Cp [J/(mol K)],S [J/(mol K)],H-H298 [kJ/mol],H [kJ/mol],G [kJ/mol]
 */
import type { StandardProperties } from '../../src/model.js';
import { fixed } from '../stages/emit.js';

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

/** The columns a table prints (computed or fitted). */
export type TableRow = Pick<StandardProperties, 'T' | 'Cp' | 'S' | 'HminusH298' | 'H' | 'G'>;

/** Decimals printed when --digits is not given. */
export const DEFAULT_TABLE_DIGITS = 3;
/** Most decimals --digits accepts (beyond this the digits are noise of a double). */
export const MAX_TABLE_DIGITS = 12;

/** --digits N: an integer 0..MAX_TABLE_DIGITS. */
export function tableDigits(text?: string): number {
  if (text === undefined) return DEFAULT_TABLE_DIGITS;
  const n = Number(text);
  if (text.trim() === '' || !Number.isInteger(n) || n < 0 || n > MAX_TABLE_DIGITS) {
    throw new TableArgumentError(`--digits '${text}': expected a whole number of decimals from 0 to ${MAX_TABLE_DIGITS}`);
  }
  return n;
}

/** Rows as the six formatted columns of the CSV header. */
export function formatTableRows(rows: readonly TableRow[], digits = DEFAULT_TABLE_DIGITS): string[][] {
  return rows.map((p) => [String(p.T), fixed(p.Cp, digits), fixed(p.S, digits), fixed(p.HminusH298, digits), fixed(p.H, digits), fixed(p.G, digits)]);
}

export function renderTableCsv(rows: readonly TableRow[], digits = DEFAULT_TABLE_DIGITS): string {
  return `${[TABLE_CSV_HEADER, ...formatTableRows(rows, digits).map((r) => r.join(','))].join('\n')}\n`;
}

export function renderTableText(name: string, pressureLabel: string, rows: readonly TableRow[], digits = DEFAULT_TABLE_DIGITS, title?: string): string {
  const header = TABLE_CSV_HEADER.split(',');
  const body = formatTableRows(rows, digits);
  const widths = header.map((h, i) => Math.max(h.length, ...body.map((r) => r[i]!.length)));
  const line = (cells: readonly string[]) => cells.map((c, i) => c.padStart(widths[i]!)).join('  ');
  return [
    title ?? `${name}: ideal gas, standard pressure ${pressureLabel}, computed from partition functions (not the fitted polynomial)`,
    line(header),
    ...body.map(line),
    '',
  ].join('\n');
}

