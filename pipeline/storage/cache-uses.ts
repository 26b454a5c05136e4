/**
 * Which cache entries each database uses, so that pruning a cache folder shared by several databases
 * (an explicit `--cache-dir`) never deletes an entry another database still needs.
 *
 * Every full (unsharded) build writes `<cache>/uses/<database id>` — the database's real path on the
 * first line, then the `kind/key` of every entry its species used, sorted. The database id is the first
 * 16 hex digits of sha256(real path). `qforge cache prune` recomputes the keys of the database it is
 * given, records them, and deletes every entry that no use list names. A use list whose database folder
 * no longer exists is stale: it is removed and protects nothing.
 */
import { readdir, readFile, realpath, rm, stat, mkdir } from 'node:fs/promises';
import path from 'node:path';
import { writeFileAtomic } from './atomic-write.js';
import { CACHE_KINDS, entryFolderOf, type CacheKind } from './cache.js';
import { sha256Hex } from './hash.js';
import { PACK_DIR, packHeader } from './build-pack.js';
import { compareText } from '../core/text.js';

const USES = 'uses';

async function databaseId(databaseDir: string): Promise<{ id: string; real: string }> {
  const real = await realpath(databaseDir).catch(() => path.resolve(databaseDir));
  return { id: sha256Hex(real).slice(0, 16), real };
}

const HEX_KEY = /^[0-9a-f]{64}$/;

/**
 * The `kind/key` names of the entries a build used, gathered species by species until the build records
 * them: a key of 64 hex digits is kept as its 32 bytes (a ~90-byte string each otherwise, five per species:
 * 20 MB at 50,000 species held through the whole build); any other name as given.
 */
export class UsedKeys {
  private readonly byKind = new Map<string, { bytes: Buffer; count: number }>();
  private readonly other: string[] = [];

  add(name: string): void {
    const slash = name.indexOf('/');
    const key = name.slice(slash + 1);
    if (slash <= 0 || !HEX_KEY.test(key)) {
      this.other.push(name);
      return;
    }
    const kind = name.slice(0, slash);
    let k = this.byKind.get(kind);
    if (!k) this.byKind.set(kind, (k = { bytes: Buffer.allocUnsafe(32 * 256), count: 0 }));
    if ((k.count + 1) * 32 > k.bytes.length) {
      const grown = Buffer.allocUnsafe(k.bytes.length * 2);
      k.bytes.copy(grown, 0, 0, k.count * 32);
      k.bytes = grown;
    }
    k.bytes.write(key, k.count * 32, 32, 'hex');
    k.count++;
  }

  /**
   * The use-list body: every distinct name, sorted by UTF-16 code units (compareText), one per line, each
   * ending in a newline. Made from the 32-byte keys without a string per name: for a hex key, byte order is
   * the order of its lower-case hex, and `kind/` is never a prefix of another kind's `kind/`, so ordering by
   * kind and then by key bytes is the order of the whole names (cheaper than making and sorting 50,000
   * strings: a numeric sort, native copies and one hex encoding per kind).
   */
  listText(): Buffer {
    if (this.other.length > 0 || [...this.byKind.values()].some((k) => k.count > MAX_SORTED_KEYS)) return sortedListText(this.names());
    const kinds = [...this.byKind.keys()].sort((a, b) => compareText(`${a}/`, `${b}/`));
    const parts: string[] = [];
    for (const kind of kinds) {
      const { bytes, count } = this.byKind.get(kind)!;
      const order = sortedKeyOrder(bytes, count);
      // The distinct keys copied in order, then hex-encoded at once (no JavaScript loop per hex digit).
      const sorted = Buffer.allocUnsafe(count * 32);
      let distinct = 0;
      for (let r = 0; r < count; r++) {
        const i = order[r]!;
        if (r > 0 && compareKeys(bytes, i, order[r - 1]!) === 0) continue;
        bytes.copy(sorted, distinct++ * 32, i * 32, i * 32 + 32);
      }
      const hex = sorted.toString('hex', 0, distinct * 32);
      const lines = new Array<string>(distinct);
      for (let r = 0; r < distinct; r++) lines[r] = hex.slice(r * 64, r * 64 + 64);
      parts.push(`${kind}/${lines.join(`\n${kind}/`)}\n`);
    }
    return Buffer.from(parts.join(''));
  }

  /** Every name added (as strings, in no particular order; duplicates kept). */
  names(): string[] {
    const out = [...this.other];
    for (const [kind, k] of this.byKind) {
      for (let i = 0; i < k.count; i++) out.push(`${kind}/${k.bytes.toString('hex', i * 32, i * 32 + 32)}`);
    }
    return out;
  }
}

/** The use-list body of `names` as strings: distinct, sorted, each on its own line. */
function sortedListText(names: readonly string[]): Buffer {
  // The default sort compares UTF-16 code units, as compareText does, without a call per comparison.
  const text = [...new Set(names)].sort().join('\n');
  return Buffer.from(text ? `${text}\n` : '');
}

/** Keys per kind that `sortedKeyOrder` can order (its index takes 20 bits of a double). */
const MAX_SORTED_KEYS = 2 ** 20;

/** Byte order of the a-th and b-th 32-byte keys of `bytes`. */
const compareKeys = (bytes: Buffer, a: number, b: number) => bytes.compare(bytes, a * 32, a * 32 + 32, b * 32, b * 32 + 32);

/**
 * Indices of the `count` 32-byte keys in `bytes` in ascending byte order. Each key's first four bytes and
 * its index share one double (32 + 20 bits, exact), so a native numeric sort without a comparator orders
 * them; runs whose first four bytes agree (rare: ~1 % of 10,000 random keys have a partner) are then put
 * in order by the whole key.
 */
function sortedKeyOrder(bytes: Buffer, count: number): Int32Array {
  const packed = new Float64Array(count);
  for (let i = 0; i < count; i++) packed[i] = bytes.readUInt32BE(i * 32) * MAX_SORTED_KEYS + i;
  packed.sort();
  const order = new Int32Array(count);
  for (let r = 0; r < count; r++) order[r] = packed[r]! % MAX_SORTED_KEYS;
  for (let r = 1; r < count; r++) {
    // Insertion within a run of equal first words (the run before r is already in order).
    for (let q = r; q > 0 && Math.floor(packed[q - 1]! / MAX_SORTED_KEYS) === Math.floor(packed[r]! / MAX_SORTED_KEYS) && compareKeys(bytes, order[q - 1]!, order[q]!) > 0; q--) {
      const t = order[q]!;
      order[q] = order[q - 1]!;
      order[q - 1] = t;
    }
  }
  return order;
}

/** Records the entries a database uses (replacing its previous list). */
export async function recordCacheUse(cacheDir: string, databaseDir: string, keys: readonly string[] | UsedKeys): Promise<void> {
  const { id, real } = await databaseId(databaseDir);
  await mkdir(path.join(cacheDir, USES), { recursive: true });
  const body = keys instanceof UsedKeys ? keys.listText() : sortedListText(keys);
  await writeFileAtomic(path.join(cacheDir, USES, id), Buffer.concat([Buffer.from(`${real}\n`), body]), { sync: false });
}

export interface PruneResult {
  /** Entries deleted and their bytes. */
  removed: number;
  bytesFreed: number;
  /** Entries kept (used by this or another database). */
  kept: number;
  /** Use lists of other databases that protected entries. */
  otherDatabases: number;
  /** Use lists dropped because their database folder is gone. */
  staleUseLists: number;
}

/** Deletes every entry below `cacheDir` that no database's use list (this one's: `keys`) names. */
export async function pruneCache(cacheDir: string, databaseDir: string, keys: readonly string[]): Promise<PruneResult> {
  await recordCacheUse(cacheDir, databaseDir, keys);
  const { id } = await databaseId(databaseDir);
  const used = new Set<string>();
  let otherDatabases = 0;
  let staleUseLists = 0;
  for (const name of await readdir(path.join(cacheDir, USES))) {
    const file = path.join(cacheDir, USES, name);
    const lines = (await readFile(file, 'utf8')).split('\n').filter((l) => l !== '');
    const owner = lines[0] ?? '';
    if (name !== id) {
      const alive = await stat(owner).then((s) => s.isDirectory(), () => false);
      if (!alive) {
        await rm(file, { force: true });
        staleUseLists++;
        continue;
      }
      otherDatabases++;
    }
    for (const k of lines.slice(1)) used.add(k);
  }
  const result: PruneResult = { removed: 0, bytesFreed: 0, kept: 0, otherDatabases, staleUseLists };
  for (const kind of CACHE_KINDS) {
    const kindDir = path.join(cacheDir, kind);
    const subs = await readdir(kindDir).catch(() => [] as string[]);
    for (const sub of subs.sort(compareText)) {
      const subDir = path.join(kindDir, sub);
      for (const entry of (await readdir(subDir).catch(() => [] as string[])).sort(compareText)) {
        // An entry outside its key's folder (a cache of an earlier layout) is never looked up again.
        if (used.has(`${kind as CacheKind}/${entry}`) && sub === entryFolderOf(entry)) {
          result.kept++;
          continue;
        }
        const file = path.join(subDir, entry);
        const size = await stat(file).then((s) => s.size, () => 0);
        await rm(file, { force: true });
        result.removed++;
        result.bytesFreed += size;
      }
      if ((await readdir(subDir).catch(() => ['x'])).length === 0) await rm(subDir, { recursive: true, force: true });
    }
  }
  // Build packs (storage/build-pack.ts) of output folders or databases that are gone serve no build again.
  for (const stale of await stalePacks(cacheDir)) {
    result.removed++;
    result.bytesFreed += stale.size;
    await rm(stale.file, { force: true });
  }
  return result;
}

/** The build packs whose database folder or output folder no longer exists (or that have no readable header). */
async function stalePacks(cacheDir: string): Promise<Array<{ file: string; size: number }>> {
  const dir = path.join(cacheDir, PACK_DIR);
  const out: Array<{ file: string; size: number }> = [];
  const isDir = (p: unknown) => typeof p === 'string' && stat(p).then((s) => s.isDirectory(), () => false);
  for (const name of (await readdir(dir).catch(() => [] as string[])).sort(compareText)) {
    const file = path.join(dir, name);
    const header = await packHeader(file);
    if (header && (await isDir(header.database)) && (await isDir(header.out))) continue;
    out.push({ file, size: await stat(file).then((s) => s.size, () => 0) });
  }
  return out;
}
