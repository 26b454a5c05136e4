/**
 * Validation of the vibrational extensions of a polyatomic (or of one conformer): `vibration_scale_factor`,
 * `anharmonicity`, `centrifugal_distortion` and the polyatomic `dissociation_energy`. Every check here
 * reports with a stable code; the schema has already checked shapes and types, so malformed items are
 * skipped, not reported twice. The level-sum checks run the survey of src/partition/anharmonic-vibration.ts,
 * which counts the levels without building them.
 */
import type { Anharmonicity, CentrifugalDistortion, Structure, Vibration } from '../../src/model.js';
import {
  centrifugalCoefficient,
  MAX_ANHARMONIC_LEVELS,
  POPULATION_CUT_TEMPERATURE,
  surveyAnharmonicLevels,
} from '../../src/partition/anharmonic-vibration.js';

type Segment = string | number;
type Obj = Record<string, unknown>;

/** What the validator's findings offer: located errors and warnings with a stable code. */
export interface AnharmonicReporter {
  error(at: Segment[], message: string, extra: { value?: unknown; expected?: string; key?: boolean; code: string }): void;
  warn(at: Segment[], message: string, extra: { value?: unknown; expected?: string; key?: boolean; code: string }): void;
}

const isObj = (v: unknown): v is Obj => v !== null && typeof v === 'object' && !Array.isArray(v);
const isFiniteNumber = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);
const isPositiveInteger = (v: unknown): v is number => Number.isInteger(v) && (v as number) >= 1;
const fmt = (x: number): string => (Number.isInteger(x) ? String(x) : String(Number(x.toPrecision(6))));

/** The accepted range of a vibrational scale factor (common practice: published factors lie within 0.8–1.1). */
export const SCALE_FACTOR_RANGE = [0.75, 1.25] as const;
/** |a T| at 6000 K above which the first-order centrifugal correction is no longer small: a warning. */
export const LARGE_CENTRIFUGAL_CORRECTION = 0.2;

/** `vibration_scale_factor`: undefined when absent, null when unusable (reported). */
export function readVibrationScaleFactor(f: AnharmonicReporter, input: Obj): { value: number; source: string } | undefined | null {
  const raw = input.vibration_scale_factor;
  if (raw === undefined) return undefined;
  if (!isObj(raw) || !isFiniteNumber(raw.value) || typeof raw.source !== 'string' || raw.source.trim() === '') return null;
  const [lo, hi] = SCALE_FACTOR_RANGE;
  if (!(raw.value >= lo && raw.value <= hi)) {
    f.error(['vibration_scale_factor', 'value'], `vibrational scale factor ${fmt(raw.value)} is outside ${lo}–${hi}`, {
      value: raw.value,
      expected: `a factor between ${lo} and ${hi} (published scale factors of quantum-chemistry methods lie near 0.85–1.05)`,
      code: 'vibration-scale-factor-out-of-range',
    });
    return null;
  }
  return { value: raw.value, source: raw.source };
}

/** Index pairs of an x or g list, checked against the modes; undefined when any item is unusable. */
function readTerms(
  f: AnharmonicReporter,
  raw: unknown,
  field: 'x' | 'g',
  vibrations: readonly Vibration[],
): Array<[number, number, number]> | undefined {
  if (!Array.isArray(raw)) return undefined;
  const out: Array<[number, number, number]> = [];
  const seen = new Map<string, number>();
  let ok = true;
  raw.forEach((item, k) => {
    if (!Array.isArray(item) || item.length !== 3 || !isPositiveInteger(item[0]) || !isPositiveInteger(item[1]) || !isFiniteNumber(item[2])) {
      ok = false;
      return;
    }
    const [i, j, value] = item as [number, number, number];
    const at: Segment[] = ['anharmonicity', field, k];
    let bad = false;
    for (const [pos, mode] of [[0, i], [1, j]] as const) {
      if (mode > vibrations.length) {
        f.error([...at, pos], `mode ${mode} does not exist: vibrations has ${vibrations.length} item${vibrations.length === 1 ? '' : 's'}`, {
          value: mode,
          expected: `a 1-based index into vibrations, 1 to ${vibrations.length}`,
          code: 'anharmonic-mode-out-of-range',
        });
        bad = true;
      }
    }
    if (bad) {
      ok = false;
      return;
    }
    if (i > j) {
      f.error(at, `${field}_${i}${j}: the first index must not exceed the second`, {
        value: item,
        expected: `[${j}, ${i}, ${fmt(value)}] (i <= j)`,
        code: 'anharmonic-index-order',
      });
      ok = false;
      return;
    }
    if (field === 'g') {
      for (const [pos, mode] of [[0, i], [1, j]] as const) {
        const d = vibrations[mode - 1]!.degeneracy;
        if (d !== 2) {
          f.error([...at, pos], `g_tt' acts on the vibrational angular momentum of a doubly degenerate mode; mode ${mode} has degeneracy ${d}`, {
            value: mode,
            expected: 'the index of a vibration with degeneracy 2',
            code: 'anharmonic-g-not-degenerate',
          });
          ok = false;
        }
      }
    }
    const key = `${i},${j}`;
    const first = seen.get(key);
    if (first !== undefined) {
      f.error(at, `${field}_${i}${j} is given twice (first at ${field}[${first}])`, {
        value: item,
        expected: 'each pair of modes once',
        code: 'anharmonic-duplicate-term',
      });
      ok = false;
      return;
    }
    seen.set(key, k);
    out.push([i - 1, j - 1, value]);
  });
  return ok ? out : undefined;
}

/**
 * `anharmonicity` normalised to 0-based modes (`ok` false when it is present but unusable, reported).
 * Needs the already-normalised vibrations (undefined when they are themselves bad: then nothing is checked).
 */
export function readAnharmonicity(
  f: AnharmonicReporter,
  input: Obj,
  structure: Structure | undefined,
  vibrations: readonly Vibration[] | undefined,
): { anharmonicity?: Anharmonicity; ok: boolean } {
  const raw = input.anharmonicity;
  if (raw === undefined) return { ok: true };
  if (!isObj(raw) || !vibrations) return { ok: false };
  const x = readTerms(f, raw.x, 'x', vibrations);
  const g = raw.g === undefined ? [] : readTerms(f, raw.g, 'g', vibrations);
  let alpha: number[][] | undefined;
  let ok = x !== undefined && g !== undefined;
  if (raw.alpha !== undefined) {
    const want = structure === 'linear' ? 1 : 3;
    if (!Array.isArray(raw.alpha)) ok = false;
    else if (raw.alpha.length !== vibrations.length) {
      f.error(['anharmonicity', 'alpha'], `alpha has ${raw.alpha.length} entr${raw.alpha.length === 1 ? 'y' : 'ies'}, vibrations ${vibrations.length}`, {
        value: raw.alpha.length,
        expected: `one entry per item of vibrations (${vibrations.length})`,
        code: 'anharmonic-alpha-count',
      });
      ok = false;
    } else {
      raw.alpha.forEach((item, k) => {
        if (!Array.isArray(item) || !item.every(isFiniteNumber)) {
          ok = false;
        } else if (item.length !== want) {
          f.error(['anharmonicity', 'alpha', k], `a ${structure} molecule takes ${want === 1 ? '[alpha_B]' : '[alpha_A, alpha_B, alpha_C]'} per mode, got ${item.length} value${item.length === 1 ? '' : 's'}`, {
            value: item,
            expected: want === 1 ? '[alpha_B] in cm-1' : '[alpha_A, alpha_B, alpha_C] in cm-1',
            code: 'anharmonic-alpha-shape',
          });
          ok = false;
        }
      });
      if (ok) alpha = (raw.alpha as number[][]).map((a) => a.slice());
    }
  }
  if (!ok) return { ok: false };
  return { anharmonicity: alpha ? { x: x!, g: g!, alpha } : { x: x!, g: g! }, ok: true };
}

/** `centrifugal_distortion` (cm⁻¹); the Watson constants beyond DJ belong to nonlinear molecules only. */
export function readCentrifugalDistortion(f: AnharmonicReporter, input: Obj, structure: Structure | undefined): { centrifugal?: CentrifugalDistortion; ok: boolean } {
  const raw = input.centrifugal_distortion;
  if (raw === undefined) return { ok: true };
  if (!isObj(raw) || !isFiniteNumber(raw.DJ)) return { ok: false };
  const out: CentrifugalDistortion = { DJ: raw.DJ };
  let ok = true;
  for (const k of ['DJK', 'DK', 'dJ', 'dK'] as const) {
    const v = raw[k];
    if (v === undefined) continue;
    if (!isFiniteNumber(v)) {
      ok = false;
      continue;
    }
    if (structure === 'linear') {
      f.error(['centrifugal_distortion', k], `${k} is a constant of a nonlinear molecule; a linear one has only DJ`, {
        key: true,
        value: v,
        expected: '{DJ} for a linear molecule',
        code: 'centrifugal-constant-not-linear',
      });
      ok = false;
      continue;
    }
    out[k] = v;
  }
  return ok ? { centrifugal: out, ok } : { ok: false };
}

/** The polyatomic `dissociation_energy` cuts only the anharmonic sum: without it, it would do nothing. */
export function checkPolyatomicCut(f: AnharmonicReporter, input: Obj): boolean {
  if (input.dissociation_energy !== undefined && input.anharmonicity === undefined) {
    f.error(['dissociation_energy'], 'dissociation_energy of a polyatomic cuts the anharmonic level sum and needs anharmonicity', {
      key: true,
      expected: 'anharmonicity {x, g?, alpha?} with it, or no dissociation_energy (harmonic oscillators have no cut)',
      code: 'dissociation-energy-without-anharmonicity',
    });
    return false;
  }
  return true;
}

export interface AnharmonicModelFields {
  vibrations: readonly Vibration[];
  rotationalConstants: readonly number[];
  anharmonicity?: Anharmonicity;
  centrifugalDistortion?: CentrifugalDistortion;
  dissociationEnergy?: number;
  vibrationScaleFactor?: { value: number; source: string };
}

/**
 * Checks of the assembled model the level sum needs (the errors it would otherwise throw, located here):
 * ladders that fall at the first quantum, too many levels, rotational constants or centrifugal factors that
 * stop being positive below the cut; warnings for a large first-order centrifugal correction and for a
 * scale factor together with anharmonic constants. Returns false when the model cannot be built.
 */
export function checkAnharmonicModel(f: AnharmonicReporter, m: AnharmonicModelFields): boolean {
  const cd = m.centrifugalDistortion;
  if (m.vibrationScaleFactor && m.anharmonicity) {
    f.warn(['vibration_scale_factor'], 'a scale factor together with anharmonicity: scale factors stand in for anharmonicity, so applying both counts it twice', {
      value: m.vibrationScaleFactor.value,
      expected: 'unscaled harmonic wavenumbers with anharmonic constants, or scaled ones without',
      code: 'vibration-scale-factor-with-anharmonicity',
    });
  }
  if (!m.anharmonicity) {
    if (!cd) return true;
    const at = centrifugalCoefficient(m.rotationalConstants, cd) * POPULATION_CUT_TEMPERATURE;
    return checkCentrifugalSize(f, at, at);
  }
  const survey = surveyAnharmonicLevels({
    vibrations: m.vibrations,
    anharmonicity: m.anharmonicity,
    rotationalConstants: m.rotationalConstants,
    ...(cd ? { centrifugalDistortion: cd } : {}),
    ...(m.dissociationEnergy !== undefined ? { dissociationEnergy: m.dissociationEnergy } : {}),
  });
  const falling = survey.firstSteps.findIndex((s) => !(s > 0));
  if (falling >= 0) {
    f.error(['anharmonicity', 'x'], `G(v) of mode ${falling + 1} falls already at the first quantum (G(1) − G(0) = ${fmt(survey.firstSteps[falling]!)} cm-1)`, {
      expected: 'x_ij that are small corrections to omega_i (check signs and units: cm-1)',
      code: 'anharmonic-ladder-turns-over',
    });
    return false;
  }
  if (survey.levels > MAX_ANHARMONIC_LEVELS) {
    f.error(['anharmonicity'], `the anharmonic level sum would hold more than ${MAX_ANHARMONIC_LEVELS} levels below its cut at ${fmt(survey.cut)} cm-1 (set by the ${survey.cutBy})`, {
      expected: 'a small molecule (the direct sum grows as E^modes), a dissociation_energy that cuts the sum lower, or harmonic vibrations',
      code: 'anharmonic-level-limit',
    });
    return false;
  }
  if (survey.nonPositiveRotation) {
    const { v, constants } = survey.nonPositiveRotation;
    f.error(['anharmonicity', 'alpha'], `the rotational constants of state v = (${v.join(', ')}) below the cut are ${constants.map(fmt).join(', ')} cm-1: B_v = B_0 - sum alpha_i v_i stops being positive`, {
      expected: 'alpha_i that are small corrections (check signs and units: cm-1), or a dissociation_energy that ends the sum earlier',
      code: 'anharmonic-rotational-constant-not-positive',
    });
    return false;
  }
  if (cd) {
    const at = survey.nonPositiveCentrifugal ? survey.nonPositiveCentrifugal.factor - 1 : survey.largestCentrifugalCorrection;
    return checkCentrifugalSize(f, at, survey.largestCentrifugalCorrection);
  }
  return true;
}

function checkCentrifugalSize(f: AnharmonicReporter, worst: number, largest: number): boolean {
  if (!(1 + worst > 0)) {
    f.error(['centrifugal_distortion'], `the first-order centrifugal factor 1 + aT is ${fmt(1 + worst)} at ${POPULATION_CUT_TEMPERATURE} K: not a small correction`, {
      expected: 'distortion constants in cm-1 that are small against the rotational constants',
      code: 'centrifugal-correction-not-positive',
    });
    return false;
  }
  if (Math.abs(largest) > LARGE_CENTRIFUGAL_CORRECTION) {
    f.warn(['centrifugal_distortion'], `the first-order centrifugal correction reaches ${fmt(largest)} of q_rot at ${POPULATION_CUT_TEMPERATURE} K; beyond about ${LARGE_CENTRIFUGAL_CORRECTION} the first-order formula loses accuracy`, {
      expected: `|a T| <= ${LARGE_CENTRIFUGAL_CORRECTION} (check the units: cm-1)`,
      code: 'centrifugal-correction-large',
    });
  }
  return true;
}
