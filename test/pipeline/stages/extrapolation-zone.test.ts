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
import { locateFitViolation } from '../../../pipeline/runner.js';
import { fitNasa7 } from '../../../src/nasa7/fit.js';
import { T_REF } from '../../../src/constants.js';
import { grid, N2_RRHO, rrhoSample } from '../../src/nasa7/synthetic.js';

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
    // Above the samples' 6000 K ceiling the zone has its own evaluator, built for the zone's top.
    const ev = createThermoEvaluator(species as Species, plan.physics, { maxTemperature: Math.max(...plan.zoneTemperatures) });
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

describe('verify stage: departure beyond the ends', () => {
  it('becomes a located diagnostic with a stable code, naming the Cp limit key it is a multiple of', () => {
    // Hand-made: RRHO N2 fitted only up to 5000 K, checked against its computed Cp/R at 5020–5100 K with
    // a Cp limit so small that the form's ordinary drift there exceeds three times it.
    const samples = grid(200, 5000, 10).map((T) => rrhoSample(N2_RRHO, T));
    const fit = fitNasa7(samples, rrhoSample(N2_RRHO, T_REF), { tLow: 200, tMid: 1000, tHigh: 5000 });
    const beyond = [5020, 5040, 5060, 5080, 5100].map((T) => rrhoSample(N2_RRHO, T));
    const tolerances = { ...DEFAULT_SETTINGS.tolerances, cp: 1e-5, relative_to_cp: { cp: 0, h: 0.003, s: 0.003 } };
    const where = { file: 'db/n2.yaml', species: 'N2', line: 1, column: 7 };
    const all = verifySpecies(fit, samples, { ...tolerances, cp: 1 }, 1, 3.5, where, beyond);
    expect(all).toEqual([]);
    const d = verifySpecies(fit, samples, tolerances, 1, 3.5, where, beyond).filter((x) => x.code === 'fit-extrapolation-departs');
    expect(d).toHaveLength(1);
    expect(d[0]!).toMatchObject({ severity: 'error', file: 'db/n2.yaml', species: 'N2', line: 1, column: 7, path: 'fit.cp' });
    const located = locateFitViolation(d[0]!, tolerances, { settingsFile: 'db/qforge.yaml' });
    expect(located.message).toMatch(/^fit check: Cp\/R of the fit is .* K beyond T_high = 5000 K, .*; limit is the default tolerances\.cp = 0\.00001 \(not set in db\/qforge\.yaml\)$/);
  });
});

