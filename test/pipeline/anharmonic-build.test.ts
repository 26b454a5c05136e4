/**
 * End to end: a database holding an anharmonic CO2 (Chedin 1979 constants, from memory), a two-conformer
 * species (hand-written test data) and the free electron builds, fits within the default tolerances, and
 * carries the new models in the model summary of thermo.json. CO2 is the bench input (bench/anharmonic.ts);
 * the other species files are written by hand here.
 */
import { mkdir, mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CO2_ANHARMONIC_YAML } from '../../bench/anharmonic.js';
import { readJson, runCli, type CliRun } from './helpers.js';

const FILES: Record<string, string> = {
  // A coarse grid keeps the CO2 direct sum (90 000 levels) cheap in the suite.
  'qforge.yaml': `fit: {sampling_step: 50}
tables: {from: 200, to: 6000, step: 1000}
`,
  'CO2.yaml': CO2_ANHARMONIC_YAML,
  'pair.yaml': `name: HOX-pair
composition: {H: 2, O: 1}
enthalpy_of_formation: -241.826
sources: ["hand-written test data"]
structure: nonlinear
conformers:
  - {name: low, energy: 0, symmetry_number: 2, rotational_constants: [27.88, 14.51, 9.28], vibrations: [3657, 1595, 3756]}
  - {name: high, energy: {value: 3.5, unit: kJ/mol}, symmetry_number: 1, rotational_constants: [20.1, 12.3, 8.1], vibrations: [3500, 1400, 3600],
     vibration_scale_factor: {value: 0.97, source: "hand-written test factor"}}
`,
  'e.yaml': `name: e-
composition: {E: 1}
charge: -1
enthalpy_of_formation: 0
sources: ["thermal-electron convention (NIST-JANAF 4th ed.)"]
structure: atom
electronic_levels: [{energy: 0, degeneracy: 2}]
`,
};

let root = '';
let run: CliRun;
beforeAll(async () => {
  root = await mkdtemp(path.join(tmpdir(), 'qforge-anh-'));
  await mkdir(path.join(root, 'db'));
  for (const [name, text] of Object.entries(FILES)) await writeFile(path.join(root, 'db', name), text);
  run = await runCli(['build', 'db', '--out', 'out', '--quiet'], root);
}, 120_000);
afterAll(() => rm(root, { recursive: true, force: true }));

describe('build with anharmonic, conformer and electron species', () => {
  it('exits 0', () => {
    expect(run.code, run.stderr + run.stdout).toBe(0);
  });
  it('records the models in thermo.json', async () => {
    const db = await readJson(path.join(root, 'out', 'thermo.json'));
    const text = JSON.stringify(db);
    expect(text).toContain('anharmonic vibrations, direct level sum');
    expect(text).toContain("conformer 'high'");
    expect(text).toContain('wavenumbers scaled by 0.97 (hand-written test factor)');
    expect(text).toContain('"e-"');
  });
});
