/**
 * Linear propagation of independent input uncertainties (GUM, JCGM 100:2008, eq. 10 without correlation
 * terms): u(f)² = Σ_i (∂f/∂x_i · u_i)², for f in Cp°, S°, H° − H°298, H°, at chosen temperatures, with the
 * three largest contributions |∂f/∂x_i|·u_i named. A species without declared uncertainties gets zeros.
 */
import type { PhysicsOptions, Species } from '../model.js';
import { uncertainInputs, type PerturbableInput } from './inputs.js';
import { propertiesAt, sensitivities } from './sensitivity.js';
import { createNormalSampler } from './prng.js';
import type { Contributor, MonteCarloPoint, PropagatedPoint, Sensitivity, SpeciesUncertainty, UncertaintyQuantity } from './types.js';

const QUANTITIES: readonly UncertaintyQuantity[] = ['cp', 's', 'hMinusH298', 'h'];
/** Contributors named per quantity. */
export const LARGEST_CONTRIBUTORS = 3;

export interface PropagationOptions {
  /** Temperatures of the reported points (K), e.g. 298.15, 1000, 2000. */
  temperatures: readonly number[];
  /** Temperatures of the u(Cp°) band of the report (K). */
  bandTemperatures?: readonly number[];
  /** Optional Monte Carlo check at `temperatures`. */
  monteCarlo?: { samples: number; seed: number };
}

export function propagateUncertainty(species: Species, physics: Partial<PhysicsOptions>, options: PropagationOptions): SpeciesUncertainty {
  const inputs = uncertainInputs(species);
  const band = options.bandTemperatures ?? [];
  const all = [...options.temperatures, ...band];
  const { values, methods } = sensitivities(species, physics, inputs, all);
  const pointAt = (k: number, T: number): PropagatedPoint => {
    const point: PropagatedPoint = { T, cp: 0, s: 0, hMinusH298: 0, h: 0, largest: { cp: [], s: [], hMinusH298: [], h: [] } };
    for (const q of QUANTITIES) {
      const parts: Contributor[] = inputs.map((inp, i) => ({ input: inp.name, contribution: Math.abs(values[i]![k]![q]) * inp.u }));
      point[q] = Math.sqrt(parts.reduce((a, c) => a + c.contribution * c.contribution, 0));
      point.largest[q] = parts
        .filter((c) => c.contribution > 0)
        .sort((a, b) => b.contribution - a.contribution || (a.input < b.input ? -1 : 1))
        .slice(0, LARGEST_CONTRIBUTORS);
    }
    return point;
  };
  // The band needs u(Cp°) alone: the same sum in the same order as pointAt's, without its contributor lists.
  const cpAt = (k: number): number => {
    let sum = 0;
    for (let i = 0; i < inputs.length; i++) {
      const contribution = Math.abs(values[i]![k]!.cp) * inputs[i]!.u;
      sum = sum + contribution * contribution;
    }
    return Math.sqrt(sum);
  };
  const result: SpeciesUncertainty = {
    inputs: inputs.map((inp, i) => ({ name: inp.name, value: inp.value, u: inp.u, unit: inp.unit, method: methods[i]! })),
    points: options.temperatures.map((T, k) => pointAt(k, T)),
    cpBand: band.map((T, j) => ({ T, u: cpAt(options.temperatures.length + j) })),
  };
  if (options.monteCarlo && options.monteCarlo.samples > 1 && inputs.length > 0) {
    result.monteCarlo = monteCarlo(species, physics, inputs, options.temperatures, options.monteCarlo.samples, options.monteCarlo.seed);
  }
  return result;
}

/**
 * Monte Carlo check: every input drawn from N(x_i, u_i²) at once, the same evaluator, the sample standard
 * deviation of each property. Agrees with the linear result when the model is near-linear over ±u; where
 * it does not (low barriers, level-count cuts), the linear figure should not be trusted.
 */
export function monteCarlo(
  species: Species,
  physics: Partial<PhysicsOptions>,
  inputs: readonly PerturbableInput[],
  temperatures: readonly number[],
  samples: number,
  seed: number,
): MonteCarloPoint[] {
  const normal = createNormalSampler(seed);
  const sum = temperatures.map(() => ({ cp: 0, s: 0, hMinusH298: 0, h: 0 }));
  const sumSq = temperatures.map(() => ({ cp: 0, s: 0, hMinusH298: 0, h: 0 }));
  const base = propertiesAt(species, physics, temperatures);
  for (let n = 0; n < samples; n++) {
    const copy = structuredClone(species);
    for (const inp of inputs) inp.apply(copy, inp.u * normal());
    const p = propertiesAt(copy, physics, temperatures);
    p.forEach((v, k) => {
      for (const q of QUANTITIES) {
        // Differences from the unperturbed value keep the sums well conditioned.
        const d = v[q] - base[k]![q];
        (sum[k] as Sensitivity)[q] += d;
        (sumSq[k] as Sensitivity)[q] += d * d;
      }
    });
  }
  return temperatures.map((T, k) => {
    const sd = (q: UncertaintyQuantity) => {
      const mean = sum[k]![q] / samples;
      return Math.sqrt(Math.max(0, (sumSq[k]![q] - samples * mean * mean) / (samples - 1)));
    };
    return { T, samples, seed, cp: sd('cp'), s: sd('s'), hMinusH298: sd('hMinusH298'), h: sd('h') };
  });
}
