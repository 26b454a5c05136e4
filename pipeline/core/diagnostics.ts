/**
 * Diagnostics: the one shape for every input problem, from YAML syntax to physics checks. Stages collect
 * them and return them all at once; only the CLI prints them and decides the exit code.
 */
import { compareText } from './text.js';

export type Severity = 'error' | 'warning';

export interface Diagnostic {
  severity: Severity;
  /** File path as the user gave it (relative to the database folder where possible). */
  file: string;
  /** 1-based line and column of the offending node, when known. */
  line?: number;
  column?: number;
  /** Species record name, when known. */
  species?: string;
  /** Field path in the document, e.g. `vibrations[1].wavenumber` ('' for the whole document). */
  path: string;
  /** What is wrong, in words. */
  message: string;
  /** The offending value, when there is one. */
  value?: unknown;
  /** What was expected instead. */
  expected?: string;
  /**
   * Stable identifier of the kind of problem, lower kebab-case (e.g. `rotor-axis-not-bonded`), the same in
   * text and JSON outputs and the key of `accepted_warnings`. Never reworded once released.
   */
  code?: string;
}

/** JSON.stringify replacer that keeps NaN and ±Infinity visible (JSON would print them as null). */
export function nonFiniteAsText(_key: string, v: unknown): unknown {
  return typeof v === 'number' && !Number.isFinite(v) ? String(v) : v;
}

function showValue(v: unknown): string {
  if (v === undefined) return '';
  let s: string;
  try {
    s = typeof v === 'number' && !Number.isFinite(v) ? String(v) : (JSON.stringify(v, nonFiniteAsText) ?? String(v));
  } catch {
    s = String(v);
  }
  return s.length > 60 ? `${s.slice(0, 57)}...` : s;
}

/** `file:line:col: error: [species] path: message (got V; expected E) [code]` — one line per diagnostic. */
export function formatDiagnostic(d: Diagnostic): string {
  const where = [d.file, d.line, d.column].filter((x) => x !== undefined).join(':');
  const who = d.species ? `[${d.species}] ` : '';
  const field = d.path ? `${d.path}: ` : '';
  const extras: string[] = [];
  if (d.value !== undefined) extras.push(`got ${showValue(d.value)}`);
  if (d.expected) extras.push(`expected ${d.expected}`);
  const tail = extras.length ? ` (${extras.join('; ')})` : '';
  const code = d.code ? ` [${d.code}]` : '';
  return `${where}: ${d.severity}: ${who}${field}${d.message}${tail}${code}`;
}


/** Stable order: file, line, column, then message; so reports depend neither on completion order nor locale. */
export function compareDiagnostics(a: Diagnostic, b: Diagnostic): number {
  return (
    compareText(a.file, b.file) ||
    (a.line ?? 0) - (b.line ?? 0) ||
    (a.column ?? 0) - (b.column ?? 0) ||
    compareText(a.message, b.message)
  );
}

export const hasErrors = (ds: readonly Diagnostic[]): boolean => ds.some((d) => d.severity === 'error');
