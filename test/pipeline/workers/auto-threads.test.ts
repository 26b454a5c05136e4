// The default thread count (no --jobs): our own rule, written by hand for this test (no external source).
import { describe, expect, it } from 'vitest';
import { autoThreads, CHECK_FILES_PER_WORKER, checkOnThreads, SPECIES_PER_THREAD } from '../../../pipeline/workers/auto-threads.js';
import { rm } from 'node:fs/promises';
import path from 'node:path';
import { runCli, tempWorkspace } from '../helpers.js';

describe('default worker threads', () => {
  it('stays on the main thread for small databases and grows one thread per SPECIES_PER_THREAD species up to the cores', () => {
    expect(autoThreads(0, 2)).toBe(1);
    expect(autoThreads(5, 2)).toBe(1);
    expect(autoThreads(2 * SPECIES_PER_THREAD - 1, 2)).toBe(1);
    expect(autoThreads(2 * SPECIES_PER_THREAD, 2)).toBe(2);
    expect(autoThreads(10_000, 2)).toBe(2);
    expect(autoThreads(10_000, 1)).toBe(1);
  });

  it('the files are checked on the threads only for large databases, sooner with more workers', () => {
    expect(checkOnThreads(1_000_000, 1)).toBe(false);
    expect(checkOnThreads(CHECK_FILES_PER_WORKER - 1, 2)).toBe(false);
    expect(checkOnThreads(CHECK_FILES_PER_WORKER, 2)).toBe(true);
    expect(checkOnThreads(CHECK_FILES_PER_WORKER / 4, 5)).toBe(true);
    expect(checkOnThreads(CHECK_FILES_PER_WORKER / 4 - 1, 5)).toBe(false);
  });

  it('build --help states the rule in force (the number comes from the rule itself)', async () => {
    const r = await runCli(['build', '--help'], process.cwd());
    const text = r.stdout.replace(/\s+/g, ' ');
    expect(text).toContain(`at most one per ${SPECIES_PER_THREAD} species to build`);
    expect(text).toContain(`at most one per ${SPECIES_PER_THREAD} species)`);
  });

  it('--jobs is a ceiling: no more threads than species to build (2 species, --jobs 64: 2 threads)', async () => {
    const ws = await tempWorkspace();
    try {
      for (const f of ['Ar.yaml', 'CO.yaml', 'H2O.yaml']) await rm(path.join(ws.db, f));
      const r = await runCli(['build', 'db', '--out', 'out', '--no-cache', '--jobs', '64'], ws.root);
      expect(r.code, r.stderr).toBe(0);
      expect(r.stderr).toMatch(/compute, fit and verify per species \(2 threads\)/);
    } finally {
      await ws.cleanup();
    }
  });
});
