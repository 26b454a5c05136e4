/**
 * The diatomic level enumeration: ladder termination rules, nuclear spin weights, separable limit.
 * Constants: Huber & Herzberg, Constants of Diatomic Molecules (1979), from memory (see
 * test/fixtures/physics-species.ts).
 */
import { describe, expect, it } from 'vitest';
import { C2_CM_K } from '../../../src/constants.js';
import type { DiatomicState } from '../../../src/model.js';
import {
  diatomicLevels,
  diatomicMoments,
  diatomicTermValue,
  MAX_VIBRATIONAL_LEVELS,
} from '../../../src/partition/diatomic.js';
import { harmonicMoments } from '../../../src/partition/harmonic.js';
import { addMoments, LevelSumError } from '../../../src/partition/moments.js';
import { linearRotorMoments } from '../../../src/partition/rigid-rotor-linear.js';
import { HYDROGEN, N2_X, NITROGEN, OXYGEN } from '../../fixtures/physics-species.js';
import { rel } from '../../support/relative.js';


const separable: DiatomicState = {
  term: 'X',
  energy: 0,
  degeneracy: 1,
  we: 2000,
  wexe: 0,
  weye: 0,
  Be: 2,
  alphae: 0,
  De: 0,
};

describe('diatomic term values', () => {
  it('follow E = Te + G(v) + B_v J(J+1) − De J²(J+1)² (Huber & Herzberg notation)', () => {
    const v = 3;
    const J = 7;
    const h = v + 0.5;
    const G = 2358.57 * h - 14.324 * h * h - 0.00226 * h ** 3;
    const Bv = 1.99824 - 0.017318 * h;
    expect(diatomicTermValue(N2_X, v, J)).toBeCloseTo(G + Bv * 56 - 5.76e-6 * 56 * 56, 9);
  });
});

describe('diatomic level enumeration', () => {
  it('reduces to rigid rotor × harmonic oscillator for separable constants far below the limit', () => {
    const input = { symmetryNumber: 1, dissociationEnergy: 1e5, electronicStates: [separable] };
    const levels = diatomicLevels(input);
    for (const T of [100, 1000, 3000]) {
      const sum = diatomicMoments(levels, T);
      const product = addMoments([linearRotorMoments(2, 1, T), harmonicMoments([{ wavenumber: 2000, degeneracy: 1 }], T)]);
      expect(rel(sum.lnQ, product.lnQ)).toBeLessThan(1e-9);
      expect(rel(sum.meanU, product.meanU)).toBeLessThan(1e-9);
      expect(rel(sum.varU, product.varU)).toBeLessThan(1e-8);
    }
  });

  it('keeps every level below the dissociation limit and measures from the ground v=0, J=0 level', () => {
    const { levels, states } = diatomicLevels(NITROGEN);
    let max = 0;
    let min = Infinity;
    for (const t of levels.theta) {
      max = Math.max(max, t);
      min = Math.min(min, t);
    }
    expect(min).toBe(0);
    expect(max).toBeLessThan(C2_CM_K * NITROGEN.dissociationEnergy);
    expect(max).toBeGreaterThan(0.95 * C2_CM_K * NITROGEN.dissociationEnergy);
    expect(states[0]!.vEnd).toBe('limit');
    expect(states[0]!.levels).toBe(levels.theta.length);
  });

  it('stops the level sum early only where the rest is negligible (brute-force two-pass sum agrees)', () => {
    const { levels } = diatomicLevels(NITROGEN);
    for (const T of [200, 1000, 6000]) {
      let q = 0;
      let s1 = 0;
      for (let i = 0; i < levels.theta.length; i++) {
        const w = levels.weight[i]! * Math.exp(-levels.theta[i]! / T);
        q += w;
        s1 += w * (levels.theta[i]! / T);
      }
      const mean = s1 / q;
      let s2 = 0;
      for (let i = 0; i < levels.theta.length; i++) {
        const u = levels.theta[i]! / T;
        s2 += levels.weight[i]! * Math.exp(-u) * (u - mean) ** 2;
      }
      const m = diatomicMoments({ levels, states: [] }, T);
      expect(rel(m.lnQ, Math.log(q))).toBeLessThan(1e-13);
      expect(rel(m.meanU, mean)).toBeLessThan(1e-12);
      expect(rel(m.varU, s2 / q)).toBeLessThan(1e-11);
    }
  });

  it('stops a v ladder where G(v) turns over', () => {
    // G(v) = 1000(v+½) − 50(v+½)² peaks at v+½ = 10; the limit is far above
    const state: DiatomicState = { ...separable, we: 1000, wexe: 50, Be: 1 };
    const { states } = diatomicLevels({ symmetryNumber: 1, dissociationEnergy: 1e6, electronicStates: [state] });
    expect(states[0]!.vEnd).toBe('turnover');
    expect(states[0]!.vibrationalLevels).toBe(10);
  });

  it('stops a v ladder where B_v ≤ 0', () => {
    const state: DiatomicState = { ...separable, alphae: 0.5 }; // B_v = 2 − 0.5(v+½) ≤ 0 from v = 4
    const { states } = diatomicLevels({ symmetryNumber: 1, dissociationEnergy: 1e6, electronicStates: [state] });
    expect(states[0]!.vEnd).toBe('B_v<=0');
    expect(states[0]!.vibrationalLevels).toBe(4);
  });

  it('stops a J ladder where E(v, J) turns over (dE/dJ ≤ 0)', () => {
    // E_rot = 2x − 0.001x², maximum at x = J(J+1) = 1000, i.e. between J = 31 (992) and 32 (1056)
    const state: DiatomicState = { ...separable, De: 0.001 };
    const { states } = diatomicLevels({ symmetryNumber: 1, dissociationEnergy: 1e6, electronicStates: [state] });
    expect(states[0]!.maxJ).toBe(31);
  });

  it("uses a state's own dissociation energy from its own lowest level", () => {
    const excited: DiatomicState = { ...separable, term: 'A', energy: 5000, dissociationEnergy: 3000 };
    const { states } = diatomicLevels({ symmetryNumber: 1, dissociationEnergy: 1e5, electronicStates: [separable, excited] });
    const ownLowest = 5000 + 1000; // Te + G(0)
    expect(states[1]!.limit).toBeCloseTo(ownLowest + 3000 - 1000, 9);
    expect(states[1]!.vibrationalLevels).toBe(2); // G(v) − G(0) = 0, 2000 < 3000 ≤ 4000
  });

  it('throws LevelSumError when a ladder never terminates within its bound', () => {
    const harmonicForever: DiatomicState = { ...separable, we: 1 };
    expect(() =>
      diatomicLevels({ symmetryNumber: 1, dissociationEnergy: 10 * MAX_VIBRATIONAL_LEVELS, electronicStates: [harmonicForever] }),
    ).toThrow(LevelSumError);
  });

  it('throws LevelSumError when nothing is bound', () => {
    expect(() => diatomicLevels({ symmetryNumber: 1, dissociationEnergy: -1, electronicStates: [separable] })).toThrow(
      /no bound levels/,
    );
  });
});

describe('nuclear spin weights', () => {
  it('replace σ: weights {1,1} equal σ = 2 at high T and differ at low T (ortho/para alternation)', () => {
    const withSigma = diatomicLevels({ ...HYDROGEN, nuclearSpinWeights: undefined, symmetryNumber: 2 });
    const withSpin = diatomicLevels(HYDROGEN); // {even: 1, odd: 3}
    const equalSpin = diatomicLevels({ ...HYDROGEN, nuclearSpinWeights: { even: 1, odd: 1 } });
    // High T: the normalised weights average to 1/2 = 1/σ
    expect(Math.abs(diatomicMoments(withSpin, 3000).lnQ - diatomicMoments(withSigma, 3000).lnQ)).toBeLessThan(1e-4);
    expect(diatomicMoments(equalSpin, 300).lnQ).toBeCloseTo(diatomicMoments(withSigma, 300).lnQ, 12);
    // Low T: para H2 (even J) dominates the {1,3} sum, so it differs clearly from 1/σ
    expect(Math.abs(diatomicMoments(withSpin, 50).lnQ - diatomicMoments(withSigma, 50).lnQ)).toBeGreaterThan(0.5);
  });

  it('weights even J by even/(even+odd) and odd J by odd/(even+odd)', () => {
    const { levels } = diatomicLevels(HYDROGEN);
    expect(levels.weight[0]).toBeCloseTo(0.25, 15); // v=0, J=0
    expect(levels.weight[1]).toBeCloseTo(3 * 0.75, 15); // v=0, J=1: (2J+1)·3/4
  });

  it('multiplies by the electronic degeneracy (O2 X3Σg− g = 3, σ = 2)', () => {
    const { levels } = diatomicLevels(OXYGEN);
    expect(levels.weight[0]).toBeCloseTo(1.5, 15);
  });
});
