/**
 * Publishing a rebuild whose outputs all equal the previous OUT's (pipeline/storage/atomic-write.ts,
 * OutputStaging): the previous files are hashed in place and only linked when the folders must be swapped;
 * when every file but one is the previous file and the marker lists the same files, that one file is
 * renamed into OUT and nothing else is touched. A previous file changed after it was checked is never
 * published on that check. Holds no reference values (no source to name): the file contents are written
 * by hand, and the builds compared are of our own code on the test fixture database.
 */
import { cp, lstat, mkdtemp, readdir, readFile, rename, rm, stat, symlink, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { OutputFolderError, OutputStaging, publishDirectory } from '../../../pipeline/storage/atomic-write.js';
import { textDigest } from '../../../pipeline/storage/hash.js';
import { deterministicOutputs, FIXTURE_DB, runCli } from '../helpers.js';

let root: string;
beforeEach(async () => {
  root = await mkdtemp(path.join(tmpdir(), 'qforge-inplace-'));
});
afterEach(async () => {
  await rm(root, { recursive: true, force: true });
});

/** Replaces a file by a new inode, as an editor saving through a temporary file does. */
async function replaceFile(file: string, text: string): Promise<void> {
  await writeFile(`${file}.tmp`, text);
  await rename(`${file}.tmp`, file);
}

const ino = async (f: string) => (await stat(f)).ino;
const leftovers = async () => (await readdir(root)).filter((n) => n.includes('qforge-'));

/** A previous OUT written by publishDirectory (so it has its marker), with hand-written contents. */
async function previousOut(): Promise<string> {
  const out = path.join(root, 'out');
  await publishDirectory(out, new Map([['a.txt', 'alpha\n'], ['tables/b.csv', 'b,1\n'], ['summary.json', '{"n":1}\n']]));
  return out;
}

describe('in-place publish', () => {
  it('all files but one equal to the previous ones: only that file is renamed into OUT', async () => {
    const out = await previousOut();
    const [dirIno, aIno, bIno] = await Promise.all([ino(out), ino(path.join(out, 'a.txt')), ino(path.join(out, 'tables/b.csv'))]);
    const staging = await OutputStaging.open(out);
    expect(await staging.reuseByDigest('a.txt', textDigest('alpha\n'))).toBe(true);
    await staging.writeOrReuse('tables/b.csv', 'b,1\n');
    await staging.write('summary.json', '{"n":2}\n');
    expect((await staging.publish()).replaced).toBe(true);
    // The same folder and files; the one new file in place; no staging folder or backup left.
    expect([await ino(out), await ino(path.join(out, 'a.txt')), await ino(path.join(out, 'tables/b.csv'))]).toEqual([dirIno, aIno, bIno]);
    expect(await readFile(path.join(out, 'summary.json'), 'utf8')).toBe('{"n":2}\n');
    expect(await leftovers()).toEqual([]);
  });

  it('a second changed file, a file fewer or more: the folders are swapped and the equal files linked', async () => {
    for (const variant of ['changed', 'fewer', 'more'] as const) {
      const out = await previousOut();
      const [dirIno, bIno] = await Promise.all([ino(out), ino(path.join(out, 'tables/b.csv'))]);
      const staging = await OutputStaging.open(out);
      if (variant === 'changed') await staging.write('a.txt', 'ALPHA\n');
      else if (variant === 'more') {
        expect(await staging.reuseByDigest('a.txt', textDigest('alpha\n'))).toBe(true);
        await staging.write('c.txt', 'new\n');
      }
      expect(await staging.reuseByDigest('tables/b.csv', textDigest('b,1\n'))).toBe(true);
      await staging.write('summary.json', '{"n":2}\n');
      await staging.publish();
      expect(await ino(out), variant).not.toBe(dirIno);
      expect(await ino(path.join(out, 'tables/b.csv')), variant).toBe(bIno);
      const files = (await readFile(path.join(out, '.qforge-build'), 'utf8')).split('\n').slice(2).filter(Boolean);
      expect(files, variant).toEqual(variant === 'changed' ? ['a.txt', 'summary.json', 'tables/b.csv'] : variant === 'fewer' ? ['summary.json', 'tables/b.csv'] : ['a.txt', 'c.txt', 'summary.json', 'tables/b.csv']);
      expect(await leftovers(), variant).toEqual([]);
      await rm(out, { recursive: true });
    }
  });

  it('a modified previous file is not taken; one replaced by the same bytes after the check is linked', async () => {
    const out = await previousOut();
    await writeFile(path.join(out, 'a.txt'), 'alphA\n');
    const staging = await OutputStaging.open(out);
    expect(await staging.reuseByDigest('a.txt', textDigest('alpha\n'))).toBe(false);
    await staging.write('a.txt', 'alpha\n');
    expect(await staging.reuseByDigest('tables/b.csv', textDigest('b,1\n'))).toBe(true);
    // Replaced (another inode: written aside, renamed over) by the same bytes after the check: hashed
    // again through the link, published.
    await replaceFile(path.join(out, 'tables/b.csv'), 'b,1\n');
    await staging.write('summary.json', '{}\n');
    await staging.publish();
    expect(await readFile(path.join(out, 'a.txt'), 'utf8')).toBe('alpha\n');
    expect(await readFile(path.join(out, 'tables/b.csv'), 'utf8')).toBe('b,1\n');
  });

  it('a previous file replaced by other bytes after its check fails the publish and leaves OUT as it was', async () => {
    const out = await previousOut();
    const staging = await OutputStaging.open(out);
    expect(await staging.reuseByDigest('tables/b.csv', textDigest('b,1\n'))).toBe(true);
    await staging.write('a.txt', 'changed\n');
    await staging.write('summary.json', '{}\n');
    await replaceFile(path.join(out, 'tables/b.csv'), 'b,2\n');
    const failure = await staging.publish().catch((e: unknown) => e);
    expect(failure).toBeInstanceOf(OutputFolderError);
    expect(String(failure)).toMatch(/tables\/b\.csv changed while the build ran/);
    expect(await readFile(path.join(out, 'a.txt'), 'utf8')).toBe('alpha\n');
    expect(await leftovers()).toEqual([]);
  });

  it('OUT given as a symbolic link to a folder is replaced by a folder, as by a swap', async () => {
    const real = await previousOut();
    const link = path.join(root, 'link');
    await symlink(real, link);
    const staging = await OutputStaging.open(link);
    expect(await staging.reuseByDigest('a.txt', textDigest('alpha\n'))).toBe(true);
    expect(await staging.reuseByDigest('tables/b.csv', textDigest('b,1\n'))).toBe(true);
    await staging.write('summary.json', '{}\n');
    await staging.publish();
    expect((await lstat(link)).isDirectory()).toBe(true);
    // The folder the link led to is left alone (the link is what is replaced).
    expect(await readFile(path.join(real, 'summary.json'), 'utf8')).toBe('{"n":1}\n');
  });

  it('a no-change rebuild of the fixture database keeps OUT, its files and inodes, and writes a --no-cache build\'s bytes', async () => {
    await cp(FIXTURE_DB, path.join(root, 'db'), { recursive: true });
    const build = async (out: string, extra: string[] = []) => expect((await runCli(['build', 'db', '--out', out, '--quiet', ...extra], root)).code).toBe(0);
    await build('out');
    const out = path.join(root, 'out');
    const names = ['', 'thermo.json', 'nasa7.txt', 'tables/CO.csv', 'tables/README.txt'];
    const before = await Promise.all(names.map((n) => ino(path.join(out, n))));
    await build('out');
    expect(await Promise.all(names.map((n) => ino(path.join(out, n))))).toEqual(before);
    await build('reference', ['--no-cache']);
    expect(await deterministicOutputs(out)).toEqual(await deterministicOutputs(path.join(root, 'reference')));
    expect((await readdir(root)).filter((n) => n.includes('qforge-new') || n.includes('qforge-old'))).toEqual([]);
  }, 180_000);
});
