/**
 * The one shape of a command-line failure that is not a data diagnostic (bad arguments, unusable paths,
 * a locked build, a file-system error): a `qforge: error: ...` line on stderr and, when the command line
 * asked for `--json`, a JSON object on stdout so a CI job that parses stdout always gets JSON:
 * `{"format": "qforge-error/1", "error": {"code", "message", "exit_code"}}` (schemas/error.schema.json).
 */
import type { CliIo } from './io.js';

export const ERROR_FORMAT = 'qforge-error/1';

/** Stable code of a commander parse error: 'commander.unknownOption' → 'unknown-option'. */
export function commanderErrorCode(code: string): string {
  return code.replace(/^commander\./, '').replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`);
}

export function reportCliError(io: CliIo, argv: readonly string[], code: string, message: string, exitCode: number, opts: { printed?: boolean } = {}): number {
  if (!opts.printed) io.stderr.write(`qforge: error: ${message}\n`);
  if (argv.includes('--json')) {
    io.stdout.write(`${JSON.stringify({ format: ERROR_FORMAT, error: { code, message, exit_code: exitCode } }, null, 2)}\n`);
  }
  return exitCode;
}
