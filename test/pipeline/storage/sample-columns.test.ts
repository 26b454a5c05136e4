/**
 * The `samples` entry encoding (pipeline/storage/sample-columns.ts): sample lists as base64 columns of
 * doubles read back bit for bit and in JSON.parse's key order; lists that are not plain samples stay plain
 * JSON; a malformed column string is a corrupt entry (recomputed); and a build whose samples come from the
 * cache writes what a build without a cache writes. Species: the seeded synthetic set of bench/synthetic.ts
 * (our own generator) and the fixture database of test/fixtures/db; odd lists written by hand.
 */
import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { syntheticSpecies } from '../../../bench/synthetic.js';
import { planSpecies } from '../../../pipeline/core/plan.js';
import { withDefaults } from '../../../pipeline/core/settings.js';
import { computeSamples } from '../../../pipeline/stages/compute.js';
import { parseYamlText } from '../../../pipeline/stages/load.js';
import { validateSpecies } from '../../../pipeline/stages/validate.js';
import { cached, StageCache } from '../../../pipeline/storage/cache.js';
import { canonicalCopy } from '../../../pipeline/storage/hash.js';
import { decodeSampleEntry, encodeSampleEntry } from '../../../pipeline/storage/sample-columns.js';
import { deterministicOutputs, runCli, tempWorkspace } from '../helpers.js';
import { bitsDeep } from '../../fixtures/pipeline/bits.js';

const SETTINGS = withDefaults({});
/** A cache key (any sha256 hex digest; this one written by hand). */
const KEY = 'ab'.repeat(32);

describe('samples entries as columns', () => {
  it('computed samples of the synthetic set read back as JSON.parse of their canonical JSON, bit for bit, in half the text', () => {
    for (let i = 0; i < 12; i++) {
      const s = syntheticSpecies(1, i);
      const species = validateSpecies(parseYamlText(s.yaml, `${s.name}.yaml`).documents[0]!).species!;
      const plan = planSpecies(species, SETTINGS);
      const value = canonicalCopy(computeSamples(species, { standardPressure: 1e5 }, plan.sampleTemperatures, plan.zoneTemperatures));
      const plain = JSON.stringify(value);
      const text = encodeSampleEntry(value);
      expect(text).toContain('$qforge-f64-columns');
      expect(text.length).toBeLessThan(0.7 * plain.length);
      expect(bitsDeep(decodeSampleEntry(text)), s.name).toStrictEqual(bitsDeep(JSON.parse(plain)));
    }
  });

  it('lists that are not plain finite samples in key order stay plain JSON and read back alike', () => {
    const odd = [
      { samples: [{ T: 200, cpR: -0, hRT: 1, sR: 2 }], extrapolationSamples: [] },
      { samples: [{ T: 200, cpR: 1, hRT: 1, sR: 2, extra: 1 }] },
      { samples: [{ cpR: 1, T: 200, hRT: 1, sR: 2 }] },
      { samples: [{ T: 200, cpR: Number.NaN, hRT: 1, sR: 2 }] },
      { samples: 'not a list', extrapolationSamples: [{ T: 6100, cpR: 4, hRT: 5, sR: 6 }] },
      [1, 2],
      null,
    ];
    for (const v of odd) {
      const text = encodeSampleEntry(v);
      expect(bitsDeep(decodeSampleEntry(text))).toStrictEqual(bitsDeep(JSON.parse(JSON.stringify(v))));
    }
    // Only the list that is plain is encoded.
    expect(encodeSampleEntry(odd[4])).toBe('{"samples":"not a list","extrapolationSamples":{"$qforge-f64-columns":"' + Buffer.from(new Float64Array([6100, 4, 5, 6]).buffer).toString('base64') + '"}}');
  });

  it('a malformed column string is a corrupt entry: recomputed, and reported so', async () => {
    for (const bad of ['"AAAA"', '"not base64!"', '{"$qforge-f64-columns":"AAAA","x":1}', '12']) {
      expect(() => decodeSampleEntry(`{"samples":{"$qforge-f64-columns":${bad}}}`)).toThrow(/malformed sample columns/);
    }
    const dir = await mkdtemp(path.join(tmpdir(), 'qforge-sample-columns-'));
    try {
      const cache = new StageCache(dir);
      await cache.putText('samples', KEY, '{"samples":{"$qforge-f64-columns":"AAAA"}}');
      const codec = { encode: encodeSampleEntry, decode: decodeSampleEntry };
      const r = await cached(cache, 'samples', KEY, () => ({ samples: [{ T: 300, cpR: 3.5, hRT: 1, sR: 20 }] }), { codec });
      expect(r.outcome).toBe('corrupt');
      expect(r.value.samples[0]!.cpR).toBe(3.5);
      const again = await cached(cache, 'samples', KEY, () => ({ samples: [] as unknown[] }), { codec });
      expect(again.outcome).toBe('hit');
      expect(again.value).toEqual({ samples: [{ T: 300, cpR: 3.5, hRT: 1, sR: 20 }] });
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  });

  it('a build that takes its samples from the cache (a fit setting changed) writes what a build without a cache writes', async () => {
    const ws = await tempWorkspace();
    try {
      const cacheDir = path.join(ws.root, 'cache');
      expect((await runCli(['build', 'db', '--out', 'out', '--cache-dir', cacheDir, '-q'], ws.root)).code).toBe(0);
      const settings = path.join(ws.db, 'qforge.yaml');
      await writeFile(settings, (await readFile(settings, 'utf8')).replace('weights: {cp: 1, h: 1, s: 1}', 'weights: {cp: 1, h: 2, s: 1}'));
      const warm = await runCli(['build', 'db', '--out', 'out', '--cache-dir', cacheDir, '--json', '-q'], ws.root);
      for (const sp of JSON.parse(warm.stdout).species) expect(sp.cache.samples).toBe('hit');
      expect((await runCli(['build', 'db', '--out', 'fresh', '--no-cache', '-q'], ws.root)).code).toBe(0);
      expect(await deterministicOutputs(path.join(ws.root, 'out'))).toEqual(await deterministicOutputs(path.join(ws.root, 'fresh')));
    } finally {
      await ws.cleanup();
    }
  });
});
