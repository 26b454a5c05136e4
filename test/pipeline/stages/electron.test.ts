/**
 * The free electron as a species, against NIST-JANAF 4th ed. (table "electron gas", values FROM MEMORY):
 * S°(298.15) = 20.979 J/(mol K), Cp° = 20.786 J/(mol K) (5/2 R) at every T, H°(298.15) − H°(0) = 6.197
 * kJ/mol (5/2 R·298.15) and ΔfH° = 0 at every T (the thermal-electron convention of
 * src/thermo/reference-states.ts). Also: the 80-column record lists the electron once, and E inside any
 * other composition is an error with its code. The YAML is written by hand.
 */
import { describe, expect, it } from 'vitest';
import { parseYamlText } from '../../../pipeline/stages/load.js';
import { validateSpecies } from '../../../pipeline/stages/validate.js';
import { recordElements } from '../../../pipeline/stages/emit.js';
import { ELECTRON_MASS_U } from '../../../src/constants.js';
import { createThermoEvaluator, standardProperties } from '../../../src/thermo/index.js';

const yaml = (lines: string[]) => parseYamlText(lines.join('\n') + '\n', 'species/e.yaml').documents[0]!;
const ELECTRON = [
  'name: e-',
  'composition: {E: 1}',
  'charge: -1',
  'enthalpy_of_formation: 0',
  'sources: ["thermal-electron convention (NIST-JANAF 4th ed.)"]',
  'structure: atom',
  'electronic_levels: [{energy: 0, degeneracy: 2}]',
];

describe('e- (NIST-JANAF 4th ed., from memory)', () => {
  const r = validateSpecies(yaml(ELECTRON));
  it('validates, with molar mass m_e (CODATA 2018)', () => {
    expect(r.diagnostics).toEqual([]);
    expect(r.species!.molarMass).toBe(ELECTRON_MASS_U);
  });
  it('S°(298.15) = 20.979 and Cp° = 20.786 J/(mol K) within 0.005; H298 − H0 = 6.197 kJ/mol', () => {
    const ev = createThermoEvaluator(r.species!);
    const p = standardProperties(ev, 298.15);
    expect(Math.abs(p.S - 20.979)).toBeLessThan(0.005);
    expect(Math.abs(p.Cp - 20.786)).toBeLessThan(0.005);
    expect(Math.abs(ev.h298MinusH0 / 1000 - 6.197)).toBeLessThan(0.0005);
    expect(Math.abs(standardProperties(ev, 3000).Cp - 20.786)).toBeLessThan(0.005);
  });
  it('ΔfH° given at 0 K stays 0 at 298.15 K (thermal-electron convention)', () => {
    const at0 = validateSpecies(yaml([...ELECTRON.slice(0, 3), 'enthalpy_of_formation: {value: 0, temperature: 0}', ...ELECTRON.slice(4)]));
    expect(Math.abs(createThermoEvaluator(at0.species!).enthalpyOfFormation298)).toBeLessThan(1e-9);
  });
  it('the 80-column record lists E 1 once', () => {
    expect(recordElements(r.species!)).toEqual([['E', 1]]);
  });
});

describe('E in other compositions', () => {
  it.each([
    ['an ion with E in its composition', ['name: O2-', 'composition: {O: 2, E: 1}', 'charge: -1'], 'electron-composition'],
    ['e- without its charge', ['name: e-', 'composition: {E: 1}', 'charge: 0'], 'electron-composition'],
  ])('%s: %s', (_kind, head, code) => {
    const lines = [...head, 'enthalpy_of_formation: 0', 'sources: ["hand-written test"]', 'structure: atom'];
    const r = validateSpecies(yaml(lines));
    const d = r.diagnostics.find((x) => x.code === code);
    expect(d?.path).toBe('composition.E');
    expect(d?.line).toBe(2);
    expect(r.species).toBeUndefined();
  });
  it('e- without spin degeneracy 2 draws a warning', () => {
    const r = validateSpecies(yaml(ELECTRON.slice(0, 6)));
    expect(r.diagnostics.map((d) => d.code)).toEqual(['electron-spin-degeneracy']);
  });
});
