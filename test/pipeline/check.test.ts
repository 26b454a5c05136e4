/**
 * `qforge check` reports every error of a file in one run, even when the YAML itself has a duplicate key
 * (issue 2: "all errors of a file are reported at once"). Holds no reference values (no source to name).
 */
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from './helpers.js';

describe('qforge check', () => {
  it('a duplicate key does not hide the other mistakes of the document, and the document is not built', async () => {
    const root = await mkdtemp(path.join(tmpdir(), 'qforge-check-'));
    try {
      await writeFile(
        path.join(root, 'a.yaml'),
        'name: Ar\nname: Ar2\ncomposition: {Ar: 1}\ncharge: 0.5\nenthalpy_of_formation: 0\nsources: []\nstructure: atomic\n',
      );
      const r = await runCli(['check', '.'], root);
      expect(r.code).toBe(1);
      const errors = r.stderr.split('\n').filter((l) => l.includes(': error: '));
      expect(errors).toHaveLength(4);
      expect(errors[0]).toMatch(/^a\.yaml:2:1: error: duplicate key 'name'/);
      expect(r.stderr).toMatch(/a\.yaml:4:9: error: \[Ar\] charge:/);
      expect(r.stderr).toMatch(/a\.yaml:6:10: error: \[Ar\] sources:/);
      expect(r.stderr).toMatch(/a\.yaml:7:12: error: \[Ar\] structure: .*did you mean 'atom'/);

      const b = await runCli(['build', '.', '--out', 'out', '--keep-going', '--quiet'], root);
      expect(b.code).toBe(1);
      expect(b.stderr).toMatch(/no species succeeded/);
    } finally {
      await rm(root, { recursive: true, force: true });
    }
  });
});
