/**
 * `qforge diff` and the file reading shared by diff and compare: like-with-like comparison of a build
 * folder against an 80-column file, no negative zero in any table, and clean errors (never a stack trace)
 * for missing, unreadable, folder, device and oversized inputs. The polynomials used for the zero test
 * are invented (an argon-like constant Cp of 5/2 R, the kinetic-theory value, common practice).
 */
import { chmod, copyFile, mkdir, truncate, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { compareWithReferences, renderCompareText } from '../../../pipeline/commands/compare.js';
import { diffSets, renderDiffText } from '../../../pipeline/commands/diff.js';
import { inputReadError, MAX_INPUT_BYTES, ReadBuildError, ReadBuildUsageError, readInputFile, type PolynomialSet } from '../../../pipeline/storage/read-build.js';
import type { Nasa7Polynomial } from '../../../src/nasa7/types.js';
import { runCli, sharedBuiltWorkspace } from '../helpers.js';

const workspace = sharedBuiltWorkspace();

function set(label: string, polys: Record<string, Nasa7Polynomial>, format: PolynomialSet['format'] = 'thermo.json'): PolynomialSet {
  return {
    label,
    origin: label,
    format,
    fromFolder: false,
    species: new Map(Object.entries(polys).map(([name, polynomial]) => [name, { name, polynomial }])),
  };
}

// Cp/R = 2.5 (monatomic ideal gas, common practice); a7 chosen so S is ordinary, a6 so H298 ≈ 0.
const monatomic = (a6: number, a7 = 4.37967): Nasa7Polynomial => ({
  tLow: 200,
  tMid: 1000,
  tHigh: 6000,
  low: [2.5, 0, 0, 0, 0, a6, a7],
  high: [2.5, 0, 0, 0, 0, a6, a7],
});

describe('diff of a build folder against an 80-column file', () => {
  it('build vs build/nasa7.txt (either order) reports no changed species', async () => {
    for (const args of [['out', 'out/nasa7.txt'], ['out/nasa7.txt', 'out']]) {
      const r = await runCli(['diff', ...args, '--json'], workspace().root);
      expect(r.code, r.stderr).toBe(0);
      const report = JSON.parse(r.stdout);
      expect(report.changed).toEqual([]);
      expect(report.unchanged).toEqual(['Ar', 'CO', 'H2O', 'N2', 'O']);
      expect(report.notes.join('\n')).toMatch(/out is compared through out\/nasa7\.txt/);
    }
  });

  it('a thermo.json given as a file against nasa7.txt is compared within the 9-digit rounding', async () => {
    const r = await runCli(['diff', 'out/thermo.json', 'out/nasa7.txt'], workspace().root);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toMatch(/0 changed, 5 unchanged/);
    expect(r.stdout).toMatch(/note: out\/thermo\.json \(full precision\) against out\/nasa7\.txt \(80-column records, 9 digits\)/);
  });

  it('a folder without nasa7.txt against an 80-column file is compared within the rounding as well', async () => {
    const ws = workspace();
    const jsonOnly = path.join(ws.root, 'json-only');
    await mkdir(jsonOnly, { recursive: true });
    await copyFile(path.join(ws.out, 'thermo.json'), path.join(jsonOnly, 'thermo.json'));
    const r = await runCli(['diff', 'json-only', 'out/nasa7.txt', '--json'], ws.root);
    expect(r.code, r.stderr).toBe(0);
    const report = JSON.parse(r.stdout);
    expect(report.changed).toEqual([]);
    expect(report.notes.join('\n')).toMatch(/full precision/);
  });
});

describe('no negative zero in diff and compare tables', () => {
  it('diff prints 0.0000, never -0.0000, for a value that rounds to zero', () => {
    // H(298.15) of these polynomials is about -1e-6 kJ/mol: rounds to zero at 4 decimals.
    const a = set('old', { X: monatomic(-745.375) });
    const b = set('new', { X: monatomic(-745.3751) });
    const text = renderDiffText(diffSets(a, b));
    expect(text).toMatch(/at 298\.15 K: Cp 20\.7862 -> 20\.7862, H 0\.0000 -> 0\.0000/);
    expect(text).not.toMatch(/-0\.0+(?!\d*[1-9])/);
  });

  it('compare prints +0.0000 for a deviation that rounds to zero', () => {
    const build = set('b', { X: monatomic(-745.375) });
    const ref = { file: 'ref.csv', species: new Map([['X', [{ T: 298.15, cp: 20.786199999, h: -0.0000001 }]]]) };
    const report = compareWithReferences(build, [ref], { cp: 0.1, s: 0.1, h: 0.1 });
    const text = renderCompareText(report);
    expect(text).not.toMatch(/-0\.0000(?!\d)/);
    expect(text).toMatch(/H-H298\s+0\.0000\s+0\.0000\s+\+0\.0000/);
  });
});

describe('reading diff/compare inputs: clean errors and exit codes', () => {
  it('a folder given as --reference says "is a folder" (exit 2)', async () => {
    const r = await runCli(['compare', 'out', '--reference', 'db'], workspace().root);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/reference db is a folder; expected a file/);
    expect(r.stderr).not.toMatch(/\n\s+at /);
  });

  it('a device is refused as not a regular file (exit 2)', async () => {
    const r = await runCli(['compare', 'out', '--reference', '/dev/null'], workspace().root);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/reference \/dev\/null is not a regular file/);
  });

  it.skipIf(process.getuid?.() === 0)('an unreadable file (EACCES) is a clean error (exit 2), for diff and compare', async () => {
    const ws = workspace();
    const locked = path.join(ws.root, 'locked.csv');
    await writeFile(locked, 'T [K],Cp [J/(mol K)]\n1000,32.697\n');
    await chmod(locked, 0o000);
    try {
      const c = await runCli(['compare', 'out', '--reference', 'locked.csv'], ws.root);
      expect(c.code).toBe(2);
      expect(c.stderr).toMatch(/reference locked\.csv: permission denied/);
      const d = await runCli(['diff', 'out', 'locked.csv'], ws.root);
      expect(d.code).toBe(2);
      expect(d.stderr).toMatch(/locked\.csv: permission denied/);
    } finally {
      await chmod(locked, 0o644);
    }
  });

  it('maps EACCES/EPERM and ENOENT to usage errors (exit 2), other codes (EIO) to input failures (exit 1)', () => {
    const errno = (code: string) => Object.assign(new Error(code), { code });
    const denied = inputReadError(errno('EACCES'), 'reference', 'x.csv');
    expect(denied).toBeInstanceOf(ReadBuildUsageError);
    expect(denied.message).toBe('reference x.csv: permission denied (EACCES)');
    expect(inputReadError(errno('ENOENT'), 'reference', 'x.csv')).toBeInstanceOf(ReadBuildUsageError);
    const io = inputReadError(errno('EIO'), 'build file', 'y');
    expect(io).toBeInstanceOf(ReadBuildError);
    expect(io.message).toBe('build file y: cannot read it (EIO)');
  });

  it.runIf(process.platform === 'linux')('a file the system fails to read (/proc/self/mem, EIO) is a clean error (exit 1)', async () => {
    const r = await runCli(['diff', 'out', '/proc/self/mem'], workspace().root);
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/\/proc\/self\/mem: cannot read it \(EIO\)/);
    expect(r.stderr).not.toMatch(/internal error|\n\s+at /);
  });

  it('a file over the 64 MiB cap is refused before it is read (exit 1)', async () => {
    const ws = workspace();
    const huge = path.join(ws.root, 'huge.txt');
    await writeFile(huge, '');
    await truncate(huge, MAX_INPUT_BYTES + 1); // sparse: no disk space used
    const d = await runCli(['diff', 'out', 'huge.txt'], ws.root);
    expect(d.code).toBe(1);
    expect(d.stderr).toMatch(/build file huge\.txt is too large \(64\.0 MiB\); the limit is 64 MiB/);
    const c = await runCli(['compare', 'out', '--reference', 'huge.txt'], ws.root);
    expect(c.code).toBe(1);
    expect(c.stderr).toMatch(/reference huge\.txt is too large/);
  });

  it('stops reading at the cap even when the size on disk says less (/proc-like files)', async () => {
    const file = path.join(workspace().root, 'ten.txt');
    await writeFile(file, '0123456789');
    await expect(readInputFile(file, 'ten.txt', 'reference', 4)).rejects.toThrow(/ten\.txt is too large/);
    await expect(readInputFile(file, 'ten.txt', 'reference', 10)).resolves.toBe('0123456789');
  });

  it('keeps exit 2 for a missing path and 1 for malformed content', async () => {
    const ws = workspace();
    const missing = await runCli(['diff', 'out', 'nope.txt'], ws.root);
    expect(missing.code).toBe(2);
    expect(missing.stderr).toMatch(/nope\.txt: no such build folder or file/);
    await writeFile(path.join(ws.root, 'garbage.txt'), 'THERMO\nthis is not a record\n');
    const bad = await runCli(['diff', 'out', 'garbage.txt'], ws.root);
    expect(bad.code).toBe(1);
    expect(bad.stderr).toMatch(/garbage\.txt:\d+:/);
  });
});
