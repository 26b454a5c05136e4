/**
 * StageCache entries (pipeline/storage/cache.ts): written once, read back checked, and still written when
 * their folder disappears during a build (the folders made are remembered, so that case must be handled).
 * Values written by hand for this test; no outside source is involved.
 */
import { mkdtemp, readFile, readdir, rm, writeFile } from 'node:fs/promises';
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
      cache.flushWrites();
      expect((await cache.get('fit', KEY_B)).outcome).toBe('miss');
      await writeFile(cacheEntryPath(dir, 'fit', KEY_A), (await cache.getText('fit', KEY_A)).value!.replace('2.5', '3.5'));
      expect((await cache.get('fit', KEY_A)).outcome).toBe('corrupt');
      // No temporary files are left next to the entries.
      expect(await readdir(path.dirname(cacheEntryPath(dir, 'fit', KEY_A)))).toEqual([KEY_A]);
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  });

  it('entries are queued: read back at once, written 64 at a time or when flushed; a failed write is noted, not thrown', async () => {
    const dir = await mkdtemp(path.join(tmpdir(), 'qforge-cache-'));
    try {
      const cache = new StageCache(dir);
      // Keys made by this test: the hex of 0 … 63 repeated to 64 digits.
      const keys = Array.from({ length: 64 }, (_, i) => i.toString(16).padStart(2, '0').repeat(32));
      for (const k of keys.slice(0, 63)) await cache.putText('fit', k, '[1]');
      expect(await cache.get('fit', keys[5]!)).toEqual({ outcome: 'hit', value: [1] });
      await expect(readFile(cacheEntryPath(dir, 'fit', keys[5]!))).rejects.toThrow();
      await cache.putText('fit', keys[63]!, '[2]');
      expect(await readFile(cacheEntryPath(dir, 'fit', keys[63]!), 'utf8')).toMatch(/\n\[2\]$/);
      expect(await readFile(cacheEntryPath(dir, 'fit', keys[5]!), 'utf8')).toMatch(/\n\[1\]$/);
      // A cache folder that cannot hold entries (a file where its kind folder would be).
      await writeFile(path.join(dir, 'table'), 'not a folder');
      await cache.putText('table', KEY_A, '3');
      expect(() => cache.flushWrites()).not.toThrow();
      expect(cache.writeProblem).toBeDefined();
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  });

  it('an entry folder removed during the build is made again', async () => {
    const dir = await mkdtemp(path.join(tmpdir(), 'qforge-cache-'));
    try {
      const cache = new StageCache(dir);
      await cache.putText('samples', KEY_A, '1');
      cache.flushWrites();
      await rm(path.join(dir, 'samples'), { recursive: true });
      await cache.putText('samples', KEY_B, '2');
      cache.flushWrites();
      expect(await readFile(cacheEntryPath(dir, 'samples', KEY_B), 'utf8')).toMatch(/\n2$/);
      expect(await cache.get('samples', KEY_B)).toEqual({ outcome: 'hit', value: 2 });
      expect(cache.writeProblem).toBeUndefined();
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  });

  it('lookups after misses and after hits give the same outcomes: hit, miss, corrupt, and an entry another build wrote meanwhile', async () => {
    const dir = await mkdtemp(path.join(tmpdir(), 'qforge-cache-'));
    try {
      const writer = new StageCache(dir);
      await writer.putText('fit', KEY_A, '[1]');
      writer.flushWrites();
      const cache = new StageCache(dir);
      // miss, then hit (the lookup after a miss asks whether the file exists first), then miss again
      expect((await cache.getText('fit', KEY_B)).outcome).toBe('miss');
      expect(await cache.get('fit', KEY_A)).toEqual({ outcome: 'hit', value: [1] });
      expect((await cache.get('fit', KEY_B)).outcome).toBe('miss');
      expect((await cache.get('table', KEY_A)).outcome).toBe('miss');
      // written by another build after our misses: found at once
      await writer.putText('fit', KEY_B, '[2]');
      writer.flushWrites();
      expect(await cache.getText('fit', KEY_B)).toEqual({ outcome: 'hit', value: '[2]' });
      // a damaged entry right after a miss is still reported, not taken for a miss
      expect((await cache.get('table', KEY_B)).outcome).toBe('miss');
      await writeFile(cacheEntryPath(dir, 'fit', KEY_A), 'not an entry');
      expect((await cache.get('fit', KEY_A)).outcome).toBe('corrupt');
      // a kind folder that is a file: every lookup below it is a miss, whatever came before
      await writeFile(path.join(dir, 'samples'), 'not a folder');
      expect((await cache.get('samples', KEY_A)).outcome).toBe('miss');
      expect((await cache.get('samples', KEY_B)).outcome).toBe('miss');
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  });
});
