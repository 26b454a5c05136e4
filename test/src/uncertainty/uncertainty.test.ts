/**
 * Sensitivities and propagated uncertainties.
 * Test species are hand-written (water-like constants, not a reference record); the checks are against
 * closed forms: the harmonic-oscillator heat capacity (McQuarrie, Statistical Mechanics, 1976, ch. 8)
 * differentiated symbolically by mathjs, and the Sackur–Tetrode entropy (same source, ch. 5), whose mass
 * derivative is ∂S/∂M = (3/2)R/M.
 */
import { derivative } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { C2_CM_K, GAS_CONSTANT, T_REF } from '../../../src/constants.js';
import type { NonlinearSpecies, Species } from '../../../src/model.js';
import {
  centralDifference,
  harmonicWavenumberDerivatives,
  propagateUncertainty,
  sensitivities,
  uncertainInputs,
} from '../../../src/uncertainty/index.js';

const R = GAS_CONSTANT;
const physics = { standardPressure: 1e5 };

/** Hand-written nonlinear species with one vibration (values chosen for the test, water-like). */
function oneOscillator(wavenumber = 1594.6): NonlinearSpecies {
  return {
    name: 'X1',
    composition: { H: 2, O: 1 },
    charge: 0,
    molarMass: 18.015,
    enthalpyOfFormation: { value: -241826, temperature: 298.15 },
    sources: ['hand-written test data'],
    structure: 'nonlinear',
    symmetryNumber: 2,
    electronicLevels: [{ energy: 0, degeneracy: 1 }],
    rotationalConstants: [27.88, 14.51, 9.28],
    vibrations: [{ wavenumber, degeneracy: 1 }],
    uncertainties: { vibrationsRelative: 0.01 },
  };
}

/** Hand-written water-like species with three vibrations and several uncertain inputs. */
function waterLike(): NonlinearSpecies {
  return {
    ...oneOscillator(),
    vibrations: [
      { wavenumber: 3657.1, degeneracy: 1 },
      { wavenumber: 1594.7, degeneracy: 1 },
      { wavenumber: 3755.9, degeneracy: 1 },
    ],
    uncertainties: { vibrationsRelative: 0.004, rotationalConstantsRelative: 0.002, enthalpyOfFormation: 400, scaleFactorRelative: 0.003 },
  };
}

describe('single harmonic oscillator', () => {
  // d/dx of the Einstein heat capacity x² eˣ/(eˣ−1)², derived by mathjs (independent of our hand derivation).
  const dEinstein = derivative('x^2 * exp(x) / (exp(x) - 1)^2', 'x');
  for (const T of [200, 298.15, 1000, 3000]) {
    it(`dCp/dν̃ at ${T} K matches the closed form (mathjs derivative) and the pipeline's central difference`, () => {
      const nu = 1594.6;
      const x = (C2_CM_K * nu) / T;
      const expected = R * dEinstein.evaluate({ x }) * (C2_CM_K / T);
      const analytic = R * harmonicWavenumberDerivatives(nu, 1, T).cp;
      expect(Math.abs(analytic - expected)).toBeLessThan(1e-12 + 1e-9 * Math.abs(expected));
      const sp = oneOscillator(nu);
      const [input] = uncertainInputs(sp);
      const [cd] = centralDifference(sp, physics, input!, [T], 1e-4 * nu);
      // O(δ²) truncation: about 1e-7 relative at x = c2ν̃/T ≈ 11 (200 K), less at higher T.
      expect(Math.abs(cd!.cp - analytic)).toBeLessThan(1e-6 * Math.abs(analytic) + 1e-12);
      expect(Math.abs(cd!.s - R * harmonicWavenumberDerivatives(nu, 1, T).s)).toBeLessThan(1e-6 * Math.abs(cd!.s) + 1e-12);
    });
  }

  it('uses the closed form for harmonic vibrations and central differences for other inputs', () => {
    const sp = waterLike();
    const inputs = uncertainInputs(sp);
    const { methods } = sensitivities(sp, physics, inputs, [1000]);
    expect(inputs.map((i) => i.name)).toEqual([
      'vibration[0]',
      'vibration[1]',
      'vibration[2]',
      'scale_factor',
      'rotational_constant[0]',
      'rotational_constant[1]',
      'rotational_constant[2]',
      'enthalpy_of_formation',
    ]);
    expect(methods.slice(0, 3)).toEqual(['analytic', 'analytic', 'analytic']);
    expect(methods.slice(3)).toEqual(Array(5).fill('central-difference'));
  });

  it('central differences do not depend on the step over two decades (the step chosen, 1e-4, sits inside)', () => {
    const sp = waterLike();
    const scale = uncertainInputs(sp).find((i) => i.name === 'scale_factor')!;
    const at = (step: number) => centralDifference(sp, physics, scale, [298.15, 2000], step)[1]!.cp;
    const ref = at(1e-4);
    for (const step of [1e-3, 1e-5]) expect(Math.abs(at(step) - ref)).toBeLessThan(1e-5 * Math.abs(ref));
  });
});

describe('propagation', () => {
  it('S°(298.15) of a monatomic gas from a mass uncertainty is the Sackur–Tetrode derivative (3/2)R·δM/M', () => {
    const rel = 1e-3;
    const ar: Species = {
      name: 'Ar',
      composition: { Ar: 1 },
      charge: 0,
      molarMass: 39.948,
      enthalpyOfFormation: { value: 0, temperature: 298.15 },
      sources: ['hand-written test data'],
      structure: 'atom',
      electronicLevels: [{ energy: 0, degeneracy: 1 }],
      uncertainties: { molarMassRelative: rel },
    };
    const u = propagateUncertainty(ar, physics, { temperatures: [T_REF, 1000, 2000] });
    const expected = 1.5 * R * rel;
    for (const p of u.points) {
      expect(Math.abs(p.s - expected)).toBeLessThan(1e-7 * expected);
      expect(p.cp).toBeLessThan(1e-9); // Cp = 5/2 R does not depend on the mass
    }
    expect(u.points[0]!.largest.s).toEqual([{ input: 'molar_mass', contribution: u.points[0]!.s }]);
  });

  it('a species without uncertainties reports zero at every point, not nothing', () => {
    const sp = waterLike();
    delete sp.uncertainties;
    const u = propagateUncertainty(sp, physics, { temperatures: [T_REF, 1000, 2000], bandTemperatures: [500, 1500] });
    expect(u.inputs).toEqual([]);
    expect(u.points.map((p) => p.T)).toEqual([T_REF, 1000, 2000]);
    for (const p of u.points) {
      expect([p.cp, p.s, p.hMinusH298, p.h]).toEqual([0, 0, 0, 0]);
      expect(p.largest).toEqual({ cp: [], s: [], hMinusH298: [], h: [] });
    }
    expect(u.cpBand).toEqual([{ T: 500, u: 0 }, { T: 1500, u: 0 }]);
  });

  it('the u(Cp°) band is the u(Cp°) of the reported points, bit for bit (summed without contributor lists)', () => {
    const temperatures = [T_REF, 450.5, 1000, 2000, 3333.3];
    const u = propagateUncertainty(waterLike(), physics, { temperatures, bandTemperatures: temperatures });
    expect(u.inputs.length).toBeGreaterThan(3);
    const view = new DataView(new ArrayBuffer(8));
    const bits = (x: number) => (view.setFloat64(0, x), view.getBigUint64(0));
    expect(u.cpBand.map((b) => bits(b.u))).toEqual(u.points.map((p) => bits(p.cp)));
    expect(u.cpBand.map((b) => b.T)).toEqual(temperatures);
  });

  it('names the three largest contributors, largest first; u(H°) adds the formation enthalpy, u(H°−H°298) does not', () => {
    const u = propagateUncertainty(waterLike(), physics, { temperatures: [T_REF, 1000, 2000] });
    const p = u.points[1]!;
    expect(p.largest.cp.length).toBe(3);
    const c = p.largest.cp.map((x) => x.contribution);
    expect(c[0]).toBeGreaterThanOrEqual(c[1]!);
    expect(c[1]).toBeGreaterThanOrEqual(c[2]!);
    expect(p.largest.h[0]!.input).toBe('enthalpy_of_formation');
    expect(p.largest.hMinusH298.some((x) => x.input === 'enthalpy_of_formation')).toBe(false);
    expect(Math.abs(p.h ** 2 - (p.hMinusH298 ** 2 + 0.4 ** 2))).toBeLessThan(1e-9);
    // H° − H°298 is exactly zero at 298.15 K, and so is its uncertainty.
    expect(u.points[0]!.hMinusH298).toBeLessThan(1e-9);
  });

  it('Monte Carlo and linear propagation agree for small uncertainties within the sampling error', () => {
    const samples = 400;
    const u = propagateUncertainty(waterLike(), physics, { temperatures: [T_REF, 1000, 2000], monteCarlo: { samples, seed: 7 } });
    // Relative standard error of a sample standard deviation ≈ 1/√(2(N−1)); allow four of them.
    const tol = 4 / Math.sqrt(2 * (samples - 1));
    u.points.forEach((p, k) => {
      const mc = u.monteCarlo![k]!;
      for (const q of ['cp', 's', 'h'] as const) expect(Math.abs(mc[q] - p[q]) / p[q]).toBeLessThan(tol);
    });
    // Seeded: the same seed gives the same numbers.
    const again = propagateUncertainty(waterLike(), physics, { temperatures: [T_REF, 1000, 2000], monteCarlo: { samples, seed: 7 } });
    expect(again.monteCarlo).toEqual(u.monteCarlo);
  });
});
