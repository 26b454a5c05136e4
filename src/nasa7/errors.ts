/**
 * Error classes of the NASA-7 fit and of the 80-column layout. Each carries the list of problems it found
 * so a caller can report all of them at once; `message` joins them.
 */

/** The fit cannot be made as asked: bad options, samples that do not support it, or a singular system. */
export class FitError extends Error {
  readonly problems: string[];
  constructor(problems: string | string[]) {
    const list = Array.isArray(problems) ? problems : [problems];
    super(list.length === 1 ? list[0] : `${list.length} problems:\n  - ${list.join('\n  - ')}`);
    this.name = 'FitError';
    this.problems = list;
  }
}

/** A record cannot be written in the four-line 80-column layout without losing information. */
export class Nasa7FormatError extends Error {
  /** Record name the problem belongs to ('' for the file header). */
  readonly record: string;
  /** Field of the layout, e.g. `elements[4]`, `name`, `high.a3`. */
  readonly field: string;
  constructor(record: string, field: string, message: string) {
    super(`${record ? `record ${JSON.stringify(record)}: ` : ''}${field}: ${message}`);
    this.name = 'Nasa7FormatError';
    this.record = record;
    this.field = field;
  }
}
