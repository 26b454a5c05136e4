/**
 * Content hashing for the cache and for the per-species input hash in thermo.json.
 *
 * Canonical JSON: object keys sorted, `undefined` members dropped, numbers as JavaScript prints them
 * (shortest round-trip form, so equal doubles always give equal text). Two inputs that differ only in key
 * order or YAML layout therefore hash the same.
 */
import { hash } from 'node:crypto';
import { sortedKeys } from '../core/text.js';

/** Deterministic JSON text of a JSON-like value (sorted keys; arrays keep their order). */
export function canonicalJson(value: unknown): string {
  return JSON.stringify(canonical(value));
}

/**
 * The value `JSON.parse(canonicalJson(value))` would give, without the text: sorted keys, `undefined`
 * members dropped (`null` in arrays) and -0 as 0. Stage results go through it, fresh or cached alike, so
 * their key order (which reaches thermo.json) never depends on whether the cache was used. Parts that are
 * canonical already (a sample {T, cpR, hRT, sR}, an array of them, a list of numbers) are returned as they
 * are rather than copied — most of a stage result; copying the whole cost ~0.3 ms per species — so the
 * result may share them with `value`: callers hand over a value they no longer change.
 */
export function canonicalCopy<T>(value: T): T {
  return canonical(value) as T;
}

/**
 * Arrays their makers have declared canonical (`declareCanonical`): returned by the canonical copy without
 * a look at their elements. A build's sample lists are most of its stage results, and checking each of
 * their ~1,200 objects per species, which the compute stage made canonical by construction, was ~1–2 % of
 * a cold build's CPU. Weak: an array leaves the set with its last reference.
 */
const declaredCanonical = new WeakSet<readonly unknown[]>();

/**
 * Declares `array` canonical: the caller guarantees that `canonicalCopy(array)` would return `array` itself
 * (plain objects with their keys in sort order, no undefined member, no −0 at any depth) and that neither
 * the array nor anything in it is changed afterwards. (A structured clone or JSON copy is a new array and
 * is checked as usual.)
 */
export function declareCanonical(array: readonly unknown[]): void {
  declaredCanonical.add(array);
}

/** Strictly negative zero (`-0 === 0`, so it needs its own test). */
const isNegativeZero = (v: number) => v === 0 && 1 / v < 0;

function canonical(value: unknown): unknown {
  if (typeof value !== 'object' || value === null) return typeof value === 'number' && isNegativeZero(value) ? 0 : value;
  if (Array.isArray(value)) {
    if (declaredCanonical.has(value)) return value;
    // Copied from the first element that changes on; an array that is canonical already is kept.
    let out: unknown[] | undefined;
    for (let i = 0; i < value.length; i++) {
      const v: unknown = value[i];
      const c = v === undefined ? null : typeof v === 'number' ? (isNegativeZero(v) ? 0 : v) : canonical(v);
      if (out !== undefined) out.push(c);
      else if (c !== v || (typeof v === 'number' && isNegativeZero(v))) {
        out = value.slice(0, i);
        out.push(c);
      }
    }
    return out ?? value;
  }
  const obj = value as Record<string, unknown>;
  if (isCanonicalPlainObject(obj)) return value;
  const keys = sortedKeys(obj);
  const out: Record<string, unknown> = {};
  for (let i = 0; i < keys.length; i++) {
    const k = keys[i]!;
    const v = obj[k];
    if (v !== undefined) out[k] = canonical(v);
  }
  return out;
}

/**
 * Whether a plain object (prototype Object.prototype or null) is canonical already: keys in sort order, no
 * undefined member, every member canonical. Walked with for-in, which on a plain object visits exactly the
 * own enumerable keys in Object.keys order and allocates nothing: a stage result holds thousands of small
 * canonical objects (the samples), and an Object.keys array for each was ~100 MB of garbage per 2,000
 * species. Other objects answer false and are copied key by key, as before.
 */
function isCanonicalPlainObject(obj: Record<string, unknown>): boolean {
  const proto: unknown = Object.getPrototypeOf(obj);
  if (proto !== Object.prototype && proto !== null) return false;
  let previous: string | undefined;
  for (const k in obj) {
    if (previous !== undefined && previous > k) return false;
    previous = k;
    const v = obj[k];
    if (v === undefined || (typeof v === 'number' ? isNegativeZero(v) : canonical(v) !== v)) return false;
  }
  return true;
}

/** sha256 of a string (UTF-8) or bytes, lower-case hex. */
export function sha256Hex(data: string | Uint8Array): string {
  // One-shot: no Hash object per call (a rebuild hashes a few small texts per species).
  return hash('sha256', data, 'hex');
}

/** sha256 of the canonical JSON of `parts` (an array so that the order of the parts matters). */
export function hashParts(...parts: unknown[]): string {
  return sha256Hex(canonicalJson(parts));
}

/** sha256 (lower-case hex) and length in bytes of a text (UTF-8) or file. */
export interface Digest {
  hash: string;
  bytes: number;
}

/** The Digest of a text as written in UTF-8. */
export function textDigest(text: string): Digest {
  return { hash: sha256Hex(text), bytes: Buffer.byteLength(text, 'utf8') };
}
