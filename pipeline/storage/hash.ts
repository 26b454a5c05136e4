/**
 * Content hashing for the cache and for the per-species input hash in thermo.json.
 *
 * Canonical JSON: object keys sorted, `undefined` members dropped, numbers as JavaScript prints them
 * (shortest round-trip form, so equal doubles always give equal text). Two inputs that differ only in key
 * order or YAML layout therefore hash the same.
 */
import { hash } from 'node:crypto';

/** Deterministic JSON text of a JSON-like value (sorted keys; arrays keep their order). */
export function canonicalJson(value: unknown): string {
  return JSON.stringify(sortKeys(value));
}

/**
 * The value `JSON.parse(canonicalJson(value))` would give, without the text: a structural copy with sorted
 * keys, `undefined` members dropped and -0 as 0. Stage results go through it, fresh or cached alike, so
 * their key order (which reaches thermo.json) never depends on whether the cache was used.
 */
export function canonicalCopy<T>(value: T): T {
  return sortKeys(value) as T;
}

function sortKeys(value: unknown): unknown {
  if (Array.isArray(value)) {
    const out = new Array<unknown>(value.length);
    for (let i = 0; i < value.length; i++) {
      const v: unknown = value[i];
      out[i] = v === undefined ? null : typeof v === 'number' ? (v === 0 ? 0 : v) : sortKeys(v);
    }
    return out;
  }
  if (value !== null && typeof value === 'object') {
    const out: Record<string, unknown> = {};
    const keys = Object.keys(value as Record<string, unknown>);
    // Most stage objects (a sample {T, cpR, hRT, sR}, …) are built with their keys in order already.
    if (!inOrder(keys)) keys.sort();
    for (const k of keys) {
      const v = (value as Record<string, unknown>)[k];
      if (v !== undefined) out[k] = sortKeys(v);
    }
    return out;
  }
  if (typeof value === 'number' && value === 0) return 0; // -0 as 0
  return value;
}

/** Whether `keys` is in the order `Array.prototype.sort` would give (UTF-16 code units). */
function inOrder(keys: readonly string[]): boolean {
  for (let i = 1; i < keys.length; i++) if (keys[i - 1]! > keys[i]!) return false;
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
