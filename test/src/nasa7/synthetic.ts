/**
 * Closed-form ideal-gas models for fit tests (not the project's physics; independent of src/thermo):
 * translation (Sackur–Tetrode), rigid rotor in its high-temperature limit, harmonic oscillators (Einstein
 * functions). Formulas as published in e.g. McQuarrie, Statistical Mechanics (1976), ch. 5–8:
 *   vibration, x = θ/T:  Cv/R = x² eˣ/(eˣ−1)²,  (H−H0)/RT = x/(eˣ−1),  S/R = x/(eˣ−1) − ln(1−e^(−x))
 *   linear rotor:        Cp/R = 1,  H/RT = 1,  S/R = ln(T/(σ θr)) + 1
 *   nonlinear rotor:     Cp/R = 3/2, H/RT = 3/2, S/R = ln(√π/σ · √(T³/(θA θB θC))) + 3/2
 *   translation:         Cp/R = 5/2, H/RT = 5/2, S/R = ln[(2π m k T/h²)^(3/2) k T/p°] + 5/2
 */
import { ATOMIC_MASS_CONSTANT, BOLTZMANN, C2_CM_K, PLANCK, STANDARD_PRESSURE_BAR, T_REF } from '../../../src/constants.js';
import type { FitSample } from '../../../src/nasa7/types.js';

export interface RrhoModel {
  massU: number;
  /** 'linear' → one B; 'nonlinear' → [A, B, C]; 'atom' → none. cm⁻¹ */
  rotor: { kind: 'atom' } | { kind: 'linear'; B: number; sigma: number } | { kind: 'nonlinear'; ABC: [number, number, number]; sigma: number };
  /** [wavenumber cm⁻¹, degeneracy] */
  vibrations: Array<[number, number]>;
  /** ΔfH°(298.15)/R in K, so hRT carries a realistic formation-enthalpy term. */
  dfH298OverR: number;
}

function relative(model: RrhoModel, T: number): { cpR: number; hmh0RT: number; sR: number } {
  const m = model.massU * ATOMIC_MASS_CONSTANT;
  let cpR = 2.5;
  let hmh0RT = 2.5;
  let sR = Math.log(((2 * Math.PI * m * BOLTZMANN * T) / PLANCK ** 2) ** 1.5 * ((BOLTZMANN * T) / STANDARD_PRESSURE_BAR)) + 2.5;
  const rot = model.rotor;
  if (rot.kind === 'linear') {
    cpR += 1;
    hmh0RT += 1;
    sR += Math.log(T / (rot.sigma * rot.B * C2_CM_K)) + 1;
  } else if (rot.kind === 'nonlinear') {
    const [A, B, C] = rot.ABC.map((x) => x * C2_CM_K) as [number, number, number];
    cpR += 1.5;
    hmh0RT += 1.5;
    sR += Math.log((Math.sqrt(Math.PI) / rot.sigma) * Math.sqrt(T ** 3 / (A * B * C))) + 1.5;
  }
  for (const [nu, g] of model.vibrations) {
    const x = (nu * C2_CM_K) / T;
    const em1 = Math.expm1(x);
    cpR += (g * x * x * Math.exp(x)) / (em1 * em1);
    hmh0RT += (g * x) / em1;
    sR += g * (x / em1 - Math.log(-Math.expm1(-x)));
  }
  return { cpR, hmh0RT, sR };
}

/** Absolute point: H(T) = ΔfH298 + [H(T) − H(298.15)]. */
export function rrhoSample(model: RrhoModel, T: number): FitSample {
  const r = relative(model, T);
  const ref = relative(model, T_REF);
  const hR = model.dfH298OverR + r.hmh0RT * T - ref.hmh0RT * T_REF;
  return { T, cpR: r.cpR, hRT: hR / T, sR: r.sR };
}

export function grid(from: number, to: number, step: number): number[] {
  const out: number[] = [];
  for (let i = 0; from + i * step <= to + 1e-9; i++) out.push(from + i * step);
  return out;
}

/** N2, rigid rotor + harmonic oscillator; ωe = 2358.57 cm⁻¹, Be = 1.99824 cm⁻¹ (Huber & Herzberg 1979). */
export const N2_RRHO: RrhoModel = {
  massU: 28.0134,
  rotor: { kind: 'linear', B: 1.99824, sigma: 2 },
  vibrations: [[2358.57, 1]],
  dfH298OverR: 0,
};

/**
 * CH4, rigid rotor + harmonic oscillators. Fundamentals 2917 (1), 1534 (2), 3019 (3), 1306 (3) cm⁻¹
 * (Shimanouchi, NSRDS-NBS 39, 1972; from memory), B = 5.241 cm⁻¹ spherical top (from memory), σ = 12;
 * ΔfH°(298.15) = −74.87 kJ/mol (NIST-JANAF 4th ed., from memory).
 */
export const CH4_RRHO: RrhoModel = {
  massU: 16.0425,
  rotor: { kind: 'nonlinear', ABC: [5.241, 5.241, 5.241], sigma: 12 },
  vibrations: [
    [2917, 1],
    [1534, 2],
    [3019, 3],
    [1306, 3],
  ],
  dfH298OverR: -74870 / 8.314462618,
};

/**
 * H2O, rigid rotor + harmonic oscillators: 3657, 1595, 3756 cm⁻¹; A, B, C = 27.88, 14.51, 9.28 cm⁻¹,
 * σ = 2 (Herzberg, Electronic spectra … of polyatomic molecules, 1966; from memory); ΔfH°(298.15) =
 * −241.826 kJ/mol (CODATA key values, from memory). Large negative H/RT at low T.
 */
export const H2O_RRHO: RrhoModel = {
  massU: 18.01528,
  rotor: { kind: 'nonlinear', ABC: [27.88, 14.51, 9.28], sigma: 2 },
  vibrations: [
    [3657, 1],
    [1595, 1],
    [3756, 1],
  ],
  dfH298OverR: -241826 / 8.314462618,
};
