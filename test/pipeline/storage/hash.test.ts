/**
 * Canonical JSON (pipeline/storage/hash.ts): the cache writes a fresh stage result as the plain JSON of
 * its canonical copy, which must be exactly its canonical JSON. Values written by hand for this test (no
 * external source): unsorted and nested keys, undefined members and array slots, -0, non-finite numbers.
 */
import { describe, expect, it } from 'vitest';
import { canonicalCopy, canonicalJson } from '../../../pipeline/storage/hash.js';

const VALUES: unknown[] = [
  { b: 1, a: { d: [3, { z: -0, y: undefined }], c: 'x' } },
  [undefined, -0, NaN, Infinity, { q: null, p: [1.5e-300, -2] }],
  { samples: [{ T: 200, sR: 30.25, cpR: 4.0000000000000009, hRT: 12 }], summary: { notes: [], structure: 'atom' } },
  'text',
  0,
];

describe('canonical JSON', () => {
  it.each(VALUES.map((v, i) => [i, v] as const))('value %s: JSON of the canonical copy is the canonical JSON', (_i, v) => {
    expect(JSON.stringify(canonicalCopy(v))).toBe(canonicalJson(v));
  });
  it('sorts keys at every depth and drops undefined members', () => {
    expect(canonicalJson({ b: 1, a: { d: 2, c: undefined } })).toBe('{"a":{"d":2},"b":1}');
  });
});
