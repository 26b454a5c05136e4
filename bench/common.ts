/**
 * Pieces shared by the benchmark scripts: command-line values, the size of a folder, and one build in a
 * child process (bench/child.ts) with the figures it reports about itself.
 */
import { spawnSync } from 'node:child_process';
import { readdir, readFile, stat } from 'node:fs/promises';
import path from 'node:path';

/** The value after `name` in `argv`, or undefined. */
export function option(argv: readonly string[], name: string): string | undefined {
  const i = argv.indexOf(name);
  return i >= 0 ? argv[i + 1] : undefined;
}

/** Every value after an occurrence of `name` in `argv` (a repeatable option), in order. */
export function options(argv: readonly string[], name: string): string[] {
  const out: string[] = [];
  for (let i = 0; i < argv.length; i++) if (argv[i] === name && argv[i + 1] !== undefined) out.push(argv[i + 1]!);
  return out;
}

/** Total bytes of the files below `dir` (0 when it does not exist). */
export async function folderBytes(dir: string): Promise<number> {
  let total = 0;
  for (const e of await readdir(dir, { withFileTypes: true, recursive: true }).catch(() => [])) {
    if (e.isFile()) total += (await stat(path.join(e.parentPath, e.name))).size;
  }
  return total;
}

/** What bench/child.ts writes about the command it ran. */
export interface ChildReport {
  exitCode: number;
  wallMs: number;
  userMs: number;
  systemMs: number;
  maxRssKb: number;
}

/**
 * Runs `args` (a qforge command line) in a child process of `child` (a child.js) and returns its report.
 * The files earlier runs wrote are flushed to disk first (`sync`, where the system has it): while the kernel
 * is still writing back a previous build's files, every file a build creates costs several times more
 * kernel time (on the 2-core machine, 10,000 files of 20 KB took 26 µs each after a flush and 108–118 µs
 * each right after a run that had written as many, a loop micro-benchmark), which made a build into a
 * fresh cache depend on what ran before it.
 */
export async function runChild(child: string, report: string, args: readonly string[]): Promise<ChildReport> {
  spawnSync('sync', { stdio: 'ignore' });
  const r = spawnSync(process.execPath, [child, report, ...args], { stdio: ['ignore', 'ignore', 'pipe'], maxBuffer: 1 << 30 });
  if (r.error) throw r.error;
  return JSON.parse(await readFile(report, 'utf8')) as ChildReport;
}

/** Median of `values` (the mean of the two middle values for an even count; NaN for none). */
export function median(values: readonly number[]): number {
  if (values.length === 0) return NaN;
  const v = [...values].sort((a, b) => a - b);
  const mid = v.length >> 1;
  return v.length % 2 ? v[mid]! : (v[mid - 1]! + v[mid]!) / 2;
}

/**
 * The lines of a text table: each column padded to its widest cell, left-aligned where `left(column)` says
 * so and right-aligned otherwise, two spaces between columns.
 */
export function alignColumns(rows: readonly (readonly string[])[], left: (column: number) => boolean): string[] {
  const widths = rows[0]!.map((_, i) => Math.max(...rows.map((r) => r[i]!.length)));
  return rows.map((r) => r.map((c, i) => (left(i) ? c.padEnd(widths[i]!) : c.padStart(widths[i]!))).join('  '));
}
