/**
 * Geometry input through the validator: bad input located with a stable code (table-driven), a geometry
 * file whose problems point into the XYZ file, warnings that keep the species, and the potential forms
 * (barrier, fourier, scan) agreeing with each other. The base is the ethane of test/fixtures/db-geometry
 * (sources named there); the mistakes and the scan points (generated from V3 = 12.1 kJ/mol by our own
 * formula) are invented.
 */
import { mkdtemp, readFile, rm, symlink, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { formatDiagnostic, type Diagnostic } from '../../pipeline/core/diagnostics.js';
import { loadYamlFile, parseYamlText } from '../../pipeline/stages/load.js';
import { validateSpecies } from '../../pipeline/stages/validate.js';
import { GAS_CONSTANT } from '../../src/constants.js';
import type { NonlinearSpecies } from '../../src/model.js';
import { createThermoEvaluator, standardProperties } from '../../src/thermo/index.js';

const DB = path.join(path.dirname(fileURLToPath(import.meta.url)), '../fixtures/db-geometry');
const FILE = 'species/C2H6.yaml';
const ETHANE = await readFile(path.join(DB, 'C2H6.yaml'), 'utf8');
const ROTOR = `  - axis: [1, 2]
    top: [3, 4, 5]
    symmetry_number: 3
    potential: {barrier: {value: 12.1, unit: kJ/mol}, foldedness: 3}
`;

/** The ethane file with its rotor block (and optionally other text) replaced. */
function ethane(rotor: string, replace: Array<[string, string]> = []): string {
  let text = ETHANE.replace(ROTOR, rotor);
  for (const [a, b] of replace) text = text.replace(a, b);
  return text;
}
const lineOf = (yaml: string, text: string) => yaml.split('\n').findIndex((l) => l.includes(text)) + 1;

function diagnosticsOf(yaml: string): Diagnostic[] {
  const loaded = parseYamlText(yaml, FILE);
  return [...loaded.diagnostics, ...loaded.documents.flatMap((d) => validateSpecies(d).diagnostics)];
}
function speciesOf(yaml: string): NonlinearSpecies {
  const v = validateSpecies(parseYamlText(yaml, FILE).documents[0]!);
  expect(v.diagnostics.filter((d) => d.severity === 'error').map(formatDiagnostic)).toEqual([]);
  return v.species as NonlinearSpecies;
}
const s298 = (s: NonlinearSpecies) => standardProperties(createThermoEvaluator(s), 298.15);

interface Case {
  kind: string;
  yaml: string;
  code: string;
  path: string;
  /** The diagnostic's line holds this text. */
  lineWith: string;
  contains: string[];
}

/** CO2 (r(C=O) = 1.16 angstrom, Herzberg 1966, from memory) written as nonlinear by mistake. */
const LINEAR_AS_NONLINEAR = [
  'name: CO2',
  'composition: {C: 1, O: 2}',
  'enthalpy_of_formation: -393.51',
  'sources: ["Herzberg (1966), from memory"]',
  'structure: nonlinear',
  'geometry:',
  '  - [O, 0, 0, -1.16]',
  '  - [C, 0, 0, 0]',
  '  - [O, 0, 0, 1.16]',
  'vibrations: [1333, 667, 2349]',
  '',
].join('\n');

const SCAN_HALF = Array.from({ length: 7 }, (_, i) => `[${i * 10}, ${((12.1 / 2) * (1 - Math.cos((3 * i * 10 * Math.PI) / 180))).toFixed(4)}]`).join(', ');

const ERRORS: Case[] = [
  {
    kind: 'atom index out of range', yaml: ethane('  - {axis: [1, 9], symmetry_number: 3, barrier: 1011}\n'), code: 'rotor-atom-out-of-range',
    path: 'internal_rotors[0].axis[1]', lineWith: 'axis: [1, 9]', contains: ['atom index 9 is out of range', '8 atoms'],
  },
  {
    kind: 'axis not bonded', yaml: ethane('  - {axis: [3, 6], symmetry_number: 3, barrier: 1011}\n'), code: 'rotor-axis-not-bonded',
    path: 'internal_rotors[0].axis', lineWith: 'axis: [3, 6]', contains: ['atoms 3 and 6', 'not bonded', 'covalent radii'],
  },
  {
    kind: 'top on both sides', yaml: ethane('  - {axis: [1, 2], top: [3, 6], symmetry_number: 3, barrier: 1011}\n'), code: 'rotor-top-both-sides',
    path: 'internal_rotors[0].top', lineWith: 'top: [3, 6]', contains: ['both sides of the bond 1-2'],
  },
  {
    kind: 'top leaving out atoms of its side', yaml: ethane('  - {axis: [1, 2], top: [3, 4], symmetry_number: 3, barrier: 1011}\n'), code: 'rotor-top-incomplete',
    path: 'internal_rotors[0].top', lineWith: 'top: [3, 4]', contains: ['leaves out atom 5'],
  },
  {
    kind: 'geometry composition disagrees', yaml: ethane(ROTOR, [['composition: {C: 2, H: 6}', 'composition: {C: 2, H: 5, D: 1}']]), code: 'geometry-composition',
    path: 'geometry', lineWith: '[C, 0.0, 0.0, 0.76755]', contains: ['the geometry holds C2 H6 but composition is C2 D H5'],
  },
  {
    kind: 'coincident atoms', yaml: ethane(ROTOR, [['[H, -1.02017, 0.0, -1.16263]', '[H, 0.51009, 0.88350, -1.16264]']]), code: 'geometry-coincident-atoms',
    path: 'geometry[6]', lineWith: '[H, 0.51009, 0.88350, -1.16264]', contains: ['atom 6 and atom 7 are at the same place'],
  },
  {
    kind: 'unknown isotope', yaml: ethane(ROTOR, [['[C, 0.0, 0.0, 0.76755]', '[99C, 0.0, 0.0, 0.76755]']]), code: 'geometry-unknown-atom',
    path: 'geometry[0]', lineWith: '[99C,', contains: ['no isotope 99C'],
  },
  {
    kind: 'scan not covering the period', yaml: ethane(`  - {axis: [1, 2], symmetry_number: 3, potential: {scan: [${SCAN_HALF}], unit: kJ/mol}}\n`), code: 'rotor-scan-coverage',
    path: 'internal_rotors[0].potential.scan', lineWith: 'scan:', contains: ['does not cover the period of 120 degrees', 'gap of 60 degrees'],
  },
  {
    kind: 'constants disagree with the geometry', yaml: ethane(ROTOR, [['structure: nonlinear', 'structure: nonlinear\nrotational_constants: [2.68, 0.70, 0.70]']]), code: 'geometry-rotation-disagrees',
    path: 'rotational_constants', lineWith: 'rotational_constants:', contains: ['(2.68, 0.7, 0.7 cm-1)', '2.67861, 0.662133, 0.662132 cm-1', 'more than 0.5 %'],
  },
  {
    kind: 'linear geometry, nonlinear structure', yaml: LINEAR_AS_NONLINEAR, code: 'geometry-structure',
    path: 'geometry', lineWith: '[O, 0, 0, -1.16]', contains: ["the geometry is linear but structure is 'nonlinear'"],
  },
  {
    kind: 'axis without a geometry', yaml: ethane(ROTOR, [['\ngeometry:\n', '\nrotational_constants: [2.68, 0.662, 0.662]\nsymmetry_number: 6\nxgeometry:\n']]), code: 'rotor-axis-needs-geometry',
    path: 'internal_rotors[0].axis', lineWith: 'axis: [1, 2]', contains: ['needs a geometry'],
  },
  {
    kind: 'both barrier and potential', yaml: ethane('  - {axis: [1, 2], barrier: 1011, potential: {barrier: 1011}}\n'), code: 'rotor-potential-given-twice',
    path: 'internal_rotors[0].potential', lineWith: 'barrier: 1011, potential', contains: ['either barrier or potential'],
  },
];

describe('geometry input: bad input, located with a stable code', () => {
  it.each(ERRORS.map((c) => [c.kind, c] as const))('%s', (_kind, c) => {
    const ds = diagnosticsOf(c.yaml);
    const d = ds.find((x) => x.severity === 'error' && x.code === c.code);
    expect(d, ds.map(formatDiagnostic).join('\n')).toBeDefined();
    expect(d!.file).toBe(FILE);
    expect(d!.path).toBe(c.path);
    expect(d!.line).toBe(lineOf(c.yaml, c.lineWith));
    for (const s of c.contains) expect(formatDiagnostic(d!)).toContain(s);
  });
});

describe('geometry input: warnings keep the species', () => {
  it('a given symmetry number that differs from the geometry: warning with both values, the given one used', () => {
    const yaml = ethane(ROTOR, [['structure: nonlinear', 'structure: nonlinear\nsymmetry_number: 3']]);
    const v = validateSpecies(parseYamlText(yaml, FILE).documents[0]!);
    const w = v.diagnostics.find((d) => d.code === 'symmetry-number-differs');
    expect(w?.severity).toBe('warning');
    expect(formatDiagnostic(w!)).toContain('symmetry number 3 differs from the 6 of the geometry');
    expect((v.species as NonlinearSpecies).symmetryNumber).toBe(3);
  });
  it('a rotor symmetry number that differs from the geometry: warning with both values', () => {
    const v = validateSpecies(parseYamlText(ethane(ROTOR.replace('symmetry_number: 3', 'symmetry_number: 1')), FILE).documents[0]!);
    const w = v.diagnostics.find((d) => d.code === 'rotor-symmetry-number-differs');
    expect(formatDiagnostic(w!)).toContain('rotor symmetry number 1 differs from the 3 of the geometry');
  });
  it('a rough scan draws a residual warning', () => {
    // 24 points of V3 = 12.1 kJ/mol, one 3 kJ/mol off (a jump to another structure).
    const points = Array.from({ length: 24 }, (_, i) => `[${i * 5}, ${(6.05 * (1 - Math.cos((3 * i * 5 * Math.PI) / 180)) + (i === 8 ? 3 : 0)).toFixed(4)}]`).join(', ');
    const v = validateSpecies(parseYamlText(ethane(`  - {axis: [1, 2], potential: {scan: [${points}], unit: kJ/mol}}\n`), FILE).documents[0]!);
    const w = v.diagnostics.find((d) => d.code === 'rotor-scan-fit-residual');
    expect(w?.severity, v.diagnostics.map(formatDiagnostic).join('\n')).toBe('warning');
    expect(v.species).toBeDefined();
  });
});

describe('geometry input: normalisation', () => {
  it('barrier, one-term fourier and a scan of the same V3 potential give the same S(298.15) (scan within 0.01)', () => {
    const barrier = s298(speciesOf(ETHANE)).S;
    const fourier = s298(speciesOf(ethane('  - {axis: [1, 2], potential: {fourier: [[3, 12.1, 0]], unit: kJ/mol}}\n'))).S;
    const points = Array.from({ length: 12 }, (_, i) => `[${i * 10}, ${(6.05 * (1 - Math.cos((3 * i * 10 * Math.PI) / 180))).toFixed(6)}]`).join(', ');
    const scanned = speciesOf(ethane(`  - {axis: [1, 2], potential: {scan: [${points}], unit: kJ/mol}}\n`));
    expect(Math.abs(fourier - barrier)).toBeLessThan(1e-6);
    expect(Math.abs(s298(scanned).S - barrier)).toBeLessThan(0.01);
    expect(scanned.internalRotors![0]!.scanFit!.points).toBe(12);
    expect(createThermoEvaluator(scanned).summary.contributions.join('\n')).toContain('fitted to a scan of 12 points');
  });
  it('a sine term changes the levels (an asymmetric potential) but not the count of modes', () => {
    const s = speciesOf(ethane('  - {axis: [1, 2], potential: {fourier: [[3, 12.1, 0], [6, 0.5, 0.8]], unit: kJ/mol}}\n'));
    expect(s.internalRotors![0]!.fourier).toHaveLength(2);
    expect(Math.abs(s298(s).S - s298(speciesOf(ETHANE)).S)).toBeGreaterThan(0.001);
  });
  it('optical_isomers: 2 adds R ln 2 to S and nothing to Cp or H', () => {
    const plain = s298(speciesOf(ETHANE));
    const chiral = s298(speciesOf(ethane(ROTOR, [['structure: nonlinear', 'structure: nonlinear\noptical_isomers: 2']])));
    expect(Math.abs(chiral.S - plain.S - GAS_CONSTANT * Math.log(2))).toBeLessThan(1e-9);
    expect(chiral.Cp).toBe(plain.Cp);
  });
  it('given constants that agree with the geometry are used as given', () => {
    const s = speciesOf(ethane(ROTOR, [['structure: nonlinear', 'structure: nonlinear\nrotational_constants: [2.68, 0.6625, 0.6620]']]));
    expect(s.rotationalConstants).toEqual([2.68, 0.6625, 0.662]);
  });
});

describe('geometry in a conformer', () => {
  it('a one-conformer list with the geometry gives the plain species (same normalisation, same S)', () => {
    const body = ETHANE.slice(ETHANE.indexOf('geometry:\n'));
    const indented = body.split('\n').map((l) => (l === '' ? l : `    ${l}`)).join('\n');
    const yaml = ETHANE.slice(0, ETHANE.indexOf('geometry:\n')) + `conformers:\n  - name: staggered\n    energy: 0\n${indented.replace(/^    /, '    ')}`;
    const v = validateSpecies(parseYamlText(yaml, FILE).documents[0]!);
    expect(v.diagnostics.filter((d) => d.severity === 'error').map(formatDiagnostic)).toEqual([]);
    const conf = v.species as NonlinearSpecies;
    expect(conf.conformers![0]!.symmetryNumber).toBe(6);
    expect(conf.conformers![0]!.internalRotors![0]!.symmetryNumber).toBe(3);
    expect(Math.abs(s298(conf).S - s298(speciesOf(ETHANE)).S)).toBeLessThan(1e-9);
  });
});

describe('geometry_file', () => {
  it('reads the XYZ file next to the species file; its problems point into the XYZ file', async () => {
    const dir = await mkdtemp(path.join(tmpdir(), 'qforge-geo-'));
    try {
      const yaml = (await readFile(path.join(DB, 'CH3OH.yaml'), 'utf8')).replace('CH3OH.xyz', 'bad.xyz');
      await writeFile(path.join(dir, 'CH3OH.yaml'), yaml);
      await writeFile(path.join(dir, 'bad.xyz'), '6\nmethanol with a typo\nC 0 0 0\nO 0 0 1.4246\nH 0.896 0 1.725\nH 0.513 0.888 -0.379 x\nH -1.026 0 -0.379\nH 0.513 -0.888 -0.379\n');
      const loaded = await loadYamlFile(path.join(dir, 'CH3OH.yaml'), 'db/CH3OH.yaml');
      const v = validateSpecies(loaded.documents[0]!);
      const d = v.diagnostics.find((x) => x.code === 'xyz-bad-line');
      expect(d, v.diagnostics.map(formatDiagnostic).join('\n')).toBeDefined();
      expect(d!.file).toBe(path.join('db', 'bad.xyz'));
      expect(d!.line).toBe(6);
      expect(v.species).toBeUndefined();
      await writeFile(path.join(dir, 'CH3OH.yaml'), yaml.replace('bad.xyz', '../outside.xyz'));
      const outside = validateSpecies((await loadYamlFile(path.join(dir, 'CH3OH.yaml'), 'db/CH3OH.yaml')).documents[0]!);
      expect(outside.diagnostics.map((x) => x.code)).toContain('geometry-file-outside');
      // A symbolic link out of the folder is refused too (never read, never echoed).
      const elsewhere = await mkdtemp(path.join(tmpdir(), 'qforge-geo-out-'));
      try {
        await writeFile(path.join(elsewhere, 'secret.xyz'), '1\nsecret\nC 0 0 0\n');
        await symlink(path.join(elsewhere, 'secret.xyz'), path.join(dir, 'link.xyz'));
        await writeFile(path.join(dir, 'CH3OH.yaml'), yaml.replace('bad.xyz', 'link.xyz'));
        const linked = validateSpecies((await loadYamlFile(path.join(dir, 'CH3OH.yaml'), 'db/CH3OH.yaml')).documents[0]!);
        expect(linked.diagnostics.map((x) => x.code)).toContain('geometry-file-outside');
      } finally {
        await rm(elsewhere, { recursive: true, force: true });
      }
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  });
  it('a document checked without its file (not loaded from disk) says the file was not read', () => {
    const yaml = ETHANE.replace(/geometry:\n(  - .*\n)+/, 'geometry_file: C2H6.xyz\n');
    expect(diagnosticsOf(yaml).map((d) => d.code)).toContain('geometry-file-unread');
  });
});
