/**
 * Stage "compute": the partition-function properties of one species on its sampling grid (for the fit)
 * or on the table grid (for tables/<name>.csv). Pure: a function of the species and its plan only, no
 * shared state, so a worker pool can run it later.
 */
import { T_REF } from '../../src/constants.js';
import type { ModelSummary, PhysicsOptions, Species, StandardProperties } from '../../src/model.js';
import type { FitSample } from '../../src/nasa7/types.js';
import { createThermoEvaluator } from '../../src/thermo/evaluator.js';
import { standardProperties } from '../../src/thermo/properties.js';

export interface ComputedSpecies {
  /** Cp/R, H/RT (absolute), S/R on the sampling grid, ascending T. */
  samples: FitSample[];
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

const toSample = (p: StandardProperties): FitSample => ({ T: p.T, cpR: p.cpR, hRT: p.hRT, sR: p.sR });

function assertFinite(p: StandardProperties): void {
  for (const k of ['Cp', 'S', 'HminusH298', 'H', 'G', 'cpR', 'hRT', 'sR'] as const) {
    if (!Number.isFinite(p[k])) throw new ComputeError(`${k} at ${p.T} K is not a finite number (${p[k]})`);
  }
  if (!(p.Cp > 0)) throw new ComputeError(`Cp at ${p.T} K is not positive (${p.Cp})`);
}

export function computeSamples(species: Species, physics: PhysicsOptions, temperatures: readonly number[]): ComputedSpecies {
  const ev = createThermoEvaluator(species, physics);
  const samples: FitSample[] = [];
  for (const T of temperatures) {
    const p = standardProperties(ev, T);
    assertFinite(p);
    samples.push(toSample(p));
  }
  const at298 = standardProperties(ev, T_REF);
  assertFinite(at298);
  return {
    samples,
    anchor: toSample(at298),
    at298,
    h298MinusH0: ev.h298MinusH0,
    enthalpyOfFormation298: ev.enthalpyOfFormation298,
    summary: ev.summary,
  };
}

/** Standard properties at each table temperature. */
export function computeTable(species: Species, physics: PhysicsOptions, temperatures: readonly number[]): StandardProperties[] {
  const ev = createThermoEvaluator(species, physics);
  return temperatures.map((T) => {
    const p = standardProperties(ev, T);
    assertFinite(p);
    return p;
  });
}
