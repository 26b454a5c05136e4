/**
 * The database-wide name checks (unique names, names differing only in case) on small per-document facts,
 * so they run without the documents' YAML trees — also when a file's findings come from the cache.
 */
import type { Diagnostic } from '../core/diagnostics.js';
import { compareText } from '../core/text.js';
import type { LoadedDocument } from './load.js';

/**
 * What the name checks need of one document: its file, position, `name` (when a string) and where that is
 * written. Small enough to keep for every document of a large database after its YAML tree is dropped.
 */
export interface NameFact {
  file: string;
  index: number;
  name?: string;
  nameAt?: { line: number; column: number };
}

export function nameFact(doc: LoadedDocument): NameFact {
  const f: NameFact = { file: doc.file, index: doc.index };
  const value = doc.value as { name?: unknown } | null;
  if (value !== null && typeof value === 'object' && !Array.isArray(value) && typeof value.name === 'string') {
    f.name = value.name;
    const at = doc.locate(['name']);
    if (at) f.nameAt = { line: at.line, column: at.column };
  }
  return f;
}

/** `checkUniqueNames` on the name facts of the documents. */
export function checkUniqueNameFacts(facts: readonly NameFact[]): Diagnostic[] {
  return nameFindings(facts, true);
}

export function nameFindings(docs: readonly NameFact[], withCaseWarnings: boolean): Diagnostic[] {
  const out: Diagnostic[] = [];
  const sorted = docs.slice().sort((a, b) => compareText(a.file, b.file) || a.index - b.index);
  const exact = new Map<string, { doc: NameFact; line?: number }>();
  const folded = new Map<string, { doc: NameFact; line?: number; name: string }>();
  for (const doc of sorted) {
    const name = doc.name;
    if (name === undefined) continue;
    const where = doc.nameAt;
    const here = (d: Diagnostic): Diagnostic => {
      if (where) {
        d.line = where.line;
        d.column = where.column;
      }
      return d;
    };
    const first = exact.get(name);
    if (first) {
      const at = `${first.doc.file}${first.line !== undefined ? `:${first.line}` : ''}`;
      out.push(
        here({
          severity: 'error',
          code: 'duplicate-name',
          file: doc.file,
          path: 'name',
          species: name,
          message: `duplicate species name '${name}', already defined at ${at}`,
          value: name,
          expected: 'a name unique in the database',
        }),
      );
      continue;
    }
    exact.set(name, { doc, line: where?.line });
    const lower = name.toLowerCase();
    const twin = folded.get(lower);
    if (twin && withCaseWarnings) {
      const at = `${twin.doc.file}${twin.line !== undefined ? `:${twin.line}` : ''}`;
      out.push(
        here({
          severity: 'warning',
          code: 'name-differs-in-case',
          file: doc.file,
          path: 'name',
          species: name,
          message: `species name '${name}' differs only in letter case from '${twin.name}' at ${at}`,
          value: name,
          expected: 'names that differ in more than case (some readers ignore case)',
        }),
      );
    } else folded.set(lower, { doc, line: where?.line, name });
  }
  return out;
}
