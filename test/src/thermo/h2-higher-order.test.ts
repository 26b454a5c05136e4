/**
 * H2 with the sextic centrifugal constant He against NIST-JANAF Thermochemical Tables, 4th ed. (Chase
 * 1998), table H-050, and CODATA Key Values (Cox, Wagman & Medvedev 1989). Reference numbers:
 * test/fixtures/janaf.ts.
 *
 * Input: H2 X¹Σg⁺ constants of Huber & Herzberg (1979), from memory (test/fixtures/physics-species.ts), plus
 * He = 5.02e-5 cm⁻¹ estimated from He = (2De/(3ωe²))(12Be² − αe·ωe) (Herzberg, Molecular Spectra and
 * Molecular Structure I (1950), ch. III), our arithmetic — the value of species/H2.yaml. Nothing here was
 * adjusted to the table; the bounds are the measured deviations (in the comments) plus a margin.
 *
 * Measured, calc − JANAF (Cp, S in J/(mol K), H − H298 in kJ/mol), without He → with He:
 *   1000 K  Cp +0.060 → +0.010   S +0.034 → +0.012   H +0.019 → +0.004
 *   2000 K  Cp +0.353 → +0.003   S +0.144 → +0.020   H +0.192 → +0.015
 *   3000 K  Cp +1.240 → −0.096   S +0.435 → +0.008   H +0.941 → −0.019
 *   6000 K  Cp −0.947 → −1.850   S +1.302 → −0.465   H +4.344 → −2.367
 */
import { describe, expect, it } from 'vitest';
import type { DiatomicSpecies } from '../../../src/model.js';
import { createThermoEvaluator, standardProperties } from '../../../src/thermo/index.js';
import { CODATA_S298, JANAF } from '../../fixtures/janaf.js';
import { H2_X, HYDROGEN } from '../../fixtures/physics-species.js';

const WITH_HE: DiatomicSpecies = { ...HYDROGEN, electronicStates: [{ ...H2_X, He: 5.02e-5 }] };
const withHe = createThermoEvaluator(WITH_HE);
const withoutHe = createThermoEvaluator(HYDROGEN);

function deviation(ev: typeof withHe, T: string) {
  const p = standardProperties(ev, Number(T));
  const [Cp, S, HminusH298] = JANAF['H2']!.T[T]!;
  return { Cp: p.Cp - Cp, S: p.S - S, H: p.HminusH298 - HminusH298 };
}

describe('H2 with He vs NIST-JANAF H-050', () => {
  it('Cp at 2000 K within 0.05 J/(mol K) (measured +0.003; without He +0.353)', () => {
    expect(Math.abs(deviation(withHe, '2000').Cp)).toBeLessThan(0.05);
    expect(deviation(withoutHe, '2000').Cp).toBeGreaterThan(0.3);
  });

  it('Cp at 3000 K within 0.15 J/(mol K) (measured −0.096; without He +1.240)', () => {
    expect(Math.abs(deviation(withHe, '3000').Cp)).toBeLessThan(0.15);
    expect(deviation(withoutHe, '3000').Cp).toBeGreaterThan(1.0);
  });

  it.each(['1000', '2000', '3000'])('at %s K: Cp, S and H − H298 closer to the table than without He', (T) => {
    const a = deviation(withHe, T);
    const b = deviation(withoutHe, T);
    expect(Math.abs(a.Cp)).toBeLessThan(Math.abs(b.Cp));
    expect(Math.abs(a.S)).toBeLessThan(Math.abs(b.S));
    expect(Math.abs(a.H)).toBeLessThan(Math.abs(b.H));
    // Measured S ≤ 0.020 and H − H298 ≤ 0.019 in magnitude.
    expect(Math.abs(a.S)).toBeLessThan(0.03);
    expect(Math.abs(a.H)).toBeLessThan(0.03);
  });

  it('200 and 298.15 K stay within the foundation tolerances (Cp 0.03, S 0.02, H 0.01)', () => {
    for (const T of ['200', '298.15']) {
      const d = deviation(withHe, T);
      expect(Math.abs(d.Cp)).toBeLessThan(0.03);
      expect(Math.abs(d.S)).toBeLessThan(0.02);
      expect(Math.abs(d.H)).toBeLessThan(0.01);
    }
  });

  it('S°(298.15) within 0.01 of CODATA 130.680 and H298 − H0 within 0.002 of 8.467 kJ/mol (JANAF)', () => {
    expect(Math.abs(standardProperties(withHe, 298.15).S - CODATA_S298['H2']!)).toBeLessThan(0.01);
    expect(Math.abs(withHe.h298MinusH0 / 1000 - JANAF['H2']!.H298mH0)).toBeLessThan(0.002);
  });

  it('6000 K: the known shortfall (documents the model limit, see species/H2.yaml)', () => {
    // The sum stops at the dissociation limit and the power series does not follow the levels near it:
    // Cp −1.85, S −0.47, H − H298 −2.37 measured. A band, so a change in either direction is noticed.
    const d = deviation(withHe, '6000');
    expect(d.Cp).toBeGreaterThan(-2.2);
    expect(d.Cp).toBeLessThan(-1.5);
    expect(Math.abs(d.S)).toBeLessThan(0.6);
    expect(d.H).toBeGreaterThan(-2.8);
    expect(d.H).toBeLessThan(-2.0);
  });
});
