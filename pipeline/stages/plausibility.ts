/**
 * Physical plausibility bounds: every number of a species input must lie in the range real molecules
 * occupy, whatever unit it was given in. A value outside is an error at its own field, reported by
 * `check` and `build` alike (both run validate.ts, which calls `checkPlausibility` once per document), so
 * `check` never accepts a value the build would then turn into an overflow or a NaN.
 *
 * The bounds (internal units; each is a generous envelope around the extreme real value named):
 *
 * | quantity | accepted | extreme real value |
 * |---|---|---|
 * | vibration wavenumber | 1 … 5000 cm⁻¹ | H2 ωe ≈ 4401 cm⁻¹ (Huber & Herzberg 1979, from memory) |
 * | rotational constant (A, B, C; diatomic Be) | 1e-4 … 100 cm⁻¹ | H2 Be ≈ 60.9 cm⁻¹; C16 molecules ≈ 1e-3 cm⁻¹ (from memory) |
 * | moment of inertia | the same range as the rotational constant it implies (≈ 0.169 … 1.69e5 amu Å²) | |
 * | electronic level / state energy | 0 … 3e5 cm⁻¹ | He first ionisation ≈ 198 311 cm⁻¹ (NIST ASD, from memory) |
 * | dissociation energy D0 | up to 1.2e5 cm⁻¹ | CO D0 ≈ 89 460 cm⁻¹, the strongest bond (from memory) |
 * | internal rotor barrier | 0 … 3e4 cm⁻¹ | C=C cis-trans barriers ≈ 2.3e4 cm⁻¹ (common practice) |
 * | enthalpy of formation | \|ΔfH°\| ≤ 2e4 kJ/mol | multiply charged ions, large perfluorinated molecules (common practice) |
 * | symmetry number σ | whole number 1 … 60 | Ih point group (C60): σ = 60 |
 * | internal rotor σ, foldedness n | whole number 1 … 12 | CH3, CF3 tops: 3; C6H5: 2 |
 *
 * A bare rotational constant above 100 cm⁻¹ that would be an ordinary constant in MHz (the unit of
 * microwave tables) is reported with that reading: `[158000, 30000, 25000]` read as cm⁻¹ gives S°(298.15)
 * about 65 instead of about 194 J/(mol K).
 */
import type { Diagnostic } from '../core/diagnostics.js';
import {
  ENERGY_UNITS_TO_CM1,
  ENTHALPY_UNITS_TO_J_PER_MOL,
  INERTIA_UNITS_TO_KG_M2,
  ROTATIONAL_UNITS_TO_CM1,
  rotationalConstantFromInertia,
} from '../../src/units.js';
import type { LoadedDocument } from './load.js';
import { diagnosticAt } from './located.js';

type Segment = string | number;
type Obj = Record<string, unknown>;

export interface Bound {
  min: number;
  max: number;
  /** Internal unit of min and max. */
  unit: string;
  /** Inclusive lower end (else exclusive). */
  minInclusive: boolean;
  /** The real extreme named in the message. */
  why: string;
}

export const PLAUSIBLE = {
  wavenumber: { min: 1, max: 5000, unit: 'cm-1', minInclusive: true, why: 'no fundamental exceeds H2 (about 4400 cm-1)' },
  rotationalConstant: { min: 1e-4, max: 100, unit: 'cm-1', minInclusive: true, why: 'real molecules lie between about 1e-3 cm-1 (C16) and 61 cm-1 (H2)' },
  levelEnergy: { min: 0, max: 3e5, unit: 'cm-1', minInclusive: true, why: 'bound electronic levels lie below the ionisation limit (He: about 198000 cm-1)' },
  dissociationEnergy: { min: 0, max: 1.2e5, unit: 'cm-1', minInclusive: false, why: 'no bond is stronger than CO (about 89500 cm-1)' },
  barrier: { min: 0, max: 3e4, unit: 'cm-1', minInclusive: true, why: 'torsional barriers stay below about 23000 cm-1 (C=C cis-trans)' },
  enthalpy: { min: -2e4, max: 2e4, unit: 'kJ/mol', minInclusive: true, why: 'enthalpies of formation of real species stay within +-20000 kJ/mol' },
} as const satisfies Record<string, Bound>;

export const SYMMETRY_NUMBER_MAX = 60;
export const ROTOR_INTEGER_MAX = 12;

const CM1_PER_MHZ = ROTATIONAL_UNITS_TO_CM1.MHz!;
const ENTHALPY_UNITS_TO_KJ_PER_MOL: Readonly<Record<string, number>> = Object.fromEntries(
  Object.entries(ENTHALPY_UNITS_TO_J_PER_MOL).map(([unit, f]) => [unit, f / 1000]),
);

const isObj = (v: unknown): v is Obj => v !== null && typeof v === 'object' && !Array.isArray(v);
const isNum = (v: unknown): v is number => typeof v === 'number' && !Number.isNaN(v);

/** The raw number and its unit factor, or undefined when the form is wrong (the schema reports that). */
function read(raw: unknown, table: Readonly<Record<string, number>>, defaultUnit: string): { value: number; factor: number; bare: boolean; at: Segment[] } | undefined {
  if (isNum(raw)) return { value: raw, factor: table[defaultUnit]!, bare: true, at: [] };
  if (isObj(raw) && isNum(raw.value) && typeof raw.unit === 'string' && Object.hasOwn(table, raw.unit)) {
    return { value: raw.value, factor: table[raw.unit]!, bare: false, at: ['value'] };
  }
  return undefined;
}

const show = (x: number): string => (Number.isFinite(x) ? String(Number(x.toPrecision(6))) : String(x));

/** Every out-of-bounds number of one species document, each at its own field. */
export function checkPlausibility(doc: LoadedDocument, species: string | undefined): Diagnostic[] {
  const out: Diagnostic[] = [];
  const input = doc.value;
  if (!isObj(input)) return out;
  const push = (code: string, at: Segment[], message: string, value: unknown, expected: string) => {
    out.push(diagnosticAt(doc, species, at, { severity: 'error', code: code, message, value, expected }));
  };
  const within = (x: number, b: Bound) => Number.isFinite(x) && (b.minInclusive ? x >= b.min : x > b.min) && x <= b.max;
  const range = (b: Bound) => `${b.minInclusive ? '' : 'above '}${show(b.min)} to ${show(b.max)} ${b.unit}`;

  const quantity = (code: string, at: Segment[], raw: unknown, table: Readonly<Record<string, number>>, defaultUnit: string, b: Bound, what: string) => {
    const q = read(raw, table, defaultUnit);
    if (!q) return;
    const x = q.value * q.factor;
    if (within(x, b)) return;
    push(code, [...at, ...q.at], `${what} ${show(x)} ${b.unit} is outside the plausible range (${b.why})`, q.value, `${range(b)}${q.bare ? ` (a bare number is read as ${defaultUnit})` : ''}`);
  };

  const rotationalConstant = (at: Segment[], raw: unknown, what: string) => {
    const b = PLAUSIBLE.rotationalConstant;
    const q = read(raw, ROTATIONAL_UNITS_TO_CM1, 'cm-1');
    if (!q) return;
    const x = q.value * q.factor;
    if (within(x, b)) return;
    const asMHz = q.value * CM1_PER_MHZ;
    if (q.bare && x > b.max && within(asMHz, b)) {
      push('rotational-constant-looks-mhz', at, `${what} ${show(q.value)} has no unit, so it is read as ${show(q.value)} cm-1, larger than any molecule's (H2: about 61 cm-1); as MHz it would be ${show(asMHz)} cm-1`, q.value, `{value: ${show(q.value)}, unit: MHz} if the table is in MHz, else a value in cm-1 from ${range(b)}`);
      return;
    }
    push('rotational-constant-out-of-bounds', [...at, ...q.at], `${what} ${show(x)} cm-1 is outside the plausible range (${b.why})`, q.value, range(b));
  };

  const integer = (code: string, at: Segment[], raw: unknown, max: number, what: string) => {
    if (typeof raw !== 'number' || !Number.isInteger(raw) || raw < 1) return; // the schema reports that
    if (raw > max) push(code, at, `${what} ${show(raw)} is larger than any real one`, raw, `a whole number from 1 to ${max}`);
  };

  // Enthalpy of formation (bare: kJ/mol).
  const h = input.enthalpy_of_formation;
  quantity('enthalpy-out-of-bounds', ['enthalpy_of_formation'], h, ENTHALPY_UNITS_TO_KJ_PER_MOL, 'kJ/mol', PLAUSIBLE.enthalpy, 'enthalpy of formation');
  if (isObj(h) && isNum(h.value) && h.unit === undefined) {
    // {value, temperature} without a unit: kJ/mol.
    const x = h.value;
    if (!within(x, PLAUSIBLE.enthalpy)) {
      push('enthalpy-out-of-bounds', ['enthalpy_of_formation', 'value'], `enthalpy of formation ${show(x)} kJ/mol is outside the plausible range (${PLAUSIBLE.enthalpy.why})`, h.value, range(PLAUSIBLE.enthalpy));
    }
  }

  integer('symmetry-number-out-of-bounds', ['symmetry_number'], input.symmetry_number, SYMMETRY_NUMBER_MAX, 'symmetry number');

  if (Array.isArray(input.vibrations)) {
    input.vibrations.forEach((v, i) => {
      const raw = isObj(v) && Object.hasOwn(v, 'wavenumber') ? v.wavenumber : v;
      const at: Segment[] = isObj(v) && Object.hasOwn(v, 'wavenumber') ? ['vibrations', i, 'wavenumber'] : ['vibrations', i];
      quantity('wavenumber-out-of-bounds', at, raw, ENERGY_UNITS_TO_CM1, 'cm-1', PLAUSIBLE.wavenumber, 'vibration wavenumber');
    });
  }
  if (Array.isArray(input.rotational_constants)) {
    input.rotational_constants.forEach((b, i) => rotationalConstant(['rotational_constants', i], b, 'rotational constant'));
  }
  if (Array.isArray(input.moments_of_inertia)) {
    input.moments_of_inertia.forEach((raw, i) => {
      const q = read(raw, INERTIA_UNITS_TO_KG_M2, 'amu*angstrom^2');
      if (!q || !(q.value > 0)) return;
      const b = rotationalConstantFromInertia(q.value * q.factor);
      if (within(b, PLAUSIBLE.rotationalConstant)) return;
      push('moment-of-inertia-out-of-bounds', ['moments_of_inertia', i, ...q.at], `moment of inertia implies a rotational constant of ${show(b)} cm-1, outside the plausible range (${PLAUSIBLE.rotationalConstant.why})`, q.value, `a moment of inertia that implies ${range(PLAUSIBLE.rotationalConstant)}${q.bare ? ' (a bare number is read as amu*angstrom^2)' : ''}`);
    });
  }
  if (Array.isArray(input.internal_rotors)) {
    input.internal_rotors.forEach((r, i) => {
      if (!isObj(r)) return;
      quantity('barrier-out-of-bounds', ['internal_rotors', i, 'barrier'], r.barrier, ENERGY_UNITS_TO_CM1, 'cm-1', PLAUSIBLE.barrier, 'barrier');
      integer('rotor-symmetry-number-out-of-bounds', ['internal_rotors', i, 'symmetry_number'], r.symmetry_number, ROTOR_INTEGER_MAX, 'rotor symmetry number');
      integer('rotor-foldedness-out-of-bounds', ['internal_rotors', i, 'foldedness'], r.foldedness, ROTOR_INTEGER_MAX, 'foldedness');
    });
  }
  if (Array.isArray(input.electronic_levels)) {
    input.electronic_levels.forEach((l, i) => {
      if (isObj(l)) quantity('level-energy-out-of-bounds', ['electronic_levels', i, 'energy'], l.energy, ENERGY_UNITS_TO_CM1, 'cm-1', PLAUSIBLE.levelEnergy, 'level energy');
    });
  }
  quantity('dissociation-energy-out-of-bounds', ['dissociation_energy'], input.dissociation_energy, ENERGY_UNITS_TO_CM1, 'cm-1', PLAUSIBLE.dissociationEnergy, 'dissociation energy');
  if (Array.isArray(input.electronic_states)) {
    input.electronic_states.forEach((s, i) => {
      if (!isObj(s)) return;
      const at = (f: string): Segment[] => ['electronic_states', i, f];
      quantity('level-energy-out-of-bounds', at('energy'), s.energy, ENERGY_UNITS_TO_CM1, 'cm-1', PLAUSIBLE.levelEnergy, 'state energy Te');
      quantity('wavenumber-out-of-bounds', at('we'), s.we, ENERGY_UNITS_TO_CM1, 'cm-1', PLAUSIBLE.wavenumber, 'harmonic wavenumber we');
      rotationalConstant(at('Be'), s.Be, 'rotational constant Be');
      quantity('dissociation-energy-out-of-bounds', at('dissociation_energy'), s.dissociation_energy, ENERGY_UNITS_TO_CM1, 'cm-1', PLAUSIBLE.dissociationEnergy, 'dissociation energy');
    });
  }
  return out;
}
