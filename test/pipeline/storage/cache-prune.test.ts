/**
 * The cache location and `qforge cache prune`: the default cache lives inside the database folder (so
 * `--out /tmp/x` of two databases never shares one); a prune drops the entries no current species uses
 * and reports count and bytes; two databases sharing one --cache-dir keep each other's entries. Our own
 * builds compared with each other; the changed constant below is invented for the test.
 */
import { cp, mkdir, mkdtemp, readdir, readFile, rm, stat, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { CACHE_KINDS } from '../../../pipeline/storage/cache.js';
import { UsedKeys } from '../../../pipeline/storage/cache-uses.js';
import { sha256Hex } from '../../../pipeline/storage/hash.js';
import { compareText } from '../../../pipeline/core/text.js';
import { FIXTURE_DB, runCli } from '../helpers.js';

let root: string;
beforeEach(async () => {
  root = await mkdtemp(path.join(tmpdir(), 'qforge-prune-'));
  await cp(FIXTURE_DB, path.join(root, 'a'), { recursive: true });
  await cp(FIXTURE_DB, path.join(root, 'b'), { recursive: true });
});
afterEach(async () => {
  await rm(root, { recursive: true, force: true });
});

async function entries(cacheDir: string): Promise<string[]> {
  const out: string[] = [];
  for (const kind of CACHE_KINDS) {
    const k = path.join(cacheDir, kind);
    for (const sub of await readdir(k).catch(() => [])) for (const f of await readdir(path.join(k, sub))) out.push(`${kind}/${f}`);
  }
  return out.sort();
}

/** An invented change of one constant of CO, so its old entries become unused. */
async function changeCO(db: string): Promise<void> {
  const file = path.join(root, db, 'CO.yaml');
  await writeFile(file, (await readFile(file, 'utf8')).replace('we: 2169.81358', 'we: 2171.0'));
}

describe('cache location and prune', () => {
  it('the default cache is inside the database folder, not next to the output folder', async () => {
    expect((await runCli(['build', 'a', '--out', 'out-a', '--quiet'], root)).code).toBe(0);
    expect((await stat(path.join(root, 'a', '.qforge-cache'))).isDirectory()).toBe(true);
    await expect(stat(path.join(root, '.qforge-cache'))).rejects.toThrow();
  }, 120_000);

  it('prune drops only unused entries and reports count and bytes; a rebuild then hits everywhere', async () => {
    expect((await runCli(['build', 'a', '--out', 'out-a', '--quiet'], root)).code).toBe(0);
    const first = await entries(path.join(root, 'a', '.qforge-cache'));
    await changeCO('a');
    expect((await runCli(['build', 'a', '--out', 'out-a', '--quiet'], root)).code).toBe(0);
    const grown = await entries(path.join(root, 'a', '.qforge-cache'));
    expect(grown.length).toBeGreaterThan(first.length);
    const r = await runCli(['cache', 'prune', 'a', '--json'], root);
    expect(r.code, r.stderr).toBe(0);
    const res = JSON.parse(r.stdout);
    expect(res.removed).toBe(grown.length - first.length);
    expect(res.bytes_freed).toBeGreaterThan(0);
    expect(r.stderr).toMatch(/removed \d+ entries \([\d.]+ MB freed\)/);
    expect((await entries(path.join(root, 'a', '.qforge-cache'))).length).toBe(first.length);
    const again = JSON.parse((await runCli(['build', 'a', '--out', 'out-a', '--quiet', '--json'], root)).stdout);
    expect(again.counts.cache_hits).toBe(5);
  }, 180_000);

  it('pruning one database never deletes entries another database sharing the cache folder uses', async () => {
    expect((await runCli(['build', 'b', '--out', 'out-b', '--quiet', '--cache-dir', 'shared'], root)).code).toBe(0);
    await changeCO('a');
    expect((await runCli(['build', 'a', '--out', 'out-a', '--quiet', '--cache-dir', 'shared'], root)).code).toBe(0);
    const before = await entries(path.join(root, 'shared'));
    // a no longer uses b's CO entries, but b does: they stay.
    const r = JSON.parse((await runCli(['cache', 'prune', 'a', '--cache-dir', 'shared', '--json'], root)).stdout);
    expect(r.removed).toBe(0);
    expect(r.other_databases).toBe(1);
    expect(await entries(path.join(root, 'shared'))).toEqual(before);
    const b = JSON.parse((await runCli(['build', 'b', '--out', 'out-b', '--quiet', '--json', '--cache-dir', 'shared'], root)).stdout);
    expect(b.counts.cache_hits).toBe(5);
    // Once b is gone, its use list is stale and its CO entries go.
    await rm(path.join(root, 'b'), { recursive: true, force: true });
    const r2 = JSON.parse((await runCli(['cache', 'prune', 'a', '--cache-dir', 'shared', '--json'], root)).stdout);
    expect(r2.removed).toBeGreaterThan(0);
    expect(r2.stale_use_lists).toBe(1);
  }, 180_000);

  it('entries are in 16 folders per kind (first hex digit of the key); prune drops a used key kept elsewhere', async () => {
    expect((await runCli(['build', 'a', '--out', 'out-a', '--quiet'], root)).code).toBe(0);
    const cacheDir = path.join(root, 'a', '.qforge-cache');
    for (const kind of CACHE_KINDS) {
      for (const sub of await readdir(path.join(cacheDir, kind)).catch(() => [] as string[])) {
        expect(sub).toMatch(/^[0-9a-f]$/);
        for (const f of await readdir(path.join(cacheDir, kind, sub))) expect(f.startsWith(sub)).toBe(true);
      }
    }
    // An entry of a used key moved to a two-digit folder (the layout before 2026-12-05): no lookup finds it there.
    const [kind, key] = (await entries(cacheDir))[0]!.split('/') as [string, string];
    const placed = path.join(cacheDir, kind, key.slice(0, 1), key);
    const misplaced = path.join(cacheDir, kind, key.slice(0, 2), key);
    await mkdir(path.dirname(misplaced), { recursive: true });
    await writeFile(misplaced, await readFile(placed));
    const r = JSON.parse((await runCli(['cache', 'prune', 'a', '--json'], root)).stdout);
    expect(r.removed).toBe(1);
    await expect(stat(misplaced)).rejects.toThrow();
    expect((await stat(placed)).isFile()).toBe(true);
  }, 120_000);
});

describe('UsedKeys', () => {
  it('gives back every name added: hex keys kept as bytes (past the first growth), other names as written', () => {
    // Keys made by our own hash of a counter; the odd names are written by hand.
    const u = new UsedKeys();
    const added: string[] = [];
    for (let i = 0; i < 700; i++) {
      const name = `${i % 3 === 0 ? 'samples' : 'fit'}/${sha256Hex(String(i))}`;
      u.add(name);
      added.push(name);
    }
    for (const odd of ['result/ABC', 'noslash', '/leading', `table/${sha256Hex('x').toUpperCase()}`, `fit/${sha256Hex('0')}`]) {
      u.add(odd);
      added.push(odd);
    }
    expect(u.names().sort()).toEqual(added.sort());
  });

  it('listText: every distinct name once, in compareText order, as the sort of the strings gives it', () => {
    // Keys by our own hash of a counter, with repeats; kind names written by hand, one a prefix of another.
    const stringBody = (names: string[]) => {
      const text = [...new Set(names)].sort(compareText).join('\n');
      return text ? `${text}\n` : '';
    };
    const u = new UsedKeys();
    const added: string[] = [];
    expect(u.listText().toString()).toBe('');
    for (let i = 0; i < 3000; i++) {
      const kind = ['samples', 'fit', 'file', 'fits', 'result', 'table'][i % 6]!;
      const name = `${kind}/${sha256Hex(String(i % 1700))}`;
      u.add(name);
      added.push(name);
    }
    expect(u.listText().toString()).toBe(stringBody(added));
    u.add('odd-name');
    added.push('odd-name');
    expect(u.listText().toString()).toBe(stringBody(added));
  });
});
