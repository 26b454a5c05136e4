/**
 * Reader of the four-line 80-column NASA layout (Gordon & McBride 1971, NASA SP-273; McBride, Gordon &
 * Reno 1993, NASA TM-4513). Inputs are hand-written in that layout with coefficients written by hand for this test, in the
 * variants such files commonly show (common practice): THERMO ALL header, '!' comments, blank lines,
 * Fortran D exponents, no column-80 line numbers, real-valued element counts.
 */
import { describe, expect, it } from 'vitest';
import { formatNasa7File } from '../../../src/nasa7/format.js';
import { parseFortranNumber, parseNasa7File } from '../../../src/nasa7/parse.js';
import { GOLDEN_RECORDS } from '../../fixtures/nasa7/golden-records.js';

const rec = (lines: string[]) => lines.join('\n');

// A record in the published layout; coefficients written by hand for this test.
const L1 = 'AB2               TEST  A   1B   2          G   300.000  5000.000 1000.00      1';
const L2 = ' 1.00000000E+00 2.00000000E-03-3.00000000E-07 4.00000000E-11-5.00000000E-15    2';
const L3 = '-6.00000000E+03 7.00000000E+00 1.10000000E+00 2.20000000E-03-3.30000000E-06    3';
const L4 = ' 4.40000000E-09-5.50000000E-12-6.60000000E+03 7.70000000E+00                   4';

describe('parseFortranNumber', () => {
  it.each([
    [' 1.5D+03', 1500],
    ['-2.5d-2', -0.025],
    ['3.', 3],
    ['.5E1', 5],
    ['  7 ', 7],
  ])('%j → %d', (t, v) => expect(parseFortranNumber(t)).toBe(v));
  it.each(['', 'abc', '1.0E', '1.0E+0x', '--1'])('%j is not a number', (t) => expect(parseFortranNumber(t)).toBeUndefined());
});

describe('parseNasa7File', () => {
  it('reads a record field by field', () => {
    const { records, errors, header } = parseNasa7File(rec([L1, L2, L3, L4]), 'x.dat');
    expect(errors).toEqual([]);
    expect(header).toBeUndefined();
    expect(records).toHaveLength(1);
    const r = records[0]!;
    expect(r.name).toBe('AB2');
    expect(r.identifier).toBe('TEST');
    expect(r.elements).toEqual([['A', 1], ['B', 2]]);
    expect(r.phase).toBe('G');
    expect(r.polynomial.tLow).toBe(300);
    expect(r.polynomial.tHigh).toBe(5000);
    expect(r.polynomial.tMid).toBe(1000);
    expect(r.polynomial.high).toEqual([1, 2e-3, -3e-7, 4e-11, -5e-15, -6e3, 7]);
    expect(r.polynomial.low).toEqual([1.1, 2.2e-3, -3.3e-6, 4.4e-9, -5.5e-12, -6.6e3, 7.7]);
  });

  it('tolerates THERMO ALL, comments, blank lines, D exponents, missing line numbers, END and trailing text', () => {
    const noNumbers = [L1, L2, L3, L4].map((l) => l.slice(0, 79).replace(/E/g, 'D'));
    const text = rec([
      '! a comment line',
      'THERMO ALL',
      '   300.000  1000.000  5000.000',
      '',
      ...noNumbers,
      '   ! indented comment',
      L1.replace('AB2 ', 'AB3 '),
      L2,
      '',
      L3,
      L4,
      'END',
      'this is ignored',
    ]);
    const { records, errors, header } = parseNasa7File(text, 'y.dat');
    expect(errors).toEqual([]);
    expect(header).toEqual({ tLow: 300, tMid: 1000, tHigh: 5000 });
    expect(records.map((r) => r.name)).toEqual(['AB2', 'AB3']);
    expect(records[0]!.polynomial.low[0]).toBe(1.1);
  });

  it('fills a blank T_mid from the header and reads real counts and a fifth element in columns 74–78', () => {
    const l1 = 'ABCDE'.padEnd(18) + 'TEST  ' + 'A  2.B  1.C  1.D  1.' + 'G' + '   300.000' + '  5000.000' + '        ' + 'E   1' + ' 1';
    expect(l1).toHaveLength(80);
    const { records, errors } = parseNasa7File(rec(['THERMO', '   300.000  1500.000  5000.000', l1, L2, L3, L4]), 'z.dat');
    expect(errors).toEqual([]);
    expect(records[0]!.polynomial.tMid).toBe(1500);
    expect(records[0]!.elements).toEqual([['A', 2], ['B', 1], ['C', 1], ['D', 1], ['E', 1]]);
  });

  it('reports malformed records with line numbers and continues with the next', () => {
    const badNumber = L3.slice(0, 15) + ' 7.0000000XE+00' + L3.slice(30);
    const badColumn = L4.slice(0, 79) + '9';
    const text = rec([
      'THERMO',
      '   300.000  1000.000  5000.000',
      L1, L2, badNumber, L4, // record at line 3, bad field on line 5
      L1, L2, // truncated record at line 7: next line starts a new record
      L1, L2, L3, badColumn, // record at line 9, wrong line number on line 12
      L1.replace('AB2', 'OK1'), L2, L3, L4, // fine, line 13
      'END',
    ]);
    const { records, errors } = parseNasa7File(text, 'bad.dat');
    expect(records.map((r) => r.name)).toEqual(['OK1']);
    expect(errors.map((e) => e.line)).toEqual([3, 7, 9]);
    expect(errors[0]!.message).toMatch(/line 5, columns 16–30 \(high a7\): " 7.0000000XE\+00" is not a number/);
    expect(errors[1]!.message).toMatch(/has 2 line\(s\); expected 4/);
    expect(errors[2]!.message).toMatch(/line 12: column 80 holds '9', expected '4'/);
    expect(errors.every((e) => e.file === 'bad.dat')).toBe(true);
  });

  it('reports bad temperatures and element fields', () => {
    const badT = L1.slice(0, 45) + '   abc    ' + L1.slice(55);
    const badEl = L1.slice(0, 24) + 'A   x' + L1.slice(29);
    const { errors } = parseNasa7File(rec([badT, L2, L3, L4, badEl, L2, L3, L4]), 't.dat');
    expect(errors.map((e) => e.line)).toEqual([1, 5]);
    expect(errors[0]!.message).toMatch(/columns 46–55 \(T_low\)/);
    expect(errors[1]!.message).toMatch(/columns 25–29 \(element 1\)/);
  });

  it('reads what the writer writes (golden records)', () => {
    const { records, errors } = parseNasa7File(formatNasa7File(GOLDEN_RECORDS, { tLow: 200, tMid: 1000, tHigh: 6000 }), 'w.dat');
    expect(errors).toEqual([]);
    expect(records).toHaveLength(GOLDEN_RECORDS.length);
    expect(records[1]!.elements).toEqual([['N', 1], ['O', 1], ['E', -1]]);
  });
});

describe('names that look like framing', () => {
  it('a record named END-X (with its column-80 number) is a record, not the terminator', () => {
    const { records, errors } = parseNasa7File(rec([L1.replace('AB2   ', 'END-X '), L2, L3, L4, 'END']), 'e.dat');
    expect(errors).toEqual([]);
    expect(records.map((r) => r.name)).toEqual(['END-X']);
  });
});
