/**
 * The cache key carries a fingerprint of the code, so a changed physics or fit module can never be served
 * stale numbers from the cache. Holds no reference values (no source to name).
 */
import { mkdtemp, mkdir, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { codeFingerprint, fingerprintFolders } from '../../../pipeline/storage/code-fingerprint.js';

let root: string | undefined;
afterEach(async () => {
  if (root) await rm(root, { recursive: true, force: true });
  root = undefined;
});

describe('code fingerprint', () => {
  it('is a stable sha256 of this installation', () => {
    expect(codeFingerprint()).toMatch(/^[0-9a-f]{64}$/);
    expect(codeFingerprint()).toBe(codeFingerprint());
  });

  it('changes when any code file changes, is added or renamed, and ignores other files', async () => {
    root = await mkdtemp(path.join(tmpdir(), 'qforge-fp-'));
    const src = path.join(root, 'src');
    await mkdir(path.join(src, 'thermo'), { recursive: true });
    await writeFile(path.join(src, 'thermo', 'a.js'), 'export const x = 1;\n');
    const first = fingerprintFolders([src]);
    expect(fingerprintFolders([src])).toBe(first);

    await writeFile(path.join(src, 'notes.txt'), 'not code');
    expect(fingerprintFolders([src])).toBe(first);

    await writeFile(path.join(src, 'thermo', 'a.js'), 'export const x = 2;\n');
    const second = fingerprintFolders([src]);
    expect(second).not.toBe(first);

    await writeFile(path.join(src, 'thermo', 'b.ts'), 'export {};\n');
    expect(fingerprintFolders([src])).not.toBe(second);
  });
});
