/**
 * `qforge diff --json` (schemas/diff.schema.json, format qforge-diff/2): the DiffReport with every key in
 * snake_case, like every other JSON qforge writes. Rendered field by field rather than by a key converter,
 * because the recorded inputs inside `input_changes` and `settings_changes` (`old`/`new` values) are data
 * and keep their own keys.
 */
import type { DiffReport, SpeciesChange } from './diff.js';
import type { GateResult } from './gate-results.js';
import type { InputChange } from './input-diff.js';
import type { Properties } from '../storage/read-build.js';

export const DIFF_FORMAT = 'qforge-diff/2';

const props = (p: Properties) => ({ cp: p.cp, h: p.h, s: p.s });
const changesJson = (cs: readonly InputChange[]) => cs.map((c) => ({ ...c }));

function speciesChangeJson(c: SpeciesChange) {
  return {
    name: c.name,
    kind: c.kind,
    ...(c.inputChanged !== undefined ? { input_changed: c.inputChanged } : {}),
    inputs_recorded: c.inputChanges !== undefined,
    ...(c.inputChanges ? { input_changes: changesJson(c.inputChanges) } : {}),
    ranges_changed: c.rangesChanged,
    old: { ...c.old },
    new: { ...c.new },
    ...(c.common ? { common: { ...c.common } } : {}),
    max: {
      cp: { value: c.max.cp.value, t: c.max.cp.T },
      h: { value: c.max.h.value, t: c.max.h.T },
      s: { value: c.max.s.value, t: c.max.s.T },
    },
    at: c.at.map((p) => ({ t: p.T, old: props(p.old), new: props(p.new) })),
  };
}

export function diffJson(r: DiffReport, gate: { limits: { cp?: number; h?: number; s?: number }; breaches: string[]; results: GateResult[] }) {
  return {
    format: DIFF_FORMAT,
    old: r.old,
    new: r.new,
    added: r.added,
    removed: r.removed,
    unchanged: r.unchanged,
    changed: r.changed.map(speciesChangeJson),
    notes: r.notes,
    settings_recorded: r.settingsChanges !== undefined,
    ...(r.settingsChanges ? { settings_changes: changesJson(r.settingsChanges) } : {}),
    ...(r.codeChanged !== undefined ? { code_changed: r.codeChanged } : {}),
    gate: { limits: { ...gate.limits }, breaches: gate.breaches, results: gate.results.map((g) => ({ ...g })) },
  };
}
