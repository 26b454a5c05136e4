/**
 * Anharmonic polyatomics against NIST-JANAF 4th ed. (Chase 1998; CO2 C-095 and H2O H-064 rows FROM MEMORY,
 * see test/fixtures/anharmonic-species.ts for them and for the sources of the molecular constants).
 *
 * Targets: CO2 with published ω_i, x_ij, g_22 (Chedin 1979, from memory) within 0.15 J/(mol K) in Cp° and
 * 0.1 in S° at 1000, 2000 and 3000 K; rigid-rotor harmonic is about 0.64 and 1.12 low in Cp at 2000 and
 * 3000 K. H2O with x_ij (Benedict, Gailar & Plyler 1956), α_i and Watson-A quartic constants (from memory):
 * the deviation from JANAF at 2000 and 3000 K at least halves against rigid-rotor harmonic, in Cp and S.
 * Measured (J/(mol K), model − JANAF): CO2 anharmonic Cp −0.005/+0.021/+0.060, S −0.027/−0.022/−0.006
 * at 1000/2000/3000 K (RRHO Cp −0.157/−0.641/−1.115, S −0.022/−0.280/−0.628). H2O anharmonic Cp
 * +0.079/+0.441, S −0.023/+0.068 at 2000/3000 K (RRHO Cp −0.972/−1.706, S −0.659/−1.197); x_ij alone:
 * Cp −0.262/−0.165, S −0.399/−0.496 (halves Cp, not S at 2000 K).
 */
import { describe, expect, it } from 'vitest';
import type { Species } from '../../../src/model.js';
import { createThermoEvaluator, standardProperties } from '../../../src/thermo/index.js';
import { CO2_ANHARMONIC, H2O_ANHARMONIC, JANAF_CO2_FROM_MEMORY, JANAF_H2O_FROM_MEMORY } from '../../fixtures/anharmonic-species.js';
import { CARBON_DIOXIDE, WATER } from '../../fixtures/physics-species.js';

const deviation = (species: Species, ref: Readonly<Record<number, readonly [number, number]>>, T: number) => {
  const p = standardProperties(createThermoEvaluator(species), T);
  return { cp: p.Cp - ref[T]![0], s: p.S - ref[T]![1] };
};

describe('CO2, anharmonic direct sum (Chedin 1979 constants, from memory) vs NIST-JANAF 4th ed. (from memory)', () => {
  it.each([1000, 2000, 3000])('at %s K: |ΔCp| < 0.15 and |ΔS| < 0.1 J/(mol K)', (T) => {
    const d = deviation(CO2_ANHARMONIC, JANAF_CO2_FROM_MEMORY, T);
    expect(Math.abs(d.cp)).toBeLessThan(0.15);
    expect(Math.abs(d.s)).toBeLessThan(0.1);
  });
  it('rigid-rotor harmonic is about 0.64 and 1.12 low in Cp at 2000 and 3000 K (the issue figures)', () => {
    expect(deviation(CARBON_DIOXIDE, JANAF_CO2_FROM_MEMORY, 2000).cp).toBeCloseTo(-0.64, 1);
    expect(deviation(CARBON_DIOXIDE, JANAF_CO2_FROM_MEMORY, 3000).cp).toBeCloseTo(-1.12, 1);
  });
});

describe('H2O, anharmonic direct sum (BGP 1956 x_ij, alpha, Watson A; from memory) vs NIST-JANAF 4th ed. (from memory)', () => {
  it.each([2000, 3000])('at %s K the deviation at least halves against RRHO, in Cp and in S', (T) => {
    const anh = deviation(H2O_ANHARMONIC, JANAF_H2O_FROM_MEMORY, T);
    const rrho = deviation(WATER, JANAF_H2O_FROM_MEMORY, T);
    expect(Math.abs(anh.cp)).toBeLessThanOrEqual(0.5 * Math.abs(rrho.cp));
    expect(Math.abs(anh.s)).toBeLessThanOrEqual(0.5 * Math.abs(rrho.s));
  });
  it('x_ij alone halves Cp but not S at 2000 K (as the issue reports for an independent implementation)', () => {
    const xOnly: Species = { ...H2O_ANHARMONIC, anharmonicity: { x: H2O_ANHARMONIC.anharmonicity!.x, g: [] } };
    delete (xOnly as { centrifugalDistortion?: unknown }).centrifugalDistortion;
    const anh = deviation(xOnly, JANAF_H2O_FROM_MEMORY, 2000);
    const rrho = deviation(WATER, JANAF_H2O_FROM_MEMORY, 2000);
    expect(Math.abs(anh.cp)).toBeLessThanOrEqual(0.5 * Math.abs(rrho.cp));
    expect(Math.abs(anh.s)).toBeGreaterThan(0.5 * Math.abs(rrho.s));
  });
});
