/**
 * A fingerprint of the code that computes the numbers, mixed into every cache key.
 *
 * The tool version alone is not enough: between releases (and in every developer's tree) the physics or the
 * fit can change while package.json does not, and a cache keyed by version would then serve numbers the
 * current code no longer produces. Hashing the library's own module files (src/ and pipeline/, compiled or
 * not) makes any code change a cache miss; the price is one cold rebuild after an upgrade.
 */
import { createHash } from 'node:crypto';
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { compareText } from '../core/text.js';

const CODE_FILE = /\.(?:js|ts|json)$/;

/** sha256 over every code file below `dirs` (relative path and bytes, in sorted order). */
export function fingerprintFolders(dirs: readonly string[]): string {
  const h = createHash('sha256');
  const walk = (dir: string, rel: string): void => {
    let entries;
    try {
      entries = readdirSync(dir, { withFileTypes: true });
    } catch {
      return;
    }
    entries.sort((a, b) => compareText(a.name, b.name));
    for (const e of entries) {
      const p = path.join(dir, e.name);
      const r = `${rel}/${e.name}`;
      if (e.isDirectory()) walk(p, r);
      else if (e.isFile() && CODE_FILE.test(e.name)) {
        h.update(`${r}\0`);
        h.update(readFileSync(p));
        h.update('\0');
      }
    }
  };
  for (const d of dirs) walk(d, path.basename(d));
  return h.digest('hex');
}

let memo: string | undefined;

/** Fingerprint of this installation's src/ and pipeline/ (computed once per process). */
export function codeFingerprint(): string {
  if (memo === undefined) {
    const pipelineDir = path.join(path.dirname(fileURLToPath(import.meta.url)), '..');
    memo = fingerprintFolders([path.join(pipelineDir, '..', 'src'), pipelineDir]);
  }
  return memo;
}

/**
 * Makes this thread use `fingerprint` (a worker thread takes the main thread's, so both address the same
 * cache entries). From the compiled dist/ both are the same tree anyway; from TypeScript sources (tests)
 * the workers run dist/, which `npm test` builds from those sources first.
 */
export function useCodeFingerprint(fingerprint: string): void {
  memo = fingerprint;
}
