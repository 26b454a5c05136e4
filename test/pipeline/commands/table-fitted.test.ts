/**
 * `qforge table BUILD --name N2` and `qforge table nasa7.txt --name N2`: the fitted polynomial evaluated
 * in the computed table's columns. The fixture database (test/fixtures/db, hand-written) is built once;
 * its N2 must read the same from thermo.json and from the 80-column records, and agree with the
 * partition-function table within the fit limits of test/fixtures/db/qforge.yaml (dimensionless:
 * Cp/R 0.1, H/RT 0.02, S/R 0.02; for N2, Cp/R < 4.7, the relative_to_cp limits are smaller).
 */
import { describe, expect, it } from 'vitest';
import { GAS_CONSTANT as R } from '../../../src/constants.js';
import { TABLE_CSV_HEADER } from '../../../pipeline/commands/table.js';
import { runCli, sharedBuiltWorkspace } from '../helpers.js';

const workspace = sharedBuiltWorkspace();
const GRID = ['--range', '200:6000:200', '--at', '298.15'];
const rowsOf = (csv: string) =>
  csv
    .trim()
    .split('\n')
    .slice(1)
    .map((l) => l.split(',').map(Number));

describe('qforge table on a build (the fitted polynomial)', () => {
  it('reads the same N2 from the build folder and from its 80-column file, with the computed table header', async () => {
    const fromBuild = await runCli(['table', 'out', '--name', 'N2', ...GRID, '--format', 'csv'], workspace().root);
    expect(fromBuild.code, fromBuild.stderr).toBe(0);
    expect(fromBuild.stdout.split('\n')[0]).toBe(TABLE_CSV_HEADER);
    const fromNasa7 = await runCli(['table', 'out/nasa7.txt', '--name', 'N2', ...GRID, '--format', 'csv'], workspace().root);
    expect(fromNasa7.code, fromNasa7.stderr).toBe(0);
    const a = rowsOf(fromBuild.stdout);
    const b = rowsOf(fromNasa7.stdout);
    expect(a.length).toBe(31);
    // The 80-column records keep 9 significant digits: the same numbers to the printed 0.001, allowing one
    // unit of the last digit where a value sits on a rounding boundary.
    a.forEach((row, i) => row.forEach((x, j) => expect(Math.abs(x - b[i]![j]!)).toBeLessThanOrEqual(0.0011)));
  });

  it('matches the partition-function table within the fit tolerances; H includes ΔfH and G = H - TS', async () => {
    const fitted = rowsOf((await runCli(['table', 'out', '--name', 'N2', ...GRID, '--format', 'csv', '--digits', '6'], workspace().root)).stdout);
    const computed = rowsOf((await runCli(['table', 'db/N2.yaml', ...GRID, '--format', 'csv', '--digits', '6'], workspace().root)).stdout);
    expect(fitted.length).toBe(computed.length);
    fitted.forEach(([T, cp, s, dh, h, g], i) => {
      const [T2, cp2, s2, dh2, h2] = computed[i]!;
      expect(T).toBe(T2);
      const hLimit = (t: number) => (0.02 * R * t) / 1000; // kJ/mol
      expect(Math.abs(cp! - cp2!)).toBeLessThan(0.1 * R);
      expect(Math.abs(s! - s2!)).toBeLessThan(0.02 * R);
      expect(Math.abs(h! - h2!)).toBeLessThan(hLimit(T!));
      // H - H298 carries the error at both ends.
      expect(Math.abs(dh! - dh2!)).toBeLessThan(hLimit(T!) + hLimit(298.15));
      expect(g!).toBeCloseTo(h! - (T! * s!) / 1000, 5);
    });
  });

  it('--digits prints more decimals (default three, unchanged)', async () => {
    const three = await runCli(['table', 'out', '--name', 'N2', '--at', '1000', '--format', 'csv'], workspace().root);
    expect(three.stdout.split('\n')[1]).toMatch(/^1000,\d+\.\d{3},\d+\.\d{3},\d+\.\d{3},-?\d+\.\d{3},-?\d+\.\d{3}$/);
    const six = await runCli(['table', 'out', '--name', 'N2', '--at', '1000', '--format', 'csv', '--digits', '6'], workspace().root);
    expect(six.stdout.split('\n')[1]).toMatch(/^1000,\d+\.\d{6},\d+\.\d{6},\d+\.\d{6},-?\d+\.\d{6},-?\d+\.\d{6}$/);
    const computed = await runCli(['table', 'db/N2.yaml', '--at', '1000', '--format', 'csv', '--digits', '5'], workspace().root);
    expect(computed.stdout.split('\n')[1]).toMatch(/^1000,\d+\.\d{5},/);
    for (const bad of ['-1', '2.5', 'x', '13']) {
      const r = await runCli(['table', 'out', '--name', 'N2', '--digits', bad], workspace().root);
      expect(r.code).toBe(2);
      expect(r.stderr).toMatch(/^qforge: error: --digits/);
    }
  });

  it('text output names the polynomial, its fitted range and the caution', async () => {
    const r = await runCli(['table', 'out', '--name', 'N2'], workspace().root);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toMatch(/^N2: fitted NASA 7-coefficient polynomial from out\/thermo\.json \(200-6000 K, standard pressure 1 bar\).*valid only inside the fitted range/);
  });

  it('--pressure atm is refused for a 1 bar build (a polynomial is not converted)', async () => {
    const r = await runCli(['table', 'out', '--name', 'N2', '--pressure', 'atm'], workspace().root);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/--pressure atm: out\/thermo\.json holds polynomials for standard pressure 1 bar/);
  });

  it('refuses temperatures outside the fitted range (never extrapolates); the default grid stays inside', async () => {
    const r = await runCli(['table', 'out', '--name', 'N2', '--at', '298.15,7000'], workspace().root);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/N2 in out\/thermo\.json is fitted on 200-6000 K; 1 temperature\(s\) outside it \(7000 K\)/);
    expect(r.stdout).toBe('');
    const low = await runCli(['table', 'out/nasa7.txt', '--name', 'N2', '--range', '100:300:100'], workspace().root);
    expect(low.code).toBe(2);
    const def = rowsOf((await runCli(['table', 'out', '--name', 'N2', '--format', 'csv'], workspace().root)).stdout);
    expect(def[0]![0]).toBe(200);
    expect(def.at(-1)![0]).toBe(6000);
  });

  it('a wrong or missing --name is a usage error in the style of the species-file table', async () => {
    const wrong = await runCli(['table', 'out', '--name', 'XX'], workspace().root);
    expect(wrong.code).toBe(2);
    expect(wrong.stderr).toMatch(/^qforge: error: no species named 'XX' in out\/thermo\.json \(it holds: .*N2.*\)\n$/);
    const wrong80 = await runCli(['table', 'out/nasa7.txt', '--name', 'XX'], workspace().root);
    expect(wrong80.code).toBe(2);
    expect(wrong80.stderr).toMatch(/no species named 'XX' in out\/nasa7\.txt/);
    const none = await runCli(['table', 'out'], workspace().root);
    expect(none.code).toBe(2);
    expect(none.stderr).toMatch(/choose one with --name/);
    expect((await runCli(['table', 'missing-build', '--name', 'N2'], workspace().root)).code).toBe(2);
  });
});
