/**
 * Validate stage: one loaded YAML document → the normalised `Species` of src/model.ts, or every problem of
 * the document at once.
 *
 * Three passes over the same document, all always run so the user sees everything in one go:
 * 1. the JSON Schema (schemas/species.schema.json): shape, types, unknown keys, units, simple ranges;
 * 2. physics checks the schema cannot express (unknown elements, atom counts per structure, rotational
 *    constant counts, dissociation limits, converging level ladders, ...) — written defensively so that a
 *    field the schema already rejected is skipped, not reported twice;
 * 3. normalisation (only when there is no error): units converted once (src/units.ts), defaults filled,
 *    molar mass from src/elements.ts, plus a canonical key-sorted JSON form for the cache hash.
 * Warnings flag legal but suspicious input and never stop a species.
 */
import { elementsObject } from '../../src/libraries.js';
import schema from '../../schemas/species.schema.json' with { type: 'json' };
import { isKnownElement, molarMass } from '../../src/elements.js';
import { centrifugalConstantOf, rotationalConstantOf, vibrationalTerm } from '../../src/partition/diatomic.js';
import { DEFAULT_NUCLEAR_SPIN_MIXTURE } from '../../src/partition/spin-mixture.js';
import type {
  Conformer,
  DiatomicState,
  ElectronicLevel,
  NuclearSpinMixture,
  NuclearSpinWeights,
  PolyatomicMolecularPart,
  Species,
  Structure,
  Vibration,
  SpeciesFitLimits,
} from '../../src/model.js';
import { ENTHALPY_UNITS_TO_J_PER_MOL } from '../../src/units.js';
import { compareDiagnostics, type Diagnostic } from '../core/diagnostics.js';
import type { LoadedDocument } from './load.js';
import { checkPlausibility } from './plausibility.js';
import { checkBareUnits } from './bare-units.js';
import { nameFact, nameFindings } from './names.js';
import type { ValidateFunction } from 'ajv';
import { validateSpeciesInput } from '../generated/species-validator.js';
import { checkAgainstSchema, formatFieldPath, nearestKey } from './schema-check.js';
import {
  checkAnharmonicModel,
  checkPolyatomicCut,
  readAnharmonicity,
  readCentrifugalDistortion,
  readVibrationScaleFactor,
} from './validate-anharmonic.js';
import { checkConformerSet } from './validate-conformers.js';
import { checkElectron } from './validate-electron.js';
import { compareText, sortedKeys } from '../core/text.js';
import { normaliseMolecularPart } from './validate-molecule.js';
import { energy, fmt, isFiniteNumber, isObj, isPositiveInteger, rotational, type FindingExtra, type Obj, type Segment } from './validate-values.js';
import { readUncertainties } from './uncertainty-input.js';


export interface SpeciesValidation {
  /** Present only when the document has no error. */
  species?: Species;
  /** Errors and warnings, in source order. */
  diagnostics: Diagnostic[];
  /**
   * Canonical JSON-able form of the species (units converted, defaults filled, keys sorted at every level),
   * for content hashing; present together with `species`.
   */
  normalisedInput?: unknown;
}

// Compiled ahead of time (scripts/generate-validators.mjs): compiling the schema here cost ~0.3 s per run.
// The messages look subschemas up from the root (`validate.schema`), which ajv's compile would attach.
const speciesValidator = Object.assign(validateSpeciesInput, { schema }) as unknown as ValidateFunction;
const validateAgainstSpeciesSchema = () => speciesValidator;

/** More bound vibrational levels than any real diatomic has (I2 has about 110): a units mistake. */
const MAX_VIBRATIONAL_LEVELS = 1000;
/** Rough cap on rovibrational levels the full level sum would visit; beyond it the ladder is effectively endless. */
const MAX_ROVIBRATIONAL_LEVELS = 5e7;

const SAYS_NOTHING = /^(todo|tbd|tba|fixme|unknown|none|n\/?a|nil|null|-+|\?+|x+|\.+|source|sources|ref|refs|reference|references|see above|various|misc|internet|web|google|wikipedia)$/i;

function atomicNumber(symbol: string): number | undefined {
  if (symbol === 'D' || symbol === 'T') return 1;
  return (elementsObject as Record<string, { number?: number }>)[symbol]?.number;
}

const ALL_SYMBOLS: readonly string[] = [...Object.keys(elementsObject as object), 'D', 'T'].filter(isKnownElement);

/** Every finding carries its stable code (FindingExtra, pipeline/core/diagnostics.ts). */
class Findings {
  constructor(
    private readonly doc: LoadedDocument,
    private readonly species: string | undefined,
    /** Path of the nested part these findings are about (a conformer), prepended to every path. */
    private readonly prefix: Segment[] = [],
    readonly diagnostics: Diagnostic[] = [],
  ) {}

  /** Findings about a nested part (e.g. `conformers[1]`), reported into the same list. */
  within(prefix: Segment[]): Findings {
    return new Findings(this.doc, this.species, [...this.prefix, ...prefix], this.diagnostics);
  }

  add(
    severity: Diagnostic['severity'],
    relative: Segment[],
    message: string,
    extra: FindingExtra,
  ): void {
    const at = [...this.prefix, ...relative];
    const where = this.doc.locate(at, { key: extra.key ?? false });
    const d: Diagnostic = { severity, file: this.doc.file, path: formatFieldPath(at), message, code: extra.code };
    if (where) {
      d.line = where.line;
      d.column = where.column;
    }
    if (this.species !== undefined) d.species = this.species;
    if (extra.value !== undefined) d.value = extra.value;
    if (extra.expected !== undefined) d.expected = extra.expected;
    this.diagnostics.push(d);
  }
  error(at: Segment[], message: string, extra: FindingExtra): void {
    this.add('error', at, message, extra);
  }
  warn(at: Segment[], message: string, extra: FindingExtra): void {
    this.add('warning', at, message, extra);
  }
}

/**
 * Vibrational term value G(v) = ωe(v+½) − ωexe(v+½)² + ωeye(v+½)³ + ωeze(v+½)⁴, cm⁻¹, in the notation of
 * Huber & Herzberg, Constants of Diatomic Molecules (1979): the level sum's own function, so the checks
 * bound exactly the ladders the physics will walk.
 */
const termValue = vibrationalTerm;

/** Our threshold for "a higher-order constant out of proportion": see checkHigherOrderConstants. */
const HIGHER_ORDER_RATIO_LIMIT = 0.25;
/** The J ladder of v = 0 turning over below this fraction of the way to the limit draws a warning. */
const EARLY_TURNOVER_FRACTION = 0.75;

/**
 * Where the J ladder of one v ends, with x = J(J+1) treated as continuous: the first turnover of
 * E_rot(x) = B_v x − D_v x² + H_v x³ (dE_rot/dx = 0, smallest positive root), or else where E_rot
 * reaches `room` (cm⁻¹ above E(v,0)). The turnover root is written B_v / (D_v + √(D_v² − 3H_v B_v)),
 * which avoids cancellation and covers H_v = 0 (x = B_v/2D_v) and both signs of H_v. Needs B_v > 0.
 * Used only to warn and to estimate level counts; the level sum walks integer J itself.
 */
function rotationalLadderTop(bv: number, dv: number, hv: number, room: number): { x: number; energy: number; turnsOver: boolean } {
  const rot = (x: number) => bv * x - dv * x * x + hv * x * x * x;
  const disc = dv * dv - 3 * hv * bv;
  const denominator = disc >= 0 ? dv + Math.sqrt(disc) : 0;
  const turnover = denominator > 0 ? bv / denominator : Infinity;
  if (turnover < Infinity && rot(turnover) < room) return { x: turnover, energy: rot(turnover), turnsOver: true };
  // E_rot rises monotonically up to `turnover`: bracket the crossing of `room`, then bisect.
  let lo = 0;
  let hi = room / bv;
  for (let i = 0; i < 200 && rot(hi) < room && hi < turnover; i++) [lo, hi] = [hi, 2 * hi];
  hi = Math.min(hi, turnover);
  for (let i = 0; i < 100; i++) {
    const mid = 0.5 * (lo + hi);
    if (rot(mid) < room) lo = mid;
    else hi = mid;
  }
  return { x: hi, energy: room, turnsOver: false };
}

interface CompositionView {
  symbols: string[];
  counts: Record<string, number>;
  atoms: number;
  known: boolean;
}

function readComposition(raw: unknown, f: Findings): CompositionView | undefined {
  if (!isObj(raw)) return undefined;
  const counts: Record<string, number> = {};
  let known = true;
  let atoms = 0;
  for (const [symbol, n] of Object.entries(raw)) {
    if (!isKnownElement(symbol)) {
      known = false;
      const caseFix = ALL_SYMBOLS.find((s) => s.toLowerCase() === symbol.toLowerCase());
      const suggestion = caseFix ?? nearestKey(symbol, ALL_SYMBOLS);
      f.error(['composition', symbol], `unknown element symbol '${symbol}'${suggestion ? ` (did you mean '${suggestion}'?)` : ''}`, {
        code: 'unknown-element',
        key: true,
        expected: 'an IUPAC element symbol with a standard atomic weight (or D, T for 2H, 3H)',
      });
    }
    if (isPositiveInteger(n)) {
      counts[symbol] = n;
      atoms += n;
    } else {
      known = false;
    }
  }
  return { symbols: Object.keys(counts).sort(), counts, atoms, known };
}

function sortKeysDeep(v: unknown): unknown {
  if (Array.isArray(v)) return v.map(sortKeysDeep);
  if (isObj(v)) {
    const out: Obj = {};
    for (const k of sortedKeys(v)) if (v[k] !== undefined) out[k] = sortKeysDeep(v[k]);
    return out;
  }
  return v;
}

interface Ctx {
  f: Findings;
  input: Obj;
  structure: Structure | undefined;
  composition: CompositionView | undefined;
  /** The XYZ files named by geometry_file fields, as load.ts read them. */
  geometryFiles?: LoadedDocument['geometryFiles'];
}

function checkName(ctx: Ctx): void {
  const name = ctx.input.name;
  if (typeof name !== 'string') return;
  // The 80-column file is framed by THERMO ... END lines; readers would take a record of that name for framing.
  if (/^(END|THERMO)$/i.test(name)) {
    ctx.f.error(['name'], `'${name}' is a keyword of the 80-column thermo file and cannot name a record`, {
      code: 'name-is-keyword',
      value: name,
      expected: 'another name (e.g. with a suffix)',
    });
  } else if (/^END/i.test(name)) {
    ctx.f.warn(['name'], `a name starting with '${name.slice(0, 3)}' may be read as the END line by some readers of the 80-column file`, {
      code: 'name-reads-as-end',
      value: name,
      expected: 'a name that does not start with END',
    });
  }
  if (/^\.+$/.test(name)) {
    ctx.f.error(['name'], 'a name made only of dots cannot name a record or an output file', {
      code: 'name-only-dots',
      value: name,
      expected: 'a name with at least one letter, digit or symbol other than "."',
    });
  }
}

function checkComposition(ctx: Ctx): void {
  const { f, structure, composition: c } = ctx;
  if (!c || !c.known) return;
  if (structure === 'atom' && c.atoms !== 1) {
    f.error(['composition'], `an atom must consist of exactly 1 atom, this composition has ${c.atoms}`, {
      code: 'atom-count-atom',
      value: ctx.input.composition,
      expected: "one element with count 1, or structure 'diatomic', 'linear' or 'nonlinear'",
    });
  }
  if (structure === 'diatomic' && c.atoms !== 2) {
    f.error(['composition'], `a diatomic must consist of exactly 2 atoms, this composition has ${c.atoms}`, {
      code: 'atom-count-diatomic',
      value: ctx.input.composition,
      expected: c.atoms === 1 ? "2 atoms, or structure 'atom'" : "2 atoms, or structure 'linear' or 'nonlinear'",
    });
  }
  if (structure === 'linear' && c.atoms < 2) {
    f.error(['composition'], `a linear molecule needs at least 2 atoms, this composition has ${c.atoms}`, {
      code: 'atom-count-linear',
      value: ctx.input.composition,
      expected: "2 or more atoms, or structure 'atom'",
    });
  }
  if (structure === 'nonlinear' && c.atoms < 3) {
    f.error(['composition'], `a nonlinear molecule needs at least 3 atoms, this composition has ${c.atoms}`, {
      code: 'atom-count-nonlinear',
      value: ctx.input.composition,
      expected: "3 or more atoms, or structure 'linear' / 'diatomic'",
    });
  }
  const charge = ctx.input.charge ?? 0;
  if (Number.isInteger(charge)) {
    let electrons = 0;
    for (const s of c.symbols) electrons += (atomicNumber(s) ?? 0) * c.counts[s]!;
    electrons -= charge as number;
    if (electrons < 0) {
      f.error(['charge'], `charge ${charge as number} would leave ${electrons} electrons`, {
        code: 'charge-exceeds-electrons',
        value: charge,
        expected: `a charge of at most +${electrons + (charge as number)} for this composition`,
      });
    }
  }
}

function checkSources(ctx: Ctx): void {
  const sources = ctx.input.sources;
  if (!Array.isArray(sources)) return;
  sources.forEach((s, i) => {
    if (typeof s === 'string' && s.trim() !== '' && (SAYS_NOTHING.test(s.trim()) || s.trim().length < 3)) {
      ctx.f.warn(['sources', i], 'this source entry does not say where the numbers come from', {
        code: 'source-says-nothing',
        value: s,
        expected: 'a citation, e.g. "Huber & Herzberg (1979)", or "from memory" / "invented (demo)"',
      });
    }
  });
}

function readEnthalpy(ctx: Ctx): { value: number; temperature: number } | undefined {
  const raw = ctx.input.enthalpy_of_formation;
  if (isFiniteNumber(raw)) return { value: raw * ENTHALPY_UNITS_TO_J_PER_MOL['kJ/mol']!, temperature: 298.15 };
  if (!isObj(raw) || !isFiniteNumber(raw.value)) return undefined;
  const unit = raw.unit ?? 'kJ/mol';
  const temperature = raw.temperature ?? 298.15;
  if (typeof unit !== 'string' || !Object.hasOwn(ENTHALPY_UNITS_TO_J_PER_MOL, unit)) return undefined;
  if (temperature !== 298.15 && temperature !== 0) return undefined;
  if (temperature === 0) {
    ctx.f.warn(['enthalpy_of_formation', 'temperature'], 'enthalpy of formation given at 0 K', {
      code: 'enthalpy-at-0k',
      value: 0,
      expected:
        "a value at 298.15 K where available; a 0 K value is converted with the elements' reference-state enthalpy increments, so check they cover every element",
    });
  }
  return { value: raw.value * ENTHALPY_UNITS_TO_J_PER_MOL[unit]!, temperature };
}

function readTemperatureRanges(ctx: Ctx): { low?: number; mid?: number; high?: number } | undefined {
  const raw = ctx.input.temperature_ranges;
  if (!isObj(raw)) return undefined;
  const out: { low?: number; mid?: number; high?: number } = {};
  for (const k of ['low', 'mid', 'high'] as const) if (isFiniteNumber(raw[k]) && raw[k] > 0) out[k] = raw[k];
  const order = (['low', 'mid', 'high'] as const).filter((k) => out[k] !== undefined);
  for (let i = 1; i < order.length; i++) {
    const a = order[i - 1]!;
    const b = order[i]!;
    if (!(out[a]! < out[b]!)) {
      ctx.f.error(['temperature_ranges', b], `${b} (${fmt(out[b]!)} K) must be above ${a} (${fmt(out[a]!)} K)`, {
        code: 'temperature-range-order',
        value: out[b],
        expected: 'low < mid < high',
      });
    }
  }
  return out;
}

/** The species' own fit limits (schema-checked shape; only finite values are kept). */
function readFitLimits(ctx: Ctx): SpeciesFitLimits | undefined {
  const raw = ctx.input.tolerances;
  if (!isObj(raw)) return undefined;
  const out: SpeciesFitLimits = {};
  for (const q of ['cp', 'h', 's'] as const) if (isFiniteNumber(raw[q]) && raw[q] > 0) out[q] = raw[q];
  const rel = raw.relative_to_cp;
  if (isObj(rel)) {
    const r: NonNullable<SpeciesFitLimits['relativeToCp']> = {};
    for (const q of ['cp', 'h', 's'] as const) if (isFiniteNumber(rel[q]) && rel[q] >= 0) r[q] = rel[q];
    out.relativeToCp = r;
  }
  return out;
}

function readElectronicLevels(ctx: Ctx): ElectronicLevel[] | undefined {
  const raw = ctx.input.electronic_levels;
  if (raw === undefined) return [{ energy: 0, degeneracy: 1 }];
  if (!Array.isArray(raw) || raw.length === 0) return undefined;
  const levels: ElectronicLevel[] = [];
  let ok = true;
  raw.forEach((item) => {
    const e = isObj(item) ? energy(item.energy) : undefined;
    if (!isObj(item) || e === undefined || e < 0 || !isPositiveInteger(item.degeneracy)) {
      ok = false;
      return;
    }
    const level: ElectronicLevel = { energy: e, degeneracy: item.degeneracy };
    if (typeof item.term === 'string') level.term = item.term;
    levels.push(level);
  });
  if (!ok) return undefined;
  const lowest = Math.min(...levels.map((l) => l.energy));
  if (lowest !== 0) {
    const i = levels.findIndex((l) => l.energy === lowest);
    ctx.f.error(['electronic_levels', i, 'energy'], `the lowest electronic level is at ${fmt(lowest)} cm-1, not at 0`, {
      code: 'lowest-level-not-zero',
      value: (raw[i] as Obj).energy,
      expected: 'energies measured from the ground level, which is at energy 0',
    });
  }
  const seen = new Map<string, number>();
  levels.forEach((l, i) => {
    const key = `${l.energy}|${l.term ?? ''}`;
    const first = seen.get(key);
    if (first !== undefined) {
      ctx.f.warn(['electronic_levels', i], `same energy${l.term ? ' and term' : ''} as electronic_levels[${first}]; is a level listed twice?`, {
        code: 'electronic-level-repeated',
        value: raw[i],
        expected: 'each level once, with its total degeneracy',
      });
    } else seen.set(key, i);
  });
  // Stable sort: the physics does not care, but the canonical form should not depend on listing order.
  return levels.map((l, i) => ({ l, i })).sort((a, b) => a.l.energy - b.l.energy || a.i - b.i).map((x) => x.l);
}

function checkSymmetryNumber(ctx: Ctx, sigma: number, hasSpinWeights: boolean): void {
  const { f, structure, composition: c } = ctx;
  if ((structure === 'diatomic' || structure === 'linear') && sigma > 2) {
    f.error(['symmetry_number'], `a linear molecule has symmetry number 1 or 2, not ${sigma}`, {
      code: 'symmetry-number-linear',
      value: sigma,
      expected: '1 (no centre of symmetry) or 2 (centrosymmetric)',
    });
    return;
  }
  if (!c || !c.known) return;
  const homonuclear = c.symbols.length === 1;
  if (structure === 'diatomic') {
    if (hasSpinWeights && homonuclear && sigma !== 2) {
      f.warn(['symmetry_number'], `symmetry number ${sigma} is ignored: nuclear_spin_weights replace it`, {
        code: 'symmetry-number-ignored',
        value: sigma,
        expected: '2 for a homonuclear diatomic',
      });
    } else if (homonuclear && sigma !== 2) {
      f.warn(['symmetry_number'], 'a homonuclear diatomic usually has symmetry number 2', { code: 'symmetry-number-homonuclear', value: sigma, expected: '2' });
    } else if (!homonuclear && sigma !== 1) {
      f.warn(['symmetry_number'], 'a heteronuclear diatomic usually has symmetry number 1', { code: 'symmetry-number-heteronuclear', value: sigma, expected: '1' });
    }
  } else if (structure === 'linear' && sigma === 2) {
    // A centre of symmetry pairs atoms of each element; at most one element can have an odd count (the centre).
    const odd = c.symbols.filter((s) => c.counts[s]! % 2 === 1).length;
    if (odd > 1) {
      f.warn(['symmetry_number'], 'symmetry number 2 needs a centre of symmetry, which this composition cannot have', {
        code: 'symmetry-number-no-centre',
        value: sigma,
        expected: '1',
      });
    }
  } else if (structure === 'nonlinear' && sigma > 1 && c.symbols.every((s) => c.counts[s] === 1)) {
    f.warn(['symmetry_number'], 'with no two atoms of the same element no rotation can be a symmetry operation', {
      code: 'symmetry-number-no-equal-atoms',
      value: sigma,
      expected: '1',
    });
  }
}

/**
 * The molecular fields of a linear or nonlinear species, or of one of its conformers (the same checks and
 * normalisation for both; a conformer's ctx has its own input object and prefixed findings). Optional keys
 * appear only when given, so every species without them keeps its normalised form and hash.
 */
function readMolecularPart(ctx: Ctx): PolyatomicMolecularPart | undefined {
  const { f, input, structure } = ctx;
  if (isPositiveInteger(input.symmetry_number)) checkSymmetryNumber(ctx, input.symmetry_number, false);
  const electronicLevels = readElectronicLevels(ctx);
  // Geometry or constants, symmetry number (given, or from the geometry), rotors: validate-molecule.ts.
  const molecule = normaliseMolecularPart(input, [], f, {
    structure: structure as 'linear' | 'nonlinear',
    ...(ctx.composition?.known ? { composition: ctx.composition.counts } : {}),
    ...(ctx.geometryFiles ? { geometryFiles: ctx.geometryFiles } : {}),
  });
  f.diagnostics.push(...molecule.external);
  const { rotationalConstants, symmetryNumber: sigma } = molecule;
  const internal = { rotors: molecule.internalRotors, ok: molecule.rotorsOk };
  const { vibrations: given } = readPolyatomic(ctx);
  const scale = readVibrationScaleFactor(f, input);
  const vibrations = given && scale ? given.map((v) => ({ ...v, wavenumber: v.wavenumber * scale.value })) : given;
  const anh = readAnharmonicity(f, input, structure, vibrations);
  const cd = readCentrifugalDistortion(f, input, structure);
  const cutOk = checkPolyatomicCut(f, input);
  const d0 = input.anharmonicity !== undefined && input.dissociation_energy !== undefined ? energy(input.dissociation_energy) : undefined;
  if (!(electronicLevels && rotationalConstants && vibrations && sigma !== undefined && internal.ok && scale !== null && anh.ok && cd.ok && cutOk)) return undefined;
  // Nonlinear constants are kept as A >= B >= C; per-axis alpha follow the same order.
  const order = rotationalConstants.map((_, k) => k);
  if (structure === 'nonlinear') order.sort((a, b) => rotationalConstants[b]! - rotationalConstants[a]! || a - b);
  const anharmonicity = anh.anharmonicity?.alpha
    ? { ...anh.anharmonicity, alpha: anh.anharmonicity.alpha.map((row) => order.map((k) => row[k]!)) }
    : anh.anharmonicity;
  const part: PolyatomicMolecularPart = {
    symmetryNumber: sigma,
    electronicLevels,
    rotationalConstants: order.map((k) => rotationalConstants[k]!),
    vibrations,
    ...(internal.rotors ? { internalRotors: internal.rotors } : {}),
    ...(molecule.opticalIsomers ? { opticalIsomers: molecule.opticalIsomers } : {}),
    ...(molecule.geometryNotes ? { geometryNotes: molecule.geometryNotes } : {}),
    ...(scale ? { vibrationScaleFactor: scale } : {}),
    ...(anharmonicity ? { anharmonicity } : {}),
    ...(cd.centrifugal ? { centrifugalDistortion: cd.centrifugal } : {}),
    ...(d0 !== undefined ? { dissociationEnergy: d0 } : {}),
  };
  return checkAnharmonicModel(f, part) ? part : undefined;
}

/** Each conformer through readMolecularPart (paths under `conformers[i]`), then the cross-conformer checks. */
function readConformerParts(ctx: Ctx): Conformer[] | undefined {
  const raw = ctx.input.conformers;
  if (!Array.isArray(raw)) return undefined;
  const out: Conformer[] = [];
  let ok = true;
  raw.forEach((item, i) => {
    if (!isObj(item)) {
      ok = false;
      return;
    }
    const part = readMolecularPart({ ...ctx, f: ctx.f.within(['conformers', i]), input: item });
    const e = energy(item.energy);
    if (!part || e === undefined || typeof item.name !== 'string') {
      ok = false;
      return;
    }
    out.push({ label: item.name, energy: e, ...part });
  });
  return ok && checkConformerSet(ctx.f, out, raw) ? out : undefined;
}

/** The molecular part of the lowest conformer (energy 0), without its label and energy. */
function lowestConformerPart(conformers: Conformer[] | undefined): PolyatomicMolecularPart | undefined {
  const lowest = conformers?.find((c) => c.energy === 0);
  if (!lowest) return undefined;
  const { label: _label, energy: _energy, ...part } = lowest;
  return part;
}

function readPolyatomic(ctx: Ctx): { vibrations?: Vibration[] } {
  const { f, input, structure, composition: c } = ctx;
  let vibrations: Vibration[] | undefined;
  const raw = input.vibrations;
  if (Array.isArray(raw)) {
    const vs: Vibration[] = [];
    raw.forEach((item, i) => {
      const read = readVibration(item);
      if (!read) return;
      const { wavenumber: wn, degeneracy: g } = read;
      vs.push({ wavenumber: wn, degeneracy: g });
    });
    if (vs.length === raw.length) {
      vibrations = vs;
      if (c && c.known && (structure === 'linear' || structure === 'nonlinear')) {
        const expected = 3 * c.atoms - (structure === 'linear' ? 5 : 6);
        const modes = vs.reduce((n, v) => n + v.degeneracy, 0);
        const rotors = Array.isArray(input.internal_rotors) ? input.internal_rotors.length : 0;
        if (rotors === 0 && expected > 0 && modes !== expected) {
          f.warn(['vibrations'], `${modes} vibrational mode${modes === 1 ? '' : 's'} (counting degeneracy), but a ${structure} molecule of ${c.atoms} atoms has ${expected} (3N-${structure === 'linear' ? 5 : 6})`, {
            code: 'mode-count',
            expected: `${expected} modes counting degeneracy`,
          });
        } else if (rotors > 0 && expected > 0 && modes + rotors !== expected) {
          // Each internal rotor replaces one torsional vibration; a torsion left in `vibrations` is counted
          // twice, which is an error (more modes than the molecule has); fewer modes stay a warning.
          f.add(modes + rotors > expected ? 'error' : 'warning', ['vibrations'], `${modes} vibrational mode${modes === 1 ? '' : 's'} (counting degeneracy) plus ${rotors} internal rotor${rotors === 1 ? '' : 's'} make ${modes + rotors} modes, but a ${structure} molecule of ${c.atoms} atoms has ${expected} (3N-${structure === 'linear' ? 5 : 6})`, {
            code: modes + rotors > expected ? 'torsion-counted-twice' : 'mode-count-with-rotors',
            expected: `${expected} modes counting each internal rotor as one (remove a torsion treated as an internal rotor from vibrations)`,
          });
        }
      }
    }
  }
  return { vibrations };
}

/**
 * One vibration in any of its three forms — a bare wavenumber (cm⁻¹), a quantity `{value, unit}` (both
 * degeneracy 1), or `{wavenumber, degeneracy?}` with the wavenumber itself bare or `{value, unit}` — or
 * undefined when the item has none of these shapes exactly (the schema reports why).
 */
function readVibration(item: unknown): Vibration | undefined {
  const keys = isObj(item) ? Object.keys(item) : [];
  let wn: number | undefined;
  let g: unknown = 1;
  if (!isObj(item)) wn = energy(item);
  else if (keys.includes('wavenumber')) {
    if (!keys.every((k) => k === 'wavenumber' || k === 'degeneracy')) return undefined;
    wn = isObj(item.wavenumber) && Object.keys(item.wavenumber).length !== 2 ? undefined : energy(item.wavenumber);
    g = item.degeneracy ?? 1;
  } else if (keys.length === 2) wn = energy(item);
  if (wn === undefined || !(wn > 0) || !isPositiveInteger(g)) return undefined;
  return { wavenumber: wn, degeneracy: g };
}

function readDiatomicState(raw: unknown): DiatomicState | undefined {
  if (!isObj(raw) || typeof raw.term !== 'string' || !isPositiveInteger(raw.degeneracy)) return undefined;
  const te = energy(raw.energy);
  const we = energy(raw.we);
  const wexe = raw.wexe === undefined ? 0 : energy(raw.wexe);
  const weye = raw.weye === undefined ? 0 : energy(raw.weye);
  const Be = rotational(raw.Be);
  const alphae = raw.alphae === undefined ? 0 : rotational(raw.alphae);
  const De = raw.De === undefined ? 0 : rotational(raw.De);
  const weze = raw.weze === undefined ? 0 : energy(raw.weze);
  const gammae = raw.gammae === undefined ? 0 : rotational(raw.gammae);
  const betae = raw.betae === undefined ? 0 : rotational(raw.betae);
  const He = raw.He === undefined ? 0 : rotational(raw.He);
  const d0 = raw.dissociation_energy === undefined ? undefined : energy(raw.dissociation_energy);
  if ([te, we, wexe, weye, Be, alphae, De, weze, gammae, betae, He].some((x) => x === undefined)) return undefined;
  if (raw.dissociation_energy !== undefined && d0 === undefined) return undefined;
  if (te! < 0 || !(we! > 0) || !(Be! > 0) || De! < 0 || (d0 !== undefined && !(d0 > 0))) return undefined;
  const s: DiatomicState = {
    term: raw.term,
    energy: te!,
    degeneracy: raw.degeneracy,
    we: we!,
    wexe: wexe!,
    weye: weye!,
    Be: Be!,
    alphae: alphae!,
    De: De!,
  };
  // Higher-order constants enter only when non-zero: an explicit 0 normalises (and hashes) like an
  // absent field, and every species written without them keeps its normalised form and cache hash.
  if (weze !== 0) s.weze = weze!;
  if (gammae !== 0) s.gammae = gammae!;
  if (betae !== 0) s.betae = betae!;
  if (He !== 0) s.He = He!;
  if (d0 !== undefined) s.dissociationEnergy = d0;
  return s;
}

/**
 * Checks of the optional higher-order constants (weze, gammae, betae, He) of one state.
 *
 * Error (impossible): D_0 = De + βe/2 < 0. The centrifugal correction of the lowest vibrational level is
 * a second-order perturbation from the higher levels only, so it lowers every J > 0 level: D_0 ≥ 0
 * (Herzberg 1950, ch. III).
 * Warnings (legal but suspicious):
 * - γe, βe, ωeze out of proportion: in Dunham's ordering each further power of (v+½) costs a factor of
 *   about Be/ωe (0.01–0.03 even for hydrides), so |γe| > 0.25·αe, |βe| > 0.25·De or |ωeze| > 0.25·ωexe
 *   (or any of them given without the lower constant) points to a unit or sign slip. 0.25 is our own
 *   threshold, loose enough for every state we know of.
 * - He far from the estimate H_e ≈ (2De/(3ωe²))·(12Be² − αe·ωe) (Herzberg 1950, ch. III; from the
 *   Dunham relations): off by more than a factor of 10 or of the other sign, checked only where the
 *   bracket is clearly non-zero (its sign is then reliable). The usual slips are a sign convention
 *   (tables that write −H J³(J+1)³) or a unit.
 * A negative He by itself is not an error: heavy molecules have 12Be² < αe·ωe and so H_e < 0. Its effect —
 * J ladders that turn over early — is caught by the turnover warning of the ladder checks.
 */
function checkHigherOrderConstants(f: Findings, s: DiatomicState, i: number, raw: Obj): void {
  const at = (field: string): Segment[] => ['electronic_states', i, field];
  if (s.betae !== undefined && s.De + 0.5 * s.betae < 0) {
    f.error(at('betae'), `D_0 = De + betae/2 = ${fmt(s.De + 0.5 * s.betae)} cm-1 is negative: the centrifugal distortion of the lowest vibrational level cannot raise the rotational levels`, {
      code: 'diatomic-d0-negative',
      value: raw.betae,
      expected: `betae >= ${fmt(-2 * s.De)} cm-1 (D_0 >= 0; betae is usually a few percent of De, check its sign and unit)`,
    });
  }
  const outOfProportion = (field: string, value: number | undefined, lower: number, lowerName: string) => {
    if (value === undefined) return;
    if (lower === 0) {
      f.warn(at(field), `${field} = ${fmt(value)} cm-1 is given but ${lowerName} is 0: a higher-order correction without the term it corrects`, {
        code: 'higher-order-without-lower',
        value: raw[field],
        expected: `${lowerName} as well, or no ${field}`,
      });
    } else if (Math.abs(value) > HIGHER_ORDER_RATIO_LIMIT * Math.abs(lower)) {
      f.warn(at(field), `|${field}| = ${fmt(Math.abs(value))} cm-1 is more than ${HIGHER_ORDER_RATIO_LIMIT} of ${lowerName} = ${fmt(lower)} cm-1; higher-order constants are usually a few percent of the one before (check the unit)`, {
        code: 'higher-order-too-large',
        value: raw[field],
        expected: `|${field}| << |${lowerName}|`,
      });
    }
  };
  outOfProportion('weze', s.weze, s.wexe, 'wexe');
  outOfProportion('gammae', s.gammae, s.alphae, 'alphae');
  outOfProportion('betae', s.betae, s.De, 'De');
  if (s.He !== undefined) {
    if (s.De === 0) {
      outOfProportion('He', s.He, 0, 'De');
      return;
    }
    const bracket = 12 * s.Be * s.Be - s.alphae * s.we;
    if (Math.abs(bracket) < 0.1 * 12 * s.Be * s.Be) return;
    const estimate = ((2 * s.De) / (3 * s.we * s.we)) * bracket;
    const ratio = s.He / estimate;
    if (!(ratio >= 0.1 && ratio <= 10)) {
      f.warn(at('He'), `He = ${fmt(s.He)} cm-1 is ${ratio < 0 ? 'of the other sign from' : 'more than a factor of 10 away from'} the estimate (2De/(3we^2))(12Be^2 - alphae we) = ${fmt(estimate)} cm-1 (Herzberg 1950)`, {
        code: 'diatomic-he-estimate',
        value: raw.He,
        expected: `He of the order of ${fmt(estimate)} cm-1 in the convention E = ... - D_v J^2(J+1)^2 + He J^3(J+1)^3 (check the sign and the unit)`,
      });
    }
  }
}

function checkDiatomicLadders(ctx: Ctx, states: (DiatomicState | undefined)[], d0: number | undefined): void {
  const { f } = ctx;
  const ground = states[0];
  const rawStates = ctx.input.electronic_states as unknown[];
  if (ground && ground.energy !== 0) {
    f.error(['electronic_states', 0, 'energy'], `the first electronic state must be the ground state at energy 0, got ${fmt(ground.energy)} cm-1`, {
      code: 'ground-state-not-zero',
      value: (rawStates[0] as Obj).energy,
      expected: 'the ground state first, with energy 0',
    });
  }
  states.forEach((s, i) => {
    if (s && i > 0 && s.energy === 0) {
      f.warn(['electronic_states', i, 'energy'], 'a second electronic state at Te = 0; is a state listed twice?', {
        code: 'electronic-state-repeated',
        value: 0,
        expected: 'Te > 0 for excited states (a degenerate state is listed once with its total degeneracy)',
      });
    }
  });
  if (ground && ground.dissociationEnergy !== undefined && d0 !== undefined && Math.abs(ground.dissociationEnergy - d0) > 1e-9 * d0) {
    f.error(['electronic_states', 0, 'dissociation_energy'], `the ground state's dissociation_energy (${fmt(ground.dissociationEnergy)} cm-1) differs from the molecule's (${fmt(d0)} cm-1)`, {
      code: 'dissociation-energy-mismatch',
      value: (rawStates[0] as Obj).dissociation_energy,
      expected: "the same value, or leave it out (the ground state uses the molecule's dissociation_energy)",
    });
  }
  if (ground && d0 !== undefined) {
    const g0 = termValue(ground, 0);
    if (d0 <= g0) {
      f.error(['dissociation_energy'], `dissociation energy D0 = ${fmt(d0)} cm-1 is below the zero-point energy G(0) = ${fmt(g0)} cm-1 of the ground state`, {
        code: 'dissociation-below-zpe',
        value: ctx.input.dissociation_energy,
        expected: 'D0 measured from the lowest level, well above G(0) = we/2 - wexe/4 + weye/8 + weze/16 (check the unit)',
      });
      return;
    }
  }
  let totalLevels = 0;
  states.forEach((s, i) => {
    if (!s) return;
    let negativeDvWarned = false;
    if (s.wexe < 0) {
      f.warn(['electronic_states', i, 'wexe'], 'negative anharmonicity wexe: vibrational spacings grow with v', {
        code: 'negative-anharmonicity',
        value: (rawStates[i] as Obj).wexe,
        expected: 'wexe > 0 for almost every state (check the sign convention: G(v) = we(v+1/2) - wexe(v+1/2)^2 + ...)',
      });
    }
    if (s.De > 0.01 * s.Be) {
      f.warn(['electronic_states', i, 'De'], `centrifugal distortion De = ${fmt(s.De)} cm-1 is more than 1% of Be; check the unit (De is usually ~1e-6 of Be)`, {
        code: 'centrifugal-too-large',
        value: (rawStates[i] as Obj).De,
        expected: 'De << Be',
      });
    }
    checkHigherOrderConstants(f, s, i, rawStates[i] as Obj);
    // Height of this state's dissociation limit above its own lowest level.
    let limit: number | undefined;
    if (s.dissociationEnergy !== undefined) limit = s.dissociationEnergy;
    else if (ground && d0 !== undefined) limit = d0 - (s.energy + termValue(s, 0) - termValue(ground, 0));
    if (limit === undefined) return;
    if (limit <= 0) {
      f.error(['electronic_states', i, 'energy'], `state '${s.term}' lies entirely above the dissociation limit (its lowest level is ${fmt(-limit)} cm-1 above it)`, {
        code: 'state-above-limit',
        value: (rawStates[i] as Obj).energy,
        expected: `a bound state below the limit at ${fmt(d0 ?? 0)} cm-1, or its own dissociation_energy`,
      });
      return;
    }
    const g0 = termValue(s, 0);
    if (termValue(s, 1) <= g0) {
      f.error(['electronic_states', i, 'wexe'], `the vibrational levels of state '${s.term}' turn over before v = 1 (G(1) <= G(0)); the ladder has no excited levels`, {
        code: 'ladder-turns-over',
        value: (rawStates[i] as Obj).wexe,
        expected: 'we - 2 wexe + ... > 0 (check the units and signs of we, wexe, weye)',
      });
      return;
    }
    for (let v = 0; ; v++) {
      const gv = termValue(s, v);
      if (v > 0 && (gv <= termValue(s, v - 1) || gv - g0 >= limit)) break;
      if (v >= MAX_VIBRATIONAL_LEVELS) {
        f.error(['electronic_states', i, 'we'], `the vibrational levels of state '${s.term}' never reach the dissociation limit: more than ${MAX_VIBRATIONAL_LEVELS} bound levels`, {
          code: 'ladder-endless',
          value: (rawStates[i] as Obj).we,
          expected: 'constants and dissociation energy in consistent units (cm-1 when bare numbers)',
        });
        return;
      }
      const bv = rotationalConstantOf(s, v);
      if (bv <= 0) {
        // Blame gammae when the linear part alone would still be positive.
        const byGamma = s.gammae !== undefined && s.Be - s.alphae * (v + 0.5) > 0;
        const field = byGamma ? 'gammae' : 'alphae';
        f.error(['electronic_states', i, field], `B_v = Be - alphae(v+1/2)${s.gammae !== undefined ? ' + gammae(v+1/2)^2' : ''} is ${fmt(bv)} cm-1 at v = ${v}, below the dissociation limit: the rotational ladder of that level would not rise`, {
          code: 'rotational-ladder-falls',
          value: (rawStates[i] as Obj)[field],
          expected: byGamma
            ? `gammae > ${fmt(-(s.Be - s.alphae * (v + 0.5)) / ((v + 0.5) * (v + 0.5)))} cm-1 so that B_v stays positive for every bound level (check its sign)`
            : `alphae < ${fmt(s.Be / (v + 0.5))} cm-1 so that B_v stays positive for every bound level`,
        });
        return;
      }
      const dv = centrifugalConstantOf(s, v);
      const hv = s.He ?? 0;
      if (2 * bv - 4 * dv + 8 * hv <= 0) {
        const field = hv < 0 && 2 * bv - 4 * dv > 0 ? 'He' : 'De';
        f.error(['electronic_states', i, field], `E(v,1) <= E(v,0) at v = ${v} (2B_v - 4D_v + 8H_v = ${fmt(2 * bv - 4 * dv + 8 * hv)} cm-1), below the dissociation limit: the rotational ladder of that level would not rise`, {
          code: 'rotational-ladder-falls',
          value: (rawStates[i] as Obj)[field],
          expected: 'centrifugal terms that are small corrections to B_v J(J+1) (D_v << B_v, |H_v| << D_v; check the units)',
        });
        return;
      }
      if (dv < 0 && v > 0 && !negativeDvWarned) {
        negativeDvWarned = true;
        f.warn(['electronic_states', i, 'betae'], `D_v = De + betae(v+1/2) is ${fmt(dv)} cm-1 at v = ${v}, below the dissociation limit: the linear D_v is extrapolated past where it holds, and those J ladders rise faster than B_v J(J+1)`, {
          code: 'centrifugal-extrapolated',
          value: (rawStates[i] as Obj).betae,
          expected: `D_v > 0 for every bound level: |betae| < ${fmt(s.De / (v + 0.5))} cm-1, or constants fitted up to this v`,
        });
      }
      const room = limit - (gv - g0);
      // Rotational levels of one v: up to the J(J+1) where E reaches the limit or the ladder turns over.
      const top = rotationalLadderTop(bv, dv, hv, room);
      if (v === 0 && top.turnsOver && top.energy < EARLY_TURNOVER_FRACTION * room) {
        const field = hv < 0 ? 'He' : 'De';
        f.warn(['electronic_states', i, field], `the J ladder of v = 0 of state '${s.term}' turns over at J = ${Math.floor(Math.sqrt(top.x + 0.25) - 0.5)}, ${fmt(top.energy)} cm-1 above J = 0, while the dissociation limit is ${fmt(room)} cm-1 above it: the truncated level expression crowds and then loses the high-J levels, so Cp and S come out wrong at high temperature`, {
          code: 'j-ladder-turns-over',
          value: (rawStates[i] as Obj)[field],
          expected: hv < 0
            ? 'He from the tables (its sign: usually that of 12 Be^2 - alphae we)'
            : 'the sextic constant He of the tables (it removes the turnover), or accept a high-temperature error',
        });
      }
      totalLevels += Math.sqrt(Math.max(top.x, 0)) + 1;
    }
  });
  if (totalLevels > MAX_ROVIBRATIONAL_LEVELS) {
    f.error(['electronic_states'], `the level sum would visit about ${fmt(totalLevels)} rovibrational levels; levels this dense are effectively a never-ending ladder`, {
      code: 'too-many-levels',
      expected: `at most ${fmt(MAX_ROVIBRATIONAL_LEVELS)} levels: check the units of Be and dissociation_energy`,
    });
  }
}

interface DiatomicReading {
  states?: DiatomicState[];
  d0?: number;
  spin?: NuclearSpinWeights;
  /** Only with `spin`; the default filled in, so the cache hash states it explicitly. */
  mixture?: NuclearSpinMixture;
}

/**
 * `nuclear_spin_mixture` says how the even-J and odd-J manifolds set by `nuclear_spin_weights` are
 * populated, so without spin weights it has nothing to act on (σ divides every level then): an error, not
 * a silent no-op. Returns the mixture to use when spin weights are present.
 */
function readSpinMixture(ctx: Ctx): NuclearSpinMixture {
  const { f, input } = ctx;
  const raw = input.nuclear_spin_mixture;
  const given = raw === 'equilibrium' || raw === 'frozen' ? raw : undefined;
  if (given !== undefined && input.nuclear_spin_weights === undefined) {
    f.error(['nuclear_spin_mixture'], 'nuclear_spin_mixture needs nuclear_spin_weights: without them the symmetry number divides every level and there is no even/odd-J mixture to choose', {
      code: 'spin-mixture-without-weights',
      key: true,
      value: raw,
      expected: 'nuclear_spin_weights {even, odd} on a homonuclear diatomic (e.g. {even: 1, odd: 3} for H2), or no nuclear_spin_mixture',
    });
  }
  return given ?? DEFAULT_NUCLEAR_SPIN_MIXTURE;
}

function readDiatomic(ctx: Ctx): DiatomicReading {
  const { f, input, composition: c } = ctx;
  const d0 = energy(input.dissociation_energy);
  let spin: NuclearSpinWeights | undefined;
  const rawSpin = input.nuclear_spin_weights;
  if (isObj(rawSpin)) {
    if (c && c.known && !(c.symbols.length === 1 && c.atoms === 2)) {
      f.error(['nuclear_spin_weights'], 'nuclear spin weights apply only to a homonuclear diatomic (two atoms of one element)', {
        code: 'spin-weights-not-homonuclear',
        key: true,
        value: input.composition,
        expected: 'no nuclear_spin_weights for a heteronuclear molecule (its symmetry number is 1)',
      });
    }
    if (Number.isInteger(rawSpin.even) && Number.isInteger(rawSpin.odd) && (rawSpin.even as number) >= 0 && (rawSpin.odd as number) >= 0) {
      if (rawSpin.even === 0 && rawSpin.odd === 0) {
        f.error(['nuclear_spin_weights'], 'nuclear spin weights are both 0: no rotational level would exist', {
          code: 'spin-weights-zero',
          value: rawSpin,
          expected: 'at least one positive weight, e.g. {even: 1, odd: 3} for H2',
        });
      } else spin = { even: rawSpin.even as number, odd: rawSpin.odd as number };
    }
  }
  const mixture = readSpinMixture(ctx);
  const spinPart = spin ? { spin, mixture } : {};
  const rawStates = input.electronic_states;
  if (!Array.isArray(rawStates) || rawStates.length === 0) return { d0, ...spinPart };
  const states = rawStates.map(readDiatomicState);
  checkDiatomicLadders(ctx, states, d0);
  if (states.every((s): s is DiatomicState => s !== undefined)) return { states, d0, ...spinPart };
  return { d0, ...spinPart };
}

/**
 * Validates and normalises one species document. Returns every error and warning of the document; `species`
 * and `normalisedInput` only when there is no error.
 */
export function validateSpecies(doc: LoadedDocument): SpeciesValidation {
  const input = doc.value;
  const name = isObj(input) && typeof input.name === 'string' ? input.name : undefined;
  const schemaDiagnostics = checkAgainstSchema(validateAgainstSpeciesSchema(), doc, name === undefined ? {} : { species: name });
  if (!isObj(input)) return { diagnostics: schemaDiagnostics };
  // A field the schema already rejected is not reported again by the bounds.
  const rejected = schemaDiagnostics.map((d) => d.path);
  const under = (p: string, q: string) => p === q || (p.startsWith(q) && (p[q.length] === '.' || p[q.length] === '['));
  schemaDiagnostics.push(...[...checkPlausibility(doc, name), ...checkBareUnits(doc, name)].filter((d) => !rejected.some((q) => under(d.path, q))));

  const f = new Findings(doc, name);
  const structure = (['atom', 'diatomic', 'linear', 'nonlinear'] as const).find((s) => s === input.structure);
  const ctx: Ctx = { f, input, structure, composition: undefined, ...(doc.geometryFiles ? { geometryFiles: doc.geometryFiles } : {}) };
  ctx.composition = readComposition(input.composition, f);
  checkName(ctx);
  checkComposition(ctx);
  checkElectron(ctx.f, ctx.composition, input.charge, structure, input.electronic_levels);
  checkSources(ctx);
  const enthalpy = readEnthalpy(ctx);
  const temperatureRanges = readTemperatureRanges(ctx);
  const fitLimits = readFitLimits(ctx);
  const sigma = isPositiveInteger(input.symmetry_number) ? input.symmetry_number : undefined;

  let species: Species | undefined;
  const canBuild = ctx.composition?.known === true && enthalpy !== undefined && name !== undefined && Array.isArray(input.sources);
  const common = () => {
    const comp = ctx.composition!;
    const composition: Record<string, number> = {};
    for (const s of comp.symbols) composition[s] = comp.counts[s]!;
    const charge = (input.charge as number | undefined) ?? 0;
    const base = {
      name: name!,
      composition,
      charge,
      molarMass: molarMass(composition, charge),
      enthalpyOfFormation: enthalpy!,
      sources: (input.sources as string[]).slice(),
    };
    return { ...base, ...(temperatureRanges ? { temperatureRanges } : {}), ...(fitLimits ? { fitLimits } : {}) };
  };

  if (structure === 'atom') {
    const electronicLevels = readElectronicLevels(ctx);
    if (canBuild && electronicLevels) species = { ...common(), structure, electronicLevels } as Species;
  } else if (structure === 'linear' || structure === 'nonlinear') {
    // With conformers the species-level molecular fields are those of the lowest conformer.
    const conformers = input.conformers !== undefined ? readConformerParts(ctx) : undefined;
    const part = input.conformers !== undefined ? lowestConformerPart(conformers) : readMolecularPart(ctx);
    if (canBuild && part) species = { ...common(), structure, ...part, ...(conformers ? { conformers } : {}) } as Species;
  } else if (structure === 'diatomic') {
    const { states, d0, spin, mixture } = readDiatomic(ctx);
    if (sigma !== undefined) checkSymmetryNumber(ctx, sigma, spin !== undefined);
    if (canBuild && states && d0 !== undefined && sigma !== undefined) {
      const s: Species = { ...common(), structure, symmetryNumber: sigma, dissociationEnergy: d0, electronicStates: states };
      if (spin) {
        s.nuclearSpinWeights = spin;
        s.nuclearSpinMixture = mixture ?? DEFAULT_NUCLEAR_SPIN_MIXTURE;
      }
      species = s;
    }
  }

  if (species && input.uncertainties !== undefined) {
    const u = readUncertainties(input.uncertainties, species, (sev, at, message, extra) => f.add(sev, ['uncertainties', ...at], message, extra));
    if (u) species.uncertainties = u;
  }
  const diagnostics = [...schemaDiagnostics, ...f.diagnostics].sort(compareDiagnostics);
  const failed = diagnostics.some((d) => d.severity === 'error');
  if (failed || !species) {
    if (!failed) {
      // Defensive: normalisation could not complete although no check failed; never pass on a half species.
      diagnostics.push({ severity: 'error', code: 'not-normalised', file: doc.file, path: '', message: 'species could not be normalised', species: name });
    }
    return { diagnostics };
  }
  return { species, diagnostics, normalisedInput: sortKeysDeep(species) };
}

export interface SpeciesSetEntry extends SpeciesValidation {
  doc: LoadedDocument;
}

export { checkUniqueNameFacts, nameFact, type NameFact } from './names.js';

/**
 * Record names must be unique in a database: reports every document whose name was already used (naming
 * the first use's file and line), and warns about names that differ only in letter case, which readers of
 * the 80-column format may not distinguish. Order-independent: documents are considered sorted by file and
 * position.
 */
export function checkUniqueNames(docs: readonly LoadedDocument[]): Diagnostic[] {
  return nameFindings(docs.map(nameFact), true);
}

/** Only the errors of `checkUniqueNames`: one per document reusing a name (each names the first use). */
export function findDuplicateNames(docs: readonly LoadedDocument[]): Diagnostic[] {
  return nameFindings(docs.map(nameFact), false);
}


/**
 * Validates every document of a database and checks names across it. `results` are in the order of `docs`;
 * `diagnostics` holds only the cross-document findings (duplicate names). A species whose name is a
 * duplicate loses its `species` (the database would otherwise hold two records of one name).
 */
export function validateSpeciesSet(docs: readonly LoadedDocument[]): {
  results: SpeciesSetEntry[];
  diagnostics: Diagnostic[];
} {
  const results = docs.map((doc) => ({ doc, ...validateSpecies(doc) }));
  const diagnostics = checkUniqueNames(docs);
  for (const d of diagnostics) {
    if (d.severity !== 'error') continue;
    for (const r of results) {
      if (r.doc.file === d.file && r.doc.locate(['name'])?.line === d.line && r.species?.name === d.species) {
        delete r.species;
        delete r.normalisedInput;
      }
    }
  }
  return { results, diagnostics };
}
