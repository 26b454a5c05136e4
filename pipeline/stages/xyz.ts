/**
 * The XYZ geometry format, parsed from text (load.ts reads the file): a first line with the atom count, a
 * comment line, then one line `symbol x y z` per atom (coordinates in angstrom, whitespace-separated).
 * Pure: problems come back as located diagnostics (file, line, column), never as exceptions.
 */
import type { GeometryRow } from '../../src/geometry/index.js';
import type { Diagnostic } from '../core/diagnostics.js';

export interface ParsedXyz {
  rows: GeometryRow[];
  /** 1-based line of each row. */
  lines: number[];
  diagnostics: Diagnostic[];
}

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

export function parseXyz(text: string, file: string): ParsedXyz {
  const out: ParsedXyz = { rows: [], lines: [], diagnostics: [] };
  const lines = text.split(/\r?\n/);
  const fail = (line: number, code: string, message: string, expected: string, value?: string) => {
    const d: Diagnostic = { severity: 'error', code, file, line, column: 1, path: '', message, expected };
    if (value !== undefined) d.value = value;
    out.diagnostics.push(d);
  };
  const countText = (lines[0] ?? '').trim();
  if (!/^\d+$/.test(countText) || Number(countText) < 1) {
    fail(1, 'xyz-bad-count', 'the first line of an XYZ file must hold the number of atoms', 'a whole number >= 1', countText);
    return out;
  }
  const count = Number(countText);
  for (let k = 0; k < count; k++) {
    const lineNo = k + 3;
    const line = lines[k + 2];
    if (line === undefined || line.trim() === '') {
      fail(lineNo, 'xyz-atom-count', `the file ends after ${k} of the ${count} atoms its first line announces`, `${count} atom lines after the comment line`);
      return out;
    }
    const fields = line.trim().split(/\s+/);
    if (fields.length !== 4 || !fields.slice(1).every((x) => NUMBER.test(x))) {
      fail(lineNo, 'xyz-bad-line', `atom line ${k + 1} is not 'symbol x y z'`, "an element or isotope symbol and three coordinates in angstrom, e.g. 'C 0.0 0.0 0.7676'", line.trim());
      continue;
    }
    out.rows.push([fields[0]!, Number(fields[1]), Number(fields[2]), Number(fields[3])]);
    out.lines.push(lineNo);
  }
  const extra = lines.slice(count + 2).findIndex((l) => l.trim() !== '');
  if (extra >= 0) {
    fail(count + 3 + extra, 'xyz-atom-count', `more atom lines than the ${count} the first line announces`, `exactly ${count} atom lines (one geometry per file)`, lines[count + 2 + extra]!.trim());
  }
  return out;
}
