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
 */
import { createReadStream } from 'node:fs';
import type { ValidateFunction } from 'ajv';
import { validateDatabaseSpecies } from '../generated/output-validators.js';
import { formatNasa7Record } from '../../src/nasa7/format.js';
import { markPartialNasa7, type PartialMark } from './partial.js';
import type { OutputStaging, StagedStream } from '../storage/atomic-write.js';
import { sha256Hex } from '../storage/hash.js';
import type { DatabaseSettings } from '../core/settings.js';
import type { RenderedSpecies } from '../storage/fast-entries.js';
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

/** Where the species list sits in the envelope text of `jsonText(databaseJson([], …))`. */
const EMPTY_SPECIES = '\n  "species": []';
const NASA7_END = 'END\n';

/** Incremental `tableFileNames`: names must arrive in name order. */
export class TableNamer {
  private readonly taken = new Set<string>();
  next(name: string): string {
    let stem = speciesFileStem(name);
    if (this.taken.has(stem.toLowerCase())) stem = `${stem}_${sha256Hex(name).slice(0, 8)}`;
    this.taken.add(stem.toLowerCase());
    return `tables/${stem}.csv`;
  }
}

export class StreamingEmitter {
  private thermo: StagedStream | undefined;
  private nasa7: StagedStream | undefined;
  private readonly namer = new TableNamer();
  private count = 0;

  private constructor(
    private readonly staging: OutputStaging,
    private readonly settings: DatabaseSettings,
  ) {}

  static async open(staging: OutputStaging, settings: DatabaseSettings): Promise<StreamingEmitter> {
    const e = new StreamingEmitter(staging, settings);
    if (settings.outputs.thermo_json) e.thermo = await staging.scratch('thermo.json');
    if (settings.outputs.nasa7) e.nasa7 = await staging.scratch('nasa7.txt');
    return e;
  }

  /** Species written so far. */
  get written(): number {
    return this.count;
  }

  /**
   * Renders and writes one species (in name order). Throws before writing anything when a record cannot
   * be rendered (a Nasa7FormatError: the runner fails that species). Returns the rendered texts (the
   * no-change fast path stores them) and the time spent on its table.
   */
  async add(b: BuiltSpecies): Promise<{ rendered: RenderedSpecies; tableMs: number }> {
    const r: RenderedSpecies = {};
    if (this.nasa7) r.nasa7 = `${formatNasa7Record(nasa7Record(b, this.settings.record_identifier)).join('\n')}\n`;
    if (this.thermo) {
      const record = speciesJson(b);
      validateSpeciesRecord(record);
      r.thermo = JSON.stringify(record, null, 2).replace(/^/gm, '    ');
    }
    let tableMs = 0;
    if (this.settings.outputs.tables) {
      const t0 = performance.now();
      r.table = await renderTable(b);
      tableMs = performance.now() - t0;
    }
    await this.addRendered(b.name, r);
    return { rendered: r, tableMs };
  }

  /**
   * Writes one species from texts `add` rendered (in name order; taken from the cache on a no-change
   * rebuild). An output the settings do not write is ignored; one they write must be present.
   */
  async addRendered(name: string, r: RenderedSpecies): Promise<void> {
    const missing = [this.nasa7 && r.nasa7 === undefined && 'nasa7', this.thermo && r.thermo === undefined && 'thermo', this.settings.outputs.tables && r.table === undefined && 'table'].filter(Boolean);
    if (missing.length) throw new Error(`rendered outputs of ${name} lack ${missing.join(', ')}`);
    const tableFile = this.settings.outputs.tables ? this.namer.next(name) : undefined;
    if (this.nasa7) await this.nasa7.write(r.nasa7!);
    if (this.thermo) await this.thermo.write(this.count === 0 ? `\n${r.thermo!}` : `,\n${r.thermo!}`);
    if (tableFile !== undefined) await this.staging.writeOrReuse(tableFile, r.table!);
    this.count++;
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
      await this.thermo.close();
      await this.frame('thermo.json', head, tail);
    }
    if (this.nasa7) {
      const framed = renderNasa7([], this.settings);
      const text = mark ? markPartialNasa7(framed, mark) : framed;
      if (!text.endsWith(NASA7_END)) throw new Error('nasa7.txt framing without its END line');
      await this.nasa7.close();
      await this.frame('nasa7.txt', text.slice(0, -NASA7_END.length), NASA7_END);
    }
    if (this.settings.outputs.tables) await this.staging.write('tables/README.txt', renderTablesReadme(this.settings));
  }

  /** Closes the scratch files (idempotent; `finish` closes them itself). */
  async close(): Promise<void> {
    await this.thermo?.close();
    await this.nasa7?.close();
  }

  private async frame(rel: string, head: string, tail: string): Promise<void> {
    const out = await this.staging.stream(rel);
    try {
      await out.write(head);
      for await (const chunk of createReadStream(this.staging.scratchPath(rel), { encoding: 'utf8' })) await out.write(chunk as string);
      await out.write(tail);
    } finally {
      await out.close();
    }
    await this.staging.dropScratch(rel);
    await this.staging.reuseIfSame(rel);
  }
}
