/**
 * The midpoint-stability measurement (bench/mid-stability.ts) on a few species of our own synthetic
 * generator: one row per ε, every species fitted both times, and with ε = 0 (samples unchanged) no
 * midpoint moves — the search is deterministic.
 */
import { describe, expect, it } from 'vitest';
import { midStability } from '../../bench/mid-stability.js';

describe('bench midpoint stability', () => {
  it('one row per ε; unchanged samples never move a midpoint', () => {
    const rows = midStability(12, 1, [0, 1e-12]);
    expect(rows.map((r) => r.eps)).toEqual([0, 1e-12]);
    for (const r of rows) expect(r.species).toBeGreaterThan(8);
    expect(rows[0]!.moved).toEqual([]);
  });
});
