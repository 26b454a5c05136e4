/**
 * The compute stage's allocation-lean forms give the very doubles of the forms they replaced
 * (test/fixtures/pipeline/compute-reference.ts, the code as it stood before): fit samples formed straight
 * from the grid values instead of through a StandardProperties object, table rows found by bisection
 * instead of a Map, and sampling grids remembered by argument list (pipeline/core/grid.ts). Equality is
 * bit for bit (IEEE-754 bit patterns, so −0 ≠ +0) and in key order (the order reaches canonical JSON).
 * Species: the seeded synthetic set of bench/synthetic.ts (our own generator: atoms, diatomics with level
 * sums, polyatomics with rotors) on the default plan, and the physics fixtures of test/fixtures (constants
 * from memory, sources there).
 */
import { describe, expect, it } from 'vitest';
import { syntheticSpecies } from '../../../bench/synthetic.js';
import { temperatureGrid, tidy } from '../../../pipeline/core/grid.js';
import { planSpecies } from '../../../pipeline/core/plan.js';
import { withDefaults } from '../../../pipeline/core/settings.js';
import { computeSamples, computeTable } from '../../../pipeline/stages/compute.js';
import { parseYamlText } from '../../../pipeline/stages/load.js';
import { canonicalCopy } from '../../../pipeline/storage/hash.js';
import { validateSpecies } from '../../../pipeline/stages/validate.js';
import type { Species } from '../../../src/model.js';
import { HYDROGEN_PEROXIDE } from '../../fixtures/hindered-rotor.js';
import { CARBON_DIOXIDE, NITROGEN } from '../../fixtures/physics-species.js';
import { computeSamplesReference, computeTableReference } from '../../fixtures/pipeline/compute-reference.js';
import { bitsDeep } from '../../fixtures/pipeline/bits.js';

const SETTINGS = withDefaults({});
const physics = { standardPressure: 1e5 };

function syntheticSet(count: number): Array<[string, Species]> {
  const out: Array<[string, Species]> = [];
  for (let i = 0; i < count; i++) {
    const s = syntheticSpecies(1, i);
    const doc = parseYamlText(s.yaml, `${s.name}.yaml`).documents[0]!;
    out.push([`${s.name} (${s.kind})`, validateSpecies(doc).species!]);
  }
  return out;
}

const cases: Array<[string, Species]> = [...syntheticSet(24), ['N2', NITROGEN], ['CO2', CARBON_DIOXIDE], ['H2O2 (torsion)', HYDROGEN_PEROXIDE]];

describe('compute stage: the same doubles as the per-point-object form', () => {
  it('samples, zone samples, anchor and 298.15 K properties, bit for bit and in key order', () => {
    let diatomics = 0;
    for (const [name, given] of cases) {
      if (given.structure === 'diatomic') diatomics++;
      const plan = planSpecies(given, SETTINGS);
      const got = computeSamples({ ...given }, physics, plan.sampleTemperatures, plan.zoneTemperatures);
      const ref = computeSamplesReference({ ...given }, physics, plan.sampleTemperatures, plan.zoneTemperatures);
      const pick = (c: Pick<typeof got, 'samples' | 'extrapolationSamples' | 'anchor' | 'at298' | 'h298MinusH0' | 'enthalpyOfFormation298'>) => ({ samples: c.samples, extrapolationSamples: c.extrapolationSamples, anchor: c.anchor, at298: c.at298, h298MinusH0: c.h298MinusH0, f: c.enthalpyOfFormation298 });
      expect(bitsDeep(pick(got)), name).toStrictEqual(bitsDeep(pick(ref)));
    }
    expect(diatomics).toBeGreaterThan(0);
  });

  it('sample lists it declares canonical are canonical: keys T, cpR, hRT, sR in order, finite, no −0', () => {
    // What storage/hash.ts declareCanonical is promised; checked here element by element, not through the
    // canonical copy (which trusts the declaration).
    for (const [name, given] of cases) {
      const plan = planSpecies(given, SETTINGS);
      const got = computeSamples({ ...given }, physics, plan.sampleTemperatures, plan.zoneTemperatures);
      for (const list of [got.samples, got.extrapolationSamples]) {
        expect(canonicalCopy(list), name).toBe(list);
        for (const sample of list) {
          expect(Object.keys(sample)).toEqual(['T', 'cpR', 'hRT', 'sR']);
          for (const v of Object.values(sample)) expect(Number.isFinite(v) && !Object.is(v, -0), `${name}: ${v}`).toBe(true);
        }
      }
    }
  });

  it('table rows from the remembered grid (bisection) equal the Map form, on, off and beyond the sampling grid', () => {
    for (const [name, given] of cases.slice(0, 12)) {
      const plan = planSpecies(given, SETTINGS);
      // Ascending (the plan's), unsorted with repeats, zone temperatures, one off every grid (→ evaluated).
      const tables = [plan.tableTemperatures, [1000, 298.15, 200, 1000, 6000, 200], [plan.zoneTemperatures[0]!, 6020, 6100, 300], [250.5, 1000]];
      // The sampling grid as the plan gives it and reversed (the linear-scan branch of the lookup).
      for (const sampling of [plan.sampleTemperatures, [...plan.sampleTemperatures].reverse()]) {
        for (const table of tables) {
          const species = { ...given };
          computeSamples(species, physics, sampling, plan.zoneTemperatures);
          const got = computeTable(species, physics, table);
          const ref = computeTableReference(species, physics, computeSamplesReference(species, physics, sampling, plan.zoneTemperatures), table);
          expect(bitsDeep(got), `${name}: ${table.slice(0, 4).join(' ')}`).toStrictEqual(bitsDeep(ref));
        }
      }
    }
  });

  it('a table asked for again (its memo entry used up) or after other species were computed has the same doubles', () => {
    const some = cases.slice(0, 10);
    const species = some.map(([, given]) => ({ ...given }));
    const plans = some.map(([, given]) => planSpecies(given, SETTINGS));
    // Samples of all ten first (more than the memo holds), then each table twice.
    species.forEach((s, i) => computeSamples(s, physics, plans[i]!.sampleTemperatures, plans[i]!.zoneTemperatures));
    species.forEach((s, i) => {
      const ref = computeTableReference(s, physics, computeSamplesReference(s, physics, plans[i]!.sampleTemperatures, plans[i]!.zoneTemperatures), plans[i]!.tableTemperatures);
      for (let round = 0; round < 2; round++) expect(bitsDeep(computeTable(s, physics, plans[i]!.tableTemperatures)), `${some[i]![0]} round ${round}`).toStrictEqual(bitsDeep(ref));
    });
  });
});

describe('sampling grid memo (pipeline/core/grid.ts)', () => {
  /** The grid as it was built before the memo (written here from the code of the time). */
  function gridReference(low: number, high: number, step: number, extra: readonly number[] = []): number[] {
    const set = new Set<number>();
    const n = Math.floor((high - low) / step + 1e-9);
    for (let k = 0; k <= n; k++) set.add(tidy(low + k * step));
    set.add(tidy(high));
    for (const t of extra) if (t >= low && t <= high) set.add(tidy(t));
    return [...set].filter((t) => t >= low && t <= high).sort((a, b) => a - b);
  }

  it('a repeated argument list gives a fresh array with the same doubles; changing one changes no other', () => {
    const args: Array<[number, number, number, number[]]> = [
      [200, 6000, 10, [1000, 298.15]],
      [200, 6000, 10, [1000.5, 298.15]],
      [200, 6000, 7, []],
      [200, 201, 0.1, [200.05]],
      [300, 5000, 10, [1000, 298.15]],
      ...Array.from({ length: 10 }, (_, i): [number, number, number, number[]] => [200 + i, 3000, 25, [1000]]),
    ];
    for (let round = 0; round < 3; round++) {
      for (const [low, high, step, extra] of args) {
        const a = temperatureGrid(low, high, step, extra);
        const b = temperatureGrid(low, high, step, extra);
        expect(a).not.toBe(b);
        expect(bitsDeep(a)).toStrictEqual(bitsDeep(gridReference(low, high, step, extra)));
        a[0] = -1;
        a.push(1e9);
        expect(bitsDeep(b)).toStrictEqual(bitsDeep(gridReference(low, high, step, extra)));
        expect(bitsDeep(temperatureGrid(low, high, step, extra))).toStrictEqual(bitsDeep(gridReference(low, high, step, extra)));
      }
    }
  });
});
