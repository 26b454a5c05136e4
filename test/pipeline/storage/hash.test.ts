/**
 * Canonical JSON (pipeline/storage/hash.ts): the cache writes a fresh stage result as the plain JSON of
 * its canonical copy, which must be exactly its canonical JSON; the copy itself is checked against
 * expectations written by hand (key order, -0, undefined, which parts are shared). Values written by hand for this test (no
 * external source): unsorted and nested keys, undefined members and array slots, -0, non-finite numbers.
 */
import { describe, expect, it } from 'vitest';
import { sortedKeys } from '../../../pipeline/core/text.js';
import { canonicalCopy, canonicalJson, declareCanonical } from '../../../pipeline/storage/hash.js';

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
  it('the copy: keys in order at every depth, -0 as 0, undefined dropped (null in arrays); the input unchanged', () => {
    const input = { b: [{ z: -0, y: undefined, x: 1 }, undefined, -0], a: { d: [1, 2], c: 'x' } };
    const before = JSON.stringify(input);
    const c = canonicalCopy(input) as { a: { c: string; d: number[] }; b: [Record<string, number>, null, number] };
    // Expected values written by hand from the rules above.
    expect(Object.keys(c)).toEqual(['a', 'b']);
    expect(Object.keys(c.a)).toEqual(['c', 'd']);
    expect(Object.keys(c.b[0])).toEqual(['x', 'z']);
    expect(Object.is(c.b[0].z, 0)).toBe(true);
    expect(c.b[1]).toBeNull();
    expect(Object.is(c.b[2], 0)).toBe(true);
    expect(JSON.stringify(input)).toBe(before);
    expect(Object.keys(input.b[0]!)).toEqual(['z', 'y', 'x']);
  });
  it('parts that are canonical already are kept, not copied; a part that is not is copied', () => {
    const samples = [{ T: 200, cpR: 1, hRT: 2, sR: 3 }];
    const value = { samples, anchor: { sR: 3, T: 298.15 }, zeros: [1, -0] };
    const c = canonicalCopy(value);
    expect(c).not.toBe(value); // its keys were not in order
    expect(c.samples).toBe(samples);
    expect(c.anchor).not.toBe(value.anchor);
    expect(c.zeros).not.toBe(value.zeros);
    expect(Object.is(c.zeros[1], 0)).toBe(true);
    expect(Object.is(value.zeros[1], -0)).toBe(true);
  });
});

describe('canonical copy of objects that are not plain, and key order', () => {
  it('an object with another prototype is copied (keys in order), a null-prototype one kept when canonical', () => {
    class Point {
      constructor(
        public x = 1,
        public a = 2,
      ) {}
    }
    const p = new Point();
    const c = canonicalCopy({ p });
    expect(c.p).not.toBe(p);
    expect(Object.keys(c.p)).toEqual(['a', 'x']);
    const bare = Object.assign(Object.create(null) as Record<string, number>, { a: 1, b: 2 });
    expect(canonicalCopy({ bare }).bare).toBe(bare);
  });
  it('an in-order object is copied when a member is undefined, -0 or itself not canonical', () => {
    for (const v of [{ a: 1, b: undefined }, { a: -0, b: 1 }, { a: { d: 1, c: 2 }, b: 1 }]) expect(canonicalCopy(v)).not.toBe(v);
  });
});

describe('sortedKeys', () => {
  // Keys made by this test from a seeded generator (no external source): short and long objects, digits,
  // upper case, non-ASCII and astral characters, so both the insertion sort and the built-in sort are used.
  it('gives the order of Array.prototype.sort on the keys, for small and large objects', () => {
    let seed = 7;
    const rnd = () => (seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648;
    const alphabet = ['a', 'B', 'z', '_', '0', '9', 'é', 'Ω', '\u{1F600}', 'T', 'cpR'];
    for (const size of [0, 1, 2, 5, 31, 32, 33, 80]) {
      const obj: Record<string, number> = {};
      while (Object.keys(obj).length < size) {
        let k = '';
        for (let n = 1 + Math.floor(rnd() * 4); n > 0; n--) k += alphabet[Math.floor(rnd() * alphabet.length)];
        obj[k] = 1;
      }
      expect(sortedKeys(obj)).toEqual(Object.keys(obj).sort());
    }
  });
});

describe('declared canonical arrays', () => {
  it('are returned as they are; an undeclared copy of one is checked (and copied when it is not canonical)', () => {
    const list = [{ T: 200, cpR: 1, hRT: 2, sR: 3 }];
    declareCanonical(list);
    expect(canonicalCopy({ list }).list).toBe(list);
    const other = [{ sR: 3, T: 200 }];
    expect(canonicalCopy(other)).not.toBe(other);
    expect(Object.keys(canonicalCopy(other)[0]!)).toEqual(['T', 'sR']);
  });
});
