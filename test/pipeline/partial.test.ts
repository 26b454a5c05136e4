/**
 * `build --keep-going` with a failing species writes a database that says it is partial: thermo.json's
 * `partial` member and '!' comment lines at the top of nasa7.txt name the species left out; the 80-column
 * reader still reads the file. A complete build carries neither. The failing input is invented for the test.
 */
import { readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseNasa7File } from '../../src/nasa7/parse.js';
import { readJson, runCli, tempWorkspace } from './helpers.js';

const BAD = 'name: XBAD\ncomposition: {He: 1}\nenthalpy_of_formation: 1e308\nsources: ["invented for a test"]\nstructure: atom\n';

describe('partial database mark', () => {
  it('--keep-going: thermo.json and nasa7.txt name the species left out; the reader tolerates the lines', async () => {
    const ws = await tempWorkspace();
    try {
      await writeFile(path.join(ws.db, 'bad.yaml'), BAD);
      const r = await runCli(['build', 'db', '--out', 'out', '--keep-going', '--quiet'], ws.root);
      expect(r.code).toBe(1);
      const db = await readJson(path.join(ws.out, 'thermo.json'));
      expect(db.partial).toEqual({ partial: true, left_out: ['XBAD'], files_with_errors: ['db/bad.yaml'] });
      const text = await readFile(path.join(ws.out, 'nasa7.txt'), 'utf8');
      expect(text.split('\n')[0]).toBe('! PARTIAL DATABASE (build --keep-going): 1 species left out: XBAD; files with');
      const parsed = parseNasa7File(text, 'nasa7.txt');
      expect(parsed.records.map((x) => x.name).sort()).toEqual(['Ar', 'CO', 'H2O', 'N2', 'O']);
      const summary = await readJson(path.join(ws.out, 'summary.json'));
      expect(summary.status).toBe('partial');
    } finally {
      await ws.cleanup();
    }
  });

  it('a complete build carries no mark', async () => {
    const ws = await tempWorkspace();
    try {
      expect((await runCli(['build', 'db', '--out', 'out', '--quiet'], ws.root)).code).toBe(0);
      expect((await readJson(path.join(ws.out, 'thermo.json'))).partial).toBeUndefined();
      expect(await readFile(path.join(ws.out, 'nasa7.txt'), 'utf8')).not.toMatch(/PARTIAL/);
    } finally {
      await ws.cleanup();
    }
  });
});
