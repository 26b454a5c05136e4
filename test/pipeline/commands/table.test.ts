/**
 * `qforge table`: one species straight from its partition functions. Reference values: NIST-JANAF
 * Thermochemical Tables 4th ed. (Chase 1998), table N-023 (N2) and Ar-001 (Ar), copied from the project's
 * excerpt; tolerances as in issue 2 (0.03 J/(mol K) Cp, 0.02 J/(mol K) S, 0.01 kJ/mol H-H298).
 */
import { describe, expect, it } from 'vitest';
import { TABLE_CSV_HEADER, tableTemperatures } from '../../../pipeline/commands/table.js';
import path from 'node:path';
import { FIXTURE_DB, REPO, runCli } from '../helpers.js';

describe('qforge table', () => {
  it('prints the exact CSV header and JANAF-grade N2 values', async () => {
    const r = await runCli(['table', 'N2.yaml', '--at', '298.15,1000,2000', '--format', 'csv'], FIXTURE_DB);
    expect(r.code, r.stderr).toBe(0);
    const lines = r.stdout.trim().split('\n');
    expect(lines[0]).toBe('T [K],Cp [J/(mol K)],S [J/(mol K)],H-H298 [kJ/mol],H [kJ/mol],G [kJ/mol]');
    expect(lines[0]).toBe(TABLE_CSV_HEADER);
    const rows = lines.slice(1).map((l) => l.split(',').map(Number));
    // NIST-JANAF 4th ed. N-023: [T, Cp, S, H-H298]
    const janaf = [
      [298.15, 29.124, 191.609, 0],
      [1000, 32.697, 228.17, 21.463],
      [2000, 35.971, 252.074, 56.137],
    ];
    rows.forEach((row, i) => {
      const [T, Cp, S, dH] = janaf[i]!;
      expect(row[0]).toBe(T);
      expect(Math.abs(row[1]! - Cp!)).toBeLessThan(0.03);
      expect(Math.abs(row[2]! - S!)).toBeLessThan(0.02);
      expect(Math.abs(row[3]! - dH!)).toBeLessThan(0.01);
    });
  });

  it('text format, --range grid and --name selection', async () => {
    const r = await runCli(['table', 'Ar.yaml', '--range', '200:1000:400', '--name', 'Ar'], FIXTURE_DB);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toMatch(/Ar: ideal gas, standard pressure 1 bar/);
    // Ar-001: Cp = 20.786 J/(mol K) at every temperature (Cp = 5/2 R).
    expect(r.stdout.match(/20\.786/g)?.length).toBe(3);
    expect(tableTemperatures(undefined, '200:1000:400')).toEqual([200, 600, 1000]);
    expect(tableTemperatures('1000,200', '200:200:1')).toEqual([200, 1000]);
  });

  it('usage errors exit 2 (bad options, a wrong --name, a missing FILE), input errors exit 1', async () => {
    expect((await runCli(['table', 'N2.yaml', '--range', '200:100'], FIXTURE_DB)).code).toBe(2);
    expect((await runCli(['table', 'N2.yaml', '--at', '-5'], FIXTURE_DB)).code).toBe(2);
    expect((await runCli(['table', 'N2.yaml', '--format', 'xml'], FIXTURE_DB)).code).toBe(2);
    const wrongName = await runCli(['table', 'N2.yaml', '--name', 'O2'], FIXTURE_DB);
    expect(wrongName.code).toBe(2);
    expect(wrongName.stderr).toMatch(/no species named 'O2'/);
    const multi = path.join(REPO, 'test/fixtures/input/multi.yaml');
    expect((await runCli(['table', multi], FIXTURE_DB)).code).toBe(2);
    expect((await runCli(['table', multi, '--name', 'Xe'], FIXTURE_DB)).code).toBe(2);
    const missing = await runCli(['table', 'nope.yaml'], FIXTURE_DB);
    expect(missing.code).toBe(2);
    expect(missing.stderr).toMatch(/nope\.yaml: no such file/);
    expect((await runCli(['table', 'reference'], FIXTURE_DB)).code).toBe(2);
    // An input error in an existing file stays 1.
    const bad = await runCli(['table', 'qforge.yaml'], FIXTURE_DB);
    expect(bad.code).toBe(1);
  });
});
