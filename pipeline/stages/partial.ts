/**
 * The mark of a partial database (`build --keep-going` with failures): thermo.json gets a `partial` member
 * and nasa7.txt '!' comment lines on top, both naming every species left out, so a database missing
 * species can never pass for a complete one. Readers of the 80-column file skip '!' lines (as they do the
 * caution); src/nasa7/parse.ts does.
 */
import { compareText } from '../core/text.js';
import { wrapWords } from './emit.js';

export interface PartialMark {
  /** Always true: the member exists only in a partial database. */
  partial: true;
  /** Names of the species that failed (sorted), including documents that failed validation. */
  left_out: string[];
  /** Species files with errors, as displayed (a document without a usable name is known only by its file). */
  files_with_errors: string[];
}

export function partialMark(leftOut: Iterable<string>, filesWithErrors: Iterable<string>): PartialMark {
  return {
    partial: true,
    left_out: [...new Set(leftOut)].sort(compareText),
    files_with_errors: [...new Set(filesWithErrors)].sort(compareText),
  };
}

/** nasa7.txt with the partial-database comment lines put above everything else. */
export function markPartialNasa7(text: string, mark: PartialMark): string {
  const what = mark.left_out.length ? `${mark.left_out.length} species left out: ${mark.left_out.join(', ')}` : 'species left out (see files)';
  const files = mark.files_with_errors.length ? `; files with errors: ${mark.files_with_errors.join(', ')}` : '';
  const lines = wrapWords(`PARTIAL DATABASE (build --keep-going): ${what}${files}.`, 77).map((l) => `! ${l}`);
  return `${lines.join('\n')}\n${text}`;
}
