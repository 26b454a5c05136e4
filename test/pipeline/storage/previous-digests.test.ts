/**
 * The digest helper of a rebuild (pipeline/storage/previous-digests.ts, workers/digest-worker.ts): the
 * digests it reports are those the main thread computes (fileDigest), and a digest is given only for the
 * file state it was taken of; species files are hashed first when asked. Holds no reference values (no source to name): the file contents are
 * written by hand and compared with our own fileDigest.
 */
import { lstatSync } from 'node:fs';
import { mkdir, mkdtemp, rename, rm, symlink, writeFile } from 'node:fs/promises';
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

  it('with inputsFirst: waits for the species files, hashes them (links followed) before the OUT files, apart from them', async () => {
    const out = path.join(root, 'out');
    const db = path.join(root, 'db');
    await mkdir(out, { recursive: true });
    await mkdir(db, { recursive: true });
    await writeFile(path.join(out, 'nasa7.txt'), 'record\n');
    const files = [];
    for (let i = 0; i < 100; i++) {
      const f = path.join(db, `S${i}.yaml`);
      await writeFile(f, `name: S${i}\n`);
      files.push(f);
    }
    await symlink(files[3]!, path.join(db, 'link.yaml'));
    files.push(path.join(db, 'link.yaml'), path.join(db, 'gone.yaml'));
    const d = PreviousDigests.start(out, ['nasa7.txt'], [], true);
    expect(d).toBeDefined();
    try {
      // Nothing is hashed until the list arrives, and nothing is answered for the inputs before it is sent.
      await new Promise((res) => setTimeout(res, 100));
      expect(d!.lookup(path.join(out, 'nasa7.txt'), stamp(path.join(out, 'nasa7.txt')))).toBeUndefined();
      expect(d!.inputDigest(files[0]!)).toBeUndefined();
      d!.hashInputs(files);
      let first: string | undefined;
      for (let i = 0; i < 200 && first === undefined; i++) {
        first = d!.inputDigest(files[0]!);
        if (first === undefined) await new Promise((res) => setTimeout(res, 25));
      }
      expect(first).toBe(fileDigest(files[0]!).hash);
      expect(await reported(d!, path.join(out, 'nasa7.txt'))).toEqual(fileDigest(path.join(out, 'nasa7.txt')));
      // By now every input has been hashed (they come first).
      for (const f of files.slice(0, 100)) expect(d!.inputDigest(f)).toBe(fileDigest(f).hash);
      expect(d!.inputDigest(path.join(db, 'link.yaml'))).toBe(fileDigest(files[3]!).hash);
      expect(d!.inputDigest(path.join(db, 'gone.yaml'))).toBeUndefined();
      // Inputs and OUT files are kept apart.
      expect(d!.lookup(files[0]!, stamp(files[0]!))).toBeUndefined();
    } finally {
      await d!.stop();
    }
    expect(d!.inputDigest(files[0]!)).toBeUndefined();
  });

  it('no previous folder: no helper', () => {
    expect(PreviousDigests.start(path.join(root, 'none'), ['thermo.json'], ['tables'])).toBeUndefined();
  });
});
