/**
 * Molar masses against IUPAC standard atomic weights (CIAAW 2021 abridged/conventional values, from memory
 * to the digits used here).
 */
import { describe, expect, it } from 'vitest';
import { ELECTRON_MASS_U } from '../../src/constants.js';
import { atomicWeight, isKnownElement, molarMass } from '../../src/elements.js';

describe('atomic weights (IUPAC)', () => {
  it.each([
    ['H', 1.008],
    ['C', 12.011],
    ['N', 14.007],
    ['O', 15.999],
  ])('%s ≈ %f (IUPAC abridged standard atomic weight)', (symbol, value) => {
    expect(Math.abs(atomicWeight(symbol) - value)).toBeLessThan(0.002);
  });
  it.each([
    ['Ar', 39.948],
    ['Cl', 35.453],
    ['S', 32.065],
  ])('%s ≈ %f (IUPAC 2007 standard atomic weight, before intervals were adopted)', (symbol, value) => {
    expect(Math.abs(atomicWeight(symbol) - value)).toBeLessThan(0.001);
  });
  it('D and T are the isotopic masses 2.014102 and 3.016049 u (AME, published)', () => {
    expect(atomicWeight('D')).toBeCloseTo(2.014102, 5);
    expect(atomicWeight('T')).toBeCloseTo(3.016049, 5);
  });
  it('knows real elements and rejects made-up ones', () => {
    expect(isKnownElement('Xe')).toBe(true);
    expect(isKnownElement('Xx')).toBe(false);
    expect(() => atomicWeight('Xx')).toThrow(/unknown element/);
  });
});

describe('molar masses (IUPAC standard atomic weights)', () => {
  it('N2 = 28.0134 g/mol, H2O = 18.015 g/mol, CO = 28.010 g/mol', () => {
    expect(molarMass({ N: 2 })).toBeCloseTo(28.0134, 3);
    expect(molarMass({ H: 2, O: 1 })).toBeCloseTo(18.015, 3);
    expect(molarMass({ C: 1, O: 1 })).toBeCloseTo(28.010, 3);
  });
  it('a cation weighs one electron mass less per charge (CODATA 2018 electron mass)', () => {
    const n2 = molarMass({ N: 2 });
    expect(molarMass({ N: 2 }, 1)).toBeCloseTo(n2 - ELECTRON_MASS_U, 12);
    expect(molarMass({ O: 1 }, -1)).toBeCloseTo(molarMass({ O: 1 }) + ELECTRON_MASS_U, 12);
  });
});
