/**
 * Temporary names of the atomic writes (pipeline/storage/atomic-write.ts): many writes into one folder, to one
 * file and to many, concurrent and synchronous, each go through a name of their own — every write succeeds,
 * each file ends with one whole content, and no temporary file is left. Contents written by this test.
 */
import { mkdtemp, readdir, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { writeFileAtomic, writeFileAtomicNoSync } from '../../../pipeline/storage/atomic-write.js';

let dir: string;
beforeEach(async () => {
  dir = await mkdtemp(path.join(tmpdir(), 'qforge-temp-names-'));
});
afterEach(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('atomic writes through temporary names', () => {
  it('concurrent writes of one file all succeed and leave one whole content, no temporary file', async () => {
    const target = path.join(dir, 'one.txt');
    const contents = Array.from({ length: 40 }, (_, i) => `content ${i}\n`.repeat(50));
    await Promise.all(contents.map((c) => writeFileAtomic(target, c, { sync: false })));
    expect(contents).toContain(await readFile(target, 'utf8'));
    expect(await readdir(dir)).toEqual(['one.txt']);
  });

  it('synchronous writes of many files and of one file again and again', async () => {
    for (let i = 0; i < 200; i++) writeFileAtomicNoSync(path.join(dir, `f${i}.txt`), `file ${i}`);
    for (let i = 0; i < 50; i++) writeFileAtomicNoSync(path.join(dir, 'again.txt'), `round ${i}`);
    const names = await readdir(dir);
    expect(names.filter((n) => n.endsWith('.tmp'))).toEqual([]);
    expect(names).toHaveLength(201);
    expect(await readFile(path.join(dir, 'f123.txt'), 'utf8')).toBe('file 123');
    expect(await readFile(path.join(dir, 'again.txt'), 'utf8')).toBe('round 49');
  });
});
