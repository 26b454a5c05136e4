/**
 * `qforge diff` explains each change: the recorded input fields that moved (old → new with units), the
 * settings that moved and a code change. Builds of the fixture database (test/fixtures/db); the edits
 * below (a changed wavenumber, a changed fit weight) are written by hand.
 */
import { readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { diffInputs, formatInputChange, unitOfPath } from '../../../pipeline/commands/input-diff.js';
import { runCli, tempWorkspace } from '../helpers.js';

describe('diffInputs', () => {
  it('names each differing leaf by its path, old and new, with the unit of the normalised field', () => {
    const a = { vibrations: [{ wavenumber: 3600, degeneracy: 1 }, { wavenumber: 866, degeneracy: 1 }], enthalpyOfFormation: { value: -136100, temperature: 298.15 } };
    const b = { vibrations: [{ wavenumber: 3600, degeneracy: 1 }, { wavenumber: 877, degeneracy: 1 }, { wavenumber: 1200, degeneracy: 1 }], enthalpyOfFormation: { value: -136000, temperature: 298.15 } };
    const changes = diffInputs(a, b);
    expect(changes).toEqual([
      { path: 'enthalpyOfFormation.value', old: -136100, new: -136000, unit: 'J/mol' },
      { path: 'vibrations[1].wavenumber', old: 866, new: 877, unit: 'cm-1' },
      { path: 'vibrations[2]', new: { wavenumber: 1200, degeneracy: 1 } },
    ]);
    expect(changes.map(formatInputChange)).toEqual([
      'enthalpyOfFormation.value -136100 → -136000 J/mol',
      'vibrations[1].wavenumber 866 → 877 cm-1',
      'vibrations[2] added: {"wavenumber":1200,"degeneracy":1}',
    ]);
    expect(formatInputChange({ path: 'sources[1]', old: 'x' })).toBe('sources[1] removed (was "x")');
    expect(diffInputs(a, structuredClone(a))).toEqual([]);
    expect(unitOfPath('fit.sampling_step')).toBe('K');
  });
});

let ws: Awaited<ReturnType<typeof tempWorkspace>>;
beforeEach(async () => {
  ws = await tempWorkspace();
});
afterEach(async () => {
  await ws.cleanup();
});

describe('diff of two builds explains what moved', () => {
  it('one changed vibration wavenumber is named exactly, old → new in cm-1, with the Cp change', async () => {
    expect((await runCli(['build', 'db', '--out', 'before', '--quiet'], ws.root)).code).toBe(0);
    const file = path.join(ws.db, 'H2O.yaml');
    // A hand-made edit of the bending fundamental (1594.75 → 1600 cm-1).
    await writeFile(file, (await readFile(file, 'utf8')).replace('vibrations: [3657.05, 1594.75, 3755.93]', 'vibrations: [3657.05, 1600, 3755.93]'));
    expect((await runCli(['build', 'db', '--out', 'after', '--quiet'], ws.root)).code).toBe(0);
    const report = JSON.parse((await runCli(['diff', 'before', 'after', '--json'], ws.root)).stdout);
    expect(report.changed.map((c: { name: string }) => c.name)).toEqual(['H2O']);
    const [h2o] = report.changed;
    expect(h2o.input_changes).toHaveLength(1);
    expect(h2o.input_changes[0]).toMatchObject({ old: 1594.75, new: 1600, unit: 'cm-1' });
    expect(h2o.input_changes[0].path).toMatch(/^vibrations\[1\]/);
    // A stiffer bend lowers Cp at 1000 K.
    const at1000 = h2o.at.find((a: { t: number }) => a.t === 1000);
    expect(at1000.new.cp).toBeLessThan(at1000.old.cp);
    const text = (await runCli(['diff', 'before', 'after'], ws.root)).stdout;
    expect(text).toMatch(/^ {4}H2O: vibrations\[1\]\S* 1594\.75 → 1600 cm-1; Cp\(1000 K\) -\d\.\d{4} J\/\(mol K\)$/m);
  });

  it('a changed setting is named old → new; a build without recorded inputs says so instead of failing', async () => {
    expect((await runCli(['build', 'db', '--out', 'before', '--quiet'], ws.root)).code).toBe(0);
    const settings = path.join(ws.db, 'qforge.yaml');
    await writeFile(settings, (await readFile(settings, 'utf8')).replace('sampling_step: 20', 'sampling_step: 25'));
    expect((await runCli(['build', 'db', '--out', 'after', '--quiet'], ws.root)).code).toBe(0);

    const report = JSON.parse((await runCli(['diff', 'before', 'after', '--json'], ws.root)).stdout);
    expect(report.format).toBe('qforge-diff/2');
    expect(report.settings_changes).toEqual([{ path: 'fit.sampling_step', old: 20, new: 25, unit: 'K' }]);
    expect(report.changed.length).toBeGreaterThan(0);
    expect(report.code_changed).toBe(false);
    for (const c of report.changed) expect(c.input_changes).toEqual([]);
    const text = (await runCli(['diff', 'before', 'after'], ws.root)).stdout;
    expect(text).toMatch(/^settings changed: fit\.sampling_step 20 → 25 K$/m);

    // An older build: thermo.json without `input`, summary.json without `code_fingerprint`.
    const thermo = path.join(ws.root, 'before', 'thermo.json');
    const db = JSON.parse(await readFile(thermo, 'utf8'));
    for (const s of db.species) delete s.input;
    await writeFile(thermo, JSON.stringify(db));
    const summary = path.join(ws.root, 'before', 'summary.json');
    const sm = JSON.parse(await readFile(summary, 'utf8'));
    delete sm.code_fingerprint;
    await writeFile(summary, JSON.stringify(sm));
    const old = await runCli(['diff', 'before', 'after', '--json'], ws.root);
    expect(old.code, old.stderr).toBe(0);
    const o = JSON.parse(old.stdout);
    expect(o.changed.length).toBeGreaterThan(0);
    for (const c of o.changed) {
      expect(c.inputs_recorded).toBe(false);
      expect(c).not.toHaveProperty('input_changes');
    }
    expect(o).not.toHaveProperty('code_changed');
    expect((await runCli(['diff', 'before', 'after'], ws.root)).stdout).toMatch(/: inputs not recorded; Cp\(1000 K\)/);
  });
});
