/**
 * summary.json's per-species entries, kept as their rendered text instead of as objects: an entry is made
 * when its species is emitted, validated against the entry sub-schema at once, and held as the ~0.6 KB of
 * JSON it will be written as (an object graph of warnings, cache outcomes and timings costs several times
 * that on the heap, and there is one per species). `write` frames them with the envelope, validated with an
 * empty species list; the bytes are those of `jsonText` of the whole summary (tested). The objects are
 * parsed back only when a caller asks for them (`species`: `qforge build --json`, tests).
 */
import type { ValidateFunction } from 'ajv';
import { validateSummaryEntry, validateSummaryEnvelope } from '../generated/output-validators.js';
import type { CacheKind, CacheOutcome } from '../storage/cache.js';
import type { StagedStream } from '../storage/atomic-write.js';
import { compareText } from '../core/text.js';
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
  /** The entry as it stands in summary.json (indented for its depth, no trailing separator). */
  text: string;
}

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

  /** Validates and keeps one entry (throws OutputSchemaError, a bug, for an entry off its schema). */
  add(entry: SummarySpecies): void {
    validateEntry(entry);
    this.rows.push({
      name: entry.name,
      file: entry.file,
      document: entry.document ?? 0,
      failed: entry.status === 'failed',
      cacheHit: entry.cache_hit,
      text: entryText(entry),
    });
    if (entry.status === 'failed') this.failed++;
    if (entry.cache_hit) this.hits++;
    this.parsed = undefined;
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
    this.parsed ??= this.rows.map((r) => JSON.parse(r.text) as SummarySpecies);
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
      const part = this.rows.slice(i, i + CHUNK).map((r) => r.text);
      await out.write(`${i === 0 ? '\n' : ',\n'}${part.join(',\n')}`);
    }
    await out.write(`${this.rows.length === 0 ? '' : '\n  '}]${text.slice(at + EMPTY_SPECIES.length)}`);
  }
}
