/**
 * Temperatures just beyond a species' fit range where the computed Cp/R is compared with the fitted one
 * (the extrapolation check of src/nasa7/quality.ts). They never enter the fit: the fit takes only
 * `sampleTemperatures`, inside the range.
 *
 * Below the low end every 5 K over [T_low − 20, T_low) (a large molecule's Cp falls fast at low T, so the
 * zone is short and dense), above the high end every 20 K over (T_high, T_high + 100]. Points at or below
 * 0 K and above the highest temperature an evaluator can be built for are left out.
 */
import { HINDERED_ROTOR_CEILING_TEMPERATURE } from '../../src/partition/hindered-rotor.js';
import { DEFAULT_FIT_TOLERANCES } from '../../src/nasa7/quality.js';
import { tidy } from './grid.js';

export const ZONE_STEP_BELOW = 5;
export const ZONE_STEP_ABOVE = 20;

export function extrapolationZoneTemperatures(low: number, high: number): number[] {
  const out: number[] = [];
  const below = DEFAULT_FIT_TOLERANCES.extrapolationBelow;
  const above = DEFAULT_FIT_TOLERANCES.extrapolation;
  for (let d = below; d > 0; d -= ZONE_STEP_BELOW) {
    const T = tidy(low - d);
    if (T > 0) out.push(T);
  }
  for (let d = ZONE_STEP_ABOVE; d <= above; d += ZONE_STEP_ABOVE) {
    const T = tidy(high + d);
    if (T <= HINDERED_ROTOR_CEILING_TEMPERATURE) out.push(T);
  }
  return out;
}
