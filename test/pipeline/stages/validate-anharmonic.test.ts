/**
 * Input of the vibrational extensions: vibration_scale_factor, anharmonicity, centrifugal_distortion, the
 * polyatomic dissociation_energy and conformers. Valid inputs normalise to the model the physics tests use;
 * bad inputs are table-driven, each located (line, column, field path) with its stable code.
 * Bases: CO2 with the constants of test/fixtures/anharmonic-species.ts (Chedin 1979 and the usual B_0, α_i,
 * D_J, from memory) and H2O (Herzberg, from memory); the mistakes and the second conformer are invented.
 */
import { describe, expect, it } from 'vitest';
import type { Diagnostic } from '../../../pipeline/core/diagnostics.js';
import { parseYamlText } from '../../../pipeline/stages/load.js';
import { validateSpecies } from '../../../pipeline/stages/validate.js';
import type { LinearSpecies, NonlinearSpecies, Species } from '../../../src/model.js';
import { createThermoEvaluator } from '../../../src/thermo/index.js';
import { CO2_ANHARMONIC } from '../../fixtures/anharmonic-species.js';

const FILE = 'species/anh.yaml';
const CO2 = [
  'name: CO2',
  'composition: {C: 1, O: 2}',
  'enthalpy_of_formation: -393.51',
  'sources: ["Chedin (1979), from memory"]',
  'structure: linear',
  'symmetry_number: 2',
  'rotational_constants: [0.39022]',
  'vibrations: [1354.31, {wavenumber: 672.85, degeneracy: 2}, 2396.32]',
  'anharmonicity:',
  '  x: [[1, 1, -2.93], [1, 2, -4.61], [1, 3, -19.82], [2, 2, 1.35], [2, 3, -12.31], [3, 3, -12.47]]',
  '  g: [[2, 2, -0.97]]',
  '  alpha: [[0.00120], [-0.00072], [0.00309]]',
  'centrifugal_distortion: {DJ: 1.333e-7}',
  'dissociation_energy: 43980',
];
const H2O = [
  'name: H2O',
  'composition: {H: 2, O: 1}',
  'enthalpy_of_formation: -241.826',
  'sources: ["Herzberg, from memory"]',
  'structure: nonlinear',
  'symmetry_number: 2',
  'rotational_constants: [27.88, 14.51, 9.28]',
  'vibrations: [3657, 1595, 3756]',
];

function edit(base: readonly string[], changes: Record<number, string | null> = {}, extra: readonly string[] = []): string {
  const out = base.map((l, i) => (Object.hasOwn(changes, i + 1) ? changes[i + 1] : l)).filter((l): l is string => l !== null);
  return [...out, ...extra].join('\n') + '\n';
}

function validate(yaml: string): { species?: Species; diagnostics: Diagnostic[] } {
  const loaded = parseYamlText(yaml, FILE);
  expect(loaded.diagnostics).toEqual([]);
  return validateSpecies(loaded.documents[0]!);
}

describe('valid input normalises to the physics model', () => {
  it('anharmonic CO2: 0-based terms, constants as given', () => {
    const r = validate(edit(CO2));
    expect(r.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    const s = r.species as LinearSpecies;
    expect(s.anharmonicity).toEqual(CO2_ANHARMONIC.anharmonicity);
    expect(s.centrifugalDistortion).toEqual({ DJ: 1.333e-7 });
    expect(s.dissociationEnergy).toBe(43980);
    expect(createThermoEvaluator(s).at(3000)).toEqual(createThermoEvaluator({ ...CO2_ANHARMONIC, name: 'CO2', enthalpyOfFormation: s.enthalpyOfFormation, sources: s.sources, molarMass: s.molarMass }).at(3000));
  });
  it('vibration_scale_factor multiplies every wavenumber and is recorded in the model summary', () => {
    const r = validate(edit(H2O, {}, ['vibration_scale_factor: {value: 0.96, source: "invented test factor"}']));
    const s = r.species as NonlinearSpecies;
    expect(s.vibrations.map((v) => v.wavenumber)).toEqual([3657 * 0.96, 1595 * 0.96, 3756 * 0.96]);
    expect(s.vibrationScaleFactor).toEqual({ value: 0.96, source: 'invented test factor' });
    expect(createThermoEvaluator(s).summary.contributions.join('\n')).toContain('wavenumbers scaled by 0.96 (invented test factor)');
  });
  it('nonlinear alpha columns follow the rotational constants into A >= B >= C order', () => {
    const r = validate(edit(H2O, { 7: 'rotational_constants: [9.28, 27.88, 14.51]' }, ['anharmonicity: {x: [], alpha: [[0.03, 0.01, 0.02], [0.03, 0.01, 0.02], [0.03, 0.01, 0.02]]}']));
    const s = r.species as NonlinearSpecies;
    expect(s.rotationalConstants).toEqual([27.88, 14.51, 9.28]);
    expect(s.anharmonicity!.alpha).toEqual([[0.01, 0.02, 0.03], [0.01, 0.02, 0.03], [0.01, 0.02, 0.03]]);
  });
});

describe('conformers', () => {
  const conformer = (name: string, energy: number, extra = '') =>
    `  - {name: ${name}, energy: ${energy}, symmetry_number: 2, rotational_constants: [27.88, 14.51, 9.28], vibrations: [3657, 1595, 3756]${extra}}`;
  const plainH2O = H2O;
  const withConformers = (lines: string[]) => edit(plainH2O, { 6: null, 7: null, 8: null }, ['conformers:', ...lines]);

  it('a one-conformer list equals the plain species (every function, to the last bit)', () => {
    const plain = validate(edit(plainH2O)).species!;
    const one = validate(withConformers([conformer('only', 0)]));
    expect(one.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    const a = createThermoEvaluator(plain);
    const b = createThermoEvaluator(one.species!);
    for (const T of [200, 298.15, 1000, 3000, 6000]) expect(b.at(T)).toEqual(a.at(T));
  });
  it('two identical conformers at energy 0 add R ln 2 to S and nothing to Cp', () => {
    const plain = createThermoEvaluator(validate(edit(plainH2O)).species!).at(1000);
    const two = createThermoEvaluator(validate(withConformers([conformer('a', 0), conformer('b', 0)])).species!).at(1000);
    expect(two.s - plain.s).toBeCloseTo(Math.log(2), 12);
    expect(two.cp).toBeCloseTo(plain.cp, 12);
  });
  it('a second conformer at E adds the two-level (Schottky) heat capacity to Cp/R (McQuarrie 1976, two-level system)', () => {
    const E = 500; // cm-1, invented
    const T = 600;
    const plain = createThermoEvaluator(validate(edit(plainH2O)).species!).at(T);
    const two = createThermoEvaluator(validate(withConformers([conformer('a', 0), conformer('b', E)])).species!).at(T);
    const x = (1.438776877 * E) / T;
    const schottky = (x * x * Math.exp(-x)) / (1 + Math.exp(-x)) ** 2;
    expect(two.cp - plain.cp).toBeCloseTo(schottky, 6);
  });
  it('a conformer field error is located under conformers[i]', () => {
    const yaml = withConformers([conformer('a', 0), conformer('b', 100, ', anharmonicity: {x: [[1, 4, -1]]}')]);
    const d = validate(yaml).diagnostics.find((x) => x.code === 'anharmonic-mode-out-of-range');
    expect(d?.path).toBe('conformers[1].anharmonicity.x[0][1]');
    expect(d?.line).toBe(yaml.split('\n').findIndex((l) => l.includes('name: b')) + 1);
  });
});

interface Case {
  kind: string;
  yaml: string;
  code: string;
  path: string;
  line: number;
  at?: string;
  severity?: 'error' | 'warning';
  contains?: string[];
}

const CASES: Case[] = [
  { kind: 'x_ij on a mode that does not exist', yaml: edit(CO2, { 10: '  x: [[1, 1, -2.93], [1, 4, -4.61]]' }), code: 'anharmonic-mode-out-of-range', path: 'anharmonicity.x[1][1]', line: 10, at: '4, -4.61', contains: ['mode 4 does not exist', 'vibrations has 3 items'] },
  { kind: 'x_ij with i > j', yaml: edit(CO2, { 10: '  x: [[2, 1, -4.61]]' }), code: 'anharmonic-index-order', path: 'anharmonicity.x[0]', line: 10, at: '[2, 1', contains: ['[1, 2, -4.61]'] },
  { kind: 'x_ij given twice', yaml: edit(CO2, { 10: '  x: [[1, 2, -4.61], [1, 2, -4.0]]' }), code: 'anharmonic-duplicate-term', path: 'anharmonicity.x[1]', line: 10, at: '[1, 2, -4.0]' },
  { kind: 'a degenerate-mode g on a non-degenerate mode', yaml: edit(CO2, { 11: '  g: [[3, 3, -0.97]]' }), code: 'anharmonic-g-not-degenerate', path: 'anharmonicity.g[0][0]', line: 11, at: '3, 3', contains: ['mode 3 has degeneracy 1'] },
  { kind: 'alpha with the wrong count', yaml: edit(CO2, { 12: '  alpha: [[0.00120], [-0.00072]]' }), code: 'anharmonic-alpha-count', path: 'anharmonicity.alpha', line: 12, at: '[[' },
  { kind: 'alpha of the wrong shape', yaml: edit(CO2, { 12: '  alpha: [[0.00120], [-0.00072], [0.1, 0.2, 0.3]]' }), code: 'anharmonic-alpha-shape', path: 'anharmonicity.alpha[2]', line: 12, at: '[0.1' },
  { kind: 'a ladder falling at the first quantum', yaml: edit(CO2, { 10: '  x: [[1, 1, -900]]' }), code: 'anharmonic-ladder-turns-over', path: 'anharmonicity.x', line: 10, at: '[[' },
  { kind: 'alpha making B_v negative below the cut', yaml: edit(CO2, { 12: '  alpha: [[0.1], [0], [0]]' }), code: 'anharmonic-rotational-constant-not-positive', path: 'anharmonicity.alpha', line: 12, at: '[[' },
  { kind: 'Watson constants on a linear molecule', yaml: edit(CO2, { 13: 'centrifugal_distortion: {DJ: 1.333e-7, DK: 1e-3}' }), code: 'centrifugal-constant-not-linear', path: 'centrifugal_distortion.DK', line: 13, at: 'DK' },
  { kind: 'a centrifugal factor that goes negative', yaml: edit(CO2, { 13: 'centrifugal_distortion: {DJ: -1e-4}' }), code: 'centrifugal-correction-not-positive', path: 'centrifugal_distortion', line: 13, at: '{DJ' },
  { kind: 'dissociation_energy without anharmonicity', yaml: edit(H2O, {}, ['dissociation_energy: 41130']), code: 'dissociation-energy-without-anharmonicity', path: 'dissociation_energy', line: 9, at: 'dissociation_energy' },
  { kind: 'scale factor out of range', yaml: edit(H2O, {}, ['vibration_scale_factor: {value: 9.6, source: "typo"}']), code: 'vibration-scale-factor-out-of-range', path: 'vibration_scale_factor.value', line: 9, at: '9.6' },
  { kind: 'scale factor with anharmonic constants', yaml: edit(CO2, {}, ['vibration_scale_factor: {value: 0.97, source: "invented"}']), code: 'vibration-scale-factor-with-anharmonicity', path: 'vibration_scale_factor', line: 15, at: '{value', severity: 'warning' },
  {
    kind: 'too many levels for the direct sum',
    yaml: edit(H2O, { 2: 'composition: {C: 2, H: 4}', 8: `vibrations: [${Array.from({ length: 12 }, (_, i) => 300 + 10 * i).join(', ')}]` }, ['anharmonicity: {x: [[1, 1, -0.1]]}']),
    code: 'anharmonic-level-limit', path: 'anharmonicity', line: 9, at: '{x',
  },
  {
    kind: 'conformer names repeated', yaml: edit(H2O, { 6: null, 7: null, 8: null }, ['conformers:', '  - {name: a, energy: 0, symmetry_number: 2, rotational_constants: [27.88, 14.51, 9.28], vibrations: [3657, 1595, 3756]}', '  - {name: a, energy: 10, symmetry_number: 2, rotational_constants: [27.88, 14.51, 9.28], vibrations: [3657, 1595, 3756]}']),
    code: 'conformer-duplicate-name', path: 'conformers[1].name', line: 8, at: 'a, energy: 10',
  },
  {
    kind: 'no conformer at energy 0', yaml: edit(H2O, { 6: null, 7: null, 8: null }, ['conformers:', '  - {name: a, energy: 5, symmetry_number: 2, rotational_constants: [27.88, 14.51, 9.28], vibrations: [3657, 1595, 3756]}']),
    code: 'conformer-lowest-energy-not-zero', path: 'conformers[0].energy', line: 7, at: '5,',
  },
  {
    kind: 'conformers carrying a hindered rotor', severity: 'warning',
    yaml: edit(H2O, { 6: null, 7: null, 8: null }, ['conformers:', '  - {name: a, energy: 0, symmetry_number: 2, rotational_constants: [27.88, 14.51, 9.28], vibrations: [3657, 1595]}', '  - {name: b, energy: 10, symmetry_number: 2, rotational_constants: [27.88, 14.51, 9.28], vibrations: [3657, 1595], internal_rotors: [{barrier: 100, symmetry_number: 1, rotational_constant: 20}]}']),
    code: 'conformer-rotor-double-counting', path: 'conformers[1].internal_rotors', line: 8, at: 'internal_rotors',
  },
];

describe.each(CASES)('bad input: $kind', (c) => {
  it(`${c.code} at ${c.path}, line ${c.line}`, () => {
    const r = validate(c.yaml);
    const d = r.diagnostics.find((x) => x.code === c.code);
    expect(d, JSON.stringify(r.diagnostics, null, 1)).toBeDefined();
    expect(d!.severity).toBe(c.severity ?? 'error');
    expect(d!.file).toBe(FILE);
    expect(d!.path).toBe(c.path);
    expect(d!.line).toBe(c.line);
    if (c.at) expect(d!.column).toBe(c.yaml.split('\n')[c.line - 1]!.indexOf(c.at) + 1);
    for (const text of c.contains ?? []) expect(`${d!.message} ${d!.expected ?? ''}`).toContain(text);
    if ((c.severity ?? 'error') === 'error') expect(r.species).toBeUndefined();
  });
});
