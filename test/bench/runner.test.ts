/**
 * The tree comparison of the benchmark (bench/runner.ts): the alternating order of the rounds and the
 * median it reports, and the table's columns. Inputs written by hand here.
 */
import { describe, expect, it } from 'vitest';
import { median } from '../../bench/common.js';
import { formatTreeTable, roundOrder, type TreeFigures } from '../../bench/runner.js';

describe('bench tree comparison', () => {
  it('runs the trees in the given order in even rounds and reversed in odd ones, without changing the input', () => {
    const trees = ['before', 'after'];
    expect([0, 1, 2, 3].map((r) => roundOrder(trees, r))).toEqual([
      ['before', 'after'],
      ['after', 'before'],
      ['before', 'after'],
      ['after', 'before'],
    ]);
    expect(trees).toEqual(['before', 'after']);
    expect(roundOrder(['a', 'b', 'c'], 1)).toEqual(['c', 'b', 'a']);
  });

  it('the table gives every measured-per-round figure as its median with the range of the rounds', () => {
    const row: TreeFigures = {
      tree: '/work/after',
      n: 2000,
      coldWallS: 11.1,
      coldPeakRssMb: 300,
      freshWallS: [7.4, 6.5, 7.8],
      freshPeakRssMb: 301,
      noCacheWallS: [5.3, 5.2, 5.6],
      noCacheCpuS: [9.8, 9.9, 10],
      rebuildWallS: [0.41, 0.4, 0.42],
      noCachePeakRssMb: 282,
      rebuildPeakRssMb: 118,
      cacheHits: 2000,
      cacheMb: 120.4,
    };
    const table = formatTreeTable([row]);
    expect(table).toMatch(/^rounds: 3, trees in alternating order\n/);
    expect(table).toContain('5.30 (5.20–5.60)');
    expect(table).toContain('7.40 (6.50–7.80)');
    expect(table).toContain('0.41 (0.40–0.42)');
    // The first cold build (11.1 s) fills the rebuilds' cache; it is not a round's figure.
    expect(table).not.toContain('11.10');
  });

  it('median of odd and even counts, in any input order', () => {
    expect(median([3, 1, 2])).toBe(2);
    expect(median([4, 1, 3, 2])).toBe(2.5);
    expect(median([7])).toBe(7);
  });
});
