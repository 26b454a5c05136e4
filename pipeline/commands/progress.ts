/**
 * Progress display of a build on stderr: a cli-progress bar when stderr is a terminal, plain lines
 * otherwise (CI logs), nothing with --quiet.
 */
import type { ProgressEvent } from '../runner.js';

export interface TextSink {
  write(text: string): unknown;
}

export interface ProgressReporter {
  onProgress(e: ProgressEvent): void;
  stop(): void;
}

export async function createProgressReporter(
  stderr: TextSink,
  mode: { quiet: boolean; tty: boolean },
): Promise<ProgressReporter> {
  if (mode.quiet) return { onProgress: () => {}, stop: () => {} };
  const isTerminal = mode.tty && typeof (stderr as { cursorTo?: unknown }).cursorTo === 'function';
  if (!isTerminal) {
    return {
      onProgress(e) {
        if (e.kind === 'stage') stderr.write(`qforge: ${e.stage}${e.detail ? `: ${e.detail}` : ''}\n`);
        else if (e.kind === 'note') stderr.write(`qforge: ${e.message}\n`);
        else if (e.kind === 'species-done') {
          stderr.write(`qforge: [${e.done}/${e.total}] ${e.name} ${e.ok ? 'ok' : 'FAILED'}${e.cacheHit ? ' (cached)' : ''}\n`);
        }
      },
      stop() {},
    };
  }
  const { default: cliProgress } = await import('cli-progress');
  const bar = new cliProgress.SingleBar(
    {
      stream: stderr as unknown as NodeJS.WritableStream,
      format: 'qforge {bar} {value}/{total} species | {name}',
      hideCursor: true,
      clearOnComplete: true,
      noTTYOutput: false,
    },
    cliProgress.Presets.shades_classic,
  );
  let started = false;
  return {
    onProgress(e) {
      if (e.kind === 'species-start') {
        bar.start(e.total, 0, { name: '' });
        started = true;
      } else if (e.kind === 'species-done' && started) {
        bar.update(e.done, { name: `${e.name}${e.ok ? '' : ' FAILED'}` });
      } else if (e.kind === 'note') {
        stderr.write(`qforge: ${e.message}\n`);
      }
    },
    stop() {
      if (started) bar.stop();
      started = false;
    },
  };
}
