/**
 * End-to-end builds of the fixture database (test/fixtures/db: Ar, O, N2, CO, H2O with sources named in
 * each file): outputs, schema validity, caching, determinism, incremental rebuilds and diff.
 */
import { readdir, readFile, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { Ajv2020 } from 'ajv/dist/2020.js';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import databaseSchema from '../../schemas/database.schema.json' with { type: 'json' };
import settingsSchema from '../../schemas/settings.schema.json' with { type: 'json' };
import summarySchema from '../../schemas/summary.schema.json' with { type: 'json' };
import { evaluateNasa7, evaluateRange } from '../../src/nasa7/evaluate.js';
import { parseNasa7File } from '../../src/nasa7/parse.js';
import type { Nasa7Polynomial } from '../../src/nasa7/types.js';
import { deterministicOutputs, hashFolder, readJson, runCli, tempWorkspace } from './helpers.js';

const SPECIES = ['Ar', 'CO', 'H2O', 'N2', 'O'];

let ws: Awaited<ReturnType<typeof tempWorkspace>>;
beforeEach(async () => {
  ws = await tempWorkspace();
});
afterEach(async () => {
  await ws.cleanup();
});

const build = (...extra: string[]) => runCli(['build', 'db', '--out', 'out', ...extra], ws.root);

describe('qforge build of the fixture database', () => {
  it('writes thermo.json, nasa7.txt, tables and summary.json that match their schemas', async () => {
    const r = await build();
    expect(r.stderr).toContain('built 5 species');
    expect(r.code).toBe(0);
    const names = (await readdir(ws.out)).sort();
    expect(names).toEqual(['.qforge-build', 'nasa7.txt', 'summary.json', 'tables', 'thermo.json']);
    expect((await readdir(path.join(ws.out, 'tables'))).sort()).toEqual([...SPECIES.map((s) => `${s}.csv`), 'README.txt']);
    // The tables carry the caution beside them (inside a CSV it would break the header line).
    expect(await readFile(path.join(ws.out, 'tables/README.txt'), 'utf8')).toMatch(/CAUTION: these polynomials are valid only inside/);

    const ajv = new Ajv2020({ allErrors: true, strict: false });
    ajv.addSchema(settingsSchema);
    const db = await readJson(path.join(ws.out, 'thermo.json'));
    expect(ajv.validate(databaseSchema, db), JSON.stringify(ajv.errors)).toBe(true);
    const summary = await readJson(path.join(ws.out, 'summary.json'));
    expect(ajv.validate(summarySchema, summary), JSON.stringify(ajv.errors)).toBe(true);

    expect(db.species.map((s: { name: string }) => s.name)).toEqual(SPECIES);
    expect(db.caution).toMatch(/valid only inside/);
    expect(db.constants_edition).toBe('CODATA 2018');
    expect(db.build_settings.record_identifier).toBe('QFTEST');
    const n2 = db.species.find((s: { name: string }) => s.name === 'N2');
    expect(n2.input_hash).toMatch(/^sha256:[0-9a-f]{64}$/);
    expect(n2.sources.join(' ')).toMatch(/Huber & Herzberg/);
    // NIST-JANAF 4th ed. table N-023: S°(298.15) = 191.609 J/(mol K), Cp° = 29.124 J/(mol K).
    expect(n2.at_298_15.entropy_j_per_mol_k).toBeCloseTo(191.609, 1);
    expect(n2.at_298_15.heat_capacity_j_per_mol_k).toBeCloseTo(29.124, 1);
    expect(summary.species.every((s: { status: string; cache_hit: boolean }) => s.status === 'ok' && !s.cache_hit)).toBe(true);
    expect(summary.species[0].timings_ms).toHaveProperty('fit');

    const nasa = await readFile(path.join(ws.out, 'nasa7.txt'), 'utf8');
    expect(nasa.split('\n')[0]).toMatch(/^! /);
    expect(nasa).toMatch(/CAUTION/);
    const parsed = parseNasa7File(nasa, 'nasa7.txt');
    expect(parsed.errors).toEqual([]);
    expect(parsed.records.map((r) => r.name)).toEqual(SPECIES);
    expect(parsed.records.every((r) => r.identifier === 'QFTEST')).toBe(true);

    const csv = (await readFile(path.join(ws.out, 'tables/N2.csv'), 'utf8')).split('\n');
    expect(csv[0]).toBe(
      'T [K],Cp computed [J/(mol K)],Cp fitted [J/(mol K)],Cp fitted-computed [J/(mol K)],S computed [J/(mol K)],S fitted [J/(mol K)],S fitted-computed [J/(mol K)],H-H298 computed [kJ/mol],H-H298 fitted [kJ/mol],H-H298 fitted-computed [kJ/mol],H computed [kJ/mol],H fitted [kJ/mol],H fitted-computed [kJ/mol],G computed [kJ/mol],G fitted [kJ/mol],G fitted-computed [kJ/mol]',
    );
    expect(csv[2]!.startsWith('298.15,')).toBe(true);
  });

  it('nasa7.txt read back stays continuous at T_mid (< 1e-7) and agrees with thermo.json to 1e-7 relative', async () => {
    // Continuity and round-trip bounds from issue 3; the layout is the NASA 4-line record (McBride, Gordon &
    // Reno 1993, NASA TM-4513), which holds 9 significant digits per coefficient.
    expect((await build()).code).toBe(0);
    const db = await readJson(path.join(ws.out, 'thermo.json'));
    const parsed = parseNasa7File(await readFile(path.join(ws.out, 'nasa7.txt'), 'utf8'), 'nasa7.txt');
    expect(parsed.errors).toEqual([]);
    for (const rec of parsed.records) {
      const p = rec.polynomial;
      const lo = evaluateRange(p.low, p.tMid);
      const hi = evaluateRange(p.high, p.tMid);
      expect(Math.abs(lo.cpR - hi.cpR)).toBeLessThan(1e-7);
      expect(Math.abs(lo.hRT - hi.hRT)).toBeLessThan(1e-7);
      expect(Math.abs(lo.sR - hi.sR)).toBeLessThan(1e-7);
      const inJson = db.species.find((s: { name: string }) => s.name === rec.name);
      const exact = {
        ...p,
        low: inJson.coefficients.low,
        high: inJson.coefficients.high,
      } as Nasa7Polynomial;
      for (const T of [200, 298.15, 700, 1000, 1500, 3000, 6000]) {
        const a = evaluateNasa7(p, T);
        const b = evaluateNasa7(exact, T);
        for (const k of ['cpR', 'hRT', 'sR'] as const) {
          expect(Math.abs(a[k] - b[k])).toBeLessThan(1e-7 * Math.max(1, Math.abs(b[k])));
        }
      }
    }
  });

  it('a rebuild with nothing changed takes every species from the cache and gives byte-identical outputs', async () => {
    expect((await build()).code).toBe(0);
    const first = await deterministicOutputs(ws.out);
    const r = await build('--json', '--quiet');
    expect(r.code).toBe(0);
    const summary = JSON.parse(r.stdout);
    expect(summary.counts.cache_hits).toBe(5);
    expect(summary.species.every((s: { cache_hit: boolean }) => s.cache_hit)).toBe(true);
    expect(await deterministicOutputs(ws.out)).toEqual(first);
  });

  it('concurrency, cache use and order of completion do not change a byte', async () => {
    expect((await build('--jobs', '1', '--no-cache')).code).toBe(0);
    const serial = await deterministicOutputs(ws.out);
    expect((await build('--jobs', '8')).code).toBe(0);
    expect(await deterministicOutputs(ws.out)).toEqual(serial);
    expect((await build('--jobs', '3')).code).toBe(0);
    expect(await deterministicOutputs(ws.out)).toEqual(serial);
  });

  it('changing one species recomputes only it, and diff reports exactly that species', async () => {
    expect((await build()).code).toBe(0);
    await runCli(['build', 'db', '--out', 'before', '--quiet'], ws.root);
    const file = path.join(ws.db, 'CO.yaml');
    // A slightly different harmonic constant (a "revised constants" scenario; the value is invented).
    await writeFile(file, (await readFile(file, 'utf8')).replace('we: 2169.81358', 'we: 2171.0'));
    const r = await build('--json', '--quiet');
    expect(r.code).toBe(0);
    const summary = JSON.parse(r.stdout);
    const recomputed = summary.species.filter((s: { cache_hit: boolean }) => !s.cache_hit).map((s: { name: string }) => s.name);
    expect(recomputed).toEqual(['CO']);

    const d = await runCli(['diff', 'before', 'out', '--json'], ws.root);
    expect(d.code).toBe(0);
    const report = JSON.parse(d.stdout);
    expect(report.added).toEqual([]);
    expect(report.removed).toEqual([]);
    expect(report.changed.map((c: { name: string }) => c.name)).toEqual(['CO']);
    expect(report.changed[0].kind).toBe('properties');
    expect(report.changed[0].input_changed).toBe(true);
    expect(report.unchanged).toEqual(['Ar', 'H2O', 'N2', 'O']);
    expect(report.changed[0].at.map((a: { t: number }) => a.t)).toEqual([298.15, 1000]);
    // Exactly the field that was edited, old -> new in its normalised unit; nothing else moved.
    expect(report.changed[0].input_changes).toEqual([{ path: 'electronicStates[0].we', old: 2169.81358, new: 2171, unit: 'cm-1' }]);
    expect(report.settings_changes).toEqual([]);
    expect(report.code_changed).toBe(false);

    const text = await runCli(['diff', 'before', 'out'], ws.root);
    expect(text.stdout).toMatch(/~ CO: properties changed; input changed/);
    expect(text.stdout).toMatch(/ {4}CO: electronicStates\[0\]\.we 2169\.81358 → 2171 cm-1; Cp\(1000 K\) [+-]\d+\.\d{4} J\/\(mol K\)\n/);
    expect(text.stdout).toMatch(/max \|dCp\|/);
    // The CI gate: the change is far above 1e-6 J/(mol K) and far below 10 J/(mol K).
    expect((await runCli(['diff', 'before', 'out', '--fail-above', 'cp=1e-6'], ws.root)).code).toBe(1);
    expect((await runCli(['diff', 'before', 'out', '--fail-above', 'cp=10,h=10,s=10'], ws.root)).code).toBe(0);
    // An 80-column file against a build folder: only E15.8 rounding differs for the unchanged species.
    const vs80 = JSON.parse((await runCli(['diff', 'before/nasa7.txt', 'before', '--json'], ws.root)).stdout);
    expect(vs80.changed.every((c: { kind: string }) => c.kind === 'coefficients')).toBe(true);
  });

  it('a setting that only affects emission (the table grid) reuses every cached fit', async () => {
    expect((await build()).code).toBe(0);
    const settings = path.join(ws.db, 'qforge.yaml');
    await writeFile(settings, (await readFile(settings, 'utf8')).replace('step: 200, extra', 'step: 500, extra'));
    const s = JSON.parse((await build('--json', '--quiet')).stdout);
    for (const sp of s.species) {
      expect(sp.cache.samples).toBe('hit');
      expect(sp.cache.fit).toBe('hit');
      expect(sp.cache.table).toBe('miss');
    }
    // A fit setting invalidates the fits but not the computed samples.
    await writeFile(settings, (await readFile(settings, 'utf8')).replace('weights: {cp: 1, h: 1, s: 1}', 'weights: {cp: 1, h: 2, s: 1}'));
    const t = JSON.parse((await build('--json', '--quiet')).stdout);
    for (const sp of t.species) {
      expect(sp.cache.samples).toBe('hit');
      expect(sp.cache.fit).toBe('miss');
    }
  });

  it('optimise_mid and a per-species range override reach thermo.json, the tables and nasa7.txt', async () => {
    const settings = path.join(ws.db, 'qforge.yaml');
    await writeFile(settings, (await readFile(settings, 'utf8')).replace('  sampling_step: 20', '  sampling_step: 20\n  optimise_mid: {min: 800, max: 1600, step: 100}'));
    await writeFile(path.join(ws.db, 'Ar.yaml'), `${await readFile(path.join(ws.db, 'Ar.yaml'), 'utf8')}temperature_ranges: {low: 250, high: 5000}\n`);
    const r = await build();
    expect(r.code, r.stderr).toBe(0);
    const db = await readJson(path.join(ws.out, 'thermo.json'));
    const ar = db.species.find((s: { name: string }) => s.name === 'Ar');
    expect([ar.temperature_ranges.low, ar.temperature_ranges.high]).toEqual([250, 5000]);
    for (const s of db.species) expect(s.temperature_ranges.mid % 100).toBe(0);
    expect(db.species.some((s: { temperature_ranges: { mid: number } }) => s.temperature_ranges.mid !== 1000)).toBe(true);
    const csv = (await readFile(path.join(ws.out, 'tables/Ar.csv'), 'utf8')).trim().split('\n');
    expect(csv[1]!.split(',')[0]).toBe('298.15');
    expect(csv.at(-1)!.split(',')[0]).toBe('5000');
    const parsed = parseNasa7File(await readFile(path.join(ws.out, 'nasa7.txt'), 'utf8'), 'nasa7.txt');
    expect(parsed.records.find((x) => x.name === 'Ar')!.polynomial.tHigh).toBe(5000);
  });

  it('outputs settings choose the files; diff reads nasa7.txt when there is no thermo.json, and lists added/removed', async () => {
    expect((await runCli(['build', 'db', '--out', 'before', '--quiet'], ws.root)).code).toBe(0);
    const settings = path.join(ws.db, 'qforge.yaml');
    await writeFile(settings, `${await readFile(settings, 'utf8')}outputs: {thermo_json: false, tables: false}\n`);
    await writeFile(path.join(ws.db, 'Ar.yaml'), (await readFile(path.join(ws.db, 'Ar.yaml'), 'utf8')).replace('name: Ar', 'name: Ar2'));
    expect((await build()).code).toBe(0);
    expect((await readdir(ws.out)).sort()).toEqual(['.qforge-build', 'nasa7.txt', 'summary.json']);
    const d = await runCli(['diff', 'before', 'out', '--json'], ws.root);
    expect(d.code).toBe(0);
    const report = JSON.parse(d.stdout);
    expect(report.added).toEqual(['Ar2']);
    expect(report.removed).toEqual(['Ar']);
    // JSON coefficients against their E15.8 rounding: only the coefficients moved.
    expect(report.changed.every((c: { kind: string }) => c.kind === 'coefficients')).toBe(true);
    const gate = await runCli(['diff', 'before', 'out', '--fail-on-removed'], ws.root);
    expect(gate.code).toBe(1);
    expect(gate.stderr).toMatch(/Ar: removed/);
  });

  it('a corrupted or foreign cache entry is detected and recomputed, never trusted', async () => {
    expect((await build()).code).toBe(0);
    const good = await deterministicOutputs(ws.out);
    // The default cache lives inside the database folder (never shared by unrelated builds).
    const cacheRoot = path.join(ws.db, '.qforge-cache');
    const fitDir = path.join(cacheRoot, 'fit');
    const entries: string[] = [];
    for (const sub of await readdir(fitDir)) for (const f of await readdir(path.join(fitDir, sub))) entries.push(path.join(fitDir, sub, f));
    expect(entries.length).toBe(5);
    // 1: a truncated entry; 2: a payload edited without updating the checksum; 3: an entry copied under another key.
    await writeFile(entries[0]!, 'qforge-cache/2 fit');
    const e1 = await readFile(entries[1]!, 'utf8');
    await writeFile(entries[1]!, e1.replace(/"low":\[(-?)(\d)/, (_m, sign: string, d: string) => `"low":[${sign}${(Number(d) + 1) % 10}`));
    await writeFile(entries[2]!, await readFile(entries[3]!, 'utf8'));
    // Without the whole-species result entries (test/pipeline/fast-rebuild.test.ts) and the build pack that
    // holds the same results (test/pipeline/storage/build-pack.test.ts), so the fit entries are read.
    await rm(path.join(cacheRoot, 'result'), { recursive: true, force: true });
    await rm(path.join(cacheRoot, 'pack'), { recursive: true, force: true });
    const r = await build('--json', '--quiet');
    expect(r.code).toBe(0);
    const summary = JSON.parse(r.stdout);
    const corrupt = summary.species.filter((s: { cache: { fit: string } }) => s.cache.fit === 'corrupt');
    expect(corrupt.length).toBe(3);
    expect(corrupt.flatMap((s: { warnings: string[] }) => s.warnings).join('\n')).toMatch(/no entry header|checksum mismatch|different key/);
    // Also on the terminal (even with --quiet): one line per rejected entry, naming the species.
    const lines = r.stderr.split('\n').filter((l) => /^qforge: warning: \w+: cache entry for fit rejected \(.+\); recomputed$/.test(l));
    expect(lines).toHaveLength(3);
    for (const c of corrupt) expect(r.stderr).toContain(`warning: ${c.name}: cache entry for fit rejected`);
    expect(summary.warnings).toHaveLength(3);
    expect(await deterministicOutputs(ws.out)).toEqual(good);
    // Rewritten: the next build hits everywhere.
    const again = JSON.parse((await build('--json', '--quiet')).stdout);
    expect(again.counts.cache_hits).toBe(5);
  });

  it('--keep-going writes the good species, lists the failed ones (summary and CLI) and still exits 1', async () => {
    // Two invented documents: one with a name and an unknown element, one without a name.
    await writeFile(
      path.join(ws.db, 'bad.yaml'),
      'name: Bad\ncomposition: {Xx: 1}\nenthalpy_of_formation: 0\nsources: ["invented for a test"]\nstructure: atom\n---\ncomposition: {He: 1}\n',
    );
    const r = await build('--keep-going');
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/bad\.yaml:2/);
    expect(r.stderr).toMatch(/wrote 5 species into out; FAILED: Bad, bad\.yaml#2; 1 file\(s\) with errors/);
    expect(r.stderr).not.toMatch(/\(none\)/);
    const db = await readJson(path.join(ws.out, 'thermo.json'));
    expect(db.species.map((s: { name: string }) => s.name)).toEqual(SPECIES);
    const summary = await readJson(path.join(ws.out, 'summary.json'));
    const ajv = new Ajv2020({ allErrors: true, strict: false });
    expect(ajv.validate(summarySchema, summary), JSON.stringify(ajv.errors)).toBe(true);
    expect(summary.status).toBe('partial');
    expect(summary.counts).toMatchObject({ species: 7, ok: 5, failed: 2 });
    const failed = summary.species.filter((s: { status: string }) => s.status === 'failed');
    expect(failed.map((s: { name?: string; file: string; document: number }) => [s.name, s.file, s.document])).toEqual([
      ['Bad', 'bad.yaml', 1],
      [undefined, 'bad.yaml', 2],
    ]);
    expect(failed[0].errors.join('\n')).toMatch(/bad\.yaml:2:\d+: error: \[Bad\] composition\.Xx/);
    expect(failed[1].errors.join('\n')).toMatch(/missing required field 'name'/);
    expect(summary.files.map((f: { file: string }) => path.basename(f.file))).toEqual(['bad.yaml']);
    // A duplicate name: the second definition fails, with its file, in species[] and files[].
    await writeFile(path.join(ws.db, 'zz.yaml'), await readFile(path.join(ws.db, 'Ar.yaml'), 'utf8'));
    const dupRun = await build('--keep-going', '--json', '--quiet');
    const dup = JSON.parse(dupRun.stdout);
    const ars = dup.species.filter((s: { name: string }) => s.name === 'Ar');
    expect(ars.map((s: { status: string; file: string }) => [s.status, s.file])).toEqual([
      ['ok', 'Ar.yaml'],
      ['failed', 'zz.yaml'],
    ]);
    expect(ars[1].errors.join('\n')).toMatch(/duplicate species name 'Ar'/);
    expect(dupRun.stderr).toMatch(/FAILED: Ar, Bad, bad\.yaml#2/);
    const zz = dup.files.find((f: { file: string }) => f.file.endsWith('zz.yaml'));
    expect(zz.errors.join('\n')).toMatch(/duplicate species name 'Ar'/);
  });

  it('a cache that cannot be written is reported once per build (stderr and summary.json), the build still succeeds', async () => {
    await writeFile(path.join(ws.root, 'plain.txt'), 'a regular file, so nothing can be created below it');
    const r = await build('--cache-dir', 'plain.txt/cache', '--json', '--quiet');
    expect(r.code, r.stderr).toBe(0);
    const lines = r.stderr.split('\n').filter((l) => l.includes('cache: not writable'));
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(/^qforge: warning: cache: not writable: .*plain\.txt\/cache: mkdir '.*plain\.txt.*': ENOTDIR \(not a directory\); every species is recomputed/);
    const summary = JSON.parse(r.stdout);
    expect(summary.warnings).toEqual([lines[0]!.replace('qforge: warning: ', '')]);
    expect(summary.counts.ok).toBe(5);
  });

  it('a species named ".." writes its table inside tables/ (names never escape the output folder)', async () => {
    const src = await readFile(path.join(ws.db, 'Ar.yaml'), 'utf8');
    await writeFile(path.join(ws.db, 'dots.yaml'), src.replace('name: Ar', 'name: ".."'));
    const r = await build();
    expect(r.stderr + r.stdout).not.toMatch(/internal error/);
    if (r.code === 0) {
      expect((await readdir(path.join(ws.out, 'tables'))).sort()).toContain('%2E%2E.csv');
      expect(await hashFolder(path.join(ws.root, 'tables'))).toBe('absent');
    } else {
      // The species validator may refuse the name outright; then nothing is written at all.
      expect(await hashFolder(ws.out)).toBe('absent');
    }
  });
});
