/**
 * tables/<name>.csv is joined directly when no cell needs quoting (stages/emit.ts renderTable); the bytes
 * must be those fast-csv (an npm CSV library) writes for the same rows. Checked on the tables of a build of
 * the fixture database (every row of every species) and on rows written by hand for this test that do need
 * quoting. The fast fixed decimals are checked against Number.prototype.toFixed (ECMAScript, the engine's own
 * conversion) on edge values written by hand and on values from a seeded generator in this file; the record
 * indentation against the regular-expression form on records written by hand. No values from elsewhere.
 */
import { readdir, readFile } from 'node:fs/promises';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { csvText, fittedProperties, fixed, fixedByToFixed, renderTable, TABLE_HEADERS } from '../../../pipeline/stages/emit.js';
import { indentedRecordText } from '../../../pipeline/stages/emit-stream.js';
import { sharedBuiltWorkspace } from '../helpers.js';

describe('table CSV', () => {
  const ws = sharedBuiltWorkspace();

  it('every table of a build is what fast-csv writes for its cells', async () => {
    const dir = path.join(ws().out, 'tables');
    const files = (await readdir(dir)).filter((f) => f.endsWith('.csv'));
    expect(files.length).toBeGreaterThan(3);
    for (const f of files) {
      const text = await readFile(path.join(dir, f), 'utf8');
      const rows = text.slice(0, -1).split('\n').map((line) => line.split(','));
      expect(await csvText(rows)).toBe(text);
    }
  });

  it('cells that need quoting are quoted (fast-csv path)', async () => {
    expect(await csvText([['a,b', 'say "x"'], ['1', '2']])).toBe('"a,b","say ""x"""\n1,2\n');
  });

  it('fixed decimals never print a negative zero', () => {
    expect(fixed(-0.00001, 4)).toBe('0.0000');
    expect(fixed(-0, 2)).toBe('0.00');
    expect(fixed(-0.00005, 4)).toBe('-0.0001');
    expect(fixed(-1.5, 0)).toBe('-2');
    expect(fixed(2.5e-7, 5)).toBe('0.00000');
  });

  // The reference is Number.prototype.toFixed itself (ECMA-262, as Node implements it) with the negative-zero
  // rule: `fixedByToFixed`, the formatter before the fast path. Values generated here (seeded LCG, written
  // for this test) plus hand-picked edge cases.
  it('the fast path gives exactly the text of toFixed, on millions of values and the edge cases', () => {
    const edge = [
      0, -0, 5e-324, -5e-324, 2.2250738585072014e-308, 1e-300, -1e-300, 1e-5, -1e-5, 4.9999e-5, -4.9999e-5,
      0.00005, -0.00005, 0.000005, -0.000005, 0.000015, 0.000025, -0.000025, 1.00005, 1.000005, 2.5, -2.5,
      0.5, -0.5, 1.5, 123.45675, 123.456785, -123.45675, 8.345, 1.0005, 1.00015, 1e15, -1e15, 1e20, 1e21,
      -1e21, 1e300, -1e300, 214748.3647, 214748.3648, -214748.3648, 21474.83647, 21474.83648, 21474.836475,
      2147483647, 2147483648, 4294967296.5, 9007199254740991, Number.MAX_VALUE, -Number.MAX_VALUE,
      Infinity, -Infinity, NaN, 0.1 + 0.2, 1 / 3, -2 / 3, 6000, 298.15, -241.826, 0.99999, 0.999995, -0.999995,
    ];
    for (const x of edge) for (let d = 0; d <= 12; d++) expect(fixed(x, d), `${x} to ${d}`).toBe(fixedByToFixed(x, d));
    let seed = 12345;
    const next = () => ((seed = (Math.imul(seed, 1103515245) + 12345) >>> 0) / 4294967296);
    let checked = 0;
    for (let i = 0; i < 400_000; i++) {
      const u = next();
      const scale = 10 ** Math.floor(next() * 24 - 12);
      const x = (u - 0.5) * scale;
      // Near-ties: a multiple of 10^-d nudged by half a unit and a few ulps.
      const d = 1 + (i % 9);
      const tie = (Math.round(x * 10 ** d) + 0.5) / 10 ** d;
      for (const v of [x, tie, tie * (1 + 2 ** -52), tie * (1 - 2 ** -52)]) {
        if (fixed(v, 4) !== fixedByToFixed(v, 4) || fixed(v, 5) !== fixedByToFixed(v, 5) || fixed(v, d) !== fixedByToFixed(v, d)) {
          expect([v, fixed(v, 4), fixed(v, 5), fixed(v, d)]).toEqual([v, fixedByToFixed(v, 4), fixedByToFixed(v, 5), fixedByToFixed(v, d)]);
        }
        checked += 3;
      }
    }
    expect(checked).toBe(4_800_000);
  });

  it('a species record indented for the species list: the bytes of the regular-expression form', () => {
    const reg = (r: object) => JSON.stringify(r, null, 2).replace(/^/gm, '    ');
    const records: object[] = [
      { name: 'CH4', list: [1, -0, 2.5e-300, { a: [] }], empty: {}, nested: { x: [[1], [2, { y: 'z' }]] } },
      {},
      { name: 'text with \n, "quotes" and \u00e9' },
    ];
    for (const r of records) expect(indentedRecordText(r)).toBe(reg(r));
  });

  it('a record with U+2028 / U+2029 in a string reads back as the same value (the regular-expression form indented inside the string)', () => {
    // Written for this test: JSON.stringify leaves both separators raw, and a multiline ^ matches after them.
    const record = { name: 'line\u2028separator', note: 'para\u2029graph', list: ['a\u2028b'] };
    const text = indentedRecordText(record);
    expect(JSON.parse(text)).toEqual(record);
    expect(text.split('\n').every((l) => l.startsWith('    '))).toBe(true);
    expect(JSON.parse(`[${text}]`)).toEqual([record]);
  });

  // The reference: the table as the emit stage wrote it before the byte writer, cell strings from
  // `fixedByToFixed` (toFixed) and `fittedProperties`, joined with commas. Polynomials and points are
  // generated here (seeded, written for this test): no physical meaning, only numbers of every size.
  it('renderTable writes exactly the cells of toFixed, on generated tables with edge values', () => {
    let seed = 99;
    const next = () => ((seed = (Math.imul(seed, 1103515245) + 12345) >>> 0) / 4294967296);
    const edge = [0, -0, 5e-324, -1e-7, 0.00005, -0.00005, 0.000005, -0.000005, 1e21, -1e21, 1e300, NaN, Infinity, -Infinity, 21474.83648, -214748.3648];
    for (let k = 0; k < 300; k++) {
      const coeffs = () => [3 + next(), next() * 1e-3, next() * 1e-6, next() * 1e-9, next() * 1e-13, (next() - 0.5) * 1e5, (next() - 0.5) * 50] as [number, number, number, number, number, number, number];
      const poly = { tLow: 200, tMid: 1000, tHigh: 6000, low: coeffs(), high: coeffs() };
      const table = Array.from({ length: 1 + (k % 70) }, (_, i) => {
        const pick = () => (next() < 0.1 ? edge[Math.floor(next() * edge.length)]! : (next() - 0.5) * 10 ** Math.floor(next() * 10 - 3));
        return { T: k % 2 ? 200 + 100 * i : 298.15 + i * 7.5, Cp: pick(), S: pick(), HminusH298: pick(), H: pick(), G: pick(), cpR: 0, hRT: 0, sR: 0 };
      });
      const lines = table.map((c) => {
        const f = fittedProperties(poly, c.T);
        const cell = (x: number, d: number) => fixedByToFixed(x, d);
        return [
          String(c.T),
          cell(c.Cp, 4), cell(f.Cp, 4), cell(f.Cp - c.Cp, 4),
          cell(c.S, 4), cell(f.S, 4), cell(f.S - c.S, 4),
          cell(c.HminusH298, 5), cell(f.HminusH298, 5), cell(f.HminusH298 - c.HminusH298, 5),
          cell(c.H, 5), cell(f.H, 5), cell(f.H - c.H, 5),
          cell(c.G, 5), cell(f.G, 5), cell(f.G - c.G, 5),
        ].join(','); // prettier-ignore
      });
      expect(renderTable({ fit: { polynomial: poly }, table })).toBe(`${[TABLE_HEADERS.join(','), ...lines].join('\n')}\n`);
    }
  });
});
