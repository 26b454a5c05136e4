/**
 * Stage "fit": the two-range NASA 7-coefficient fit of one species' computed points (src/nasa7). Pure:
 * a function of the computed samples and the fit options only.
 *
 * The samples are the sampling grid (the check grid of the verify stage). The fit is made from the node
 * subset `options.nodes` picks (pipeline/core/fit-nodes.ts; 'all' = every sample), optionally followed by
 * one exchange step: the samples where the fit's limit-relative error has its local maxima join the
 * nodes and the fit is redone at the midpoint the search chose. Either way the returned metrics are those
 * of the whole sampling grid, so thermo.json reports the errors the check judges.
 */
import { fitNasa7 } from '../../src/nasa7/fit.js';
import { evaluateRange } from '../../src/nasa7/evaluate.js';
import { limitAt } from '../../src/nasa7/limits.js';
import { worstLimitRatio } from '../../src/nasa7/limit-ratio.js';
import { computeMetrics } from '../../src/nasa7/metrics.js';
import { normaliseFitOptions, type PartialFitOptions } from '../../src/nasa7/options.js';
import type { FitOptions, FitResult, FitSample, Nasa7Polynomial } from '../../src/nasa7/types.js';
import { fitNodeIndices, type FitNodesSetting } from '../core/fit-nodes.js';
import type { ComputedSpecies } from './compute.js';

/** The fit options of a plan: those of src/nasa7 plus the node set (default 'all'). */
export type FitStageOptions = FitOptions & { nodes?: FitNodesSetting };
export type PartialFitStageOptions = PartialFitOptions & { nodes?: FitNodesSetting };

/**
 * Normalised fit options of a plan (throws FitError listing every bad option). The node set rides along
 * in the same object, so the fit stage's cache key (a hash of these options) changes with it.
 */
export function fitOptionsFor(partial: PartialFitStageOptions): FitStageOptions {
  const out: FitStageOptions = normaliseFitOptions(partial);
  if (partial.nodes !== undefined && partial.nodes !== 'all') out.nodes = { ...partial.nodes };
  return out;
}

/** Node indices of the last few (grid, options) seen: species of one database share them. */
const nodeMemo = new Map<string, number[]>();
const NODE_MEMO_SIZE = 16;

function nodesFor(samples: readonly FitSample[], options: FitStageOptions, nodes: Exclude<FitNodesSetting, 'all'>): number[] {
  let gridKey = '';
  for (const s of samples) gridKey += `${s.T},`;
  const key = `${JSON.stringify(nodes)}|${options.tLow}|${options.tMid}|${options.tHigh}|${JSON.stringify(options.optimiseMid ?? null)}|${gridKey}`;
  let hit = nodeMemo.get(key);
  if (!hit) {
    const grid = samples.map((s) => s.T);
    const mids = options.optimiseMid ? { mid: options.tMid, search: options.optimiseMid } : { mid: options.tMid };
    hit = fitNodeIndices(grid, nodes, { low: options.tLow, high: options.tHigh }, mids);
    if (nodeMemo.size >= NODE_MEMO_SIZE) nodeMemo.delete(nodeMemo.keys().next().value!);
    nodeMemo.set(key, hit);
  }
  return hit;
}

function splitAt(samples: readonly FitSample[], tMid: number): { low: FitSample[]; high: FitSample[] } {
  return { low: samples.filter((s) => s.T <= tMid), high: samples.filter((s) => s.T >= tMid) };
}

/**
 * Exchange points: in each range, the samples where |fit − sample| / limit of Cp/R, H/RT or S/R has a
 * local maximum (≥ both neighbours in that range) of at least EXCHANGE_FLOOR × the worst ratio. These
 * are the extremal points a minimax fit on the whole grid would equioscillate on (Remez 1934; Powell,
 * Approximation Theory and Methods, 1981, ch. 8), so fitting them again moves the fit towards that one.
 */
export function exchangePoints(poly: Nasa7Polynomial, samples: readonly FitSample[], limits: FitOptions['limits'], floor = EXCHANGE_FLOOR): number[] {
  const out = new Set<number>();
  const n = samples.length;
  const ratio = new Float64Array(3 * n);
  let worst = 0;
  const rangeOf = new Int8Array(n);
  for (let i = 0; i < n; i++) {
    const s = samples[i]!;
    rangeOf[i] = s.T <= poly.tMid ? 0 : 1;
    const v = evaluateRange(s.T <= poly.tMid ? poly.low : poly.high, s.T);
    ratio[3 * i] = Math.abs(v.cpR - s.cpR) / limitAt(limits.cp, s.cpR);
    ratio[3 * i + 1] = Math.abs(v.hRT - s.hRT) / limitAt(limits.h, s.cpR);
    ratio[3 * i + 2] = Math.abs(v.sR - s.sR) / limitAt(limits.s, s.cpR);
    worst = Math.max(worst, ratio[3 * i]!, ratio[3 * i + 1]!, ratio[3 * i + 2]!);
  }
  const least = floor * worst;
  for (let q = 0; q < 3; q++) {
    for (let i = 0; i < n; i++) {
      const r = ratio[3 * i + q]!;
      if (!(r >= least) || r === 0) continue;
      const left = i > 0 && rangeOf[i - 1] === rangeOf[i] ? ratio[3 * (i - 1) + q]! : -1;
      const right = i + 1 < n && rangeOf[i + 1] === rangeOf[i] ? ratio[3 * (i + 1) + q]! : -1;
      if (r >= left && r >= right) out.add(i);
    }
  }
  return [...out].sort((a, b) => a - b);
}

/** Local maxima below this fraction of the worst ratio are not exchanged (they do not bind the optimum). */
export const EXCHANGE_FLOOR = 0.5;

/**
 * Fits the samples on the node set of the options; throws FitError when the fit cannot be made. With
 * nodes 'all' this is exactly fitNasa7 of the samples.
 */
export function fitSpecies(computed: Pick<ComputedSpecies, 'samples' | 'anchor'>, options: FitStageOptions): FitResult {
  return fitSpeciesCounted(computed, options).fit;
}

/** `fitSpecies`, with the number of distinct points the returned fit was made from (for the price table). */
export function fitSpeciesCounted(computed: Pick<ComputedSpecies, 'samples' | 'anchor'>, options: FitStageOptions): { fit: FitResult; points: number } {
  const { samples, anchor } = computed;
  const nodes = options.nodes ?? 'all';
  const base: FitOptions = normaliseFitOptions(options);
  if (nodes === 'all') return { fit: fitNasa7(samples, anchor, base), points: samples.length };
  const indices = nodesFor(samples, options, nodes);
  const nodeSamples = indices.map((i) => samples[i]!);
  let fit = fitNasa7(nodeSamples, anchor, base);
  let points = nodeSamples.length;
  if (nodes.exchange) {
    const tMid = fit.polynomial.tMid;
    const dense = splitAt(samples, tMid);
    const before = worstLimitRatio(fit.polynomial, dense, base.limits).ratio;
    const extra = exchangePoints(fit.polynomial, samples, base.limits);
    const merged = [...new Set([...indices, ...extra])].sort((a, b) => a - b).map((i) => samples[i]!);
    const fixed: FitOptions = { ...base, tMid };
    delete fixed.optimiseMid;
    const again = fitNasa7(merged, anchor, fixed);
    // Kept only when it is better on the check grid (it nearly always is); the midpoint search's count stays.
    if (worstLimitRatio(again.polynomial, dense, base.limits).ratio < before) {
      fit = { ...again, solver: { ...again.solver!, midCandidates: fit.solver?.midCandidates ?? 1 } };
      points = merged.length;
    }
  }
  const p = fit.polynomial;
  const dense = splitAt(samples, p.tMid);
  const solver = fit.solver?.worstLimitRatio !== undefined ? { ...fit.solver, worstLimitRatio: worstLimitRatio(p, dense, base.limits).ratio } : fit.solver;
  return { fit: { polynomial: p, metrics: computeMetrics(p, dense, anchor), ...(solver ? { solver } : {}) }, points };
}
