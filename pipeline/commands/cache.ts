/** `qforge cache prune`: drops the cache entries no current species uses (see storage/cache-uses.ts). */
import { stat } from 'node:fs/promises';
import { buildContext, checkDatabase, currentCacheKeys } from '../runner.js';
import { defaultCacheDir } from '../storage/cache.js';
import { pruneCache } from '../storage/cache-uses.js';
import { displayPath } from '../core/display-path.js';
import { formatDiagnostic, hasErrors } from '../core/diagnostics.js';
import type { CliIo } from './io.js';

/** `cache prune --json` (schemas/cache-prune.schema.json). */
export const PRUNE_FORMAT = 'qforge-cache-prune/1';

const mb = (bytes: number) => `${(bytes / 1048576).toFixed(2)} MB`;

export async function cachePruneCommand(io: CliIo, dir: string, dirLabel: string, o: { cacheDir?: string; json?: boolean }): Promise<number> {
  const cacheDir = o.cacheDir ?? defaultCacheDir(dir);
  const shown = displayPath(io.cwd, cacheDir);
  if (!(await stat(cacheDir).then((s) => s.isDirectory(), () => false))) {
    io.stderr.write(`qforge: cache ${shown} does not exist; nothing to prune\n`);
    if (o.json) io.stdout.write(`${JSON.stringify({ format: PRUNE_FORMAT, cache: shown, removed: 0, bytes_freed: 0, kept: 0 }, null, 2)}\n`);
    return 0;
  }
  // The fast-path keys as a build with the default options from this folder computes them.
  const check = await checkDatabase({ dir, displayBase: io.cwd, keep: 'memory', fastPath: { context: buildContext({}) } });
  // Without a complete list of the current species, pruning would delete entries still needed.
  if (!check.settingsOk || hasErrors(check.diagnostics)) {
    for (const d of check.diagnostics) if (d.severity === 'error') io.stderr.write(`${formatDiagnostic(d)}\n`);
    io.stderr.write(`qforge: error: ${dirLabel} has errors; fix them before pruning its cache (nothing deleted)\n`);
    return 1;
  }
  const r = await pruneCache(cacheDir, dir, await currentCacheKeys(check));
  io.stderr.write(
    `qforge: pruned ${shown}: removed ${r.removed} entr${r.removed === 1 ? 'y' : 'ies'} (${mb(r.bytesFreed)} freed), kept ${r.kept}` +
      `${r.otherDatabases ? ` (also used by ${r.otherDatabases} other database(s))` : ''}\n`,
  );
  if (o.json) {
    io.stdout.write(
      `${JSON.stringify({ format: PRUNE_FORMAT, cache: shown, removed: r.removed, bytes_freed: r.bytesFreed, kept: r.kept, other_databases: r.otherDatabases, stale_use_lists: r.staleUseLists }, null, 2)}\n`,
    );
  }
  return 0;
}
