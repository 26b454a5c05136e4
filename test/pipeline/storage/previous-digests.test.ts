/**
 * The digest helper of a rebuild (pipeline/storage/previous-digests.ts, workers/digest-worker.ts): the
 * digests it reports are those the main thread computes (fileDigest), and a digest is given only for the
 * file state it was taken of. Holds no reference values (no source to name): the file contents are
 * written by hand and compared with our own fileDigest.
 */
import { lstatSync } from 'node:fs';
import { mkdir, mkdtemp, rename, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { fileDigest, stampOf } from '../../../pipeline/storage/atomic-write.js';
import { PreviousDigests } from '../../../pipeline/storage/previous-digests.js';

let root: string;
beforeEach(async () => {
  root = await mkdtemp(path.join(tmpdir(), 'qforge-digests-'));
});
afterEach(async () => {
  await rm(root, { recursive: true, force: true });
});

const stamp = (f: string) => stampOf(lstatSync(f, { bigint: true }));

/** Waits (polling lookup) until the helper has reported `file`, or gives up. */
async function reported(d: PreviousDigests, file: string): Promise<ReturnType<PreviousDigests['lookup']>> {
  for (let i = 0; i < 200; i++) {
    const r = d.lookup(file, stamp(file));
    if (r) return r;
    await new Promise((res) => setTimeout(res, 25));
  }
  return undefined;
}

describe('previous digests', () => {
  it('reports fileDigest of the framed files and of every table, only for the state hashed', async () => {
    const out = path.join(root, 'out');
    await mkdir(path.join(out, 'tables'), { recursive: true });
    await writeFile(path.join(out, 'thermo.json'), '{"species": []}\n');
    for (let i = 0; i < 150; i++) await writeFile(path.join(out, 'tables', `S${i}.csv`), `T,cp\n298.15,${i}\n`);
    const d = PreviousDigests.start(out, ['thermo.json', 'missing.txt'], ['tables', 'no-such-folder']);
    expect(d).toBeDefined();
    try {
      for (const f of [path.join(out, 'thermo.json'), path.join(out, 'tables', 'S0.csv'), path.join(out, 'tables', 'S149.csv')]) {
        expect(await reported(d!, f)).toEqual(fileDigest(f));
      }
      expect(d!.lookup(path.join(out, 'missing.txt'), 'x')).toBeUndefined();
      // Replaced since it was hashed (another inode): no digest for the new state.
      const t = path.join(out, 'tables', 'S7.csv');
      await writeFile(`${t}.tmp`, 'T,cp\n298.15,7\n');
      await rename(`${t}.tmp`, t);
      expect(d!.lookup(t, stamp(t))).toBeUndefined();
    } finally {
      await d!.stop();
    }
    // Stopped: nothing is answered any more.
    expect(d!.lookup(path.join(out, 'thermo.json'), stamp(path.join(out, 'thermo.json')))).toBeUndefined();
  });

  it('no previous folder: no helper', () => {
    expect(PreviousDigests.start(path.join(root, 'none'), ['thermo.json'], ['tables'])).toBeUndefined();
  });
});
