/**
 * What a command may touch of the outside world: its output streams, working folder, terminal kind and
 * environment. Commands take it as an argument so they can run in-process in tests; only the CLI builds
 * it from the real process.
 */
import type { TextSink } from './progress.js';

export interface CliIo {
  stdout: TextSink;
  stderr: TextSink;
  /** Folder relative paths are resolved against. */
  cwd: string;
  /** Whether stderr is a terminal (progress bar vs plain lines). */
  isTTY: boolean;
  env: Record<string, string | undefined>;
}
