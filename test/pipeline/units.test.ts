/**
 * Unit checks of the pipeline pieces: settings defaults against their schema, file-name safety, the cache
 * entry checks, the temperature grids, the atomic swap and the help texts. No reference data here (common
 * practice checks of our own code only).
 */
import { mkdir, mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import settingsSchema from '../../schemas/settings.schema.json' with { type: 'json' };
import { OutputFolderError, publishDirectory, safeJoin } from '../../pipeline/storage/atomic-write.js';
import { cacheEntryPath, StageCache } from '../../pipeline/storage/cache.js';
import { recordElements, speciesFileStem, tableFileNames } from '../../pipeline/stages/emit.js';
import { sha256Hex } from '../../pipeline/storage/hash.js';
import { temperatureGrid } from '../../pipeline/core/grid.js';
import { DEFAULT_SETTINGS, withDefaults } from '../../pipeline/core/settings.js';
import { parseTriple } from '../../pipeline/cli.js';
import { FIXTURE_DB, runCli } from './helpers.js';

/** Every `default` of the schema, by dotted path. */
function schemaDefaults(schema: any, prefix = ''): Map<string, unknown> {
  const out = new Map<string, unknown>();
  for (const [k, sub] of Object.entries<any>(schema.properties ?? {})) {
    const p = prefix ? `${prefix}.${k}` : k;
    if ('default' in sub) out.set(p, sub.default);
    for (const [kk, vv] of schemaDefaults(sub, p)) out.set(kk, vv);
  }
  return out;
}

const get = (o: any, p: string) => p.split('.').reduce((x, k) => x?.[k], o);

describe('settings', () => {
  it('every schema default equals the code default, and every leaf setting has a schema default', () => {
    const defaults = schemaDefaults(settingsSchema);
    for (const [p, v] of defaults) expect(get(DEFAULT_SETTINGS, p), p).toEqual(v);
    const leaves = (o: any, prefix = ''): string[] =>
      Object.entries(o).flatMap(([k, v]) =>
        v && typeof v === 'object' && !Array.isArray(v) ? leaves(v, prefix ? `${prefix}.${k}` : k) : [prefix ? `${prefix}.${k}` : k],
      );
    // A documented default object (fit.optimise_mid) counts for its members.
    const documented = (leaf: string) => [...defaults.keys()].some((d) => leaf === d || leaf.startsWith(`${d}.`));
    for (const leaf of leaves(DEFAULT_SETTINGS)) expect(documented(leaf), `${leaf} has no documented default`).toBe(true);
  });

  it('merges partial settings over the defaults', () => {
    const s = withDefaults({ fit: { weights: { h: 2 } }, tables: { extra: [] } });
    expect(s.fit.weights).toEqual({ cp: 1, h: 2, s: 1 });
    expect(s.tables.extra).toEqual([]);
    expect(s.temperature_ranges).toEqual({ low: 200, mid: 1000, high: 6000 });
    expect(withDefaults({ fit: { optimise_mid: { min: 800, max: 1400 } } }).fit.optimise_mid).toEqual({ min: 800, max: 1400, step: 100 });
  });
});

describe('file names never escape the output folder', () => {
  it.each([
    ['../x', '%2E%2E%2Fx'],
    ['..', '%2E%2E'],
    ['.hidden', '%2Ehidden'],
    ['a/b', 'a%2Fb'],
    ['C*', 'C%2A'],
    ['NO+', 'NO+'],
    ['CH2(S)', 'CH2(S)'],
    ['C2H5,OH', 'C2H5,OH'],
    ['a..b', 'a..b'],
    ['100%', '100%25'],
  ])('%s → %s', (name, stem) => {
    expect(speciesFileStem(name)).toBe(stem);
    const target = safeJoin('/out/tables', `${speciesFileStem(name)}.csv`);
    expect(path.dirname(target)).toBe(path.resolve('/out/tables'));
  });

  it('safeJoin refuses paths that leave the root', () => {
    expect(() => safeJoin('/out', '../x.csv')).toThrow(OutputFolderError);
    expect(() => safeJoin('/out', '/etc/passwd')).toThrow(OutputFolderError);
    expect(() => safeJoin('/out', 'tables/../../x')).toThrow(OutputFolderError);
    expect(safeJoin('/out', 'tables/N2.csv')).toBe(path.resolve('/out/tables/N2.csv'));
  });

  it('names equal up to letter case get distinct files', () => {
    const m = tableFileNames(['Co', 'CO'], sha256Hex);
    expect(m.get('CO')).toBe('tables/CO.csv');
    expect(m.get('Co')).toMatch(/^tables\/Co_[0-9a-f]{8}\.csv$/);
  });
});

describe('80-column elements', () => {
  it('ions carry the electron as element E, negative for cations (NASA TM-4513 convention)', () => {
    const base = { name: 'X', molarMass: 1, enthalpyOfFormation: { value: 0, temperature: 298.15 }, sources: ['s'], structure: 'atom', electronicLevels: [] } as const;
    expect(recordElements({ ...base, composition: { N: 1, O: 1 }, charge: 1 } as never)).toEqual([['N', 1], ['O', 1], ['E', -1]]);
    expect(recordElements({ ...base, composition: { O: 2 }, charge: -1 } as never)).toEqual([['O', 2], ['E', 1]]);
    expect(recordElements({ ...base, composition: { Ar: 1 }, charge: 0 } as never)).toEqual([['Ar', 1]]);
  });
});

describe('cache entries', () => {
  it('hit only when format, kind, key and checksum all match', async () => {
    const dir = await mkdtemp(path.join(tmpdir(), 'qforge-cache-'));
    try {
      const cache = new StageCache(dir);
      const key = sha256Hex('k');
      expect((await cache.get('fit', key)).outcome).toBe('miss');
      await cache.put('fit', key, { a: [1, 2.5] });
      expect(await cache.get('fit', key)).toEqual({ outcome: 'hit', value: { a: [1, 2.5] } });
      cache.flushWrites();
      expect((await cache.get('samples', key)).outcome).toBe('miss');
      // One header line (format, kind, key, sha256 of the payload bytes), then the payload as stored.
      const file = cacheEntryPath(dir, 'fit', key);
      const entry = await readFile(file, 'utf8');
      expect(entry).toBe(`qforge-cache/2 fit ${key} ${sha256Hex('{"a":[1,2.5]}')}\n{"a":[1,2.5]}`);
      await writeFile(file, entry.replace(' fit ', ' table '));
      expect((await cache.get('fit', key)).reason).toMatch(/kind/);
      await writeFile(file, entry.replace('qforge-cache/2', 'other/1'));
      expect((await cache.get('fit', key)).reason).toMatch(/foreign format/);
      await writeFile(file, entry.replace('2.5', '2.6'));
      expect((await cache.get('fit', key)).reason).toMatch(/checksum/);
      await writeFile(file, '{"format":"qforge-cache/1"}');
      expect((await cache.get('fit', key)).reason).toMatch(/header/);
      await expect(new StageCache(undefined).get('fit', key)).resolves.toEqual({ outcome: 'off' });
      await expect(cache.get('fit', '../../etc')).rejects.toThrow(/sha256/);
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  });
});

describe('temperature grids', () => {
  it('include the ends, the extras inside the range, and carry no binary noise', () => {
    expect(temperatureGrid(200, 1000, 200, [298.15, 1000, 7000])).toEqual([200, 298.15, 400, 600, 800, 1000]);
    const g = temperatureGrid(200, 201, 0.1);
    expect(g).toHaveLength(11);
    expect(g[3]).toBe(200.3);
    expect(temperatureGrid(200, 6000, 7).at(-1)).toBe(6000);
  });
});

describe('atomic publication', () => {
  it('replaces a qforge folder as a whole and refuses a foreign one', async () => {
    const root = await mkdtemp(path.join(tmpdir(), 'qforge-swap-'));
    try {
      const out = path.join(root, 'out');
      await publishDirectory(out, new Map([['a.txt', 'one'], ['sub/b.txt', 'two']]));
      expect(await readFile(path.join(out, 'sub/b.txt'), 'utf8')).toBe('two');
      await publishDirectory(out, new Map([['c.txt', 'three']]));
      await expect(readFile(path.join(out, 'a.txt'), 'utf8')).rejects.toThrow();
      expect(await readFile(path.join(out, 'c.txt'), 'utf8')).toBe('three');
      const foreign = path.join(root, 'foreign');
      await mkdir(foreign);
      await writeFile(path.join(foreign, 'thesis.tex'), 'precious');
      await expect(publishDirectory(foreign, new Map([['x', 'y']]))).rejects.toThrow(/not written by qforge/);
      await expect(publishDirectory(out, new Map([['../escape.txt', 'x']]))).rejects.toThrow(/leave the output folder/);
      expect(await readFile(path.join(out, 'c.txt'), 'utf8')).toBe('three');
    } finally {
      await rm(root, { recursive: true, force: true });
    }
  });
});

describe('output lock', () => {
  it('a build refuses to run while another live process holds the lock, and takes over a stale one', async () => {
    const root = await mkdtemp(path.join(tmpdir(), 'qforge-lock-'));
    try {
      await mkdir(path.join(root, 'db'));
      await writeFile(path.join(root, 'db', 'Ar.yaml'), await readFile(path.join(FIXTURE_DB, 'Ar.yaml'), 'utf8'));
      // The parent process (the test runner) is alive and is not this process.
      await writeFile(path.join(root, '.out.qforge-lock'), `${process.ppid}\n`);
      const locked = await runCli(['build', 'db', '--out', 'out'], root);
      expect(locked.code).toBe(1);
      expect(locked.stderr).toMatch(/another qforge build \(pid \d+\) is writing/);
      // A pid that cannot be alive: stale, taken over.
      await writeFile(path.join(root, '.out.qforge-lock'), '999999999\n');
      const r = await runCli(['build', 'db', '--out', 'out', '--quiet'], root);
      expect(r.code, r.stderr).toBe(0);
      await expect(readFile(path.join(root, '.out.qforge-lock'))).rejects.toThrow();
    } finally {
      await rm(root, { recursive: true, force: true });
    }
  });
});

describe('command line', () => {
  it('--help of every command exits 0 and shows examples', async () => {
    for (const cmd of ['build', 'check', 'table', 'diff', 'compare']) {
      const r = await runCli([cmd, '--help'], process.cwd());
      expect(r.code, cmd).toBe(0);
      expect(r.stdout, cmd).toMatch(/Examples:/);
    }
    expect((await runCli(['--version'], process.cwd())).code).toBe(0);
    const none = await runCli(['frobnicate'], process.cwd());
    expect(none.code).toBe(2);
  });

  it('diff and compare: a missing path is a usage error (2), a malformed file an input error (1)', async () => {
    const root = await mkdtemp(path.join(tmpdir(), 'qforge-cli-'));
    try {
      await writeFile(path.join(root, 'garbage.txt'), 'not a record\n');
      const missing = await runCli(['diff', 'nope', 'nope2'], root);
      expect(missing.code).toBe(2);
      expect(missing.stderr).toMatch(/nope: no such build folder or file/);
      const garbage = await runCli(['diff', 'garbage.txt', 'garbage.txt'], root);
      expect(garbage.code).toBe(1);
      expect(garbage.stderr).toMatch(/garbage\.txt:1: record starting on line 1/);
      expect((await runCli(['compare', 'nope', '--reference', 'x.csv'], root)).code).toBe(2);
    } finally {
      await rm(root, { recursive: true, force: true });
    }
  });

  it('parses --fail-above / --tolerance lists', () => {
    expect(parseTriple('cp=0.1,h=2e-3')).toEqual({ cp: 0.1, h: 0.002 });
    expect(() => parseTriple('cp=-1')).toThrow();
    expect(() => parseTriple('x=1')).toThrow();
  });
});
