/**
 * Fit → 80-column file → reader → evaluation. Data: closed-form RRHO models (synthetic.ts; constants from
 * Huber & Herzberg 1979 and from memory as marked there). Layout: NASA TM-4513 (McBride, Gordon & Reno
 * 1993). Tolerances from issue 3: read-back equals the in-memory fit to 1e-7 relative; continuity at tMid
 * < 1e-7 after the round trip.
 */
import { describe, expect, it } from 'vitest';
import { T_REF } from '../../../src/constants.js';
import { cpDerivative, evaluateNasa7, evaluateRange } from '../../../src/nasa7/evaluate.js';
import { fitNasa7 } from '../../../src/nasa7/fit.js';
import { formatNasa7File } from '../../../src/nasa7/format.js';
import { parseNasa7File } from '../../../src/nasa7/parse.js';
import { roundForRecord } from '../../../src/nasa7/round.js';
import type { Nasa7Record } from '../../../src/nasa7/types.js';
import { CH4_RRHO, grid, H2O_RRHO, N2_RRHO, rrhoSample } from './synthetic.js';

const models = [
  ['N2', N2_RRHO, [['N', 2]]],
  ['CH4', CH4_RRHO, [['C', 1], ['H', 4]]],
  ['H2O', H2O_RRHO, [['H', 2], ['O', 1]]],
] as const;

describe('write → read round trip of fitted records', () => {
  const records: Nasa7Record[] = models.map(([name, model, elements]) => ({
    name,
    identifier: 'QF',
    elements: elements.map(([s, n]) => [s, n] as [string, number]),
    phase: 'G',
    polynomial: fitNasa7(grid(200, 6000, 10).map((T) => rrhoSample(model, T)), rrhoSample(model, T_REF)).polynomial,
  }));
  const header = { tLow: 200, tMid: 1000, tHigh: 6000 };
  const rounded = records.map((r) => ({ ...r, polynomial: roundForRecord(r.polynomial) }));
  const parsed = parseNasa7File(formatNasa7File(rounded, header), 'roundtrip.txt');
  const naive = parseNasa7File(formatNasa7File(records, header), 'naive.txt');

  it('roundForRecord is what the file holds: read-back coefficients equal it exactly', () => {
    parsed.records.forEach((r, i) => expect(r.polynomial).toEqual(rounded[i]!.polynomial));
  });

  it('without roundForRecord independent rounding costs continuity (documents why it exists)', () => {
    const jumps = naive.records.map((r) => Math.abs(evaluateRange(r.polynomial.low, 1000).sR - evaluateRange(r.polynomial.high, 1000).sR));
    expect(Math.max(...jumps)).toBeGreaterThan(1e-9);
  });

  it('reads every record back without errors', () => {
    expect(parsed.errors).toEqual([]);
    expect(parsed.records.map((r) => r.name)).toEqual(['N2', 'CH4', 'H2O']);
  });

  it('read-back evaluation equals the in-memory fit to 1e-7 relative (200–6000 K)', () => {
    let worst = 0;
    parsed.records.forEach((r, i) => {
      for (const T of grid(200, 6000, 25)) {
        const a = evaluateNasa7(r.polynomial, T);
        const b = evaluateNasa7(records[i]!.polynomial, T);
        for (const q of ['cpR', 'hRT', 'sR'] as const) {
          // Relative to max(|value|, 1): H/RT of N2 crosses zero (ΔfH = 0), where a relative error is undefined.
          worst = Math.max(worst, Math.abs(a[q] - b[q]) / Math.max(Math.abs(b[q]), 1));
        }
      }
    });
    expect(worst).toBeLessThan(1e-7);
  });

  it('continuity at tMid survives the rounding to E15.8 within 1e-7', () => {
    for (const r of parsed.records) {
      const { low, high, tMid } = r.polynomial;
      const lo = evaluateRange(low, tMid);
      const hi = evaluateRange(high, tMid);
      expect(Math.abs(lo.cpR - hi.cpR)).toBeLessThan(1e-7);
      expect(Math.abs(lo.hRT - hi.hRT)).toBeLessThan(1e-7);
      expect(Math.abs(lo.sR - hi.sR)).toBeLessThan(1e-7);
      expect(tMid * Math.abs(cpDerivative(low, tMid) - cpDerivative(high, tMid))).toBeLessThan(1e-7);
    }
  });
});
