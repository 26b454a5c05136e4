/**
 * tables/<name>.csv of one built species: computed and fitted values and their difference on the table
 * grid, numbers in fixed decimals. Pure text rendering; worker threads render their species' tables with
 * it (workers/species-worker.ts), the emit stage renders the rest.
 */
import { GAS_CONSTANT, T_REF } from '../../src/constants.js';
import { evaluateNasa7 } from '../../src/nasa7/evaluate.js';
import type { Nasa7Polynomial } from '../../src/nasa7/types.js';
import type { StandardProperties } from '../../src/model.js';

/** What a table needs of a built species (emit.ts BuiltSpecies has it). */
export interface TableSource {
  fit: { polynomial: Nasa7Polynomial };
  /** Computed properties on the table grid. */
  table: readonly StandardProperties[];
}

export const TABLE_HEADERS = [
  'T [K]',
  'Cp computed [J/(mol K)]',
  'Cp fitted [J/(mol K)]',
  'Cp fitted-computed [J/(mol K)]',
  'S computed [J/(mol K)]',
  'S fitted [J/(mol K)]',
  'S fitted-computed [J/(mol K)]',
  'H-H298 computed [kJ/mol]',
  'H-H298 fitted [kJ/mol]',
  'H-H298 fitted-computed [kJ/mol]',
  'H computed [kJ/mol]',
  'H fitted [kJ/mol]',
  'H fitted-computed [kJ/mol]',
  'G computed [kJ/mol]',
  'G fitted [kJ/mol]',
  'G fitted-computed [kJ/mol]',
] as const;

/** Powers of ten that are exact doubles, by number of decimals (the fast path of `fixed`). */
const POW10 = [1, 10, 100, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9] as const;
const ZERO_TEXT = POW10.map((_, d) => (0).toFixed(d));
/** |x·10^d| below this (2^31): ulp ≤ 2^-22, and the integer part prints as a small integer. */
const FAST_LIMIT = 2147483648;
/** How far x·10^d must lie from a rounding tie (an integer + 1/2) for the fast path: far above ulp(2^31) = 2^-22. */
const TIE_MARGIN = 1e-6;

/**
 * Fixed decimals, never "-0.000": exactly the text of `x.toFixed(decimals)` (ECMA-262 Number.prototype.toFixed:
 * the integer n nearest to x·10^d in exact arithmetic, ties to the larger n), with the sign dropped when the
 * text reads as zero.
 *
 * Method (why it is exact): 10^d (d ≤ 9) is an exact double, so the rounded product y = fl(x·10^d) is within
 * ulp(y)/2 ≤ 2^-23 of the exact product when |y| < 2^31; y − round(y) is exact (Sterbenz); when y lies more
 * than TIE_MARGIN from a half-integer, the exact product rounds to the same integer n = Math.round(y) (being
 * strictly off the tie would do: half-integers below 2^31 are doubles, so rounding the product cannot step
 * over one; the margin is a safety factor), and
 * n's digits with the point inserted are toFixed's text. Anything else (ties within the margin, |y| ≥ 2^31,
 * non-finite, d = 0 or d > 9) goes through toFixed itself. About twice as fast as toFixed plus the negative
 * zero check; a table of 60 rows formats 900 cells (test/pipeline/stages/emit-table.test.ts compares the two
 * on millions of values and the edge cases).
 */
export function fixed(x: number, decimals: number): string {
  const n = exactlyScaled(x, decimals);
  if (n !== n) return fixedByToFixed(x, decimals);
  if (n === 0) return ZERO_TEXT[decimals]!;
  const scale = POW10[decimals]!;
  const a = n < 0 ? -n : n;
  const whole = Math.floor(a / scale);
  // scale + fraction has d + 1 digits; dropping its leading 1 leaves the fraction zero-padded.
  const text = `${whole}.${String(scale + (a - whole * scale)).slice(1)}`;
  return n < 0 ? `-${text}` : text;
}

/** round(x·10^decimals) when the fast path of `fixed` is exact for it (see there), else NaN. */
function exactlyScaled(x: number, decimals: number): number {
  const scale = decimals > 0 ? POW10[decimals] : undefined;
  if (scale === undefined) return NaN;
  const y = x * scale;
  if (!(y < FAST_LIMIT && y > -FAST_LIMIT)) return NaN;
  const n = Math.round(y);
  const r = y - n;
  return r < 0.5 - TIE_MARGIN && r > TIE_MARGIN - 0.5 ? n : NaN;
}

/** The reference form of `fixed`: toFixed, and "-0.000…" printed without its sign. */
export function fixedByToFixed(x: number, decimals: number): string {
  const s = x.toFixed(decimals);
  // Only a negative number can print as "-0.000…"; then it reads back as (negative) zero.
  return x < 0 && Number(s) === 0 ? s.slice(1) : s;
}

/** Fitted properties in table units at T (K). */
export function fittedProperties(poly: Nasa7Polynomial, T: number): { Cp: number; S: number; H: number; HminusH298: number; G: number } {
  return fittedPropertiesFrom(poly, T, enthalpyAt298(poly));
}

/** H(298.15 K) of the polynomial, kJ/mol. */
function enthalpyAt298(poly: Nasa7Polynomial): number {
  return (evaluateNasa7(poly, T_REF).hRT * GAS_CONSTANT * T_REF) / 1000;
}

function fittedPropertiesFrom(poly: Nasa7Polynomial, T: number, H298: number): { Cp: number; S: number; H: number; HminusH298: number; G: number } {
  const R = GAS_CONSTANT;
  const v = evaluateNasa7(poly, T);
  const H = (v.hRT * R * T) / 1000;
  const S = v.sR * R;
  return { Cp: v.cpR * R, S, H, HminusH298: H - H298, G: H - (T * S) / 1000 };
}

const TABLE_HEADER_LINE = `${TABLE_HEADERS.join(',')}\n`;

// The table text is written as ASCII bytes into one growing buffer per thread and decoded once: no string
// per cell, none per row (the previous form made ~2,000 small strings per species).
let bytes = new Uint8Array(1 << 15);
let at = 0;
const DOT = 0x2e;
const COMMA = 0x2c;
const MINUS = 0x2d;
const NEWLINE = 0x0a;
const ZERO = 0x30;

function room(n: number): void {
  if (at + n <= bytes.length) return;
  const grown = new Uint8Array(Math.max(bytes.length * 2, at + n));
  grown.set(bytes.subarray(0, at));
  bytes = grown;
}

/** Appends an ASCII text (a number's String or toFixed form). */
function putAscii(s: string): void {
  room(s.length);
  for (let i = 0; i < s.length; i++) bytes[at++] = s.charCodeAt(i);
}

/** Appends a non-negative integer below 2^31 in decimal. */
function putDigits(v: number): void {
  let len = 1;
  for (let t = v; t >= 10; t = (t / 10) | 0) len++;
  for (let p = at + len - 1; p >= at; p--) {
    bytes[p] = ZERO + (v % 10);
    v = (v / 10) | 0;
  }
  at += len;
}

/**
 * The cells of the row being written, by column (T first). Cells are handed to `putCell` as indices into
 * this array, not as numbers: a double passed to a function that is not inlined is boxed, and the table
 * writer made one such box per cell (~15 KB per species, measured).
 */
const row = new Float64Array(TABLE_HEADERS.length);

/** Appends `fixed(row[cell], decimals)`: the same fast path (see there for why it is exact), written as bytes. */
function putFixed(cell: number, decimals: number): void {
  const x = row[cell]!;
  const n = exactlyScaled(x, decimals);
  if (n !== n) {
    putAscii(fixedByToFixed(x, decimals));
    return;
  }
  const scale = POW10[decimals]!;
  room(decimals + 13);
  if (n < 0) bytes[at++] = MINUS;
  const a = n < 0 ? -n : n;
  const whole = Math.floor(a / scale);
  putDigits(whole);
  bytes[at++] = DOT;
  let frac = a - whole * scale;
  for (let p = at + decimals - 1; p >= at; p--) {
    bytes[p] = ZERO + (frac % 10);
    frac = (frac / 10) | 0;
  }
  at += decimals;
}

/** Appends a separator and `fixed(row[cell], decimals)`. */
function putCell(cell: number, decimals: number): void {
  room(1);
  bytes[at++] = COMMA;
  putFixed(cell, decimals);
}

/**
 * The data lines of tables/<name>.csv, written cell by cell into the byte buffer (no array per row, no
 * object per point, no string per cell): the same arithmetic as `fittedProperties` at each table
 * temperature (evaluate.ts `evaluateRange`'s expressions, written out), every cell a decimal number
 * (`fixed`, String of T), so none needs CSV quoting.
 */
function renderTableBody(b: TableSource): string {
  const poly = b.fit.polynomial;
  const H298 = enthalpyAt298(poly);
  const R = GAS_CONSTANT;
  at = 0;
  for (const c of b.table) {
    const T = c.T;
    const k = T <= poly.tMid ? poly.low : poly.high;
    const a1 = k[0], a2 = k[1], a3 = k[2], a4 = k[3], a5 = k[4], a6 = k[5], a7 = k[6]; // prettier-ignore
    const cpR = a1 + T * (a2 + T * (a3 + T * (a4 + T * a5)));
    const hRT = a1 + T * (a2 / 2 + T * (a3 / 3 + T * (a4 / 4 + T * (a5 / 5)))) + a6 / T;
    const sR = a1 * Math.log(T) + T * (a2 + T * (a3 / 2 + T * (a4 / 3 + T * (a5 / 4)))) + a7;
    const H = (hRT * R * T) / 1000;
    const S = sR * R;
    const Cp = cpR * R;
    const dH298 = H - H298;
    const G = H - (T * S) / 1000;
    putAscii(String(T));
    row[1] = c.Cp; row[2] = Cp; row[3] = Cp - c.Cp;
    row[4] = c.S; row[5] = S; row[6] = S - c.S;
    row[7] = c.HminusH298; row[8] = dH298; row[9] = dH298 - c.HminusH298;
    row[10] = c.H; row[11] = H; row[12] = H - c.H;
    row[13] = c.G; row[14] = G; row[15] = G - c.G;
    for (let cell = 1; cell <= 3; cell++) putCell(cell, 4);
    for (let cell = 4; cell <= 6; cell++) putCell(cell, 4);
    for (let cell = 7; cell <= 15; cell++) putCell(cell, 5);
    room(1);
    bytes[at++] = NEWLINE;
  }
  return Buffer.from(bytes.buffer, bytes.byteOffset, at).toString('latin1');
}

/**
 * tables/<name>.csv. Its cells are numbers (digits, '.', '-', and 'e', '+', 'NaN', 'Infinity' of String(T) or of
 * toFixed beyond 1e21) and the fixed headers, none of which CSV quotes, so the text is written directly
 * (fast-csv's stream cost ~0.4 ms per species; test/pipeline/stages/emit-table.test.ts checks the bytes are
 * what fast-csv writes for the same cells).
 */
export function renderTable(b: TableSource): string {
  return TABLE_HEADER_LINE + renderTableBody(b);
}

/** CSV text of `rows` as fast-csv writes it (quoting where needed), one row per line, final newline. */
export async function csvText(rows: readonly (readonly string[])[]): Promise<string> {
  // Loaded on first use: most builds never need it.
  const { writeToString } = await import('fast-csv');
  const text = await writeToString(rows.map((r) => [...r]), { headers: false, rowDelimiter: '\n' });
  return `${text}\n`;
}
