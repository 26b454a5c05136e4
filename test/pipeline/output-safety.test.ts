/**
 * The output folder belongs to qforge and is replaced as a whole; these tests check that a build can never
 * delete its own inputs or a user's file, that bad paths give clean messages (no stack trace), and that
 * the command line follows one exit-code rule (0 ok, 1 data failures, 2 usage). The fixture database
 * (test/fixtures/db) names its sources in each file; this file holds no reference values (no source to
 * name).
 */
import { cp, mkdir, readdir, readFile, symlink, writeFile } from 'node:fs/promises';
import { existsSync } from 'node:fs';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { BUILD_MARKER, describeFsError, markerText } from '../../pipeline/storage/atomic-write.js';
import { HELP_WIDTH } from '../../pipeline/cli.js';
import { deterministicOutputs, hashFolder, readJson, REPO, runCli, tempWorkspace } from './helpers.js';

let ws: Awaited<ReturnType<typeof tempWorkspace>>;
beforeEach(async () => {
  ws = await tempWorkspace();
});
afterEach(async () => {
  await ws.cleanup();
});

const build = (argv: string[]) => runCli(['build', ...argv], ws.root);

describe('a build never deletes its own inputs', () => {
  it('refuses DIR == OUT and DIR inside OUT (the species files stay), exit 2', async () => {
    expect((await build(['db', '--out', 'out', '--quiet'])).code).toBe(0);
    await cp(ws.db, path.join(ws.out, 'db'), { recursive: true });
    const dbInOut = await hashFolder(path.join(ws.out, 'db'));
    const inside = await build(['out/db', '--out', 'out']);
    expect(inside.code).toBe(2);
    expect(inside.stderr).toMatch(/database folder out\/db is inside the output folder out/);
    expect(await hashFolder(path.join(ws.out, 'db'))).toBe(dbInOut);
    const same = await build(['db', '--out', 'db']);
    expect(same.code).toBe(2);
    expect(same.stderr).toMatch(/database folder db is the output folder/);
    // The default cache lives inside the database folder (.qforge-cache); the species files are untouched.
    expect((await readdir(ws.db)).filter((f) => f !== '.qforge-cache').sort()).toEqual(['Ar.yaml', 'CO.yaml', 'H2O.yaml', 'N2.yaml', 'O.yaml', 'qforge.yaml', 'reference']);
    expect(inside.stderr + same.stderr).not.toMatch(/internal error|at \w+ \(/);
  });

  it('compares real paths: a symlink to the database folder or to its parent is refused', async () => {
    await symlink(ws.db, path.join(ws.root, 'db-link'));
    const viaLink = await build(['db', '--out', 'db-link']);
    expect(viaLink.code).toBe(2);
    expect(viaLink.stderr).toMatch(/database folder db is the output folder/);
    await symlink(ws.root, path.join(ws.root, 'root-link'));
    const parent = await build(['db', '--out', 'root-link']);
    expect(parent.code).toBe(2);
    expect(parent.stderr).toMatch(/database folder db is inside the output folder root-link/);
    expect(existsSync(path.join(ws.db, 'N2.yaml'))).toBe(true);
  });

  it('refuses a settings file that resolves into OUT, and a cache inside OUT (or OUT inside the cache)', async () => {
    expect((await build(['db', '--out', 'out', '--quiet'])).code).toBe(0);
    const cacheInOut = await build(['db', '--out', 'out', '--cache-dir', 'out/cache']);
    expect(cacheInOut.code).toBe(2);
    expect(cacheInOut.stderr).toMatch(/cache folder out\/cache is inside the output folder out/);
    const outInCache = await build(['db', '--out', 'c/out', '--cache-dir', 'c']);
    expect(outInCache.code).toBe(2);
    expect(outInCache.stderr).toMatch(/output folder c\/out is inside the cache folder c/);
    // qforge.yaml as a link to a file kept in OUT (it would vanish with the next swap).
    const db2 = path.join(ws.root, 'db2');
    await mkdir(db2);
    await cp(path.join(ws.db, 'Ar.yaml'), path.join(db2, 'Ar.yaml'));
    await symlink(path.join(ws.out, 'thermo.json'), path.join(db2, 'qforge.yaml'));
    const settings = await build(['db2', '--out', 'out']);
    expect(settings.code).toBe(2);
    expect(settings.stderr).toMatch(/settings file db2\/qforge\.yaml resolves into the output folder out/);
  });

  it('OUT inside the database folder is allowed: the next build reads the same species and writes the same bytes', async () => {
    const first = await build(['db', '--out', 'db/build']);
    expect(first.code, first.stderr).toBe(0);
    const outputs = await deterministicOutputs(path.join(ws.db, 'build'));
    const again = await build(['db', '--out', 'db/build', '--json', '--quiet']);
    expect(again.code, again.stderr).toBe(0);
    expect(JSON.parse(again.stdout).counts.species).toBe(5);
    expect(await deterministicOutputs(path.join(ws.db, 'build'))).toEqual(outputs);
  });
});

describe('OUT holds only what qforge wrote', () => {
  it('the marker lists the files written, deterministically; a user file stops the build and survives', async () => {
    expect((await build(['db', '--out', 'out', '--quiet'])).code).toBe(0);
    const marker = await readFile(path.join(ws.out, BUILD_MARKER), 'utf8');
    expect(marker).toBe(
      markerText([
        'thermo.json',
        'nasa7.txt',
        'summary.json',
        'tables/README.txt',
        ...['Ar', 'CO', 'H2O', 'N2', 'O'].map((n) => `tables/${n}.csv`),
      ]),
    );
    expect(marker.split('\n').slice(2, 4)).toEqual(['nasa7.txt', 'summary.json']);
    expect((await build(['db', '--out', 'out', '--quiet', '--no-cache'])).code).toBe(0);
    expect(await readFile(path.join(ws.out, BUILD_MARKER), 'utf8')).toBe(marker);

    await writeFile(path.join(ws.out, 'tables', 'my-notes.txt'), 'keep me');
    await mkdir(path.join(ws.out, 'plots'));
    const r = await build(['db', '--out', 'out']);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/output folder out holds 2 entries qforge did not write \(plots\/, tables\/my-notes\.txt\)/);
    expect(await readFile(path.join(ws.out, 'tables', 'my-notes.txt'), 'utf8')).toBe('keep me');
  });

  it('a marker of an older qforge (no file list) is still trusted; the success line says OUT was replaced', async () => {
    await mkdir(ws.out);
    await writeFile(path.join(ws.out, BUILD_MARKER), 'This folder is written by qforge build and is replaced as a whole on every build.\n');
    await writeFile(path.join(ws.out, 'thermo.json'), '{}');
    const r = await build(['db', '--out', 'out']);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stderr).toMatch(/built 5 species into out \(0 from the cache\); the previous out was replaced as a whole \(it belongs to qforge\)/);
  });

  it('build --help says OUT is replaced whole and what is refused', async () => {
    const r = await runCli(['build', '--help'], ws.root);
    expect(r.stdout).toMatch(/OUT belongs to qforge: every build replaces it as a whole/);
    expect(r.stdout).toMatch(/a file you put into OUT stops the\s+build \(exit 2\)/);
  });
});

describe('bad paths: clean messages with the OS reason, never a stack trace', () => {
  it('--out below a regular file or in /proc is a usage error naming the path and the reason', async () => {
    await writeFile(path.join(ws.root, 'plain.txt'), 'x');
    const under = await build(['db', '--out', 'plain.txt/out']);
    expect(under.code).toBe(2);
    expect(under.stderr).toMatch(/^qforge: error: cannot use the output folder plain\.txt\/out: .*ENOTDIR \(not a directory\)$/m);
    if (existsSync('/etc/passwd')) {
      const etc = await build(['db', '--out', '/etc/passwd/x']);
      expect(etc.code).toBe(2);
      expect(etc.stderr).toMatch(/cannot use the output folder \/etc\/passwd\/x: .*ENOTDIR/);
    }
    if (existsSync('/proc/self')) {
      const proc = await build(['db', '--out', '/proc/x']);
      expect(proc.code).toBe(2);
      expect(proc.stderr).toMatch(/cannot use the output folder \/proc\/x: .*(ENOENT|EACCES|EPERM|EROFS)/);
    }
    expect(under.stderr).not.toMatch(/internal error|\n\s+at /);
  });

  it('an existing file as OUT is refused (exit 2)', async () => {
    await writeFile(path.join(ws.root, 'plain.txt'), 'x');
    const r = await build(['db', '--out', 'plain.txt']);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/output path plain\.txt exists and is not a folder/);
  });

  it('describeFsError names the call, the path, the code and the reason', () => {
    const e = Object.assign(new Error("ENOTDIR: not a directory, mkdir '/etc/passwd/x'"), {
      code: 'ENOTDIR',
      syscall: 'mkdir',
      path: '/etc/passwd/x',
    });
    expect(describeFsError(e)).toBe("mkdir '/etc/passwd/x': ENOTDIR (not a directory)");
    const big = Object.assign(new RangeError('File size (3000000000) is greater than 2 GiB'), { code: 'ERR_FS_FILE_TOO_LARGE' });
    expect(describeFsError(big)).toBe('ERR_FS_FILE_TOO_LARGE (File size (3000000000) is greater than 2 GiB)');
    expect(describeFsError(new Error('plain'))).toBeUndefined();
    expect(describeFsError(Object.assign(new Error('x'), { code: 'commander.unknownOption' }))).toBeUndefined();
  });
});

describe('exit codes and help', () => {
  it('bare qforge prints the help on stderr and exits 2', async () => {
    const r = await runCli([], ws.root);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/Usage: qforge/);
    expect(r.stderr).toMatch(/no command given/);
    expect((await runCli(['--help'], ws.root)).code).toBe(0);
    expect((await runCli(['help', 'build'], ws.root)).code).toBe(0);
    // Options but no command: usage as well.
    expect((await runCli(['--quiet'], ws.root)).code).toBe(2);
  });

  it(`every --help line fits in ${HELP_WIDTH} columns, and the table examples name files that exist`, async () => {
    for (const cmd of [[], ['build'], ['check'], ['table'], ['diff'], ['compare']]) {
      const r = await runCli([...cmd, '--help'], ws.root);
      const long = r.stdout.split('\n').filter((l) => l.length > HELP_WIDTH);
      expect(long, cmd.join(' ') || 'qforge').toEqual([]);
    }
    const table = (await runCli(['table', '--help'], ws.root)).stdout;
    const files = [...table.matchAll(/qforge table (\S+\.yaml)/g)].map((m) => m[1]!);
    expect(files.length).toBeGreaterThanOrEqual(3);
    for (const f of files) expect(existsSync(path.join(REPO, f)), f).toBe(true);
  });

  it('summary.json of a build with a settings error is not written; the CLI names the settings file', async () => {
    expect((await build(['db', '--out', 'out', '--quiet'])).code).toBe(0);
    const before = await readJson(path.join(ws.out, 'summary.json'));
    const settings = path.join(ws.db, 'qforge.yaml');
    await writeFile(settings, (await readFile(settings, 'utf8')).replace('title:', 'titel:'));
    const r = await build(['db', '--out', 'out']);
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/build failed \(1 error\(s\) in the settings file db\/qforge\.yaml\); out left unchanged/);
    expect(r.stderr).not.toMatch(/0 species failed/);
    expect(await readJson(path.join(ws.out, 'summary.json'))).toEqual(before);
  });
});
