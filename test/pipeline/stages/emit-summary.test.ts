/**
 * summary.json is written from entries kept as text (stages/emit-summary.ts): its bytes must be those of
 * `jsonText` of the whole summary object, whatever the number of entries (empty, one, more than one write
 * chunk), and the order must be name order with unnamed documents last. Compared with our own `jsonText`
 * (the whole-object rendering it replaces); the entries are written by hand for this test. End to end: the
 * file a `--keep-going` build writes equals what `--json` prints for the same build.
 */
import { readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { SummaryEntries, type SummarySpecies } from '../../../pipeline/stages/emit-summary.js';
import { jsonText, OutputSchemaError } from '../../../pipeline/stages/emit.js';
import { SpillFile } from '../../../pipeline/storage/spill.js';
import { runCli, tempWorkspace } from '../helpers.js';

function entry(i: number, extra: Partial<SummarySpecies> = {}): SummarySpecies {
  return {
    name: `S${String(1000 - i).padStart(4, '0')}`,
    file: `s${i}.yaml`,
    status: i % 7 === 0 ? 'failed' : 'ok',
    warnings: i % 5 === 0 ? [`s${i}.yaml:3:1 warning: "quoted" text`] : [],
    errors: i % 7 === 0 ? ['an error'] : [],
    cache: { samples: 'off', fit: 'off' },
    cache_hit: i % 3 === 0,
    timings_ms: { compute: i / 3, emit: 0.5 },
    ...(i % 2 === 0 ? { fit_metrics: { max_abs_cp: 1e-3 * i, max_abs_h: 2e-4, max_abs_s: 3e-4, t_mid: 1000 } } : {}),
    ...extra,
  };
}

function envelope(): Record<string, unknown> & { species: unknown[] } {
  return {
    format: 'qforge-summary/1',
    tool: { name: 'qforge', version: '0.0.0' },
    code_fingerprint: `sha256:${'0'.repeat(64)}`,
    database: 'db',
    status: 'ok',
    written: true,
    outputs: ['nasa7.txt', 'summary.json'],
    counts: { species: 0, ok: 0, failed: 0, cache_hits: 0, files: 0, files_failed: 0 },
    warnings: [],
    settings_diagnostics: [],
    species: [],
    files: [{ file: 'x.yaml', errors: ['e'], warnings: [] }],
    timings_ms: { load: 1, validate: 1, compute_fit_verify: 1, emit: 1, total: 4 },
  };
}

async function written(entries: SummaryEntries): Promise<string> {
  let text = '';
  await entries.write({ write: async (t) => void (text += t), close: async () => {} }, envelope());
  return text;
}

describe('summary.json from entries kept as text', () => {
  it.each([0, 1, 2, 600])('%s entries: the bytes of jsonText of the whole summary, in name order', async (n) => {
    const entries = new SummaryEntries();
    const all = Array.from({ length: n }, (_, i) => entry(i));
    for (const e of all) entries.add(e);
    entries.sort();
    const sorted = [...all].sort((a, b) => (a.name! < b.name! ? -1 : 1));
    expect(await written(entries)).toBe(jsonText({ ...envelope(), species: sorted }));
    expect(entries.species()).toEqual(sorted);
    expect(entries.cacheHits).toBe(all.filter((e) => e.cache_hit).length);
    expect(entries.failedLabels()).toEqual(sorted.filter((e) => e.status === 'failed').map((e) => e.name));
  });

  it('entries moved to a spill file as they come: the same bytes, read back in runs, and back for species()', async () => {
    const spill = await SpillFile.open();
    try {
      // A batch of ~2 KB spills every few entries; added in reverse name order with non-ASCII warnings, so the
      // runs read back are cut by the sort and the byte places differ from the string lengths.
      const entries = new SummaryEntries(spill, 2048);
      const all = Array.from({ length: 600 }, (_, i) => entry(i, i % 4 === 0 ? { warnings: [`s${i}.yaml:1:1 warning: Δ température \u2028 ✓`] } : {}));
      for (const e of all) entries.add(e);
      entries.sort();
      const sorted = [...all].sort((a, b) => (a.name! < b.name! ? -1 : 1));
      expect(() => entries.species()).toThrow(/before settle/);
      expect(await written(entries)).toBe(jsonText({ ...envelope(), species: sorted }));
      await entries.settle();
      expect(entries.species()).toEqual(sorted);
      expect(await written(entries)).toBe(jsonText({ ...envelope(), species: sorted }));
    } finally {
      await spill.close();
    }
  });

  it('documents without a name sort last, by file and document, and are labelled file#document', async () => {
    const entries = new SummaryEntries();
    const { name: _n, ...unnamed } = entry(7);
    entries.add({ ...unnamed, file: 'b.yaml', document: 2 });
    entries.add({ ...unnamed, file: 'a.yaml', document: 3 });
    entries.add(entry(1));
    entries.sort();
    expect(entries.failedLabels()).toEqual(['a.yaml#3', 'b.yaml#2']);
    expect(entries.species().map((e) => e.name ?? e.file)).toEqual(['S0999', 'a.yaml', 'b.yaml']);
  });

  it('an entry off its schema is refused when it is added, not when the file is written', () => {
    const entries = new SummaryEntries();
    expect(() => entries.add({ ...entry(1), status: 'great' as 'ok' })).toThrow(OutputSchemaError);
    expect(entries.size).toBe(0);
  });
});

describe('summary.json of a build', () => {
  it('a --keep-going build with an invalid document and a failing species: the file is what --json prints', async () => {
    const ws = await tempWorkspace();
    try {
      // Written by hand for this test: one species whose enthalpy cannot be computed, one invalid document.
      await writeFile(path.join(ws.db, 'bad.yaml'), 'name: XBAD\ncomposition: {He: 1}\nenthalpy_of_formation: 1e308\nsources: ["invented for a test"]\nstructure: atom\n');
      await writeFile(path.join(ws.db, 'broken.yaml'), 'name: XBROKEN\ncomposition: {He: 1}\n');
      const r = await runCli(['build', 'db', '--out', 'out', '--keep-going', '--quiet', '--json'], ws.root);
      expect(r.code).toBe(1);
      const file = await readFile(path.join(ws.out, 'summary.json'), 'utf8');
      expect(file).toBe(r.stdout);
      const names = (JSON.parse(file) as { species: SummarySpecies[] }).species.map((s) => s.name);
      expect(names).toEqual([...names].sort());
      expect(names).toContain('XBAD');
      expect(names).toContain('XBROKEN');
    } finally {
      await ws.cleanup();
    }
  });
});
