/**
 * Tree-against-tree measurement of `npm run bench` (also runnable alone): for seeded synthetic databases of
 * N species (bench/synthetic.ts), each qforge tree's cold build into an empty cache, then — in alternating
 * rounds — its cold build without a cache, its cold build into a cache emptied for the round, and its
 * no-change rebuild (the nightly case), with peak RSS, each build in a child process (bench/child.ts),
 * started once earlier runs' files are flushed to disk (bench/common.ts `runChild`). `--child` points at
 * the child.js of another qforge tree, so a "before" figure is measured on the same machine, in the same
 * run and on the same files as the "after" one (e.g. a build of main in a temporary clone).
 *
 * Why rounds in alternating order: the 2-core machine's speed drifts by 10–30 % within minutes (a loop
 * micro-benchmark ran 640 and 1,000 ms back to back), so trees measured one after the other compared the
 * machine's moods as much as the code. Round r runs the trees in the given order when r is even and in
 * the reverse order when it is odd; the table gives each tree's median with the range of its rounds.
 *
 * Usage: node dist/bench/runner.js [--sizes 1000,2000,10000] [--seed 1] [--jobs N] [--rounds 3]
 *        [--child OTHER_TREE/dist/bench/child.js ...] [--json FILE]
 */
import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { folderBytes, median, options, runChild } from './common.js';
import { writeSyntheticDatabase } from './synthetic.js';

/** The same settings as bench/run.ts: the defaults. */
const BENCH_SETTINGS = '';

/** Rounds of the alternating comparison unless `--rounds` says otherwise. */
export const DEFAULT_ROUNDS = 3;

export interface TreeFigures {
  tree: string;
  n: number;
  /** Cold build into an empty cache (once, before the rounds: the cache the rebuilds use). */
  coldWallS: number;
  coldPeakRssMb: number;
  /**
   * Per round: a cold build into a cache emptied for it. Measured in every round, not only once: the
   * creation of its ~5 entry files per species is the part of a build that varies most with the machine's
   * state (DEVELOPERS.md "Folders of a fresh cache").
   */
  freshWallS: number[];
  freshPeakRssMb: number;
  /** Per round, in round order: cold build without a cache (wall, CPU of all threads) and no-change rebuild. */
  noCacheWallS: number[];
  noCacheCpuS: number[];
  rebuildWallS: number[];
  /** Largest peak RSS over the rounds. */
  noCachePeakRssMb: number;
  rebuildPeakRssMb: number;
  cacheHits: number;
  cacheMb: number;
}

/** Round r's order of the trees: as given for even r, reversed for odd r. */
export function roundOrder<T>(items: readonly T[], round: number): T[] {
  return round % 2 === 0 ? [...items] : [...items].reverse();
}

/**
 * Every tree's figures on one synthetic database of n species: a cold build into its own empty cache,
 * then `rounds` alternating rounds of a build without a cache, a build into an emptied cache and a
 * no-change rebuild (see the file comment).
 */
export async function benchTrees(children: readonly string[], n: number, seed: number, jobs: string[], rounds = DEFAULT_ROUNDS): Promise<TreeFigures[]> {
  const work = await mkdtemp(path.join(tmpdir(), 'qforge-bench-runner-'));
  try {
    const dir = path.join(work, 'species');
    await writeSyntheticDatabase(dir, n, seed, BENCH_SETTINGS);
    const report = path.join(work, 'report.json');
    const trees = children.map((child, i) => ({ child, cache: path.join(work, `cache-${i}`), out: path.join(work, `build-${i}`) }));
    const figures = new Map<string, TreeFigures>();
    for (const t of trees) {
      const cold = await runChild(t.child, report, ['build', dir, '--out', t.out, '-q', '-k', '--cache-dir', t.cache, ...jobs]);
      figures.set(t.child, {
        tree: path.resolve(path.dirname(t.child), '../..'),
        n,
        coldWallS: cold.wallMs / 1000,
        coldPeakRssMb: cold.maxRssKb / 1024,
        freshWallS: [],
        freshPeakRssMb: cold.maxRssKb / 1024,
        noCacheWallS: [],
        noCacheCpuS: [],
        rebuildWallS: [],
        noCachePeakRssMb: 0,
        rebuildPeakRssMb: 0,
        cacheHits: 0,
        cacheMb: (await folderBytes(t.cache)) / 1048576,
      });
    }
    for (let round = 0; round < rounds; round++) {
      for (const t of roundOrder(trees, round)) {
        const f = figures.get(t.child)!;
        const plain = await runChild(t.child, report, ['build', dir, '--out', path.join(work, 'no-cache'), '-q', '-k', '--no-cache', ...jobs]);
        f.noCacheWallS.push(plain.wallMs / 1000);
        f.noCacheCpuS.push((plain.userMs + plain.systemMs) / 1000);
        f.noCachePeakRssMb = Math.max(f.noCachePeakRssMb, plain.maxRssKb / 1024);
        // Cache and output folder both emptied, as for the first cold build: a build into an existing OUT
        // would also hash the previous outputs while it checks.
        const freshCache = path.join(work, 'fresh-cache');
        const freshOut = path.join(work, 'fresh');
        await rm(freshCache, { recursive: true, force: true });
        await rm(freshOut, { recursive: true, force: true });
        const fresh = await runChild(t.child, report, ['build', dir, '--out', freshOut, '-q', '-k', '--cache-dir', freshCache, ...jobs]);
        f.freshWallS.push(fresh.wallMs / 1000);
        f.freshPeakRssMb = Math.max(f.freshPeakRssMb, fresh.maxRssKb / 1024);
        const warm = await runChild(t.child, report, ['build', dir, '--out', t.out, '-q', '-k', '--cache-dir', t.cache, ...jobs]);
        f.rebuildWallS.push(warm.wallMs / 1000);
        f.rebuildPeakRssMb = Math.max(f.rebuildPeakRssMb, warm.maxRssKb / 1024);
        const summary = JSON.parse(await readFile(path.join(t.out, 'summary.json'), 'utf8')) as { counts: { cache_hits: number } };
        f.cacheHits = summary.counts.cache_hits;
      }
    }
    return trees.map((t) => figures.get(t.child)!);
  } finally {
    await rm(work, { recursive: true, force: true });
  }
}

/** "median (min–max)" of a tree's rounds. */
function spread(values: readonly number[], digits: number): string {
  return `${median(values).toFixed(digits)} (${Math.min(...values).toFixed(digits)}–${Math.max(...values).toFixed(digits)})`;
}

export function formatTreeTable(rows: readonly TreeFigures[]): string {
  const head =
    'tree                                 N  no-cache wall s, median (range)  CPU s  RSS MB  fresh-cache s, median (range)  RSS MB  rebuild s, median (range)  RSS MB   hits  cache MB';
  const lines = rows.map((r) =>
    [
      r.tree.slice(-30).padEnd(30),
      String(r.n).padStart(6),
      spread(r.noCacheWallS, 2).padStart(32),
      median(r.noCacheCpuS).toFixed(2).padStart(6),
      r.noCachePeakRssMb.toFixed(0).padStart(7),
      spread(r.freshWallS, 2).padStart(30),
      r.freshPeakRssMb.toFixed(0).padStart(7),
      spread(r.rebuildWallS, 2).padStart(26),
      r.rebuildPeakRssMb.toFixed(0).padStart(7),
      String(r.cacheHits).padStart(6),
      r.cacheMb.toFixed(1).padStart(9),
    ].join(' '),
  );
  return [`rounds: ${rows[0]?.noCacheWallS.length ?? 0}, trees in alternating order`, head, ...lines].join('\n');
}

async function main(): Promise<void> {
  const argv = process.argv.slice(2);
  const sizes = (options(argv, '--sizes')[0] ?? '1000,2000,10000').split(',').map(Number);
  const seed = Number(options(argv, '--seed')[0] ?? 1);
  const rounds = Number(options(argv, '--rounds')[0] ?? DEFAULT_ROUNDS);
  const jobs = options(argv, '--jobs').length ? ['--jobs', options(argv, '--jobs')[0]!] : [];
  const own = path.join(path.dirname(fileURLToPath(import.meta.url)), 'child.js');
  const children = [...options(argv, '--child'), own];
  const rows: TreeFigures[] = [];
  for (const n of sizes) rows.push(...(await benchTrees(children, n, seed, jobs, rounds)));
  console.log(formatTreeTable(rows));
  const json = options(argv, '--json')[0];
  if (json) await writeFile(json, `${JSON.stringify(rows, null, 2)}\n`);
}

if (process.argv[1] && fileURLToPath(import.meta.url) === path.resolve(process.argv[1])) await main();
