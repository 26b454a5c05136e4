/**
 * The warning policy of `check` and `build`: warnings accepted in writing disappear, the rest become
 * errors in strict mode (`--strict`, or `strict: true` in qforge.yaml), so a nightly run fails on anything
 * suspicious unless a person has accepted that one warning with a reason.
 *
 * An acceptance names a diagnostic code and a reason, either in a species document
 * (`accepted_warnings: [{code, reason}]`, for that species) or in the settings
 * (`accepted_warnings: [{code, species?, reason}]`, for one species or, without `species`, for every
 * diagnostic of that code). An acceptance that matches no warning is stale and is itself warned about
 * (`stale-accepted-warning`), like a known deviation compare no longer needs. Pure: no I/O.
 */
import type { Diagnostic } from './diagnostics.js';
import type { AcceptedWarning } from './settings.js';

type Segment = string | number;

/** Where a field of a document is, for locating stale entries. */
export type Locator = (segments: Segment[]) => { line?: number; column?: number } | undefined;

export const STALE_ACCEPTANCE_CODE = 'stale-accepted-warning';
export const STRICT_PREFIX = 'warning made an error by strict mode: ';

const PLACEHOLDER_REASON = /^\s*(todo|tbd|tba|fixme|xxx|n\/?a|none|unknown|accepted|ok|fine)\b/i;

export interface WarningPolicy {
  /** A species document's diagnostics with its own and the settings' acceptances applied (strict: warnings → errors). */
  applySpecies(ds: readonly Diagnostic[], species: { raw: unknown; file: string; name?: string; locate: Locator }, used?: Set<number>): Diagnostic[];
  /** Diagnostics not of one species document (files, settings, names across the database). */
  applyOther(ds: readonly Diagnostic[], used?: Set<number>): Diagnostic[];
  /**
   * Counts settings acceptances as used, as if they had matched here: a file whose checked diagnostics
   * were taken from the cache reports the indices its first check matched (`used` of the apply calls).
   */
  markUsed(indices: Iterable<number>): void;
  /** Warnings for settings acceptances that matched nothing (call once, after every document). */
  staleSettingsEntries(): Diagnostic[];
}

export function createWarningPolicy(opts: {
  strict: boolean;
  accepted: readonly AcceptedWarning[];
  settingsFile?: string;
  settingsLocate?: Locator;
}): WarningPolicy {
  const used = new Set<number>();
  const settingsMatch = (d: Diagnostic, track?: Set<number>): boolean => {
    let hit = false;
    opts.accepted.forEach((a, i) => {
      if (a.code === d.code && (a.species === undefined || a.species === d.species)) {
        used.add(i);
        track?.add(i);
        hit = true;
      }
    });
    return hit;
  };
  const harden = (d: Diagnostic): Diagnostic =>
    opts.strict && d.severity === 'warning' ? { ...d, severity: 'error', message: `${STRICT_PREFIX}${d.message}` } : d;

  const finish = (ds: readonly Diagnostic[], own: (d: Diagnostic) => boolean, track?: Set<number>): Diagnostic[] =>
    ds.filter((d) => !(d.severity === 'warning' && d.code !== undefined && (own(d) || settingsMatch(d, track)))).map(harden);

  return {
    applySpecies(ds, species, track) {
      const list = Array.isArray((species.raw as { accepted_warnings?: unknown })?.accepted_warnings)
        ? ((species.raw as { accepted_warnings: unknown[] }).accepted_warnings as Array<{ code?: unknown; reason?: unknown }>)
        : [];
      const ownUsed = new Set<number>();
      const out = finish(ds, (d) => {
        let hit = false;
        list.forEach((a, i) => {
          if (a && a.code === d.code) {
            ownUsed.add(i);
            hit = true;
          }
        });
        return hit;
      }, track);
      const extra: Diagnostic[] = [];
      list.forEach((a, i) => {
        if (!a || typeof a.code !== 'string' || typeof a.reason !== 'string') return; // the schema reports it
        const at = ['accepted_warnings', i];
        const where = species.locate(at) ?? {};
        const base = { file: species.file, path: `accepted_warnings[${i}]`, ...where, ...(species.name ? { species: species.name } : {}) };
        if (PLACEHOLDER_REASON.test(a.reason)) {
          extra.push({ severity: 'error', code: 'accepted-warning-placeholder-reason', ...base, message: 'the reason for accepting this warning is a placeholder', value: a.reason, expected: 'why the warning is acceptable, in words a reviewer can check' });
        } else if (!ownUsed.has(i)) {
          extra.push(harden({ severity: 'warning', code: STALE_ACCEPTANCE_CODE, ...base, message: `accepted warning '${a.code}' no longer occurs; remove the entry`, value: a.code, expected: 'an accepted_warnings entry for a warning this species still draws' }));
        }
      });
      return [...out, ...extra];
    },
    applyOther(ds, track) {
      return finish(ds, () => false, track);
    },
    markUsed(indices) {
      for (const i of indices) used.add(i);
    },
    staleSettingsEntries() {
      const out: Diagnostic[] = [];
      opts.accepted.forEach((a, i) => {
        const at = ['accepted_warnings', i];
        const where = opts.settingsLocate?.(at) ?? {};
        const base = { file: opts.settingsFile ?? 'qforge.yaml', path: `accepted_warnings[${i}]`, ...where };
        if (PLACEHOLDER_REASON.test(a.reason)) {
          out.push({ severity: 'error', code: 'accepted-warning-placeholder-reason', ...base, message: 'the reason for accepting this warning is a placeholder', value: a.reason, expected: 'why the warning is acceptable, in words a reviewer can check' });
        } else if (!used.has(i)) {
          out.push(harden({ severity: 'warning', code: STALE_ACCEPTANCE_CODE, ...base, message: `accepted warning '${a.code}'${a.species ? ` of ${a.species}` : ''} no longer occurs; remove the entry`, value: a.code, expected: 'an accepted_warnings entry for a warning the database still draws' }));
        }
      });
      return out;
    },
  };
}
