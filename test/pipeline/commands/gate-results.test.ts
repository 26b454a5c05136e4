/** Structured diff gate results (quantity, species, T, value, limit); the report below is written by hand. */
import { describe, expect, it } from 'vitest';
import type { DiffReport } from '../../../pipeline/commands/diff.js';
import { diffGateResults } from '../../../pipeline/commands/gate-results.js';

const report = {
  removed: ['OLD'],
  changed: [
    { name: 'H2O2', common: { low: 200, high: 6000 }, max: { cp: { value: 0.04, T: 1000 }, h: { value: 0.001, T: 300 }, s: { value: 0.2, T: 6000 } } },
    { name: 'NO', max: { cp: { value: 0, T: NaN }, h: { value: 0, T: NaN }, s: { value: 0, T: NaN } } },
  ],
} as unknown as DiffReport;

describe('diffGateResults', () => {
  it('one object per breach, with its number and limit', () => {
    expect(diffGateResults(report, { cp: 0.01, s: 0.5 }, true)).toEqual([
      { species: 'H2O2', quantity: 'cp', t: 1000, value: 0.04, limit: 0.01, unit: 'J/(mol K)' },
      { species: 'NO', quantity: 'range' },
      { species: 'OLD', quantity: 'removed' },
    ]);
    expect(diffGateResults(report, {}, false)).toEqual([]);
  });
});
