/**
 * Runner measurement of `npm run bench` (also runnable alone): the no-change rebuild — the nightly case —
 * and the peak RSS of a cold build and of the rebuild, for seeded synthetic databases of N species
 * (bench/synthetic.ts), each build in a child process (bench/child.ts). `--child` points at the
 * child.js of another qforge tree, so a "before" figure is measured on the same machine, in the same
 * run and on the same files as the "after" one (e.g. a build of main in a temporary clone).
 *
 * Usage: node dist/bench/runner.js [--sizes 1000,2000,10000] [--seed 1] [--jobs N]
 *        [--child OTHER_TREE/dist/bench/child.js ...] [--json FILE]
 */
import { spawnSync } from 'node:child_process';
import { mkdtemp, readdir, readFile, rm, stat, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { writeSyntheticDatabase } from './synthetic.js';

/** The same settings as bench/run.ts: the defaults. */
const BENCH_SETTINGS = '';

export interface RebuildFigures {
  tree: string;
  n: number;
  coldWallS: number;
  coldPeakRssMb: number;
  rebuildWallS: number;
  rebuildMsPerSpecies: number;
  rebuildPeakRssMb: number;
  cacheHits: number;
  cacheMb: number;
}

async function folderBytes(dir: string): Promise<number> {
  let total = 0;
  for (const e of await readdir(dir, { withFileTypes: true, recursive: true }).catch(() => [])) {
    if (e.isFile()) total += (await stat(path.join(e.parentPath, e.name))).size;
  }
  return total;
}

async function runChild(child: string, report: string, args: string[]): Promise<{ wallMs: number; maxRssKb: number }> {
  const r = spawnSync(process.execPath, [child, report, ...args], { stdio: ['ignore', 'ignore', 'pipe'], maxBuffer: 1 << 30 });
  if (r.error) throw r.error;
  return JSON.parse(await readFile(report, 'utf8')) as { wallMs: number; maxRssKb: number };
}

/** Cold build into an empty cache, then the same build again (nothing changed), with `child`. */
export async function benchRebuild(child: string, n: number, seed: number, jobs: string[]): Promise<RebuildFigures> {
  const work = await mkdtemp(path.join(tmpdir(), 'qforge-bench-runner-'));
  try {
    const dir = path.join(work, 'species');
    await writeSyntheticDatabase(dir, n, seed, BENCH_SETTINGS);
    const cache = path.join(work, 'cache');
    const out = path.join(work, 'build');
    const args = ['build', dir, '--out', out, '-q', '-k', '--cache-dir', cache, ...jobs];
    const report = path.join(work, 'report.json');
    const cold = await runChild(child, report, args);
    const warm = await runChild(child, report, args);
    const summary = JSON.parse(await readFile(path.join(out, 'summary.json'), 'utf8')) as { counts: { cache_hits: number } };
    return {
      tree: path.resolve(path.dirname(child), '../..'),
      n,
      coldWallS: cold.wallMs / 1000,
      coldPeakRssMb: cold.maxRssKb / 1024,
      rebuildWallS: warm.wallMs / 1000,
      rebuildMsPerSpecies: warm.wallMs / n,
      rebuildPeakRssMb: warm.maxRssKb / 1024,
      cacheHits: summary.counts.cache_hits,
      cacheMb: (await folderBytes(cache)) / 1048576,
    };
  } finally {
    await rm(work, { recursive: true, force: true });
  }
}

export function formatRebuildTable(rows: readonly RebuildFigures[]): string {
  const head = 'tree                                  N   cold s  cold RSS MB  rebuild s  ms/species  rebuild RSS MB  hits   cache MB';
  const lines = rows.map((r) =>
    [
      r.tree.slice(-30).padEnd(30),
      String(r.n).padStart(7),
      r.coldWallS.toFixed(1).padStart(8),
      r.coldPeakRssMb.toFixed(0).padStart(12),
      r.rebuildWallS.toFixed(2).padStart(10),
      r.rebuildMsPerSpecies.toFixed(2).padStart(11),
      r.rebuildPeakRssMb.toFixed(0).padStart(15),
      String(r.cacheHits).padStart(5),
      r.cacheMb.toFixed(1).padStart(10),
    ].join(' '),
  );
  return [head, ...lines].join('\n');
}

function options(argv: readonly string[], name: string): string[] {
  const out: string[] = [];
  for (let i = 0; i < argv.length; i++) if (argv[i] === name && argv[i + 1] !== undefined) out.push(argv[i + 1]!);
  return out;
}

async function main(): Promise<void> {
  const argv = process.argv.slice(2);
  const sizes = (options(argv, '--sizes')[0] ?? '1000,2000,10000').split(',').map(Number);
  const seed = Number(options(argv, '--seed')[0] ?? 1);
  const jobs = options(argv, '--jobs').length ? ['--jobs', options(argv, '--jobs')[0]!] : [];
  const own = path.join(path.dirname(fileURLToPath(import.meta.url)), 'child.js');
  const children = [...options(argv, '--child'), own];
  const rows: RebuildFigures[] = [];
  for (const n of sizes) {
    for (const c of children) {
      rows.push(await benchRebuild(c, n, seed, jobs));
      console.error(formatRebuildTable(rows.slice(-1)).split('\n')[1]);
    }
  }
  console.log(formatRebuildTable(rows));
  const json = options(argv, '--json')[0];
  if (json) await writeFile(json, `${JSON.stringify(rows, null, 2)}\n`);
}

if (process.argv[1] && fileURLToPath(import.meta.url) === path.resolve(process.argv[1])) await main();
