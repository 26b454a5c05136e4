/**
 * Reader of files in the four-line, 80-column NASA record layout (see format.ts for the columns). Reads
 * what such files commonly contain, not only what our writer produces:
 *  - an optional `THERMO` / `THERMO ALL` line followed by a line of default T_low, T_mid, T_high;
 *  - comment lines starting with '!' (after optional blanks) and blank lines, anywhere;
 *  - a terminating `END` line (anything after it is ignored; a file without one is fine);
 *  - Fortran 'D' exponents; element counts written as reals ("2."); a fifth element in columns 74–78;
 *  - missing line numbers in column 80 (then records are taken four lines at a time);
 *  - a blank T_mid field, filled from the header's default when there is one;
 *  - coefficient fields that are not exactly 15 wide, when the line splits into the right number of
 *    numbers.
 * A malformed record yields one error with its line number and the reader continues with the next record.
 */
import type { Coefficients7, Nasa7Record } from './types.js';

export interface Nasa7ParseError {
  /** 1-based line number. */
  line: number;
  message: string;
  /** The file name given to the parser (added for diagnostics). */
  file: string;
}

export interface Nasa7ParseResult {
  records: Nasa7Record[];
  header?: { tLow: number; tMid: number; tHigh: number };
  errors: Nasa7ParseError[];
}

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/** A Fortran real (E or D exponent), or undefined when the text is not one. */
export function parseFortranNumber(text: string): number | undefined {
  const t = text.trim().replace(/[dD]/, 'E');
  return NUMBER.test(t) ? Number(t) : undefined;
}

interface SourceLine {
  no: number;
  text: string;
}

class RecordProblem extends Error {}

const column80 = (text: string): string => (text.length >= 80 ? text[79]!.trim() : '');

function parseHeaderLine(text: string): { tLow: number; tMid: number; tHigh: number } | undefined {
  if (column80(text) !== '') return undefined;
  const parts = text.trim().split(/\s+/);
  if (parts.length < 3) return undefined;
  const [a, b, c] = parts.slice(0, 3).map(parseFortranNumber);
  if (a === undefined || b === undefined || c === undefined) return undefined;
  return { tLow: a, tMid: b, tHigh: c };
}

function coefficientFields(line: SourceLine, count: number, label: string[]): number[] {
  const fixed: Array<number | undefined> = [];
  for (let i = 0; i < count; i++) fixed.push(parseFortranNumber(line.text.slice(15 * i, 15 * i + 15)));
  if (fixed.every((v) => v !== undefined)) return fixed as number[];
  const tokens = line.text.slice(0, 79).match(/[+-]?(\d+\.?\d*|\.\d+)([eEdD][+-]?\d+)?/g) ?? [];
  if (tokens.length === count) return tokens.map((t) => parseFortranNumber(t)!);
  const bad = fixed.findIndex((v) => v === undefined);
  const text = line.text.slice(15 * bad, 15 * bad + 15);
  throw new RecordProblem(
    `line ${line.no}, columns ${15 * bad + 1}–${15 * bad + 15} (${label[bad]}): ${JSON.stringify(text)} is not a number; expected ${count} E15.8 fields`,
  );
}

function parseRecord(lines: SourceLine[], header: Nasa7ParseResult['header']): Nasa7Record {
  const [l1, l2, l3, l4] = lines as [SourceLine, SourceLine, SourceLine, SourceLine];
  lines.forEach((l, i) => {
    const c = column80(l.text);
    if (c !== '' && c !== String(i + 1)) throw new RecordProblem(`line ${l.no}: column 80 holds '${c}', expected '${i + 1}' (line ${i + 1} of a record)`);
  });
  const t = l1.text;
  const name = t.slice(0, 18).trim().split(/\s+/)[0] ?? '';
  if (!name) throw new RecordProblem(`line ${l1.no}: columns 1–18 (name) are blank`);
  const identifier = t.slice(18, 24).trim();
  const elements: Array<[string, number]> = [];
  const slots: Array<[number, string]> = [0, 1, 2, 3].map((i) => [24 + 5 * i, `element ${i + 1}`]);
  slots.push([73, 'element 5']);
  for (const [start, label] of slots) {
    const symbol = t.slice(start, start + 2).trim();
    const countText = t.slice(start + 2, start + 5).trim();
    if (!symbol && (!countText || parseFortranNumber(countText) === 0)) continue;
    const count = parseFortranNumber(countText);
    if (!symbol || count === undefined || !Number.isInteger(count)) {
      throw new RecordProblem(`line ${l1.no}, columns ${start + 1}–${start + 5} (${label}): ${JSON.stringify(t.slice(start, start + 5))} is not a symbol and integer count`);
    }
    if (count !== 0) elements.push([symbol, count]);
  }
  const phase = t.slice(44, 45).trim();
  const temp = (from: number, to: number, label: string, fallback?: number): number => {
    const text = t.slice(from, to);
    if (!text.trim() && fallback !== undefined) return fallback;
    const v = parseFortranNumber(text);
    if (v === undefined || !(v > 0)) throw new RecordProblem(`line ${l1.no}, columns ${from + 1}–${to} (${label}): ${JSON.stringify(text)} is not a positive temperature`);
    return v;
  };
  const tLow = temp(45, 55, 'T_low');
  const tHigh = temp(55, 65, 'T_high');
  const tMid = temp(65, 73, 'T_mid', header?.tMid);
  if (!(tLow < tMid && tMid < tHigh)) throw new RecordProblem(`line ${l1.no}: temperatures ${tLow} / ${tMid} / ${tHigh} K; expected T_low < T_mid < T_high`);
  const c2 = coefficientFields(l2, 5, ['high a1', 'high a2', 'high a3', 'high a4', 'high a5']);
  const c3 = coefficientFields(l3, 5, ['high a6', 'high a7', 'low a1', 'low a2', 'low a3']);
  const c4 = coefficientFields(l4, 4, ['low a4', 'low a5', 'low a6', 'low a7']);
  const high = [...c2, c3[0], c3[1]] as Coefficients7;
  const low = [c3[2], c3[3], c3[4], ...c4] as Coefficients7;
  return { name, identifier, elements, phase, polynomial: { tLow, tMid, tHigh, low, high } };
}

export function parseNasa7File(text: string, fileName: string): Nasa7ParseResult {
  const all = text.split(/\r\n|\n|\r/).map((t, i) => ({ no: i + 1, text: t.replace(/\s+$/, '') }));
  const content = all.filter((l) => l.text.trim() !== '' && !/^\s*!/.test(l.text));
  const records: Nasa7Record[] = [];
  const errors: Nasa7ParseError[] = [];
  let header: Nasa7ParseResult['header'];
  let i = 0;
  if (content[0] && /^THERMO\b/i.test(content[0].text.trim())) {
    i = 1;
    const h = content[1] ? parseHeaderLine(content[1].text) : undefined;
    if (h) {
      header = h;
      i = 2;
    }
  }
  // A record whose name starts with END (line 1 carries '1' in column 80) is not the terminator.
  const isEnd = (l: SourceLine) => /^END\b/i.test(l.text.trim()) && column80(l.text) !== '1';
  while (i < content.length && !isEnd(content[i]!)) {
    const group: SourceLine[] = [];
    let j = i;
    while (group.length < 4 && j < content.length && !isEnd(content[j]!)) {
      // A '1' in column 80 after the first line starts a new record: the current one is short.
      if (group.length > 0 && column80(content[j]!.text) === '1') break;
      group.push(content[j]!);
      j++;
    }
    const first = group[0]!;
    if (group.length < 4) {
      errors.push({ file: fileName, line: first.no, message: `record starting on line ${first.no} has ${group.length} line(s); expected 4` });
      i = j;
      continue;
    }
    try {
      records.push(parseRecord(group, header));
    } catch (e) {
      if (!(e instanceof RecordProblem)) throw e;
      const name = first.text.slice(0, 18).trim();
      errors.push({ file: fileName, line: first.no, message: `record ${JSON.stringify(name)}: ${e.message}` });
    }
    i = j;
  }
  const result: Nasa7ParseResult = { records, errors };
  if (header) result.header = header;
  return result;
}
