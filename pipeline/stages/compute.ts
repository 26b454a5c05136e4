/**
 * Stage "compute": the partition-function properties of one species on its sampling grid (for the fit)
 * or on the table grid (for tables/<name>.csv). A function of the species and its plan only, so a worker
 * pool can run it: the small memo below only lets the table of a species take its rows from the sampling
 * grid just computed (the same numbers it would compute again), never changes a result.
 *
 * Both grids are evaluated whole (`ThermoEvaluator.grid`: typed arrays, no object per temperature). Level
 * lists with a temperature ceiling (hindered and linear rotors) are built for the smallest ceiling of
 * CEILINGS that holds every temperature asked for, so the sampling and the table grid of the usual
 * settings (both within 200–6000 K) use the same lists and hence give the same numbers at shared points.
 */
import { T_REF } from '../../src/constants.js';
import type { ModelSummary, PhysicsOptions, Species, StandardProperties, ThermoEvaluator, ThermoGrid } from '../../src/model.js';
import type { FitSample } from '../../src/nasa7/types.js';
import { createThermoEvaluator } from '../../src/thermo/evaluator.js';
import { standardPropertiesOf } from '../../src/thermo/properties.js';

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

/** Temperature ceilings (K) of the evaluators: 6000 covers the usual fit range, 20000 the largest the settings accept. */
const CEILINGS = [6000, 10000, 20000] as const;

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

/**
 * The zone points are evaluated apart from the samples: with the samples' evaluator when its ceiling holds
 * them, else with one built for their ceiling — so the samples (and hence the fit) are the numbers they
 * would be without the zone, bit for bit.
 */
function zoneSamples(species: Species, physics: PhysicsOptions, ev: ThermoEvaluator, sampleTemperatures: readonly number[], zone: readonly number[]): FitSample[] {
  if (zone.length === 0) return [];
  let zoneMax = T_REF;
  for (const T of zone) if (T > zoneMax) zoneMax = T;
  // Above the samples' ceiling: an evaluator built for exactly the zone's top (level lists no longer
  // than these few points need; one for the next ceiling of CEILINGS would cost more than the samples).
  const zev = zoneMax <= evaluatorCeiling(sampleTemperatures) ? ev : createThermoEvaluator(species, physics, { maxTemperature: zoneMax });
  const values = zev.grid(zone);
  const out: FitSample[] = new Array<FitSample>(values.T.length);
  for (let j = 0; j < values.T.length; j++) out[j] = toSample(propertiesAt(zev, values, j));
  return out;
}

export function computeSamples(
  species: Species,
  physics: PhysicsOptions,
  temperatures: readonly number[],
  zoneTemperatures: readonly number[] = [],
): ComputedSpecies {
  const ev = evaluatorFor(species, physics, temperatures);
  const n = temperatures.length;
  const values = ev.grid([...temperatures, T_REF]);
  const samples: FitSample[] = new Array<FitSample>(n);
  for (let j = 0; j < n; j++) samples[j] = toSample(propertiesAt(ev, values, j));
  const at298 = propertiesAt(ev, values, n);
  const index = new Map<number, number>();
  for (let j = 0; j <= n; j++) if (!index.has(values.T[j]!)) index.set(values.T[j]!, j);
  if (recent.length >= MEMO_SIZE) recent.shift();
  recent.push({ species, standardPressure: physics.standardPressure, ev, values, index });
  return {
    samples,
    extrapolationSamples: zoneSamples(species, physics, ev, temperatures, zoneTemperatures),
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

