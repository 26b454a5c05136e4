/**
 * A build killed at any moment leaves either the previous complete outputs or the new complete ones
 * (pipeline/atomic-write.ts). The CLI is spawned as a real process (dist/, built by `npm test`) and
 * killed at test hooks placed right before the folder swap and between its two renames, and at an
 * arbitrary point mid-way through the species. The hooks are test-only: they need QFORGE_TEST=1 as well
 * as QFORGE_TEST_PAUSE (pipeline/cli.ts), which the last test checks. Holds no reference values (no
 * source to name).
 */
import { spawn } from 'node:child_process';
import { execFileSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { readdir, readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { recoverOutputDir } from '../../pipeline/storage/atomic-write.js';
import { hashFolder, REPO, runCli, tempWorkspace } from './helpers.js';

const BIN = path.join(REPO, 'bin/qforge.js');

beforeAll(() => {
  if (!existsSync(path.join(REPO, 'dist/pipeline/cli.js'))) {
    execFileSync(process.execPath, [path.join(REPO, 'node_modules/typescript/bin/tsc'), '-p', 'tsconfig.build.json'], { cwd: REPO });
  }
}, 120_000);

/** Spawns a build and kills it with `signal` as soon as stderr matches `when`. Resolves when it is dead. */
function killedBuild(cwd: string, env: Record<string, string>, when: RegExp, signal: NodeJS.Signals, extra: string[] = []): Promise<{ stderr: string; signal: string | null; code: number | null }> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [BIN, 'build', 'db', '--out', 'out', ...extra], { cwd, env: { ...process.env, ...env }, stdio: ['ignore', 'ignore', 'pipe'] });
    let stderr = '';
    let sent = false;
    child.stderr.on('data', (b: Buffer) => {
      stderr += b.toString();
      if (!sent && when.test(stderr)) {
        sent = true;
        child.kill(signal);
      }
    });
    child.on('error', reject);
    child.on('exit', (code, sig) => resolve({ stderr, signal: sig, code }));
  });
}

async function changeOneSpecies(db: string): Promise<void> {
  const f = path.join(db, 'CO.yaml');
  await writeFile(f, (await readFile(f, 'utf8')).replace('we: 2169.81358', 'we: 2170.5'));
}

describe('interrupted builds', () => {
  for (const signal of ['SIGKILL', 'SIGTERM', 'SIGINT'] as const) {
    it(`${signal} right before the swap leaves the previous outputs intact`, async () => {
      const ws = await tempWorkspace();
      try {
        expect((await runCli(['build', 'db', '--out', 'out', '--quiet'], ws.root)).code).toBe(0);
        const before = await hashFolder(ws.out);
        await changeOneSpecies(ws.db);
        const r = await killedBuild(ws.root, { QFORGE_TEST: '1', QFORGE_TEST_PAUSE: 'before-swap' }, /test pause before-swap/, signal);
        expect(r.stderr).toMatch(/test pause before-swap/);
        expect(r.code === 0).toBe(false);
        if (signal !== 'SIGKILL') expect(r.stderr).toMatch(new RegExp(`${signal}: build interrupted`));
        expect(await hashFolder(ws.out)).toBe(before);
        // The unfinished new folder is left behind and cleaned up by the next build.
        expect((await readdir(ws.root)).some((n) => n.startsWith('.out.qforge-new-'))).toBe(true);
        const next = await runCli(['build', 'db', '--out', 'out'], ws.root);
        expect(next.code).toBe(0);
        expect(next.stderr).toMatch(/removed the unfinished outputs/);
        expect((await readdir(ws.root)).some((n) => n.includes('qforge-new'))).toBe(false);
        expect(await hashFolder(ws.out)).not.toBe(before);
      } finally {
        await ws.cleanup();
      }
    });
  }

  it('SIGKILL between the two renames: readers and the next build see the previous complete outputs', async () => {
    const ws = await tempWorkspace();
    try {
      expect((await runCli(['build', 'db', '--out', 'out', '--quiet'], ws.root)).code).toBe(0);
      const before = await hashFolder(ws.out);
      await changeOneSpecies(ws.db);
      const r = await killedBuild(ws.root, { QFORGE_TEST: '1', QFORGE_TEST_PAUSE: 'mid-swap' }, /test pause mid-swap/, 'SIGKILL');
      expect(r.signal).toBe('SIGKILL');
      expect(existsSync(ws.out)).toBe(false);
      expect(await hashFolder(path.join(ws.root, '.out.qforge-old'))).toBe(before);
      // diff reads the complete previous set through the backup.
      const d = await runCli(['diff', 'out', 'out', '--json'], ws.root);
      expect(d.code).toBe(0);
      expect(JSON.parse(d.stdout).unchanged).toEqual(['Ar', 'CO', 'H2O', 'N2', 'O']);
      const notes = await recoverOutputDir(ws.out);
      expect(notes.join('\n')).toMatch(/restored the previous outputs/);
      expect(await hashFolder(ws.out)).toBe(before);
    } finally {
      await ws.cleanup();
    }
  });

  it('QFORGE_TEST_PAUSE alone (without QFORGE_TEST=1) never pauses a build', async () => {
    const ws = await tempWorkspace();
    try {
      const r = await runCli(['build', 'db', '--out', 'out'], ws.root, { QFORGE_TEST_PAUSE: 'before-swap' });
      expect(r.code, r.stderr).toBe(0);
      expect(r.stderr).not.toMatch(/test pause/);
      const m = await runCli(['build', 'db', '--out', 'out'], ws.root, { QFORGE_TEST: '0', QFORGE_TEST_PAUSE: 'mid-swap' });
      expect(m.code, m.stderr).toBe(0);
      expect(m.stderr).not.toMatch(/test pause/);
    } finally {
      await ws.cleanup();
    }
  });

  it('SIGKILL mid-way through the species leaves the previous outputs intact', async () => {
    const ws = await tempWorkspace();
    try {
      expect((await runCli(['build', 'db', '--out', 'out', '--quiet'], ws.root)).code).toBe(0);
      const before = await hashFolder(ws.out);
      await changeOneSpecies(ws.db);
      const r = await killedBuild(ws.root, {}, /\[1\/5\]/, 'SIGKILL', ['--no-cache', '--jobs', '1']);
      expect(r.stderr).toMatch(/\[1\/5\]/);
      expect(await hashFolder(ws.out)).toBe(before);
    } finally {
      await ws.cleanup();
    }
  });
});
