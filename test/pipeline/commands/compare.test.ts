/**
 * `qforge compare` against NIST-JANAF Thermochemical Tables, 4th ed. (Chase 1998): tables Ar-001, O-001,
 * N-023 and C-093, copied into test/fixtures/db/reference/janaf-4th-ed.csv with the source named there.
 */
import { writeFile } from 'node:fs/promises';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseReferenceCsv } from '../../../pipeline/commands/compare.js';
import { runCli, sharedBuiltWorkspace } from '../helpers.js';

const workspace = sharedBuiltWorkspace();

describe('qforge compare against NIST-JANAF 4th ed.', () => {
  it('passes for every covered species with the fixture tolerances (settings of --database)', async () => {
    const r = await runCli(['compare', 'out', '--database', 'db', '--json'], workspace().root);
    expect(r.code, r.stderr).toBe(0);
    const report = JSON.parse(r.stdout);
    const species = [...new Set(report.deviations.map((d: { species: string }) => d.species))].sort();
    expect(species).toEqual(['Ar', 'CO', 'N2', 'O']);
    // 4 species × 6 temperatures × 3 quantities.
    expect(report.deviations.length).toBe(72);
    expect(report.breaches).toEqual([]);
    // The tolerances came from db/qforge.yaml (references.tolerances).
    expect(report.tolerances).toEqual({ cp: 0.25, s: 0.05, h: 0.05 });
  });

  it('passes with --reference and the tolerances given as flags', async () => {
    const r = await runCli(['compare', 'out', '--reference', 'db/reference/janaf-4th-ed.csv', '--tolerance', 'cp=0.25,s=0.05,h=0.05'], workspace().root);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stderr).toMatch(/compare ok: 72 values: 72 within tolerance$/m);
    expect(r.stdout).toMatch(/^ok {4}N2: 18 values/m);
  });

  it('fails with a useful message when a tolerance is tightened below the error', async () => {
    const r = await runCli(['compare', 'out', '--database', 'db', '--tolerance', 'cp=0.01'], workspace().root);
    expect(r.code).toBe(1);
    // e.g. "N2 Cp at 6000 K: build 38.10 vs reference 38.2760 J/(mol K) (...): deviation -0.17 exceeds the tolerance 0.01 J/(mol K)"
    expect(r.stderr).toMatch(/\d+ value\(s\) beyond tolerance:/);
    expect(r.stderr).toMatch(/compare FAILED: 72 values: \d+ within tolerance, \d+ beyond tolerance$/m);
    expect(r.stderr).toMatch(/N2 Cp at \d+(\.\d+)? K: build [\d.]+ vs reference [\d.]+ J\/\(mol K\) \(db\/reference\/janaf-4th-ed\.csv\): deviation [+-][\d.]+ exceeds the tolerance 0\.01 J\/\(mol K\)/);
    expect(r.stderr).not.toMatch(/Ar Cp/); // Ar is exact to 0.001 (Cp = 5/2 R)
  });

  it('reads one-species files named by their file name, with units converted (cal → J)', async () => {
    // NIST-JANAF 4th ed. N-023: Cp(1000 K) = 32.697 J/(mol K) = 7.8148 cal/(mol K) (thermochemical calorie).
    const file = path.join(workspace().root, 'N2.csv');
    await writeFile(file, '# NIST-JANAF 4th ed., table N-023, converted to cal\nT [K],Cp [cal/(mol K)]\n1000,7.8148\n');
    const t = await parseReferenceCsv('# c\nT [K],Cp [cal/(mol K)]\n1000,7.8148\n', 'N2.csv');
    expect(t.species.get('N2')![0]!.cp).toBeCloseTo(32.697, 3);
    const r = await runCli(['compare', 'out', '--reference', 'N2.csv', '--tolerance', 'cp=0.25'], workspace().root);
    expect(r.code, r.stderr).toBe(0);
  });

  it('accepts an 80-column file as the reference (the build against its own nasa7.txt)', async () => {
    const r = await runCli(['compare', 'out', '--reference', 'out/nasa7.txt', '--tolerance', 'cp=1e-5,s=1e-5,h=1e-5', '--json'], workspace().root);
    expect(r.code, r.stderr).toBe(0);
    expect(JSON.parse(r.stdout).deviations.length).toBeGreaterThan(100);
  });

  it('accepts a thermo.json file as the reference (the build against itself: every deviation 0)', async () => {
    const r = await runCli(['compare', 'out', '--reference', 'out/thermo.json', '--tolerance', 'cp=1e-9,s=1e-9,h=1e-9', '--json'], workspace().root);
    expect(r.code, r.stderr).toBe(0);
    const report = JSON.parse(r.stdout);
    expect(report.deviations.length).toBeGreaterThan(100);
    expect(report.deviations.every((d: { deviation: number }) => d.deviation === 0)).toBe(true);
  });

  it('reports malformed reference tables and missing files clearly', async () => {
    await writeFile(path.join(workspace().root, 'bad.csv'), 'T,Cp\n300,29\n');
    const bad = await runCli(['compare', 'out', '--reference', 'bad.csv'], workspace().root);
    expect(bad.code).toBe(1);
    expect(bad.stderr).toMatch(/bad\.csv:1: column 1: header 'T' has no unit/);
    expect(bad.stderr).toMatch(/bad\.csv:1: column 2: header 'Cp' has no unit; units are never guessed/);
    const missing = await runCli(['compare', 'out', '--reference', 'nope.csv'], workspace().root);
    expect(missing.code).toBe(2);
    expect(missing.stderr).toMatch(/nope\.csv: no such file/);
  });
});
