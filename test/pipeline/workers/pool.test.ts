/**
 * The species worker pool (pipeline/workers/pool.ts): outputs byte-identical whatever --jobs, on the demo
 * database and the fixture database, and a worker that dies fails only its own batch with a clear error
 * instead of hanging the build; files checked on the workers give the findings of files checked here. Workers run the compiled dist/ code (`npm test` builds it first). Holds no
 * reference values (no source to name): the comparisons are between builds of our own code.
 */
import { cp, mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { checkDatabase, buildOneSpecies } from '../../../pipeline/runner.js';
import { batchesOf, createSpeciesPool } from '../../../pipeline/workers/pool.js';
import { StageCache } from '../../../pipeline/storage/cache.js';
import { checkFileBytes, checkPolicy } from '../../../pipeline/stages/check-file.js';
import { renderTable } from '../../../pipeline/stages/emit.js';
import { deterministicOutputs, FIXTURE_DB, REPO, runCli } from '../helpers.js';
import { h2oInput } from '../../support/h2o-input.js';

let root: string;
beforeAll(async () => {
  root = await mkdtemp(path.join(tmpdir(), 'qforge-pool-'));
  await cp(path.join(REPO, 'species'), path.join(root, 'demo'), { recursive: true });
  await cp(FIXTURE_DB, path.join(root, 'fx'), { recursive: true });
});
afterAll(async () => {
  await rm(root, { recursive: true, force: true });
});

/** A two-worker pool over the fixture database (no cache); `extra` goes into the workers' init. */
async function fixturePool(extra: { testCrashOn?: string; keepSamples?: boolean }, shareThisThread = false) {
  const check = await checkDatabase({ dir: path.join(root, 'fx') });
  const cache = new StageCache(undefined);
  const pool = createSpeciesPool({
    jobs: 2,
    init: { settings: check.settings, limits: { setAt: {} }, cacheDir: undefined, codeFingerprint: 'test', ...extra },
    inline: (v) => buildOneSpecies(v, check.settings, cache, check),
    inlineCheck: (file, bytes, keep) => checkFileBytes(bytes, file, checkPolicy(check.settings, false), keep),
    crashed: (v, reason) => ({ valid: v, diagnostics: [{ severity: 'error', file: v.displayFile, path: '', message: reason }], cache: {}, cacheNotes: [], timings: {} }),
    shareThisThread,
  });
  return { check, cache, pool };
}

describe('worker pool', () => {
  it('--jobs 1, 2 and 3 write the same bytes (demo and fixture databases)', async () => {
    for (const db of ['demo', 'fx']) {
      const outputs: Array<Awaited<ReturnType<typeof deterministicOutputs>>> = [];
      for (const jobs of ['1', '2', '3']) {
        const r = await runCli(['build', db, '--out', `${db}-${jobs}`, '--no-cache', '--jobs', jobs, '--quiet'], root);
        expect(r.code, r.stderr).toBe(0);
        outputs.push(await deterministicOutputs(path.join(root, `${db}-${jobs}`)));
      }
      expect(outputs[1]).toEqual(outputs[0]);
      expect(outputs[2]).toEqual(outputs[0]);
    }
  }, 240_000);

  it('batches are deterministic and cover every species once, in order', () => {
    const items = Array.from({ length: 101 }, (_, i) => i);
    for (const jobs of [1, 2, 3, 8]) {
      const b = batchesOf(items, jobs);
      expect(b.flat()).toEqual(items);
      expect(batchesOf(items, jobs)).toEqual(b);
    }
    // 2,000 species on two threads: batches of 32, then the last 272 (at least 8 · 32) in batches of 8.
    const many = Array.from({ length: 2000 }, (_, i) => i);
    const sizes = batchesOf(many, 2).map((x) => x.length);
    expect(batchesOf(many, 2).flat()).toEqual(many);
    expect(sizes).toEqual([...Array(54).fill(32), ...Array(34).fill(8)]);
  });

  it('a crashing worker fails its batch with a clear error and the pool goes on (no hang)', async () => {
    const { check, pool } = await fixturePool({ testCrashOn: 'CO' });
    try {
      const batches = check.species.map((v) => [v]);
      const results = (await Promise.all(batches.map((b) => pool.run(b)))).flat();
      expect(results.map((o) => o.valid.name)).toEqual(check.species.map((v) => v.name));
      const co = results.find((o) => o.valid.name === 'CO')!;
      expect(co.built).toBeUndefined();
      expect(co.diagnostics[0]!.message).toMatch(/worker thread exited with code 70/);
      for (const o of results.filter((x) => x.valid.name !== 'CO')) expect(o.built, o.valid.name).toBeDefined();
    } finally {
      await pool.close();
    }
  }, 120_000);

  it('a worker that dies during a file check hands the check to this thread: the same findings, no hang', async () => {
    const { check, pool } = await fixturePool({ testCrashOn: 'CO' });
    try {
      const policy = checkPolicy(check.settings, false);
      for (const name of ['CO', 'N2']) {
        const file = path.join(root, 'fx', `${name}.yaml`);
        const bytes = await readFile(file);
        const [there, here] = [await pool.checkFile(file, bytes, 'objects'), await checkFileBytes(bytes, file, policy, 'objects')];
        expect(there.facts, name).toEqual(here.facts);
        expect(there.kept, name).toEqual(here.kept);
        expect(there.kept[0], name).toBeDefined();
      }
    } finally {
      await pool.close();
    }
  }, 120_000);

  it('sharing this thread: jobs 2 starts one worker and builds a batch here while it is busy', async () => {
    // The worker would exit on CO; the second batch, CO's, is built on this thread, so nothing crashes.
    const { check, pool } = await fixturePool({ testCrashOn: 'CO' }, true);
    try {
      const co = check.species.findIndex((v) => v.name === 'CO');
      const others = check.species.filter((_, i) => i !== co);
      const results = (await Promise.all([pool.run(others), pool.run([check.species[co]!])])).flat();
      expect(results.map((o) => o.valid.name)).toEqual([...others, check.species[co]!].map((v) => v.name));
      for (const o of results) expect(o.built, o.valid.name).toBeDefined();
    } finally {
      await pool.close();
    }
  }, 120_000);

  it('with the report, the sample points come back from the workers: report.html is the same for --jobs 1 and 2', async () => {
    const pages: Array<Awaited<ReturnType<typeof deterministicOutputs>>> = [];
    for (const jobs of ['1', '2']) {
      const r = await runCli(['build', 'demo', '--out', `demo-report-${jobs}`, '--no-cache', '--jobs', jobs, '--quiet', '--report'], root);
      expect(r.code, r.stderr).toBe(0);
      pages.push(await deterministicOutputs(path.join(root, `demo-report-${jobs}`)));
    }
    expect(pages[0]!.has('report.html')).toBe(true);
    expect(pages[1]).toEqual(pages[0]);
  }, 240_000);

  it('without the report, a worker drops the sample points from its reply (the outputs above do not need them)', async () => {
    const { check, pool } = await fixturePool({});
    try {
      const [o] = await pool.run([check.species[0]!]);
      expect(o!.built).toBeDefined();
      expect(o!.built!.computed.samples).toEqual([]);
      expect(o!.built!.fit.polynomial.tMid).toBeGreaterThan(0);
    } finally {
      await pool.close();
    }
  }, 120_000);

  it('a species built in a worker carries the extrapolation-zone points the verify stage checked, as inline', async () => {
    const { check, cache, pool } = await fixturePool({ keepSamples: true });
    try {
      const results = (await Promise.all(check.species.map((v) => pool.run([v])))).flat();
      for (const [i, o] of results.entries()) {
        const inline = await buildOneSpecies(check.species[i]!, check.settings, cache, check);
        const zone = o.built?.computed.extrapolationSamples;
        expect(zone?.length, o.valid.name).toBeGreaterThan(0);
        expect(zone).toEqual(inline.built!.computed.extrapolationSamples);
      }
    } finally {
      await pool.close();
    }
  }, 120_000);

  it('a worker sends the table as text (what emit renders from the points): otherwise the outcome is the inline one', async () => {
    const { check, cache, pool } = await fixturePool({ keepSamples: true });
    try {
      const results = (await Promise.all(check.species.map((v) => pool.run([v])))).flat();
      let tables = 0;
      for (const [i, o] of results.entries()) {
        const v = check.species[i]!;
        const inline = await buildOneSpecies(v, check.settings, cache, check);
        if (!inline.built) {
          expect(o.built).toBeUndefined();
          expect(o.diagnostics).toEqual(inline.diagnostics);
          continue;
        }
        expect(o.built!.tableText).toBe(renderTable(inline.built));
        expect(o.built!.table).toEqual([]);
        tables++;
        const { tableText: _t, table: _p, ...rest } = o.built!;
        const { table: _q, ...own } = inline.built;
        expect(rest).toEqual(own);
      }
      expect(tables).toBeGreaterThan(3);
    } finally {
      await pool.close();
    }
  }, 120_000);

  it('files checked on the workers give the same findings, messages and outputs as checked here', async () => {
    // The fixture database with inputs written by hand for this test: a warning accepted in the settings, an
    // acceptance no file uses, a schema error, a duplicate key (checked, never built), a duplicate name, and
    // two documents in one file.
    const db = path.join(root, 'mixed');
    await cp(FIXTURE_DB, db, { recursive: true });
    const settings = path.join(db, 'qforge.yaml');
    await writeFile(
      settings,
      `${await readFile(settings, 'utf8')}accepted_warnings:\n  - {code: mode-count, species: XH2O, reason: "written for a test: one mode left out on purpose"}\n  - {code: no-such-warning, reason: "written for a test: never drawn by any file"}\n`,
    );
    await writeFile(path.join(db, 'few.yaml'), h2oInput({ 8: 'vibrations: [3657.05, 1594.75]' }));
    const atom = (name: string, extra = '') => `name: ${name}\ncomposition: {He: 1}\nenthalpy_of_formation: 0\nsources: ["written for a test"]\nstructure: atom\n${extra}`;
    await writeFile(path.join(db, 'bad.yaml'), atom('Xbad', 'symmetry_number: -3\n'));
    await writeFile(path.join(db, 'dupkey.yaml'), atom('Xdup', 'structure: atom\n'));
    await writeFile(path.join(db, 'twice.yaml'), `${atom('Xtwo')}---\n${atom('Xthree')}`);
    await writeFile(path.join(db, 'again.yaml'), atom('Xtwo'));
    const runs = [];
    for (const jobs of ['1', '2', '3']) {
      // A database this small is checked on the main thread by default (workers/auto-threads.ts
      // checkOnThreads): the test hook sends its files to the workers as a large database's are.
      const r = await runCli(['build', 'mixed', '--out', `mixed-${jobs}`, '--no-cache', '--keep-going', '--json', '--jobs', jobs], root, { QFORGE_TEST: '1', QFORGE_TEST_CHECK_ON_THREADS: '1' });
      expect(r.code, r.stderr).toBe(1);
      const summary = JSON.parse(r.stdout);
      delete summary.timings_ms;
      for (const sp of summary.species) delete sp.timings_ms;
      runs.push({ stderr: r.stderr.split('\n').filter((l) => !l.startsWith('qforge:')), summary, outputs: await deterministicOutputs(path.join(root, `mixed-${jobs}`)) });
    }
    expect(runs[0]!.stderr.join('\n')).toMatch(/bad\.yaml:\d+:\d+: error: .*symmetry_number/);
    expect(runs[0]!.stderr.join('\n')).toMatch(/dupkey\.yaml:\d+:\d+: error: .*[Dd]uplicate/);
    expect(runs[0]!.stderr.join('\n')).toMatch(/no-such-warning.*no longer occurs/);
    expect(runs[0]!.summary.species.map((sp: { name: string }) => sp.name)).toContain('XH2O');
    for (const r of runs.slice(1)) {
      expect(r.stderr).toEqual(runs[0]!.stderr);
      expect(r.summary).toEqual(runs[0]!.summary);
      expect(r.outputs).toEqual(runs[0]!.outputs);
    }
  }, 240_000);
});
