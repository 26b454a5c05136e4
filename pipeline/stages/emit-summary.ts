/**
 * summary.json's per-species entries, kept as their rendered text instead of as objects: an entry is made
 * when its species is emitted, validated against the entry sub-schema at once, and held as the ~0.6 KB of
 * JSON it will be written as (an object graph of warnings, cache outcomes and timings costs several times
 * that on the heap, and there is one per species). `write` frames them with the envelope, validated with an
 * empty species list; the bytes are those of `jsonText` of the whole summary (tested). The objects are
 * parsed back only when a caller asks for them (`species`: `qforge build --json`, tests). Given a spill file,
 * the texts go there in batches as they come and are read back in runs of adjacent entries when the file is
 * written, so what stays in memory per species is its row (name, file, flags, place): the memory of a
 * build does not grow by half a kilobyte per species (25 MB at 50,000).
 */
import type { ValidateFunction } from 'ajv';
import { validateSummaryEntry, validateSummaryEnvelope } from '../generated/output-validators.js';
import type { CacheKind, CacheOutcome } from '../storage/cache.js';
import type { StagedStream } from '../storage/atomic-write.js';
import { compareText } from '../core/text.js';
import type { SpillFile } from '../storage/spill.js';
import { jsonText, OutputSchemaError } from './emit.js';

/** One species' entry of summary.json (schemas/summary.schema.json, `species` items). */
export interface SummarySpecies {
  /** Absent only for a document without a usable name (then `document` tells which one it is). */
  name?: string;
  file: string;
  /** 1-based position within the file; given for species that failed validation. */
  document?: number;
  status: 'ok' | 'failed';
  warnings: string[];
  errors: string[];
  cache: Partial<Record<CacheKind, CacheOutcome>>;
  cache_hit: boolean;
  fit_metrics?: { max_abs_cp: number; max_abs_h: number; max_abs_s: number; t_mid: number };
  timings_ms: Record<string, number>;
}

interface Row {
  name: string | undefined;
  file: string;
  document: number;
  failed: boolean;
  cacheHit: boolean;
  /**
   * The entry as it stands in summary.json (indented for its depth, no trailing separator), until it is
   * moved to the spill file; then `at` and `bytes` say where its UTF-8 bytes lie there.
   */
  text: string | undefined;
  at: number;
  bytes: number;
}

/** Entry text gathered before it goes to the spill file in one write (and read back per run of rows). */
const SPILL_BATCH = 1 << 20;

// Compiled ahead of time (core/output-schemas.ts, scripts/generate-validators.mjs).
const entryValidator = validateSummaryEntry as unknown as ValidateFunction;
const envelopeValidator = validateSummaryEnvelope as unknown as ValidateFunction;

function validateEntry(entry: SummarySpecies): void {
  if (!entryValidator(entry)) throw new OutputSchemaError('summary.json (species entry)', entryValidator.errors);
}

/** Validates summary.json without its species (each entry was validated when it was added). */
function validateEnvelope(envelope: unknown): void {
  if (!envelopeValidator(envelope)) throw new OutputSchemaError('summary.json', envelopeValidator.errors);
}

/**
 * An entry's text as it stands at depth 2 of summary.json: rendered inside two arrays and cut out, so the
 * indentation is JSON.stringify's own and the text is one flat string (indenting it afterwards with a
 * regular-expression replace leaves a rope of hundreds of pieces per entry on the heap).
 */
function entryText(entry: SummarySpecies): string {
  return JSON.stringify([[entry]], null, 2).slice(OPEN.length, -CLOSE.length);
}
const OPEN = '[\n  [\n';
const CLOSE = '\n  ]\n]';

/** Where the species list sits in the envelope text of `jsonText` with an empty list. */
const EMPTY_SPECIES = '\n  "species": []';
/** Entries written per stream write. */
const CHUNK = 256;

export class SummaryEntries {
  private rows: Row[] = [];
  private failed = 0;
  private hits = 0;
  private parsed: SummarySpecies[] | undefined;
  /** Rows whose text is still in memory only, and its length in UTF-16 units. */
  private unspilled: Row[] = [];
  private unspilledLength = 0;
  private readonly writes: Promise<void>[] = [];

  /**
   * `spill`: where the entry texts may wait (the build's spill file; open until `write` and `settle`);
   * `batchLength`: texts gathered per spill write (tests make it small).
   */
  constructor(
    private readonly spill?: SpillFile,
    private readonly batchLength = SPILL_BATCH,
  ) {}

  /** Validates and keeps one entry (throws OutputSchemaError, a bug, for an entry off its schema). */
  add(entry: SummarySpecies): void {
    validateEntry(entry);
    const row: Row = {
      name: entry.name,
      file: entry.file,
      document: entry.document ?? 0,
      failed: entry.status === 'failed',
      cacheHit: entry.cache_hit,
      text: entryText(entry),
      at: 0,
      bytes: 0,
    };
    this.rows.push(row);
    if (entry.status === 'failed') this.failed++;
    if (entry.cache_hit) this.hits++;
    this.parsed = undefined;
    if (this.spill) {
      this.unspilled.push(row);
      this.unspilledLength += row.text!.length;
      if (this.unspilledLength >= this.batchLength) this.moveToSpill();
    }
  }

  /** Writes the texts held in memory to the spill file in one piece and forgets them. */
  private moveToSpill(): void {
    const rows = this.unspilled;
    this.unspilled = [];
    this.unspilledLength = 0;
    const batch = Buffer.from(rows.map((r) => r.text!).join(''), 'utf8');
    const { ref, written } = this.spill!.appendBytes(batch);
    let at = ref.offset;
    for (const r of rows) {
      r.bytes = Buffer.byteLength(r.text!, 'utf8');
      r.at = at;
      at += r.bytes;
      r.text = undefined;
    }
    this.writes.push(written);
  }

  /** The texts of `rows[from …]` that lie next to each other in the spill file, up to SPILL_BATCH bytes. */
  private async readRun(from: number, to: number): Promise<{ texts: string[]; next: number }> {
    const first = this.rows[from]!;
    if (first.text !== undefined) return { texts: [first.text], next: from + 1 };
    let end = from + 1;
    let bytes = first.bytes;
    while (end < to) {
      const r = this.rows[end]!;
      if (r.text !== undefined || r.at !== first.at + bytes || bytes + r.bytes > SPILL_BATCH) break;
      bytes += r.bytes;
      end++;
    }
    const buf = await this.spill!.getBytes({ offset: first.at, length: bytes });
    const texts: string[] = [];
    for (let i = from, off = 0; i < end; i++) {
      const r = this.rows[i]!;
      texts.push(buf.toString('utf8', off, off + r.bytes));
      off += r.bytes;
    }
    return { texts, next: end };
  }

  /** The texts of rows[from, to) in order (from memory or the spill file). */
  private async textsOf(from: number, to: number): Promise<string[]> {
    await Promise.all(this.writes.splice(0));
    const out: string[] = [];
    for (let i = from; i < to; ) {
      const { texts, next } = await this.readRun(i, to);
      out.push(...texts);
      i = next;
    }
    return out;
  }

  /**
   * Reads every spilled text back into memory, so `species` works after the spill file is closed (the
   * runner calls it last; only a caller that reads the entries needs them).
   */
  async settle(): Promise<void> {
    if (!this.spill) return;
    const texts = await this.textsOf(0, this.rows.length);
    texts.forEach((t, i) => (this.rows[i]!.text = t));
    this.unspilled = [];
    this.unspilledLength = 0;
  }

  get size(): number {
    return this.rows.length;
  }

  get cacheHits(): number {
    return this.hits;
  }

  get failedCount(): number {
    return this.failed;
  }

  /** Names of the failed entries with a name, in the order they were added. */
  failedNames(): string[] {
    return this.rows.flatMap((r) => (r.failed && r.name !== undefined ? [r.name] : []));
  }

  /** Failed entries as `name`, or `file#document` for a document without a name, in the current order. */
  failedLabels(): string[] {
    return this.rows.flatMap((r) => (r.failed ? [r.name ?? `${r.file}#${r.document}`] : []));
  }

  /** Name order (unnamed documents last), then file and document: independent of completion order. */
  sort(): void {
    const nameKey = (r: Row) => (r.name === undefined ? '\uffff' : r.name);
    this.rows.sort((a, b) => compareText(nameKey(a), nameKey(b)) || compareText(a.file, b.file) || a.document - b.document);
    this.parsed = undefined;
  }

  /** The entries as objects, in the current order (parsed from their text on first use). */
  species(): SummarySpecies[] {
    this.parsed ??= this.rows.map((r) => {
      if (r.text === undefined) throw new Error('summary entries read before settle()');
      return JSON.parse(r.text) as SummarySpecies;
    });
    return this.parsed;
  }

  /**
   * Writes summary.json: `envelope` is the summary with an empty species list (validated here), the entries
   * go where that list stands. The bytes equal `jsonText` of the envelope with the entries in it.
   */
  async write(out: StagedStream, envelope: Record<string, unknown> & { species: readonly unknown[] }): Promise<void> {
    if (envelope.species.length !== 0) throw new Error('summary envelope with species in it');
    validateEnvelope(envelope);
    const text = jsonText(envelope);
    const at = text.indexOf(EMPTY_SPECIES);
    if (at < 0) throw new Error('summary.json envelope without a species list');
    await out.write(`${text.slice(0, at)}\n  "species": [`);
    for (let i = 0; i < this.rows.length; i += CHUNK) {
      const part = await this.textsOf(i, Math.min(this.rows.length, i + CHUNK));
      await out.write(`${i === 0 ? '\n' : ',\n'}${part.join(',\n')}`);
    }
    await out.write(`${this.rows.length === 0 ? '' : '\n  '}]${text.slice(at + EMPTY_SPECIES.length)}`);
  }
}
