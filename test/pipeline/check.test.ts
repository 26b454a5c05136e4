/**
 * `qforge check` reports every error of a file in one run, even when the YAML itself has a duplicate key
 * (issue 2: "all errors of a file are reported at once"). Holds no reference values (no source to name).
 */
import { cp, mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { REPO, runCli, tempWorkspace } from './helpers.js';

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

      expect(r.stderr).toMatch(/checked 1 species in 1 file\(s\) \(1 invalid\): 4 error\(s\)/);

      const b = await runCli(['build', '.', '--out', 'out', '--keep-going', '--quiet'], root);
      expect(b.code).toBe(1);
      expect(b.stderr).toMatch(/no species succeeded/);

      // Beside a good species, --keep-going builds the good one and lists the recovered one as failed.
      await cp(path.join(REPO, 'test/fixtures/db/Ar.yaml'), path.join(root, 'good.yaml'));
      await writeFile(path.join(root, 'a.yaml'), (await readFile(path.join(root, 'a.yaml'), 'utf8')).replace(/Ar/g, 'Xe'));
      const k = await runCli(['build', '.', '--out', 'out', '--keep-going', '--json', '--quiet'], root);
      expect(k.code).toBe(1);
      const summary = JSON.parse(k.stdout);
      expect(summary.counts.failed).toBe(1);
      expect(summary.species.find((x: { name?: string }) => x.name === 'Xe')?.status).toBe('failed');
      expect(summary.species.find((x: { name?: string }) => x.name === 'Ar')?.status).toBe('ok');
    } finally {
      await rm(root, { recursive: true, force: true });
    }
  });
});

describe('a species whose own temperature_ranges are too narrow for fit.sampling_step', () => {
  it('fails with one error naming both settings, not "the fit failed"', async () => {
    // Fit needs >= 7 distinct temperatures per range (common practice, src/nasa7 sample checks).
    const ws = await tempWorkspace();
    try {
      const ar = path.join(ws.db, 'Ar.yaml');
      await writeFile(ar, `${await readFile(ar, 'utf8')}temperature_ranges: {low: 250, mid: 300, high: 6000}\n`);
      const r = await runCli(['build', 'db', '--out', 'out'], ws.root);
      expect(r.code).toBe(1);
      expect(r.stderr).toMatch(/Ar\.yaml:\d+:\d+: error: \[Ar\] temperature_ranges: .*too narrow for fit\.sampling_step = 20 K \(set in db\/qforge\.yaml:10:18\)/);
      expect(r.stderr).not.toMatch(/the fit failed/);
    } finally {
      await ws.cleanup();
    }
  });
});
