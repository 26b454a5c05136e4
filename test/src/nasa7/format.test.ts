/**
 * The 80-column writer checked column by column against the published layout of the NASA coefficient
 * records (Gordon & McBride 1971, NASA SP-273; McBride, Gordon & Reno 1993, NASA TM-4513): line 1 name
 * 1–18, identifier 19–24, four element symbol(2)/count(3) pairs 25–44, phase 45, T_low 46–55, T_high 56–65,
 * T_mid 66–73, '1' in 80; lines 2–4 E15.8 fields, line number in 80. Coefficients are written by hand for this test.
 */
import { describe, expect, it } from 'vitest';
import { Nasa7FormatError } from '../../../src/nasa7/errors.js';
import { formatE15, formatNasa7File, formatNasa7Record } from '../../../src/nasa7/format.js';
import type { Nasa7Record } from '../../../src/nasa7/types.js';
import { GOLDEN_RECORDS } from '../../fixtures/nasa7/golden-records.js';

/** 1-based inclusive columns, as the published layout counts them. */
const cols = (line: string, from: number, to: number) => line.slice(from - 1, to);

const record: Nasa7Record = GOLDEN_RECORDS[1]!; // NO+, three elements incl. the electron

describe('E15.8', () => {
  it.each([
    [3.1428571, ' 3.14285710E+00'],
    [-1.23456789e-3, '-1.23456789E-03'],
    [0, ' 0.00000000E+00'],
    [-0, ' 0.00000000E+00'],
    [9.9999999996, ' 1.00000000E+01'], // mantissa carry into the exponent
    [-117901.234, '-1.17901234E+05'],
    [1e-99, ' 1.00000000E-99'],
    [3e-100, ' 0.00000000E+00'], // underflow → zero
    [-9.87654321e99, '-9.87654321E+99'],
  ])('%s → %s', (x, want) => {
    expect(formatE15(x)).toBe(want);
    expect(formatE15(x)).toHaveLength(15);
  });

  it('3-digit exponents and non-finite values are errors', () => {
    expect(() => formatE15(1e100, 'X', 'high.a1')).toThrow(/high\.a1: 1e\+100 needs a 3-digit exponent/);
    expect(() => formatE15(Number.NaN)).toThrow(Nasa7FormatError);
    expect(() => formatE15(Infinity)).toThrow(Nasa7FormatError);
  });
});

describe('record layout, column by column', () => {
  const lines = formatNasa7Record(record);
  it('four lines of exactly 80 columns, numbered 1–4 in column 80', () => {
    expect(lines).toHaveLength(4);
    lines.forEach((l, i) => {
      expect(l).toHaveLength(80);
      expect(cols(l, 80, 80)).toBe(String(i + 1));
    });
  });

  it('line 1 fields', () => {
    const l = lines[0]!;
    expect(cols(l, 1, 18)).toBe('NO+'.padEnd(18));
    expect(cols(l, 19, 24)).toBe('QF0001');
    expect(cols(l, 25, 26)).toBe('N ');
    expect(cols(l, 27, 29)).toBe('  1');
    expect(cols(l, 30, 31)).toBe('O ');
    expect(cols(l, 32, 34)).toBe('  1');
    expect(cols(l, 35, 36)).toBe('E ');
    expect(cols(l, 37, 39)).toBe(' -1'); // electron, negative for a cation
    expect(cols(l, 40, 44)).toBe('     '); // unused fourth slot
    expect(cols(l, 45, 45)).toBe('G');
    expect(cols(l, 46, 55)).toBe('   298.150');
    expect(cols(l, 56, 65)).toBe('  6000.000');
    expect(cols(l, 66, 73)).toBe('1000.000');
    expect(cols(l, 74, 79)).toBe('      ');
  });

  it('lines 2–4: high a1..a5 | high a6, a7, low a1..a3 | low a4..a7, 15 columns each', () => {
    const { high, low } = record.polynomial;
    const fields = (l: string, n: number) => Array.from({ length: n }, (_, i) => cols(l, 15 * i + 1, 15 * i + 15));
    expect(fields(lines[1]!, 5)).toEqual(high.slice(0, 5).map((x) => formatE15(x)));
    expect(fields(lines[2]!, 5)).toEqual([high[5], high[6], low[0], low[1], low[2]].map((x) => formatE15(x)));
    expect(fields(lines[3]!, 4)).toEqual(low.slice(3, 7).map((x) => formatE15(x)));
    expect(cols(lines[1]!, 76, 79)).toBe('    ');
    expect(cols(lines[3]!, 61, 79)).toBe(' '.repeat(19));
    // A sample field in full: sign or blank, d.dddddddd, E, exponent sign, two digits.
    expect(cols(lines[1]!, 1, 15)).toBe(' 2.86428571E+00');
    expect(cols(lines[1]!, 31, 45)).toBe('-6.42857143E-07');
  });

  it('file: THERMO, default ranges line, records, END, "\\n" endings, deterministic', () => {
    const text = formatNasa7File([record], { tLow: 200, tMid: 1000, tHigh: 6000 });
    const ls = text.split('\n');
    expect(ls[0]).toBe('THERMO');
    expect(ls[1]).toBe('   200.000  1000.000  6000.000');
    expect(ls.slice(2, 6)).toEqual(lines);
    expect(ls[6]).toBe('END');
    expect(ls[7]).toBe('');
    expect(text).not.toMatch(/\r/);
    expect(formatNasa7File([record], { tLow: 200, tMid: 1000, tHigh: 6000 })).toBe(text);
  });
});

describe('what the layout cannot hold is an error, never a silent cut', () => {
  const err = (r: Partial<Nasa7Record>) => () => formatNasa7Record({ ...record, ...r });
  it('a fifth element', () => {
    expect(err({ elements: [['C', 1], ['H', 4], ['N', 1], ['O', 1], ['S', 1]] })).toThrow(/elements\[4\]: 5 elements \(C, H, N, O, S\); the layout holds at most 4/);
  });
  it('a name longer than 18 characters, a blank in the name, an empty name', () => {
    expect(err({ name: 'CH3CH2CH2CH2CH2OOH1' })).toThrow(/name: "CH3CH2CH2CH2CH2OOH1": expected 1–18 printable ASCII characters without blanks \(got 19\)/);
    expect(err({ name: 'N2 gas' })).toThrow(Nasa7FormatError);
    expect(err({ name: '' })).toThrow(Nasa7FormatError);
    expect(err({ name: '!X' })).toThrow(/leading '!'/);
  });
  it('an identifier longer than 6, a count that does not fit 3 columns, a bad symbol, zero or real counts', () => {
    expect(err({ identifier: '2026-12' })).toThrow(/identifier: "2026-12": expected at most 6/);
    expect(err({ elements: [['H', 1000]] })).toThrow(/count of H is 1000; 3 columns hold -99\.\.999/);
    expect(err({ elements: [['E', -100]] })).toThrow(/count of E is -100/);
    expect(err({ elements: [['Xyz', 1]] })).toThrow(/symbol "Xyz"/);
    expect(err({ elements: [['H', 0]] })).toThrow(/non-zero integer/);
    expect(err({ elements: [['H', 1.5]] })).toThrow(/non-zero integer/);
    expect(err({ elements: [['H', 1], ['H', 2]] })).toThrow(/appears twice/);
  });
  it('temperatures that do not fit F10.3 / F8.3, bad ordering, duplicate names in a file', () => {
    expect(err({ polynomial: { ...record.polynomial, tMid: 10000, tHigh: 20000 } })).toThrow(/tMid: 10000\.000 does not fit 8 columns/);
    expect(err({ polynomial: { ...record.polynomial, tMid: 100 } })).toThrow(/expected tLow < tMid < tHigh/);
    expect(() => formatNasa7File([record, record], { tLow: 200, tMid: 1000, tHigh: 6000 })).toThrow(/same name/);
  });
});
