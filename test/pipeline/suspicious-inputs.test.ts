/**
 * Table-driven bad and suspicious inputs through `check` and `build`: for each, the exit codes, the
 * diagnostic at file:line:column with its severity and stable code, outputs of the previous build
 * byte-identical afterwards, and `check` never accepting what `build` rejects. Warnings are run with
 * `--strict` (which must fail them) and then without (which must build).
 *
 * Species data: the H2O constants of test/fixtures/db/H2O.yaml (NIST CCCBDB / Shimanouchi, from memory) and
 * N2 of Huber & Herzberg (1979), from memory, each edited by hand into the mistake the case names; the
 * mistakes are invented for the tests.
 */
import { cp, readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { h2oInput } from '../support/h2o-input.js';
import { hashFolder, runCli, tempWorkspace, type Workspace } from './helpers.js';

const lines = (...ls: string[]) => `${ls.join('\n')}\n`;

/** The nonlinear base (test/support/h2o-input.ts): `over` replaces lines by number, extra lines are appended. */
const h2o = h2oInput;

/** Diatomic base (lines 1-9). */
function n2(over: Record<number, string> = {}): string {
  const base = [
    'name: XN2',
    'composition: {N: 2}',
    'enthalpy_of_formation: 0',
    'sources: ["N2 constants, Huber & Herzberg (1979), from memory; edited for a test"]',
    'structure: diatomic',
    'symmetry_number: 2',
    'dissociation_energy: {value: 78714, unit: cm-1}',
    'electronic_states:',
    '  - {term: X, energy: 0, degeneracy: 1, we: 2358.57, wexe: 14.324, Be: 1.99824, alphae: 0.017318}',
  ];
  for (const [k, v] of Object.entries(over)) base[Number(k) - 1] = v;
  return lines(...base);
}

const atom = (extra: string[] = [], over: Record<number, string> = {}) => {
  const base = ['name: XHe', 'composition: {He: 1}', 'enthalpy_of_formation: 0', 'sources: ["invented for a test"]', 'structure: atom'];
  for (const [k, v] of Object.entries(over)) base[Number(k) - 1] = v;
  return lines(...base, ...extra);
};

const rotor = (fields: string) => `internal_rotors: [{${fields}}]`;

interface Case {
  name: string;
  /** Contents of db/bad.yaml (text, or raw bytes). */
  text?: string | Buffer;
  /** Instead: an edit of db/qforge.yaml. */
  settings?: [string, string];
  severity: 'error' | 'warning';
  code: string;
  /** The located diagnostic: line, and the column where `at` starts on that line (none for whole-file problems). */
  line?: number;
  at?: string;
  file?: string;
  contains?: string[];
}

const CASES: Case[] = [
  // The issue's own examples.
  { name: 'rotational constants in MHz without a unit', text: h2o({ 7: 'rotational_constants: [835840, 435352, 278139]' }), severity: 'error', code: 'rotational-constant-looks-mhz', line: 7, at: '835840', contains: ['as MHz it would be 27.88'] },
  { name: 'vibration of 3e303 cm-1', text: h2o({ 8: 'vibrations: [3657.05, 1594.75, 3e303]' }), severity: 'error', code: 'wavenumber-out-of-bounds', line: 8, at: '3e303' },
  { name: 'enthalpy of formation 1e308', text: h2o({ 3: 'enthalpy_of_formation: 1e308' }), severity: 'error', code: 'enthalpy-out-of-bounds', line: 3, at: '1e308' },
  { name: 'symmetry number 6e11', text: h2o({ 6: 'symmetry_number: 6e11' }), severity: 'error', code: 'symmetry-number-out-of-bounds', line: 6, at: '6e11' },
  {
    name: 'torsion listed under vibrations and internal_rotors',
    text: h2o({}, rotor('barrier: {value: 1000, unit: cm-1}, symmetry_number: 1, rotational_constant: 20')),
    severity: 'error', code: 'torsion-counted-twice', line: 8, at: '[',
  },
  // Further plausibility bounds.
  { name: 'vibration below 1 cm-1', text: h2o({ 8: 'vibrations: [3657.05, 0.5, 3755.93]' }), severity: 'error', code: 'wavenumber-out-of-bounds', line: 8, at: '0.5' },
  { name: 'vibration with a unit, out of range', text: h2o({ 8: 'vibrations: [{value: 1e6, unit: cm-1}, 1594.75, 3755.93]' }), severity: 'error', code: 'wavenumber-out-of-bounds', line: 8, at: '1e6' },
  { name: 'rotational constant 1e-6 cm-1', text: h2o({ 7: 'rotational_constants: [27.8806, 14.5216, 1e-6]' }), severity: 'error', code: 'rotational-constant-out-of-bounds', line: 7, at: '1e-6' },
  { name: 'rotational constant with a unit, too large', text: h2o({ 7: 'rotational_constants: [{value: 500, unit: cm-1}, 14.5216, 9.2777]' }), severity: 'error', code: 'rotational-constant-out-of-bounds', line: 7, at: '500' },
  { name: 'moment of inertia far too small', text: h2o({ 7: 'moments_of_inertia: [{value: 1e-5, unit: amu*angstrom^2}, {value: 1.16, unit: amu*angstrom^2}, {value: 1.82, unit: amu*angstrom^2}]' }), severity: 'error', code: 'moment-of-inertia-out-of-bounds', line: 7, at: '1e-5' },
  { name: 'enthalpy of formation -1e6 kJ/mol', text: h2o({ 3: 'enthalpy_of_formation: {value: -1e6, unit: kJ/mol}' }), severity: 'error', code: 'enthalpy-out-of-bounds', line: 3, at: '-1e6' },
  {
    name: 'barrier of 1e6 cm-1',
    text: h2o({ 8: 'vibrations: [3657.05, 1594.75]' }, rotor('barrier: {value: 1e6, unit: cm-1}, symmetry_number: 1, rotational_constant: 20')),
    severity: 'error', code: 'barrier-out-of-bounds', line: 9, at: '1e6',
  },
  {
    name: 'rotor symmetry number 20',
    text: h2o({ 8: 'vibrations: [3657.05, 1594.75]' }, rotor('barrier: {value: 1000, unit: cm-1}, symmetry_number: 20, foldedness: 20, rotational_constant: 20')),
    severity: 'error', code: 'rotor-symmetry-number-out-of-bounds', line: 9, at: '20, fold',
  },
  { name: 'dissociation energy 5e5 cm-1', text: n2({ 7: 'dissociation_energy: {value: 5e5, unit: cm-1}' }), severity: 'error', code: 'dissociation-energy-out-of-bounds', line: 7, at: '5e5' },
  { name: 'diatomic Be in MHz without a unit', text: n2({ 9: '  - {term: X, energy: 0, degeneracy: 1, we: 2358.57, wexe: 14.324, Be: 59906, alphae: 0.017318}' }), severity: 'error', code: 'rotational-constant-looks-mhz', line: 9, at: '59906' },
  { name: 'diatomic we 3e5', text: n2({ 9: '  - {term: X, energy: 0, degeneracy: 1, we: 3e5, wexe: 14.324, Be: 1.99824, alphae: 0.017318}' }), severity: 'error', code: 'wavenumber-out-of-bounds', line: 9, at: '3e5' },
  { name: 'atomic level at 1e7 cm-1', text: atom(['electronic_levels: [{energy: 0, degeneracy: 1}, {energy: {value: 1e7, unit: cm-1}, degeneracy: 3}]']), severity: 'error', code: 'level-energy-out-of-bounds', line: 6, at: '1e7' },
  // Schema and physics errors.
  { name: 'misspelt key', text: atom(['electronic_level: [{energy: 0, degeneracy: 1}]']), severity: 'error', code: 'unknown-key', line: 6, at: 'electronic_level' },
  { name: 'unknown element', text: atom([], { 2: 'composition: {Xx: 1}' }), severity: 'error', code: 'unknown-element', line: 2, at: 'Xx' },
  { name: 'missing sources', text: lines('name: XHe', 'composition: {He: 1}', 'enthalpy_of_formation: 0', 'structure: atom'), severity: 'error', code: 'missing-field', line: 1, at: 'name' },
  { name: 'unknown unit', text: atom([], { 3: 'enthalpy_of_formation: {value: 0, unit: kJ/kg}' }), severity: 'error', code: 'unknown-unit', line: 3, at: 'kJ/kg' },
  { name: 'charge beyond the electrons', text: atom(['charge: 5']), severity: 'error', code: 'charge-exceeds-electrons', line: 6, at: '5' },
  { name: 'NaN wavenumber', text: h2o({ 8: 'vibrations: [3657.05, .nan, 3755.93]' }), severity: 'error', code: 'wrong-type', line: 8, at: '.nan', contains: ['(got NaN;'] },
  { name: 'text for a number', text: h2o({ 6: 'symmetry_number: two' }), severity: 'error', code: 'wrong-type', line: 6, at: 'two' },
  { name: 'YAML syntax error', text: 'name: XHe\ncomposition: {He: 1\nstructure: atom\n', severity: 'error', code: 'yaml-syntax', line: 3, at: 'structure' },
  { name: 'duplicate key', text: atom(['structure: atom']), severity: 'error', code: 'yaml-duplicate-key', line: 6, at: 'structure' },
  { name: 'binary file', text: Buffer.from([0x00, 0x01, 0x02, 0xff, 0x10, 0x00]), severity: 'error', code: 'not-utf8-text', contains: ['not UTF-8 text'] },
  { name: 'UTF-16 file', text: Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(atom(), 'utf16le')]), severity: 'error', code: 'not-utf8-text', contains: ['not UTF-8 text (UTF-16 byte-order mark)'] },
  { name: 'accepted warning with a placeholder reason', text: atom(['accepted_warnings: [{code: source-says-nothing, reason: "todo: explain later"}]']), severity: 'error', code: 'accepted-warning-placeholder-reason', line: 6, at: '{code' },
  // Suspicious but legal: warnings, errors with --strict.
  { name: 'too few vibrational modes', text: h2o({ 8: 'vibrations: [3657.05, 1594.75]' }), severity: 'warning', code: 'mode-count', line: 8, at: '[' },
  { name: 'a source that says nothing', text: atom([], { 4: 'sources: ["todo"]' }), severity: 'warning', code: 'source-says-nothing', line: 4, at: '"todo"' },
  { name: 'enthalpy of formation at 0 K', text: atom([], { 3: 'enthalpy_of_formation: {value: 0, unit: kJ/mol, temperature: 0}' }), severity: 'warning', code: 'enthalpy-at-0k', line: 3, at: '0}' },
  { name: 'symmetry number 2 with no two equal atoms', text: h2o({ 2: 'composition: {H: 1, O: 1, F: 1}' }), severity: 'warning', code: 'symmetry-number-no-equal-atoms', line: 6, at: '2' },
  { name: 'stale accepted warning', text: atom(['accepted_warnings: [{code: mode-count, reason: "invented acceptance for a test"}]']), severity: 'warning', code: 'stale-accepted-warning', line: 6, at: '{code' },
  {
    name: 'bare barrier that reads as plausible in cm-1 and in kJ/mol',
    text: h2o({ 8: 'vibrations: [3657.05, 1594.75]' }, rotor('barrier: 15, symmetry_number: 1, rotational_constant: 20')),
    severity: 'warning', code: 'bare-unit', line: 9, at: '15', contains: ['read as 15 cm-1 (= 0.17944 kJ/mol)', 'had it been 15 kJ/mol it would be 1253.9 cm-1'],
  },
  { name: 'bare dissociation energy that reads as plausible both ways', text: n2({ 7: 'dissociation_energy: 941' }), severity: 'error', code: 'dissociation-below-zpe', line: 7, at: '941' },
  { name: 'bare moment of inertia', text: h2o({ 7: 'moments_of_inertia: [0.6115, 1.1550, 1.8173]' }), severity: 'warning', code: 'bare-unit', line: 7, at: '0.6115', contains: ['amu*bohr^2'] },
  // Settings.
  { name: 'settings: misspelt key', settings: ['title:', 'titel:'], severity: 'error', code: 'unknown-key', file: 'db/qforge.yaml', line: 3, at: 'titel', contains: ["did you mean 'title'"] },
  { name: 'settings: stale accepted warning', settings: ['title:', 'accepted_warnings: [{code: mode-count, species: H2O, reason: "invented acceptance for a test"}]\ntitle:'], severity: 'warning', code: 'stale-accepted-warning', file: 'db/qforge.yaml', line: 3, at: '{code' },
];

const FILE = 'db/bad.yaml';
const col = (text: string, line: number, at: string) => text.split('\n')[line - 1]!.indexOf(at) + 1;

describe('bad and suspicious inputs: check and build agree, each located and coded, outputs untouched', () => {
  let base: Workspace;
  let scratch: string;
  beforeAll(async () => {
    base = await tempWorkspace();
    const r = await runCli(['build', 'db', '--out', 'out', '--quiet'], base.root);
    expect(r.code, r.stderr).toBe(0);
    scratch = await mkdtemp(path.join(tmpdir(), 'qforge-suspicious-'));
  });
  afterAll(async () => {
    await base.cleanup();
    await rm(scratch, { recursive: true, force: true });
  });

  it('has at least 30 cases', () => expect(CASES.length).toBeGreaterThanOrEqual(30));

  CASES.forEach((c, n) => {
    it(c.name, async () => {
      const root = path.join(scratch, String(n));
      await cp(base.root, root, { recursive: true });
      const settingsFile = path.join(root, 'db', 'qforge.yaml');
      let shown: string;
      if (c.settings) {
        const text = (await readFile(settingsFile, 'utf8')).replace(c.settings[0], c.settings[1]);
        await writeFile(settingsFile, text);
        shown = text;
      } else {
        await writeFile(path.join(root, 'db', 'bad.yaml'), c.text!);
        shown = typeof c.text === 'string' ? c.text : '';
      }
      const out = path.join(root, 'out');
      const before = await hashFolder(out);

      const check = await runCli(['check', 'db'], root);
      const strictCheck = await runCli(['check', 'db', '--strict'], root);
      expect(check.code, check.stderr).toBe(c.severity === 'error' ? 1 : 0);
      expect(strictCheck.code, strictCheck.stderr).toBe(1);

      const where = c.line === undefined ? `${c.file ?? FILE}` : `${c.file ?? FILE}:${c.line}:${col(shown, c.line, c.at!)}`;
      const line = check.stderr.split('\n').find((l) => l.startsWith(`${where}: ${c.severity}: `) && l.endsWith(` [${c.code}]`));
      expect(line, check.stderr).toBeDefined();
      for (const s of c.contains ?? []) expect(line).toContain(s);

      const build = await runCli(['build', 'db', '--out', 'out', ...(c.severity === 'warning' ? ['--strict'] : [])], root);
      expect(build.code, build.stderr).toBe(1);
      expect(build.stderr).toContain(`[${c.code}]`);
      expect(await hashFolder(out)).toBe(before);
      if (c.severity === 'warning') {
        // check accepted it, so build must too (without --strict).
        const plain = await runCli(['build', 'db', '--out', 'out', '--quiet'], root);
        expect(plain.code, plain.stderr).toBe(0);
      }
      await rm(root, { recursive: true, force: true });
    });
  });
});
