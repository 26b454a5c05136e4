/**
 * The measure the error check uses: the largest |fit − sample| / L_q(T) over every sample of both ranges
 * and q = Cp/R, H/RT, S/R (a sample at tMid against both sets), with L_q the size-scaled limit
 * (limits.ts). ≤ 1 means every error check passes.
 */
import { evaluateRange } from './evaluate.js';
import { limitAt, type FitLimits, type LimitQuantity } from './limits.js';
import type { FitSample, Nasa7Polynomial } from './types.js';

export interface WorstRatio {
  ratio: number;
  quantity: LimitQuantity;
  T: number;
  range: 'low' | 'high';
}

export function worstLimitRatio(
  poly: Nasa7Polynomial,
  ranges: { low: readonly FitSample[]; high: readonly FitSample[] },
  limits: FitLimits,
): WorstRatio {
  let worst: WorstRatio = { ratio: 0, quantity: 'cp', T: NaN, range: 'low' };
  for (const range of ['low', 'high'] as const) {
    const coeffs = range === 'low' ? poly.low : poly.high;
    for (const s of ranges[range]) {
      const v = evaluateRange(coeffs, s.T);
      const rc = Math.abs(v.cpR - s.cpR) / limitAt(limits.cp, s.cpR);
      const rh = Math.abs(v.hRT - s.hRT) / limitAt(limits.h, s.cpR);
      const rs = Math.abs(v.sR - s.sR) / limitAt(limits.s, s.cpR);
      if (!(rc <= worst.ratio)) worst = { ratio: rc, quantity: 'cp', T: s.T, range };
      if (!(rh <= worst.ratio)) worst = { ratio: rh, quantity: 'h', T: s.T, range };
      if (!(rs <= worst.ratio)) worst = { ratio: rs, quantity: 's', T: s.T, range };
    }
  }
  return worst;
}
