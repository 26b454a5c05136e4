/**
 * summary.json's `reference_files`: the settings' `references.files` (relative to the database folder),
 * each as a path relative to the build folder with posix separators, e.g.
 * `../species/reference/nist-janaf-4th-ed.csv`. Relative, not absolute, so that the same database and
 * output layout give byte-identical summaries wherever they are checked out; `qforge compare BUILD` with
 * no flags resolves them against the build folder it is given (commands/recorded-references.ts).
 */
import path from 'node:path';

export function recordedReferenceFiles(databaseDir: string, outDir: string, files: readonly string[]): string[] {
  return files.map((f) => path.relative(path.resolve(outDir), path.resolve(databaseDir, f)).split(path.sep).join('/'));
}
