/**
 * Where a fit limit came from, for the messages of the verify stage: the species' own file (file:line:col
 * of its `tolerances` key), the settings file (file:line:col), or the default.
 */
import type { SpeciesFitLimits } from '../../src/model.js';
import type { LoadedDocument } from './load.js';
import type { FitTolerancesSetting } from '../core/settings.js';

type Position = { line: number; column: number };

export interface LimitOriginSource {
  settingsFile?: string;
  settingsSetAt?: (segments: Array<string | number>) => Position | undefined;
}

export interface LimitOriginSpecies {
  displayFile: string;
  species: { fitLimits?: SpeciesFitLimits };
  positions: Partial<Record<string, Position>>;
}

/** Positions of the `tolerances` keys a species document sets, keyed 'tolerances.cp', 'tolerances.relative_to_cp.cp', … */
export function toleranceKeyPositions(doc: LoadedDocument): Record<string, Position> {
  const out: Record<string, Position> = {};
  for (const q of ['cp', 'h', 's']) {
    for (const segments of [['tolerances', q], ['tolerances', 'relative_to_cp', q]]) {
      const p = doc.locate(segments);
      if (p) out[segments.join('.')] = { line: p.line, column: p.column };
    }
  }
  return out;
}

/**
 * The origin text of a fit-check diagnostic whose path is fit.<q> or fit.<q>.relative_to_cp (q = cp, h,
 * s); other fit checks are built in.
 */
export function fitLimitOrigin(path: string, tolerances: FitTolerancesSetting, source: LimitOriginSource, species?: LimitOriginSpecies): string {
  const m = /^fit\.(cp|h|s)(\.relative_to_cp)?$/.exec(path);
  if (!m) return 'a built-in check of every fit (not a setting)';
  const q = m[1] as 'cp' | 'h' | 's';
  const relative = m[2] !== undefined;
  const key = relative ? `tolerances.relative_to_cp.${q}` : `tolerances.${q}`;
  const own = species?.species.fitLimits;
  const setByOwn = relative ? own?.relativeToCp?.[q] !== undefined : own?.[q] !== undefined;
  if (species && setByOwn) {
    const at = species.positions[key];
    return `limit set by ${key} in the species' own file ${species.displayFile}${at ? `:${at.line}:${at.column}` : ''}`;
  }
  const segments = relative ? ['tolerances', 'relative_to_cp', q] : ['tolerances', q];
  const at = source.settingsSetAt?.(segments);
  if (at && source.settingsFile) return `limit set by ${key} in ${source.settingsFile}:${at.line}:${at.column}`;
  const value = ` = ${relative ? tolerances.relative_to_cp[q] : tolerances[q]}`;
  if (source.settingsFile) return `limit is the default ${key}${value} (not set in ${source.settingsFile})`;
  return `limit is the default ${key}${value} (the database has no qforge.yaml)`;
}
