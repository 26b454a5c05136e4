/**
 * JSON Schema checking of a loaded YAML document, with ajv's raw errors turned into located, readable
 * diagnostics: file:line:column, field path (`vibrations[1].wavenumber`), the bad value and what was
 * expected. Used for species files and for the settings file; nothing here is specific to species.
 *
 * ajv with `allErrors` reports every failure, including the bookkeeping of combinators: each failed branch of
 * an anyOf/oneOf plus the combinator itself, and an "if" error next to every failed "then". Those cascades are
 * collapsed here into one message per location: the errors of the branch whose type matches the value (e.g.
 * "must be > 0" for a bare number), or, when no branch matches, a single "expected ..." built from the
 * schema's `title`s. Schema `title`s are therefore written as human "expected" phrases
 * ("a number > 0 in cm-1, or {value, unit}"); a `title` on a `then` object names the condition
 * ("structure 'atom'") for messages about fields required or forbidden by it.
 */
import { ajv2020Module } from '../core/lazy-libraries.js';
import type { ErrorObject, ValidateFunction } from 'ajv';
import type { Diagnostic } from '../core/diagnostics.js';
import { compareText } from '../core/text.js';
import type { LoadedDocument, SourcePosition } from './load.js';

/**
 * The ajv options every input schema is compiled with (the messages below rely on `verbose`). The species
 * and settings schemas are compiled ahead of time with them (scripts/generate-validators.mjs →
 * pipeline/generated/input-validators.ts, checked for drift by a test).
 */
export const INPUT_AJV_OPTIONS = Object.freeze({
  allErrors: true,
  verbose: true,
  strict: true,
  strictRequired: false,
  allowUnionTypes: true,
});

/** A validator for `schema` compiled now, with the input options (for schemas not compiled ahead of time). */
export function createSchemaValidator(schema: object): ValidateFunction {
  return new (ajv2020Module().Ajv2020)({ ...INPUT_AJV_OPTIONS }).compile(schema);
}

export interface SchemaCheckOptions {
  /** Species (or record) name put on every diagnostic. Default: the document's `name` when it is a string. */
  species?: string;
}

type Segment = string | number;
type JsonObject = Record<string, unknown>;

const IDENTIFIER = /^[A-Za-z_][A-Za-z0-9_]*$/;

/** `vibrations[1].wavenumber`; keys that are not identifiers are quoted: `composition["C-13"]`. */
export function formatFieldPath(segments: ReadonlyArray<Segment>): string {
  let out = '';
  for (const s of segments) {
    if (typeof s === 'number') out += `[${s}]`;
    else if (IDENTIFIER.test(s)) out += out === '' ? s : `.${s}`;
    else out += `[${JSON.stringify(s)}]`;
  }
  return out;
}

/**
 * Edit distance with adjacent transpositions counting as one edit (optimal string alignment), so the
 * commonest typing slip ('titel' for 'title') is one edit away, not two.
 */
function levenshtein(a: string, b: string): number {
  let before = Array.from({ length: b.length + 1 }, () => 0);
  let prev = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const cur = [i];
    for (let j = 1; j <= b.length; j++) {
      let d = Math.min(prev[j]! + 1, cur[j - 1]! + 1, prev[j - 1]! + (a[i - 1] === b[j - 1] ? 0 : 1));
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) d = Math.min(d, before[j - 2]! + 1);
      cur.push(d);
    }
    before = prev;
    prev = cur;
  }
  return prev[b.length]!;
}

/**
 * The candidate closest to `word` (case-insensitive edit distance), when it is close enough to be a likely
 * misspelling: distance at most max(2, length/3), or one is a prefix of the other.
 */
export function nearestKey(word: string, candidates: Iterable<string>): string | undefined {
  const w = word.toLowerCase();
  let best: string | undefined;
  let bestDistance = Infinity;
  for (const c of candidates) {
    const lc = c.toLowerCase();
    const d = lc === w ? 0 : lc.startsWith(w) || w.startsWith(lc) ? 1 : levenshtein(w, lc);
    if (d < bestDistance) {
      best = c;
      bestDistance = d;
    }
  }
  if (best === undefined) return undefined;
  // Short words are within two edits of almost anything, so the allowance grows with the length and a
  // suggestion must keep at least one character of the word.
  const allowance = Math.max(1, Math.min(2, Math.floor(word.length / 3)));
  return bestDistance <= allowance && bestDistance < word.length ? best : undefined;
}

function decodePointer(pointer: string): string[] {
  if (pointer === '' || pointer === '#') return [];
  return pointer
    .replace(/^#/, '')
    .split('/')
    .slice(1)
    .map((s) => s.replace(/~1/g, '/').replace(/~0/g, '~'));
}

/** JSON pointer into the data → path segments, with array indices as numbers. */
function instanceSegments(pointer: string, data: unknown): Segment[] {
  const out: Segment[] = [];
  let node = data;
  for (const raw of decodePointer(pointer)) {
    if (Array.isArray(node)) {
      const i = Number(raw);
      out.push(i);
      node = node[i];
    } else {
      out.push(raw);
      node = node !== null && typeof node === 'object' ? (node as JsonObject)[raw] : undefined;
    }
  }
  return out;
}

/** Resolves a local schema pointer (`#/$defs/x/properties/y`) against the root schema. */
function resolveSchema(root: unknown, pointer: string): unknown {
  let node = root;
  for (const seg of decodePointer(pointer)) {
    if (node === null || typeof node !== 'object') return undefined;
    node = (node as JsonObject)[seg];
  }
  return node;
}

function deref(root: unknown, schema: unknown): unknown {
  let s = schema;
  for (let i = 0; i < 10 && s && typeof s === 'object' && typeof (s as JsonObject).$ref === 'string'; i++) {
    const ref = (s as JsonObject).$ref as string;
    if (!ref.startsWith('#')) return s;
    s = resolveSchema(root, ref);
  }
  return s;
}

function titleOf(schema: unknown): string | undefined {
  return schema && typeof schema === 'object' && typeof (schema as JsonObject).title === 'string'
    ? ((schema as JsonObject).title as string)
    : undefined;
}

/** The `title` of the nearest `then`/`else` object on the error's schema path: the condition that applies. */
function conditionTitle(root: unknown, schemaPath: string): string | undefined {
  const segs = decodePointer(schemaPath);
  for (let i = segs.length - 1; i >= 0; i--) {
    if (segs[i] === 'then' || segs[i] === 'else') {
      return titleOf(resolveSchema(root, `#/${segs.slice(0, i + 1).join('/')}`));
    }
  }
  return undefined;
}

/** Searches the schema path (innermost first) for a `properties` entry named `key`. */
function propertySchema(root: unknown, schemaPath: string, key: string): unknown {
  const segs = decodePointer(schemaPath);
  for (let i = segs.length; i >= 0; i--) {
    const s = resolveSchema(root, i === 0 ? '#' : `#/${segs.slice(0, i).join('/')}`) as JsonObject | undefined;
    const props = s && typeof s === 'object' ? (s.properties as JsonObject | undefined) : undefined;
    if (props && typeof props === 'object' && key in props) return deref(root, props[key]);
  }
  return undefined;
}

function jsonTypeName(v: unknown): string {
  if (v === null) return 'null (empty value)';
  if (Array.isArray(v)) return 'a list';
  switch (typeof v) {
    case 'number':
      return Number.isFinite(v) ? (Number.isInteger(v) ? 'a whole number' : 'a number') : `not a finite number (${v})`;
    case 'string':
      return 'a text';
    case 'boolean':
      return 'true/false';
    case 'object':
      return 'a mapping';
    default:
      return typeof v;
  }
}

const TYPE_WORDS: Readonly<Record<string, string>> = {
  number: 'a number',
  integer: 'a whole number',
  string: 'a text',
  boolean: 'true or false',
  object: 'a mapping',
  array: 'a list',
  null: 'an empty value',
};

function typeWords(t: unknown): string {
  const list = Array.isArray(t) ? t : [t];
  return list.map((x) => TYPE_WORDS[String(x)] ?? String(x)).join(' or ');
}

/** "expected ..." text for a field's schema: its title, its accepted values, or its type. */
function expectationOf(prop: unknown): string | undefined {
  if (!prop || typeof prop !== 'object') return undefined;
  const s = prop as JsonObject;
  if (titleOf(s)) return titleOf(s);
  if (Array.isArray(s.enum)) return `one of ${s.enum.map((x) => (typeof x === 'string' ? x : JSON.stringify(x))).join(', ')}`;
  if ('const' in s) return JSON.stringify(s.const);
  return s.type !== undefined ? typeWords(s.type) : undefined;
}

function branchSummary(root: unknown, branches: unknown): string | undefined {
  if (!Array.isArray(branches)) return undefined;
  const parts = branches.map((b) => {
    const s = deref(root, b) as JsonObject | boolean | undefined;
    if (typeof s === 'boolean' || !s) return String(s);
    if (titleOf(s)) return titleOf(s)!;
    if ('const' in s) return JSON.stringify(s.const);
    if (Array.isArray(s.enum)) return s.enum.map((x) => JSON.stringify(x)).join(', ');
    if (s.type) return typeWords(s.type);
    return 'another form';
  });
  return parts.join('; or ');
}

function isWithin(p: string, prefix: string): boolean {
  return p === prefix || p.startsWith(`${prefix}/`);
}

const MISMATCH_KEYWORDS = new Set(['type', 'const', 'enum', 'false schema']);

/**
 * Replaces each failed anyOf/oneOf (and its branch errors, which ajv emits just before it) by the errors of
 * the branch that fits the value's type, or by the combinator error alone when no branch fits. Processing in
 * emission order handles nesting: an inner combinator is collapsed before the outer one sees it.
 */
function collapseCombinators(root: unknown, errors: readonly ErrorObject[]): ErrorObject[] {
  const out: ErrorObject[] = [];
  for (const e of errors) {
    if (e.keyword !== 'anyOf' && e.keyword !== 'oneOf') {
      out.push(e);
      continue;
    }
    const popped: ErrorObject[] = [];
    while (out.length > 0 && isWithin(out[out.length - 1]!.instancePath, e.instancePath)) popped.unshift(out.pop()!);
    const byKeys = collapseByKeys(root, e, popped);
    if (byKeys) {
      out.push(...byKeys);
      continue;
    }
    const multipleMatched = e.keyword === 'oneOf' && Array.isArray((e.params as { passingSchemas?: unknown }).passingSchemas);
    const kept = multipleMatched
      ? []
      : popped.filter((x) => !(x.instancePath === e.instancePath && MISMATCH_KEYWORDS.has(x.keyword)));
    if (kept.length === 0) {
      // No branch takes a value of this type at all (a text where numbers and mappings are accepted).
      const atItem = popped.filter((x) => x.instancePath === e.instancePath);
      const onlyTypes = !multipleMatched && atItem.length > 0 && atItem.every((x) => x.keyword === 'type');
      out.push(onlyTypes ? { ...e, params: { ...e.params, noTypeFits: true } } : e);
      continue;
    }
    // Several branches fit the type: report the branch with the fewest complaints (the likely intent).
    const prefix = `${e.schemaPath}/`;
    const groups = new Map<number, ErrorObject[]>();
    for (const x of kept) {
      const m = x.schemaPath.startsWith(prefix) ? /^(\d+)/.exec(x.schemaPath.slice(prefix.length)) : null;
      const branch = m ? Number(m[1]) : -1;
      groups.set(branch, [...(groups.get(branch) ?? []), x]);
    }
    const identified = [...groups.entries()].filter(([b]) => b >= 0);
    if (identified.length > 1) {
      identified.sort((a, b) => a[1].length - b[1].length || a[0] - b[0]);
      out.push(...identified[0]![1]);
    } else {
      out.push(...kept);
    }
  }
  return out;
}

const SHAPE_KEYWORDS = new Set(['required', 'additionalProperties']);

/** The object branches of a combinator (refs resolved), or undefined when a branch is not a plain object schema. */
function objectBranches(root: unknown, branches: unknown): JsonObject[] {
  if (!Array.isArray(branches)) return [];
  return branches
    .map((b) => deref(root, b))
    .filter((s): s is JsonObject => {
      if (!s || typeof s !== 'object') return false;
      const t = (s as JsonObject).type;
      return t === 'object' || (Array.isArray(t) && t.includes('object'));
    });
}

/**
 * A mapping given to a combinator with several mapping forms (a vibration is `{value, unit}` or
 * `{wavenumber, degeneracy}`): the form is recognised from the keys, not from ajv's per-branch error counts
 * (ajv's schema paths inside `$ref` branches cannot be told apart reliably). When exactly one form has every
 * key of the mapping and all its required keys, only the errors inside that form's fields are kept (the
 * other forms' "missing"/"unknown key" complaints are noise); when none does, the combinator error alone is
 * reported, once, at the mapping, with the combinator's title as the expectation. Returns undefined when
 * the rule does not apply (not a mapping, or fewer than two mapping forms).
 */
function collapseByKeys(root: unknown, e: ErrorObject, popped: readonly ErrorObject[]): ErrorObject[] | undefined {
  const data = e.data;
  if (data === null || typeof data !== 'object' || Array.isArray(data)) return undefined;
  const forms = objectBranches(root, e.schema);
  if (forms.length < 2) return undefined;
  const keys = Object.keys(data as JsonObject);
  const fits = forms.filter((s) => {
    const props = s.properties && typeof s.properties === 'object' ? (s.properties as JsonObject) : {};
    const required = Array.isArray(s.required) ? (s.required as string[]) : [];
    return keys.every((k) => k in props) && required.every((k) => keys.includes(k));
  });
  if (fits.length !== 1) return [e];
  const props = fits[0]!.properties as JsonObject;
  const inner = popped.filter((x) => {
    if (x.instancePath === e.instancePath) return false;
    const below = decodePointer(x.instancePath.slice(e.instancePath.length))[0];
    return below !== undefined && below in props;
  });
  return inner.length > 0 ? inner : [e];
}

/**
 * Several "missing field" / "unknown key" complaints about one quantity mapping (`{B: 0.39}` for a
 * rotational constant) are one mistake — the wrong form — so they become one error at the mapping.
 */
function mergeQuantityShapeErrors(errors: readonly ErrorObject[]): ErrorObject[] {
  const isQuantityShape = (x: ErrorObject) => {
    const t = (x.parentSchema as JsonObject | undefined)?.type;
    return SHAPE_KEYWORDS.has(x.keyword) && Array.isArray(t) && t.includes('object') && t.length > 1;
  };
  const count = new Map<string, number>();
  for (const x of errors) if (isQuantityShape(x)) count.set(x.instancePath, (count.get(x.instancePath) ?? 0) + 1);
  const out: ErrorObject[] = [];
  const merged = new Map<string, ErrorObject>();
  for (const x of errors) {
    if (!isQuantityShape(x) || (count.get(x.instancePath) ?? 0) < 2) {
      out.push(x);
      continue;
    }
    let m = merged.get(x.instancePath);
    if (!m) {
      m = { ...x, keyword: 'quantityForm', params: { missing: [] as string[], unknown: [] as string[] } };
      merged.set(x.instancePath, m);
      out.push(m);
    }
    const p = m.params as { missing: string[]; unknown: string[] };
    if (x.keyword === 'required') p.missing.push(String((x.params as { missingProperty?: unknown }).missingProperty));
    else p.unknown.push(String((x.params as { additionalProperty?: unknown }).additionalProperty));
  }
  return out;
}

function describeLimit(keyword: string, limit: unknown): { message: string; expected: string } {
  switch (keyword) {
    case 'exclusiveMinimum':
      return { message: limit === 0 ? 'must be positive' : 'too small', expected: `a value > ${limit}` };
    case 'minimum':
      return { message: limit === 0 ? 'must not be negative' : 'too small', expected: `a value >= ${limit}` };
    case 'exclusiveMaximum':
      return { message: 'too large', expected: `a value < ${limit}` };
    default:
      return { message: 'too large', expected: `a value <= ${limit}` };
  }
}

function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}

/**
 * Validates `doc.value` with `validate` and returns every failure as a located diagnostic (empty when the
 * document conforms). `validate` should come from `createSchemaValidator` (it needs `verbose` errors).
 */
export function checkAgainstSchema(
  validate: ValidateFunction,
  doc: LoadedDocument,
  opts: SchemaCheckOptions = {},
): Diagnostic[] {
  if (validate(doc.value)) return [];
  const root = validate.schema;
  const species =
    opts.species ??
    (doc.value && typeof doc.value === 'object' && typeof (doc.value as JsonObject).name === 'string'
      ? ((doc.value as JsonObject).name as string)
      : undefined);

  const raw = (validate.errors ?? []).filter((e) => e.keyword !== 'if' && e.keyword !== 'propertyNames');
  const errors = mergeQuantityShapeErrors(collapseCombinators(root, raw));
  const out: Diagnostic[] = [];
  const seen = new Set<string>();

  const emit = (segments: Segment[], where: SourcePosition | undefined, d: Omit<Diagnostic, 'severity' | 'file' | 'path'> & { code: string }) => {
    const pathText = formatFieldPath(segments);
    const key = `${pathText}\u0000${d.message}`;
    if (seen.has(key)) return;
    seen.add(key);
    const diag: Diagnostic = { severity: 'error', file: doc.file, path: pathText, ...d };
    if (where) {
      diag.line = where.line;
      diag.column = where.column;
    }
    if (species !== undefined) diag.species = species;
    out.push(diag);
  };

  for (const e of errors) {
    const params = e.params as Record<string, unknown>;
    const at = instanceSegments(e.instancePath, doc.value);
    // Errors about a mapping key (propertyNames) concern the key itself.
    if (typeof params.propertyName === 'string') {
      at.push(params.propertyName);
      emit(at, doc.locate(at, { key: true }), {
        code: 'key-not-accepted',
        message: `key '${params.propertyName}' is not accepted here`,
        value: params.propertyName,
        expected: titleOf(e.parentSchema) ?? e.message ?? 'another key',
      });
      continue;
    }
    const parentSchema = e.parentSchema as JsonObject | undefined;
    const title = titleOf(parentSchema);
    const last = at[at.length - 1];

    switch (e.keyword) {
      case 'required': {
        const missing = String(params.missingProperty);
        const condition = conditionTitle(root, e.schemaPath);
        const own = parentSchema && typeof parentSchema.properties === 'object' ? (parentSchema.properties as JsonObject)[missing] : undefined;
        const prop = own !== undefined ? deref(root, own) : propertySchema(root, e.schemaPath, missing);
        emit([...at, missing], doc.locate(at), {
          code: 'missing-field',
          message: `missing required field '${missing}'${condition ? ` (required for ${condition})` : ''}`,
          expected: expectationOf(prop),
        });
        break;
      }
      case 'additionalProperties': {
        const key = String(params.additionalProperty);
        const known = parentSchema && typeof parentSchema.properties === 'object' ? Object.keys(parentSchema.properties as object) : [];
        const suggestion = nearestKey(key, known);
        emit([...at, key], doc.locate([...at, key], { key: true }), {
          code: 'unknown-key',
          message: `unknown key '${key}'${suggestion ? ` (did you mean '${suggestion}'?)` : ''}`,
          expected: known.length ? `one of ${known.join(', ')}` : 'no keys here',
        });
        break;
      }
      case 'false schema': {
        const condition = conditionTitle(root, e.schemaPath);
        emit(at, doc.locate(at, { key: true }), {
          code: condition ? 'field-not-applicable' : 'field-not-allowed',
          message: condition
            ? `field '${String(last)}' does not apply to ${condition}`
            : `field '${String(last)}' is not allowed here`,
          expected: condition ? `no '${String(last)}' for ${condition}` : undefined,
        });
        break;
      }
      case 'type':
        emit(at, doc.locate(at), {
          code: 'wrong-type',
          message: `wrong type: ${jsonTypeName(e.data)}`,
          // JSON would print Infinity and NaN as null.
          value: typeof e.data === 'number' && !Number.isFinite(e.data) ? String(e.data) : e.data,
          // At the root the title names the whole document rather than phrasing an expectation.
          expected: at.length === 0 ? `${typeWords(params.type)}${title ? ` (${title})` : ''}` : title ?? typeWords(params.type),
        });
        break;
      case 'enum': {
        const allowed = (params.allowedValues as unknown[]) ?? [];
        const suggestion =
          typeof e.data === 'string' ? nearestKey(e.data, allowed.filter((x): x is string => typeof x === 'string')) : undefined;
        const what = last === 'unit' ? 'unknown unit' : 'not an accepted value';
        emit(at, doc.locate(at), {
          code: last === 'unit' ? 'unknown-unit' : 'value-not-accepted',
          message: `${what}${suggestion ? ` (did you mean '${suggestion}'?)` : ''}`,
          value: e.data,
          expected: `one of ${allowed.map((x) => (typeof x === 'string' ? x : JSON.stringify(x))).join(', ')}`,
        });
        break;
      }
      case 'const':
        emit(at, doc.locate(at), { code: 'value-not-accepted', message: 'not the accepted value', value: e.data, expected: JSON.stringify(params.allowedValue) });
        break;
      case 'minimum':
      case 'maximum':
      case 'exclusiveMinimum':
      case 'exclusiveMaximum': {
        const { message, expected } = describeLimit(e.keyword, params.limit);
        emit(at, doc.locate(at), { code: 'out-of-range', message, value: e.data, expected: title ? `${expected} (${title})` : expected });
        break;
      }
      case 'pattern':
        emit(at, doc.locate(at), {
          code: 'wrong-form',
          message: 'wrong form',
          value: e.data,
          expected: title ?? `text matching ${String(params.pattern)}`,
        });
        break;
      case 'minItems':
      case 'maxItems': {
        const n = Array.isArray(e.data) ? e.data.length : 0;
        const limit = Number(params.limit);
        emit(at, doc.locate(at), {
          code: e.keyword === 'minItems' ? 'too-few-items' : 'too-many-items',
          message: e.keyword === 'minItems' ? `too few items (${n})` : `too many items (${n})`,
          value: e.data,
          expected: `${e.keyword === 'minItems' ? 'at least' : 'at most'} ${plural(limit, 'item')}${title ? ` (${title})` : ''}`,
        });
        break;
      }
      case 'minLength':
      case 'maxLength': {
        const n = typeof e.data === 'string' ? [...e.data].length : 0;
        const limit = `${e.keyword === 'minLength' ? 'at least' : 'at most'} ${plural(Number(params.limit), 'character')}`;
        emit(at, doc.locate(at), {
          code: e.keyword === 'minLength' ? 'too-short' : 'too-long',
          message: `${e.keyword === 'minLength' ? 'too short' : 'too long'}: ${plural(n, 'character')}`,
          value: e.data,
          expected: title ? `${limit}: ${title}` : limit,
        });
        break;
      }
      case 'minProperties':
        emit(at, doc.locate(at), {
          code: 'too-few-entries',
          message: 'too few entries',
          value: e.data,
          expected: `at least ${plural(Number(params.limit), 'entry')}${title ? ` (${title})` : ''}`,
        });
        break;
      case 'quantityForm': {
        const p = params as { missing: string[]; unknown: string[] };
        const known = parentSchema && typeof parentSchema.properties === 'object' ? Object.keys(parentSchema.properties as object) : [];
        const parts: string[] = [];
        if (p.missing.length) parts.push(`missing ${p.missing.map((k) => `'${k}'`).join(', ')}`);
        for (const k of p.unknown) {
          const suggestion = nearestKey(k, known);
          parts.push(`unknown key '${k}'${suggestion ? ` (did you mean '${suggestion}'?)` : ''}`);
        }
        emit(at, doc.locate(at), {
          code: 'quantity-form',
          message: `not an accepted form: ${parts.join('; ')}`,
          value: e.data,
          expected: title ?? `one of ${known.join(', ')}`,
        });
        break;
      }
      case 'anyOf':
      case 'oneOf': {
        const multiple = Array.isArray(params.passingSchemas);
        emit(at, doc.locate(at), {
          code: multiple ? 'ambiguous-form' : params.noTypeFits === true ? 'wrong-type' : 'not-accepted-form',
          message: multiple
            ? 'matches more than one accepted form'
            : params.noTypeFits === true
              ? `wrong type: ${jsonTypeName(e.data)}`
              : 'not an accepted form',
          value: e.data,
          expected: title ?? branchSummary(root, e.schema) ?? 'one of the accepted forms',
        });
        break;
      }
      default:
        emit(at, doc.locate(at), { code: `schema-${e.keyword.replace(/[^a-z0-9]+/gi, '-').toLowerCase()}`, message: e.message ?? `fails '${e.keyword}'`, value: e.data });
    }
  }
  // Source order, so a report reads top to bottom like the file.
  return out.sort((a, b) => (a.line ?? 0) - (b.line ?? 0) || (a.column ?? 0) - (b.column ?? 0) || compareText(a.path, b.path));
}
