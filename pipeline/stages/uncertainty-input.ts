/**
 * Normalises the optional `uncertainties` block of a species document (schemas/species.schema.json) into
 * internal units. The schema has checked the shapes; this checks what needs the species: a per-entry list
 * of vibration uncertainties must have one entry per vibration, and an uncertainty of an input the species
 * does not have is a warning (it would silently do nothing).
 */
import type { InputUncertainties, Species } from '../../src/model.js';
import { ENTHALPY_UNITS_TO_J_PER_MOL } from '../../src/units.js';

type Segment = string | number;
export type UncertaintyFinding = (
  severity: 'error' | 'warning',
  at: Segment[],
  message: string,
  extra: { code: string; value?: unknown; expected?: string },
) => void;

const isObj = (v: unknown): v is Record<string, unknown> => v !== null && typeof v === 'object' && !Array.isArray(v);
const num = (v: unknown): number | undefined => (typeof v === 'number' && Number.isFinite(v) && v >= 0 ? v : undefined);

/** Internal-unit uncertainties, or undefined when the block is absent or unusable (the finding says why). */
export function readUncertainties(raw: unknown, species: Species, find: UncertaintyFinding): InputUncertainties | undefined {
  if (!isObj(raw)) return undefined;
  const out: InputUncertainties = {};
  const polyatomic = species.structure === 'linear' || species.structure === 'nonlinear';
  const notApplicable = (key: string, why: string) =>
    find('warning', [key], `uncertainty of an input this species does not have (${why}); it has no effect`, {
      code: 'uncertainty-not-applicable',
      value: raw[key],
    });

  const vib = raw.vibrations;
  if (Array.isArray(vib)) {
    const entries = polyatomic ? species.vibrations.length : 0;
    if (!polyatomic) notApplicable('vibrations', 'a per-entry list needs a `vibrations` list');
    else if (vib.length !== entries) {
      find('error', ['vibrations'], `${vib.length} uncertainties for ${entries} vibration entries`, {
        code: 'uncertainty-list-length',
        value: vib.length,
        expected: `one uncertainty (cm-1) per entry of vibrations (${entries}), or one relative figure for all`,
      });
      return undefined;
    } else out.vibrations = vib.map((v) => num(v) ?? 0);
  } else if (num(vib) !== undefined) {
    if (species.structure === 'atom') notApplicable('vibrations', 'an atom has no vibrations');
    else out.vibrationsRelative = num(vib)!;
  }
  const rel: Array<[string, keyof InputUncertainties, boolean, string]> = [
    ['scale_factor', 'scaleFactorRelative', polyatomic, 'only polyatomics have a vibration list to scale'],
    ['rotational_constants', 'rotationalConstantsRelative', species.structure !== 'atom', 'an atom does not rotate'],
    ['barriers', 'barriersRelative', polyatomic && (species.internalRotors?.length ?? 0) > 0, 'no internal_rotors'],
    ['anharmonic_constants', 'anharmonicRelative', species.structure === 'diatomic' || (polyatomic && species.anharmonicity !== undefined), 'no anharmonic constants'],
    ['molar_mass', 'molarMassRelative', true, ''],
  ];
  for (const [key, field, applies, why] of rel) {
    const v = num(raw[key]);
    if (v === undefined) continue;
    if (!applies) notApplicable(key, why);
    else (out as Record<string, number>)[field] = v;
  }
  const el = num(raw.electronic_energies);
  if (el !== undefined) out.electronicEnergies = el;
  const h = raw.enthalpy_of_formation;
  if (num(h) !== undefined) out.enthalpyOfFormation = num(h)! * 1000;
  else if (isObj(h) && num(h.value) !== undefined) {
    const unit = typeof h.unit === 'string' ? h.unit : 'kJ/mol';
    out.enthalpyOfFormation = num(h.value)! * (ENTHALPY_UNITS_TO_J_PER_MOL[unit] ?? 1000);
  }
  return out;
}
