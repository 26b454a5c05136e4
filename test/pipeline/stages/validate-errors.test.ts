/**
 * Table-driven bad input: each case is one kind of mistake, and each asserts the file, line, column, field
 * path and the content of the message (bad value and expectation).
 *
 * The valid bases use published constants: N2 X1Sigma_g+ from Huber & Herzberg (1979); O atom levels from
 * the NIST Atomic Spectra Database; H2O constants from memory (NIST CCCBDB). The mistakes are invented.
 */
import { describe, expect, it } from 'vitest';
import { formatDiagnostic, type Diagnostic } from '../../../pipeline/core/diagnostics.js';
import { parseYamlText } from '../../../pipeline/stages/load.js';
import { validateSpecies } from '../../../pipeline/stages/validate.js';
import { CO2_LINES } from '../../fixtures/input/co2.js';

type Edit = Record<number, string | null>;

function edit(base: readonly string[], changes: Edit = {}, extra: readonly string[] = []): string {
  const out = base.map((l, i) => (Object.hasOwn(changes, i + 1) ? changes[i + 1] : l)).filter((l): l is string => l !== null);
  return [...out, ...extra].join('\n') + '\n';
}

// Line numbers below refer to these bases (line 1 = first element).
const DIATOMIC = [
  'name: N2',
  'composition: {N: 2}',
  'enthalpy_of_formation: 0',
  'sources: ["Huber & Herzberg (1979)"]',
  'structure: diatomic',
  'symmetry_number: 2',
  'dissociation_energy: 78714',
  'electronic_states:',
  '  - {term: X, energy: 0, degeneracy: 1, we: 2358.57, wexe: 14.324, Be: 1.99824, alphae: 0.017318}',
];
/**
 * Line 9 of DIATOMIC with higher-order constants appended (`, He: ...`). N2's De = 5.76e-6 cm-1 is from
 * Huber & Herzberg (1979), from memory; the higher-order values of the cases are invented mistakes.
 */
const n2State = (extra: string) =>
  `  - {term: X, energy: 0, degeneracy: 1, we: 2358.57, wexe: 14.324, Be: 1.99824, alphae: 0.017318${extra}}`;
const NONLINEAR = [
  'name: H2O',
  'composition: {H: 2, O: 1}',
  'enthalpy_of_formation: -241.826',
  'sources: ["CODATA key values; constants from memory (NIST CCCBDB)"]',
  'structure: nonlinear',
  'symmetry_number: 2',
  'rotational_constants: [27.88, 14.51, 9.28]',
  'vibrations: [3657, 1595, 3756]',
];
const ATOM = [
  'name: O',
  'composition: {O: 1}',
  'enthalpy_of_formation: 249.18',
  'sources: ["NIST Atomic Spectra Database"]',
  'structure: atom',
  'electronic_levels: [{energy: 0, degeneracy: 5}, {energy: 158.265, degeneracy: 3}]',
];

interface Case {
  kind: string;
  yaml: string;
  line: number;
  /** The column is where this text starts on that line (omit to skip the column check). */
  at?: string;
  path: string;
  contains: string[];
  severity?: 'error' | 'warning';
}

const FILE = 'species/bad.yaml';

function diagnosticsOf(yaml: string): Diagnostic[] {
  const loaded = parseYamlText(yaml, FILE);
  return [...loaded.diagnostics, ...loaded.documents.flatMap((d) => validateSpecies(d).diagnostics)];
}

function columnOf(yaml: string, line: number, text: string): number {
  const l = yaml.split('\n')[line - 1]!;
  const i = l.indexOf(text);
  if (i < 0) throw new Error(`test setup: '${text}' not on line ${line}: ${l}`);
  return i + 1;
}

const ERRORS: Case[] = [
  { kind: 'YAML syntax error', yaml: edit(NONLINEAR, { 6: 'symmetry_number: 2: 3' }), line: 6, path: '', contains: ['YAML syntax error'] },
  { kind: 'duplicate key', yaml: edit(NONLINEAR, {}, ['symmetry_number: 2']), line: 9, at: 'symmetry_number', path: '', contains: ['duplicate key'] },
  {
    kind: 'unknown (misspelt) key', yaml: edit(NONLINEAR, { 8: 'vibration: [3657, 1595, 3756]' }), line: 8, at: 'vibration', path: 'vibration',
    contains: ["unknown key 'vibration'", "did you mean 'vibrations'", 'expected one of name, composition'],
  },
  {
    kind: 'wrong type', yaml: edit(NONLINEAR, { 8: 'vibrations: [3657, abc, 3756]' }), line: 8, at: 'abc', path: 'vibrations[1]',
    contains: ['wrong type: a text', 'got "abc"', 'expected a wavenumber > 0 in cm-1'],
  },
  {
    kind: 'non-positive wavenumber', yaml: edit(NONLINEAR, { 8: 'vibrations: [3657, {wavenumber: -1595}, 3756]' }), line: 8, at: '-1595',
    path: 'vibrations[1].wavenumber', contains: ['must be positive', 'got -1595', 'expected a value > 0'],
  },
  {
    kind: 'non-positive rotational constant', yaml: edit(NONLINEAR, { 7: 'rotational_constants: [27.88, 0, 9.28]' }), line: 7, at: '0,',
    path: 'rotational_constants[1]', contains: ['must be positive', 'got 0'],
  },
  {
    kind: 'unknown unit', yaml: edit(NONLINEAR, { 7: 'rotational_constants: [27.88, {value: 14.51, unit: cm^-1}, 9.28]' }), line: 7, at: 'cm^-1',
    path: 'rotational_constants[1].unit', contains: ['unknown unit', "did you mean 'cm-1'", 'got "cm^-1"', 'GHz'],
  },
  {
    kind: 'missing required field', yaml: edit(NONLINEAR, { 4: null }), line: 1, at: 'name', path: 'sources',
    contains: ["missing required field 'sources'", 'expected a non-empty list of texts'],
  },
  {
    kind: 'missing symmetry number', yaml: edit(NONLINEAR, { 6: null }), line: 1, path: 'symmetry_number',
    contains: ["missing required field 'symmetry_number'", "required for structure 'nonlinear'"],
  },
  {
    kind: 'unknown element', yaml: edit(NONLINEAR, { 2: 'composition: {H: 2, Q: 1}' }), line: 2, at: 'Q', path: 'composition.Q',
    contains: ["unknown element symbol 'Q'", 'IUPAC'],
  },
  {
    kind: 'element symbol in wrong case', yaml: edit(ATOM, { 1: 'name: Cl', 2: 'composition: {CL: 1}' }), line: 2, at: 'CL', path: 'composition.CL',
    contains: ["unknown element symbol 'CL'", "did you mean 'Cl'"],
  },
  {
    kind: 'wrong count of rotational constants', yaml: edit(NONLINEAR, { 7: 'rotational_constants: [27.88, 14.51]' }), line: 7, at: '[',
    path: 'rotational_constants', contains: ['takes 3 rotational constants, got 2', 'expected [A, B, C]'],
  },
  {
    kind: 'field of another structure', yaml: edit(DIATOMIC, {}, ['vibrations: [2358]']), line: 10, at: 'vibrations', path: 'vibrations',
    contains: ["field 'vibrations' does not apply to structure 'diatomic'"],
  },
  {
    kind: 'spin weights on a heteronuclear molecule',
    yaml: edit(DIATOMIC, { 1: 'name: CO', 2: 'composition: {C: 1, O: 1}', 6: 'symmetry_number: 1' }, ['nuclear_spin_weights: {even: 1, odd: 3}']),
    line: 10, at: 'nuclear_spin_weights', path: 'nuclear_spin_weights', contains: ['only to a homonuclear diatomic', 'got {"C":1,"O":1}'],
  },
  {
    kind: 'spin mixture without spin weights',
    yaml: edit(DIATOMIC, {}, ['nuclear_spin_mixture: frozen']), line: 10, at: 'nuclear_spin_mixture', path: 'nuclear_spin_mixture',
    contains: ['nuclear_spin_mixture needs nuclear_spin_weights', 'got "frozen"', 'expected nuclear_spin_weights {even, odd}'],
  },
  {
    kind: 'spin mixture not one of the two', yaml: edit(DIATOMIC, {}, ['nuclear_spin_weights: {even: 6, odd: 3}', 'nuclear_spin_mixture: normal']),
    line: 11, at: 'normal', path: 'nuclear_spin_mixture', contains: ['got "normal"', 'equilibrium', 'frozen'],
  },
  {
    kind: 'spin mixture on a non-diatomic', yaml: edit(NONLINEAR, {}, ['nuclear_spin_mixture: frozen']), line: 9, at: 'nuclear_spin_mixture',
    path: 'nuclear_spin_mixture', contains: ["'nuclear_spin_mixture' does not apply to structure 'nonlinear'"],
  },
  {
    kind: 'nuclear spin weights both zero', yaml: edit(DIATOMIC, {}, ['nuclear_spin_weights: {even: 0, odd: 0}']), line: 10, at: '{even',
    path: 'nuclear_spin_weights', contains: ['both 0'],
  },
  {
    // G(0) = 2358.57/2 - 14.324/4 = 1175.70 cm-1.
    kind: 'dissociation energy below the zero-point level', yaml: edit(DIATOMIC, { 7: 'dissociation_energy: 500' }), line: 7, at: '500',
    path: 'dissociation_energy', contains: ['D0 = 500 cm-1 is below the zero-point energy G(0) = 1175.7 cm-1', 'got 500', 'check the unit'],
  },
  {
    // B_v = 1.99824 - 0.5 (v + 1/2) is negative from v = 4 on, well below the dissociation limit.
    kind: 'rotational ladder that never rises (B_v <= 0)',
    yaml: edit(DIATOMIC, { 9: '  - {term: X, energy: 0, degeneracy: 1, we: 2358.57, wexe: 14.324, Be: 1.99824, alphae: 0.5}' }),
    line: 9, at: '0.5}', path: 'electronic_states[0].alphae', contains: ['at v = 4', 'would not rise', 'got 0.5'],
  },
  {
    kind: 'vibrational ladder that never reaches the limit',
    yaml: edit(DIATOMIC, { 9: '  - {term: X, energy: 0, degeneracy: 1, we: 2.35857, wexe: 0, Be: 1.99824}' }),
    line: 9, at: '2.35857', path: 'electronic_states[0].we', contains: ['never reach the dissociation limit', 'more than 1000 bound levels'],
  },
  {
    kind: 'vibrational ladder turning over at once',
    yaml: edit(DIATOMIC, { 9: '  - {term: X, energy: 0, degeneracy: 1, we: 2358.57, wexe: 1200, Be: 1.99824}' }),
    line: 9, at: '1200', path: 'electronic_states[0].wexe', contains: ['turn over before v = 1'],
  },
  {
    kind: 'excited state above the dissociation limit',
    yaml: edit(DIATOMIC, {}, ['  - {term: A, energy: 90000, degeneracy: 2, we: 1460, Be: 1.6}']),
    line: 10, at: '90000', path: 'electronic_states[1].energy', contains: ["state 'A' lies entirely above the dissociation limit", 'got 90000'],
  },
  {
    kind: 'ground state not first',
    yaml: edit(DIATOMIC, { 9: '  - {term: A, energy: 50000, degeneracy: 2, we: 1460, Be: 1.6}' }),
    line: 9, at: '50000', path: 'electronic_states[0].energy', contains: ['first electronic state must be the ground state at energy 0'],
  },
  {
    kind: 'ground electronic level not at 0', yaml: edit(ATOM, { 6: 'electronic_levels: [{energy: 10, degeneracy: 5}, {energy: 158.265, degeneracy: 3}]' }),
    line: 6, at: '10,', path: 'electronic_levels[0].energy', contains: ['lowest electronic level is at 10 cm-1, not at 0'],
  },
  {
    kind: 'diatomic with 3 atoms', yaml: edit(DIATOMIC, { 2: 'composition: {N: 3}' }), line: 2, at: '{N', path: 'composition',
    contains: ['exactly 2 atoms', 'has 3', 'got {"N":3}'],
  },
  { kind: 'atom with 2 atoms', yaml: edit(ATOM, { 2: 'composition: {O: 2}' }), line: 2, at: '{O', path: 'composition', contains: ['exactly 1 atom'] },
  {
    kind: 'nonlinear with 2 atoms', yaml: edit(NONLINEAR, { 2: 'composition: {H: 1, O: 1}' }), line: 2, at: '{H', path: 'composition',
    contains: ['at least 3 atoms'],
  },
  {
    kind: 'charge leaving a negative electron count',
    yaml: edit(ATOM, { 1: 'name: H', 2: 'composition: {H: 1}', 6: 'electronic_levels: [{energy: 0, degeneracy: 2}]' }, ['charge: 2']),
    line: 7, at: '2', path: 'charge', contains: ['would leave -1 electrons', 'at most +1'],
  },
  {
    kind: 'invalid record name', yaml: edit(ATOM, { 1: 'name: O atom!' }), line: 1, at: 'O atom!', path: 'name',
    contains: ['wrong form', 'got "O atom!"', '1-16 characters'],
  },
  {
    // A 16-character name with a bad character: only the character-set message, no length complaint.
    kind: 'invalid record name of the right length', yaml: edit(ATOM, { 1: 'name: "ABCDEFGHIJKLMNO!"' }), line: 1, at: '"ABC', path: 'name',
    contains: ['wrong form', 'from A-Z a-z 0-9'],
  },
  {
    kind: 'name that is a keyword of the 80-column file', yaml: edit(ATOM, { 1: 'name: end' }), line: 1, at: 'end', path: 'name',
    contains: ["'end' is a keyword of the 80-column thermo file"],
  },
  {
    // 17 characters: one more than the name field (columns 1-16) of the NASA published 80-column record.
    kind: 'record name too long', yaml: edit(ATOM, { 1: 'name: ABCDEFGHIJKLMNOPQ' }), line: 1, at: 'ABCDEFGHIJKLMNOPQ', path: 'name',
    contains: ['too long: 17 characters', 'got "ABCDEFGHIJKLMNOPQ"', 'at most 16 characters', '1-16 characters', '80-column record'],
  },
  { kind: 'empty record name', yaml: edit(ATOM, { 1: 'name: ""' }), line: 1, at: '""', path: 'name', contains: ['too short: 0 characters'] },
  { kind: 'name of dots only', yaml: edit(ATOM, { 1: 'name: ".."' }), line: 1, at: '".."', path: 'name', contains: ['only of dots'] },
  {
    kind: 'misspelt structure', yaml: edit(ATOM, { 5: 'structure: atomic' }), line: 5, at: 'atomic', path: 'structure',
    contains: ["did you mean 'atom'", 'one of atom, diatomic, linear, nonlinear'],
  },
  {
    kind: 'enthalpy at an unsupported temperature', yaml: edit(ATOM, { 3: 'enthalpy_of_formation: {value: 249.18, temperature: 300}' }), line: 3,
    at: '300', path: 'enthalpy_of_formation.temperature', contains: ['got 300', 'one of 298.15, 0'],
  },
  { kind: 'empty sources', yaml: edit(ATOM, { 4: 'sources: []' }), line: 4, at: '[]', path: 'sources', contains: ['too few items (0)', 'at least 1 item'] },
  {
    kind: 'temperature ranges out of order', yaml: edit(ATOM, {}, ['temperature_ranges: {low: 1000, mid: 500}']), line: 7, at: '500',
    path: 'temperature_ranges.mid', contains: ['mid (500 K) must be above low (1000 K)'],
  },
  {
    kind: 'rotational constants and moments of inertia together', yaml: edit(NONLINEAR, {}, ['moments_of_inertia: [0.6, 1.2, 1.8]']), line: 9,
    at: 'moments_of_inertia', path: 'moments_of_inertia', contains: ['either rotational_constants or moments_of_inertia, not both'],
  },
  {
    kind: 'linear molecule with symmetry number 3',
    yaml: edit(NONLINEAR, { 1: 'name: CO2', 2: 'composition: {C: 1, O: 2}', 5: 'structure: linear', 6: 'symmetry_number: 3', 7: 'rotational_constants: [0.39021]', 8: 'vibrations: [1333, {wavenumber: 667, degeneracy: 2}, 2349]' }),
    line: 6, at: '3', path: 'symmetry_number', contains: ['symmetry number 1 or 2, not 3'],
  },
  {
    kind: 'empty value', yaml: edit(NONLINEAR, { 8: 'vibrations:' }), line: 8, at: 'vibrations', path: 'vibrations',
    contains: ['wrong type: null (empty value)', 'a non-empty list of vibrations'],
  },
  {
    kind: 'infinite number', yaml: edit(NONLINEAR, { 7: 'rotational_constants: [.inf, 14.51, 9.28]' }), line: 7, at: '.inf',
    path: 'rotational_constants[0]', contains: ['wrong type: not a finite number (Infinity)', 'got "Infinity"'],
  },
  {
    kind: 'tag that would construct code', yaml: edit(ATOM, { 3: 'enthalpy_of_formation: !!js/function "function () { return 1 }"' }), line: 3,
    at: '!!js/function', path: '', contains: ['Unresolved tag', 'js/function', 'no tags that construct objects or run code'],
  },
  {
    kind: 'document that is not a mapping', yaml: 'just a string\n', line: 1, at: 'just', path: '', contains: ['wrong type: a text', 'expected a mapping'],
  },
  // Higher-order level constants (weze, gammae, betae, He).
  {
    kind: 'higher-order constant in an unknown unit', yaml: edit(DIATOMIC, { 9: n2State(', gammae: {value: -1e-5, unit: cm^-1}') }), line: 9,
    at: 'cm^-1', path: 'electronic_states[0].gammae.unit', contains: ['unknown unit', 'got "cm^-1"', 'MHz'],
  },
  {
    // He is a rotational-type constant (MHz allowed, see the warnings); an inertia unit is not.
    kind: 'sextic constant in a unit of inertia', yaml: edit(DIATOMIC, { 9: n2State(', De: 5.76e-6, He: {value: 5, unit: amu*angstrom^2}') }), line: 9,
    at: 'amu*angstrom^2', path: 'electronic_states[0].He.unit', contains: ['unknown unit', 'got "amu*angstrom^2"'],
  },
  {
    // weze belongs to G(v): energy units only, no MHz.
    kind: 'vibrational constant weze in a rotational unit', yaml: edit(DIATOMIC, { 9: n2State(', weze: {value: 3, unit: MHz}') }), line: 9,
    at: 'MHz', path: 'electronic_states[0].weze.unit', contains: ['unknown unit', 'got "MHz"', 'kcal/mol'],
  },
  {
    kind: 'sextic constant as text', yaml: edit(DIATOMIC, { 9: n2State(', De: 5.76e-6, He: "5e-12"') }), line: 9, at: '"5e-12"',
    path: 'electronic_states[0].He', contains: ['wrong type', 'got "5e-12"'],
  },
  {
    kind: 'higher-order constant misspelt', yaml: edit(DIATOMIC, { 9: n2State(', De: 5.76e-6, Hee: 5e-12') }), line: 9, at: 'Hee',
    path: 'electronic_states[0].Hee', contains: ["unknown key 'Hee'", "did you mean 'He'"],
  },
  {
    // D_0 = 5.76e-6 - 2e-5/2 < 0: impossible for the lowest vibrational level.
    kind: 'betae making D_0 negative', yaml: edit(DIATOMIC, { 9: n2State(', De: 5.76e-6, betae: -2e-5') }), line: 9, at: '-2e-5',
    path: 'electronic_states[0].betae', contains: ['D_0 = De + betae/2 = -0.00000424 cm-1 is negative', 'got -0.00002', 'betae >= -0.00001152 cm-1'],
  },
  {
    // B_v = 1.99824 - 0.017318 h - 0.01 h^2 falls below 0 at v = 13 (h = 13.5); the linear part is still positive.
    kind: 'gammae making B_v <= 0 at a bound level', yaml: edit(DIATOMIC, { 9: n2State(', gammae: -0.01') }), line: 9, at: '-0.01',
    path: 'electronic_states[0].gammae', contains: ['+ gammae(v+1/2)^2 is', 'at v = 13', 'would not rise', 'got -0.01'],
  },
  {
    // 2B - 4D + 8H = 3.979 - 8 < 0: the J = 1 level of v = 0 would lie below J = 0.
    kind: 'negative He so large that the J ladder never rises', yaml: edit(DIATOMIC, { 9: n2State(', De: 5.76e-6, He: -1') }), line: 9, at: '-1}',
    path: 'electronic_states[0].He', contains: ['E(v,1) <= E(v,0) at v = 0', 'would not rise', 'got -1'],
  },
  {
    // A wavenumber beyond the plausibility bound (pipeline/stages/plausibility.ts) is an error, not a warning.
    kind: 'wavenumber in the wrong unit', yaml: edit(NONLINEAR, { 8: 'vibrations: [365700, 1595, 3756]' }), line: 8, at: '365700',
    path: 'vibrations[0]', contains: ['outside the plausible range', '[wavenumber-out-of-bounds]'],
  },
];

const WARNINGS: Case[] = [
  {
    kind: 'rotational constants not A >= B >= C', yaml: edit(NONLINEAR, { 7: 'rotational_constants: [9.28, 14.51, 27.88]' }), line: 7, at: '[',
    path: 'rotational_constants', contains: ['not in the order A >= B >= C'],
  },
  {
    kind: 'vibration count not 3N-6', yaml: edit(NONLINEAR, { 8: 'vibrations: [3657, 1595]' }), line: 8, at: '[', path: 'vibrations',
    contains: ['2 vibrational modes', 'has 3 (3N-6)'],
  },
  {
    kind: 'linear vibration count not 3N-5',
    yaml: edit(NONLINEAR, { 1: 'name: CO2', 2: 'composition: {C: 1, O: 2}', 5: 'structure: linear', 7: 'rotational_constants: [0.39021]', 8: 'vibrations: [1333, 667, 2349]' }),
    line: 8, at: '[', path: 'vibrations', contains: ['3 vibrational modes', 'has 4 (3N-5)'],
  },
  {
    kind: 'negative anharmonicity',
    yaml: edit(DIATOMIC, { 9: '  - {term: X, energy: 0, degeneracy: 1, we: 2358.57, wexe: -14.324, Be: 1.99824}' }),
    line: 9, at: '-14.324', path: 'electronic_states[0].wexe', contains: ['negative anharmonicity'],
  },
  { kind: 'unusual symmetry number', yaml: edit(DIATOMIC, { 6: 'symmetry_number: 1' }), line: 6, at: '1', path: 'symmetry_number', contains: ['usually has symmetry number 2'] },
  {
    kind: 'symmetry number without equivalent atoms', yaml: edit(NONLINEAR, { 1: 'name: HOCl', 2: 'composition: {H: 1, O: 1, Cl: 1}' }), line: 6, at: '2',
    path: 'symmetry_number', contains: ['no two atoms of the same element'],
  },
  { kind: 'name starting with END', yaml: edit(ATOM, { 1: 'name: ENDO' }), line: 1, at: 'ENDO', path: 'name', contains: ['may be read as the END line'] },
  { kind: 'source that says nothing', yaml: edit(ATOM, { 4: 'sources: [TODO]' }), line: 4, at: 'TODO', path: 'sources[0]', contains: ['does not say where'] },
  {
    kind: 'enthalpy given at 0 K', yaml: edit(ATOM, { 3: 'enthalpy_of_formation: {value: 246.79, temperature: 0}' }), line: 3, at: '0}',
    path: 'enthalpy_of_formation.temperature', contains: ['given at 0 K'],
  },
  {
    kind: 'implausibly large centrifugal distortion',
    yaml: edit(DIATOMIC, { 9: '  - {term: X, energy: 0, degeneracy: 1, we: 2358.57, wexe: 14.324, Be: 1.99824, De: 0.5}' }),
    line: 9, at: '0.5', path: 'electronic_states[0].De', contains: ['more than 1% of Be'],
  },
  // Higher-order level constants (weze, gammae, betae, He); values invented, N2 base from Huber & Herzberg (1979).
  {
    kind: 'gammae out of proportion to alphae', yaml: edit(DIATOMIC, { 9: n2State(', gammae: 0.01') }), line: 9, at: '0.01}',
    path: 'electronic_states[0].gammae', contains: ['|gammae| = 0.01 cm-1 is more than 0.25 of alphae = 0.017318 cm-1', 'check the unit'],
  },
  {
    kind: 'betae out of proportion to De', yaml: edit(DIATOMIC, { 9: n2State(', De: 5.76e-6, betae: 5e-6') }), line: 9, at: '5e-6}',
    path: 'electronic_states[0].betae', contains: ['|betae| = 0.000005 cm-1 is more than 0.25 of De = 0.00000576 cm-1'],
  },
  {
    kind: 'betae without De', yaml: edit(DIATOMIC, { 9: n2State(', betae: 1e-8') }), line: 9, at: '1e-8',
    path: 'electronic_states[0].betae', contains: ['is given but De is 0'],
  },
  {
    kind: 'weze out of proportion to wexe', yaml: edit(DIATOMIC, { 9: n2State(', weze: 5') }), line: 9, at: '5}',
    path: 'electronic_states[0].weze', contains: ['more than 0.25 of wexe = 14.324 cm-1'],
  },
  {
    // Herzberg's (1950) estimate (2De/(3we^2))(12Be^2 - alphae we) is +4.88e-12 cm-1 for these constants (our arithmetic).
    kind: 'He of the other sign from the estimate (sign convention)', yaml: edit(DIATOMIC, { 9: n2State(', De: 5.76e-6, He: -5e-12') }), line: 9,
    at: '-5e-12', path: 'electronic_states[0].He', contains: ['of the other sign from the estimate', '4.88', 'check the sign and the unit'],
  },
  {
    // 5e-12 cm-1 typed as MHz-sized number: 150 MHz = 0.005 cm-1, a factor of 1e9 too large.
    kind: 'He far from the estimate (unit)', yaml: edit(DIATOMIC, { 9: n2State(', De: 5.76e-6, He: {value: 150, unit: MHz}') }), line: 9,
    at: '{value: 150', path: 'electronic_states[0].He', contains: ['more than a factor of 10 away from the estimate'],
  },
  {
    kind: 'He without De', yaml: edit(DIATOMIC, { 9: n2State(', He: 5e-12') }), line: 9, at: '5e-12', path: 'electronic_states[0].He',
    contains: ['is given but De is 0'],
  },
  {
    // B_v/(2 D_v) = 1.99/2e-4: the v = 0 ladder turns over near 9900 cm-1, far below D0 = 78714 cm-1 (H2 without He is like this).
    kind: 'J ladder turning over far below the limit', yaml: edit(DIATOMIC, { 9: n2State(', De: 1e-4') }), line: 9, at: '1e-4',
    path: 'electronic_states[0].De', contains: ['the J ladder of v = 0', 'turns over at J = 99', 'the sextic constant He'],
  },
  {
    // With He < 0 the ladder always turns over; here near J = 154 and 30600 cm-1, far below the limit.
    kind: 'negative He turning the J ladder over early', yaml: edit(DIATOMIC, { 9: n2State(', De: 5.76e-6, He: -1e-9') }), line: 9,
    at: '-1e-9', path: 'electronic_states[0].He', contains: ['the J ladder of v = 0', 'turns over', 'He from the tables'],
  },
  {
    // D_v = 5.76e-6 - 1e-6 (v + 1/2) < 0 from v = 6, below the limit; |betae|/De = 0.17 draws no ratio warning.
    kind: 'betae making D_v negative at a higher bound level', yaml: edit(DIATOMIC, { 9: n2State(', De: 5.76e-6, betae: -1e-6') }), line: 9,
    at: '-1e-6', path: 'electronic_states[0].betae', contains: ['D_v = De + betae(v+1/2) is', 'at v = 6', 'extrapolated'],
  },
];

function assertCase(c: Case, severity: 'error' | 'warning'): void {
  const ds = diagnosticsOf(c.yaml);
  const match = ds.find((d) => d.severity === severity && d.path === c.path && c.contains.every((s) => formatDiagnostic(d).includes(s)));
  if (!match) throw new Error(`no ${severity} at '${c.path}' containing ${JSON.stringify(c.contains)}; got:\n${ds.map(formatDiagnostic).join('\n')}`);
  expect(match.file).toBe(FILE);
  expect(match.line).toBe(c.line);
  if (c.at !== undefined) expect(match.column).toBe(columnOf(c.yaml, c.line, c.at));
  // The formatted line starts with file:line(:col) so editors can jump to it.
  expect(formatDiagnostic(match).startsWith(`${FILE}:${c.line}`)).toBe(true);
}

describe('bad species input: errors', () => {
  it('covers at least 14 kinds', () => expect(ERRORS.length).toBeGreaterThanOrEqual(14));
  it.each(ERRORS.map((c) => [c.kind, c] as const))('%s', (_kind, c) => {
    assertCase(c, 'error');
    const loaded = parseYamlText(c.yaml, FILE);
    for (const doc of loaded.documents) expect(validateSpecies(doc).species).toBeUndefined();
  });
});

describe('suspicious but legal input: warnings', () => {
  it.each(WARNINGS.map((c) => [c.kind, c] as const))('%s', (_kind, c) => {
    assertCase(c, 'warning');
    const loaded = parseYamlText(c.yaml, FILE);
    const r = validateSpecies(loaded.documents[0]!);
    expect(r.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    expect(r.species).toBeDefined();
  });
});

describe('all errors at once', () => {
  it('reports every mistake of one document, schema and physics together', () => {
    const yaml = edit(NONLINEAR, {
      2: 'composition: {H: 2, Qq: 1}',
      4: 'source: [x]',
      7: 'rotational_constants: [27.88, -14.51]',
      8: 'vibrations: [3657, {wavenumber: 1595, degeneracy: 0}, 3756]',
    });
    const ds = diagnosticsOf(yaml).filter((d) => d.severity === 'error');
    const paths = ds.map((d) => d.path).sort();
    expect(paths).toEqual(
      ['composition.Qq', 'rotational_constants', 'rotational_constants[1]', 'source', 'sources', 'vibrations[1].degeneracy'].sort(),
    );
  });

  it('reports the errors of every document of a file, not only the first', () => {
    const yaml = `${edit(ATOM, { 2: 'composition: {O: 2}' })}---\n${edit(ATOM, { 1: 'name: O2x', 5: 'structure: atomic' })}`;
    const loaded = parseYamlText(yaml, FILE);
    expect(loaded.documents).toHaveLength(2);
    const [a, b] = loaded.documents.map((d) => validateSpecies(d).diagnostics);
    expect(a!.some((d) => d.path === 'composition' && d.line === 2)).toBe(true);
    expect(b!.some((d) => d.path === 'structure' && d.line === 12)).toBe(true);
  });

  it('keeps reading the other documents of a file when one has a syntax error', () => {
    const yaml = `${edit(ATOM, { 6: 'electronic_levels: [{energy: 0, degeneracy: 5}' })}---\n${edit(ATOM, { 1: 'name: O2x' })}`;
    const loaded = parseYamlText(yaml, FILE);
    expect(loaded.diagnostics.some((d) => d.severity === 'error' && (d.line ?? 0) <= 7)).toBe(true);
    expect(loaded.documents.map((d) => (d.value as { name: string }).name)).toEqual(['O2x']);
  });
});

describe('a malformed quantity or vibration item gives one error at the item', () => {
  // CO2 (test/fixtures/input/co2.ts). Only line 8 (vibrations) or 7 (rotational constants) is varied.
  const CO2 = [...CO2_LINES];
  const VIBRATION_FORMS = 'a wavenumber > 0 in cm-1, {value, unit}, or {wavenumber, degeneracy}';
  const bad: Array<{ item: string; path: string; contains: string[] }> = [
    { item: '{value: 1333}', path: 'vibrations[0]', contains: ['not an accepted form', VIBRATION_FORMS] },
    { item: '{value: 1333, unit: cm-1, degeneracy: 1}', path: 'vibrations[0]', contains: ['not an accepted form', VIBRATION_FORMS, '{wavenumber: {value: 667, unit: cm-1}, degeneracy: 2}'] },
    { item: '{wavenumber: 1333, unit: cm-1}', path: 'vibrations[0]', contains: ['not an accepted form', VIBRATION_FORMS] },
    { item: '{}', path: 'vibrations[0]', contains: ['not an accepted form', VIBRATION_FORMS] },
    { item: '[1333]', path: 'vibrations[0]', contains: ['wrong type: a list', VIBRATION_FORMS] },
    { item: '{value: 1333, unit: cm1}', path: 'vibrations[0].unit', contains: ["unknown unit (did you mean 'cm-1'?)"] },
    { item: '{value: 0, unit: cm-1}', path: 'vibrations[0].value', contains: ['must be positive'] },
    { item: '{wavenumber: {value: 1333}}', path: 'vibrations[0].wavenumber.unit', contains: ["missing required field 'unit'", 'expected one of cm-1, eV'] },
    { item: '{wavenumber: {value: 1333, unit: cm-1}, degeneracy: 0}', path: 'vibrations[0].degeneracy', contains: ['too small'] },
    { item: '{wavenumber: {value: 1333, unt: cm-1}}', path: 'vibrations[0].wavenumber', contains: ["not an accepted form: missing 'unit'; unknown key 'unt' (did you mean 'unit'?)"] },
  ];
  it.each(bad.map((c) => [c.item, c] as const))('vibration %s', (_item, c) => {
    const yaml = edit(CO2, { 8: `vibrations: [${c.item}, {wavenumber: 667, degeneracy: 2}, 2349]` });
    const errors = diagnosticsOf(yaml).filter((d) => d.severity === 'error');
    expect(errors.map(formatDiagnostic)).toHaveLength(1);
    const [e] = errors;
    expect(e!.path).toBe(c.path);
    expect(e!.line).toBe(8);
    for (const s of c.contains) expect(formatDiagnostic(e!)).toContain(s);
  });

  it.each([
    ['rotational_constants', 7, 'rotational_constants: [{B: 0.39021}]', 'rotational_constants[0]', "missing 'value', 'unit'; unknown key 'B'"],
    ['moments_of_inertia', 7, 'moments_of_inertia: [{value: 43.1, units: amu*angstrom^2}]', 'moments_of_inertia[0]', "missing 'unit'; unknown key 'units' (did you mean 'unit'?)"],
    ['electronic level energy', 9, 'electronic_levels: [{energy: {val: 0, units: cm-1}, degeneracy: 1}]', 'electronic_levels[0].energy', "missing 'value', 'unit'"],
  ] as const)('%s item in a wrong form', (_what, line, text, path, contains) => {
    const yaml = line === 9 ? edit(CO2, {}, [text]) : edit(CO2, { 7: text });
    const errors = diagnosticsOf(yaml).filter((d) => d.severity === 'error');
    expect(errors.map(formatDiagnostic)).toHaveLength(1);
    expect(errors[0]!.path).toBe(path);
    expect(errors[0]!.line).toBe(line);
    expect(formatDiagnostic(errors[0]!)).toContain(contains);
    expect(formatDiagnostic(errors[0]!)).toContain('not an accepted form');
  });

  it('a diatomic constant in a wrong form: one error at the constant', () => {
    const yaml = edit(DIATOMIC, { 9: '  - {term: X, energy: 0, degeneracy: 1, we: {val: 2358.57, u: cm-1}, wexe: 14.324, Be: 1.99824, alphae: 0.017318}' });
    const errors = diagnosticsOf(yaml).filter((d) => d.severity === 'error');
    expect(errors.map(formatDiagnostic)).toHaveLength(1);
    expect(errors[0]!.path).toBe('electronic_states[0].we');
    expect(formatDiagnostic(errors[0]!)).toContain("missing 'value', 'unit'");
  });

  it('a quantity missing only its unit names the accepted units', () => {
    const yaml = edit(CO2, { 7: 'rotational_constants: [{value: 0.39021}]' });
    const errors = diagnosticsOf(yaml).filter((d) => d.severity === 'error');
    expect(errors).toHaveLength(1);
    expect(formatDiagnostic(errors[0]!)).toContain("missing required field 'unit' (expected one of cm-1, eV, K, J/mol, kJ/mol, kcal/mol, MHz, GHz)");
  });
});

describe('record name length', () => {
  it('a 17-character name of accepted characters gets the length message only', () => {
    const errors = diagnosticsOf(edit(ATOM, { 1: 'name: ABCDEFGHIJKLMNOPQ' })).filter((d) => d.severity === 'error');
    expect(errors.map(formatDiagnostic)).toEqual([
      'species/bad.yaml:1:7: error: [ABCDEFGHIJKLMNOPQ] name: too long: 17 characters (got "ABCDEFGHIJKLMNOPQ"; expected at most 16 characters: 1-16 characters from A-Z a-z 0-9 ( ) + * , . _ - (the name field of the 80-column record)) [too-long]',
    ]);
  });
});
