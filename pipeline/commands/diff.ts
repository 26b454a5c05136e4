/**
 * `qforge diff OLD NEW`: which species were added, removed or changed between two builds (or 80-column
 * files), and for each changed one how much its properties moved.
 *
 * A species is "changed" when its coefficients or ranges differ at all. It then counts as
 * "properties changed" when any of |ΔCp|, |ΔS| exceeds 0.001 J/(mol K) or |ΔH| exceeds 0.001 kJ/mol at
 * some point of the common range (10 K grid plus 298.15 K, 1000 K and the ends); otherwise "only the
 * coefficients moved" (e.g. a refit that lands on an equivalent polynomial, or the E15.8 rounding of an
 * 80-column file against full-precision JSON). The thresholds sit far below any tolerance a thermo table
 * is quoted to (NIST-JANAF prints 0.001) and far above the rounding of the 80-column layout (8 digits).
 *
 * Like with like: when one side is an 80-column file and the other a build folder, the folder's nasa7.txt
 * is read instead of its thermo.json, so a build compared with its own nasa7.txt shows no change (the
 * thermo.json coefficients are full precision, the records hold 9 digits: every species would otherwise
 * count as changed). When that is impossible (a thermo.json given as a file, or a folder without
 * nasa7.txt) the comparison is "mixed precision": a species with the same ranges whose Cp, H and S agree
 * within ROUNDING_TOLERANCE everywhere on the grid counts as unchanged, and the report says so in `notes`.
 */
import { T_REF } from '../../src/constants.js';
import type { Nasa7Polynomial } from '../../src/nasa7/types.js';
import type { CliIo } from './io.js';
import { diffGateResults } from './gate-results.js';
import { diffInputs, formatInputChange, type InputChange } from './input-diff.js';
import { diffJson } from './diff-json.js';
import { formatFixed, formatSigned, polynomialProperties, readPolynomialSet, ReadBuildError, type PolynomialSet, type Properties } from '../storage/read-build.js';
import { compareText } from '../core/text.js';

export const PROPERTY_CHANGE_THRESHOLDS = Object.freeze({ cp: 1e-3, h: 1e-3, s: 1e-3 });
/**
 * Largest property difference (J/(mol K); kJ/mol for H) that 9-digit rounding of the coefficients can
 * cause: about 1e-8 relative in Cp/R, H/RT, S/R (see src/nasa7/round.ts), i.e. < 1e-6 J/(mol K) and
 * < 1e-6 kJ/mol at 6000 K; 1e-5 leaves a margin and is still 100 times below PROPERTY_CHANGE_THRESHOLDS.
 */
export const ROUNDING_TOLERANCE = 1e-5;
export const DIFF_GRID_STEP = 10;

type Q = 'cp' | 'h' | 's';
const QS: readonly Q[] = ['cp', 'h', 's'];
const UNITS: Record<Q, string> = { cp: 'J/(mol K)', h: 'kJ/mol', s: 'J/(mol K)' };
const LABELS: Record<Q, string> = { cp: 'Cp', h: 'H', s: 'S' };

export interface SpeciesChange {
  name: string;
  /** 'properties' when a property moved beyond the thresholds, else 'coefficients'. */
  kind: 'properties' | 'coefficients';
  /** True/false when both sides carry an input hash, otherwise undefined. */
  inputChanged?: boolean;
  /**
   * The input fields that moved (normalised inputs recorded in both thermo.json files), or undefined when
   * either side did not record its input ("inputs not recorded").
   */
  inputChanges?: InputChange[];
  rangesChanged: boolean;
  old: { low: number; mid: number; high: number };
  new: { low: number; mid: number; high: number };
  /** Common range compared, undefined when the ranges do not overlap. */
  common?: { low: number; high: number };
  /** Largest |new − old| and where, on the common range. Cp, S in J/(mol K); H (absolute) in kJ/mol. */
  max: Record<Q, { value: number; T: number }>;
  /** Values at 298.15 and 1000 K when inside the common range. */
  at: Array<{ T: number; old: Properties; new: Properties }>;
}

export interface DiffReport {
  old: string;
  new: string;
  added: string[];
  removed: string[];
  unchanged: string[];
  changed: SpeciesChange[];
  /** How the two sides were read when that matters (e.g. a folder's nasa7.txt instead of its thermo.json). */
  notes: string[];
  /** Build settings that moved, or undefined when either side does not record its settings. */
  settingsChanges?: InputChange[];
  /** Whether the code fingerprints differ (a code or model change), or undefined when either is not recorded. */
  codeChanged?: boolean;
}

export interface DiffOptions {
  /**
   * One side holds full-precision coefficients and the other 9-digit records: same ranges and properties
   * within ROUNDING_TOLERANCE count as unchanged.
   */
  mixedPrecision?: boolean;
}

const sameNumbers = (a: readonly number[], b: readonly number[]) => a.length === b.length && a.every((x, i) => Object.is(x, b[i]) || x === b[i]);

function samePolynomial(a: Nasa7Polynomial, b: Nasa7Polynomial): boolean {
  return a.tLow === b.tLow && a.tMid === b.tMid && a.tHigh === b.tHigh && sameNumbers(a.low, b.low) && sameNumbers(a.high, b.high);
}

/** Comparison grid of [low, high]: every DIFF_GRID_STEP K, the ends, 298.15 K and 1000 K when inside. */
export function diffGrid(low: number, high: number): number[] {
  const set = new Set<number>([low, high]);
  for (let T = Math.ceil(low / DIFF_GRID_STEP) * DIFF_GRID_STEP; T <= high; T += DIFF_GRID_STEP) set.add(T);
  for (const T of [T_REF, 1000]) if (T >= low && T <= high) set.add(T);
  return [...set].sort((a, b) => a - b);
}

export function compareSpecies(name: string, a: Nasa7Polynomial, b: Nasa7Polynomial, hashes: [string?, string?]): SpeciesChange {
  const low = Math.max(a.tLow, b.tLow);
  const high = Math.min(a.tHigh, b.tHigh);
  const max: SpeciesChange['max'] = { cp: { value: 0, T: NaN }, h: { value: 0, T: NaN }, s: { value: 0, T: NaN } };
  const change: SpeciesChange = {
    name,
    kind: 'coefficients',
    rangesChanged: a.tLow !== b.tLow || a.tMid !== b.tMid || a.tHigh !== b.tHigh,
    old: { low: a.tLow, mid: a.tMid, high: a.tHigh },
    new: { low: b.tLow, mid: b.tMid, high: b.tHigh },
    max,
    at: [],
  };
  if (hashes[0] && hashes[1]) change.inputChanged = hashes[0] !== hashes[1];
  if (!(low < high)) {
    change.kind = 'properties';
    return change;
  }
  change.common = { low, high };
  for (const T of diffGrid(low, high)) {
    const pa = polynomialProperties(a, T);
    const pb = polynomialProperties(b, T);
    for (const q of QS) {
      const d = Math.abs(pb[q] - pa[q]);
      if (d > max[q].value || Number.isNaN(max[q].T)) max[q] = { value: d, T };
    }
    if (T === T_REF || T === 1000) change.at.push({ T, old: pa, new: pb });
  }
  if (change.rangesChanged || QS.some((q) => max[q].value > PROPERTY_CHANGE_THRESHOLDS[q])) change.kind = 'properties';
  return change;
}

/** Same ranges, and Cp, H, S within ROUNDING_TOLERANCE at every grid point. */
function sameWithinRounding(a: Nasa7Polynomial, b: Nasa7Polynomial): boolean {
  if (a.tLow !== b.tLow || a.tMid !== b.tMid || a.tHigh !== b.tHigh) return false;
  return diffGrid(a.tLow, a.tHigh).every((T) => {
    const pa = polynomialProperties(a, T);
    const pb = polynomialProperties(b, T);
    return QS.every((q) => Math.abs(pb[q] - pa[q]) <= ROUNDING_TOLERANCE);
  });
}

export function diffSets(a: PolynomialSet, b: PolynomialSet, options: DiffOptions = {}): DiffReport {
  const names = (s: PolynomialSet) => [...s.species.keys()];
  const sort = (xs: string[]) => xs.sort(compareText);
  const report: DiffReport = {
    old: a.label,
    new: b.label,
    added: sort(names(b).filter((n) => !a.species.has(n))),
    removed: sort(names(a).filter((n) => !b.species.has(n))),
    unchanged: [],
    changed: [],
    notes: [],
  };
  for (const name of sort(names(a).filter((n) => b.species.has(n)))) {
    const x = a.species.get(name)!;
    const y = b.species.get(name)!;
    const same = options.mixedPrecision ? sameWithinRounding(x.polynomial, y.polynomial) : samePolynomial(x.polynomial, y.polynomial);
    if (same) report.unchanged.push(name);
    else {
      const change = compareSpecies(name, x.polynomial, y.polynomial, [x.inputHash, y.inputHash]);
      if (x.input !== undefined && y.input !== undefined) change.inputChanges = diffInputs(x.input, y.input);
      report.changed.push(change);
    }
  }
  if (a.settings && b.settings) report.settingsChanges = diffInputs(a.settings, b.settings);
  if (a.codeFingerprint && b.codeFingerprint) report.codeChanged = a.codeFingerprint !== b.codeFingerprint;
  return report;
}

const num = (x: number, d = 4) => formatFixed(x, d);
// Magnitudes (never negative): tiny ones in exponent form so a 1e-7 change does not print as 0.0000.
const sci = (x: number) => (x === 0 ? '0' : x < 1e-3 ? x.toExponential(2) : formatFixed(x, 4));

export function renderDiffText(r: DiffReport): string {
  const lines: string[] = [
    `qforge diff ${r.old} -> ${r.new}: ${r.added.length} added, ${r.removed.length} removed, ${r.changed.length} changed, ${r.unchanged.length} unchanged`,
  ];
  for (const n of r.notes) lines.push(`note: ${n}`);
  if (r.settingsChanges?.length) lines.push(`settings changed: ${r.settingsChanges.map(formatInputChange).join('; ')}`);
  if (r.codeChanged === true) lines.push('code or model changed (code fingerprints differ)');
  for (const n of r.added) lines.push(`+ ${n}  (added)`);
  for (const n of r.removed) lines.push(`- ${n}  (removed)`);
  for (const c of r.changed) {
    const why = [
      c.kind === 'properties' ? 'properties changed' : 'only the coefficients moved (properties within thresholds)',
      c.inputChanged === true ? 'input changed' : c.inputChanged === false ? 'same input' : undefined,
      c.rangesChanged ? `ranges ${c.old.low}/${c.old.mid}/${c.old.high} -> ${c.new.low}/${c.new.mid}/${c.new.high} K` : undefined,
    ].filter(Boolean);
    lines.push(`~ ${c.name}: ${why.join('; ')}`);
    lines.push(`    ${c.name}: ${changeHeadline(c)}`);
    if (!c.common) {
      lines.push('    the temperature ranges do not overlap; nothing to compare');
      continue;
    }
    lines.push(
      `    over ${c.common.low}-${c.common.high} K: ` +
        QS.map((q) => `max |d${LABELS[q]}| ${sci(c.max[q].value)} ${UNITS[q]} at ${c.max[q].T} K`).join(', '),
    );
    for (const p of c.at) {
      lines.push(
        `    at ${p.T} K: ` +
          QS.map((q) => `${LABELS[q]} ${num(p.old[q])} -> ${num(p.new[q])}`).join(', ') +
          ' (Cp, S in J/(mol K); H in kJ/mol)',
      );
    }
  }
  return `${lines.join('\n')}\n`;
}

/**
 * The one-line explanation a nightly report quotes: the input fields that moved (or "inputs not recorded")
 * and the Cp change at 1000 K (or the largest one when 1000 K is outside the common range).
 */
export function changeHeadline(c: SpeciesChange): string {
  const parts: string[] = [];
  if (!c.inputChanges) parts.push('inputs not recorded');
  else if (c.inputChanges.length) parts.push(...c.inputChanges.map(formatInputChange));
  else parts.push('same input');
  const at = c.at.find((p) => p.T === 1000);
  if (at) parts.push(`Cp(1000 K) ${formatSigned(at.new.cp - at.old.cp, 4)} J/(mol K)`);
  else if (c.common) parts.push(`max |dCp| ${sci(c.max.cp.value)} J/(mol K) at ${c.max.cp.T} K`);
  return parts.join('; ');
}

/** Breaches of the --fail-above limits, as messages. */
export function gateBreaches(r: DiffReport, limits: { cp?: number; h?: number; s?: number }, failOnRemoved: boolean): string[] {
  const out: string[] = [];
  for (const c of r.changed) {
    for (const q of QS) {
      const lim = limits[q];
      if (lim === undefined) continue;
      if (!c.common) out.push(`${c.name}: temperature ranges no longer overlap`);
      else if (c.max[q].value > lim) {
        out.push(`${c.name}: |d${LABELS[q]}| ${sci(c.max[q].value)} ${UNITS[q]} at ${c.max[q].T} K exceeds ${lim} ${UNITS[q]}`);
      }
    }
  }
  if (failOnRemoved) for (const n of r.removed) out.push(`${n}: removed`);
  return [...new Set(out)];
}

/**
 * Reads both sides and diffs them like with like: a build folder facing an 80-column file is read from its
 * nasa7.txt; when only full precision is available on one side the comparison is mixed precision.
 */
export async function readAndDiff(paths: { old: string; new: string; oldLabel: string; newLabel: string }): Promise<DiffReport> {
  // Both read at once, but a failure is reported for OLD before NEW whatever finishes first, so the same
  // mistake always gives the same message.
  const settled = await Promise.allSettled([
    readPolynomialSet(paths.old, paths.oldLabel),
    readPolynomialSet(paths.new, paths.newLabel),
  ]);
  for (const r of settled) if (r.status === 'rejected') throw r.reason;
  let [a, b] = settled.map((r) => (r as PromiseFulfilledResult<PolynomialSet>).value) as [PolynomialSet, PolynomialSet];
  const notes: string[] = [];
  if (a.format !== b.format) {
    const reread = async (s: PolynomialSet, p: string): Promise<PolynomialSet> => {
      if (!s.fromFolder || s.format !== 'thermo.json') return s;
      const n = await readPolynomialSet(p, s.label, { preferNasa7: true });
      if (n.format === 'nasa7') notes.push(`${s.label} is compared through ${n.origin} (the other side is an 80-column file), not its full-precision thermo.json`);
      return n;
    };
    // One after the other: each may add a note, and notes keep OLD-then-NEW order.
    a = await reread(a, paths.old);
    b = await reread(b, paths.new);
  }
  const mixedPrecision = a.format !== b.format;
  const report = diffSets(a, b, { mixedPrecision });
  if (mixedPrecision) {
    const [full, records] = a.format === 'thermo.json' ? [a, b] : [b, a];
    notes.push(
      `${full.origin} (full precision) against ${records.origin} (80-column records, 9 digits): a species whose Cp, H and S agree within ${ROUNDING_TOLERANCE} (rounding) counts as unchanged`,
    );
  }
  report.notes = notes;
  return report;
}

export async function diffCommand(
  io: CliIo,
  paths: { old: string; new: string; oldLabel: string; newLabel: string },
  o: { failAbove?: { cp?: number; h?: number; s?: number }; failOnRemoved?: boolean; json?: boolean },
): Promise<number> {
  let report: DiffReport;
  try {
    report = await readAndDiff(paths);
  } catch (e) {
    if (e instanceof ReadBuildError) {
      io.stderr.write(`qforge: error: ${e.message}\n`);
      return 1;
    }
    throw e;
  }
  const breaches = gateBreaches(report, o.failAbove ?? {}, !!o.failOnRemoved);
  if (o.json) {
    const gate = { limits: o.failAbove ?? {}, breaches, results: diffGateResults(report, o.failAbove ?? {}, !!o.failOnRemoved) };
    io.stdout.write(`${JSON.stringify(diffJson(report, gate), null, 2)}\n`);
  }
  else io.stdout.write(renderDiffText(report));
  if (breaches.length) {
    io.stderr.write(`qforge: diff gate FAILED (${breaches.length}):\n${breaches.map((x) => `  ${x}`).join('\n')}\n`);
    return 1;
  }
  return 0;
}
