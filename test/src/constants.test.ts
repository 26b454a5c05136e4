/**
 * Pins every constant to its CODATA 2018 value (Tiesinga et al., Rev. Mod. Phys. 93, 025010 (2021)) and
 * cross-checks against mathjs, an independent general-purpose library that ships CODATA 2018.
 */
import * as math from 'mathjs';
import { describe, expect, it } from 'vitest';
import {
  ATOMIC_MASS_CONSTANT,
  AVOGADRO,
  BOLTZMANN,
  C2_CM_K,
  ELECTRON_MASS_U,
  ELEMENTARY_CHARGE,
  GAS_CONSTANT,
  PLANCK,
  SPEED_OF_LIGHT,
  STANDARD_PRESSURE_ATM,
  STANDARD_PRESSURE_BAR,
  T_REF,
} from '../../src/constants.js';
import { rel } from '../support/relative.js';

/** mathjs physical constants are Units; `.value` is the SI value. */
function si(name: keyof typeof math): number {
  return (math[name] as unknown as { value: number }).value;
}

describe('CODATA 2018 constants (exact in the 2019 SI)', () => {
  it('pins the defining constants', () => {
    expect(PLANCK).toBe(6.62607015e-34); // CODATA 2018, exact
    expect(BOLTZMANN).toBe(1.380649e-23); // CODATA 2018, exact
    expect(SPEED_OF_LIGHT).toBe(299792458); // CODATA 2018, exact
    expect(AVOGADRO).toBe(6.02214076e23); // CODATA 2018, exact
    expect(ELEMENTARY_CHARGE).toBe(1.602176634e-19); // CODATA 2018, exact
  });

  it('pins the derived and measured constants', () => {
    // CODATA 2018: R = 8.314 462 618... J/(mol K) (exact, = N_A k)
    expect(GAS_CONSTANT).toBeCloseTo(8.314462618, 9);
    // CODATA 2018: c2 = 1.438 776 877... e-2 m K (exact; next digits 5039) = 1.438776877 cm K
    expect(Math.abs(C2_CM_K - 1.438776877)).toBeLessThan(1e-9);
    expect(C2_CM_K).toBeCloseTo(1.4387768775039, 12);
    // CODATA 2018: m_u = 1.660 539 066 60(50) e-27 kg
    expect(ATOMIC_MASS_CONSTANT).toBe(1.6605390666e-27);
    // CODATA 2018: m_e = 5.485 799 090 65(16) e-4 u
    expect(ELECTRON_MASS_U).toBe(5.48579909065e-4);
    expect(STANDARD_PRESSURE_BAR).toBe(1e5); // IUPAC standard pressure, 1 bar
    expect(STANDARD_PRESSURE_ATM).toBe(101325); // standard atmosphere (exact by definition)
    expect(T_REF).toBe(298.15);
  });

  it('agrees with mathjs (CODATA 2018)', () => {
        expect(rel(PLANCK, si('planckConstant'))).toBeLessThan(1e-15);
    expect(rel(BOLTZMANN, si('boltzmann'))).toBeLessThan(1e-15);
    expect(rel(SPEED_OF_LIGHT, si('speedOfLight'))).toBeLessThan(1e-15);
    expect(rel(AVOGADRO, si('avogadro'))).toBeLessThan(1e-15);
    expect(rel(ELEMENTARY_CHARGE, si('elementaryCharge'))).toBeLessThan(1e-15);
    expect(rel(GAS_CONSTANT, si('gasConstant'))).toBeLessThan(1e-14);
    expect(rel(ATOMIC_MASS_CONSTANT, si('atomicMass'))).toBeLessThan(1e-15);
    expect(rel(ELECTRON_MASS_U, si('electronMass') / si('atomicMass'))).toBeLessThan(1e-10);
    // mathjs gives c2 in m K; ours is in cm K
    expect(rel(C2_CM_K, si('secondRadiation') * 100)).toBeLessThan(1e-14);
  });
});
