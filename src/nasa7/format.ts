/**
 * Writer of the four-line, 80-column record published with the NASA coefficient reports (Gordon &
 * McBride 1971, NASA SP-273; McBride, Gordon & Reno 1993, NASA TM-4513). Columns (1-based, inclusive):
 *
 *   line 1   1–18  name (left-justified)          19–24  identifier (left-justified)
 *           25–44  four element slots: symbol (2 chars, left-justified) + count (3 chars, integer,
 *                  right-justified); unused slots blank
 *              45  phase ('G')
 *           46–55  T_low  (F10.3)     56–65  T_high (F10.3)     66–73  T_mid (F8.3)
 *           74–79  blank                 80  '1'
 *   line 2  high a1..a5                                   (5 × E15.8, cols 1–75), '2' in col 80
 *   line 3  high a6, a7, low a1, a2, a3                   (5 × E15.8, cols 1–75), '3' in col 80
 *   line 4  low a4..a7                                    (4 × E15.8, cols 1–60), '4' in col 80
 *
 * Choices: temperatures are fixed-point with 3 decimals (F10.3 / F8.3, e.g. "   200.000", "1000.000");
 * counts are integers (the layout also admits "2." style reals; integers are what our compositions are).
 * E15.8 is written exactly as Fortran would: sign or blank, d.dddddddd, 'E', exponent sign, two digits.
 * Magnitudes that round below 1e-99 are written as zero (a term below 1e-99 T⁴ is nothing at any T the
 * record is valid for); magnitudes ≥ 1e100 cannot be written and are an error. Anything the layout cannot
 * hold (a fifth element, a long name, a count beyond 3 columns, …) is a Nasa7FormatError, never a cut.
 *
 * The file (`formatNasa7File`): a line `THERMO`, a line with the default T_low, T_mid, T_high (3 × F10.3),
 * the records, and a line `END` — the framing kinetics codes commonly expect (common practice). Lines end
 * in '\n'; output depends only on the arguments.
 */
import { Nasa7FormatError } from './errors.js';
import type { Coefficients7, Nasa7Record } from './types.js';

export const NAME_WIDTH = 18;
export const IDENTIFIER_WIDTH = 6;
export const MAX_ELEMENTS = 4;
export const MIN_COUNT = -99;
export const MAX_COUNT = 999;

/** Fortran E15.8 of a finite number. `where` names the record and field for errors. */
export function formatE15(x: number, record = '', field = 'value'): string {
  if (!Number.isFinite(x)) throw new Nasa7FormatError(record, field, `${x} cannot be written as E15.8; expected a finite number`);
  const text = Math.abs(x).toExponential(8); // "d.dddddddde±x", correctly rounded
  const [mantissa, expText] = text.split('e') as [string, string];
  const exponent = Number(expText);
  if (x === 0 || exponent < -99) return ' 0.00000000E+00';
  if (exponent > 99) throw new Nasa7FormatError(record, field, `${x} needs a 3-digit exponent; E15.8 holds two (|value| < 1e100)`);
  const sign = x < 0 ? '-' : ' ';
  const expSign = exponent < 0 ? '-' : '+';
  return `${sign}${mantissa}E${expSign}${String(Math.abs(exponent)).padStart(2, '0')}`;
}

/** Fixed-point with 3 decimals, right-justified in `width` columns. */
export function formatFixed(x: number, width: number, record = '', field = 'value'): string {
  if (!Number.isFinite(x) || x <= 0) throw new Nasa7FormatError(record, field, `temperature ${x} K: expected a positive finite number`);
  const s = x.toFixed(3);
  if (s.length > width) throw new Nasa7FormatError(record, field, `${s} does not fit ${width} columns (F${width}.3)`);
  return s.padStart(width, ' ');
}

const PRINTABLE = /^[\x21-\x7e]*$/;
const PRINTABLE_OR_BLANK = /^[\x20-\x7e]*$/;

function elementSlots(rec: Nasa7Record): string {
  const els = rec.elements;
  if (els.length === 0) throw new Nasa7FormatError(rec.name, 'elements', 'no elements; a record needs at least one element symbol/count pair');
  if (els.length > MAX_ELEMENTS) {
    throw new Nasa7FormatError(
      rec.name,
      `elements[${MAX_ELEMENTS}]`,
      `${els.length} elements (${els.map(([s]) => s).join(', ')}); the layout holds at most ${MAX_ELEMENTS} symbol/count pairs`,
    );
  }
  const seen = new Set<string>();
  let out = '';
  els.forEach(([symbol, count], i) => {
    const field = `elements[${i}]`;
    if (!/^[A-Za-z]{1,2}$/.test(symbol)) throw new Nasa7FormatError(rec.name, field, `symbol ${JSON.stringify(symbol)}: expected 1–2 letters`);
    const key = symbol.toUpperCase();
    if (seen.has(key)) throw new Nasa7FormatError(rec.name, field, `symbol ${symbol} appears twice`);
    seen.add(key);
    if (!Number.isInteger(count) || count === 0) throw new Nasa7FormatError(rec.name, field, `count of ${symbol} is ${count}; expected a non-zero integer`);
    if (count < MIN_COUNT || count > MAX_COUNT) throw new Nasa7FormatError(rec.name, field, `count of ${symbol} is ${count}; 3 columns hold ${MIN_COUNT}..${MAX_COUNT}`);
    out += symbol.padEnd(2, ' ') + String(count).padStart(3, ' ');
  });
  return out.padEnd(5 * MAX_ELEMENTS, ' ');
}

const withLineNumber = (body: string, n: number): string => `${body.padEnd(79, ' ')}${n}`;

/** The four lines of one record (no trailing newline on the last). */
export function formatNasa7Record(rec: Nasa7Record): string[] {
  const name = rec.name;
  if (name.length === 0 || name.length > NAME_WIDTH || !PRINTABLE.test(name)) {
    throw new Nasa7FormatError(name, 'name', `${JSON.stringify(name)}: expected 1–${NAME_WIDTH} printable ASCII characters without blanks (got ${name.length})`);
  }
  if (name.startsWith('!')) throw new Nasa7FormatError(name, 'name', `${JSON.stringify(name)}: a leading '!' would make readers take the line for a comment`);
  if (rec.identifier.length > IDENTIFIER_WIDTH || !PRINTABLE_OR_BLANK.test(rec.identifier)) {
    throw new Nasa7FormatError(name, 'identifier', `${JSON.stringify(rec.identifier)}: expected at most ${IDENTIFIER_WIDTH} printable ASCII characters`);
  }
  if (!/^[A-Za-z]$/.test(rec.phase)) throw new Nasa7FormatError(name, 'phase', `${JSON.stringify(rec.phase)}: expected one letter ('G' for gas)`);
  const p = rec.polynomial;
  if (!(p.tLow < p.tMid && p.tMid < p.tHigh)) {
    throw new Nasa7FormatError(name, 'temperatures', `${p.tLow} / ${p.tMid} / ${p.tHigh} K: expected tLow < tMid < tHigh`);
  }
  const line1 =
    name.padEnd(NAME_WIDTH, ' ') +
    rec.identifier.padEnd(IDENTIFIER_WIDTH, ' ') +
    elementSlots(rec) +
    rec.phase +
    formatFixed(p.tLow, 10, name, 'tLow') +
    formatFixed(p.tHigh, 10, name, 'tHigh') +
    formatFixed(p.tMid, 8, name, 'tMid');
  const h = p.high;
  const l = p.low;
  const line2 = coefficientFields(h, 'high', name, 0, 5);
  const line3 = coefficientFields(h, 'high', name, 5, 7) + coefficientFields(l, 'low', name, 0, 3);
  const line4 = coefficientFields(l, 'low', name, 3, 7);
  return [withLineNumber(line1, 1), withLineNumber(line2, 2), withLineNumber(line3, 3), withLineNumber(line4, 4)];
}

/**
 * Coefficients from … to − 1 of one set as E15 fields, one after the other. A module function rather than a
 * closure per record: V8 compiled each record's closure anew (14 compilations per thread).
 */
function coefficientFields(c: Coefficients7, set: 'low' | 'high', name: string, from: number, to: number): string {
  let out = '';
  for (let i = from; i < to; i++) out += formatE15(c[i]!, name, `${set}.a${i + 1}`);
  return out;
}

/** The whole file: THERMO, default ranges, records in the given order, END; '\n' after every line. */
export function formatNasa7File(records: readonly Nasa7Record[], header: { tLow: number; tMid: number; tHigh: number }): string {
  if (!(header.tLow < header.tMid && header.tMid < header.tHigh)) {
    throw new Nasa7FormatError('', 'header', `${header.tLow} / ${header.tMid} / ${header.tHigh} K: expected tLow < tMid < tHigh`);
  }
  const lines = ['THERMO', formatFixed(header.tLow, 10, '', 'header.tLow') + formatFixed(header.tMid, 10, '', 'header.tMid') + formatFixed(header.tHigh, 10, '', 'header.tHigh')];
  const names = new Set<string>();
  for (const rec of records) {
    if (names.has(rec.name)) throw new Nasa7FormatError(rec.name, 'name', 'two records with the same name; a reader could not tell them apart');
    names.add(rec.name);
    lines.push(...formatNasa7Record(rec));
  }
  lines.push('END');
  return `${lines.join('\n')}\n`;
}
