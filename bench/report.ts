/**
 * `npm run bench:report`: size and cost of the build report for a synthetic database (bench/synthetic.ts,
 * seeded), built once without and once with --report in child processes (bench/child.ts).
 * Prints the report.html size, the per-species pages' total (beyond the inline limit of 200), and the
 * extra wall time the report costs.
 *
 * Usage: node dist/bench/report.js [--size 1000] [--seed 1]
 */
import { mkdtemp, readdir, readFile, rm, stat } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { folderBytes, runChild } from './common.js';
import { writeSyntheticDatabase } from './synthetic.js';

const here = path.dirname(fileURLToPath(import.meta.url));
const arg = (name: string, fallback: number) => {
  const i = process.argv.indexOf(name);
  return i >= 0 ? Number(process.argv[i + 1]) : fallback;
};
const size = arg('--size', 1000);
const seed = arg('--seed', 1);

const build = (args: string[], reportFile: string) => runChild(path.join(here, 'child.js'), reportFile, args);

const root = await mkdtemp(path.join(tmpdir(), 'qforge-bench-report-'));
try {
  const db = path.join(root, 'db');
  await writeSyntheticDatabase(db, size, seed, 'tolerances: {cp: 2, h: 0.5, s: 0.5}');
  const plain = await build(['build', db, '--out', path.join(root, 'plain'), '--no-cache', '--quiet', '--keep-going'], path.join(root, 'plain.json'));
  const withReport = await build(['build', db, '--out', path.join(root, 'out'), '--no-cache', '--quiet', '--keep-going', '--report'], path.join(root, 'report.json'));
  const main = (await stat(path.join(root, 'out', 'report.html'))).size;
  const pages = await folderBytes(path.join(root, 'out', 'report'));
  const count = (await readdir(path.join(root, 'out', 'report')).catch(() => [])).length;
  const summary = JSON.parse(await readFile(path.join(root, 'out', 'summary.json'), 'utf8')) as { counts: { ok: number } };
  const mb = (b: number) => (b / 1e6).toFixed(2);
  console.log(`species: ${size} (${summary.counts.ok} built), seed ${seed}`);
  console.log(`report.html: ${mb(main)} MB; per-species pages: ${count} files, ${mb(pages)} MB (${(pages / Math.max(1, count) / 1e3).toFixed(1)} kB each)`);
  console.log(`wall time: ${(plain.wallMs / 1000).toFixed(2)} s without the report, ${(withReport.wallMs / 1000).toFixed(2)} s with it`);
} finally {
  await rm(root, { recursive: true, force: true });
}
