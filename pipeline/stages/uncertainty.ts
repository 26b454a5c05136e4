/**
 * Stage "uncertainty": propagated standard uncertainties of one species (src/uncertainty) at 298.15, 1000
 * and 2000 K (those inside its fitted range; 298.15 K always), a u(Cp°) band over the range for the
 * report, and optionally the seeded Monte Carlo check. Pure, like compute. Also the thermo.json form.
 */
import { T_REF } from '../../src/constants.js';
import type { PhysicsOptions, Species } from '../../src/model.js';
import { propagateUncertainty, type Contributor, type SpeciesUncertainty } from '../../src/uncertainty/index.js';

/** Temperatures of the reported uncertainties, K. */
export const UNCERTAINTY_TEMPERATURES = [T_REF, 1000, 2000] as const;
/** Seed of the Monte Carlo check (fixed, so a build stays reproducible). */
export const MONTE_CARLO_SEED = 20240611;
/** Points of the report's u(Cp°) band. */
const BAND_POINTS = 24;

export const UNCERTAINTY_METHOD =
  'linear propagation of independent standard uncertainties, u(f)^2 = sum (df/dx_i u_i)^2 (GUM, JCGM 100:2008); ' +
  'df/dx analytic for harmonic vibrations, central differences (relative step 1e-4) otherwise; input uncertainties only, model errors not included';

export function computeUncertainty(
  species: Species,
  physics: PhysicsOptions,
  ranges: { low: number; high: number },
  monteCarloSamples?: number,
): SpeciesUncertainty {
  const temperatures = UNCERTAINTY_TEMPERATURES.filter((T) => T === T_REF || (T >= ranges.low && T <= ranges.high));
  const band: number[] = [];
  for (let i = 0; i <= BAND_POINTS; i++) band.push(ranges.low + ((ranges.high - ranges.low) * i) / BAND_POINTS);
  return propagateUncertainty(species, physics, {
    temperatures,
    bandTemperatures: band,
    ...(monteCarloSamples && monteCarloSamples > 1 ? { monteCarlo: { samples: monteCarloSamples, seed: MONTE_CARLO_SEED } } : {}),
  });
}

const contributorsJson = (cs: readonly Contributor[]) => cs.map((c) => ({ input: c.input, contribution: c.contribution }));

/** The `uncertainty` block of a species in thermo.json (schemas/database.schema.json). */
export function uncertaintyJson(u: SpeciesUncertainty) {
  return {
    declared: u.inputs.length > 0,
    method: UNCERTAINTY_METHOD,
    inputs: u.inputs.map((i) => ({ name: i.name, value: i.value, u: i.u, unit: i.unit, sensitivity: i.method ?? 'central-difference' })),
    points: u.points.map((p) => ({
      t_k: p.T,
      u_cp_j_per_mol_k: p.cp,
      u_s_j_per_mol_k: p.s,
      u_h_minus_h298_kj_per_mol: p.hMinusH298,
      u_h_kj_per_mol: p.h,
      largest: {
        cp: contributorsJson(p.largest.cp),
        s: contributorsJson(p.largest.s),
        h_minus_h298: contributorsJson(p.largest.hMinusH298),
        h: contributorsJson(p.largest.h),
      },
    })),
    ...(u.monteCarlo
      ? {
          monte_carlo: u.monteCarlo.map((m) => ({
            t_k: m.T,
            samples: m.samples,
            seed: m.seed,
            u_cp_j_per_mol_k: m.cp,
            u_s_j_per_mol_k: m.s,
            u_h_minus_h298_kj_per_mol: m.hMinusH298,
            u_h_kj_per_mol: m.h,
          })),
        }
      : {}),
  };
}
