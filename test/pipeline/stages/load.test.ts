/**
 * Load stage: YAML text → located documents, file discovery, and hostile input (alias bombs, huge files,
 * code-constructing tags, symlinks out of the database folder). The species constants in the fixtures are
 * from Huber & Herzberg (1979) and NIST ASD (see test/fixtures/input/README.md); the hostile inputs are
 * invented. No timing assertions (speed lives in the bench); an alias bomb without the limit would expand to
 * 9^9 nodes and exhaust memory, so the test finishing at all shows it was refused early.
 */
import { mkdtempSync, mkdirSync, readFileSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import {
  DEFAULT_MAX_BYTES,
  discoverSpeciesFiles,
  loadYamlFile,
  parseYamlText,
} from '../../../pipeline/stages/load.js';
import { validateSpecies } from '../../../pipeline/stages/validate.js';

const fixture = (name: string) => readFileSync(new URL(`../../fixtures/input/${name}`, import.meta.url), 'utf8');
const temps: string[] = [];
function tempDir(): string {
  const d = mkdtempSync(path.join(tmpdir(), 'qforge-load-'));
  temps.push(d);
  return d;
}
afterAll(() => {
  for (const d of temps) rmSync(d, { recursive: true, force: true });
});

describe('parseYamlText', () => {
  it('splits --- documents into species with their index, skipping empty documents', () => {
    const r = parseYamlText(fixture('multi.yaml'), 'multi.yaml');
    expect(r.diagnostics).toEqual([]);
    expect(r.documents.map((d) => [d.index, (d.value as { name: string }).name])).toEqual([[0, 'Ar'], [1, 'O'], [2, 'N2']]);
    expect(r.documents.every((d) => d.file === 'multi.yaml')).toBe(true);
  });

  it('splits a top-level list and locates paths relative to each item (1-based line and column)', () => {
    const text = fixture('list.yaml');
    const r = parseYamlText(text, 'list.yaml');
    const [h2o, ocs] = r.documents;
    expect(h2o!.locate([])).toEqual({ line: 2, column: 3 });
    expect(h2o!.locate(['name'])).toEqual({ line: 2, column: 9 });
    const lines = text.split('\n');
    const col = (line: number, s: string, from = 0) => lines[line - 1]!.indexOf(s, from) + 1;
    expect(h2o!.locate(['vibrations', 2])).toEqual({ line: 9, column: col(9, '3756') });
    expect(ocs!.locate(['vibrations', 1, 'degeneracy'])).toEqual({ line: 17, column: col(17, '2}') });
    expect(ocs!.locate(['rotational_constants'], { key: true })).toEqual({ line: 16, column: 3 });
    // A missing path falls back to its deepest existing ancestor.
    expect(ocs!.locate(['vibrations', 7, 'degeneracy'])).toEqual({ line: 17, column: col(17, '[') });
    expect(ocs!.locate(['no_such_key'])).toEqual({ line: 10, column: 3 });
  });

  it('reports a syntax error with line and column and keeps the good documents', () => {
    const r = parseYamlText('name: A\n---\nname: [B\n---\nname: C\n', 's.yaml');
    const errors = r.diagnostics.filter((d) => d.severity === 'error');
    expect(errors.length).toBeGreaterThan(0);
    expect(errors[0]).toMatchObject({ file: 's.yaml', path: '' });
    expect(errors[0]!.line).toBeGreaterThanOrEqual(3);
    expect(errors[0]!.message).toMatch(/YAML syntax error/);
    expect(r.documents.map((d) => (d.value as { name: string }).name)).toEqual(['A', 'C']);
  });

  it('rejects duplicate keys instead of letting the last one win', () => {
    const r = parseYamlText('name: A\nsymmetry_number: 1\nsymmetry_number: 2\n', 'd.yaml');
    expect(r.documents).toEqual([]);
    expect(r.diagnostics).toEqual([
      expect.objectContaining({ severity: 'error', file: 'd.yaml', line: 3, column: 1, message: expect.stringContaining('duplicate key') }),
    ]);
    // Still readable for checking (never for building): the FIRST value is kept, and the message says so.
    expect(r.diagnostics[0]!.message).toBe(
      "duplicate key 'symmetry_number' in a mapping (each key may appear only once; first given on line 2); the rest of the document was checked with the first value, this one is ignored",
    );
    expect(r.recoveredDocuments.map((d) => d.value)).toEqual([{ name: 'A', symmetry_number: 1 }]);
    expect(r.recoveredDocuments[0]!.yamlErrors).toEqual([r.diagnostics[0]]);
    expect(r.recoveredDocuments[0]!.locate(['symmetry_number'])).toEqual({ line: 2, column: 18 });
  });

  it('a duplicate key and three other mistakes in one document are all reported in one run', () => {
    // Argon: a single 1S0 level (NIST ASD, Ar I); the mistakes are invented.
    const text = [
      'name: Ar',
      'composition: {Ar: 1}',
      'charge: 0.5', // mistake 2: not a whole number
      'enthalpy_of_formation: 0',
      'sources: []', // mistake 3: empty
      'structure: atomic', // mistake 4: not an accepted structure
      'name: Ar2', // mistake 1: duplicate key
      '',
    ].join('\n');
    const r = parseYamlText(text, 'ar.yaml');
    expect(r.documents).toEqual([]);
    const all = [...r.diagnostics, ...r.recoveredDocuments.flatMap((d) => validateSpecies(d).diagnostics)];
    const errors = all.filter((d) => d.severity === 'error').map((d) => [d.line, d.path, d.message]);
    expect(errors).toEqual([
      [7, '', expect.stringContaining("duplicate key 'name'")],
      [3, 'charge', expect.stringContaining('wrong type')],
      [5, 'sources', expect.stringContaining('too few items')],
      [6, 'structure', expect.stringContaining("did you mean 'atom'")],
    ]);
    // The kept name is the first one.
    expect(all.filter((d) => d.species !== undefined).every((d) => d.species === 'Ar')).toBe(true);
  });

  it('an unknown tag makes its node invalid (null) but the rest of the document is still checked', () => {
    const r = parseYamlText('name: Ar\ncharge: !custom 1\nstructure: atomic\n', 't.yaml');
    expect(r.documents).toEqual([]);
    expect(r.recoveredDocuments.map((d) => d.value)).toEqual([{ name: 'Ar', charge: null, structure: 'atomic' }]);
    expect(r.diagnostics[0]!.message).toMatch(/Unresolved tag: !custom; .*the value is treated as invalid and the rest of the document was checked/);
    const v = validateSpecies(r.recoveredDocuments[0]!).diagnostics.map((d) => d.path);
    expect(v).toEqual(expect.arrayContaining(['structure', 'charge']));
  });

  it('in a top-level list only the item holding the YAML error is held back', () => {
    const r = parseYamlText('- name: A\n  x: 1\n  x: 2\n- name: B\n- !foo {name: C}\n', 'l.yaml');
    expect(r.documents.map((d) => d.value)).toEqual([{ name: 'B' }]);
    expect(r.recoveredDocuments.map((d) => [d.index, d.value, d.yamlErrors!.map((e) => e.line)])).toEqual([
      [0, { name: 'A', x: 1 }, [3]],
      [2, null, [5]],
    ]);
  });

  it('a syntax error or an alias bomb still stops the document: nothing is recovered', () => {
    const syntax = parseYamlText('name: A\nname: B\nx: [1\n', 's.yaml');
    expect(syntax.documents).toEqual([]);
    expect(syntax.recoveredDocuments).toEqual([]);
    const rows = ['a: &a [x, x, x, x, x, x, x, x, x]', 'name: A'];
    for (const [p, q] of ['ab', 'bc', 'cd', 'de']) rows.push(`${q}: &${q} [${Array(9).fill(`*${p}`).join(',')}]`);
    rows.push('name: B');
    const bomb = parseYamlText(rows.join('\n') + '\n', 'bomb.yaml');
    expect(bomb.recoveredDocuments).toEqual([]);
    expect(bomb.diagnostics.map((d) => d.message)).toEqual(expect.arrayContaining([expect.stringContaining('alias')]));
  });

  it.each([
    ['!!js/function', 'x: !!js/function "function () { globalThis.__qforgeHacked = true; }"\n'],
    ['!!js/undefined', 'x: !!js/undefined ""\n'],
    ['!!python/object/apply', 'x: !!python/object/apply:os.system ["echo hacked"]\n'],
    ['!custom', 'x: !custom {a: 1}\n'],
    ['!!binary (YAML 1.1 only)', 'x: !!binary aGVsbG8=\n'],
  ])('refuses the tag %s and executes nothing', (tag, text) => {
    const r = parseYamlText(text, 't.yaml');
    expect(r.documents).toEqual([]);
    expect(r.diagnostics).toHaveLength(1);
    expect(r.diagnostics[0]).toMatchObject({ severity: 'error', line: 1, column: 4 });
    expect(r.diagnostics[0]!.message).toContain('Unresolved tag');
    expect(r.diagnostics[0]!.message).toContain(tag.split(' ')[0]!.replace(/^!!/, ''));
    expect((globalThis as Record<string, unknown>).__qforgeHacked).toBeUndefined();
  });

  it('accepts the core-schema tags', () => {
    const r = parseYamlText('a: !!str 12\nb: !!float 3.5\nc: !!int "4"\n', 'c.yaml');
    expect(r.diagnostics).toEqual([]);
    expect(r.documents[0]!.value).toEqual({ a: '12', b: 3.5, c: 4 });
  });

  it('refuses an alias bomb (billion laughs) with a clear message', () => {
    const rows = ['a: &a ["lol","lol","lol","lol","lol","lol","lol","lol","lol"]'];
    for (const [p, q] of ['ab', 'bc', 'cd', 'de', 'ef', 'fg', 'gh', 'hi']) rows.push(`${q}: &${q} [${Array(9).fill(`*${p}`).join(',')}]`);
    const r = parseYamlText(rows.join('\n') + '\n', 'bomb.yaml');
    expect(r.documents).toEqual([]);
    expect(r.diagnostics).toHaveLength(1);
    expect(r.diagnostics[0]).toMatchObject({ severity: 'error', file: 'bomb.yaml', line: 1, column: 1 });
    expect(r.diagnostics[0]!.message).toMatch(/too many YAML alias expansions \(more than 100\).*alias bomb/);
  });

  it('allows a few aliases', () => {
    const r = parseYamlText('x: &v {value: 1, unit: eV}\ny: *v\nz: *v\n', 'ok.yaml');
    expect(r.diagnostics).toEqual([]);
    expect(r.documents[0]!.value).toEqual({ x: { value: 1, unit: 'eV' }, y: { value: 1, unit: 'eV' }, z: { value: 1, unit: 'eV' } });
  });

  it('refuses absurdly deep nesting before parsing (it would exhaust the parser), but not brackets in text', () => {
    const n = 400_000;
    const r = parseYamlText(`name: X\nx: ${'['.repeat(n)}${']'.repeat(n)}\n`, 'deep.yaml');
    expect(r.documents).toEqual([]);
    expect(r.diagnostics).toEqual([
      expect.objectContaining({ severity: 'error', line: 2, column: 4 + 64, message: expect.stringContaining('nesting deeper than 64 levels') }),
    ]);
    const ok = parseYamlText(`sources: ["${'['.repeat(100)}", '${'{'.repeat(100)}', "a \\" ${'['.repeat(100)}"] # ${'['.repeat(100)}\n`, 'ok.yaml');
    expect(ok.diagnostics).toEqual([]);
    for (const text of [`${'- '.repeat(5000)}x\n`, `a:\n  ${'? '.repeat(5000)}x\n`, Array.from({ length: 300 }, (_, i) => `${' '.repeat(i)}a:`).join('\n')]) {
      const b = parseYamlText(text, 'deep-block.yaml');
      expect(b.documents).toEqual([]);
      expect(b.diagnostics[0]!.message).toContain('nesting deeper than 64 levels');
    }
    // Nesting the parser itself cannot follow is still a diagnostic, not a crash.
    const deep = parseYamlText(`x: ${'['.repeat(2000)}${']'.repeat(2000)}\n`, 'deep2.yaml', { maxNesting: 5000 });
    expect(deep.documents).toEqual([]);
    expect(deep.diagnostics[0]!.severity).toBe('error');
  });

  it('refuses text larger than the limit', () => {
    const r = parseYamlText(`name: ${'x'.repeat(2000)}\n`, 'big.yaml', { maxBytes: 1000 });
    expect(r.documents).toEqual([]);
    expect(r.diagnostics[0]!.message).toMatch(/file is too large: .*\(2007 bytes\); the limit is 1000 bytes/);
  });
});

describe('loadYamlFile', () => {
  it('refuses a file over 1 MiB without parsing it', async () => {
    const d = tempDir();
    const f = path.join(d, 'huge.yaml');
    writeFileSync(f, `# ${'x'.repeat(DEFAULT_MAX_BYTES)}\n`);
    const r = await loadYamlFile(f, 'huge.yaml');
    expect(r.documents).toEqual([]);
    expect(r.text).toBe('');
    expect(r.diagnostics).toEqual([expect.objectContaining({ severity: 'error', file: 'huge.yaml', message: expect.stringMatching(/too large.*limit is 1 MiB/) })]);
  });

  it('reports a missing file as a diagnostic, not an exception', async () => {
    const r = await loadYamlFile(path.join(tempDir(), 'nope.yaml'), 'nope.yaml');
    expect(r.diagnostics).toEqual([expect.objectContaining({ severity: 'error', file: 'nope.yaml', message: 'file not found' })]);
  });

  it('reads and parses a file, keeping the text', async () => {
    const d = tempDir();
    writeFileSync(path.join(d, 'n2.yaml'), fixture('n2.yaml'));
    const r = await loadYamlFile(path.join(d, 'n2.yaml'), 'species/n2.yaml');
    expect(r.file).toBe('species/n2.yaml');
    expect(r.text).toBe(fixture('n2.yaml'));
    expect(r.documents).toHaveLength(1);
    expect(r.documents[0]!.file).toBe('species/n2.yaml');
  });
});

describe('discoverSpeciesFiles', () => {
  function makeDatabase() {
    const root = tempDir();
    const db = path.join(root, 'db');
    const outside = path.join(root, 'outside');
    mkdirSync(path.join(db, 'sub', 'deeper'), { recursive: true });
    mkdirSync(outside);
    for (const f of ['qforge.yaml', 'b.yaml', 'a.YML', 'sub/c.yaml', 'sub/qforge.yaml', 'sub/deeper/d.yml', '.hidden.yaml', 'notes.txt']) {
      writeFileSync(path.join(db, f), 'name: X\n');
    }
    mkdirSync(path.join(db, '.git'));
    writeFileSync(path.join(db, '.git', 'e.yaml'), 'name: X\n');
    writeFileSync(path.join(outside, 'evil.yaml'), 'name: EVIL\n');
    return { root, db, outside };
  }

  it('lists *.yaml/*.yml recursively, sorted, without the root settings file or hidden entries', async () => {
    const { db } = makeDatabase();
    const r = await discoverSpeciesFiles(db);
    expect(r.diagnostics).toEqual([]);
    expect(r.files).toEqual(['a.YML', 'b.yaml', 'sub/c.yaml', 'sub/deeper/d.yml', 'sub/qforge.yaml'].map((f) => path.join(db, f)));
  });

  it('refuses a symlinked file or folder that resolves outside the database folder', async () => {
    const { db, outside } = makeDatabase();
    symlinkSync(path.join(outside, 'evil.yaml'), path.join(db, 'evil.yaml'));
    symlinkSync(outside, path.join(db, 'elsewhere'));
    symlinkSync(path.join('..', '..', 'outside', 'evil.yaml'), path.join(db, 'sub', 'relative-evil.yaml'));
    const r = await discoverSpeciesFiles(db);
    expect(r.files.some((f) => f.includes('evil') || f.includes('elsewhere'))).toBe(false);
    const refused = r.diagnostics.filter((d) => d.severity === 'error').map((d) => [d.file, d.message]);
    expect(refused).toHaveLength(3);
    for (const name of ['evil.yaml', 'elsewhere', path.join('sub', 'relative-evil.yaml')]) {
      expect(refused).toContainEqual([path.join(db, name), expect.stringContaining('symbolic link resolves outside the database folder')]);
    }
  });

  it('follows symlinks inside the database folder, reading each real file once', async () => {
    const { db } = makeDatabase();
    symlinkSync(path.join(db, 'sub'), path.join(db, 'alias-dir'));
    symlinkSync('b.yaml', path.join(db, 'b-again.yaml'));
    const r = await discoverSpeciesFiles(db);
    expect(r.files).toEqual(['a.YML', 'b.yaml', 'sub/c.yaml', 'sub/deeper/d.yml', 'sub/qforge.yaml'].map((f) => path.join(db, f)));
    expect(r.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    expect(r.diagnostics).toContainEqual(expect.objectContaining({ severity: 'warning', file: path.join(db, 'b-again.yaml') }));
  });

  it('refuses a broken symlink and reports a missing folder', async () => {
    const { db } = makeDatabase();
    symlinkSync(path.join(db, 'gone.yaml'), path.join(db, 'dangling.yaml'));
    const r = await discoverSpeciesFiles(db);
    expect(r.diagnostics).toContainEqual(expect.objectContaining({ severity: 'error', file: path.join(db, 'dangling.yaml'), message: expect.stringContaining('broken symbolic link') }));
    const missing = await discoverSpeciesFiles(path.join(db, 'nope'));
    expect(missing.files).toEqual([]);
    expect(missing.diagnostics[0]!.message).toContain('not found');
  });
});
