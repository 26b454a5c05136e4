/**
 * Stage "emit", streamed: each built species is written into the staging folder as soon as it is its
 * turn in name order (the runner's reorder window), so memory does not grow with the database.
 *
 *   tables/<name>.csv  written at once, named as `tableFileNames` would name the whole set (the
 *                      case-collision suffix depends only on the species before it in name order);
 *   thermo.json        each species record is validated against its sub-schema and appended to a scratch
 *                      file; `finish` writes the envelope (validated with an empty species list) around it;
 *   nasa7.txt          each 80-column record is appended to a scratch file; `finish` frames it.
 *
 * The envelopes are rendered at the end, when the build knows everything, by the same functions as the
 * in-memory emit (databaseJson, renderNasa7 with no species), and the bytes are those of `jsonText` and
 * `renderNasa7` of the whole set (tested against them).
 *
 * Reuse of the previous OUT (a rebuild): given the build pack's records of the previous thermo.json and
 * nasa7.txt (storage/build-pack.ts), the previous file is hashed at once (in place; OutputStaging links it
 * when it is needed, checking that the link is of the inode hashed); when it still holds the recorded
 * bytes, each species piece whose digest is the next recorded one is only counted, not written. The first
 * piece that differs switches the file back to a scratch copy (the pieces counted so far are copied from the
 * linked file, whose bytes were checked), and `finish` publishes the previous file only when every piece,
 * the head and the tail matched. A table is linked when
 * the previous one hashes to the digest of the text this build would write. A species taken from the pack
 * carries only digests; its texts are loaded (from its result entry) only where a piece differs.
 */
import { closeSync, createReadStream, openSync, readSync } from 'node:fs';
import { createHash } from 'node:crypto';
import { rm } from 'node:fs/promises';
import { StringDecoder } from 'node:string_decoder';
import type { ValidateFunction } from 'ajv';
import { validateDatabaseSpecies } from '../generated/output-validators.js';
import { formatNasa7Record } from '../../src/nasa7/format.js';
import { markPartialNasa7, type PartialMark } from './partial.js';
import type { OutputStaging, StagedStream } from '../storage/atomic-write.js';
import { sha256Hex } from '../storage/hash.js';
import type { DatabaseSettings } from '../core/settings.js';
import type { RenderedDigests, RenderedSpecies } from '../storage/fast-entries.js';
import type { OutputRecord } from '../storage/build-pack.js';
import { textDigest, type Digest } from '../storage/hash.js';
import { speciesFileStem } from './emit.js';
import {
  databaseJson,
  jsonText,
  nasa7Record,
  OutputSchemaError,
  renderNasa7,
  renderTable,
  renderTablesReadme,
  speciesJson,
  validateDatabaseEnvelope,
  type BuiltSpecies,
} from './emit.js';

// Compiled ahead of time (core/output-schemas.ts, scripts/generate-validators.mjs): ~0.15 s per build at run time.
const speciesValidator = validateDatabaseSpecies as unknown as ValidateFunction;
function validateSpeciesRecord(record: unknown): void {
  if (!speciesValidator(record)) throw new OutputSchemaError('thermo.json (species record)', speciesValidator.errors);
}

/** What `JSON.stringify([[x]], null, 2)` puts around the text of x (an object), which it indents by 4. */
const NESTED_HEAD = '[\n  [\n    ';
const NESTED_TAIL = '\n  ]\n]';

/**
 * A species record as it sits in thermo.json's species list: `JSON.stringify(record, null, 2)` with every
 * line indented by four spaces.
 * Made by stringifying the record two arrays deep and cutting the brackets off (one native pass instead of
 * a regular-expression pass over the text: about half the cost). It also keeps every string intact: the
 * regular-expression form's `^` (m flag) matched after U+2028 and U+2029, which JSON.stringify leaves raw
 * inside strings, and so inserted four spaces into such a string — a record read back held another value.
 */
export function indentedRecordText(record: object): string {
  const nested = JSON.stringify([[record]], null, 2);
  return `    ${nested.slice(NESTED_HEAD.length, -NESTED_TAIL.length)}`;
}

/** Where the species list sits in the envelope text of `jsonText(databaseJson([], …))`. */
const EMPTY_SPECIES = '\n  "species": []';
const NASA7_END = 'END\n';

/** Incremental `tableFileNames`: names must arrive in name order. */
export class TableNamer {
  private readonly taken = new Set<string>();
  /** The name `next` would give, without taking it. */
  peek(name: string): string {
    let stem = speciesFileStem(name);
    if (this.taken.has(stem.toLowerCase())) stem = `${stem}_${sha256Hex(name).slice(0, 8)}`;
    return `tables/${stem}.csv`;
  }
  next(name: string): string {
    const rel = this.peek(name);
    this.taken.add(rel.slice('tables/'.length, -'.csv'.length).toLowerCase());
    return rel;
  }
}

/**
 * One output assembled from per-species pieces: written to a scratch file, or — while the previous file's
 * pieces keep matching — only counted against the linked previous file (see the module comment).
 */
class PieceStream {
  readonly pieces: Array<[string, number]> = [];
  private scratch: StagedStream | undefined;
  /** The linked previous file, its record, and the bytes of the pieces counted so far (separators included). */
  private reuse: { path: string; record: OutputRecord; offset: number } | undefined;
  private whole = createHash('sha256');
  private wholeBytes = 0;

  private constructor(
    private readonly staging: OutputStaging,
    private readonly rel: string,
    private readonly separator: (index: number) => string,
    private readonly digests: boolean,
  ) {}

  static async open(staging: OutputStaging, rel: string, separator: (index: number) => string, digests: boolean, previous?: OutputRecord): Promise<PieceStream> {
    const s = new PieceStream(staging, rel, separator, digests);
    const candidate = staging.scratchPath(`reuse-${rel}`);
    if (previous && (await staging.linkPreviousAs(rel, candidate, previous.whole))) s.reuse = { path: candidate, record: previous, offset: 0 };
    else s.scratch = await staging.scratch(rel);
    return s;
  }

  get count(): number {
    return this.pieces.length;
  }

  /** Whether a piece of this digest is the next one of the linked previous file (then `accept` it). */
  accepts(d: Digest | undefined): boolean {
    const next = this.reuse?.record.pieces[this.pieces.length];
    return d !== undefined && next !== undefined && next[0] === d.hash && next[1] === d.bytes;
  }

  accept(d: Digest): void {
    this.reuse!.offset += Buffer.byteLength(this.separator(this.pieces.length), 'utf8') + d.bytes;
    this.pieces.push([d.hash, d.bytes]);
  }

  /** Appends a piece; its digest is computed unless given (and only when digests are kept). */
  async write(text: string, d?: Digest): Promise<Digest | undefined> {
    const digest = d ?? (this.digests ? textDigest(text) : undefined);
    if (this.accepts(digest)) {
      this.accept(digest!);
      return digest;
    }
    if (this.reuse) await this.toScratch();
    await this.scratch!.write(`${this.separator(this.pieces.length)}${text}`);
    this.pieces.push(digest ? [digest.hash, digest.bytes] : ['', 0]);
    return digest;
  }

  /** Leaves reuse: the pieces counted so far are copied from the linked previous file into a scratch file. */
  private async toScratch(): Promise<void> {
    const { path: linked, record, offset } = this.reuse!;
    this.reuse = undefined;
    this.scratch = await this.staging.scratch(this.rel);
    await this.staging.ensureLinked(linked);
    const fd = openSync(linked, 'r');
    try {
      const buf = Buffer.allocUnsafe(1 << 20);
      // A chunk may end inside a multi-byte character: the decoder carries it over to the next one.
      const decoder = new StringDecoder('utf8');
      for (let done = 0; done < offset; ) {
        const n = readSync(fd, buf, 0, Math.min(buf.length, offset - done), record.head.bytes + done);
        if (n === 0) throw new Error(`${this.rel}: the linked previous file ended early`);
        await this.scratch.write(decoder.write(buf.subarray(0, n)));
        done += n;
      }
      await this.scratch.write(decoder.end());
    } finally {
      closeSync(fd);
    }
    await rm(linked, { force: true });
  }

  /** Publishes the file: the link when nothing differed, else head + scratch + tail. Returns its record. */
  async finish(head: string, tail: string): Promise<OutputRecord> {
    const headD = textDigest(head);
    const tailD = textDigest(tail);
    const r = this.reuse;
    if (r && this.pieces.length === r.record.pieces.length && sameDigest(headD, r.record.head) && sameDigest(tailD, r.record.tail)) {
      await this.staging.adoptScratch(r.path, this.rel);
      this.reuse = undefined;
      return { file: this.rel, whole: r.record.whole, head: headD, tail: tailD, pieces: this.pieces };
    }
    // A piece fewer than before (a species failed), or another head or tail: framed from a scratch copy.
    if (r) await this.toScratch();
    await this.scratch!.close();
    const out = await this.staging.stream(this.rel);
    const put = async (text: string) => {
      await out.write(text);
      this.whole.update(text, 'utf8');
      this.wholeBytes += Buffer.byteLength(text, 'utf8');
    };
    try {
      await put(head);
      for await (const chunk of createReadStream(this.staging.scratchPath(this.rel), { encoding: 'utf8' })) await put(chunk as string);
      await put(tail);
    } finally {
      await out.close();
    }
    await this.staging.dropScratch(this.rel);
    await this.staging.reuseIfSame(this.rel);
    return { file: this.rel, whole: { hash: this.whole.digest('hex'), bytes: this.wholeBytes }, head: headD, tail: tailD, pieces: this.pieces };
  }

  /** Closes what is open and drops the link (idempotent; `finish` does it itself). */
  async close(): Promise<void> {
    await this.scratch?.close();
    if (this.reuse) await this.staging.dropLink(this.reuse.path);
    this.reuse = undefined;
  }
}

const sameDigest = (a: Digest, b: Digest) => a.hash === b.hash && a.bytes === b.bytes;

/** How a StreamingEmitter is opened: whether it keeps digests (for the next build pack), the previous records. */
export interface EmitterOptions {
  /** Compute the digest of every text written (the runner stores them in the build pack). */
  digests?: boolean;
  /** The build pack's records of the previous OUT's thermo.json and nasa7.txt (see the module comment). */
  previous?: ReadonlyMap<string, OutputRecord>;
}


export class StreamingEmitter {
  private thermo: PieceStream | undefined;
  private nasa7: PieceStream | undefined;
  private readonly namer = new TableNamer();
  private count = 0;
  /** The records of the framed files, after `finish`. */
  readonly records: OutputRecord[] = [];

  private constructor(
    private readonly staging: OutputStaging,
    private readonly settings: DatabaseSettings,
    private readonly digests: boolean,
  ) {}

  static async open(staging: OutputStaging, settings: DatabaseSettings, opts: EmitterOptions = {}): Promise<StreamingEmitter> {
    const digests = opts.digests === true || opts.previous !== undefined;
    const e = new StreamingEmitter(staging, settings, digests);
    if (settings.outputs.thermo_json) e.thermo = await PieceStream.open(staging, 'thermo.json', (i) => (i === 0 ? '\n' : ',\n'), digests, opts.previous?.get('thermo.json'));
    if (settings.outputs.nasa7) e.nasa7 = await PieceStream.open(staging, 'nasa7.txt', () => '', digests, opts.previous?.get('nasa7.txt'));
    return e;
  }

  /** Species written so far. */
  get written(): number {
    return this.count;
  }

  /**
   * Renders and writes one species (in name order). Throws before writing anything when a record cannot
   * be rendered (a Nasa7FormatError: the runner fails that species). Returns the rendered texts (the
   * no-change fast path stores them), their digests (when kept) and the time spent on its table.
   */
  async add(b: BuiltSpecies): Promise<{ rendered: RenderedSpecies; digests: RenderedDigests; tableMs: number }> {
    const r: RenderedSpecies = {};
    if (this.nasa7) r.nasa7 = `${formatNasa7Record(nasa7Record(b, this.settings.record_identifier)).join('\n')}\n`;
    if (this.thermo) {
      const record = speciesJson(b);
      validateSpeciesRecord(record);
      r.thermo = indentedRecordText(record);
    }
    let tableMs = 0;
    if (this.settings.outputs.tables) {
      const t0 = performance.now();
      r.table = b.tableText ?? renderTable(b);
      tableMs = performance.now() - t0;
    }
    const digests = await this.addRendered(b.name, r);
    return { rendered: r, digests, tableMs };
  }

  /**
   * Writes one species from texts `add` rendered (in name order; taken from the cache on a no-change
   * rebuild). An output the settings do not write is ignored; one they write must be present. Returns the
   * digests of the texts (when kept).
   */
  async addRendered(name: string, r: RenderedSpecies): Promise<RenderedDigests> {
    const missing = [this.nasa7 && r.nasa7 === undefined && 'nasa7', this.thermo && r.thermo === undefined && 'thermo', this.settings.outputs.tables && r.table === undefined && 'table'].filter(Boolean);
    if (missing.length) throw new Error(`rendered outputs of ${name} lack ${missing.join(', ')}`);
    const d: RenderedDigests = {};
    const tableFile = this.settings.outputs.tables ? this.namer.next(name) : undefined;
    if (this.nasa7) d.nasa7 = await this.nasa7.write(r.nasa7!);
    if (this.thermo) d.thermo = await this.thermo.write(r.thermo!);
    if (tableFile !== undefined) {
      const td = this.digests ? textDigest(r.table!) : undefined;
      if (!td) await this.staging.writeOrReuse(tableFile, r.table!);
      else {
        // No previous file of that digest: one to compare byte for byte cannot exist either.
        if (!(await this.staging.reuseByDigest(tableFile, td))) await this.staging.write(tableFile, r.table!);
        d.table = td;
      }
    }
    this.count++;
    return d;
  }

  /**
   * Writes one species of which only the digests of its texts are at hand (a build pack line): pieces and a
   * table that match the previous OUT are reused; the texts are loaded (`load`) only when something differs.
   * Returns undefined, having written nothing, when texts are needed and `load` has none (the runner then
   * builds the species).
   */
  async addDigested(name: string, d: RenderedDigests, load: () => Promise<RenderedSpecies | undefined>): Promise<RenderedDigests | undefined> {
    const tables = this.settings.outputs.tables;
    if ((this.nasa7 && !d.nasa7) || (this.thermo && !d.thermo) || (tables && !d.table)) return undefined;
    const tableFile = tables ? this.namer.peek(name) : undefined;
    const tableReused = tableFile !== undefined && (await this.staging.reuseByDigest(tableFile, d.table!));
    const needed = (this.nasa7 && !this.nasa7.accepts(d.nasa7)) || (this.thermo && !this.thermo.accepts(d.thermo)) || (tableFile !== undefined && !tableReused);
    if (!needed) {
      if (tableFile !== undefined) this.namer.next(name);
      if (this.nasa7) this.nasa7.accept(d.nasa7!);
      if (this.thermo) this.thermo.accept(d.thermo!);
      this.count++;
      return d;
    }
    if (tableReused) await this.staging.remove(tableFile!);
    const r = await load();
    if (!r || (this.nasa7 && r.nasa7 === undefined) || (this.thermo && r.thermo === undefined) || (tables && r.table === undefined)) return undefined;
    return this.addRendered(name, r);
  }

  /** Writes the framed thermo.json and nasa7.txt and tables/README.txt; `mark` flags a partial database. */
  async finish(mark?: PartialMark): Promise<void> {
    if (this.thermo) {
      const envelope = databaseJson([], this.settings);
      if (mark) Object.assign(envelope, { partial: mark });
      validateDatabaseEnvelope(envelope);
      const text = jsonText(envelope);
      const at = text.lastIndexOf(EMPTY_SPECIES);
      if (at < 0) throw new Error('thermo.json envelope without a species list');
      const head = `${text.slice(0, at)}\n  "species": [`;
      const tail = `${this.count === 0 ? '' : '\n  '}]${text.slice(at + EMPTY_SPECIES.length)}`;
      this.records.push(await this.thermo.finish(head, tail));
    }
    if (this.nasa7) {
      const framed = renderNasa7([], this.settings);
      const text = mark ? markPartialNasa7(framed, mark) : framed;
      if (!text.endsWith(NASA7_END)) throw new Error('nasa7.txt framing without its END line');
      this.records.push(await this.nasa7.finish(text.slice(0, -NASA7_END.length), NASA7_END));
    }
    if (this.settings.outputs.tables) await this.staging.writeOrReuse('tables/README.txt', renderTablesReadme(this.settings));
  }

  /** Closes the scratch files (idempotent; `finish` closes them itself). */
  async close(): Promise<void> {
    await this.thermo?.close();
    await this.nasa7?.close();
  }
}
