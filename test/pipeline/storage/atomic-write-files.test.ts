/**
 * File writing of pipeline/storage/atomic-write.ts. Temporary names of the atomic writes: many writes into
 * one folder, to one file and to many, concurrent and synchronous, each go through a name of their own —
 * every write succeeds, each file ends with one whole content, and no temporary file is left. Staged files
 * created in bursts: whatever is queued is on disk when it is published or compared, a removed file is never
 * created, a discarded staging leaves nothing. Contents written by this test.
 */
import { mkdtemp, readdir, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { OutputStaging, writeFileAtomic, writeFileAtomicNoSync } from '../../../pipeline/storage/atomic-write.js';

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

describe('staged files created in bursts', () => {
  it('a publish holds every file written, in full, and none that was removed', async () => {
    const out = path.join(dir, 'out');
    const staging = await OutputStaging.open(out);
    // 70 files: two full bursts and a partial one; two removed (one still queued, one already created).
    for (let i = 0; i < 70; i++) await staging.write(`tables/t${String(i).padStart(3, '0')}.csv`, `row ${i}\n`.repeat(20));
    await staging.remove('tables/t005.csv');
    await staging.remove('tables/t069.csv');
    await staging.write('summary.json', '{}\n');
    await staging.publish();
    const tables = (await readdir(path.join(out, 'tables'))).sort();
    expect(tables).toHaveLength(68);
    expect(tables).not.toContain('t005.csv');
    expect(tables).not.toContain('t069.csv');
    expect(await readFile(path.join(out, 'tables', 't068.csv'), 'utf8')).toBe('row 68\n'.repeat(20));
    expect(await readFile(path.join(out, 'summary.json'), 'utf8')).toBe('{}\n');
  });

  it('a queued file is on disk before it is compared with the previous output (reuseIfSame)', async () => {
    const out = path.join(dir, 'out');
    const first = await OutputStaging.open(out);
    await first.write('a.txt', 'same');
    await first.publish();
    const second = await OutputStaging.open(out);
    await second.write('a.txt', 'same');
    await second.reuseIfSame('a.txt');
    await second.publish();
    expect(await readFile(path.join(out, 'a.txt'), 'utf8')).toBe('same');
  });

  it('a discarded staging folder leaves nothing behind, queued files included', async () => {
    const out = path.join(dir, 'out');
    const staging = await OutputStaging.open(out);
    await staging.write('x.txt', 'x');
    await staging.discard();
    expect(await readdir(dir)).toEqual([]);
  });
});
