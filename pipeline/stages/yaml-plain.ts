/**
 * Fast reader for the plain subset of YAML that species files are written in. The load stage calls it before
 * the `yaml` library; it returns exactly what that library's path in `parseYamlText` would return for the
 * same text — the same values (same key order, same numbers down to `Object.is`, plain objects and arrays)
 * and `locate` answering the same 1-based line and column for every path — or `undefined`, and then the
 * library's path runs unchanged. Reading a species file this way costs a few hundredths of what the library
 * costs (it builds a concrete syntax tree, a document tree and then the values), and the library is still
 * the one authority on everything outside the subset.
 *
 * Accepted (section numbers of the YAML 1.2.2 specification, 2021-10-01):
 * - one bare document (9.1.3, 9.2) whose root is a block mapping or block sequence at column 0;
 * - block mappings (8.2.2) of implicit single-line keys, and block sequences (8.2.1), including a sequence
 *   at the indentation of its parent key and compact mappings as sequence items (`- key: value`),
 *   indented with spaces only (6.1);
 * - flow sequences (7.4.1) and flow mappings (7.4.2) of `key: value` pairs, nested, on one line or spread
 *   over lines after `[`, `{` or `,` (each further line indented more than the block node it belongs to),
 *   with one trailing comma;
 * - single-line plain scalars (7.3.3), single-quoted scalars (7.3.2, `''` for a quote) and double-quoted
 *   scalars (7.3.1) whose only escapes are `\\` and `\"`;
 * - comments (6.6) on their own lines or after white space at the end of a line;
 * - plain scalars typed by the core schema (10.3.2), as the `yaml` library resolves them with the options
 *   load.ts passes: `null`/`Null`/`NULL`/`~`, `true`/`false` (three spellings each), decimal integers
 *   without a sign other than `-` and without leading zeros (parseInt, so `-0` is -0), decimal floats with
 *   digits on both sides of the point and an optional exponent, or an integer with an exponent (parseFloat);
 *   every other plain scalar that matches no core-schema pattern is a string.
 *
 * Fallback rule: anything else, and anything the reader is not sure reads the same, returns `undefined`:
 * document markers and directives, anchors, aliases, tags, block scalars (`|`, `>`), multi-line scalars,
 * explicit (`?`) or complex keys, keys that are not strings (a plain `1:` or `true:`), duplicate keys, the
 * keys `__proto__` and `<<`, empty values in flow collections or sequences, other escapes, core-schema
 * numbers in other forms (`+1`, `007`, `0x1f`, `0o7`, `.5`, `1.`, `.inf`, `.nan`), brackets inside plain
 * scalars, `key:value` without a space, tabs, carriage returns, control characters, byte-order marks and
 * lone surrogates anywhere in the text, nesting deeper than {@link MAX_DEPTH}, keys longer than
 * {@link MAX_KEY_LENGTH}, text longer than {@link MAX_TEXT_LENGTH}, and an empty document. A misread
 * species would be silently wrong; a fallback only costs the library's time.
 *
 * The differential tests (test/pipeline/stages/yaml-plain.test.ts) hold this reader to the library on every
 * YAML file of the project, thousands of synthetic species and generated variants.
 */
import type { LoadedDocument, SourcePosition } from './load.js';

/** Longest text the reader takes (UTF-16 code units); a species file is 0.5–2 KB. */
export const MAX_TEXT_LENGTH = 64 * 1024;
/** Deepest nesting of collections the reader takes (a species needs 3 or 4 levels). */
export const MAX_DEPTH = 16;
/** Longest mapping key the reader takes (YAML allows at most 1024 characters before an implicit key's `:`). */
export const MAX_KEY_LENGTH = 256;

/**
 * Where each node starts, in the shape of the value: a scalar is its start offset; a mapping keeps its keys,
 * their offsets and its values' shadows (EMPTY for a value with no text, as `key:` at the end of a line).
 */
type Shadow = number | MapShadow | SeqShadow;
interface MapShadow {
  start: number;
  keys: string[];
  keyStarts: number[];
  values: Shadow[];
}
interface SeqShadow {
  start: number;
  items: Shadow[];
}
const EMPTY = -1;

/** Thrown inside the reader when the text leaves the subset; never escapes `readPlainYaml`. */
class Decline extends Error {}
/** Exported for the tests (what `plainScalarValue` returns for a form left to the library). */
export const DECLINE = new Decline('outside the plain YAML subset');

const SPACE = 0x20;
const NEWLINE = 0x0a;
const HASH = 0x23;
const COLON = 0x3a;
const DASH = 0x2d;
const COMMA = 0x2c;
const OPEN_SQUARE = 0x5b;
const CLOSE_SQUARE = 0x5d;
const OPEN_CURLY = 0x7b;
const CLOSE_CURLY = 0x7d;
const DOUBLE_QUOTE = 0x22;
const SINGLE_QUOTE = 0x27;
const BACKSLASH = 0x5c;

// The core-schema tests of the `yaml` library (2.x, schema/core), in the order it tries them.
const CORE_NULL = /^(?:~|[Nn]ull|NULL)?$/;
const CORE_BOOL = /^(?:[Tt]rue|TRUE|[Ff]alse|FALSE)$/;
const CORE_INT_OCT = /^0o[0-7]+$/;
const CORE_INT = /^[-+]?[0-9]+$/;
const CORE_INT_HEX = /^0x[0-9a-fA-F]+$/;
const CORE_FLOAT_NAN = /^(?:[-+]?\.(?:inf|Inf|INF)|\.nan|\.NaN|\.NAN)$/;
const CORE_FLOAT_EXP = /^[-+]?(?:\.[0-9]+|[0-9]+(?:\.[0-9]*)?)[eE][-+]?[0-9]+$/;
const CORE_FLOAT = /^[-+]?(?:\.[0-9]+|[0-9]+\.[0-9]*)$/;
// The forms of those this reader takes: plain decimals.
const DECIMAL_INT = /^-?(?:0|[1-9][0-9]*)$/;
const DECIMAL_FLOAT_EXP = /^-?(?:0|[1-9][0-9]*)(?:\.[0-9]+)?[eE][-+]?[0-9]+$/;
const DECIMAL_FLOAT = /^-?(?:0|[1-9][0-9]*)\.[0-9]+$/;
/** A line that starts a document marker (`---`, `...`) or a directive (`%`). */
const MARKER_LINE = /^(?:---|\.\.\.|%)/m;

/**
 * The value of a plain scalar under the core schema as the `yaml` library resolves it (same tests, same
 * order, same parseInt/parseFloat calls), or DECLINE for the number forms this reader leaves to the library.
 * Exported for the tests.
 */
export function plainScalarValue(raw: string): unknown {
  const decimal = decimalForm(raw);
  if (decimal === DECIMAL_INT_FORM) return parseInt(raw, 10);
  if (decimal === DECIMAL_FLOAT_FORM) return parseFloat(raw);
  const c = raw.charCodeAt(0);
  // A first character that none of the core patterns can start with: a string (the common case of names).
  const maybeTyped =
    (c >= 0x30 && c <= 0x39) || c === DASH || c === 0x2b || c === 0x2e || c === 0x7e || c === 0x6e || c === 0x4e || c === 0x74 || c === 0x54 || c === 0x66 || c === 0x46;
  if (!maybeTyped) return raw;
  if (CORE_NULL.test(raw)) return null;
  if (CORE_BOOL.test(raw)) return c === 0x74 || c === 0x54;
  if (CORE_INT_OCT.test(raw)) return DECLINE;
  if (CORE_INT.test(raw)) return DECIMAL_INT.test(raw) ? parseInt(raw, 10) : DECLINE;
  if (CORE_INT_HEX.test(raw) || CORE_FLOAT_NAN.test(raw)) return DECLINE;
  if (CORE_FLOAT_EXP.test(raw)) return DECIMAL_FLOAT_EXP.test(raw) ? parseFloat(raw) : DECLINE;
  if (CORE_FLOAT.test(raw)) return DECIMAL_FLOAT.test(raw) ? parseFloat(raw) : DECLINE;
  return raw;
}

const NOT_DECIMAL = 0;
const DECIMAL_INT_FORM = 1;
const DECIMAL_FLOAT_FORM = 2;

/**
 * Which of the plain decimal forms `raw` has, by one scan instead of the chain of patterns: DECIMAL_INT_FORM
 * exactly when DECIMAL_INT matches, DECIMAL_FLOAT_FORM exactly when DECIMAL_FLOAT or DECIMAL_FLOAT_EXP
 * matches. None of the core patterns tried before int (null, bool, octal) can match such text, and none
 * tried before float (also int, hex, nan) can match a float form, so the library resolves these with
 * parseInt and parseFloat too.
 */
function decimalForm(raw: string): number {
  const n = raw.length;
  let i = raw.charCodeAt(0) === DASH ? 1 : 0;
  const first = raw.charCodeAt(i);
  if (first === 0x30) i++;
  else if (first >= 0x31 && first <= 0x39) {
    i++;
    while (i < n && isDigit(raw.charCodeAt(i))) i++;
  } else return NOT_DECIMAL;
  if (i === n) return DECIMAL_INT_FORM;
  let c = raw.charCodeAt(i);
  if (c === 0x2e) {
    const from = ++i;
    while (i < n && isDigit(raw.charCodeAt(i))) i++;
    if (i === from) return NOT_DECIMAL;
    if (i === n) return DECIMAL_FLOAT_FORM;
    c = raw.charCodeAt(i);
  }
  if (c !== 0x65 && c !== 0x45) return NOT_DECIMAL;
  i++;
  c = raw.charCodeAt(i);
  if (c === 0x2b || c === DASH) i++;
  const from = i;
  while (i < n && isDigit(raw.charCodeAt(i))) i++;
  return i > from && i === n ? DECIMAL_FLOAT_FORM : NOT_DECIMAL;
}

function isDigit(c: number): boolean {
  return c >= 0x30 && c <= 0x39;
}

/** True when the text holds a character the reader leaves to the library (see the module comment). */
function hasRefusedCharacter(text: string): boolean {
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c >= 0x20 && c < 0x7f) continue;
    if (c === NEWLINE) continue;
    if (c < 0xa0) return true; // other C0 controls (tab, CR), DEL, C1 controls (NEL)
    if (c === 0xfeff || c === 0x2028 || c === 0x2029 || c === 0xfffe || c === 0xffff) return true;
    if (c >= 0xd800 && c <= 0xdbff) {
      const d = text.charCodeAt(i + 1);
      if (!(d >= 0xdc00 && d <= 0xdfff)) return true;
      i++;
    } else if (c >= 0xdc00 && c <= 0xdfff) {
      return true;
    }
  }
  return false;
}

/** True for a character a plain scalar may not start with here (YAML indicators, 5.3, and a few more). */
function refusedPlainStart(c: number, next: number): boolean {
  switch (c) {
    case DASH:
      // `-1`, `-x`: a sign or a word; `- ` would be a sequence entry, `-[`, `-#` are left to the library.
      return !((next >= 0x30 && next <= 0x39) || next === 0x2e || (next >= 0x41 && next <= 0x5a) || (next >= 0x61 && next <= 0x7a) || next === 0x5f);
    case 0x3f: // ?
    case COLON:
    case COMMA:
    case OPEN_SQUARE:
    case CLOSE_SQUARE:
    case OPEN_CURLY:
    case CLOSE_CURLY:
    case HASH:
    case 0x26: // &
    case 0x2a: // *
    case 0x21: // !
    case 0x7c: // |
    case 0x3e: // >
    case SINGLE_QUOTE:
    case DOUBLE_QUOTE:
    case 0x25: // %
    case 0x40: // @
    case 0x60: // `
    case SPACE:
    case NEWLINE:
      return true;
    default:
      return Number.isNaN(c);
  }
}

/** How a plain scalar ended. */
const END_LINE = 0;
const END_COLON = 1;
const END_FLOW = 2;

class PlainReader {
  private pos = 0;
  /** Set by `plain`: how the scalar ended. */
  private plainStop = END_LINE;
  private readonly n: number;

  constructor(private readonly t: string) {
    this.n = t.length;
  }

  /** The root value and its shadow. */
  document(): { value: unknown; shadow: Shadow } {
    this.pos = this.nextContentLine(0);
    if (this.pos >= this.n || this.indentAt(this.pos) !== 0) throw DECLINE;
    const out = this.isSequenceEntry(this.pos) ? this.blockSequence(0, 1) : this.blockMapping(0, 1);
    if (this.pos < this.n) throw DECLINE;
    return out;
  }

  /** Offset of the next line, from line start `p`, that is neither blank nor only a comment (or n). */
  private nextContentLine(p: number): number {
    const t = this.t;
    while (p < this.n) {
      let q = p;
      while (t.charCodeAt(q) === SPACE) q++;
      const c = t.charCodeAt(q);
      if (q < this.n && c !== NEWLINE && c !== HASH) return p;
      const eol = t.indexOf('\n', q);
      if (eol < 0) return this.n;
      p = eol + 1;
    }
    return this.n;
  }

  private indentAt(lineStart: number): number {
    let q = lineStart;
    while (this.t.charCodeAt(q) === SPACE) q++;
    return q - lineStart;
  }

  private isSequenceEntry(p: number): boolean {
    const t = this.t;
    let q = p;
    while (t.charCodeAt(q) === SPACE) q++;
    if (t.charCodeAt(q) !== DASH) return false;
    const next = t.charCodeAt(q + 1);
    return next === SPACE || next === NEWLINE || q + 1 >= this.n;
  }

  /**
   * After a value that ends its line: only spaces and a comment (after a space) may follow. Moves to the
   * next content line.
   */
  private endOfLine(): void {
    const t = this.t;
    const start = this.pos;
    let q = start;
    while (t.charCodeAt(q) === SPACE) q++;
    const c = t.charCodeAt(q);
    if (q < this.n && c !== NEWLINE) {
      if (c !== HASH || q === start) throw DECLINE;
    }
    const eol = t.indexOf('\n', q);
    this.pos = eol < 0 ? this.n : this.nextContentLine(eol + 1);
  }

  /** A block mapping whose first key starts at `this.pos`, in column `indent`. */
  private blockMapping(indent: number, depth: number): { value: unknown; shadow: Shadow } {
    if (depth > MAX_DEPTH) throw DECLINE;
    const t = this.t;
    const obj: Record<string, unknown> = {};
    const shadow: MapShadow = { start: this.pos, keys: [], keyStarts: [], values: [] };
    for (;;) {
      const keyStart = this.pos;
      const key = this.blockKey();
      let value: unknown;
      let valueShadow: Shadow;
      // After the key's ':' comes a space, the end of the line or the end of the text.
      let q = this.pos;
      while (t.charCodeAt(q) === SPACE) q++;
      const c = t.charCodeAt(q);
      if (q >= this.n || c === NEWLINE || c === HASH) {
        if (c === HASH && q === this.pos) throw DECLINE;
        const eol = q >= this.n ? -1 : t.indexOf('\n', q);
        const next = eol < 0 ? this.n : this.nextContentLine(eol + 1);
        const nextIndent = next < this.n ? this.indentAt(next) : -1;
        if (next < this.n && (nextIndent > indent || (nextIndent === indent && this.isSequenceEntry(next)))) {
          this.pos = next + nextIndent;
          const nested = this.isSequenceEntry(next) ? this.blockSequence(nextIndent, depth + 1) : this.blockMapping(nextIndent, depth + 1);
          value = nested.value;
          valueShadow = nested.shadow;
        } else {
          value = null;
          valueShadow = EMPTY;
          this.pos = next;
        }
      } else {
        this.pos = q;
        const inline = this.inlineValue(indent, depth);
        value = inline.value;
        valueShadow = inline.shadow;
        this.endOfLine();
      }
      if (Object.prototype.hasOwnProperty.call(obj, key)) throw DECLINE;
      obj[key] = value;
      shadow.keys.push(key);
      shadow.keyStarts.push(keyStart);
      shadow.values.push(valueShadow);
      // this.pos is now at the start of a content line, or at the end of the text.
      if (this.pos >= this.n) break;
      const nextIndent = this.indentAt(this.pos);
      if (nextIndent < indent) break;
      if (nextIndent > indent || this.isSequenceEntry(this.pos)) throw DECLINE;
      this.pos += nextIndent;
    }
    return { value: obj, shadow };
  }

  /** A block sequence whose first `-` is at `this.pos`, in column `indent`. */
  private blockSequence(indent: number, depth: number): { value: unknown; shadow: Shadow } {
    if (depth > MAX_DEPTH) throw DECLINE;
    const t = this.t;
    const arr: unknown[] = [];
    const shadow: SeqShadow = { start: this.pos, items: [] };
    for (;;) {
      // this.pos is at the '-' of an entry.
      let q = this.pos + 1;
      if (t.charCodeAt(q) !== SPACE) throw DECLINE; // `-` alone: an empty or nested item
      while (t.charCodeAt(q) === SPACE) q++;
      const c = t.charCodeAt(q);
      if (q >= this.n || c === NEWLINE || c === HASH) throw DECLINE;
      if (c === DASH && (t.charCodeAt(q + 1) === SPACE || t.charCodeAt(q + 1) === NEWLINE || q + 1 >= this.n)) throw DECLINE;
      this.pos = q;
      let item: { value: unknown; shadow: Shadow };
      if (c !== OPEN_SQUARE && c !== OPEN_CURLY && this.startsCompactMapping()) {
        const lineStart = t.lastIndexOf('\n', q - 1) + 1;
        item = this.blockMapping(q - lineStart, depth + 1);
      } else {
        item = this.inlineValue(indent, depth);
        this.endOfLine();
      }
      arr.push(item.value);
      shadow.items.push(item.shadow);
      if (this.pos >= this.n) break;
      const nextIndent = this.indentAt(this.pos);
      if (nextIndent < indent) break;
      if (nextIndent > indent) throw DECLINE;
      if (!this.isSequenceEntry(this.pos)) break;
      this.pos += nextIndent;
    }
    return { value: arr, shadow };
  }

  /** Whether the sequence item at `this.pos` is `key: …` (a compact mapping). Does not move. */
  private startsCompactMapping(): boolean {
    const t = this.t;
    const at = this.pos;
    const c = t.charCodeAt(at);
    if (c === DOUBLE_QUOTE || c === SINGLE_QUOTE) {
      this.quoted();
      const q = this.spacesEnd(this.pos);
      this.pos = at;
      return this.keyColonAt(q);
    }
    this.plain(false);
    this.pos = at;
    return this.plainStop === END_COLON;
  }

  /**
   * A mapping key in block context at `this.pos`: a plain or quoted scalar that is a string, followed by
   * `:` and a space or the end of the line. Leaves `this.pos` after the `:`.
   */
  private blockKey(): string {
    const t = this.t;
    const start = this.pos;
    const c = t.charCodeAt(start);
    let key: string;
    if (c === DOUBLE_QUOTE || c === SINGLE_QUOTE) {
      key = this.quoted();
      const q = this.spacesEnd(this.pos);
      if (t.charCodeAt(q) !== COLON) throw DECLINE;
      this.pos = q;
    } else {
      const raw = this.plain(false);
      if (this.plainStop !== END_COLON) throw DECLINE;
      if (plainScalarValue(raw) !== raw) throw DECLINE;
      key = raw;
    }
    this.checkKey(key, start);
    if (!this.keyColonAt(this.pos)) throw DECLINE;
    this.pos++;
    return key;
  }

  /** The first position at or after `from` that is not a space. */
  private spacesEnd(from: number): number {
    while (this.t.charCodeAt(from) === SPACE) from++;
    return from;
  }

  /** Whether `at` holds a key's ':' — one followed by a space, the end of the line or of the text. */
  private keyColonAt(at: number): boolean {
    if (this.t.charCodeAt(at) !== COLON) return false;
    const next = this.t.charCodeAt(at + 1);
    return next === SPACE || next === NEWLINE || at + 1 >= this.n;
  }

  private checkKey(key: string, start: number): void {
    if (key === '__proto__' || key === '<<' || this.pos - start > MAX_KEY_LENGTH) throw DECLINE;
  }

  /** A value that starts on this line: a flow collection or a one-line scalar. */
  private inlineValue(owner: number, depth: number): { value: unknown; shadow: Shadow } {
    return this.collectionOrScalar(owner, depth, false);
  }

  /** A flow item: a nested flow collection or a one-line scalar, which must not be a key. */
  private flowItem(owner: number, depth: number): { value: unknown; shadow: Shadow } {
    return this.collectionOrScalar(owner, depth, true);
  }

  /**
   * A flow collection or a one-line scalar at `this.pos`. In block context (`flow` false) a plain scalar must
   * run to the end of the line (`key: a: b` declines); in a flow collection it must end at `,` or a closing
   * bracket (a key, `[a: 1]`, or a scalar running to the line end declines).
   */
  private collectionOrScalar(owner: number, depth: number, flow: boolean): { value: unknown; shadow: Shadow } {
    const start = this.pos;
    const c = this.t.charCodeAt(start);
    if (c === OPEN_SQUARE) return this.flowSequence(owner, depth + 1);
    if (c === OPEN_CURLY) return this.flowMapping(owner, depth + 1);
    if (c === DOUBLE_QUOTE || c === SINGLE_QUOTE) return { value: this.quoted(), shadow: start };
    const raw = this.plain(flow);
    if (this.plainStop !== (flow ? END_FLOW : END_LINE)) throw DECLINE;
    const value = plainScalarValue(raw);
    if (value === DECLINE) throw DECLINE;
    return { value, shadow: start };
  }

  /**
   * A one-line plain scalar at `this.pos` (block context, or flow context when `flow`). Returns its text
   * without trailing spaces; sets `plainStop`.
   */
  private plain(flow: boolean): string {
    const t = this.t;
    const start = this.pos;
    if (refusedPlainStart(t.charCodeAt(start), t.charCodeAt(start + 1))) throw DECLINE;
    let i = start;
    let end = start;
    let stop = END_LINE;
    for (;;) {
      if (i >= this.n) break;
      const c = t.charCodeAt(i);
      if (c === NEWLINE) break;
      if (c === SPACE) {
        if (t.charCodeAt(i + 1) === HASH) break;
        i++;
        continue;
      }
      if (c === COLON) {
        const next = t.charCodeAt(i + 1);
        if (next === SPACE || next === NEWLINE || i + 1 >= this.n) {
          if (i !== end) throw DECLINE; // `a :` (a space before the indicator)
          stop = END_COLON;
          break;
        }
        throw DECLINE; // `a:b`
      }
      if (c === OPEN_SQUARE || c === OPEN_CURLY || c === CLOSE_SQUARE || c === CLOSE_CURLY) {
        if (!flow || c === OPEN_SQUARE || c === OPEN_CURLY) throw DECLINE;
        stop = END_FLOW;
        break;
      }
      if (c === COMMA && flow) {
        stop = END_FLOW;
        break;
      }
      i++;
      end = i;
    }
    this.plainStop = stop;
    // At the ':' of a key; otherwise after the scalar's last character.
    this.pos = stop === END_COLON ? i : end;
    return t.slice(start, end);
  }

  /** A one-line quoted scalar at `this.pos`; leaves `this.pos` after the closing quote. */
  private quoted(): string {
    const t = this.t;
    const quote = t.charCodeAt(this.pos);
    let i = this.pos + 1;
    let out = '';
    let from = i;
    for (;;) {
      if (i >= this.n) throw DECLINE;
      const c = t.charCodeAt(i);
      if (c === NEWLINE) throw DECLINE; // multi-line quoted scalar
      if (c === quote) {
        if (quote === SINGLE_QUOTE && t.charCodeAt(i + 1) === SINGLE_QUOTE) {
          out += t.slice(from, i + 1);
          i += 2;
          from = i;
          continue;
        }
        break;
      }
      if (c === BACKSLASH && quote === DOUBLE_QUOTE) {
        const e = t.charCodeAt(i + 1);
        if (e !== BACKSLASH && e !== DOUBLE_QUOTE) throw DECLINE;
        out += t.slice(from, i);
        i++; // keep the escaped character, skip the backslash
        from = i;
        i++;
        continue;
      }
      i++;
    }
    out += t.slice(from, i);
    this.pos = i + 1;
    return out;
  }

  /**
   * Between items of a flow collection: spaces, a comment after a space, and line breaks to further lines
   * indented more than `owner` (the column of the block node holding the collection), never blank or
   * comment-only lines.
   */
  private flowSpace(owner: number): void {
    const t = this.t;
    for (;;) {
      const before = this.pos;
      while (t.charCodeAt(this.pos) === SPACE) this.pos++;
      let c = t.charCodeAt(this.pos);
      if (c === HASH) {
        if (this.pos === before && t.charCodeAt(this.pos - 1) !== SPACE) throw DECLINE;
        const eol = t.indexOf('\n', this.pos);
        if (eol < 0) throw DECLINE;
        this.pos = eol;
        c = NEWLINE;
      }
      if (c !== NEWLINE) return;
      const lineStart = this.pos + 1;
      const indent = this.indentAt(lineStart);
      const first = t.charCodeAt(lineStart + indent);
      if (indent <= owner || lineStart + indent >= this.n || first === NEWLINE || first === HASH) throw DECLINE;
      this.pos = lineStart + indent;
    }
  }

  /** Spaces on the same line. */
  private inlineSpace(): void {
    while (this.t.charCodeAt(this.pos) === SPACE) this.pos++;
  }

  private flowSequence(owner: number, depth: number): { value: unknown; shadow: Shadow } {
    if (depth > MAX_DEPTH) throw DECLINE;
    const t = this.t;
    const arr: unknown[] = [];
    const shadow: SeqShadow = { start: this.pos, items: [] };
    this.pos++;
    for (;;) {
      if (this.flowItemStart(owner, CLOSE_SQUARE) === undefined) break;
      const item = this.flowItem(owner, depth);
      arr.push(item.value);
      shadow.items.push(item.shadow);
      if (this.flowItemEnd(CLOSE_SQUARE)) break;
    }
    this.pos++;
    return { value: arr, shadow };
  }

  /**
   * Before a flow item: the first character of the item, or undefined at the closing bracket `close` (an
   * empty item — a ',' or the end of the text — declines).
   */
  private flowItemStart(owner: number, close: number): number | undefined {
    this.flowSpace(owner);
    const c = this.t.charCodeAt(this.pos);
    if (c === close) return undefined;
    if (c === COMMA || Number.isNaN(c)) throw DECLINE;
    return c;
  }

  /** After a flow item: true at the closing bracket `close`; past its ',' otherwise (anything else declines). */
  private flowItemEnd(close: number): boolean {
    this.inlineSpace();
    const after = this.t.charCodeAt(this.pos);
    if (after === close) return true;
    if (after !== COMMA) throw DECLINE;
    this.pos++;
    return false;
  }

  private flowMapping(owner: number, depth: number): { value: unknown; shadow: Shadow } {
    if (depth > MAX_DEPTH) throw DECLINE;
    const t = this.t;
    const obj: Record<string, unknown> = {};
    const shadow: MapShadow = { start: this.pos, keys: [], keyStarts: [], values: [] };
    this.pos++;
    for (;;) {
      const c = this.flowItemStart(owner, CLOSE_CURLY);
      if (c === undefined) break;
      const keyStart = this.pos;
      let key: string;
      if (c === DOUBLE_QUOTE || c === SINGLE_QUOTE) {
        key = this.quoted();
        this.inlineSpace();
        if (t.charCodeAt(this.pos) !== COLON) throw DECLINE;
      } else {
        const raw = this.plain(true);
        if (this.plainStop !== END_COLON || plainScalarValue(raw) !== raw) throw DECLINE;
        key = raw;
      }
      this.checkKey(key, keyStart);
      // At the ':'; a space and a value on the same line must follow.
      if (t.charCodeAt(this.pos + 1) !== SPACE) throw DECLINE;
      this.pos += 2;
      this.inlineSpace();
      const v = t.charCodeAt(this.pos);
      if (v === COMMA || v === CLOSE_CURLY || v === NEWLINE || v === HASH || Number.isNaN(v)) throw DECLINE;
      const item = this.flowItem(owner, depth);
      if (Object.prototype.hasOwnProperty.call(obj, key)) throw DECLINE;
      obj[key] = item.value;
      shadow.keys.push(key);
      shadow.keyStarts.push(keyStart);
      shadow.values.push(item.shadow);
      if (this.flowItemEnd(CLOSE_CURLY)) break;
    }
    this.pos++;
    return { value: obj, shadow };
  }
}

function startOf(s: Shadow): number {
  return typeof s === 'number' ? s : s.start;
}

/**
 * The position of the node at `segments` below `root`, by the rules of load.ts's `locateIn`: the deepest
 * existing ancestor when the path does not exist, the key with `wantKey` or when the value is empty.
 */
function locateShadow(root: Shadow, segments: ReadonlyArray<string | number>, wantKey: boolean): number {
  let node = root;
  let best = startOf(root);
  for (let i = 0; i < segments.length; i++) {
    const seg = segments[i]!;
    const last = i === segments.length - 1;
    if (typeof node === 'number') break;
    if ('keys' in node) {
      const k = node.keys.indexOf(String(seg));
      if (k < 0) break;
      const keyStart = node.keyStarts[k]!;
      const value = node.values[k]!;
      if ((last && wantKey) || value === EMPTY) {
        best = keyStart;
        break;
      }
      best = startOf(value);
      node = value;
    } else {
      const idx = typeof seg === 'number' ? seg : Number(seg);
      const item = Number.isInteger(idx) ? node.items[idx] : undefined;
      if (item === undefined) break;
      best = startOf(item);
      node = item;
    }
  }
  return best;
}

/** 1-based line and column of offsets in one text (columns in UTF-16 code units, as the `yaml` library counts). */
class LinePositions {
  private starts: number[] | undefined;
  constructor(private readonly text: string) {}

  at(offset: number): SourcePosition {
    if (this.starts === undefined) {
      const starts = [0];
      for (let i = this.text.indexOf('\n'); i >= 0; i = this.text.indexOf('\n', i + 1)) starts.push(i + 1);
      this.starts = starts;
    }
    const starts = this.starts;
    let low = 0;
    let high = starts.length;
    // The last line start <= offset.
    while (high - low > 1) {
      const mid = (low + high) >> 1;
      if (starts[mid]! <= offset) low = mid;
      else high = mid;
    }
    return { line: low + 1, column: offset - starts[low]! + 1 };
  }
}

/**
 * Reads `text` if it lies in the plain subset (see the module comment); throws `Decline` otherwise. Split
 * as load.ts splits: 'species' makes each item of a root sequence one document.
 */
function readOrDecline(text: string, file: string, split: 'species' | 'single'): LoadedDocument[] {
  if (text.length > MAX_TEXT_LENGTH || MARKER_LINE.test(text) || hasRefusedCharacter(text)) throw DECLINE;
  const { value, shadow } = new PlainReader(text).document();
  const lines = new LinePositions(text);
  const docFor = (index: number, v: unknown, root: Shadow): LoadedDocument => ({
    file,
    index,
    value: v,
    locate: (p, o) => lines.at(locateShadow(root, p, o?.key ?? false)),
  });
  if (split === 'species' && Array.isArray(value) && typeof shadow !== 'number' && 'items' in shadow) {
    return value.map((item, i) => docFor(i, item, shadow.items[i]!));
  }
  return [docFor(0, value, shadow)];
}

/**
 * The documents of `text` read by the fast path, or `undefined` when the text is outside the plain subset
 * (then the `yaml` library must read it). Never throws. Pure: no disk access.
 */
export function readPlainYaml(text: string, file: string, split: 'species' | 'single'): LoadedDocument[] | undefined {
  try {
    return readOrDecline(text, file, split);
  } catch {
    return undefined;
  }
}

/** For the differential tests: like `readPlainYaml`, but a reader bug (any error but a decline) is thrown. */
export function readPlainYamlForTest(text: string, file: string, split: 'species' | 'single'): LoadedDocument[] | undefined {
  try {
    return readOrDecline(text, file, split);
  } catch (e) {
    if (e instanceof Decline) return undefined;
    throw e;
  }
}
