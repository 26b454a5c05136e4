/**
 * Sharding of a build: `--shard I/N` builds the species whose stable hash falls into shard I of N, so N
 * machines (a CI matrix, a batch-scheduler array) can share one database and `qforge merge` can put the
 * pieces back together. The hash is the first 8 hex digits of sha256(name) read as an unsigned integer,
 * modulo N: it depends on the name only, never on the machine, the file layout or the other species.
 */
import { createHash } from 'node:crypto';

export interface Shard {
  /** 1-based. */
  index: number;
  count: number;
}

/** Parses "I/N" (1 ≤ I ≤ N ≤ 4096); throws an Error with a readable message otherwise. */
export function parseShard(text: string): Shard {
  const m = /^\s*(\d+)\s*\/\s*(\d+)\s*$/.exec(text);
  const index = m ? Number(m[1]) : NaN;
  const count = m ? Number(m[2]) : NaN;
  if (!m || !(count >= 1 && count <= 4096) || !(index >= 1 && index <= count)) {
    throw new Error(`'${text}': expected I/N with whole numbers 1 ≤ I ≤ N ≤ 4096, e.g. 2/3`);
  }
  return { index, count };
}

/** The 1-based shard of `key` (a species name) among `count`. */
export function shardOf(key: string, count: number): number {
  const h = Number.parseInt(createHash('sha256').update(key, 'utf8').digest('hex').slice(0, 8), 16);
  return (h % count) + 1;
}

export const shardLabel = (s: Shard): string => `${s.index}/${s.count}`;

/** What summary.json of a shard records, so that `qforge merge` can check the shards belong together. */
export interface ShardRecord {
  index: number;
  count: number;
  /** Named species documents of the whole database (valid or not). */
  database_species: number;
  /** sha256 of those names, sorted and '\n'-joined: shards of different databases do not merge. */
  database_names_sha256: string;
}

export function shardRecord(shard: Shard, database: { species: ReadonlyArray<{ name: string }>; invalid: ReadonlyArray<{ name?: string }> }): ShardRecord {
  const names = [...database.species.map((s) => s.name), ...database.invalid.flatMap((i) => (i.name === undefined ? [] : [i.name]))];
  names.sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
  return {
    index: shard.index,
    count: shard.count,
    database_species: names.length,
    database_names_sha256: createHash('sha256').update(names.join('\n'), 'utf8').digest('hex'),
  };
}
