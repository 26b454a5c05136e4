/**
 * Cost of the anharmonic direct sum (src/partition/anharmonic-vibration.ts): validation (the level survey),
 * the level list built once per species, and one evaluation per point of a 10 K grid over 200–6000 K
 * (581 points), for CO2 (x_ij, g_22, alpha, D_J; Chedin 1979 constants, from memory) and H2O (x_ij of
 * Benedict, Gailar & Plyler 1956, alpha, Watson A; from memory), against the rigid-rotor harmonic model of
 * the same molecule. Wired into bench/run.ts (skip with --no-anharmonic).
 */
import { performance } from 'node:perf_hooks';
import { parseYamlText } from '../pipeline/stages/load.js';
import { validateSpecies } from '../pipeline/stages/validate.js';
import type { Species } from '../src/model.js';
import { createThermoEvaluator } from '../src/thermo/evaluator.js';

/** Anharmonic CO2 as a species file (also the end-to-end test's input, test/pipeline/anharmonic-build.test.ts). */
export const CO2_ANHARMONIC_YAML = `name: CO2
composition: {C: 1, O: 2}
enthalpy_of_formation: -393.51
sources: ["Chedin (1979), from memory"]
structure: linear
symmetry_number: 2
rotational_constants: [0.39022]
vibrations: [1354.31, {wavenumber: 672.85, degeneracy: 2}, 2396.32]
anharmonicity:
  x: [[1, 1, -2.93], [1, 2, -4.61], [1, 3, -19.82], [2, 2, 1.35], [2, 3, -12.31], [3, 3, -12.47]]
  g: [[2, 2, -0.97]]
  alpha: [[0.00120], [-0.00072], [0.00309]]
centrifugal_distortion: {DJ: 1.333e-7}
dissociation_energy: 43980
`;
const H2O = `name: H2O
composition: {H: 2, O: 1}
enthalpy_of_formation: -241.826
sources: ["Benedict, Gailar & Plyler (1956), from memory"]
structure: nonlinear
symmetry_number: 2
rotational_constants: [27.877, 14.512, 9.285]
vibrations: [3832.17, 1648.47, 3942.53]
anharmonicity:
  x: [[1, 1, -42.576], [1, 2, -15.933], [1, 3, -165.824], [2, 2, -16.813], [2, 3, -20.332], [3, 3, -47.566]]
  alpha: [[0.754, 0.206, 0.181], [-3.25, -0.175, 0.156], [1.231, 0.081, 0.143]]
centrifugal_distortion: {DJ: 1.254e-3, DJK: -5.77e-3, DK: 3.247e-2, dJ: 5.07e-4, dK: 1.36e-3}
dissociation_energy: 41130
`;

export interface AnharmonicBenchRow {
  name: string;
  validateMs: number;
  buildMs: number;
  gridMs: number;
  harmonicGridMs: number;
  levels: string;
}

function species(text: string): Species {
  const r = validateSpecies(parseYamlText(text, 'bench.yaml').documents[0]!);
  if (!r.species) throw new Error(`bench species invalid: ${JSON.stringify(r.diagnostics)}`);
  return r.species;
}

function gridMs(s: Species): number {
  const ev = createThermoEvaluator(s);
  const t0 = performance.now();
  for (let T = 200; T <= 6000; T += 10) ev.at(T);
  return performance.now() - t0;
}

export function benchAnharmonic(): AnharmonicBenchRow[] {
  return [
    ['CO2', CO2_ANHARMONIC_YAML],
    ['H2O', H2O],
  ].map(([name, text]) => {
    const t0 = performance.now();
    const s = species(text!);
    const t1 = performance.now();
    const ev = createThermoEvaluator(s);
    const t2 = performance.now();
    const harmonic = { ...s } as Species & { anharmonicity?: unknown; centrifugalDistortion?: unknown; dissociationEnergy?: unknown };
    delete harmonic.anharmonicity;
    delete harmonic.centrifugalDistortion;
    delete harmonic.dissociationEnergy;
    const line = ev.summary.contributions.find((c) => c.startsWith('anharmonic')) ?? '';
    return {
      name: name!,
      validateMs: t1 - t0,
      buildMs: t2 - t1,
      gridMs: gridMs(s),
      harmonicGridMs: gridMs(harmonic),
      levels: /\d+ states, \d+ levels/.exec(line)?.[0] ?? '',
    };
  });
}
