/**
 * The CLI bounds V8's heap growth (cli.ts HEAP_GROWING_PERCENT) unless node was started with a growth of the
 * user's own or QFORGE_HEAP_GROWTH says otherwise; the values below are written by hand. Whether the bound
 * lowers peak memory is measured by `npm run bench`, not here.
 */
import { execFileSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { HEAP_GROWING_PERCENT, heapGrowthForDatabase, heapGrowthSetting, LARGE_DATABASE_HEAP_GROWING_PERCENT, pretenuringOff } from '../../pipeline/cli.js';
import { LARGE_DATABASE_FILES } from '../../pipeline/workers/heap.js';
import { runBuild } from '../../pipeline/runner.js';
import { runCli, tempWorkspace } from './helpers.js';

describe('heapGrowthSetting', () => {
  it('the default, the environment value, V8 own growth for 0, and node own flag winning', () => {
    expect(heapGrowthSetting({}, [])).toEqual({ percent: HEAP_GROWING_PERCENT, byDefault: true });
    expect(heapGrowthSetting({ QFORGE_HEAP_GROWTH: '50' }, ['--enable-source-maps'])).toEqual({ percent: 50 });
    expect(heapGrowthSetting({ QFORGE_HEAP_GROWTH: '0' }, [])).toEqual({});
    expect(heapGrowthSetting({ QFORGE_HEAP_GROWTH: '50' }, ['--heap-growing-percent=5'])).toEqual({});
    expect(heapGrowthSetting({}, ['--heap_growing_percent=5'])).toEqual({});
  });

  it('a malformed value is refused with what was expected, and the CLI exits 2 naming it', async () => {
    for (const bad of ['-1', '1.5', '20%', 'lots', '5000']) {
      expect(heapGrowthSetting({ QFORGE_HEAP_GROWTH: bad }, [])).toEqual({ error: expect.stringMatching(/^QFORGE_HEAP_GROWTH must be a whole number of percent from 0 to 1000/) });
    }
    const ws = await tempWorkspace();
    try {
      const r = await runCli(['check', 'db'], ws.root, { QFORGE_HEAP_GROWTH: 'lots' });
      expect(r.code).toBe(2);
      expect(r.stderr).toContain('qforge: error: QFORGE_HEAP_GROWTH must be a whole number of percent from 0 to 1000');
      expect(r.stderr).toContain('got "lots"');
    } finally {
      await ws.cleanup();
    }
  });
});

describe('heap growth by database size', () => {
  it('the default drops for databases above LARGE_DATABASE_FILES species files, and the build says how many it found', async () => {
    expect(heapGrowthForDatabase(LARGE_DATABASE_FILES)).toBeUndefined();
    expect(heapGrowthForDatabase(LARGE_DATABASE_FILES + 1)).toBe(LARGE_DATABASE_HEAP_GROWING_PERCENT);
    expect(LARGE_DATABASE_HEAP_GROWING_PERCENT).toBeLessThan(HEAP_GROWING_PERCENT);
    const ws = await tempWorkspace();
    try {
      const told: number[] = [];
      await runBuild({ dir: ws.db, out: ws.out, cacheDir: null, jobs: 1, onDatabaseSize: (n) => told.push(n) });
      // The fixture database holds five species files.
      expect(told).toEqual([5]);
    } finally {
      await ws.cleanup();
    }
  });
});

describe('pretenuringOff', () => {
  it('on by default, left alone when node was started with either form of the flag', () => {
    expect(pretenuringOff([])).toBe(true);
    expect(pretenuringOff(['--enable-source-maps'])).toBe(true);
    expect(pretenuringOff(['--allocation-site-pretenuring'])).toBe(false);
    expect(pretenuringOff(['--no-allocation-site-pretenuring'])).toBe(false);
    expect(pretenuringOff(['--no_allocation_site_pretenuring'])).toBe(false);
  });

  it('set once node runs, the flag still stops V8 from pretenuring (this node version)', () => {
    // A script written for this test: objects of one allocation site that survive young collections, which
    // V8 pretenures; its pretenuring trace counts the sites it tenures.
    const script = `
      if (process.argv[1] === 'off') require('v8').setFlagsFromString('--no-allocation-site-pretenuring');
      const keep = [];
      const make = (i) => ({ a: i, b: [i, i + 1] });
      for (let r = 0; r < 40; r++) { for (let i = 0; i < 50000; i++) keep.push(make(i)); if (keep.length > 400000) keep.splice(0, 200000); }
    `;
    const tenured = (mode: string) =>
      (execFileSync(process.execPath, ['--trace-pretenuring-statistics', '-e', script, mode], { encoding: 'utf8' }).match(/=> tenure/g) ?? []).length;
    expect(tenured('on')).toBeGreaterThan(0);
    expect(tenured('off')).toBe(0);
  });
});
