/**
 * The per-species plan: everything a species' compute, fit, verify and table stages depend on, derived
 * once from the database settings and the species' own overrides. Each stage's cache key is a hash of
 * exactly the part of the plan it reads, so a changed setting invalidates only what it affects:
 *   compute ← input, physics options, sampling grid, extrapolation-zone grid
 *   fit     ← compute key, fit options (the node set of fit.nodes included)
 *   table   ← input, physics options, table grid
 *   verify  ← tolerances (cheap; never cached)
 */
import { T_REF } from '../../src/constants.js';
import type { PhysicsOptions, Species } from '../../src/model.js';
import type { PartialFitStageOptions } from '../stages/fit.js';
import type { DatabaseSettings, FitTolerancesSetting } from './settings.js';
import { fitLimitsFor, midSearchFor } from './fit-plan.js';
import { standardPressurePa } from './settings.js';
import { temperatureGrid, tidy } from './grid.js';
import { extrapolationZoneTemperatures } from './zone-grid.js';

export interface SpeciesPlan {
  ranges: { low: number; mid: number; high: number };
  physics: PhysicsOptions;
  /**
   * Temperatures (K) of the computed points, ascending, 298.15 and the midpoint included: the check grid of
   * the verify stage, and the points the fit's nodes are drawn from (fitOptions.nodes, core/fit-nodes.ts).
   */
  sampleTemperatures: number[];
  /** The fit options, the node set included (so the fit's cache key changes with it). */
  fitOptions: PartialFitStageOptions;
  /** The species' fit limits: its own `tolerances` keys over the settings'. */
  tolerances: FitTolerancesSetting;
  /** Temperatures (K) of tables/<name>.csv, inside the species' range, ascending. */
  tableTemperatures: number[];
  /** Temperatures (K) just beyond the range where the extrapolated fit is checked (zone-grid.ts); never fitted. */
  zoneTemperatures: number[];
}

export function planSpecies(species: Species, settings: DatabaseSettings): SpeciesPlan {
  const o = species.temperatureRanges ?? {};
  const ranges = {
    low: o.low ?? settings.temperature_ranges.low,
    mid: o.mid ?? settings.temperature_ranges.mid,
    high: o.high ?? settings.temperature_ranges.high,
  };
  const physics: PhysicsOptions = { standardPressure: standardPressurePa(settings.standard_pressure) };
  const sampleTemperatures = temperatureGrid(ranges.low, ranges.high, settings.fit.sampling_step, [ranges.mid, T_REF]);
  const fitOptions: PartialFitStageOptions = {
    tLow: ranges.low,
    tMid: ranges.mid,
    tHigh: ranges.high,
    weights: { ...settings.fit.weights },
    continuityOrder: settings.fit.continuity_order,
    anchorT: T_REF,
    method: settings.fit.method === 'least_squares' ? 'least-squares' : 'minimax',
    nodes: settings.fit.nodes === 'all' ? 'all' : { ...settings.fit.nodes },
  };
  const tolerances = fitLimitsFor(settings.tolerances, species.fitLimits);
  fitOptions.limits = {
    cp: { absolute: tolerances.cp, perCp: tolerances.relative_to_cp.cp },
    h: { absolute: tolerances.h, perCp: tolerances.relative_to_cp.h },
    s: { absolute: tolerances.s, perCp: tolerances.relative_to_cp.s },
  };
  const search = midSearchFor(settings.fit.optimise_mid, ranges, o.mid !== undefined);
  if (search) fitOptions.optimiseMid = search;
  const t = settings.tables;
  const tableTemperatures = [...new Set([...temperatureGrid(t.from, t.to, t.step), ...t.extra.map(tidy)])]
    .filter((x) => x >= ranges.low && x <= ranges.high)
    .sort((a, b) => a - b);
  const zoneTemperatures = extrapolationZoneTemperatures(ranges.low, ranges.high);
  return { ranges, physics, sampleTemperatures, fitOptions, tolerances, tableTemperatures, zoneTemperatures };
}
