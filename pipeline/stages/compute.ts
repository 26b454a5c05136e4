/**
 * Stage "compute": the partition-function properties of one species on its sampling grid (for the fit)
 * or on the table grid (for tables/<name>.csv). A function of the species and its plan only, so a worker
 * pool can run it: the small memo below only lets the table of a species take its rows from the sampling
 * grid just computed (the same numbers it would compute again), never changes a result.
 *
 * Both grids are evaluated whole (`ThermoEvaluator.grid`: typed arrays, no object per temperature). Level
 * lists with a temperature ceiling (hindered and linear rotors) are built for the smallest ceiling of
 * CEILINGS that holds every temperature asked for, so the sampling grid with its extrapolation zone and
 * the table grid of the usual settings (both within 200–6000 K, the zone up to 6100 K) use the same lists
 * and hence give the same numbers at shared points. One evaluator serves the samples and the zone: building
 * the level lists (rotor eigenvalues, diatomic levels) is most of a species' compute cost.
 */
import { T_REF } from '../../src/constants.js';
import type { ModelSummary, PhysicsOptions, Species, StandardProperties, ThermoEvaluator, ThermoGrid } from '../../src/model.js';
import type { FitSample } from '../../src/nasa7/types.js';
import { createThermoEvaluator } from '../../src/thermo/evaluator.js';
import { standardPropertiesOf } from '../../src/thermo/properties.js';
import { HINDERED_ROTOR_CEILING_TEMPERATURE } from '../../src/partition/hindered-rotor.js';
import { DEFAULT_FIT_TOLERANCES } from '../../src/nasa7/quality.js';

const ZONE_ABOVE = DEFAULT_FIT_TOLERANCES.extrapolation;

export interface ComputedSpecies {
  /** Cp/R, H/RT (absolute), S/R on the sampling grid, ascending T. */
  samples: FitSample[];
  /**
   * Cp/R, H/RT, S/R at the extrapolation-zone temperatures just beyond the range (plan.zoneTemperatures),
   * ascending. Only the verify stage reads them; the fit never sees them.
   */
  extrapolationSamples: FitSample[];
  /** The point at 298.15 K the fit reproduces exactly. */
  anchor: FitSample;
  /** Properties at 298.15 K in table units. */
  at298: StandardProperties;
  /** H°(298.15) − H°(0), J/mol. */
  h298MinusH0: number;
  /** ΔfH°(298.15), J/mol. */
  enthalpyOfFormation298: number;
  summary: ModelSummary;
}

/** Thrown when the physics cannot evaluate a species; the runner turns it into a diagnostic. */
export class ComputeError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'ComputeError';
  }
}

/**
 * Temperature ceilings (K) of the evaluators: 6100 covers the usual fit range up to 6000 K with its
 * extrapolation zone (zone-grid.ts), 10100 a range up to 10000 K, 20000 the largest the settings accept
 * (the zone stops there too).
 */
const CEILINGS = [6000 + ZONE_ABOVE, 10000 + ZONE_ABOVE, HINDERED_ROTOR_CEILING_TEMPERATURE] as const;

/** Species whose sampling grid is remembered for their table (a few per concurrent job is plenty). */
const MEMO_SIZE = 32;

interface Evaluated {
  species: Species;
  standardPressure: number;
  ev: ThermoEvaluator;
  values: ThermoGrid;
  index: Map<number, number>;
}

const recent: Evaluated[] = [];

/** The smallest ceiling holding T_REF and every temperature (above the last, the evaluator itself refuses). */
function evaluatorCeiling(temperatures: ArrayLike<number>): number {
  let max = T_REF;
  for (let j = 0; j < temperatures.length; j++) if (temperatures[j]! > max) max = temperatures[j]!;
  return CEILINGS.find((c) => c >= max) ?? max;
}

function evaluatorFor(species: Species, physics: PhysicsOptions, temperatures: readonly number[]): ThermoEvaluator {
  return createThermoEvaluator(species, physics, { maxTemperature: evaluatorCeiling(temperatures) });
}

const toSample = (p: StandardProperties): FitSample => ({ T: p.T, cpR: p.cpR, hRT: p.hRT, sR: p.sR });

function assertFinite(p: StandardProperties): void {
  for (const k of ['Cp', 'S', 'HminusH298', 'H', 'G', 'cpR', 'hRT', 'sR'] as const) {
    if (!Number.isFinite(p[k])) throw new ComputeError(`${k} at ${p.T} K is not a finite number (${p[k]})`);
  }
  if (!(p.Cp > 0)) throw new ComputeError(`Cp at ${p.T} K is not positive (${p.Cp})`);
}

function propertiesAt(ev: ThermoEvaluator, values: ThermoGrid, j: number): StandardProperties {
  const p = standardPropertiesOf(ev, values.T[j]!, { cp: values.cp[j]!, hmh0: values.hmh0[j]!, s: values.s[j]! });
  assertFinite(p);
  return p;
}

export function computeSamples(
  species: Species,
  physics: PhysicsOptions,
  temperatures: readonly number[],
  zoneTemperatures: readonly number[] = [],
): ComputedSpecies {
  // Samples, the anchor and the zone in one grid evaluation of one evaluator (each temperature's numbers
  // depend on that temperature and the level lists alone, so they are those of separate evaluations).
  const all = [...temperatures, T_REF, ...zoneTemperatures];
  const ev = evaluatorFor(species, physics, all);
  const n = temperatures.length;
  const values = ev.grid(all);
  const samples: FitSample[] = new Array<FitSample>(n);
  for (let j = 0; j < n; j++) samples[j] = toSample(propertiesAt(ev, values, j));
  const at298 = propertiesAt(ev, values, n);
  const extrapolationSamples: FitSample[] = new Array<FitSample>(zoneTemperatures.length);
  for (let j = 0; j < zoneTemperatures.length; j++) extrapolationSamples[j] = toSample(propertiesAt(ev, values, n + 1 + j));
  const index = new Map<number, number>();
  for (let j = 0; j < values.T.length; j++) if (!index.has(values.T[j]!)) index.set(values.T[j]!, j);
  if (recent.length >= MEMO_SIZE) recent.shift();
  recent.push({ species, standardPressure: physics.standardPressure, ev, values, index });
  return {
    samples,
    extrapolationSamples,
    anchor: toSample(at298),
    at298,
    h298MinusH0: ev.h298MinusH0,
    enthalpyOfFormation298: ev.enthalpyOfFormation298,
    summary: ev.summary,
  };
}

/**
 * Standard properties at each table temperature: rows on the sampling grid just computed for this species
 * come from it, the others from one grid evaluation.
 */
export function computeTable(species: Species, physics: PhysicsOptions, temperatures: readonly number[]): StandardProperties[] {
  const known = recent.find((r) => r.species === species && r.standardPressure === physics.standardPressure);
  const sameCeiling = known !== undefined && evaluatorCeiling(temperatures) === evaluatorCeiling(known.values.T);
  if (known && sameCeiling && temperatures.every((T) => known.index.has(T))) {
    return temperatures.map((T) => propertiesAt(known.ev, known.values, known.index.get(T)!));
  }
  const ev = sameCeiling ? known!.ev : evaluatorFor(species, physics, temperatures);
  const values = ev.grid(temperatures);
  return temperatures.map((_, j) => propertiesAt(ev, values, j));
}

