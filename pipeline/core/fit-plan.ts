/**
 * The fit part of a species' plan: its limits (its own `tolerances` keys over the settings') and its
 * midpoint search interval (the settings' interval clipped to the species' ranges).
 */
import type { SpeciesFitLimits } from '../../src/model.js';
import type { DatabaseSettings, FitTolerancesSetting } from './settings.js';

/** Margin (K) the searched midpoint keeps from the range ends, so both sets keep enough samples. */
export const MID_SEARCH_MARGIN = 100;

export function fitLimitsFor(settings: FitTolerancesSetting, own: SpeciesFitLimits | undefined): FitTolerancesSetting {
  const rel = own?.relativeToCp ?? {};
  return {
    cp: own?.cp ?? settings.cp,
    h: own?.h ?? settings.h,
    s: own?.s ?? settings.s,
    relative_to_cp: {
      cp: rel.cp ?? settings.relative_to_cp.cp,
      h: rel.h ?? settings.relative_to_cp.h,
      s: rel.s ?? settings.relative_to_cp.s,
    },
  };
}

/**
 * The midpoint search of one species, or undefined for a fixed midpoint: when the settings turn the search
 * off, when the species fixes its own `temperature_ranges.mid`, or when nothing of the interval lies
 * MID_SEARCH_MARGIN inside the species' range (then the fixed midpoint applies).
 */
export function midSearchFor(
  search: DatabaseSettings['fit']['optimise_mid'],
  ranges: { low: number; mid: number; high: number },
  ownMid: boolean,
): { min: number; max: number; step: number } | undefined {
  if (search === false || ownMid) return undefined;
  const min = Math.max(search.min, ranges.low + MID_SEARCH_MARGIN, 298.15);
  const max = Math.min(search.max, ranges.high - MID_SEARCH_MARGIN);
  if (!(min <= max)) return undefined;
  // Keep the candidates on the settings' own lattice min + k·step, so species share factorisations.
  const first = search.min + Math.ceil((min - search.min) / search.step - 1e-9) * search.step;
  if (first > max) return undefined;
  return { min: first, max, step: search.step };
}
