/**
 * A diagnostic at a field of a loaded document: its path written the one way every stage writes it, and the
 * line and column of that field when the document can locate it.
 */
import type { Diagnostic, Severity } from '../core/diagnostics.js';
import type { LoadedDocument } from './load.js';
import { formatFieldPath } from './schema-check.js';

export function diagnosticAt(
  doc: LoadedDocument,
  species: string | undefined,
  at: ReadonlyArray<string | number>,
  finding: { severity: Severity; code: string; message: string; value?: unknown; expected?: string },
): Diagnostic {
  const d: Diagnostic = { severity: finding.severity, code: finding.code, file: doc.file, path: formatFieldPath([...at]), message: finding.message };
  if (finding.value !== undefined) d.value = finding.value;
  if (finding.expected !== undefined) d.expected = finding.expected;
  const where = doc.locate(at);
  if (where) {
    d.line = where.line;
    d.column = where.column;
  }
  if (species !== undefined) d.species = species;
  return d;
}
