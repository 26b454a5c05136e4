/**
 * Fits of the project's physics (src/thermo: full rovibrational level sum for diatomics) for N2 and CO,
 * 200 / 1000 / 6000 K, equal weights, compared with NIST-JANAF 4th ed. (Chase 1998; values copied in
 * test/fixtures/nasa7/janaf-n2-co.ts). Issue 3 tolerances: 0.1 J/(mol K) in Cp, 0.05 J/(mol K) in S.
 * Also the form's floor for N2 (issue 3: max |ΔCp/R| ≈ 0.012, max |ΔS/R| ≈ 0.002).
 */
import { describe, expect, it } from 'vitest';
import { GAS_CONSTANT, T_REF } from '../../../src/constants.js';
import type { Species } from '../../../src/model.js';
import { evaluateNasa7 } from '../../../src/nasa7/evaluate.js';
import { fitNasa7 } from '../../../src/nasa7/fit.js';
import { assessFit } from '../../../src/nasa7/quality.js';
import type { FitSample } from '../../../src/nasa7/types.js';
import { createThermoEvaluator, standardProperties } from '../../../src/thermo/index.js';
import { JANAF_CP_S } from '../../fixtures/nasa7/janaf-n2-co.js';
import { CO_SPECIES, N2_SPECIES } from '../../fixtures/nasa7/species.js';
import { grid } from './synthetic.js';

function samplesFor(species: Species): { samples: FitSample[]; anchor: FitSample } {
  const ev = createThermoEvaluator(species);
  const point = (T: number): FitSample => {
    const p = standardProperties(ev, T);
    return { T, cpR: p.cpR, hRT: p.hRT, sR: p.sR };
  };
  return { samples: grid(200, 6000, 10).map(point), anchor: point(T_REF) };
}

describe('fitted N2 and CO against NIST-JANAF 4th ed.', () => {
  for (const species of [N2_SPECIES, CO_SPECIES]) {
    it(`${species.name}: Cp within 0.1 and S within 0.05 J/(mol K) at 298.15, 1000, 2000, 3000 K`, () => {
      const { samples, anchor } = samplesFor(species);
      const fit = fitNasa7(samples, anchor);
      const table = JANAF_CP_S[species.name as 'N2' | 'CO'];
      for (const [T, [cp, s]] of Object.entries(table)) {
        const v = evaluateNasa7(fit.polynomial, Number(T));
        expect(Math.abs(v.cpR * GAS_CONSTANT - cp), `Cp at ${T} K`).toBeLessThan(0.1);
        expect(Math.abs(v.sR * GAS_CONSTANT - s), `S at ${T} K`).toBeLessThan(0.05);
      }
      expect(assessFit(fit, samples)).toEqual([]);
    });
  }

  it('N2 reaches the floor of the form (issue 3: ≈ 0.012 in Cp/R, ≈ 0.002 in S/R)', () => {
    const { samples, anchor } = samplesFor(N2_SPECIES);
    const fit = fitNasa7(samples, anchor);
    const m = fit.metrics;
    expect(Math.max(m.low.maxAbs.cp, m.high.maxAbs.cp)).toBeLessThan(0.0125);
    expect(Math.max(m.low.maxAbs.s, m.high.maxAbs.s)).toBeLessThan(0.002);
  });
});
