/**
 * The tree comparison of the benchmark (bench/runner.ts): the alternating order of the rounds and the
 * median it reports. Inputs written by hand here.
 */
import { describe, expect, it } from 'vitest';
import { median } from '../../bench/common.js';
import { roundOrder } from '../../bench/runner.js';

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

  it('median of odd and even counts, in any input order', () => {
    expect(median([3, 1, 2])).toBe(2);
    expect(median([4, 1, 3, 2])).toBe(2.5);
    expect(median([7])).toBe(7);
  });
});
