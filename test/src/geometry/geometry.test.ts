/**
 * The geometry library against known answers: symmetry numbers from the point groups of published
 * structures (test/fixtures/geometries.ts names each; point groups and σ as in McQuarrie, Statistical
 * Mechanics (1976), Table 8-1), isotope masses of the AME as carried by `chemical-elements` (a maintained
 * npm library; ¹H 1.00782503223 u, ¹³C 13.00335483507 u, ²H 2.01410177812 u — AME2016, from memory),
 * rotational constants against the published equilibrium constants of H2O (A_e 27.88, B_e 14.51, C_e
 * 9.55 cm⁻¹, Hoy, Mills & Strey 1972, from memory) and the closed forms of simple rotors, and the reduced
 * moment of a torsion against its two-top closed form (symmetric tops on a common axis: I₁I₂/(I₁ + I₂),
 * Pitzer 1946).
 */
import { describe, expect, it } from 'vitest';
import {
  atomIdentity,
  atomsOf,
  compositionOf,
  GeometryError,
  rigidRotorOf,
  rotationalSymmetryNumber,
  torsionOf,
  type GeometryRow,
} from '../../../src/geometry/index.js';
import * as G from '../../fixtures/geometries.js';
import { rel } from '../../support/relative.js';

describe('rotational symmetry number from the geometry', () => {
  it.each([
    ['H2O (C2v)', G.water(), 2],
    ['NH3 (C3v)', G.ammonia(), 3],
    ['CH4 (Td)', G.methane(), 12],
    ['C2H6 staggered (D3d)', G.ethane(), 6],
    ['C6H6 (D6h)', G.benzene(), 12],
    ['CO2 (D∞h)', G.carbonDioxide(), 2],
    ['HCN (C∞v)', G.hydrogenCyanide(), 1],
    ['SF6 (Oh)', G.sulfurHexafluoride(), 24],
    ['CH3OH (Cs)', G.methanol(), 1],
  ] as const)('%s: sigma = %i', (_name, rows, sigma) => {
    expect(rotationalSymmetryNumber(atomsOf(rows))).toBe(sigma);
  });
  it('does not depend on where the molecule sits or how it is turned', () => {
    const turned: GeometryRow[] = G.methane().map(([s, x, y, z]) => {
      const c = Math.cos(0.7);
      const si = Math.sin(0.7);
      return [s, c * x - si * y + 3.1, si * x + c * y - 1.2, z + 0.4];
    });
    expect(rotationalSymmetryNumber(atomsOf(turned))).toBe(12);
  });
  it('an isotope breaks the symmetry: HDO has sigma 1, CH3D 3', () => {
    const hdo = G.water().map((r, i): GeometryRow => (i === 1 ? ['D', r[1], r[2], r[3]] : r));
    expect(rotationalSymmetryNumber(atomsOf(hdo))).toBe(1);
    const ch3d = G.methane().map((r, i): GeometryRow => (i === 1 ? ['D', r[1], r[2], r[3]] : r));
    expect(rotationalSymmetryNumber(atomsOf(ch3d))).toBe(3);
  });
  it('a distortion beyond the tolerance (0.02 angstrom) lowers it; one inside does not', () => {
    const moved = (d: number) => G.ammonia().map((r, i): GeometryRow => (i === 1 ? [r[0], r[1] + d, r[2], r[3]] : r));
    expect(rotationalSymmetryNumber(atomsOf(moved(0.005)))).toBe(3);
    expect(rotationalSymmetryNumber(atomsOf(moved(0.2)))).toBe(1);
  });
});

describe('isotopes and composition', () => {
  it('a bare symbol is the most abundant isotope; 13C, D, T, 2H as written', () => {
    expect(atomIdentity('H')).toEqual({ element: 'H', mass: 1.00782503223 });
    expect(atomIdentity('C').mass).toBe(12);
    expect(atomIdentity('13C')).toEqual({ element: 'C', mass: 13.00335483507 });
    expect(atomIdentity('D')).toEqual({ element: 'D', mass: 2.01410177812 });
    expect(atomIdentity('2H')).toEqual(atomIdentity('D'));
    expect(atomIdentity('T').element).toBe('T');
    expect(atomIdentity('S').mass).toBeCloseTo(31.97207, 5);
  });
  it('unknown symbols and elements without a stable isotope are refused with a code', () => {
    for (const s of ['Xx', '14Q', '99C', 'Tc']) {
      expect(() => atomIdentity(s)).toThrow(GeometryError);
    }
    expect(() => atomIdentity('99Tc')).not.toThrow();
  });
  it('counts D and T apart from H', () => {
    const rows: GeometryRow[] = [['C', 0, 0, 0], ['H', 1.09, 0, 0], ['D', -1.09, 0, 0], ['13C', 0, 1.5, 0]];
    expect(compositionOf(atomsOf(rows))).toEqual({ C: 2, H: 1, D: 1 });
  });
  it('coincident atoms are an error naming both', () => {
    try {
      atomsOf([['O', 0, 0, 0], ['H', 0.96, 0, 0], ['H', 0.96, 0.01, 0]]);
      expect.unreachable();
    } catch (e) {
      expect((e as GeometryError).code).toBe('geometry-coincident-atoms');
      expect((e as GeometryError).atoms).toEqual([1, 2]);
    }
  });
});

describe('rigid rotor from the geometry', () => {
  it('H2O r_e structure gives the equilibrium constants within 2 % (A_e 27.88, B_e 14.51, C_e 9.55 cm-1)', () => {
    const r = rigidRotorOf(atomsOf(G.water()));
    expect(r.linear).toBe(false);
    const [a, b, c] = r.rotationalConstants as [number, number, number];
    expect(rel(a, 27.88)).toBeLessThan(0.02);
    expect(rel(b, 14.51)).toBeLessThan(0.02);
    expect(rel(c, 9.55)).toBeLessThan(0.01);
    // Planar: I_C = I_A + I_B exactly, i.e. 1/C = 1/A + 1/B.
    expect(rel(1 / c, 1 / a + 1 / b)).toBeLessThan(1e-12);
  });
  it('CO2 is linear with B = h/(8π²c·2 m_O r²) (16.857629192 cm-1 per amu·Å², CODATA 2018)', () => {
    const r = rigidRotorOf(atomsOf(G.carbonDioxide()));
    expect(r.linear).toBe(true);
    expect(rel(r.rotationalConstants[0], 16.857629192 / (2 * 15.99491461957 * 1.16 * 1.16))).toBeLessThan(1e-8);
  });
  it('a spherical top (CH4, SF6) has A = B = C', () => {
    for (const rows of [G.methane(), G.sulfurHexafluoride()]) {
      const [a, b, c] = rigidRotorOf(atomsOf(rows)).rotationalConstants as [number, number, number];
      expect(rel(a, c)).toBeLessThan(1e-12);
      expect(rel(b, c)).toBeLessThan(1e-12);
    }
  });
});

describe('torsion: sides, top and reduced moment', () => {
  it('ethane: two equal coaxial tops give I_top/2 (Pitzer I(2,3) reduces to I1 I2/(I1 + I2)), rotor sigma 3', () => {
    const atoms = atomsOf(G.ethane());
    const t = torsionOf(atoms, 0, 1);
    const top = 3 * 1.00782503223 * (1.094 * Math.sin((68.83 * Math.PI) / 180)) ** 2;
    expect(rel(t.reducedMoment, top / 2)).toBeLessThan(1e-9);
    expect(rel(t.twoBodyMoment, t.reducedMoment)).toBeLessThan(1e-9);
    expect(t.symmetryNumber).toBe(3);
  });
  it('methanol: the same reduced moment whichever side turns; the smaller side (OH) by default', () => {
    const atoms = atomsOf(G.methanol());
    const a = torsionOf(atoms, 0, 1);
    const b = torsionOf(atoms, 1, 0, [0, 3, 4, 5]);
    expect(a.top).toEqual([1, 2]);
    expect(rel(a.reducedMoment, b.reducedMoment)).toBeLessThan(1e-12);
    expect(a.symmetryNumber).toBe(3);
  });
  it.each([
    ['atoms not bonded', () => torsionOf(atomsOf(G.methanol()), 2, 3), 'rotor-axis-not-bonded'],
    ['bond in a ring', () => torsionOf(atomsOf(G.benzene()), 0, 2), 'rotor-axis-in-ring'],
    ['top on both sides', () => torsionOf(atomsOf(G.ethane()), 0, 1, [2, 5]), 'rotor-top-both-sides'],
    ['top that is part of a side', () => torsionOf(atomsOf(G.ethane()), 0, 1, [2, 3]), 'rotor-top-incomplete'],
  ] as const)('%s: GeometryError %s', (_n, run, code) => {
    expect(run).toThrow(GeometryError);
    try {
      run();
    } catch (e) {
      expect((e as GeometryError).code).toBe(code);
    }
  });
});
