/**
 * Stage "compute": the table takes its rows from the sampling grid where the grids coincide, and those
 * rows are exactly what a fresh evaluation gives (the memo changes no number). Species: physics fixtures
 * (constants from memory, sources there).
 */
import { describe, expect, it } from 'vitest';
import { computeSamples, computeTable } from '../../../pipeline/stages/compute.js';
import { HYDROGEN_PEROXIDE } from '../../fixtures/hindered-rotor.js';
import { CARBON_DIOXIDE, NITROGEN } from '../../fixtures/physics-species.js';

const physics = { standardPressure: 1e5 };
const sampling = Array.from({ length: 581 }, (_, i) => 200 + 10 * i);
const table = [200, 298.15, 300, 1000, 2500, 6000];

describe('compute stage', () => {
  it.each([
    ['N2', NITROGEN],
    ['CO2', CARBON_DIOXIDE],
    ['H2O2 (torsion)', HYDROGEN_PEROXIDE],
  ] as const)('%s: table rows from the sampling grid equal a fresh evaluation, bit for bit', (_, species) => {
    const computed = computeSamples({ ...species }, physics, sampling);
    const fresh = computeTable({ ...species }, physics, table); // another object: no memo
    const sameSpecies = { ...species };
    computeSamples(sameSpecies, physics, sampling);
    const fromSamples = computeTable(sameSpecies, physics, table);
    expect(fromSamples).toEqual(fresh);
    const at1000 = computed.samples.find((s) => s.T === 1000)!;
    const row1000 = fromSamples.find((r) => r.T === 1000)!;
    expect({ cpR: row1000.cpR, hRT: row1000.hRT, sR: row1000.sR }).toEqual({ cpR: at1000.cpR, hRT: at1000.hRT, sR: at1000.sR });
    expect(fromSamples.find((r) => r.T === 298.15)).toEqual(computed.at298);
    expect(computed.at298.HminusH298).toBe(0);
  });
  it('a table row off the sampling grid is evaluated (same numbers as a fresh table)', () => {
    const s = { ...NITROGEN };
    computeSamples(s, physics, sampling);
    expect(computeTable(s, physics, [250, 255.5])).toEqual(computeTable({ ...NITROGEN }, physics, [250, 255.5]));
  });
});
