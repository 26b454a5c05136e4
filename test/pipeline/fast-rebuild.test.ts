/**
 * The no-change fast path of `qforge build` (pipeline/storage/fast-entries.ts): a rebuild with nothing
 * changed takes every species whole from its result entry and every file's check from its file entry,
 * and writes the same bytes as a cold build and as a --no-cache build; a changed file, setting, geometry
 * file, strict policy or code misses; a corrupt entry is rejected with a note and recomputed; duplicate
 * names across files are still found on a rebuild; `qforge cache prune` keeps the entries in use.
 * Holds no reference values (no source to name): every comparison is between builds of our own code, on
 * the test fixture databases; the edits below (a comment, a title, a coordinate) are written by hand.
 */
import { execFileSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { cp, mkdtemp, readdir, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { Ajv2020 } from 'ajv/dist/2020.js';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import databaseSchema from '../../schemas/database.schema.json' with { type: 'json' };
import settingsSchema from '../../schemas/settings.schema.json' with { type: 'json' };
import summarySchema from '../../schemas/summary.schema.json' with { type: 'json' };
import { codeFingerprint, useCodeFingerprint } from '../../pipeline/storage/code-fingerprint.js';
import { decodeEntry, encodeEntry } from '../../pipeline/storage/fast-entries.js';
import { deterministicOutputs, FIXTURE_DB, readJson, REPO, runCli } from './helpers.js';

let root: string;
beforeEach(async () => {
  root = await mkdtemp(path.join(tmpdir(), 'qforge-fast-'));
  await cp(FIXTURE_DB, path.join(root, 'db'), { recursive: true });
});
afterEach(async () => {
  await rm(root, { recursive: true, force: true });
});

interface SummaryEntry {
  name?: string;
  status: string;
  warnings: string[];
  errors: string[];
  cache: Record<string, string>;
  cache_hit: boolean;
  fit_metrics?: unknown;
}
interface Summary {
  counts: Record<string, number>;
  warnings: string[];
  species: SummaryEntry[];
  files: unknown[];
  status: string;
}

async function build(out: string, extra: string[] = [], db = 'db'): Promise<Summary> {
  const r = await runCli(['build', db, '--out', out, '--quiet', '-k', ...extra], root);
  expect(r.code, r.stderr).toBeLessThanOrEqual(1);
  return readJson<Summary>(path.join(root, out, 'summary.json'));
}

/** The summary without what differs between a cold build, a rebuild and a --no-cache build. */
function comparable(s: Summary): unknown {
  const copy = JSON.parse(JSON.stringify(s)) as Record<string, any>;
  delete copy.timings_ms;
  delete copy.counts.cache_hits;
  for (const x of copy.species as Array<Record<string, unknown>>) {
    delete x.timings_ms;
    delete x.cache;
    delete x.cache_hit;
  }
  return copy;
}

const resultOutcomes = (s: Summary) => Object.fromEntries(s.species.map((x) => [x.name, x.cache.result]));

async function entryFiles(cacheDir: string, kind: string): Promise<string[]> {
  const out: string[] = [];
  for (const sub of await readdir(path.join(cacheDir, kind)).catch(() => [])) for (const f of await readdir(path.join(cacheDir, kind, sub))) out.push(path.join(cacheDir, kind, sub, f));
  return out.sort();
}

describe('no-change rebuild fast path', () => {
  it('cold build, rebuild from the cache and --no-cache build write the same bytes; the rebuild takes every species whole', async () => {
    const cold = await build('cold');
    expect(Object.values(resultOutcomes(cold)).every((o) => o === 'miss')).toBe(true);
    const warm = await build('cold');
    expect(resultOutcomes(warm)).toEqual(Object.fromEntries(warm.species.map((x) => [x.name, 'hit'])));
    expect(warm.species.every((x) => x.cache_hit)).toBe(true);
    expect(warm.counts.cache_hits).toBe(warm.species.length);
    await build('again');
    const none = await build('none', ['--no-cache']);
    expect(none.species.every((x) => x.cache.result === undefined)).toBe(true);
    const a = await deterministicOutputs(path.join(root, 'cold'));
    expect(a.size).toBeGreaterThan(3);
    expect(await deterministicOutputs(path.join(root, 'again'))).toEqual(a);
    expect(await deterministicOutputs(path.join(root, 'none'))).toEqual(a);
    expect(comparable(warm)).toEqual(comparable(cold));
    expect(comparable(none)).toEqual(comparable(cold));
  }, 180_000);

  it('a no-change rebuild loads neither the yaml library nor ajv\'s schema compiler (core/lazy-libraries.ts)', async () => {
    expect(existsSync(path.join(REPO, 'dist/pipeline/cli.js'))).toBe(true);
    // A fresh process per build (this one has both loaded) reports which of the two its build required;
    // `preload` requires both first, to show the probe sees them.
    const probe = (preload: boolean) =>
      [
        "import { createRequire } from 'node:module';",
        'const require = createRequire(import.meta.url);',
        preload ? "require('yaml'); require('ajv/dist/2020.js');" : '',
        `const { main } = await import(${JSON.stringify(pathToFileURL(path.join(REPO, 'dist/pipeline/cli.js')).href)});`,
        "const code = await main(['build', 'db', '--out', 'out', '-q']);",
        'const loaded = Object.keys(require.cache);',
        "process.stdout.write(JSON.stringify({ code, yaml: loaded.some((f) => /[\\/]node_modules[\\/]yaml[\\/]/.test(f)), ajv: loaded.some((f) => /[\\/]ajv[\\/]dist[\\/]2020\\.js$/.test(f)) }));",
      ].join('\n');
    const run = (preload = false) =>
      JSON.parse(execFileSync(process.execPath, ['--input-type=module', '-e', probe(preload)], { cwd: root, encoding: 'utf8', env: { ...process.env, NODE_PATH: path.join(REPO, 'node_modules') } })) as { code: number };
    expect(run().code).toBe(0); // cold: fills the cache
    expect(run()).toEqual({ code: 0, yaml: false, ajv: false });
    expect(run(true)).toEqual({ code: 0, yaml: true, ajv: true });
  }, 120_000);

  it('a changed file misses for its species only; settings, --strict and code changes miss for all', async () => {
    await build('out');
    const co = path.join(root, 'db', 'CO.yaml');
    // A comment changes the bytes, not the normalised input: the stage entries still hit.
    await writeFile(co, `${await readFile(co, 'utf8')}\n# edited by the fast-path test\n`);
    const s1 = await build('out');
    expect(resultOutcomes(s1)).toEqual({ Ar: 'hit', CO: 'miss', H2O: 'hit', N2: 'hit', O: 'hit' });
    expect(s1.species.find((x) => x.name === 'CO')!.cache.fit).toBe('hit');

    const settings = path.join(root, 'db', 'qforge.yaml');
    await writeFile(settings, (await readFile(settings, 'utf8')).replace('title: qforge pipeline test fixture', 'title: qforge pipeline test fixture, edited'));
    const s2 = await build('out');
    expect(Object.values(resultOutcomes(s2)).every((o) => o === 'miss')).toBe(true);

    const s3 = await build('out', ['--strict']);
    expect(s3.species.every((x) => x.cache.result !== 'hit')).toBe(true);

    const fingerprint = codeFingerprint();
    try {
      useCodeFingerprint('0'.repeat(64));
      const s4 = await build('out');
      expect(Object.values(resultOutcomes(s4)).every((o) => o === 'miss')).toBe(true);
    } finally {
      useCodeFingerprint(fingerprint);
    }
    expect(Object.values(resultOutcomes(await build('out'))).every((o) => o === 'hit')).toBe(true);
  }, 240_000);

  it('a changed geometry file misses for the species that reads it', async () => {
    await cp(path.join(REPO, 'test/fixtures/db-geometry'), path.join(root, 'geo'), { recursive: true });
    const first = await build('out-geo', [], 'geo');
    expect(first.status).not.toBe('failed');
    expect(Object.values(resultOutcomes(await build('out-geo', [], 'geo'))).every((o) => o === 'hit')).toBe(true);
    const xyz = path.join(root, 'geo', 'CH3OH.xyz');
    await writeFile(xyz, (await readFile(xyz, 'utf8')).replace('O 0.000000 0.000000 1.424600', 'O 0.000000 0.000000 1.425600'));
    const s = await build('out-geo', [], 'geo');
    const outcomes = resultOutcomes(s);
    expect(outcomes.CH3OH).toBe('miss');
    expect(Object.entries(outcomes).filter(([n]) => n !== 'CH3OH').every(([, o]) => o === 'hit')).toBe(true);
  }, 240_000);

  it('a corrupt result or file entry is rejected with a note, recomputed, and the outputs stay the same', async () => {
    await build('out');
    const before = await deterministicOutputs(path.join(root, 'out'));
    const cacheDir = path.join(root, 'db', '.qforge-cache');
    const results = await entryFiles(cacheDir, 'result');
    const files = await entryFiles(cacheDir, 'file');
    expect(results.length).toBe(5);
    expect(files.length).toBe(5);
    const r0 = await readFile(results[0]!, 'utf8');
    await writeFile(results[0]!, `${r0} `);
    const f0 = await readFile(files[0]!, 'utf8');
    await writeFile(files[0]!, f0.slice(0, f0.length - 3));
    // Without the build pack (which holds the same findings and would be read instead; its own rejection
    // is tested in storage/build-pack.test.ts), the rebuild reads the entries themselves.
    await rm(path.join(cacheDir, 'pack'), { recursive: true, force: true });
    const s = await build('out');
    expect(s.warnings.filter((w) => /cache entry for result rejected \(checksum mismatch\); recomputed/.test(w))).toHaveLength(1);
    expect(s.warnings.filter((w) => /cache entry for file rejected \(checksum mismatch\); checked again/.test(w))).toHaveLength(1);
    expect(Object.values(resultOutcomes(s)).filter((o) => o === 'corrupt')).toHaveLength(1);
    expect(await deterministicOutputs(path.join(root, 'out'))).toEqual(before);
    // Rewritten: the next rebuild hits everywhere again.
    const again = await build('out');
    expect(Object.values(resultOutcomes(again)).every((o) => o === 'hit')).toBe(true);
    expect(again.warnings).toEqual([]);
  }, 180_000);

  it('duplicate names across files are found on every build, also when both files come from the cache', async () => {
    await writeFile(path.join(root, 'db', 'CO-copy.yaml'), await readFile(path.join(root, 'db', 'CO.yaml'), 'utf8'));
    const cold = await runCli(['build', 'db', '--out', 'out', '--quiet', '-k'], root);
    const warm = await runCli(['build', 'db', '--out', 'out', '--quiet', '-k'], root);
    expect(cold.code).toBe(1);
    expect(warm.code).toBe(1);
    expect(cold.stderr).toMatch(/duplicate species name 'CO'/);
    expect(warm.stderr.replace(' (replaced as a whole)', '')).toBe(cold.stderr);
    const s = await readJson<Summary>(path.join(root, 'out', 'summary.json'));
    expect(s.species.filter((x) => x.name === 'CO').map((x) => x.status).sort()).toEqual(['failed', 'ok']);
    // The first use (CO-copy.yaml sorts before CO.yaml) goes: CO.yaml, unchanged and checked from the
    // cache, is now the one CO.
    await rm(path.join(root, 'db', 'CO-copy.yaml'));
    const s2 = await build('out');
    expect(s2.status).toBe('ok');
    expect(s2.species.filter((x) => x.name === 'CO').map((x) => x.status)).toEqual(['ok']);
  }, 180_000);

  it('qforge cache prune keeps the file and result entries the current species use', async () => {
    await build('out');
    const cacheDir = path.join(root, 'db', '.qforge-cache');
    const r = await runCli(['cache', 'prune', 'db', '--json'], root);
    expect(r.code, r.stderr).toBe(0);
    expect(JSON.parse(r.stdout).removed).toBe(0);
    expect(await entryFiles(cacheDir, 'result')).toHaveLength(5);
    expect(Object.values(resultOutcomes(await build('out'))).every((o) => o === 'hit')).toBe(true);
  }, 180_000);
});

describe('fast-path entries and schemas', () => {
  it('entry JSON keeps non-finite numbers a diagnostic may quote', () => {
    const v = { value: [NaN, Infinity, -Infinity, 1.5], message: 'got NaN' };
    const back = decodeEntry<typeof v>(encodeEntry(v));
    expect(back.value[0]).toBeNaN();
    expect(back.value.slice(1)).toEqual([Infinity, -Infinity, 1.5]);
    expect(back.message).toBe('got NaN');
  });

  it('the output schemas are valid against their meta-schema (emit compiles them without that check)', () => {
    const ajv = new Ajv2020({ allErrors: true, strict: false, validateSchema: true });
    ajv.addSchema(settingsSchema);
    expect(ajv.validateSchema(databaseSchema)).toBe(true);
    expect(ajv.validateSchema(summarySchema)).toBe(true);
    expect(() => ajv.compile(databaseSchema)).not.toThrow();
    expect(() => ajv.compile(summarySchema)).not.toThrow();
  });
});
