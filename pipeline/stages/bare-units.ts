/**
 * Bare numbers whose unit is easy to confuse. qforge reads a bare energy as cm⁻¹ but a bare enthalpy of
 * formation as kJ/mol, so a barrier or a dissociation energy copied from a kJ/mol table is off by a factor
 * of about 84 without any error. For these quantities a bare number draws a warning (`bare-unit`) that
 * shows the value read both ways when BOTH readings are physically plausible (inside the bounds of
 * plausibility.ts), i.e. when the number alone cannot tell which unit was meant; a reading outside the
 * bounds is already impossible (19224 cm⁻¹ for an N level is not 19224 eV). Writing `{value, unit}`
 * silences it and `--strict` makes it an error. The choice (warn rather than require a unit) keeps old
 * inputs building while a nightly `--strict` run still refuses them.
 *
 * | field | a bare number is read as | the confusable reading |
 * |---|---|---|
 * | internal_rotors[].barrier | cm⁻¹ | kJ/mol |
 * | dissociation_energy, electronic_states[].dissociation_energy | cm⁻¹ | kJ/mol |
 * | electronic_levels[].energy, electronic_states[].energy (not 0) | cm⁻¹ | eV |
 * | moments_of_inertia[], internal_rotors[].moment_of_inertia | amu·Å² | amu·bohr² (printed by quantum-chemistry programs; always ambiguous) |
 *
 * Spectroscopic constants (wavenumbers, ωe, Be, …) stay bare in cm⁻¹ by convention and are bounded by
 * plausibility.ts instead.
 */
import type { Diagnostic } from '../core/diagnostics.js';
import { ENERGY_UNITS_TO_CM1 } from '../../src/units.js';
import type { LoadedDocument } from './load.js';
import { diagnosticAt } from './located.js';
import { PLAUSIBLE, type Bound } from './plausibility.js';

type Segment = string | number;
type Obj = Record<string, unknown>;

export const BARE_UNIT_CODE = 'bare-unit';

const isObj = (v: unknown): v is Obj => v !== null && typeof v === 'object' && !Array.isArray(v);
const show = (x: number): string => String(Number(x.toPrecision(5)));

/** Bohr radius a0 = 0.529177210903 Å (CODATA 2018): 1 amu·bohr² = a0² amu·Å². */
const ANGSTROM2_PER_BOHR2 = 0.529177210903 ** 2;

const inBounds = (x: number, b: Bound) => Number.isFinite(x) && (b.minInclusive ? x >= b.min : x > b.min) && x <= b.max;

/** One warning per bare confusable number of the document. */
export function checkBareUnits(doc: LoadedDocument, species: string | undefined): Diagnostic[] {
  const out: Diagnostic[] = [];
  const input = doc.value;
  if (!isObj(input)) return out;
  const push = (at: Segment[], message: string, value: number, expected: string) => {
    out.push(diagnosticAt(doc, species, at, { severity: 'warning', code: BARE_UNIT_CODE, message, value, expected }));
  };
  const energy = (at: Segment[], raw: unknown, what: string, other: 'kJ/mol' | 'eV', bound: Bound) => {
    if (typeof raw !== 'number' || !Number.isFinite(raw) || raw === 0) return;
    const f = ENERGY_UNITS_TO_CM1[other]!;
    if (!inBounds(raw, bound) || !inBounds(raw * f, bound)) return;
    push(
      at,
      `bare ${what} ${show(raw)} is read as ${show(raw)} cm-1 (= ${show(raw / f)} ${other}); had it been ${show(raw)} ${other} it would be ${show(raw * f)} cm-1, also a plausible value`,
      raw,
      `the unit written out, e.g. {value: ${show(raw)}, unit: cm-1}`,
    );
  };
  const inertia = (at: Segment[], raw: unknown) => {
    if (typeof raw !== 'number' || !Number.isFinite(raw) || !(raw > 0)) return;
    push(
      at,
      `bare moment of inertia ${show(raw)} is read as ${show(raw)} amu*angstrom^2; had it been ${show(raw)} amu*bohr^2 (as quantum-chemistry programs print it) it would be ${show(raw * ANGSTROM2_PER_BOHR2)} amu*angstrom^2`,
      raw,
      `the unit written out, e.g. {value: ${show(raw)}, unit: amu*angstrom^2}`,
    );
  };

  if (Array.isArray(input.internal_rotors)) {
    input.internal_rotors.forEach((r, i) => {
      if (!isObj(r)) return;
      energy(['internal_rotors', i, 'barrier'], r.barrier, 'barrier', 'kJ/mol', PLAUSIBLE.barrier);
      inertia(['internal_rotors', i, 'moment_of_inertia'], r.moment_of_inertia);
    });
  }
  energy(['dissociation_energy'], input.dissociation_energy, 'dissociation energy', 'kJ/mol', PLAUSIBLE.dissociationEnergy);
  if (Array.isArray(input.electronic_levels)) {
    input.electronic_levels.forEach((l, i) => {
      if (isObj(l)) energy(['electronic_levels', i, 'energy'], l.energy, 'level energy', 'eV', PLAUSIBLE.levelEnergy);
    });
  }
  if (Array.isArray(input.electronic_states)) {
    input.electronic_states.forEach((s, i) => {
      if (!isObj(s)) return;
      energy(['electronic_states', i, 'energy'], s.energy, 'state energy', 'eV', PLAUSIBLE.levelEnergy);
      energy(['electronic_states', i, 'dissociation_energy'], s.dissociation_energy, 'dissociation energy', 'kJ/mol', PLAUSIBLE.dissociationEnergy);
    });
  }
  if (Array.isArray(input.moments_of_inertia)) {
    input.moments_of_inertia.forEach((m, i) => inertia(['moments_of_inertia', i], m));
  }
  return out;
}
