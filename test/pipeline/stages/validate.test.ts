/**
 * Good input: whole documents through load + validate, with units converted and defaults filled.
 *
 * Expected conversion factors are typed here from CODATA 2018 (NIST SP 961, exact SI defining constants
 * h, c, k, e, N_A; m_u measured), independently of src/constants.ts:
 *   1 eV/(hc)        = 8065.543937349 cm-1      (CODATA 2018 energy conversion table)
 *   k/(hc)           = 0.6950348004861 cm-1/K    (CODATA 2018)
 *   1 kJ/mol /(N_A hc) = 83.593472291 cm-1
 *   1 GHz / c        = 0.0333564095198 cm-1      (c exact)
 *   h/(8 pi^2 c m_u 1e-20 m^2) = 16.857629192 cm-1 amu angstrom^2  (derived from CODATA 2018 h, c, m_u)
 *   1 kcal/mol = 4184 J/mol (thermochemical calorie, NIST SP 811).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseYamlText } from '../../../pipeline/stages/load.js';
import { checkUniqueNames, findDuplicateNames, validateSpecies, validateSpeciesSet } from '../../../pipeline/stages/validate.js';
import type { AtomSpecies, DiatomicSpecies, LinearSpecies, NonlinearSpecies } from '../../../src/model.js';
import { CO2_LINES } from '../../fixtures/input/co2.js';

const EV_CM1 = 8065.543937349212;
const K_CM1 = 0.6950348004861275;
const KJMOL_CM1 = 83.59347229111778;
const GHZ_CM1 = 0.03335640951981521;
const INERTIA_B = 16.85762919164018;

const fixture = (name: string) => readFileSync(new URL(`../../fixtures/input/${name}`, import.meta.url), 'utf8');

function validateFixture(name: string) {
  const loaded = parseYamlText(fixture(name), name);
  expect(loaded.diagnostics).toEqual([]);
  return loaded.documents.map((d) => {
    const r = validateSpecies(d);
    expect(r.diagnostics.filter((x) => x.severity === 'error')).toEqual([]);
    return r;
  });
}

describe('validateSpecies on good input', () => {
  it('normalises N2 (Huber & Herzberg 1979 constants) with defaults and molar mass', () => {
    const [r] = validateFixture('n2.yaml');
    const n2 = r!.species as DiatomicSpecies;
    expect(r!.diagnostics).toEqual([]);
    expect(n2.structure).toBe('diatomic');
    expect(n2.charge).toBe(0);
    expect(n2.symmetryNumber).toBe(2);
    expect(n2.dissociationEnergy).toBe(78714);
    expect(n2.electronicStates[0]).toEqual({
      term: 'X1Sigma_g+', energy: 0, degeneracy: 1, we: 2358.57, wexe: 14.324, weye: -0.00226, Be: 1.99824, alphae: 0.017318, De: 5.76e-6,
    });
    // IUPAC standard atomic weight of N: 14.007 (interval [14.00643, 14.00728]).
    expect(n2.molarMass).toBeGreaterThan(2 * 14.00643);
    expect(n2.molarMass).toBeLessThan(2 * 14.00728);
    expect(n2.enthalpyOfFormation).toEqual({ value: 0, temperature: 298.15 });
  });

  it('reads one species per --- document and skips an empty trailing document', () => {
    const rs = validateFixture('multi.yaml');
    expect(rs.map((r) => r.species?.name)).toEqual(['Ar', 'O', 'N2']);
    const ar = rs[0]!.species as AtomSpecies;
    expect(ar.electronicLevels).toEqual([{ energy: 0, degeneracy: 1 }]); // default
    const o = rs[1]!.species as AtomSpecies;
    // NIST ASD O I levels, cm-1.
    expect(o.electronicLevels.map((l) => [l.energy, l.degeneracy, l.term])).toEqual([
      [0, 5, '3P2'], [158.265, 3, '3P1'], [226.977, 1, '3P0'], [15867.862, 5, '1D2'],
    ]);
    expect(o.enthalpyOfFormation.value).toBeCloseTo(249180, 6);
    const n2 = rs[2]!.species as DiatomicSpecies;
    expect(n2.electronicStates[0]).toMatchObject({ weye: 0, alphae: 0, De: 0 }); // defaults
  });

  it('reads a top-level list as one species per item, with GHz converted', () => {
    const rs = validateFixture('list.yaml');
    const h2o = rs[0]!.species as NonlinearSpecies;
    const ocs = rs[1]!.species as LinearSpecies;
    expect(h2o.rotationalConstants).toEqual([27.88, 14.51, 9.28]);
    expect(h2o.vibrations).toEqual([
      { wavenumber: 3657, degeneracy: 1 }, { wavenumber: 1595, degeneracy: 1 }, { wavenumber: 3756, degeneracy: 1 },
    ]);
    expect(h2o.electronicLevels).toEqual([{ energy: 0, degeneracy: 1 }]);
    expect(ocs.rotationalConstants[0]).toBeCloseTo(6.08149 * GHZ_CM1, 12);
    expect(ocs.vibrations[1]).toEqual({ wavenumber: 520, degeneracy: 2 });
    expect(ocs.enthalpyOfFormation).toEqual({ value: -138410, temperature: 298.15 });
  });

  it('converts eV, kcal/mol, K, kJ/mol, MHz, GHz and amu*angstrom^2 (CODATA 2018 factors)', () => {
    const rs = validateFixture('units.yaml');
    const x = rs[0]!.species as DiatomicSpecies;
    expect(x.dissociationEnergy / (9.759 * EV_CM1)).toBeCloseTo(1, 12);
    expect(x.enthalpyOfFormation.value).toBeCloseTo(-57.798 * 4184, 6);
    const [xs, as] = x.electronicStates;
    expect(xs!.Be / (59.9056 * GHZ_CM1)).toBeCloseTo(1, 12);
    expect(xs!.alphae / (519.2e-3 * GHZ_CM1)).toBeCloseTo(1, 12);
    expect(as!.energy / (1000 * K_CM1)).toBeCloseTo(1, 12);
    expect(as!.dissociationEnergy! / (300 * KJMOL_CM1)).toBeCloseTo(1, 12);

    const y = rs[1]!.species as NonlinearSpecies;
    // kg m^2 → amu angstrom^2 with m_u = 1.66053906660e-27 kg (CODATA 2018).
    const iC = 1.8e-47 / (1.6605390666e-27 * 1e-20);
    const expected = [INERTIA_B / 0.6, INERTIA_B / 1.2, INERTIA_B / iC].sort((a, b) => b - a);
    y.rotationalConstants.forEach((b, i) => expect(b / expected[i]!).toBeCloseTo(1, 10));
    expect(y.electronicLevels[1]!.energy / EV_CM1).toBeCloseTo(1, 12);
    expect(y.vibrations[0]!.wavenumber / (10 * KJMOL_CM1)).toBeCloseTo(1, 12);
    expect(y.enthalpyOfFormation).toEqual({ value: -241826, temperature: 0 });
    expect(y.temperatureRanges).toEqual({ low: 300, high: 5000 });
    // The 0 K enthalpy is legal but flagged.
    expect(rs[1]!.diagnostics.some((d) => d.severity === 'warning' && /0 K/.test(d.message))).toBe(true);
  });

  it('gives a canonical, key-sorted normalised input that ignores key order and unit spelling', () => {
    const a = parseYamlText(fixture('n2.yaml'), 'a.yaml').documents[0]!;
    const b = parseYamlText(
      `structure: diatomic
symmetry_number: 2
electronic_states:
  - {De: 5.76e-6, alphae: 0.017318, Be: 1.99824, weye: -0.00226, wexe: 14.324, we: 2358.57, degeneracy: 1, energy: 0, term: "X1Sigma_g+"}
dissociation_energy: {value: 78714, unit: cm-1}
sources: ["spectroscopic constants: Huber & Herzberg (1979)", "D0: Huber & Herzberg (1979)"]
enthalpy_of_formation: 0
composition: {N: 2}
name: N2
`,
      'b.yaml',
    ).documents[0]!;
    const ra = validateSpecies(a);
    const rb = validateSpecies(b);
    expect(JSON.stringify(rb.normalisedInput)).toBe(JSON.stringify(ra.normalisedInput));
    const keys = Object.keys(ra.normalisedInput as object);
    expect(keys).toEqual([...keys].sort());
  });

  it('fills nuclear_spin_mixture (default equilibrium) only with spin weights, so the hash states it', () => {
    // H2 X1Sigma_g+ constants: Huber & Herzberg (1979), from memory; 1:3 para:ortho (textbook nuclear spin statistics).
    // He estimated from Herzberg's (1950) relation (our arithmetic): without it the J ladders turn over early (a warning).
    const h2 = (extra: string) =>
      validateSpecies(
        parseYamlText(
          `name: H2
composition: {H: 2}
enthalpy_of_formation: 0
sources: ["Huber & Herzberg (1979), from memory"]
structure: diatomic
symmetry_number: 2
nuclear_spin_weights: {even: 1, odd: 3}
${extra}
dissociation_energy: 36118.1
electronic_states:
  - {term: X, energy: 0, degeneracy: 1, we: 4401.21, wexe: 121.33, Be: 60.853, alphae: 3.062, De: 0.0471, He: 5.02e-5}
`,
          'h2.yaml',
        ).documents[0]!,
      );
    const omitted = h2('');
    const explicit = h2('nuclear_spin_mixture: equilibrium');
    const frozen = h2('nuclear_spin_mixture: frozen');
    for (const r of [omitted, explicit, frozen]) expect(r.diagnostics).toEqual([]);
    expect((omitted.species as DiatomicSpecies).nuclearSpinMixture).toBe('equilibrium');
    expect((frozen.species as DiatomicSpecies).nuclearSpinMixture).toBe('frozen');
    expect(omitted.normalisedInput).toHaveProperty('nuclearSpinMixture', 'equilibrium');
    expect(JSON.stringify(explicit.normalisedInput)).toBe(JSON.stringify(omitted.normalisedInput));
    expect(JSON.stringify(frozen.normalisedInput)).not.toBe(JSON.stringify(omitted.normalisedInput));
    // Without spin weights there is no mixture to state.
    const [n2] = validateFixture('n2.yaml');
    expect(n2!.normalisedInput).not.toHaveProperty('nuclearSpinMixture');
  });

  it('keeps non-zero higher-order constants (units converted) and omits zeros, so explicit 0 hashes like absent', () => {
    // N2 X1Sigma_g+: Huber & Herzberg (1979), from memory; the higher-order values are invented for this test.
    const n2 = (extra: string) =>
      validateSpecies(
        parseYamlText(
          `name: N2
composition: {N: 2}
enthalpy_of_formation: 0
sources: ["Huber & Herzberg (1979), from memory"]
structure: diatomic
symmetry_number: 2
dissociation_energy: 78714
electronic_states:
  - {term: X, energy: 0, degeneracy: 1, we: 2358.57, wexe: 14.324, weye: -0.00226, Be: 1.99824, alphae: 0.017318, De: 5.76e-6${extra}}
`,
          'n2.yaml',
        ).documents[0]!,
      );
    const plain = n2('');
    const zeros = n2(', weze: 0, gammae: 0, betae: {value: 0, unit: MHz}, He: 0');
    // He = 1.5e-7 MHz = 5.0e-12 cm-1, near Herzberg's (1950) estimate 4.88e-12 cm-1 for these constants (our arithmetic).
    const given = n2(', weze: 0.001, gammae: -3e-5, betae: 1e-8, He: {value: 1.5e-7, unit: MHz}');
    for (const r of [plain, zeros, given]) expect(r.diagnostics).toEqual([]);
    expect(JSON.stringify(zeros.normalisedInput)).toBe(JSON.stringify(plain.normalisedInput));
    expect((zeros.species as DiatomicSpecies).electronicStates[0]).not.toHaveProperty('He');
    const state = (given.species as DiatomicSpecies).electronicStates[0]!;
    expect(state.weze).toBe(0.001);
    expect(state.gammae).toBe(-3e-5);
    expect(state.betae).toBe(1e-8);
    expect(state.He! / ((1.5e-7 * GHZ_CM1) / 1000) - 1).toBeCloseTo(0, 14); // MHz = GHz/1000, factor above
    expect(JSON.stringify(given.normalisedInput)).not.toBe(JSON.stringify(plain.normalisedInput));
  });

  it('fills charge and corrects the molar mass of a cation for the missing electron', () => {
    const doc = parseYamlText(
      `name: Ar+
composition: {Ar: 1}
charge: 1
enthalpy_of_formation: 1526.8
sources: ["invented for this test"]
structure: atom
electronic_levels: [{energy: 0, degeneracy: 4}, {energy: 1431.58, degeneracy: 2}]
`,
      'ion.yaml',
    ).documents[0]!;
    const ion = validateSpecies(doc).species!;
    const neutral = validateFixture('multi.yaml')[0]!.species!;
    // Electron mass 5.48579909065e-4 u (CODATA 2018).
    expect(neutral.molarMass - ion.molarMass).toBeCloseTo(5.48579909065e-4, 12);
  });
});

describe('names across a database', () => {
  it('reports a duplicate name with both files and lines, and drops the later species', () => {
    const a = parseYamlText(fixture('n2.yaml'), 'a/n2.yaml').documents;
    const b = parseYamlText(fixture('multi.yaml'), 'b/multi.yaml').documents;
    const dups = findDuplicateNames([...b, ...a]);
    expect(dups).toHaveLength(1);
    expect(dups[0]).toMatchObject({ severity: 'error', file: 'b/multi.yaml', line: 19, column: 7, path: 'name', species: 'N2' });
    expect(dups[0]!.message).toContain("already defined at a/n2.yaml:2");
    const set = validateSpeciesSet([...a, ...b]);
    expect(set.diagnostics).toHaveLength(1);
    expect(set.results.filter((r) => r.species?.name === 'N2')).toHaveLength(1);
  });

  it('warns about names that differ only in case', () => {
    const docs = parseYamlText(
      `- {name: OH, composition: {O: 1}, enthalpy_of_formation: 0, sources: [invented for this test], structure: atom}
- {name: oh, composition: {O: 1}, enthalpy_of_formation: 0, sources: [invented for this test], structure: atom}
`,
      'case.yaml',
    ).documents;
    expect(findDuplicateNames(docs)).toEqual([]);
    const all = checkUniqueNames(docs);
    expect(all).toHaveLength(1);
    expect(all[0]).toMatchObject({ severity: 'warning', line: 2 });
  });
});

describe('vibration forms', () => {
  // CO2 (test/fixtures/input/co2.ts) with its vibrations line replaced.
  const co2 = (vibrations: string) => [...CO2_LINES.slice(0, 7), `vibrations: ${vibrations}`].join('\n');
  const normalised = (vibrations: string) => {
    const r = validateSpecies(parseYamlText(co2(vibrations), 'co2.yaml').documents[0]!);
    expect(r.diagnostics).toEqual([]);
    return r;
  };
  const EXPECTED = [
    { wavenumber: 1333, degeneracy: 1 },
    { wavenumber: 667, degeneracy: 2 },
    { wavenumber: 2349, degeneracy: 1 },
  ];

  it('bare, {value, unit} and {wavenumber, degeneracy} give the same normalised species', () => {
    const forms = [
      '[1333, {wavenumber: 667, degeneracy: 2}, 2349]',
      '[{value: 1333, unit: cm-1}, {wavenumber: {value: 667, unit: cm-1}, degeneracy: 2}, {value: 2349, unit: cm-1}]',
      '[{wavenumber: 1333}, {wavenumber: 667, degeneracy: 2}, {wavenumber: {value: 2349, unit: cm-1}, degeneracy: 1}]',
      '[{wavenumber: {value: 1333, unit: cm-1}}, {degeneracy: 2, wavenumber: 667}, {unit: cm-1, value: 2349}]',
    ];
    const results = forms.map(normalised);
    for (const r of results) expect((r.species as LinearSpecies).vibrations).toEqual(EXPECTED);
    // Same canonical form, so the same cache hash whatever the spelling.
    for (const r of results) expect(JSON.stringify(r.normalisedInput)).toBe(JSON.stringify(results[0]!.normalisedInput));
  });

  it('a {value, unit} vibration in another unit is converted (CODATA 2018 factors typed above)', () => {
    const r = normalised(`[{value: ${1333 / EV_CM1}, unit: eV}, {wavenumber: {value: ${667 / K_CM1}, unit: K}, degeneracy: 2}, {value: ${2349 / KJMOL_CM1}, unit: kJ/mol}]`);
    const vs = (r.species as LinearSpecies).vibrations;
    expect(vs.map((v) => v.degeneracy)).toEqual([1, 2, 1]);
    vs.forEach((v, i) => expect(v.wavenumber).toBeCloseTo(EXPECTED[i]!.wavenumber, 6));
  });
});
