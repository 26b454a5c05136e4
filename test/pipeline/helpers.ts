/** Shared helpers of the end-to-end pipeline tests: temp databases, in-process CLI runs, folder hashes. */
import { createHash } from 'node:crypto';
import { cp, mkdtemp, readdir, readFile, rm, stat } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { main } from '../../pipeline/cli.js';
import { afterAll, beforeAll, expect } from 'vitest';

export const REPO = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
export const FIXTURE_DB = path.join(REPO, 'test/fixtures/db');

/** A fresh temp folder holding a copy of the fixture database in `db/`; `out/` is the build folder. */
export async function tempWorkspace(): Promise<{ root: string; db: string; out: string; cleanup: () => Promise<void> }> {
  const root = await mkdtemp(path.join(tmpdir(), 'qforge-test-'));
  const db = path.join(root, 'db');
  await cp(FIXTURE_DB, db, { recursive: true });
  return { root, db, out: path.join(root, 'out'), cleanup: () => rm(root, { recursive: true, force: true }) };
}

export interface CliRun {
  code: number;
  stdout: string;
  stderr: string;
}

/** Runs the CLI in-process with captured output, cwd = `cwd`. */
export async function runCli(argv: string[], cwd: string, env: Record<string, string | undefined> = {}): Promise<CliRun> {
  let stdout = '';
  let stderr = '';
  const code = await main(argv, {
    stdout: { write: (s: string) => (stdout += s) },
    stderr: { write: (s: string) => (stderr += s) },
    cwd,
    isTTY: false,
    env,
  });
  return { code, stdout, stderr };
}

/** sha256 over every file (relative path + bytes) below `dir`, or 'absent'. */
export async function hashFolder(dir: string): Promise<string> {
  try {
    await stat(dir);
  } catch {
    return 'absent';
  }
  const h = createHash('sha256');
  const walk = async (d: string, rel: string): Promise<void> => {
    const entries = (await readdir(d, { withFileTypes: true })).sort((a, b) => (a.name < b.name ? -1 : 1));
    for (const e of entries) {
      const p = path.join(d, e.name);
      const r = rel ? `${rel}/${e.name}` : e.name;
      if (e.isDirectory()) await walk(p, r);
      else {
        h.update(`${r}\0`);
        h.update(await readFile(p));
        h.update('\0');
      }
    }
  };
  await walk(dir, '');
  return h.digest('hex');
}

/** Contents of the deterministic outputs (everything but summary.json), by relative path. */
export async function deterministicOutputs(out: string): Promise<Map<string, string>> {
  const files = new Map<string, string>();
  const walk = async (d: string, rel: string): Promise<void> => {
    for (const e of await readdir(d, { withFileTypes: true })) {
      const r = rel ? `${rel}/${e.name}` : e.name;
      if (e.isDirectory()) await walk(path.join(d, e.name), r);
      else if (r !== 'summary.json') files.set(r, await readFile(path.join(d, e.name), 'utf8'));
    }
  };
  await walk(out, '');
  return new Map([...files].sort(([a], [b]) => (a < b ? -1 : 1)));
}

export async function readJson<T = any>(file: string): Promise<T> {
  return JSON.parse(await readFile(file, 'utf8')) as T;
}

export type Workspace = Awaited<ReturnType<typeof tempWorkspace>>;

/**
 * For a test file that only reads one build: a workspace with the fixture database built into `out/`
 * once before all its tests, removed after them. Returns a getter, since the workspace exists only
 * once `beforeAll` has run.
 */
export function sharedBuiltWorkspace(beforeBuild?: (ws: Workspace) => Promise<void>): () => Workspace {
  let ws: Workspace | undefined;
  beforeAll(async () => {
    ws = await tempWorkspace();
    await beforeBuild?.(ws);
    const r = await runCli(['build', 'db', '--out', 'out', '--quiet'], ws.root);
    expect(r.code, r.stderr).toBe(0);
  });
  afterAll(async () => {
    await ws?.cleanup();
  });
  return () => {
    if (!ws) throw new Error('workspace used outside a test');
    return ws;
  };
}
