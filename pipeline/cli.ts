/**
 * The command line. `main` parses the arguments with commander, runs one command and returns its exit
 * code; it never calls process.exit (bin/qforge.js sets process.exitCode).
 *
 * Exit codes (the one rule for every command):
 *   0  success;
 *   1  the data failed: input, species, fit checks, a diff gate or compare breach, malformed build or
 *      reference files, an output folder locked by a live build, a file-system error while reading or
 *      writing (reported as `qforge: error: <syscall> '<path>': <CODE> (<reason>)`);
 *   2  usage: bad command line (no command, unknown option, bad value, `table` without or with a wrong
 *      --name), a missing or unusable path argument (DIR, FILE, an --out qforge cannot create or may not
 *      replace, a database or cache folder inside the output folder).
 * bin/qforge.js turns anything else (a bug) into exit 3. Heavy modules are imported per command so
 * start-up stays fast.
 */
import path from 'node:path';
import { setFlagsFromString } from 'node:v8';
import { Command, CommanderError, InvalidArgumentError, Option } from 'commander';
import type { Diagnostic } from './core/diagnostics.js';
import type { CliIo } from './commands/io.js';
import { displayPath } from './core/display-path.js';
import { parseShard, type Shard } from './core/shard.js';
import { CHECK_FILES_PER_WORKER, SPECIES_PER_THREAD } from './workers/auto-threads.js';
import { LARGE_DATABASE_FILES } from './workers/heap.js';

export type { CliIo } from './commands/io.js';


/** A usage problem found after parsing (e.g. a folder that does not exist): exit 2. */
export class UsageError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'UsageError';
  }
}

const EXAMPLES = {
  build: `
Examples:
  qforge build                         build species/ into build/
  qforge build mydb --out mydb-build   build another database folder
  qforge build --keep-going --json     write the good species, print the summary
  qforge build --no-cache --jobs 1     recompute everything, one at a time

Outputs (in OUT): thermo.json, nasa7.txt, tables/<name>.csv, summary.json,
and with --report (or outputs.report in qforge.yaml) report.html
(summary.json holds timings; the other files are byte-identical for identical
inputs). The cache lives in .qforge-cache/ inside the database folder
(--cache-dir to move it; qforge cache prune drops entries no species uses).
--jobs N runs compute, fit and verify on N threads: this one and N-1 worker
threads (default: the number of cores, at most one per ${SPECIES_PER_THREAD} species to build,
since each thread compiles and warms up the code again, ~2 s of CPU; never
more threads than species); the outputs are the same bytes for every N.

Sharding: --shard I/N builds only the species whose name hashes into shard I
of N; qforge merge SHARD_DIR... --out OUT joins all N shard folders into the
database an unsharded build writes.

OUT belongs to qforge: every build replaces it as a whole, atomically. Its
.qforge-build file lists what qforge wrote; a file you put into OUT stops the
build (exit 2) instead of being deleted. OUT may not contain the database
folder or the cache; OUT inside the database folder is fine (only *.yaml
files are read there, and OUT holds none).`,
  check: `
Examples:
  qforge check                 check species/ (settings and every species file)
  qforge check mydb --json     the diagnostics as JSON`,
  table: `
Examples:
  qforge table species/N2.yaml
  qforge table species/O2.yaml --at 298.15,1000,2000
  qforge table test/fixtures/input/multi.yaml --name N2
  qforge table species/H2O.yaml --range 200:6000:100 --format csv > H2O.csv
  qforge table build --name N2 --digits 6     the fitted polynomial of a build
  qforge table build/nasa7.txt --name N2 --at 298.15,1000

A build folder or an 80-column file prints the fitted polynomial (same columns;
H includes the enthalpy of formation, G = H - T S). Temperatures outside the
record's fitted range are refused (exit 2); the default grid is cut to it.

--name picks one species of a file holding several; a missing or wrong --name
then is a usage error (exit 2), like a FILE that does not exist.`,
  diff: `
Examples:
  qforge diff build-yesterday build
  qforge diff old/nasa7.txt build --fail-above cp=0.05,h=0.1,s=0.05
  qforge diff build-main build --json

A species counts as "properties changed" when any of |dCp|, |dS| exceeds
0.001 J/(mol K) or |dH| exceeds 0.001 kJ/mol somewhere on the common range
(10 K grid); otherwise only its coefficients moved.`,
  compare: `
Examples:
  qforge compare build --reference janaf/N2.csv janaf/O2.csv
  qforge compare build --reference tables.csv --tolerance cp=0.1,s=0.05,h=0.02
  qforge compare build --database species    references of species/qforge.yaml
  qforge compare build --quiet                references recorded in the build
  qforge compare build --database species --strict   ignore known deviations

Reference CSV: one row per temperature; header names with units, e.g.
  species,T [K],Cp [J/(mol K)],S [J/(mol K)],H-H298 [kJ/mol]
The species column is optional: without it the file name (without .csv) is the
species name. Lines starting with '#' are comments. Units: J/(mol K),
cal/(mol K) for Cp and S; kJ/mol, J/mol, kcal/mol for H-H298. An 80-column
NASA file can also serve as the reference.

Known deviations (references.known_deviations in qforge.yaml: species, from/to
K, widened tolerances, reason) turn a value beyond the normal tolerance but
within the widened one into "known": printed with its reason, counted
separately, exit 0. --tolerance changes the normal limits only; --strict
ignores the known deviations. Entries that name a missing species or are no
longer needed are warned about.`,
  merge: `
Examples:
  qforge build species --shard 1/2 --out shard-1
  qforge build species --shard 2/2 --out shard-2
  qforge merge shard-1 shard-2 --out build

Every shard 1..N of one sharded build must be given once, built from the same
database, settings and qforge version; the merged folder is byte for byte the
one an unsharded build writes (summary.json aside, which holds timings).`,
  cache: `
Examples:
  qforge cache prune                      prune species/.qforge-cache
  qforge cache prune mydb --cache-dir /ci/cache

Entries are kept while this database's species or another database that built
into the same cache folder (its folder still existing) use them.`,
};

interface BuildFlags {
  cache: boolean;
  cacheDir?: string;
  keepGoing?: boolean;
  jobs?: number;
  shard?: Shard;
  quiet?: boolean;
  json?: boolean;
  strict?: boolean;
  report?: boolean;
  reportAgainst?: string;
  uncertaintySamples?: number;
}

function shardArg(value: string): Shard {
  try {
    return parseShard(value);
  } catch (e) {
    throw new InvalidArgumentError((e as Error).message);
  }
}

function positiveInt(value: string): number {
  const n = Number(value);
  if (!Number.isInteger(n) || n < 1 || n > 1024) throw new InvalidArgumentError('expected a whole number from 1 to 1024');
  return n;
}

function positiveSamples(value: string): number {
  const n = Number(value);
  if (!Number.isInteger(n) || n < 2 || n > 100000) throw new InvalidArgumentError('expected a whole number of samples from 2 to 100000');
  return n;
}

/** Parses `cp=0.1,h=0.2,s=0.3` (any subset). */
export function parseTriple(value: string): { cp?: number; h?: number; s?: number } {
  const out: { cp?: number; h?: number; s?: number } = {};
  for (const part of value.split(',')) {
    const m = /^\s*(cp|h|s)\s*=\s*([0-9.eE+-]+)\s*$/.exec(part);
    const n = m ? Number(m[2]) : NaN;
    if (!m || !Number.isFinite(n) || n <= 0) {
      throw new InvalidArgumentError(`'${part}': expected cp=N, h=N or s=N with N > 0, comma separated`);
    }
    out[m[1] as 'cp' | 'h' | 's'] = n;
  }
  return out;
}

function printDiagnostics(io: CliIo, ds: readonly Diagnostic[], format: (d: Diagnostic) => string): void {
  for (const d of ds) io.stderr.write(`${format(d)}\n`);
}

/**
 * TEST-ONLY hook (test/pipeline/interrupt.test.ts): with QFORGE_TEST=1 and QFORGE_TEST_PAUSE set to
 * 'before-swap' or 'mid-swap', the build announces the point on stderr and holds still for 60 s so the
 * test can kill it exactly there. Both variables are required, so a stray QFORGE_TEST_PAUSE in a user's
 * environment never stalls a real build. Not a user feature; not documented in --help.
 */
async function waitForTestPause(io: CliIo, where: string): Promise<void> {
  if (io.env.QFORGE_TEST !== '1' || io.env.QFORGE_TEST_PAUSE !== where) return;
  io.stderr.write(`qforge: test pause ${where}\n`);
  await new Promise((r) => setTimeout(r, 60_000));
}

/** Width the help text is wrapped to (and the epilogs are written for). */
export const HELP_WIDTH = 80;

/**
 * V8's old-generation growth after each full collection, in percent (V8 flag --heap-growing-percent). By
 * default V8 lets the heap grow to 1.1–4× what survived, and a build's garbage (grids, fit scratch, texts
 * between stages) is what fills it: the resident memory of a build was mostly head-room. 50 % keeps each
 * thread's heap within 1.5× what it holds, at the price of more full collections. Measured (synthetic
 * species, cold --no-cache, 2 threads, with allocation-site pretenuring off (`pretenuringOff`), the
 * 2-core machine, 2026-12-03): 10,000 species 21.1 s / 371 MB with V8's own growth, 24.0 s / 253 MB with
 * 50 %, 26.4 s / 246 MB with 20 % (the earlier default); 50,000 species with 50 %: 357 MB (--no-cache) and
 * 401–482 MB (into a fresh cache), which is why large databases drop to 20 % (`heapGrowthForDatabase`). The
 * memory bound of the throughput issue (400 MB at 10,000, 500 MB at 50,000) is met with it, so it is the
 * default; QFORGE_HEAP_GROWTH=0 buys the rest of the speed back.
 * With so little room the threads' small heaps started a full collection every ~250 ms whatever they
 * promoted; pipeline/workers/heap.ts gives them a fixed amount of room instead (measured there).
 * (V8's parallel collector threads competing with the build's threads for the cores were part of the price:
 * node --single-threaded-gc bin/qforge.js … saved ~5 % at 10,000 species before heap.ts, nothing since —
 * 18.6 and 20.5 s against 18.9 and 18.9 s, alternating, 2026-12-05. The flag cannot be set once V8 runs.)
 */
export const HEAP_GROWING_PERCENT = 50;

/**
 * Above this many species files the default growth drops to LARGE_DATABASE_HEAP_GROWING_PERCENT once the
 * build has counted them (V8 reads the flag at each collection, so the change takes effect from then on):
 * the main thread's live heap grows with the database (every species' check findings until its turn), and a
 * fixed percentage of it is head-room that grows too. Measured (50,000 synthetic species into a fresh
 * cache, bench, 2026-12-03): 482 MB peak RSS with 50 %, 431 MB with 20 % (the previous session's bench);
 * 10,000 species keep the faster 50 %.
 */
export const LARGE_DATABASE_HEAP_GROWING_PERCENT = 20;

/** The growth for a database of `files` species files when the growth is qforge's default, else undefined. */
export function heapGrowthForDatabase(files: number): number | undefined {
  return files > LARGE_DATABASE_FILES ? LARGE_DATABASE_HEAP_GROWING_PERCENT : undefined;
}
const HEAP_GROWTH_ENV = 'QFORGE_HEAP_GROWTH';

/**
 * The heap growth this process (and so its worker threads: the flag is process-wide) should run with:
 * QFORGE_HEAP_GROWTH (whole percent, 0 = V8's own growth) or HEAP_GROWING_PERCENT; none when node itself
 * was started with --heap-growing-percent (the user's choice wins). A malformed value is an error.
 */
export function heapGrowthSetting(env: NodeJS.ProcessEnv, execArgv: readonly string[]): { percent?: number; byDefault?: true } | { error: string } {
  if (execArgv.some((a) => /^--heap[-_]growing[-_]percent\b/.test(a))) return {};
  const given = env[HEAP_GROWTH_ENV];
  if (given === undefined || given === '') return { percent: HEAP_GROWING_PERCENT, byDefault: true };
  if (!/^\d{1,4}$/.test(given.trim()) || Number(given) > 1000) {
    return { error: `${HEAP_GROWTH_ENV} must be a whole number of percent from 0 to 1000 (0: V8's own heap growth); got ${JSON.stringify(given)}` };
  }
  const percent = Number(given);
  return percent === 0 ? {} : { percent };
}

/**
 * Whether to turn off V8's allocation-site pretenuring for this process (and its worker threads: the flag is
 * process-wide): yes, unless node was started with either form of the flag (the user's choice wins).
 * Why: V8 moves an allocation site to the old generation once most of its objects survive a young
 * collection, and a species' samples, grids and fit scratch do survive one — they live for the few
 * milliseconds of their species — so hundreds of sites were pretenured (node --trace-pretenuring-statistics)
 * and their short-lived objects filled the old generation, which with a 20 % growth meant a full collection
 * every ~90 ms. Measured (2,000 synthetic species, cold --no-cache, alternating runs on the 2-core
 * machine, 20 % growth): 1 thread 73 → 43 full collections, CPU 10.0–10.4 → 9.5 s; 2 threads wall 7.1–7.3 → 6.8–6.9 s,
 * CPU 12.0–12.3 → 11.4–11.6 s, peak RSS 218–222 → 224–229 MB. The flag is read when V8 judges its sites,
 * so setting it at start-up, before a build allocates, takes effect.
 */
export function pretenuringOff(execArgv: readonly string[]): boolean {
  return !execArgv.some((a) => /^--(no[-_])?allocation[-_]site[-_]pretenuring\b/.test(a));
}

export async function main(argv: string[], ioIn?: Partial<CliIo>): Promise<number> {
  const io: CliIo = {
    stdout: ioIn?.stdout ?? process.stdout,
    stderr: ioIn?.stderr ?? process.stderr,
    cwd: ioIn?.cwd ?? process.cwd(),
    isTTY: ioIn?.isTTY ?? Boolean(process.stderr.isTTY),
    env: ioIn?.env ?? process.env,
  };
  const abs = (p: string) => path.resolve(io.cwd, p);
  let exitCode = 0;
  const growth = heapGrowthSetting(io.env, process.execArgv);
  if ('error' in growth) {
    io.stderr.write(`qforge: error: ${growth.error}\n`);
    return 2;
  }
  if (growth.percent !== undefined) setFlagsFromString(`--heap-growing-percent=${growth.percent}`);
  // Only qforge's own default adapts to the database's size; a growth the user chose stays.
  const onDatabaseSize =
    growth.byDefault === true
      ? (files: number) => {
          const percent = heapGrowthForDatabase(files);
          if (percent !== undefined) setFlagsFromString(`--heap-growing-percent=${percent}`);
        }
      : undefined;
  if (pretenuringOff(process.execArgv)) setFlagsFromString('--no-allocation-site-pretenuring');

  const program = new Command();
  const { TOOL_VERSION } = await import('./core/version.js');
  program
    .name('qforge')
    .description('Build checked ideal-gas thermochemistry databases (NASA 7-coefficient polynomials) from partition functions.')
    .version(TOOL_VERSION)
    .exitOverride()
    .showHelpAfterError('(run with --help for usage)')
    .configureOutput({
      writeOut: (s) => io.stdout.write(s),
      writeErr: (s) => io.stderr.write(s),
      // Argument errors carry the program name like every other error line.
      outputError: (s, write) => write(s.startsWith('error:') ? `qforge: ${s}` : s),
      getOutHelpWidth: () => HELP_WIDTH,
      getErrHelpWidth: () => HELP_WIDTH,
    });

  program
    .command('build')
    .description('load, validate, compute, fit, verify and emit a database folder')
    .argument('[dir]', 'database folder (species files and qforge.yaml)', 'species')
    .option('-o, --out <dir>', 'output folder', 'build')
    .option('--no-cache', 'recompute and refit every species')
    .option('--cache-dir <dir>', 'cache folder (default: .qforge-cache inside the database folder)')
    .option('-k, --keep-going', 'write the species that succeeded even when others failed (exit code stays 1)')
    .option('-j, --jobs <n>', `threads for compute, fit and verify, and for checking the files of large databases (${CHECK_FILES_PER_WORKER} files per worker and more), this one included (default: the cores, at most one per ${SPECIES_PER_THREAD} species)`, positiveInt)
    .option('--shard <i/n>', 'build only shard I of N (by a stable hash of the species name); see qforge merge', shardArg)
    .option('-q, --quiet', 'no progress output')
    .option('--json', 'print the build summary as JSON on stdout')
    .option('--strict', 'every warning not accepted in writing (accepted_warnings) is an error')
    .option('--report', 'also write report.html (overview and charts of every species)')
    .option('--report-against <old>', 'report: compare with this earlier build folder (implies --report)')
    .option('--uncertainty-samples <n>', 'Monte Carlo check of the propagated uncertainties with N samples per species', positiveSamples)
    .addHelpText('after', EXAMPLES.build)
    .action(async (dir: string, o: BuildFlags & { out: string }) => {
      exitCode = await buildCommand(io, abs(dir), dir, abs(o.out), o.out, o, onDatabaseSize);
    });

  program
    .command('merge')
    .description('join the shard folders of a sharded build (build --shard I/N) into one database')
    .argument('<shards...>', 'the N shard output folders')
    .requiredOption('-o, --out <dir>', 'output folder of the merged database')
    .option('-q, --quiet', 'no summary line')
    .addHelpText('after', EXAMPLES.merge)
    .action(async (shards: string[], o: { out: string; quiet?: boolean }) => {
      const { mergeCommand } = await import('./commands/merge.js');
      exitCode = await mergeCommand(io, shards.map((s) => ({ path: abs(s), label: s })), { path: abs(o.out), label: o.out }, o);
    });

  const cacheCmd = program.command('cache').description('manage the stage cache of a database');
  cacheCmd
    .command('prune')
    .description('delete the cache entries no current species of the database (nor another database sharing the folder) uses')
    .argument('[dir]', 'database folder', 'species')
    .option('--cache-dir <dir>', 'cache folder (default: .qforge-cache inside the database folder)')
    .option('--json', 'print the result as JSON on stdout')
    .addHelpText('after', EXAMPLES.cache)
    .action(async (dir: string, o: { cacheDir?: string; json?: boolean }) => {
      const { cachePruneCommand } = await import('./commands/cache.js');
      exitCode = await cachePruneCommand(io, abs(dir), dir, { ...o, cacheDir: o.cacheDir === undefined ? undefined : abs(o.cacheDir) });
    });

  program
    .command('check')
    .description('load and validate only: report every problem of every file at once')
    .argument('[dir]', 'database folder', 'species')
    .option('--json', 'print the diagnostics as JSON on stdout')
    .option('--strict', 'every warning not accepted in writing (accepted_warnings) is an error')
    .addHelpText('after', EXAMPLES.check)
    .action(async (dir: string, o: { json?: boolean; strict?: boolean }) => {
      exitCode = await checkCommand(io, abs(dir), o);
    });

  program
    .command('table')
    .description("print one species' properties from its partition functions, or a build's fitted polynomial")
    .argument('<file>', 'species YAML file, build folder or 80-column file')
    .option('-n, --name <name>', 'species to print when the file holds several')
    .option('--at <list>', 'comma-separated temperatures in K, e.g. 200,298.15,1000')
    .option('--range <from:to:step>', 'temperature grid in K, e.g. 200:6000:100')
    .addOption(new Option('--format <format>', 'output format').choices(['text', 'csv']).default('text'))
    .addOption(new Option('--pressure <p>', 'standard pressure').choices(['bar', 'atm']).default('bar'))
    .option('--digits <n>', 'decimals printed (default 3)')
    .addHelpText('after', EXAMPLES.table)
    .action(async (file: string, o: { name?: string; at?: string; range?: string; format: 'text' | 'csv'; pressure: 'bar' | 'atm'; digits?: string }) => {
      const { tableCommand } = await import('./commands/table.js');
      exitCode = await tableCommand(io, abs(file), file, o);
    });

  program
    .command('diff')
    .description('what changed between two builds (or 80-column files): added, removed, changed species')
    .argument('<old>', 'old build folder or 80-column file')
    .argument('<new>', 'new build folder or 80-column file')
    .option('--fail-above <limits>', 'exit 1 when a change exceeds these: cp=J/(mol K),h=kJ/mol,s=J/(mol K)', parseTriple)
    .option('--fail-on-removed', 'exit 1 when a species was removed')
    .option('--json', 'print the report as JSON on stdout')
    .addHelpText('after', EXAMPLES.diff)
    .action(async (oldPath: string, newPath: string, o: { failAbove?: { cp?: number; h?: number; s?: number }; failOnRemoved?: boolean; json?: boolean }) => {
      const { diffCommand } = await import('./commands/diff.js');
      exitCode = await diffCommand(io, { old: abs(oldPath), new: abs(newPath), oldLabel: oldPath, newLabel: newPath }, o);
    });

  program
    .command('compare')
    .description('compare a build with reference tables (CSV) or 80-column files; exit 1 on a breach')
    .argument('<build>', 'build folder (or an 80-column file)')
    .option('-r, --reference <files...>', 'reference CSV tables or 80-column files')
    .option('-d, --database <dir>', 'database folder whose qforge.yaml names references and tolerances')
    .option('-t, --tolerance <limits>', 'largest accepted |deviation|: cp=J/(mol K),s=J/(mol K),h=kJ/mol', parseTriple)
    .option('--strict', 'ignore the known deviations of the settings: every value must meet the normal tolerance')
    .option('--json', 'print the report as JSON on stdout')
    .option('-q, --quiet', 'print only the breaches and the summary line')
    .addHelpText('after', EXAMPLES.compare)
    .action(async (build: string, o: { reference?: string[]; database?: string; tolerance?: { cp?: number; h?: number; s?: number }; strict?: boolean; json?: boolean; quiet?: boolean }) => {
      const { compareCommand } = await import('./commands/compare.js');
      exitCode = await compareCommand(io, abs(build), build, {
        ...o,
        reference: o.reference?.map((r) => ({ path: abs(r), label: r })),
        database: o.database ? abs(o.database) : undefined,
      });
    });

  // No command at all is a usage error: the help goes to stderr, exit 2.
  if (argv.length === 0) {
    io.stderr.write(program.helpInformation());
    io.stderr.write('qforge: error: no command given (build, check, table, diff, compare, merge or cache)\n');
    return 2;
  }
  try {
    await program.parseAsync(argv, { from: 'user' });
    return exitCode;
  } catch (e) {
    if (e instanceof CommanderError) {
      if (e.code === 'commander.helpDisplayed' || e.code === 'commander.version') return 0;
      // `qforge help [cmd]` asks for help (0); help shown because no command was given is usage (2).
      if (e.code === 'commander.help') return e.exitCode === 0 ? 0 : 2;
      const { commanderErrorCode, reportCliError } = await import('./commands/cli-error.js');
      return reportCliError(io, argv, commanderErrorCode(e.code), e.message.replace(/^error: /, ''), 2, { printed: true });
    }
    const { reportCliError } = await import('./commands/cli-error.js');
    // A malformed --report-against build or reference table is bad data (exit 1), like in diff/compare.
    if (['BuildLockedError', 'ReadBuildError', 'ReferenceError'].includes((e as Error)?.name)) {
      return reportCliError(io, argv, (e as Error).name === 'BuildLockedError' ? 'build-locked' : 'unreadable-input', (e as Error).message, 1);
    }
    if (e instanceof UsageError || ['UsageError', 'OutputFolderError'].includes((e as Error)?.name)) {
      return reportCliError(io, argv, (e as Error).name === 'OutputFolderError' ? 'output-folder' : 'usage', (e as Error).message, 2);
    }
    // Any file-system error that escaped a command (a disk that filled, a folder that vanished, a
    // permission): the path and the OS reason, not a stack trace.
    const { describeFsError } = await import('./storage/atomic-write.js');
    const fs = describeFsError(e);
    if (fs) return reportCliError(io, argv, 'file-system', fs, 1);
    throw e;
  }
}

/** Real path of `p`, also when its tail does not exist yet (the existing ancestor is resolved). */
async function realpathLoose(p: string): Promise<string> {
  const { realpath } = await import('node:fs/promises');
  const rest: string[] = [];
  let cur = path.resolve(p);
  for (;;) {
    try {
      return path.join(await realpath(cur), ...rest.reverse());
    } catch {
      const parent = path.dirname(cur);
      if (parent === cur) return path.resolve(p);
      rest.push(path.basename(cur));
      cur = parent;
    }
  }
}

/** `inner` equals `outer` or lies below it (both real, absolute). */
function within(inner: string, outer: string): boolean {
  const rel = path.relative(outer, inner);
  return rel === '' || (!rel.startsWith('..') && !path.isAbsolute(rel));
}

/**
 * Refuses folder layouts in which a build would delete its own inputs: OUT is replaced as a whole, so the
 * database folder, the settings file and the cache may not lie inside it (compared by real path, so
 * symlinks do not hide it). OUT inside the database folder is allowed: discovery reads only *.yaml there
 * and skips dot-folders, and OUT holds only *.json, *.txt, *.csv and the marker.
 */
export async function assertSafeBuildPaths(p: {
  dir: string;
  dirLabel: string;
  out: string;
  outLabel: string;
  cacheDir?: string;
  cacheLabel?: string;
}): Promise<void> {
  const [dir, out] = await Promise.all([realpathLoose(p.dir), realpathLoose(p.out)]);
  const why = 'a build replaces the output folder as a whole and would delete';
  if (within(dir, out)) {
    throw new UsageError(
      `the database folder ${p.dirLabel} ${dir === out ? 'is the output folder' : `is inside the output folder ${p.outLabel}`}; ` +
        `${why} the species files: choose an --out outside ${p.dirLabel}`,
    );
  }
  const { SETTINGS_FILE_NAME } = await import('./stages/load.js');
  const settings = await realpathLoose(path.join(p.dir, SETTINGS_FILE_NAME));
  if (within(settings, out)) {
    throw new UsageError(`the settings file ${path.join(p.dirLabel, SETTINGS_FILE_NAME)} resolves into the output folder ${p.outLabel}; ${why} it`);
  }
  if (p.cacheDir !== undefined) {
    const cache = await realpathLoose(p.cacheDir);
    if (within(cache, out)) {
      throw new UsageError(`the cache folder ${p.cacheLabel ?? p.cacheDir} is inside the output folder ${p.outLabel}; ${why} the cache on every build`);
    }
    if (within(out, cache)) {
      throw new UsageError(`the output folder ${p.outLabel} is inside the cache folder ${p.cacheLabel ?? p.cacheDir}; choose folders apart`);
    }
  }
}

async function assertFolder(p: string, label: string): Promise<void> {
  const { stat } = await import('node:fs/promises');
  try {
    if (!(await stat(p)).isDirectory()) throw new UsageError(`${label} is not a folder`);
  } catch (e) {
    if (e instanceof UsageError) throw e;
    throw new UsageError(`${label}: no such folder`);
  }
}

async function buildCommand(
  io: CliIo,
  dir: string,
  dirLabel: string,
  out: string,
  outLabel: string,
  o: BuildFlags,
  onDatabaseSize?: (files: number) => void,
): Promise<number> {
  await assertFolder(dir, `database folder ${dirLabel}`);
  const [{ runBuild }, { formatDiagnostic }, { createProgressReporter }, { assertReplaceable }, { CACHE_DIR_NAME, defaultCacheDir }, { availableParallelism }] = await Promise.all([
    import('./runner.js'),
    import('./core/diagnostics.js'),
    import('./commands/progress.js'),
    import('./storage/atomic-write.js'),
    import('./storage/cache.js'),
    import('node:os'),
  ]);
  const cacheDir = o.cache === false ? null : o.cacheDir ? path.resolve(io.cwd, o.cacheDir) : undefined;
  await assertSafeBuildPaths({
    dir,
    dirLabel,
    out,
    outLabel,
    ...(cacheDir === null ? {} : { cacheDir: cacheDir ?? defaultCacheDir(dir), cacheLabel: o.cacheDir ?? path.join(dirLabel, CACHE_DIR_NAME) }),
  });
  await assertReplaceable(out, outLabel);
  const reporter = await createProgressReporter(io.stderr, { quiet: !!o.quiet, tty: io.isTTY });
  // In a real process: say what state OUT is in, then die of the same signal (default behaviour). The
  // folder swap is safe at any instant, so nothing needs undoing here.
  const signals = ['SIGINT', 'SIGTERM'] as const;
  const onSignal = (sig: NodeJS.Signals) => {
    reporter.stop();
    io.stderr.write(`\nqforge: ${sig}: build interrupted; ${outLabel} keeps complete outputs (an unfinished swap is settled by the next command)\n`);
    for (const s of signals) process.off(s, onSignal);
    process.kill(process.pid, sig);
  };
  const ownProcess = io.stderr === process.stderr;
  if (ownProcess) for (const s of signals) process.on(s, onSignal);
  let report;
  try {
    report = await runBuild({
      dir,
      out,
      displayBase: io.cwd,
      ...(o.jobs !== undefined ? { jobs: o.jobs } : { maxThreads: availableParallelism() }),
      keepGoing: !!o.keepGoing,
      ...(o.shard ? { shard: o.shard } : {}),
      strict: !!o.strict,
      cacheDir,
      ...(o.uncertaintySamples !== undefined ? { uncertaintySamples: o.uncertaintySamples } : {}),
      ...(o.report || o.reportAgainst !== undefined
        ? { report: o.reportAgainst !== undefined ? { against: { path: path.resolve(io.cwd, o.reportAgainst), label: o.reportAgainst } } : {} }
        : {}),
      onProgress: (e) => reporter.onProgress(e),
      ...(onDatabaseSize ? { onDatabaseSize } : {}),
      // TEST-ONLY (test/pipeline/workers/pool.test.ts): with QFORGE_TEST=1, QFORGE_TEST_CHECK_ON_THREADS=1
      // checks a small database's files on the worker threads, as a large database's are.
      ...(io.env.QFORGE_TEST === '1' && io.env.QFORGE_TEST_CHECK_ON_THREADS === '1' ? { checkOnThreads: true } : {}),
      hooks: {
        beforeSwap: () => waitForTestPause(io, 'before-swap'),
        midSwap: () => waitForTestPause(io, 'mid-swap'),
      },
    });
  } finally {
    reporter.stop();
    if (ownProcess) for (const s of signals) process.off(s, onSignal);
  }
  printDiagnostics(io, report.diagnostics, formatDiagnostic);
  // Cache problems are warnings, printed even with --quiet (like the diagnostics): a cache that never
  // fills or a tampered entry should not go unnoticed.
  for (const w of report.warnings) io.stderr.write(`qforge: warning: ${w}\n`);
  const s = report.summary as unknown as { counts: { species: number; ok: number; failed: number; cache_hits: number; files_failed: number } };
  const failedList = report.failed.length ? `${report.failed.length} species failed: ${report.failed.join(', ')}` : '';
  const filesList = s.counts.files_failed ? `${s.counts.files_failed} file(s) with errors` : '';
  if (!o.quiet || report.exitCode !== 0) {
    if (report.exitCode === 0) {
      io.stderr.write(
        `qforge: built ${s.counts.ok} species into ${outLabel} (${s.counts.cache_hits} from the cache)` +
          `${report.replaced ? `; the previous ${outLabel} was replaced as a whole (it belongs to qforge)` : ''}\n`,
      );
    } else if (report.written) {
      const failedNames = report.failed.length ? `${report.failed.join(', ')}` : '';
      io.stderr.write(
        `qforge: wrote ${s.counts.ok} species into ${outLabel}` +
          `${report.replaced ? ' (replaced as a whole)' : ''}; FAILED: ${[failedNames, filesList].filter(Boolean).join('; ') || 'see the errors above'}\n`,
      );
    } else {
      const settingsErrors = ((report.summary.settings_diagnostics as string[] | undefined) ?? []).filter((d) =>
        d.includes(': error: '),
      ).length;
      const settingsFile = report.settingsFile;
      const causes = [
        settingsErrors ? `${settingsErrors} error(s) in the settings file${settingsFile ? ` ${settingsFile}` : ''}` : '',
        failedList,
        filesList,
        report.notWrittenReason ?? '',
      ].filter(Boolean);
      io.stderr.write(
        `qforge: build failed (${causes.join('; ') || 'see the errors above'}); ${outLabel} left unchanged\n`,
      );
    }
  }
  if (o.json) io.stdout.write(`${JSON.stringify(report.summary, null, 2)}\n`);
  return report.exitCode;
}

async function checkCommand(io: CliIo, dir: string, o: { json?: boolean; strict?: boolean }): Promise<number> {
  await assertFolder(dir, `database folder ${displayPath(io.cwd, dir)}`);
  const [{ checkDatabase }, { formatDiagnostic, hasErrors, nonFiniteAsText }] = await Promise.all([import('./runner.js'), import('./core/diagnostics.js')]);
  const report = await checkDatabase({ dir, displayBase: io.cwd, strict: !!o.strict, keep: 'none' });
  printDiagnostics(io, report.diagnostics, formatDiagnostic);
  const errors = report.diagnostics.filter((d) => d.severity === 'error').length;
  const warnings = report.diagnostics.length - errors;
  io.stderr.write(
    `qforge: checked ${report.species.length + report.invalid.length} species in ${report.files.length} file(s)` +
      (report.invalid.length ? ` (${report.invalid.length} invalid)` : '') +
      ': ' +
      (errors ? `${errors} error(s), ${warnings} warning(s)\n` : `no errors${warnings ? `, ${warnings} warning(s)` : ''}\n`),
  );
  if (o.json) {
    io.stdout.write(
      `${JSON.stringify({ format: 'qforge-check/1', species: report.species.map((s) => ({ name: s.name, file: s.file })), diagnostics: report.diagnostics }, nonFiniteAsText, 2)}\n`,
    );
  }
  return hasErrors(report.diagnostics) ? 1 : 0;
}
