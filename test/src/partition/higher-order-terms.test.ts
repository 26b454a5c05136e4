/**
 * Higher-order level constants of a diatomic state (ωeze, γe, βe, He): the term values, that absent and
 * zero constants change no bit, and that the ladders stay bounded when He removes the turnover.
 *
 * Formula under test (Herzberg, Molecular Spectra and Molecular Structure I (1950), ch. III; Huber &
 * Herzberg (1979) notation; Dunham, Phys. Rev. 41, 721 (1932)):
 *   E(v,J) = Te + G(v) + B_v x − D_v x² + H_v x³, x = J(J+1),
 *   G(v) = ωe h − ωexe h² + ωeye h³ + ωeze h⁴, B_v = Be − αe h + γe h², D_v = De + βe h, H_v = He, h = v + ½.
 * N2, CO, O2 and H2 constants: Huber & Herzberg (1979), from memory (test/fixtures/physics-species.ts).
 * H2's He = 5.02e-5 cm⁻¹ is estimated from Herzberg's relation He = (2De/(3ωe²))(12Be² − αeωe), our arithmetic.
 * The constants of `invented` are invented, chosen so the hand arithmetic below is exact in decimal.
 */
import { describe, expect, it } from 'vitest';
import { C2_CM_K } from '../../../src/constants.js';
import type { DiatomicState } from '../../../src/model.js';
import {
  centrifugalConstantOf,
  diatomicLevels,
  diatomicMoments,
  diatomicSpinManifolds,
  diatomicTermValue,
  higherOrderTermsOf,
  MAX_ROTATIONAL_LEVELS,
  rotationalConstantOf,
  vibrationalTerm,
} from '../../../src/partition/diatomic.js';
import { LevelSumError } from '../../../src/partition/moments.js';
import { createThermoEvaluator } from '../../../src/thermo/evaluator.js';
import { CARBON_MONOXIDE, H2_X, HYDROGEN, NITROGEN, OXYGEN } from '../../fixtures/physics-species.js';

/** Invented constants (not a real molecule). */
const invented: DiatomicState = {
  term: 'A',
  energy: 100,
  degeneracy: 2,
  we: 1000,
  wexe: 10,
  weye: 0.5,
  weze: 0.01,
  Be: 2,
  alphae: 0.02,
  gammae: 0.001,
  De: 1e-5,
  betae: 1e-7,
  He: 1e-10,
};

/** H2 X¹Σg⁺ with the estimated sextic constant of species/H2.yaml. */
const H2_X_WITH_HE: DiatomicState = { ...H2_X, He: 5.02e-5 };
const HYDROGEN_WITH_HE = { ...HYDROGEN, electronicStates: [H2_X_WITH_HE] };

describe('term values with the higher-order constants', () => {
  it('match E(v,J) worked by hand for v = 2, J = 10 (invented constants)', () => {
    // h = 2.5, x = 110:
    // G = 2500 − 62.5 + 7.8125 + 0.390625 = 2445.703125
    // B_v = 2 − 0.05 + 0.00625 = 1.95625;  B_v x = 215.1875
    // D_v = 1e-5 + 2.5e-7 = 1.025e-5;      D_v x² = 0.124025
    // H_v x³ = 1e-10 · 1331000 = 0.0001331
    // E = 100 + 2445.703125 + 215.1875 − 0.124025 + 0.0001331 = 2760.7667331
    expect(vibrationalTerm(invented, 2)).toBeCloseTo(2445.703125, 10);
    expect(rotationalConstantOf(invented, 2)).toBeCloseTo(1.95625, 13);
    expect(centrifugalConstantOf(invented, 2)).toBeCloseTo(1.025e-5, 18);
    expect(diatomicTermValue(invented, 2, 10)).toBeCloseTo(2760.7667331, 9);
  });

  it('match the formula term by term over a grid of v and J (H2 with He, the form of Herzberg 1950)', () => {
    for (const v of [0, 3, 7]) {
      for (const J of [0, 1, 5, 20]) {
        const h = v + 0.5;
        const x = J * (J + 1);
        const s = H2_X_WITH_HE;
        const expected =
          s.we * h - s.wexe * h ** 2 + (s.Be - s.alphae * h) * x - s.De * x ** 2 + 5.02e-5 * x ** 3;
        expect(diatomicTermValue(s, v, J)).toBeCloseTo(expected, 8);
      }
    }
  });

  it('He raises E(0, 20) of H2 by He·(420)³ = 3719.0 cm⁻¹ (our arithmetic)', () => {
    expect(diatomicTermValue(H2_X_WITH_HE, 0, 20) - diatomicTermValue(H2_X, 0, 20)).toBeCloseTo(5.02e-5 * 420 ** 3, 8);
  });

  it('lists only the non-zero higher-order constants (for the model summary)', () => {
    expect(higherOrderTermsOf(H2_X)).toEqual([]);
    expect(higherOrderTermsOf({ ...H2_X, weze: 0, gammae: 0, betae: 0, He: 0 })).toEqual([]);
    expect(higherOrderTermsOf(invented)).toEqual([
      'weze = 0.01 cm-1',
      'gammae = 0.001 cm-1',
      'betae = 1e-7 cm-1',
      'He = 1e-10 cm-1',
    ]);
  });
});

describe('absent and zero higher-order constants change nothing', () => {
  const zeros = { weze: 0, gammae: 0, betae: 0, He: 0 };
  it.each([
    ['N2', NITROGEN],
    ['CO', CARBON_MONOXIDE],
    ['O2 (three states)', OXYGEN],
    ['H2 (spin weights)', HYDROGEN],
  ] as const)('%s: explicit zeros give the same level list bit for bit', (_name, species) => {
    const plain = diatomicLevels(species);
    const zeroed = diatomicLevels({ ...species, electronicStates: species.electronicStates.map((s) => ({ ...s, ...zeros })) });
    expect(zeroed.levels.theta).toEqual(plain.levels.theta);
    expect(zeroed.levels.weight).toEqual(plain.levels.weight);
    expect(zeroed.states).toEqual(plain.states);
    for (const T of [200, 3000, 6000]) expect(diatomicMoments(zeroed, T)).toEqual(diatomicMoments(plain, T));
  });

  it('term values are identical for a grid of v, J', () => {
    for (let v = 0; v < 10; v++) {
      for (let J = 0; J < 60; J += 7) {
        expect(Object.is(diatomicTermValue({ ...H2_X, ...zeros }, v, J), diatomicTermValue(H2_X, v, J))).toBe(true);
      }
    }
  });
});

describe('ladder rules with the higher-order constants', () => {
  it('H2 without He: the J ladders turn over below the limit (the truncated expression)', () => {
    // Measured: 12 of the 14 ladders turn over; the two highest v reach the limit first.
    const { states } = diatomicLevels(HYDROGEN);
    expect(states[0]!.vibrationalLevels).toBe(14);
    expect(states[0]!.rotationalTurnovers).toBe(12);
  });

  it('H2 with He > 0: no J ladder turns over; every ladder ends at the limit, below it, and the sum stays bounded', () => {
    const { levels, states } = diatomicLevels(HYDROGEN_WITH_HE);
    const s = states[0]!;
    expect(s.rotationalTurnovers).toBe(0);
    expect(s.vEnd).toBe('limit');
    // Measured: 14 vibrational levels, 282 levels, J ≤ 26 (not a published count; a regression guard).
    expect(s.vibrationalLevels).toBe(14);
    expect(s.maxJ).toBe(26);
    expect(s.levels).toBe(282);
    const limitTheta = C2_CM_K * HYDROGEN.dissociationEnergy;
    for (const t of levels.theta) expect(t).toBeLessThan(limitTheta);
    // The level above the top of each ladder would be at or beyond the limit.
    const lowest = diatomicTermValue(H2_X_WITH_HE, 0, 0);
    expect(diatomicTermValue(H2_X_WITH_HE, 0, s.maxJ + 1) - lowest).toBeGreaterThanOrEqual(HYDROGEN.dissociationEnergy);
  });

  it('the frozen-mixture manifolds use the same levels', () => {
    const { components } = diatomicSpinManifolds(HYDROGEN_WITH_HE);
    expect(components.reduce((n, c) => n + c.levels.theta.length, 0)).toBe(282);
  });

  it('He > 0 with constants in the wrong unit still ends: LevelSumError, not an endless ladder', () => {
    // B = 1e-5 cm⁻¹ (a MHz value typed as cm⁻¹, say): the ladder would need J ≈ 6e4 > MAX_ROTATIONAL_LEVELS.
    const tiny: DiatomicState = { term: 'X', energy: 0, degeneracy: 1, we: 2000, wexe: 0, weye: 0, Be: 1e-5, alphae: 0, De: 0, He: 1e-30 };
    expect(MAX_ROTATIONAL_LEVELS).toBeLessThan(6e4);
    expect(() => diatomicLevels({ symmetryNumber: 1, dissociationEnergy: 30000, electronicStates: [tiny] })).toThrow(LevelSumError);
  });

  it('He < 0 makes the J ladder turn over where dE/dx = B − 2Dx + 3Hx² = 0', () => {
    // Invented: B = 2, D = 0, H = −1e-8: dE/dx = 0 at x = √(B/(3|H|)) = 8165.0. With E_rot = 2x − 1e-8x³
    // (our arithmetic): J = 89 (x = 8010) 10880.7, J = 90 (x = 8190) 10886.5, J = 91 (x = 8372) 10876.2 → J ≤ 90.
    const state: DiatomicState = { term: 'X', energy: 0, degeneracy: 1, we: 2000, wexe: 0, weye: 0, Be: 2, alphae: 0, De: 0, He: -1e-8 };
    const { states } = diatomicLevels({ symmetryNumber: 1, dissociationEnergy: 1e6, electronicStates: [state] });
    expect(states[0]!.maxJ).toBe(90);
    // 500 harmonic levels of 2000 cm⁻¹ below 1e6; the top five (v ≥ 495) lie less than 10886.5 cm⁻¹ under the
    // limit, so their ladders reach it before turning over.
    expect(states[0]!.vibrationalLevels).toBe(500);
    expect(states[0]!.rotationalTurnovers).toBe(495);
  });

  it('γe and βe enter B_v and D_v of every v (v ladder ends where B_v ≤ 0)', () => {
    // Invented: B_v = 2 − 0.5h + 0.02h² vanishes at h = 5 and 20, so v = 0…4 are kept (B_4 = 0.155, B_5 = −0.145).
    const state: DiatomicState = { term: 'X', energy: 0, degeneracy: 1, we: 2000, wexe: 0, weye: 0, Be: 2, alphae: 0.5, gammae: 0.02, De: 0, betae: 0 };
    const { states } = diatomicLevels({ symmetryNumber: 1, dissociationEnergy: 1e6, electronicStates: [state] });
    expect(states[0]!.vEnd).toBe('B_v<=0');
    expect(states[0]!.vibrationalLevels).toBe(5);
    // βe: D_v = 0.001 + 0.001h. For v = 1, E_rot = 1.295x − 0.0025x² peaks at x = 259 (our arithmetic):
    // J = 15 (x = 240) 166.80, J = 16 (x = 272) 167.28, J = 17 (x = 306) 162.18 → the ladder stops after J = 16.
    const withBeta: DiatomicState = { ...state, alphae: 0.5, gammae: 0.02, De: 0.001, betae: 0.001 };
    expect(rotationalConstantOf(withBeta, 1)).toBeCloseTo(1.295, 12);
    expect(centrifugalConstantOf(withBeta, 1)).toBeCloseTo(0.0025, 15);
    const e = (J: number) => diatomicTermValue(withBeta, 1, J);
    expect(e(16) - e(0)).toBeCloseTo(1.295 * 272 - 0.0025 * 272 ** 2, 9);
    expect(e(16)).toBeGreaterThan(e(15));
    expect(e(17)).toBeLessThan(e(16));
    const ladder = diatomicLevels({ symmetryNumber: 1, dissociationEnergy: 1e6, electronicStates: [withBeta] });
    // The longest ladder is v = 0: B_0 = 1.755, D_0 = 0.0015, E_rot at J = 23, 24, 25 is 511.7, 513.0, 507.0.
    expect(ladder.states[0]!.maxJ).toBe(24);

  });
});

describe('model summary', () => {
  it('names the non-zero higher-order constants of a state and how its J ladders ended', () => {
    const ev = createThermoEvaluator(HYDROGEN_WITH_HE);
    expect(ev.summary.notes).toContain(
      'state X1Sigma_g+: higher-order level constants He = 0.0000502 cm-1; 0 of 14 J ladders end where E(v,J) turns over, the rest at the limit',
    );
  });

  it('adds no note for a state without them', () => {
    expect(createThermoEvaluator(NITROGEN).summary.notes.some((n) => n.includes('higher-order'))).toBe(false);
  });
});
