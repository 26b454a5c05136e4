/**
 * The extrapolation zone: computed points just beyond the fit range travel with the samples (and their
 * cache key) but never reach the fit. Species: physics fixtures (constants from memory, sources there).
 */
import { describe, expect, it } from 'vitest';
import { computeSamples } from '../../../pipeline/stages/compute.js';
import { fitOptionsFor, fitSpecies } from '../../../pipeline/stages/fit.js';
import { classicalCpFloor, verifySpecies } from '../../../pipeline/stages/verify.js';
import { planSpecies } from '../../../pipeline/core/plan.js';
import { extrapolationZoneTemperatures } from '../../../pipeline/core/zone-grid.js';
import { DEFAULT_SETTINGS } from '../../../pipeline/core/settings.js';
import { stageKeys } from '../../../pipeline/runner.js';
import { createThermoEvaluator } from '../../../src/thermo/evaluator.js';
import { HYDROGEN_PEROXIDE } from '../../fixtures/hindered-rotor.js';
import { CARBON_DIOXIDE, NITROGEN } from '../../fixtures/physics-species.js';
import type { Species } from '../../../src/model.js';

const bits = (xs: readonly number[]) => Buffer.from(new Float64Array(xs).buffer).toString('hex');

describe('extrapolation zone', () => {
  it('lies every 5 K over the 20 K below T_low and every 20 K over the 100 K above T_high, never at or below 0 K', () => {
    expect(extrapolationZoneTemperatures(200, 6000)).toEqual([180, 185, 190, 195, 6020, 6040, 6060, 6080, 6100]);
    expect(extrapolationZoneTemperatures(10, 1000)).toEqual([5, 1020, 1040, 1060, 1080, 1100]);
    expect(extrapolationZoneTemperatures(300, 20000)).toEqual([280, 285, 290, 295]);
  });

  it.each([
    ['N2', NITROGEN],
    ['CO2', CARBON_DIOXIDE],
    ['H2O2 (torsion)', HYDROGEN_PEROXIDE],
  ] as const)('%s: the fit is bit-identical with and without the zone points, which equal a fresh evaluation', (_, species) => {
    const plan = planSpecies(species as Species, DEFAULT_SETTINGS);
    const options = fitOptionsFor(plan.fitOptions);
    const without = computeSamples({ ...species }, plan.physics, plan.sampleTemperatures);
    const withZone = computeSamples({ ...species }, plan.physics, plan.sampleTemperatures, plan.zoneTemperatures);
    expect(without.extrapolationSamples).toEqual([]);
    expect(withZone.samples).toEqual(without.samples);
    const a = fitSpecies(without, options).polynomial;
    const b = fitSpecies(withZone, options).polynomial;
    expect(bits([...b.low, ...b.high, b.tMid])).toBe(bits([...a.low, ...a.high, a.tMid]));

    expect(withZone.extrapolationSamples.map((s) => s.T)).toEqual(plan.zoneTemperatures);
    expect(withZone.extrapolationSamples.every((s) => s.T < plan.ranges.low || s.T > plan.ranges.high)).toBe(true);
    const ev = createThermoEvaluator(species as Species, plan.physics, { maxTemperature: 10000 });
    const fresh = ev.grid(plan.zoneTemperatures);
    expect(withZone.extrapolationSamples.map((s) => s.cpR)).toEqual(Array.from(fresh.cp));
    // A careful fit of these species keeps within the departure limit there.
    expect(verifySpecies(fitSpecies(withZone, options), withZone.samples, plan.tolerances, options.continuityOrder, classicalCpFloor(species.structure), { file: 'x', species: 'x' }, withZone.extrapolationSamples)).toEqual([]);
  });

  it('the zone is part of the samples cache key (an entry without it is never served)', () => {
    const plan = planSpecies(NITROGEN, DEFAULT_SETTINGS);
    const options = fitOptionsFor(plan.fitOptions);
    const keys = stageKeys('sha256:x', NITROGEN, plan, options);
    const other = stageKeys('sha256:x', NITROGEN, { ...plan, zoneTemperatures: [] }, options);
    expect(other.samples).not.toBe(keys.samples);
    expect(other.fit).not.toBe(keys.fit);
  });
});
