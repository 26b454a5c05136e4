/** `qforge merge SHARD_DIR... --out OUT`: joins the shards of a sharded build (storage/merge-shards.ts). */
import { realpath, stat } from 'node:fs/promises';
import path from 'node:path';
import { assertReplaceable, resolveReadableBuild } from '../storage/atomic-write.js';
import { MergeError, mergeShards, type ShardInput } from '../storage/merge-shards.js';
import type { CliIo } from './io.js';

/** A missing shard folder, or one inside OUT (or OUT itself, deleted by the swap): exit 2. */
class MergeUsageError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'UsageError';
  }
}

export async function mergeCommand(io: CliIo, shards: ShardInput[], out: ShardInput, o: { quiet?: boolean }): Promise<number> {
  const outReal = await realpath(out.path).catch(() => path.resolve(out.path));
  for (const s of shards) {
    const dir = await resolveReadableBuild(s.path);
    if (!(await stat(dir).then((st) => st.isDirectory(), () => false))) throw new MergeUsageError(`shard folder ${s.label}: no such folder`);
    const real = await realpath(s.path).catch(() => path.resolve(s.path));
    const rel = path.relative(outReal, real);
    if (rel === '' || (!rel.startsWith('..') && !path.isAbsolute(rel))) {
      throw new MergeUsageError(`the shard folder ${s.label} is ${rel === '' ? 'the' : 'inside the'} output folder ${out.label}; the merge replaces it as a whole: choose another --out`);
    }
  }
  await assertReplaceable(out.path, out.label);
  try {
    const r = await mergeShards(shards, out.path);
    if (!o.quiet || r.status !== 'ok') {
      io.stderr.write(
        `qforge: merged ${r.shards} shard(s), ${r.species} species into ${out.label}` +
          `${r.replaced ? `; the previous ${out.label} was replaced as a whole` : ''}` +
          `${r.status === 'partial' ? '; PARTIAL: some shards were built with --keep-going and left species out (see summary.json)' : ''}\n`,
      );
    }
    return r.status === 'ok' ? 0 : 1;
  } catch (e) {
    if (e instanceof MergeError) {
      io.stderr.write(`qforge: error: ${e.message}; nothing written\n`);
      return 1;
    }
    throw e;
  }
}
