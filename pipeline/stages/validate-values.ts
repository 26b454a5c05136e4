/**
 * Small readers shared by the validators (validate.ts, validate-molecule.ts): value shape tests, quantities
 * converted to internal units (src/units.ts) and number formatting for messages. Each returns undefined for
 * a malformed value, which the JSON Schema has already reported.
 */
import {
  ENERGY_UNITS_TO_CM1,
  INERTIA_UNITS_TO_KG_M2,
  ROTATIONAL_UNITS_TO_CM1,
  rotationalConstantFromInertia,
} from '../../src/units.js';

export type Segment = string | number;
export type Obj = Record<string, unknown>;

/** Where a validator reports a finding; every finding carries its stable code. */
export interface FindingExtra {
  code: string;
  value?: unknown;
  expected?: string;
  key?: boolean;
}
export interface Reporter {
  error(at: Segment[], message: string, extra: FindingExtra): void;
  warn(at: Segment[], message: string, extra: FindingExtra): void;
}

export const isObj = (v: unknown): v is Obj => v !== null && typeof v === 'object' && !Array.isArray(v);
export const isFiniteNumber = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);
export const isPositiveInteger = (v: unknown): v is number => Number.isInteger(v) && (v as number) >= 1;

/** A quantity in its internal unit, or undefined when malformed (the schema reports that). */
export function quantity(raw: unknown, table: Readonly<Record<string, number>>, defaultUnit: string): number | undefined {
  if (isFiniteNumber(raw)) return raw * table[defaultUnit]!;
  if (isObj(raw) && isFiniteNumber(raw.value) && typeof raw.unit === 'string' && Object.hasOwn(table, raw.unit)) {
    return raw.value * table[raw.unit]!;
  }
  return undefined;
}
export const energy = (raw: unknown) => quantity(raw, ENERGY_UNITS_TO_CM1, 'cm-1');
export const rotational = (raw: unknown) => quantity(raw, ROTATIONAL_UNITS_TO_CM1, 'cm-1');
/** A moment of inertia (amu*angstrom^2 when bare) as the rotational constant it implies, cm⁻¹. */
export function rotationalFromInertia(raw: unknown): number | undefined {
  const kgm2 = quantity(raw, INERTIA_UNITS_TO_KG_M2, 'amu*angstrom^2');
  return kgm2 === undefined ? undefined : rotationalConstantFromInertia(kgm2);
}

/** Number formatting for messages: enough digits to recognise the value, no float noise. */
export function fmt(x: number): string {
  return Number.isInteger(x) ? String(x) : String(Number(x.toPrecision(6)));
}
