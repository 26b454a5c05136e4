/**
 * Joins the output folders of a sharded build (`qforge build --shard I/N`) into the folder an unsharded
 * build writes, byte for byte (summary.json aside: it holds timings). Pure file work; the CLI prints.
 *
 * Checks, all before anything is written: every folder is a shard output (summary.json with a `shard`
 * record); all name the same N and the same database (the sha256 of its species names); each index 1..N
 * appears exactly once (a repeat is "overlapping", a gap "missing"); no species is in two shards; the
 * envelopes of thermo.json and the framing of nasa7.txt and tables/README.txt are identical (same
 * settings and qforge version).
 *
 * The merged thermo.json is the shards' envelope around all species records in name order, rendered by
 * the same `jsonText` as a build; nasa7.txt the shared framing around all 4-line records in name order;
 * the tables are copied under the names `tableFileNames` gives the whole set (a case-collision suffix can
 * depend on a species of another shard).
 */
import { readFile, stat } from 'node:fs/promises';
import path from 'node:path';
import { acquireOutputLock, OutputStaging, recoverOutputDir, resolveReadableBuild } from './atomic-write.js';
import { sha256Hex } from './hash.js';
import { jsonText, tableFileNames, validateSummaryJson } from '../stages/emit.js';
import { compareText } from '../core/text.js';
import type { ShardRecord } from '../core/shard.js';

/** A shard set that does not merge: exit 1 with this message, nothing written. */
export class MergeError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'MergeError';
  }
}

export interface ShardInput {
  path: string;
  label: string;
}

interface SummaryLike {
  status: 'ok' | 'partial' | 'failed';
  written: boolean;
  outputs: string[];
  counts: Record<string, number>;
  warnings: string[];
  species: Array<{ name?: string; file: string; document?: number; status: string }>;
  files: unknown[];
  timings_ms: Record<string, number>;
  shard?: ShardRecord;
  [k: string]: unknown;
}

interface LoadedShard {
  input: ShardInput;
  dir: string;
  summary: SummaryLike;
  shard: ShardRecord;
  /** Built species of the shard, name order. */
  built: string[];
}

async function readText(file: string, label: string): Promise<string> {
  try {
    return await readFile(file, 'utf8');
  } catch {
    throw new MergeError(`${label}: cannot read ${path.basename(file)}; is it the output folder of a finished build --shard I/N?`);
  }
}

async function loadShard(input: ShardInput): Promise<LoadedShard> {
  const dir = await resolveReadableBuild(input.path);
  if (!(await stat(dir).then((s) => s.isDirectory(), () => false))) throw new MergeError(`${input.label}: no such folder`);
  let summary: SummaryLike;
  try {
    summary = JSON.parse(await readText(path.join(dir, 'summary.json'), input.label)) as SummaryLike;
  } catch (e) {
    if (e instanceof MergeError) throw e;
    throw new MergeError(`${input.label}: summary.json is not valid JSON`);
  }
  if (!summary.shard) throw new MergeError(`${input.label} is not a shard: its summary.json has no shard record (built without --shard I/N)`);
  const built = summary.species.filter((s) => s.status === 'ok' && s.name !== undefined).map((s) => s.name as string);
  return { input, dir, summary, shard: summary.shard, built: built.sort(compareText) };
}

/** Checks the set of shards; throws MergeError naming every problem. */
function checkShardSet(shards: readonly LoadedShard[]): void {
  const problems: string[] = [];
  const first = shards[0]!;
  const n = first.shard.count;
  for (const s of shards) {
    if (s.shard.count !== n) problems.push(`${s.input.label} is shard ${s.shard.index}/${s.shard.count}, ${first.input.label} is one of ${n}`);
    else if (s.shard.database_names_sha256 !== first.shard.database_names_sha256) {
      problems.push(`${s.input.label} was built from another database (or another state of it) than ${first.input.label}`);
    }
  }
  if (problems.length === 0) {
    const byIndex = new Map<number, string[]>();
    for (const s of shards) byIndex.set(s.shard.index, [...(byIndex.get(s.shard.index) ?? []), s.input.label]);
    for (const [index, labels] of [...byIndex].sort(([a], [b]) => a - b)) {
      if (labels.length > 1) problems.push(`overlapping shards: ${index}/${n} is given ${labels.length} times (${labels.join(', ')})`);
    }
    const missing = Array.from({ length: n }, (_, i) => i + 1).filter((i) => !byIndex.has(i));
    if (missing.length) problems.push(`missing shard${missing.length > 1 ? 's' : ''} ${missing.map((i) => `${i}/${n}`).join(', ')}`);
  }
  const owner = new Map<string, string>();
  for (const s of shards) {
    for (const name of s.built) {
      const o = owner.get(name);
      if (o !== undefined && o !== s.input.label) problems.push(`species ${name} is in two shards (${o}, ${s.input.label})`);
      owner.set(name, s.input.label);
    }
  }
  if (problems.length) throw new MergeError(`cannot merge: ${problems.join('; ')}`);
}

/** The text of a file that must be identical in every shard (or absent from all). */
async function sameInAll(shards: readonly LoadedShard[], rel: string, what: (text: string) => string): Promise<string | undefined> {
  const has = shards.filter((s) => s.summary.outputs.includes(rel));
  if (has.length === 0) return undefined;
  if (has.length !== shards.length) throw new MergeError(`cannot merge: ${rel} is written by some shards only (different settings)`);
  let ref: string | undefined;
  for (const s of shards) {
    const t = what(await readText(path.join(s.dir, rel), s.input.label));
    if (ref === undefined) ref = t;
    else if (t !== ref) throw new MergeError(`cannot merge: ${rel} of ${s.input.label} differs from that of ${shards[0]!.input.label} (different settings or qforge version)`);
  }
  return ref;
}

function mergeThermoJson(texts: readonly string[]): string {
  const dbs = texts.map((t) => JSON.parse(t) as { species: Array<{ name: string }> } & Record<string, unknown>);
  const envelope = (db: Record<string, unknown>) => jsonText({ ...db, species: [] });
  const ref = envelope(dbs[0]!);
  if (dbs.some((db) => envelope(db) !== ref)) throw new MergeError('cannot merge: the thermo.json headers differ (different settings or qforge version)');
  const species = dbs.flatMap((db) => db.species).sort((a, b) => compareText(a.name, b.name));
  return jsonText({ ...dbs[0]!, species });
}

/** Splits a nasa7.txt into its framing (before the records, after them) and its 4-line records. */
function splitNasa7(text: string): { head: string; records: Array<{ name: string; text: string }>; tail: string } {
  const lines = text.split('\n');
  const start = lines.indexOf('THERMO') + 2;
  const end = lines.lastIndexOf('END');
  if (start < 2 || end < start || (end - start) % 4 !== 0) throw new MergeError('cannot merge: a nasa7.txt is not framed THERMO … END with 4-line records');
  const records = [];
  for (let i = start; i < end; i += 4) records.push({ name: lines[i]!.slice(0, 18).trimEnd(), text: `${lines.slice(i, i + 4).join('\n')}\n` });
  return { head: `${lines.slice(0, start).join('\n')}\n`, records, tail: `${lines.slice(end).join('\n')}` };
}

function mergeSummaries(shards: readonly LoadedShard[], outputs: string[]): SummaryLike {
  const first = shards[0]!.summary;
  const sum = (key: string) => shards.reduce((acc, s) => acc + (s.summary.counts[key] ?? 0), 0);
  const nameKey = (x: { name?: string }) => (x.name === undefined ? '\uffff' : x.name);
  const species = shards
    .flatMap((s) => s.summary.species)
    .sort((a, b) => compareText(nameKey(a), nameKey(b)) || compareText(a.file, b.file) || (a.document ?? 0) - (b.document ?? 0));
  const statuses = shards.map((s) => s.summary.status);
  const timings: Record<string, number> = {};
  for (const s of shards) for (const [k, v] of Object.entries(s.summary.timings_ms)) timings[k] = Math.round(((timings[k] ?? 0) + v) * 1000) / 1000;
  const { shard: _shard, ...rest } = first;
  return {
    ...rest,
    status: statuses.includes('partial') ? 'partial' : 'ok',
    written: true,
    outputs,
    counts: { ...first.counts, species: sum('species'), ok: sum('ok'), failed: sum('failed'), cache_hits: sum('cache_hits') },
    warnings: shards.flatMap((s) => s.summary.warnings),
    species,
    timings_ms: timings,
  };
}

export interface MergeResult {
  species: number;
  shards: number;
  status: 'ok' | 'partial';
  replaced: boolean;
}

/** Merges the shard folders into `out` (replaced as a whole, atomically, like a build's output folder). */
export async function mergeShards(inputs: readonly ShardInput[], out: string): Promise<MergeResult> {
  if (inputs.length === 0) throw new MergeError('cannot merge: no shard folders given');
  const release = await acquireOutputLock(out);
  try {
    await recoverOutputDir(out);
    const shards = await Promise.all(inputs.map(loadShard));
    checkShardSet(shards);
    const files = new Map<string, string>();
    const thermoTexts = await Promise.all(
      shards.filter((s) => s.summary.outputs.includes('thermo.json')).map((s) => readText(path.join(s.dir, 'thermo.json'), s.input.label)),
    );
    if (thermoTexts.length) {
      if (thermoTexts.length !== shards.length) throw new MergeError('cannot merge: thermo.json is written by some shards only (different settings)');
      files.set('thermo.json', mergeThermoJson(thermoTexts));
    }
    const head = await sameInAll(shards, 'nasa7.txt', (t) => splitNasa7(t).head + splitNasa7(t).tail);
    if (head !== undefined) {
      const parts = await Promise.all(shards.map(async (s) => splitNasa7(await readText(path.join(s.dir, 'nasa7.txt'), s.input.label))));
      const records = parts.flatMap((p) => p.records).sort((a, b) => compareText(a.name, b.name));
      files.set('nasa7.txt', `${parts[0]!.head}${records.map((r) => r.text).join('')}${parts[0]!.tail}`);
    }
    const readme = await sameInAll(shards, 'tables/README.txt', (t) => t);
    const staging = await OutputStaging.open(out);
    try {
      for (const [rel, text] of files) await staging.write(rel, text);
      if (readme !== undefined) {
        await staging.write('tables/README.txt', readme);
        const all = tableFileNames(shards.flatMap((s) => s.built), sha256Hex);
        for (const s of shards) {
          for (const [name, rel] of tableFileNames(s.built, sha256Hex)) {
            await staging.write(all.get(name)!, await readFile(path.join(s.dir, rel)));
          }
        }
      }
      const summary = mergeSummaries(shards, [...[...staging.written].sort(), 'summary.json']);
      validateSummaryJson(summary);
      await staging.write('summary.json', jsonText(summary));
      const { replaced } = await staging.publish();
      return { species: shards.reduce((n, s) => n + s.built.length, 0), shards: shards.length, status: summary.status as 'ok' | 'partial', replaced };
    } catch (e) {
      await staging.discard();
      throw e;
    }
  } finally {
    await release();
  }
}
