/**
 * One species of the build report: its section (charts, model summary, sources, uncertainties) and the
 * small summary row the overview is made of. Takes one species' data at a time and keeps nothing, so a
 * streaming runner can render each species as it finishes and drop its samples.
 */
import { GAS_CONSTANT, T_REF } from '../../src/constants.js';
import type { Species } from '../../src/model.js';
import { evaluateNasa7 } from '../../src/nasa7/evaluate.js';
import type { FitResult, Nasa7Polynomial } from '../../src/nasa7/types.js';
import type { SpeciesUncertainty, UncertaintyQuantity } from '../../src/uncertainty/types.js';
import type { QuantityTriple } from '../core/settings.js';
import type { ComputedSpecies } from '../stages/compute.js';
import { decimateEnvelope, renderChart, type ChartSeries } from './chart.js';
import { anchorId, escapeHtml, sig } from './html.js';

/** A reference table row: Cp, S in J/(mol K), H − H298 in kJ/mol (any may be missing). */
export interface ReportReferenceRow {
  T: number;
  cp?: number;
  s?: number;
  h?: number;
}

export interface ReportSpeciesInput {
  name: string;
  file: string;
  status: 'ok' | 'failed';
  species?: Species;
  computed?: ComputedSpecies;
  fit?: FitResult;
  /**
   * Fit limits, dimensionless (Cp/R, H/RT, S/R): the limit of q at T is max(q, relative_to_cp.q · Cp/R(T))
   * (the size-scaled limits of the settings); without relative_to_cp it is q.
   */
  tolerances: QuantityTriple & { relative_to_cp?: QuantityTriple };
  /** Scale of "how big is a change": references.tolerances (Cp, S in J/(mol K), H in kJ/mol). */
  changeScale: QuantityTriple;
  warnings: readonly string[];
  errors: readonly string[];
  cacheHit: boolean;
  /** The same species in the build compared against (`--report-against`). */
  previous?: { label: string; polynomial: Nasa7Polynomial };
  /** Reference points of this species from the configured reference files. */
  reference?: { label: string; rows: readonly ReportReferenceRow[] };
  uncertainty?: SpeciesUncertainty;
}

/** A largest difference: quantity, value in its table unit, where, and its ratio to the change scale. */
export interface LargestDifference {
  quantity: 'Cp' | 'S' | 'H';
  value: number;
  T: number;
  unit: string;
  ratio: number;
}

/** What the overview needs of one species (small: no samples). */
export interface ReportRow {
  name: string;
  anchor: string;
  file: string;
  status: 'ok' | 'failed';
  ranges?: { low: number; mid: number; high: number };
  /** Worst |fit − computed| per quantity, dimensionless, and its temperature. */
  worst?: Record<'cp' | 'h' | 's', { value: number; T: number }>;
  /** Largest worst-error-to-tolerance ratio (1 = at the limit). */
  worstRatio: number;
  warnings: number;
  errors: number;
  cacheHit: boolean;
  /** u(S°298.15), u(Cp°1000) in J/(mol K); undefined when not computed. */
  uS298?: number;
  uCp1000?: number;
  /** True when the species declares no input uncertainty (its u are zero). */
  noUncertaintyInputs?: boolean;
  change?: LargestDifference;
  deviation?: LargestDifference;
}

export interface RenderedSpecies {
  row: ReportRow;
  html: string;
}

const R = GAS_CONSTANT;
const CHART_W = 760;
const CHART_H = 330;
const RES_W = 366;
const RES_H = 210;
/** Computed points drawn on the Cp chart (the fit uses many more; these show agreement, not density). */
const MAX_POINTS = 60;
/** Extrapolation drawn beyond each end of the fitted range, K. */
const EXTRAPOLATION_K = 100;

type Q3 = 'cp' | 'h' | 's';
const Q3S: readonly Q3[] = ['cp', 'h', 's'];

/** The fit limit of q at a point whose computed Cp/R is cpR. */
export function limitAt(tol: ReportSpeciesInput['tolerances'], q: Q3, cpR: number): number {
  return Math.max(tol[q], (tol.relative_to_cp?.[q] ?? 0) * cpR);
}

interface Residuals {
  /** fit − computed per quantity, at every sample. */
  values: Record<Q3, Array<readonly [number, number]>>;
  /** Limit per quantity at every sample. */
  limits: Record<Q3, number[]>;
  /** Largest |residual| / limit over all samples and quantities. */
  worstRatio: number;
}

function residualsOf(fit: FitResult, computed: ComputedSpecies, tol: ReportSpeciesInput['tolerances']): Residuals {
  const values: Residuals['values'] = { cp: [], h: [], s: [] };
  const limits: Residuals['limits'] = { cp: [], h: [], s: [] };
  let worstRatio = 0;
  for (const smp of computed.samples) {
    const f = evaluateNasa7(fit.polynomial, smp.T);
    const d: Record<Q3, number> = { cp: f.cpR - smp.cpR, h: f.hRT - smp.hRT, s: f.sR - smp.sR };
    for (const q of Q3S) {
      const lim = limitAt(tol, q, smp.cpR);
      values[q].push([smp.T, d[q]]);
      limits[q].push(lim);
      worstRatio = Math.max(worstRatio, Math.abs(d[q]) / lim);
    }
  }
  return { values, limits, worstRatio };
}

function polyLine(poly: Nasa7Polynomial, from: number, to: number, n: number, f: (T: number) => number): Array<[number, number]> {
  const out: Array<[number, number]> = [];
  for (let i = 0; i <= n; i++) {
    const T = from + ((to - from) * i) / n;
    out.push([T, f(T)]);
  }
  return out;
}

/** Largest |a − b| over T of each of Cp, S (J/(mol K)) and H (kJ/mol), the one largest against the scale. */
function largestOf(
  diffs: Iterable<{ T: number; cp?: number; s?: number; h?: number }>,
  scale: QuantityTriple,
): LargestDifference | undefined {
  let best: LargestDifference | undefined;
  for (const d of diffs) {
    const cands: Array<[LargestDifference['quantity'], number | undefined, number, string]> = [
      ['Cp', d.cp, scale.cp, 'J/(mol K)'],
      ['S', d.s, scale.s, 'J/(mol K)'],
      ['H', d.h, scale.h, 'kJ/mol'],
    ];
    for (const [q, v, sc, unit] of cands) {
      if (v === undefined || !Number.isFinite(v)) continue;
      const ratio = Math.abs(v) / sc;
      if (!best || ratio > best.ratio) best = { quantity: q, value: v, T: d.T, unit, ratio };
    }
  }
  return best;
}

/** Properties of a polynomial in table units (Cp, S J/(mol K); H − H298 kJ/mol). */
function tableUnits(poly: Nasa7Polynomial, T: number) {
  const v = evaluateNasa7(poly, T);
  const ref = evaluateNasa7(poly, T_REF);
  return { cp: v.cpR * R, s: v.sR * R, h: (v.hRT * R * T - ref.hRT * R * T_REF) / 1000 };
}

export function renderSpeciesSection(input: ReportSpeciesInput): RenderedSpecies {
  const anchor = anchorId(input.name);
  const row: ReportRow = {
    name: input.name,
    anchor,
    file: input.file,
    status: input.status,
    worstRatio: input.status === 'failed' ? Infinity : 0,
    warnings: input.warnings.length,
    errors: input.errors.length,
    cacheHit: input.cacheHit,
  };
  const body: string[] = [];
  const { fit, computed } = input;
  if (fit && computed) {
    const poly = fit.polynomial;
    row.ranges = { low: poly.tLow, mid: poly.tMid, high: poly.tHigh };
    const m = fit.metrics;
    const pick = (q: 'cp' | 'h' | 's') =>
      m.low.maxAbs[q] >= m.high.maxAbs[q] ? { value: m.low.maxAbs[q], T: m.low.tAtMax[q] } : { value: m.high.maxAbs[q], T: m.high.tAtMax[q] };
    row.worst = { cp: pick('cp'), h: pick('h'), s: pick('s') };
    const residuals = residualsOf(fit, computed, input.tolerances);
    row.worstRatio = residuals.worstRatio;
    if (input.previous) {
      const prev = input.previous.polynomial;
      const lo = Math.max(prev.tLow, poly.tLow);
      const hi = Math.min(prev.tHigh, poly.tHigh);
      const diffs = [];
      for (let T = lo; T <= hi + 1e-9; T += Math.max(1, (hi - lo) / 200)) {
        const a = tableUnits(poly, T);
        const b = tableUnits(prev, T);
        diffs.push({ T, cp: a.cp - b.cp, s: a.s - b.s, h: a.h - b.h });
      }
      const c = largestOf(diffs, input.changeScale);
      if (c) row.change = c;
    }
    if (input.reference) {
      const diffs = input.reference.rows
        .filter((r) => r.T >= poly.tLow && r.T <= poly.tHigh)
        .map((r) => {
          const a = tableUnits(poly, r.T);
          return {
            T: r.T,
            ...(r.cp !== undefined ? { cp: a.cp - r.cp } : {}),
            ...(r.s !== undefined ? { s: a.s - r.s } : {}),
            ...(r.h !== undefined ? { h: a.h - r.h } : {}),
          };
        });
      const d = largestOf(diffs, input.changeScale);
      if (d) row.deviation = d;
    }
    body.push(cpChart(input, poly, computed));
    body.push(`<div class="residuals">${residualCharts(input, fit, residuals)}${uncertaintyChart(input, poly)}</div>`);
  } else {
    body.push('<p class="nochart">No fit: the species failed before it could be fitted (errors below).</p>');
  }
  const u = input.uncertainty;
  if (u) {
    const at = (T: number) => u.points.find((p) => Math.abs(p.T - T) < 1e-9);
    row.uS298 = at(T_REF)?.s;
    row.uCp1000 = at(1000)?.cp;
    row.noUncertaintyInputs = u.inputs.length === 0;
  }
  body.push(facts(input, row));
  if (u) body.push(uncertaintyTable(u));
  if (input.species || input.computed) body.push(modelSummary(input));
  if (input.errors.length || input.warnings.length) {
    body.push(
      `<div class="messages">${input.errors.map((e) => `<p class="error">${escapeHtml(e)}</p>`).join('')}${input.warnings
        .map((w) => `<p class="warning">${escapeHtml(w)}</p>`)
        .join('')}</div>`,
    );
  }
  const badge = `<span class="badge ${input.status}">${input.status === 'ok' ? 'ok' : 'FAILED'}</span>`;
  const html =
    `<section class="species" id="${anchor}" data-name="${escapeHtml(input.name)}">` +
    `<details open><summary><h2>${escapeHtml(input.name)} ${badge}<span class="file">${escapeHtml(input.file)}</span></h2></summary>` +
    `${body.join('\n')}<p class="top"><a href="#overview">back to the overview</a></p></details></section>\n`;
  return { row, html };
}

function cpChart(input: ReportSpeciesInput, poly: Nasa7Polynomial, computed: ComputedSpecies): string {
  const cpR = (p: Nasa7Polynomial) => (T: number) => evaluateNasa7(p, T).cpR;
  const samples = computed.samples;
  const stride = Math.max(1, Math.ceil(samples.length / MAX_POINTS));
  const pts = samples.filter((_, i) => i % stride === 0 || i === samples.length - 1).map((s) => [s.T, s.cpR] as const);
  const lowFrom = Math.max(10, poly.tLow - EXTRAPOLATION_K);
  const series: ChartSeries[] = [];
  const u = input.uncertainty;
  if (u && u.cpBand.some((b) => b.u > 0)) {
    series.push({
      kind: 'band',
      style: 'band',
      label: 'fit ± u(Cp°), propagated',
      points: u.cpBand.map((b) => {
        const c = evaluateNasa7(poly, b.T).cpR;
        return [b.T, c - b.u / R, c + b.u / R] as const;
      }),
    });
  }
  series.push(
    { kind: 'line', style: 'fit', label: 'NASA-7 fit', points: [...polyLine(poly, poly.tLow, poly.tMid, 80, cpR(poly)), ...polyLine(poly, poly.tMid, poly.tHigh, 120, cpR(poly))] },
    { kind: 'line', style: 'extrapolation', label: `fit extrapolated ${EXTRAPOLATION_K} K`, points: polyLine(poly, lowFrom, poly.tLow, 10, cpR(poly)) },
    { kind: 'line', style: 'extrapolation', label: '', legend: false, points: polyLine(poly, poly.tHigh, poly.tHigh + EXTRAPOLATION_K, 10, cpR(poly)) },
    { kind: 'points', style: 'computed', label: 'partition functions', points: pts },
  );
  if (input.previous) {
    const prev = input.previous.polynomial;
    series.push({
      kind: 'line',
      style: 'previous',
      label: `previous build (${input.previous.label})`,
      points: [...polyLine(prev, prev.tLow, prev.tMid, 60, cpR(prev)), ...polyLine(prev, prev.tMid, prev.tHigh, 90, cpR(prev))],
    });
  }
  if (input.reference) {
    const rows = input.reference.rows.filter((r) => r.cp !== undefined && r.T >= lowFrom && r.T <= poly.tHigh + EXTRAPOLATION_K);
    series.push({ kind: 'points', style: 'reference', label: `reference (${input.reference.label})`, points: rows.map((r) => [r.T, r.cp! / R] as const) });
  }
  return renderChart({
    title: `${input.name}: Cp/R from the partition functions and the fitted polynomial`,
    xLabel: 'T [K]',
    yLabel: 'Cp°/R [–]',
    width: CHART_W,
    height: CHART_H,
    series,
    markers: [{ x: poly.tMid, label: `T_mid ${sig(poly.tMid, 5)} K` }],
    className: 'cp',
  });
}

function residualCharts(input: ReportSpeciesInput, fit: FitResult, residuals: Residuals): string {
  const poly = fit.polynomial;
  const label: Record<Q3, string> = { cp: 'Cp/R', h: 'H/RT', s: 'S/R' };
  const scaled = input.tolerances.relative_to_cp !== undefined;
  return Q3S.map((q) => {
    const res = residuals.values[q];
    const lims = residuals.limits[q];
    // The limit band follows the size-scaled limit; ~60 points draw it exactly enough (it is smooth in T).
    const stride = Math.max(1, Math.ceil(res.length / 60));
    const band = res
      .map((p, i) => [p[0], -lims[i]!, lims[i]!] as const)
      .filter((_, i) => i % stride === 0 || i === res.length - 1);
    const lo = Math.min(...lims);
    const hi = Math.max(...lims);
    const limitLabel = scaled && hi > lo * 1.0001 ? `limit ±${sig(lo)}…${sig(hi)}` : `limit ±${sig(hi)}`;
    return renderChart({
      title: `${input.name}: residual of ${label[q]}, fit − computed`,
      xLabel: 'T [K]',
      yLabel: `Δ ${label[q]} [–]`,
      width: RES_W,
      height: RES_H,
      series: [
        { kind: 'band', style: 'limit', label: limitLabel, points: band },
        { kind: 'line', style: 'residual', label: 'fit − computed', points: decimateEnvelope(res, 90) },
      ],
      markers: [{ x: poly.tMid, label: 'T_mid' }],
      yInclude: [0],
      className: 'residual',
      legend: 'above',
    });
  }).join('');
}

/** u(Cp°) over the range, for species that declare input uncertainties (the band on Cp/R is thin). */
function uncertaintyChart(input: ReportSpeciesInput, poly: Nasa7Polynomial): string {
  const u = input.uncertainty;
  if (!u || u.inputs.length === 0) return '';
  return renderChart({
    title: `${input.name}: propagated standard uncertainty of Cp°`,
    xLabel: 'T [K]',
    yLabel: 'u(Cp°) [J/(mol K)]',
    width: RES_W,
    height: RES_H,
    series: [{ kind: 'line', style: 'residual', label: 'u(Cp°), linear propagation', points: u.cpBand.map((b) => [b.T, b.u] as const) }],
    markers: [{ x: poly.tMid, label: 'T_mid' }],
    yInclude: [0],
    className: 'uncertainty',
    legend: 'above',
  });
}

const fmtDiff = (d: LargestDifference | undefined) =>
  d && d.value === 0 ? 'none' : d ? `${d.quantity} ${sig(d.value, 3)} ${d.unit} at ${sig(d.T, 5)} K` : '–';

function facts(input: ReportSpeciesInput, row: ReportRow): string {
  const items: Array<[string, string]> = [];
  if (row.ranges) items.push(['fit ranges', `${sig(row.ranges.low, 5)}–${sig(row.ranges.mid, 5)}–${sig(row.ranges.high, 5)} K`]);
  if (row.worst) {
    for (const [q, label] of [['cp', 'Cp/R'], ['h', 'H/RT'], ['s', 'S/R']] as const) {
      const w = row.worst[q];
      const cpAt = input.computed?.samples.find((x) => x.T === w.T)?.cpR;
      const lim = cpAt !== undefined ? limitAt(input.tolerances, q, cpAt) : input.tolerances[q];
      items.push([`worst |Δ ${label}|`, `${sig(w.value)} at ${sig(w.T, 5)} K (limit there ${sig(lim)})`]);
    }
  }
  if (input.computed) {
    const a = input.computed.at298;
    items.push(['at 298.15 K', `Cp° ${a.Cp.toFixed(3)} J/(mol K), S° ${a.S.toFixed(3)} J/(mol K), ΔfH° ${(input.computed.enthalpyOfFormation298 / 1000).toFixed(3)} kJ/mol`]);
  }
  items.push(['cache', input.cacheHit ? 'hit (all stages from the cache)' : 'computed']);
  if (input.previous) items.push([`largest change vs ${input.previous.label}`, fmtDiff(row.change)]);
  if (input.reference) items.push([`largest deviation vs ${input.reference.label}`, fmtDiff(row.deviation)]);
  return `<dl class="facts">${items.map(([k, v]) => `<dt>${escapeHtml(k)}</dt><dd>${escapeHtml(v)}</dd>`).join('')}</dl>`;
}

const Q_LABEL: Record<UncertaintyQuantity, string> = { cp: 'u(Cp°)', s: 'u(S°)', hMinusH298: 'u(H°−H°298)', h: 'u(H°)' };
const Q_UNIT: Record<UncertaintyQuantity, string> = { cp: 'J/(mol K)', s: 'J/(mol K)', hMinusH298: 'kJ/mol', h: 'kJ/mol' };

function uncertaintyTable(u: SpeciesUncertainty): string {
  const qs: UncertaintyQuantity[] = ['cp', 's', 'hMinusH298', 'h'];
  const head = `<tr><th>T [K]</th>${qs.map((q) => `<th>${Q_LABEL[q]} [${Q_UNIT[q]}]</th>`).join('')}</tr>`;
  const rows = u.points
    .map((p) => {
      const cells = qs.map((q) => {
        const top = p.largest[q].map((c) => `${escapeHtml(c.input)} ${sig(c.contribution, 2)}`).join('; ');
        return `<td><b>${sig(p[q], 3)}</b>${top ? `<br><small>${top}</small>` : ''}</td>`;
      });
      return `<tr><td>${sig(p.T, 5)}</td>${cells.join('')}</tr>`;
    })
    .join('');
  // Beyond sampling error (≈ 1/√(2N) relative) and this margin, the model is not linear over ±u there.
  const disagree = (mc: number, lin: number, n: number) => lin > 0 && Math.abs(mc - lin) / lin > Math.max(0.2, 3 / Math.sqrt(2 * n));
  const flagged: string[] = [];
  const mc = u.monteCarlo?.length
    ? `<p class="mc">Monte Carlo check (${u.monteCarlo[0]!.samples} samples, seed ${u.monteCarlo[0]!.seed}): ${u.monteCarlo
        .map((m) => {
          const lin = u.points.find((p) => p.T === m.T);
          for (const q of ['cp', 's', 'hMinusH298', 'h'] as const) {
            if (lin && disagree(m[q], lin[q], m.samples)) flagged.push(`${Q_LABEL[q]} at ${sig(m.T, 5)} K`);
          }
          return `${sig(m.T, 5)} K: u(Cp°) ${sig(m.cp, 3)}, u(S°) ${sig(m.s, 3)}, u(H°−H°298) ${sig(m.hMinusH298, 3)}`;
        })
        .join(' · ')}</p>${
        flagged.length
          ? `<p class="warning">Monte Carlo and linear propagation disagree (${flagged.join(', ')}): the model is not linear over ±u there; do not trust the linear figure.</p>`
          : ''
      }`
    : '';
  const none = u.inputs.length === 0 ? '<p class="warning">This species declares no input uncertainties: every u below is zero, not "known exactly".</p>' : '';
  const inputs = u.inputs.length
    ? `<p class="inputs">Uncertain inputs: ${u.inputs.map((i) => `${escapeHtml(i.name)} = ${sig(i.value, 6)} ± ${sig(i.u, 2)} ${escapeHtml(i.unit)}`).join('; ')}</p>`
    : '';
  return `<h3>Propagated uncertainty (linear, standard uncertainties; largest three contributors)</h3>${none}${inputs}<table class="unc">${head}${rows}</table>${mc}`;
}

function modelSummary(input: ReportSpeciesInput): string {
  const parts: string[] = ['<h3>Model and sources</h3>'];
  const s = input.computed?.summary;
  if (s) {
    parts.push(`<p>structure: ${escapeHtml(s.structure)}</p>`);
    parts.push(`<ul class="contrib">${s.contributions.map((c) => `<li>${escapeHtml(c)}</li>`).join('')}</ul>`);
    if (s.notes.length) parts.push(`<ul class="notes">${s.notes.map((c) => `<li>${escapeHtml(c)}</li>`).join('')}</ul>`);
  }
  const sp = input.species;
  if (sp) {
    if ('internalRotors' in sp && sp.internalRotors?.length) {
      parts.push(
        `<table class="rotors"><tr><th>rotor</th><th>V0 [cm⁻¹]</th><th>n</th><th>σ</th><th>B [cm⁻¹]</th></tr>${sp.internalRotors
          .map((r, i) => `<tr><td>${i + 1}</td><td>${sig(r.barrier, 5)}</td><td>${r.foldedness}</td><td>${r.symmetryNumber}</td><td>${sig(r.rotationalConstant, 5)}</td></tr>`)
          .join('')}</table>`,
      );
    }
    if ('electronicLevels' in sp) parts.push(`<p>electronic levels used: ${sp.electronicLevels.length}</p>`);
    if ('electronicStates' in sp) parts.push(`<p>electronic states used: ${sp.electronicStates.map((e) => escapeHtml(e.term)).join(', ')}</p>`);
    const conformers = (sp as { conformers?: unknown[] }).conformers;
    parts.push(`<p>conformers: ${Array.isArray(conformers) ? conformers.length : 'one (single structure)'}</p>`);
    parts.push(`<ol class="sources">${sp.sources.map((x) => `<li>${escapeHtml(x)}</li>`).join('')}</ol>`);
  }
  return parts.join('');
}
