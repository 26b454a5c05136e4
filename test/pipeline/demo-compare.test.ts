/**
 * The nightly reference check of the demo database: `qforge compare build --database species` gates the
 * demo against species/reference/ (NIST-JANAF 4th ed. excerpt for the atoms and diatomics; NIST-JANAF 4th
 * ed. values FROM MEMORY for the polyatomics H2O, OH, NO, NH3, NO2, N2O, HO2, H2O2), with the model limits
 * recorded as known deviations in species/qforge.yaml. Before, the polyatomics were not compared at all.
 */
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { REPO, runCli, tempWorkspace } from './helpers.js';

let ws: Awaited<ReturnType<typeof tempWorkspace>>;
beforeAll(async () => {
  ws = await tempWorkspace();
  const r = await runCli(['build', path.join(REPO, 'species'), '--out', 'demo', '--quiet', '--no-cache'], ws.root);
  expect(r.code, r.stderr).toBe(0);
});
afterAll(() => ws.cleanup());

describe('compare of the demo database with its shipped references', () => {
  it('covers the polyatomics and exits 0, the model limits reported as known deviations with reasons', async () => {
    const species = path.join(REPO, 'species');
    const r = await runCli(['compare', 'demo', '--database', species, '--json'], ws.root);
    expect(r.code, r.stderr).toBe(0);
    const report = JSON.parse(r.stdout);
    const compared = new Set(report.deviations.map((d: { species: string }) => d.species));
    for (const s of ['H2O', 'OH', 'NO', 'NH3', 'NO2', 'N2O', 'HO2', 'H2O2']) expect(compared.has(s), s).toBe(true);
    const text = await runCli(['compare', 'demo', '--database', species], ws.root);
    expect(text.code).toBe(0);
    expect(text.stderr).not.toMatch(/warning/); // no stale known deviation
    // H2O's harmonic model: Cp about 1 J/(mol K) low at 2000 K (JANAF from memory: 51.180).
    const h2o = report.deviations.find((d: { species: string; quantity: string; t: number }) => d.species === 'H2O' && d.quantity === 'cp' && d.t === 2000);
    expect(h2o.deviation).toBeLessThan(-0.5);
    expect(h2o.deviation).toBeGreaterThan(-1.5);
    expect(h2o.status).toBe('known');
    expect(text.stdout).toMatch(/^known H2O: .*\n.*\n {8}reason: Rigid-rotor\/harmonic-oscillator model/m);
  });

  it('the nightly form `compare BUILD` (no flags) reads the references recorded in the build: same result', async () => {
    const r = await runCli(['compare', 'demo', '--quiet'], ws.root);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stderr).toMatch(/^qforge: compare ok: \d+ values: \d+ within tolerance, \d+ within known deviations \(.*H2O \d+.*\)\n$/);
  });

  it('--strict makes the same model limits fail', async () => {
    const r = await runCli(['compare', 'demo', '--database', path.join(REPO, 'species'), '--strict', '--quiet'], ws.root);
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/H2O Cp at 2000 K: build/);
    expect(r.stderr).toMatch(/H2O2 Cp at 298\.15 K/);
    expect(r.stderr).toMatch(/NH3 Cp at 1000 K/);
  });
});
