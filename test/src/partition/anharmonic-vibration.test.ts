/**
 * The anharmonic direct sum (src/partition/anharmonic-vibration.ts): limits and closed forms.
 * - every x_ij = g = 0 reproduces the harmonic oscillator (McQuarrie 1976, eqs. 6-22 to 6-25) to 1e-9,
 *   also with zero-valued g terms (which list the l sublevels: their count v + 1 per doubly degenerate mode
 *   is Herzberg II (1945), ch. II.5) and a triply degenerate mode (C(v + 2, 2) states);
 * - the first-order centrifugal factor against a direct quantum sum over J (and over J, K for a prolate
 *   symmetric top) with E = B J(J+1) − D J²(J+1)² (+ (A − B)K² − D_JK J(J+1)K² − D_K K⁴): the standard
 *   level expressions (Herzberg II, ch. I.3), test data written by hand;
 * - the moments are exact derivatives: central differences of lnQ (the identities of moments.ts);
 * - level counts of the CO2 and H2O models, and the stable error codes.
 */
import { describe, expect, it } from 'vitest';
import { C2_CM_K } from '../../../src/constants.js';
import type { Vibration } from '../../../src/model.js';
import {
  AnharmonicModelError,
  anharmonicMoments,
  buildAnharmonicLevels,
  centrifugalCoefficient,
  MAX_ANHARMONIC_LEVELS,
  populationCut,
  surveyAnharmonicLevels,
  type AnharmonicModelInput,
} from '../../../src/partition/anharmonic-vibration.js';
import { harmonicMoments } from '../../../src/partition/harmonic.js';
import { CO2_ANHARMONIC, H2O_ANHARMONIC } from '../../fixtures/anharmonic-species.js';
import { rel } from '../../support/relative.js';

const CO2_MODES: Vibration[] = [
  { wavenumber: 1354.31, degeneracy: 1 },
  { wavenumber: 672.85, degeneracy: 2 },
  { wavenumber: 2396.32, degeneracy: 1 },
];
const TEMPERATURES = [200, 1000, 3000, 6000];

function expectHarmonic(input: AnharmonicModelInput, vibrations: Vibration[], temperatures = TEMPERATURES): void {
  const model = buildAnharmonicLevels(input);
  for (const T of temperatures) {
    const a = anharmonicMoments(model, T);
    const h = harmonicMoments(vibrations, T);
    expect(rel(a.lnQ, h.lnQ)).toBeLessThan(1e-9);
    expect(rel(a.meanU, h.meanU)).toBeLessThan(1e-9);
    expect(rel(a.varU, h.varU)).toBeLessThan(1e-9);
  }
}

describe('limits: all x_ij = 0 is the harmonic oscillator (to 1e-9)', () => {
  const rotationalConstants = [0.39];
  it('no terms at all (population cut only)', () => {
    expectHarmonic({ vibrations: CO2_MODES, anharmonicity: { x: [], g: [] }, rotationalConstants }, CO2_MODES);
  });
  // Listing every l sublevel up to the population cut would pass the level limit, so these two cut at
  // 100000 cm-1, where the harmonic tail above the cut is below 1e-16 of q up to 3000 K.
  const stiff: Vibration[] = CO2_MODES.map((v) => ({ ...v, wavenumber: 2 * v.wavenumber }));
  it('x_ij given as 0 and g_22 = 0 (l sublevels listed, |l| merged)', () => {
    const x: Array<[number, number, number]> = [[0, 0, 0], [0, 1, 0], [1, 1, 0], [2, 2, 0]];
    const input = { vibrations: stiff, anharmonicity: { x, g: [[1, 1, 0]] as Array<[number, number, number]> }, rotationalConstants, dissociationEnergy: 1e5 };
    expectHarmonic(input, stiff, [200, 1000, 3000]);
  });
  it('a zero cross term g_tt′ between two doubly degenerate modes (signed l listed)', () => {
    const modes: Vibration[] = [{ wavenumber: 1400, degeneracy: 2 }, { wavenumber: 2200, degeneracy: 2 }];
    const input = { vibrations: modes, anharmonicity: { x: [], g: [[0, 1, 0]] as Array<[number, number, number]> }, rotationalConstants: [5, 4, 3], dissociationEnergy: 1e5 };
    expectHarmonic(input, modes, [200, 1000, 3000]);
  });
  it('a triply degenerate mode (C(v+2, 2) states per v)', () => {
    const modes: Vibration[] = [{ wavenumber: 1306, degeneracy: 3 }, { wavenumber: 2917, degeneracy: 1 }];
    expectHarmonic({ vibrations: modes, anharmonicity: { x: [], g: [] }, rotationalConstants: [5.2, 5.2, 5.2] }, modes);
  });
});

describe('first-order centrifugal factor 1 + aT against direct quantum sums', () => {
  it('linear: (q_D/q_rigid − 1)/(aT) = 1 within 1 % (B = 1, D = 1e-6 cm-1, 1000 K; the second-order term is 0.4 %)', () => {
    const B = 1;
    const D = 1e-6;
    const T = 1000;
    let q0 = 0;
    let qd = 0;
    for (let J = 0; J < 150; J++) {
      const x = J * (J + 1);
      q0 += (2 * J + 1) * Math.exp((-C2_CM_K * B * x) / T);
      qd += (2 * J + 1) * Math.exp((-C2_CM_K * (B * x - D * x * x)) / T);
    }
    const aT = centrifugalCoefficient([B], { DJ: D }) * T;
    expect(Math.abs((qd / q0 - 1) / aT - 1)).toBeLessThan(0.01);
  });
  it('prolate symmetric top (A = 5, B = C = 1 cm-1, D_J, D_JK, D_K; 2000 K) within 3 %', () => {
    const [A, B] = [5, 1];
    const d = { DJ: 1e-6, DJK: 2e-6, DK: 5e-6 };
    const T = 2000;
    let q0 = 0;
    let qd = 0;
    for (let J = 0; J < 500; J++) {
      const x = J * (J + 1);
      for (let K = 0; K <= J; K++) {
        const g = (2 * J + 1) * (K === 0 ? 1 : 2);
        const rigid = B * x + (A - B) * K * K;
        const distortion = d.DJ * x * x + d.DJK * x * K * K + d.DK * K ** 4;
        q0 += g * Math.exp((-C2_CM_K * rigid) / T);
        qd += g * Math.exp((-C2_CM_K * (rigid - distortion)) / T);
      }
    }
    const aT = centrifugalCoefficient([A, B, B], d) * T;
    expect(Math.abs((qd / q0 - 1) / aT - 1)).toBeLessThan(0.03);
  });
});

describe('moments are the exact derivatives of lnQ (central differences)', () => {
  const models = [
    ['CO2 (x, g, alpha, D_J)', CO2_ANHARMONIC],
    ['H2O (x, alpha, Watson A)', H2O_ANHARMONIC],
  ] as const;
  it.each(models)('%s', (_label, s) => {
    const model = buildAnharmonicLevels({
      vibrations: s.vibrations,
      anharmonicity: s.anharmonicity!,
      rotationalConstants: s.rotationalConstants,
      centrifugalDistortion: s.centrifugalDistortion!,
      dissociationEnergy: s.dissociationEnergy!,
    });
    for (const T of [300, 1500, 4000]) {
      const h = 1e-4 * T;
      const lnQ = (t: number) => anharmonicMoments(model, t).lnQ;
      const tMean = (t: number) => t * anharmonicMoments(model, t).meanU;
      const m = anharmonicMoments(model, T);
      // Measured ~1e-8 (the O(h²) error of the central difference); an inexact curvature term shows at 1e-6.
      expect(rel((T * (lnQ(T + h) - lnQ(T - h))) / (2 * h), m.meanU)).toBeLessThan(1e-7);
      expect(rel((tMean(T + h) - tMean(T - h)) / (2 * h), m.varU)).toBeLessThan(1e-7);
    }
  });
});

describe('level counts and cuts', () => {
  it('CO2: 10134 states, 89511 levels below D0 = 43980 cm-1 (measured; l sublevels of ν2 merged by |l|)', () => {
    const s = CO2_ANHARMONIC;
    const model = buildAnharmonicLevels({ vibrations: s.vibrations, anharmonicity: s.anharmonicity!, rotationalConstants: s.rotationalConstants, dissociationEnergy: 43980 });
    expect(model.states).toBe(10134);
    expect(model.levels.theta.length).toBe(89511);
    expect(model.cutBy).toBe('dissociation energy');
    const survey = surveyAnharmonicLevels({ vibrations: s.vibrations, anharmonicity: s.anharmonicity!, rotationalConstants: s.rotationalConstants, dissociationEnergy: 43980 });
    expect([survey.states, survey.levels]).toEqual([10134, 89511]);
  });
  it('H2O: 1270 states below D0 = 41130 cm-1, one ladder ends where G(v) turns over (measured)', () => {
    const s = H2O_ANHARMONIC;
    const model = buildAnharmonicLevels({ vibrations: s.vibrations, anharmonicity: s.anharmonicity!, rotationalConstants: s.rotationalConstants, dissociationEnergy: 41130 });
    expect(model.states).toBe(1270);
    expect(model.turnovers).toBe(1);
  });
  it('without a dissociation energy the population cut holds the harmonic tail below 1e-12 at 6000 K', () => {
    // Q(4, x) = 1e-12 at x ≈ 36.5 (the upper incomplete gamma function; e^{-x} Σ_{k<4} x^k/k!).
    const cut = populationCut(4);
    const x = (cut * C2_CM_K) / 6000;
    const tail = Math.exp(-x) * (1 + x + (x * x) / 2 + (x * x * x) / 6);
    expect(tail).toBeLessThanOrEqual(1e-12);
    expect(tail).toBeGreaterThan(0.9e-12);
  });
});

describe('the level list against a brute-force enumeration written out here', () => {
  it('two doubly degenerate modes with g_11 and a cross term g_12: every signed (l_1, l_2) counted once', () => {
    const w = [1400, 2200];
    const [g11, g12, g22] = [-3.1, 2.4, 0.7];
    const cut = 20000;
    const T = 2500;
    let q = 0;
    for (let v1 = 0; w[0]! * v1 <= cut; v1++) {
      for (let v2 = 0; w[0]! * v1 + w[1]! * v2 <= cut; v2++) {
        for (let l1 = -v1; l1 <= v1; l1 += 2) {
          for (let l2 = -v2; l2 <= v2; l2 += 2) {
            const e = w[0]! * v1 + w[1]! * v2 + g11 * l1 * l1 + g12 * l1 * l2 + g22 * l2 * l2;
            q += Math.exp((-C2_CM_K * e) / T);
          }
        }
      }
    }
    const modes: Vibration[] = [{ wavenumber: w[0]!, degeneracy: 2 }, { wavenumber: w[1]!, degeneracy: 2 }];
    const model = buildAnharmonicLevels({ vibrations: modes, anharmonicity: { x: [], g: [[0, 0, g11], [0, 1, g12], [1, 1, g22]] }, rotationalConstants: [1, 0.9, 0.8], dissociationEnergy: cut });
    // Our levels are measured from the lowest sublevel, the brute force from G(0) (both have l = 0 there).
    expect(rel(anharmonicMoments(model, T).lnQ, Math.log(q))).toBeLessThan(1e-12);
  });
  it('one mode, ω = 1000, x_11 = −10 cm-1, no cut: v = 0…49, the ladder ends where G(v+1) − G(v) = 1000 − 20(v+1) reaches 0', () => {
    const model = buildAnharmonicLevels({ vibrations: [{ wavenumber: 1000, degeneracy: 1 }], anharmonicity: { x: [[0, 0, -10]], g: [] }, rotationalConstants: [1, 1, 1] });
    expect(model.states).toBe(50);
    expect(model.turnovers).toBe(1);
    expect(model.cutBy).toBe('population bound');
  });
});

describe('errors carry stable codes', () => {
  const code = (f: () => unknown) => {
    try {
      f();
    } catch (e) {
      return e instanceof AnharmonicModelError ? e.code : String(e);
    }
    return 'no error';
  };
  it('a ladder that falls at the first quantum: anharmonic-ladder-turns-over', () => {
    expect(code(() => buildAnharmonicLevels({ vibrations: CO2_MODES, anharmonicity: { x: [[0, 0, -1000]], g: [] }, rotationalConstants: [0.39] }))).toBe(
      'anharmonic-ladder-turns-over',
    );
  });
  it('alpha driving a rotational constant to zero below the cut: anharmonic-rotational-constant-not-positive', () => {
    const input: AnharmonicModelInput = { vibrations: CO2_MODES, anharmonicity: { x: [], g: [], alpha: [[0.1], [0], [0]] }, rotationalConstants: [0.39], dissociationEnergy: 20000 };
    expect(code(() => buildAnharmonicLevels(input))).toBe('anharmonic-rotational-constant-not-positive');
    expect(surveyAnharmonicLevels(input).nonPositiveRotation?.v).toEqual([4, 0, 0]);
  });
  it(`more than ${MAX_ANHARMONIC_LEVELS} levels: the survey says so without building them`, () => {
    const modes: Vibration[] = Array.from({ length: 12 }, (_, i) => ({ wavenumber: 300 + 10 * i, degeneracy: 1 }));
    const survey = surveyAnharmonicLevels({ vibrations: modes, anharmonicity: { x: [], g: [] }, rotationalConstants: [1, 0.5, 0.4] });
    expect(survey.levels).toBeGreaterThan(MAX_ANHARMONIC_LEVELS);
  });
});
