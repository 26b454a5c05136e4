/**
 * A small structural diff of two recorded inputs (a species' normalised input from thermo.json, or the
 * build settings), for `qforge diff`'s "which input moved" lines: every leaf that differs, with its field
 * path (`vibrations[3].wavenumber`, `fit.sampling_step`), the old and new value and, where the field's
 * unit is fixed by the normalised form, that unit.
 *
 * Objects are compared key by key (union of keys, code-point order), arrays index by index (an entry only
 * on one side is added or removed: `old` or `new` is then absent), anything else by value. Inserting one
 * vibration at the front therefore reports every later index; that is honest about what the arrays hold
 * and cheap, and the normalised inputs keep their lists in input order.
 */
import { compareText } from '../core/text.js';

export interface InputChange {
  path: string;
  /** Absent when the field was added. */
  old?: unknown;
  /** Absent when the field was removed. */
  new?: unknown;
  unit?: string;
}

/**
 * Units of normalised-input fields (see src/model.ts: spectroscopic energies in cm⁻¹, enthalpies in
 * J/mol, temperatures in K) and of the temperature settings, keyed by the last field name of the path.
 */
const UNIT_OF_FIELD: Record<string, string> = {
  wavenumber: 'cm-1',
  vibrations: 'cm-1',
  barrier: 'cm-1',
  rotationalConstant: 'cm-1',
  rotationalConstants: 'cm-1',
  energy: 'cm-1',
  we: 'cm-1',
  wexe: 'cm-1',
  weye: 'cm-1',
  weze: 'cm-1',
  Be: 'cm-1',
  alphae: 'cm-1',
  gammae: 'cm-1',
  De: 'cm-1',
  betae: 'cm-1',
  He: 'cm-1',
  DJ: 'cm-1',
  DJK: 'cm-1',
  DK: 'cm-1',
  dJ: 'cm-1',
  dK: 'cm-1',
  dissociationEnergy: 'cm-1',
  cos: 'cm-1',
  sin: 'cm-1',
  molarMass: 'g/mol',
  temperature: 'K',
  low: 'K',
  mid: 'K',
  high: 'K',
  sampling_step: 'K',
  from: 'K',
  to: 'K',
  step: 'K',
  extra: 'K',
};

const isObject = (x: unknown): x is Record<string, unknown> => typeof x === 'object' && x !== null && !Array.isArray(x);

/** Unit of the field at `path`, from its last name (array indices ignored); enthalpies need the parent. */
export function unitOfPath(path: string): string | undefined {
  const names = path.replace(/\[\d+\]/g, '').split('.');
  const last = names[names.length - 1]!;
  if (last === 'value' && names[names.length - 2] === 'enthalpyOfFormation') return 'J/mol';
  return UNIT_OF_FIELD[last];
}

/** Every differing leaf of `a` against `b`, in path order. */
export function diffInputs(a: unknown, b: unknown, path = ''): InputChange[] {
  const out: InputChange[] = [];
  const push = (p: string, x: unknown, y: unknown) => {
    const c: InputChange = { path: p || '(whole input)' };
    if (x !== undefined) c.old = x;
    if (y !== undefined) c.new = y;
    // A unit only for numbers: a whole added entry (an object) carries its own field names.
    const unit = typeof (x ?? y) === 'number' ? unitOfPath(p) : undefined;
    if (unit) c.unit = unit;
    out.push(c);
  };
  const walk = (x: unknown, y: unknown, p: string): void => {
    if (isObject(x) && isObject(y)) {
      const keys = [...new Set([...Object.keys(x), ...Object.keys(y)])].sort(compareText);
      for (const k of keys) walk(x[k], y[k], p ? `${p}.${k}` : k);
    } else if (Array.isArray(x) && Array.isArray(y)) {
      for (let i = 0; i < Math.max(x.length, y.length); i++) walk(x[i], y[i], `${p}[${i}]`);
    } else if (!(Object.is(x, y) || JSON.stringify(x) === JSON.stringify(y))) push(p, x, y);
  };
  walk(a, b, path);
  return out;
}

const show = (x: unknown): string => (typeof x === 'string' ? JSON.stringify(x) : typeof x === 'number' ? String(x) : JSON.stringify(x) ?? 'null');

/** "vibrations[3].wavenumber 866 → 877 cm-1", "x added: 3", "y removed (was 2)". */
export function formatInputChange(c: InputChange): string {
  const unit = c.unit ? ` ${c.unit}` : '';
  if (!('old' in c)) return `${c.path} added: ${show(c.new)}${unit}`;
  if (!('new' in c)) return `${c.path} removed (was ${show(c.old)}${unit})`;
  return `${c.path} ${show(c.old)} → ${show(c.new)}${unit}`;
}
