/**
 * `compare BUILD` with neither --reference nor --database: the reference files the build recorded.
 *
 * A build writes `reference_files` into summary.json (see core/recorded-references.ts); compare resolves
 * them against the build folder it is given. The tolerances and known deviations come from the settings
 * recorded in thermo.json, as before.
 */
import path from 'node:path';
import { readInputFile, ReadBuildError, ReadBuildUsageError } from '../storage/read-build.js';

/**
 * The reference files recorded in BUILD/summary.json, resolved, with labels relative to the build label.
 * An empty list when the build recorded none (or is not a folder).
 */
export async function referencesRecordedInBuild(buildDir: string, buildLabel: string): Promise<Array<{ path: string; label: string }>> {
  const summaryLabel = path.join(buildLabel, 'summary.json');
  let text: string;
  try {
    text = await readInputFile(path.join(buildDir, 'summary.json'), summaryLabel, 'build file');
  } catch (e) {
    if (e instanceof ReadBuildUsageError) return [];
    throw e;
  }
  let files: unknown;
  try {
    files = (JSON.parse(text) as { reference_files?: unknown }).reference_files;
  } catch (e) {
    throw new ReadBuildError(`${summaryLabel}: not valid JSON (${(e as Error).message})`);
  }
  if (files === undefined) return [];
  if (!Array.isArray(files) || !files.every((f) => typeof f === 'string')) throw new ReadBuildError(`${summaryLabel}: reference_files is not a list of paths`);
  return files.map((f) => ({ path: path.resolve(buildDir, f), label: path.join(buildLabel, f) }));
}
