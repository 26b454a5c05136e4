/**
 * tables/<name>.csv is joined directly when no cell needs quoting (stages/emit.ts renderTable); the bytes
 * must be those fast-csv (an npm CSV library) writes for the same rows. Checked on the tables of a build of
 * the fixture database (every row of every species) and on rows written by hand for this test that do need
 * quoting.
 */
import { readdir, readFile } from 'node:fs/promises';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { csvText, fixed } from '../../../pipeline/stages/emit.js';
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
});
