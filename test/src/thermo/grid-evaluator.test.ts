/**
 * The grid evaluator (ThermoEvaluator.grid: binned level sums, one-exponential harmonic modes, grid rotor
 * forms) against the DIRECT formula of every model: the per-point functions of src/partition composed by
 * hand here (direct level sums, expm1/log1p oscillators, the direct J sum), at 1e-10 relative in Cp/R,
 * (H − H0)/RT and S/R — the accuracy the issue asks for; the stated bounds (level-sum-grid.ts,
 * harmonic.ts) promise ~1e-13. Species: the physics fixtures (constants from memory, sources there) and
 * hand-written variants (a heavy n = 1 torsion, frozen H2, many degenerate modes); temperatures span the
 * direct-sum region below 200 K, the 10 K fitting grid and the 20000 K ceiling.
 */
import { describe, expect, it } from 'vitest';
import { C2_CM_K, STANDARD_PRESSURE_BAR } from '../../../src/constants.js';
import type { DiatomicSpecies, NonlinearSpecies, Species } from '../../../src/model.js';
import { diatomicLevels, diatomicSpinManifolds } from '../../../src/partition/diatomic.js';
import { electronicLevelList } from '../../../src/partition/electronic.js';
import { temperatureGrid, zeroGridMoments } from '../../../src/partition/grid-moments.js';
import { addHarmonicGrid, harmonicMoments } from '../../../src/partition/harmonic.js';
import { expNeg, expNegPairSmall } from '../../../src/partition/exp-neg.js';
import { hinderedRotorLevels, hinderedRotorMoments } from '../../../src/partition/hindered-rotor.js';
import { createLevelList, levelSumMoments, stableEnergyOrder } from '../../../src/partition/level-sum.js';
import { addLevelSumGrid } from '../../../src/partition/level-sum-grid.js';
import { addMoments, type PartitionMoments } from '../../../src/partition/moments.js';
import { linearRotorLevelList, linearRotorMoments } from '../../../src/partition/rigid-rotor-linear.js';
import { nonlinearRotorMoments } from '../../../src/partition/rigid-rotor-nonlinear.js';
import { frozenMixtureContribution } from '../../../src/partition/spin-mixture.js';
import { translationalMoments } from '../../../src/partition/translational.js';
import { createThermoEvaluator } from '../../../src/thermo/evaluator.js';
import { HYDROGEN_PEROXIDE } from '../../fixtures/hindered-rotor.js';
import {
  ARGON,
  CARBON_DIOXIDE,
  CARBON_MONOXIDE,
  HYDROGEN,
  NITROGEN,
  OXYGEN,
  OXYGEN_ATOM,
  WATER,
} from '../../fixtures/physics-species.js';

const TOLERANCE = 1e-10;

/** Hand-written: H2O2 with a heavy one-fold torsion (B = 1 cm⁻¹, ~900 levels) and a degenerate mode set. */
const HEAVY_TORSION: NonlinearSpecies = {
  ...HYDROGEN_PEROXIDE,
  name: 'heavy-torsion',
  vibrations: [
    { wavenumber: 3599, degeneracy: 1 },
    { wavenumber: 1402, degeneracy: 3 },
    { wavenumber: 120, degeneracy: 2 },
    { wavenumber: 9, degeneracy: 1 },
    { wavenumber: 1266, degeneracy: 12 },
  ],
  electronicLevels: [
    { energy: 0, degeneracy: 2 },
    { energy: 800, degeneracy: 4 },
  ],
  internalRotors: [...HYDROGEN_PEROXIDE.internalRotors!, { barrier: 1000, foldedness: 1, symmetryNumber: 1, rotationalConstant: 1 }],
};
const FROZEN_H2: DiatomicSpecies = { ...HYDROGEN, nuclearSpinMixture: 'frozen' };

const built = new Map<unknown, unknown>();
/** Build once per (object, ceiling): the direct reference sums the same level lists at every T. */
function once<T>(key: object, ceiling: number, make: () => T): T {
  const k = `${ceiling}`;
  let byCeiling = built.get(key) as Map<string, T> | undefined;
  if (!byCeiling) built.set(key, (byCeiling = new Map()));
  if (!byCeiling.has(k)) byCeiling.set(k, make());
  return byCeiling.get(k)!;
}

/** Direct composition of the per-point models (the formulas, no grid code). */
function direct(species: Species, T: number, ceiling: number): { cp: number; hmh0: number; s: number } {
  const trans = translationalMoments(species.molarMass, T, STANDARD_PRESSURE_BAR);
  let internal: PartitionMoments;
  switch (species.structure) {
    case 'atom':
      internal = levelSumMoments(once(species, 0, () => electronicLevelList(species.electronicLevels)), T);
      break;
    case 'diatomic':
      if (species.nuclearSpinMixture === 'frozen') {
        const c = frozenMixtureContribution(once(species, 0, () => diatomicSpinManifolds(species).components), T);
        return { cp: trans.varU + c.cp, hmh0: trans.meanU + c.hmh0, s: trans.lnQ + trans.meanU + c.s };
      }
      internal = levelSumMoments(once(species, 0, () => diatomicLevels(species).levels), T);
      break;
    case 'linear':
    case 'nonlinear': {
      const rotor =
        species.structure === 'linear'
          ? linearRotorMoments(species.rotationalConstants[0], species.symmetryNumber, T)
          : nonlinearRotorMoments(species.rotationalConstants, species.symmetryNumber, T);
      const torsions = (species.internalRotors ?? []).map((r) =>
        hinderedRotorMoments(once(r, ceiling, () => hinderedRotorLevels(r, { ceilingTemperature: ceiling })), T),
      );
      const el = once(species, 0, () => electronicLevelList(species.electronicLevels));
      internal = addMoments([rotor, harmonicMoments(species.vibrations, T), levelSumMoments(el, T), ...torsions]);
      break;
    }
  }
  const m = addMoments([trans, internal]);
  return { cp: m.varU, hmh0: m.meanU, s: m.lnQ + m.meanU };
}

const fittingGrid = [50, 100, 150, ...Array.from({ length: 581 }, (_, i) => 200 + 10 * i), 298.15];

describe('grid evaluator = direct formula of every model (1e-10 relative in Cp/R, (H − H0)/RT, S/R)', () => {
  const cases: Array<[string, Species, number, number[]]> = [
    ['atom Ar', ARGON, 6000, fittingGrid],
    ['atom O (fine-structure levels)', OXYGEN_ATOM, 6000, fittingGrid],
    ['diatomic N2 (full level sum)', NITROGEN, 6000, fittingGrid],
    ['diatomic CO', CARBON_MONOXIDE, 6000, fittingGrid],
    ['diatomic O2 (three states)', OXYGEN, 6000, fittingGrid],
    ['diatomic H2, equilibrium spin weights', HYDROGEN, 6000, fittingGrid],
    ['diatomic H2, frozen mixture', FROZEN_H2, 6000, fittingGrid],
    ['nonlinear H2O', WATER, 6000, fittingGrid],
    ['linear CO2 (J sum)', CARBON_DIOXIDE, 6000, fittingGrid],
    ['nonlinear H2O2 with torsion', HYDROGEN_PEROXIDE, 6000, fittingGrid],
    ['heavy torsion, degenerate and very soft modes', HEAVY_TORSION, 6000, fittingGrid],
    ['heavy torsion up to the 20000 K ceiling', HEAVY_TORSION, 20000, [200, 1000, 6000, 9000, 12000, 20000]],
    ['CO2 up to the 20000 K ceiling', CARBON_DIOXIDE, 20000, [200, 1000, 6000, 12000, 20000]],
  ];
  it.each(cases)('%s', (_, species, ceiling, temperatures) => {
    const ev = createThermoEvaluator(species, {}, { maxTemperature: ceiling });
    const g = ev.grid(temperatures);
    let worst = 0;
    temperatures.forEach((T, j) => {
      const d = direct(species, T, ceiling);
      for (const [a, b] of [
        [g.cp[j]!, d.cp],
        [g.hmh0[j]!, d.hmh0],
        [g.s[j]!, d.s],
      ] as const) {
        worst = Math.max(worst, Math.abs(a - b) / Math.abs(b));
      }
    });
    expect(worst).toBeLessThan(TOLERANCE);
  });

  it('at(T) is the grid value at T, bit for bit (each temperature depends on itself alone)', () => {
    for (const species of [NITROGEN, HEAVY_TORSION, FROZEN_H2, CARBON_DIOXIDE]) {
      const ev = createThermoEvaluator(species, {}, { maxTemperature: 6000 });
      const temperatures = [200, 298.15, 1000, 3210, 6000];
      const g = ev.grid(temperatures);
      temperatures.forEach((T, j) => expect(ev.at(T)).toEqual({ T, cp: g.cp[j], hmh0: g.hmh0[j], s: g.s[j] }));
    }
  });

  it('refuses a temperature above the ceiling it was built for', () => {
    expect(() => createThermoEvaluator(HEAVY_TORSION, {}, { maxTemperature: 6000 }).grid([6001])).toThrow(/6000 K/);
  });
});

describe('grid building blocks against their direct forms', () => {
  /** Seeded level list (hand-written generator): clusters, exact ties and wide gaps. */
  function levels(seed: number, n: number) {
    let a = seed;
    const rnd = () => ((a = (a * 1103515245 + 12345) % 2147483648) / 2147483648);
    const e: number[] = [];
    const w: number[] = [];
    for (let i = 0; i < n; i++) {
      const r = rnd();
      e.push(r < 0.1 ? 500 : r < 0.5 ? 20000 * rnd() : 100000 * rnd() ** 2);
      w.push(1 + Math.floor(5 * rnd()));
    }
    return createLevelList(e, w, 1.438776877);
  }
  /** Every moment of the binned grid sum within 1e-12 of its scale of the direct sum at each temperature. */
  function expectBinnedEqualsDirect(list: Parameters<typeof addLevelSumGrid>[0], temperatures: number[]): void {
    const grid = temperatureGrid(temperatures);
    const m = zeroGridMoments(temperatures.length);
    addLevelSumGrid(list, grid, m);
    temperatures.forEach((T, j) => {
      const d = levelSumMoments(list, T);
      expect(Math.abs(m.lnQ[j]! - d.lnQ)).toBeLessThan(1e-12 * Math.max(1, Math.abs(d.lnQ)));
      expect(Math.abs(m.meanU[j]! - d.meanU)).toBeLessThan(1e-12 * Math.max(1, d.meanU));
      expect(Math.abs(m.varU[j]! - d.varU)).toBeLessThan(1e-12 * Math.max(1, d.varU));
    });
  }
  it('binned level sum = direct level sum (every moment, 1e-12 relative of its scale)', () => {
    const temperatures = [20, 60, 150, 199, 200, 250, 400, 1000, 2222, 6000, 20000];
    for (const list of [levels(1, 65), levels(2, 3000), levels(3, 40000)]) {
      expectBinnedEqualsDirect(list, temperatures);
    }
  });
  it('binned sum of sparse ladders (one or two levels per bin, hindered and linear rotors) = direct sum, 1e-12 on the 10 K grid', () => {
    // Hand-written rotors: a light CH3-like top, a heavy one-fold torsion, and a floppy two-fold one.
    const rotors = [
      { barrier: 1000, foldedness: 3, symmetryNumber: 3, rotationalConstant: 5.3 },
      { barrier: 1000, foldedness: 1, symmetryNumber: 1, rotationalConstant: 1 },
      { barrier: 150, foldedness: 2, symmetryNumber: 2, rotationalConstant: 0.4 },
    ];
    const temperatures = Array.from({ length: 591 }, (_, i) => 200 + 10 * i);
    const lists = [
      ...rotors.map((r) => hinderedRotorLevels(r, { ceilingTemperature: 6100 }).list),
      linearRotorLevelList(0.39, 6100),
    ];
    for (const list of lists) {
      expectBinnedEqualsDirect(list, temperatures);
    }
  });
  it('one-exponential harmonic modes = expm1/log1p form, from x ≈ 4e-4 to x ≈ 6e3', () => {
    const vib = [5, 300, 1500, 3000, 4000, 40000].map((wavenumber, i) => ({ wavenumber, degeneracy: 1 + (i % 3) }));
    const temperatures = [10, 200, 1000, 6000, 20000];
    const m = zeroGridMoments(temperatures.length);
    addHarmonicGrid(vib, temperatureGrid(temperatures), m);
    temperatures.forEach((T, j) => {
      const d = harmonicMoments(vib, T);
      expect(Math.abs(m.lnQ[j]! - d.lnQ)).toBeLessThan(1e-13 * Math.max(1, Math.abs(d.lnQ)));
      expect(Math.abs(m.meanU[j]! / d.meanU - 1)).toBeLessThan(1e-13);
      expect(Math.abs(m.varU[j]! / d.varU - 1)).toBeLessThan(1e-13);
    });
  });
  it('the temperature-by-temperature loop gives the doubles of the mode-by-mode loop it replaced, bit for bit', () => {
    // The mode-by-mode form as it stood before (written here from that code): same operations per mode and
    // temperature, sums kept in grid arrays.
    const modeByMode = (vibrations: ReadonlyArray<{ wavenumber: number; degeneracy: number }>, T: readonly number[]) => {
      const n = T.length;
      const meanU = new Float64Array(n);
      const varU = new Float64Array(n);
      const product = new Float64Array(n).fill(1);
      const logSum = new Float64Array(n);
      const pair = new Float64Array(2);
      for (const { wavenumber, degeneracy: d } of vibrations) {
        const th = C2_CM_K * wavenumber;
        const powers = d === 1 ? 1 : Number.isInteger(d) && d <= 8 ? d : 0;
        for (let j = 0; j < n; j++) {
          const x = th * (1 / T[j]!);
          let e: number;
          let oneMinusE: number;
          if (x >= Math.LN2) {
            e = expNeg(x);
            oneMinusE = 1 - e;
          } else {
            expNegPairSmall(x, pair);
            e = pair[0]!;
            oneMinusE = pair[1]!;
          }
          const inv = 1 / oneMinusE;
          const xRatio = d * x * e * inv;
          meanU[j]! += xRatio;
          varU[j]! += xRatio * x * inv;
          let p = product[j]!;
          if (powers === 1) p *= oneMinusE;
          else if (powers > 1) for (let r = 0; r < powers; r++) p *= oneMinusE;
          else logSum[j]! += d * Math.log(oneMinusE);
          if (p < 1e-250) {
            logSum[j]! += Math.log(p);
            p = 1;
          }
          product[j] = p;
        }
      }
      // Added into zeroed moments as the grid form does (0 − x, so a zero sum gives +0, not −0).
      return { lnQ: Array.from(T, (_, j) => 0 - (logSum[j]! + Math.log(product[j]!))), meanU: Array.from(meanU, (v) => 0 + v), varU: Array.from(varU, (v) => 0 + v) };
    };
    // Mode sets made by this test (seeded, no external source): 1–180 modes of 5–4000 cm⁻¹, degeneracies
    // 1, 2, 3 and a non-integer 1.5 (its own logarithm), and enough low modes at 20 K for the running
    // product to underflow-flush.
    let seed = 5;
    const rnd = () => (seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648;
    const T = [20, 200, 298.15, 1000, 2990, 6000, 20000];
    for (let trial = 0; trial < 30; trial++) {
      const count = 1 + Math.floor(rnd() * 180);
      const vib = Array.from({ length: count }, () => ({ wavenumber: 5 + rnd() * 3995, degeneracy: [1, 1, 1, 2, 3, 1.5][Math.floor(rnd() * 6)]! }));
      const m = zeroGridMoments(T.length);
      addHarmonicGrid(vib, temperatureGrid(T), m);
      const ref = modeByMode(vib, T);
      const bits = (a: ArrayLike<number>) => Array.from(a, (v) => (Object.is(v, -0) ? '-0' : String(v)));
      expect(bits(m.lnQ), `trial ${trial}`).toEqual(bits(ref.lnQ));
      expect(bits(m.meanU), `trial ${trial}`).toEqual(bits(ref.meanU));
      expect(bits(m.varU), `trial ${trial}`).toEqual(bits(ref.varU));
    }
  });
  it('a nearly free mode (x ≈ 7e-6) keeps full precision in lnQ = −ln(1 − e^{−x}) (the e-first form loses 1e-16/x)', () => {
    const temperatures = [200, 20000];
    const m = zeroGridMoments(2);
    addHarmonicGrid([{ wavenumber: 0.1, degeneracy: 1 }], temperatureGrid(temperatures), m);
    temperatures.forEach((T, j) => {
      const x = (C2_CM_K * 0.1) / T;
      expect(Math.abs(m.lnQ[j]! / -Math.log(-Math.expm1(-x)) - 1)).toBeLessThan(1e-15);
    });
  });
  it('stableEnergyOrder is the stable sort by energy', () => {
    const e = [5, 1, 1, 3, 9, 2, 2, 8, 0, 5, 5, 1];
    const expected = e.map((_, i) => i).sort((a, b) => e[a]! - e[b]! || a - b);
    expect([...stableEnergyOrder(e)]).toEqual(expected);
    expect([...stableEnergyOrder([1, 2, 3])]).toEqual([0, 1, 2]);
    // Seeded lists made by this test (no external source): sorted runs of random lengths, values drawn from
    // few levels so that ties are common, and −0 beside 0 (equal energies: input order decides).
    let seed = 11;
    const rnd = () => (seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648;
    for (let trial = 0; trial < 40; trial++) {
      const list: number[] = [];
      const n = 1 + Math.floor(rnd() * 400);
      while (list.length < n) {
        let v = Math.floor(rnd() * 30) - 5;
        for (let r = Math.floor(rnd() * 20); r >= 0 && list.length < n; r--) list.push((v += Math.floor(rnd() * 3)) === 0 && rnd() < 0.5 ? -0 : v);
      }
      const want = list.map((_, i) => i).sort((x, y) => list[x]! - list[y]! || x - y);
      expect([...stableEnergyOrder(list)]).toEqual(want);
      expect([...stableEnergyOrder(Float64Array.from(list))]).toEqual(want);
    }
  });
});
