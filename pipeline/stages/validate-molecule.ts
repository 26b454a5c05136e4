/**
 * The molecular part of a polyatomic species — geometry or constants, symmetry number, internal rotors,
 * optical isomers — read, checked and normalised to src/model.ts. `normaliseMolecularPart` works on any
 * object with these fields under any field path, so a species and each of its conformers share it.
 *
 * Geometry (src/geometry/): isotope masses, principal moments, A ≥ B ≥ C, linear or not, the rotational
 * symmetry number and, for a rotor given by `axis`, Pitzer's reduced moment and the rotor symmetry number.
 * Given constants stay accepted; with a geometry they must agree within GEOMETRY_ROTATION_TOLERANCE and
 * are then used (experimental B0 are usually better than constants from an r_e or computed structure).
 */
import { GeometryError, atomsOf, compositionOf, rigidRotorOf, rotationalConstantOfMoment, rotationalSymmetryNumber, torsionOf, type Atom, type GeometryRow } from '../../src/geometry/index.js';
import type { FourierTerm, InternalRotor } from '../../src/model.js';
import { fourierPotentialRange } from '../../src/partition/fourier-rotor.js';
import { hinderedRotorBasisSize, MAX_HINDERED_ROTOR_BASIS, smallestHinderedRotorConstant } from '../../src/partition/hindered-rotor.js';
import { fitTorsionScan, TorsionScanError } from '../../src/partition/torsion-scan.js';
import { ENERGY_UNITS_TO_CM1 } from '../../src/units.js';
import type { Diagnostic } from '../core/diagnostics.js';
import type { LoadedGeometryFile } from './load.js';
import { energy, fmt, isFiniteNumber, isObj, isPositiveInteger, rotational, rotationalFromInertia, type Obj, type Reporter, type Segment } from './validate-values.js';

/** Given rotational constants and those of the geometry may differ by this fraction at most. */
export const GEOMETRY_ROTATION_TOLERANCE = 0.005;
/** A scan must leave no gap wider than this fraction of its period (360°/σ). */
export const SCAN_LARGEST_GAP_FRACTION = 1 / 6;
/** A scan fit whose largest residual exceeds this fraction of the scan's energy range draws a warning... */
export const SCAN_RESIDUAL_FRACTION = 0.05;
/** ...and this absolute floor, cm⁻¹ (0.1 kJ/mol), so that flat scans are not held to their noise. */
export const SCAN_RESIDUAL_FLOOR_CM1 = 8.359;
/** A reduced rotational constant above this is larger than any torsion's (an OH top: about 20-40 cm⁻¹). */
const LARGEST_TORSION_ROTATIONAL_CONSTANT = 100;

export interface MoleculeContext {
  structure: 'linear' | 'nonlinear';
  /** Element counts of `composition`, when it is known and valid. */
  composition?: Readonly<Record<string, number>>;
  /** The XYZ files named by `geometry_file` fields, as load.ts read them, by name. */
  geometryFiles?: Readonly<Record<string, LoadedGeometryFile>>;
}

export interface MolecularPart {
  /** [B] or [A, B, C] (cm⁻¹) as given or from the geometry; undefined when unusable (reported). */
  rotationalConstants?: number[];
  symmetryNumber?: number;
  /** Absent when the input has none. */
  internalRotors?: InternalRotor[];
  /** Only when given and > 1. */
  opticalIsomers?: number;
  /** False when any rotor is unusable (reported). */
  rotorsOk: boolean;
  /** What came from the geometry, for the model summary (absent without a geometry). */
  geometryNotes?: string[];
  /** Diagnostics located in another file (the XYZ file), to be added to the species' own. */
  external: Diagnostic[];
}

/** The geometry of the input: the atoms and where to point at them, or undefined (absent, or reported). */
interface GeometryReading {
  atoms?: Atom[];
  /** True when a geometry was given (even a bad one), so that missing constants are not reported too. */
  given: boolean;
  /** Field path of the geometry, and how to name atom k in messages. */
  at: Segment[];
  atomPath: (k: number) => Segment[];
  atomName: (k: number) => string;
}

function formula(counts: Readonly<Record<string, number>>): string {
  return Object.keys(counts)
    .sort()
    .map((s) => `${s}${counts[s] === 1 ? '' : counts[s]}`)
    .join(' ');
}

function readGeometry(input: Obj, at: Segment[], report: Reporter, context: MoleculeContext, external: Diagnostic[]): GeometryReading {
  const inline = input.geometry;
  const file = input.geometry_file;
  const none: GeometryReading = { given: false, at, atomPath: () => at, atomName: (k) => `atom ${k + 1}` };
  if (inline === undefined && file === undefined) return none;
  if (inline !== undefined && file !== undefined) {
    report.error([...at, 'geometry_file'], 'give either geometry or geometry_file, not both', {
      code: 'geometry-given-twice',
      key: true,
      expected: 'exactly one of geometry (rows in the species file), geometry_file (an XYZ file)',
    });
    return { ...none, given: true };
  }
  let rows: GeometryRow[] | undefined;
  let reading: GeometryReading;
  if (inline !== undefined) {
    const where = [...at, 'geometry'];
    reading = { given: true, at: where, atomPath: (k) => [...where, k], atomName: (k) => `atom ${k + 1}` };
    if (Array.isArray(inline) && inline.every((r) => Array.isArray(r) && r.length === 4 && typeof r[0] === 'string' && r.slice(1).every(isFiniteNumber))) {
      rows = inline as GeometryRow[];
    }
  } else {
    const where = [...at, 'geometry_file'];
    const loaded = typeof file === 'string' ? context.geometryFiles?.[file] : undefined;
    reading = {
      given: true,
      at: where,
      atomPath: () => where,
      atomName: (k) => `atom ${k + 1} (${loaded?.file ?? String(file)} line ${loaded?.lines?.[k] ?? '?'})`,
    };
    if (loaded === undefined) {
      // load.ts reads the file when it loads the document; a document checked without it (a test) says so.
      report.error(where, `geometry file '${String(file)}' was not read`, { code: 'geometry-file-unread', value: file, expected: 'an XYZ file next to the species file' });
    } else if (loaded.diagnostics.length > 0) {
      external.push(...loaded.diagnostics);
    } else rows = loaded.rows;
  }
  if (rows === undefined) return reading;
  try {
    reading.atoms = atomsOf(rows);
  } catch (e) {
    if (!(e instanceof GeometryError)) throw e;
    const k = e.atoms[e.atoms.length - 1] ?? 0;
    const message = e.code === 'geometry-coincident-atoms'
      ? `${e.atoms.map(reading.atomName).join(' and ')} are at the same place: ${e.message}`
      : `${reading.atomName(k)}: ${e.message}`;
    report.error(reading.atomPath(k), message, {
      code: e.code,
      value: rows[k],
      expected: e.code === 'geometry-coincident-atoms'
        ? 'each atom once, at least 0.1 angstrom from every other (coordinates in angstrom)'
        : 'an element symbol (its most abundant isotope), an isotope with its mass number first (13C, 2H) or D, T',
    });
    return reading;
  }
  const got = compositionOf(reading.atoms);
  const want = context.composition;
  if (want !== undefined && formula(got) !== formula(want)) {
    report.error(reading.at, `the geometry holds ${formula(got)} but composition is ${formula(want)}`, {
      code: 'geometry-composition',
      value: formula(got),
      expected: `one row per atom of the composition (${formula(want)}); D and T (2H, 3H) count as D and T`,
    });
    delete reading.atoms;
  }
  return reading;
}

/**
 * The rotation of a polyatomic as given: rotational_constants or moments_of_inertia (cm⁻¹ out), or
 * undefined when absent or malformed. Missing both is an error only without a geometry.
 */
function readGivenRotation(input: Obj, at: Segment[], report: Reporter, structure: 'linear' | 'nonlinear', hasGeometry: boolean): number[] | undefined {
  const want = structure === 'linear' ? 1 : 3;
  const rc = input.rotational_constants;
  const moi = input.moments_of_inertia;
  let rotationalConstants: number[] | undefined;
  if (rc !== undefined && moi !== undefined) {
    report.error([...at, 'moments_of_inertia'], 'give either rotational_constants or moments_of_inertia, not both', {
      code: 'rotation-given-twice',
      key: true,
      expected: 'exactly one of rotational_constants, moments_of_inertia',
    });
  } else if (rc === undefined && moi === undefined) {
    if (!hasGeometry) report.error([...at, 'rotational_constants'], `missing required field 'rotational_constants' (or 'moments_of_inertia') for structure '${structure}' without a geometry`, {
      code: 'rotation-missing',
      expected: structure === 'linear' ? '[B] in cm-1' : '[A, B, C] in cm-1',
    });
  } else {
    const field = rc !== undefined ? 'rotational_constants' : 'moments_of_inertia';
    const list = rc ?? moi;
    if (Array.isArray(list)) {
      if (list.length > 3) {
        // The schema already reports more than 3 items.
      } else if (list.length !== want) {
        report.error([...at, field], `a ${structure} molecule takes ${want} ${field === 'rotational_constants' ? 'rotational constant' : 'moment of inertia'}${want === 1 ? '' : 's'}, got ${list.length}`, {
          code: 'rotation-count',
          value: list,
          expected: structure === 'linear' ? (field === 'rotational_constants' ? '[B]' : '[I]') : field === 'rotational_constants' ? '[A, B, C]' : '[IA, IB, IC]',
        });
      } else {
        const values = list.map(field === 'rotational_constants' ? rotational : rotationalFromInertia);
        if (values.every((v): v is number => v !== undefined && v > 0)) {
          rotationalConstants = values;
          if (structure === 'nonlinear' && !(values[0]! >= values[1]! && values[1]! >= values[2]!)) {
            report.warn([...at, field], field === 'rotational_constants' ? 'rotational constants are not in the order A >= B >= C' : 'moments of inertia are not in the order IA <= IB <= IC', {
              code: 'rotation-order',
              value: list,
              expected: 'the conventional order (the product, and so the thermochemistry, is unaffected)',
            });
          }
        }
      }
    }
  }
  return rotationalConstants;
}

/** The torsional potential of one rotor (cm⁻¹), or undefined when unusable (reported). */
interface PotentialReading {
  barrier: number;
  foldedness: number;
  fourier?: FourierTerm[];
  scanFit?: InternalRotor['scanFit'];
}

function readPotential(item: Obj, at: (field?: string) => Segment[], report: Reporter, sigma: number): PotentialReading | undefined {
  const hasBarrier = item.barrier !== undefined;
  const raw = item.potential;
  if (hasBarrier && raw !== undefined) {
    report.error(at('potential'), 'give either barrier or potential of an internal rotor, not both', {
      code: 'rotor-potential-given-twice',
      key: true,
      expected: 'exactly one of barrier (with foldedness), potential',
    });
    return undefined;
  }
  if (!hasBarrier && raw === undefined) {
    report.error(at('barrier'), "missing required field 'barrier' (or 'potential') of an internal rotor", {
      code: 'missing-field',
      expected: 'barrier V0 (cm-1 or {value, unit}), or potential {barrier, foldedness} | {fourier, unit} | {scan, unit}',
    });
    return undefined;
  }
  if (hasBarrier || (isObj(raw) && raw.barrier !== undefined)) {
    const v0 = energy(hasBarrier ? item.barrier : (raw as Obj).barrier);
    const n = (isObj(raw) ? raw.foldedness : undefined) ?? item.foldedness ?? sigma;
    if (v0 === undefined || !(v0 >= 0) || !isPositiveInteger(n)) return undefined;
    return { barrier: v0, foldedness: n };
  }
  if (!isObj(raw)) return undefined;
  const unit = raw.unit ?? 'cm-1';
  if (typeof unit !== 'string' || !Object.hasOwn(ENERGY_UNITS_TO_CM1, unit)) return undefined;
  const factor = ENERGY_UNITS_TO_CM1[unit]!;
  let terms: FourierTerm[];
  let scanFit: InternalRotor['scanFit'];
  if (Array.isArray(raw.fourier)) {
    const ok = raw.fourier.every((t) => Array.isArray(t) && t.length === 3 && isPositiveInteger(t[0]) && isFiniteNumber(t[1]) && isFiniteNumber(t[2]));
    if (!ok) return undefined;
    terms = (raw.fourier as [number, number, number][]).map(([n, c, s]) => ({ n, cos: c * factor, sin: s * factor }));
    const seen = new Set<number>();
    for (const [k, t] of terms.entries()) {
      if (seen.has(t.n)) {
        report.error([...at('potential'), 'fourier', k], `Fourier term n = ${t.n} is given twice`, {
          code: 'rotor-fourier-repeated-term',
          value: raw.fourier[k],
          expected: 'each n once (add the coefficients)',
        });
        return undefined;
      }
      seen.add(t.n);
      if (t.n % sigma !== 0) {
        report.warn([...at('potential'), 'fourier', k], `Fourier term n = ${t.n} is not a multiple of the rotor symmetry number ${sigma}: the potential does not repeat with the top`, {
          code: 'rotor-symmetry-fourier',
          value: raw.fourier[k],
          expected: `terms n = ${sigma}, ${2 * sigma}, ... for a top of symmetry number ${sigma}`,
        });
      }
    }
  } else if (Array.isArray(raw.scan)) {
    const ok = raw.scan.every((p) => Array.isArray(p) && p.length === 2 && isFiniteNumber(p[0]) && isFiniteNumber(p[1]));
    if (!ok) return undefined;
    const points = (raw.scan as [number, number][]).map(([a, v]) => [a, v * factor] as const);
    const where = [...at('potential'), 'scan'];
    try {
      const fit = fitTorsionScan(points, sigma);
      if (fit.largestGapDegrees > SCAN_LARGEST_GAP_FRACTION * fit.periodDegrees) {
        report.error(where, `the scan does not cover the period of ${fmt(fit.periodDegrees)} degrees (rotor symmetry number ${sigma}): it leaves a gap of ${fmt(fit.largestGapDegrees)} degrees`, {
          code: 'rotor-scan-coverage',
          expected: `scan angles over a whole period of ${fmt(fit.periodDegrees)} degrees, no gap wider than ${fmt(SCAN_LARGEST_GAP_FRACTION * fit.periodDegrees)} degrees`,
        });
        return undefined;
      }
      const limit = Math.max(SCAN_RESIDUAL_FRACTION * fit.range, SCAN_RESIDUAL_FLOOR_CM1);
      if (fit.maxResidual > limit) {
        report.warn(where, `the Fourier fit of the scan (${fit.terms.length} terms) misses a point by ${fmt(fit.maxResidual)} cm-1 (rms ${fmt(fit.rmsResidual)} cm-1), more than ${fmt(limit)} cm-1`, {
          code: 'rotor-scan-fit-residual',
          expected: `a smooth scan of one torsion: residuals within ${SCAN_RESIDUAL_FRACTION * 100} % of its range (${fmt(fit.range)} cm-1) or ${SCAN_RESIDUAL_FLOOR_CM1} cm-1; check for jumps to another conformer or a wrong symmetry number`,
        });
      }
      terms = fit.terms;
      scanFit = { points: points.length, terms: fit.terms.length, rmsResidual: fit.rmsResidual, maxResidual: fit.maxResidual };
    } catch (e) {
      if (!(e instanceof TorsionScanError)) throw e;
      report.error(where, e.message, { code: e.code, expected: 'at least 3 distinct angles per period (usually 12 or more)' });
      return undefined;
    }
  } else return undefined;
  const { min, max } = fourierPotentialRange(terms);
  const out: PotentialReading = { barrier: max - min, foldedness: Math.max(...terms.map((t) => t.n)), fourier: terms };
  if (scanFit) out.scanFit = scanFit;
  return out;
}

/** The reduced rotational constant and symmetry number of a rotor given by `axis` in the geometry. */
function readRotorAxis(
  item: Obj,
  at: (field?: string) => Segment[],
  report: Reporter,
  geometry: GeometryReading,
): { rotationalConstant: number; symmetryNumber: number; reducedMoment: number; twoBodyMoment: number; top: number[] } | undefined {
  const axis = item.axis;
  const top = item.top;
  if (!geometry.given) {
    report.error(at('axis'), 'an internal rotor given by axis needs a geometry', {
      code: 'rotor-axis-needs-geometry',
      key: true,
      expected: 'geometry or geometry_file, or moment_of_inertia / rotational_constant instead of axis',
    });
    return undefined;
  }
  const atoms = geometry.atoms;
  if (!atoms || !Array.isArray(axis) || !axis.every(isPositiveInteger) || (top !== undefined && !(Array.isArray(top) && top.every(isPositiveInteger)))) {
    return undefined;
  }
  let inRange = true;
  const check = (field: string, list: number[]) =>
    list.forEach((k, m) => {
      if (k > atoms.length) {
        inRange = false;
        report.error([...at(field), m], `atom index ${k} is out of range: the geometry has ${atoms.length} atoms`, {
          code: 'rotor-atom-out-of-range',
          value: k,
          expected: `a 1-based atom index from 1 to ${atoms.length}`,
        });
      }
    });
  check('axis', axis as number[]);
  if (top !== undefined) check('top', top as number[]);
  if (!inRange) return undefined;
  const [i, j] = (axis as number[]).map((k) => k - 1) as [number, number];
  if (i === j) {
    report.error(at('axis'), `the axis joins atom ${i + 1} to itself`, { code: 'rotor-axis-same-atom', value: axis, expected: 'two bonded atoms' });
    return undefined;
  }
  try {
    const t = torsionOf(atoms, i, j, top === undefined ? undefined : (top as number[]).map((k) => k - 1));
    if (!(t.reducedMoment > 1e-6)) {
      report.error(at('axis'), `the top (${t.top.map((k) => k + 1).join(', ')}) has no moment of inertia about the axis: all its atoms lie on it`, {
        code: 'rotor-no-moment',
        value: axis,
        expected: 'a bond with atoms off the axis on both sides (a torsion)',
      });
      return undefined;
    }
    return { rotationalConstant: rotationalConstantOfMoment(t.reducedMoment), symmetryNumber: t.symmetryNumber, reducedMoment: t.reducedMoment, twoBodyMoment: t.twoBodyMoment, top: t.top };
  } catch (e) {
    if (!(e instanceof GeometryError)) throw e;
    const onTop = e.code === 'rotor-top-both-sides' || e.code === 'rotor-top-incomplete';
    const expected: Record<string, string> = {
      'rotor-axis-not-bonded': `two bonded atoms (distance at most 1.25 x the sum of the covalent radii of Cordero et al. 2008)`,
      'rotor-axis-in-ring': 'a bond that is not part of a ring',
      'rotor-top-both-sides': 'the atoms of one side of the axis bond',
      'rotor-top-incomplete': 'every atom of one side of the axis bond (or leave top out: the smaller side turns)',
      'geometry-no-covalent-radius': 'elements with a tabulated covalent radius',
    };
    report.error(at(onTop ? 'top' : 'axis'), e.message, { code: e.code, value: onTop ? top : axis, expected: expected[e.code] ?? 'a torsion about a single bond' });
    return undefined;
  }
}

/**
 * The optional `internal_rotors`, normalised (cm⁻¹; foldedness defaulting to the rotor symmetry number), or
 * undefined when absent or when any item is unusable (reported). Per rotor: exactly one of axis (geometry),
 * moment_of_inertia, rotational_constant; exactly one of barrier and potential; a basis the level sum can
 * diagonalise; warnings for a rotor on a linear molecule, a symmetry number that does not divide the
 * foldedness or differs from the geometry's, and an implausibly large rotational constant.
 */
function readInternalRotors(
  input: Obj,
  prefix: Segment[],
  report: Reporter,
  structure: 'linear' | 'nonlinear',
  geometry: GeometryReading,
  notes: string[],
): { rotors?: InternalRotor[]; ok: boolean } {
  const raw = input.internal_rotors;
  if (raw === undefined) return { ok: true };
  if (!Array.isArray(raw) || raw.length === 0) return { ok: false };
  if (structure === 'linear') {
    report.warn([...prefix, 'internal_rotors'], 'internal rotors on a linear molecule: a linear molecule has no torsion about a bond axis', {
      code: 'rotor-on-linear',
      key: true,
      expected: "structure 'nonlinear' for a molecule with a torsion, or no internal_rotors",
    });
  }
  const rotors: InternalRotor[] = [];
  let ok = true;
  raw.forEach((item, i) => {
    if (!isObj(item)) {
      ok = false;
      return;
    }
    const at = (field?: string): Segment[] => (field === undefined ? [...prefix, 'internal_rotors', i] : [...prefix, 'internal_rotors', i, field]);
    const hasAxis = item.axis !== undefined;
    const hasI = item.moment_of_inertia !== undefined;
    const hasB = item.rotational_constant !== undefined;
    if (hasI && hasB) {
      report.error(at('moment_of_inertia'), 'give either moment_of_inertia or rotational_constant of an internal rotor, not both', {
        code: 'rotor-given-twice',
        key: true,
        expected: 'exactly one of moment_of_inertia (amu*angstrom^2), rotational_constant (cm-1)',
      });
      ok = false;
      return;
    }
    if (hasAxis && (hasI || hasB)) {
      report.error(at(hasI ? 'moment_of_inertia' : 'rotational_constant'), `give either axis (the reduced moment from the geometry) or ${hasI ? 'moment_of_inertia' : 'rotational_constant'} of an internal rotor, not both`, {
        code: 'rotor-given-twice',
        key: true,
        expected: 'exactly one of axis, moment_of_inertia, rotational_constant',
      });
      ok = false;
      return;
    }
    if (!hasAxis && item.top !== undefined) {
      report.error(at('top'), 'top needs axis: it names the atoms that turn about the axis bond', { code: 'rotor-top-without-axis', key: true, expected: 'axis [i, j] as well, or no top' });
      ok = false;
      return;
    }
    if (!hasAxis && !hasI && !hasB) {
      report.error(at(), "an internal rotor needs 'moment_of_inertia' or 'rotational_constant' (or 'axis' with a geometry)", {
        code: 'rotor-missing-inertia',
        value: item,
        expected: 'the reduced moment of inertia (amu*angstrom^2) or the reduced rotational constant (cm-1) of the torsion, or its bond axis in the geometry',
      });
      ok = false;
      return;
    }
    const fromAxis = hasAxis ? readRotorAxis(item, at, report, geometry) : undefined;
    if (fromAxis) {
      notes.push(
        `rotor ${i + 1} about atoms ${(item.axis as number[]).join('-')}: top ${fromAxis.top.map((k) => k + 1).join(', ')}, reduced moment ${fmt(fromAxis.reducedMoment)} amu*angstrom^2 (Pitzer I(2,3); two-body ${fmt(fromAxis.twoBodyMoment)}), rotor symmetry number ${fromAxis.symmetryNumber} from the geometry`,
      );
    }
    const b = hasAxis ? fromAxis?.rotationalConstant : hasB ? rotational(item.rotational_constant) : rotationalFromInertia(item.moment_of_inertia);
    const given = isPositiveInteger(item.symmetry_number) ? item.symmetry_number : undefined;
    if (item.symmetry_number === undefined && !hasAxis) {
      report.error(at('symmetry_number'), "missing required field 'symmetry_number' of an internal rotor (required without axis)", {
        code: 'missing-field',
        expected: 'the rotor symmetry number (3 for a CH3 top, 1 for an OH top)',
      });
    }
    if (given !== undefined && fromAxis !== undefined && given !== fromAxis.symmetryNumber) {
      report.warn(at('symmetry_number'), `rotor symmetry number ${given} differs from the ${fromAxis.symmetryNumber} of the geometry (turns about the axis that map both sides onto themselves); ${given} is used`, {
        code: 'rotor-symmetry-number-differs',
        value: given,
        expected: `${fromAxis.symmetryNumber}, or a geometry with the symmetry of the top`,
      });
    }
    const sigma = given ?? fromAxis?.symmetryNumber;
    if (b === undefined || !(b > 0) || sigma === undefined) {
      ok = false;
      return;
    }
    const potential = readPotential(item, at, report, sigma);
    if (potential === undefined) {
      ok = false;
      return;
    }
    const field = hasAxis ? 'axis' : hasB ? 'rotational_constant' : 'moment_of_inertia';
    const rotor: InternalRotor = { barrier: potential.barrier, foldedness: potential.foldedness, symmetryNumber: sigma, rotationalConstant: b };
    if (potential.fourier) rotor.fourier = potential.fourier;
    if (potential.scanFit) rotor.scanFit = potential.scanFit;
    const basis = hinderedRotorBasisSize(rotor);
    if (basis > MAX_HINDERED_ROTOR_BASIS) {
      report.error(at(field), `reduced rotational constant ${fmt(b)} cm-1 is too small for the level sum: ${basis} free-rotor basis functions, more than ${MAX_HINDERED_ROTOR_BASIS}`, {
        code: 'rotor-basis-too-large',
        value: item[field],
        expected: `the reduced constant of a real torsion, at least ${fmt(smallestHinderedRotorConstant(rotor))} cm-1 (check the unit: a bare moment_of_inertia is in amu*angstrom^2)`,
      });
      ok = false;
      return;
    }
    if (b > LARGEST_TORSION_ROTATIONAL_CONSTANT) {
      report.warn(at(field), `reduced rotational constant of ${fmt(b)} cm-1 is larger than that of any torsion (an OH top: about 20-40 cm-1); check the unit`, {
        code: 'rotor-constant-too-large',
        value: item[field],
        expected: 'a value in cm-1, or a moment of inertia in amu*angstrom^2',
      });
    }
    const n = potential.foldedness;
    if (!potential.fourier && n % sigma !== 0) {
      report.warn(at('symmetry_number'), `rotor symmetry number ${sigma} does not divide the foldedness ${n}: a rotation that maps the top onto itself must also map the potential onto itself`, {
        code: 'rotor-symmetry-foldedness',
        value: sigma,
        expected: `a divisor of ${n} (usually ${n} for a symmetric top, 1 for an asymmetric one)`,
      });
    }
    rotors.push(rotor);
  });
  return ok ? { rotors, ok } : { ok: false };
}

/**
 * Normalises the molecular part of a polyatomic (geometry | constants, symmetry number, internal rotors,
 * optical isomers) found in `input` at field path `at` (the species itself: []; a conformer: its path),
 * reporting every problem through `report`. Works for a species and for each of its conformers.
 */
export function normaliseMolecularPart(input: Obj, at: Segment[], report: Reporter, context: MoleculeContext): MolecularPart {
  const external: Diagnostic[] = [];
  const notes: string[] = [];
  const { structure } = context;
  const geometry = readGeometry(input, at, report, context, external);
  const given = readGivenRotation(input, at, report, structure, geometry.given);
  let rotationalConstants = given;
  let fromGeometrySigma: number | undefined;
  if (geometry.atoms) {
    const rigid = rigidRotorOf(geometry.atoms);
    const shape = rigid.linear ? 'linear' : 'nonlinear';
    if (shape !== structure) {
      report.error(geometry.at, `the geometry is ${shape} but structure is '${structure}'`, {
        code: 'geometry-structure',
        value: structure,
        expected: `structure '${shape}' for this geometry (linear: every atom within 0.001 angstrom of one line)`,
      });
    } else {
      fromGeometrySigma = rotationalSymmetryNumber(geometry.atoms);
      const computed = rigid.rotationalConstants;
      notes.push(
        `geometry of ${geometry.atoms.length} atoms: principal moments ${rigid.moments.map((m) => fmt(m)).join(', ')} amu*angstrom^2, rotational constants ${computed.map(fmt).join(', ')} cm-1 (${given === undefined ? 'used' : 'the given constants agree within 0.5 % and are used'}), symmetry number ${fromGeometrySigma}`,
      );
      if (given === undefined) rotationalConstants = computed;
      else if (given.length === computed.length) {
        const sorted = structure === 'nonlinear' ? given.slice().sort((a, b) => b - a) : given;
        const worst = sorted.reduce((w, g, k) => Math.max(w, Math.abs(g - computed[k]!) / computed[k]!), 0);
        if (worst > GEOMETRY_ROTATION_TOLERANCE) {
          const field = input.rotational_constants !== undefined ? 'rotational_constants' : 'moments_of_inertia';
          report.error([...at, field], `the given rotational constants (${sorted.map(fmt).join(', ')} cm-1) and those of the geometry (${computed.map(fmt).join(', ')} cm-1) differ by ${fmt(worst * 100)} %, more than ${GEOMETRY_ROTATION_TOLERANCE * 100} %`, {
            code: 'geometry-rotation-disagrees',
            value: sorted.map(fmt),
            expected: 'constants and geometry of the same structure (or give only one of them)',
          });
          rotationalConstants = undefined;
        }
      }
    }
  }
  const rawSigma = input.symmetry_number;
  let symmetryNumber = isPositiveInteger(rawSigma) ? rawSigma : fromGeometrySigma;
  if (rawSigma === undefined && !geometry.given) {
    report.error([...at, 'symmetry_number'], `missing required field 'symmetry_number' (required for structure '${structure}' without a geometry)`, {
      code: 'missing-field',
      expected: 'the rotational symmetry number sigma (a whole number >= 1), or a geometry to find it from',
    });
  } else if (isPositiveInteger(rawSigma) && fromGeometrySigma !== undefined && rawSigma !== fromGeometrySigma) {
    report.warn([...at, 'symmetry_number'], `symmetry number ${rawSigma} differs from the ${fromGeometrySigma} of the geometry (proper rotations mapping it onto itself); ${rawSigma} is used`, {
      code: 'symmetry-number-differs',
      value: rawSigma,
      expected: `${fromGeometrySigma}, or a geometry of the symmetric structure (atoms within 0.02 angstrom)`,
    });
  }
  if (rawSigma === undefined && geometry.given && fromGeometrySigma === undefined) symmetryNumber = undefined;
  const rotors = readInternalRotors(input, at, report, structure, geometry, notes);
  const out: MolecularPart = { rotorsOk: rotors.ok, external };
  if (rotationalConstants) out.rotationalConstants = rotationalConstants;
  if (symmetryNumber !== undefined) out.symmetryNumber = symmetryNumber;
  if (rotors.rotors) out.internalRotors = rotors.rotors;
  if (isPositiveInteger(input.optical_isomers) && input.optical_isomers > 1) out.opticalIsomers = input.optical_isomers;
  if (notes.length > 0) out.geometryNotes = notes;
  return out;
}
