/**
 * Table-driven bad inputs across species files, settings and the command line. Each case asserts the exit
 * code, that the message names the file, line and field, and that the previous outputs are untouched
 * (hash of the output folder before and after). Species data in the cases are invented for the tests
 * unless a source is named.
 */
import { cp, mkdir, readFile, symlink, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { formatDiagnostic } from '../../pipeline/core/diagnostics.js';
import { parseYamlText } from '../../pipeline/stages/load.js';
import { checkSettingsRules, checkSpeciesSampling, largestSamplingStep, samplingShortfall, withDefaults } from '../../pipeline/core/settings.js';
import { hashFolder, runCli, tempWorkspace } from './helpers.js';

type Ws = Awaited<ReturnType<typeof tempWorkspace>>;

interface BadCase {
  name: string;
  /** Prepares the broken state inside the workspace. */
  setup: (ws: Ws) => Promise<void>;
  /** Arguments (default: build db --out out). */
  argv?: string[];
  code: 1 | 2;
  /** Each must appear in stderr. */
  expect: Array<string | RegExp>;
  /** The stable code of the diagnostic the case is about. */
  diag?: string;
}

/** A diagnostic line (`file[:line:col]: error|warning: ...`), and the same ending in its `[code]`. */
const DIAGNOSTIC_LINE = /^(?!qforge: )[^\s:][^:]*(:\d+:\d+)?: (error|warning): /;
const CODED_LINE = / \[[a-z0-9]+(-[a-z0-9]+)*\]$/;

const atom = (name: string, extra = '') =>
  `name: ${name}\ncomposition: {He: 1}\nenthalpy_of_formation: 0\nsources: ["invented for a test"]\nstructure: atom\n${extra}`;

const write = (rel: string, text: string) => async (ws: Ws) => writeFile(path.join(ws.db, rel), text);
const editSettings = (from: string | RegExp, to: string) => async (ws: Ws) => {
  const p = path.join(ws.db, 'qforge.yaml');
  await writeFile(p, (await readFile(p, 'utf8')).replace(from, to));
};

/** The references.tolerances line of the fixture qforge.yaml (line 15). */
const REF_TOLERANCES = '  tolerances: {cp: 0.25, s: 0.05, h: 0.05}';

const CASES: BadCase[] = [
  {
    name: 'YAML syntax error',
    setup: write('bad.yaml', 'name: He\ncomposition: {He: 1\nstructure: atom\n'),
    code: 1,
    expect: [/bad\.yaml:\d+:\d+: error/, /YAML/],
  },
  {
    name: 'misspelt (unknown) key',
    setup: write('bad.yaml', atom('He', 'electronic_level: [{energy: 0, degeneracy: 1}]\n')),
    code: 1,
    expect: [/bad\.yaml:6:1: error/, /electronic_level/, /unknown key/],
  },
  {
    name: 'unknown element',
    setup: write('bad.yaml', atom('He').replace('{He: 1}', '{Xx: 1}')),
    code: 1,
    expect: [/bad\.yaml:2:\d+: error/, /composition/, /Xx/],
  },
  {
    name: 'non-positive vibrational wavenumber',
    setup: write(
      'bad.yaml',
      'name: XY2\ncomposition: {H: 2, O: 1}\nenthalpy_of_formation: 0\nsources: ["invented for a test"]\nstructure: nonlinear\nsymmetry_number: 2\nrotational_constants: [27.9, 14.5, 9.3]\nvibrations: [3657, -1595, 3756]\n',
    ),
    code: 1,
    expect: [/bad\.yaml:8:\d+: error/, /vibrations\[1\]/],
  },
  {
    name: 'wrong number of rotational constants for a nonlinear molecule',
    setup: write(
      'bad.yaml',
      'name: XY2\ncomposition: {H: 2, O: 1}\nenthalpy_of_formation: 0\nsources: ["invented for a test"]\nstructure: nonlinear\nsymmetry_number: 2\nrotational_constants: [27.9]\nvibrations: [3657, 1595, 3756]\n',
    ),
    code: 1,
    expect: [/bad\.yaml:7:\d+: error/, /rotational_constants/],
  },
  {
    name: 'diatomic without symmetry number',
    setup: async (ws) => {
      const src = await readFile(path.join(ws.db, 'N2.yaml'), 'utf8');
      await writeFile(path.join(ws.db, 'bad.yaml'), src.replace('name: N2', 'name: N2x').replace(/^symmetry_number: 2\n/m, ''));
    },
    code: 1,
    expect: [/bad\.yaml:\d+:\d+: error/, /symmetry_number/],
  },
  {
    name: 'missing sources',
    setup: write('bad.yaml', 'name: He\ncomposition: {He: 1}\nenthalpy_of_formation: 0\nstructure: atom\n'),
    code: 1,
    expect: [/bad\.yaml:1:\d+: error/, /sources/],
  },
  {
    name: 'duplicate species name across files',
    setup: async (ws) => writeFile(path.join(ws.db, 'zz-dup.yaml'), await readFile(path.join(ws.db, 'Ar.yaml'), 'utf8')),
    code: 1,
    expect: [/zz-dup\.yaml:\d+:\d+: error/, /duplicate species name 'Ar'/, /Ar\.yaml/],
  },
  {
    name: 'unknown unit',
    setup: write('bad.yaml', atom('He').replace('enthalpy_of_formation: 0', 'enthalpy_of_formation: {value: 0, unit: kJ/kg}')),
    code: 1,
    expect: [/bad\.yaml:3:\d+: error/, /enthalpy_of_formation\.unit/, /kJ\/kg/],
  },
  {
    name: 'YAML alias bomb',
    setup: write(
      'bad.yaml',
      'a: &a [x, x, x, x, x, x, x, x, x]\nb: &b [*a, *a, *a, *a, *a, *a, *a, *a, *a]\nc: &c [*b, *b, *b, *b, *b, *b, *b, *b, *b]\nd: &d [*c, *c, *c, *c, *c, *c, *c, *c, *c]\ne: [*d, *d, *d, *d, *d, *d, *d, *d, *d]\n',
    ),
    code: 1,
    expect: [/bad\.yaml:\d+:\d+: error/, /alias/],
  },
  {
    name: 'YAML tag that would construct an object',
    setup: write('bad.yaml', atom('He').replace('name: He', 'name: !!js/function "function () { return 1 }"')),
    code: 1,
    expect: [/bad\.yaml:1:\d+: error/, /tag/],
  },
  {
    name: 'nuclear spin weights on a heteronuclear molecule',
    setup: async (ws) => {
      const src = await readFile(path.join(ws.db, 'CO.yaml'), 'utf8');
      await writeFile(path.join(ws.db, 'bad.yaml'), src.replace('name: CO', 'name: COx').replace('symmetry_number: 1\n', 'symmetry_number: 1\nnuclear_spin_weights: {even: 1, odd: 3}\n'));
    },
    code: 1,
    expect: [/bad\.yaml:\d+:\d+: error/, /nuclear_spin_weights/],
  },
  {
    name: 'dissociation energy below the zero-point level',
    setup: async (ws) => {
      const src = await readFile(path.join(ws.db, 'N2.yaml'), 'utf8');
      await writeFile(path.join(ws.db, 'bad.yaml'), src.replace('name: N2', 'name: N2x').replace('dissociation_energy: 78714', 'dissociation_energy: 500'));
    },
    code: 1,
    expect: [/bad\.yaml:\d+:\d+: error/, /dissociation_energy/],
  },
  {
    name: 'file larger than the size limit',
    setup: write('bad.yaml', `${atom('He')}# ${'x'.repeat(1024 * 1024 + 10)}\n`),
    code: 1,
    expect: [/bad\.yaml: error/, /too large/],
  },
  {
    name: 'symlinked species file outside the database folder',
    setup: async (ws) => {
      const outside = path.join(ws.root, 'outside.yaml');
      await writeFile(outside, atom('He'));
      await symlink(outside, path.join(ws.db, 'link.yaml'));
    },
    code: 1,
    expect: [/link\.yaml: error/, /outside the database folder/],
  },
  {
    name: 'settings: unknown key',
    setup: editSettings('title:', 'titel:'),
    code: 1,
    expect: [/qforge\.yaml:3:1: error/, /titel/, /unknown key/],
  },
  {
    name: 'settings: record identifier longer than 6 characters',
    setup: editSettings('record_identifier: QFTEST', 'record_identifier: TOOLONGID'),
    code: 1,
    expect: [/qforge\.yaml:4:\d+: error/, /record_identifier/, /TOOLONGID/],
  },
  {
    name: 'settings: temperature ranges out of order',
    setup: editSettings('mid: 1000', 'mid: 7000'),
    code: 1,
    expect: [/qforge\.yaml:5:\d+: error/, /temperature_ranges/, /low < mid < high/],
  },
  {
    // 500 K leaves the low range [200, 1000] K 4 distinct temperatures; the fit needs 7 (src/nasa7/samples.ts).
    name: 'settings: sampling step too coarse for the fit ranges',
    setup: editSettings('sampling_step: 20', 'sampling_step: 500'),
    code: 1,
    expect: [
      /qforge\.yaml:10:18: error: fit\.sampling_step: fit\.sampling_step = 500 K is too coarse for the temperature ranges 200\/1000\/6000 K/,
      /low range \[200, 1000\] K gets 4 distinct sample temperatures; the fit needs at least 7/,
      /got 500; expected fit\.sampling_step <= 199\.5 K/,
    ],
  },
  {
    name: 'settings: unknown standard pressure',
    setup: editSettings('standard_pressure: 1 bar', 'standard_pressure: 2 bar'),
    code: 1,
    expect: [/qforge\.yaml:6:\d+: error/, /standard_pressure/],
  },
  {
    name: 'settings: negative tolerance',
    setup: editSettings('tolerances: {cp: 0.1,', 'tolerances: {cp: -0.1,'),
    code: 1,
    expect: [/qforge\.yaml:11:\d+: error/, /tolerances\.cp/],
  },
  {
    name: 'settings: YAML syntax error',
    setup: editSettings('fit:', 'fit: [\n'),
    code: 1,
    expect: [/qforge\.yaml:\d+:\d+: error/, /YAML/],
  },
  {
    name: 'settings: fit tolerance tighter than the form allows (fit check fails the species)',
    setup: editSettings('tolerances: {cp: 0.1,', 'tolerances: {relative_to_cp: {cp: 0}, cp: 0.000001,'),
    code: 1,
    // Reported at the species (its name line), naming the setting that set the limit and where.
    expect: [
      /N2\.yaml:2:7: error: \[N2\] fit check: Cp\/R fit error [\d.e-]+ at \d+ K \((low|high) range [\d–]+ K\) is [\d.e+]+ × its limit 1\.000e-6, set there by the absolute part 1\.000e-6; .*temperature_ranges/,
      /limit set by tolerances\.cp in db\/qforge\.yaml:11:\d+/,
      // Ar's Cp is exactly 5/2 R (NIST-JANAF 4th ed. Ar-001), so its fit meets any tolerance.
      /build failed \(4 species failed: CO, H2O, N2, O\)/,
    ],
  },
  {
    name: '--keep-going with no good species: the previous database is kept, not replaced by an empty one',
    setup: async (ws) => {
      for (const f of ['Ar', 'CO', 'H2O', 'N2', 'O']) {
        const p = path.join(ws.db, `${f}.yaml`);
        await writeFile(p, (await readFile(p, 'utf8')).replace('sources:', 'sourcez:'));
      }
    },
    argv: ['build', 'db', '--out', 'out', '--keep-going'],
    code: 1,
    expect: [/5 species failed: Ar, CO, H2O, N2, O/, /no species succeeded, so --keep-going wrote nothing/, /out left unchanged/],
  },
  {
    name: 'settings: midpoint below 298.15 K points at mid, not low',
    setup: editSettings('mid: 1000', 'mid: 250'),
    code: 1,
    expect: [/qforge\.yaml:5:\d+: error: temperature_ranges\.mid: the low range must contain 298\.15 K/, /got 250/, /1 error\(s\) in the settings file db\/qforge\.yaml/],
  },
  // references.known_deviations (fixture qforge.yaml: the entry starts on line 17). A settings error stops
  // the build and compare alike; the species and tolerances are those of the fixture (NIST-JANAF 4th ed.
  // N-023 for N2, see test/fixtures/db/reference), the reasons are invented for the tests.
  {
    name: 'settings: known deviation without a reason (build)',
    setup: editSettings(REF_TOLERANCES, `${REF_TOLERANCES}\n  known_deviations:\n    - {species: N2, from: 3000, tolerances: {cp: 0.5}}`),
    code: 1,
    expect: [/qforge\.yaml:17:\d+: error: references\.known_deviations\[0\]\.reason: missing required field 'reason'/],
  },
  {
    name: 'settings: known deviation without a reason (compare)',
    setup: editSettings(REF_TOLERANCES, `${REF_TOLERANCES}\n  known_deviations:\n    - {species: N2, from: 3000, tolerances: {cp: 0.5}}`),
    argv: ['compare', 'out', '--database', 'db'],
    code: 1,
    expect: [/qforge\.yaml:17:\d+: error: references\.known_deviations\[0\]\.reason: missing required field 'reason'/],
  },
  {
    name: 'settings: known deviation with an unknown key',
    setup: editSettings(REF_TOLERANCES, `${REF_TOLERANCES}\n  known_deviations:\n    - {species: N2, above: 3000, tolerances: {cp: 0.5}, reason: "invented test reason"}`),
    code: 1,
    expect: [/qforge\.yaml:17:\d+: error: references\.known_deviations\[0\]\.above: unknown key 'above'/],
  },
  {
    name: 'settings: known deviation that does not widen the tolerance',
    setup: editSettings(REF_TOLERANCES, `${REF_TOLERANCES}\n  known_deviations:\n    - {species: N2, tolerances: {cp: 0.2}, reason: "invented test reason"}`),
    code: 1,
    expect: [/qforge\.yaml:17:\d+: error: references\.known_deviations\[0\]\.tolerances\.cp: known deviation: the limit does not widen/, /got 0\.2/],
  },
  {
    name: 'settings: overlapping known deviations of one species and quantity',
    setup: editSettings(
      REF_TOLERANCES,
      `${REF_TOLERANCES}\n  known_deviations:\n    - {species: N2, from: 3000, tolerances: {cp: 0.5}, reason: "invented test reason"}\n    - {species: N2, from: 5000, tolerances: {cp: 0.9}, reason: "invented test reason"}`,
    ),
    code: 1,
    expect: [/qforge\.yaml:18:\d+: error: references\.known_deviations\[1\]: known deviation overlaps references\.known_deviations\[0\] for N2 cp/],
  },
  {
    name: 'five elements: more than the 80-column record can hold',
    setup: write(
      'bad.yaml',
      'name: CHNOS\ncomposition: {C: 1, H: 1, N: 1, O: 1, S: 1}\nenthalpy_of_formation: 0\nsources: ["invented for a test"]\nstructure: nonlinear\nsymmetry_number: 1\nrotational_constants: [1.0, 0.2, 0.15]\nvibrations: [3000, 2000, 1500, 1200, 1000, 800, 600, 500, 400]\n',
    ),
    code: 1,
    expect: [/bad\.yaml:2:\d+: error: \[CHNOS\] composition: cannot be written as an 80-column record/, /at most 4/],
  },
  {
    name: 'database folder without species files',
    setup: async (ws) => mkdir(path.join(ws.root, 'emptydb')),
    argv: ['build', 'emptydb', '--out', 'out'],
    code: 1,
    expect: [/emptydb: error: no species files/],
  },
  {
    name: 'usage: --jobs 0',
    setup: async () => {},
    argv: ['build', 'db', '--out', 'out', '--jobs', '0'],
    code: 2,
    expect: [/--jobs/],
  },
  {
    name: 'usage: unknown option',
    setup: async () => {},
    argv: ['build', 'db', '--out', 'out', '--fast'],
    code: 2,
    expect: [/unknown option '--fast'/],
  },
  {
    name: 'usage: database folder does not exist',
    setup: async () => {},
    argv: ['build', 'no-such-db', '--out', 'out'],
    code: 2,
    expect: [/no-such-db: no such folder/],
  },
  {
    name: 'usage: database folder inside the output folder (would be deleted by the swap)',
    setup: async (ws) => cp(ws.db, path.join(ws.out, 'db'), { recursive: true }),
    argv: ['build', 'out/db', '--out', 'out'],
    code: 2,
    expect: [/the database folder out\/db is inside the output folder out/, /choose an --out outside/],
  },
  {
    name: 'usage: output folder that lies below a regular file (ENOTDIR, no stack trace)',
    setup: async (ws) => writeFile(path.join(ws.root, 'plain.txt'), 'a file'),
    argv: ['build', 'db', '--out', 'plain.txt/x'],
    code: 2,
    expect: [/qforge: error: cannot use the output folder plain\.txt\/x: \w+ '.*plain\.txt.*': ENOTDIR \(not a directory\)/],
  },
  {
    name: 'usage: a file the user put into a qforge output folder',
    setup: async (ws) => writeFile(path.join(ws.out, 'my-notes.txt'), 'keep me'),
    code: 2,
    expect: [/output folder out holds an entry qforge did not write \(my-notes\.txt\)/, /move it elsewhere/],
  },
  {
    name: 'usage: output folder not written by qforge',
    setup: async (ws) => {
      await mkdir(path.join(ws.root, 'mine'));
      await writeFile(path.join(ws.root, 'mine', 'precious.txt'), 'keep me');
    },
    argv: ['build', 'db', '--out', 'mine'],
    code: 2,
    expect: [/output folder mine is not empty and was not written by qforge/],
  },
  {
    name: 'usage: the output folder is the parent of the database folder',
    setup: async (ws) => writeFile(path.join(ws.root, 'precious.txt'), 'keep me'),
    argv: ['build', 'db', '--out', '.'],
    code: 2,
    expect: [/the database folder db is inside the output folder \./],
  },
];

describe('bad inputs: exit code, located message, outputs untouched', () => {
  let template: Ws;
  beforeAll(async () => {
    template = await tempWorkspace();
  });
  afterAll(async () => {
    await template.cleanup();
  });

  it('has at least 15 kinds of bad input', () => {
    expect(CASES.length).toBeGreaterThanOrEqual(15);
  });

  for (const c of CASES) {
    it(c.name, async () => {
      const ws = await tempWorkspace();
      try {
        const first = await runCli(['build', 'db', '--out', 'out', '--quiet'], ws.root);
        expect(first.code, first.stderr).toBe(0);
        // After the setup: some cases put something into out/ themselves (a user's file, a database).
        await c.setup(ws);
        const before = await hashFolder(ws.out);
        const r = await runCli(c.argv ?? ['build', 'db', '--out', 'out'], ws.root);
        expect(r.code, r.stderr).toBe(c.code);
        for (const e of c.expect) expect(r.stderr).toMatch(e);
        expect(r.stderr).not.toMatch(/internal error/);
        // Every diagnostic line carries its stable code (pipeline/core/diagnostics.ts).
        for (const line of r.stderr.split('\n').filter((l) => DIAGNOSTIC_LINE.test(l))) expect(line).toMatch(CODED_LINE);
        if (c.diag) expect(r.stderr).toContain(`[${c.diag}]`);
        expect(await hashFolder(ws.out)).toBe(before);
        if (c.argv?.includes('.')) expect(await readFile(path.join(ws.root, 'precious.txt'), 'utf8')).toBe('keep me');
        if (c.argv?.includes('mine')) expect(await readFile(path.join(ws.root, 'mine', 'precious.txt'), 'utf8')).toBe('keep me');
      } finally {
        await ws.cleanup();
      }
    });
  }

  it('check reports every problem of every file in one run', async () => {
    const ws = await tempWorkspace();
    try {
      await writeFile(path.join(ws.db, 'a.yaml'), atom('He', 'electronic_level: []\n'));
      await writeFile(path.join(ws.db, 'b.yaml'), atom('Ne').replace('{He: 1}', '{Qq: 1}').replace('sources: ["invented for a test"]\n', ''));
      const r = await runCli(['check', 'db'], ws.root);
      expect(r.code).toBe(1);
      expect(r.stderr).toMatch(/a\.yaml:6:1: error: .*electronic_level/);
      expect(r.stderr).toMatch(/b\.yaml:2:\d+: error: .*Qq/);
      expect(r.stderr).toMatch(/b\.yaml:\d+:\d+: error: .*sources/);
      expect(await hashFolder(ws.out)).toBe('absent');
    } finally {
      await ws.cleanup();
    }
  });
});

describe('fit.sampling_step against the fit ranges (rules of src/nasa7/samples.ts: >= 7 distinct T per range, gaps <= 25 %)', () => {
  const settingsDoc = (text: string) => parseYamlText(text, 'db/qforge.yaml', { split: 'single' }).documents[0]!;

  it('is blamed once, on the setting, not on every species', async () => {
    const ws = await tempWorkspace();
    try {
      await editSettings('sampling_step: 20', 'sampling_step: 500')(ws);
      const r = await runCli(['check', 'db'], ws.root);
      expect(r.code).toBe(1);
      expect(r.stderr.match(/fit\.sampling_step/g)?.length).toBeGreaterThanOrEqual(1);
      expect(r.stderr).not.toMatch(/the fit failed/);
      expect(r.stderr.split('\n').filter((l) => / error: /.test(l))).toHaveLength(1);
    } finally {
      await ws.cleanup();
    }
  });

  it('the largest accepted step for the default ranges 200/1000/6000 K', () => {
    // Low range: 200, 200+s, …, 1000 plus 298.15 K: 7 distinct temperatures while 4s < 800 K.
    expect(largestSamplingStep({ low: 200, mid: 1000, high: 6000 })).toBe(199.5);
    expect(samplingShortfall({ low: 200, mid: 1000, high: 6000 }, 199.5)).toBeUndefined();
    expect(samplingShortfall({ low: 200, mid: 1000, high: 6000 }, 200)).toMatch(/low range \[200, 1000\] K gets 6 distinct/);
    expect(samplingShortfall({ low: 200, mid: 1000, high: 6000 }, 10)).toBeUndefined();
  });

  it('counts the high range from the grid of the whole span, and accepts a fine grid on a narrow range', () => {
    // High range [1000, 1100]: with step 30 from 200 the samples are 1000 (mid), 1010, 1040, 1070, 1100 (end): 5 distinct.
    expect(samplingShortfall({ low: 200, mid: 1000, high: 1100 }, 30)).toMatch(/high range \[1000, 1100\] K gets 5 distinct/);
    // Low range [250, 300]: 250, 258, …, 298, 298.15, 300: 9 distinct, gaps <= 8 K: accepted.
    expect(samplingShortfall({ low: 250, mid: 300, high: 6000 }, 8)).toBeUndefined();
  });

  it('a too-coarse default step is reported at temperature_ranges and says it is the default', () => {
    const doc = settingsDoc('title: t\ntemperature_ranges: {low: 260, mid: 300, high: 6000}\n');
    const ds = checkSettingsRules(withDefaults(doc.value), 'db/qforge.yaml', doc);
    expect(ds).toHaveLength(1);
    expect(ds[0]).toMatchObject({ path: 'fit.sampling_step', line: 2, value: 10 });
    expect(ds[0]!.message).toContain('fit.sampling_step = 10 K (the default) is too coarse');
    expect(ds[0]!.expected).toContain('<= 9.5 K');
  });

  it('a species whose own temperature_ranges are too narrow for the step names both', () => {
    const settingsText = 'fit:\n  sampling_step: 50\n';
    const doc = settingsDoc(settingsText);
    const settings = withDefaults(doc.value);
    expect(checkSettingsRules(settings, 'db/qforge.yaml', doc)).toEqual([]);
    const d = checkSpeciesSampling({
      ranges: { low: 200, mid: 400, high: 6000 },
      settings,
      file: 'db/He.yaml',
      species: 'He',
      line: 6,
      column: 21,
      settingsFile: 'db/qforge.yaml',
      stepSetAt: doc.locate(['fit', 'sampling_step']),
    });
    expect(d).toBeDefined();
    expect(formatDiagnostic(d!)).toBe(
      'db/He.yaml:6:21: error: [He] temperature_ranges: temperature_ranges 200/400/6000 K are too narrow for fit.sampling_step = 50 K (set in db/qforge.yaml:2:18): the low range [200, 400] K gets 6 distinct sample temperatures; the fit needs at least 7 (got {"low":200,"mid":400,"high":6000}; expected fit.sampling_step <= 49.5 K for these ranges, or wider temperature_ranges) [sampling-step-too-coarse]',
    );
    expect(checkSpeciesSampling({ ranges: { low: 200, mid: 1000, high: 6000 }, settings, file: 'db/He.yaml', species: 'He' })).toBeUndefined();
  });
});
