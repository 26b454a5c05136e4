/**
 * Crash-safe publication of a build folder. A build writes several files that only make sense together,
 * so single-file renames are not enough. The scheme:
 *
 *   1. every output is written (and fsync'd) into a fresh sibling folder `.<OUT>.qforge-new-<pid>-<rand>`;
 *   2. the previous OUT (if any) is renamed to `.<OUT>.qforge-old`;
 *   3. the new folder is renamed to OUT;
 *   4. `.<OUT>.qforge-old` is removed.
 *
 * Each step is a single rename(2) in one parent folder, atomic on POSIX file systems. A process killed at
 * any moment therefore leaves one of these states, and the next command restores a complete set:
 *   - killed during 1: OUT untouched; a stale `-new-` folder is removed on the next build;
 *   - killed between 2 and 3: OUT absent, `-old` complete → `recoverOutputDir` renames it back (readers
 *     use it directly, see `resolveReadableBuild`);
 *   - killed between 3 and 4: OUT is the new complete set; `-old` is removed.
 * OUT is owned by qforge: it carries a marker file, and a non-empty folder without one is never replaced.
 */
import { randomBytes } from 'node:crypto';
import { mkdir, open, readdir, readFile, rename, rm, stat } from 'node:fs/promises';
import path from 'node:path';

/** Marker file that identifies a folder as a qforge build output (content is constant). */
export const BUILD_MARKER = '.qforge-build';
const MARKER_TEXT = 'This folder is written by qforge build and is replaced as a whole on every build.\n';

export class OutputFolderError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'OutputFolderError';
  }
}

/** Another live build holds the lock of the same output folder. */
export class BuildLockedError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'BuildLockedError';
  }
}

const siblings = (out: string) => {
  const abs = path.resolve(out);
  const parent = path.dirname(abs);
  const base = path.basename(abs);
  return {
    abs,
    parent,
    base,
    old: path.join(parent, `.${base}.qforge-old`),
    lock: path.join(parent, `.${base}.qforge-lock`),
    newPrefix: `.${base}.qforge-new-`,
  };
};

async function exists(p: string): Promise<boolean> {
  try {
    await stat(p);
    return true;
  } catch {
    return false;
  }
}

function processAlive(pid: number): boolean {
  if (!Number.isInteger(pid) || pid <= 0) return false;
  try {
    process.kill(pid, 0);
    return true;
  } catch (err) {
    return (err as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/**
 * Takes the lock of OUT (`.<OUT>.qforge-lock` next to it, holding the owner's pid) so that two builds never
 * swap the same folder at once. A lock whose process is gone (killed build) is taken over. Returns the
 * release function.
 */
export async function acquireOutputLock(out: string): Promise<() => Promise<void>> {
  const s = siblings(out);
  await mkdir(s.parent, { recursive: true });
  for (let attempt = 0; attempt < 3; attempt++) {
    try {
      const fh = await open(s.lock, 'wx');
      await fh.writeFile(`${process.pid}\n`);
      await fh.close();
      return async () => {
        await rm(s.lock, { force: true });
      };
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code !== 'EEXIST') throw err;
      let owner = NaN;
      try {
        owner = Number((await readFile(s.lock, 'utf8')).trim());
      } catch {
        // Vanished in between: try again.
      }
      if (processAlive(owner) && owner !== process.pid) {
        throw new BuildLockedError(`another qforge build (pid ${owner}) is writing ${out}; try again when it has finished`);
      }
      await rm(s.lock, { force: true });
    }
  }
  throw new BuildLockedError(`could not take the lock ${s.lock}`);
}

/** Writes a file through a temporary name and a rename, fsync'd. */
export async function writeFileAtomic(file: string, data: string | Uint8Array): Promise<void> {
  const tmp = `${file}.${process.pid}.${randomBytes(4).toString('hex')}.tmp`;
  const fh = await open(tmp, 'w');
  try {
    await fh.writeFile(data);
    await fh.sync();
  } finally {
    await fh.close();
  }
  try {
    await rename(tmp, file);
  } catch (err) {
    await rm(tmp, { force: true });
    throw err;
  }
}

async function fsyncDir(dir: string): Promise<void> {
  try {
    const fh = await open(dir, 'r');
    try {
      await fh.sync();
    } finally {
      await fh.close();
    }
  } catch {
    // Some file systems refuse fsync on directories; the renames are still atomic.
  }
}

/**
 * Brings OUT back to a complete state after an interrupted build (see the module comment) and removes
 * stale temporary folders of dead processes. Returns what it did, for the log.
 */
export async function recoverOutputDir(out: string): Promise<string[]> {
  const s = siblings(out);
  const notes: string[] = [];
  if (!(await exists(s.parent))) return notes;
  const outExists = await exists(s.abs);
  if (await exists(s.old)) {
    if (!outExists) {
      await rename(s.old, s.abs);
      notes.push(`restored the previous outputs of an interrupted build into ${out}`);
    } else {
      await rm(s.old, { recursive: true, force: true });
      notes.push(`removed the backup left by an interrupted build (${path.basename(s.old)})`);
    }
  }
  for (const name of await readdir(s.parent)) {
    if (!name.startsWith(s.newPrefix)) continue;
    const pid = Number(name.slice(s.newPrefix.length).split('-')[0]);
    if (processAlive(pid) && pid !== process.pid) continue;
    await rm(path.join(s.parent, name), { recursive: true, force: true });
    notes.push(`removed the unfinished outputs of an interrupted build (${name})`);
  }
  return notes;
}

/** The folder a reader should use for OUT: OUT itself, or its backup while a swap is half done. */
export async function resolveReadableBuild(out: string): Promise<string> {
  const s = siblings(out);
  if (await exists(s.abs)) return s.abs;
  if (await exists(s.old)) return s.old;
  return s.abs;
}

/** Refuses to replace a folder qforge did not write (protects e.g. `--out ~`). */
export async function assertReplaceable(out: string): Promise<void> {
  const s = siblings(out);
  let st;
  try {
    st = await stat(s.abs);
  } catch {
    return;
  }
  if (!st.isDirectory()) throw new OutputFolderError(`output path ${out} exists and is not a folder`);
  const entries = await readdir(s.abs);
  if (entries.length === 0 || entries.includes(BUILD_MARKER)) return;
  throw new OutputFolderError(
    `output folder ${out} is not empty and was not written by qforge (no ${BUILD_MARKER}); refusing to replace it`,
  );
}

/** Resolved path of `rel` inside `root`, or an error when it would land outside (`..`, absolute, …). */
export function safeJoin(root: string, rel: string): string {
  const absRoot = path.resolve(root);
  const target = path.resolve(absRoot, rel);
  const back = path.relative(absRoot, target);
  if (!back || back.startsWith('..') || path.isAbsolute(back)) {
    throw new OutputFolderError(`output file name ${JSON.stringify(rel)} would leave the output folder`);
  }
  return target;
}

export interface PublishHooks {
  /** Called after the new folder is complete and before OUT is touched (tests pause here). */
  beforeSwap?: () => Promise<void>;
  /** Called after OUT was moved aside and before the new folder takes its place. */
  midSwap?: () => Promise<void>;
}

/**
 * Writes `files` (relative path → content) as the complete new content of OUT, atomically as described in
 * the module comment. The marker file is added.
 */
export async function publishDirectory(
  out: string,
  files: ReadonlyMap<string, string | Uint8Array>,
  hooks: PublishHooks = {},
): Promise<void> {
  const s = siblings(out);
  await mkdir(s.parent, { recursive: true });
  await assertReplaceable(out);
  const tmp = path.join(s.parent, `${s.newPrefix}${process.pid}-${randomBytes(4).toString('hex')}`);
  await mkdir(tmp);
  try {
    const all = new Map(files);
    all.set(BUILD_MARKER, MARKER_TEXT);
    const dirs = new Set<string>([tmp]);
    for (const [rel, data] of [...all].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))) {
      const target = safeJoin(tmp, rel);
      const dir = path.dirname(target);
      if (!dirs.has(dir)) {
        await mkdir(dir, { recursive: true });
        dirs.add(dir);
      }
      const fh = await open(target, 'wx');
      try {
        await fh.writeFile(data);
        await fh.sync();
      } finally {
        await fh.close();
      }
    }
    for (const d of dirs) await fsyncDir(d);
    await hooks.beforeSwap?.();
    const hadOld = await exists(s.abs);
    if (hadOld) {
      await rm(s.old, { recursive: true, force: true });
      await rename(s.abs, s.old);
    }
    await hooks.midSwap?.();
    await rename(tmp, s.abs);
    await fsyncDir(s.parent);
    if (hadOld) await rm(s.old, { recursive: true, force: true });
  } catch (err) {
    await rm(tmp, { recursive: true, force: true });
    if (!(await exists(s.abs)) && (await exists(s.old))) await rename(s.old, s.abs);
    throw err;
  }
}

/** Writes a text file into a fresh temp name next to it and renames it into place. */
export async function writeTextAtomic(file: string, text: string): Promise<void> {
  await mkdir(path.dirname(file), { recursive: true });
  await writeFileAtomic(file, text);
}

