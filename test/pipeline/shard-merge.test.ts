/**
 * Sharded builds: `build --shard I/N` builds a deterministic subset, and `merge` of all N shards is the
 * unsharded build byte for byte (summary.json aside: it holds timings) for N = 2 and 3 on the demo
 * database; merge refuses overlapping, missing and foreign shards. Comparisons between builds of our own
 * code; no reference values.
 */
import { cp, mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { shardOf } from '../../pipeline/core/shard.js';
import { deterministicOutputs, hashFolder, readJson, REPO, runCli } from './helpers.js';

let root: string;
beforeAll(async () => {
  root = await mkdtemp(path.join(tmpdir(), 'qforge-shard-'));
  await cp(path.join(REPO, 'species'), path.join(root, 'demo'), { recursive: true });
  const r = await runCli(['build', 'demo', '--out', 'full', '--quiet', '--cache-dir', 'cache'], root);
  expect(r.code, r.stderr).toBe(0);
}, 240_000);
afterAll(async () => {
  await rm(root, { recursive: true, force: true });
});

describe('build --shard and merge', () => {
  it('the shard of a name is stable and spreads names over the shards', () => {
    expect(shardOf('H2O', 3)).toBe(shardOf('H2O', 3));
    const names = Array.from({ length: 300 }, (_, i) => `S${i}`);
    for (const n of [2, 3]) {
      const counts = new Array(n).fill(0);
      for (const s of names) counts[shardOf(s, n) - 1]++;
      for (const c of counts) expect(c).toBeGreaterThan(300 / n / 2);
    }
  });

  for (const n of [2, 3]) {
    it(`merge of ${n} shards equals the unsharded build`, async () => {
      const dirs: string[] = [];
      const seen = new Set<string>();
      for (let i = 1; i <= n; i++) {
        const out = `s${n}-${i}`;
        const r = await runCli(['build', 'demo', '--out', out, '--shard', `${i}/${n}`, '--quiet', '--cache-dir', 'cache'], root);
        expect(r.code, r.stderr).toBe(0);
        const summary = await readJson(path.join(root, out, 'summary.json'));
        expect(summary.shard).toMatchObject({ index: i, count: n });
        for (const s of summary.species as Array<{ name: string }>) {
          expect(shardOf(s.name, n)).toBe(i);
          expect(seen.has(s.name)).toBe(false);
          seen.add(s.name);
        }
        dirs.push(out);
      }
      const m = await runCli(['merge', ...dirs, '--out', `merged${n}`], root);
      expect(m.code, m.stderr).toBe(0);
      expect(await deterministicOutputs(path.join(root, `merged${n}`))).toEqual(await deterministicOutputs(path.join(root, 'full')));
      const merged = await readJson(path.join(root, `merged${n}`, 'summary.json'));
      const full = await readJson(path.join(root, 'full', 'summary.json'));
      expect(merged.shard).toBeUndefined();
      expect(merged.counts.species).toBe(full.counts.species);
      expect(merged.species.map((s: { name: string }) => s.name)).toEqual(full.species.map((s: { name: string }) => s.name));
    }, 240_000);
  }

  it('merge refuses overlapping, missing and mismatched shards, and writes nothing', async () => {
    const before = await hashFolder(path.join(root, 'refused'));
    const missing = await runCli(['merge', 's3-1', 's3-2', '--out', 'refused'], root);
    expect(missing.code).toBe(1);
    expect(missing.stderr).toMatch(/missing shard 3\/3/);
    const twice = await runCli(['merge', 's3-1', 's3-1', 's3-2', 's3-3', '--out', 'refused'], root);
    expect(twice.code).toBe(1);
    expect(twice.stderr).toMatch(/overlapping shards: 1\/3 is given 2 times/);
    const mixed = await runCli(['merge', 's2-1', 's3-2', '--out', 'refused'], root);
    expect(mixed.code).toBe(1);
    expect(mixed.stderr).toMatch(/is shard 2\/3, s2-1 is one of 2/);
    const notShard = await runCli(['merge', 'full', '--out', 'refused'], root);
    expect(notShard.code).toBe(1);
    expect(notShard.stderr).toMatch(/full is not a shard/);
    expect(await hashFolder(path.join(root, 'refused'))).toBe(before);
    const absent = await runCli(['merge', 's3-1', 'no-such-shard', '--out', 'refused'], root);
    expect(absent.code).toBe(2);
    expect(absent.stderr).toMatch(/no-such-shard: no such folder/);
    const bad = await runCli(['build', 'demo', '--out', 'x', '--shard', '4/3'], root);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toMatch(/--shard/);
  }, 120_000);
});
