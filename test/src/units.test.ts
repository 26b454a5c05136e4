/**
 * Unit conversions against CODATA 2018 energy-equivalence values (NIST CODATA "energy conversion factors")
 * and textbook relations.
 */
import { describe, expect, it } from 'vitest';
import {
  convertQuantity,
  ENERGY_UNITS_TO_CM1,
  ENTHALPY_UNITS_TO_J_PER_MOL,
  INERTIA_UNITS_TO_KG_M2,
  rotationalConstantFromInertia,
  ROTATIONAL_UNITS_TO_CM1,
  UnknownUnitError,
} from '../../src/units.js';
import { rel } from '../support/relative.js';


describe('energy units (CODATA 2018 conversion factors)', () => {
  it('1 eV = 8065.543937 cm-1 (CODATA 2018, exact in the 2019 SI)', () => {
    expect(rel(ENERGY_UNITS_TO_CM1['eV']!, 8065.543937)).toBeLessThan(1e-9);
  });
  it('1 kJ/mol = 83.5934722 cm-1 (CODATA 2018)', () => {
    expect(rel(ENERGY_UNITS_TO_CM1['kJ/mol']!, 83.5934722)).toBeLessThan(1e-8);
  });
  it('1 K = 0.6950348 cm-1 (CODATA 2018, k/(hc) = 69.503480 m-1 K-1)', () => {
    expect(rel(ENERGY_UNITS_TO_CM1['K']!, 0.6950348)).toBeLessThan(1e-7);
  });
  it('1 kcal/mol = 4.184 kJ/mol (thermochemical calorie, exact by definition)', () => {
    expect(rel(ENERGY_UNITS_TO_CM1['kcal/mol']!, 4.184 * ENERGY_UNITS_TO_CM1['kJ/mol']!)).toBeLessThan(1e-15);
    expect(ENTHALPY_UNITS_TO_J_PER_MOL['kcal/mol']).toBe(4184);
  });
  it('1 eV per particle = 96.4853321 kJ/mol (CODATA 2018, Faraday constant)', () => {
    expect(rel(ENTHALPY_UNITS_TO_J_PER_MOL['eV']!, 96485.33212)).toBeLessThan(1e-9);
  });
  it('cm-1 to J/mol inverts kJ/mol to cm-1', () => {
    expect(rel(ENTHALPY_UNITS_TO_J_PER_MOL['cm-1']! * ENERGY_UNITS_TO_CM1['kJ/mol']!, 1000)).toBeLessThan(1e-14);
  });
});

describe('rotational units', () => {
  it('1 GHz = 1/29.9792458 cm-1 (c exact)', () => {
    expect(rel(ROTATIONAL_UNITS_TO_CM1['GHz']!, 1 / 29.9792458)).toBeLessThan(1e-15);
    expect(rel(ROTATIONAL_UNITS_TO_CM1['MHz']!, 1e-3 / 29.9792458)).toBeLessThan(1e-15);
  });
  it('B = h/(8π²cI): I = 1 amu Å² gives B = 16.857629 cm-1 (published conversion factor, CODATA 2018)', () => {
    const b = rotationalConstantFromInertia(INERTIA_UNITS_TO_KG_M2['amu*angstrom^2']!);
    expect(rel(b, 16.857629)).toBeLessThan(1e-6);
  });
  it('CO: I ≈ 8.729 amu Å² ↔ Be ≈ 1.931 cm-1 (Huber & Herzberg 1979 Be, from memory)', () => {
    const b = rotationalConstantFromInertia(8.7291 * INERTIA_UNITS_TO_KG_M2['amu*angstrom^2']!);
    expect(b).toBeCloseTo(1.9312, 3);
  });
});

describe('convertQuantity', () => {
  it('takes bare numbers in the default unit and {value, unit} in the given unit', () => {
    expect(convertQuantity(2, ENERGY_UNITS_TO_CM1, 'cm-1')).toBe(2);
    expect(convertQuantity({ value: 1, unit: 'eV' }, ENERGY_UNITS_TO_CM1, 'cm-1')).toBeCloseTo(8065.543937, 5);
  });
  it('rejects an unknown unit naming the accepted ones', () => {
    expect(() => convertQuantity({ value: 1, unit: 'erg' }, ENERGY_UNITS_TO_CM1, 'cm-1')).toThrow(UnknownUnitError);
    expect(() => convertQuantity({ value: 1, unit: 'erg' }, ENERGY_UNITS_TO_CM1, 'cm-1')).toThrow(/expected one of .*eV/);
  });
});
