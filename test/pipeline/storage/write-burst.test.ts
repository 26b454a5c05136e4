/**
 * The write queue shared by the output staging folder and the stage cache (pipeline/storage/write-burst.ts):
 * files are created when the queue fills and when it is flushed, in the order queued; a queued file can be
 * read back, replaced or dropped; a create that throws stops the flush and leaves the rest queued. The
 * "files" are names and contents made up by this test, recorded instead of written.
 */
import { describe, expect, it } from 'vitest';
import { WriteBurst } from '../../../pipeline/storage/write-burst.js';

describe('WriteBurst', () => {
  it('creates a full queue at once, in order; get, has, drop and replacing a queued file', () => {
    const created: string[] = [];
    const burst = new WriteBurst<string>(3, (file, data) => created.push(`${file}=${data}`));
    burst.add('a', '1');
    burst.add('b', '2');
    burst.add('a', '3');
    expect(created).toEqual([]);
    expect(burst.get('a')).toBe('3');
    expect(burst.has('b')).toBe(true);
    expect(burst.drop('b')).toBe(true);
    expect(burst.drop('b')).toBe(false);
    burst.add('c', '4');
    burst.add('d', '5');
    expect(created).toEqual(['a=3', 'c=4', 'd=5']);
    expect(burst.get('a')).toBeUndefined();
    burst.add('e', '6');
    burst.flush();
    expect(created).toEqual(['a=3', 'c=4', 'd=5', 'e=6']);
    burst.add('f', '7');
    burst.clear();
    burst.flush();
    expect(created).toHaveLength(4);
  });

  it('a create that throws stops the flush; the files after it stay queued', () => {
    const created: string[] = [];
    const burst = new WriteBurst<string>(10, (file) => {
      if (file === 'bad') throw new Error('disk full');
      created.push(file);
    });
    for (const f of ['x', 'bad', 'y']) burst.add(f, '');
    expect(() => burst.flush()).toThrow('disk full');
    expect(created).toEqual(['x']);
    expect(burst.has('y')).toBe(true);
    burst.flush();
    expect(created).toEqual(['x', 'y']);
  });
});
