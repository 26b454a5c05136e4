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
import { GAS_CONSTANT, T_REF } from '../../src/constants.js';
import type { ModelSummary, PhysicsOptions, Species, StandardProperties, ThermoEvaluator, ThermoGrid } from '../../src/model.js';
import type { FitSample } from '../../src/nasa7/types.js';
import { createThermoEvaluator } from '../../src/thermo/evaluator.js';
import { declareCanonical } from '../storage/hash.js';
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

/**
 * Species whose sampling grid is remembered for their table. A thread builds one species at a time, its
 * table right after its samples (only cache reads can interleave another species), and the table takes its
 * entry out of the memo: so a few entries are plenty. An entry holds the species' evaluator (its level
 * lists, for a diatomic some 14,000 levels with their bins) and grid values; keeping 32 of them held ~10 MB
 * for nothing (peak RSS of a one-thread 2,000-species build 180–183 → 169–170 MB; the number of full
 * collections did not change).
 */
const MEMO_SIZE = 4;

interface Evaluated {
  species: Species;
  standardPressure: number;
  ev: ThermoEvaluator;
  values: ThermoGrid;
  /** Number of sampling temperatures (values.T[0, samples)); values.T[samples] is T_REF, the zone follows. */
  samples: number;
  /** Whether the sampling and zone parts of values.T are each non-decreasing (then searched by bisection). */
  ascending: boolean;
}

const recent: Evaluated[] = [];

/** The smallest ceiling holding T_REF and every temperature (above the last, the evaluator itself refuses). */
function evaluatorCeiling(temperatures: ArrayLike<number>): number {
  let max = T_REF;
  for (let j = 0; j < temperatures.length; j++) if (temperatures[j]! > max) max = temperatures[j]!;
  return CEILINGS.find((c) => c >= max) ?? max;
}

function evaluatorFor(species: Species, physics: PhysicsOptions, temperatures: ArrayLike<number>): ThermoEvaluator {
  return createThermoEvaluator(species, physics, { maxTemperature: evaluatorCeiling(temperatures) });
}

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
 * The fit sample at grid index j: T, cpR, hRT, sR of `propertiesAt` without its object of nine fields (the
 * same expressions as properties.ts `standardPropertiesOf`, so the same doubles), after the same checks.
 * Every quantity `assertFinite` looks at is formed here too; when one fails, `propertiesAt` builds the
 * object and throws exactly its error.
 */
function sampleAt(ev: ThermoEvaluator, values: ThermoGrid, j: number): FitSample {
  const R = GAS_CONSTANT;
  const T = values.T[j]!;
  const cp = values.cp[j]!;
  const s = values.s[j]!;
  const hMinusH298Exact = R * T * values.hmh0[j]! - ev.h298MinusH0;
  const H = ev.enthalpyOfFormation298 + hMinusH298Exact;
  const S = R * s;
  const Cp = R * cp;
  const hRT = H / (R * T);
  // Cp and S are finite exactly when cp and s are (R is finite and non-zero); H − H298 and H likewise
  // after dividing by 1000; G = (H − T S)/1000.
  const ok = Cp > 0 && Number.isFinite(Cp) && Number.isFinite(S) && Number.isFinite(hMinusH298Exact / 1000) && Number.isFinite(H / 1000) && Number.isFinite((H - T * S) / 1000) && Number.isFinite(cp) && Number.isFinite(hRT) && Number.isFinite(s);
  if (!ok) propertiesAt(ev, values, j);
  return { T, cpR: cp, hRT, sR: s };
}

export function computeSamples(
  species: Species,
  physics: PhysicsOptions,
  temperatures: readonly number[],
  zoneTemperatures: readonly number[] = [],
): ComputedSpecies {
  // Samples, the anchor and the zone in one grid evaluation of one evaluator (each temperature's numbers
  // depend on that temperature and the level lists alone, so they are those of separate evaluations).
  const n = temperatures.length;
  const all = new Float64Array(n + 1 + zoneTemperatures.length);
  for (let j = 0; j < n; j++) all[j] = temperatures[j]!;
  all[n] = T_REF;
  for (let j = 0; j < zoneTemperatures.length; j++) all[n + 1 + j] = zoneTemperatures[j]!;
  const ev = evaluatorFor(species, physics, all);
  const values = ev.grid(all);
  const samples: FitSample[] = new Array<FitSample>(n);
  for (let j = 0; j < n; j++) samples[j] = sampleAt(ev, values, j);
  const at298 = propertiesAt(ev, values, n);
  const extrapolationSamples: FitSample[] = new Array<FitSample>(zoneTemperatures.length);
  for (let j = 0; j < zoneTemperatures.length; j++) extrapolationSamples[j] = sampleAt(ev, values, n + 1 + j);
  declareIfCanonical(samples);
  declareIfCanonical(extrapolationSamples);
  if (recent.length >= MEMO_SIZE) recent.shift();
  const ascending = nonDecreasing(values.T, 0, n) && nonDecreasing(values.T, n + 1, values.T.length);
  recent.push({ species, standardPressure: physics.standardPressure, ev, values, samples: n, ascending });
  return {
    samples,
    extrapolationSamples,
    anchor: { T: at298.T, cpR: at298.cpR, hRT: at298.hRT, sR: at298.sR },
    at298,
    h298MinusH0: ev.h298MinusH0,
    enthalpyOfFormation298: ev.enthalpyOfFormation298,
    summary: ev.summary,
  };
}

/**
 * Sample lists are canonical by construction — objects {T, cpR, hRT, sR} in key order, finite numbers
 * (sampleAt checks) — unless a value is −0; T and cpR are positive, so only hRT and sR are looked at. Nothing
 * changes a sample list once made (the runner replaces it, never edits it).
 */
function declareIfCanonical(samples: readonly FitSample[]): void {
  for (let j = 0; j < samples.length; j++) {
    const s = samples[j]!;
    if (s.hRT === 0 || s.sR === 0) return;
  }
  declareCanonical(samples);
}

function nonDecreasing(T: Float64Array, from: number, to: number): boolean {
  for (let j = from + 1; j < to; j++) if (!(T[j - 1]! <= T[j]!)) return false;
  return true;
}

/** First index of T in values.T[from, to) (non-decreasing when `sorted`), or −1. */
function firstIndexIn(values: Float64Array, T: number, from: number, to: number, sorted: boolean): number {
  if (!sorted) {
    for (let j = from; j < to; j++) if (values[j] === T) return j;
    return -1;
  }
  // First index whose value is ≥ T.
  let lo = from;
  let hi = to;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (values[mid]! < T) lo = mid + 1;
    else hi = mid;
  }
  return lo < to && values[lo] === T ? lo : -1;
}

/**
 * The first index of T in the remembered grid (what a Map from each temperature to its first index gives:
 * the sampling part comes first, then T_REF, then the zone), or −1 when T is not on it.
 */
function indexOnGrid(known: Evaluated, T: number): number {
  const t = known.values.T;
  const n = known.samples;
  const inSamples = firstIndexIn(t, T, 0, n, known.ascending);
  if (inSamples >= 0) return inSamples;
  if (t[n] === T) return n;
  return firstIndexIn(t, T, n + 1, t.length, known.ascending);
}

/**
 * Standard properties at each table temperature: rows on the sampling grid just computed for this species
 * come from it, the others from one grid evaluation.
 */
export function computeTable(species: Species, physics: PhysicsOptions, temperatures: readonly number[]): StandardProperties[] {
  const at = recent.findIndex((r) => r.species === species && r.standardPressure === physics.standardPressure);
  const known = at >= 0 ? recent[at] : undefined;
  // A species' table is made once: its entry has served.
  if (at >= 0) recent.splice(at, 1);
  const sameCeiling = known !== undefined && evaluatorCeiling(temperatures) === evaluatorCeiling(known.values.T);
  if (known && sameCeiling) {
    let onGrid = true;
    for (let j = 0; j < temperatures.length && onGrid; j++) onGrid = indexOnGrid(known, temperatures[j]!) >= 0;
    if (onGrid) return temperatures.map((T) => propertiesAt(known.ev, known.values, indexOnGrid(known, T)));
  }
  const ev = sameCeiling ? known!.ev : evaluatorFor(species, physics, temperatures);
  const values = ev.grid(temperatures);
  return temperatures.map((_, j) => propertiesAt(ev, values, j));
}

