/**
 * Rigid-rotor harmonic-oscillator polyatomics, sanity against NIST-JANAF 4th ed. (values from memory):
 * H2O S°(298.15) = 188.834 J/(mol K), CO2 S°(298.15) = 213.795 J/(mol K); Cp°(298.15) H2O 33.590,
 * CO2 37.129 J/(mol K). Molecular constants from memory (Herzberg, Molecular Spectra and Molecular
 * Structure II). RRHO neglects anharmonicity, centrifugal distortion and rotation–vibration coupling,
 * so agreement at 298 K is expected to ~0.1–0.2 J/(mol K) (common practice).
 */
import { describe, expect, it } from 'vitest';
import { createThermoEvaluator, standardProperties } from '../../../src/thermo/index.js';
import { CARBON_DIOXIDE, WATER } from '../../fixtures/physics-species.js';

describe('nonlinear polyatomic: H2O (RRHO)', () => {
  const p = standardProperties(createThermoEvaluator(WATER), 298.15);
  it('S°(298.15) ≈ 188.83 J/(mol K) (NIST-JANAF, from memory; measured −0.115)', () => {
    expect(Math.abs(p.S - 188.834)).toBeLessThan(0.2);
  });
  it('Cp°(298.15) ≈ 33.59 J/(mol K) (NIST-JANAF, from memory)', () => {
    expect(Math.abs(p.Cp - 33.59)).toBeLessThan(0.2);
  });
});

describe('linear polyatomic: CO2 (RRHO, direct J sum)', () => {
  const p = standardProperties(createThermoEvaluator(CARBON_DIOXIDE), 298.15);
  it('S°(298.15) ≈ 213.79 J/(mol K) (NIST-JANAF, from memory)', () => {
    expect(Math.abs(p.S - 213.795)).toBeLessThan(0.2);
  });
  it('Cp°(298.15) ≈ 37.13 J/(mol K) (NIST-JANAF, from memory)', () => {
    expect(Math.abs(p.Cp - 37.129)).toBeLessThan(0.2);
  });
});
