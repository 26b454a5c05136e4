/**
 * The payload encoding of `samples` cache entries: JSON in which each sample list (`samples`,
 * `extrapolationSamples`) is one string, the base64 of its values as little-endian IEEE-754 doubles, column
 * by column (every T, then every Cp/R, H/RT, S/R), under the key "$qforge-f64-columns". A species' ~1,200
 * samples took ~0.26 ms of JSON.stringify per species on a cold build into a cache and 50 KB of entry; as
 * columns they take ~0.06 ms and 26 KB, and they read back as the very doubles (bit for bit) in the same
 * key order that JSON.parse gives a canonical entry.
 *
 * Lists that are not plain finite samples {T, cpR, hRT, sR} (in that key order, no −0) are written as plain
 * JSON, as is everything else; a big-endian machine writes plain JSON throughout. Either form reads back.
 */
import { endianness } from 'node:os';

const COLUMNS_KEY = '$qforge-f64-columns';
const SAMPLE_LIST_KEYS = ['samples', 'extrapolationSamples'] as const;
const LITTLE_ENDIAN = endianness() === 'LE';

type Sample = { T: number; cpR: number; hRT: number; sR: number };
/** The keys of a plain sample, in their canonical order. */
const SAMPLE_KEYS = ['T', 'cpR', 'hRT', 'sR'] as const;

/** Whether `s` has exactly the keys of a plain sample, in that order (for-in: no key array per sample). */
function hasSampleKeys(s: object): boolean {
  let i = 0;
  for (const k in s) if (k !== SAMPLE_KEYS[i++]) return false;
  return i === SAMPLE_KEYS.length;
}

const isPlainNumber = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v) && !Object.is(v, -0);

/** The samples of `list` as columns, or undefined when some element is not a plain sample. */
function columnsOf(list: unknown): Float64Array | undefined {
  if (!Array.isArray(list)) return undefined;
  const n = list.length;
  const columns = new Float64Array(4 * n);
  for (let j = 0; j < n; j++) {
    const s: unknown = list[j];
    if (typeof s !== 'object' || s === null || Object.getPrototypeOf(s) !== Object.prototype) return undefined;
    if (!hasSampleKeys(s)) return undefined;
    const { T, cpR, hRT, sR } = s as Sample;
    if (!isPlainNumber(T) || !isPlainNumber(cpR) || !isPlainNumber(hRT) || !isPlainNumber(sR)) return undefined;
    columns[j] = T;
    columns[n + j] = cpR;
    columns[2 * n + j] = hRT;
    columns[3 * n + j] = sR;
  }
  return columns;
}

/** The entry text of a computed-samples value (canonical, as the cache stores it): see the file comment. */
export function encodeSampleEntry(value: unknown): string {
  if (!LITTLE_ENDIAN || typeof value !== 'object' || value === null || Array.isArray(value)) return JSON.stringify(value);
  const record = value as Record<string, unknown>;
  let out: Record<string, unknown> | undefined;
  for (const key of SAMPLE_LIST_KEYS) {
    if (!(key in record)) continue;
    const columns = columnsOf(record[key]);
    if (!columns) continue;
    // A copy that keeps the key order: only the list's value changes.
    out ??= { ...record };
    out[key] = { [COLUMNS_KEY]: Buffer.from(columns.buffer, columns.byteOffset, columns.byteLength).toString('base64') };
  }
  return JSON.stringify(out ?? value);
}

/** Reads an entry text of `encodeSampleEntry` (or plain JSON); throws on a malformed column string. */
export function decodeSampleEntry<T>(text: string): T {
  const value: unknown = JSON.parse(text);
  if (typeof value !== 'object' || value === null || Array.isArray(value)) return value as T;
  const record = value as Record<string, unknown>;
  for (const key of SAMPLE_LIST_KEYS) {
    const packed = record[key];
    if (typeof packed !== 'object' || packed === null || Array.isArray(packed) || !(COLUMNS_KEY in packed)) continue;
    const encoded = (packed as Record<string, unknown>)[COLUMNS_KEY];
    if (typeof encoded !== 'string' || Object.keys(packed).length !== 1) throw new Error(`${key}: malformed sample columns`);
    if (!LITTLE_ENDIAN) throw new Error(`${key}: sample columns cannot be read on a big-endian machine`);
    const bytes = Buffer.from(encoded, 'base64');
    if (bytes.length % 32 !== 0 || bytes.toString('base64') !== encoded) throw new Error(`${key}: malformed sample columns`);
    // Copied into an aligned buffer of its own (a Buffer may sit at any offset of a shared pool).
    const columns = new Float64Array(bytes.length / 8);
    new Uint8Array(columns.buffer).set(bytes);
    const n = columns.length / 4;
    const list: Sample[] = new Array<Sample>(n);
    for (let j = 0; j < n; j++) list[j] = { T: columns[j]!, cpR: columns[n + j]!, hRT: columns[2 * n + j]!, sR: columns[3 * n + j]! };
    record[key] = list;
  }
  return value as T;
}
