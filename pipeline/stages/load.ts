/**
 * Load stage: the only place on the input side that touches the disk. Finds the species files of a database
 * folder and parses YAML text into documents that remember where every node came from, so later stages can
 * point at file:line:column.
 *
 * Hostile input is expected (a database folder may come from anywhere):
 * - files larger than `maxBytes` (default 1 MiB) are refused before they are read;
 * - YAML aliases are expanded at most `maxAliasCount` times (default 100), which stops "billion laughs"
 *   alias bombs with a clear message instead of exhausting memory;
 * - only the YAML 1.2 core schema is used: no tag constructs objects or runs code, and an unknown tag
 *   (`!!js/function`, `!!python/object`, `!custom`, even YAML 1.1 `!!binary`/`!!set`) is an error, never
 *   silently turned into a string;
 * - duplicate keys in a mapping are errors (the second value would otherwise silently win).
 *
 * All errors at once: a document whose only YAML-level problems are duplicate keys or unknown tags is
 * structurally sound, so it is still read (the FIRST value of a duplicated key is kept; a tagged node
 * becomes null, i.e. invalid) and returned in `recoveredDocuments`, never in `documents`. Consumers
 * validate it to report the rest of its mistakes in the same run, and must never build from it (its YAML
 * error stays in `diagnostics` and in the document's `yamlErrors`). A syntax error, an alias bomb or a
 * nesting overflow makes the document unreadable: nothing of it is returned.
 *
 * Plain species files (nearly all of them) are read by the fast reader of `yaml-plain.ts`, which gives the
 * same documents and positions as the `yaml` library path below and declines anything it is not sure of;
 * the size and nesting checks run before it, and every declined text goes through the library unchanged.
 *
 * Symlink policy of `discoverSpeciesFiles`: a symlinked file or folder whose real path lies inside the
 * database folder is followed (each real file is read once); one that resolves OUTSIDE the database folder is
 * refused with an error diagnostic, as is a broken link. Entries whose name starts with '.' are skipped.
 */
import { closeSync, openSync, readFileSync, readSync, statSync } from 'node:fs';
import { readdir, readFile, realpath, stat } from 'node:fs/promises';
import path from 'node:path';
import type { Document, LineCounter, Node as YamlNode } from 'yaml';
import { yamlModule } from '../core/lazy-libraries.js';
import type { GeometryRow } from '../../src/geometry/index.js';
import type { Diagnostic } from '../core/diagnostics.js';
import { parseXyz } from './xyz.js';
import { readPlainYaml } from './yaml-plain.js';
import { compareText, errorText } from '../core/text.js';

/** Default size limit of one YAML file: 1 MiB (a large species file is a few kB). */
export const DEFAULT_MAX_BYTES = 1024 * 1024;
/** Default cap on alias expansions per document (yaml's own default; legitimate files use a handful). */
export const DEFAULT_MAX_ALIAS_COUNT = 100;
/**
 * Default cap on nesting: of flow collections ([ ] and { }), of compact block indicators on one line
 * (`- - - x`), and (times 4) of indentation columns. A species needs 3 or 4 levels; a few thousand levels,
 * well under the size limit, can exhaust the parser's stack or memory.
 */
export const DEFAULT_MAX_NESTING = 64;
/** The settings file at the root of a database folder, never read as a species file. */
export const SETTINGS_FILE_NAME = 'qforge.yaml';

export interface SourcePosition {
  /** 1-based. */
  line: number;
  /** 1-based. */
  column: number;
}

/** One species document (a YAML document, or one item of a top-level list). */
export interface LoadedDocument {
  /** Display path of the file. */
  file: string;
  /** 0-based position of this species within its file (counting list items and `---` documents). */
  index: number;
  /** Plain JavaScript value of the species (mappings are plain objects). */
  value: unknown;
  /**
   * Source position of the node at `path` (relative to this species). When the path does not exist, the
   * position of its deepest existing ancestor. With `{ key: true }` the position of the mapping key of the
   * last segment instead of its value (where an unknown key is written).
   */
  locate(path: ReadonlyArray<string | number>, opts?: { key?: boolean }): SourcePosition | undefined;
  /**
   * Only on a recovered document: the YAML-level errors (duplicate key, unknown tag) found in it. They are
   * also in LoadResult.diagnostics; a document carrying them must never be built.
   */
  yamlErrors?: readonly Diagnostic[];
  /**
   * The XYZ files named by `geometry_file` (of the species or of a conformer), by name as written, read by
   * `loadYamlFile` (absent when none is named or the document was not loaded from disk).
   */
  geometryFiles?: Record<string, LoadedGeometryFile>;
}

/** A geometry file as read: its rows and their lines, or the problems that stopped it (located in it). */
export interface LoadedGeometryFile {
  /** Display path of the XYZ file. */
  file: string;
  rows: GeometryRow[];
  lines: number[];
  diagnostics: Diagnostic[];
}

export interface LoadResult {
  file: string;
  /** Documents without any YAML-level error. */
  documents: LoadedDocument[];
  /**
   * Documents whose only YAML-level errors are duplicate keys or unknown tags (see the module comment):
   * for validation diagnostics only, never to be built. Each carries `yamlErrors`.
   */
  recoveredDocuments: LoadedDocument[];
  diagnostics: Diagnostic[];
  text: string;
}

export interface ParseOptions {
  /** Refuse text larger than this many bytes (UTF-8). Default 1 MiB. */
  maxBytes?: number;
  /** Cap on alias expansions per YAML document. Default 100. */
  maxAliasCount?: number;
  /** Cap on nesting levels (flow brackets, compact `- - x` indicators; indentation columns / 4). Default 64. */
  maxNesting?: number;
  /**
   * How a YAML document maps to species: 'species' (default) splits a top-level list into one document per
   * item; 'single' keeps each YAML document whole (e.g. for a settings file).
   */
  split?: 'species' | 'single';
  /**
   * Try the fast reader of plain YAML (`yaml-plain.ts`) first (default true). False always uses the `yaml`
   * library, so the differential tests can compare the two.
   */
  plainFastPath?: boolean;
}

function err(file: string, code: string, message: string, extra: Partial<Diagnostic> = {}): Diagnostic {
  return { severity: 'error', code, file, path: '', message, ...extra };
}

/** The file's text when it is UTF-8 without NUL bytes (a binary or UTF-16 file has them), else undefined. */
function decodeUtf8Text(bytes: Buffer): string | undefined {
  if (bytes.includes(0)) return undefined;
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    return undefined;
  }
}

function describeNonText(bytes: Buffer): string {
  if ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff)) return 'UTF-16 byte-order mark';
  const nul = bytes.indexOf(0);
  if (nul >= 0) return `NUL byte at offset ${nul}: binary or UTF-16`;
  return 'invalid UTF-8 byte sequence';
}

function formatBytes(n: number): string {
  if (n >= 1024 * 1024) return `${(n / (1024 * 1024)).toFixed(n % (1024 * 1024) === 0 ? 0 : 1)} MiB`;
  if (n >= 1024) return `${(n / 1024).toFixed(n % 1024 === 0 ? 0 : 1)} KiB`;
  return `${n} bytes`;
}

function sizeDiagnostic(file: string, size: number, maxBytes: number): Diagnostic {
  return err(file, 'file-too-large', `file is too large: ${formatBytes(size)} (${size} bytes); the limit is ${formatBytes(maxBytes)}`, {
    expected: `a species file of at most ${maxBytes} bytes (split large databases into several files)`,
  });
}

/** yaml's messages end with " at line L, column C" when pretty; we report the position separately. */
function plainYamlMessage(message: string): string {
  return message.replace(/ at line \d+, column \d+:[\s\S]*$/, '').trim();
}

const YAML_MESSAGES: Readonly<Record<string, (m: string) => string>> = {
  DUPLICATE_KEY: () => 'duplicate key in a mapping (each key may appear only once)',
  TAG_RESOLVE_FAILED: (m) =>
    `${m}; only plain YAML values are accepted (no tags that construct objects or run code)`,
};

/** Stable diagnostic code of a YAML parser problem. */
function yamlCode(yamlErrorCode: string): string {
  if (yamlErrorCode === 'DUPLICATE_KEY') return 'yaml-duplicate-key';
  if (yamlErrorCode === 'TAG_RESOLVE_FAILED') return 'yaml-tag-refused';
  return 'yaml-syntax';
}

/** YAML-level problems after which the rest of the document can still be read and checked. */
const RECOVERABLE = new Set(['DUPLICATE_KEY', 'TAG_RESOLVE_FAILED']);

/** The YAML 1.2 core-schema tags; any other tag on a node is unresolved (refused). */
const CORE_TAGS = new Set(['str', 'int', 'float', 'bool', 'null', 'map', 'seq'].map((t) => `tag:yaml.org,2002:${t}`));

/**
 * Makes a document with duplicate keys or unknown tags readable for checking: the later pairs of a
 * duplicated scalar key are dropped (the first value is kept, which is also the one `locate` points at),
 * and a node with an unresolved tag becomes null, so the checks report it as invalid rather than using
 * the text behind the tag. Returns, per duplicate key offset, the line of the kept first key.
 */
function recoverDocument(doc: Document.Parsed, lc: LineCounter): Map<number, { key: string; firstLine: number }> {
  const { isMap, isScalar, Scalar, visit } = yamlModule();
  const dropped = new Map<number, { key: string; firstLine: number }>();
  visit(doc, {
    // One visitor for every node: yaml calls a Map-specific visitor instead of Node, which would skip tags.
    Node(_key, node) {
      if (node.tag !== undefined && !CORE_TAGS.has(node.tag)) {
        const nul = new Scalar(null);
        nul.range = node.range;
        return nul;
      }
      if (!isMap(node)) return undefined;
      const first = new Map<string, number>();
      node.items = node.items.filter((pair) => {
        if (!isScalar(pair.key)) return true;
        const k = String(pair.key.value);
        const start = nodeStart(pair.key) ?? 0;
        const seen = first.get(k);
        if (seen === undefined) {
          first.set(k, start);
          return true;
        }
        dropped.set(start, { key: k, firstLine: positionOf(lc, seen).line });
        return false;
      });
      return undefined;
    },
  });
  return dropped;
}

function positionOf(lc: LineCounter, offset: number): SourcePosition {
  const p = lc.linePos(offset);
  return { line: p.line, column: p.col };
}

function nodeStart(node: unknown): number | undefined {
  const range = (node as { range?: [number, number, number] } | null)?.range;
  return range ? range[0] : undefined;
}

/** Walks the YAML AST; returns the position of the node at `segments`, or the deepest ancestor's. */
function locateIn(
  doc: Document,
  root: unknown,
  segments: ReadonlyArray<string | number>,
  lc: LineCounter,
  wantKey: boolean,
): SourcePosition | undefined {
  const { isAlias, isMap, isPair, isScalar, isSeq } = yamlModule();
  let node: unknown = root;
  let best = nodeStart(root);
  for (let i = 0; i < segments.length; i++) {
    const seg = segments[i]!;
    const last = i === segments.length - 1;
    if (isAlias(node)) node = node.resolve(doc);
    if (isMap(node)) {
      const pair = node.items.find((p) => isPair(p) && isScalar(p.key) && String(p.key.value) === String(seg));
      if (!pair) break;
      const keyStart = nodeStart(pair.key);
      const valueStart = nodeStart(pair.value);
      if (last && wantKey) {
        best = keyStart ?? best;
        break;
      }
      // An empty value (`vibrations:`) has no text of its own: point at its key.
      const v = pair.value;
      const empty = v === null || v === undefined || (isScalar(v) && v.value === null && !!v.range && v.range[0] === v.range[1]);
      if (empty) {
        best = keyStart ?? best;
        break;
      }
      best = valueStart ?? keyStart ?? best;
      node = v;
    } else if (isSeq(node)) {
      const idx = typeof seg === 'number' ? seg : Number(seg);
      const item = Number.isInteger(idx) ? node.items[idx] : undefined;
      if (item === undefined) break;
      best = nodeStart(item) ?? best;
      node = item;
    } else {
      break;
    }
  }
  return best === undefined ? undefined : positionOf(lc, best);
}

const QUOTE_OPENERS = new Set([' ', '\t', '\n', '\r', '[', '{', ',', ':', '-']);

/**
 * Offset where flow nesting first exceeds `limit`, or -1. A light scan, run before the parser: it skips
 * comments and quoted scalars (so brackets inside text do not count) and only needs to be conservative.
 */
function flowNestingOverflow(text: string, limit: number): number {
  let depth = 0;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i]!;
    const prev = i === 0 ? '\n' : text[i - 1]!;
    if (prev === '\n') {
      // Block nesting: deep indentation, or compact indicators `- - - x` / `? ? ? x` opening one level each.
      let j = i;
      while (text[j] === ' ') j++;
      if (j - i > limit * 4) return j;
      let compact = 0;
      while ((text[j] === '-' || text[j] === '?' || text[j] === ':') && (text[j + 1] === ' ' || text[j + 1] === '\t')) {
        if (++compact > limit) return j;
        j += 2;
        while (text[j] === ' ' || text[j] === '\t') j++;
      }
    }
    if (ch === '#' && (prev === ' ' || prev === '\t' || prev === '\n' || prev === '\r')) {
      while (i < text.length && text[i] !== '\n') i++;
    } else if ((ch === '"' || ch === "'") && QUOTE_OPENERS.has(prev)) {
      for (i++; i < text.length; i++) {
        if (ch === '"' && text[i] === '\\') i++;
        else if (text[i] === ch) {
          if (ch === "'" && text[i + 1] === "'") i++;
          else break;
        }
      }
    } else if (ch === '[' || ch === '{') {
      if (++depth > limit) return i;
    } else if ((ch === ']' || ch === '}') && depth > 0) {
      depth--;
    }
  }
  return -1;
}

function isExcessiveAliasError(e: unknown): boolean {
  return e instanceof Error && /alias count|resource exhaustion/i.test(e.message);
}

/**
 * Parses YAML text (one or more `---` documents) into species documents. Pure: no disk access. Syntax
 * errors, duplicate keys, unknown tags, alias bombs and oversized text become error diagnostics with line
 * and column; the documents without errors are still returned, so one bad document does not hide the others.
 * Documents (or items of a top-level list) whose only errors are duplicate keys or unknown tags are returned
 * in `recoveredDocuments` for checking, never in `documents`.
 */
export function parseYamlText(text: string, displayPath: string, opts: ParseOptions = {}): LoadResult {
  const maxBytes = opts.maxBytes ?? DEFAULT_MAX_BYTES;
  const maxAliasCount = opts.maxAliasCount ?? DEFAULT_MAX_ALIAS_COUNT;
  const split = opts.split ?? 'species';
  const result: LoadResult = { file: displayPath, documents: [], recoveredDocuments: [], diagnostics: [], text };
  const size = Buffer.byteLength(text, 'utf8');
  if (size > maxBytes) {
    result.diagnostics.push(sizeDiagnostic(displayPath, size, maxBytes));
    result.text = '';
    return result;
  }

  const maxNesting = opts.maxNesting ?? DEFAULT_MAX_NESTING;
  const overflow = flowNestingOverflow(text, maxNesting);
  if (overflow >= 0) {
    const upTo = text.slice(0, overflow);
    const line = upTo.split('\n').length;
    const column = overflow - upTo.lastIndexOf('\n');
    result.diagnostics.push(
      err(displayPath, 'yaml-too-deep', `YAML nesting deeper than ${maxNesting} levels (or indented more than ${maxNesting * 4} columns); refused`, {
        line,
        column,
        expected: `at most ${maxNesting} nested lists or mappings`,
      }),
    );
    return result;
  }
  // Species files are nearly always plain YAML, which the fast reader takes at a small part of the
  // library's cost; it declines anything it is not sure of, and the library reads that below.
  const plain = opts.plainFastPath === false ? undefined : readPlainYaml(text, displayPath, split);
  if (plain !== undefined) {
    result.documents = plain;
    return result;
  }
  const { LineCounter, isSeq, parseAllDocuments } = yamlModule();
  const lc = new LineCounter();
  let docs: Document.Parsed[];
  try {
    docs = parseAllDocuments(text, {
      lineCounter: lc,
      schema: 'core',
      uniqueKeys: true,
      prettyErrors: false,
      merge: false,
      // Without this, yaml resolves the YAML 1.1 tags !!binary, !!set, !!omap, !!pairs, !!timestamp even
      // under the core schema; we accept plain values only.
      resolveKnownTags: false,
      strict: true,
    }) as Document.Parsed[];
  } catch (e) {
    result.diagnostics.push(err(displayPath, 'yaml-unreadable', `could not parse YAML: ${errorText(e)}`));
    return result;
  }
  // parseAllDocuments returns an EmptyStream (array-like, empty) for text without documents.
  docs = Array.from(docs);

  let index = 0;
  for (const doc of docs) {
    const problems = [...doc.errors, ...doc.warnings.filter((w) => w.code === 'TAG_RESOLVE_FAILED')];
    const recoverable = problems.length > 0 && problems.every((e) => RECOVERABLE.has(e.code));
    const dropped = recoverable ? recoverDocument(doc, lc) : new Map<number, { key: string; firstLine: number }>();
    const yamlErrors: Diagnostic[] = [];
    for (const e of problems) {
      const pos = positionOf(lc, e.pos[0]);
      const plain = plainYamlMessage(e.message);
      let message = YAML_MESSAGES[e.code]?.(plain) ?? `YAML syntax error: ${plain}`;
      const dup = e.code === 'DUPLICATE_KEY' ? dropped.get(e.pos[0]) : undefined;
      if (dup) message = `duplicate key '${dup.key}' in a mapping (each key may appear only once; first given on line ${dup.firstLine}); the rest of the document was checked with the first value, this one is ignored`;
      else if (recoverable && e.code === 'TAG_RESOLVE_FAILED') message += '; the value is treated as invalid and the rest of the document was checked';
      const d = err(displayPath, yamlCode(e.code), message, { line: pos.line, column: pos.column });
      yamlErrors.push(d);
      result.diagnostics.push(d);
    }
    for (const w of doc.warnings) {
      if (w.code === 'TAG_RESOLVE_FAILED') continue;
      const pos = positionOf(lc, w.pos[0]);
      result.diagnostics.push({
        severity: 'warning',
        code: 'yaml-warning',
        file: displayPath,
        path: '',
        line: pos.line,
        column: pos.column,
        message: `YAML: ${plainYamlMessage(w.message)}`,
      });
    }
    // A duplicate key the recovery did not find (e.g. a non-scalar key) leaves the document ambiguous.
    const unmatched = doc.errors.some((e) => e.code === 'DUPLICATE_KEY' && !dropped.has(e.pos[0]));
    if (problems.length > 0 && (!recoverable || unmatched)) continue;
    const target = problems.length > 0 ? result.recoveredDocuments : result.documents;
    const extra = problems.length > 0 ? { yamlErrors } : {};

    let value: unknown;
    try {
      value = doc.toJS({ maxAliasCount });
    } catch (e) {
      const start = nodeStart(doc.contents);
      const where = start === undefined ? {} : positionOf(lc, start);
      if (isExcessiveAliasError(e)) {
        result.diagnostics.push(
          err(displayPath, 'yaml-alias-bomb', `too many YAML alias expansions (more than ${maxAliasCount}); refusing a possible alias bomb`, {
            ...where,
            expected: `at most ${maxAliasCount} alias (*name) expansions per document`,
          }),
        );
      } else if (e instanceof RangeError) {
        result.diagnostics.push(err(displayPath, 'yaml-too-deep', 'YAML nesting is too deep to read', where));
      } else {
        result.diagnostics.push(
          err(displayPath, 'yaml-unreadable', `could not read YAML document: ${errorText(e)}`, where),
        );
      }
      continue;
    }
    // An empty document (e.g. after a trailing `---`, or comments only) holds no species.
    if (value === null || value === undefined) continue;

    const contents = doc.contents;
    if (split === 'species' && Array.isArray(value) && isSeq(contents)) {
      value.forEach((item, i) => {
        const itemNode = contents.items[i];
        // A list item spans from the end of the previous one (its tag, if any, comes before its range).
        const from = i === 0 ? 0 : ((contents.items[i - 1] as { range?: number[] } | undefined)?.range?.[2] ?? 0);
        const to = (itemNode as { range?: number[] } | undefined)?.range?.[2] ?? Infinity;
        const own = yamlErrors.filter((_d, k) => problems[k]!.pos[0] >= from && problems[k]!.pos[0] < to);
        const entry = {
          file: displayPath,
          index: index++,
          value: item,
          locate: (p: ReadonlyArray<string | number>, o?: { key?: boolean }) => locateIn(doc, itemNode, p, lc, o?.key ?? false),
        };
        if (own.length) result.recoveredDocuments.push({ ...entry, yamlErrors: own });
        else result.documents.push(entry);
      });
    } else {
      target.push({
        file: displayPath,
        index: index++,
        value,
        locate: (p, o) => locateIn(doc, contents, p, lc, o?.key ?? false),
        ...extra,
      });
    }
  }
  return result;
}

/** A species file's bytes as read, or the diagnostics that stopped reading it (see `loadYamlFile`). */
export type YamlFileBytes = { bytes: Buffer; diagnostics?: undefined } | { bytes?: undefined; diagnostics: Diagnostic[] };

/**
 * Reads one YAML file's bytes. The size is checked before reading, so a huge file is never loaded into
 * memory. Read failures become diagnostics, never exceptions.
 */
export async function readYamlFileBytes(filePath: string, displayPath: string, opts: ParseOptions = {}): Promise<YamlFileBytes> {
  const maxBytes = opts.maxBytes ?? DEFAULT_MAX_BYTES;
  try {
    // Synchronous: a species file is small, and thread-pool round trips would cost more than reading it.
    const info = statSync(filePath);
    if (!info.isFile()) return { diagnostics: [err(displayPath, 'not-a-file', 'not a regular file', { expected: 'a YAML file' })] };
    if (info.size > maxBytes) return { diagnostics: [sizeDiagnostic(displayPath, info.size, maxBytes)] };
    return { bytes: readSized(filePath, info.size) };
  } catch (e) {
    return { diagnostics: [readFailure(displayPath, e)] };
  }
}

/**
 * A file's bytes when stat said `size`: one read of one byte more tells that the file still ends there
 * (open, read, close, where readFileSync also fstats and reads again to find the end); a file that grew
 * since is read whole.
 */
function readSized(filePath: string, size: number): Buffer {
  const buf = Buffer.allocUnsafe(size + 1);
  const fd = openSync(filePath, 'r');
  let n: number;
  try {
    n = readSync(fd, buf, 0, size + 1, 0);
  } finally {
    closeSync(fd);
  }
  return n <= size ? buf.subarray(0, n) : readFileSync(filePath);
}

function readFailure(displayPath: string, e: unknown): Diagnostic {
  const code = (e as NodeJS.ErrnoException).code;
  const reason = code === 'ENOENT' ? 'file not found' : `cannot read file (${code ?? String(e)})`;
  return err(displayPath, code === 'ENOENT' ? 'file-not-found' : 'file-unreadable', reason);
}

/**
 * Parses the bytes of one YAML file (read by `readYamlFileBytes`) and reads the geometry files its
 * documents name. Problems become diagnostics, never exceptions.
 */
export async function loadYamlBytes(bytes: Buffer, filePath: string, displayPath: string, opts: ParseOptions = {}): Promise<LoadResult> {
  const maxBytes = opts.maxBytes ?? DEFAULT_MAX_BYTES;
  const empty: LoadResult = { file: displayPath, documents: [], recoveredDocuments: [], diagnostics: [], text: '' };
  try {
    const text = decodeUtf8Text(bytes);
    if (text === undefined) {
      empty.diagnostics.push(
        err(displayPath, 'not-utf8-text', `not UTF-8 text (${describeNonText(bytes)})`, {
          expected: 'a UTF-8 encoded YAML text file',
        }),
      );
      return empty;
    }
    const result = parseYamlText(text, displayPath, opts);
    await attachGeometryFiles([...result.documents, ...result.recoveredDocuments], filePath, displayPath, maxBytes);
    return result;
  } catch (e) {
    empty.diagnostics.push(readFailure(displayPath, e));
    return empty;
  }
}

/**
 * Reads and parses one YAML file. The size is checked before reading, so a huge file is never loaded into
 * memory. Read failures become diagnostics, never exceptions.
 */
export async function loadYamlFile(
  filePath: string,
  displayPath: string,
  opts: ParseOptions = {},
): Promise<LoadResult> {
  const read = await readYamlFileBytes(filePath, displayPath, opts);
  if (read.bytes === undefined) return { file: displayPath, documents: [], recoveredDocuments: [], diagnostics: read.diagnostics, text: '' };
  return loadYamlBytes(read.bytes, filePath, displayPath, opts);
}

/** The `geometry_file` names a species document refers to (its own, then its conformers'), as written. */
export function geometryFileNames(value: unknown): string[] {
  const v = value as { geometry_file?: unknown; conformers?: unknown } | null;
  const conformers = Array.isArray(v?.conformers) ? (v.conformers as Array<{ geometry_file?: unknown } | null>) : [];
  return [v?.geometry_file, ...conformers.map((c) => c?.geometry_file)].filter((n): n is string => typeof n === 'string' && n !== '');
}

/**
 * One geometry file named by a species file, read exactly as `loadYamlFile` reads it (same checks, same
 * diagnostics), so a cached load can tell whether it still reads the same.
 */
export function readNamedGeometryFile(speciesFile: string, displayPath: string, name: string, opts: ParseOptions = {}): Promise<LoadedGeometryFile> {
  return readGeometryFile(path.dirname(speciesFile), name, path.join(path.dirname(displayPath), name), opts.maxBytes ?? DEFAULT_MAX_BYTES);
}

/**
 * Reads the XYZ file each document names in `geometry_file` (a name relative to the species file's folder,
 * never outside it; same size limit as species files) and attaches it, parsed, to the document. Problems
 * become diagnostics of the geometry file, which the validator reports with the species.
 */
async function attachGeometryFiles(docs: LoadedDocument[], filePath: string, displayPath: string, maxBytes: number): Promise<void> {
  const folder = path.dirname(filePath);
  for (const doc of docs) {
    for (const name of geometryFileNames(doc.value)) {
      doc.geometryFiles ??= {};
      doc.geometryFiles[name] ??= await readGeometryFile(folder, name, path.join(path.dirname(displayPath), name), maxBytes);
    }
  }
}

async function readGeometryFile(folder: string, name: string, display: string, maxBytes: number): Promise<LoadedGeometryFile> {
  const fail = (code: string, message: string, expected: string): LoadedGeometryFile => ({
    file: display,
    rows: [],
    lines: [],
    diagnostics: [err(display, code, message, { expected })],
  });
  const target = path.resolve(folder, name);
  if (path.isAbsolute(name) || !isInside(folder, target)) {
    return fail('geometry-file-outside', 'a geometry file must lie in the folder of its species file or below it', 'a relative name without ..');
  }
  try {
    // As for species files: a symbolic link may not lead out of the folder.
    if (!isInside(await realpath(folder), await realpath(target))) {
      return fail('geometry-file-outside', 'the geometry file resolves outside the folder of its species file (symbolic link); refused', 'a file inside the database folder');
    }
    const info = await stat(target);
    if (!info.isFile()) return fail('not-a-file', 'not a regular file', 'an XYZ file');
    if (info.size > maxBytes) return { file: display, rows: [], lines: [], diagnostics: [sizeDiagnostic(display, info.size, maxBytes)] };
    const text = decodeUtf8Text(await readFile(target));
    if (text === undefined) return fail('not-utf8-text', 'not UTF-8 text', 'a UTF-8 encoded XYZ text file');
    return { file: display, ...parseXyz(text, display) };
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    return fail(code === 'ENOENT' ? 'file-not-found' : 'file-unreadable', code === 'ENOENT' ? 'geometry file not found' : `cannot read file (${code ?? String(e)})`, 'an XYZ file next to the species file');
  }
}

export interface DiscoverOptions {
  /** Name of the settings file at the root, excluded from the species files. Default `qforge.yaml`. */
  settingsFileName?: string;
}

function isYamlName(name: string): boolean {
  return /\.ya?ml$/i.test(name);
}

function isInside(root: string, candidate: string): boolean {
  const rel = path.relative(root, candidate);
  return rel === '' || (!rel.startsWith('..') && !path.isAbsolute(rel));
}

/**
 * Lists the species files of a database folder: every *.yaml / *.yml below `dir`, recursively, except the
 * settings file at the root and entries whose name starts with '.'. Returned paths are `dir` joined with the
 * path relative to it (so they are readable and read well in messages), sorted by that relative path
 * (code-point order, '/' separators), so the order never depends on the file system.
 *
 * Symlinks: followed when their real path is inside the database folder (a real file reached twice is read
 * once, with a warning); refused with an error diagnostic when they resolve outside it or are broken.
 */
export async function discoverSpeciesFiles(
  dir: string,
  opts: DiscoverOptions = {},
): Promise<{ files: string[]; diagnostics: Diagnostic[] }> {
  const settingsName = opts.settingsFileName ?? SETTINGS_FILE_NAME;
  const diagnostics: Diagnostic[] = [];

  let rootReal: string;
  try {
    rootReal = await realpath(dir);
    if (!(await stat(rootReal)).isDirectory()) {
      diagnostics.push(err(dir, 'not-a-folder', 'not a folder', { expected: 'a database folder of species YAML files' }));
      return { files: [], diagnostics };
    }
  } catch {
    diagnostics.push(err(dir, 'folder-not-found', 'database folder not found', { expected: 'an existing folder of species YAML files' }));
    return { files: [], diagnostics };
  }

  const visitedDirs = new Set<string>([rootReal]);
  const found: { rel: string; real: string; viaLink: boolean }[] = [];
  // Links are resolved after the real tree is walked, so a file is listed under its real path when it has one.
  const links: { abs: string; rel: string; name: string; atRoot: boolean }[] = [];

  async function walk(absDir: string, relDir: string, viaLink: boolean): Promise<void> {
    let entries;
    try {
      entries = await readdir(absDir, { withFileTypes: true });
    } catch (e) {
      diagnostics.push(err(relDir === '' ? dir : path.join(dir, relDir), 'folder-unreadable', `cannot read folder (${(e as NodeJS.ErrnoException).code ?? e})`));
      return;
    }
    entries.sort((a, b) => compareText(a.name, b.name));
    for (const entry of entries) {
      if (entry.name.startsWith('.')) continue;
      const rel = relDir === '' ? entry.name : `${relDir}/${entry.name}`;
      const abs = path.join(absDir, entry.name);
      if (entry.isSymbolicLink()) {
        links.push({ abs, rel, name: entry.name, atRoot: relDir === '' });
      } else if (entry.isDirectory()) {
        if (visitedDirs.has(abs)) continue;
        visitedDirs.add(abs);
        await walk(abs, rel, viaLink);
      } else if (entry.isFile() && isYamlName(entry.name)) {
        if (relDir === '' && entry.name === settingsName) continue;
        found.push({ rel, real: abs, viaLink });
      }
    }
  }

  async function followLink(link: (typeof links)[number]): Promise<void> {
    const display = path.join(dir, link.rel);
    let real: string;
    try {
      real = await realpath(link.abs);
    } catch {
      diagnostics.push(err(display, 'broken-link', 'broken symbolic link; refused', { expected: 'a link to a file or folder inside the database folder' }));
      return;
    }
    const info = await stat(real);
    if (!info.isDirectory() && !(info.isFile() && isYamlName(link.name))) return;
    if (!isInside(rootReal, real)) {
      diagnostics.push(
        err(display, 'link-outside-database', `symbolic link resolves outside the database folder (to ${real}); refused`, {
          expected: 'species files and folders that live inside the database folder',
        }),
      );
      return;
    }
    if (info.isDirectory()) {
      if (visitedDirs.has(real)) return;
      visitedDirs.add(real);
      await walk(real, link.rel, true);
    } else if (!(link.atRoot && link.name === settingsName)) {
      found.push({ rel: link.rel, real, viaLink: true });
    }
  }

  await walk(rootReal, '', false);
  while (links.length > 0) {
    links.sort((a, b) => compareText(a.rel, b.rel));
    await followLink(links.shift()!);
  }

  // One entry per real file: the one reached without links, else the first by path.
  const byPreference = found.slice().sort((a, b) => Number(a.viaLink) - Number(b.viaLink) || compareText(a.rel, b.rel));
  const kept = new Map<string, string>();
  const skipped: { rel: string; first: string }[] = [];
  for (const f of byPreference) {
    const first = kept.get(f.real);
    if (first === undefined) kept.set(f.real, f.rel);
    else skipped.push({ rel: f.rel, first });
  }
  for (const s of skipped) {
    diagnostics.push({
      severity: 'warning',
      code: 'same-file-twice',
      file: path.join(dir, s.rel),
      path: '',
      message: `same file as ${path.join(dir, s.first)} (reached through a symbolic link); read once`,
    });
  }
  const files = [...kept.values()].sort().map((rel) => path.join(dir, rel));
  return { files, diagnostics };
}
