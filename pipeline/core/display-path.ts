import path from 'node:path';

/**
 * How a path is shown in messages: relative to `base` (normally the working directory) when it lies inside
 * it, so messages stay short; absolute otherwise, because `../../tmp/x.yaml` is harder to read and to paste.
 */
export function displayPath(base: string, p: string): string {
  const abs = path.resolve(base, p);
  const rel = path.relative(base, abs);
  if (rel === '') return '.';
  if (rel.startsWith('..') || path.isAbsolute(rel)) return abs;
  return rel;
}
