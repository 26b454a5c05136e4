/**
 * The build pack (pipeline/storage/build-pack.ts) and the reuse of previous outputs by digest
 * (stages/emit-stream.ts): a corrupt, truncated or foreign pack is rejected with a warning and the build
 * goes on from the per-species entries; a pack of another build context is not used; a previous output
 * that was modified is never linked into the new build; whatever path a rebuild takes, its outputs are the
 * bytes of a --no-cache build. Holds no reference values (no source to name): every comparison is between
 * builds of our own code on the test fixture database; the edits (a title, a removed species, appended or
 * replaced bytes) and the pack texts of the unit tests are written by hand.
 */
import { cp, mkdtemp, readdir, readFile, rm, stat, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { packFile, packIdentity, PackWriter, readPack } from '../../../pipeline/storage/build-pack.js';
import { deterministicOutputs, FIXTURE_DB, readJson, runCli } from '../helpers.js';

let root: string;
beforeEach(async () => {
  root = await mkdtemp(path.join(tmpdir(), 'qforge-pack-'));
  await cp(FIXTURE_DB, path.join(root, 'db'), { recursive: true });
});
afterEach(async () => {
  await rm(root, { recursive: true, force: true });
});

interface Summary {
  warnings: string[];
  status: string;
  species: Array<{ name?: string; cache: Record<string, string>; cache_hit: boolean }>;
}

async function build(out: string, extra: string[] = [], db = 'db'): Promise<Summary> {
  const r = await runCli(['build', db, '--out', out, '--quiet', '-k', ...extra], root);
  expect(r.code, r.stderr).toBe(0);
  return readJson<Summary>(path.join(root, out, 'summary.json'));
}

const resultOutcomes = (s: Summary) => Object.fromEntries(s.species.map((x) => [x.name, x.cache.result]));
const allHit = (s: Summary) => s.species.every((x) => x.cache.result === 'hit');
const inode = async (file: string) => (await stat(file)).ino;
const thePack = () => packFile(path.join(root, 'db', '.qforge-cache'), packIdentity(path.join(root, 'db'), path.join(root, 'out')));

/** The outputs of a --no-cache build (what every rebuild below must write). */
async function reference(): Promise<Map<string, string>> {
  await build('reference', ['--no-cache']);
  return deterministicOutputs(path.join(root, 'reference'));
}

describe('build pack', () => {
  it('a no-change rebuild reads the pack, links every output and writes the bytes of a --no-cache build', async () => {
    await build('out');
    expect((await stat(thePack())).size).toBeGreaterThan(0);
    const before = await Promise.all(['thermo.json', 'nasa7.txt', 'tables/CO.csv'].map((f) => inode(path.join(root, 'out', f))));
    const s = await build('out');
    expect(allHit(s)).toBe(true);
    expect(s.warnings).toEqual([]);
    // Linked, not rewritten: the same inodes.
    expect(await Promise.all(['thermo.json', 'nasa7.txt', 'tables/CO.csv'].map((f) => inode(path.join(root, 'out', f))))).toEqual(before);
    expect(await deterministicOutputs(path.join(root, 'out'))).toEqual(await reference());
  }, 180_000);

  it('a modified previous output is never linked: the rebuild writes the right bytes again', async () => {
    await build('out');
    const out = path.join(root, 'out');
    const tableBefore = await inode(path.join(out, 'tables/N2.csv'));
    // Same length, other bytes (so that only the digest can tell), and an appended line.
    const thermo = await readFile(path.join(out, 'thermo.json'), 'utf8');
    await writeFile(path.join(out, 'thermo.json'), thermo.replace('"name": "CO"', '"name": "XO"'));
    await writeFile(path.join(out, 'nasa7.txt'), `${await readFile(path.join(out, 'nasa7.txt'), 'utf8')}! added by hand\n`);
    const table = await readFile(path.join(out, 'tables/CO.csv'), 'utf8');
    await writeFile(path.join(out, 'tables/CO.csv'), table.replace(/\d(?=\n)/, (d) => String((Number(d) + 1) % 10)));
    const s = await build('out');
    expect(allHit(s)).toBe(true);
    expect(await deterministicOutputs(out)).toEqual(await reference());
    // The unmodified table is still linked.
    expect(await inode(path.join(out, 'tables/N2.csv'))).toBe(tableBefore);
  }, 180_000);

  it('texts needed from a corrupt result entry: the entry is rejected, the species rebuilt, the outputs right', async () => {
    await build('out');
    const cacheDir = path.join(root, 'db', '.qforge-cache');
    for (const sub of await readdir(path.join(cacheDir, 'result'))) {
      for (const f of await readdir(path.join(cacheDir, 'result', sub))) {
        const file = path.join(cacheDir, 'result', sub, f);
        await writeFile(file, `${await readFile(file, 'utf8')} `);
      }
    }
    // Every piece differs from the previous outputs, so every species needs its texts.
    await rm(path.join(root, 'out', 'thermo.json'));
    await writeFile(path.join(root, 'out', 'thermo.json'), '{}\n');
    const s = await build('out');
    expect(Object.values(resultOutcomes(s)).every((o) => o === 'corrupt')).toBe(true);
    expect(s.warnings.filter((w) => /cache entry for result rejected \(checksum mismatch\); recomputed/.test(w))).toHaveLength(5);
    expect(await deterministicOutputs(path.join(root, 'out'))).toEqual(await reference());
    // Rewritten: the next rebuild hits everywhere again.
    const again = await build('out');
    expect(allHit(again)).toBe(true);
    expect(again.warnings).toEqual([]);
  }, 180_000);

  it('a species fewer, or one changed in the middle: the files are framed again from the linked previous bytes', async () => {
    await build('out');
    await rm(path.join(root, 'db', 'O.yaml'));
    await build('out');
    const ref1 = await reference();
    expect(await deterministicOutputs(path.join(root, 'out'))).toEqual(ref1);
    const co = path.join(root, 'db', 'CO.yaml');
    await writeFile(co, (await readFile(co, 'utf8')).replace('we: 2169.81358', 'we: 2171.0'));
    const s = await build('out');
    expect(resultOutcomes(s)).toEqual({ Ar: 'hit', CO: 'miss', H2O: 'hit', N2: 'hit' });
    await rm(path.join(root, 'reference'), { recursive: true });
    expect(await deterministicOutputs(path.join(root, 'out'))).toEqual(await reference());
  }, 240_000);

  it('a corrupt or truncated pack is rejected with a warning and the species come from their entries', async () => {
    await build('out');
    const file = thePack();
    const good = await readFile(file);
    const at = good.indexOf(0x0a) + 10;
    const flipped = Buffer.from(good);
    flipped[at] = flipped[at] === 0x41 ? 0x42 : 0x41;
    await writeFile(file, flipped);
    const s1 = await build('out');
    expect(s1.warnings.filter((w) => /build pack .* rejected \(checksum mismatch\)/.test(w))).toHaveLength(1);
    expect(allHit(s1)).toBe(true);
    expect(await deterministicOutputs(path.join(root, 'out'))).toEqual(await reference());
    // The build wrote a good pack again.
    expect((await build('out')).warnings).toEqual([]);
    await writeFile(file, (await readFile(file)).subarray(0, (await stat(file)).size - 100));
    const s2 = await build('out');
    expect(s2.warnings.filter((w) => /build pack .* rejected \(truncated \(\d+ of \d+ bytes\)\)/.test(w))).toHaveLength(1);
    expect(allHit(s2)).toBe(true);
  }, 180_000);

  it('a pack of another database is foreign (rejected with a warning); one of another build context is not used', async () => {
    await cp(FIXTURE_DB, path.join(root, 'other'), { recursive: true });
    await build('out');
    await build('out', [], 'other');
    // The other database's pack put where this database's pack belongs.
    const otherPack = packFile(path.join(root, 'other', '.qforge-cache'), packIdentity(path.join(root, 'other'), path.join(root, 'out')));
    await cp(otherPack, thePack());
    const s = await build('out');
    expect(s.warnings.filter((w) => /build pack .* rejected \(written for another database or output folder\)/.test(w))).toHaveLength(1);
    expect(allHit(s)).toBe(true);
    const settings = path.join(root, 'db', 'qforge.yaml');
    await writeFile(settings, (await readFile(settings, 'utf8')).replace('title: qforge pipeline test fixture', 'title: qforge pipeline test fixture, edited'));
    const s2 = await build('out');
    expect(s2.warnings).toEqual([]);
    expect(Object.values(resultOutcomes(s2)).every((o) => o === 'miss')).toBe(true);
    expect(await deterministicOutputs(path.join(root, 'out'))).toEqual(await reference());
  }, 240_000);
});

describe('build packs and cache prune', () => {
  it('prune keeps the pack of a live output folder and drops the pack of one that is gone', async () => {
    await build('out');
    await build('gone');
    const cacheDir = path.join(root, 'db', '.qforge-cache');
    const gonePack = packFile(cacheDir, packIdentity(path.join(root, 'db'), path.join(root, 'gone')));
    expect((await stat(gonePack)).isFile()).toBe(true);
    await rm(path.join(root, 'gone'), { recursive: true });
    const r = await runCli(['cache', 'prune', 'db', '--json'], root);
    expect(r.code, r.stderr).toBe(0);
    expect(JSON.parse(r.stdout).removed).toBe(1);
    await expect(stat(gonePack)).rejects.toThrow();
    expect((await stat(thePack())).isFile()).toBe(true);
    const inodes = await inode(path.join(root, 'out', 'thermo.json'));
    const s = await build('out');
    expect(allHit(s)).toBe(true);
    expect(await inode(path.join(root, 'out', 'thermo.json'))).toBe(inodes);
  }, 180_000);
});

describe('readPack', () => {
  const id = { database: '/d', out: '/o' };
  const written = async (dir: string) => {
    const w = new PackWriter();
    w.addFile('a'.repeat(64), '{"documents":[]}');
    w.addResult('b'.repeat(64), '{"diagnostics":[],"stages":[]}');
    w.addOutput({ file: 'nasa7.txt', whole: { hash: 'c'.repeat(64), bytes: 3 }, head: { hash: 'd'.repeat(64), bytes: 1 }, tail: { hash: 'e'.repeat(64), bytes: 1 }, pieces: [['f'.repeat(64), 1]] });
    await w.write(dir, id, 'ctx');
    return packFile(dir, id);
  };

  it('reads back what was written, for its identity and context only', async () => {
    const file = await written(root);
    const r = readPack(root, id, 'ctx');
    expect(r.rejected).toBeUndefined();
    expect(r.pack!.files.get('a'.repeat(64))).toBe('{"documents":[]}');
    expect(r.pack!.results.get('b'.repeat(64))).toBe('{"diagnostics":[],"stages":[]}');
    expect(r.pack!.outputs.get('nasa7.txt')!.pieces).toEqual([['f'.repeat(64), 1]]);
    // Another context: stale, silently not used.
    expect(readPack(root, id, 'other')).toEqual({});
    // Another identity (the same file read as another database's): foreign.
    await cp(file, packFile(root, { database: '/x', out: '/o' }));
    expect(readPack(root, { database: '/x', out: '/o' }, 'ctx').rejected).toBe('written for another database or output folder');
    // No pack: nothing.
    expect(readPack(root, { database: '/y', out: '/o' }, 'ctx')).toEqual({});
  });

  it('spills a large body to a scratch file beside the pack: the same bytes, the scratch file removed', async () => {
    // Lines written by hand; a bound of 100 bytes makes every few lines go to the scratch file.
    const fill = (w: PackWriter) => {
      for (let i = 0; i < 40; i++) w.addFile(i.toString(16).padStart(64, '0'), `{"documents":[${i}]}`);
      for (let i = 0; i < 40; i++) w.addResult(i.toString(16).padStart(64, 'a'), `{"diagnostics":[],"n":${i}}`);
      w.addOutput({ file: 'nasa7.txt', whole: { hash: 'c'.repeat(64), bytes: 3 }, head: { hash: 'd'.repeat(64), bytes: 1 }, tail: { hash: 'e'.repeat(64), bytes: 1 }, pieces: [] });
    };
    const inMemory = new PackWriter();
    fill(inMemory);
    await inMemory.write(root, id, 'ctx');
    const expected = await readFile(packFile(root, id));
    await rm(packFile(root, id));
    const scratchDir = path.dirname(packFile(root, id));
    const spilled = new PackWriter(scratchDir, 100);
    fill(spilled);
    expect((await readdir(scratchDir)).some((n) => n.startsWith('.body.'))).toBe(true);
    await spilled.write(root, id, 'ctx');
    expect(await readFile(packFile(root, id))).toEqual(expected);
    expect(await readdir(scratchDir)).toEqual([path.basename(packFile(root, id))]);
    // The same body as the pack read: nothing rewritten, the scratch file removed all the same.
    const again = new PackWriter(scratchDir, 100);
    fill(again);
    const before = (await stat(packFile(root, id))).mtimeMs;
    await again.write(root, id, 'ctx', readPack(root, id, 'ctx').pack);
    expect((await stat(packFile(root, id))).mtimeMs).toBe(before);
    expect(await readdir(scratchDir)).toEqual([path.basename(packFile(root, id))]);
    // A build that stops before writing discards its scratch file.
    const dropped = new PackWriter(scratchDir, 100);
    fill(dropped);
    dropped.discard();
    expect(await readdir(scratchDir)).toEqual([path.basename(packFile(root, id))]);
    // Lines out of body order are a bug of the caller.
    const w = new PackWriter();
    w.addResult('b'.repeat(64), '{}');
    expect(() => w.addFile('a'.repeat(64), '{}')).toThrow(/out of order/);
  });

  it('rejects a foreign format, a missing header, a truncated, a lengthened and a corrupt body', async () => {
    const file = await written(root);
    const good = await readFile(file, 'utf8');
    const eol = good.indexOf('\n');
    const cases: Array<[string, RegExp]> = [
      [good.replace('qforge-pack/1', 'qforge-pack/0'), /^foreign format/],
      ['not a pack\n', /^no pack header$/],
      [good.slice(0, good.length - 5), /^truncated \(\d+ of \d+ bytes\)$/],
      [`${good}R ${'9'.repeat(64)} {}\n`, /^truncated/],
      [`${good.slice(0, eol + 3)}${good[eol + 3] === '0' ? '1' : '0'}${good.slice(eol + 4)}`, /^checksum mismatch$/],
    ];
    for (const [text, reason] of cases) {
      await writeFile(file, text);
      const r = readPack(root, id, 'ctx');
      expect(r.pack, text.slice(0, 60)).toBeUndefined();
      expect(r.rejected).toMatch(reason);
    }
  });
});
