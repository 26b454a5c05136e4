/**
 * StageCache entries (pipeline/storage/cache.ts): written once, read back checked, and still written when
 * their folder disappears during a build (the folders made are remembered, so that case must be handled).
 * Values written by hand for this test; no outside source is involved.
 */
import { mkdtemp, readdir, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { cacheEntryPath, StageCache } from '../../../pipeline/storage/cache.js';

const KEY_A = `ab${'0'.repeat(62)}`;
const KEY_B = `ab${'1'.repeat(62)}`;

describe('stage cache entries', () => {
  it('an entry reads back as written; a changed byte is rejected', async () => {
    const dir = await mkdtemp(path.join(tmpdir(), 'qforge-cache-'));
    try {
      const cache = new StageCache(dir);
      await cache.putText('fit', KEY_A, '{"x":[1,2.5]}');
      expect(await cache.get('fit', KEY_A)).toEqual({ outcome: 'hit', value: { x: [1, 2.5] } });
      expect((await cache.get('fit', KEY_B)).outcome).toBe('miss');
      await writeFile(cacheEntryPath(dir, 'fit', KEY_A), (await cache.getText('fit', KEY_A)).value!.replace('2.5', '3.5'));
      expect((await cache.get('fit', KEY_A)).outcome).toBe('corrupt');
      // No temporary files are left next to the entries.
      expect(await readdir(path.dirname(cacheEntryPath(dir, 'fit', KEY_A)))).toEqual([KEY_A]);
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  });

  it('an entry folder removed during the build is made again', async () => {
    const dir = await mkdtemp(path.join(tmpdir(), 'qforge-cache-'));
    try {
      const cache = new StageCache(dir);
      await cache.putText('samples', KEY_A, '1');
      await rm(path.join(dir, 'samples'), { recursive: true });
      await cache.putText('samples', KEY_B, '2');
      expect(await cache.get('samples', KEY_B)).toEqual({ outcome: 'hit', value: 2 });
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  });
});
