/**
 * Cache of the species-independent part of the fit: the design rows, column scale, constraint QR and
 * reduced-matrix QR (solve.ts `FactoredProblem`) depend only on the sample temperatures of each range, the
 * weights, the anchor temperature, tMid and the continuity order. A build fits thousands of species on one
 * grid, so each factorisation is made once and applied per species (a few matrix–vector products).
 *
 * Pure (no I/O), deterministic (a hit returns the same object a miss would build, so results do not depend
 * on what was fitted before) and bounded: at most MAX_FACTORISATIONS entries, least recently used evicted
 * first. Each entry holds ≈ 23 doubles per row in typed arrays (solve.ts `FactoredProblem`; ≈ 0.3 MB for a
 * 10 K grid over 200–6000 K), plus the projector and semi-normal factors ls-score.ts and ls-rank.ts keep
 * beside it (≈ 9 more per row).
 */
import { buildConstraints } from './constraints.js';
import { designRows } from './design.js';
import { factorConstrainedProblem, type FactoredProblem } from './solve.js';
import { sameSampleTemperatures } from './log-temperatures.js';
import type { FitSample, FitWeights } from './types.js';

/** Enough for a midpoint search of ~40 candidates on two grids (fixed and searched midpoints). */
export const MAX_FACTORISATIONS = 96;

/**
 * Keyed first by the temperature key (one long string, the same string object for every candidate of a
 * species, so its hash is computed once), then by the short option key; the LRU order runs over entries.
 */
const cache = new Map<string, Map<string, FactoredProblem>>();
const order = new Map<FactoredProblem, [string, string]>();

export interface FactorKeyParts {
  /** Identity of the sample temperatures (see `temperatureKey`). */
  temperatures: string;
  weights: FitWeights;
  anchorT: number;
  tMid: number;
  continuityOrder: 1 | 2;
}

/**
 * The temperatures and key of the last call: species of one database share their grid, so the next call
 * usually finds the same temperatures and returns the same string object. That saves formatting every T,
 * and makes each cache lookup with the key a pointer comparison with a cached hash instead of hashing and
 * comparing a new string of some 4,000 characters (measured: ≈ 0.1 ms per species). The key's content,
 * hence every result, is the same either way.
 */
let lastKey: { T: Float64Array; key: string } | undefined;

/** A string identifying the temperatures of a sample list exactly (shortest round-trip decimal of each). */
export function temperatureKey(samples: readonly FitSample[]): string {
  const last = lastKey;
  if (last && sameSampleTemperatures(last.T, samples)) return last.key;
  let key = '';
  for (const s of samples) key += `${s.T},`;
  lastKey = { T: Float64Array.from(samples, (s) => s.T), key };
  return key;
}

/**
 * The option keys made for the last weights, anchor temperature and continuity order, by tMid: a search
 * asks for the same few dozen keys species after species, and formatting six numbers each time was a
 * measurable share of a lookup. A key is a function of the values only (String of Object.is-equal
 * numbers is the same string; the tMid map's SameValueZero merges +0 and −0, whose strings are both
 * "0"), so a remembered key is the very string a fresh one would be.
 */
let keysFor: { cp: number; h: number; s: number; anchorT: number; continuityOrder: number; byMid: Map<number, string> } | undefined;

/** The short option key of a factorisation (remembered, see above). */
export function optionKey(w: FitWeights, parts: FactorKeyParts): string {
  let memo = keysFor;
  if (!memo || !Object.is(memo.cp, w.cp) || !Object.is(memo.h, w.h) || !Object.is(memo.s, w.s) || !Object.is(memo.anchorT, parts.anchorT) || !Object.is(memo.continuityOrder, parts.continuityOrder)) {
    memo = keysFor = { cp: w.cp, h: w.h, s: w.s, anchorT: parts.anchorT, continuityOrder: parts.continuityOrder, byMid: new Map() };
  }
  let key = memo.byMid.get(parts.tMid);
  if (key === undefined) {
    key = `${w.cp}|${w.h}|${w.s}|${parts.anchorT}|${parts.tMid}|${parts.continuityOrder}`;
    // Bounded like the cache: a caller trying ever new midpoints does not grow it without end.
    if (memo.byMid.size >= MAX_FACTORISATIONS) memo.byMid.clear();
    memo.byMid.set(parts.tMid, key);
  }
  return key;
}

type SplitRanges = { low: readonly FitSample[]; high: readonly FitSample[] };

/**
 * The factorisation for these ranges and options, from the cache or built now. `ranges` must be the split
 * of samples whose temperatures `parts.temperatures` identifies (or a function returning it, called on a
 * miss only). Throws FitError like the solve itself (failures are not cached).
 */
export function factorisationFor(
  parts: FactorKeyParts,
  ranges: SplitRanges | (() => SplitRanges),
  anchor: FitSample,
): FactoredProblem {
  const w = parts.weights;
  const key = optionKey(w, parts);
  let inner = cache.get(parts.temperatures);
  const hit = inner?.get(key);
  if (hit) {
    order.delete(hit);
    order.set(hit, [parts.temperatures, key]);
    return hit;
  }
  const constraints = buildConstraints(anchor, { tMid: parts.tMid, continuityOrder: parts.continuityOrder });
  const made = factorConstrainedProblem(designRows(typeof ranges === 'function' ? ranges() : ranges, w), constraints.rows, constraints.labels);
  if (!inner) cache.set(parts.temperatures, (inner = new Map()));
  inner.set(key, made);
  order.set(made, [parts.temperatures, key]);
  if (order.size > MAX_FACTORISATIONS) {
    const [oldest, [t, k]] = order.entries().next().value!;
    order.delete(oldest);
    const m = cache.get(t)!;
    m.delete(k);
    if (m.size === 0) cache.delete(t);
  }
  return made;
}

/** Number of cached factorisations (for tests of the bound). */
export function cachedFactorisations(): number {
  return order.size;
}
