/**
 * Uncertainties through a whole build: every species in thermo.json carries an `uncertainty` block (zeros
 * and declared = false without inputs), declared inputs are normalised to internal units, a per-entry list
 * of the wrong length is one located error, and --uncertainty-samples adds the seeded Monte Carlo check.
 * Test data: the fixture database (sources in its files) plus hand-written uncertainty figures.
 */
import { appendFile, readFile } from 'node:fs/promises';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { readJson, runCli, tempWorkspace } from './helpers.js';

let ws: Awaited<ReturnType<typeof tempWorkspace>>;
beforeEach(async () => {
  ws = await tempWorkspace();
});
afterEach(async () => {
  await ws.cleanup();
});

describe('uncertainty in a build', () => {
  it('writes zeros for species without inputs and propagated values with their contributors for the others', async () => {
    await appendFile(path.join(ws.db, 'H2O.yaml'), '\nuncertainties: {vibrations: 0.01, enthalpy_of_formation: {value: 40, unit: J/mol}}\n');
    const r = await runCli(['build', 'db', '--out', 'out', '-q', '--uncertainty-samples', '30', '--report'], ws.root);
    expect(r.code, r.stderr).toBe(0);
    const db = await readJson(path.join(ws.out, 'thermo.json'));
    for (const s of db.species) {
      expect(s.uncertainty.points.map((p: { t_k: number }) => p.t_k)).toEqual([298.15, 1000, 2000]);
      if (s.name !== 'H2O') {
        expect(s.uncertainty.declared).toBe(false);
        expect(s.uncertainty.inputs).toEqual([]);
        expect(s.uncertainty.points[0].u_s_j_per_mol_k).toBe(0);
        expect(s.uncertainty.monte_carlo).toBeUndefined();
      }
    }
    const h2o = db.species.find((s: { name: string }) => s.name === 'H2O').uncertainty;
    expect(h2o.declared).toBe(true);
    expect(h2o.inputs.map((i: { name: string }) => i.name)).toEqual(['vibration[0]', 'vibration[1]', 'vibration[2]', 'enthalpy_of_formation']);
    expect(h2o.inputs[3]).toMatchObject({ u: 40, unit: 'J/mol', sensitivity: 'central-difference' });
    const at1000 = h2o.points[1];
    expect(at1000.u_cp_j_per_mol_k).toBeGreaterThan(0);
    expect(at1000.largest.cp.length).toBe(3);
    // u(H°) = sqrt(u(H−H298)² + u(ΔfH°)²): the formation enthalpy enters H° only.
    expect(at1000.u_h_kj_per_mol ** 2).toBeCloseTo(at1000.u_h_minus_h298_kj_per_mol ** 2 + 0.04 ** 2, 12);
    expect(h2o.monte_carlo.map((m: { samples: number }) => m.samples)).toEqual([30, 30, 30]);
    const html = await readFile(path.join(ws.out, 'report.html'), 'utf8');
    expect(html).toContain('Propagated uncertainty');
    expect(html).toMatch(/Species without declared input uncertainties[^<]*Ar/);
    expect(html).toContain('<svg class="chart uncertainty"');
  });

  it('a per-entry vibration list of the wrong length is one error at the field, with a stable code', async () => {
    await appendFile(path.join(ws.db, 'H2O.yaml'), '\nuncertainties: {vibrations: [5, 5]}\n');
    const r = await runCli(['check', 'db'], ws.root);
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/H2O\.yaml:\d+:\d+: error: \[H2O\] uncertainties\.vibrations: 2 uncertainties for 3 vibration entries.*\[uncertainty-list-length\]/);
  });

  it('an uncertainty of an input the species does not have is a warning', async () => {
    await appendFile(path.join(ws.db, 'Ar.yaml'), '\nuncertainties: {barriers: 0.1}\n');
    const r = await runCli(['check', 'db'], ws.root);
    expect(r.code).toBe(0);
    expect(r.stderr).toMatch(/Ar\.yaml.*warning: \[Ar\] uncertainties\.barriers: uncertainty of an input this species does not have.*\[uncertainty-not-applicable\]/);
  });
});
