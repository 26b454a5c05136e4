/**
 * Internal thermodynamic consistency: the moments must satisfy Cp = dH/dT and Cp/T = dS/dT (exact, published
 * thermodynamic identities at constant p, e.g. McQuarrie, Statistical Mechanics (1976), ch. 1), checked by
 * central finite differences of the evaluator's own outputs. The physics itself never differentiates.
 */
import { describe, expect, it } from 'vitest';
import { GAS_CONSTANT } from '../../../src/constants.js';
import type { Species } from '../../../src/model.js';
import { createThermoEvaluator } from '../../../src/thermo/index.js';
import { CO2_ANHARMONIC, H2O_ANHARMONIC, H2O_CENTRIFUGAL_ONLY, TWO_CONFORMERS } from '../../fixtures/anharmonic-species.js';
import { CARBON_DIOXIDE, EXCERPT_SPECIES, WATER } from '../../fixtures/physics-species.js';

const SPECIES: ReadonlyArray<readonly [string, Species]> = [
  ...EXCERPT_SPECIES,
  ['H2O', WATER],
  ['CO2', CARBON_DIOXIDE],
  ['CO2 anharmonic (x, g, alpha, D_J)', CO2_ANHARMONIC],
  ['H2O anharmonic (x, alpha, Watson A)', H2O_ANHARMONIC],
  ['H2O RRHO with the centrifugal factor only', H2O_CENTRIFUGAL_ONLY],
  ['two conformers', TWO_CONFORMERS],
];
const TEMPERATURES = [200, 298.15, 1000, 3000, 6000];

describe.each(SPECIES)('%s: Cp = dH/dT and Cp/T = dS/dT', (_name, species) => {
  const ev = createThermoEvaluator(species);
  const H = (T: number) => GAS_CONSTANT * T * ev.at(T).hmh0;
  const S = (T: number) => GAS_CONSTANT * ev.at(T).s;
  it.each(TEMPERATURES)('at %s K', (T) => {
    const h = 1e-4 * T;
    const cp = GAS_CONSTANT * ev.at(T).cp;
    const dH = (H(T + h) - H(T - h)) / (2 * h);
    const dS = (S(T + h) - S(T - h)) / (2 * h);
    expect(Math.abs(dH / cp - 1)).toBeLessThan(1e-6);
    expect(Math.abs((dS * T) / cp - 1)).toBeLessThan(1e-6);
  });
});
